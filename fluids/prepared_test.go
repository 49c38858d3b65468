package fluids

import (
	"math"
	"strings"
	"testing"
)

// sameResult reports whether two (value, flags, error) results are the
// same bit for bit, errors by their text.
func sameResult(p1 float64, f1 Flags, e1 error, p2 float64, f2 Flags, e2 error) bool {
	if (e1 == nil) != (e2 == nil) || (e1 != nil && e1.Error() != e2.Error()) {
		return false
	}
	return math.Float64bits(p1) == math.Float64bits(p2) && f1 == f2
}

// An isochore gives exactly SinglePhasePressure at every temperature, on
// both sides of the critical density, in and out of the two-phase region,
// with one isochore evaluated at many temperatures in turn (its dew or
// bubble temperature is found once and reused). No tolerance: the same
// arithmetic must give the same bits.
func TestIsochoreMatchesSinglePhasePressure(t *testing.T) {
	lib, err := Builtin()
	if err != nil {
		t.Fatal(err)
	}
	for _, s := range lib.All() {
		for _, f := range []float64{1e-4, 0.05, 0.5, 0.97, 1, 1.03, 1.5, 2, 2.6} {
			rho := f * s.CriticalDensity()
			var c Isochore
			s.PrepareIsochore(rho, &c)
			for i := 0; i <= 60; i++ {
				temp := s.MinTemperature() + (s.CriticalTemperature()+80-s.MinTemperature())*float64(i)/60
				p1, f1, e1 := c.Pressure(temp)
				p2, f2, e2 := s.SinglePhasePressure(temp, rho)
				if !sameResult(p1, f1, e1, p2, f2, e2) {
					t.Fatalf("%s at %.2f K, %.4g kg/m³: isochore %v %v %v, direct %v %v %v", s.Fluid().ID, temp, rho, p1, f1, e1, p2, f2, e2)
				}
			}
		}
	}
}

// A liquid isotherm prepared once gives, pressure after pressure, what a
// fresh CompressedLiquidDensity call gives, errors included (below the
// vapour pressure, not finite, above Tc).
func TestLiquidIsothermMatchesCompressedLiquidDensity(t *testing.T) {
	lib, err := Builtin()
	if err != nil {
		t.Fatal(err)
	}
	for _, s := range lib.All() {
		for _, tr := range []float64{0.6, 0.8, 0.94, 0.96, 0.999, 1.01} {
			temp := math.Max(s.MinTemperature(), tr*s.CriticalTemperature())
			var li LiquidIsotherm
			s.PrepareLiquidIsotherm(temp, &li)
			ps, _, _ := s.SaturationPressure(temp)
			for _, p := range []float64{ps * 0.5, ps, ps * (1 + 1e-13), ps + 1e5, ps + 1e6, ps + 3e7, 2e8, math.NaN()} {
				r1, f1, e1 := li.Density(p)
				r2, f2, e2 := s.CompressedLiquidDensity(temp, p)
				if !sameResult(r1, f1, e1, r2, f2, e2) {
					t.Fatalf("%s at %.2f K, %.6g Pa: isotherm %v %v %v, direct %v %v %v", s.Fluid().ID, temp, p, r1, f1, e1, r2, f2, e2)
				}
			}
		}
	}
}

// Lookup by the library's key index finds what a scan of Matches in
// library order finds: for every ID, name, CAS number and synonym of every
// fluid, written as people write them, and for keys that match nothing.
func TestLookupIndexMatchesScan(t *testing.T) {
	lib, err := Builtin()
	if err != nil {
		t.Fatal(err)
	}
	scan := func(key string) *Substance {
		for _, s := range lib.substances {
			if s.fluid.Matches(key) {
				return s
			}
		}
		return nil
	}
	var keys []string
	for _, s := range lib.All() {
		f := s.Fluid()
		for _, k := range append([]string{f.ID, f.Name, f.CAS}, f.Synonyms...) {
			keys = append(keys, k, strings.ToUpper(k), strings.ReplaceAll(k, "-", " "), " "+k+".")
		}
	}
	keys = append(keys, "", " ", "-", "no such fluid", "7732-18-6x")
	for _, k := range keys {
		got, err := lib.Lookup(k)
		want := scan(k)
		if got != want || (err == nil) != (want != nil) {
			t.Errorf("Lookup(%q) = %v, %v; the scan finds %v", k, name(got), err, name(want))
		}
	}
}

func name(s *Substance) string {
	if s == nil {
		return "nothing"
	}
	return s.Fluid().ID
}

// The dew-temperature search's vapour density is Saturation's, bit for
// bit, over the whole saturation curve (both sides of the near-critical
// blend) and NaN where Saturation fails.
func TestSaturatedVapourDensityMatchesSaturation(t *testing.T) {
	lib, err := Builtin()
	if err != nil {
		t.Fatal(err)
	}
	for _, s := range lib.All() {
		for i := -1; i <= 201; i++ {
			temp := s.MinTemperature() + (s.CriticalTemperature()-s.MinTemperature())*float64(i)/200
			got := s.saturatedVapourDensity(temp)
			sat, err := s.Saturation(temp)
			if err != nil {
				if !math.IsNaN(got) {
					t.Errorf("%s at %.3f K: %g, want NaN (Saturation: %v)", s.Fluid().ID, temp, got, err)
				}
				continue
			}
			if math.Float64bits(got) != math.Float64bits(sat.VapourDensity) {
				t.Errorf("%s at %.3f K: %.17g, Saturation gives %.17g", s.Fluid().ID, temp, got, sat.VapourDensity)
			}
		}
	}
}

// The quick check of a strongly compressed liquid (LiquidIsotherm.density)
// gives what the full check through SinglePhasePressure gives, bit for
// bit, on every fluid of the correlation route, from the freezing point to
// Tc and from the vapour pressure to far past any glass; and it is used
// (the comparison would prove nothing if no isotherm took it).
func TestLiquidIsothermQuickCheck(t *testing.T) {
	lib, err := Builtin()
	if err != nil {
		t.Fatal(err)
	}
	quick := 0
	for _, s := range lib.All() {
		if s.ref != nil {
			continue
		}
		for i := 0; i <= 80; i++ {
			temp := s.MinTemperature() + (s.CriticalTemperature()-s.MinTemperature())*float64(i)/80
			var li LiquidIsotherm
			s.PrepareLiquidIsotherm(temp, &li)
			if li.quick {
				quick++
			}
			ps, _, err := s.SaturationPressure(temp)
			if err != nil {
				continue
			}
			for j := 0; j <= 60; j++ {
				p := ps + math.Pow(10, 3+6*float64(j)/60) // 1 kPa to 1 GPa above Psat
				r1, f1, e1 := li.density(p, li.quick)
				r2, f2, e2 := li.density(p, false)
				if !sameResult(r1, f1, e1, r2, f2, e2) {
					t.Fatalf("%s at %.3f K, %.6g Pa: quick %v %v %v, full %v %v %v", s.Fluid().ID, temp, p, r1, f1, e1, r2, f2, e2)
				}
			}
		}
	}
	if quick == 0 {
		t.Fatal("no isotherm takes the quick check")
	}
	t.Logf("%d isotherms with the quick check", quick)
}
