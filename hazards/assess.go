package hazards

import (
	"errors"
	"fmt"
	"math"

	"ullage/fluids"
	"ullage/fluids/solve"
	"ullage/fluids/units"
)

// Assessment is the full result of reviewing one design.
type Assessment struct {
	Design Design
	Fluid  *fluids.Fluid
	Glass  Glass

	// VolumeM3 is the internal volume used; FillDensity the fill mass per
	// internal volume (kg/m³); LiquidFractionAtSealing the share of the
	// volume taken by liquid when sealed.
	VolumeM3                float64
	FillDensity             float64
	LiquidFractionAtSealing float64

	// Hot and Cold are the vessel at the hottest and coldest temperatures.
	Hot, Cold VesselState
	// Worst is the worst-case unit within the stated tolerances (most fill,
	// least internal volume) at the hottest temperature; nil when the
	// design states no tolerances.
	Worst *WorstCase
	// LiquidFullK is the temperature at which the vessel goes liquid-full;
	// LiquidFullReached is false when it does not below Tc.
	LiquidFullK       float64
	LiquidFullReached bool

	// Parts are the stresses of each part at the hottest temperature, and
	// Strength the burst resistance of the whole envelope.
	Parts    []PartStress
	Strength Strength
	// BurstSafetyFactor is the long-term burst overpressure over the
	// overpressure at the hottest temperature; FailureProbability the
	// Weibull probability of failure over the service life.
	BurstSafetyFactor  float64
	FailureProbability float64
	// BurstSafetyFactorBound is AtLeast when the factor is capped at
	// SafetyFactorCap under a real load; FailureProbabilityBound AtMost
	// when the probability is too small to compute and a bound is given.
	// With no burst load (HasBurstLoad false) neither number is a result.
	BurstSafetyFactorBound  Direction
	FailureProbabilityBound Direction
	// WorstStrength is the weakest permitted unit's strength; nil when the
	// design states no tolerances.
	WorstStrength *WorstStrength
	// RequiredSafetyFactor is the safety factor that meets both the
	// minimum safety factor and the maximum failure probability.
	RequiredSafetyFactor float64
	// ExternalLoadPa is the outside-minus-inside pressure at the coldest
	// temperature (positive when the vessel is under external pressure);
	// ImplosionSafetyFactor the smallest knocked-down buckling pressure
	// of any part over it.
	ExternalLoadPa        float64
	ImplosionSafetyFactor float64
	// Seal is the seal's residual stress and its effect on the burst
	// resistance; nil when the design gives none (see sealstress.go).
	Seal *SealResult
	// Shock is the thermal-shock review (see thermalshock.go).
	Shock ThermalShockResult

	// MaxSafe are the largest temperature and fill that still meet the
	// burst, failure-probability and ullage criteria.
	MaxSafe MaxSafe

	Rupture Rupture
	Release Release

	Findings []Finding
	Verdict  Status
	// Flags gathers every correlation stretched anywhere in the review.
	Flags fluids.Flags

	vessel  *sealedVessel
	release *releaseModel
	// rec is the calculation record, built on first use (Trace).
	rec *record
}

// MaxSafe holds the limits found by root-finding. A limit that lies
// outside the searched range is reported at the range end with the
// matching Bound flag set.
type MaxSafe struct {
	TemperatureK       float64
	TemperatureBound   Bound
	TemperatureLimitBy string // "pressure" or "ullage"
	FillMassKg         float64
	FillBound          Bound
	// Roots record how each limit was found, for the calculation record.
	PressureRoot, UllageRoot, FillRoot *solve.Root
}

// Bound says whether a searched limit was found inside its range.
type Bound string

// Bounds of a searched limit.
const (
	BoundFound Bound = "found"
	// BoundAbove: the criterion still holds at the top of the range.
	BoundAbove Bound = "above-range"
	// BoundBelow: the criterion already fails at the bottom of the range.
	BoundBelow Bound = "below-range"
)

