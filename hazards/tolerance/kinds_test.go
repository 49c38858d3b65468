package tolerance

import (
	"testing"

	"ullage/assets"
	"ullage/hazards"
)

// studyKind is one kind of design the speed benchmarks and the fast-path
// check cover.
type studyKind struct {
	name   string
	design hazards.Design
	// spreadK is the ± spread of the hottest temperature studied.
	spreadK float64
}

// studyKinds returns the three kinds of design:
//
//   - "passes": the bundled example's revision B, which keeps its vapour
//     space and passes;
//   - "liquid-full": the bundled example's revision A, which goes
//     liquid-full in a hot car with residual gas in the bubble (the
//     gas-bubble solve at every unit);
//   - "vapour": vapour_bulb.json (invented), 0.27 g of acetone in the
//     ornament's bulbs and tube, evacuated: the fill is all vapour from
//     about the hottest temperature up (349 K), so the units fall on both
//     sides of the dew point (about a third all vapour).
func studyKinds(t testing.TB) []studyKind {
	t.Helper()
	f, err := assets.ExampleFile()
	if err != nil {
		t.Fatal(err)
	}
	rev := func(label string) hazards.Design {
		r, err := f.Find(label)
		if err != nil {
			t.Fatal(err)
		}
		return r.Design
	}
	return []studyKind{
		{"passes", rev("B"), 5},
		{"liquid-full", rev("A"), 5},
		{"vapour", loadDesign(t, "vapour_bulb.json"), 5},
	}
}
