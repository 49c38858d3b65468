package parse

import (
	"math"
	"strconv"
	"strings"
)

// Number reads a number typed by a person: surrounding blanks are
// ignored and a single decimal comma is accepted in place of a point
// ("21,5" is 21.5). ok is false, and the number 0, for anything else,
// including NaN, infinities and numbers beyond the range of a float64.
func Number(s string) (x float64, ok bool) {
	s = strings.TrimSpace(s)
	if s == "" {
		return 0, false
	}
	if strings.Count(s, ",") == 1 && !strings.Contains(s, ".") {
		s = strings.Replace(s, ",", ".", 1)
	}
	x, err := strconv.ParseFloat(s, 64)
	if err != nil || math.IsNaN(x) || math.IsInf(x, 0) {
		return 0, false
	}
	return x, true
}

// Count reads a whole number, 0 or more, typed by a person; blanks
// (spaces, thin and no-break spaces) and underscores between digit groups
// are ignored ("100 000"). ok is false, and the count 0, for anything
// else.
func Count(s string) (n uint64, ok bool) {
	s = strings.Map(func(r rune) rune {
		switch r {
		case ' ', '_', '\u202f', '\u2009', '\u00a0':
			return -1
		}
		return r
	}, s)
	if s == "" {
		return 0, false
	}
	n, err := strconv.ParseUint(s, 10, 64)
	if err != nil {
		return 0, false
	}
	return n, true
}
