package report

import (
	"fmt"
	"strconv"
	"strings"

	"ullage/hazards"
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
	d.lead(fmt.Sprintf("%d units were drawn (seed %d) with their own fill, volume, walls, hottest temperature and glass strength. Each fraction carries its 95 %% Wilson score interval (Wilson, J. Am. Stat. Assoc. 22, 209 (1927)). A unit bursts when its own glass strength, a Weibull draw, is below its hoop stress at its hottest temperature.", r.Samples, r.Seed))
	rows := [][]cell{}
	for _, x := range r.Inputs {
		nominal, spread := w.inputValue(x.Key, x.Nominal), "± "+w.inputSpread(x.Key, x.PlusMinus)
		if x.Distribution == tolerance.Weibull {
			spread = "Weibull modulus " + display.Number(x.Shape, display.ValueFigures)
		}
		rows = append(rows, []cell{{text: x.Label}, {text: display.DistributionWords(x.Distribution)}, {text: nominal}, {text: spread}})
	}
	d.subheading("Inputs that vary from unit to unit")
	d.drawTable(table{cols: []col{{"Input", 0.3, 'L'}, {"Distribution", 0.3, 'L'}, {"Nominal", 0.18, 'R'}, {"Tolerance or spread", 0.22, 'R'}}, rows: rows, size: 8, zebra: true})
	d.note(display.PlusMinusNote)
	pairs := [][2]string{
		{"Liquid-full below the hottest temperature", display.Proportion(r.LiquidFullFraction)},
		{"Burst over the service life", display.Proportion(r.BurstFraction)},
		{"Mean failure probability", display.Number(r.MeanFailureProbability, display.ValueFigures) + " (strength integrated exactly)"},
	}
	if r.ExposureLimited {
		pairs = append(pairs, [2]string{"Release above a governing limit", display.Proportion(r.ExposureExceedFraction)})
	} else {
		pairs = append(pairs, [2]string{"Release above a governing limit", "no published numeric limit applies: not assessed"})
	}
	if r.UnsealableUnits > 0 {
		pairs = append(pairs, [2]string{"Units that could not be sealed", strconv.Itoa(r.UnsealableUnits) + " (counted as liquid-full and burst)"})
	}
	if r.ExtrapolatedUnits > 0 {
		pairs = append(pairs, [2]string{"Units computed outside a correlation's range", strconv.Itoa(r.ExtrapolatedUnits) + " ‡"})
	}
	pp, sf := r.PressurePa, r.SafetyFactor
	factor := func(x float64) string {
		if x >= hazards.SafetyFactorCap {
			return "no burst load"
		}
		return display.Number(x, display.ValueFigures)
	}
	pairs = append(pairs,
		[2]string{"Pressure at the hottest, P1 / P50 / P99", display.Spread(pp.P1, pp.P50, pp.P99, w.u.pressure)},
		[2]string{"Unit safety factor, P1 / P50 / P99", display.Spread(sf.P1, sf.P50, sf.P99, factor)},
		[2]string{"Strongest driver of the safety factor", display.StrongestDriver(r.Sensitivity)})
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
	note := fmt.Sprintf("Spearman rank correlation with the unit safety factor over the first %d units (Spearman, Am. J. Psychol. 15, 72 (1904)). Dark bars lower the margin as the input grows: tighten those tolerances first.", n)
	if display.WallLowersMargin(ds) {
		note += " " + display.WallVolumeNote
	}
	w.d.note(note)
}

// inputValue formats a varied input's nominal value in the record's units.
func (w *assessmentWriter) inputValue(key string, v float64) string {
	switch {
	case key == tolerance.KeyFillMass:
		return w.u.mass(v)
	case key == tolerance.KeyVolume:
		return w.u.vesselVolume(v)
	case key == tolerance.KeyHottest:
		return w.u.temperature(v)
	case key == tolerance.KeyGlassStrength:
		return w.u.stress(v)
	case hazards.IsPartField(key) && strings.HasSuffix(key, "."+hazards.PartWallThickness):
		return w.u.length(v)
	}
	return display.Number(v, display.ValueFigures+1)
}

// inputSpread formats a ± spread (a difference, so temperatures convert
// without their offset).
func (w *assessmentWriter) inputSpread(key string, v float64) string {
	if key == tolerance.KeyHottest {
		return w.u.temperatureDifference(v)
	}
	return w.inputValue(key, v)
}