// Release summarises the breakage of the vessel into the room.
type Release struct {
	Room       Room
	MassKg     float64
	Peak       Exposure // highest one-minute average, room or near field
	STEL       Exposure // 15-minute average
	TWA8h      Exposure // 8-hour time-weighted average
	PercentLFL float64  // of the peak; 0 when not flammable
	// Bound is the physical ceiling every concentration is held to.
	Bound ConcentrationBound
	// Limits are every applicable published limit, each evaluated over
	// its own averaging period, the governing one of each kind marked.
	Limits []LimitResult
	// LimitSets are the limit sets applied (Criteria.AppliedLimitSets);
	// LimitNotes say in words where a set gives no number for the fluid.
	LimitSets  []string
	LimitNotes []LimitNote
	// RoomTimeConstantS is the e-folding time of the well-mixed room,
	// k·V/Q; zero ventilation gives the cap of 1e9 s.
	RoomTimeConstantS float64
}

// Assess reviews a design against the fluid library. It validates the
// design first and returns an *InputError (wrapping ErrInvalidInput) for
// any bad input; no NaN or infinity reaches a result.
func Assess(d Design, lib *fluids.Library) (*Assessment, error) {
	return assess(d, lib, true)
}

// assess is Assess; warm says whether the searches for the maximum safe
// temperature and fill start from the brackets the design's own states
// point to and the gas-bubble solves from the bubble the liquid leaves
// at its saturated density (Assess), or run over their whole ranges
// only, as a reference for the tests.
func assess(d Design, lib *fluids.Library, warm bool) (*Assessment, error) {
	sub, glass, err := prepare(d, lib)
	if err != nil {
		return nil, err
	}
	a := &Assessment{Design: d, Fluid: sub.Fluid(), Glass: glass}
	for _, tf := range []struct {
		field string
		t     float64
	}{{FieldColdest, d.ColdestK}, {FieldSealingTemperature, d.SealingTemperatureK}, {FieldHottest, d.HottestK}} {
		if tf.t < sub.MinTemperature() {
			return nil, &InputError{Field: tf.field, Value: fmt.Sprintf("%g", tf.t),
				Want: fmt.Sprintf("must be at or above the freezing point of %s, %.2f K (%.1f °C)", sub.Fluid().Name, sub.MinTemperature(), units.KelvinToCelsius(sub.MinTemperature())),
				Rule: RuleAtLeast, Min: sub.MinTemperature(), Unit: "K", Subject: "the freezing point of " + sub.Fluid().Name}
		}
	}
	a.VolumeM3 = d.Vessel.Volume()
	a.FillDensity = d.FillMassKg / a.VolumeM3
	sats := newSatMemo(sub, d.ResidualGasPressurePa > 0, d.SealingTemperatureK, d.HottestK, d.ColdestK)
	sats.direct = !warm
	v, err := newSharedVessel(sub, d.FillMassKg, a.VolumeM3, d.SealingTemperatureK, d.ResidualGasPressurePa, d.AmbientPressurePa, sats)
	if err != nil {
		return nil, err
	}
	a.vessel = v
	if sat, err := sats.saturation(sub, d.SealingTemperatureK); err == nil {
		a.LiquidFractionAtSealing = math.Max(0, (a.FillDensity-sat.VapourDensity)/(sat.LiquidDensity-sat.VapourDensity))
	}
	if a.Hot, err = v.state(d.HottestK); err != nil {
		return nil, fmt.Errorf("state at the hottest temperature: %w", err)
	}
	if a.Cold, err = v.state(d.ColdestK); err != nil {
		return nil, fmt.Errorf("state at the coldest temperature: %w", err)
	}
	a.Flags = a.Hot.Flags | a.Cold.Flags
	a.Worst = worstCase(d, sub, sats)
	if a.Worst != nil && a.Worst.Sealable {
		a.Flags |= a.Worst.Hot.Flags
	}
	a.LiquidFullK, a.LiquidFullReached = v.liquidFullTemperature()

	// Glass.
	over := a.Hot.PressurePa - d.AmbientPressurePa
	a.Parts = analyseParts(d.Vessel.Parts, &glass, over)
	loadS := d.HoursAtHottest * 3600
	a.Strength = glassStrength(a.Parts, &glass, loadS, d.Criteria.MinBurstSafetyFactor)
	a.BurstSafetyFactor, a.BurstSafetyFactorBound = boundedSafetyFactor(a.Strength.LongTermBurstPa, over)
	m := glass.WeibullModulus.Value
	a.FailureProbability, a.FailureProbabilityBound = boundedFailureProbability(over, a.Strength.LongTermBurstPa, m)
	a.WorstStrength = a.worstStrength()
	a.RequiredSafetyFactor = math.Max(d.Criteria.MinBurstSafetyFactor, math.Pow(-math.Log1p(-d.Criteria.MaxFailureProbability), -1/m))
	a.ExternalLoadPa = d.AmbientPressurePa - a.Cold.PressurePa
	a.ImplosionSafetyFactor = SafetyFactorCap
	for _, p := range a.Parts {
		a.ImplosionSafetyFactor = math.Min(a.ImplosionSafetyFactor, safetyFactor(p.BucklingPa, a.ExternalLoadPa))
	}
	if err := a.applySealStress(); err != nil {
		return nil, err
	}
	a.assessThermalShock()

	if err := a.findMaxSafe(sub, warm); err != nil {
		return nil, err
	}
	a.rupture(sub)
	a.releaseModel(sub)
	a.findings()
	a.rec = &record{a: a}
	for i := range a.Findings {
		a.Findings[i].rec, a.Findings[i].index = a.rec, i
	}
	return a, nil
}

