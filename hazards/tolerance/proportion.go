package tolerance

import "math"

// z975 is the 0.975 quantile of the standard normal distribution, for a
// two-sided 95 % interval.
const z975 = 1.959963984540054

// Proportion is a fraction of sampled units with its 95 % confidence
// interval.
type Proportion struct {
	// Count of Total units had the property.
	Count int `json:"count"`
	Total int `json:"total"`
	// Estimate is Count/Total; Low and High bound the 95 % Wilson score
	// interval.
	Estimate float64 `json:"estimate"`
	Low      float64 `json:"low"`
	High     float64 `json:"high"`
}

// Wilson returns the proportion count/total with its 95 % Wilson score
// interval (E. B. Wilson, "Probable inference, the law of succession, and
// statistical inference", J. Am. Stat. Assoc. 22, 209–212 (1927)):
//
//	centre = (p̂ + z²/2n) / (1 + z²/n)
//	half   = z/(1 + z²/n) · √(p̂(1 − p̂)/n + z²/4n²)
//
// with p̂ = count/total and z = 1.95996, the two-sided 95 % normal
// quantile. Unlike the plain p̂ ± z√(p̂(1−p̂)/n) it stays inside [0, 1] and
// gives a useful upper bound when no unit fails (z²/(n + z²), about 3.84/n).
// A total of zero, or a count outside [0, total], gives the empty
// Proportion{Total: total, High: 1} rather than NaN.
func Wilson(count, total int) Proportion {
	if total <= 0 || count < 0 || count > total {
		return Proportion{Count: max(count, 0), Total: max(total, 0), High: 1}
	}
	n := float64(total)
	p := float64(count) / n
	z2 := z975 * z975
	denom := 1 + z2/n
	centre := (p + z2/(2*n)) / denom
	half := z975 / denom * math.Sqrt(p*(1-p)/n+z2/(4*n*n))
	lo, hi := math.Max(0, centre-half), math.Min(1, centre+half)
	// At the ends the interval touches 0 or 1 exactly; rounding must not
	// leave it a hair away.
	if count == 0 {
		lo = 0
	}
	if count == total {
		hi = 1
	}
	return Proportion{Count: count, Total: total, Estimate: p, Low: lo, High: hi}
}
