package hazards

import (
	"errors"
	"math"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

// Stress from a polariscope retardation, σ = δ/(C·L) (the stress-optic
// law; retardation as read by the ASTM C148 methods), worked by hand:
// 100 nm over a 2 mm path in borosilicate 3.3 (C = 4.0e-12 /Pa, SCHOTT
// DURAN data) is 1e-7 / (4e-12 × 2e-3) = 12.5 MPa; in annealed soda-lime
// (C = 2.7e-12 /Pa) 1e-7 / (2.7e-12 × 2e-3) = 18.52 MPa.
func TestSealStressFromRetardation(t *testing.T) {
	for _, tt := range []struct {
		glass string
		want  float64
	}{{"borosilicate-3.3", 12.5e6}, {"soda-lime-annealed", 18.5185e6}} {
		d := typicalDesign()
		d.Glass = GlassChoice{ID: tt.glass}
		d.SealStress = SealStress{Part: "neck tube", RetardationM: 100e-9, PathLengthM: 2e-3}
		a, err := Assess(d, testLibrary(t))
		if err != nil {
			t.Fatal(err)
		}
		// 1e-5 relative: the soda-lime hand value is rounded to 6 figures.
		if a.Seal == nil || !scalar.EqualWithinAbsOrRel(a.Seal.StressPa, tt.want, 0, 1e-5) || a.Seal.Part != 2 {
			t.Errorf("%s: seal %+v; want %g Pa on part 2", tt.glass, a.Seal, tt.want)
		}
		if lt := a.Trace()[a.TraceStep("long_term_burst")-1]; lt.Result.Value != a.Seal.BurstWithoutPa {
			t.Errorf("%s: long-term burst step shows %g, want the plain %g", tt.glass, lt.Result.Value, a.Seal.BurstWithoutPa)
		}
		n := a.TraceStep("seal_residual_stress")
		if n == 0 || a.Trace()[n-1].Equation != "σ_r = δ / (C·L)" {
			t.Errorf("%s: no conversion step in the record", tt.glass)
		}
	}
}

// The residual stress lowers the burst resistance and raises the failure
// probability; a vanishing one changes nothing (the formulas join the
// plain burst check continuously).
func TestSealStressInTheBurstCheck(t *testing.T) {
	lib := testLibrary(t)
	base, err := Assess(typicalDesign(), lib)
	if err != nil {
		t.Fatal(err)
	}
	tiny := typicalDesign()
	tiny.SealStress = SealStress{Part: "lower bulb", ResidualStressPa: 1e-3}
	at, err := Assess(tiny, lib)
	if err != nil {
		t.Fatal(err)
	}
	// 1e-6 relative: bisection to 1e-12 and a stress 10 orders below σ₀.
	if !scalar.EqualWithinAbsOrRel(at.BurstSafetyFactor, base.BurstSafetyFactor, 0, 1e-6) ||
		!scalar.EqualWithinAbsOrRel(at.FailureProbability, base.FailureProbability, 1e-18, 1e-6) {
		t.Errorf("1 mPa of residual stress: SF %g, P_f %g; without %g, %g", at.BurstSafetyFactor, at.FailureProbability, base.BurstSafetyFactor, base.FailureProbability)
	}
	prevSF, prevPf := base.BurstSafetyFactor, base.FailureProbability
	for _, s := range []float64{2e6, 5e6, 10e6, 20e6} {
		d := typicalDesign()
		d.SealStress = SealStress{Part: "lower bulb", ResidualStressPa: s}
		a, err := Assess(d, lib)
		if err != nil {
			t.Fatal(err)
		}
		if !(a.BurstSafetyFactor < prevSF) || !(a.FailureProbability > prevPf) {
			t.Errorf("%g Pa: SF %g (before %g), P_f %g (before %g)", s, a.BurstSafetyFactor, prevSF, a.FailureProbability, prevPf)
		}
		prevSF, prevPf = a.BurstSafetyFactor, a.FailureProbability
		steps := map[int]bool{}
		for _, f := range a.Findings {
			if f.Criterion == CriterionBurst {
				for _, n := range f.Steps() {
					steps[n] = true
				}
			}
		}
		if !steps[a.TraceStep("seal_residual_stress")] || !steps[a.TraceStep("seal_burst")] {
			t.Errorf("%g Pa: the burst finding does not point at the seal steps", s)
		}
	}
}

// With no overpressure the residual stress alone still gives a failure
// probability, by the weakest-link sum worked here: the part's equivalent
// stress for the service life, σ_r (t_life/t₀)^(1/n), over its strength.
func TestSealStressAloneBreaksOverTheLife(t *testing.T) {
	d := typicalDesign()
	d.Fluid = "ethanol" // below ambient at 76 °C: no overpressure
	d.FillMassKg, d.FillMassToleranceKg = 0.01, 0
	d.SealStress = SealStress{Part: "upper bulb", ResidualStressPa: 10e6}
	a, err := Assess(d, testLibrary(t))
	if err != nil {
		t.Fatal(err)
	}
	if a.Hot.PressurePa > d.AmbientPressurePa {
		t.Skipf("vessel over-pressurised at %g Pa; the check needs none", a.Hot.PressurePa)
	}
	life := d.ServiceLifeYears * 8766 * 3600
	area := a.Parts[1].AreaM2
	eq := 10e6 * math.Pow(life/60, 1.0/16)
	want := 1 - math.Exp(-area*math.Pow(eq/3.208e7, 7))
	// 1e-9 relative: the same formula in another order.
	if !scalar.EqualWithinAbsOrRel(a.FailureProbability, want, 1e-18, 1e-9) {
		t.Errorf("P_f %g; by hand %g", a.FailureProbability, want)
	}
}

// The residual stress of the seal's part also adds to its thermal-shock
// stress.
func TestSealStressAddsToTheShock(t *testing.T) {
	d := shockDesign(30)
	d.SealStress = SealStress{Part: "upper bulb", ResidualStressPa: 5e6}
	a, err := Assess(d, testLibrary(t))
	if err != nil {
		t.Fatal(err)
	}
	if got := a.Shock.Parts[1].Cases[0].ResidualStressPa; got != 5e6 {
		t.Errorf("upper bulb shock carries %g Pa residual; want 5e6", got)
	}
	if got := a.Shock.Parts[0].Cases[0].ResidualStressPa; got != 0 {
		t.Errorf("lower bulb shock carries %g Pa residual; want 0", got)
	}
}

func TestSealStressInputErrors(t *testing.T) {
	lib := testLibrary(t)
	custom := func() *Glass {
		g, _ := LookupGlass("soda-lime-annealed")
		g.ID, g.StressOpticCoefficient = "own", Sourced{}
		return &g
	}
	for _, tt := range []struct {
		name  string
		seal  SealStress
		glass *Glass
		field string
	}{
		{"no part", SealStress{ResidualStressPa: 1e6}, nil, "seal_stress.part"},
		{"unknown part", SealStress{Part: "spout", ResidualStressPa: 1e6}, nil, "seal_stress.part"},
		{"both forms", SealStress{Part: "lower bulb", ResidualStressPa: 1e6, RetardationM: 1e-7, PathLengthM: 1e-3}, nil, "seal_stress.retardation_m"},
		{"no path", SealStress{Part: "lower bulb", RetardationM: 1e-7}, nil, "seal_stress.path_length_m"},
		{"nothing measured", SealStress{Part: "lower bulb"}, nil, "seal_stress.residual_stress_pa"},
		{"negative", SealStress{Part: "lower bulb", ResidualStressPa: -1}, nil, "seal_stress.residual_stress_pa"},
		{"glass without C", SealStress{Part: "lower bulb", RetardationM: 1e-7, PathLengthM: 1e-3}, custom(), "seal_stress.retardation_m"},
		{"absurd reading", SealStress{Part: "lower bulb", RetardationM: 9e-6, PathLengthM: 1e-5}, nil, "seal_stress.retardation_m"},
	} {
		d := typicalDesign()
		d.SealStress = tt.seal
		if tt.glass != nil {
			d.Glass = GlassChoice{Custom: tt.glass}
		}
		var ie *InputError
		if _, err := Assess(d, lib); !errors.As(err, &ie) || ie.Field != tt.field {
			t.Errorf("%s: %v; want an error naming %s", tt.name, err, tt.field)
		}
	}
}

// The burst and failure-probability findings say that the seal's
// residual stress is in them, in both unit systems.
func TestSealStressNamedInTheFindings(t *testing.T) {
	d := typicalDesign()
	d.SealStress = SealStress{Part: "lower bulb", ResidualStressPa: 6e6}
	a, err := Assess(d, testLibrary(t))
	if err != nil {
		t.Fatal(err)
	}
	for _, f := range a.Findings {
		if f.Criterion != CriterionBurst && f.Criterion != CriterionFailure {
			continue
		}
		stress, seal := false, false
		for _, x := range f.Facts {
			stress = stress || (x.Kind == FactStress && x.Value == 6e6)
			seal = seal || (x.Name == "seal" && x.Text == "lower bulb")
		}
		if !stress || !seal {
			t.Errorf("%s: facts %+v; want the 6 MPa residual stress at the seal of the lower bulb", f.Criterion, f.Facts)
		}
	}
}
