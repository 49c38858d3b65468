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
	// recent are the descriptions shown last, the one on screen first.
	// Going back to one of them (the same results again after "No
	// results yet" while a design opens or an input is mistyped) shows
	// its image again if the renderer still has it.
	recent []chartShown
	// held keeps the chart from drawing until the next set: the results
	// panel lays out again for new findings before it sets the charts
	// of the new results, and the chart of the old results at the new
	// size would be drawn for nothing.
	held bool
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
	held := c.held
	c.held = false
	for i, k := range c.recent {
		if k.faded == faded && reflect.DeepEqual(k.spec, spec) {
			if i == 0 {
				if held {
					c.Refresh()
				}
				return
			}
			copy(c.recent[1:i+1], c.recent[:i])
			c.recent[0] = k
			c.spec, c.faded, c.gen = k.spec, k.faded, k.gen
			c.Refresh()
			return
		}
	}
	c.gens++
	c.spec, c.faded, c.gen = spec, faded, c.gens
	c.recent = append([]chartShown{{spec, faded, c.gen}}, c.recent[:min(len(c.recent), chartImagesKept-1)]...)
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
	// shown are the images drawn last and what each shows, the one on
	// screen first: a refresh or layout that would draw one of them
	// again (the same chart after "No results yet", or at the window's
	// size before) shows it instead.
	shown []chartImage
}

// chartImagesKept is how many images a chart keeps, the one on screen
// included, and how many descriptions it remembers: a few megabytes
// each at most. Opening a design draws the chart of the results before
// and "No results yet", each at the height the charts have while the
// findings are empty and at their height with the findings.
const chartImagesKept = 4

// chartDrawn is what a chart's image was drawn from: the description,
// the size in pixels, the resolution and the colours.
type chartDrawn struct {
	gen    uint64
	w, h   int
	dpi    float64
	fg, bg color.Color
}

// chartImage is an image drawn of a chart and what it shows.
type chartImage struct {
	d   chartDrawn
	img image.Image
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
	if r.c.held {
		return false
	}
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
	for i, k := range r.shown {
		if k.d == d {
			if i == 0 {
				return false
			}
			copy(r.shown[1:i+1], r.shown[:i])
			r.shown[0] = k
			r.img.Image = k.img
			return true
		}
	}
	r.img.Image = chartmodel.Image(r.c.spec, w, h, d.dpi, o)
	r.shown = append([]chartImage{{d, r.img.Image}}, r.shown[:min(len(r.shown), chartImagesKept-1)]...)
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
