package gui

import (
	"fmt"
	"image/color"
	"math"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/canvas"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"

	"ullage/hazards/tolerance"
)

// barsKind says which chart a barChart draws.
type barsKind int

const (
	barsHistogram barsKind = iota
	barsDrivers
)

// barChart draws the tolerance study's two bar charts with Fyne's canvas
// primitives: the histogram of the units' safety factors and the ranked
// drivers of the margin. Neither needs colour to be read: bars that
// matter (units that burst, inputs that lower the margin) are filled in
// the text colour, the others lighter (histogram) or only outlined
// (drivers), and every bar of the drivers carries its signed value.
type barChart struct {
	widget.BaseWidget
	kind    barsKind
	hist    tolerance.Histogram
	drivers []tolerance.Driver
	// faded draws the chart washed out, for a study that is out of date.
	faded bool
}

func newBarChart(kind barsKind) *barChart {
	c := &barChart{kind: kind}
	c.ExtendBaseWidget(c)
	return c
}

// setHistogram shows a histogram of safety factors.
func (c *barChart) setHistogram(h tolerance.Histogram, faded bool) {
	c.hist, c.faded = h, faded
	c.Refresh()
}

// setDrivers shows the ranked drivers.
func (c *barChart) setDrivers(ds []tolerance.Driver, faded bool) {
	c.drivers, c.faded = ds, faded
	c.Refresh()
}

// CreateRenderer builds the chart's renderer.
func (c *barChart) CreateRenderer() fyne.WidgetRenderer { return &barRenderer{c: c} }

type barRenderer struct {
	c    *barChart
	objs []fyne.CanvasObject
	size fyne.Size
}

// Sizes of the bar charts.
const (
	histogramHeight = 230
	driverRowHeight = 26
	driverLabelW    = 190
	driverValueW    = 56
)

func (r *barRenderer) Destroy()                     {}
func (r *barRenderer) Objects() []fyne.CanvasObject { return r.objs }
func (r *barRenderer) Layout(size fyne.Size)        { r.size = size; r.build() }
func (r *barRenderer) Refresh()                     { r.build(); canvas.Refresh(r.c) }

func (r *barRenderer) MinSize() fyne.Size {
	if r.c.kind == barsHistogram {
		return fyne.NewSize(360, histogramHeight)
	}
	return fyne.NewSize(driverLabelW+220+driverValueW, float32(max(len(r.c.drivers), 1))*driverRowHeight+58)
}

// palette returns the colours of the chart: text, grid, the light and the
// strong bar fill, and the background.
func (r *barRenderer) palette() (fg, grid, light, dark, bg color.Color) {
	th := r.c.Theme()
	v := fyne.CurrentApp().Settings().ThemeVariant()
	fg = th.Color(theme.ColorNameForeground, v)
	grid = th.Color(theme.ColorNameSeparator, v)
	bg = th.Color(theme.ColorNameInputBackground, v)
	light = tint(th.Color(theme.ColorNamePrimary, v), 90)
	dark = tint(fg, 215)
	if r.c.faded {
		fg, light, dark = tint(fg, 110), tint(light, 40), tint(dark, 70)
	}
	return
}

func (r *barRenderer) build() {
	size := r.size
	if size.Width < 10 || size.Height < 10 {
		size = r.c.Size()
	}
	fg, grid, light, dark, bg := r.palette()
	dr := newDrawing(r.objs, size, bg)
	add := dr.add
	text := func(s string, x, y, sz float32, bold bool) *canvas.Text { return dr.text(s, x, y, sz, fg, bold) }
	bar := func(x, y, w, h float32, fill color.Color) {
		if w < 0 {
			x, w = x+w, -w
		}
		rect := canvas.NewRectangle(fill)
		rect.StrokeColor = fg
		rect.StrokeWidth = 1
		rect.Move(fyne.NewPos(x, y))
		rect.Resize(fyne.NewSize(max(w, 1), h))
		add(rect)
	}
	if r.c.kind == barsHistogram {
		r.histogram(size, text, bar, fg, grid, light, dark, add)
	} else {
		r.driverBars(size, text, bar, fg, grid, light, dark, add)
	}
	r.objs = dr.objs
}

type textFn func(s string, x, y, sz float32, bold bool) *canvas.Text
type barFn func(x, y, w, h float32, fill color.Color)

