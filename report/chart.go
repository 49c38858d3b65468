package report

import (
	"math"
	"strconv"
	"strings"
)

// A small line-chart drawer: axes with ticks and labels (linear or log),
// lines with dash patterns, labelled reference lines and labelled
// markers, and a legend. Everything is vector drawing on the canvas.

// xy is a point in data coordinates.
type xy struct{ x, y float64 }

// axis is one axis of a chart.
type axis struct {
	label    string
	min, max float64
	log      bool
}

// lineStyle is how a line is stroked.
type lineStyle struct {
	dash   []float64
	width  float64
	colour rgb
}

// series is a named line through data points; a non-finite point (or one
// at or below zero on a log axis) breaks the line.
type series struct {
	name  string
	pts   []xy
	style lineStyle
}

// refLine is a labelled horizontal (or vertical) reference line, such as a
// limit or a temperature of interest.
type refLine struct {
	value    float64
	label    string
	vertical bool
	style    lineStyle
}

// markShape is the shape of a marker.
type markShape int

const (
	markCircle markShape = iota
	markSquare
	markDiamond
	markTriangle
)

// mark is a labelled point.
type mark struct {
	at    xy
	label string
	shape markShape
	// filled marks are solid; others are open.
	filled bool
}

// chart is a whole line chart.
type chart struct {
	title  string
	x, y   axis
	series []series
	lines  []refLine
	marks  []mark
	// legendLines adds the reference lines to the legend.
	legendLines bool
}

// Dash patterns, distinct in print.
var (
	solidLine    = lineStyle{width: 0.5, colour: black}
	dashedLine   = lineStyle{dash: []float64{2.2, 1.2}, width: 0.5, colour: black}
	dottedLine   = lineStyle{dash: []float64{0.5, 0.9}, width: 0.6, colour: black}
	dashDotLine  = lineStyle{dash: []float64{2.6, 0.9, 0.5, 0.9}, width: 0.45, colour: darkGrey}
	longDashLine = lineStyle{dash: []float64{4, 1.5}, width: 0.4, colour: darkGrey}
)

// plotBox is the plotting area of a chart on the page.
type plotBox struct {
	x, y, w, h float64
	xa, ya     axis
}

func (b plotBox) fx(v float64) float64 { return b.x + b.w*frac(b.xa, v) }
func (b plotBox) fy(v float64) float64 { return b.y + b.h*(1-frac(b.ya, v)) }

// frac is the position of v along an axis, 0 at min and 1 at max.
func frac(a axis, v float64) float64 {
	if a.log {
		if v <= 0 {
			return math.Inf(-1)
		}
		return (math.Log10(v) - math.Log10(a.min)) / (math.Log10(a.max) - math.Log10(a.min))
	}
	return (v - a.min) / (a.max - a.min)
}

// usable reports whether a data point can be drawn.
func (b plotBox) usable(p xy) bool {
	return finite(p.x) && finite(p.y) && (!b.xa.log || p.x > 0) && (!b.ya.log || p.y > 0)
}

// page converts a data point to the page, clamped far outside the plot so
// that the clip does the cutting without huge numbers.
func (b plotBox) page(p xy) point {
	const far = 2000
	return point{clampF(b.fx(p.x), b.x-far, b.x+b.w+far), clampF(b.fy(p.y), b.y-far, b.y+b.h+far)}
}

func clampF(v, lo, hi float64) float64 { return math.Max(lo, math.Min(hi, v)) }

