package report

import (
	"math"
	"strconv"
	"strings"
)

// noValue stands for a number that cannot be shown (not computed, or not
// finite); the report never prints NaN.
const noValue = "—"

// finite reports whether x is an ordinary number.
func finite(x float64) bool { return !math.IsNaN(x) && !math.IsInf(x, 0) }

// fixed formats x with the given number of decimals, never as "-0".
func fixed(x float64, decimals int) string {
	if !finite(x) {
		return noValue
	}
	s := strconv.FormatFloat(x, 'f', decimals, 64)
	if strings.Trim(s, "-0.") == "" {
		s = strings.TrimPrefix(s, "-")
	}
	return strings.Replace(s, "-", "−", 1)
}

// sig formats x to n significant figures without an exponent for
// magnitudes from 0.001 to below ten million, and as a power of ten
// (1.2×10⁻⁵) outside that.
func sig(x float64, n int) string {
	if !finite(x) {
		return noValue
	}
	if x == 0 {
		return "0"
	}
	ax := math.Abs(x)
	if ax >= 1e-3 && ax < 1e7 {
		mag := int(math.Floor(math.Log10(ax)))
		dec := n - 1 - mag
		if dec < 0 {
			if mag >= n+2 {
				return power(x, n)
			}
			dec = 0
		}
		// Rounding may carry into the next decade (9.996 → 10.00).
		if r, _ := strconv.ParseFloat(strconv.FormatFloat(ax, 'f', dec, 64), 64); r >= math.Pow(10, float64(mag+1)) && dec > 0 {
			dec--
		}
		return fixed(x, dec)
	}
	return power(x, n)
}

var superscripts = map[rune]rune{
	'0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵',
	'6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹', '-': '⁻',
}

// power formats x as m×10ᵉ with n significant figures in m.
func power(x float64, n int) string {
	s := strconv.FormatFloat(x, 'e', n-1, 64)
	mant, exp, _ := strings.Cut(s, "e")
	e, _ := strconv.Atoi(exp)
	var b strings.Builder
	b.WriteString(strings.Replace(mant, "-", "−", 1))
	b.WriteString("×10")
	for _, r := range strconv.Itoa(e) {
		b.WriteRune(superscripts[r])
	}
	return b.String()
}

// plain formats x to at most four significant figures without trailing
// zeros: counts, durations and criteria (10 years, 480 min, 4, 0.45).
func plain(x float64) string {
	if !finite(x) || x == 0 {
		return sig(x, 1)
	}
	n := 1
	for ; n < 4; n++ {
		r, _ := strconv.ParseFloat(strconv.FormatFloat(x, 'e', n-1, 64), 64)
		if math.Abs(r-x) <= 1e-9*math.Abs(x) {
			break
		}
	}
	if ax := math.Abs(x); ax >= 1 && ax < 1e7 {
		n = max(n, int(math.Floor(math.Log10(ax)))+1)
	}
	s := sig(x, n)
	if strings.Contains(s, ".") && !strings.Contains(s, "×") {
		s = strings.TrimRight(strings.TrimRight(s, "0"), ".")
	}
	return s
}

// margin formats a finding's margin: a signed percentage, or the ratio of
// value to limit when that is more than ten times either way.
func margin(m float64, atLeast bool) string {
	if !finite(m) {
		return noValue
	}
	if m > -9.99 && m < 9.99 {
		return signed(m, percent(m, 2))
	}
	ratio := 1 - m
	if atLeast {
		ratio = m + 1
	}
	return sig(ratio, 2) + "× the limit"
}

// percent formats a fraction (0.25) as a percentage ("25 %").
func percent(fraction float64, n int) string {
	if !finite(fraction) {
		return noValue
	}
	return sig(fraction*100, n) + " %"
}

// signed prefixes a plus sign to a positive formatted number.
func signed(x float64, s string) string {
	if x > 0 && s != noValue {
		return "+" + s
	}
	return s
}

// orBlank returns s, or a line to fill in by hand when s is empty.
func orBlank(s string) string {
	if strings.TrimSpace(s) == "" {
		return "______________"
	}
	return s
}
