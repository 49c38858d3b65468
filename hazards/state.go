package hazards

import (
	"errors"
	"fmt"
	"math"
	"sync"

	"ullage/fluids"
	"ullage/fluids/solve"
	"ullage/fluids/units"
)

// Phase is the state of the fluid in the sealed vessel.
type Phase string

// The phases a sealed vessel can be in.
const (
	PhaseTwoPhase      Phase = "two-phase"
	PhaseLiquidFull    Phase = "liquid-full"
	PhaseVapour        Phase = "vapour"
	PhaseSupercritical Phase = "supercritical"
)

// VesselState is the sealed vessel at one temperature.
type VesselState struct {
	TemperatureK float64
	Phase        Phase
	// PressurePa is the absolute internal pressure; GasPressurePa the part
	// of it due to residual non-condensable gas.
	PressurePa    float64
	GasPressurePa float64
	// UllagePercent is the vapour (and gas) space as a percentage of the
	// internal volume.
	UllagePercent float64
	LiquidMassKg  float64
	VapourMassKg  float64
	// VapourDensity is the density of the vapour in the ullage (kg/m³),
	// LiquidDensity that of the liquid; zero where the phase is absent.
	VapourDensity float64
	LiquidDensity float64
	// Flags says which correlations were stretched for this state.
	Flags fluids.Flags
}

// sealedVessel is a fixed mass of fluid and residual gas in a rigid
// vessel. The glass's own expansion (about 3·α·ΔT, under 0.3 % over 100 K
// for soda-lime) is neglected, which errs on the safe side: it would give
// the liquid slightly more room.
type sealedVessel struct {
	fluid     *fluids.Substance
	mass      float64 // kg
	volume    float64 // m³
	gasMoles  float64 // mol of residual gas
	density   float64 // overall fill density, kg/m³
	ambientPa float64
	// criticalOffset carries the gas-bubble model's pressure at Tc into
	// the supercritical region, where the gas is mixed with the fluid by
	// Dalton's law, so that the curve stays continuous at Tc (non-zero
	// only for a liquid-like fill with residual gas).
	offsetOnce     sync.Once
	criticalOffset float64
	// iso is the fluid at the fill density, which finds its dew or bubble
	// temperature once for every single-phase state of the vessel; sats
	// the saturated states worked out once for the assessment's fixed
	// temperatures (nil for none).
	iso  fluids.Isochore
	sats *satMemo
}

// satMemo holds what the vessels of one assessment (or one tolerance
// study) need again and again at the few temperatures they keep returning
// to, the sealing, hottest and coldest temperatures: the saturated state,
// and the compressed liquid prepared for the gas-bubble solve. It is
// filled once and only read after, so vessels share it across goroutines.
// Every value is what the direct call gives.
type satMemo struct {
	// gas says the compressed liquid is prepared (liq or eos).
	gas bool
	// direct says the gas-bubble solve on the correlation route runs
	// Brent over its whole bracket, without the warm start
	// (withGasBubbleBrentOn): the reference the tests hold the warm
	// start to.
	direct bool
	n      int
	t      [3]float64
	sat    [3]fluids.Saturation
	liq    []fluids.LiquidIsotherm // len(t) when gas on the correlation route, else nil
	eos    []fluids.Isotherm       // len(t) when gas on the equation of state's route, else nil
	hasEOS [3]bool
	// isotherms, when set (UnitModel.TabulateHottest), prepares the
	// compressed liquid at the other temperatures of a tolerance study
	// from a table, within its stated error bound; nil for Assess, which
	// always prepares it directly.
	isotherms *fluids.IsothermTable
}

// newSatMemo works out the saturated states of s at the given
// temperatures (SaturationNoHeatCapacity), leaving out those it has none
// for, and, when gas is true (residual gas), prepares the compressed
// liquid there.
func newSatMemo(s *fluids.Substance, gas bool, temps ...float64) *satMemo {
	m := &satMemo{gas: gas}
	if gas && s.HasReferenceEOS() {
		m.eos = make([]fluids.Isotherm, len(m.t))
	}
	for _, t := range temps {
		if m.n == len(m.t) {
			break
		}
		if _, ok := m.find(t); ok || !(t <= s.CriticalTemperature()) {
			continue
		}
		sat, err := s.SaturationNoHeatCapacity(t)
		if err != nil {
			continue
		}
		i := m.n
		m.t[i], m.sat[i] = t, sat
		if gas {
			m.hasEOS[i] = m.eos != nil && s.PrepareIsotherm(t, &m.eos[i])
			if !m.hasEOS[i] {
				if m.liq == nil {
					m.liq = make([]fluids.LiquidIsotherm, len(m.t))
				}
				s.PrepareLiquidIsotherm(t, &m.liq[i])
			}
		}
		m.n++
	}
	return m
}

