package tolerance

import (
	"math"
	"math/rand/v2"
	"slices"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

func TestPercentiles(t *testing.T) {
	tests := []struct {
		name string
		x    []float64
		n    int
		want Percentiles
	}{
		// Hyndman and Fan (1996) definition 7 by hand for 1 … 10:
		// h = 9p, so P1 = 1 + 0.09, P5 = 1 + 0.45, P50 = 5 + 0.5,
		// P95 = 9 + 0.55, P99 = 9 + 0.91.
		{"one to ten", []float64{7, 3, 10, 1, 9, 2, 8, 4, 6, 5}, 10, Percentiles{1.09, 1.45, 5.5, 9.55, 9.91}},
		{"single value", []float64{42}, 1, Percentiles{42, 42, 42, 42, 42}},
		{"all equal", []float64{3, 3, 3, 3, 3, 3}, 6, Percentiles{3, 3, 3, 3, 3}},
		// Values past n are larger than the rest and ignored.
		{"tail ignored", []float64{math.Inf(1), 2, 1, math.Inf(1)}, 2, Percentiles{1.01, 1.05, 1.5, 1.95, 1.99}},
		{"empty", nil, 0, Percentiles{}},
	}
	for _, tc := range tests {
		got := percentiles(append([]float64(nil), tc.x...), tc.n)
		g := []float64{got.P1, got.P5, got.P50, got.P95, got.P99}
		w := []float64{tc.want.P1, tc.want.P5, tc.want.P50, tc.want.P95, tc.want.P99}
		for i := range g {
			if !scalar.EqualWithinAbsOrRel(g[i], w[i], 1e-12, 1e-12) {
				t.Errorf("%s: percentiles(%v) = %+v, want %+v", tc.name, tc.x, got, tc.want)
				break
			}
		}
	}
}

// The selection agrees with a full sort on random data with many ties.
func TestSelectRanksAgreesWithSort(t *testing.T) {
	rng := rand.New(rand.NewPCG(1, 2))
	for _, n := range []int{2, 3, 17, 1000, 50_001} {
		x := make([]float64, n)
		for i := range x {
			x[i] = float64(rng.IntN(n/3 + 1))
		}
		sorted := append([]float64(nil), x...)
		slices.Sort(sorted)
		ranks := []int{0, n / 4, n / 2, n - 1}
		slices.Sort(ranks)
		ranks = slices.Compact(ranks)
		selectRanks(x, ranks)
		for _, k := range ranks {
			if x[k] != sorted[k] {
				t.Errorf("n = %d: rank %d = %g, sorted gives %g", n, k, x[k], sorted[k])
			}
		}
	}
}