// drawChart draws a chart of the given height across the text width,
// starting a new page if it does not fit.
func (d *doc) drawChart(ch chart, height float64) {
	legendH := 0.0
	if n := d.legendEntries(ch); n > 0 {
		legendH = d.legendHeight(ch)
	}
	d.need(height + legendH)
	c := d.c
	top := d.y
	// Title.
	d.use(bodyBold)
	lh := lineHeight(bodyBold.size)
	c.drawText(d.left, baseline(top, lh, bodyBold.size), ch.title)
	// Plot area: room for tick labels and the rotated y label on the left,
	// tick labels and the x label below.
	d.use(small)
	yTicks := ticks(ch.y)
	labW := 0.0
	for _, t := range yTicks {
		if t.label != "" {
			labW = max(labW, c.textWidth(t.label))
		}
	}
	b := plotBox{x: d.left + labW + 7, y: top + lh + 2, xa: ch.x, ya: ch.y}
	b.w = d.right - 2 - b.x
	b.h = height - (lh + 2) - 11
	// Grid and frame.
	c.setDash()
	c.setLineWidth(0.12)
	c.setStroke(lightGrey)
	for _, t := range yTicks {
		if t.major {
			c.line(b.x, b.fy(t.v), b.x+b.w, b.fy(t.v))
		}
	}
	xTicks := ticks(ch.x)
	for _, t := range xTicks {
		if t.major {
			c.line(b.fx(t.v), b.y, b.fx(t.v), b.y+b.h)
		}
	}
	c.setStroke(black)
	c.setLineWidth(0.3)
	c.rect(b.x, b.y, b.w, b.h, stroke)
	// Ticks and tick labels.
	c.setLineWidth(0.2)
	d.use(small)
	sh := small.size * ptMM
	for _, t := range yTicks {
		y := b.fy(t.v)
		l := 1.0
		if t.major {
			l = 1.8
		}
		c.line(b.x-l, y, b.x, y)
		if t.label != "" {
			c.drawText(b.x-2.5-c.textWidth(t.label), y+0.35*sh, t.label)
		}
	}
	lastRight := math.Inf(-1)
	for _, t := range xTicks {
		x := b.fx(t.v)
		l := 1.0
		if t.major {
			l = 1.8
		}
		c.line(x, b.y+b.h, x, b.y+b.h+l)
		if t.label != "" {
			w := c.textWidth(t.label)
			if x-w/2 > lastRight+1.5 {
				c.drawText(x-w/2, b.y+b.h+2.3+sh, t.label)
				lastRight = x + w/2
			}
		}
	}
	// Axis labels.
	d.use(label)
	c.drawText(b.x+(b.w-c.textWidth(ch.x.label))/2, b.y+b.h+6.8+sh, ch.x.label)
	c.drawTextRotated(d.left+0.5+sh, b.y+(b.h+c.textWidth(ch.y.label))/2, 90, ch.y.label)

	// Reference lines, then series, then marks, all clipped to the plot.
	c.clip(b.x, b.y, b.w, b.h)
	for _, r := range ch.lines {
		d.applyLineStyle(r.style)
		if r.vertical {
			if x := b.fx(r.value); finite(x) {
				c.line(x, b.y, x, b.y+b.h)
			}
		} else if y := b.fy(r.value); finite(y) {
			c.line(b.x, y, b.x+b.w, y)
		}
	}
	for _, s := range ch.series {
		d.applyLineStyle(s.style)
		var run []point
		for _, p := range s.pts {
			if !b.usable(p) {
				c.polyline(run)
				run = run[:0]
				continue
			}
			run = append(run, b.page(p))
		}
		c.polyline(run)
	}
	c.unclip()
	p := &placer{b: b, points: seriesPoints(b, ch.series)}
	for _, m := range ch.marks {
		if b.usable(m.at) {
			q := b.page(m.at)
			p.placed = append(p.placed, labelBox{q.x - 1.5, q.y - 1.5, 3, 3})
		}
	}
	d.drawRefLabels(p, ch.lines)
	d.drawMarks(p, ch.marks)
	d.y = b.y + b.h + 11
	d.drawLegend(ch)
	d.y += 2
}

func (d *doc) applyLineStyle(s lineStyle) {
	d.c.setDash(s.dash...)
	d.c.setLineWidth(s.width)
	d.c.setStroke(s.colour)
}

// labelBox is a label placed on the plot with a white background.
type labelBox struct{ x, y, w, h float64 }

func (l labelBox) overlaps(o labelBox) bool {
	return l.x < o.x+o.w && o.x < l.x+l.w && l.y < o.y+o.h && o.y < l.y+l.h
}

// drawLabel writes text on a white ground at (x, top y).
func (d *doc) drawLabel(x, y float64, text string) labelBox {
	d.use(small)
	sh := small.size * ptMM
	w := d.c.textWidth(text) + 1.2
	h := sh + 1.2
	d.c.setFill(white)
	d.c.rect(x, y, w, h, fill)
	d.c.drawText(x+0.6, y+0.6+0.78*sh, text)
	return labelBox{x, y, w, h}
}

