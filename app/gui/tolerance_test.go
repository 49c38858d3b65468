package gui

import (
	"bytes"
	"context"
	"errors"
	"reflect"
	"strings"
	"testing"

	"ullage/report/display"
)

// runStudyWith types the study's settings, taps Run and waits for it.
func (h *harness) runStudyWith(units, seed, spread string) {
	h.t.Helper()
	tp := h.s.tol
	tp.units.SetText(units)
	tp.seed.SetText(seed)
	tp.spread.SetText(spread)
	button(h.t, tp.object, "Run the study").OnTapped()
	h.idle()
}

func TestSmallStudyFillsThePanel(t *testing.T) {
	h := newHarness(t)
	tp := h.s.tol
	if !tp.empty.Visible() || tp.results.Visible() {
		t.Fatal("results shown before any study")
	}
	h.runStudyWith("2000", "7", "5")
	r := tp.last().result
	if r == nil {
		t.Fatalf("no result; status %q, error %v", tp.status.Text, tp.st.err)
	}
	if r.Samples != 2000 || r.Seed != 7 || r.HottestSpreadK != 5 {
		t.Errorf("study ran with %d units, seed %d, spread %g K", r.Samples, r.Seed, r.HottestSpreadK)
	}
	if tp.empty.Visible() || !tp.results.Visible() || tp.staleBox.Visible() {
		t.Error("the results are not shown as current")
	}
	text := shownText(tp.results)
	for _, want := range []string{
		display.Proportion(r.LiquidFullFraction), display.Proportion(r.BurstFraction),
		"Release above a governing exposure limit", "P50", "Unit safety factor", "Hottest temperature",
	} {
		if !strings.Contains(text, want) {
			t.Errorf("the panel lacks %q", want)
		}
	}
	n := r.Histogram.Below + r.Histogram.Above + r.Histogram.NoLoad
	for _, c := range tp.hist.spec.Bars.Counts {
		n += c
	}
	if n != 2000 {
		t.Errorf("the histogram accounts for %d units, want 2000", n)
	}
	if !strings.Contains(tp.histNote.Text, "of 2000 units are drawn") {
		t.Errorf("the histogram does not say how many units it shows: %q", tp.histNote.Text)
	}
	if len(tp.drivers.spec.Ranked) != len(r.Sensitivity) || len(r.Sensitivity) == 0 {
		t.Errorf("%d drivers drawn of %d", len(tp.drivers.spec.Ranked), len(r.Sensitivity))
	}
	if !strings.HasPrefix(tp.status.Text, "Finished") || tp.busy.Visible() || tp.runBtn.Disabled() || !tp.cancelBtn.Disabled() {
		t.Errorf("the panel still looks busy: %q", tp.status.Text)
	}

	// The same seed gives the same numbers; another seed other numbers.
	first := *r
	h.runStudyWith("2000", "7", "5")
	if !reflect.DeepEqual(first, *tp.last().result) || shownText(tp.results) != text {
		t.Error("the same seed gave different numbers")
	}
	h.runStudyWith("2000", "8", "5")
	if reflect.DeepEqual(first.PressurePa, tp.last().result.PressurePa) {
		t.Error("another seed gave the same pressures")
	}
}

func TestStudyRefusesBadSettings(t *testing.T) {
	tests := []struct {
		units, seed, spread string
		want                string
	}{
		{"lots", "1", "0", "units to draw \"lots\""},
		{"0", "1", "0", "from 1 to"},
		{"20000000", "1", "0", "from 1 to"},
		{"100", "-3", "0", "seed \"-3\""},
		{"100", "1", "200", "0 to 100 K"},
		{"100", "1", "x", "hottest temperature spread \"x\""},
	}
	// Refused settings change nothing but the message, so one window
	// serves every row; the message is cleared before each.
	h := newHarness(t)
	tp := h.s.tol
	for _, tc := range tests {
		tp.problem.SetText("")
		tp.problem.Hide()
		h.runStudyWith(tc.units, tc.seed, tc.spread)
		if tp.last().result != nil || !tp.problem.Visible() || !strings.Contains(tp.problem.Text, tc.want) {
			t.Errorf("%q, %q, %q: message %q (shown %v), want it to mention %q", tc.units, tc.seed, tc.spread, tp.problem.Text, tp.problem.Visible(), tc.want)
		}
	}
}