// find returns the index of temperature t in the memo.
func (m *satMemo) find(t float64) (int, bool) {
	if m == nil {
		return 0, false
	}
	for i := 0; i < m.n; i++ {
		if m.t[i] == t {
			return i, true
		}
	}
	return 0, false
}

// saturation returns the saturated state at t from the memo, or as
// SaturationNoHeatCapacity gives it: every value but the liquid heat
// capacity, which the vessel never uses.
func (m *satMemo) saturation(s *fluids.Substance, t float64) (fluids.Saturation, error) {
	if i, ok := m.find(t); ok {
		return m.sat[i], nil
	}
	return s.SaturationNoHeatCapacity(t)
}

// ErrOverfilled: the fill would not fit as liquid at the sealing
// temperature.
var ErrOverfilled = errors.New("the fill does not fit in the vessel")

// newSealedVessel seals mass kg of fluid s and residual gas at residualPa
// into volume m³ at sealK.
func newSealedVessel(s *fluids.Substance, mass, volume, sealK, residualPa, ambientPa float64) (*sealedVessel, error) {
	return newSharedVessel(s, mass, volume, sealK, residualPa, ambientPa, nil)
}

// newSharedVessel is newSealedVessel with the saturated states of sats
// (nil for none) at hand.
func newSharedVessel(s *fluids.Substance, mass, volume, sealK, residualPa, ambientPa float64, sats *satMemo) (*sealedVessel, error) {
	v := new(sealedVessel)
	if err := v.seal(s, mass, volume, sealK, residualPa, ambientPa, sats); err != nil {
		return nil, err
	}
	return v, nil
}

// seal makes v the vessel newSharedVessel makes, reusing its memory (for
// a search that seals vessel after vessel); v must not be in use.
func (v *sealedVessel) seal(s *fluids.Substance, mass, volume, sealK, residualPa, ambientPa float64, sats *satMemo) error {
	*v = sealedVessel{fluid: s, mass: mass, volume: volume, density: mass / volume, ambientPa: ambientPa, sats: sats}
	s.PrepareIsochore(v.density, &v.iso)
	if sealK > s.CriticalTemperature() {
		return &InputError{Field: FieldSealingTemperature, Value: fmt.Sprintf("%g", sealK),
			Want: fmt.Sprintf("must be below the critical temperature of %s (%.2f K) so that the fill can be sealed as a liquid", s.Fluid().Name, s.CriticalTemperature()),
			Rule: RuleBelow, Max: s.CriticalTemperature(), Unit: "K", Subject: "the critical temperature of " + s.Fluid().Name}
	}
	sat, err := sats.saturation(s, sealK)
	if err != nil {
		return &InputError{Field: FieldSealingTemperature, Value: fmt.Sprintf("%g", sealK), Want: err.Error()}
	}
	if v.density >= sat.LiquidDensity {
		maxFill := sat.LiquidDensity * volume
		return fmt.Errorf("%w: %w", &InputError{Field: FieldFillMass, Value: fmt.Sprintf("%g", mass),
			Want: fmt.Sprintf("must be less than %.4g kg: that much %s, as liquid, already fills the whole %.4g m³ at the sealing temperature", maxFill, s.Fluid().Name, volume),
			Rule: RuleBelow, Max: maxFill, Unit: "kg", Subject: "the mass of " + s.Fluid().Name + " that, as liquid, fills the whole vessel at the sealing temperature"}, ErrOverfilled)
	}
	v.sealGas(sat, residualPa, sealK)
	return nil
}

