package designfile

import (
	"bytes"
	"encoding/json"
	"fmt"
	"os"
	"path/filepath"
	"testing"

	"ullage/hazards"
)

// sharedDesign reads a design from the repository's shared testdata
// folder (see testdata/README.md), strictly: an unknown field is an error.
// It panics when the fixture is missing or bad, a fault of the test tree.
func sharedDesign(name string) hazards.Design {
	path := filepath.Join("..", "..", "testdata", name)
	b, err := os.ReadFile(path)
	if err != nil {
		panic(fmt.Sprintf("shared test design: %v", err))
	}
	var d hazards.Design
	dec := json.NewDecoder(bytes.NewReader(b))
	dec.DisallowUnknownFields()
	if err := dec.Decode(&d); err != nil {
		panic(fmt.Sprintf("shared test design %s: %v", path, err))
	}
	return d
}

// TestSharedDesigns: every shared test design decodes strictly, passes
// validation and is described in testdata/README.md.
func TestSharedDesigns(t *testing.T) {
	dir := filepath.Join("..", "..", "testdata")
	readme, err := os.ReadFile(filepath.Join(dir, "README.md"))
	if err != nil {
		t.Fatal(err)
	}
	names, err := filepath.Glob(filepath.Join(dir, "*.json"))
	if err != nil || len(names) == 0 {
		t.Fatalf("no shared designs in %s (%v)", dir, err)
	}
	for _, p := range names {
		name := filepath.Base(p)
		d := sharedDesign(name)
		if err := d.Validate(); err != nil {
			t.Errorf("%s does not validate: %v", name, err)
		}
		if !bytes.Contains(readme, []byte("`"+name+"`")) {
			t.Errorf("%s is not described in testdata/README.md", name)
		}
	}
}
