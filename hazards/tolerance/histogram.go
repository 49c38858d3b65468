package tolerance

import (
	"math"

	"ullage/hazards"
)

// HistogramBins is the number of bins in Result.Histogram.
const HistogramBins = 40

// Histogram counts sampled values in equal bins from Edges[0] to
// Edges[len(Edges)−1], for a chart. Bin i holds Edges[i] ≤ x < Edges[i+1]
// (the last bin also holds its upper edge); Below and Above count the
// values outside. NoLoad counts the units left out because they carry no
// burst load (their safety factor sits at hazards.SafetyFactorCap), so
// that they do not squash the bins of the units that do.
type Histogram struct {
	Edges  []float64 `json:"edges"`
	Counts []int     `json:"counts"`
	Below  int       `json:"below"`
	Above  int       `json:"above"`
	NoLoad int       `json:"no_load"`
}

// loadedHistogram bins the safety factors of the units under burst load
// over the range those units span: from their 1st to their 99th
// percentile, starting at 0 when the lowest units come near a factor of
// 1 (so that the bursting side is in view), and reaching at least 1.
// Below and Above count the few units outside, so that no range of
// factors hides the bulk of the units.
func loadedHistogram(factors []float64) Histogram {
	loaded := make([]float64, 0, len(factors))
	for _, v := range factors {
		if v < hazards.SafetyFactorCap {
			loaded = append(loaded, v)
		}
	}
	lo, hi := 0.0, 1.0
	if len(loaded) > 0 {
		ps := percentiles(append([]float64(nil), loaded...), len(loaded))
		hi = math.Max(ps.P99, 1)
		if ps.P1 > 2 {
			lo = math.Floor(0.9 * ps.P1)
		}
		if !(hi > lo) {
			hi = lo + 1
		}
	}
	h := newHistogram(loaded, lo, hi)
	h.NoLoad = len(factors) - len(loaded)
	return h
}

// newHistogram counts x in HistogramBins equal bins from lo to hi (hi > lo).
func newHistogram(x []float64, lo, hi float64) Histogram {
	h := Histogram{Edges: make([]float64, HistogramBins+1), Counts: make([]int, HistogramBins)}
	w := (hi - lo) / HistogramBins
	for i := range h.Edges {
		h.Edges[i] = lo + float64(i)*w
	}
	h.Edges[HistogramBins] = hi
	for _, v := range x {
		switch {
		case v < lo:
			h.Below++
		case v > hi:
			h.Above++
		default:
			b := min(int((v-lo)/w), HistogramBins-1)
			h.Counts[b]++
		}
	}
	return h
}
