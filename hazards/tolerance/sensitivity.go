package tolerance

import (
	"math"
	"slices"
	"sort"
)

// Driver is one varying input and how strongly it moves the burst safety
// factor.
type Driver struct {
	// Key and Label name the input as in Input.
	Key   string `json:"key"`
	Label string `json:"label"`
	// RankCorrelation is Spearman's rank correlation coefficient between
	// the input's sampled values and the units' burst safety factors, from
	// −1 to 1: negative when a larger value lowers the safety margin.
	RankCorrelation float64 `json:"rank_correlation"`
}

// sensitivity ranks the inputs by the absolute value of Spearman's rank
// correlation coefficient (C. Spearman, "The proof and measurement of
// association between two things", Am. J. Psychol. 15(1), 72–101 (1904))
// between each input's column of values and the output y: the Pearson
// correlation of the ranks, with tied values given their mean rank. Rank
// correlation is the usual screening measure for a sampled study whose
// output is monotonic but not linear in its inputs (J. C. Helton and F. J.
// Davis, Reliab. Eng. Syst. Saf. 81, 23–69 (2003), from memory). The
// coefficient is zero when the input's sampled values, or the output, did
// not vary. Ties in the ranking keep the order of inputs; the ranks are
// computed on up to workers goroutines.
func sensitivity(inputs []Input, columns [][]float64, y []float64, workers int) []Driver {
	rx := make([][]float64, len(columns))
	var ry []float64
	jobs := []func(){func() { ry = ranks(y) }}
	for i := range columns {
		jobs = append(jobs, func() { rx[i] = ranks(columns[i]) })
	}
	parallel(workers, jobs...)
	out := make([]Driver, len(inputs))
	for i, in := range inputs {
		out[i] = Driver{Key: in.Key, Label: in.Label, RankCorrelation: pearson(rx[i], ry)}
	}
	sort.SliceStable(out, func(i, j int) bool {
		return math.Abs(out[i].RankCorrelation) > math.Abs(out[j].RankCorrelation)
	})
	return out
}

// ranks returns the ranks (1 … n) of x with ties given their mean rank.
func ranks(x []float64) []float64 {
	n := len(x)
	idx := make([]int, n)
	for i := range idx {
		idx[i] = i
	}
	// The order among equal values does not matter: they share a rank.
	slices.SortFunc(idx, func(a, b int) int {
		switch {
		case x[a] < x[b]:
			return -1
		case x[a] > x[b]:
			return 1
		}
		return 0
	})
	r := make([]float64, n)
	for i := 0; i < n; {
		j := i + 1
		for j < n && x[idx[j]] == x[idx[i]] {
			j++
		}
		mean := float64(i+j+1) / 2 // mean of ranks i+1 … j
		for k := i; k < j; k++ {
			r[idx[k]] = mean
		}
		i = j
	}
	return r
}

// pearson returns the Pearson correlation of a and b, or 0 when either
// does not vary.
func pearson(a, b []float64) float64 {
	n := float64(len(a))
	if len(a) < 2 {
		return 0
	}
	ma, mb := 0.0, 0.0
	for i := range a {
		ma += a[i]
		mb += b[i]
	}
	ma /= n
	mb /= n
	var sab, saa, sbb float64
	for i := range a {
		da, db := a[i]-ma, b[i]-mb
		sab += da * db
		saa += da * da
		sbb += db * db
	}
	if saa <= 0 || sbb <= 0 {
		return 0
	}
	return math.Max(-1, math.Min(1, sab/math.Sqrt(saa*sbb)))
}
