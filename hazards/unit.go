package hazards

import (
	"fmt"
	"math"
	"sync"

	"ullage/fluids"
)

// UnitModel is a design prepared for evaluating many manufactured units
// quickly, for sampled tolerance studies. The fluid and the glass are
// looked up and the design is validated once; Evaluate then computes only
// what differs from unit to unit (the vessel state at the unit's hottest
// temperature, the hoop stresses of its walls and the strength of its
// stressed area) and skips the searches for the maximum safe temperature
// and fill, the rupture and release models and the findings. The physics
// is the same code Assess uses. A UnitModel is safe for concurrent use.
type UnitModel struct {
	design Design
	sub    *fluids.Substance
	glass  Glass
	// sealLiquidDensity is the saturated liquid density at the sealing
	// temperature and durationFactor the static-fatigue factor of the load
	// duration (Strength.DurationFactor), both the same for every unit.
	sealLiquidDensity float64
	durationFactor    float64
	// sealSat is the saturated state at the sealing temperature, which
	// fixes every unit's residual gas.
	sealSat fluids.Saturation
	// sats holds the saturated states at the sealing temperature and the
	// design's hottest temperature, shared by every unit's vessel.
	sats *satMemo
	// vessels recycles the per-unit sealed vessels, which would otherwise
	// be a million small allocations for a million units.
	vessels sync.Pool
}

// Unit holds one manufactured unit's own values of the inputs that vary
// from unit to unit. SI units.
type Unit struct {
	FillMassKg float64
	// VolumeM3 is the unit's internal volume; 0 means compute it from the
	// parts with this unit's walls.
	VolumeM3 float64
	// WallThicknessM holds one wall thickness per part of the design, in
	// the design's order; nil keeps the design's walls.
	WallThicknessM []float64
	HottestK       float64
}

// UnitResult is one unit at its hottest temperature.
type UnitResult struct {
	// VolumeM3 is the internal volume used.
	VolumeM3 float64
	// Hot is the vessel state at the unit's hottest temperature.
	Hot VesselState
	// LiquidFullK is the temperature at which the unit goes liquid-full
	// (see fluids.Substance.LiquidFullTemperature); LiquidFull is true when
	// that happens below the unit's hottest temperature.
	LiquidFullK float64
	LiquidFull  bool
	// StressPerPascal is the largest hoop stress per pascal of internal
	// overpressure of any part; HoopStressPa that stress at the hottest
	// temperature (zero when the unit is not over-pressurised).
	StressPerPascal float64
	HoopStressPa    float64
	// LongTermBurstPa is the overpressure at which 63.2 % of units with
	// these walls fail under the load held for Design.HoursAtHottest.
	LongTermBurstPa float64
	// EffectiveStrengthPa is the Weibull scale stress (63.2 % failure) of
	// the unit's stressed glass, for the load duration, referred to its most
	// stressed part: LongTermBurstPa × StressPerPascal. A unit whose own
	// strength, a Weibull draw with this scale and the glass's modulus, is
	// below HoopStressPa bursts (weakest-link model, see Strength).
	EffectiveStrengthPa float64
	// BurstSafetyFactor and FailureProbability are as in Assessment.
	BurstSafetyFactor  float64
	FailureProbability float64
}

// NewUnitModel validates the design, looks up its fluid and glass and
// returns a model for Evaluate. Errors are those of Assess: an *InputError
// wrapping ErrInvalidInput for bad input.
func NewUnitModel(d Design, lib *fluids.Library) (*UnitModel, error) {
	sub, glass, err := prepare(d, lib)
	if err != nil {
		return nil, err
	}
	if d.SealingTemperatureK < sub.MinTemperature() {
		return nil, &InputError{Field: FieldSealingTemperature, Value: fmt.Sprintf("%g", d.SealingTemperatureK),
			Want: fmt.Sprintf("must be at or above the freezing point of %s, %.2f K", sub.Fluid().Name, sub.MinTemperature()),
			Rule: RuleAtLeast, Min: sub.MinTemperature(), Unit: "K", Subject: "the freezing point of " + sub.Fluid().Name}
	}
	// The nominal vessel checks the sealing temperature against the
	// critical point, with newSealedVessel's own errors.
	sats := newSatMemo(sub, d.ResidualGasPressurePa > 0, d.SealingTemperatureK, d.HottestK)
	if _, err := newSharedVessel(sub, d.FillMassKg, d.Vessel.Volume(), d.SealingTemperatureK, d.ResidualGasPressurePa, d.AmbientPressurePa, sats); err != nil {
		return nil, err
	}
	sat, err := sats.saturation(sub, d.SealingTemperatureK)
	if err != nil {
		return nil, &InputError{Field: FieldSealingTemperature, Value: fmt.Sprintf("%g", d.SealingTemperatureK), Want: err.Error()}
	}
	d.Vessel.Parts = append([]Part(nil), d.Vessel.Parts...)
	m := &UnitModel{design: d, sub: sub, glass: glass, sealLiquidDensity: sat.LiquidDensity, sealSat: sat, sats: sats}
	m.durationFactor = glassStrength(analyseParts(d.Vessel.Parts, &glass, 0), &glass, d.HoursAtHottest*3600, 1).DurationFactor
	m.vessels.New = func() any { return new(sealedVessel) }
	return m, nil
}

