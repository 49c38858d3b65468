package hazards

import (
	"errors"
	"math"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

// The stress per kelvin of a sudden change, E·α/(1 − ν), for every glass
// of the library, worked out by hand from the values and sources the data
// file itself cites. A glass added to the library needs a row here.
func TestStressPerKelvinOfEveryGlass(t *testing.T) {
	want := map[string]struct {
		perK float64
		how  string
	}{
		// EN 572-1: E = 70 000 N/mm², α = 9e-6 /K, ν = 0.2.
		"soda-lime-annealed": {787500, "70e9 × 9e-6 / 0.8 (EN 572-1)"},
		// SCHOTT DURAN brochure: E = 63e3 N/mm², α = 3.3e-6 /K, ν = 0.20.
		"borosilicate-3.3": {259875, "63e9 × 3.3e-6 / 0.8 (SCHOTT DURAN property table)"},
		// Fused-silica property sheets: E = 73 GPa, α = 0.52e-6 /K, ν = 0.17.
		"fused-silica": {45734.94, "73e9 × 0.52e-6 / 0.83 (optical fused-silica sheets)"},
		// Tempering leaves E, α and ν as annealed (EN 572-1).
		"soda-lime-tempered": {787500, "as annealed soda-lime (EN 572-1)"},
	}
	gs, err := Glasses()
	if err != nil {
		t.Fatal(err)
	}
	for _, g := range gs {
		w, ok := want[g.ID]
		if !ok {
			t.Errorf("glass %s has no hand-worked stress per kelvin in this test", g.ID)
			continue
		}
		got := ThermalStressPerKelvin(&g)
		// 1e-6 relative: the hand values are exact products, rounded to
		// the cent of a pascal for fused silica.
		if !scalar.EqualWithinAbsOrRel(got, w.perK, 0, 1e-6) {
			t.Errorf("%s: E·α/(1 − ν) = %.2f Pa/K; by hand %s = %.2f Pa/K", g.ID, got, w.how, w.perK)
		}
	}
	// The round figures quoted for the two common glasses: about
	// 0.8 MPa/K for annealed soda-lime and 0.26 MPa/K for borosilicate 3.3.
	for id, approx := range map[string]float64{"soda-lime-annealed": 0.8e6, "borosilicate-3.3": 0.26e6} {
		g, _ := LookupGlass(id)
		if got := ThermalStressPerKelvin(&g); !scalar.EqualWithinAbsOrRel(got, approx, 0, 0.02) {
			t.Errorf("%s: %.4g Pa/K, not about %.2g", id, got, approx)
		}
	}
}

// Worked example: the critical temperature difference of a quench at a
// high rate of heat transfer, ΔT_f = σ_f(1 − ν)/(E·α) (Callister and
// Rethwisch, Materials Science and Engineering: An Introduction, the
// thermal-shock problem on their Equation 17.9, with the soda-lime glass
// data of their Appendix B tables: E = 69 GPa, ν = 0.23, α = 9.0e-6 /°C,
// σ_f = 69 MPa, values from memory). By hand:
// 69e6 × 0.77 / (69e9 × 9.0e-6) = 53.13e6 / 621e3 = 85.56 K.
func TestCriticalQuenchWorkedExample(t *testing.T) {
	g := Glass{ElasticModulus: Sourced{Value: 69e9}, PoissonRatio: Sourced{Value: 0.23}, Expansion: Sourced{Value: 9.0e-6}}
	got := 69e6 / ThermalStressPerKelvin(&g)
	// 0.01 K: the hand value is rounded to two decimals.
	if !scalar.EqualWithinAbsOrRel(got, 85.56, 0.01, 0) {
		t.Errorf("ΔT_f = %.3f K; Callister's data give 85.56 K by hand", got)
	}
}

func shockDesign(dk float64) Design {
	d := typicalDesign()
	d.ThermalShock = ThermalShock{HotToColdK: dk}
	return d
}

// Without a sudden change the review says so and adds no finding; the
// other findings do not move.
func TestNoShockGivenNotAssessed(t *testing.T) {
	lib := testLibrary(t)
	a, err := Assess(typicalDesign(), lib)
	if err != nil {
		t.Fatal(err)
	}
	if a.Shock.Assessed || a.Shock.NotAssessedReason != ShockNotAssessed {
		t.Errorf("shock %+v; want not assessed with the reason", a.Shock)
	}
	for _, f := range a.Findings {
		if IsThermalShockCriterion(f.Criterion) {
			t.Errorf("finding %s without a sudden change", f.Criterion)
		}
	}
	b, err := Assess(shockDesign(20), lib)
	if err != nil {
		t.Fatal(err)
	}
	if b.BurstSafetyFactor != a.BurstSafetyFactor || b.FailureProbability != a.FailureProbability {
		t.Error("a sudden change moved the burst results")
	}
}

// The engine's shock stress and safety factor against the formulas worked
// out here from the typical design's own numbers.
func TestThermalShockFinding(t *testing.T) {
	const dk = 40
	a, err := Assess(shockDesign(dk), testLibrary(t))
	if err != nil {
		t.Fatal(err)
	}
	if !a.Shock.Assessed || len(a.Shock.Parts) != 3 {
		t.Fatalf("shock %+v", a.Shock)
	}
	g := a.Glass
	for i, ps := range a.Shock.Parts {
		c := ps.Cases[ps.Governing]
		part := a.Parts[i]
		// Kingery, Bowen and Uhlmann (1976) ch. 16: σ = E·α·ΔT/(1 − ν).
		thermal := 70e9 * 9e-6 * dk / 0.8
		pressure := part.StressPerPascal * math.Max(a.Hot.PressurePa-a.Design.AmbientPressurePa, 0)
		// Weibull size effect, 3 s load: σ₀ (A₀/A)^(1/m) (60/3)^(1/16).
		strength := 3.208e7 * math.Pow(1/part.AreaM2, 1.0/7) * math.Pow(20, 1.0/16)
		// 1e-9 relative: the same arithmetic in another order.
		if !scalar.EqualWithinAbsOrRel(c.ThermalStressPa, thermal, 0, 1e-9) ||
			!scalar.EqualWithinAbsOrRel(c.PressureStressPa, pressure, 1e-6, 1e-9) ||
			!scalar.EqualWithinAbsOrRel(ps.StrengthPa, strength, 0, 1e-9) {
			t.Errorf("%s: thermal %g, pressure %g, strength %g; want %g, %g, %g", ps.Name, c.ThermalStressPa, c.PressureStressPa, ps.StrengthPa, thermal, pressure, strength)
		}
		sf := strength / (thermal + pressure)
		pf := 1 - math.Exp(-math.Pow((thermal+pressure)/strength, g.WeibullModulus.Value))
		if !scalar.EqualWithinAbsOrRel(c.SafetyFactor, sf, 0, 1e-9) || !scalar.EqualWithinAbsOrRel(c.FailureProbability, pf, 1e-15, 1e-6) {
			t.Errorf("%s: SF %g, P_f %g; want %g, %g", ps.Name, c.SafetyFactor, c.FailureProbability, sf, pf)
		}
		var f *Finding
		for j := range a.Findings {
			if a.Findings[j].Criterion == ThermalShockCriterion(i) {
				f = &a.Findings[j]
			}
		}
		if f == nil {
			t.Fatalf("no finding for %s", ps.Name)
		}
		if f.Value != c.SafetyFactor || f.Limit != a.RequiredSafetyFactor || len(f.Steps()) < 3 {
			t.Errorf("finding %+v", f)
		}
		perK := false
		for _, x := range f.Facts {
			perK = perK || (x.Kind == FactStressPerKelvin && x.Value == ps.StressPerKelvin)
		}
		if !perK {
			t.Errorf("facts %+v; want the stress per kelvin", f.Facts)
		}
	}
}

// A larger sudden change never gives a larger safety factor, and the
// finding fails once the change passes what the part withstands.
func TestThermalShockMonotonic(t *testing.T) {
	lib := testLibrary(t)
	prev := math.Inf(1)
	for _, dk := range []float64{5, 20, 40, 80, 160, 320} {
		a, err := Assess(shockDesign(dk), lib)
		if err != nil {
			t.Fatal(err)
		}
		ps := a.Shock.Parts[0]
		sf := ps.Cases[0].SafetyFactor
		if sf > prev {
			t.Errorf("ΔT %g K: SF %g above %g at a smaller change", dk, sf, prev)
		}
		prev = sf
		fail := false
		for _, f := range a.Findings {
			if f.Criterion == ThermalShockCriterion(0) {
				fail = f.Status == StatusFail
			}
		}
		if want := dk > ps.AllowableDeltaK; fail != want {
			t.Errorf("ΔT %g K against %g K withstood: fail %v", dk, ps.AllowableDeltaK, fail)
		}
	}
}

// Cold to hot starts from the coldest temperature, where an evacuated
// vessel carries no internal overpressure: only the thermal stress counts.
func TestColdToHotUsesTheColdPressure(t *testing.T) {
	d := typicalDesign()
	d.ThermalShock = ThermalShock{ColdToHotK: 60}
	a, err := Assess(d, testLibrary(t))
	if err != nil {
		t.Fatal(err)
	}
	c := a.Shock.Parts[0].Cases[0]
	if c.Direction != ShockColdToHot || c.StartK != d.ColdestK || c.PressureStressPa != 0 {
		t.Errorf("case %+v; want cold-to-hot from %g K with no pressure stress", c, d.ColdestK)
	}
}

func TestShockPresets(t *testing.T) {
	ps, err := ShockPresets()
	if err != nil {
		t.Fatal(err)
	}
	if len(ps) < 4 {
		t.Fatalf("%d presets", len(ps))
	}
	dirs := map[string]bool{}
	for _, p := range ps {
		dirs[p.Direction] = true
		if p.DeltaK() <= 0 || p.From.Source == "" || p.To.Source == "" {
			t.Errorf("preset %+v", p)
		}
	}
	if !dirs[ShockHotToCold] || !dirs[ShockColdToHot] {
		t.Error("presets do not cover both directions")
	}
	// 76 °C cabin air (Grundstein et al. 2009) into 20 °C water (HSE L8):
	// 349.15 − 293.15 = 56 K.
	p, err := LookupShockPreset("hot-car-into-cold-tap-water")
	if err != nil || p.DeltaK() != 56 {
		t.Errorf("hot car into cold tap water: %v, %g K; want 56 K", err, p.DeltaK())
	}
	if _, err := LookupShockPreset("nope"); !errors.Is(err, ErrInvalidInput) {
		t.Errorf("unknown preset: %v", err)
	}
}

func TestShockInputErrors(t *testing.T) {
	for _, tt := range []struct {
		shock ThermalShock
		field string
	}{
		{ThermalShock{HotToColdK: -1}, "thermal_shock.hot_to_cold_k"},
		{ThermalShock{ColdToHotK: math.NaN()}, "thermal_shock.cold_to_hot_k"},
		{ThermalShock{HotToColdK: 900}, "thermal_shock.hot_to_cold_k"},
	} {
		d := typicalDesign()
		d.ThermalShock = tt.shock
		var ie *InputError
		if err := d.Validate(); !errors.As(err, &ie) || ie.Field != tt.field {
			t.Errorf("%+v: %v; want an error naming %s", tt.shock, err, tt.field)
		}
	}
}

// With a sudden change and a seal stress, every step is complete and
// every finding points at steps that exist.
func TestShockAndSealTrace(t *testing.T) {
	d := shockDesign(50)
	d.ThermalShock.ColdToHotK = 40
	d.SealStress = SealStress{Part: "neck tube", RetardationM: 80e-9, PathLengthM: 1e-3}
	a, err := Assess(d, testLibrary(t))
	if err != nil {
		t.Fatal(err)
	}
	for i, s := range a.Trace() {
		if s.Number != i+1 || s.Title == "" || s.Equation == "" || s.Source == "" || s.Method == "" ||
			math.IsNaN(s.Result.Value) || math.IsInf(s.Result.Value, 0) {
			t.Errorf("step %d incomplete: %+v", i+1, s)
		}
	}
	shock := 0
	for _, f := range a.Findings {
		if IsThermalShockCriterion(f.Criterion) {
			shock++
			if len(f.Steps()) < 4 {
				t.Errorf("%s: steps %v", f.Criterion, f.Steps())
			}
		}
		for _, n := range f.Steps() {
			if n < 1 || n > len(a.Trace()) {
				t.Errorf("%s points at step %d of %d", f.Criterion, n, len(a.Trace()))
			}
		}
	}
	if shock != len(d.Vessel.Parts) {
		t.Errorf("%d thermal-shock findings for %d parts", shock, len(d.Vessel.Parts))
	}
	for _, key := range []string{"thermal_shock_stress_1", "thermal_shock_strength_2", "thermal_shock_safety_factor_3", "thermal_shock_failure_probability_1"} {
		if a.TraceStep(key) == 0 {
			t.Errorf("no step %s", key)
		}
	}
}

// FuzzShockAndSeal: any sudden change and seal reading gives an input
// error or a finite result, never a panic or a NaN.
func FuzzShockAndSeal(f *testing.F) {
	f.Add(56.0, 0.0, 0.0, 1e-7, 2e-3, 0)
	f.Add(0.0, 99.0, 5e6, 0.0, 0.0, 2)
	f.Add(math.NaN(), -1.0, math.Inf(1), -1e-9, 0.0, 7)
	library := testLibrary(f)
	f.Fuzz(func(t *testing.T, down, up, stress, retard, path float64, part int) {
		d := typicalDesign()
		d.ThermalShock = ThermalShock{HotToColdK: down, ColdToHotK: up}
		if part >= 0 {
			d.SealStress = SealStress{Part: d.Vessel.Parts[part%len(d.Vessel.Parts)].Name, ResidualStressPa: stress, RetardationM: retard, PathLengthM: path}
		}
		a, err := Assess(d, library)
		if err != nil {
			if !errors.Is(err, ErrInvalidInput) {
				t.Fatalf("error %v is not an input error", err)
			}
			return
		}
		for _, fd := range a.Findings {
			if math.IsNaN(fd.Value) || math.IsNaN(fd.Margin) || math.IsInf(fd.Value, 0) {
				t.Fatalf("finding %s not finite: %+v", fd.Criterion, fd)
			}
		}
		for _, s := range a.Trace() {
			if math.IsNaN(s.Result.Value) || math.IsInf(s.Result.Value, 0) {
				t.Fatalf("step %d not finite: %+v", s.Number, s)
			}
		}
	})
}
