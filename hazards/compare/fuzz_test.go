package compare

import (
	"math"
	"strings"
	"testing"

	"ullage/hazards"
)

// FuzzCompare: Compare never panics for any assessable design against a
// reference design (on either side, or against a side with no
// assessment), every result has a name and finite numbers, and a side
// compared with itself shows no change. The reference is assessed once:
// each input costs one assessment, so the comparison itself gets the
// time (FuzzAssess fuzzes the assessment).
func FuzzCompare(f *testing.F) {
	f.Add(0.012, 0.045, 0.001, 360.0, "A", "B", false, false)
	f.Add(0.05, 0.1, 0.002, 500.0, "", "rev\u00a0B", true, false)
	f.Add(math.NaN(), math.Inf(1), 0.0, 800.0, strings.Repeat("x", 300), "\xff", false, true)
	f.Add(5e-324, -1.0, 0.0, 0.0, "A", "A", true, true)
	lib := testLibrary(f)
	ref := overfilledBulb()
	refAssessment, err := hazards.Assess(ref, lib)
	if err != nil {
		f.Fatal(err)
	}
	base := overfilledBulb() // read once: each input changes a copy
	f.Fuzz(func(t *testing.T, fill, od, wall, hot float64, labelA, labelB string, drop, swap bool) {
		d := base
		d.Vessel.Parts = append([]hazards.Part(nil), base.Vessel.Parts...)
		d.FillMassKg = fill
		d.Vessel.Parts[0].OuterDiameterM, d.Vessel.Parts[0].WallThicknessM = od, wall
		d.HottestK = hot
		a, err := hazards.Assess(d, lib)
		if err != nil {
			a = nil
		}
		fuzzed := Side{Label: labelB, Design: d, Assessment: a}
		if drop {
			fuzzed.Assessment = nil
		}
		reference := Side{Label: labelA, Design: ref, Assessment: refAssessment}
		older, newer := reference, fuzzed
		if swap {
			older, newer = fuzzed, reference
		}
		c := Compare(older, newer)
		for _, r := range c.Results {
			if r.Name == "" || math.IsNaN(r.Old.Value) || math.IsInf(r.Old.Value, 0) || math.IsNaN(r.New.Value) || math.IsInf(r.New.Value, 0) {
				t.Errorf("result %+v", r)
			}
		}
		for _, in := range c.Inputs {
			if in.Field == "" {
				t.Errorf("input change without a field: %+v", in)
			}
		}
		if a == nil {
			return
		}
		self := Side{Label: labelB, Design: d, Assessment: a}
		same := Compare(self, self)
		if len(same.Inputs) != 0 || len(same.Statuses) != 0 {
			t.Errorf("a design compared with itself changed: %+v %+v", same.Inputs, same.Statuses)
		}
		for _, r := range same.Results {
			if r.Changed() {
				t.Errorf("a design compared with itself: %s changed", r.Name)
			}
		}
	})
}
