package compare

import (
	"bytes"
	"encoding/json"
	"fmt"
	"os"
	"path/filepath"

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
