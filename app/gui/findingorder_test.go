package gui

import (
	"fmt"
	"testing"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/theme"

	"ullage/app/look"
	"ullage/hazards"
	"ullage/report/display"
)

// TestFailsAndCautionsComeFirst: the table lists fails, then cautions,
// then findings without a limit, then passes, keeping the engine's order
// within each.
func TestFailsAndCautionsComeFirst(t *testing.T) {
	in := []hazards.Finding{
		{Criterion: "a", Status: hazards.StatusPass},
		{Criterion: "b", Status: hazards.StatusCaution},
		{Criterion: "c", Status: hazards.StatusNotAssessed},
		{Criterion: "d", Status: hazards.StatusFail},
		{Criterion: "e", Status: hazards.StatusPass},
		{Criterion: "f", Status: hazards.StatusFail},
	}
	var got string
	for _, f := range orderFindings(in) {
		got += f.Criterion
	}
	if got != "dfbcae" {
		t.Errorf("order %q, want dfbcae", got)
	}
	if in[0].Criterion != "a" {
		t.Error("orderFindings changed its argument")
	}

	// In the window: an overfilled design (revision A's 28.3 g in B's
	// bulbs, see TestTypingUpdatesFindings) fails, and its fail is the
	// first row.
	h := newHarness(t)
	h.typeInto("fill_mass_kg", "28.3")
	rows := h.s.results.list.rows
	if len(rows) == 0 || rows[0].Status != hazards.StatusFail {
		t.Fatalf("first row %+v, want a fail", rows[:min(len(rows), 1)])
	}
	for i := 1; i < len(rows); i++ {
		if statusRank(rows[i].Status) < statusRank(rows[i-1].Status) {
			t.Errorf("row %d (%s, %s) comes after a less severe row", i, rows[i].Criterion, rows[i].Status)
		}
	}
}

// TestEveryFindingVisibleAt1280x800: at 1280×800 the findings table is
// tall enough for every row, with and without the input-error banner,
// and no criterion is cut short; the charts give way.
func TestEveryFindingVisibleAt1280x800(t *testing.T) {
	h := newHarness(t)
	for _, size := range []fyne.Size{{Width: 1280, Height: 800}, {Width: 1920, Height: 1080}} {
		h.w.Resize(size)
		h.idle()
		h.layOut()
		h.checkAllRowsVisible(t, size, "")
	}
	h.w.Resize(fyne.NewSize(1280, 800))
	h.typeInto("hottest_k", "7O")
	h.layOut()
	h.checkAllRowsVisible(t, fyne.NewSize(1280, 800), " with the input-error banner")
}

// checkAllRowsVisible asserts that the findings list has room for all
// its rows, each as tall as its criterion needs at the column's width.
func (h *harness) checkAllRowsVisible(t *testing.T, size fyne.Size, tag string) {
	t.Helper()
	fl := h.s.results.list
	n := len(fl.rows)
	if n < 8 {
		t.Fatalf("%d findings; the example has at least 8", n)
	}
	pad := look.Dense{}.Size(theme.SizeNamePadding)
	crit, _ := fl.criterionWidth(fl.list.Size().Width - 2*pad)
	need := float32(n-1) * pad
	for _, f := range fl.rows {
		title := display.Finding(f, fl.system()).Title
		row := max(fl.rowHeight(), denseHeight(title, crit))
		need += row
	}
	if got := fl.list.Size().Height; got+0.5 < need {
		t.Errorf("at %.0f×%.0f%s the findings list is %.0f high, %d rows need %.0f", size.Width, size.Height, tag, got, n, need)
	}
}

func fmtSize(s fyne.Size) string {
	return fmt.Sprintf("%.0fx%.0f", s.Width, s.Height)
}
