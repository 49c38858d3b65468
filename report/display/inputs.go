package display

import (
	"fmt"
	"strings"
	"unicode"
	"unicode/utf8"

	"ullage/hazards"
	"ullage/hazards/compare"
)

// Names of design fields shown to people, in one place so that the
// window, the record and the command line call each field the same.
const (
	// LabelResidualGas names residual_gas_pressure_pa, the pressure of
	// the air left in the vessel when it is sealed (Pa).
	LabelResidualGas = "Residual air when sealed"
	// LabelAmbientPressure names ambient_pressure_pa, the pressure
	// outside the vessel (Pa).
	LabelAmbientPressure = "Ambient pressure"
	// LabelExposureTime names room.exposure_minutes, how long a person
	// stays in the room after a breakage (min).
	LabelExposureTime = "Time in the room"
)

// Input formats an SI value a person typed, in the system's unit: with
// the figures it was given ([Stated], at most four, so that a converted
// value never shows a long tail), temperatures and temperature
// differences to a tenth of a degree.
func (s System) Input(q Quantity, x float64) string {
	v := s.FromSI(q, x)
	var t string
	if q == Temperature || q == TempDifference {
		t = Fixed(v, 1)
	} else {
		t = Stated(v)
	}
	if lbl := s.Unit(q); lbl != "" && t != NoValue {
		t += " " + lbl
	}
	return t
}

// WithTolerance appends "± tolerance" to a formatted value when the
// tolerance is above zero.
func WithTolerance(value string, tol float64, format func(float64) string) string {
	if tol <= 0 {
		return value
	}
	return value + " ± " + format(tol)
}

// RoomPresetName is the name of a room preset: "custom" for none, the id
// itself when the preset is unknown.
func RoomPresetName(id string) string {
	if id == "" {
		return "custom"
	}
	if p, err := hazards.LookupRoomPreset(id); err == nil && p.Name != "" {
		return p.Name
	}
	return id
}

// ShockPresetName is the name of a sudden-change preset, the id itself
// when the preset is unknown.
func ShockPresetName(id string) string {
	if p, err := hazards.LookupShockPreset(id); err == nil && p.Name != "" {
		return p.Name
	}
	return id
}

// PartText describes one part of the vessel in a line: "lower bulb:
// sphere, 40 mm outside, wall 1.4 mm ± 0.2 mm".
func PartText(p hazards.Part, s System) string {
	length := func(x float64) string { return s.Input(Length, x) }
	name := p.Name
	if strings.TrimSpace(name) == "" {
		name = "unnamed"
	}
	t := fmt.Sprintf("%s: %s, %s outside, wall %s", name, p.Shape, length(p.OuterDiameterM), WithTolerance(length(p.WallThicknessM), p.WallToleranceM, length))
	if p.Shape == hazards.ShapeTube {
		t += ", " + length(p.LengthM) + " long"
	}
	return t
}

// ShockText describes the design's sudden temperature changes in a line,
// each with the name of its preset.
func ShockText(sh hazards.ThermalShock, s System) string {
	if !sh.Given() {
		return "none given: thermal shock not assessed"
	}
	var parts []string
	add := func(dir string, dk float64, preset string) {
		if dk <= 0 {
			return
		}
		t := dir + " " + s.Input(TempDifference, dk)
		if preset != "" {
			t += " (" + lowerFirst(ShockPresetName(preset)) + ")"
		}
		parts = append(parts, t)
	}
	add(hazards.ShockHotToCold, sh.HotToColdK, sh.HotToColdPresetID)
	add(hazards.ShockColdToHot, sh.ColdToHotK, sh.ColdToHotPresetID)
	return strings.Join(parts, "; ")
}

// lowerFirst lower-cases the first letter of a name set inside a
// sentence ("From a hot car …" becomes "from a hot car …").
func lowerFirst(s string) string {
	r, n := utf8.DecodeRuneInString(s)
	if n == 0 {
		return s
	}
	return string(unicode.ToLower(r)) + s[n:]
}

// SealText describes the design's residual stress at the seal in a line.
func SealText(st hazards.SealStress, s System) string {
	switch {
	case !st.Given():
		return "none given"
	case st.RetardationM > 0:
		return st.Part + ": retardation " + Number(st.RetardationM*1e9, ValueFigures) + " nm over " + s.Input(Length, st.PathLengthM)
	}
	return st.Part + ": " + s.Input(Stress, st.ResidualStressPa)
}

// InputRow is one input of two designs side by side: its label, each
// side's value in words and whether it differs. Other marks a changed
// field that no labelled row covers, named by [FieldWords].
type InputRow struct {
	Label   string
	A, B    string
	Changed bool
	Other   bool
}

