package gui

import (
	"image/color"
	"math"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/canvas"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"
)

// chartSeries is one curve, in display units.
type chartSeries struct {
	Name   string
	X, Y   []float64
	Colour color.Color
	Width  float32
	Dashed bool
}

// chartMark is a labelled straight line across the plot: a limit
// (horizontal) or a temperature or time (vertical).
type chartMark struct {
	Label    string
	Value    float64
	Vertical bool
	Colour   color.Color
	Dashed   bool
}

// chartPoint is a labelled dot.
type chartPoint struct {
	X, Y   float64
	Label  string
	Colour color.Color
}

// chartSpec is everything a chart draws. Ranges of zero width are chosen
// from the data.
type chartSpec struct {
	Title          string
	XLabel, YLabel string
	LogX, LogY     bool
	XMin, XMax     float64
	YMin, YMax     float64
	Series         []chartSeries
	Marks          []chartMark
	Points         []chartPoint
	// Note is a line printed under the title (off-scale values …).
	Note string
	// Empty is shown instead of a plot when there is nothing to draw.
	Empty string
}

// chart draws a chartSpec with Fyne's canvas primitives: axes with
// ticks and units, curves, limit lines with labels and a legend.
type chart struct {
	widget.BaseWidget
	spec chartSpec
	// faded draws the chart washed out, for results that are out of date.
	faded bool
}

// newChart returns an empty chart.
func newChart() *chart {
	c := &chart{}
	c.ExtendBaseWidget(c)
	return c
}

// set replaces what the chart draws.
func (c *chart) set(spec chartSpec, faded bool) {
	c.spec, c.faded = spec, faded
	c.Refresh()
}

// CreateRenderer builds the chart's renderer.
func (c *chart) CreateRenderer() fyne.WidgetRenderer { return &chartRenderer{c: c} }

type chartRenderer struct {
	c    *chart
	objs []fyne.CanvasObject
	size fyne.Size
}

func (r *chartRenderer) Destroy() {}

func (r *chartRenderer) MinSize() fyne.Size { return fyne.NewSize(360, 170) }

func (r *chartRenderer) Objects() []fyne.CanvasObject { return r.objs }

func (r *chartRenderer) Layout(size fyne.Size) {
	r.size = size
	r.build()
}

func (r *chartRenderer) Refresh() {
	r.build()
	canvas.Refresh(r.c)
}

// Chart text sizes and margins, in Fyne units.
const (
	chartText      = 11
	chartTitleText = 12.5
	chartLeft      = 62
	chartRight     = 14
	chartBottom    = 38
)

// plotArea maps data to pixels.
type plotArea struct {
	x0, y0, w, h float32 // pixel rectangle
	xMin, xMax   float64
	yMin, yMax   float64
	logX, logY   bool
}

// axisPosition maps v in [lo, hi] to [0, 1], on a log scale when asked.
func axisPosition(v, lo, hi float64, log bool) float32 {
	if log {
		v, lo, hi = math.Log10(v), math.Log10(lo), math.Log10(hi)
	}
	return float32((v - lo) / (hi - lo))
}

func (p *plotArea) px(x float64) float32 {
	return p.x0 + axisPosition(x, p.xMin, p.xMax, p.logX)*p.w
}

func (p *plotArea) py(y float64) float32 {
	return p.y0 + p.h - axisPosition(y, p.yMin, p.yMax, p.logY)*p.h
}

// usable reports whether a data point can be drawn on the axes' scales.
func (p *plotArea) usable(x, y float64) bool {
	return finite(x) && finite(y) && (!p.logX || x > 0) && (!p.logY || y > 0)
}

// box is a rectangle taken by a label, for keeping labels apart.
type box struct{ x, y, w, h float32 }

func (a box) overlaps(b box) bool {
	return a.x < b.x+b.w && b.x < a.x+a.w && a.y < b.y+b.h && b.y < a.y+a.h
}

// labelPlacer puts each label at the best of its candidate positions:
// inside the plot, clear of the labels already placed and, as far as it
// can, of the curves.
type labelPlacer struct {
	area   box
	taken  []box // labels and dots
	curves []box // small boxes along the curves
}

