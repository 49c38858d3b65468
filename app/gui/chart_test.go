package gui

import (
	"flag"
	"image/png"
	"os"
	"path/filepath"
	"reflect"
	"testing"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/test"

	"ullage/report/chartmodel"
)

var chartPNGs = flag.String("chart-png", "", "write the window's charts as PNGs into this folder, to look at")

// The window's charts are drawn by the chart model into an image of the
// widget's size: each chart of the example comes out the size it is shown
// at and not blank.
func TestChartCaptures(t *testing.T) {
	h := newHarness(t)
	h.runStudyWith("2000", "7", "5")
	h.s.results.drawFill() // drawn when its tab comes to the front
	tp := h.s.tol
	charts := map[string]*chart{
		"pressure": h.s.results.pt, "release": h.s.results.conc, "fillmap": h.s.results.fill,
		"histogram": tp.hist, "drivers": tp.drivers,
	}
	for name, c := range charts {
		if c.spec.Empty != "" {
			t.Errorf("%s chart is empty: %s", name, c.spec.Empty)
		}
		c.Show() // a chart on a tab not in front is hidden
		w := test.NewTempWindow(t, c)
		w.Resize(fyne.NewSize(820, 420))
		img := w.Canvas().Capture()
		b := img.Bounds()
		if b.Dx() < 800 || b.Dy() < 400 {
			t.Errorf("%s capture %v", name, b)
		}
		first, varied := img.At(b.Min.X+b.Dx()/2, b.Min.Y+b.Dy()/2), false
		for x := b.Min.X; x < b.Max.X && !varied; x += 7 {
			for y := b.Min.Y; y < b.Max.Y && !varied; y += 7 {
				varied = img.At(x, y) != first
			}
		}
		if !varied {
			t.Errorf("%s chart captured blank", name)
		}
		if *chartPNGs != "" {
			f, err := os.Create(filepath.Join(*chartPNGs, name+".png"))
			if err != nil {
				t.Fatal(err)
			}
			if err := png.Encode(f, img); err != nil {
				t.Fatal(err)
			}
			f.Close()
		}
	}
}

// A chart draws its image again when its description, its fading or its
// size changes, and keeps the image when it is set to the same
// description again or refreshed.
func TestChartDrawsAgainOnlyWhenSomethingChanged(t *testing.T) {
	line := func(y float64) chartmodel.Chart {
		return chartmodel.Chart{Series: []chartmodel.Series{{Name: "p", X: []float64{0, 1}, Y: []float64{0, y}}}}
	}
	c := newChart()
	w := test.NewTempWindow(t, c)
	w.Resize(fyne.NewSize(400, 240))
	c.set(line(1), false)
	r := test.WidgetRenderer(c).(*chartRenderer)
	steps := []struct {
		what   string
		do     func()
		redraw bool
	}{
		{"the same description again", func() { c.set(line(1), false) }, false},
		{"a refresh", func() { c.Refresh() }, false},
		{"another description", func() { c.set(line(2), false) }, true},
		{"the same description faded", func() { c.set(line(2), true) }, true},
		{"another size", func() { w.Resize(fyne.NewSize(420, 240)) }, true},
		{"the same size again", func() { w.Resize(fyne.NewSize(420, 240)) }, false},
	}
	for _, s := range steps {
		before := r.img.Image
		s.do()
		if got := r.img.Image != before; got != s.redraw {
			t.Errorf("after %s: drawn again %v, want %v", s.what, got, s.redraw)
		}
	}

	// Back to the description shown before: its image comes back, and
	// shows what a chart drawn afresh shows.
	c.set(line(3), false)
	three := r.img.Image
	c.set(chartmodel.Chart{Empty: "No results yet."}, false)
	if r.img.Image == three {
		t.Fatal("an empty chart kept the image of the one before")
	}
	c.set(line(3), false)
	if r.img.Image != three {
		t.Error("the description shown before was drawn again")
	}
	fresh := newChart()
	fw := test.NewTempWindow(t, fresh)
	fw.Resize(fyne.NewSize(420, 240))
	fresh.set(line(3), false)
	if !reflect.DeepEqual(test.WidgetRenderer(fresh).(*chartRenderer).img.Image, three) {
		t.Error("the image shown again differs from the chart drawn afresh")
	}
	c.set(line(4), false)
	if r.img.Image == three {
		t.Error("a new description kept the image of the one before")
	}

	// A held chart laid out at another size waits for its next
	// description, and draws it even when it is the same as before.
	four := r.img.Image
	c.held = true
	w.Resize(fyne.NewSize(440, 240))
	if r.img.Image != four {
		t.Error("a held chart drew when laid out")
	}
	c.set(line(4), false)
	if r.img.Image == four || c.held {
		t.Errorf("setting a held chart: drawn again %v, still held %v", r.img.Image != four, c.held)
	}
}
