package report

import (
	"ullage/hazards/tolerance"
	"ullage/report/chartmodel"
	"ullage/report/display"
)

// toleranceStudy prints the sampled tolerance study: the failure rates
// with their 95 % intervals, the spread of pressure and safety factor, a
// histogram of the units' safety factors and the inputs ranked by how much
// they move it.
func (w *assessmentWriter) toleranceStudy() {
	r := w.tol
	if r == nil {
		return
	}
	d := w.d
	d.heading("Tolerance study")
	d.lead(display.StudyAbout(r, w.u.system()) + " Each unit has its own fill, volume, walls, hottest temperature and glass strength. Each fraction carries its 95 % Wilson score interval (Wilson, J. Am. Stat. Assoc. 22, 209 (1927)). A unit bursts when its own glass strength, a Weibull draw, is below its hoop stress at its hottest temperature.")
	rows := [][]cell{}
	for _, x := range display.StudyInputs(r, w.u.system()) {
		rows = append(rows, []cell{{text: x.Label}, {text: x.Distribution}, {text: x.Nominal}, {text: x.Spread}})
	}
	d.subheading("Inputs that vary from unit to unit")
	d.drawTable(table{cols: []col{{"Input", 0.3, 'L'}, {"Distribution", 0.3, 'L'}, {"Nominal", 0.18, 'R'}, {"Tolerance or spread", 0.22, 'R'}}, rows: rows, size: 8, zebra: true})
	d.note(display.PlusMinusNote)
	var pairs [][2]string
	for _, f := range display.StudyFractions(r) {
		pairs = append(pairs, [2]string{f.Label, f.Value})
	}
	for _, sp := range display.StudySpread(r, w.u.system()) {
		pairs = append(pairs, [2]string{sp.Label + ", " + display.Spread(display.Percentiles[0], display.Percentiles[2], display.Percentiles[4]),
			display.Spread(sp.P[0], sp.P[2], sp.P[4])})
	}
	pairs = append(pairs, [2]string{display.StrongestDriverLabel, display.StrongestDriver(r.Sensitivity)})
	d.subheading("Results")
	d.keyValues(pairs, 1)
	w.histogramChart(r.Histogram)
	w.driverChart(r.Sensitivity, r.SensitivityUnits)
}

// histogramChart draws the units' safety factors as bars.
func (w *assessmentWriter) histogramChart(h tolerance.Histogram) {
	w.d.drawModelChart(chartmodel.Histogram("Figure 3. Burst safety factor of the sampled units", h), histogramHeight)
}

// driverChart ranks the inputs by their rank correlation with the safety
// factor, as horizontal bars either side of zero.
func (w *assessmentWriter) driverChart(ds []tolerance.Driver, n int) {
	if len(ds) == 0 {
		return
	}
	w.d.drawModelChart(chartmodel.Drivers("Figure 4. What drives the safety margin", ds), float64(len(ds))*6+22)
	w.d.note(display.DriversNote(ds, n))
}
