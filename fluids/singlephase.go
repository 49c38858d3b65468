package fluids

import (
	"fmt"
	"math"
	"sync"

	"ullage/fluids/solve"
)

// Single-phase states (compressed liquid, superheated vapour and
// supercritical fluid) at a fixed density. The pressure is anchored on the
// saturation curve and carried to higher temperature along the isochore:
//
//	P(T, ρ) = P_sat(T_s(ρ)) + [P_eos(T, ρ) − P_eos(T_s(ρ), ρ)]
//
// where T_s(ρ) is the temperature at which the saturated liquid (ρ > ρc)
// or saturated vapour (ρ ≤ ρc) has density ρ, and P_eos is the translated
// Peng–Robinson equation. This keeps the pressure continuous at every phase
// boundary by construction. For a compressed liquid below Tr 0.95 the Tait
// correlation of Thomson, Brobst and Hankinson gives the pressure directly
// instead, and the isochoric hand-over starts at Tr 0.95.

// bubbleTemperature inverts the saturated-liquid density curve: the
// temperature at which the saturated liquid density is rho (ρc ≤ ρ). It
// returns tMin, false when rho is denser than the liquid at the freezing
// point.
func (s *Substance) bubbleTemperature(rho float64) (float64, bool) {
	c := &s.liquid
	if c.corr == nil || rho < c.near.rhoRef {
		return c.temperature(rho, s.tMin)
	}
	ends := s.searchEnds()
	return c.searchTemperature(rho, s.tMin, ends.liquidMin, ends.liquidTop)
}

// saturatedVapourDensity is Saturation(t).VapourDensity (NaN where
// Saturation fails), without the values of Saturation it does not need:
// the dew-temperature search calls it at every step.
func (s *Substance) saturatedVapourDensity(t float64) float64 {
	if s.ref != nil {
		sat, err := s.Saturation(t)
		if err != nil {
			return math.NaN()
		}
		return sat.VapourDensity
	}
	p, _, err := s.SaturationPressure(t)
	if err != nil {
		return math.NaN()
	}
	if t <= s.blendT {
		return s.eos.vapourDensity(t, p)
	}
	rhoL, _ := s.liquid.density(t)
	d := s.diameterAtBlend + (s.rhoC-s.diameterAtBlend)*(t-s.blendT)/(s.tc-s.blendT)
	return 2*d - rhoL
}

// dewTemperature returns the temperature at which the saturated vapour
// density equals rho (rho ≤ ρc), or tMin, false when the vapour at the
// freezing point is already denser than rho.
func (s *Substance) dewTemperature(rho float64) (float64, bool) {
	if rho >= s.rhoC {
		return s.tc, true
	}
	ends := s.searchEnds()
	if ends.vapourMin >= rho {
		return s.tMin, false
	}
	lnRho := math.Log(rho)
	r, err := solve.Brent(func(t float64) float64 {
		switch t { // the ends, the same for every density
		case s.tMin:
			return math.Log(ends.vapourMin) - lnRho
		case s.tc:
			return math.Log(ends.vapourTc) - lnRho
		}
		return math.Log(s.saturatedVapourDensity(t)) - lnRho
	}, s.tMin, s.tc, 1e-9, 200)
	if err != nil {
		return s.tc, true
	}
	return r.X, true
}

// SinglePhasePressure returns the pressure (Pa) of the fluid at
// temperature t (K) and density rho (kg/m³) outside the two-phase region,
// with flags saying which correlation was stretched. It returns
// ErrTwoPhase when (t, rho) lies between the saturated vapour and liquid
// densities below Tc.
func (s *Substance) SinglePhasePressure(t, rho float64) (float64, Flags, error) {
	return s.singlePhasePressure(t, rho, nil)
}

