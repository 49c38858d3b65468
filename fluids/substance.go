package fluids

import (
	"fmt"
	"math"
	"sync"

	"ullage/fluids/solve"
	"ullage/fluids/units"
)

// Substance is a validated fluid with its correlations set up, ready to
// answer property questions. It is immutable and safe for concurrent use.
type Substance struct {
	fluid *Fluid
	// ref is the reference equation of state, nil on the correlation
	// route; with it, every property below comes from the equation and
	// the correlation fields are unused.
	ref *referenceEOS
	// tPeak is the temperature of the densest saturated liquid (the
	// freezing point, except for water).
	tPeak float64
	// peakLiquidDensity is the saturated liquid density at tPeak and
	// maxRefDensity the top of the equation of state's density search
	// (refMaxDensity), kg/m³; equation-of-state route only.
	peakLiquidDensity, maxRefDensity float64

	tc, pc, rhoC, tMin, molarMass float64
	vp                            *vapourPressureCurve
	liquid                        liquidDensityCurve
	eos                           pengRobinson
	compressed                    tait

	// Near-critical vapour density by the law of rectilinear diameters
	// (L. Cailletet and E. Mathias, C. R. Acad. Sci. 102, 1202 (1886);
	// from memory): above blendT the mean of liquid and vapour densities
	// runs on a straight line to the critical density.
	blendT, diameterAtBlend float64

	// ends holds what the dew and bubble temperature searches find at
	// the ends of their ranges, the same for every density (searchEnds).
	ends searchEnds
	// boiling is the saturated state at the normal boiling point
	// (NormalBoilingSaturation).
	boiling struct {
		once sync.Once
		sat  Saturation
		err  error
	}
}

// NormalBoilingSaturation returns Saturation at the record's normal
// boiling point, worked out on the first call: what Saturation gives
// there.
func (s *Substance) NormalBoilingSaturation() (Saturation, error) {
	b := &s.boiling
	b.once.Do(func() { b.sat, b.err = s.Saturation(s.fluid.NormalBoilingPoint.Value) })
	return b.sat, b.err
}

// searchEnds are the saturated vapour density at the freezing point and
// at Tc, and the saturated liquid density (the published correlation's)
// at the freezing point and at the correlation's upper end, worked out on
// first need: each is what the direct call gives.
type searchEnds struct {
	once                 sync.Once
	vapourMin, vapourTc  float64
	liquidMin, liquidTop float64
}

// searchEnds returns s's searchEnds, working them out on the first call.
func (s *Substance) searchEnds() *searchEnds {
	e := &s.ends
	e.once.Do(func() {
		e.vapourMin, e.vapourTc = s.saturatedVapourDensity(s.tMin), s.saturatedVapourDensity(s.tc)
		if s.liquid.corr != nil {
			e.liquidMin, _ = s.liquid.density(s.tMin)
			e.liquidTop, _ = s.liquid.density(s.liquid.tJoin)
		}
	})
	return e
}

// nearCriticalBlendTr is the reduced temperature above which the vapour
// density follows the rectilinear diameter instead of the equation of
// state (common practice: cubic equations lose accuracy near Tc).
const nearCriticalBlendTr = 0.9

// NewSubstance validates f and prepares its correlations.
func NewSubstance(f *Fluid) (*Substance, error) {
	if err := f.Validate(); err != nil {
		return nil, err
	}
	return newSubstance(f)
}

func newSubstance(f *Fluid) (*Substance, error) {
	s := &Substance{
		tPeak:     f.FreezingPoint.Value,
		fluid:     f,
		tc:        f.CriticalTemperature.Value,
		pc:        f.CriticalPressure.Value,
		rhoC:      f.CriticalDensity.Value,
		tMin:      f.FreezingPoint.Value,
		molarMass: f.MolarMass.Value,
	}
	vp, err := newVapourPressureCurve(f.VapourPressure, s.tc, s.pc)
	if err != nil {
		return nil, fmt.Errorf("%w: %s: %v", ErrInvalidFluid, f.ID, err)
	}
	s.vp = vp
	s.liquid = newLiquidDensityCurve(f)
	s.eos = newPengRobinson(s.tc, s.pc, f.AcentricFactor.Value, s.molarMass, s.rhoC, units.GasConstant)
	s.compressed = newTait(s.tc, s.pc, f.AcentricFactor.Value)
	s.blendT = nearCriticalBlendTr * s.tc
	if s.blendT < s.tMin {
		s.blendT = s.tMin
	}
	lnP, _ := s.vp.lnP(s.blendT)
	rhoV := s.eos.vapourDensity(s.blendT, math.Exp(lnP))
	s.diameterAtBlend = 0.5 * (s.liquidDensity(s.blendT) + rhoV)
	return s, nil
}

