package gui

import (
	"testing"

	"fyne.io/fyne/v2/test"

	"ullage/report/chartmodel"
)

// BenchmarkEditToFindings times the whole path from a changed field to
// updated findings and charts, without the typing pause: the entry's
// change, parsing and unit conversion, the assessment off the UI
// goroutine, sampling both charts, and applying the results to the
// verdict, the findings list, the key numbers and the redrawn charts.
func BenchmarkEditToFindings(b *testing.B) {
	h := newHarnessIn(b, b.TempDir())
	f := h.field("fill_mass_kg")
	values := []string{"20", "21"}
	// Render once so every widget has its renderer, as on screen.
	test.NewTempWindow(b, h.s.results.object).Canvas().Refresh(h.s.results.object)
	b.ReportAllocs()
	b.ResetTimer()
	for i := 0; i < b.N; i++ {
		f.entry.SetText(values[i%2])
		h.idle()
	}
	b.StopTimer()
	if h.s.stale() || h.s.last.assessment == nil {
		b.Fatal("no current results")
	}
}

// BenchmarkEvaluate times the background part alone: the assessment and
// the sampling of both charts.
func BenchmarkEvaluate(b *testing.B) {
	h := newHarnessIn(b, b.TempDir())
	d, lib := h.s.doc.Work, h.s.lib
	b.ReportAllocs()
	b.ResetTimer()
	for i := 0; i < b.N; i++ {
		if o := evaluate(d, lib); o.err != nil {
			b.Fatal(o.err)
		}
	}
}

// BenchmarkChartRedraw times drawing the pressure chart's image for new
// results.
func BenchmarkChartRedraw(b *testing.B) {
	h := newHarnessIn(b, b.TempDir())
	c := newChart()
	w := test.NewTempWindow(b, c)
	w.Resize(w.Canvas().Size().AddWidthHeight(600, 300))
	spec := chartmodel.Pressure("", []chartmodel.Side{{A: h.s.last.assessment}}, unitsSI.chartUnits())
	b.ReportAllocs()
	b.ResetTimer()
	for i := 0; i < b.N; i++ {
		c.set(spec, i%2 == 0)
	}
}
