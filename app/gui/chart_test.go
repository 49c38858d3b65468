package gui

import (
	"flag"
	"image/png"
	"os"
	"path/filepath"
	"testing"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/test"
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
