package report

import (
	"fmt"
	"strings"

	"ullage/fluids"
	"ullage/fluids/units"
	"ullage/hazards"
	"ullage/report/display"
)

// provenance prints the source of every fluid and glass value used, each
// correlation's validity range and where it was stretched.
func (w *assessmentWriter) provenance() {
	d, a := w.d, w.a
	d.heading("Data provenance")
	origin := "the built-in fluid library"
	if a.Fluid.UserSupplied {
		origin = "a fluid file supplied by the user, not the built-in library"
	}
	d.lead(fmt.Sprintf("Fluid data for %s (CAS %s, library record “%s”) come from %s, data version %s. Every value below is printed with the publication it was taken from, as stored in the library.",
		a.Fluid.Name, a.Fluid.CAS, a.Fluid.ID, origin, firstNonBlank(w.m.FluidDataVersion, "not stated")))
	d.subheading("Fluid properties")
	d.drawTable(fluidTable(a.Fluid, w.u))
	sub := fluids.BuiltinSubstanceOf(a.Fluid)
	if eos := sub.EquationOfState(); eos != nil {
		d.subheading("Reference equation of state")
		d.drawTable(equationTable(eos, w.u))
		use := "Vapour pressure, saturated densities, heat of vaporisation and every single-phase state (compressed liquid, vapour, supercritical) come from this equation; the saturation curve is solved from it by equal pressure and equal Gibbs energy in both phases."
		if a.Flags&fluids.EquationOfStateExtrapolated != 0 {
			use = "‡ This review used the equation outside its stated range. " + use
		}
		d.note(use)
	} else {
		d.subheading("Vapour-pressure correlation")
		d.drawTable(vapourPressureTable(a.Fluid, w.u))
		use := "Outside the published pieces the curve is extended to the critical point by a Riedel-type hand-over, flagged as extrapolated wherever it is used."
		if a.Flags&fluids.VapourPressureExtrapolated != 0 {
			use = "‡ This review used the curve outside its published pieces. " + use
		}
		d.note(use)
	}
	var us []fluids.Uncertainty
	if sub != nil {
		us = sub.Uncertainties()
	} else {
		us = a.Fluid.Uncertainty
	}
	d.subheading("How good each property is")
	d.drawTable(uncertaintyTable(us))
	d.subheading("Exposure limits")
	d.drawTable(limitsTable(a.Fluid, a.Release.Limits))
	for _, n := range a.Fluid.NoNumericLimit {
		d.note(n.Body + " " + n.Kind + ": " + n.Note)
	}
	d.subheading("Glass: " + a.Glass.Name)
	d.drawTable(glassTable(&a.Glass, w.u))
	if a.Glass.Note != "" {
		d.note(a.Glass.Note)
	}
	d.subheading("Correlations, their ranges and where they were used")
	d.drawTable(validityTable(a, w.u))
	if a.Flags.Extrapolated() {
		d.note("‡ marks a value computed outside a correlation's published range (over the whole review: " + a.Flags.String() + "). Treat such values as estimates and confirm them by test.")
	} else {
		d.note("No value in this record was computed outside a correlation's published range.")
	}
}

// sourceCell is a small, dim cell for a source text.
func sourceCell(s string) cell {
	if strings.TrimSpace(s) == "" {
		s = "no source given"
	}
	return cell{text: s, dim: true}
}

