package report

import (
	"ullage/report/chartmodel"
	"ullage/report/display"
)

// Chart heights in mm.
const (
	chartHeight     = 78
	histogramHeight = 56
)

// chartUnits hands the record's conversions and formatters to the chart
// model, so that a chart's labels read like the rest of the record.
func (u unitSystem) chartUnits() chartmodel.Units {
	tq, pq := u.temperatureQ(), u.pressureQ()
	return chartmodel.Units{
		Temperature: chartmodel.Quantity{Unit: tq.unit, FromSI: tq.conv, Format: u.temperature},
		Pressure:    chartmodel.Quantity{Unit: pq.unit, FromSI: pq.conv, Format: u.pressure},
		Number:      display.Stated,
	}
}

// pressureChart is figure 1: pressure against temperature.
func (w *assessmentWriter) pressureChart() {
	ch := chartmodel.Pressure("Figure 1. Internal pressure against temperature", []chartmodel.Side{{A: w.a}}, w.u.chartUnits())
	w.d.drawModelChart(ch, chartHeight)
	w.fillMapChart()
}

// fillMapChart is figure 1b: how much may be filled, and how hot it may
// get, at a glance.
func (w *assessmentWriter) fillMapChart() {
	mq := w.u.massQ()
	mass := chartmodel.Quantity{Unit: mq.unit, FromSI: mq.conv, Format: w.u.mass}
	ch := chartmodel.FillTemperature("Figure 1b. Fill–temperature map", chartmodel.FillMapFor(w.a), w.a, w.u.chartUnits(), mass)
	w.d.drawModelChart(ch, chartHeight)
}

// concentrationChart is figure 2: concentration against time after the
// breakage.
func (w *assessmentWriter) concentrationChart() {
	ch := chartmodel.Release("Figure 2. Vapour concentration after a breakage", w.a, w.u.chartUnits())
	w.d.drawModelChart(ch, chartHeight)
}

// chart draws both revisions' pressure curves on shared axes.
func (w *comparisonWriter) chart() {
	w.d.heading("Pressure against temperature")
	ch := chartmodel.Pressure("Figure 1. Internal pressure against temperature, both revisions",
		[]chartmodel.Side{{Name: w.la, A: w.c.A.Assessment}, {Name: w.lb, A: w.c.B.Assessment}}, w.u.chartUnits())
	w.d.drawModelChart(ch, chartHeight+6)
}
