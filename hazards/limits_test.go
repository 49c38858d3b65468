package hazards

import (
	"encoding/json"
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
	"ullage/fluids/units"
)

// carDesign is 2.3 g of n-hexane in a small sealed bulb, broken in a closed
// 3 m³ car (0.5 air changes per hour, well mixed) with someone inside for
// 8 hours. Invented test fixture.
func carDesign() Design {
	d := typicalDesign()
	d.Fluid = "n-hexane"
	d.FillMassKg = 0.0023
	d.FillMassToleranceKg = 0
	d.HottestK = units.CelsiusToKelvin(40)
	d.Room = Room{VolumeM3: 3, AirChangesPerHour: 0.5, MixingFactor: 1, NearFieldRadiusM: 0.5, NearFieldAirSpeed: 0.05, ExposureMinutes: 480}
	return d
}

func findingOf(t *testing.T, a *Assessment, id string) Finding {
	t.Helper()
	for _, f := range a.Findings {
		if f.Criterion == id {
			return f
		}
	}
	t.Fatalf("no finding %s", id)
	return Finding{}
}

// TestTWAGovernedByLargestShare: the 8-hour average of 2.3 g n-hexane in a
// closed 3 m³ car is above the ACGIH TLV TWA of 50 ppm (8 h), so the TWA
// finding fails, whatever the NIOSH REL (up to 10 h) would give when
// averaged over a longer day.
//
// By hand (well-mixed room, AIHA 2009 ch. 3): C₀ = 2300 mg / 3 m³ =
// 766.7 mg/m³ = 766.7 × 24.45 / 86.18 = 217.5 ppm (NIOSH Pocket Guide
// conversion at 25 °C); 8-hour average C₀(1 − e^−4)/4 = 53.4 ppm. The
// near field adds a little in the first minutes, so the finding may be a
// few percent higher, never lower.
func TestTWAGovernedByLargestShare(t *testing.T) {
	a, err := Assess(carDesign(), testLibrary(t))
	if err != nil {
		t.Fatal(err)
	}
	f := findingOf(t, a, CriterionTWA)
	if f.Status != StatusFail {
		t.Errorf("TWA finding %s at %.4g ppm; want fail against 50 ppm (8-hour average 53.4 ppm by hand)", f.Status, f.Value)
	}
	if f.Value < 53.4*(1-1e-3) || f.Value > 53.4*1.05 {
		t.Errorf("TWA value %.4g ppm; want 53.4 ppm by hand, up to 5 %% more for the near field", f.Value)
	}
	// The finding, the governing limit and its calculation step give the
	// same number.
	var gov *LimitResult
	for i, l := range a.Release.Limits {
		if l.Kind == "TWA" && l.Governs {
			gov = &a.Release.Limits[i]
		}
	}
	if gov == nil {
		t.Fatal("no governing TWA limit")
	}
	if gov.Exposure.PPM != f.Value || gov.Exposure.AveragingS != 8*3600 {
		t.Errorf("governing %s: %.6g ppm over %g s; finding %.6g ppm", gov.Name, gov.Exposure.PPM, gov.Exposure.AveragingS, f.Value)
	}
	step := a.Trace()[f.Steps()[1]-1]
	if step.Result.Value != f.Value || step.Inputs[0].Value != gov.Exposure.AveragingS {
		t.Errorf("step %d %q gives %.6g ppm over %g s; finding %.6g ppm", step.Number, step.Title, step.Result.Value, step.Inputs[0].Value, f.Value)
	}
}