// singlePhasePressure is SinglePhasePressure, taking the dew or bubble
// temperature of rho from c when c is not nil.
func (s *Substance) singlePhasePressure(t, rho float64, c *Isochore) (float64, Flags, error) {
	if err := s.checkTemperature(t); err != nil {
		return 0, 0, err
	}
	if math.IsNaN(rho) || math.IsInf(rho, 0) || rho <= 0 {
		return 0, 0, fmt.Errorf("%s: density %v kg/m³ must be a positive number: %w", s.fluid.Name, rho, ErrOutOfDomain)
	}
	if s.ref != nil {
		return s.refSinglePhasePressure(t, rho)
	}
	var fl Flags
	if t > s.tc {
		fl |= SupercriticalState
	}
	if rho <= s.rhoC {
		ts, found := c.boundary(s, rho)
		if !found {
			// Thinner than the saturated vapour even at the freezing
			// point: a gas at every temperature, on the equation of
			// state alone.
			p, ok := s.eos.pressure(t, rho)
			if !ok {
				return 0, 0, fmt.Errorf("%s: density %.4g kg/m³ is beyond the equation of state's limit: %w", s.fluid.Name, rho, ErrOutOfDomain)
			}
			return p, fl, nil
		}
		if t < ts*(1-boundaryTolerance) {
			return 0, 0, fmt.Errorf("%s: %.2f K at %.4g kg/m³ is below the dew temperature %.2f K: %w", s.fluid.Name, t, rho, ts, ErrTwoPhase)
		}
		ps, f2, _ := s.SaturationPressure(ts)
		fl |= f2
		p, err := s.isochoricRise(t, ts, rho, ps)
		return p, fl, err
	}
	ts, ok := c.boundary(s, rho)
	if ok && t < ts*(1-boundaryTolerance) {
		return 0, 0, fmt.Errorf("%s: %.2f K at %.4g kg/m³ is below the liquid-full temperature %.2f K: %w", s.fluid.Name, t, rho, ts, ErrTwoPhase)
	}
	tTait := taitMaxTr * s.tc
	if ts >= tTait {
		ps, f2, _ := s.SaturationPressure(ts)
		fl |= f2 | CompressedLiquidExtrapolated
		p, err := s.isochoricRise(t, ts, rho, ps)
		return p, fl, err
	}
	// Far into the compressed-liquid region the Tait isochores bend over
	// (its B(T) falls faster than the liquid expands), which no real
	// liquid does: (∂P/∂T)_ρ > 0. Where that happens before Tr 0.95, the
	// hand-over to the equation of state moves down to the top of the
	// Tait isochore.
	tt := math.Min(t, tTait)
	if s.taitSlope(tt, rho) <= 0 {
		lo := ts
		if !ok {
			lo = s.tMin
		}
		if s.taitSlope(lo, rho) > 0 {
			if r, err := solve.Brent(func(x float64) float64 { return s.taitSlope(x, rho) }, lo, tt, 1e-6, 100); err == nil {
				tTait = r.X
			}
		} else {
			tTait = lo
		}
		tt = math.Min(t, tTait)
	}
	p, f2 := s.taitPressure(tt, rho)
	fl |= f2
	if t <= tTait {
		return p, fl, nil
	}
	fl |= CompressedLiquidExtrapolated
	p, err := s.isochoricRise(t, tTait, rho, p)
	return p, fl, err
}

func (s *Substance) taitPressure(t, rho float64) (float64, Flags) {
	ps, fl, _ := s.SaturationPressure(t)
	return s.compressed.pressure(t, rho, s.liquidDensity(t), ps), fl
}

// taitSlope is the Tait isochore's slope (∂P/∂T)_ρ by a central difference.
func (s *Substance) taitSlope(t, rho float64) float64 {
	lo, hi := s.taitSlopeEnds(t)
	return s.taitSlopeFrom(lo, hi, rho)
}

// taitAt is what taitPressure at one temperature takes besides the
// density: Tait's B, the saturated liquid density and the vapour
// pressure.
type taitAt struct{ b, rhoSat, ps float64 }

// taitAtT returns taitAt for temperature t.
func (s *Substance) taitAtT(t float64) taitAt {
	ps, _, _ := s.SaturationPressure(t)
	return taitAt{s.compressed.bParam(t), s.liquidDensity(t), ps}
}

