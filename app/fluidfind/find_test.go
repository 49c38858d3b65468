package fluidfind

import (
	"slices"
	"testing"

	"ullage/fluids"
)

// TestSortsByName: names sort by the name itself, ignoring case, locants
// and prefixes such as "n-".
func TestSortsByName(t *testing.T) {
	opts := []string{"Water", "n-Butane", "Ethanol", "1,2-Dichloroethane", "acetone", "n-Hexane (your data)"}
	Sort(opts)
	want := []string{"acetone", "n-Butane", "1,2-Dichloroethane", "Ethanol", "n-Hexane (your data)", "Water"}
	if !slices.Equal(opts, want) {
		t.Errorf("sorted %v, want %v", opts, want)
	}
}

// TestFindByTyping: a fluid of the built-in library is found by a
// synonym, in any case and hyphenation, and by the start of a name; the
// names and synonyms are the library's own (fluids/data).
func TestFindByTyping(t *testing.T) {
	lib, err := fluids.Builtin()
	if err != nil {
		t.Fatal(err)
	}
	for _, tc := range []struct{ typed, wantName string }{
		{"R-134a", "1,1,1,2-Tetrafluoroethane"},
		{"r134a", "1,1,1,2-Tetrafluoroethane"},
		{"methylene chloride", "Dichloromethane"},
		{"dichlorom", "Dichloromethane"},
		{"eth", "Ethanol"},
		{"but", "n-Butane"},
	} {
		sub := Find(lib, tc.typed)
		if sub == nil {
			t.Errorf("%q finds no fluid", tc.typed)
			continue
		}
		if got := sub.Fluid().Name; got != tc.wantName {
			t.Errorf("%q finds %s, want %s", tc.typed, got, tc.wantName)
		}
	}
	for _, typed := range []string{"unobtainium", "", "   "} {
		if Find(lib, typed) != nil {
			t.Errorf("%q found a fluid", typed)
		}
	}
}
