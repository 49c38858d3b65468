package hazards

import (
	"math"
	"testing"

	"ullage/fluids"
	"ullage/fluids/units"
)

func vesselFor(t *testing.T, fluid string, fillDensity, residualPa float64) (*sealedVessel, *fluids.Substance) {
	t.Helper()
	s, err := testLibrary(t).Lookup(fluid)
	if err != nil {
		t.Fatal(err)
	}
	const volume = 50e-6
	v, err := newSealedVessel(s, fillDensity*volume, volume, units.CelsiusToKelvin(20), residualPa, 101325)
	if err != nil {
		t.Fatalf("%s at %g kg/m³: %v", fluid, fillDensity, err)
	}
	return v, s
}

// TestFillingRuleP200 applies the UN packing instruction P200 filling rule
// for low-pressure liquefied gases (UN Model Regulations, P200 (5)(b), as
// summarised in testdata/worked_examples.json): a receptacle filled to
// 0.95 × the liquid density at 50 °C must not become liquid-full at or
// below 60 °C. Every library fluid whose critical point is above 60 °C
// must honour it.
func TestFillingRuleP200(t *testing.T) {
	for _, s := range testLibrary(t).All() {
		if s.CriticalTemperature() < units.CelsiusToKelvin(70) || s.MinTemperature() > units.CelsiusToKelvin(20) {
			continue
		}
		rho50, err := s.SaturatedLiquidDensity(units.CelsiusToKelvin(50))
		if err != nil {
			t.Fatal(err)
		}
		v, _ := vesselFor(t, s.Fluid().ID, 0.95*rho50, 0)
		tlf, ok := v.liquidFullTemperature()
		if !ok || tlf <= units.CelsiusToKelvin(60) {
			t.Errorf("%s filled per P200 goes liquid-full at %.1f °C, at or below 60 °C", s.Fluid().ID, units.KelvinToCelsius(tlf))
		}
		st, err := v.state(units.CelsiusToKelvin(60))
		if err != nil || st.Phase != PhaseTwoPhase || st.UllagePercent <= 0 {
			t.Errorf("%s filled per P200 at 60 °C: %+v, %v", s.Fluid().ID, st, err)
		}
	}
}

// TestPressureCurveIsContinuousAndRising sweeps temperature finely across
// every phase boundary for light, critical-ish and heavy fills, evacuated
// and with residual air: pressure never falls with temperature in a closed
// vessel (common practice: a rigid closed system at fixed mass) and never
// jumps by more than the local slope allows.
func TestPressureCurveIsContinuousAndRising(t *testing.T) {
	for _, fluid := range []string{"dichloromethane", "acetone", "n-pentane", "water", "isobutane"} {
		s, err := testLibrary(t).Lookup(fluid)
		if err != nil {
			t.Fatal(err)
		}
		for _, frac := range []float64{0.2, 0.9, 1.4, 2.2} {
			rho := frac * s.CriticalDensity()
			seal, _ := s.SaturatedLiquidDensity(units.CelsiusToKelvin(20))
			if rho >= 0.99*seal {
				continue
			}
			for _, gas := range []float64{0, 3000} {
				v, _ := vesselFor(t, fluid, rho, gas)
				lo := math.Max(s.MinTemperature(), units.CelsiusToKelvin(-30))
				hi := s.CriticalTemperature() + 30
				const n = 3000
				prev, prevT := -1.0, 0.0
				for i := 0; i <= n; i++ {
					temp := lo + (hi-lo)*float64(i)/n
					st, err := v.state(temp)
					if err != nil {
						t.Fatalf("%s ρ=%.0f gas=%g at %.2f K: %v", fluid, rho, gas, temp, err)
					}
					p := st.PressurePa
					if math.IsNaN(p) || math.IsInf(p, 0) || p <= 0 {
						t.Fatalf("%s ρ=%.0f at %.2f K: pressure %g", fluid, rho, temp, p)
					}
					if prev > 0 {
						if p < prev*(1-1e-9) {
							t.Errorf("%s ρ=%.0f gas=%g: pressure falls from %.6g to %.6g Pa between %.3f and %.3f K", fluid, rho, gas, prev, p, prevT, temp)
						}
						// Largest physical step: 3 MPa/K liquid-full rise
						// times the step, or 5 % of the pressure.
						if p-prev > math.Max(3e6*(temp-prevT), 0.05*prev) {
							t.Errorf("%s ρ=%.0f gas=%g: pressure jumps from %.6g to %.6g Pa at %.3f K (%s)", fluid, rho, gas, prev, p, temp, st.Phase)
						}
					}
					if mass := st.LiquidMassKg + st.VapourMassKg; math.Abs(mass-v.mass) > 1e-9*v.mass {
						t.Errorf("%s ρ=%.0f at %.2f K: mass %g, fill %g (mass not conserved)", fluid, rho, temp, mass, v.mass)
					}
					prev, prevT = p, temp
				}
			}
		}
	}
}

