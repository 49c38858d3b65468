package fluids

import (
	"math"

	"ullage/fluids/solve"
)

// liquidDensityCurve is the saturated liquid density from the freezing
// point to the critical point. Where the fluid has a published correlation
// (DIPPR 105 or 116), it is used up to tJoin — its upper limit or 0.95 Tc,
// whichever is lower — and the Rackett form carries on from there through
// the critical density. Without one, the Rackett form runs through the
// reference density and the critical density.
type liquidDensityCurve struct {
	corr      *LiquidDensityCorrelation
	molarMass float64
	tJoin     float64
	near      rackett
}

func newLiquidDensityCurve(f *Fluid) liquidDensityCurve {
	tc := f.CriticalTemperature.Value
	rhoC := f.CriticalDensity.Value
	c := liquidDensityCurve{molarMass: f.MolarMass.Value}
	if f.LiquidDensityCorrelation == nil {
		c.near = newRackett(tc, f.LiquidDensity.Value, f.LiquidDensity.TemperatureK, rhoC)
		return c
	}
	c.corr = f.LiquidDensityCorrelation
	c.tJoin = math.Min(c.corr.TMaxK, taitMaxTr*tc)
	c.near = newRackett(tc, c.corr.density(c.tJoin, c.molarMass), c.tJoin, rhoC)
	return c
}

// density returns the saturated liquid density in kg/m³ and whether the
// published correlation was used below its range.
func (c *liquidDensityCurve) density(t float64) (float64, bool) {
	if c.corr != nil && t <= c.tJoin {
		return c.corr.density(t, c.molarMass), t < c.corr.TMinK
	}
	return c.near.density(t), false
}

// temperature inverts density: the temperature at which the saturated
// liquid has density rho, searching from tMin. ok is false when rho is
// denser than the liquid at tMin.
func (c *liquidDensityCurve) temperature(rho, tMin float64) (float64, bool) {
	if c.corr == nil || rho < c.near.rhoRef {
		return c.near.inverse(rho, tMin)
	}
	dMin, _ := c.density(tMin)
	dTop, _ := c.density(c.tJoin)
	return c.searchTemperature(rho, tMin, dMin, dTop)
}

// searchTemperature is temperature's search on the published correlation,
// given its densities dMin at tMin and dTop at tJoin (the ends, which
// every search shares).
func (c *liquidDensityCurve) searchTemperature(rho, tMin, dMin, dTop float64) (float64, bool) {
	if rho > dMin {
		return tMin, false
	}
	r, err := solve.Brent(func(t float64) float64 {
		var d float64
		switch t {
		case tMin:
			d = dMin
		case c.tJoin:
			d = dTop
		default:
			d, _ = c.density(t)
		}
		return d - rho
	}, tMin, c.tJoin, 1e-9, 200)
	if err != nil {
		return tMin, false
	}
	return r.X, true
}

// decreasing reports whether the published correlation's density falls
// strictly with temperature over the whole range temperature searches,
// [tMin, tJoin], by the form's derivative: DIPPR 105, ln ρ = ln A −
// (1 + x^D) ln B with x = 1 − T/C, has d ln ρ/dT = D·x^(D−1)·ln B / C,
// negative for every x > 0 when A, B, C > 0 and D·ln B < 0, and x > 0 on the
// range when tJoin < C. Any other form (DIPPR 116, for water, whose liquid
// is densest near 4 °C) or no correlation: false.
func (c *liquidDensityCurve) decreasing() bool {
	k := c.corr
	if k == nil || k.Form == FormDIPPR116 {
		return false
	}
	return k.A > 0 && k.B > 0 && k.C > 0 && !math.IsNaN(k.D) && !math.IsInf(k.D, 0) && k.D*math.Log(k.B) < 0 && c.tJoin < k.C
}