// placer finds places for labels on a plot: inside the plot, clear of
// labels already placed, and covering as little of the drawn lines as
// possible.
type placer struct {
	b      plotBox
	placed []labelBox
	points []point
}

// best returns the first candidate with the least cover, skipping those
// that leave the plot or overlap a placed label; ok is false when every
// candidate does.
func (p *placer) best(cands []labelBox) (labelBox, bool) {
	bestI, bestCover := -1, 0
	for i, c := range cands {
		if c.x < p.b.x+0.3 || c.x+c.w > p.b.x+p.b.w-0.3 || c.y < p.b.y+0.3 || c.y+c.h > p.b.y+p.b.h-0.3 {
			continue
		}
		clash := false
		for _, o := range p.placed {
			if c.overlaps(o) {
				clash = true
				break
			}
		}
		if clash {
			continue
		}
		cover := 0
		for _, q := range p.points {
			if q.x >= c.x && q.x <= c.x+c.w && q.y >= c.y && q.y <= c.y+c.h {
				cover++
			}
		}
		if bestI < 0 || cover < bestCover {
			bestI, bestCover = i, cover
		}
	}
	if bestI < 0 {
		return labelBox{}, false
	}
	return cands[bestI], true
}

// seriesPoints returns the drawn points of every series on the page.
func seriesPoints(b plotBox, ss []series) []point {
	var out []point
	for _, s := range ss {
		for _, p := range s.pts {
			if b.usable(p) {
				out = append(out, b.page(p))
			}
		}
	}
	return out
}

// drawRefLabels labels vertical lines at the top, beside the line, and
// horizontal lines at either end, above or below the line, wherever the
// label is clearest.
func (d *doc) drawRefLabels(p *placer, lines []refLine) {
	d.use(small)
	sh := small.size * ptMM
	h := sh + 1.2
	b := p.b
	for _, r := range lines {
		if !r.vertical || r.label == "" {
			continue
		}
		x := b.fx(r.value)
		if !finite(x) || x < b.x || x > b.x+b.w {
			continue
		}
		w := d.c.textWidth(r.label) + 1.2
		var cands []labelBox
		for y := b.y + 0.8; y < b.y+b.h-h; y += h + 0.4 {
			cands = append(cands, labelBox{x + 0.8, y, w, h}, labelBox{x - 0.8 - w, y, w, h})
		}
		if c, ok := p.best(cands); ok {
			p.placed = append(p.placed, d.drawLabel(c.x, c.y, r.label))
		}
	}
	for _, r := range lines {
		if r.vertical || r.label == "" {
			continue
		}
		y := b.fy(r.value)
		if !finite(y) || y < b.y-0.1 || y > b.y+b.h+0.1 {
			continue
		}
		w := d.c.textWidth(r.label) + 1.2
		right, left := b.x+b.w-w-0.8, b.x+0.8
		cands := []labelBox{
			{right, y - h - 0.3, w, h}, {right, y + 0.3, w, h},
			{left, y - h - 0.3, w, h}, {left, y + 0.3, w, h},
			{(right + left) / 2, y - h - 0.3, w, h}, {(right + left) / 2, y + 0.3, w, h},
		}
		if c, ok := p.best(cands); ok {
			p.placed = append(p.placed, d.drawLabel(c.x, c.y, r.label))
		}
	}
}

// drawMarkShape draws a marker centred on (x, y).
func (d *doc) drawMarkShape(x, y float64, shape markShape, filled bool) {
	c := d.c
	r := 1.1
	c.setDash()
	c.setLineWidth(0.3)
	c.setStroke(black)
	style := stroke
	if filled {
		c.setFill(black)
		style = fillStroke
	} else {
		c.setFill(white)
		style = fillStroke
	}
	switch shape {
	case markSquare:
		c.rect(x-r, y-r, 2*r, 2*r, style)
	case markDiamond:
		c.polygon([]point{{x, y - 1.3*r}, {x + 1.3*r, y}, {x, y + 1.3*r}, {x - 1.3*r, y}}, style)
	case markTriangle:
		c.polygon([]point{{x, y - 1.3*r}, {x + 1.2*r, y + r}, {x - 1.2*r, y + r}}, style)
	default:
		c.circle(x, y, r, style)
	}
}

