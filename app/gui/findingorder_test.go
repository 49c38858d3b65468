package gui

import (
	"fmt"
	"image/png"
	"os"
	"path/filepath"
	"testing"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/theme"

	"ullage/app/look"
	"ullage/hazards"
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
// tall enough for every row, with and without the input-error banner;
// the charts give way. Screenshots of the review screen are written
// when ULLAGE_SHOTS names a folder.
func TestEveryFindingVisibleAt1280x800(t *testing.T) {
	h := newHarness(t)
	if os.Getenv("ULLAGE_SHOTS") != "" {
		// Screenshots in the program's own look.
		set := testApp().Settings()
		was := set.Theme()
		set.SetTheme(look.New(look.Light))
		defer set.SetTheme(was)
	}
	for _, size := range []fyne.Size{{Width: 1280, Height: 800}, {Width: 1920, Height: 1080}} {
		h.w.Resize(size)
		h.idle()
		h.checkAllRowsVisible(t, size, "")
	}
	h.w.Resize(fyne.NewSize(1280, 800))
	h.typeInto("hottest_k", "7O")
	h.checkAllRowsVisible(t, fyne.NewSize(1280, 800), "-input-error")
	if os.Getenv("ULLAGE_SHOTS") != "" {
		// The new design, like every state with an input that is not
		// acceptable, is not captured (see checkAllRowsVisible).
		h.typeInto("hottest_k", "76")
		h.s.shell.showCompare()
		h.idle()
		h.shot(t, "compare-1280x800")
	}
}

// checkAllRowsVisible asserts that the findings list has room for all
// its rows, and saves a screenshot when asked.
func (h *harness) checkAllRowsVisible(t *testing.T, size fyne.Size, tag string) {
	t.Helper()
	fl := h.s.results.list
	n := len(fl.rows)
	if n < 8 {
		t.Fatalf("%d findings; the example has at least 8", n)
	}
	row := fl.rowHeight()
	need := float32(n)*row + float32(n-1)*look.Dense{}.Size(theme.SizeNamePadding)
	if got := fl.list.Size().Height; got+0.5 < need {
		t.Errorf("at %.0f×%.0f%s the findings list is %.0f high, %d rows need %.0f", size.Width, size.Height, tag, got, n, need)
	}
	// The test driver's software painter fails on the out-of-date
	// state (a nil image in its drawImage), so that state is not
	// captured.
	if tag == "" {
		h.shot(t, "review-"+sizeName(size))
	}
}

// shot saves a capture of the window as NAME.png in the folder
// ULLAGE_SHOTS names; nothing when it is not set.
func (h *harness) shot(t *testing.T, name string) {
	t.Helper()
	if dir := os.Getenv("ULLAGE_SHOTS"); dir != "" {
		img := h.w.Canvas().Capture()
		f, err := os.Create(filepath.Join(dir, name+".png"))
		if err != nil {
			t.Fatal(err)
		}
		defer f.Close()
		if err := png.Encode(f, img); err != nil {
			t.Fatal(err)
		}
	}
}

func sizeName(s fyne.Size) string {
	return fmtSize(s)
}

func fmtSize(s fyne.Size) string {
	return fmt.Sprintf("%.0fx%.0f", s.Width, s.Height)
}