// sealGas sets the moles of residual gas sealed in at residualPa and
// sealK, where sat is the saturated state: the gas fills the space the
// liquid leaves.
func (v *sealedVessel) sealGas(sat fluids.Saturation, residualPa, sealK float64) {
	gasSpace := v.volume
	if v.density > sat.VapourDensity {
		gasSpace = (sat.LiquidDensity*v.volume - v.mass) / (sat.LiquidDensity - sat.VapourDensity)
	}
	v.gasMoles = residualPa * gasSpace / (units.GasConstant * sealK)
}

// liquidFullTemperature returns the temperature at which the saturated
// liquid alone fills the vessel, and false when the fill density is at or
// below the critical density.
func (v *sealedVessel) liquidFullTemperature() (float64, bool) {
	return v.fluid.LiquidFullTemperature(v.density)
}

// state returns the vessel's state at temperature t (K).
func (v *sealedVessel) state(t float64) (VesselState, error) {
	s := v.fluid
	if t < s.MinTemperature() || !isFinite(t) {
		return VesselState{}, &InputError{Field: "temperature", Value: fmt.Sprintf("%g K", t),
			Want: fmt.Sprintf("must be at or above the freezing point of %s (%.2f K, %.2f °C)", s.Fluid().Name, s.MinTemperature(), units.KelvinToCelsius(s.MinTemperature())),
			Rule: RuleAtLeast, Min: s.MinTemperature(), Unit: "K", Subject: "the freezing point of " + s.Fluid().Name}
	}
	st := VesselState{TemperatureK: t}
	gasP := func(space float64) float64 { return v.gasMoles * units.GasConstant * t / space }
	if t > s.CriticalTemperature() {
		st, err := v.supercritical(t)
		st.PressurePa += v.offsetAtCritical()
		return st, err
	}
	sat, err := v.sats.saturation(s, t)
	if err != nil {
		return st, err
	}
	st.Flags = sat.Flags
	if v.density <= sat.VapourDensity {
		// All vapour: the liquid has evaporated.
		p, fl, err := v.singlePhase(t, sat)
		if err != nil {
			return st, err
		}
		st.Phase = PhaseVapour
		st.GasPressurePa = gasP(v.volume)
		st.PressurePa = p + st.GasPressurePa
		st.UllagePercent = 100
		st.VapourMassKg = v.mass
		st.VapourDensity = v.density
		st.Flags |= fl
		return st, nil
	}
	if v.density >= sat.LiquidDensity {
		st.Phase = PhaseLiquidFull
	} else {
		st.Phase = PhaseTwoPhase
	}
	if v.gasMoles == 0 {
		if st.Phase == PhaseLiquidFull {
			p, fl, err := v.singlePhase(t, sat)
			if err != nil {
				return st, err
			}
			st.PressurePa = p
			st.LiquidMassKg = v.mass
			st.LiquidDensity = v.density
			st.Flags |= fl
			return st, nil
		}
		liquidVolume := (v.mass - sat.VapourDensity*v.volume) / (sat.LiquidDensity - sat.VapourDensity)
		st.PressurePa = sat.PressurePa
		st.UllagePercent = 100 * (1 - liquidVolume/v.volume)
		st.LiquidMassKg = liquidVolume * sat.LiquidDensity
		st.VapourMassKg = v.mass - st.LiquidMassKg
		st.LiquidDensity = sat.LiquidDensity
		st.VapourDensity = sat.VapourDensity
		return st, nil
	}
	return v.withGasBubble(st, sat)
}

// offsetAtCritical computes, once and only when a supercritical state is
// asked for, the pressure step between the gas-bubble model just below Tc
// and the Dalton mixture just above it.
func (v *sealedVessel) offsetAtCritical() float64 {
	v.offsetOnce.Do(func() {
		s := v.fluid
		if v.gasMoles == 0 || v.density <= s.CriticalDensity() {
			return
		}
		tc := s.CriticalTemperature()
		below, err1 := v.state(tc)
		above, err2 := v.supercritical(tc)
		if err1 == nil && err2 == nil {
			v.criticalOffset = below.PressurePa - above.PressurePa
		}
	})
	return v.criticalOffset
}