// inputSpec is one labelled row: the design fields (JSON paths) whose
// change marks it, and how to word its value.
type inputSpec struct {
	label  string
	fields []string
	value  func(d *hazards.Design, a *hazards.Assessment) string
}

// inputSpecs lists the labelled rows for two designs with up to nParts
// parts.
func inputSpecs(s System, nParts int) []inputSpec {
	type dv = func(d *hazards.Design, a *hazards.Assessment) string
	of := func(f func(d *hazards.Design) string) dv {
		return func(d *hazards.Design, _ *hazards.Assessment) string { return f(d) }
	}
	in := func(q Quantity) func(float64) string { return func(x float64) string { return s.Input(q, x) } }
	specs := []inputSpec{
		{"Fluid", []string{hazards.FieldFluid}, func(d *hazards.Design, a *hazards.Assessment) string {
			if a != nil && a.Fluid != nil {
				return a.Fluid.Name
			}
			return d.Fluid
		}},
		{"Fill mass", []string{hazards.FieldFillMass, hazards.FieldFillMassTolerance}, of(func(d *hazards.Design) string {
			return WithTolerance(s.Input(Mass, d.FillMassKg), d.FillMassToleranceKg, in(Mass))
		})},
		{"Internal volume", []string{hazards.FieldInternalVolume, hazards.FieldVolumeTolerance}, of(func(d *hazards.Design) string {
			if d.Vessel.InternalVolumeM3 == 0 {
				return WithTolerance("from the parts, "+s.Format(VesselVolume, d.Vessel.PartsVolume()), d.Vessel.VolumeToleranceM3, in(VesselVolume))
			}
			return WithTolerance(s.Input(VesselVolume, d.Vessel.InternalVolumeM3), d.Vessel.VolumeToleranceM3, in(VesselVolume)) + " measured"
		})},
	}
	for i := 0; i < nParts; i++ {
		specs = append(specs, inputSpec{fmt.Sprintf("Part %d", i+1), []string{hazards.PartField(i, "")}, of(func(d *hazards.Design) string {
			if i >= len(d.Vessel.Parts) {
				return "absent"
			}
			return PartText(d.Vessel.Parts[i], s)
		})})
	}
	specs = append(specs,
		inputSpec{"Sealing temperature", []string{hazards.FieldSealingTemperature}, of(func(d *hazards.Design) string { return s.Input(Temperature, d.SealingTemperatureK) })},
		inputSpec{LabelResidualGas, []string{hazards.FieldResidualGasPressure}, of(func(d *hazards.Design) string {
			if d.ResidualGasPressurePa == 0 {
				return "none"
			}
			return s.Input(Pressure, d.ResidualGasPressurePa)
		})},
		inputSpec{"Hottest temperature", []string{hazards.FieldHottest}, of(func(d *hazards.Design) string { return s.Input(Temperature, d.HottestK) })},
		inputSpec{"Coldest temperature", []string{hazards.FieldColdest}, of(func(d *hazards.Design) string { return s.Input(Temperature, d.ColdestK) })},
		inputSpec{LabelAmbientPressure, []string{hazards.FieldAmbientPressure}, of(func(d *hazards.Design) string { return s.Input(Pressure, d.AmbientPressurePa) })},
		inputSpec{"Glass", []string{hazards.FieldGlass}, func(d *hazards.Design, a *hazards.Assessment) string {
			if d.Glass.Custom != nil {
				return "custom: " + d.Glass.Custom.Name
			}
			if a != nil && a.Glass.Name != "" {
				return a.Glass.Name
			}
			return d.Glass.ID
		}},
		inputSpec{"Service life", []string{hazards.FieldServiceLife}, of(func(d *hazards.Design) string { return Stated(d.ServiceLifeYears) + " years" })},
		inputSpec{"Time at the hottest", []string{hazards.FieldHoursAtHottest}, of(func(d *hazards.Design) string { return Stated(d.HoursAtHottest) + " h" })},
		inputSpec{"Sudden temperature change", []string{hazards.FieldThermalShock}, of(func(d *hazards.Design) string { return ShockText(d.ThermalShock, s) })},
		inputSpec{"Residual stress at the seal", []string{hazards.FieldSealStress}, of(func(d *hazards.Design) string { return SealText(d.SealStress, s) })},
		inputSpec{"Room", []string{hazards.FieldRoomPreset}, of(func(d *hazards.Design) string { return RoomPresetName(d.Room.PresetID) })},
		inputSpec{"Room volume", []string{hazards.FieldRoomVolume}, of(func(d *hazards.Design) string { return s.Input(RoomVolume, d.Room.VolumeM3) })},
		inputSpec{"Air changes per hour", []string{hazards.FieldAirChanges}, of(func(d *hazards.Design) string { return Stated(d.Room.AirChangesPerHour) })},
		inputSpec{"Mixing factor", []string{hazards.FieldMixingFactor}, of(func(d *hazards.Design) string { return Stated(d.Room.MixingFactor) })},
		inputSpec{"Near-field radius", []string{hazards.FieldNearFieldRadius}, of(func(d *hazards.Design) string { return s.Input(RoomLength, d.Room.NearFieldRadiusM) })},
		inputSpec{"Near-field air speed", []string{hazards.FieldNearFieldAirSpeed}, of(func(d *hazards.Design) string { return s.Input(Speed, d.Room.NearFieldAirSpeed) })},
		inputSpec{LabelExposureTime, []string{hazards.FieldExposureMinutes}, of(func(d *hazards.Design) string { return Stated(d.Room.ExposureMinutes) + " min" })},
		inputSpec{"Criteria: burst, implosion safety factors", []string{hazards.FieldMinBurstSafetyFactor, hazards.FieldMinImplosionSafetyFactor}, of(func(d *hazards.Design) string {
			return "at least " + Stated(d.Criteria.MinBurstSafetyFactor) + ", at least " + Stated(d.Criteria.MinImplosionSafetyFactor)
		})},
		inputSpec{"Criteria: failure probability", []string{hazards.FieldMaxFailureProbability}, of(func(d *hazards.Design) string { return "at most " + Stated(d.Criteria.MaxFailureProbability) })},
		inputSpec{"Criteria: ullage at the hottest", []string{hazards.FieldMinUllagePercent}, of(func(d *hazards.Design) string { return "at least " + Stated(d.Criteria.MinUllagePercent) + " %" })},
		inputSpec{"Criteria: exposure, flammability", []string{hazards.FieldMaxFractionOfLimit, hazards.FieldMaxPercentLFL, hazards.FieldLimitBodies}, of(func(d *hazards.Design) string {
			bodies := "all bodies"
			if len(d.Criteria.LimitBodies) > 0 {
				bodies = strings.Join(d.Criteria.LimitBodies, ", ")
			}
			return "at most " + Stated(d.Criteria.MaxFractionOfLimit) + " of the limit (" + bodies + "); at most " + Stated(d.Criteria.MaxPercentLFL) + " % LFL"
		})},
		inputSpec{"Criteria: limit sets", []string{hazards.FieldLimitSets}, of(func(d *hazards.Design) string {
			var names []string
			for _, id := range d.Criteria.AppliedLimitSets() {
				names = append(names, LimitSetShort(id))
			}
			return strings.Join(names, ", ")
		})},
	)
	return specs
}

