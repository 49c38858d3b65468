package gui

import (
	"strings"

	"ullage/hazards"
	"ullage/report"
)

// formField is one number of the design as the form shows it: the field's
// path in hazards.Design (the name the engine's InputError uses), its
// label, its quantity, and how to read and write it in a design.
type formField struct {
	path  string
	label string
	q     quantity
	get   func(*hazards.Design) float64
	set   func(*hazards.Design, float64)
}

// formFields are the numbers of the form outside the parts list, in the
// order of the form; the parts' numbers come after them (partFieldSpecs).
// The order decides which of several unreadable entries is named first.
var formFields = []formField{
	{hazards.FieldFillMass, "Fill", qMass,
		func(d *hazards.Design) float64 { return d.FillMassKg },
		func(d *hazards.Design, x float64) { d.FillMassKg = x }},
	{hazards.FieldFillMassTolerance, "Fill tolerance (±)", qMass,
		func(d *hazards.Design) float64 { return d.FillMassToleranceKg },
		func(d *hazards.Design, x float64) { d.FillMassToleranceKg = x }},
	{hazards.FieldInternalVolume, "Measured internal volume", qVesselVolume,
		func(d *hazards.Design) float64 { return d.Vessel.InternalVolumeM3 },
		func(d *hazards.Design, x float64) { d.Vessel.InternalVolumeM3 = x }},
	{hazards.FieldVolumeTolerance, "Volume tolerance (±)", qVesselVolume,
		func(d *hazards.Design) float64 { return d.Vessel.VolumeToleranceM3 },
		func(d *hazards.Design, x float64) { d.Vessel.VolumeToleranceM3 = x }},
	{hazards.FieldHottest, "Hottest temperature", qTemperature,
		func(d *hazards.Design) float64 { return d.HottestK },
		func(d *hazards.Design, x float64) { d.HottestK = x }},
	{hazards.FieldColdest, "Coldest temperature", qTemperature,
		func(d *hazards.Design) float64 { return d.ColdestK },
		func(d *hazards.Design, x float64) { d.ColdestK = x }},
	{hazards.FieldSealingTemperature, "Sealing temperature", qTemperature,
		func(d *hazards.Design) float64 { return d.SealingTemperatureK },
		func(d *hazards.Design, x float64) { d.SealingTemperatureK = x }},
	{hazards.FieldResidualGasPressure, report.LabelResidualGas, qPressure,
		func(d *hazards.Design) float64 { return d.ResidualGasPressurePa },
		func(d *hazards.Design, x float64) { d.ResidualGasPressurePa = x }},
	{hazards.FieldAmbientPressure, report.LabelAmbientPressure, qPressure,
		func(d *hazards.Design) float64 { return d.AmbientPressurePa },
		func(d *hazards.Design, x float64) { d.AmbientPressurePa = x }},
	{hazards.FieldServiceLife, "Service life", qYears,
		func(d *hazards.Design) float64 { return d.ServiceLifeYears },
		func(d *hazards.Design, x float64) { d.ServiceLifeYears = x }},
	{hazards.FieldHoursAtHottest, "Time at the hottest, in all", qHours,
		func(d *hazards.Design) float64 { return d.HoursAtHottest },
		func(d *hazards.Design, x float64) { d.HoursAtHottest = x }},
	{hazards.FieldHotToCold, "Sudden drop, hot to cold", qTempDiff,
		func(d *hazards.Design) float64 { return d.ThermalShock.HotToColdK },
		func(d *hazards.Design, x float64) { d.ThermalShock.HotToColdK = x }},
	{hazards.FieldColdToHot, "Sudden rise, cold to hot", qTempDiff,
		func(d *hazards.Design) float64 { return d.ThermalShock.ColdToHotK },
		func(d *hazards.Design, x float64) { d.ThermalShock.ColdToHotK = x }},
	{hazards.FieldResidualStress, "Residual stress at the seal", qStress,
		func(d *hazards.Design) float64 { return d.SealStress.ResidualStressPa },
		func(d *hazards.Design, x float64) { d.SealStress.ResidualStressPa = x }},
	{hazards.FieldRetardation, "or: retardation measured", qRetardation,
		func(d *hazards.Design) float64 { return d.SealStress.RetardationM },
		func(d *hazards.Design, x float64) { d.SealStress.RetardationM = x }},
	{hazards.FieldSealPathLength, "through a glass path of", qLength,
		func(d *hazards.Design) float64 { return d.SealStress.PathLengthM },
		func(d *hazards.Design, x float64) { d.SealStress.PathLengthM = x }},
	{hazards.FieldRoomVolume, "Room volume", qRoomVolume,
		func(d *hazards.Design) float64 { return d.Room.VolumeM3 },
		func(d *hazards.Design, x float64) { d.Room.VolumeM3 = x }},
	{hazards.FieldAirChanges, "Air changes", qPerHour,
		func(d *hazards.Design) float64 { return d.Room.AirChangesPerHour },
		func(d *hazards.Design, x float64) { d.Room.AirChangesPerHour = x }},
	{hazards.FieldMixingFactor, "Mixing factor", qNumber,
		func(d *hazards.Design) float64 { return d.Room.MixingFactor },
		func(d *hazards.Design, x float64) { d.Room.MixingFactor = x }},
	{hazards.FieldNearFieldRadius, "Near-field radius", qRoomLength,
		func(d *hazards.Design) float64 { return d.Room.NearFieldRadiusM },
		func(d *hazards.Design, x float64) { d.Room.NearFieldRadiusM = x }},
	{hazards.FieldNearFieldAirSpeed, "Air speed near the breakage", qAirSpeed,
		func(d *hazards.Design) float64 { return d.Room.NearFieldAirSpeed },
		func(d *hazards.Design, x float64) { d.Room.NearFieldAirSpeed = x }},
	{hazards.FieldExposureMinutes, report.LabelExposureTime, qMinutes,
		func(d *hazards.Design) float64 { return d.Room.ExposureMinutes },
		func(d *hazards.Design, x float64) { d.Room.ExposureMinutes = x }},
	criterionField(hazards.CriterionMinBurstSafetyFactor, "Least burst safety factor", qNumber),
	criterionField(hazards.CriterionMinImplosionSafetyFactor, "Least implosion safety factor", qNumber),
	criterionField(hazards.CriterionMaxFailureProbability, "Highest failure probability", qProbability),
	criterionField(hazards.CriterionMinUllagePercent, "Least ullage at the hottest", qPercent),
	criterionField(hazards.CriterionMaxFractionOfLimit, "Highest fraction of a limit", qNumber),
	criterionField(hazards.CriterionMaxPercentLFL, "Highest share of the LFL", qPercent),
}