// supercritical returns the state above Tc, the residual gas mixed with
// the fluid by Dalton's law, without the continuity offset.
func (v *sealedVessel) supercritical(t float64) (VesselState, error) {
	s := v.fluid
	st := VesselState{TemperatureK: t, Phase: PhaseSupercritical}
	p, fl, err := v.iso.Pressure(t)
	if err != nil {
		return st, err
	}
	st.GasPressurePa = v.gasMoles * units.GasConstant * t / v.volume
	st.PressurePa = p + st.GasPressurePa
	if v.density <= s.CriticalDensity() {
		st.UllagePercent = 100
	}
	st.VapourMassKg = v.mass
	st.Flags = fl | fluids.SupercriticalState
	return st, nil
}

// singlePhase evaluates the fluid alone at the fill density, treating a
// state a rounding error inside the saturation boundary as on it.
func (v *sealedVessel) singlePhase(t float64, sat fluids.Saturation) (float64, fluids.Flags, error) {
	p, fl, err := v.iso.Pressure(t)
	if errors.Is(err, fluids.ErrTwoPhase) {
		return sat.PressurePa, 0, nil
	}
	return p, fl, err
}

// withGasBubble solves for the gas space when residual gas shares it with
// saturated vapour: the liquid, compressed to the total pressure, and the
// gas space together fill the vessel,
//
//	V_g + (m − ρ_v V_g)/ρ_l(T, P_sat + nRT/V_g) = V,
//
// solved for ln V_g by Brent's method. The same equation covers the
// approach to liquid-full and beyond, where the gas is squeezed into an
// ever smaller bubble, so the pressure rises continuously.
func (v *sealedVessel) withGasBubble(st VesselState, sat fluids.Saturation) (VesselState, error) {
	s := v.fluid
	t := st.TemperatureK
	nrt := v.gasMoles * units.GasConstant * t
	if v.mass-sat.VapourDensity*v.volume <= 0 {
		return st, fmt.Errorf("internal: gas bubble asked for an all-vapour state at %.2f K", t)
	}
	if i, ok := v.sats.find(t); ok && v.sats.gas {
		if v.sats.hasEOS[i] {
			return v.withGasBubbleEOS(st, sat, nrt, &v.sats.eos[i])
		}
		return v.withGasBubbleBrentOn(st, sat, nrt, &v.sats.liq[i])
	}
	var iso fluids.Isotherm
	if v.sats != nil && v.sats.isotherms.Prepare(t, &iso) || s.PrepareIsotherm(t, &iso) {
		return v.withGasBubbleEOS(st, sat, nrt, &iso)
	}
	return v.withGasBubbleBrent(st, sat, nrt)
}

// withGasBubbleBrent is withGasBubble by Brent's method on ln V_g, each
// step solving for the compressed-liquid density: the correlation route,
// and the check on the equation-of-state route's own solver.
func (v *sealedVessel) withGasBubbleBrent(st VesselState, sat fluids.Saturation, nrt float64) (VesselState, error) {
	var liq fluids.LiquidIsotherm
	v.fluid.PrepareLiquidIsotherm(st.TemperatureK, &liq)
	return v.withGasBubbleBrentOn(st, sat, nrt, &liq)
}