// Fluid returns the data record behind the substance. Callers must not
// modify it.
func (s *Substance) Fluid() *Fluid { return s.fluid }

// CriticalTemperature returns Tc in K: the critical point of the
// reference equation of state where the fluid has one, else the record's.
func (s *Substance) CriticalTemperature() float64 { return s.tc }

// CriticalPressure returns Pc in Pa as stored in the library.
func (s *Substance) CriticalPressure() float64 { return s.pc }

// CriticalDensity returns the critical density in kg/m³.
func (s *Substance) CriticalDensity() float64 { return s.rhoC }

// MinTemperature returns the lowest temperature the liquid correlations
// accept: the freezing (triple) point in K.
func (s *Substance) MinTemperature() float64 { return s.tMin }

// DensestLiquidTemperature returns the temperature (K) of the densest
// saturated liquid: the freezing point for every fluid but water, whose
// maximum lies near 4 °C. Above it the saturated liquid density falls
// steadily to the critical density, so a vessel at a temperature t at or
// above it has gone liquid-full (LiquidFullTemperature below t) exactly
// when its fill density is at or above the saturated liquid density at t.
func (s *Substance) DensestLiquidTemperature() float64 { return s.tPeak }

// MolarMass returns the molar mass in kg/mol.
func (s *Substance) MolarMass() float64 { return s.molarMass }

// RackettZ returns the Rackett compressibility factor Z_RA of the
// near-critical liquid-density form (fitted to reach the critical density),
// or 0 for a fluid on the equation-of-state route, which has none.
func (s *Substance) RackettZ() float64 {
	if s.ref != nil {
		return 0
	}
	return s.liquid.near.z()
}

// liquidDensity returns the saturated liquid density in kg/m³.
func (s *Substance) liquidDensity(t float64) float64 {
	if s.ref != nil {
		rl, _ := s.ref.table.densities(t)
		return rl * s.molarMass
	}
	d, _ := s.liquid.density(t)
	return d
}

// Saturation is the state of liquid and vapour in equilibrium at one
// temperature. Densities in kg/m³, pressure in Pa, heat of vaporisation in
// J/kg, liquid heat capacity in J/(kg·K).
type Saturation struct {
	TemperatureK       float64
	PressurePa         float64
	LiquidDensity      float64
	VapourDensity      float64
	HeatOfVaporisation float64
	LiquidHeatCapacity float64
	Flags              Flags
}

func (s *Substance) checkTemperature(t float64) error {
	if math.IsNaN(t) || math.IsInf(t, 0) {
		return fmt.Errorf("%s: temperature %v K: %w", s.fluid.Name, t, ErrNotFinite)
	}
	if t < s.tMin {
		return fmt.Errorf("%s: temperature %.2f K (%.2f °C) is below the freezing point %.2f K (%.2f °C): %w",
			s.fluid.Name, t, units.KelvinToCelsius(t), s.tMin, units.KelvinToCelsius(s.tMin), ErrBelowFreezing)
	}
	return nil
}

// SaturationPressure returns the vapour pressure in Pa at t (K) with its
// flags. It fails for t not finite, below the freezing point or above Tc.
func (s *Substance) SaturationPressure(t float64) (float64, Flags, error) {
	if err := s.checkTemperature(t); err != nil {
		return 0, 0, err
	}
	if t > s.tc {
		return 0, 0, fmt.Errorf("%s: temperature %.2f K is above the critical temperature %.2f K: %w", s.fluid.Name, t, s.tc, ErrSupercritical)
	}
	if s.ref != nil {
		sat := s.refSaturationNoCp(t)
		return sat.PressurePa, sat.Flags, nil
	}
	lnP, ext := s.vp.lnP(t)
	var fl Flags
	if ext {
		fl |= VapourPressureExtrapolated
	}
	return math.Exp(lnP), fl, nil
}

// SaturatedLiquidDensity returns the saturated liquid density (kg/m³) at t.
func (s *Substance) SaturatedLiquidDensity(t float64) (float64, error) {
	if err := s.checkTemperature(t); err != nil {
		return 0, err
	}
	if t > s.tc {
		return 0, fmt.Errorf("%s: temperature %.2f K is above the critical temperature %.2f K: %w", s.fluid.Name, t, s.tc, ErrSupercritical)
	}
	return s.liquidDensity(t), nil
}

