package report

import (
	"fmt"
	"strings"

	"ullage/hazards"
	"ullage/report/display"
)

// inputs prints the design as reviewed.
func (w *assessmentWriter) inputs() {
	d, a, u := w.d, w.a, w.u
	ds := &a.Design
	d.heading("Inputs")
	d.subheading("Fill, vessel and service")
	d.keyValues(designPairs(ds, a, u), 2)

	d.subheading("Parts of the glass envelope")
	d.drawTable(partsTable(ds.Vessel.Parts, u))

	d.subheading("Release scenario")
	d.keyValues(roomPairs(ds.Room, u), 2)

	d.subheading("Review criteria")
	d.drawTable(criteriaTable(ds.Criteria))
}

// designPairs lists the design's main inputs as label–value pairs.
func designPairs(ds *hazards.Design, a *hazards.Assessment, u unitSystem) [][2]string {
	fluid := ds.Fluid
	if a != nil && a.Fluid != nil {
		fluid = fmt.Sprintf("%s (CAS %s, %s)", a.Fluid.Name, a.Fluid.CAS, a.Fluid.Formula)
	}
	vol := "computed from the parts"
	if ds.Vessel.InternalVolumeM3 > 0 {
		vol = u.given(display.VesselVolume, ds.Vessel.InternalVolumeM3) + " measured"
	}
	if ds.Vessel.VolumeToleranceM3 > 0 {
		vol += ", " + u.plusMinus(u.given(display.VesselVolume, ds.Vessel.VolumeToleranceM3))
	}
	glass := ds.Glass.ID
	if ds.Glass.Custom != nil {
		glass = "custom: " + ds.Glass.Custom.Name
	} else if a != nil && a.Glass.Name != "" {
		glass = a.Glass.Name
	}
	pairs := [][2]string{
		{"Fluid", fluid},
		{"Fill mass", display.WithTolerance(u.given(display.Mass, ds.FillMassKg), ds.FillMassToleranceKg, func(x float64) string { return u.given(display.Mass, x) })},
		{"Internal volume", vol},
	}
	if a != nil {
		pairs = append(pairs,
			[2]string{"Volume used", u.vesselVolume(a.VolumeM3)},
			[2]string{"Fill density", u.density(a.FillDensity)},
			[2]string{"Liquid share at sealing", percent(a.LiquidFractionAtSealing, 3) + " of the volume"})
	}
	gas := u.given(display.Pressure, ds.ResidualGasPressurePa)
	if ds.ResidualGasPressurePa == 0 {
		gas = "none (fully evacuated)"
	}
	pairs = append(pairs,
		[2]string{"Sealing temperature", u.temperature(ds.SealingTemperatureK)},
		[2]string{LabelResidualGas, gas},
		[2]string{"Hottest temperature", u.temperature(ds.HottestK)},
		[2]string{"Coldest temperature", u.temperature(ds.ColdestK)},
		[2]string{LabelAmbientPressure, u.given(display.Pressure, ds.AmbientPressurePa)},
		[2]string{"Glass", glass},
		[2]string{"Service life", display.Stated(ds.ServiceLifeYears) + " years"},
		[2]string{"Time at the hottest", display.Stated(ds.HoursAtHottest) + " h over the life"},
		[2]string{"Sudden temperature change", display.ShockText(ds.ThermalShock, u.system())},
		[2]string{"Residual stress at the seal", display.SealText(ds.SealStress, u.system())},
	)
	return pairs
}

// partsTable lists the parts of the envelope.
func partsTable(parts []hazards.Part, u unitSystem) table {
	rows := make([][]cell, 0, len(parts))
	for _, p := range parts {
		length := noValue
		if p.Shape == hazards.ShapeTube {
			length = u.given(display.Length, p.LengthM)
		}
		tol := "not stated"
		if p.WallToleranceM > 0 {
			tol = u.plusMinus(u.given(display.Length, p.WallToleranceM))
		}
		rows = append(rows, []cell{
			{text: p.Name}, {text: p.Shape}, {text: u.given(display.Length, p.OuterDiameterM)}, {text: u.given(display.Length, p.WallThicknessM)},
			{text: tol}, {text: length}, {text: u.vesselVolume(p.InternalVolume())},
		})
	}
	return table{cols: []col{
		{"Part", 2, 'L'}, {"Shape", 1, 'L'}, {"Outer diameter", 1.3, 'R'}, {"Wall", 1.1, 'R'},
		{"Wall tolerance", 1.3, 'R'}, {"Length", 1.1, 'R'}, {"Internal volume", 1.3, 'R'},
	}, rows: rows, zebra: true}
}

