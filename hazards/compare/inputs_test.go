package compare

import (
	"math"
	"reflect"
	"testing"

	"ullage/hazards"
)

// Helpers for the expected typed values.
func num(u Unit, x float64) InputValue { return InputValue{Kind: KindNumber, Unit: u, Number: x} }
func text(s string) InputValue         { return InputValue{Kind: KindText, Text: s} }

var absent = InputValue{Kind: KindAbsent}

// field is one named field of an expected group.
func field(name string, v InputValue) InputField { return InputField{Name: name, Value: v} }

// The expected changes are read off the edits: each changed field with
// its SI value and the unit its JSON name carries.
func TestInputChanges(t *testing.T) {
	custom := &hazards.Glass{ID: "mine", Name: "Own glass", WeibullModulus: hazards.Sourced{Value: 8, Source: "own tests"}}
	sourced := func(u Unit, x float64, src string) InputValue {
		return InputValue{Kind: KindGroup, Fields: []InputField{field("value", num(u, x)), field("source", text(src))}}
	}
	part := func(name, shape string, od, wall, length float64) InputValue {
		return InputValue{Kind: KindGroup, Fields: []InputField{field("name", text(name)), field("shape", text(shape)),
			field("outer_diameter_m", num(UnitLength, od)), field("wall_thickness_m", num(UnitLength, wall)),
			field("wall_tolerance_m", num(UnitLength, 0)), field("length_m", num(UnitLength, length))}}
	}
	tests := []struct {
		name string
		edit func(d *hazards.Design)
		want []InputChange
	}{
		{"nothing", func(d *hazards.Design) {}, nil},
		{"fluid", func(d *hazards.Design) { d.Fluid = "ethanol" },
			[]InputChange{{"fluid", UnitNone, text("acetone"), text("ethanol")}}},
		{"hottest temperature in kelvin", func(d *hazards.Design) { d.HottestK = 333.15 },
			[]InputChange{{"hottest_k", UnitTemperature, num(UnitTemperature, 349.15), num(UnitTemperature, 333.15)}}},
		{"wall of the first part", func(d *hazards.Design) { d.Vessel.Parts[0].WallThicknessM = 0.002 },
			[]InputChange{{"vessel.parts[0].wall_thickness_m", UnitLength, num(UnitLength, 0.0015), num(UnitLength, 0.002)}}},
		{"part added", func(d *hazards.Design) {
			d.Vessel.Parts = append(d.Vessel.Parts, hazards.Part{Name: "stem", Shape: hazards.ShapeTube, OuterDiameterM: 0.006, WallThicknessM: 0.001, LengthM: 0.05})
		}, []InputChange{{"vessel.parts[1]", UnitNone, absent, part("stem", "tube", 0.006, 0.001, 0.05)}}},
		{"part removed", func(d *hazards.Design) { d.Vessel.Parts = nil },
			[]InputChange{{"vessel.parts[0]", UnitNone, part("bulb", "sphere", 0.04, 0.0015, 0), absent}}},
		{"measured volume", func(d *hazards.Design) { d.Vessel.InternalVolumeM3 = 2.6e-5 },
			[]InputChange{{"vessel.internal_volume_m3", UnitVolume, num(UnitVolume, 0), num(UnitVolume, 2.6e-5)}}},
		{"room and ventilation", func(d *hazards.Design) {
			d.Room.AirChangesPerHour = 2
			d.Room.NearFieldAirSpeed = 0.05
			d.Room.NearFieldRadiusM = 2
		},
			[]InputChange{{"room.air_changes_per_hour", UnitPerHour, num(UnitPerHour, 0.45), num(UnitPerHour, 2)},
				{"room.near_field_radius_m", UnitRoomLength, num(UnitRoomLength, 1), num(UnitRoomLength, 2)},
				{"room.near_field_air_speed_m_s", UnitSpeed, num(UnitSpeed, 0.1), num(UnitSpeed, 0.05)}}},
		{"hours and criteria", func(d *hazards.Design) {
			d.HoursAtHottest = 500
			d.Criteria.MaxPercentLFL = 10
			d.Criteria.MinBurstSafetyFactor = 5
		},
			[]InputChange{{"hours_at_hottest", UnitHours, num(UnitHours, 1000), num(UnitHours, 500)},
				{"criteria.min_burst_safety_factor", UnitNone, num(UnitNone, 4), num(UnitNone, 5)},
				{"criteria.max_percent_lfl", UnitPercentLFL, num(UnitPercentLFL, 25), num(UnitPercentLFL, 10)}}},
		{"limit bodies as a whole", func(d *hazards.Design) { d.Criteria.LimitBodies = []string{"NIOSH", "OSHA"} },
			[]InputChange{{"criteria.limit_bodies", UnitNone, InputValue{Kind: KindList, Items: []InputValue{}},
				InputValue{Kind: KindList, Items: []InputValue{text("NIOSH"), text("OSHA")}}}}},
		{"custom glass added", func(d *hazards.Design) { d.Glass.Custom = custom },
			[]InputChange{{"glass.custom", UnitNone, absent, InputValue{Kind: KindGroup, Fields: []InputField{
				field("id", text("mine")), field("name", text("Own glass")), field("note", text("")),
				field("elastic_modulus_pa", sourced(UnitPressure, 0, "")), field("poisson_ratio", sourced(UnitNone, 0, "")),
				field("expansion_per_k", sourced(UnitPerKelvin, 0, "")), field("characteristic_strength_pa", sourced(UnitPressure, 0, "")),
				field("reference_area_m2", sourced(UnitArea, 0, "")), field("reference_load_seconds", sourced(UnitSeconds, 0, "")),
				field("weibull_modulus", sourced(UnitNone, 8, "own tests")), field("stress_corrosion_exponent", sourced(UnitNone, 0, "")),
			}}}}},
		{"residual gas", func(d *hazards.Design) { d.ResidualGasPressurePa = 500; d.FillMassToleranceKg = 0.0005 },
			[]InputChange{{"fill_mass_tolerance_kg", UnitMass, num(UnitMass, 0), num(UnitMass, 0.0005)},
				{"residual_gas_pressure_pa", UnitPressure, num(UnitPressure, 0), num(UnitPressure, 500)}}},
		{"minus zero is zero", func(d *hazards.Design) { d.ResidualGasPressurePa = math.Copysign(0, -1) }, nil},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			a, b := overfilledBulb(), overfilledBulb()
			tt.edit(&b)
			got := inputChanges(&a, &b)
			if !reflect.DeepEqual(got, tt.want) {
				t.Errorf("changes\n got %+v\nwant %+v", got, tt.want)
			}
		})
	}
}

