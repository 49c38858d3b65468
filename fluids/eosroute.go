package fluids

import (
	"fmt"
	"math"

	"ullage/fluids/solve"
)

// The equation-of-state route: a fluid with a reference equation of state
// takes every fluid property from it — vapour pressure, saturated
// densities and heat of vaporisation from the saturation table, and
// single-phase states (compressed liquid, vapour, supercritical) from the
// explicit pressure P(T, ρ). The pressure of a sealed vessel is then
// continuous at every phase boundary because the saturated states are
// states of the same surface.

// newEOSSubstance prepares a built-in fluid whose record is paired with a
// reference equation of state.
func newEOSSubstance(f *Fluid, e *EquationOfState) (*Substance, error) {
	if e.Fluid != f.ID {
		return nil, fmt.Errorf("%w: equation of state for %q paired with fluid %q", ErrInvalidFluid, e.Fluid, f.ID)
	}
	tLow := f.FreezingPoint.Value
	ref, err := newReferenceEOS(e, tLow)
	if err != nil {
		return nil, err
	}
	if err := f.validate(ref); err != nil {
		return nil, err
	}
	return newRefSubstance(f, ref)
}

func newRefSubstance(f *Fluid, ref *referenceEOS) (*Substance, error) {
	s := &Substance{
		fluid:     f,
		ref:       ref,
		tc:        ref.tc,
		pc:        ref.pc,
		rhoC:      ref.rhoCMol * ref.m,
		tMin:      f.FreezingPoint.Value,
		molarMass: ref.m,
	}
	tb, err := ref.sat()
	if err != nil {
		return nil, fmt.Errorf("%w: %s: %v", ErrInvalidFluid, f.ID, err)
	}
	// The saturated liquid is densest at the freezing point for every
	// fluid but water, whose maximum lies near 4 °C; above the maximum the
	// liquid density falls steadily to the critical point.
	s.tPeak = s.tMin
	prev := math.Inf(-1)
	for i := 0; i <= 400; i++ {
		t := s.tMin + (s.tc-s.tMin)*float64(i)/400
		_, rl, _, _ := tb.at(t)
		if rl <= prev {
			break
		}
		prev = rl
		s.tPeak = t
	}
	if s.tPeak > s.tMin {
		lo, hi := math.Max(s.tMin, s.tPeak-(s.tc-s.tMin)/400), s.tPeak+(s.tc-s.tMin)/400
		r, err := solve.Brent(func(t float64) float64 {
			const d = 1e-4
			_, a, _, _ := tb.at(t - d)
			_, b, _, _ := tb.at(t + d)
			return b - a
		}, lo, hi, 1e-8, 100)
		if err == nil {
			s.tPeak = r.X
		}
	}
	// The densest saturated liquid and the density search's upper bound
	// are fixed for the fluid: computed once here rather than on every
	// density solve and liquid-full search.
	_, rl, _, _ := tb.at(s.tPeak)
	s.peakLiquidDensity = rl * s.molarMass
	s.maxRefDensity = s.peakLiquidDensity + 3*s.rhoC
	return s, nil
}

// refFlags returns the flags for a state at t and pressure p (0 when not
// known) against the equation's stated range.
func (s *Substance) refFlags(t, p float64) Flags {
	r := &s.ref.file.Range
	var fl Flags
	if t < r.TMinK || t > r.TMaxK || p > r.PMaxPa {
		fl |= EquationOfStateExtrapolated
	}
	if t > s.tc {
		fl |= SupercriticalState
	}
	return fl
}

// refSaturation returns the saturated state at t from the table.
func (s *Substance) refSaturation(t float64) Saturation {
	sat := s.refSaturationNoCp(t)
	sat.LiquidHeatCapacity = s.liquidHeatCapacity(s.ref.table, t)
	return sat
}

// refSaturationNoCp is refSaturation without the liquid heat capacity
// (its own table series and an exponential), for the callers that need
// only pressures and densities.
func (s *Substance) refSaturationNoCp(t float64) Saturation {
	lnP, rl, rv, dh := s.ref.table.at(t)
	p := math.Exp(lnP)
	m := s.molarMass
	return Saturation{
		TemperatureK:       t,
		PressurePa:         p,
		LiquidDensity:      rl * m,
		VapourDensity:      rv * m,
		HeatOfVaporisation: dh / m,
		Flags:              s.refFlags(t, p) &^ SupercriticalState,
	}
}