// histogram draws the units' safety factors as bars, with the bins below
// a factor of 1 (units that burst) dark and a dashed line at 1.
func (r *barRenderer) histogram(size fyne.Size, text textFn, bar barFn, fg, grid, light, dark color.Color, add func(fyne.CanvasObject)) {
	h := r.c.hist
	text("Burst safety factor of the sampled units", 8, 6, chartTitleText, true)
	text("Units per bin", 8, 24, chartText, false)
	if len(h.Counts) == 0 || len(h.Edges) != len(h.Counts)+1 {
		text("No study yet.", chartLeft, 60, chartText+1, false)
		return
	}
	p := plotArea{x0: chartLeft, y0: 44, w: size.Width - chartLeft - chartRight, h: size.Height - 44 - chartBottom}
	if p.w < 40 || p.h < 40 {
		return
	}
	maxC := 1
	for _, c := range h.Counts {
		maxC = max(maxC, c)
	}
	p.xMin, p.xMax = h.Edges[0], h.Edges[len(h.Edges)-1]
	p.yMin, p.yMax = 0, float64(maxC)*1.08
	if !(p.xMax > p.xMin) {
		p.xMax = p.xMin + 1
	}
	for _, t := range linearTicks(p.yMin, p.yMax, int(p.h/40)) {
		y := p.py(t)
		add(line(p.x0, y, p.x0+p.w, y, grid, 1))
		lbl := tickLabel(t, false)
		sz := fyne.MeasureText(lbl, chartText, fyne.TextStyle{})
		text(lbl, p.x0-sz.Width-5, y-sz.Height/2, chartText, false)
	}
	for i, c := range h.Counts {
		if c == 0 {
			continue
		}
		x1, x2 := p.px(h.Edges[i]), p.px(h.Edges[i+1])
		y := p.py(float64(c))
		fill := light
		if h.Edges[i+1] <= 1 {
			fill = dark
		}
		bar(x1, y, x2-x1, p.y0+p.h-y, fill)
	}
	for _, t := range linearTicks(p.xMin, p.xMax, int(p.w/70)) {
		x := p.px(t)
		add(line(x, p.y0+p.h, x, p.y0+p.h+4, fg, 1))
		lbl := tickLabel(t, false)
		w := fyne.MeasureText(lbl, chartText, fyne.TextStyle{}).Width
		text(lbl, x-w/2, p.y0+p.h+5, chartText, false)
	}
	add(line(p.x0, p.y0+p.h, p.x0+p.w, p.y0+p.h, fg, 1))
	add(line(p.x0, p.y0, p.x0, p.y0+p.h, fg, 1))
	if p.xMin < 1 && p.xMax > 1 {
		x := p.px(1)
		for _, o := range dashes(x, p.y0, x, p.y0+p.h, fg, 1.5) {
			add(o)
		}
		lbl := "← burst: factor below 1"
		w := fyne.MeasureText(lbl, chartText, fyne.TextStyle{Bold: true}).Width
		lx := x + 4
		if lx+w > p.x0+p.w {
			lx = x - w - 4
		}
		text(lbl, lx, p.y0+2, chartText, true)
	}
	xl := "Unit safety factor: the unit's own glass strength over its hoop stress at its hottest temperature"
	w := fyne.MeasureText(xl, chartText, fyne.TextStyle{}).Width
	text(xl, max(p.x0+p.w/2-w/2, 8), p.y0+p.h+20, chartText, false)
}

// driverBars draws the inputs, strongest first, as bars either side of
// zero: to the left, filled, when a larger value lowers the margin; to
// the right, outlined, when it raises it.
func (r *barRenderer) driverBars(size fyne.Size, text textFn, bar barFn, fg, grid, light, dark color.Color, add func(fyne.CanvasObject)) {
	ds := r.c.drivers
	text("What drives the safety margin", 8, 6, chartTitleText, true)
	if len(ds) == 0 {
		text("No study yet.", 8, 30, chartText+1, false)
		return
	}
	x0 := float32(driverLabelW)
	w := size.Width - driverLabelW - driverValueW - 8
	if w < 60 {
		return
	}
	mid := x0 + w/2
	top := float32(28)
	left, right := "← lowers the margin as it grows", "raises the margin as it grows →"
	text(left, mid-fyne.MeasureText(left, chartText, fyne.TextStyle{}).Width-6, top, chartText, false)
	text(right, mid+6, top, chartText, false)
	y := top + 18
	for _, t := range []float64{-1, -0.5, 0.5, 1} {
		x := mid + float32(t)*w/2
		add(line(x, y, x, y+float32(len(ds))*driverRowHeight, grid, 1))
	}
	for _, d := range ds {
		lbl := capitalise(d.Label)
		runes := []rune(lbl)
		for len(runes) > 1 && fyne.MeasureText(lbl, chartText+1, fyne.TextStyle{}).Width > driverLabelW-12 {
			runes = runes[:len(runes)-1]
			lbl = string(runes) + "…"
		}
		text(lbl, 8, y+4, chartText+1, false)
		rc := d.RankCorrelation
		if math.IsNaN(rc) {
			rc = 0
		}
		bw := float32(rc) * w / 2
		var fill color.Color = color.Transparent
		if rc < 0 {
			fill = dark
		}
		bar(mid, y+4, bw, driverRowHeight-8, fill)
		text(signedCorrelation(rc), x0+w+6, y+4, chartText+1, true)
		y += driverRowHeight
	}
	add(line(mid, top+18, mid, y, fg, 1.5))
	for _, t := range []float64{-1, -0.5, 0, 0.5, 1} {
		x := mid + float32(t)*w/2
		lbl := signedCorrelation(t)
		tw := fyne.MeasureText(lbl, chartText, fyne.TextStyle{}).Width
		text(lbl, x-tw/2, y+2, chartText, false)
	}
}

// signedCorrelation writes a rank correlation with its sign: +0.83,
// −0.42, 0.
func signedCorrelation(x float64) string {
	switch {
	case math.Abs(x) < 0.005:
		return "0"
	case x < 0:
		return fmt.Sprintf("−%.2f", -x)
	}
	return fmt.Sprintf("+%.2f", x)
}

// histogramNotes says what the histogram leaves out: units outside its
// range and units with no burst load, counted at the cap.
func histogramNotes(h tolerance.Histogram, r *tolerance.Result) string {
	var notes []string
	if h.Below+h.Above > 0 {
		notes = append(notes, fmt.Sprintf("%s below and %s above the range shown.", groupDigits(h.Below), groupDigits(h.Above)))
	}
	if h.NoLoad > 0 {
		notes = append(notes, fmt.Sprintf("%s carry no burst load (the pressure inside stays below the outside pressure at their hottest temperature) and are not drawn.", plural(h.NoLoad, "unit")))
	}
	if r != nil && r.UnsealableUnits > 0 {
		notes = append(notes, fmt.Sprintf("%s could not be sealed (their fill would not fit as liquid) and count at a factor of 0.", plural(r.UnsealableUnits, "unit")))
	}
	out := ""
	for i, n := range notes {
		if i > 0 {
			out += " "
		}
		out += n
	}
	return out
}
