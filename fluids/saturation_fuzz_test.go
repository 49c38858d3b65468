package fluids

import (
	"errors"
	"math"
	"testing"
)

// FuzzSaturation: for every built-in fluid and any temperature at all,
// Saturation either refuses with one of the package's sentinel errors or
// returns finite, positive properties with the liquid denser than the
// vapour.
func FuzzSaturation(f *testing.F) {
	for _, t := range []float64{0, -1, 1e-300, 5e-324, 150, 293.15, 373.15, 507.9, 508.1, 647.09, 1e4, math.Inf(1), math.NaN(), math.MaxFloat64} {
		f.Add(t, uint8(0))
	}
	lib, err := Builtin()
	if err != nil {
		f.Fatal(err)
	}
	all := lib.All()
	f.Fuzz(func(t *testing.T, temp float64, which uint8) {
		s := all[int(which)%len(all)]
		sat, err := s.Saturation(temp)
		if err != nil {
			if !errors.Is(err, ErrNotFinite) && !errors.Is(err, ErrBelowFreezing) && !errors.Is(err, ErrSupercritical) && !errors.Is(err, ErrOutOfDomain) {
				t.Fatalf("%s at %g K: error without a sentinel: %v", s.Fluid().ID, temp, err)
			}
			return
		}
		for name, x := range map[string]float64{"pressure": sat.PressurePa, "liquid density": sat.LiquidDensity,
			"vapour density": sat.VapourDensity, "heat of vaporisation": sat.HeatOfVaporisation} {
			if math.IsNaN(x) || math.IsInf(x, 0) || x < 0 {
				t.Errorf("%s at %g K: %s = %g", s.Fluid().ID, temp, name, x)
			}
		}
		if math.IsNaN(sat.LiquidHeatCapacity) || math.IsInf(sat.LiquidHeatCapacity, 0) {
			t.Errorf("%s at %g K: liquid heat capacity %g", s.Fluid().ID, temp, sat.LiquidHeatCapacity)
		}
		if sat.LiquidDensity < sat.VapourDensity {
			t.Errorf("%s at %g K: liquid %g kg/m³ lighter than vapour %g", s.Fluid().ID, temp, sat.LiquidDensity, sat.VapourDensity)
		}
	})
}
