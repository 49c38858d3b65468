package designfile

import (
	"bytes"
	"os"
	"path/filepath"
	"testing"

	"ullage/hazards"
)

// Fixture paths: one file of each format.
var (
	fixtureCurrent     = filepath.Join("testdata", "twin_bulb_v2.json")
	fixtureSingleSheet = filepath.Join("testdata", "twin_bulb_v1.json")
)

// typicalDesign is the shared test design testdata/typical_design.json
// (an invented desk ornament: two 40 mm bulbs and a 200 mm neck, 1 mm
// soda-lime walls, 6 g of dichloromethane sealed evacuated at 20 °C).
// Revision A of both fixtures.
func typicalDesign() hazards.Design { return sharedDesign("typical_design.json") }

// typicalFile is a valid two-revision file built in memory.
func typicalFile() *File {
	b := typicalDesign()
	b.FillMassKg = 0.0055
	return &File{
		Product: Product{Name: "Twin-bulb desk ornament TB-40", PartNumber: "EX-TB40", Company: "Example Glassworks Ltd (invented for tests)"},
		Revisions: []Revision{
			{Label: "A", Date: "2024-03-04", Author: "R. Tester", ChangeNote: "First release.", Design: typicalDesign()},
			{Label: "B", Date: "2024-06-17", Author: "R. Tester", ChangeNote: "Less fill.", Design: b},
		},
	}
}

func readFixture(t testing.TB, path string) []byte {
	t.Helper()
	b, err := os.ReadFile(path)
	if err != nil {
		t.Fatal(err)
	}
	return b
}

func encodeToBytes(t testing.TB, f *File) []byte {
	t.Helper()
	var b bytes.Buffer
	if err := Encode(&b, f); err != nil {
		t.Fatal(err)
	}
	return b.Bytes()
}
