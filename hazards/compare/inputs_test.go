package compare

import (
	"math"
	"reflect"
	"testing"

	"ullage/hazards"
)

func TestInputChanges(t *testing.T) {
	custom := &hazards.Glass{ID: "mine", Name: "Own glass", WeibullModulus: hazards.Sourced{Value: 8, Source: "own tests"}}
	tests := []struct {
		name string
		edit func(d *hazards.Design)
		want []InputChange
	}{
		{"nothing", func(d *hazards.Design) {}, nil},
		{"fluid", func(d *hazards.Design) { d.Fluid = "ethanol" },
			[]InputChange{{"fluid", `"acetone"`, `"ethanol"`}}},
		{"hottest temperature in kelvin and Celsius", func(d *hazards.Design) { d.HottestK = 333.15 },
			[]InputChange{{"hottest_k", "349.15 K (76 °C)", "333.15 K (60 °C)"}}},
		{"coldest below zero", func(d *hazards.Design) { d.ColdestK = 244.15 },
			[]InputChange{{"coldest_k", "253.15 K (-20 °C)", "244.15 K (-29 °C)"}}},
		{"wall of the first part", func(d *hazards.Design) { d.Vessel.Parts[0].WallThicknessM = 0.002 },
			[]InputChange{{"vessel.parts[0].wall_thickness_m", "0.0015 m", "0.002 m"}}},
		{"part added", func(d *hazards.Design) {
			d.Vessel.Parts = append(d.Vessel.Parts, hazards.Part{Name: "stem", Shape: hazards.ShapeTube, OuterDiameterM: 0.006, WallThicknessM: 0.001, LengthM: 0.05})
		}, []InputChange{{"vessel.parts[1]", Absent,
			`{name: "stem", shape: "tube", outer_diameter_m: 0.006 m, wall_thickness_m: 0.001 m, wall_tolerance_m: 0 m, length_m: 0.05 m}`}}},
		{"part removed", func(d *hazards.Design) { d.Vessel.Parts = nil },
			[]InputChange{{"vessel.parts[0]",
				`{name: "bulb", shape: "sphere", outer_diameter_m: 0.04 m, wall_thickness_m: 0.0015 m, wall_tolerance_m: 0 m, length_m: 0 m}`, Absent}}},
		{"measured volume", func(d *hazards.Design) { d.Vessel.InternalVolumeM3 = 2.6e-5 },
			[]InputChange{{"vessel.internal_volume_m3", "0 m³", "2.6e-05 m³"}}},
		{"room and ventilation", func(d *hazards.Design) { d.Room.AirChangesPerHour = 2; d.Room.NearFieldAirSpeed = 0.05 },
			[]InputChange{{"room.air_changes_per_hour", "0.45 per hour", "2 per hour"}, {"room.near_field_air_speed_m_s", "0.1 m/s", "0.05 m/s"}}},
		{"hours and criteria", func(d *hazards.Design) {
			d.HoursAtHottest = 500
			d.Criteria.MaxPercentLFL = 10
			d.Criteria.MinBurstSafetyFactor = 5
		},
			[]InputChange{{"hours_at_hottest", "1000 h", "500 h"}, {"criteria.min_burst_safety_factor", "4", "5"}, {"criteria.max_percent_lfl", "25 % of LFL", "10 % of LFL"}}},
		{"limit bodies as a whole", func(d *hazards.Design) { d.Criteria.LimitBodies = []string{"NIOSH", "OSHA"} },
			[]InputChange{{"criteria.limit_bodies", "[]", `["NIOSH", "OSHA"]`}}},
		{"custom glass added", func(d *hazards.Design) { d.Glass.Custom = custom },
			[]InputChange{{"glass.custom", Absent, `{id: "mine", name: "Own glass", note: "", ` +
				`elastic_modulus_pa: {value: 0 Pa, source: ""}, poisson_ratio: {value: 0, source: ""}, ` +
				`expansion_per_k: {value: 0 1/K, source: ""}, characteristic_strength_pa: {value: 0 Pa, source: ""}, ` +
				`reference_area_m2: {value: 0 m², source: ""}, reference_load_seconds: {value: 0 s, source: ""}, ` +
				`weibull_modulus: {value: 8, source: "own tests"}, stress_corrosion_exponent: {value: 0, source: ""}}`}}},
		{"residual gas", func(d *hazards.Design) { d.ResidualGasPressurePa = 500; d.FillMassToleranceKg = 0.0005 },
			[]InputChange{{"fill_mass_tolerance_kg", "0 kg", "0.0005 kg"}, {"residual_gas_pressure_pa", "0 Pa", "500 Pa"}}},
		{"minus zero is zero", func(d *hazards.Design) { d.ResidualGasPressurePa = math.Copysign(0, -1) }, nil},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			a, b := overfilledBulb(), overfilledBulb()
			tt.edit(&b)
			got := inputChanges(&a, &b)
			if !reflect.DeepEqual(got, tt.want) {
				t.Errorf("changes\n got %q\nwant %q", got, tt.want)
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
		{"glass.custom.expansion_per_k.value", "9e-06 1/K", "3.3e-06 1/K"},
		{"glass.custom.expansion_per_k.source", `""`, `"maker's sheet"`},
		{"glass.custom.characteristic_strength_pa.value", "3e+07 Pa", "4e+07 Pa"},
	}
	if got := inputChanges(&a, &b); !reflect.DeepEqual(got, want) {
		t.Errorf("changes\n got %q\nwant %q", got, want)
	}
}

func TestWithUnit(t *testing.T) {
	tests := []struct {
		name string
		x    float64
		want string
	}{
		{"fill_mass_kg", 0.006, "0.006 kg"},
		{"sealing_temperature_k", 273.15, "273.15 K (0 °C)"},
		{"expansion_per_k", 9e-6, "9e-06 1/K"},
		{"volume_m3", 30, "30 m³"},
		{"reference_area_m2", 1, "1 m²"},
		{"near_field_radius_m", 1, "1 m"},
		{"near_field_air_speed_m_s", 0.1, "0.1 m/s"},
		{"air_changes_per_hour", 0.45, "0.45 per hour"},
		{"ambient_pressure_pa", 101325, "101325 Pa"},
		{"service_life_years", 10, "10 years"},
		{"exposure_minutes", 480, "480 min"},
		{"reference_load_seconds", 60, "60 s"},
		{"min_ullage_percent", 5, "5 %"},
		{"max_percent_lfl", 25, "25 % of LFL"},
		{"hours_at_hottest", 1000, "1000 h"},
		{"mixing_factor", 3, "3"},
		{"max_failure_probability", 1e-4, "0.0001"},
	}
	for _, tt := range tests {
		if got := withUnit(tt.name, tt.x); got != tt.want {
			t.Errorf("withUnit(%q, %g) = %q; want %q", tt.name, tt.x, got, tt.want)
		}
	}
}
