package hazards

import (
	"encoding/json"
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
	"ullage/fluids/units"
)

// r134aSphere is 5 g of R-134a in a 40 mm sphere with a 1.2 ± 0.2 mm wall,
// hottest 40 °C. Invented test fixture.
func r134aSphere() Design {
	d := typicalDesign()
	d.Fluid = "1-1-1-2-tetrafluoroethane"
	d.FillMassKg = 0.005
	d.FillMassToleranceKg = 0
	d.Vessel.Parts = []Part{{Name: "bulb", Shape: ShapeSphere, OuterDiameterM: 0.040, WallThicknessM: 0.0012, WallToleranceM: 0.0002}}
	d.HottestK = units.CelsiusToKelvin(40)
	d.ColdestK = units.CelsiusToKelvin(0)
	return d
}

// TestWeakestUnitStrength: strength is checked at the minimum permitted
// wall (common practice in pressure-vessel design). The vessel is
// two-phase at 40 °C, so its pressure does not depend on the fill or the
// volume; the thin-wall sphere stress σ = ΔP r_m/(2t) (Roark, 7th ed.,
// Table 13.1) then scales the safety factor by
// (19.4/1.2)/(19.5/1.0) = 0.8291 from the nominal 1.2 mm wall to the
// 1.0 mm one, at the same stressed area.
func TestWeakestUnitStrength(t *testing.T) {
	a, err := Assess(r134aSphere(), testLibrary(t))
	if err != nil {
		t.Fatal(err)
	}
	nominal := findingOf(t, a, CriterionBurst)
	worst := findingOf(t, a, CriterionBurstWorst)
	ratio := (19.4 / 1.2) / (19.5 / 1.0)
	if !scalar.EqualWithinRel(worst.Value, nominal.Value*ratio, 1e-6) {
		t.Errorf("weakest-unit safety factor %.4g; want %.4g × %.4f = %.4g (by hand)", worst.Value, nominal.Value, ratio, nominal.Value*ratio)
	}
	if nominal.Value < 4 || worst.Value >= 4 || worst.Status != StatusFail {
		t.Errorf("nominal %.3g (%s), weakest unit %.3g (%s); want the nominal at least 4 and the weakest unit failing below 4",
			nominal.Value, nominal.Status, worst.Value, worst.Status)
	}
	if n := a.TraceStep("burst_safety_factor_worst"); n == 0 || a.Trace()[n-1].Result.Value != worst.Value || worst.Steps()[1] != n {
		t.Errorf("weakest-unit finding steps %v; want its own calculation step giving %.6g", worst.Steps(), worst.Value)
	}
}

// TestVolumeToleranceUsedWithParts: a volume tolerance given with a volume
// computed from the parts is applied in the worst case (less volume),
// never printed and ignored (common practice: worst-case tolerance stack).
func TestVolumeToleranceUsedWithParts(t *testing.T) {
	d := typicalDesign()
	lib := testLibrary(t)
	without, err := Assess(d, lib)
	if err != nil {
		t.Fatal(err)
	}
	d.Vessel.VolumeToleranceM3 = 0.8e-6
	with, err := Assess(d, lib)
	if err != nil {
		t.Fatal(err)
	}
	if got := without.Worst.VolumeM3 - with.Worst.VolumeM3; !scalar.EqualWithinRel(got, 0.8e-6, 1e-9) {
		t.Errorf("worst-case volume changed by %.4g m³; want the 0.8 mL tolerance", got)
	}
	if with.Worst.Hot.UllagePercent >= without.Worst.Hot.UllagePercent {
		t.Errorf("worst-case ullage %.3f %% with the tolerance, %.3f %% without; want less", with.Worst.Hot.UllagePercent, without.Worst.Hot.UllagePercent)
	}
}

// TestNoBurstLoadIsNotANumber: water sealed evacuated is below ambient at
// 40 °C (7.4 kPa, CRC Handbook), so nothing loads it towards bursting:
// the burst safety factor and failure probability are not results and say
// so in words, and the JSON gives null (common practice: a value that was
// not computed must not look computed).
func TestNoBurstLoadIsNotANumber(t *testing.T) {
	d := typicalDesign()
	d.Fluid = "water"
	d.FillMassKg = 0.005
	d.Vessel.Parts[0].WallToleranceM = 0.0001
	d.HottestK = units.CelsiusToKelvin(40)
	d.ColdestK = units.CelsiusToKelvin(5)
	a, err := Assess(d, testLibrary(t))
	if err != nil {
		t.Fatal(err)
	}
	if a.HasBurstLoad() {
		t.Fatalf("burst load at %.4g kPa", a.Hot.PressurePa/1000)
	}
	for _, id := range []string{CriterionBurst, CriterionBurstWorst, CriterionFailure} {
		f := findingOf(t, a, id)
		b, _ := json.Marshal(f)
		if f.NotApplicable != ReasonNoBurstLoad ||
			!strings.Contains(string(b), `"value":null`) || !strings.Contains(string(b), `"margin":null`) {
			t.Errorf("%s: %q, JSON %s; want no burst load, null value and margin", id, f.NotApplicable, b)
		}
	}
}

// TestFailureProbabilityNeverZero: a loaded vessel far from its strength
// has a failure probability too small to represent; it is reported as an
// upper bound, never as exactly 0 (common practice).
func TestFailureProbabilityNeverZero(t *testing.T) {
	p, b := boundedFailureProbability(1, 1e60, 7)
	if p <= 0 || b != AtMost {
		t.Errorf("failure probability %g (%q); want a positive upper bound", p, b)
	}
	p, b = boundedFailureProbability(1e5, 1e6, 7)
	if want := -math.Expm1(-1e-7); !scalar.EqualWithinRel(p, want, 1e-12) || b != "" {
		t.Errorf("failure probability %g (%q); want the computed %g", p, b, want)
	}
}