// fluidTable lists the fluid's sourced constants.
func fluidTable(f *fluids.Fluid, u unitSystem) table {
	// A value's conditions follow it on a line of their own.
	at := func(v string, t float64) string { return v + "\nat " + u.temperature(t) }
	rows := [][]cell{
		{{text: "Molar mass"}, {text: display.Number(f.MolarMass.Value*1000, 5) + " g/mol"}, sourceCell(f.MolarMass.Source)},
		{{text: "Critical temperature"}, {text: u.temperature(f.CriticalTemperature.Value)}, sourceCell(f.CriticalTemperature.Source)},
		{{text: "Critical pressure"}, {text: u.given(display.Pressure, f.CriticalPressure.Value)}, sourceCell(f.CriticalPressure.Source)},
		{{text: "Critical density"}, {text: u.given(display.Density, f.CriticalDensity.Value)}, sourceCell(f.CriticalDensity.Source)},
		{{text: "Acentric factor"}, {text: display.Number(f.AcentricFactor.Value, 4)}, sourceCell(f.AcentricFactor.Source)},
		{{text: "Normal boiling point"}, {text: u.temperature(f.NormalBoilingPoint.Value)}, sourceCell(f.NormalBoilingPoint.Source)},
		{{text: "Freezing point"}, {text: u.temperature(f.FreezingPoint.Value) + "\nlowest accepted"}, sourceCell(f.FreezingPoint.Source)},
	}
	// A record paired with a reference equation of state may leave out
	// the reference liquid density and heat of vaporisation.
	if f.LiquidDensity.Value > 0 {
		rows = append(rows, []cell{{text: "Liquid density"}, {text: at(u.given(display.Density, f.LiquidDensity.Value), f.LiquidDensity.TemperatureK)}, sourceCell(f.LiquidDensity.Source)})
	}
	if f.HeatOfVaporisation.Value > 0 {
		rows = append(rows, []cell{{text: "Heat of vaporisation"}, {text: at(display.Number(f.HeatOfVaporisation.Value/1000, 4)+" kJ/mol", f.HeatOfVaporisation.TemperatureK)}, sourceCell(f.HeatOfVaporisation.Source)})
	}
	rows = append(rows, []cell{{text: "Liquid heat capacity"}, {text: at(display.Number(f.LiquidHeatCapacity.Value, 4)+" J/(mol·K)", f.LiquidHeatCapacity.TemperatureK)}, sourceCell(f.LiquidHeatCapacity.Source)})
	fl := f.Flammability
	flam := "no"
	if fl.Flammable {
		flam = "yes"
	}
	rows = append(rows, []cell{{text: "Flammable"}, {text: flam}, sourceCell(firstNonBlank(display.Warning(fl.Note, u.system()), "library"))})
	opt := func(name string, s *fluids.Sourced, format func(float64) string) {
		if s != nil {
			rows = append(rows, []cell{{text: name}, {text: format(s.Value)}, sourceCell(s.Source)})
		}
	}
	vol := func(x float64) string { return display.Number(x, 3) + " % by volume" }
	opt("Lower flammability limit", fl.LFLPercent, vol)
	opt("Upper flammability limit", fl.UFLPercent, vol)
	opt("Flash point", fl.FlashPointK, u.temperature)
	opt("Autoignition temperature", fl.AutoignitionK, u.temperature)
	if f.PotentialCarcinogen.Value {
		rows = append(rows, []cell{{text: "Potential carcinogen"}, {text: "listed by " + f.PotentialCarcinogen.Body}, sourceCell(f.PotentialCarcinogen.Source)})
	}
	return table{cols: []col{{"Property", 1.6, 'L'}, {"Value", 1.5, 'R'}, {"Source", 5.4, 'L'}}, rows: rows, size: 7.5, zebra: true}
}

// samePaper stands for the equation's paper, cited in full on the first
// row of its table.
const samePaper = "the same paper"

// equationTable describes a reference equation of state: paper, range,
// reducing constants and where the coefficients were read.
func equationTable(e *fluids.EquationOfState, u unitSystem) table {
	rows := [][]cell{
		{{text: "Equation"}, {text: e.Name}, sourceCell(e.Paper.Citation())},
		{{text: "Stated range"}, {text: u.temperature(e.Range.TMinK) + " to " + u.temperature(e.Range.TMaxK) + ", up to " + u.given(display.Pressure, e.Range.PMaxPa)}, sourceCell(e.Range.Source)},
		{{text: "Reducing temperature"}, {text: u.temperature(e.Reducing.TemperatureK)}, sourceCell(samePaper)},
		{{text: "Reducing density"}, {text: u.given(display.Density, e.Reducing.DensityMolM3*e.MolarMass)}, sourceCell(samePaper)},
		{{text: "Terms"}, {text: fmt.Sprintf("%d in the residual Helmholtz energy", len(e.Residual))}, sourceCell(e.Transcription)},
	}
	return table{cols: []col{{"Item", 1.5, 'L'}, {"Value", 2.4, 'L'}, {"Source", 4.6, 'L'}}, rows: rows, size: 7.5, zebra: true}
}

