package parse

import "testing"

// The cases are the ways people type numbers into the form; the expected
// values are written by hand.
func TestNumber(t *testing.T) {
	tests := []struct {
		in   string
		want float64
		ok   bool
	}{
		{"21", 21, true}, {" 21.5 ", 21.5, true}, {"21,5", 21.5, true}, {"1e-4", 1e-4, true}, {"-3", -3, true},
		{"", 0, false}, {"7O", 0, false}, {"1,000.5", 0, false}, {"1,2,3", 0, false}, {"NaN", 0, false}, {"Inf", 0, false}, {"1e400", 0, false},
	}
	for _, tc := range tests {
		got, ok := Number(tc.in)
		if ok != tc.ok || got != tc.want {
			t.Errorf("Number(%q) = %g, %v; want %g, %v", tc.in, got, ok, tc.want, tc.ok)
		}
	}
}

func TestCount(t *testing.T) {
	tests := []struct {
		in   string
		want uint64
		ok   bool
	}{
		{"100000", 100000, true}, {"100 000", 100000, true}, {"100_000", 100000, true}, {" 7 ", 7, true}, {"100\u202f000", 100000, true},
		{"", 0, false}, {"1e5", 0, false}, {"-3", 0, false}, {"1,5", 0, false}, {"2.5", 0, false}, {"99999999999999999999", 0, false},
	}
	for _, tc := range tests {
		got, ok := Count(tc.in)
		if ok != tc.ok || got != tc.want {
			t.Errorf("Count(%q) = %d, %v; want %d, %v", tc.in, got, ok, tc.want, tc.ok)
		}
	}
}
