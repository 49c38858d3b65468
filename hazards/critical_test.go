package hazards

import (
	"errors"
	"fmt"
	"testing"

	"ullage/fluids/units"
)

// TestCriticalRegionAlwaysJudged sweeps every fluid across its critical
// temperature (Tc ± 1 K, and a hair either side of it), fill densities
// from 0.1 ρc up to the liquid density at sealing, with and without
// residual air: every valid design yields findings and a verdict, never
// an engine error, and a vessel that is liquid-full at the hottest
// temperature fails (common practice: a design that cannot be shown safe
// is not passed; liquid-full means the glass breaks).
func TestCriticalRegionAlwaysJudged(t *testing.T) {
	lib := testLibrary(t)
	judged := 0
	for _, sub := range lib.All() {
		tc, rhoC := sub.CriticalTemperature(), sub.CriticalDensity()
		seal := units.CelsiusToKelvin(20)
		rhoSeal, err := sub.SaturatedLiquidDensity(seal)
		if err != nil {
			t.Fatal(err)
		}
		for _, dt := range []float64{-1, -0.1, -1e-6, 0, 1e-6, 1} {
			for k := 0; k <= 6; k++ {
				rho := 0.1*rhoC + (rhoSeal*0.999-0.1*rhoC)*float64(k)/6
				for _, gas := range []float64{0, 2000} {
					d := typicalDesign()
					d.Fluid = sub.Fluid().ID
					d.Vessel.Parts = []Part{{Name: "bulb", Shape: ShapeSphere, OuterDiameterM: 0.03, WallThicknessM: 0.004, WallToleranceM: 0.0005}}
					d.FillMassKg = rho * d.Vessel.Volume()
					d.FillMassToleranceKg = 0
					d.ResidualGasPressurePa = gas
					d.SealingTemperatureK = seal
					d.HottestK = tc + dt
					d.ColdestK = seal
					name := fmt.Sprintf("%s at Tc%+g K, %.3g ρc, residual %g Pa", d.Fluid, dt, rho/rhoC, gas)
					a, err := Assess(d, lib)
					if err != nil {
						if errors.Is(err, ErrInvalidInput) {
							continue
						}
						t.Errorf("%s: engine error %v", name, err)
						continue
					}
					judged++
					if len(a.Findings) == 0 || a.Verdict == "" {
						t.Errorf("%s: no findings", name)
					}
					if a.Hot.Phase == PhaseLiquidFull {
						if f := findingOf(t, a, CriterionUllage); f.Status != StatusFail || a.Verdict != StatusFail {
							t.Errorf("%s: liquid-full but ullage %s, verdict %s", name, f.Status, a.Verdict)
						}
					}
				}
			}
		}
	}
	if judged < 1000 {
		t.Errorf("only %d designs judged; the sweep has lost its coverage", judged)
	}
}
