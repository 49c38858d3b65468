package tolerance

// HistogramBins is the number of bins in Result.Histogram.
const HistogramBins = 40

// Histogram counts sampled values in equal bins from Edges[0] to
// Edges[len(Edges)−1], for a chart. Bin i holds Edges[i] ≤ x < Edges[i+1]
// (the last bin also holds its upper edge); Below and Above count the
// values outside.
type Histogram struct {
	Edges  []float64 `json:"edges"`
	Counts []int     `json:"counts"`
	Below  int       `json:"below"`
	Above  int       `json:"above"`
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
