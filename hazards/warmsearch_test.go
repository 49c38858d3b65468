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
	largest := map[string]float64{}
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
		// near holds g to w within rel of scale (w's size when scale is 0)
		// and keeps the largest difference seen of each kind.
		near := func(kind, what string, g, w, scale, rel float64) {
			t.Helper()
			if scale == 0 {
				scale = math.Abs(w)
			}
			diff := math.Abs(g - w)
			if g == w {
				diff = 0
			}
			if !(diff <= rel*scale) {
				t.Errorf("design %d (%s): %s %.17g, reference %.17g: apart by %.3g of %.3g", i, d.Fluid, what, g, w, diff/scale, scale)
				return
			}
			if scale > 0 {
				largest[kind] = math.Max(largest[kind], diff/scale)
			}
		}
		// The gas spaces agree within 1.5e-10 (Brent's 1e-10 in ln V_g,
		// the warm start's 5e-11), and so the states' pressures (P_sat +
		// nRT/V_g) and ullages; 2e-10 is allowed. The numbers built on
		// the overpressure P − P_ambient move by as much of P, times the
		// Weibull modulus for the failure probability: 1e-6 of each is
		// allowed, with the largest seen reported.
		for _, st := range [][2]VesselState{{got.Hot, want.Hot}, {got.Cold, want.Cold}} {
			if st[0].Phase != st[1].Phase {
				t.Errorf("design %d (%s): phase %s at %g K, reference %s", i, d.Fluid, st[0].Phase, st[0].TemperatureK, st[1].Phase)
			}
			near("state pressure", "pressure", st[0].PressurePa, st[1].PressurePa, 0, 2e-10)
			near("state ullage", "ullage", st[0].UllagePercent, st[1].UllagePercent, 100, 2e-10)
		}
		same("liquid-full temperature", got.LiquidFullK, want.LiquidFullK)
		near("safety factor", "burst safety factor", got.BurstSafetyFactor, want.BurstSafetyFactor, 0, 1e-6)
		near("safety factor", "implosion safety factor", got.ImplosionSafetyFactor, want.ImplosionSafetyFactor, 0, 1e-6)
		near("failure probability", "failure probability", got.FailureProbability, want.FailureProbability, 0, 1e-6)
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
			scale := math.Max(math.Abs(w.Value), math.Abs(w.Limit))
			near("finding value", f.Criterion+" value", f.Value, w.Value, scale, 1e-6)
			same(f.Criterion+" limit", f.Limit, w.Limit)
			near("finding margin", f.Criterion+" margin", f.Margin, w.Margin, scale, 1e-6)
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
	for _, k := range []string{"state pressure", "state ullage", "safety factor", "failure probability", "finding value", "finding margin"} {
		t.Logf("largest relative difference, %s: %.3g", k, largest[k])
	}
}
