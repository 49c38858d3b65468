package hazards

import (
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"ullage/fluids/units"
)

// The public acute averages are the well-mixed solution averaged over each
// AEGL duration. For an instantaneous release of mass M into a room of
// volume V ventilated at Q with mixing factor k, C(t) = (M/V) e^(−t/τ),
// τ = kV/Q (AIHA, Mathematical Models for Estimating Occupational Exposure
// to Chemicals, 2nd ed., 2009, ch. 3, well-mixed box model, from memory),
// so the average over the first T is C̄(T) = (M/V)(τ/T)(1 − e^(−T/τ)).
// With 1 g of ammonia in 30 m³ at one air change per hour and k = 1,
// τ = 1 h and M/V = 33.33 mg/m³ = 47.85 ppm (24.45 L/mol at 25 °C,
// 17.03 g/mol). A near field with 5 m/s across its surface is mixed with
// the room within seconds, so the room solution is the exposure. The
// room's exposure time (30 min) does not cut the public averages: the
// benchmarks are for a person present for the whole duration.
func TestPublicAveragesOverEachAEGLDuration(t *testing.T) {
	d := typicalDesign()
	d.Fluid = "ammonia"
	d.FillMassKg = 0.001
	d.FillMassToleranceKg = 0
	d.HottestK = units.CelsiusToKelvin(30)
	d.Room = Room{VolumeM3: 30, AirChangesPerHour: 1, MixingFactor: 1, NearFieldRadiusM: 1, NearFieldAirSpeed: 5, ExposureMinutes: 30}
	d.Criteria.LimitSets = []string{LimitSetUSPublicAcute}
	a, err := Assess(d, testLibrary(t))
	if err != nil {
		t.Fatal(err)
	}
	c0 := 47.85
	avg := func(hours float64) float64 { return c0 * (1 - math.Exp(-hours)) / hours }
	// AEGL values of ammonia as in fluids/limits/us-public-acute.json.
	want := map[string]float64{
		"AEGL-1 10 min": avg(10.0 / 60), "AEGL-1 30 min": avg(0.5), "AEGL-1 60 min": avg(1), "AEGL-1 240 min": avg(4), "AEGL-1 480 min": avg(8),
		"AEGL-2 10 min": avg(10.0 / 60), "AEGL-2 30 min": avg(0.5), "AEGL-2 60 min": avg(1), "AEGL-2 240 min": avg(4), "AEGL-2 480 min": avg(8),
	}
	steps := map[string]bool{}
	got := 0
	for _, l := range a.Release.Limits {
		if l.Set != LimitSetUSPublicAcute {
			t.Errorf("%s from set %q; only the public set was chosen", l.Name, l.Set)
		}
		if w, ok := want[l.Name]; ok {
			got++
			steps[l.StepKey] = true
			// 0.5 %: the molar-volume rounding of the hand value (0.1 %)
			// and the near field's excess dose over the room, about M/β
			// with β = ½·2π(1 m)²·5 m/s = 15.7 m³/s, i.e. 0.106 mg/m³ =
			// 0.35 % of the 10-minute average (less at longer durations).
			if !scalar.EqualWithinRel(l.Exposure.PPM, w, 5e-3) {
				t.Errorf("%s: %.4g ppm over %g min; want %.4g ppm (well-mixed solution by hand)", l.Name, l.Exposure.PPM, l.Exposure.AveragingS/60, w)
			}
		}
	}
	if got != len(want) {
		t.Errorf("%d of the %d AEGL-1 and AEGL-2 limits evaluated", got, len(want))
	}
	if len(steps) != 5 {
		t.Errorf("%d calculation steps for the five AEGL durations; want one each: %v", len(steps), steps)
	}
	for k := range steps {
		if a.TraceStep(k) == 0 {
			t.Errorf("no calculation step %s", k)
		}
	}
	// AEGL-2 shares by hand: 44.03/220 = 0.200 (10 min) is the largest
	// (30 min 0.171, 60 min 0.189, 4 h 0.107, 8 h 0.054): it governs.
	f2 := findingOf(t, a, CriterionPublic2)
	if f2.Status != StatusPass || !strings.Contains(f2.Source, "AEGL-2 10 min") || f2.Protects != "General public, children included, 10 minutes" {
		t.Errorf("AEGL-2 finding %s from %q protecting %q; want pass on AEGL-2 10 min for the public, 10 minutes", f2.Status, f2.Source, f2.Protects)
	}
	// AEGL-1 is 30 ppm at every duration: the 10-minute average, 44.0 ppm,
	// is above it, which is a caution and never a fail.
	if f1 := findingOf(t, a, CriterionPublic1); f1.Status != StatusCaution || !scalar.EqualWithinRel(f1.Value, avg(10.0/60), 5e-3) {
		t.Errorf("AEGL-1 finding %s at %.4g ppm; want caution at %.4g ppm", f1.Status, f1.Value, avg(10.0/60))
	}
	// AEGL-3: the peak against the 10-minute value, 2700 ppm.
	if f3 := findingOf(t, a, CriterionPublic3); f3.Limit != 2700 || f3.Value != a.Release.Peak.PPM {
		t.Errorf("AEGL-3 finding %.4g ppm against %g; want the peak %.4g ppm against 2700", f3.Value, f3.Limit, a.Release.Peak.PPM)
	}
}

