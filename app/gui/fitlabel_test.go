package gui

import (
	"strings"
	"testing"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/test"
)

// A label of one line shows its whole text when it fits, and otherwise
// the longest start of it that fits with an ellipsis after it; the
// label's text stays whole.
func TestFitLabelCutsToItsWidth(t *testing.T) {
	testApp()
	const size = 14
	style := fyne.TextStyle{Bold: true}
	text := "Maximum safe temperature of the vessel"
	whole := fyne.MeasureText(text, size, style).Width
	for _, width := range []float32{whole + 5, whole, whole * 0.75, whole / 2, 20, 1, 0} {
		got := fitText(text, width, size, style)
		switch {
		case width <= 0 || width >= whole:
			if got != text {
				t.Errorf("width %.0f: %q, want the whole text", width, got)
			}
			continue
		case !strings.HasSuffix(got, "…"):
			t.Errorf("width %.0f: %q ends without an ellipsis", width, got)
			continue
		}
		start := strings.TrimSuffix(got, "…")
		if !strings.HasPrefix(text, start) {
			t.Errorf("width %.0f: %q is not a start of the text", width, got)
		}
		if start != "" && fyne.MeasureText(got, size, style).Width > width {
			t.Errorf("width %.0f: %q is %.1f wide", width, got, fyne.MeasureText(got, size, style).Width)
		}
		// The next longer cut would not fit.
		runes := []rune(text)
		for n := len([]rune(start)) + 1; n < len(runes); n++ {
			longer := strings.TrimRight(string(runes[:n]), " ") + "…"
			if longer == got {
				continue
			}
			if fyne.MeasureText(longer, size, style).Width <= width {
				t.Errorf("width %.0f: %q, but %q fits too", width, got, longer)
			}
			break
		}
	}

	l := newFitLabel(text, style)
	w := test.NewTempWindow(t, l)
	w.Resize(fyne.NewSize(160, 60))
	shown := test.WidgetRenderer(l).(*fitLabelRenderer).shown
	if l.Text != text || !strings.HasSuffix(shown.Text, "…") || shown.Size().Width+0.5 < shown.MinSize().Width {
		t.Errorf("at 160 wide: text %q, shown %q at %v for %v", l.Text, shown.Text, shown.Size(), shown.MinSize())
	}
	l.SetText("Fluid")
	if shown.Text != "Fluid" {
		t.Errorf("a short text is shown as %q", shown.Text)
	}
}