// taitSlopeEnds returns taitAt at the two temperatures of taitSlope's
// difference about t.
func (s *Substance) taitSlopeEnds(t float64) (lo, hi taitAt) {
	const h = 0.01
	return s.taitAtT(math.Max(t-h, s.tMin)), s.taitAtT(t + h)
}

// taitSlopeFrom is taitSlope at density rho from the ends of its
// difference (taitSlopeEnds): the Tait pressure at the upper end less
// that at the lower, as taitPressure gives them.
func (s *Substance) taitSlopeFrom(lo, hi taitAt, rho float64) float64 {
	b := s.compressed.pressureB(hi.b, rho, hi.rhoSat, hi.ps)
	a := s.compressed.pressureB(lo.b, rho, lo.rhoSat, lo.ps)
	return b - a
}

// Isochore is the fluid at one density, prepared for single-phase
// pressures at many temperatures: the temperature at which that density
// meets the saturation curve (the dew or bubble temperature), which
// SinglePhasePressure searches for on every call on the correlation route,
// is found once, on first need. Pressure gives exactly what
// SinglePhasePressure gives. It is safe for concurrent use; the zero value
// is unusable (see Substance.PrepareIsochore).
type Isochore struct {
	s    *Substance
	rho  float64
	once sync.Once
	// ts and found are the dew temperature (rho ≤ ρc) or the bubble
	// temperature (rho > ρc) of rho and whether the curve reaches it.
	ts    float64
	found bool
}

// PrepareIsochore prepares c for density rho (kg/m³). Nothing is
// computed until the first Pressure.
func (s *Substance) PrepareIsochore(rho float64, c *Isochore) {
	*c = Isochore{s: s, rho: rho}
}

// Pressure returns SinglePhasePressure(t, rho) for the isochore's density.
func (c *Isochore) Pressure(t float64) (float64, Flags, error) {
	return c.s.singlePhasePressure(t, c.rho, c)
}

// boundary returns the dew temperature (rho ≤ ρc) or the bubble
// temperature (rho > ρc) of rho, from c when c is not nil (which must be
// rho's isochore).
func (c *Isochore) boundary(s *Substance, rho float64) (float64, bool) {
	find := func() (float64, bool) {
		if rho <= s.rhoC {
			return s.dewTemperature(rho)
		}
		return s.bubbleTemperature(rho)
	}
	if c == nil {
		return find()
	}
	c.once.Do(func() { c.ts, c.found = find() })
	return c.ts, c.found
}

// boundaryTolerance is the relative distance inside a phase boundary still
// treated as on it, so that rounding in an inverted correlation does not
// turn a boundary state into a two-phase error.
const boundaryTolerance = 1e-9

func (s *Substance) isochoricRise(t, t0, rho, p0 float64) (float64, error) {
	if t <= t0 {
		return p0, nil
	}
	p1, ok1 := s.eos.pressure(t, rho)
	p2, ok2 := s.eos.pressure(t0, rho)
	if !ok1 || !ok2 {
		return 0, fmt.Errorf("%s: density %.4g kg/m³ is beyond the equation of state's limit: %w", s.fluid.Name, rho, ErrOutOfDomain)
	}
	return p0 + p1 - p2, nil
}

// CompressedLiquidDensity returns the density (kg/m³) of the liquid at
// temperature t ≤ Tc and pressure p at or above the saturation pressure.
func (s *Substance) CompressedLiquidDensity(t, p float64) (float64, Flags, error) {
	if s.ref != nil {
		return s.refCompressedLiquidDensityAt(t, p)
	}
	var li LiquidIsotherm
	s.PrepareLiquidIsotherm(t, &li)
	return li.Density(p)
}

// LiquidIsotherm is the compressed liquid at one temperature, prepared
// for densities at many pressures (a solver's steps): on the correlation
// route the vapour pressure, the saturated liquid density and the Tait
// parameter B of that temperature are worked out once. Density gives
// exactly what CompressedLiquidDensity gives. It is safe for concurrent
// use once prepared. The zero value is unusable; see
// Substance.PrepareLiquidIsotherm.
type LiquidIsotherm struct {
	s  *Substance
	t  float64
	ps float64
	fl Flags
	// err is the vapour pressure's error at t, returned by every Density.
	err       error
	rhoSat, b float64
	// quick says Density may check a strongly compressed state without
	// SinglePhasePressure's bubble-temperature search (see quickCheck).
	quick bool
	// slopeLo and slopeHi are the ends of taitSlope's difference at t,
	// the same for every density, worked out for a quick isotherm on the
	// first strongly compressed state only (most isotherms never see one).
	slopeOnce        sync.Once
	slopeLo, slopeHi taitAt
}