// A fluid the public table lists as "none published" (water; and
// perfluoro(2-methyl-3-pentanone), absent from the DOE PAC data set) gives
// one not-assessed finding that says so, never a pass.
func TestPublicNonePublished(t *testing.T) {
	for _, c := range []struct {
		fluid  string
		reason Reason
	}{{"water", ReasonNonePublished}, {"perfluoro-2-methyl-3-pentanone", ReasonNonePublished}} {
		d := typicalDesign()
		d.Fluid = c.fluid
		if c.fluid == "water" {
			d.FillMassKg, d.FillMassToleranceKg = 0.002, 0
			d.SealingTemperatureK, d.ColdestK = units.CelsiusToKelvin(20), units.CelsiusToKelvin(5)
		}
		a, err := Assess(d, testLibrary(t))
		if err != nil {
			t.Fatal(err)
		}
		f := findingOf(t, a, CriterionPublicNone)
		if f.Status != StatusNotAssessed || f.NotApplicable != c.reason || !f.NotApplicable.NotAssessed() {
			t.Errorf("%s: %s, %q; want not assessed, %q", c.fluid, f.Status, f.NotApplicable, c.reason)
		}
		for _, l := range a.Release.Limits {
			if l.Set == LimitSetUSPublicAcute {
				t.Errorf("%s: public limit %s evaluated", c.fluid, l.Name)
			}
		}
	}
}

// A design that names no limit set applies the default, public acute and
// US occupational; both kinds of finding appear for dichloromethane.
func TestDefaultLimitSets(t *testing.T) {
	d := typicalDesign()
	if got := d.Criteria.AppliedLimitSets(); len(got) != 2 || got[0] != LimitSetUSOccupational || got[1] != LimitSetUSPublicAcute {
		t.Fatalf("default sets %v", got)
	}
	a, err := Assess(d, testLibrary(t))
	if err != nil {
		t.Fatal(err)
	}
	findingOf(t, a, CriterionTWA)
	// Dichloromethane has DOE PAC values (fluids/limits/us-public-acute.json).
	findingOf(t, a, CriterionPublic2)
	d.Criteria.LimitSets = []string{LimitSetUKWEL, LimitSetEUOccupational}
	if a, err = Assess(d, testLibrary(t)); err != nil {
		t.Fatal(err)
	}
	sets := map[string]bool{}
	for _, l := range a.Release.Limits {
		sets[l.Set] = true
	}
	// Dichloromethane: EU IOELV 100 ppm TWA and 200 ppm STEL (Directive
	// 2009/161/EU), UK WEL the same (EH40/2005), as in the tables.
	if len(sets) != 2 || !sets[LimitSetUKWEL] || !sets[LimitSetEUOccupational] {
		t.Errorf("sets evaluated %v; want the UK and EU sets only", sets)
	}
	for _, f := range a.Findings {
		if IsPublicCriterion(f.Criterion) {
			t.Errorf("public finding %s without the public set", f.Criterion)
		}
	}
	for _, bad := range [][]string{{"us-public"}, {LimitSetUKWEL, LimitSetUKWEL}} {
		d.Criteria.LimitSets = bad
		if err := d.Validate(); err == nil || !strings.Contains(err.Error(), "criteria.limit_sets") {
			t.Errorf("limit_sets %v: %v; want an error naming the field", bad, err)
		}
	}
}

// An "NR" cell is said in words and never used as a number: chloroform's
// AEGL-1 is not recommended at every duration, so tier 1 falls back to
// the DOE PAC-1, 2.0 ppm, the DOE's own order of precedence; interim
// values are marked (acetone's AEGLs are interim). Values as in
// fluids/limits/us-public-acute.json.
func TestPublicNotRecommendedAndInterim(t *testing.T) {
	d := typicalDesign()
	d.Fluid = "chloroform"
	a, err := Assess(d, testLibrary(t))
	if err != nil {
		t.Fatal(err)
	}
	nr := 0
	for _, n := range a.Release.LimitNotes {
		if n.Reason == ReasonNotRecommended && strings.HasPrefix(n.Name, "AEGL-1 ") {
			nr++
		}
	}
	if nr != 5 {
		t.Errorf("%d AEGL-1 cells said to be not recommended; want 5: %+v", nr, a.Release.LimitNotes)
	}
	for _, l := range a.Release.Limits {
		if l.Kind == "AEGL-1" {
			t.Errorf("NR cell %s used as a number (%g ppm)", l.Name, l.PPM)
		}
	}
	if f := findingOf(t, a, CriterionPublic1); f.Limit != 2 || !strings.Contains(f.Source, "PAC-1") {
		t.Errorf("tier 1 against %g ppm from %q; want PAC-1 2 ppm", f.Limit, f.Source)
	}
	if f := findingOf(t, a, CriterionPublic2); f.Limit != 64 || !strings.Contains(f.Source, "AEGL-2 60 min") {
		t.Errorf("tier 2 against %g ppm from %q; want AEGL-2 60 min 64 ppm", f.Limit, f.Source)
	}
	d.Fluid = "acetone"
	if a, err = Assess(d, testLibrary(t)); err != nil {
		t.Fatal(err)
	}
	if f := findingOf(t, a, CriterionPublic2); !strings.Contains(f.Source, "(interim value)") {
		t.Errorf("acetone tier 2 source %q does not mark the value interim", f.Source)
	}
}