// liquidHeatCapacity is the saturated liquid's heat capacity in J/(kg·K):
// from the equation where its file gives the ideal-gas part, else the
// record's value.
func (s *Substance) liquidHeatCapacity(tb *satTable, t float64) float64 {
	if s.ref.hasIdeal {
		return tb.liquidCp(t) / s.molarMass
	}
	return s.fluid.LiquidHeatCapacity.Value / s.molarMass
}

// refPressure is the explicit pressure of the equation at (t, rho in
// kg/m³).
func (s *Substance) refPressure(t, rho float64) float64 {
	return s.ref.h.pressure(t, rho/s.molarMass)
}

func (s *Substance) refSinglePhasePressure(t, rho float64) (float64, Flags, error) {
	if t < s.tc {
		rl, rv := s.ref.table.densities(t)
		rl, rv = rl*s.molarMass, rv*s.molarMass
		if rho > rv*(1+boundaryTolerance) && rho < rl*(1-boundaryTolerance) {
			return 0, 0, fmt.Errorf("%s: %.2f K at %.4g kg/m³ lies between the saturated vapour (%.4g kg/m³) and liquid (%.4g kg/m³): %w",
				s.fluid.Name, t, rho, rv, rl, ErrTwoPhase)
		}
	}
	p := s.refPressure(t, rho)
	if !finite(p) || p <= 0 {
		return 0, 0, fmt.Errorf("%s: density %.4g kg/m³ at %.2f K is beyond what the equation of state describes: %w", s.fluid.Name, rho, t, ErrOutOfDomain)
	}
	return p, s.refFlags(t, p), nil
}

// refDensity solves P(t, ρ) = p for ρ (kg/m³) between lo and hi, where
// the pressure rises with density, by Newton's method kept inside the
// bracket (a bisection step whenever Newton would leave it).
func (s *Substance) refDensity(t, p, guess, lo, hi float64) (float64, error) {
	h := s.ref.h
	m := s.molarMass
	rho := guess
	var c tauCache
	h.prepareTau(h.tr/t, &c)
	for i := 0; i < 100; i++ {
		var st stateAt
		st.p, st.dpdrho = h.pressureSlopeCached(t, rho/m, &c)
		f := st.p - p
		if math.Abs(f) <= 1e-12*p {
			return rho, nil
		}
		if f > 0 {
			hi = math.Min(hi, rho)
		} else {
			lo = math.Max(lo, rho)
		}
		next := rho
		if st.dpdrho > 0 {
			next = rho - f/(st.dpdrho/m)
		}
		if !(next > lo && next < hi) {
			next = 0.5 * (lo + hi)
		}
		if math.Abs(next-rho) <= 1e-13*rho {
			return next, nil
		}
		rho = next
	}
	return 0, fmt.Errorf("%s: no single-phase density at %.2f K and %.4g Pa: %w", s.fluid.Name, t, p, ErrOutOfDomain)
}

// refMaxDensity bounds the density search: three times the critical
// density beyond the densest saturated liquid (no liquid here is
// compressed that far below 1 GPa).
func (s *Substance) refMaxDensity() float64 { return s.maxRefDensity }

func (s *Substance) refCompressedLiquidDensity(t, p float64, sat Saturation) (float64, Flags, error) {
	rho, err := s.refDensity(t, p, sat.LiquidDensity, sat.LiquidDensity*(1-1e-9), s.refMaxDensity())
	if err != nil {
		return 0, 0, err
	}
	return rho, s.refFlags(t, p), nil
}

// refCompressedLiquidDensityAt is CompressedLiquidDensity on the
// equation-of-state route, with the same checks and errors, reading the
// saturation table once.
func (s *Substance) refCompressedLiquidDensityAt(t, p float64) (float64, Flags, error) {
	if err := s.checkTemperature(t); err != nil {
		return 0, 0, err
	}
	if t > s.tc {
		return 0, 0, fmt.Errorf("%s: temperature %.2f K is above the critical temperature %.2f K: %w", s.fluid.Name, t, s.tc, ErrSupercritical)
	}
	sat := s.refSaturationNoCp(t)
	ps := sat.PressurePa
	if math.IsNaN(p) || math.IsInf(p, 0) {
		return 0, 0, fmt.Errorf("%s: pressure %v Pa: %w", s.fluid.Name, p, ErrNotFinite)
	}
	if p < ps*(1-1e-12) {
		return 0, 0, fmt.Errorf("%s: pressure %.4g Pa is below the vapour pressure %.4g Pa at %.2f K, where the liquid boils: %w", s.fluid.Name, p, ps, t, ErrOutOfDomain)
	}
	return s.refCompressedLiquidDensity(t, math.Max(p, ps), sat)
}