// prepare validates the design and looks up its fluid and glass, the
// first steps of Assess and NewUnitModel alike.
func prepare(d Design, lib *fluids.Library) (*fluids.Substance, Glass, error) {
	if err := d.Validate(); err != nil {
		return nil, Glass{}, err
	}
	sub, err := lib.Lookup(d.Fluid)
	if err != nil {
		return nil, Glass{}, &InputError{Field: FieldFluid, Value: fmt.Sprintf("%q", d.Fluid), Want: err.Error()}
	}
	if d.Glass.Custom != nil {
		return sub, *d.Glass.Custom, nil
	}
	glass, err := LookupGlass(d.Glass.ID)
	return sub, glass, err
}

// HasBurstLoad reports whether the vessel is above ambient pressure at the
// hottest temperature; without a load the burst safety factor and failure
// probability are not results.
func (a *Assessment) HasBurstLoad() bool { return a.Hot.PressurePa > a.Design.AmbientPressurePa }

// HasExternalLoad reports whether the vessel is below ambient pressure at
// the coldest temperature; without a load the implosion safety factor is
// not a result.
func (a *Assessment) HasExternalLoad() bool { return a.ExternalLoadPa > 0 }

// StateAt returns the vessel's state at any temperature (K) at or above
// the fluid's freezing point, for charts and tables.
func (a *Assessment) StateAt(t float64) (VesselState, error) { return a.vessel.state(t) }

// Concentration returns the concentration in mg/m³ in a zone t seconds
// after the breakage as the release chart draws it: the average over the
// minute before t, held to the physical bound. Its highest value is the
// peak (Release.Peak).
func (a *Assessment) Concentration(z Zone, t float64) float64 { return a.release.charted(z, t) }

// AllowablePressurePa returns the absolute internal pressure at which the
// burst safety factor equals the required one.
func (a *Assessment) AllowablePressurePa() float64 {
	return a.Design.AmbientPressurePa + a.Strength.LongTermBurstPa/a.RequiredSafetyFactor
}

// searchTopK is the highest temperature searched for the maximum safe
// temperature.
func (a *Assessment) searchTopK(sub *fluids.Substance) float64 {
	return math.Max(a.Design.HottestK+100, sub.CriticalTemperature()+50)
}

