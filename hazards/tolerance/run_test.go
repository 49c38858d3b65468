package tolerance

import (
	"context"
	"errors"
	"math"
	"reflect"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
	"gonum.org/v1/gonum/stat/distuv"

	"ullage/hazards"
)

// With only the glass strength varying, every unit has the same pressure
// and walls, so the burst fraction estimates the Weibull weakest-link
// failure probability (W. Weibull, "A statistical distribution function of
// wide applicability", J. Appl. Mech. 18, 293–297 (1951)) with the
// static-fatigue reduction σ_eq = σ (t/t₀)^(1/n) (ASTM E1300 glass failure
// prediction model, from memory):
//
//	P_f = 1 − exp(−(A/A₀) (σ / (σ₀ (t₀/t)^(1/n)))^m)
//
// for one sphere of outer area A = π d² with the thin-wall hoop stress
// σ = Δp r_m/(2t) (Roark's Formulas for Stress and Strain, 7th ed., Table
// 13.1, case 3a, from memory).
func TestBurstFractionMatchesWeibull(t *testing.T) {
	lib := testLibrary(t)
	d := loadDesign(t, "weak_bulb.json")
	a, err := hazards.Assess(d, lib)
	if err != nil {
		t.Fatal(err)
	}
	g := d.Glass.Custom
	over := a.Hot.PressurePa - d.AmbientPressurePa
	od, wall := 0.040, 0.001
	rm := od/2 - wall/2
	sigma := over * rm / (2 * wall)
	area := math.Pi * od * od
	loadS := d.HoursAtHottest * 3600
	scale := g.CharacteristicStrength.Value * math.Pow(g.ReferenceLoad.Value/loadS, 1/g.StressCorrosionExponent.Value)
	want := -math.Expm1(-area / g.ReferenceArea.Value * math.Pow(sigma/scale, g.WeibullModulus.Value))
	if want < 0.005 || want > 0.5 {
		t.Fatalf("the fixture gives P_f = %g: choose one between 0.005 and 0.5 so the check has teeth", want)
	}

	r, err := Run(context.Background(), d, lib, Settings{Samples: 200_000, Seed: 7})
	if err != nil {
		t.Fatal(err)
	}
	b := r.BurstFraction
	t.Logf("Weibull P_f %.5f; sampled %.5f [%.5f, %.5f]", want, b.Estimate, b.Low, b.High)
	if want < b.Low || want > b.High {
		t.Errorf("burst fraction %.5f, 95 %% interval [%.5f, %.5f], does not hold the Weibull P_f %.5f", b.Estimate, b.Low, b.High, want)
	}
	// Every unit is the nominal one, so the mean of the per-unit failure
	// probabilities is the closed form itself; the tolerance covers the
	// rounding of a sum over 200 000 units.
	if !scalar.EqualWithinRel(r.MeanFailureProbability, want, 1e-9) {
		t.Errorf("mean failure probability %.12g, closed form %.12g", r.MeanFailureProbability, want)
	}
	if len(r.Inputs) != 1 || r.Inputs[0].Key != KeyGlassStrength || len(r.Sensitivity) != 1 {
		t.Errorf("inputs %v, sensitivity %v: want glass strength alone", r.Inputs, r.Sensitivity)
	}
}

// With only the fill varying, a unit goes liquid-full when its fill is
// above ρ_l,sat(T_hot)·V, so the liquid-full fraction has a closed form:
// 1 − Φ((m* − m)/σ) with σ = ±/3 for Normal, (m + ± − m*)/(2±) for Uniform.
func TestLiquidFullFractionMatchesClosedForm(t *testing.T) {
	lib := testLibrary(t)
	base := loadDesign(t, "ornament.json")
	for i := range base.Vessel.Parts {
		base.Vessel.Parts[i].WallToleranceM = 0
	}
	sub, err := lib.Lookup(base.Fluid)
	if err != nil {
		t.Fatal(err)
	}
	rhoL, err := sub.SaturatedLiquidDensity(base.HottestK)
	if err != nil {
		t.Fatal(err)
	}
	// Two spheres of inner radius 19 mm and a tube of inner radius 3 mm,
	// 200 mm long.
	volume := 2*4.0/3.0*math.Pi*math.Pow(0.019, 3) + math.Pi*0.003*0.003*0.2
	mStar := rhoL * volume
	tests := []struct {
		dist string
		want float64
	}{
		{Normal, 1 - distuv.UnitNormal.CDF(2)}, // nominal 0.98 m*, σ = 0.01 m*
		{Uniform, 0.01 / 0.06},                 // from 0.95 m* to 1.01 m*
	}
	for _, tc := range tests {
		d := base
		d.FillMassKg = 0.98 * mStar
		d.FillMassToleranceKg = 0.03 * mStar
		r, err := Run(context.Background(), d, lib, Settings{Samples: 100_000, Seed: 11, DimensionDistribution: tc.dist})
		if err != nil {
			t.Fatalf("%s: %v", tc.dist, err)
		}
		p := r.LiquidFullFraction
		t.Logf("%s: closed form %.5f; sampled %.5f [%.5f, %.5f]", tc.dist, tc.want, p.Estimate, p.Low, p.High)
		if tc.want < p.Low || tc.want > p.High {
			t.Errorf("%s fill: liquid-full fraction %.5f [%.5f, %.5f] does not hold the closed form %.5f",
				tc.dist, p.Estimate, p.Low, p.High, tc.want)
		}
		if r.UnsealableUnits != 0 {
			t.Errorf("%s fill: %d unsealable units, want none (the fill fits up to 1.07 m*)", tc.dist, r.UnsealableUnits)
		}
		checkFinite(t, tc.dist, reflect.ValueOf(r))
	}
}

