package report

import (
	"bytes"
	"encoding/json"
	"errors"
	"io/fs"
	"os"
	"path/filepath"
	"testing"

	"ullage/fluids"
	"ullage/hazards"
)

// loadDesign reads a design fixture from testdata, or from the shared
// top-level testdata (typical_design.json; see its README).
func loadDesign(t testing.TB, name string) hazards.Design {
	t.Helper()
	b, err := os.ReadFile(filepath.Join("testdata", name))
	if errors.Is(err, fs.ErrNotExist) { // a design shared with other packages
		b, err = os.ReadFile(filepath.Join("..", "testdata", name))
	}
	if err != nil {
		t.Fatal(err)
	}
	var d hazards.Design
	if err := json.Unmarshal(b, &d); err != nil {
		t.Fatalf("%s: %v", name, err)
	}
	return d
}

// loadMeta reads a record header fixture from testdata.
func loadMeta(t testing.TB, name string) Meta {
	t.Helper()
	b, err := os.ReadFile(filepath.Join("testdata", name))
	if err != nil {
		t.Fatal(err)
	}
	var m Meta
	if err := json.Unmarshal(b, &m); err != nil {
		t.Fatalf("%s: %v", name, err)
	}
	return m
}

// assess assesses a design fixture against the built-in library.
func assess(t testing.TB, name string) *hazards.Assessment {
	t.Helper()
	lib, err := fluids.Builtin()
	if err != nil {
		t.Fatal(err)
	}
	a, err := hazards.Assess(loadDesign(t, name), lib)
	if err != nil {
		t.Fatalf("%s: %v", name, err)
	}
	return a
}

// render writes an assessment record and returns its bytes.
func render(t testing.TB, m Meta, a *hazards.Assessment, o Options) []byte {
	t.Helper()
	var buf bytes.Buffer
	if err := WriteAssessment(&buf, m, a, o); err != nil {
		t.Fatal(err)
	}
	return buf.Bytes()
}
