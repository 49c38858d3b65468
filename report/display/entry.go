package display

import (
	"math"
	"strconv"
)

// Significant figures of a value shown in an input field.
const (
	// EntryFiguresSI is how many significant figures an SI value has in
	// an input field: enough for any value a person types, without the
	// noise a unit conversion leaves.
	EntryFiguresSI = 6
	// EntryFiguresUS is the least number of significant figures a US
	// customary value, converted from SI, has in an input field: 1.6 mm
	// reads 0.06299 in, never 0.0629921 in.
	EntryFiguresUS = 4
	// entryFiguresTyped is the most significant figures a value typed in
	// US customary units keeps when it is shown again.
	entryFiguresTyped = 8
)

// Entry writes x, a value already in the unit a person types it in, for
// an input field, so that it can be edited and typed back: ASCII digits,
// a hyphen-minus and a decimal point, e-notation (1e-05) below 0.0001 and
// from a million up (never × 10ⁿ, which cannot be typed), no trailing
// zeros. In SI it has EntryFiguresSI significant figures. In US customary
// units it has the figures the value was typed with, up to eight, when it
// reads back as exactly that value (1/16 in stays 0.0625, 0.06251 in stays
// 0.06251), and EntryFiguresUS otherwise. A number that is not finite is
// NoValue.
func Entry(x float64, s System) string {
	if math.IsNaN(x) || math.IsInf(x, 0) {
		return NoValue
	}
	if x == 0 {
		return "0"
	}
	if s == US {
		for n := EntryFiguresUS; n <= entryFiguresTyped; n++ {
			// A typed value comes back from SI within a few units in the
			// last place of a float64; 1e-12 of the value is far wider
			// than that and far narrower than the step of eight figures.
			if r := roundFigures(x, n); math.Abs(r-x) <= 1e-12*math.Abs(x) {
				return strconv.FormatFloat(r, 'g', -1, 64)
			}
		}
		return strconv.FormatFloat(roundFigures(x, EntryFiguresUS), 'g', -1, 64)
	}
	return strconv.FormatFloat(roundFigures(x, EntryFiguresSI), 'g', -1, 64)
}

// roundFigures rounds x to n significant figures.
func roundFigures(x float64, n int) float64 {
	r, err := strconv.ParseFloat(strconv.FormatFloat(x, 'g', n, 64), 64)
	if err != nil {
		return x
	}
	return r
}