func (lp *labelPlacer) place(w, h float32, candidates ...fyne.Position) fyne.Position {
	best, bestScore := candidates[0], -1
	for _, c := range candidates {
		b := box{c.X, c.Y, w, h}
		if b.x < lp.area.x || b.y < lp.area.y || b.x+b.w > lp.area.x+lp.area.w || b.y+b.h > lp.area.y+lp.area.h {
			continue
		}
		score := 0
		for _, t := range lp.taken {
			if b.overlaps(t) {
				score += 1000
			}
		}
		for _, t := range lp.curves {
			if b.overlaps(t) {
				score++
			}
		}
		if bestScore < 0 || score < bestScore {
			best, bestScore = c, score
		}
		if score == 0 {
			break
		}
	}
	lp.taken = append(lp.taken, box{best.X, best.Y, w, h})
	return best
}

func (r *chartRenderer) build() {
	spec := r.c.spec
	size := r.size
	if size.Width < 10 || size.Height < 10 {
		size = r.c.Size()
	}
	th := r.c.Theme()
	v := fyne.CurrentApp().Settings().ThemeVariant()
	fg := th.Color(theme.ColorNameForeground, v)
	grid := th.Color(theme.ColorNameSeparator, v)
	bg := th.Color(theme.ColorNameInputBackground, v)
	dr := newDrawing(make([]fyne.CanvasObject, 0, 256), size, bg)
	add, text := dr.add, dr.text

	top := float32(6)
	if spec.Title != "" {
		text(spec.Title, 8, top, chartTitleText, fg, true)
		top += 18
	}
	if spec.YLabel != "" {
		text(spec.YLabel, 8, top, chartText, fg, false)
		top += 15
	}
	if spec.Note != "" {
		text(spec.Note, 8, top, chartText, th.Color(theme.ColorNameWarning, v), false)
		top += 15
	}
	// Legend, on a line of its own above the plot so it hides no data.
	lx := float32(8)
	named := false
	for _, s := range spec.Series {
		if s.Name == "" {
			continue
		}
		named = true
		col := r.fade(s.Colour)
		w := s.Width
		if w == 0 {
			w = 2
		}
		if s.Dashed {
			dr.objs = append(dr.objs, dashes(lx, top+8, lx+24, top+8, col, w)...)
		} else {
			add(line(lx, top+8, lx+24, top+8, col, w))
		}
		text(s.Name, lx+29, top, chartText, fg, false)
		lx += 29 + fyne.MeasureText(s.Name, chartText, fyne.TextStyle{}).Width + 16
	}
	if named {
		top += 16
	}
	top += 6
	if spec.Empty != "" || len(spec.Series) == 0 {
		msg := spec.Empty
		if msg == "" {
			msg = "No results to draw yet."
		}
		text(msg, chartLeft, top+20, chartText+1, fg, false)
		r.objs = dr.objs
		return
	}
	p := &plotArea{x0: chartLeft, y0: top, w: size.Width - chartLeft - chartRight, h: size.Height - top - chartBottom}
	if p.w < 40 || p.h < 40 {
		r.objs = dr.objs
		return
	}
	p.xMin, p.xMax, p.yMin, p.yMax = dataRange(spec)
	p.logX, p.logY = spec.LogX, spec.LogY
	lp := &labelPlacer{area: box{p.x0, p.y0, p.w, p.h}}

	// Grid and tick labels.
	var xTicks []float64
	if p.logX {
		xTicks = logTicks(p.xMin, p.xMax)
	} else {
		xTicks = linearTicks(p.xMin, p.xMax, int(p.w/70))
	}
	for _, t := range xTicks {
		x := p.px(t)
		add(line(x, p.y0, x, p.y0+p.h, grid, 1))
		lbl := tickLabel(t, p.logX)
		w := fyne.MeasureText(lbl, chartText, fyne.TextStyle{}).Width
		text(lbl, x-w/2, p.y0+p.h+3, chartText, fg, false)
	}
	var yTicks []float64
	if p.logY {
		yTicks = logTicks(p.yMin, p.yMax)
	} else {
		yTicks = linearTicks(p.yMin, p.yMax, int(p.h/40))
	}
	for _, t := range yTicks {
		y := p.py(t)
		add(line(p.x0, y, p.x0+p.w, y, grid, 1))
		lbl := tickLabel(t, p.logY)
		sz := fyne.MeasureText(lbl, chartText, fyne.TextStyle{})
		text(lbl, p.x0-sz.Width-5, y-sz.Height/2, chartText, fg, false)
	}
	frame := canvas.NewRectangle(color.Transparent)
	frame.StrokeColor = fg
	frame.StrokeWidth = 1
	frame.Move(fyne.NewPos(p.x0, p.y0))
	frame.Resize(fyne.NewSize(p.w, p.h))
	add(frame)
	if spec.XLabel != "" {
		w := fyne.MeasureText(spec.XLabel, chartText, fyne.TextStyle{}).Width
		text(spec.XLabel, p.x0+p.w/2-w/2, p.y0+p.h+19, chartText, fg, false)
	}

	// Curves, the first on top.
	for k := len(spec.Series) - 1; k >= 0; k-- {
		s := spec.Series[k]
		col := r.fade(s.Colour)
		wdt := s.Width
		if wdt == 0 {
			wdt = 2
		}
		for i := 1; i < len(s.X) && i < len(s.Y); i++ {
			if !p.usable(s.X[i-1], s.Y[i-1]) || !p.usable(s.X[i], s.Y[i]) {
				continue
			}
			x1, y1, x2, y2, ok := clip(p.px(s.X[i-1]), p.py(s.Y[i-1]), p.px(s.X[i]), p.py(s.Y[i]), p)
			if !ok {
				continue
			}
			lp.curves = append(lp.curves, box{min(x1, x2) - 2, min(y1, y2) - 2, abs32(x2-x1) + 4, abs32(y2-y1) + 4})
			if s.Dashed {
				dr.objs = append(dr.objs, dashes(x1, y1, x2, y2, col, wdt)...)
			} else {
				add(line(x1, y1, x2, y2, col, wdt))
			}
		}
	}

	// Points first, then the lines' labels, each kept clear of the rest.
	const lh = 14
	label := func(lbl string, col color.Color, strong bool, cands ...fyne.Position) {
		w := fyne.MeasureText(lbl, chartText, fyne.TextStyle{Bold: strong}).Width
		pos := lp.place(w+2, lh, cands...)
		labelBack(add, pos.X, pos.Y, w+2, lh, bg)
		text(lbl, pos.X+1, pos.Y, chartText, col, strong)
	}
	type pending struct {
		lbl   string
		col   color.Color
		cands []fyne.Position
	}
	var labels []pending
	for _, pt := range spec.Points {
		if !p.usable(pt.X, pt.Y) || pt.X < p.xMin || pt.X > p.xMax || pt.Y < p.yMin || pt.Y > p.yMax {
			continue
		}
		col := r.fade(pt.Colour)
		x, y := p.px(pt.X), p.py(pt.Y)
		dot := canvas.NewCircle(col)
		dot.Move(fyne.NewPos(x-4, y-4))
		dot.Resize(fyne.NewSize(8, 8))
		add(dot)
		lp.taken = append(lp.taken, box{x - 4, y - 4, 8, 8})
		if pt.Label != "" {
			w := fyne.MeasureText(pt.Label, chartText, fyne.TextStyle{Bold: true}).Width + 2
			labels = append(labels, pending{pt.Label, col, []fyne.Position{
				{X: x - w - 6, Y: y - lh - 4}, {X: x - w - 6, Y: y + 4}, {X: x + 6, Y: y - lh - 4}, {X: x + 6, Y: y + 4},
				{X: x - w - 6, Y: y - 2*lh - 6}, {X: x - w - 6, Y: y + lh + 6},
			}})
		}
	}
	var lines []pending
	for _, m := range spec.Marks {
		col := r.fade(m.Colour)
		w := fyne.MeasureText(m.Label, chartText, fyne.TextStyle{}).Width + 2
		if m.Vertical {
			if !p.usable(m.Value, p.yMax) || m.Value < p.xMin || m.Value > p.xMax {
				continue
			}
			x := p.px(m.Value)
			dr.objs = append(dr.objs, markLine(x, p.y0, x, p.y0+p.h, col, m.Dashed)...)
			var cands []fyne.Position
			for k := float32(0); k < 8; k++ {
				cands = append(cands, fyne.Position{X: x + 3, Y: p.y0 + 3 + k*(lh+1)}, fyne.Position{X: x - 3 - w, Y: p.y0 + 3 + k*(lh+1)})
			}
			lines = append(lines, pending{m.Label, col, cands})
			continue
		}
		if !p.usable(p.xMax, m.Value) || m.Value < p.yMin || m.Value > p.yMax {
			continue
		}
		y := p.py(m.Value)
		dr.objs = append(dr.objs, markLine(p.x0, y, p.x0+p.w, y, col, m.Dashed)...)
		lines = append(lines, pending{m.Label, col, []fyne.Position{
			{X: p.x0 + p.w - w - 4, Y: y - lh - 1}, {X: p.x0 + 4, Y: y - lh - 1},
			{X: p.x0 + p.w - w - 4, Y: y + 2}, {X: p.x0 + 4, Y: y + 2},
			{X: p.x0 + p.w/2 - w/2, Y: y - lh - 1}, {X: p.x0 + p.w/2 - w/2, Y: y + 2},
			{X: p.x0 + p.w/4 - w/2, Y: y - lh - 1}, {X: p.x0 + 3*p.w/4 - w/2, Y: y - lh - 1},
			{X: p.x0 + p.w/4 - w/2, Y: y + 2}, {X: p.x0 + 3*p.w/4 - w/2, Y: y + 2},
		}})
	}
	for _, l := range labels {
		label(l.lbl, l.col, true, l.cands...)
	}
	for _, l := range lines {
		label(l.lbl, l.col, false, l.cands...)
	}
	r.objs = dr.objs
}

