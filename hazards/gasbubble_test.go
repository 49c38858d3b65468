package hazards

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"ullage/fluids"
	"ullage/fluids/units"
)

// The equation-of-state route's gas-bubble solver (Newton on ln V_g with
// the explicit pressure) solves the same equation as the general solver
// (Brent on ln V_g with a compressed-liquid density solve at each step),
// so the two agree across two-phase states, the approach to liquid-full
// and the squeezed bubble beyond it, for every fluid with an equation of
// state, at several fills and residual-gas pressures.
func TestGasBubbleSolversAgree(t *testing.T) {
	lib := testLibrary(t)
	checked := 0
	for _, s := range lib.All() {
		var iso fluids.Isotherm
		if !s.PrepareIsotherm(300, &iso) {
			continue
		}
		for _, frac := range []float64{0.5, 0.8, 0.95} {
			for _, residualPa := range []float64{300, 2000, 20000} {
				seal := math.Max(s.MinTemperature()+5, math.Min(293.15, s.CriticalTemperature()-40))
				sat, err := s.Saturation(seal)
				if err != nil {
					t.Fatal(err)
				}
				const volume = 50e-6
				v, err := newSealedVessel(s, frac*sat.LiquidDensity*volume, volume, seal, residualPa, 101325)
				if err != nil {
					t.Fatal(err)
				}
				tFull, _ := v.liquidFullTemperature()
				top := math.Min(s.CriticalTemperature()-1, tFull+15)
				for i := 0; i <= 40; i++ {
					temp := seal + (top-seal)*float64(i)/40
					sat, err := s.Saturation(temp)
					if err != nil || v.density <= sat.VapourDensity {
						continue
					}
					st := VesselState{TemperatureK: temp}
					nrt := v.gasMoles * units.GasConstant * temp
					s.PrepareIsotherm(temp, &iso)
					fast, err1 := v.withGasBubbleEOS(st, sat, nrt, &iso)
					slow, err2 := v.withGasBubbleBrent(st, sat, nrt)
					if (err1 == nil) != (err2 == nil) {
						t.Errorf("%s fill %.2f gas %g Pa at %.2f K: errors differ: %v / %v", s.Fluid().ID, frac, residualPa, temp, err1, err2)
						continue
					}
					if err1 != nil {
						continue
					}
					checked++
					// Brent stops at 1e-10 in ln V_g, the Newton solver at
					// 1e-12 of the pressure: the gas pressure nRT/V_g and the
					// ullage agree to well within 1e-8; the total pressure,
					// which adds the same vapour pressure to both, closer.
					for _, c := range []struct {
						what       string
						fast, slow float64
					}{
						{"pressure", fast.PressurePa, slow.PressurePa},
						{"gas pressure", fast.GasPressurePa, slow.GasPressurePa},
						{"ullage", fast.UllagePercent, slow.UllagePercent},
						{"liquid density", fast.LiquidDensity, slow.LiquidDensity},
					} {
						if !scalar.EqualWithinAbsOrRel(c.fast, c.slow, 1e-300, 1e-8) {
							t.Errorf("%s fill %.2f gas %g Pa at %.2f K: %s %.12g (Newton) vs %.12g (Brent)", s.Fluid().ID, frac, residualPa, temp, c.what, c.fast, c.slow)
						}
					}
					if fast.Flags != slow.Flags {
						t.Errorf("%s at %.2f K: flags %v vs %v", s.Fluid().ID, temp, fast.Flags, slow.Flags)
					}
				}
			}
		}
	}
	if checked < 1000 {
		t.Errorf("only %d states compared", checked)
	}
}

// The gas-bubble solver's evaluations per state, for the record.
func BenchmarkGasBubbleEOS(b *testing.B) {
	lib := testLibrary(b)
	s, err := lib.Lookup("ethanol")
	if err != nil {
		b.Fatal(err)
	}
	for _, c := range []struct {
		name string
		frac float64
	}{{"two-phase", 0.6}, {"squeezed", 0.97}} {
		b.Run(c.name, func(b *testing.B) {
			sat, _ := s.Saturation(263.15)
			v, err := newSealedVessel(s, c.frac*sat.LiquidDensity*50e-6, 50e-6, 263.15, 300, 101325)
			if err != nil {
				b.Fatal(err)
			}
			b.ReportAllocs()
			for b.Loop() {
				if _, err := v.state(349.15); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}