// taitSlope is taitSlope(t, rho) at the isotherm's temperature, for a
// quick isotherm.
func (li *LiquidIsotherm) taitSlope(rho float64) float64 {
	li.slopeOnce.Do(func() { li.slopeLo, li.slopeHi = li.s.taitSlopeEnds(li.t) })
	return li.s.taitSlopeFrom(li.slopeLo, li.slopeHi, rho)
}

// PrepareLiquidIsotherm prepares li for temperature t (K).
func (s *Substance) PrepareLiquidIsotherm(t float64, li *LiquidIsotherm) {
	*li = LiquidIsotherm{s: s, t: t}
	if s.ref != nil {
		return
	}
	li.ps, li.fl, li.err = s.SaturationPressure(t)
	if li.err != nil {
		return
	}
	li.rhoSat = s.liquidDensity(t)
	li.b = s.compressed.bParam(t)
	li.quick = s.liquid.decreasing() && t <= s.liquid.tJoin && t < taitMaxTr*s.tc-1e-6
}

// Density returns the density (kg/m³) of the liquid at the isotherm's
// temperature and pressure p (Pa): CompressedLiquidDensity(t, p).
func (li *LiquidIsotherm) Density(p float64) (float64, Flags, error) {
	return li.density(p, li.quick)
}

// density is Density, with SinglePhasePressure's check of a strongly
// compressed state made in full unless quick.
//
// That check asks SinglePhasePressure(t, ρ) for the pressure of the Tait
// density ρ and keeps ρ when it gives p back. SinglePhasePressure first
// finds the bubble temperature T_s of ρ (a search) and uses T_s only to
// decide that the state is not two-phase (t ≥ T_s(1 − 10⁻⁹)) and not past
// the Tait range (T_s < 0.95 Tc). When the saturated liquid density is
// strictly decreasing on the search range [T_min, T_join] (decreasing) and
// t ≤ T_join, ρ ≥ ρ_sat(t) puts the one root of ρ_sat(T) = ρ at or below t,
// and the search returns it within 2·10⁻⁹ K (or fails, which decides the
// same way): with t more than 10⁻⁶ K below 0.95 Tc both decisions come out
// as above whatever the search returns, so quick skips it and takes the
// Tait pressure at t directly, the same numbers SinglePhasePressure takes.
// TestLiquidIsothermQuickCheck compares the two bit for bit.
func (li *LiquidIsotherm) density(p float64, quick bool) (float64, Flags, error) {
	s, t := li.s, li.t
	if s.ref != nil {
		return s.refCompressedLiquidDensityAt(t, p)
	}
	ps, fl := li.ps, li.fl
	if li.err != nil {
		return 0, 0, li.err
	}
	if math.IsNaN(p) || math.IsInf(p, 0) {
		return 0, 0, fmt.Errorf("%s: pressure %v Pa: %w", s.fluid.Name, p, ErrNotFinite)
	}
	if p < ps*(1-1e-12) {
		return 0, 0, fmt.Errorf("%s: pressure %.4g Pa is below the vapour pressure %.4g Pa at %.2f K, where the liquid boils: %w", s.fluid.Name, p, ps, t, ErrOutOfDomain)
	}
	rhoSat := li.rhoSat
	if t > taitMaxTr*s.tc {
		rho, f2, err := s.invertPressure(t, p, rhoSat, s.maxDensity())
		return rho, fl | f2, err
	}
	rho := s.compressed.densityB(li.b, max(p, ps), rhoSat, ps)
	// The closed form holds wherever SinglePhasePressure uses Tait; where
	// that has handed over to the equation of state, invert it instead.
	// Within 1 % of (B + Ps) above saturation the liquid is compressed by
	// under 0.1 %, far from any bend in the isochores: no check needed.
	if b := li.b; p-ps < 0.01*(b+ps) {
		return rho, fl, nil
	}
	if quick && rho > s.rhoC && rho >= s.liquid.near.rhoRef && !math.IsInf(rho, 0) && li.taitSlope(rho) > 0 {
		// SinglePhasePressure(t, ρ) is the Tait pressure at t (taitPressure
		// with this isotherm's values) and its flags are fl.
		if back := s.compressed.pressureB(li.b, rho, rhoSat, ps); math.Abs(back-p) <= 1e-9*max(p, 1) {
			return rho, fl, nil
		}
	} else if back, f2, err := s.SinglePhasePressure(t, rho); err == nil && math.Abs(back-p) <= 1e-9*max(p, 1) {
		return rho, fl | f2, nil
	}
	if inv, f2, err := s.invertPressure(t, p, rhoSat, s.maxDensity()); err == nil {
		return inv, fl | f2, nil
	}
	// Beyond every description (pressures of hundreds of megapascals,
	// far past any glass): keep the Tait value and say so.
	return rho, fl | CompressedLiquidExtrapolated, nil
}

