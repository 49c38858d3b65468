package gui

import "testing"

// The study's bar is determinate: it starts empty and shows every unit
// done when the study ends.
func TestStudyBarShowsUnitsDone(t *testing.T) {
	h := newHarness(t)
	tp := h.s.tol
	tp.busy.SetValue(0.5) // as a run before might have left it
	h.runStudyWith("3000", "7", "0")
	if tp.last().result == nil {
		t.Fatalf("no result; status %q, error %v", tp.status.Text, tp.st.err)
	}
	if tp.busy.Value != 1 || tp.busy.Max != 1 {
		t.Errorf("the bar ends at %g of %g; want every unit done", tp.busy.Value, tp.busy.Max)
	}
}
