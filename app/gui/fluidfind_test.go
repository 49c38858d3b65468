package gui

import (
	"slices"
	"testing"
)

// TestFluidListSortsByName: the selector sorts by the name itself,
// ignoring case, locants and prefixes such as "n-".
func TestFluidListSortsByName(t *testing.T) {
	opts := []string{"Water", "n-Butane", "Ethanol", "1,2-Dichloroethane", "acetone", "n-Hexane (your data)"}
	sortFluidOptions(opts)
	want := []string{"acetone", "n-Butane", "1,2-Dichloroethane", "Ethanol", "n-Hexane (your data)", "Water"}
	if !slices.Equal(opts, want) {
		t.Errorf("sorted %v, want %v", opts, want)
	}
}

// TestFindFluidByTyping: the find field picks a fluid by a synonym, in
// any case and hyphenation, and by the start of a name.
func TestFindFluidByTyping(t *testing.T) {
	h := newHarness(t)
	lib := h.s.lib
	for _, tc := range []struct{ typed, wantName string }{
		{"R-134a", "1,1,1,2-Tetrafluoroethane"},
		{"r134a", "1,1,1,2-Tetrafluoroethane"},
		{"methylene chloride", "Dichloromethane"},
		{"dichlorom", "Dichloromethane"},
		{"eth", "Ethanol"},
		{"but", "n-Butane"},
	} {
		sub := findFluid(lib, tc.typed)
		if sub == nil {
			t.Errorf("%q finds no fluid", tc.typed)
			continue
		}
		if got := sub.Fluid().Name; got != tc.wantName {
			t.Errorf("%q finds %s, want %s", tc.typed, got, tc.wantName)
		}
	}
	if findFluid(lib, "unobtainium") != nil {
		t.Error("a name the library does not know found a fluid")
	}
	h.s.form.fluid.find.SetText("methylene chloride")
	h.idle()
	if sub := findFluid(lib, "methylene chloride"); h.s.doc.Work.Fluid != sub.Fluid().ID {
		t.Errorf("typing a synonym left the fluid at %q", h.s.doc.Work.Fluid)
	}
}