// The same seed gives the same result, bit for bit, whatever the number of
// workers; another seed gives another.
func TestSameSeedSameResult(t *testing.T) {
	lib := testLibrary(t)
	d := loadDesign(t, "ornament.json")
	s := Settings{Samples: 30_000, Seed: 2024, HottestSpreadK: 8, HottestDistribution: Triangle, SensitivityUnits: 10_000}
	var first *Result
	for _, w := range []int{1, 2, 7} {
		s.Workers = w
		r, err := Run(context.Background(), d, lib, s)
		if err != nil {
			t.Fatal(err)
		}
		if first == nil {
			first = r
			continue
		}
		if !reflect.DeepEqual(first, r) {
			t.Errorf("workers %d: result differs from workers 1:\n%+v\n%+v", w, r, first)
		}
	}
	s.Seed++
	other, err := Run(context.Background(), d, lib, s)
	if err != nil {
		t.Fatal(err)
	}
	if other.SafetyFactor == first.SafetyFactor {
		t.Errorf("seeds %d and %d gave the same safety-factor percentiles %+v", s.Seed-1, s.Seed, other.SafetyFactor)
	}
}

// The ranking names every varying input once, strongest first, with the
// signs physics expects: a stronger glass and thicker bulb walls raise the
// safety factor, a hotter day lowers it.
func TestSensitivityRanking(t *testing.T) {
	lib := testLibrary(t)
	d := loadDesign(t, "ornament.json")
	r, err := Run(context.Background(), d, lib, Settings{Samples: 40_000, Seed: 5, HottestSpreadK: 5})
	if err != nil {
		t.Fatal(err)
	}
	if len(r.Sensitivity) != len(r.Inputs) {
		t.Fatalf("%d drivers for %d inputs", len(r.Sensitivity), len(r.Inputs))
	}
	sign := map[string]float64{}
	for i, dr := range r.Sensitivity {
		sign[dr.Key] = dr.RankCorrelation
		if i > 0 && math.Abs(dr.RankCorrelation) > math.Abs(r.Sensitivity[i-1].RankCorrelation) {
			t.Errorf("driver %d (%s, %.3f) ranks above a weaker one", i, dr.Key, dr.RankCorrelation)
		}
	}
	if r.Sensitivity[0].Key != KeyGlassStrength {
		t.Errorf("strongest driver %s, want glass strength (Weibull modulus 7 spreads strength far more than the tolerances spread stress)", r.Sensitivity[0].Key)
	}
	for key, positive := range map[string]bool{
		KeyGlassStrength:                   true,
		"vessel.parts[0].wall_thickness_m": true,
		"vessel.parts[1].wall_thickness_m": true,
		KeyHottest:                         false,
	} {
		if c := sign[key]; (c > 0) != positive || math.Abs(c) < 0.05 {
			t.Errorf("%s: rank correlation %.3f, want clearly %s", key, c, map[bool]string{true: "positive", false: "negative"}[positive])
		}
	}
}