// withGasBubbleBrentOn is withGasBubbleBrent with the compressed liquid
// prepared at the state's temperature.
func (v *sealedVessel) withGasBubbleBrentOn(st VesselState, sat fluids.Saturation, nrt float64, liq *fluids.LiquidIsotherm) (VesselState, error) {
	t := st.TemperatureK
	var flags fluids.Flags
	// Brent evaluates the first bracket's ends again, and the state is
	// read at a point already evaluated: each value is kept (the residual
	// is a pure function of ln V_g, so this changes nothing but the work).
	var seen residualMemo
	residual := func(lnVg float64) float64 {
		if r, fl, ok := seen.find(lnVg); ok {
			if !math.IsNaN(r) {
				flags = fl
			}
			return r
		}
		vg := math.Exp(lnVg)
		p := sat.PressurePa + nrt/vg
		rhoL, fl, err := liq.Density(p)
		if err != nil {
			seen.add(lnVg, math.NaN(), 0)
			return math.NaN()
		}
		flags = fl
		r := vg + (v.mass-sat.VapourDensity*vg)/rhoL - v.volume
		seen.add(lnVg, r, fl)
		return r
	}
	hi := math.Log(v.volume)
	if v.mass-sat.VapourDensity*v.volume <= 0 {
		return st, fmt.Errorf("internal: gas bubble asked for an all-vapour state at %.2f K", t)
	}
	if v.sats == nil || !v.sats.direct {
		// The gas space the liquid leaves at its saturated density, a
		// little short of the root (the gas squeezes the liquid), starts
		// a secant search.
		liquidVolume := (v.mass - sat.VapourDensity*v.volume) / (sat.LiquidDensity - sat.VapourDensity)
		if vg0 := v.volume - liquidVolume; vg0 > 0 {
			if y, ok := secantBracketed(residual, math.Log(vg0), vg0*(1-sat.VapourDensity/sat.LiquidDensity), gasBubbleTolerance, hi); ok {
				return v.finishGasBubble(st, sat, nrt, y, residual, &flags), nil
			}
		}
	}
	lo := hi + math.Log(1e-3)
	for i := 0; !(residual(lo) <= 0); i++ {
		if i > 20 {
			// The compressed-liquid correlation cannot squeeze the liquid
			// into the vessel (near the critical point): no bubble left.
			return v.withoutBubble(st, sat)
		}
		lo += math.Log(1e-2)
	}
	r, err := solve.Brent(residual, lo, hi, gasBubbleTolerance, 200)
	if err != nil {
		return v.withoutBubble(st, sat)
	}
	return v.finishGasBubble(st, sat, nrt, r.X, residual, &flags), nil
}

// gasBubbleTolerance is the tolerance in ln V_g of the gas-bubble solve
// on the correlation route: Brent's, and the bracket the warm start's
// secant steps are confirmed in (secantBracketed).
const gasBubbleTolerance = 1e-10

// finishGasBubble is the state with gas space exp(y), the root of
// residual, whose flags residual leaves in flags.
func (v *sealedVessel) finishGasBubble(st VesselState, sat fluids.Saturation, nrt, y float64, residual func(float64) float64, flags *fluids.Flags) VesselState {
	vg := math.Exp(y)
	residual(y)
	st.GasPressurePa = nrt / vg
	st.PressurePa = sat.PressurePa + st.GasPressurePa
	st.UllagePercent = 100 * vg / v.volume
	st.VapourMassKg = sat.VapourDensity * vg
	st.LiquidMassKg = v.mass - st.VapourMassKg
	st.VapourDensity = sat.VapourDensity
	st.LiquidDensity = st.LiquidMassKg / (v.volume - vg)
	st.Flags |= *flags
	return st
}

// secantBracketed finds the root of a smooth rising f from y0, where its
// slope is about slope0, by secant steps, and returns the last step's y
// only when f changes sign between y and y ± tol/2 (on the side the
// root lies, by the sign of f(y)), so that y is within tol/2 of a true
// root: Brent's own guarantee for a tolerance tol. ok is false when the
// steps do not settle or the bracket is not confirmed; the caller then
// solves from scratch.
func secantBracketed(f func(float64) float64, y0, slope0, tol, top float64) (float64, bool) {
	f0 := f(y0)
	if !isFinite(f0) || !(slope0 > 0) {
		return 0, false
	}
	y1 := y0 - f0/slope0
	h := 0.5 * tol
	for i := 0; i < 12; i++ {
		if !isFinite(y1) || y1+h >= top {
			return 0, false
		}
		f1 := f(y1)
		switch {
		case !isFinite(f1):
			return 0, false
		case f1 == 0:
			return y1, true
		}
		step := 0.0
		if f1 != f0 {
			step = -f1 * (y1 - y0) / (f1 - f0)
		}
		if math.Abs(step) <= 0.25*h {
			if f1 < 0 && f(y1+h) >= 0 || f1 > 0 && f(y1-h) <= 0 {
				return y1, true
			}
			return 0, false
		}
		y0, f0, y1 = y1, f1, y1+step
	}
	return 0, false
}

// newtonStopStep is the Newton step in ln V_g below which the gas-bubble
// solver stops: its square, 1e-12, is far below the 1e-10 in ln V_g that
// the general solver (Brent) is asked for.
const newtonStopStep = 1e-6

