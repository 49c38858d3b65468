package hazards

import (
	"reflect"
	"slices"
	"strings"
	"testing"
)

// designPaths lists every JSON path of a Design from its struct tags (the
// design file's own spelling), with the parts as part 0 and the fields of
// a custom glass left out (the pointer is not walked into): a glass is
// chosen whole.
func designPaths() []string {
	var out []string
	var walk func(t reflect.Type, prefix string)
	walk = func(t reflect.Type, prefix string) {
		for i := range t.NumField() {
			f := t.Field(i)
			name, _, _ := strings.Cut(f.Tag.Get("json"), ",")
			path := prefix + name
			out = append(out, path)
			ft := f.Type
			switch {
			case path == FieldGlass:
				walk(reflect.TypeFor[GlassChoice](), path+".")
			case ft.Kind() == reflect.Slice && ft.Elem().Kind() == reflect.Struct:
				walk(ft.Elem(), path+"[0].")
			case ft.Kind() == reflect.Struct:
				walk(ft, path+".")
			}
		}
	}
	walk(reflect.TypeFor[Design](), "")
	return out
}

// TestFieldPathsAreTheDesignsOwn: every field constant names a path of
// the Design's JSON tags, and every input of a Design has a constant, so
// that no caller needs a literal of its own.
func TestFieldPathsAreTheDesignsOwn(t *testing.T) {
	constants := []string{
		FieldFluid, FieldFillMass, FieldFillMassTolerance, FieldVessel, FieldInternalVolume, FieldVolumeTolerance,
		FieldParts, FieldSealingTemperature, FieldResidualGasPressure, FieldHottest, FieldColdest,
		FieldAmbientPressure, FieldGlass, FieldGlassID, FieldGlassCustom, FieldServiceLife, FieldHoursAtHottest,
		FieldRoom, FieldRoomPreset, FieldRoomVolume, FieldAirChanges, FieldMixingFactor, FieldNearFieldRadius,
		FieldNearFieldAirSpeed, FieldExposureMinutes,
		FieldCriteria, FieldMinBurstSafetyFactor, FieldMinImplosionSafetyFactor, FieldMaxFailureProbability,
		FieldMinUllagePercent, FieldMaxFractionOfLimit, FieldMaxPercentLFL, FieldLimitBodies, FieldLimitSets,
		FieldThermalShock, FieldHotToCold, FieldHotToColdPreset, FieldColdToHot, FieldColdToHotPreset,
		FieldSealStress, FieldSealPart, FieldResidualStress, FieldRetardation, FieldSealPathLength,
	}
	for _, k := range []string{RoomKeyPreset, RoomKeyVolume, RoomKeyAirChanges, RoomKeyMixingFactor, RoomKeyNearFieldRadius,
		RoomKeyNearFieldAirSpeed, RoomKeyExposureMinutes} {
		if !slices.Contains(constants, FieldRoom+"."+k) {
			t.Errorf("room key %q has no Field constant", k)
		}
	}
	for _, k := range []string{PartName, PartShape, PartOuterDiameter, PartWallThickness, PartWallTolerance, PartLength} {
		constants = append(constants, PartField(0, k))
	}
	paths := designPaths()
	for _, c := range constants {
		if !slices.Contains(paths, c) {
			t.Errorf("constant %q is not a path of hazards.Design", c)
		}
	}
	for _, p := range paths {
		if !slices.Contains(constants, p) {
			t.Errorf("path %q of hazards.Design has no constant", p)
		}
	}
}

// TestCriterionKeysAreGrounded: each criterion key has its grounds.
func TestCriterionKeysAreGrounded(t *testing.T) {
	for _, k := range []string{CriterionMinBurstSafetyFactor, CriterionMinImplosionSafetyFactor, CriterionMaxFailureProbability,
		CriterionMinUllagePercent, CriterionMaxFractionOfLimit, CriterionMaxPercentLFL} {
		if DefaultCriteriaGrounds[k] == "" {
			t.Errorf("criterion %q has no grounds in DefaultCriteriaGrounds", k)
		}
	}
}

// TestPartFieldPaths: part paths as the engine's errors spell them.
func TestPartFieldPaths(t *testing.T) {
	tests := []struct {
		i    int
		key  string
		want string
		part bool
	}{
		{0, PartWallThickness, "vessel.parts[0].wall_thickness_m", true},
		{12, PartLength, "vessel.parts[12].length_m", true},
		{3, "", "vessel.parts[3]", true},
	}
	if got := ItemField(FieldLimitSets, 1); got != "criteria.limit_sets[1]" {
		t.Errorf("ItemField(FieldLimitSets, 1) = %q, want criteria.limit_sets[1]", got)
	}
	for _, tt := range tests {
		got := PartField(tt.i, tt.key)
		if got != tt.want || IsPartField(got) != tt.part {
			t.Errorf("PartField(%d, %q) = %q (part field %v), want %q", tt.i, tt.key, got, IsPartField(got), tt.want)
		}
	}
	for _, p := range []string{FieldParts, FieldInternalVolume, "vessel.parts["} {
		if IsPartField(p) {
			t.Errorf("IsPartField(%q) = true, want false", p)
		}
	}
}