func (s *Substance) refDensityAt(t, p float64) (float64, Flags, error) {
	if t <= s.tc {
		sat := s.refSaturationNoCp(t)
		if p >= sat.PressurePa {
			return s.refCompressedLiquidDensity(t, p, sat)
		}
		guess := math.Min(p*s.molarMass/(s.ref.h.r*t), sat.VapourDensity)
		rho, err := s.refDensity(t, p, guess, 0, sat.VapourDensity*(1+1e-9))
		return rho, s.refFlags(t, p), err
	}
	// Above Tc the isotherms rise monotonically; start from the ideal gas
	// or, at high pressure, from the critical density upward.
	guess := p * s.molarMass / (s.ref.h.r * t)
	if guess > s.rhoC {
		guess = s.rhoC
	}
	rho, err := s.refDensity(t, p, guess, 0, s.refMaxDensity())
	return rho, s.refFlags(t, p), err
}

// refLiquidFullTemperature finds the temperature above the liquid-density
// maximum at which the saturated liquid density equals rho.
func (s *Substance) refLiquidFullTemperature(rho float64) (float64, bool) {
	if rho >= s.peakLiquidDensity {
		return s.tMin, true
	}
	m := s.molarMass
	r, err := solve.Brent(func(t float64) float64 {
		rl, _ := s.ref.table.densities(t)
		return rl*m - rho
	}, s.tPeak, s.tc, 1e-10, 200)
	if err != nil {
		return s.tc, true
	}
	return r.X, true
}

func (s *Substance) refSaturationTemperature(p float64) (float64, error) {
	lnTarget := math.Log(p)
	r, err := solve.Brent(func(t float64) float64 {
		lnP, _, _, _ := s.ref.table.at(t)
		return lnP - lnTarget
	}, s.tMin, s.tc, 1e-10, 200)
	if err != nil {
		return 0, fmt.Errorf("%s: saturation temperature at %.4g Pa: %w", s.fluid.Name, p, err)
	}
	return r.X, nil
}

// EquationOfState returns the reference equation of state the substance
// uses, or nil for a fluid on the correlation route (or a nil substance).
// Callers must not
// modify it.
func (s *Substance) EquationOfState() *EquationOfState {
	if s == nil || s.ref == nil {
		return nil
	}
	return s.ref.file
}

// explainEOS fills an explanation for a property taken from the
// reference equation of state.
func (s *Substance) explainEOS(e *Explanation, t float64, what string) {
	r := s.ref
	f := r.file
	e.Correlation = r.explainName
	switch what {
	case "saturation":
		e.Equation = "P = ρRT(1 + δ·∂αr/∂δ) in both phases, with equal pressure and equal Gibbs energy g/RT = 1 + α° + αr + δ·∂αr/∂δ;  δ = ρ/ρr, τ = Tr/T"
	default:
		e.Equation = "P = ρRT(1 + δ·∂αr/∂δ),  δ = ρ/ρr, τ = Tr/T"
	}
	e.Terms = []Term{{Symbol: "T", Value: t, Unit: "K"},
		{Symbol: "Tr", Value: f.Reducing.TemperatureK, Unit: "K", Source: r.citation},
		{Symbol: "ρr", Value: f.Reducing.DensityMolM3 * f.MolarMass, Unit: "kg/m³", Source: r.citation},
		{Symbol: "R", Value: f.GasConstant, Unit: "J/(mol·K)", Source: r.citation},
		{Symbol: "M", Value: f.MolarMass, Unit: "kg/mol", Source: r.citation},
	}
	e.Source = r.source
	e.Note = r.notes[uncertaintyFor(e.Quantity)]
}