// withGasBubbleEOS solves the gas-bubble equation of withGasBubble on the
// equation-of-state route, where the liquid's pressure P(T, ρ) and its
// slope are explicit. Writing the liquid density as a function of the gas
// space, ρ(V_g) = (m − ρ_v V_g)/(V − V_g), the equation is
//
//	F(V_g) = P(T, ρ(V_g)) − P_sat − nRT/V_g = 0,
//
// the same equation as withGasBubble's (whose inner step solves
// P(T, ρ) = P_sat + nRT/V_g for ρ), with the liquid held at no less than
// CompressedLiquidDensity's lower bound ρ_sat(1 − 10⁻⁹). F rises with V_g,
// so the root is unique. It is found by Newton's method in ln V_g kept
// inside a bracket (a bisection step whenever Newton would leave it),
// started from the root of the quadratic that linearises P about the
// smallest admissible gas space: one pressure evaluation per step instead
// of a density solve. Where the equation has no solution the equation of
// state can give, the state is withoutBubble's, as on the general route.
func (v *sealedVessel) withGasBubbleEOS(st VesselState, sat fluids.Saturation, nrt float64, iso *fluids.Isotherm) (VesselState, error) {
	m, vol, rv, ps := v.mass, v.volume, sat.VapourDensity, sat.PressurePa
	rhoOf := func(vg float64) float64 { return (m - rv*vg) / (vol - vg) }
	vgOf := func(rho float64) float64 { return (rho*vol - m) / (rho - rv) }
	// dρ/dV_g = (m − ρ_v V)/(V − V_g)², positive.
	slope := func(vg float64) float64 { d := vol - vg; return (m - rv*vol) / (d * d) }
	lo, hi := sat.LiquidDensity*(1-1e-9), iso.MaxDensity()
	rhoA, vgA := v.density, 0.0
	if rhoA < lo {
		rhoA, vgA = lo, vgOf(lo)
	}
	pA, kA := iso.PressureSlope(rhoA)
	if !isFinite(pA) || !isFinite(kA) {
		return v.withoutBubble(st, sat)
	}
	vg := vgA
	if vgA == 0 || pA-ps-nrt/vgA < 0 {
		vgHi := vgOf(hi)
		if !(vgHi > vgA) {
			// No solution the equation can give: as the general solver.
			return v.withoutBubble(st, sat)
		}
		// Start: P ≈ pA + kA·c·(V_g − V_gA) with c = dρ/dV_g at V_gA,
		// so a·V_g² + b·V_g − nRT = 0.
		a := kA * slope(vgA)
		b := pA - ps - a*vgA
		x := 2 * nrt / (b + math.Sqrt(b*b+4*a*nrt))
		yLo, yHi := math.Inf(-1), math.Log(vgHi)
		if vgA > 0 {
			yLo = math.Log(vgA)
		}
		y := math.Log(x)
		if !(y > yLo && y < yHi) {
			y = yHi
		}
		converged, sawAbove := false, false
		if vgA > 0 && math.Abs(y-yLo) <= newtonStopStep {
			// The start is a step from the evaluated state at V_gA,
			// exact in the gas term and linear in the liquid's pressure:
			// the stopping rule of the Newton steps below applies to it.
			vg, converged = x, true
		}
		for i := 0; i < 200 && !converged; i++ {
			vg = math.Exp(y)
			p, k := iso.PressureSlope(rhoOf(vg))
			gas := nrt / vg
			f := p - ps - gas
			next := math.NaN()
			switch {
			case !isFinite(f) || !(p > 0) || !(k > 0):
				// Denser than the equation describes (or than the
				// liquid can be compressed): the root lies below.
				yHi, sawAbove = y, true
			case math.Abs(f) <= 1e-12*(ps+gas):
				converged = true
			case f > 0:
				yHi, sawAbove = y, true
			default:
				yLo = y
			}
			if converged {
				break
			}
			newton := false
			if isFinite(f) && k > 0 {
				next = y - f/(k*slope(vg)*vg+gas)
				newton = next > yLo && next < yHi
			}
			if newton && math.Abs(next-y) <= newtonStopStep {
				// Newton converges quadratically: the error left after
				// this step is about (F''/2F')·Δy², and F varies on a
				// scale of order one in ln V_g, so under 1e-11.
				y, converged = next, true
				vg = math.Exp(y)
				break
			}
			if !(next > yLo && next < yHi) {
				if math.IsInf(yLo, -1) {
					next = y - 1
				} else {
					next = 0.5 * (yLo + yHi)
				}
			}
			if math.Abs(next-y) <= 1e-13 && sawAbove {
				y, converged = next, true
				vg = math.Exp(y)
				break
			}
			y = next
		}
		if !converged {
			// No solution the equation can give: as the general solver.
			return v.withoutBubble(st, sat)
		}
	}
	st.GasPressurePa = nrt / vg
	st.PressurePa = ps + st.GasPressurePa
	st.UllagePercent = 100 * vg / vol
	st.VapourMassKg = rv * vg
	st.LiquidMassKg = m - st.VapourMassKg
	st.VapourDensity = rv
	st.LiquidDensity = st.LiquidMassKg / (vol - vg)
	st.Flags |= iso.Flags(st.PressurePa)
	return st, nil
}