// Sourced values of a custom glass carry their parent's unit.
func TestInputChangesCustomGlass(t *testing.T) {
	a, b := overfilledBulb(), overfilledBulb()
	a.Glass.Custom = &hazards.Glass{ID: "mine", CharacteristicStrength: hazards.Sourced{Value: 3e7, Source: "own tests"}, Expansion: hazards.Sourced{Value: 9e-6}}
	g := *a.Glass.Custom
	g.CharacteristicStrength.Value = 4e7
	g.Expansion.Value = 3.3e-6
	g.Expansion.Source = "maker's sheet"
	b.Glass.Custom = &g
	want := []InputChange{
		{"glass.custom.expansion_per_k.value", UnitPerKelvin, num(UnitPerKelvin, 9e-6), num(UnitPerKelvin, 3.3e-6)},
		{"glass.custom.expansion_per_k.source", UnitNone, text(""), text("maker's sheet")},
		{"glass.custom.characteristic_strength_pa.value", UnitPressure, num(UnitPressure, 3e7), num(UnitPressure, 4e7)},
	}
	if got := inputChanges(&a, &b); !reflect.DeepEqual(got, want) {
		t.Errorf("changes\n got %+v\nwant %+v", got, want)
	}
}

// The unit of a field comes from the ending of its JSON name; a length
// or volume under room. is the room's.
func TestUnitOf(t *testing.T) {
	tests := []struct {
		path, name string
		want       Unit
	}{
		{"fill_mass_kg", "fill_mass_kg", UnitMass},
		{"sealing_temperature_k", "sealing_temperature_k", UnitTemperature},
		{"thermal_shock.hot_to_cold_k", "hot_to_cold_k", UnitTemperatureChange},
		{"glass.custom.expansion_per_k.value", "expansion_per_k", UnitPerKelvin},
		{"room.volume_m3", "volume_m3", UnitRoomVolume},
		{"vessel.internal_volume_m3", "internal_volume_m3", UnitVolume},
		{"glass.custom.reference_area_m2.value", "reference_area_m2", UnitArea},
		{"room.near_field_radius_m", "near_field_radius_m", UnitRoomLength},
		{"vessel.parts[0].outer_diameter_m", "outer_diameter_m", UnitLength},
		{"room.near_field_air_speed_m_s", "near_field_air_speed_m_s", UnitSpeed},
		{"room.air_changes_per_hour", "air_changes_per_hour", UnitPerHour},
		{"ambient_pressure_pa", "ambient_pressure_pa", UnitPressure},
		{"service_life_years", "service_life_years", UnitYears},
		{"room.exposure_minutes", "exposure_minutes", UnitMinutes},
		{"glass.custom.reference_load_seconds.value", "reference_load_seconds", UnitSeconds},
		{"criteria.min_ullage_percent", "min_ullage_percent", UnitPercent},
		{"criteria.max_percent_lfl", "max_percent_lfl", UnitPercentLFL},
		{"hours_at_hottest", "hours_at_hottest", UnitHours},
		{"room.mixing_factor", "mixing_factor", UnitNone},
		{"criteria.max_failure_probability", "max_failure_probability", UnitNone},
	}
	for _, tt := range tests {
		if got := unitOf(tt.path, tt.name); got != tt.want {
			t.Errorf("unitOf(%q) = %q; want %q", tt.path, got, tt.want)
		}
	}
}
