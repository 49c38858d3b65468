// Package assets carries the files the program ships inside its binary:
// the application icon and the bundled example designs.
package assets

import (
	"bytes"
	"embed"
	"fmt"
	"io/fs"

	"ullage/hazards"
	"ullage/hazards/designfile"
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

// ExampleFile returns the bundled example read as a design file, as
// opening it would: a fresh copy on every call.
func ExampleFile() (*designfile.File, error) {
	f, err := designfile.Decode(bytes.NewReader(Example()), ExampleName)
	if err != nil {
		return nil, fmt.Errorf("the bundled example does not load: %w", err)
	}
	return f, nil
}

// ExampleDesign returns the design of the bundled example's newest
// revision: a design valid in every field.
func ExampleDesign() (hazards.Design, error) {
	f, err := ExampleFile()
	if err != nil {
		return hazards.Design{}, err
	}
	r, err := f.Latest()
	if err != nil {
		return hazards.Design{}, fmt.Errorf("the bundled example: %w", err)
	}
	return r.Design, nil
}

// Examples returns the folder of example designs.
func Examples() fs.FS {
	sub, err := fs.Sub(examples, "examples")
	if err != nil {
		panic(err)
	}
	return sub
}