// SaturationNoHeatCapacity is Saturation with LiquidHeatCapacity left at
// zero, for callers that need only the pressure, the densities and the
// flags: on the equation-of-state route the heat capacity is a table
// series of its own.
func (s *Substance) SaturationNoHeatCapacity(t float64) (Saturation, error) {
	if s.ref == nil {
		sat, err := s.Saturation(t)
		sat.LiquidHeatCapacity = 0
		return sat, err
	}
	if err := s.checkTemperature(t); err != nil {
		return Saturation{}, err
	}
	if t > s.tc {
		return Saturation{}, fmt.Errorf("%s: temperature %.2f K is above the critical temperature %.2f K: %w", s.fluid.Name, t, s.tc, ErrSupercritical)
	}
	return s.refSaturationNoCp(t), nil
}

// Saturation returns the saturated liquid and vapour state at t (K). It
// fails for t not finite, below the freezing point or above Tc.
func (s *Substance) Saturation(t float64) (Saturation, error) {
	if s.ref != nil {
		if err := s.checkTemperature(t); err != nil {
			return Saturation{}, err
		}
		if t > s.tc {
			return Saturation{}, fmt.Errorf("%s: temperature %.2f K is above the critical temperature %.2f K: %w", s.fluid.Name, t, s.tc, ErrSupercritical)
		}
		return s.refSaturation(t), nil
	}
	p, fl, err := s.SaturationPressure(t)
	if err != nil {
		return Saturation{}, err
	}
	rhoL, below := s.liquid.density(t)
	if below {
		fl |= LiquidDensityExtrapolated
	}
	var rhoV float64
	if t <= s.blendT {
		rhoV = s.eos.vapourDensity(t, p)
	} else {
		d := s.diameterAtBlend + (s.rhoC-s.diameterAtBlend)*(t-s.blendT)/(s.tc-s.blendT)
		rhoV = 2*d - rhoL
		fl |= NearCriticalVapour
	}
	return Saturation{
		TemperatureK:       t,
		PressurePa:         p,
		LiquidDensity:      rhoL,
		VapourDensity:      rhoV,
		HeatOfVaporisation: s.heatOfVaporisation(t),
		LiquidHeatCapacity: s.fluid.LiquidHeatCapacity.Value / s.molarMass,
		Flags:              fl,
	}, nil
}

// heatOfVaporisation scales the reference enthalpy of vaporisation with
// Watson's relation, ΔH₂ = ΔH₁ [(1 − Tr₂)/(1 − Tr₁)]^0.38 (K. M. Watson,
// Ind. Eng. Chem. 35, 398 (1943); Poling et al., 5th ed., eq. 7-12.1, from
// memory). Result in J/kg; zero at Tc.
func (s *Substance) heatOfVaporisation(t float64) float64 {
	ref := s.fluid.HeatOfVaporisation
	x := (1 - t/s.tc) / (1 - ref.TemperatureK/s.tc)
	if x <= 0 {
		return 0
	}
	return ref.Value / s.molarMass * math.Pow(x, 0.38)
}

// SaturationTemperature returns the temperature (K) at which the vapour
// pressure equals p (Pa): the inverse of SaturationPressure.
func (s *Substance) SaturationTemperature(p float64) (float64, error) {
	if math.IsNaN(p) || math.IsInf(p, 0) {
		return 0, fmt.Errorf("%s: pressure %v Pa: %w", s.fluid.Name, p, ErrNotFinite)
	}
	pLo, _, _ := s.SaturationPressure(s.tMin)
	pHi, _, _ := s.SaturationPressure(s.tc)
	if p < pLo || p > pHi {
		return 0, fmt.Errorf("%s: pressure %.4g Pa is outside the saturation curve (%.4g Pa at the freezing point to %.4g Pa at the critical point): %w",
			s.fluid.Name, p, pLo, pHi, ErrOutOfDomain)
	}
	if s.ref != nil {
		return s.refSaturationTemperature(p)
	}
	lnTarget := math.Log(p)
	r, err := solve.Brent(func(t float64) float64 {
		v, _ := s.vp.lnP(t)
		return v - lnTarget
	}, s.tMin, s.tc, 1e-9, 200)
	if err != nil {
		return 0, fmt.Errorf("%s: saturation temperature at %.4g Pa: %w", s.fluid.Name, p, err)
	}
	return r.X, nil
}