// withoutBubble is the state when the gas-bubble equation has no solution
// the correlations can give, as a hair from the critical point with a
// liquid-like fill: liquid-full, the residual gas squeezed to a bubble of
// negligible volume at the liquid's pressure, P = P_liquid(T, m/V); below
// the saturated liquid density the liquid is taken as incompressible,
// P = P_sat + nRT/V_g. The state is flagged as stretched so that the
// findings built on it say so.
func (v *sealedVessel) withoutBubble(st VesselState, sat fluids.Saturation) (VesselState, error) {
	t := st.TemperatureK
	nrt := v.gasMoles * units.GasConstant * t
	if v.density < sat.LiquidDensity {
		liquidVolume := (v.mass - sat.VapourDensity*v.volume) / (sat.LiquidDensity - sat.VapourDensity)
		vg := v.volume - liquidVolume
		st.Phase = PhaseTwoPhase
		st.GasPressurePa = nrt / vg
		st.PressurePa = sat.PressurePa + st.GasPressurePa
		st.UllagePercent = 100 * vg / v.volume
		st.LiquidMassKg = liquidVolume * sat.LiquidDensity
		st.VapourMassKg = v.mass - st.LiquidMassKg
		st.LiquidDensity, st.VapourDensity = sat.LiquidDensity, sat.VapourDensity
		st.Flags |= fluids.CompressedLiquidExtrapolated
		return st, nil
	}
	p, fl, err := v.singlePhase(t, sat)
	if err != nil {
		return st, fmt.Errorf("%s at %.2f K: the liquid cannot be compressed into the vessel: %w", v.fluid.Fluid().Name, t, err)
	}
	st.Phase = PhaseLiquidFull
	st.PressurePa = math.Max(p, sat.PressurePa)
	st.GasPressurePa = 0
	st.UllagePercent = 100 * nrt / st.PressurePa / v.volume
	st.LiquidMassKg = v.mass
	st.LiquidDensity = v.density
	st.Flags |= fl | fluids.CompressedLiquidExtrapolated
	return st, nil
}

// residualMemo keeps the values of a residual already evaluated, by the
// exact argument, with the flags that came with them: a small table
// addressed by the argument's bits, where a later value takes the place
// of an earlier one of the same slot. The residual is a pure function, so
// a value not found is worked out again, to the same result.
type residualMemo struct {
	filled uint32 // the slots holding a value, one bit each
	x      [32]float64
	r      [32]float64
	fl     [32]fluids.Flags
}

// residualSlot is the slot of argument x: the top five bits of its bits
// multiplied by an odd constant (Fibonacci hashing, from memory).
func residualSlot(x float64) uint {
	return uint((math.Float64bits(x) * 0x9e3779b97f4a7c15) >> 59)
}

func (m *residualMemo) find(x float64) (float64, fluids.Flags, bool) {
	if i := residualSlot(x); m.filled&(1<<i) != 0 && m.x[i] == x {
		return m.r[i], m.fl[i], true
	}
	return 0, 0, false
}

func (m *residualMemo) add(x, r float64, fl fluids.Flags) {
	i := residualSlot(x)
	m.x[i], m.r[i], m.fl[i] = x, r, fl
	m.filled |= 1 << i
}
