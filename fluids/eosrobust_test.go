package fluids

import (
	"math"
	"testing"
)

// Bad or extreme input gives a number or an error, never a panic, a NaN
// or a hang (common practice for a safety tool): a grid over temperature
// from the freezing point to twice Tc and density from a thousandth of the
// critical density to beyond the densest liquid, and pressures from 1 Pa
// to 1 GPa, for every fluid on the equation-of-state route.
func TestEquationOfStateNeverReturnsNaN(t *testing.T) {
	for id, s := range eosSubstances(t) {
		tMax := 2 * s.CriticalTemperature()
		rhoMax := s.refMaxDensity()
		for i := 0; i <= 40; i++ {
			temp := s.MinTemperature() + (tMax-s.MinTemperature())*float64(i)/40
			for j := 0; j <= 40; j++ {
				rho := 1e-3 * s.CriticalDensity() * math.Pow(rhoMax/(1e-3*s.CriticalDensity()), float64(j)/40)
				p, _, err := s.SinglePhasePressure(temp, rho)
				if err == nil && !(p > 0 && finite(p)) {
					t.Errorf("%s at %.2f K, %.4g kg/m³: pressure %g without an error", id, temp, rho, p)
				}
			}
			for _, p := range []float64{1, 1e3, 1e5, 1e6, 1e7, 1e8, 1e9} {
				rho, _, err := s.Density(temp, p)
				if err == nil && !(rho > 0 && finite(rho)) {
					t.Errorf("%s at %.2f K, %g Pa: density %g without an error", id, temp, p, rho)
				}
				if err == nil {
					back, _, err2 := s.SinglePhasePressure(temp, rho)
					// In a liquid the pressure is a small difference of
					// terms of order ρRT ≈ 1e8 Pa, so at 1 Pa a few
					// thousandths of a pascal is all rounding.
					if err2 == nil && math.Abs(back-p) > 1e-6*p+5e-3 {
						t.Errorf("%s at %.2f K, %g Pa: density %.6g gives back %.6g Pa", id, temp, p, rho, back)
					}
				}
			}
		}
	}
}

// The explicit (∂P/∂T)ρ of the equation agrees with a central difference
// of its pressure just past liquid-full, for every equation from 0 °C to
// 0.9 Tc (common practice: a derivative and its difference quotient must
// agree; 1e-5 is far above the difference's truncation and rounding
// error, about 1e-8 with a 1 mK step).
func TestIsochoricSlopeMatchesPressure(t *testing.T) {
	for id, s := range eosSubstances(t) {
		lo := math.Max(s.MinTemperature()+0.01, 273.15)
		for _, frac := range []float64{0, 0.25, 0.5, 0.75, 1} {
			temp := lo + frac*(0.9*s.CriticalTemperature()-lo)
			sat, err := s.Saturation(temp)
			if err != nil {
				t.Fatal(err)
			}
			rho := sat.LiquidDensity * (1 + 1e-4)
			slope, err := s.IsochoricSlope(temp, rho)
			if err != nil {
				t.Fatalf("%s at %.2f K: %v", id, temp, err)
			}
			const h = 1e-3
			a, _, err1 := s.SinglePhasePressure(temp-h, rho)
			b, _, err2 := s.SinglePhasePressure(temp+h, rho)
			if err1 != nil || err2 != nil {
				t.Fatalf("%s at %.2f K: %v %v", id, temp, err1, err2)
			}
			if d := (b - a) / (2 * h); math.Abs(slope/d-1) > 1e-5 {
				t.Errorf("%s at %.2f K: (∂P/∂T)ρ %.6g Pa/K, difference quotient %.6g", id, temp, slope, d)
			}
		}
	}
}
