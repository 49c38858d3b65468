package hazards

import (
	"slices"
	"testing"
)

// The fact arena hands out lists that never overlap: extending the last
// one in place, copying any other, and an outside append never writes into
// the next list; a list longer than a chunk gets a chunk of its own.
func TestFactArenaListsStayApart(t *testing.T) {
	var ar factArena
	mk := func(n int, base float64) []Fact {
		fs := make([]Fact, n)
		for i := range fs {
			fs[i] = fact("x", FactNumber, base+float64(i))
		}
		return fs
	}
	values := func(fs []Fact) []float64 {
		var out []float64
		for _, f := range fs {
			out = append(out, f.Value)
		}
		return out
	}
	a := ar.keep(mk(3, 0)...)
	a = ar.extend(a, mk(2, 3)...) // the last list: extended in place
	b := ar.keep(mk(2, 10)...)
	a = ar.extend(a, mk(1, 5)...) // not the last: copied
	b = append(b, mk(1, 12)...)   // an outside append: copied
	c := ar.keep(mk(100, 20)...)  // beyond the chunk
	d := ar.keep(mk(1, 200)...)
	for _, tc := range []struct {
		got, want []float64
	}{
		{values(a), []float64{0, 1, 2, 3, 4, 5}},
		{values(b), []float64{10, 11, 12}},
		{values(c)[:3], []float64{20, 21, 22}},
		{values(d), []float64{200}},
	} {
		if !slices.Equal(tc.got, tc.want) {
			t.Errorf("list %v, want %v", tc.got, tc.want)
		}
	}
	if len(c) != 100 || c[99].Value != 119 {
		t.Errorf("long list %d facts, last %g", len(c), c[len(c)-1].Value)
	}
}
