package compare

import (
	"testing"

	"ullage/fluids"
	"ullage/hazards"
)

func testLibrary(t testing.TB) *fluids.Library {
	t.Helper()
	lib, err := fluids.Builtin()
	if err != nil {
		t.Fatal(err)
	}
	return lib
}

// overfilledBulb is the shared test design
// testdata/overfilled_acetone_bulb.json: an invented evacuated 40 mm
// borosilicate bulb with 20 g of acetone, meeting 76 °C: it goes
// liquid-full near 53 °C, so it fails the ullage criterion (the same
// design as hazards' ExampleAssess).
func overfilledBulb() hazards.Design { return sharedDesign("overfilled_acetone_bulb.json") }

// side assesses a design for one side of a comparison.
func side(t testing.TB, label string, d hazards.Design) Side {
	t.Helper()
	a, err := hazards.Assess(d, testLibrary(t))
	if err != nil {
		t.Fatalf("revision %s: %v", label, err)
	}
	return Side{Label: label, Design: d, Assessment: a}
}

func findResult(t testing.TB, c Comparison, name string) ResultChange {
	t.Helper()
	for _, r := range c.Results {
		if r.Name == name {
			return r
		}
	}
	t.Fatalf("no result %q", name)
	return ResultChange{}
}

func findStatus(c Comparison, criterion string) (StatusChange, bool) {
	for _, s := range c.Statuses {
		if s.Criterion == criterion {
			return s, true
		}
	}
	return StatusChange{}, false
}