// TabulateHottest lets the model prepare the compressed liquid of a unit
// with residual gas from a table of the fluid's equation of state
// (fluids.IsothermTable) when the unit's hottest temperature lies within
// lo–hi K, instead of from the equation directly: the study's per-unit
// cost drops by about a fifth, and the unit's pressure moves by at most
// the table's error bound (about 1e-9 of ρRT in the liquid's pressure,
// far less in the vessel's, which the bubble's gas sets). It does nothing
// for a design without residual gas or without a reference equation, or
// for a range that cannot be tabulated. It is not safe to call while
// units are being evaluated.
func (m *UnitModel) TabulateHottest(lo, hi float64) {
	if !m.sats.gas {
		return
	}
	lo, hi = math.Max(lo, m.sub.MinTemperature()), math.Min(hi, m.sub.CriticalTemperature())
	m.sats.isotherms = m.sub.NewIsothermTable(lo, hi)
}

// Substance returns the model's fluid.
func (m *UnitModel) Substance() *fluids.Substance { return m.sub }

// Glass returns the model's glass.
func (m *UnitModel) Glass() Glass { return m.glass }

// unitParts is the largest number of parts evaluated without allocating.
const unitParts = 8

// Evaluate returns one unit's state, stresses and strength at its hottest
// temperature. It returns an *InputError for a unit value that is not
// finite or outside its physical range (fill and volume positive, each wall
// thinner than its part's outer radius, hottest temperature at or above
// the freezing point), and an error wrapping ErrOverfilled when the unit's
// fill would not fit as liquid at the sealing temperature.
func (m *UnitModel) Evaluate(u Unit) (UnitResult, error) {
	r, v, err := m.evaluate(u)
	if err != nil {
		return r, err
	}
	defer m.vessels.Put(v)
	tFull, reached := v.liquidFullTemperature()
	r.LiquidFullK = tFull
	r.LiquidFull = reached && tFull < u.HottestK
	return r, nil
}

// EvaluateHot is Evaluate without the search for the liquid-full
// temperature, for studies that need only whether the unit has gone
// liquid-full: LiquidFullK is left at zero and LiquidFull is decided from
// the hot state (see fluids.Substance.DensestLiquidTemperature; below that
// temperature, water only, the temperature is searched as in Evaluate).
func (m *UnitModel) EvaluateHot(u Unit) (UnitResult, error) {
	r, v, err := m.evaluate(u)
	if err != nil {
		return r, err
	}
	defer m.vessels.Put(v)
	s := m.sub
	switch t := u.HottestK; {
	case t > s.CriticalTemperature():
		// Liquid-full at or below Tc when the fill is denser than the
		// critical density (fluids.Substance.LiquidFullTemperature).
		r.LiquidFull = v.density > s.CriticalDensity()
	case t >= s.DensestLiquidTemperature():
		r.LiquidFull = r.Hot.Phase == PhaseLiquidFull
	default:
		tFull, reached := v.liquidFullTemperature()
		r.LiquidFull = reached && tFull < t
	}
	return r, nil
}

