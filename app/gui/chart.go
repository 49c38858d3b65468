package gui

import (
	"image"
	"image/color"
	"math"
	"reflect"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/canvas"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"

	"ullage/report/chartmodel"
)

// chart shows a chart description, drawn by the chart model into an
// image the size of the widget whenever it is changed or laid out at
// another size.
type chart struct {
	widget.BaseWidget
	spec chartmodel.Chart
	// faded draws the chart washed out, for results that are out of date.
	faded bool
	// gen numbers the descriptions set, so that the renderer can tell a
	// chart it has drawn already; gens counts them.
	gen, gens uint64
	// before is the description shown last before this one. Going back
	// to it (the same results again after "No results yet" while a
	// design opens or an input is mistyped) shows its image again.
	before chartShown
}

// chartShown is a description a chart showed.
type chartShown struct {
	spec  chartmodel.Chart
	faded bool
	gen   uint64
}

// newChart returns an empty chart.
func newChart() *chart {
	c := &chart{}
	c.ExtendBaseWidget(c)
	return c
}

// set replaces what the chart draws; the same description again (new
// results that chart alike) leaves the chart as it is.
func (c *chart) set(spec chartmodel.Chart, faded bool) {
	if c.gen > 0 && faded == c.faded && reflect.DeepEqual(spec, c.spec) {
		return
	}
	now := chartShown{c.spec, c.faded, c.gen}
	if b := c.before; b.gen > 0 && faded == b.faded && reflect.DeepEqual(spec, b.spec) {
		c.spec, c.faded, c.gen = b.spec, b.faded, b.gen
	} else {
		c.gens++
		c.spec, c.faded, c.gen = spec, faded, c.gens
	}
	c.before = now
	c.Refresh()
}

// CreateRenderer builds the chart's renderer.
func (c *chart) CreateRenderer() fyne.WidgetRenderer {
	img := canvas.NewImageFromImage(image.NewRGBA(image.Rect(0, 0, 1, 1)))
	img.FillMode = canvas.ImageFillStretch
	img.ScaleMode = canvas.ImageScaleSmooth
	return &chartRenderer{c: c, img: img}
}

type chartRenderer struct {
	c    *chart
	img  *canvas.Image
	size fyne.Size
	// drawn is what the image shows; a refresh or layout that would draw
	// the same again keeps it. kept is the image drawn before, and what
	// it shows.
	drawn, kept chartDrawn
	keptImg     image.Image
}

// chartDrawn is what a chart's image was drawn from: the description,
// the size in pixels, the resolution and the colours.
type chartDrawn struct {
	gen    uint64
	w, h   int
	dpi    float64
	fg, bg color.Color
}

func (r *chartRenderer) Destroy() {}

func (r *chartRenderer) MinSize() fyne.Size { return fyne.NewSize(360, 170) }

func (r *chartRenderer) Objects() []fyne.CanvasObject { return []fyne.CanvasObject{r.img} }

func (r *chartRenderer) Layout(size fyne.Size) {
	r.size = size
	r.img.Resize(size)
	r.draw()
}

func (r *chartRenderer) Refresh() {
	if r.draw() {
		canvas.Refresh(r.img)
	}
}

// chartDPI is the resolution charts are drawn at for one Fyne unit per
// pixel: 11-unit text in the window is drawn as 8-point text.
const chartDPI = 96

// draw draws the chart into the image, unless it is hidden or the image
// shows it already, and reports whether it drew.
func (r *chartRenderer) draw() bool {
	if !r.c.Visible() {
		// A chart on a tab behind the others is drawn when its tab is
		// brought forward: showing it refreshes it.
		return false
	}
	size := r.size
	if size.Width < 10 || size.Height < 10 {
		size = r.c.Size()
	}
	scale := float32(1)
	if cv := fyne.CurrentApp().Driver().CanvasForObject(r.c); cv != nil {
		scale = cv.Scale()
	}
	w, h := int(math.Round(float64(size.Width*scale))), int(math.Round(float64(size.Height*scale)))
	if w < 2 || h < 2 {
		return false
	}
	th := r.c.Theme()
	v := fyne.CurrentApp().Settings().ThemeVariant()
	o := chartmodel.Options{
		FontSize:   8,
		Foreground: th.Color(theme.ColorNameForeground, v),
		Background: th.Color(theme.ColorNameInputBackground, v),
	}
	if r.c.faded {
		o.Foreground = fade(o.Foreground, o.Background)
	}
	d := chartDrawn{gen: r.c.gen, w: w, h: h, dpi: chartDPI * float64(scale), fg: o.Foreground, bg: o.Background}
	switch d {
	case r.drawn:
		return false
	case r.kept:
		r.drawn, r.kept = r.kept, r.drawn
		r.img.Image, r.keptImg = r.keptImg, r.img.Image
		return true
	}
	r.kept, r.keptImg = r.drawn, r.img.Image
	r.drawn = d
	r.img.Image = chartmodel.Image(r.c.spec, w, h, d.dpi, o)
	return true
}

// fade mixes a colour halfway to the ground, for out-of-date results.
func fade(c, ground color.Color) color.Color {
	r1, g1, b1, _ := c.RGBA()
	r2, g2, b2, _ := ground.RGBA()
	mix := func(a, b uint32) uint8 { return uint8((a + b) / 2 >> 8) }
	return color.NRGBA{R: mix(r1, r2), G: mix(g1, g2), B: mix(b1, b2), A: 0xff}
}

// chartUnits hands the window's conversions and formatters to the chart
// model, so that a chart's labels read like the rest of the window.
func (u unitSystem) chartUnits() chartmodel.Units {
	q := func(k quantity) chartmodel.Quantity {
		return chartmodel.Quantity{
			Unit:   u.unit(k),
			FromSI: func(x float64) float64 { return u.fromSI(k, x) },
			Format: func(x float64) string { return u.show(k, x, 3) },
		}
	}
	return chartmodel.Units{
		Temperature: q(qTemperature),
		Pressure:    q(qPressure),
		Number:      func(v float64) string { return sigFigures(v, 3) },
	}
}