func (a *Assessment) findMaxSafe(sub *fluids.Substance, warm bool) error {
	d := &a.Design
	lo, hi := d.ColdestK, a.searchTopK(sub)
	allow := a.AllowablePressurePa()
	// The states at the coldest and hottest temperatures are already
	// known; any other comes from the vessel.
	state := func(t float64) (VesselState, error) {
		switch t {
		case d.ColdestK:
			return a.Cold, nil
		case d.HottestK:
			return a.Hot, nil
		}
		return a.vessel.state(t)
	}
	pressureGap := func(t float64) float64 {
		st, err := state(t)
		if err != nil {
			return math.NaN()
		}
		return math.Log(st.PressurePa / allow)
	}
	minU := d.Criteria.MinUllagePercent
	ullageGap := func(t float64) float64 {
		st, err := state(t)
		if err != nil {
			return math.NaN()
		}
		return minU - st.UllagePercent
	}
	// The searches are called directly, never through a variable, so
	// that their gap functions and points stay on the stack.
	var tP float64
	var bP Bound
	var rP *solve.Root
	var err error
	if warm {
		var at [4]float64
		tP, bP, rP, err = searchRisingWarm(pressureGap, lo, hi, a.appendPressureGuesses(append(at[:0], d.HottestK), sub, lo, hi, allow)...)
	} else {
		tP, bP, rP, err = searchRising(pressureGap, lo, hi, d.HottestK)
	}
	if err != nil {
		return fmt.Errorf("maximum safe temperature (pressure): %w", err)
	}
	uHi := hi
	if a.LiquidFullReached {
		uHi = math.Min(hi, math.Max(a.LiquidFullK, lo))
	}
	tU, bU, rU := uHi, BoundAbove, (*solve.Root)(nil)
	if a.LiquidFullReached && uHi > lo {
		if tU, bU, rU, err = searchRising(ullageGap, lo, uHi, d.HottestK); err != nil {
			return fmt.Errorf("maximum safe temperature (ullage): %w", err)
		}
		if bU == BoundAbove {
			tU = hi
		}
	} else if a.LiquidFullReached {
		tU, bU = lo, BoundBelow
	}
	ms := MaxSafe{PressureRoot: rP, UllageRoot: rU}
	if tU < tP || (bU == BoundBelow) {
		ms.TemperatureK, ms.TemperatureBound, ms.TemperatureLimitBy = tU, bU, "ullage"
	} else {
		ms.TemperatureK, ms.TemperatureBound, ms.TemperatureLimitBy = tP, bP, "pressure"
	}

	// Maximum safe fill at the hottest temperature.
	sats := a.vessel.sats
	sat, err := sats.saturation(sub, d.SealingTemperatureK)
	if err != nil {
		return err
	}
	mMax := sat.LiquidDensity * a.VolumeM3 * (1 - 1e-9)
	var v sealedVessel // each step's vessel, sealed in the same memory
	fillGap := func(mass float64) float64 {
		if mass == d.FillMassKg { // the design itself: its hottest state is known
			return math.Max((a.Hot.PressurePa-allow)/allow, (minU-a.Hot.UllagePercent)/100)
		}
		if err := v.seal(sub, mass, a.VolumeM3, d.SealingTemperatureK, d.ResidualGasPressurePa, d.AmbientPressurePa, sats); err != nil {
			return math.NaN()
		}
		st, err := v.state(d.HottestK)
		if err != nil {
			return math.NaN()
		}
		return math.Max((st.PressurePa-allow)/allow, (minU-st.UllagePercent)/100)
	}
	mLo := mMax * 1e-6
	var mf float64
	var bf Bound
	var rf *solve.Root
	if warm {
		var at [5]float64
		mf, bf, rf, err = searchRisingWarm(fillGap, mLo, mMax, a.appendFillGuesses(append(at[:0], d.FillMassKg), sub, mLo, mMax, allow, fillGap)...)
	} else {
		mf, bf, rf, err = searchRising(fillGap, mLo, mMax, d.FillMassKg)
	}
	if err != nil {
		return fmt.Errorf("maximum safe fill: %w", err)
	}
	ms.FillMassKg, ms.FillBound, ms.FillRoot = mf, bf, rf
	a.MaxSafe = ms
	return nil
}

