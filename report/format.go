package report

import (
	"math"
	"strings"

	"ullage/report/display"
)

// The record formats every number by the display package's rules: one
// rule for significant figures and one for scientific notation
// (display.Number), fixed decimals for temperatures (display.Fixed) and
// stated values (display.Stated). This file holds only what is particular
// to the record's layout.

// noValue stands for a number that cannot be shown (not computed, or not
// finite); the report never prints NaN.
const noValue = display.NoValue

// finite reports whether x is an ordinary number.
func finite(x float64) bool { return !math.IsNaN(x) && !math.IsInf(x, 0) }

// percent formats a fraction (0.25) as a percentage ("25 %") to n
// significant figures.
func percent(fraction float64, n int) string {
	if !finite(fraction) {
		return noValue
	}
	return display.Number(fraction*100, n) + " %"
}

// orBlank returns s, or a line to fill in by hand when s is empty.
func orBlank(s string) string {
	if strings.TrimSpace(s) == "" {
		return "______________"
	}
	return s
}
