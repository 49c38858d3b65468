package hazards

import (
	"errors"
	"fmt"
	"math"
	"strings"
	"unicode/utf8"
)

// ErrInvalidInput is wrapped by every error about a design's inputs.
var ErrInvalidInput = errors.New("invalid input")

// InputError names the input field that is wrong, the value found and what
// is acceptable. It wraps ErrInvalidInput.
type InputError struct {
	Field string
	Value string
	Want  string
}

func (e *InputError) Error() string {
	return fmt.Sprintf("%s = %s: %s", e.Field, e.Value, e.Want)
}

// Unwrap makes errors.Is(err, ErrInvalidInput) true.
func (e *InputError) Unwrap() error { return ErrInvalidInput }

// checker collects the first input error found.
type checker struct{ err error }

func (c *checker) fail(field string, value any, want string, args ...any) {
	if c.err == nil {
		c.err = &InputError{Field: field, Value: fmt.Sprint(value), Want: fmt.Sprintf(want, args...)}
	}
}

func isFinite(x float64) bool { return !math.IsNaN(x) && !math.IsInf(x, 0) }

// number requires lo ≤ x ≤ hi and x finite.
func (c *checker) number(field string, x, lo, hi float64, unit string) {
	if !isFinite(x) {
		c.fail(field, x, "must be a finite number (%g to %g %s)", lo, hi, unit)
	} else if x < lo || x > hi {
		c.fail(field, x, "must be from %g to %g %s", lo, hi, unit)
	}
}

// positive requires 0 < x ≤ hi.
func (c *checker) positive(field string, x, hi float64, unit string) {
	if !isFinite(x) || x <= 0 || x > hi {
		c.fail(field, x, "must be greater than zero and at most %g %s", hi, unit)
	}
}

// text requires s to be at most most characters long.
func (c *checker) text(field, s string, most int) {
	if n := utf8.RuneCountInString(s); n > most {
		shown := s
		if r := []rune(s); len(r) > 40 {
			shown = string(r[:40]) + "…"
		}
		c.fail(field, fmt.Sprintf("%q", shown), "is %d characters long; at most %d are accepted", n, most)
	}
}

func (c *checker) sourced(field string, s Sourced, lo, hi float64, unit string) {
	c.number(field+".value", s.Value, lo, hi, unit)
	if strings.TrimSpace(s.Source) == "" {
		c.fail(field+".source", `""`, "every value needs its source (a publication, \"common practice\" or \"... (from memory)\")")
	}
}
