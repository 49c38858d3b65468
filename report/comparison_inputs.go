package report

import (
	"fmt"
	"strings"
	"ullage/report/display"

	"ullage/hazards"
)

// inputSpec is one row of the side-by-side inputs: its label, the design
// fields (JSON paths) whose change marks it, and how to print it.
type inputSpec struct {
	label  string
	fields []string
	value  func(d *hazards.Design, a *hazards.Assessment) string
}

// inputSpecs lists the rows for two designs with up to nParts parts.
func inputSpecs(u unitSystem, nParts int) []inputSpec {
	type dv = func(d *hazards.Design, a *hazards.Assessment) string
	num := func(f func(d *hazards.Design) string) dv {
		return func(d *hazards.Design, _ *hazards.Assessment) string { return f(d) }
	}
	specs := []inputSpec{
		{"Fluid", []string{"fluid"}, func(d *hazards.Design, a *hazards.Assessment) string {
			if a != nil && a.Fluid != nil {
				return a.Fluid.Name
			}
			return d.Fluid
		}},
		{"Fill mass", []string{"fill_mass_kg", "fill_mass_tolerance_kg"}, num(func(d *hazards.Design) string {
			return withTolerance(u.mass(d.FillMassKg), d.FillMassToleranceKg, u.mass)
		})},
		{"Internal volume", []string{"vessel.internal_volume_m3", "vessel.volume_tolerance_m3"}, num(func(d *hazards.Design) string {
			if d.Vessel.InternalVolumeM3 == 0 {
				return "from the parts, " + u.vesselVolume(d.Vessel.PartsVolume())
			}
			return withTolerance(u.vesselVolume(d.Vessel.InternalVolumeM3), d.Vessel.VolumeToleranceM3, u.vesselVolume) + " measured"
		})},
	}
	for i := 0; i < nParts; i++ {
		i := i
		specs = append(specs, inputSpec{fmt.Sprintf("Part %d", i+1), []string{fmt.Sprintf("vessel.parts[%d]", i)}, num(func(d *hazards.Design) string {
			if i >= len(d.Vessel.Parts) {
				return "absent"
			}
			return partText(d.Vessel.Parts[i], u)
		})})
	}
	specs = append(specs,
		inputSpec{"Sealing temperature", []string{"sealing_temperature_k"}, num(func(d *hazards.Design) string { return u.temperature(d.SealingTemperatureK) })},
		inputSpec{LabelResidualGas, []string{"residual_gas_pressure_pa"}, num(func(d *hazards.Design) string {
			if d.ResidualGasPressurePa == 0 {
				return "none"
			}
			return u.pressure(d.ResidualGasPressurePa)
		})},
		inputSpec{"Hottest temperature", []string{"hottest_k"}, num(func(d *hazards.Design) string { return u.temperature(d.HottestK) })},
		inputSpec{"Coldest temperature", []string{"coldest_k"}, num(func(d *hazards.Design) string { return u.temperature(d.ColdestK) })},
		inputSpec{LabelAmbientPressure, []string{"ambient_pressure_pa"}, num(func(d *hazards.Design) string { return u.pressure(d.AmbientPressurePa) })},
		inputSpec{"Glass", []string{"glass"}, func(d *hazards.Design, a *hazards.Assessment) string {
			if d.Glass.Custom != nil {
				return "custom: " + d.Glass.Custom.Name
			}
			if a != nil && a.Glass.Name != "" {
				return a.Glass.Name
			}
			return d.Glass.ID
		}},
		inputSpec{"Service life", []string{"service_life_years"}, num(func(d *hazards.Design) string { return display.Stated(d.ServiceLifeYears) + " years" })},
		inputSpec{"Time at the hottest", []string{"hours_at_hottest"}, num(func(d *hazards.Design) string { return display.Stated(d.HoursAtHottest) + " h" })},
		inputSpec{"Sudden temperature change", []string{"thermal_shock"}, num(func(d *hazards.Design) string { return shockInputText(d.ThermalShock, u) })},
		inputSpec{"Residual stress at the seal", []string{"seal_stress"}, num(func(d *hazards.Design) string { return sealInputText(d.SealStress, u) })},
		inputSpec{"Room", []string{"room.preset_id"}, num(func(d *hazards.Design) string { return presetName(d.Room.PresetID) })},
		inputSpec{"Room volume", []string{"room.volume_m3"}, num(func(d *hazards.Design) string { return u.roomVolume(d.Room.VolumeM3) })},
		inputSpec{"Air changes per hour", []string{"room.air_changes_per_hour"}, num(func(d *hazards.Design) string { return display.Stated(d.Room.AirChangesPerHour) })},
		inputSpec{"Mixing factor", []string{"room.mixing_factor"}, num(func(d *hazards.Design) string { return display.Stated(d.Room.MixingFactor) })},
		inputSpec{"Near-field radius", []string{"room.near_field_radius_m"}, num(func(d *hazards.Design) string { return u.roomLength(d.Room.NearFieldRadiusM) })},
		inputSpec{"Near-field air speed", []string{"room.near_field_air_speed_m_s"}, num(func(d *hazards.Design) string { return u.speed(d.Room.NearFieldAirSpeed) })},
		inputSpec{LabelExposureTime, []string{"room.exposure_minutes"}, num(func(d *hazards.Design) string { return display.Stated(d.Room.ExposureMinutes) + " min" })},
		inputSpec{"Criteria: burst, implosion safety factors", []string{"criteria.min_burst_safety_factor", "criteria.min_implosion_safety_factor"}, num(func(d *hazards.Design) string {
			return "≥ " + display.Stated(d.Criteria.MinBurstSafetyFactor) + ", ≥ " + display.Stated(d.Criteria.MinImplosionSafetyFactor)
		})},
		inputSpec{"Criteria: failure probability", []string{"criteria.max_failure_probability"}, num(func(d *hazards.Design) string { return "≤ " + display.Stated(d.Criteria.MaxFailureProbability) })},
		inputSpec{"Criteria: ullage at the hottest", []string{"criteria.min_ullage_percent"}, num(func(d *hazards.Design) string { return "≥ " + display.Stated(d.Criteria.MinUllagePercent) + " %" })},
		inputSpec{"Criteria: exposure, flammability", []string{"criteria.max_fraction_of_limit", "criteria.max_percent_lfl", "criteria.limit_bodies"}, num(func(d *hazards.Design) string {
			bodies := "all bodies"
			if len(d.Criteria.LimitBodies) > 0 {
				bodies = strings.Join(d.Criteria.LimitBodies, ", ")
			}
			return fmt.Sprintf("≤ %s of the limit (%s); ≤ %s %% LFL", display.Stated(d.Criteria.MaxFractionOfLimit), bodies, display.Stated(d.Criteria.MaxPercentLFL))
		})},
		inputSpec{"Criteria: limit sets", []string{"criteria.limit_sets"}, num(func(d *hazards.Design) string {
			var names []string
			for _, id := range d.Criteria.AppliedLimitSets() {
				names = append(names, display.LimitSetShort(id))
			}
			return strings.Join(names, ", ")
		})},
	)
	return specs
}

