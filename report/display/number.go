package display

import (
	"math"
	"strconv"
	"strings"
)

// NoValue stands for a number that cannot be shown (not computed, or not
// finite); no output ever prints NaN or infinity.
const NoValue = "—"

// Significant figures used everywhere a result is shown.
const (
	// ValueFigures is the number of significant figures of a result.
	ValueFigures = 3
	// MarginFigures is the number of significant figures of a margin.
	MarginFigures = 2
)

// Plain notation is used for magnitudes from plainLow to below plainHigh,
// scientific notation (× 10ⁿ) outside.
const (
	plainLow  = 1e-3
	plainHigh = 1e6
)

// Number formats x to n significant figures: in plain notation for
// magnitudes from 0.001 to below a million, as m × 10ⁿ (superscript
// exponent) outside; trailing zeros after the decimal point are dropped,
// a negative number takes a true minus sign, and a number that is not
// finite is NoValue.
func Number(x float64, n int) string {
	if math.IsNaN(x) || math.IsInf(x, 0) {
		return NoValue
	}
	if n < 1 {
		n = 1
	}
	if x == 0 {
		return "0"
	}
	// Round first, so that 999.96 to three figures is 1000 and the choice
	// of notation sees the rounded number.
	r, _ := strconv.ParseFloat(strconv.FormatFloat(x, 'e', n-1, 64), 64)
	ax := math.Abs(r)
	var s string
	if ax >= plainLow && ax < plainHigh {
		dec := n - 1 - int(math.Floor(math.Log10(ax)))
		if dec < 0 {
			dec = 0
		}
		s = trimZeros(strconv.FormatFloat(r, 'f', dec, 64))
	} else {
		mant, exp, _ := strings.Cut(strconv.FormatFloat(r, 'e', n-1, 64), "e")
		e, _ := strconv.Atoi(exp)
		s = trimZeros(mant) + " × 10" + superscript(e)
	}
	if s == "-0" {
		s = "0"
	}
	return strings.Replace(s, "-", "−", 1)
}

// Fixed formats x with the given number of decimals (temperatures to a
// tenth of a degree), never as "−0"; a number that is not finite is
// NoValue.
func Fixed(x float64, decimals int) string {
	if math.IsNaN(x) || math.IsInf(x, 0) {
		return NoValue
	}
	s := strconv.FormatFloat(x, 'f', decimals, 64)
	if strings.Trim(s, "-0.") == "" {
		s = strings.TrimPrefix(s, "-")
	}
	return strings.Replace(s, "-", "−", 1)
}

// StatedFigures is the most significant figures [Stated] prints.
const StatedFigures = 4

// Stated formats a number a person stated rather than one the engine
// computed (a criterion, a service life, an air-change rate): with as few
// significant figures as give it back exactly, at most StatedFigures and
// never fewer than its integer digits, by [Number]'s rule otherwise
// (10 years, 480 min, 0.45, 1 × 10⁻⁴).
func Stated(x float64) string {
	if math.IsNaN(x) || math.IsInf(x, 0) || x == 0 {
		return Number(x, 1)
	}
	n := 1
	for ; n < StatedFigures; n++ {
		r, _ := strconv.ParseFloat(strconv.FormatFloat(x, 'e', n-1, 64), 64)
		if math.Abs(r-x) <= 1e-9*math.Abs(x) {
			break
		}
	}
	if ax := math.Abs(x); ax >= 1 && ax < plainHigh {
		n = max(n, int(math.Floor(math.Log10(ax)))+1)
	}
	return Number(x, n)
}

// PowerOfTen writes m × 10^e in [Number]'s notation: "10⁵" when m is 1,
// "2 × 10⁵" otherwise (a chart's tick labels).
func PowerOfTen(m, e int) string {
	if m == 1 {
		return "10" + superscript(e)
	}
	return strconv.Itoa(m) + " × 10" + superscript(e)
}

// trimZeros removes trailing zeros after a decimal point.
func trimZeros(s string) string {
	if !strings.Contains(s, ".") {
		return s
	}
	return strings.TrimSuffix(strings.TrimRight(s, "0"), ".")
}

// superscript writes an integer exponent in superscript digits.
func superscript(n int) string {
	sup := []rune("⁰¹²³⁴⁵⁶⁷⁸⁹")
	var b strings.Builder
	if n < 0 {
		b.WriteRune('⁻')
		n = -n
	}
	for _, c := range strconv.Itoa(n) {
		b.WriteRune(sup[c-'0'])
	}
	return b.String()
}