// A release exceeds a limit exactly when the fill is above
// ExposureFillLimitKg: just above it some exposure finding of the engine
// fails, just below none does.
func TestExposureFillLimit(t *testing.T) {
	lib := testLibrary(t)
	d := loadDesign(t, "ornament.json")
	r, err := Run(context.Background(), d, lib, Settings{Samples: 1000, Seed: 1})
	if err != nil {
		t.Fatal(err)
	}
	if !r.ExposureLimited {
		t.Fatal("dichloromethane has published limits; ExposureLimited is false")
	}
	for _, tc := range []struct {
		factor   float64
		wantFail bool
	}{{1 + 1e-6, true}, {1 - 1e-6, false}} {
		dd := d
		dd.FillMassKg = r.ExposureFillLimitKg * tc.factor
		dd.FillMassToleranceKg = 0
		a, err := hazards.Assess(dd, lib)
		if err != nil {
			t.Fatal(err)
		}
		failed := false
		for _, f := range a.Findings {
			switch f.Criterion {
			case hazards.CriterionIDLH, hazards.CriterionCeiling, hazards.CriterionSTEL, hazards.CriterionTWA:
				failed = failed || f.Status == hazards.StatusFail
			}
		}
		if failed != tc.wantFail {
			t.Errorf("fill %.6g × limit: an exposure finding fails = %v, want %v", tc.factor, failed, tc.wantFail)
		}
	}
	// The ornament's 6 g is far above the limit: every unit exceeds.
	if r.ExposureExceedFraction.Count != r.Samples {
		t.Errorf("%d of %d units exceed, want all", r.ExposureExceedFraction.Count, r.Samples)
	}
}

// Units whose fill cannot be sealed are counted, not fatal, and leave no
// NaN or infinity in the result.
func TestUnsealableUnits(t *testing.T) {
	lib := testLibrary(t)
	d := loadDesign(t, "ornament.json")
	// The vessel holds about 83.7 g of liquid at the sealing temperature.
	d.FillMassKg, d.FillMassToleranceKg = 0.0820, 0.0030
	r, err := Run(context.Background(), d, lib, Settings{Samples: 20_000, Seed: 3})
	if err != nil {
		t.Fatal(err)
	}
	if r.UnsealableUnits == 0 || r.UnsealableUnits > r.Samples/5 {
		t.Errorf("%d unsealable units of %d: want a few per cent", r.UnsealableUnits, r.Samples)
	}
	if r.LiquidFullFraction.Count != r.Samples {
		t.Errorf("%d of %d units liquid-full: a fill this large fills any unit at 76 °C", r.LiquidFullFraction.Count, r.Samples)
	}
	checkFinite(t, "result", reflect.ValueOf(r))
}

func TestRunCancelled(t *testing.T) {
	lib := testLibrary(t)
	d := loadDesign(t, "ornament.json")
	ctx, cancel := context.WithCancel(context.Background())
	cancel()
	_, err := Run(ctx, d, lib, Settings{Samples: 100_000})
	if !errors.Is(err, context.Canceled) {
		t.Errorf("Run with a cancelled context: %v, want context.Canceled", err)
	}
}

func TestRunBadInput(t *testing.T) {
	lib := testLibrary(t)
	good := loadDesign(t, "ornament.json")
	tests := []struct {
		name  string
		edit  func(*hazards.Design, *Settings)
		field string
	}{
		{"no samples", func(_ *hazards.Design, s *Settings) { s.Samples = 0 }, "settings.samples"},
		{"too many samples", func(_ *hazards.Design, s *Settings) { s.Samples = MaxSamples + 1 }, "settings.samples"},
		{"negative workers", func(_ *hazards.Design, s *Settings) { s.Workers = -1 }, "settings.workers"},
		{"spread NaN", func(_ *hazards.Design, s *Settings) { s.HottestSpreadK = math.NaN() }, "settings.hottest_spread_k"},
		{"spread negative", func(_ *hazards.Design, s *Settings) { s.HottestSpreadK = -1 }, "settings.hottest_spread_k"},
		{"hottest lognormal", func(_ *hazards.Design, s *Settings) { s.HottestDistribution = "lognormal" }, "settings.hottest_distribution"},
		{"triangle dimensions", func(_ *hazards.Design, s *Settings) { s.DimensionDistribution = Triangle }, "settings.dimension_distribution"},
		{"sensitivity units", func(_ *hazards.Design, s *Settings) { s.SensitivityUnits = -3 }, "settings.sensitivity_units"},
		{"design fill", func(d *hazards.Design, _ *Settings) { d.FillMassKg = -1 }, "fill_mass_kg"},
	}
	for _, tc := range tests {
		d, s := good, Settings{Samples: 100}
		d.Vessel.Parts = append([]hazards.Part(nil), good.Vessel.Parts...)
		tc.edit(&d, &s)
		_, err := Run(context.Background(), d, lib, s)
		var ie *hazards.InputError
		if !errors.As(err, &ie) || !errors.Is(err, hazards.ErrInvalidInput) || ie.Field != tc.field {
			t.Errorf("%s: error %v, want an InputError for %s", tc.name, err, tc.field)
			continue
		}
		if ie.Want == "" || ie.Value == "" {
			t.Errorf("%s: error %q does not say the value and what is acceptable", tc.name, err)
		}
	}
	if _, err := Run(context.Background(), good, nil, Settings{Samples: 10}); err == nil || !strings.Contains(err.Error(), "library") {
		t.Errorf("nil library: error %v, want one naming the library", err)
	}
}