// uncertaintyTable lists the stated uncertainty of each property.
func uncertaintyTable(us []fluids.Uncertainty) table {
	var rows [][]cell
	for _, x := range us {
		rows = append(rows, []cell{{text: strings.ReplaceAll(x.Property, "_", " ")}, {text: "±" + display.Number(x.Percent, 3) + " %"}, {text: x.Statement}, sourceCell(x.Source)})
	}
	if len(rows) == 0 {
		rows = append(rows, []cell{{text: "all properties"}, {text: noValue}, {text: "no uncertainty is stated for this fluid's correlations"}, sourceCell("library")})
	}
	return table{cols: []col{{"Property", 1.5, 'L'}, {"Uncertainty", 0.9, 'R'}, {"Where it holds", 3.0, 'L'}, {"Source", 3.1, 'L'}}, rows: rows, size: 7.5, zebra: true}
}

// vapourPressureTable lists the published pieces with their ranges.
func vapourPressureTable(f *fluids.Fluid, u unitSystem) table {
	var rows [][]cell
	for _, p := range f.VapourPressure {
		coef := fmt.Sprintf("A = %s, B = %s, C = %s", display.Number(p.A, 6), display.Number(p.B, 6), display.Number(p.C, 6))
		if p.D != 0 {
			coef += ", D = " + display.Number(p.D, 6)
		}
		if p.E != 0 {
			coef += ", E = " + display.Number(p.E, 6)
		}
		rows = append(rows, []cell{{text: p.Form}, {text: coef, mono: true}, {text: u.temperature(p.TMinK) + " to " + u.temperature(p.TMaxK)}, sourceCell(p.Source)})
	}
	return table{cols: []col{{"Form", 1, 'L'}, {"Coefficients", 2.4, 'L'}, {"Valid range", 1.4, 'L'}, {"Source", 3.7, 'L'}}, rows: rows, size: 7.5}
}

// limitsTable lists every published exposure limit, marking those that
// govern the review.
func limitsTable(f *fluids.Fluid, limits []hazards.LimitResult) table {
	gov := map[fluids.ExposureLimit]bool{}
	for _, l := range f.ExposureLimits {
		for _, r := range limits {
			if r.Governs && r.Name == l.Label() && r.PPM == l.PPM && r.Kind == l.Averaging {
				gov[l] = true
			}
		}
	}
	var rows [][]cell
	for _, l := range f.ExposureLimits {
		period := noValue
		if l.Minutes > 0 {
			period = display.Stated(l.Minutes) + " min"
		}
		g := ""
		if gov[l] {
			g = "governs"
		}
		rows = append(rows, []cell{
			{text: l.Body, bold: gov[l]}, {text: l.Kind, bold: gov[l]}, {text: l.Averaging, bold: gov[l]}, {text: period},
			{text: display.Stated(l.PPM), bold: gov[l]}, {text: display.Number(units.PpmToMgPerM3(l.PPM, f.MolarMass.Value), 3)}, {text: g, bold: true}, sourceCell(l.Source),
		})
	}
	if len(rows) == 0 {
		rows = append(rows, []cell{{text: "none"}, {}, {}, {}, {}, {}, {}, {text: "no numeric limit in the library", dim: true}})
	}
	return table{cols: []col{
		{"Body", 0.8, 'L'}, {"Kind", 0.7, 'L'}, {"Averaging", 0.9, 'L'}, {"Period", 0.8, 'R'}, {"ppm", 0.7, 'R'},
		{"mg/m³", 0.8, 'R'}, {"", 0.8, 'L'}, {"Source", 3.6, 'L'},
	}, rows: rows, size: 7.5, zebra: true}
}

