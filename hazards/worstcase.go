package hazards

import (
	"errors"
	"math"

	"ullage/fluids"
)

// WorstCase is the unit at the edge of the stated tolerances that comes
// closest to going liquid-full: the fill at its upper tolerance and the
// internal volume at its lower one (the measured volume less its
// tolerance, or, for a volume computed from the parts, every wall at its
// thickest, which narrows the inside of a part of fixed outer diameter,
// less the volume tolerance, which then covers what the parts leave out:
// joints, seals and shape).
// Adding the tolerances this way is the usual worst-case stack (common
// practice); the tolerance study gives the statistical view.
type WorstCase struct {
	FillMassKg float64
	VolumeM3   float64
	// Sealable is false when that much fill would not fit as liquid at
	// the sealing temperature; Hot and the liquid-full point are then
	// not computed.
	Sealable          bool
	Hot               VesselState
	LiquidFullK       float64
	LiquidFullReached bool
}

// worstCase returns the worst-case unit, or nil when the design states
// no fill, volume or wall tolerance.
func worstCase(d Design, sub *fluids.Substance, sats *satMemo) *WorstCase {
	anyWall := false
	for _, p := range d.Vessel.Parts {
		anyWall = anyWall || p.WallToleranceM > 0
	}
	volumeTol := d.Vessel.VolumeToleranceM3
	if d.FillMassToleranceKg == 0 && volumeTol == 0 && (d.Vessel.InternalVolumeM3 > 0 || !anyWall) {
		return nil
	}
	w := &WorstCase{FillMassKg: d.FillMassKg + d.FillMassToleranceKg}
	if d.Vessel.InternalVolumeM3 > 0 {
		w.VolumeM3 = d.Vessel.InternalVolumeM3 - volumeTol
	} else {
		v := Vessel{Parts: append([]Part(nil), d.Vessel.Parts...)}
		for i := range v.Parts {
			p := &v.Parts[i]
			p.WallThicknessM = math.Min(p.WallThicknessM+p.WallToleranceM, 0.999*p.OuterDiameterM/2)
		}
		w.VolumeM3 = v.PartsVolume() - volumeTol
	}
	vessel, err := newSharedVessel(sub, w.FillMassKg, w.VolumeM3, d.SealingTemperatureK, d.ResidualGasPressurePa, d.AmbientPressurePa, sats)
	if err != nil {
		if errors.Is(err, ErrOverfilled) {
			return w
		}
		return nil
	}
	st, err := vessel.state(d.HottestK)
	if err != nil {
		return nil
	}
	w.Sealable = true
	w.Hot = st
	w.LiquidFullK, w.LiquidFullReached = vessel.liquidFullTemperature()
	return w
}

// WorstStrength is the burst strength of the weakest permitted unit: every
// wall at its thinnest (the minimum permitted thickness, as pressure-vessel
// practice checks strength), loaded by the higher of the nominal and the
// worst-case unit's pressure at the hottest temperature, so that the fill
// and volume tolerances are stacked the way that raises pressure. Taking
// the pressure of the thick-walled worst-case unit with the strength of
// the thin-walled one errs on the safe side (common practice: worst-case
// tolerance stack).
type WorstStrength struct {
	// Parts are the stresses with the walls at their thinnest; Strength
	// the envelope's burst resistance.
	Parts    []PartStress
	Strength Strength
	// PressurePa is the internal pressure used; FromWorstUnit says it is
	// the worst-case unit's (otherwise the nominal unit's).
	PressurePa    float64
	FromWorstUnit bool
	// OverPa is PressurePa less the ambient pressure.
	OverPa float64
	// SafetyFactor and FailureProbability as for the nominal unit;
	// SafetyFactorBound and FailureProbabilityBound say when they are
	// bounds (see Assessment).
	SafetyFactor            float64
	SafetyFactorBound       Direction
	FailureProbability      float64
	FailureProbabilityBound Direction
}

// worstStrength returns the weakest permitted unit's strength, or nil when
// the design states no tolerance.
func (a *Assessment) worstStrength() *WorstStrength {
	if a.Worst == nil {
		return nil
	}
	d := &a.Design
	parts := append([]Part(nil), d.Vessel.Parts...)
	for i := range parts {
		parts[i].WallThicknessM -= parts[i].WallToleranceM
	}
	ws := &WorstStrength{PressurePa: a.Hot.PressurePa}
	if a.Worst.Sealable && a.Worst.Hot.PressurePa > a.Hot.PressurePa {
		ws.PressurePa, ws.FromWorstUnit = a.Worst.Hot.PressurePa, true
	}
	ws.OverPa = ws.PressurePa - d.AmbientPressurePa
	ws.Parts = analyseParts(parts, &a.Glass, ws.OverPa)
	ws.Strength = glassStrength(ws.Parts, &a.Glass, d.HoursAtHottest*3600, d.Criteria.MinBurstSafetyFactor)
	ws.SafetyFactor, ws.SafetyFactorBound = boundedSafetyFactor(ws.Strength.LongTermBurstPa, ws.OverPa)
	ws.FailureProbability, ws.FailureProbabilityBound = boundedFailureProbability(ws.OverPa, ws.Strength.LongTermBurstPa, a.Glass.WeibullModulus.Value)
	return ws
}
