package gui

import (
	"strings"
	"testing"

	"ullage/hazards"
)

// fillRequired types the bundled example's values into the required
// fields of a new design that are still empty.
func (h *harness) fillRequired() {
	h.t.Helper()
	ex, err := exampleDocument()
	if err != nil {
		h.t.Fatal(err)
	}
	for _, nf := range h.s.form.all() {
		if nf.entry.Text == "" && requiredOnNew(nf.path) {
			h.typeInto(nf.path, entryText(h.s.units().fromSI(nf.q, nf.get(&ex.Work))))
		}
	}
}

// TestNewDesignStartsBlank: File ▸ New design (Ctrl+N) starts with no
// product name, the fill, temperatures and vessel dimensions empty and
// marked, and no verdict; typing them in gives the first verdict.
func TestNewDesignStartsBlank(t *testing.T) {
	h := newHarness(t)
	h.press(shortcutNew)
	if got := h.s.form.product.name.Text; got != "" {
		t.Errorf("the product name of a new design is %q, want empty", got)
	}
	var blank []string
	for _, nf := range h.s.form.all() {
		if requiredOnNew(nf.path) {
			if nf.entry.Text != "" {
				t.Errorf("%s of a new design holds %q, want empty", nf.label, nf.entry.Text)
			}
			if !nf.msgRow.Visible() || !strings.Contains(nf.msg.Text, "needed") {
				t.Errorf("%s of a new design is not marked as needed (%q)", nf.label, nf.msg.Text)
			}
			blank = append(blank, nf.path)
		}
	}
	if len(blank) < 4 {
		t.Fatalf("only %d required fields on a new design: %v", len(blank), blank)
	}
	v := h.s.results.verdict
	if h.s.last.assessment != nil || v.word.Text == statusWord(hazards.StatusPass) {
		t.Fatalf("a new design shows a verdict (%q) before anything is typed", v.word.Text)
	}
	if len(h.s.results.list.rows) != 0 {
		t.Errorf("a new design lists %d findings before anything is typed", len(h.s.results.list.rows))
	}
	// Switching units keeps the fields empty.
	h.s.setUnits(unitsUS)
	h.idle()
	if got := h.field("fill_mass_kg").entry.Text; got != "" {
		t.Errorf("after switching units the fill of a new design holds %q", got)
	}
	h.s.setUnits(unitsSI)
	h.idle()
	h.fillRequired()
	if h.s.last.assessment == nil || h.s.stale() {
		t.Fatalf("no verdict after the required fields were typed: %+v", h.s.problem)
	}
}