// searchRising finds where a rising gap function crosses zero on [lo, hi]:
// the largest x with gap(x) ≤ 0. When gap(hi) ≤ 0 it returns hi,
// BoundAbove; when gap(lo) > 0 it returns lo, BoundBelow. Points inside
// the range whose gap is already known (the design's own state) narrow
// the bracket before the root is polished; the root found still names
// [lo, hi] as the range searched.
func searchRising(gap func(float64) float64, lo, hi float64, inside ...float64) (float64, Bound, *solve.Root, error) {
	gap = unsafeWhereUnknown(gap)
	gLo, gHi := gap(lo), gap(hi)
	if math.IsNaN(gLo) || math.IsNaN(gHi) {
		return 0, "", nil, fmt.Errorf("the model cannot be evaluated at %g or %g", lo, hi)
	}
	if gHi <= 0 {
		return hi, BoundAbove, nil, nil
	}
	if gLo > 0 {
		return lo, BoundBelow, nil, nil
	}
	a, b, gA, gB := lo, hi, gLo, gHi
	for _, x := range inside {
		if !(x > a && x < b) {
			continue
		}
		switch g := gap(x); {
		case math.IsNaN(g):
		case g <= 0:
			a, gA = x, g
		default:
			b, gB = x, g
		}
	}
	return polishRoot(gap, a, b, gA, gB, lo, hi)
}

// searchRisingWarm is searchRising for a gap that rises everywhere on
// [lo, hi], as every gap searched here does (the pressure rises and the
// ullage falls with the temperature and with the fill): the points
// inside, the design's own state and guesses at the root, are evaluated
// first, and an end of the range is evaluated only when no point inside
// already settles it (a point with gap > 0 shows that gap(hi) > 0, one
// with gap ≤ 0 that gap(lo) ≤ 0). Brent then polishes the root in the
// narrowest bracket found, to the same tolerance as searchRising, so
// the two agree within that tolerance; guesses a hair either side of the
// root leave Brent nothing to do.
func searchRisingWarm(gap func(float64) float64, lo, hi float64, inside ...float64) (float64, Bound, *solve.Root, error) {
	gap = unsafeWhereUnknown(gap)
	a, b := lo, hi
	var gA, gB float64
	haveA, haveB := false, false
	for _, x := range inside {
		if !(x > a && x < b) {
			continue
		}
		if g := gap(x); g <= 0 {
			a, gA, haveA = x, g, true
		} else {
			b, gB, haveB = x, g, true
		}
	}
	if !haveB {
		if gB = gap(hi); gB <= 0 {
			return hi, BoundAbove, nil, nil
		}
	}
	if !haveA {
		if gA = gap(lo); gA > 0 {
			return lo, BoundBelow, nil, nil
		}
	}
	return polishRoot(gap, a, b, gA, gB, lo, hi)
}

// polishRoot runs Brent's method on the bracket [a, b] of the search
// over [lo, hi], to the searches' tolerance. The gaps at the bracket's
// ends, gA and gB, are already known and are not evaluated again (each
// gap is a pure function, so only the work changes).
func polishRoot(gap func(float64) float64, a, b, gA, gB, lo, hi float64) (float64, Bound, *solve.Root, error) {
	known := gap
	gap = func(x float64) float64 {
		switch x {
		case a:
			return gA
		case b:
			return gB
		}
		return known(x)
	}
	r, err := solve.Brent(gap, a, b, searchTolerance(hi), 200)
	r.Lo, r.Hi = lo, hi
	if err != nil && errors.Is(err, solve.ErrNotFinite) {
		return 0, "", nil, err
	}
	return r.X, BoundFound, &r, nil
}

// searchTolerance is the tolerance of the searches on [lo, hi].
func searchTolerance(hi float64) float64 { return 1e-6 * math.Max(math.Abs(hi), 1e-12) }