// criterionField is the form field of the numeric criterion key.
func criterionField(key, label string, q quantity) formField {
	get := criterionGetter(key)
	return formField{hazards.FieldCriteria + "." + key, label, q,
		func(d *hazards.Design) float64 { return *get(&d.Criteria) },
		func(d *hazards.Design, x float64) { *get(&d.Criteria) = x }}
}

// partFieldSpec is one number of a part of the vessel, below the part's
// path; every such number is a length.
type partFieldSpec struct {
	key   string
	label string
	get   func(*hazards.Part) float64
	set   func(*hazards.Part, float64)
}

// partFieldSpecs are the numbers of a part in the order of the form; the
// length is shown for tubes only.
var partFieldSpecs = []partFieldSpec{
	{hazards.PartOuterDiameter, "Outer diameter", func(p *hazards.Part) float64 { return p.OuterDiameterM }, func(p *hazards.Part, x float64) { p.OuterDiameterM = x }},
	{hazards.PartWallThickness, "Wall thickness", func(p *hazards.Part) float64 { return p.WallThicknessM }, func(p *hazards.Part, x float64) { p.WallThicknessM = x }},
	{hazards.PartWallTolerance, "Wall tolerance (±)", func(p *hazards.Part) float64 { return p.WallToleranceM }, func(p *hazards.Part, x float64) { p.WallToleranceM = x }},
	{hazards.PartLength, "Length", func(p *hazards.Part) float64 { return p.LengthM }, func(p *hazards.Part, x float64) { p.LengthM = x }},
}

