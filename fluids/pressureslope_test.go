package fluids

import "testing"

// The pressure-only evaluation sums the same terms in the same order as
// the full one, so the pressure and its density slope are bit for bit the
// same, over a grid of liquid, vapour and supercritical states of every
// fluid with an equation of state.
func TestPressureSlopeMatchesFullEvaluation(t *testing.T) {
	lib, err := Builtin()
	if err != nil {
		t.Fatal(err)
	}
	n := 0
	for _, s := range lib.All() {
		if s.ref == nil {
			continue
		}
		h := s.ref.h
		for i := 0; i <= 20; i++ {
			temp := s.tMin + (1.3*s.tc-s.tMin)*float64(i)/20
			var c tauCache
			h.prepareTau(h.tr/temp, &c)
			for j := 1; j <= 30; j++ {
				rho := s.maxRefDensity / s.molarMass * float64(j) / 30
				full := h.stateCached(temp, rho, &c)
				p, k := h.pressureSlopeCached(temp, rho, &c)
				direct := h.eval(rho/h.rhor, h.tr/temp)
				pFull := rho * h.r * temp * (1 + rho/h.rhor*direct.D)
				if p != full.p || k != full.dpdrho || h.pressure(temp, rho) != pFull {
					t.Fatalf("%s at %g K, %g mol/m³: %v, %v vs %v, %v", s.Fluid().ID, temp, rho, p, k, full.p, full.dpdrho)
				}
				n++
			}
		}
	}
	if n == 0 {
		t.Fatal("no fluid with an equation of state")
	}
}

// SaturationNoHeatCapacity is Saturation without the heat capacity: every
// other field the same, bit for bit, and the same errors.
func TestSaturationNoHeatCapacity(t *testing.T) {
	lib, err := Builtin()
	if err != nil {
		t.Fatal(err)
	}
	for _, s := range lib.All() {
		for i := -1; i <= 21; i++ {
			temp := s.tMin + (s.tc-s.tMin)*float64(i)/20
			want, err1 := s.Saturation(temp)
			got, err2 := s.SaturationNoHeatCapacity(temp)
			if (err1 == nil) != (err2 == nil) {
				t.Fatalf("%s at %g K: errors %v / %v", s.Fluid().ID, temp, err1, err2)
			}
			want.LiquidHeatCapacity = 0
			if got != want {
				t.Errorf("%s at %g K: %+v, want %+v", s.Fluid().ID, temp, got, want)
			}
		}
	}
}
