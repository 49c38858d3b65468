package tolerance

import "math"

// Percentiles are the 1st, 5th, 50th, 95th and 99th percentiles of a
// sampled quantity.
type Percentiles struct {
	P1  float64 `json:"p1"`
	P5  float64 `json:"p5"`
	P50 float64 `json:"p50"`
	P95 float64 `json:"p95"`
	P99 float64 `json:"p99"`
}

// percentileLevels are the levels of Percentiles, in field order.
var percentileLevels = [5]float64{0.01, 0.05, 0.50, 0.95, 0.99}

// percentiles returns the percentiles of the n smallest values of x by
// linear interpolation between order statistics, x₍ₖ₎ + (h − k)(x₍ₖ₊₁₎ −
// x₍ₖ₎) with h = (n − 1)p and k = ⌊h⌋: definition 7 of R. J. Hyndman and
// Y. Fan, "Sample quantiles in statistical packages", Am. Stat. 50(4),
// 361–365 (1996), the default of R and NumPy. Values beyond the n smallest
// (len(x) > n) must all be larger than them; they are ignored. x is
// reordered. It returns the zero Percentiles when n is 0.
func percentiles(x []float64, n int) Percentiles {
	if n <= 0 {
		return Percentiles{}
	}
	var ranks []int
	hs := [5]float64{}
	for i, p := range percentileLevels {
		hs[i] = float64(n-1) * p
		k := int(math.Floor(hs[i]))
		ranks = appendRank(ranks, k)
		if k+1 < n {
			ranks = appendRank(ranks, k+1)
		}
	}
	selectRanks(x, ranks)
	var out [5]float64
	for i, h := range hs {
		k := int(math.Floor(h))
		out[i] = x[k]
		if k+1 < n {
			out[i] += (h - float64(k)) * (x[k+1] - x[k])
		}
	}
	return Percentiles{P1: out[0], P5: out[1], P50: out[2], P95: out[3], P99: out[4]}
}

// appendRank appends k to the ascending list of ranks unless it is
// already last.
func appendRank(ranks []int, k int) []int {
	if len(ranks) > 0 && ranks[len(ranks)-1] >= k {
		return ranks
	}
	return append(ranks, k)
}

// selectRanks reorders x so that x[k] holds the k-th smallest value (from
// zero) for every k in ranks (ascending), in time proportional to
// len(x)·log(len(ranks)) on average: Hoare's FIND (C. A. R. Hoare,
// "Algorithm 65: Find", Commun. ACM 4(7), 321–322 (1961)) for the middle
// rank, then the same on each side for the ranks that fall there. NaN must
// not occur in x.
func selectRanks(x []float64, ranks []int) {
	if len(ranks) == 0 || len(x) == 0 {
		return
	}
	mid := len(ranks) / 2
	k := ranks[mid]
	selectKth(x, k)
	selectRanks(x[:k], ranks[:mid])
	rest := ranks[mid+1:]
	shifted := make([]int, len(rest))
	for i, r := range rest {
		shifted[i] = r - k - 1
	}
	selectRanks(x[k+1:], shifted)
}

// selectKth reorders x so that x[k] is the k-th smallest value, every
// value before it is ≤ x[k] and every value after it is ≥ x[k].
func selectKth(x []float64, k int) {
	lo, hi := 0, len(x)-1
	for hi > lo {
		// Median of three as the pivot guards against sorted input.
		m := lo + (hi-lo)/2
		if x[m] < x[lo] {
			x[m], x[lo] = x[lo], x[m]
		}
		if x[hi] < x[lo] {
			x[hi], x[lo] = x[lo], x[hi]
		}
		if x[hi] < x[m] {
			x[hi], x[m] = x[m], x[hi]
		}
		pivot := x[m]
		// Hoare partition: stops on values equal to the pivot from both
		// sides, so runs of equal values split evenly.
		i, j := lo, hi
		for i <= j {
			for x[i] < pivot {
				i++
			}
			for x[j] > pivot {
				j--
			}
			if i <= j {
				x[i], x[j] = x[j], x[i]
				i++
				j--
			}
		}
		switch {
		case k <= j:
			hi = j
		case k >= i:
			lo = i
		default:
			return
		}
	}
}