// TestEachLimitOverItsOwnPeriod checks every ammonia limit against a hand
// calculation over its own averaging period, for a 10-hour stay in a room
// ventilated at one air change per hour and a near field mixed in a
// fraction of a second (5 m/s), so the well-mixed formula
// C̄ = C₀(1 − e^−rT)/(rT) applies (AIHA 2009 ch. 3). Periods: NIOSH REL
// TWA up to 10 h, OSHA PEL and ACGIH TLV TWA 8 h, STEL 15 min, IDLH 30 min
// (NIOSH Pocket Guide, Introduction). C₀ = 1000 mg / 30 m³ = 33.33 mg/m³
// = 47.85 ppm (MW 17.03).
func TestEachLimitOverItsOwnPeriod(t *testing.T) {
	d := typicalDesign()
	d.Fluid = "ammonia"
	d.FillMassKg = 0.001
	d.FillMassToleranceKg = 0
	d.HottestK = units.CelsiusToKelvin(30)
	d.Room = Room{VolumeM3: 30, AirChangesPerHour: 1, MixingFactor: 1, NearFieldRadiusM: 1, NearFieldAirSpeed: 5, ExposureMinutes: 600}
	d.Criteria.LimitSets = []string{LimitSetUSOccupational}
	a, err := Assess(d, testLibrary(t))
	if err != nil {
		t.Fatal(err)
	}
	c0 := 47.85
	avg := func(hours float64) float64 { return c0 * (1 - math.Exp(-hours)) / hours }
	want := map[string]struct {
		ppm     float64
		governs bool
	}{
		"NIOSH REL TWA":  {avg(10), false},   // share 0.191
		"OSHA PEL TWA":   {avg(8), false},    // share 0.120
		"ACGIH TLV TWA":  {avg(8), true},     // share 0.239: governs
		"NIOSH REL STEL": {avg(0.25), true},  // share 1.21; tie with ACGIH, first listed
		"ACGIH TLV STEL": {avg(0.25), false}, // share 1.21
		"NIOSH IDLH":     {avg(0.5), true},   // share 0.126
	}
	if len(a.Release.Limits) != len(want) {
		t.Fatalf("%d limits; want %d", len(a.Release.Limits), len(want))
	}
	for _, l := range a.Release.Limits {
		w, ok := want[l.Name]
		if !ok {
			t.Errorf("unexpected limit %s", l.Name)
			continue
		}
		// 0.3 %: the molar-volume rounding of the hand value and the
		// near field's first second.
		if !scalar.EqualWithinRel(l.Exposure.PPM, w.ppm, 3e-3) || l.Governs != w.governs {
			t.Errorf("%s: %.4g ppm over %g min, governs %v; want %.4g ppm, governs %v (by hand)", l.Name, l.Exposure.PPM, l.Exposure.AveragingS/60, l.Governs, w.ppm, w.governs)
		}
	}
	if f := findingOf(t, a, CriterionTWA); !scalar.EqualWithinRel(f.Value, avg(8), 3e-3) || !strings.Contains(f.Source, "ACGIH") {
		t.Errorf("TWA finding %.4g ppm from %q; want the ACGIH 8-hour average %.4g ppm", f.Value, f.Source, avg(8))
	}
}

// TestNoPublishedLimitListed: ethanol has no STEL or ceiling in the
// library (NIOSH Pocket Guide: REL TWA 1000 ppm only), cyclopentane no
// IDLH; such criteria are listed as not assessed, never dropped, and the
// JSON value is null (common practice: a record shows what was not
// checked).
func TestNoPublishedLimitListed(t *testing.T) {
	for _, tc := range []struct {
		fluid string
		ids   []string
	}{
		{"ethanol", []string{CriterionCeiling, CriterionSTEL}},
		{"cyclopentane", []string{CriterionIDLH, CriterionCeiling, CriterionSTEL}},
	} {
		d := typicalDesign()
		d.Fluid = tc.fluid
		d.FillMassKg = 0.004
		d.HottestK = units.CelsiusToKelvin(40)
		a, err := Assess(d, testLibrary(t))
		if err != nil {
			t.Fatal(err)
		}
		for _, id := range tc.ids {
			f := findingOf(t, a, id)
			if f.Status != StatusNotAssessed || f.NotApplicable != ReasonNoPublishedLimit {
				t.Errorf("%s %s: %s %q; want not assessed — no published limit", tc.fluid, id, f.Status, f.NotApplicable)
			}
			b, _ := json.Marshal(f)
			if !strings.Contains(string(b), `"value":null`) {
				t.Errorf("%s %s JSON %s; want a null value", tc.fluid, id, b)
			}
		}
		if a.Verdict == StatusNotAssessed {
			t.Errorf("%s verdict %s; not-assessed rows must not set the verdict", tc.fluid, a.Verdict)
		}
	}
}