// fade washes a colour out when the results are out of date.
func (r *chartRenderer) fade(c color.Color) color.Color {
	if !r.c.faded {
		return c
	}
	cr, cg, cb, _ := c.RGBA()
	return color.NRGBA{R: uint8(cr >> 8), G: uint8(cg >> 8), B: uint8(cb >> 8), A: 90}
}

func labelBack(add func(fyne.CanvasObject), x, y, w, h float32, bg color.Color) {
	r := canvas.NewRectangle(bg)
	r.Move(fyne.NewPos(x, y))
	r.Resize(fyne.NewSize(w, h))
	add(r)
}

func line(x1, y1, x2, y2 float32, col color.Color, w float32) *canvas.Line {
	l := canvas.NewLine(col)
	l.StrokeWidth = w
	l.Position1 = fyne.NewPos(x1, y1)
	l.Position2 = fyne.NewPos(x2, y2)
	return l
}

func markLine(x1, y1, x2, y2 float32, col color.Color, dashed bool) []fyne.CanvasObject {
	if dashed {
		return dashes(x1, y1, x2, y2, col, 1.5)
	}
	return []fyne.CanvasObject{line(x1, y1, x2, y2, col, 1.5)}
}

// dashes draws a dashed segment as short lines, 6 on and 4 off.
func dashes(x1, y1, x2, y2 float32, col color.Color, w float32) []fyne.CanvasObject {
	dx, dy := x2-x1, y2-y1
	n := float32(math.Hypot(float64(dx), float64(dy)))
	if n < 1 {
		return nil
	}
	var out []fyne.CanvasObject
	for s := float32(0); s < n; s += 10 {
		e := min(s+6, n)
		out = append(out, line(x1+dx*s/n, y1+dy*s/n, x1+dx*e/n, y1+dy*e/n, col, w))
	}
	return out
}