// evaluate is Evaluate up to the liquid-full temperature; it returns the
// unit's vessel, which the caller puts back in the pool.
func (m *UnitModel) evaluate(u Unit) (UnitResult, *sealedVessel, error) {
	var r UnitResult
	d := &m.design
	parts := d.Vessel.Parts
	if u.WallThicknessM != nil && len(u.WallThicknessM) != len(parts) {
		return r, nil, &InputError{Field: "unit.wall_thickness_m", Value: fmt.Sprintf("%d values", len(u.WallThicknessM)),
			Want: fmt.Sprintf("one per part (%d)", len(parts))}
	}
	if !isFinite(u.FillMassKg) || u.FillMassKg <= 0 {
		return r, nil, &InputError{Field: "unit.fill_mass_kg", Value: fmt.Sprint(u.FillMassKg), Want: "must be a positive number"}
	}
	if !isFinite(u.VolumeM3) || u.VolumeM3 < 0 {
		return r, nil, &InputError{Field: "unit.volume_m3", Value: fmt.Sprint(u.VolumeM3), Want: "must be a positive number, or 0 to compute it from the parts"}
	}
	if !isFinite(u.HottestK) || u.HottestK < m.sub.MinTemperature() {
		return r, nil, &InputError{Field: "unit.hottest_k", Value: fmt.Sprint(u.HottestK),
			Want: fmt.Sprintf("must be at or above the freezing point of %s, %.2f K", m.sub.Fluid().Name, m.sub.MinTemperature()),
			Rule: RuleAtLeast, Min: m.sub.MinTemperature(), Unit: "K", Subject: "the freezing point of " + m.sub.Fluid().Name}
	}
	var buf [unitParts]PartStress
	ps := buf[:0]
	if len(parts) > unitParts {
		ps = make([]PartStress, 0, len(parts))
	}
	partsVolume := 0.0
	for i := range parts {
		p := parts[i]
		if u.WallThicknessM != nil {
			p.WallThicknessM = u.WallThicknessM[i]
		}
		if !isFinite(p.WallThicknessM) || p.WallThicknessM <= 0 || p.WallThicknessM >= p.OuterDiameterM/2 {
			return r, nil, &InputError{Field: fmt.Sprintf("unit.wall_thickness_m[%d]", i), Value: fmt.Sprint(p.WallThicknessM),
				Want: fmt.Sprintf("must be greater than zero and less than the outer radius (%g m)", p.OuterDiameterM/2)}
		}
		k, _ := hoopStressFactor(&p)
		ps = append(ps, PartStress{StressPerPascal: k, AreaM2: p.OuterArea()})
		partsVolume += p.InternalVolume()
		r.StressPerPascal = math.Max(r.StressPerPascal, k)
	}
	r.VolumeM3 = u.VolumeM3
	if r.VolumeM3 == 0 {
		r.VolumeM3 = partsVolume
	}
	// A fill that fits is sealed from the model's saturated state at the
	// sealing temperature (the same for every unit) into a recycled
	// vessel; one that does not takes newSealedVessel for its error.
	if !(u.FillMassKg/r.VolumeM3 < m.sealLiquidDensity) {
		_, err := newSharedVessel(m.sub, u.FillMassKg, r.VolumeM3, d.SealingTemperatureK, d.ResidualGasPressurePa, d.AmbientPressurePa, m.sats)
		if err == nil {
			err = fmt.Errorf("internal: fill density %g kg/m³ at or above the sealing liquid density %g kg/m³ but sealable", u.FillMassKg/r.VolumeM3, m.sealLiquidDensity)
		}
		return r, nil, err
	}
	v := m.vessels.Get().(*sealedVessel)
	*v = sealedVessel{fluid: m.sub, mass: u.FillMassKg, volume: r.VolumeM3, density: u.FillMassKg / r.VolumeM3, ambientPa: d.AmbientPressurePa, sats: m.sats}
	m.sub.PrepareIsochore(v.density, &v.iso)
	if d.ResidualGasPressurePa != 0 {
		v.sealGas(m.sealSat, d.ResidualGasPressurePa, d.SealingTemperatureK)
	}
	var err error
	if r.Hot, err = v.state(u.HottestK); err != nil {
		m.vessels.Put(v)
		return r, nil, fmt.Errorf("state at %.2f K: %w", u.HottestK, err)
	}

	over := r.Hot.PressurePa - d.AmbientPressurePa
	r.LongTermBurstPa = shortTermBurst(ps, &m.glass) * m.durationFactor
	r.HoopStressPa = r.StressPerPascal * math.Max(over, 0)
	r.EffectiveStrengthPa = r.LongTermBurstPa * r.StressPerPascal
	r.BurstSafetyFactor = safetyFactor(r.LongTermBurstPa, over)
	r.FailureProbability = failureProbability(over, r.LongTermBurstPa, m.glass.WeibullModulus.Value)
	return r, v, nil
}

// shortTermBurst returns Strength.ShortTermBurstPa, the weakest-link burst
// overpressure σ₀ / (Σᵢ (Aᵢ/A₀) kᵢ^m)^(1/m) of glassStrength, without the
// governing-part figures a unit does not need.
func shortTermBurst(parts []PartStress, g *Glass) float64 {
	sum := 0.0
	for _, p := range parts {
		sum += weakestLinkTerm(p, g)
	}
	return g.CharacteristicStrength.Value / math.Pow(sum, 1/g.WeibullModulus.Value)
}

// powWhole returns x^n for n ≥ 0 by repeated squaring.
func powWhole(x float64, n int) float64 {
	r := 1.0
	for ; n > 0; n >>= 1 {
		if n&1 == 1 {
			r *= x
		}
		x *= x
	}
	return r
}
