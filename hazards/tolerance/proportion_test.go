package tolerance

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

func TestWilson(t *testing.T) {
	tests := []struct {
		count, total int
		low, high    float64
		tol          float64
		source       string
	}{
		// Worked by hand from Wilson's formula with z² = 3.841459:
		// 8/10: centre = (0.8 + 0.192073)/1.384146 = 0.716738,
		// half = 1.959964/1.384146 · √(0.016 + 0.009604) = 0.226577.
		{8, 10, 0.490161, 0.943315, 1e-5, "hand computation"},
		// No failures: the interval is [0, z²/(n + z²)] = [0, 3.841459/13.841459].
		{0, 10, 0, 0.277533, 1e-6, "hand computation"},
		// All failures: [n/(n + z²), 1].
		{10, 10, 0.722467, 1, 1e-6, "hand computation"},
		// R. G. Newcombe, "Two-sided confidence intervals for the single
		// proportion: comparison of seven methods", Stat. Med. 17, 857–872
		// (1998), Table II, score method without continuity correction
		// (values printed to four decimals, from memory).
		{81, 263, 0.2553, 0.3662, 5e-5, "Newcombe 1998"},
		{15, 148, 0.0624, 0.1605, 5e-5, "Newcombe 1998"},
		{0, 20, 0, 0.1611, 5e-5, "Newcombe 1998"},
		{1, 29, 0.0061, 0.1718, 5e-5, "Newcombe 1998"},
	}
	for _, tc := range tests {
		got := Wilson(tc.count, tc.total)
		if !scalar.EqualWithinAbs(got.Low, tc.low, tc.tol) || !scalar.EqualWithinAbs(got.High, tc.high, tc.tol) {
			t.Errorf("Wilson(%d, %d) = [%.6f, %.6f], want [%.6f, %.6f] ± %g (%s)",
				tc.count, tc.total, got.Low, got.High, tc.low, tc.high, tc.tol, tc.source)
		}
		if want := float64(tc.count) / float64(tc.total); got.Estimate != want {
			t.Errorf("Wilson(%d, %d).Estimate = %g, want %g", tc.count, tc.total, got.Estimate, want)
		}
	}
}

// Properties: the interval holds the estimate, lies in [0, 1] and
// narrows as the sample grows.
func TestWilsonProperties(t *testing.T) {
	prev := 1.0
	for _, n := range []int{1, 10, 100, 1000, 1_000_000} {
		for _, c := range []int{0, n / 3, n / 2, n} {
			p := Wilson(c, n)
			if !(0 <= p.Low && p.Low <= p.Estimate && p.Estimate <= p.High && p.High <= 1) {
				t.Errorf("Wilson(%d, %d) = %+v: want 0 ≤ Low ≤ Estimate ≤ High ≤ 1", c, n, p)
			}
		}
		w := Wilson(n/2, n)
		if width := w.High - w.Low; width >= prev {
			t.Errorf("Wilson(%d, %d) width %g not below %g for the smaller sample", n/2, n, width, prev)
		} else {
			prev = width
		}
	}
}

// Bad counts give an empty interval, never NaN.
func TestWilsonBadInput(t *testing.T) {
	for _, tc := range []struct{ count, total int }{{0, 0}, {1, 0}, {-1, 10}, {11, 10}, {0, -5}} {
		p := Wilson(tc.count, tc.total)
		for _, x := range []float64{p.Estimate, p.Low, p.High} {
			if math.IsNaN(x) || math.IsInf(x, 0) {
				t.Errorf("Wilson(%d, %d) = %+v: not finite", tc.count, tc.total, p)
			}
		}
		if p.Low != 0 || p.High != 1 {
			t.Errorf("Wilson(%d, %d) = %+v: want the uninformative [0, 1]", tc.count, tc.total, p)
		}
	}
}