// clip cuts a segment to the plot rectangle (Liang–Barsky).
func clip(x1, y1, x2, y2 float32, p *plotArea) (float32, float32, float32, float32, bool) {
	t0, t1 := float32(0), float32(1)
	dx, dy := x2-x1, y2-y1
	edges := [4][2]float32{{-dx, x1 - p.x0}, {dx, p.x0 + p.w - x1}, {-dy, y1 - p.y0}, {dy, p.y0 + p.h - y1}}
	for _, e := range edges {
		pp, q := e[0], e[1]
		if pp == 0 {
			if q < 0 {
				return 0, 0, 0, 0, false
			}
			continue
		}
		t := q / pp
		if pp < 0 {
			if t > t1 {
				return 0, 0, 0, 0, false
			}
			t0 = max(t0, t)
		} else {
			if t < t0 {
				return 0, 0, 0, 0, false
			}
			t1 = min(t1, t)
		}
	}
	return x1 + t0*dx, y1 + t0*dy, x1 + t1*dx, y1 + t1*dy, true
}

func finite(x float64) bool { return !math.IsNaN(x) && !math.IsInf(x, 0) }

func abs32(x float32) float32 {
	if x < 0 {
		return -x
	}
	return x
}

// dataRange returns the axes' ranges: the spec's own where given,
// otherwise the span of the curves and marks with a little room.
func dataRange(s chartSpec) (xMin, xMax, yMin, yMax float64) {
	logX, logY := s.LogX, s.LogY
	xMin, xMax, yMin, yMax = math.Inf(1), math.Inf(-1), math.Inf(1), math.Inf(-1)
	for _, se := range s.Series {
		for i := range se.X {
			if i >= len(se.Y) || !finite(se.X[i]) || !finite(se.Y[i]) || (logY && se.Y[i] <= 0) || (logX && se.X[i] <= 0) {
				continue
			}
			xMin, xMax = math.Min(xMin, se.X[i]), math.Max(xMax, se.X[i])
			yMin, yMax = math.Min(yMin, se.Y[i]), math.Max(yMax, se.Y[i])
		}
	}
	if s.XMax > s.XMin {
		xMin, xMax = s.XMin, s.XMax
	}
	if s.YMax > s.YMin {
		yMin, yMax = s.YMin, s.YMax
	} else if finite(yMin) {
		if logY {
			yMin, yMax = yMin/1.5, yMax*1.5
		} else {
			pad := (yMax - yMin) * 0.08
			yMin, yMax = yMin-pad, yMax+pad
		}
	}
	if !finite(xMin) || !finite(xMax) || xMax <= xMin {
		xMin, xMax = 0, 1
	}
	if !finite(yMin) || !finite(yMax) || yMax <= yMin {
		yMin, yMax = 0, 1
		if logY {
			yMin, yMax = 1, 10
		}
	}
	if logY && yMin <= 0 {
		yMin = yMax / 1e6
	}
	if logX && xMin <= 0 {
		xMin = xMax / 1e4
	}
	return
}

