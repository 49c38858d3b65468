package gui

import (
	"testing"

	"ullage/app/fluidfind"
)

// TestFindFluidByTyping: typing a synonym in the find field chooses that
// fluid for the working copy (the finding itself is tested in
// app/fluidfind).
func TestFindFluidByTyping(t *testing.T) {
	h := newHarness(t)
	h.s.form.fluid.find.SetText("methylene chloride")
	h.idle()
	if sub := fluidfind.Find(h.s.lib, "methylene chloride"); h.s.doc.Work.Fluid != sub.Fluid().ID {
		t.Errorf("typing a synonym left the fluid at %q", h.s.doc.Work.Fluid)
	}
}
