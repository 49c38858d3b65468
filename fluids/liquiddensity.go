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
	if d, _ := c.density(tMin); rho > d {
		return tMin, false
	}
	r, err := solve.Brent(func(t float64) float64 {
		d, _ := c.density(t)
		return d - rho
	}, tMin, c.tJoin, 1e-9, 200)
	if err != nil {
		return tMin, false
	}
	return r.X, true
}