// covers reports whether a changed field belongs to one of a row's fields
// (itself, or a field or element under it).
func covers(fields []string, changed string) bool {
	for _, f := range fields {
		if changed == f || strings.HasPrefix(changed, f+".") || strings.HasPrefix(changed, f+"[") {
			return true
		}
	}
	return false
}

// InputRows returns every input of a comparison's two designs side by
// side in the system's units, each labelled row marked Changed when its
// words differ or a changed field falls under it; changed fields no row
// covers follow as Other rows, named by [FieldWords] and worded by
// [InputValueText]. The window, the comparison record and the command
// line print these rows, so that the number of inputs said to differ is
// the number of rows marked.
func InputRows(c *compare.Comparison, s System) []InputRow {
	specs := inputSpecs(s, max(len(c.A.Design.Vessel.Parts), len(c.B.Design.Vessel.Parts)))
	used := make([]bool, len(c.Inputs))
	rows := make([]InputRow, 0, len(specs))
	for _, sp := range specs {
		r := InputRow{Label: sp.label, A: sp.value(&c.A.Design, c.A.Assessment), B: sp.value(&c.B.Design, c.B.Assessment)}
		r.Changed = r.A != r.B
		for i, ic := range c.Inputs {
			if covers(sp.fields, ic.Field) {
				r.Changed, used[i] = true, true
			}
		}
		rows = append(rows, r)
	}
	for i, ic := range c.Inputs {
		if !used[i] {
			rows = append(rows, InputRow{Label: FieldWords(ic.Field), A: InputValueText(ic.Old, s), B: InputValueText(ic.New, s), Changed: true, Other: true})
		}
	}
	return rows
}