// explainTexts prepares the fixed texts of explanations once.
func (r *referenceEOS) explainTexts() {
	f := r.file
	r.citation = f.Paper.Citation()
	r.source = r.citation + ". " + f.Transcription
	r.explainName = "reference equation of state, " + f.Name
	base := fmt.Sprintf("The equation's stated range is %.2f–%.2f K and up to %.4g MPa; %d terms in the residual Helmholtz energy.",
		f.Range.TMinK, f.Range.TMaxK, f.Range.PMaxPa/1e6, len(f.Residual))
	r.notes = map[string]string{"": base}
	for _, u := range f.Uncertainty {
		r.notes[u.Property] = base + " Stated uncertainty: " + u.Statement + " (" + u.Source + ")."
	}
	for _, p := range []string{PropertyVapourPressure, PropertyLiquidDensity, PropertyVapourDensity} {
		if _, ok := r.notes[p]; !ok {
			r.notes[p] = base
		}
	}
}

func uncertaintyFor(quantity string) string {
	switch quantity {
	case "vapour pressure":
		return PropertyVapourPressure
	case "saturated liquid density":
		return PropertyLiquidDensity
	case "saturated vapour density":
		return PropertyVapourDensity
	}
	return ""
}

// IsochoricSlope returns (∂P/∂T)_ρ in Pa/K of the single-phase fluid at
// temperature t (K) and density rho (kg/m³): the rate at which a
// liquid-full vessel's pressure climbs. On the equation-of-state route it
// is explicit, ρR(1 + δ αr_δ − δτ αr_δτ); on the correlation route it is a
// central difference of SinglePhasePressure over ±0.01 K. It fails where
// SinglePhasePressure fails.
func (s *Substance) IsochoricSlope(t, rho float64) (float64, error) {
	if _, _, err := s.SinglePhasePressure(t, rho); err != nil {
		return 0, err
	}
	if s.ref != nil {
		return s.ref.h.state(t, rho/s.molarMass).dpdt, nil
	}
	const h = 0.01
	a, _, err1 := s.SinglePhasePressure(t, rho)
	b, _, err2 := s.SinglePhasePressure(t+h, rho)
	if err1 != nil || err2 != nil {
		return 0, fmt.Errorf("%s: isochoric slope at %.2f K, %.4g kg/m³: %w", s.fluid.Name, t, rho, ErrOutOfDomain)
	}
	return (b - a) / h, nil
}

// Isotherm is a fluid's reference equation of state prepared at one
// temperature, for solvers that evaluate many densities at that
// temperature: the temperature factors of every term are computed once.
// The zero value is not usable; see Substance.PrepareIsotherm.
type Isotherm struct {
	s *Substance
	t float64
	c tauCache
}

// HasReferenceEOS reports whether the substance's properties come from a
// reference equation of state (PrepareIsotherm then prepares isotherms).
func (s *Substance) HasReferenceEOS() bool { return s != nil && s.ref != nil }

// PrepareIsotherm prepares it for temperature t (K) and reports whether
// the fluid has a reference equation of state; on the correlation route
// it returns false and leaves it unusable.
func (s *Substance) PrepareIsotherm(t float64, it *Isotherm) bool {
	if s == nil || s.ref == nil {
		return false
	}
	it.s, it.t = s, t
	s.ref.h.prepareTau(s.ref.h.tr/t, &it.c)
	return true
}

// PressureSlope returns the equation's pressure P(T, ρ) in Pa and its
// slope (∂P/∂ρ)_T in Pa per kg/m³ at density rho (kg/m³), without any
// phase test: the same pressure SinglePhasePressure gives for a
// single-phase state.
func (it *Isotherm) PressureSlope(rho float64) (p, dpdrho float64) {
	s := it.s
	p, dpdrho = s.ref.h.pressureSlopeCached(it.t, rho/s.molarMass, &it.c)
	return p, dpdrho / s.molarMass
}

// Flags returns the flags CompressedLiquidDensity reports for a liquid
// at pressure p (Pa) on this isotherm.
func (it *Isotherm) Flags(p float64) Flags { return it.s.refFlags(it.t, p) }

// MaxDensity returns the top of the density range CompressedLiquidDensity
// searches, in kg/m³.
func (it *Isotherm) MaxDensity() float64 { return it.s.maxRefDensity }