// partFormField is the form field of number spec of part i.
func partFormField(i int, spec partFieldSpec) formField {
	part := func(d *hazards.Design) *hazards.Part { return &d.Vessel.Parts[i] }
	return formField{hazards.PartField(i, spec.key), spec.label, qLength,
		func(d *hazards.Design) float64 { return spec.get(part(d)) },
		func(d *hazards.Design, x float64) { spec.set(part(d), x) }}
}

// designFields returns the form fields of a design in the order of the
// form: formFields, then the numbers of each part (a tube's length, and
// no sphere's).
func designFields(d *hazards.Design) []formField {
	out := append([]formField(nil), formFields...)
	for i, p := range d.Vessel.Parts {
		for _, spec := range partFieldSpecs {
			if spec.key == hazards.PartLength && p.Shape != hazards.ShapeTube {
				continue
			}
			out = append(out, partFormField(i, spec))
		}
	}
	return out
}

// formFieldAt returns the form field at a path, the parts' numbers
// included, for any part index.
func formFieldAt(path string) (formField, bool) {
	for _, f := range formFields {
		if f.path == path {
			return f, true
		}
	}
	if i, key, ok := partIndexAndKey(path); ok {
		for _, spec := range partFieldSpecs {
			if spec.key == key {
				return partFormField(i, spec), true
			}
		}
	}
	return formField{}, false
}

// partIndexAndKey splits "vessel.parts[2].length_m" into 2 and
// "length_m".
func partIndexAndKey(path string) (int, string, bool) {
	if !hazards.IsPartField(path) {
		return 0, "", false
	}
	rest := strings.TrimPrefix(path, hazards.FieldParts+"[")
	num, key, ok := strings.Cut(rest, "].")
	if !ok {
		return 0, "", false
	}
	i := 0
	for _, c := range num {
		if c < '0' || c > '9' {
			return 0, "", false
		}
		i = 10*i + int(c-'0')
	}
	return i, key, num != ""
}

// fieldRank orders paths as the form shows them: the numbers outside
// the parts in form order, then the parts' numbers, part by part;
// anything else last.
func fieldRank(path string) int {
	for i, f := range formFields {
		if f.path == path {
			return i
		}
	}
	if i, key, ok := partIndexAndKey(path); ok {
		for j, spec := range partFieldSpecs {
			if spec.key == key {
				return len(formFields) + i*len(partFieldSpecs) + j
			}
		}
	}
	return 1 << 30
}

// quantityOf returns the quantity of the form field at a path.
func quantityOf(path string) (quantity, bool) {
	if f, ok := formFieldAt(path); ok {
		return f.q, true
	}
	return qNumber, false
}

// labelOf names the field at a path for messages: a number's label on
// the form, or the name of a choice.
func labelOf(path string) string {
	if f, ok := formFieldAt(path); ok {
		return f.label
	}
	switch {
	case path == hazards.FieldFluid:
		return "Fluid"
	case strings.HasPrefix(path, hazards.FieldGlass):
		return "Glass"
	case path == hazards.FieldParts:
		return "Parts of the vessel"
	case strings.HasPrefix(path, hazards.FieldLimitBodies):
		return "Bodies whose limits apply"
	case path == hazards.FieldStateTemperature:
		return "Temperature"
	case path == hazards.FieldSealPart:
		return "Part carrying the seal"
	}
	return path
}

// requiredOnNew reports whether the field at path starts empty on a new
// design: the fill, the hottest and coldest temperatures and every
// dimension of the vessel, which no default can stand for. The room, the
// shocks and the criteria start from the reviewer's usual values.
func requiredOnNew(path string) bool {
	switch path {
	case hazards.FieldFillMass, hazards.FieldHottest, hazards.FieldColdest:
		return true
	}
	return hazards.IsPartField(path)
}