// ChangedCount is the number of rows marked changed.
func ChangedCount(rows []InputRow) int {
	n := 0
	for _, r := range rows {
		if r.Changed {
			n++
		}
	}
	return n
}

// CountInputs says how many inputs differ, in words: "No input differs",
// "One input differs", "5 inputs differ".
func CountInputs(n int) string {
	switch n {
	case 0:
		return "No input differs"
	case 1:
		return "One input differs"
	}
	return fmt.Sprintf("%d inputs differ", n)
}

// inputQuantity is the quantity an input's unit is shown in, and the
// words after a number that has no display quantity.
func inputQuantity(u compare.Unit) (Quantity, string) {
	switch u {
	case compare.UnitTemperature:
		return Temperature, ""
	case compare.UnitTemperatureChange:
		return TempDifference, ""
	case compare.UnitPressure:
		return Pressure, ""
	case compare.UnitLength:
		return Length, ""
	case compare.UnitRoomLength:
		return RoomLength, ""
	case compare.UnitArea:
		return Surface, ""
	case compare.UnitVolume:
		return VesselVolume, ""
	case compare.UnitRoomVolume:
		return RoomVolume, ""
	case compare.UnitMass:
		return Mass, ""
	case compare.UnitSpeed:
		return Speed, ""
	case compare.UnitPerHour:
		return Plain, "per hour"
	case compare.UnitPerKelvin:
		return Plain, "/K"
	case compare.UnitPerPascal:
		return Plain, "/Pa"
	case compare.UnitYears:
		return Plain, "years"
	case compare.UnitHours:
		return Plain, "h"
	case compare.UnitMinutes:
		return Plain, "min"
	case compare.UnitSeconds:
		return Plain, "s"
	case compare.UnitPercent:
		return Plain, "%"
	case compare.UnitPercentLFL:
		return Plain, "% LFL"
	}
	return Plain, ""
}

// InputValueText words one side of a changed input in the system's
// units: a number with its unit, a text as it is, "on" or "off", a list
// joined by commas ("none" when empty), a group as "name: value" pairs
// without its empty texts, or "absent".
func InputValueText(v compare.InputValue, s System) string {
	switch v.Kind {
	case compare.KindAbsent:
		return "absent"
	case compare.KindNumber:
		q, words := inputQuantity(v.Unit)
		if q == Plain {
			t := Stated(v.Number)
			if v.Unit == compare.UnitPerKelvin && s == US {
				t = Stated(v.Number * 5 / 9)
				words = "/°F"
			}
			if words != "" {
				t += " " + words
			}
			return t
		}
		return s.Input(q, v.Number)
	case compare.KindText:
		if v.Text == "" {
			return "none"
		}
		return v.Text
	case compare.KindSwitch:
		if v.On {
			return "on"
		}
		return "off"
	case compare.KindList:
		if len(v.Items) == 0 {
			return "none"
		}
		items := make([]string, len(v.Items))
		for i, x := range v.Items {
			items[i] = InputValueText(x, s)
		}
		return strings.Join(items, ", ")
	case compare.KindGroup:
		var parts []string
		for _, f := range v.Fields {
			if f.Value.Kind == compare.KindText && f.Value.Text == "" {
				continue
			}
			parts = append(parts, FieldWords(f.Name)+": "+InputValueText(f.Value, s))
		}
		return strings.Join(parts, ", ")
	}
	return NoValue
}

// unitEndings are the unit endings of the design's JSON names, dropped
// from a field's words since the value carries its unit.
var unitEndings = []string{"_m_s", "_m3", "_m2", "_kg", "_pa", "_k", "_m", "_seconds", "_minutes", "_years"}

// FieldWords names a design field from its JSON path, for a changed
// field no labelled row covers: the path's steps with their unit endings
// dropped (the value carries its unit) and underscores as spaces, an
// index kept as the design file writes it: "glass.custom.expansion_per_k.value"
// is "glass, custom, expansion per k"; "vessel.parts[1].name" is "vessel,
// parts[1], name".
func FieldWords(path string) string {
	var out []string
	for _, seg := range strings.Split(path, ".") {
		if seg == "value" {
			continue
		}
		name, index, indexed := strings.Cut(seg, "[")
		for _, e := range unitEndings {
			if strings.HasSuffix(name, e) && len(name) > len(e) && !strings.HasSuffix(name, "_per"+e) {
				name = strings.TrimSuffix(name, e)
				break
			}
		}
		name = strings.ReplaceAll(name, "_", " ")
		if indexed {
			name += "[" + index
		}
		out = append(out, name)
	}
	return strings.Join(out, ", ")
}
