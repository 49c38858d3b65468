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
// thickest, which narrows the inside of a part of fixed outer diameter).
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
func worstCase(d Design, sub *fluids.Substance) *WorstCase {
	anyWall := false
	for _, p := range d.Vessel.Parts {
		anyWall = anyWall || p.WallToleranceM > 0
	}
	volumeTol := d.Vessel.VolumeToleranceM3
	if d.Vessel.InternalVolumeM3 == 0 {
		volumeTol = 0
	}
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
		w.VolumeM3 = v.PartsVolume()
	}
	vessel, err := newSealedVessel(sub, w.FillMassKg, w.VolumeM3, d.SealingTemperatureK, d.ResidualGasPressurePa, d.AmbientPressurePa)
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