// appendPressureGuesses appends to dst points about the maximum safe temperature by
// pressure for searchRisingWarm: where the vapour pressure reaches the
// allowable pressure, T*, the root itself for a two-phase vessel without
// residual gas, taken a quarter of the search's tolerance either side.
// Residual gas adds its pressure nRT/V_g to the vapour's: with V_g at T*
// taken as the space the liquid leaves at its saturated density, the
// vapour pressure reaching the allowable pressure less that gives T₁ a
// hair from the root (the liquid's compression, neglected, moves the gas
// pressure by some 1e-4 of itself), given a quarter of the tolerance
// either side, then T*, above the root. None when the vessel is
// liquid-full before T* or T* is outside [lo, hi].
func (a *Assessment) appendPressureGuesses(dst []float64, sub *fluids.Substance, lo, hi, allow float64) []float64 {
	ts, err := sub.SaturationTemperature(allow)
	if err != nil || !(ts > lo && ts < hi) || (a.LiquidFullReached && a.LiquidFullK <= ts) {
		return dst
	}
	h := 0.25 * searchTolerance(hi)
	v := a.vessel
	if v.gasMoles == 0 {
		return append(dst, ts-h, ts+h)
	}
	sat, err := sub.SaturationNoHeatCapacity(ts)
	if err != nil || !(v.density > sat.VapourDensity && v.density < sat.LiquidDensity) {
		return append(dst, ts)
	}
	vg := v.volume - (v.mass-sat.VapourDensity*v.volume)/(sat.LiquidDensity-sat.VapourDensity)
	t1, err := sub.SaturationTemperature(allow - v.gasMoles*units.GasConstant*ts/vg)
	if err != nil || !(t1 > lo && t1 < ts) {
		return append(dst, ts)
	}
	return append(dst, t1-h, t1+h, ts)
}

// appendFillGuesses appends to dst points about the maximum safe fill for
// searchRisingWarm. With the vessel two-phase at the hottest temperature
// and its vapour pressure within the allowable pressure, the fill at
// which the ullage falls to the minimum there is, without residual gas,
//
//	m_u = V·(ρ_v + (1 − U_min/100)·(ρ_l − ρ_v)),
//
// the root itself, taken a quarter of the search's tolerance either
// side. Residual gas, squeezing the liquid a little, moves the root a
// little above m_u: one Newton step on gap from m_u, with the slope of
// its ullage part, 1/(V·(ρ_l − ρ_v)), gives the point taken either side
// instead, then m_u and a point 0.1 % above it. None where the formula
// does not hold.
func (a *Assessment) appendFillGuesses(dst []float64, sub *fluids.Substance, lo, hi, allow float64, gap func(float64) float64) []float64 {
	d := &a.Design
	if d.HottestK > sub.CriticalTemperature() {
		return dst
	}
	sat, err := a.vessel.sats.saturation(sub, d.HottestK)
	if err != nil || !(sat.PressurePa <= allow) {
		return dst
	}
	mu := a.VolumeM3 * (sat.VapourDensity + (1-d.Criteria.MinUllagePercent/100)*(sat.LiquidDensity-sat.VapourDensity))
	if !(mu > lo && mu < hi) {
		return dst
	}
	h := 0.25 * searchTolerance(hi)
	if a.vessel.gasMoles > 0 {
		g := gap(mu)
		m1 := mu - g*a.VolumeM3*(sat.LiquidDensity-sat.VapourDensity)
		if !isFinite(g) || !(m1-h > lo && m1+h < hi) {
			return append(dst, mu, mu*(1+1e-3))
		}
		return append(dst, m1-h, m1+h, mu, mu*(1+1e-3))
	}
	return append(dst, mu-h, mu+h)
}

// unsafeWhereUnknown wraps a gap function so that where the model cannot
// be evaluated (a NaN, as a hair from the critical point) the criterion
// counts as failed: a limit is never placed where the state is unknown
// (common practice: what cannot be shown safe is not safe).
func unsafeWhereUnknown(gap func(float64) float64) func(float64) float64 {
	return func(x float64) float64 {
		g := gap(x)
		if math.IsNaN(g) || math.IsInf(g, 0) {
			return 1
		}
		return g
	}
}