// TestLiquidFullRiseIsSteep: past the liquid-full point the pressure
// climbs by of the order of a megapascal per kelvin (the thermal pressure
// coefficient α/κ of ordinary liquids, roughly 1 MPa/K: common practice).
// Missing this rise is the one error the tool must never make.
func TestLiquidFullRiseIsSteep(t *testing.T) {
	for _, fluid := range []string{"dichloromethane", "ethanol", "acetone", "n-pentane", "water"} {
		s, _ := testLibrary(t).Lookup(fluid)
		rho20, _ := s.SaturatedLiquidDensity(units.CelsiusToKelvin(20))
		for _, gas := range []float64{0, 2000} {
			v, _ := vesselFor(t, fluid, 0.9*rho20, gas)
			tlf, ok := v.liquidFullTemperature()
			if !ok {
				t.Fatalf("%s: 90 %% fill never goes liquid-full", fluid)
			}
			before, _ := v.state(tlf - 5)
			after, err := v.state(tlf + 5)
			if err != nil {
				t.Fatal(err)
			}
			if after.Phase != PhaseLiquidFull || before.Phase != PhaseTwoPhase {
				t.Errorf("%s gas=%g: phases %s → %s around %.1f K", fluid, gas, before.Phase, after.Phase, tlf)
			}
			if rise := (after.PressurePa - before.PressurePa) / 10; rise < 2e5 {
				t.Errorf("%s gas=%g: only %.3g Pa/K across the liquid-full point at %.1f K", fluid, gas, rise, tlf)
			}
		}
	}
}

// TestVapourOnlyBehavesAsGas: a vessel with too little fill to keep any
// liquid holds a gas, and at low density its pressure is the ideal-gas
// pressure ρRT/M within 1 % (common practice: Z ≈ 1 at low reduced
// pressure).
func TestVapourOnlyBehavesAsGas(t *testing.T) {
	for _, fluid := range []string{"dichloromethane", "acetone", "water", "ammonia"} {
		s, _ := testLibrary(t).Lookup(fluid)
		v, _ := vesselFor(t, fluid, 0.05, 0)
		temp := units.CelsiusToKelvin(80)
		st, err := v.state(temp)
		if err != nil {
			t.Fatal(err)
		}
		ideal := 0.05 * units.GasConstant * temp / s.MolarMass()
		if st.Phase != PhaseVapour || math.Abs(st.PressurePa/ideal-1) > 0.01 {
			t.Errorf("%s: %s at %.5g Pa, ideal gas %.5g Pa", fluid, st.Phase, st.PressurePa, ideal)
		}
	}
}

// TestResidualGasAtSealing: the residual gas pressure reads back at the
// sealing temperature.
func TestResidualGasAtSealing(t *testing.T) {
	v, _ := vesselFor(t, "acetone", 300, 5000)
	st, _ := v.state(units.CelsiusToKelvin(20))
	if math.Abs(st.GasPressurePa-5000) > 1 {
		t.Errorf("gas pressure at sealing %.6g Pa, want 5000", st.GasPressurePa)
	}
}