// drawMarks draws each marker with its label beside it, inside the plot.
func (d *doc) drawMarks(p *placer, marks []mark) {
	b := p.b
	d.use(small)
	sh := small.size * ptMM
	for _, m := range marks {
		if !b.usable(m.at) {
			continue
		}
		at := point{b.fx(m.at.x), b.fy(m.at.y)}
		if at.x < b.x-0.1 || at.x > b.x+b.w+0.1 || at.y < b.y-0.1 || at.y > b.y+b.h+0.1 {
			continue
		}
		d.drawMarkShape(at.x, at.y, m.shape, m.filled)
		if m.label == "" {
			continue
		}
		w := d.c.textWidth(m.label) + 1.2
		h := sh + 1.2
		var cands []labelBox
		for _, off := range []float64{2, 6, 10} {
			cands = append(cands,
				labelBox{at.x - off - w, at.y - off - h, w, h},
				labelBox{at.x + off, at.y + off/2, w, h},
				labelBox{at.x - off - w, at.y + off/2, w, h},
				labelBox{at.x + off, at.y - off - h, w, h})
		}
		if c, ok := p.best(cands); ok {
			d.use(small)
			p.placed = append(p.placed, d.drawLabel(c.x, c.y, m.label))
			// A thin leader from the mark to a label set further off.
			if dx, dy := c.x+c.w/2-at.x, c.y+c.h/2-at.y; dx*dx+dy*dy > 60 {
				d.c.setDash()
				d.c.setLineWidth(0.15)
				d.c.setStroke(darkGrey)
				tx := clampF(at.x, c.x, c.x+c.w)
				ty := clampF(at.y, c.y, c.y+c.h)
				d.c.line(at.x, at.y, tx, ty)
			}
		}
	}
}

func (d *doc) legendEntries(ch chart) int {
	n := 0
	for _, s := range ch.series {
		if s.name != "" {
			n++
		}
	}
	if ch.legendLines {
		for _, r := range ch.lines {
			if r.label != "" {
				n++
			}
		}
	}
	return n
}

// legendItem is one entry of the legend: a line sample and its name.
type legendItem struct {
	text string
	line *lineStyle
}

func (d *doc) legendItems(ch chart) []legendItem {
	var items []legendItem
	for i := range ch.series {
		if ch.series[i].name != "" {
			items = append(items, legendItem{text: ch.series[i].name, line: &ch.series[i].style})
		}
	}
	if ch.legendLines {
		for i := range ch.lines {
			if ch.lines[i].label != "" {
				items = append(items, legendItem{text: ch.lines[i].label, line: &ch.lines[i].style})
			}
		}
	}
	return items
}

const legendSample = 9.0

func (d *doc) legendRows(ch chart) [][]legendItem {
	d.use(small)
	var rows [][]legendItem
	var row []legendItem
	x := d.left
	for _, it := range d.legendItems(ch) {
		w := legendSample + 1.5 + d.c.textWidth(it.text) + 5
		if x+w > d.right && len(row) > 0 {
			rows = append(rows, row)
			row, x = nil, d.left
		}
		row = append(row, it)
		x += w
	}
	if len(row) > 0 {
		rows = append(rows, row)
	}
	return rows
}

func (d *doc) legendHeight(ch chart) float64 {
	return float64(len(d.legendRows(ch))) * (lineHeight(small.size) + 0.5)
}

func (d *doc) drawLegend(ch chart) {
	lh := lineHeight(small.size) + 0.5
	for _, row := range d.legendRows(ch) {
		x := d.left
		y := d.y + lh/2
		for _, it := range row {
			d.applyLineStyle(*it.line)
			d.c.line(x, y, x+legendSample, y)
			d.use(small)
			d.c.drawText(x+legendSample+1.5, baseline(d.y, lh, small.size), it.text)
			x += legendSample + 1.5 + d.c.textWidth(it.text) + 5
		}
		d.y += lh
	}
}

// tick is a tick mark; major ticks carry a label and a grid line.
type tick struct {
	v     float64
	major bool
	label string
}

