// Package assets carries the files the program ships inside its binary:
// the application icon and the bundled example designs.
package assets

import (
	"embed"
	"io/fs"
)

//go:embed icon.png
var icon []byte

//go:embed examples/*.json
var examples embed.FS

// Icon returns the application icon as PNG bytes.
func Icon() []byte { return icon }

// ExampleName is the file name of the bundled example design, an invented
// product of an invented company in two revisions: A fails (it goes
// liquid-full in a hot car) and B passes.
const ExampleName = "tidemark-lantern.json"

// Example returns the bundled example design file's bytes.
func Example() []byte {
	b, err := examples.ReadFile("examples/" + ExampleName)
	if err != nil {
		panic("assets: example design missing from the build: " + err.Error())
	}
	return b
}

// Examples returns the folder of example designs.
func Examples() fs.FS {
	sub, err := fs.Sub(examples, "examples")
	if err != nil {
		panic(err)
	}
	return sub
}