// glassTable lists the glass properties with their sources.
func glassTable(g *hazards.Glass, u unitSystem) table {
	rows := [][]cell{
		{{text: "Elastic modulus"}, {text: u.given(display.Stress, g.ElasticModulus.Value)}, sourceCell(g.ElasticModulus.Source)},
		{{text: "Poisson's ratio"}, {text: display.Number(g.PoissonRatio.Value, 3)}, sourceCell(g.PoissonRatio.Source)},
		{{text: "Thermal expansion"}, {text: display.Number(g.Expansion.Value, 3) + " /K"}, sourceCell(g.Expansion.Source)},
		{{text: "Characteristic strength"}, {text: u.given(display.Stress, g.CharacteristicStrength.Value)}, sourceCell(g.CharacteristicStrength.Source)},
		{{text: "Reference area"}, {text: u.given(display.Surface, g.ReferenceArea.Value)}, sourceCell(g.ReferenceArea.Source)},
		{{text: "Reference load time"}, {text: display.Stated(g.ReferenceLoad.Value) + " s"}, sourceCell(g.ReferenceLoad.Source)},
		{{text: "Weibull modulus"}, {text: display.Number(g.WeibullModulus.Value, 3)}, sourceCell(g.WeibullModulus.Source)},
		{{text: "Stress-corrosion exponent"}, {text: display.Number(g.StressCorrosionExponent.Value, 3)}, sourceCell(g.StressCorrosionExponent.Source)},
	}
	return table{cols: []col{{"Property", 1.9, 'L'}, {"Value", 1.2, 'R'}, {"Source", 5.4, 'L'}}, rows: rows, size: 7.5, zebra: true}
}

// validityTable says, for each correlation, its range and whether it was
// used outside it at the coldest and hottest temperatures.
func validityTable(a *hazards.Assessment, u unitSystem) table {
	f := a.Fluid
	tc := f.CriticalTemperature.Value
	lo, hi := tc, 0.0
	for _, p := range f.VapourPressure {
		lo, hi = min(lo, p.TMinK), max(hi, p.TMaxK)
	}
	type corr struct {
		name, rng string
		flag      fluids.Flags
		stretched bool // the flag means use outside the range
	}
	cs := []corr{
		{"Vapour pressure (published pieces)", u.temperature(lo) + " to " + u.temperature(hi), fluids.VapourPressureExtrapolated, true},
		{"Compressed liquid (Tait form)", "reduced temperature up to 0.95, i.e. up to " + u.temperature(0.95*tc), fluids.CompressedLiquidExtrapolated, true},
		{"Saturated vapour near the critical point (rectilinear diameter)", "used close to the critical point, " + u.temperature(tc), fluids.NearCriticalVapour, false},
		{"Supercritical state (anchored equation of state)", "above the critical temperature, " + u.temperature(tc), fluids.SupercriticalState, false},
	}
	if sub := fluids.BuiltinSubstanceOf(f); sub.EquationOfState() != nil {
		e := sub.EquationOfState()
		tc = sub.CriticalTemperature()
		cs = []corr{
			{"Reference equation of state (" + e.Name + ")", u.temperature(e.Range.TMinK) + " to " + u.temperature(e.Range.TMaxK) + ", up to " + u.given(display.Pressure, e.Range.PMaxPa),
				fluids.EquationOfStateExtrapolated, true},
			{"Supercritical state (same equation)", "above the critical temperature, " + u.temperature(tc), fluids.SupercriticalState, false},
		}
	}
	use := func(fl fluids.Flags, c corr) string {
		switch {
		case fl&c.flag != 0 && c.stretched:
			return "outside its range ‡"
		case fl&c.flag != 0:
			return "used"
		case c.stretched:
			return "within range"
		}
		return "not used"
	}
	var rows [][]cell
	for _, c := range cs {
		rows = append(rows, []cell{{text: c.name}, {text: c.rng}, {text: use(a.Cold.Flags, c), bold: a.Cold.Flags&c.flag != 0 && c.stretched},
			{text: use(a.Hot.Flags, c), bold: a.Hot.Flags&c.flag != 0 && c.stretched}})
	}
	return table{cols: []col{{"Correlation", 2.5, 'L'}, {"Published or stated range", 2.4, 'L'},
		{"At the coldest, " + u.temperature(a.Design.ColdestK), 1.6, 'L'}, {"At the hottest, " + u.temperature(a.Design.HottestK), 1.6, 'L'}},
		rows: rows, size: 7.5, zebra: true}
}