// linearTicks returns round tick values covering [lo, hi], about n of them.
func linearTicks(lo, hi float64, n int) []float64 {
	if n < 2 {
		n = 2
	}
	span := hi - lo
	if span <= 0 || !finite(span) {
		return nil
	}
	raw := span / float64(n)
	mag := math.Pow(10, math.Floor(math.Log10(raw)))
	step := mag
	for _, m := range []float64{1, 2, 2.5, 5, 10} {
		if m*mag >= raw {
			step = m * mag
			break
		}
	}
	var out []float64
	for t := math.Ceil(lo/step) * step; t <= hi+step*1e-9; t += step {
		if math.Abs(t) < step*1e-9 {
			t = 0
		}
		out = append(out, t)
	}
	return out
}

// logTicks returns the powers of ten in [lo, hi], with 2 and 5 between
// them when the range spans few decades.
func logTicks(lo, hi float64) []float64 {
	a, b := math.Floor(math.Log10(lo)), math.Ceil(math.Log10(hi))
	var out []float64
	sub := []float64{1}
	if b-a <= 2 {
		sub = []float64{1, 2, 5}
	}
	step := 1.0
	if b-a > 8 {
		step = 2
	}
	for e := a; e <= b; e += step {
		for _, m := range sub {
			t := m * math.Pow(10, e)
			if t >= lo*(1-1e-9) && t <= hi*(1+1e-9) {
				out = append(out, t)
			}
		}
	}
	return out
}

// tickLabel writes an axis value compactly: 0.01, 1, 100, 10 000, 10⁶.
func tickLabel(t float64, log bool) string {
	at := math.Abs(t)
	if log && (at >= 1e6 || (at > 0 && at < 1e-3)) {
		e := math.Round(math.Log10(at))
		m := t / math.Pow(10, e)
		if math.Abs(m-1) < 1e-9 {
			return "10" + superscript(int(e))
		}
		return sigFigures(m, 2) + "×10" + superscript(int(e))
	}
	s := sigFigures(t, 4)
	if at >= 1e4 && at < 1e7 && !containsAny(s, ".×") {
		// thin groups of three digits for legibility
		n := len(s)
		out := ""
		for i, c := range s {
			if i > 0 && (n-i)%3 == 0 && s[i-1] != '-' {
				out += " "
			}
			out += string(c)
		}
		return out
	}
	return s
}

func containsAny(s, chars string) bool {
	for _, c := range chars {
		for _, d := range s {
			if c == d {
				return true
			}
		}
	}
	return false
}
