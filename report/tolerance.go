package report

import (
	"fmt"
	"math"
	"strings"

	"ullage/hazards/tolerance"
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
			spread = fmt.Sprintf("Weibull modulus %.3g", x.Shape)
		}
		rows = append(rows, []cell{{text: x.Label}, {text: x.Distribution}, {text: nominal}, {text: spread}})
	}
	d.subheading("Inputs that vary from unit to unit")
	d.drawTable(table{cols: []col{{"Input", 0.36, 'L'}, {"Distribution", 0.18, 'L'}, {"Nominal", 0.2, 'R'}, {"Tolerance or spread", 0.26, 'R'}}, rows: rows, size: 8, zebra: true})
	prop := func(p tolerance.Proportion) string {
		return fmt.Sprintf("%d of %d  (%s, 95 %% interval %s – %s)", p.Count, p.Total, pct(p.Estimate), pct(p.Low), pct(p.High))
	}
	pairs := [][2]string{
		{"Liquid-full below the hottest temperature", prop(r.LiquidFullFraction)},
		{"Burst over the service life", prop(r.BurstFraction)},
		{"Mean failure probability", fmt.Sprintf("%.3g (strength integrated exactly)", r.MeanFailureProbability)},
	}
	if r.ExposureLimited {
		pairs = append(pairs, [2]string{"Release above a governing limit", prop(r.ExposureExceedFraction)})
	} else {
		pairs = append(pairs, [2]string{"Release above a governing limit", "no published numeric limit applies: not assessed"})
	}
	if r.UnsealableUnits > 0 {
		pairs = append(pairs, [2]string{"Units that could not be sealed", fmt.Sprintf("%d (counted as liquid-full and burst)", r.UnsealableUnits)})
	}
	if r.ExtrapolatedUnits > 0 {
		pairs = append(pairs, [2]string{"Units computed outside a correlation's range", fmt.Sprintf("%d ‡", r.ExtrapolatedUnits)})
	}
	pp, sf := r.PressurePa, r.SafetyFactor
	pairs = append(pairs,
		[2]string{"Pressure at the hottest, P1 / P50 / P99", w.u.pressure(pp.P1) + " / " + w.u.pressure(pp.P50) + " / " + w.u.pressure(pp.P99)},
		[2]string{"Unit safety factor, P1 / P50 / P99", fmt.Sprintf("%.3g / %.3g / %.3g", sf.P1, sf.P50, sf.P99)})
	d.subheading("Results")
	d.keyValues(pairs, 1)
	w.histogramChart(r.Histogram)
	w.driverChart(r.Sensitivity, r.SensitivityUnits)
}

func pct(x float64) string {
	switch {
	case x == 0:
		return "0 %"
	case x < 1e-3:
		return fmt.Sprintf("%.2g %%", 100*x)
	default:
		return fmt.Sprintf("%.3g %%", 100*x)
	}
}

// histogramChart draws the units' safety factors as bars.
func (w *assessmentWriter) histogramChart(h tolerance.Histogram) {
	if len(h.Counts) == 0 {
		return
	}
	d := w.d
	const height = 48.0
	d.subheading("Figure 3. Burst safety factor of the sampled units")
	d.need(height + 14)
	x0, y0 := d.left+14, d.y+2
	wd, ht := d.width()-18, height
	maxC := 1
	for _, c := range h.Counts {
		if c > maxC {
			maxC = c
		}
	}
	lo, hi := h.Edges[0], h.Edges[len(h.Edges)-1]
	fx := func(v float64) float64 { return x0 + wd*(v-lo)/(hi-lo) }
	d.c.setLineWidth(0.2)
	d.c.setDash()
	d.c.setStroke(midGrey)
	d.c.setFill(lightGrey)
	for i, c := range h.Counts {
		bh := ht * float64(c) / float64(maxC)
		d.c.rect(fx(h.Edges[i]), y0+ht-bh, fx(h.Edges[i+1])-fx(h.Edges[i]), bh, "FD")
	}
	d.c.setStroke(black)
	d.c.line(x0, y0+ht, x0+wd, y0+ht)
	d.c.line(x0, y0, x0, y0+ht)
	if lo < 1 && hi > 1 {
		d.c.setDash(1.2, 0.8)
		d.c.line(fx(1), y0, fx(1), y0+ht)
		d.c.setDash()
		d.use(small)
		d.c.drawText(fx(1)+1.5, y0+10, "← bursts: factor below 1")
	}
	d.use(small)
	for i := 0; i <= 4; i++ {
		v := lo + (hi-lo)*float64(i)/4
		s := fmt.Sprintf("%.3g", v)
		d.c.drawText(fx(v)-d.c.textWidth(s)/2, y0+ht+4, s)
	}
	s := fmt.Sprintf("%d", maxC)
	d.c.drawText(x0-d.c.textWidth(s)-1.5, y0+2, s)
	d.c.drawText(x0-3, y0+ht+1, "0")
	d.c.drawText(x0+wd/2-20, y0+ht+8.5, "unit safety factor (strength over stress)")
	d.y = y0 + ht + 11
	if h.Below+h.Above > 0 {
		d.note(fmt.Sprintf("%d units below and %d above the range shown.", h.Below, h.Above))
	}
	if h.NoLoad > 0 {
		d.note(fmt.Sprintf("%d units are not over-pressurised at their hottest temperature and carry no burst load; they are not drawn.", h.NoLoad))
	}
}

// driverChart ranks the inputs by their rank correlation with the safety
// factor, as horizontal bars either side of zero.
func (w *assessmentWriter) driverChart(ds []tolerance.Driver, n int) {
	if len(ds) == 0 {
		return
	}
	d := w.d
	rowH := 5.0
	d.subheading("Figure 4. What drives the safety margin")
	d.need(float64(len(ds))*rowH + 16)
	labelW := 58.0
	x0 := d.left + labelW
	wd := d.width() - labelW - 4
	mid := x0 + wd/2
	y := d.y + 1
	d.c.setLineWidth(0.2)
	d.c.setDash()
	for _, dr := range ds {
		d.use(body)
		d.c.drawText(d.left, baseline(y, rowH, body.size), d.fit(dr.Label, labelW-2))
		bw := wd / 2 * math.Abs(dr.RankCorrelation)
		x := mid
		if dr.RankCorrelation < 0 {
			x = mid - bw
			d.c.setFill(darkGrey)
		} else {
			d.c.setFill(lightGrey)
		}
		d.c.setStroke(black)
		d.c.rect(x, y+1, bw, rowH-2, "FD")
		d.use(small)
		d.c.drawText(mid+wd/2+1-d.c.textWidth("+1.00")-1, baseline(y, rowH, small.size), fmt.Sprintf("%+.2f", dr.RankCorrelation))
		y += rowH
	}
	d.c.setStroke(black)
	d.c.line(mid, d.y, mid, y)
	d.y = y + 1
	d.note(fmt.Sprintf("Spearman rank correlation with the unit safety factor over the first %d units (Spearman, Am. J. Psychol. 15, 72 (1904)). Dark bars lower the margin as the input grows: tighten those tolerances first.", n))
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
	case strings.HasSuffix(key, "wall_thickness_m"):
		return w.u.length(v)
	}
	return fmt.Sprintf("%.4g", v)
}

// inputSpread formats a ± spread (a difference, so temperatures convert
// without their offset).
func (w *assessmentWriter) inputSpread(key string, v float64) string {
	if key == tolerance.KeyHottest {
		return w.u.temperatureDifference(v)
	}
	return w.inputValue(key, v)
}