func (a *Assessment) rupture(sub *fluids.Substance) {
	f := sub.Fluid()
	st := a.Hot
	satPa, bulk := 0.0, 0.0
	if st.TemperatureK <= sub.CriticalTemperature() {
		if sat, err := a.vessel.sats.saturation(sub, st.TemperatureK); err == nil {
			satPa = sat.PressurePa
			if st.VapourDensity == 0 {
				st.VapourDensity = sat.VapourDensity
			}
		}
	}
	if st.Phase == PhaseLiquidFull && st.LiquidDensity > 0 {
		// Bulk modulus K = ρ dP/dρ by a central difference on the
		// compressed-liquid pressure.
		h := st.LiquidDensity * 1e-4
		p1, _, e1 := sub.SinglePhasePressure(st.TemperatureK, st.LiquidDensity+h)
		p0, _, e0 := sub.SinglePhasePressure(st.TemperatureK, st.LiquidDensity-h)
		if e1 == nil && e0 == nil {
			bulk = st.LiquidDensity * (p1 - p0) / (2 * h)
		}
	}
	hvapTb := f.HeatOfVaporisation.Value / f.MolarMass.Value
	if sat, err := sub.NormalBoilingSaturation(); err == nil {
		hvapTb = sat.HeatOfVaporisation
	}
	a.Rupture = ruptureEnergy(st, a.VolumeM3, a.Design.AmbientPressurePa, f.NormalBoilingPoint.Value,
		f.LiquidHeatCapacity.Value/f.MolarMass.Value, hvapTb, satPa, bulk)
}

func (a *Assessment) releaseModel(sub *fluids.Substance) {
	d := &a.Design
	rel := newReleaseModel(d.FillMassKg, d.Room)
	a.release = rel
	mm := a.Fluid.MolarMass.Value
	exposureS := d.Room.ExposureMinutes * 60
	r := Release{Room: d.Room, MassKg: d.FillMassKg}
	r.Bound = concentrationBound(sub, d, rel, a.vessel.sats)
	rel.capMgM3 = units.PpmToMgPerM3(r.Bound.PPM, mm)
	r.Peak = rel.exposure(PeakAveragingS, exposureS, mm)
	r.STEL = rel.exposure(15*60, exposureS, mm)
	r.TWA8h = rel.exposure(8*3600, exposureS, mm)
	r.Limits, r.LimitNotes = appliedLimits(a.Fluid, d.Criteria, rel, exposureS, mm)
	r.LimitSets = d.Criteria.AppliedLimitSets()
	if a.Fluid.Flammability.LFLPercent != nil {
		r.PercentLFL = r.Peak.PPM / (a.Fluid.Flammability.LFLPercent.Value * 1e4) * 100
	}
	r.RoomTimeConstantS = 1e9
	if rel.roomRate > 0 {
		r.RoomTimeConstantS = math.Min(1/rel.roomRate, 1e9)
	}
	a.Release = r
}

// concentrationBound works out the physical ceiling on the concentration.
func concentrationBound(sub *fluids.Substance, d *Design, rel *releaseModel, sats *satMemo) ConcentrationBound {
	mm := sub.Fluid().MolarMass.Value
	b := ConcentrationBound{RoomTemperatureK: math.Max(d.HottestK, units.CelsiusToKelvin(25)), SaturatedPPM: 1e6}
	if b.RoomTemperatureK < sub.CriticalTemperature() {
		if sat, err := sats.saturation(sub, b.RoomTemperatureK); err == nil && sat.PressurePa > 0 {
			b.SaturatedPPM = math.Min(1e6, sat.PressurePa/d.AmbientPressurePa*1e6)
		}
	}
	b.NearFieldPPM = units.MgPerM3ToPpm(rel.massMg/rel.nearVolume, mm)
	b.PPM, b.By = 1e6, "pure vapour"
	if b.SaturatedPPM < b.PPM {
		b.PPM, b.By = b.SaturatedPPM, "saturated vapour"
	}
	if b.NearFieldPPM < b.PPM {
		b.PPM, b.By = b.NearFieldPPM, "whole fill in the near field"
	}
	return b
}
