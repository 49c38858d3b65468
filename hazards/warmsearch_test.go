package hazards

import (
	"math"
	"math/rand/v2"
	"testing"
)

// TestWarmSearchesMatchDirect assesses the digest test's random designs
// both ways: with the maximum safe temperature and fill searched from the
// brackets the design's own states point to (Assess), and from the whole
// ranges as before (the reference). Both searches stop within Brent's
// tolerance of the same root, tol = 10⁻⁶ of the range's top (solve.Brent:
// the root lies within tol of the point returned), so the two limits
// differ by at most 2·tol; their bounds agree. Nothing else reads the
// searches, so every other number and every finding's status, value,
// limit and margin are the same bit for bit.
func TestWarmSearchesMatchDirect(t *testing.T) {
	lib := testLibrary(t)
	subs := lib.All()
	r := rand.New(rand.NewPCG(20261202, 16))
	n := digestDesigns
	if testing.Short() {
		n = 1000
	}
	var worstT, worstM float64 // largest differences, in units of tol
	compared, limitByMoved := 0, 0
	for i := 0; i < n; i++ {
		d := digestDesign(r, subs[r.IntN(len(subs))])
		got, errGot := assess(d, lib, true)
		want, errWant := assess(d, lib, false)
		if (errGot == nil) != (errWant == nil) || (errGot != nil && errGot.Error() != errWant.Error()) {
			t.Fatalf("design %d (%s): error %v, reference %v", i, d.Fluid, errGot, errWant)
		}
		if errGot != nil {
			continue
		}
		compared++
		same := func(what string, g, w float64) {
			t.Helper()
			if math.Float64bits(g) != math.Float64bits(w) {
				t.Errorf("design %d (%s): %s %v, reference %v", i, d.Fluid, what, g, w)
			}
		}
		same("hot pressure", got.Hot.PressurePa, want.Hot.PressurePa)
		same("cold pressure", got.Cold.PressurePa, want.Cold.PressurePa)
		same("liquid-full temperature", got.LiquidFullK, want.LiquidFullK)
		same("burst safety factor", got.BurstSafetyFactor, want.BurstSafetyFactor)
		same("implosion safety factor", got.ImplosionSafetyFactor, want.ImplosionSafetyFactor)
		same("failure probability", got.FailureProbability, want.FailureProbability)
		same("peak concentration", got.Release.Peak.PPM, want.Release.Peak.PPM)
		same("STEL concentration", got.Release.STEL.PPM, want.Release.STEL.PPM)
		same("8-hour concentration", got.Release.TWA8h.PPM, want.Release.TWA8h.PPM)
		if got.Verdict != want.Verdict || len(got.Findings) != len(want.Findings) {
			t.Fatalf("design %d (%s): verdict %s with %d findings, reference %s with %d", i, d.Fluid, got.Verdict, len(got.Findings), want.Verdict, len(want.Findings))
		}
		for k, f := range got.Findings {
			w := want.Findings[k]
			if f.Criterion != w.Criterion || f.Status != w.Status {
				t.Errorf("design %d (%s): finding %d %s %s, reference %s %s", i, d.Fluid, k, f.Criterion, f.Status, w.Criterion, w.Status)
			}
			same(f.Criterion+" value", f.Value, w.Value)
			same(f.Criterion+" limit", f.Limit, w.Limit)
			same(f.Criterion+" margin", f.Margin, w.Margin)
		}

		g, w := got.MaxSafe, want.MaxSafe
		sub, err := lib.Lookup(d.Fluid)
		if err != nil {
			t.Fatal(err)
		}
		tolT := searchTolerance(got.searchTopK(sub))
		if g.TemperatureBound != w.TemperatureBound {
			t.Errorf("design %d (%s): maximum safe temperature %s, reference %s", i, d.Fluid, g.TemperatureBound, w.TemperatureBound)
		}
		if g.TemperatureLimitBy != w.TemperatureLimitBy {
			// Only where the two criteria's roots lie within the
			// tolerance of each other may the governing one change.
			limitByMoved++
			if w.PressureRoot == nil || w.UllageRoot == nil || math.Abs(w.PressureRoot.X-w.UllageRoot.X) > 2*tolT {
				t.Errorf("design %d (%s): maximum safe temperature limited by %s, reference %s", i, d.Fluid, g.TemperatureLimitBy, w.TemperatureLimitBy)
			}
		}
		if dt := math.Abs(g.TemperatureK-w.TemperatureK) / tolT; dt > 2 {
			t.Errorf("design %d (%s): maximum safe temperature %v K, reference %v K: %.3g tolerances apart", i, d.Fluid, g.TemperatureK, w.TemperatureK, dt)
		} else {
			worstT = math.Max(worstT, dt)
		}
		if g.FillBound != w.FillBound {
			t.Errorf("design %d (%s): maximum safe fill %s, reference %s", i, d.Fluid, g.FillBound, w.FillBound)
		}
		if w.FillRoot != nil {
			tolM := w.FillRoot.Tolerance
			if dm := math.Abs(g.FillMassKg-w.FillMassKg) / tolM; dm > 2 {
				t.Errorf("design %d (%s): maximum safe fill %v kg, reference %v kg: %.3g tolerances apart", i, d.Fluid, g.FillMassKg, w.FillMassKg, dm)
			} else {
				worstM = math.Max(worstM, dm)
			}
		} else {
			same("maximum safe fill", g.FillMassKg, w.FillMassKg)
		}
	}
	t.Logf("%d designs compared; largest differences: maximum safe temperature %.3g, fill %.3g of the search tolerance; governing criterion moved in %d", compared, worstT, worstM, limitByMoved)
}
