package tolerance

import (
	"math"
	"testing"
)

func TestHistogram(t *testing.T) {
	x := []float64{-1, 0, 0.01, 0.5, 0.99, 1, 2}
	h := newHistogram(x, 0, 1)
	if len(h.Edges) != HistogramBins+1 || len(h.Counts) != HistogramBins {
		t.Fatalf("histogram has %d edges and %d counts, want %d and %d", len(h.Edges), len(h.Counts), HistogramBins+1, HistogramBins)
	}
	if h.Edges[0] != 0 || h.Edges[HistogramBins] != 1 {
		t.Errorf("edges run %g to %g, want 0 to 1", h.Edges[0], h.Edges[HistogramBins])
	}
	// 0 and 0.01 fall in the first bin (width 0.025), 0.5 in bin 20,
	// 0.99 and the upper edge 1 in the last.
	want := map[int]int{0: 2, 20: 1, HistogramBins - 1: 2}
	total := 0
	for i, c := range h.Counts {
		total += c
		if c != want[i] {
			t.Errorf("bin %d [%g, %g) holds %d, want %d", i, h.Edges[i], h.Edges[i+1], c, want[i])
		}
	}
	if h.Below != 1 || h.Above != 1 || total+h.Below+h.Above != len(x) {
		t.Errorf("below %d, above %d, in bins %d: want 1, 1 and %d", h.Below, h.Above, total, len(x)-2)
	}
}

// TestLoadedHistogramLeavesOutUnloadedUnits: units at the safety-factor
// cap (no burst load) are counted apart so they do not squash the bins.
func TestLoadedHistogramLeavesOutUnloadedUnits(t *testing.T) {
	x := []float64{0.5, 0.9, 1.5, 2.5, 1000, 1000, 1000}
	h := loadedHistogram(x)
	if h.NoLoad != 3 {
		t.Errorf("NoLoad = %d, want 3", h.NoLoad)
	}
	total := h.Below + h.Above
	for _, c := range h.Counts {
		total += c
	}
	if total != 4 {
		t.Errorf("binned %d units, want the 4 under load", total)
	}
	if top := h.Edges[len(h.Edges)-1]; top > 2.5 || top < 1 {
		t.Errorf("top edge %g, want the loaded units' 99th percentile (≤ 2.5)", top)
	}
}

// The range follows the data: units far above a factor of 20 are binned,
// not piled up off the chart (a fixed top of 20 once left all of them
// outside).
func TestLoadedHistogramRangeFromData(t *testing.T) {
	x := make([]float64, 0, 200)
	for i := range 200 {
		x = append(x, 40+float64(i)/10) // factors 40 to 59.9
	}
	h := loadedHistogram(x)
	lo, hi := h.Edges[0], h.Edges[len(h.Edges)-1]
	// 0.9 × the 1st percentile (≈ 40.2) floored, and the 99th (≈ 59.7).
	if lo != 36 || hi < 59 || hi > 60 {
		t.Errorf("range %g to %g, want 36 to about 59.7", lo, hi)
	}
	if h.Below+h.Above > 4 {
		t.Errorf("%d below and %d above: want at most 1 %% each side", h.Below, h.Above)
	}
}

// Factors spread over decades are binned on a logarithmic scale, so that
// the bulk of the units is not squeezed into the first of equal bins.
func TestLoadedHistogramWideSpreadIsLogarithmic(t *testing.T) {
	tests := []struct {
		name    string
		lo, hi  float64 // factors spread geometrically between
		log     bool
		firstLo float64 // the lowest edge, approximately
	}{
		{"one decade", 5, 40, false, 4},
		{"three decades, near bursting", 0.3, 800, true, 0.27},
		{"from a factor of 1.5", 1.5, 900, true, 0.5},
		{"high and wide", 20, 900, true, 18},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			x := make([]float64, 1000)
			for i := range x {
				x[i] = tt.lo * math.Pow(tt.hi/tt.lo, float64(i)/float64(len(x)-1))
			}
			h := loadedHistogram(x)
			if h.Log != tt.log {
				t.Fatalf("Log = %v, want %v", h.Log, tt.log)
			}
			total := h.Below + h.Above
			empty := 0
			for _, c := range h.Counts {
				total += c
				if c == 0 {
					empty++
				}
			}
			if total != len(x) {
				t.Errorf("counted %d units, want %d", total, len(x))
			}
			if got := h.Edges[0]; math.Abs(got-tt.firstLo) > 0.02*tt.firstLo+0.5 {
				t.Errorf("lowest edge %g, want about %g", got, tt.firstLo)
			}
			if !tt.log {
				return
			}
			// Geometric edges: every bin has the same ratio of its edges.
			r := h.Edges[1] / h.Edges[0]
			for i := 1; i < HistogramBins; i++ {
				if q := h.Edges[i+1] / h.Edges[i]; math.Abs(q-r) > 1e-9*r {
					t.Fatalf("bin %d has edge ratio %g, bin 0 %g", i, q, r)
				}
			}
			// Factors spread evenly in the logarithm fill the bins they
			// span instead of piling into the first.
			if empty > HistogramBins/2 {
				t.Errorf("%d of %d bins are empty", empty, HistogramBins)
			}
		})
	}
}