func TestStudyCanBeCancelled(t *testing.T) {
	h := newHarness(t)
	tp := h.s.tol
	tp.units.SetText("3000000")
	tp.run()
	if !tp.busy.Visible() || !tp.runBtn.Disabled() || tp.cancelBtn.Disabled() {
		t.Error("a running study shows no busy state")
	}
	tp.cancelBtn.OnTapped()
	h.idle()
	if !errors.Is(tp.st.err, context.Canceled) || tp.last().result != nil || !strings.HasPrefix(tp.status.Text, "Cancelled") {
		t.Errorf("after cancelling: error %v, status %q", tp.st.err, tp.status.Text)
	}
	if tp.busy.Visible() || tp.runBtn.Disabled() {
		t.Error("the panel still looks busy after cancelling")
	}
}

func TestStudyGoesOutOfDateWhenTheDesignChanges(t *testing.T) {
	h := newHarness(t)
	h.runStudyWith("2000", "1", "0")
	if h.s.currentStudy() == nil {
		t.Fatal("a fresh study is not current")
	}
	h.typeInto("fill_mass_kg", "15")
	tp := h.s.tol
	if h.s.currentStudy() != nil || !tp.staleBox.Visible() || !tp.hist.faded {
		t.Error("the study is not marked out of date after the fill changed")
	}
	if !strings.Contains(tp.about.Text, "out of date") {
		t.Errorf("the panel does not say the study is left out of the record: %q", tp.about.Text)
	}
}

func TestExportCarriesTheStudy(t *testing.T) {
	h := newHarness(t)
	export := func() string {
		var buf bytes.Buffer
		if err := h.s.writeAssessmentPDF(&buf); err != nil {
			t.Fatal(err)
		}
		return pdfText(t, buf.Bytes())
	}
	if strings.Contains(export(), "Tolerance study") {
		t.Error("a record with no study run has a tolerance section")
	}
	h.runStudyWith("2000", "1", "0")
	if text := export(); !strings.Contains(text, "Tolerance study") || !strings.Contains(text, "2000 units, seed 1") {
		t.Error("the record lacks the tolerance study")
	}
	h.typeInto("fill_mass_kg", "15")
	if strings.Contains(export(), "Tolerance study") {
		t.Error("an out-of-date study went into the record")
	}
}

func TestStudySpreadFollowsTheUnits(t *testing.T) {
	h := newHarness(t)
	tp := h.s.tol
	tp.spread.SetText("5")
	h.s.setUnits(unitsUS)
	h.idle()
	// A difference of 5 K is 9 °F (1 K = 1.8 °F, NIST SP 811 appendix B).
	if tp.spread.Text != "9" || tp.spreadUnit.Text != "°F" {
		t.Errorf("5 K in US units reads %q %s, want 9 °F", tp.spread.Text, tp.spreadUnit.Text)
	}
	set, err := tp.settings()
	if err != nil || set.HottestSpreadK < 4.999999 || set.HottestSpreadK > 5.000001 {
		t.Errorf("the study would run with a spread of %g K (%v), want 5", set.HottestSpreadK, err)
	}
}

// TestStudyBelongsToTheDocument: a finished study is the document's, so
// the record takes it only from the document it was run on, and what
// the window asks when it closes (publishing causeStop) reaches the
// study screen and cancels its run.
func TestStudyBelongsToTheDocument(t *testing.T) {
	h := newHarness(t)
	tp := h.s.tol
	h.runStudyWith("2000", "1", "0")
	if r := h.s.currentStudy(); r == nil || r != h.s.doc.studied.result {
		t.Fatal("the finished study is not the document's")
	}
	doc, err := exampleDocument()
	if err != nil {
		t.Fatal(err)
	}
	h.s.open(doc)
	h.idle()
	if h.s.currentStudy() != nil || !tp.empty.Visible() || tp.results.Visible() {
		t.Error("a study of the document before shows with the one opened after it")
	}

	tp.units.SetText("3000000")
	tp.run()
	if !tp.st.running {
		t.Fatal("the study did not start")
	}
	h.s.stopStudy()
	h.idle()
	if !errors.Is(tp.st.err, context.Canceled) || tp.st.running || h.s.currentStudy() != nil {
		t.Errorf("after the stop was published: running %v, error %v", tp.st.running, tp.st.err)
	}
}
