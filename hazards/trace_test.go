package hazards

import (
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

func demoDesigns() []Design {
	d := typicalDesign()
	heavy := typicalDesign()
	heavy.Fluid = "ethanol"
	heavy.FillMassKg = 0.045 // goes liquid-full before the hottest temperature
	heavy.ResidualGasPressurePa = 500
	return []Design{d, heavy}
}

// TestEveryFindingHasATrace walks every finding of the example designs
// and fails on any without calculation steps, or pointing at steps that do
// not exist.
func TestEveryFindingHasATrace(t *testing.T) {
	for _, d := range demoDesigns() {
		a, err := Assess(d, testLibrary(t))
		if err != nil {
			t.Fatal(err)
		}
		if len(a.Trace()) == 0 {
			t.Fatal("no calculation record")
		}
		for i, s := range a.Trace() {
			if s.Number != i+1 || s.Title == "" || s.Equation == "" || s.Source == "" || s.Method == "" {
				t.Errorf("step %d incomplete: %+v", i+1, s)
			}
			if math.IsNaN(s.Result.Value) || math.IsInf(s.Result.Value, 0) {
				t.Errorf("step %d result not finite", s.Number)
			}
		}
		for _, f := range a.Findings {
			if len(f.Steps()) < 2 {
				t.Errorf("%s: finding %s has steps %v, want its own and the ones behind it", d.Fluid, f.Criterion, f.Steps())
			}
			for _, n := range f.Steps() {
				if n < 1 || n > len(a.Trace()) {
					t.Errorf("%s: finding %s points at step %d of %d", d.Fluid, f.Criterion, n, len(a.Trace()))
				}
			}
		}
		for _, key := range []string{"volume", "fill_density", "liquid_full_temperature", "state_hot", "state_cold",
			"short_term_burst", "long_term_burst", "burst_safety_factor", "failure_probability", "implosion_safety_factor",
			"max_safe_temperature", "max_safe_fill", "stored_energy", "room_model", "near_field_model",
			"exposure_peak", "exposure_stel", "exposure_twa"} {
			if a.TraceStep(key) == 0 {
				t.Errorf("%s: result %q has no step", d.Fluid, key)
			}
		}
		// Root-found results show the bracket, tolerance and residual.
		for _, key := range []string{"max_safe_temperature", "max_safe_fill"} {
			s := a.Trace()[a.TraceStep(key)-1]
			if s.Root == nil || s.Root.Equation == "" {
				t.Errorf("%s: %s lacks its root record", d.Fluid, key)
			}
		}
	}
}

func input(t *testing.T, s Step, symbol string) float64 {
	t.Helper()
	for _, v := range append(append([]Value{}, s.Inputs...), s.Intermediate...) {
		if v.Symbol == symbol {
			return v.Value
		}
	}
	t.Fatalf("step %d (%s) has no value %q", s.Number, s.Title, symbol)
	return 0
}

// TestHandCheckSteps recomputes traced steps from the values printed in
// the trace, not by calling the engine.
func TestHandCheckSteps(t *testing.T) {
	a, err := Assess(typicalDesign(), testLibrary(t))
	if err != nil {
		t.Fatal(err)
	}
	// 1. Thin-walled sphere, σ = ΔP·r_m/(2t) (Roark's Formulas for Stress
	// and Strain, 7th ed., Table 13.1 case 3a).
	s := a.Trace()[a.TraceStep("stress_0")-1]
	if !strings.Contains(s.Equation, "2t") {
		t.Fatalf("step %d is not the thin-sphere formula: %s", s.Number, s.Equation)
	}
	hand := input(t, s, "ΔP") * input(t, s, "r_m") / (2 * input(t, s, "t"))
	if !scalar.EqualWithinRel(hand, s.Result.Value, 1e-12) {
		t.Errorf("step %d: by hand σ = %.8g Pa, traced %.8g Pa", s.Number, hand, s.Result.Value)
	}
	// 2. Burst safety factor, SF = ΔP_bL/ΔP (definition).
	s = a.Trace()[a.TraceStep("burst_safety_factor")-1]
	hand = input(t, s, "ΔP_bL") / input(t, s, "ΔP")
	if !scalar.EqualWithinRel(hand, s.Result.Value, 1e-12) {
		t.Errorf("step %d: by hand SF = %.8g, traced %.8g", s.Number, hand, s.Result.Value)
	}
	// 3. Well-mixed room, C(0) = M/V, converted to ppm with 24.45 L/mol
	// (NIOSH Pocket Guide introduction: ppm = mg/m³ × 24.45 / MW).
	s = a.Trace()[a.TraceStep("room_model")-1]
	mgm3 := input(t, s, "M") / input(t, s, "V_room")
	hand = mgm3 * 24.45 / (a.Fluid.MolarMass.Value * 1000)
	if !scalar.EqualWithinRel(hand, s.Result.Value, 1e-12) {
		t.Errorf("step %d: by hand C(0) = %.8g ppm, traced %.8g ppm", s.Number, hand, s.Result.Value)
	}
	// 4. Vapour pressure at the hottest temperature from the printed
	// Wagner coefficients (Poling, Prausnitz and O'Connell, 5th ed., eq.
	// 7-3.3), or Antoine (NIST WebBook form).
	s = a.Trace()[a.TraceStep("psat_hottest")-1]
	temp := input(t, s, "T")
	if strings.HasPrefix(s.Method, "Wagner") {
		tr := temp / input(t, s, "Tc")
		tau := 1 - tr
		lnr := (input(t, s, "a")*tau + input(t, s, "b")*math.Pow(tau, 1.5) + input(t, s, "c")*math.Pow(tau, 2.5) + input(t, s, "d")*math.Pow(tau, 5)) / tr
		hand = input(t, s, "Pc") * math.Exp(lnr)
	} else {
		hand = 1e5 * math.Pow(10, input(t, s, "A")-input(t, s, "B")/(temp+input(t, s, "C")))
	}
	if !scalar.EqualWithinRel(hand, s.Result.Value, 1e-9) {
		t.Errorf("step %d (%s): by hand %.8g Pa, traced %.8g Pa", s.Number, s.Method, hand, s.Result.Value)
	}
}