// Density returns the density (kg/m³) of a single-phase fluid at (t, p):
// above Tc any pressure; below Tc the liquid if p ≥ Psat and the vapour
// otherwise.
func (s *Substance) Density(t, p float64) (float64, Flags, error) {
	if err := s.checkTemperature(t); err != nil {
		return 0, 0, err
	}
	if math.IsNaN(p) || math.IsInf(p, 0) || p <= 0 {
		return 0, 0, fmt.Errorf("%s: pressure %v Pa must be a positive number: %w", s.fluid.Name, p, ErrOutOfDomain)
	}
	if s.ref != nil {
		return s.refDensityAt(t, p)
	}
	if t <= s.tc {
		sat, err := s.Saturation(t)
		if err != nil {
			return 0, 0, err
		}
		if p >= sat.PressurePa {
			return s.CompressedLiquidDensity(t, p)
		}
		return s.invertPressure(t, p, 1e-9, sat.VapourDensity)
	}
	return s.invertPressure(t, p, 1e-9, s.maxDensity())
}

func (s *Substance) invertPressure(t, p, lo, hi float64) (float64, Flags, error) {
	var fl Flags
	f := func(rho float64) float64 {
		v, f2, err := s.SinglePhasePressure(t, rho)
		if err != nil {
			return math.NaN()
		}
		fl = f2
		return v - p
	}
	r, err := solve.Brent(f, lo, hi, 1e-10*hi, 300)
	if err != nil {
		return 0, 0, fmt.Errorf("%s: no single-phase density at %.2f K and %.4g Pa: %w", s.fluid.Name, t, p, ErrOutOfDomain)
	}
	f(r.X)
	return r.X, fl, nil
}

// LiquidFullTemperature returns the temperature (K) at which saturated
// liquid of the vessel's overall fill density rho (kg/m³) just fills the
// vessel: the point past which a sealed vessel holds no ullage. ok is false
// when rho is at or below the critical density (the vessel then ends all
// vapour or supercritical without going liquid-full) and the returned value
// is Tc. When rho is denser than the liquid at the freezing point the
// vessel is liquid-full at every temperature and the freezing point is
// returned with ok true.
func (s *Substance) LiquidFullTemperature(rho float64) (float64, bool) {
	if !(rho > s.rhoC) {
		return s.tc, false
	}
	if s.ref != nil {
		return s.refLiquidFullTemperature(rho)
	}
	t, _ := s.bubbleTemperature(rho)
	return t, true
}

// maxDensity is the densest state the single-phase description covers:
// 1.5 times the liquid at the freezing point, or just short of the
// equation of state's co-volume, whichever is lower.
func (s *Substance) maxDensity() float64 {
	rho := 1.5 * s.liquidDensity(s.tMin)
	if v := 1.01*s.eos.b - s.eos.shift; v > 0 {
		rho = math.Min(rho, s.molarMass/v)
	}
	return rho
}
