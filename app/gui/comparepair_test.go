package gui

import (
	"strings"
	"testing"
)

// TestCompareRefusesABadPair: a revision against itself, or a "later"
// side older than the "earlier" one, is refused with a message and
// nothing can be exported; a good pair compares again.
func TestCompareRefusesABadPair(t *testing.T) {
	h := newHarness(t)
	c := h.s.cmp
	for _, tc := range []struct{ a, b, want string }{
		{"A", "A", "two different revisions"},
		{"B", "A", "older than"},
	} {
		c.pickTwo(tc.a, tc.b)
		h.idle()
		text := strings.Join(labels(c.statusBox), " ")
		if !strings.Contains(text, tc.want) {
			t.Errorf("comparing %s with %s: %q, want a refusal mentioning %q", tc.a, tc.b, text, tc.want)
		}
		if _, ok := c.current(); ok {
			t.Errorf("comparing %s with %s can still be exported", tc.a, tc.b)
		}
	}
	c.pickTwo("A", "B")
	h.idle()
	if _, ok := c.current(); !ok {
		t.Error("A against B is not compared after a refused pair")
	}
}

// TestRecordNameOfAChangedWorkingCopy: the suggested PDF name names the
// revision only while the working copy is that revision unchanged.
func TestRecordNameOfAChangedWorkingCopy(t *testing.T) {
	h := newHarness(t)
	if got := h.s.assessmentPDFName(); !strings.Contains(got, "-rev-b-") {
		t.Errorf("unchanged revision B: suggested %q", got)
	}
	h.typeInto("fill_mass_kg", "19.5")
	if got := h.s.assessmentPDFName(); strings.Contains(got, "rev-b") || !strings.Contains(got, "working-copy") {
		t.Errorf("changed working copy: suggested %q, want a working-copy name without rev-b", got)
	}
}
