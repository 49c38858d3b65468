package tolerance

import (
	"math/rand/v2"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

func TestRanks(t *testing.T) {
	tests := []struct {
		x, want []float64
	}{
		{[]float64{30, 10, 20}, []float64{3, 1, 2}},
		// Ties share their mean rank (Spearman 1904; common practice).
		{[]float64{10, 20, 20, 30}, []float64{1, 2.5, 2.5, 4}},
		{[]float64{5, 5, 5}, []float64{2, 2, 2}},
	}
	for _, tc := range tests {
		got := ranks(tc.x)
		for i := range got {
			if got[i] != tc.want[i] {
				t.Errorf("ranks(%v) = %v, want %v", tc.x, got, tc.want)
				break
			}
		}
	}
}

// Without ties Spearman's coefficient equals 1 − 6Σd²/(n(n² − 1)), where
// d are the rank differences (Spearman 1904; any statistics textbook).
func TestSpearmanMatchesRankDifferenceFormula(t *testing.T) {
	rng := rand.New(rand.NewPCG(3, 4))
	const n = 200
	x, y := make([]float64, n), make([]float64, n)
	for i := range x {
		x[i] = rng.Float64()
		y[i] = x[i]*x[i]*x[i] + 0.3*rng.Float64()
	}
	rx, ry := ranks(x), ranks(y)
	d2 := 0.0
	for i := range rx {
		d := rx[i] - ry[i]
		d2 += d * d
	}
	want := 1 - 6*d2/(n*(n*n-1))
	if got := pearson(rx, ry); !scalar.EqualWithinAbs(got, want, 1e-12) {
		t.Errorf("Spearman = %.15f, rank-difference formula gives %.15f", got, want)
	}
}

func TestSensitivityOrder(t *testing.T) {
	// y rises with a, falls with b (not quite in step) and ignores c, which
	// is constant.
	a := []float64{1, 2, 3, 4, 5, 6}
	b := []float64{6, 4, 5, 3, 2, 1}
	c := []float64{7, 7, 7, 7, 7, 7}
	y := []float64{1, 2, 3, 4, 5, 6}
	ins := []Input{{Key: "c"}, {Key: "b"}, {Key: "a"}}
	for _, workers := range []int{1, 3} {
		got := sensitivity(ins, [][]float64{c, b, a}, y, workers)
		if got[0].Key != "a" || got[1].Key != "b" || got[2].Key != "c" {
			t.Fatalf("workers %d: order %v, want a, b, c", workers, got)
		}
		if got[0].RankCorrelation != 1 || got[1].RankCorrelation >= 0 || got[2].RankCorrelation != 0 {
			t.Errorf("workers %d: coefficients %v: want 1, negative, 0", workers, got)
		}
	}
}