// TestPeakIsTopOfChartedCurve: the peak is the highest one-minute average,
// and the charted curves (Assessment.Concentration) reach it exactly one
// minute after the breakage and never exceed it (common practice: a
// reported peak is the top of the plotted curve).
func TestPeakIsTopOfChartedCurve(t *testing.T) {
	a, err := Assess(typicalDesign(), testLibrary(t))
	if err != nil {
		t.Fatal(err)
	}
	mm := a.Fluid.MolarMass.Value
	top := 0.0
	for i := 0; i <= 4000; i++ {
		s := 0.5 * math.Pow(28800/0.5, float64(i)/4000)
		for _, z := range []Zone{WellMixedRoom, NearField, FarField} {
			top = math.Max(top, units.MgPerM3ToPpm(a.Concentration(z, s), mm))
		}
	}
	at60 := units.MgPerM3ToPpm(a.Concentration(a.Release.Peak.Zone, 60), mm)
	if top > a.Release.Peak.PPM*(1+1e-12) || !scalar.EqualWithinRel(at60, a.Release.Peak.PPM, 1e-12) {
		t.Errorf("charted curves top out at %.6g ppm, %.6g ppm at one minute; reported peak %.6g ppm", top, at60, a.Release.Peak.PPM)
	}
}

// TestConcentrationPhysicalBounds: 28 g of ethanol broken with a face
// 0.1 m away in still air (0.005 m/s) would, unbounded, give more than a
// million ppm. Ethanol's vapour pressure at 40 °C is 17.9 kPa (CRC
// Handbook of Chemistry and Physics, vapour pressure of organic
// compounds), so air at 40 °C can hold at most 17.9/101.325 = 17.7 % by
// volume: 176 600 ppm, 535 % of the 3.3 % LFL (NIOSH Pocket Guide).
func TestConcentrationPhysicalBounds(t *testing.T) {
	d := typicalDesign()
	d.Fluid = "ethanol"
	d.FillMassKg = 0.028
	d.FillMassToleranceKg = 0
	d.Vessel.Parts = []Part{{Name: "bulb", Shape: ShapeSphere, OuterDiameterM: 0.06, WallThicknessM: 0.0015}}
	d.HottestK = units.CelsiusToKelvin(40)
	d.Room.NearFieldRadiusM, d.Room.NearFieldAirSpeed = 0.1, 0.005
	a, err := Assess(d, testLibrary(t))
	if err != nil {
		t.Fatal(err)
	}
	const satPPM = 17.9 / 101.325 * 1e6
	// 2 %: the library's vapour-pressure correlation against the CRC table.
	if r := a.Release; r.Peak.PPM > satPPM*1.02 || !r.Peak.Bounded || r.Bound.By != "saturated vapour" {
		t.Errorf("peak %.4g ppm (bounded %v by %q); want at most %.4g ppm, bounded by saturated vapour", r.Peak.PPM, r.Peak.Bounded, r.Bound.By, satPPM)
	}
	if got := a.Release.PercentLFL; got > 535*1.02 {
		t.Errorf("%.4g %% of the LFL; want at most 535 %%", got)
	}
	if f := findingOf(t, a, CriterionFlammability); f.ValueBound != AtMost || f.Status != StatusFail {
		t.Errorf("flammability %s, bound %q; want fail with the value stated as an upper bound", f.Status, f.ValueBound)
	}
	for _, l := range a.Release.Limits {
		if l.Exposure.PPM > a.Release.Bound.PPM*(1+1e-12) {
			t.Errorf("%s average %.4g ppm above the bound %.4g ppm", l.Name, l.Exposure.PPM, a.Release.Bound.PPM)
		}
	}
}
