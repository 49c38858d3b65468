package tolerance

import (
	"math"

	"ullage/hazards"
)

// HistogramBins is the number of bins in Result.Histogram.
const HistogramBins = 40

// Histogram counts sampled values in equal bins from Edges[0] to
// Edges[len(Edges)−1], for a chart: equal in the value, or, when Log is
// set, equal in its logarithm. Bin i holds Edges[i] ≤ x < Edges[i+1]
// (the last bin also holds its upper edge); Below and Above count the
// values outside. NoLoad counts the units left out because they carry no
// burst load (their safety factor sits at hazards.SafetyFactorCap), so
// that they do not squash the bins of the units that do.
type Histogram struct {
	Edges  []float64 `json:"edges"`
	Counts []int     `json:"counts"`
	// Log marks bins of equal width in the logarithm of the value, for
	// factors spread over more than wideSpread.
	Log    bool `json:"log"`
	Below  int  `json:"below"`
	Above  int  `json:"above"`
	NoLoad int  `json:"no_load"`
}

// wideSpread is the ratio of the 99th to the 1st percentile of the
// loaded units' safety factors above which they are binned on a
// logarithmic scale: over a wider spread, equal bins in the factor put
// nearly every unit in the first bin and leave the rest of the chart
// empty (common practice for quantities spanning decades).
const wideSpread = 30

// loadedHistogram bins the safety factors of the units under burst load
// over the range those units span: from their 1st to their 99th
// percentile, starting at 0 when the lowest units come near a factor of
// 1 (so that the bursting side is in view), and reaching at least 1.
// Factors spread wider than wideSpread are binned on a logarithmic scale
// from 0.9 × the 1st percentile (0.5 at most, so that a factor of 1 is in
// view, when the lowest units come near it). Below and Above count the
// few units outside, so that no range of factors hides the bulk of the
// units.
func loadedHistogram(factors []float64) Histogram {
	loaded := make([]float64, 0, len(factors))
	for _, v := range factors {
		if v < hazards.SafetyFactorCap {
			loaded = append(loaded, v)
		}
	}
	lo, hi := 0.0, 1.0
	var ps Percentiles
	if len(loaded) > 0 {
		ps = percentiles(append([]float64(nil), loaded...), len(loaded))
		hi = math.Max(ps.P99, 1)
		if ps.P1 > 2 {
			lo = math.Floor(0.9 * ps.P1)
		}
		if !(hi > lo) {
			hi = lo + 1
		}
	}
	if len(loaded) > 0 && ps.P1 > 0 && hi/ps.P1 > wideSpread {
		lo = 0.9 * ps.P1
		if ps.P1 < 2 {
			lo = math.Min(lo, 0.5)
		}
		h := newLogHistogram(loaded, lo, hi)
		h.NoLoad = len(factors) - len(loaded)
		return h
	}
	h := newHistogram(loaded, lo, hi)
	h.NoLoad = len(factors) - len(loaded)
	return h
}

// newLogHistogram counts x in HistogramBins bins of equal width in ln x
// from lo to hi (0 < lo < hi): the equal bins of the logarithms, their
// edges turned back into values.
func newLogHistogram(x []float64, lo, hi float64) Histogram {
	ln := make([]float64, len(x))
	for i, v := range x {
		ln[i] = math.Log(v) // v ≤ 0 gives −Inf or NaN: counted below, as v < lo
		if !(ln[i] >= math.Inf(-1)) {
			ln[i] = math.Inf(-1)
		}
	}
	h := newHistogram(ln, math.Log(lo), math.Log(hi))
	for i, e := range h.Edges {
		h.Edges[i] = math.Exp(e)
	}
	h.Edges[0], h.Edges[HistogramBins] = lo, hi
	h.Log = true
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