// partText describes one part in a line.
func partText(p hazards.Part, u unitSystem) string {
	s := fmt.Sprintf("%s: %s, %s outside, wall %s", firstNonBlank(p.Name, "unnamed"), p.Shape, u.length(p.OuterDiameterM),
		withTolerance(u.length(p.WallThicknessM), p.WallToleranceM, u.length))
	if p.Shape == hazards.ShapeTube {
		s += ", " + u.length(p.LengthM) + " long"
	}
	return s
}

// covers reports whether a changed field belongs to one of the row's
// fields (itself, or a field or element under it).
func covers(fields []string, changed string) bool {
	for _, f := range fields {
		if changed == f || strings.HasPrefix(changed, f+".") || strings.HasPrefix(changed, f+"[") {
			return true
		}
	}
	return false
}

// inputs prints every input side by side, the changed ones marked.
func (w *comparisonWriter) inputs() {
	d, c := w.d, w.c
	d.heading("Inputs side by side")
	specs := inputSpecs(w.u, max(len(c.A.Design.Vessel.Parts), len(c.B.Design.Vessel.Parts)))
	used := make([]bool, len(c.Inputs))
	var rows [][]cell
	marked := 0
	for _, s := range specs {
		va, vb := s.value(&c.A.Design, c.A.Assessment), s.value(&c.B.Design, c.B.Assessment)
		changed := va != vb
		for i, ic := range c.Inputs {
			if covers(s.fields, ic.Field) {
				changed, used[i] = true, true
			}
		}
		name := "   " + s.label
		if changed {
			name = changedMark + " " + s.label
			marked++
		}
		rows = append(rows, []cell{{text: name, bold: changed}, {text: va, bold: changed}, {text: vb, bold: changed}})
	}
	var other [][]cell
	for i, ic := range c.Inputs {
		if !used[i] {
			other = append(other, []cell{{text: changedMark + " " + ic.Field, bold: true, mono: true}, {text: ic.Old}, {text: ic.New}})
		}
	}
	// The count is the number of rows marked, here and in the table of
	// other changed inputs below.
	d.lead(fmt.Sprintf("%s between the revisions. A changed row starts with %s and is printed in bold.", countInputs(marked+len(other)), changedMark))
	d.drawTable(table{cols: []col{{"Input", 1.6, 'L'}, {w.la, 2.2, 'L'}, {w.lb, 2.2, 'L'}}, rows: rows, zebra: true})
	if len(other) > 0 {
		d.subheading("Other changed inputs, as stored in the design files (SI)")
		d.drawTable(table{cols: []col{{"Field", 1.8, 'L'}, {w.la, 2.1, 'L'}, {w.lb, 2.1, 'L'}}, rows: other, size: 7.5})
	}
}

// countInputs says how many inputs differ, in words.
func countInputs(n int) string {
	switch n {
	case 0:
		return "No input differs"
	case 1:
		return "One input differs"
	}
	return fmt.Sprintf("%d inputs differ", n)
}