// ticks returns the ticks of an axis: "nice" steps of 1, 2 or 5 times a
// power of ten on a linear axis; decades (with 2 and 5 when the axis is
// short) on a log axis.
func ticks(a axis) []tick {
	if !(a.max > a.min) || !finite(a.min) || !finite(a.max) {
		return nil
	}
	if a.log {
		return logTicks(a)
	}
	step := niceStep((a.max - a.min) / 8)
	dec := max(0, int(-math.Floor(math.Log10(step)+1e-9)))
	var out []tick
	minor := step / 5
	if m := step / math.Pow(10, math.Floor(math.Log10(step)+1e-9)); math.Abs(m-2) < 1e-9 {
		minor = step / 4
	}
	for v := math.Ceil(a.min/minor-1e-9) * minor; v <= a.max+minor*1e-6; v += minor {
		r := math.Round(v/step) * step
		if math.Abs(v-r) < minor*1e-3 {
			out = append(out, tick{v: r, major: true, label: fixed(r, dec)})
		} else {
			out = append(out, tick{v: v})
		}
	}
	return out
}

// niceStep rounds a raw step up to 1, 2 or 5 times a power of ten.
func niceStep(raw float64) float64 {
	p := math.Pow(10, math.Floor(math.Log10(raw)))
	for _, m := range []float64{1, 2, 5, 10} {
		if raw <= m*p*1.0000001 {
			return m * p
		}
	}
	return 10 * p
}

func logTicks(a axis) []tick {
	lo, hi := math.Log10(a.min), math.Log10(a.max)
	decades := hi - lo
	every := 1
	if decades > 8 {
		every = int(math.Ceil(decades / 8))
	}
	var out []tick
	for e := math.Floor(lo); e <= math.Ceil(hi); e++ {
		base := math.Pow(10, e)
		for m := 1; m <= 9; m++ {
			v := float64(m) * base
			if v < a.min*(1-1e-9) || v > a.max*(1+1e-9) {
				continue
			}
			switch {
			case m == 1:
				t := tick{v: v, major: int(e)%every == 0}
				if t.major {
					t.label = decadeLabel(int(e))
				}
				out = append(out, t)
			case decades <= 8:
				t := tick{v: v}
				if decades < 2.5 && (m == 2 || m == 5) {
					t.label = plain(v)
				}
				out = append(out, t)
			}
		}
	}
	return out
}

// decadeLabel writes 10^e as a plain number for small exponents and as a
// power of ten otherwise.
func decadeLabel(e int) string {
	if e >= -3 && e <= 4 {
		return plain(math.Pow(10, float64(e)))
	}
	var b strings.Builder
	b.WriteString("10")
	for _, r := range strconv.Itoa(e) {
		b.WriteRune(superscripts[r])
	}
	return b.String()
}

// niceRange widens [lo, hi] outward to whole steps for a linear axis.
func niceRange(lo, hi float64) (float64, float64) {
	if !(hi > lo) {
		hi = lo + 1
	}
	step := niceStep((hi - lo) / 6)
	return math.Floor(lo/step) * step, math.Ceil(hi/step) * step
}

// logRange widens [lo, hi] outward to whole decades, or to 1-2-5 steps
// when the range is short.
func logRange(lo, hi float64) (float64, float64) {
	if !(lo > 0) {
		lo = hi / 1000
	}
	if !(hi > lo) {
		hi = lo * 10
	}
	l, h := math.Floor(math.Log10(lo)), math.Ceil(math.Log10(hi))
	if h-l <= 2 {
		return stepDown(lo), stepUp(hi)
	}
	return math.Pow(10, l), math.Pow(10, h)
}

func stepDown(v float64) float64 {
	p := math.Pow(10, math.Floor(math.Log10(v)))
	for _, m := range []float64{5, 2, 1} {
		if m*p <= v*(1+1e-9) {
			return m * p
		}
	}
	return p
}

func stepUp(v float64) float64 {
	p := math.Pow(10, math.Floor(math.Log10(v)))
	for _, m := range []float64{1, 2, 5, 10} {
		if m*p >= v*(1-1e-9) {
			return m * p
		}
	}
	return 10 * p
}