// roomPairs lists the release scenario.
func roomPairs(r hazards.Room, u unitSystem) [][2]string {
	preset := display.RoomPresetName(r.PresetID)
	return [][2]string{
		{"Room", preset},
		{"Room volume", u.given(display.RoomVolume, r.VolumeM3)},
		{"Air changes per hour", display.Stated(r.AirChangesPerHour) + " per hour"},
		{"Mixing factor", display.Stated(r.MixingFactor) + " (1 = perfectly mixed)"},
		{"Near-field radius", u.given(display.RoomLength, r.NearFieldRadiusM)},
		{"Near-field air speed", u.given(display.Speed, r.NearFieldAirSpeed)},
		{LabelExposureTime, display.Stated(r.ExposureMinutes) + " min after the breakage"},
		{"Near-field volume", u.roomVolume(hazards.NearFieldVolume(r.NearFieldRadiusM))},
	}
}

// criteriaTable lists the review criteria with their grounds.
func criteriaTable(cr hazards.Criteria) table {
	bodies := "all bodies"
	if len(cr.LimitBodies) > 0 {
		bodies = strings.Join(cr.LimitBodies, ", ")
	}
	def := hazards.DefaultCriteria()
	row := func(name, key string, v, dv float64, text string) []cell {
		grounds := hazards.DefaultCriteriaGrounds[key]
		if v != dv {
			grounds = "Set for this review (default " + display.Stated(dv) + ": " + grounds + ")"
		}
		return []cell{{text: name}, {text: text}, {text: grounds, dim: true}}
	}
	rows := [][]cell{
		row("Minimum burst safety factor", hazards.CriterionMinBurstSafetyFactor, cr.MinBurstSafetyFactor, def.MinBurstSafetyFactor, display.Stated(cr.MinBurstSafetyFactor)),
		row("Minimum implosion safety factor", hazards.CriterionMinImplosionSafetyFactor, cr.MinImplosionSafetyFactor, def.MinImplosionSafetyFactor, display.Stated(cr.MinImplosionSafetyFactor)),
		row("Maximum failure probability", hazards.CriterionMaxFailureProbability, cr.MaxFailureProbability, def.MaxFailureProbability, display.Stated(cr.MaxFailureProbability)),
		row("Minimum ullage at the hottest", hazards.CriterionMinUllagePercent, cr.MinUllagePercent, def.MinUllagePercent, display.Stated(cr.MinUllagePercent)+" %"),
		row("Maximum fraction of a limit", hazards.CriterionMaxFractionOfLimit, cr.MaxFractionOfLimit, def.MaxFractionOfLimit, display.Stated(cr.MaxFractionOfLimit)),
		row("Maximum % of the LFL", hazards.CriterionMaxPercentLFL, cr.MaxPercentLFL, def.MaxPercentLFL, display.Stated(cr.MaxPercentLFL)+" %"),
		{{text: "Exposure limits from"}, {text: bodies}, {text: "Chosen for this review. Every limit of these bodies is averaged over its own period as its body defines it (NIOSH REL TWA up to a 10-hour day, OSHA PEL and ACGIH TLV TWA 8 hours, STEL 15 minutes or the stated period, ceiling at its stated period or the peak, IDLH 30 minutes); for each kind the limit with the largest share of its limit governs, and a kind with no published limit is listed as not assessed.", dim: true}},
		limitSetsRow(cr),
		{{text: "Strength checked at"}, {text: "nominal and thinnest walls"}, {text: "The burst safety factor is found for the nominal unit and for the weakest permitted unit: every wall at its thinnest, the fill and volume tolerances stacked to raise the pressure (common practice: strength at the minimum permitted thickness).", dim: true}},
		{{text: "Peak concentration"}, {text: "highest 1-minute average"}, {text: "The highest one-minute average in the room or beside the breakage, the top of the charted curves; no concentration is taken above the saturated vapour at the room temperature, the whole fill in the near field, or pure vapour.", dim: true}},
	}
	return table{cols: []col{{"Criterion", 2.2, 'L'}, {"Value", 1.3, 'R'}, {"Grounds", 5, 'L'}}, rows: rows, zebra: true, size: 7.5}
}

// limitSetsRow names the limit sets applied and whether they are the
// default.
func limitSetsRow(cr hazards.Criteria) []cell {
	var names []string
	for _, id := range cr.AppliedLimitSets() {
		names = append(names, display.LimitSetShort(id))
	}
	grounds := "Chosen for this review."
	if len(cr.LimitSets) == 0 {
		grounds = "The default, as the design names none: a consumer product may break where the general public, children included, breathes the release, so the public acute benchmarks (AEGL, DOE PAC) apply beside the US occupational limits."
	}
	return []cell{{text: "Limit sets"}, {text: strings.Join(names, ", ")}, {text: grounds, dim: true}}
}
