package compare

import (
	"math"
	"strings"
	"testing"

	"ullage/hazards"
)

// FuzzCompare: Compare never panics for any two assessable designs (or a
// side with no assessment), every result has a name and finite numbers,
// and a side compared with itself shows no change.
func FuzzCompare(f *testing.F) {
	f.Add(0.02, 0.012, 0.04, 0.045, 0.0015, 0.001, 330.0, 360.0, "A", "B", false)
	f.Add(0.001, 0.05, 0.01, 0.1, 1e-4, 0.002, 250.0, 500.0, "", "rev\u00a0B", true)
	f.Add(5e-324, math.NaN(), -1.0, math.Inf(1), 0.0, 0.0, 0.0, 800.0, strings.Repeat("x", 300), "\xff", false)
	lib := testLibrary(f)
	f.Fuzz(func(t *testing.T, fillA, fillB, odA, odB, wallA, wallB, hotA, hotB float64, labelA, labelB string, dropB bool) {
		mk := func(fill, od, wall, hot float64) (hazards.Design, *hazards.Assessment) {
			d := overfilledBulb()
			d.FillMassKg = fill
			d.Vessel.Parts[0].OuterDiameterM, d.Vessel.Parts[0].WallThicknessM = od, wall
			d.HottestK = hot
			a, err := hazards.Assess(d, lib)
			if err != nil {
				return d, nil
			}
			return d, a
		}
		da, aa := mk(fillA, odA, wallA, hotA)
		db, ab := mk(fillB, odB, wallB, hotB)
		if aa == nil {
			return
		}
		if dropB {
			ab = nil
		}
		c := Compare(Side{Label: labelA, Design: da, Assessment: aa}, Side{Label: labelB, Design: db, Assessment: ab})
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
		same := Compare(Side{Label: labelA, Design: da, Assessment: aa}, Side{Label: labelA, Design: da, Assessment: aa})
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
