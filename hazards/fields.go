package hazards

import (
	"strconv"
	"strings"
)

// Field paths of a Design: the JSON path of each input, as the design
// file spells it and as InputError.Field names it. Programs that show,
// compare or store single inputs name them by these constants, not by
// string literals of their own.
const (
	FieldFluid               = "fluid"
	FieldFillMass            = "fill_mass_kg"
	FieldFillMassTolerance   = "fill_mass_tolerance_kg"
	FieldVessel              = "vessel"
	FieldInternalVolume      = FieldVessel + ".internal_volume_m3"
	FieldVolumeTolerance     = FieldVessel + ".volume_tolerance_m3"
	FieldParts               = FieldVessel + ".parts"
	FieldSealingTemperature  = "sealing_temperature_k"
	FieldResidualGasPressure = "residual_gas_pressure_pa"
	FieldHottest             = "hottest_k"
	FieldColdest             = "coldest_k"
	FieldAmbientPressure     = "ambient_pressure_pa"
	FieldGlass               = "glass"
	FieldGlassID             = FieldGlass + ".id"
	FieldGlassCustom         = FieldGlass + ".custom"
	FieldServiceLife         = "service_life_years"
	FieldHoursAtHottest      = "hours_at_hottest"

	FieldRoom              = "room"
	FieldRoomPreset        = FieldRoom + "." + RoomKeyPreset
	FieldRoomVolume        = FieldRoom + "." + RoomKeyVolume
	FieldAirChanges        = FieldRoom + "." + RoomKeyAirChanges
	FieldMixingFactor      = FieldRoom + "." + RoomKeyMixingFactor
	FieldNearFieldRadius   = FieldRoom + "." + RoomKeyNearFieldRadius
	FieldNearFieldAirSpeed = FieldRoom + "." + RoomKeyNearFieldAirSpeed
	FieldExposureMinutes   = FieldRoom + "." + RoomKeyExposureMinutes

	FieldCriteria                 = "criteria"
	FieldMinBurstSafetyFactor     = FieldCriteria + "." + CriterionMinBurstSafetyFactor
	FieldMinImplosionSafetyFactor = FieldCriteria + "." + CriterionMinImplosionSafetyFactor
	FieldMaxFailureProbability    = FieldCriteria + "." + CriterionMaxFailureProbability
	FieldMinUllagePercent         = FieldCriteria + "." + CriterionMinUllagePercent
	FieldMaxFractionOfLimit       = FieldCriteria + "." + CriterionMaxFractionOfLimit
	FieldMaxPercentLFL            = FieldCriteria + "." + CriterionMaxPercentLFL
	FieldLimitBodies              = FieldCriteria + ".limit_bodies"
	FieldLimitSets                = FieldCriteria + ".limit_sets"

	FieldThermalShock    = "thermal_shock"
	FieldHotToCold       = FieldThermalShock + ".hot_to_cold_k"
	FieldHotToColdPreset = FieldThermalShock + ".hot_to_cold_preset_id"
	FieldColdToHot       = FieldThermalShock + ".cold_to_hot_k"
	FieldColdToHotPreset = FieldThermalShock + ".cold_to_hot_preset_id"
	FieldSealStress      = "seal_stress"
	FieldSealPart        = FieldSealStress + ".part"
	FieldResidualStress  = FieldSealStress + ".residual_stress_pa"
	FieldRetardation     = FieldSealStress + ".retardation_m"
	FieldSealPathLength  = FieldSealStress + ".path_length_m"
)

// FieldStateTemperature is the field an InputError names when a
// temperature asked of the engine (a point on a chart, a state) is
// outside what the fluid allows; it is not an input of a Design.
const FieldStateTemperature = "temperature"

// partsIndexOpening begins the path of every part: "vessel.parts[".
const partsIndexOpening = FieldParts + "["

// Keys of the numeric criteria inside Criteria, as the design file spells
// them and as DefaultCriteriaGrounds is keyed; the field path of each is
// FieldCriteria + "." + key.
const (
	CriterionMinBurstSafetyFactor     = "min_burst_safety_factor"
	CriterionMinImplosionSafetyFactor = "min_implosion_safety_factor"
	CriterionMaxFailureProbability    = "max_failure_probability"
	CriterionMinUllagePercent         = "min_ullage_percent"
	CriterionMaxFractionOfLimit       = "max_fraction_of_limit"
	CriterionMaxPercentLFL            = "max_percent_lfl"
)

// Keys of a room's fields, below FieldRoom (or the prefix Room.Validate
// is given).
const (
	RoomKeyPreset            = "preset_id"
	RoomKeyVolume            = "volume_m3"
	RoomKeyAirChanges        = "air_changes_per_hour"
	RoomKeyMixingFactor      = "mixing_factor"
	RoomKeyNearFieldRadius   = "near_field_radius_m"
	RoomKeyNearFieldAirSpeed = "near_field_air_speed_m_s"
	RoomKeyExposureMinutes   = "exposure_minutes"
)

// Keys of a part's fields, below PartField.
const (
	PartName          = "name"
	PartShape         = "shape"
	PartOuterDiameter = "outer_diameter_m"
	PartWallThickness = "wall_thickness_m"
	PartWallTolerance = "wall_tolerance_m"
	PartLength        = "length_m"
)

// PartField returns the field path of key in part i of the vessel:
// PartField(0, PartWallThickness) is "vessel.parts[0].wall_thickness_m".
// With key "" it is the path of the part itself, "vessel.parts[0]".
func PartField(i int, key string) string {
	p := ItemField(FieldParts, i)
	if key != "" {
		p += "." + key
	}
	return p
}

// IsPartField reports whether path names one part of the vessel or a
// field inside one ("vessel.parts[2]", "vessel.parts[0].length_m"); the
// list itself, FieldParts, is not a part field.
func IsPartField(path string) bool {
	return len(path) > len(partsIndexOpening) && strings.HasPrefix(path, partsIndexOpening)
}

// ItemField returns the path of item i of the list at path:
// ItemField(FieldLimitSets, 1) is "criteria.limit_sets[1]".
func ItemField(path string, i int) string {
	return path + "[" + strconv.Itoa(i) + "]"
}
