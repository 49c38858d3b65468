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
//
// Besides the sentence in Want (SI units, for the command line and logs),
// an error about a number carries its rule as data, so that each output
// can word it in its own units: Rule, the bounds Min and Max in the SI
// unit Unit, and Subject, what a bound that is a property rather than a
// fixed number belongs to ("the freezing point of ethanol").
type InputError struct {
	Field string
	Value string
	Want  string
	// Rule is the kind of bound the value broke; RuleOther when Want alone
	// says what is acceptable.
	Rule Rule
	// Min and Max are the bounds the rule names, in Unit (an SI unit: K,
	// kg, Pa, m, m³, m/s, h, or "" for a plain number).
	Min, Max float64
	Unit     string
	// Subject names what the bound is, when it is a property of the
	// design or the fluid; "" for a fixed bound.
	Subject string
	// Note is a remark that follows the bound ("(0 means compute from
	// the parts)"), or "".
	Note string
}

// Rule is the kind of bound an input must keep to.
type Rule string

// Rules of an InputError.
const (
	RuleOther    Rule = ""         // Want says what is acceptable
	RuleRange    Rule = "range"    // Min ≤ value ≤ Max
	RulePositive Rule = "positive" // 0 < value ≤ Max
	RuleAtLeast  Rule = "at-least" // value ≥ Min (Subject names Min)
	RuleBelow    Rule = "below"    // value < Max (Subject names Max)
	RuleAtMost   Rule = "at-most"  // value ≤ Max (Subject names Max)
)

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

// inRange reports whether number(…, x, lo, hi, …) passes: x finite and
// lo ≤ x ≤ hi.
func inRange(x, lo, hi float64) bool { return isFinite(x) && x >= lo && x <= hi }

// number requires lo ≤ x ≤ hi and x finite.
func (c *checker) number(field string, x, lo, hi float64, unit string) {
	if x >= lo && x <= hi && isFinite(x) {
		return // within bounds: nothing to record
	}
	first := c.err
	defer c.rule(first, RuleRange, lo, hi, unit, "")
	if !isFinite(x) {
		c.fail(field, x, "must be a finite number (%g to %g %s)", lo, hi, unit)
	} else if x < lo || x > hi {
		c.fail(field, x, "must be from %g to %g %s", lo, hi, unit)
	}
}

// rule records the rule of the error just found by the check that
// found it (first is the error before that check).
func (c *checker) rule(first error, r Rule, lo, hi float64, unit, subject string) {
	if first != nil || c.err == nil {
		return
	}
	if ie, ok := c.err.(*InputError); ok {
		ie.Rule, ie.Min, ie.Max, ie.Subject = r, lo, hi, subject
		ie.Unit, ie.Note = splitUnit(unit)
	}
}

// siUnits are the units a bound may carry.
var siUnits = map[string]bool{"K": true, "kg": true, "Pa": true, "m": true, "m³": true, "m/s": true, "h": true, "s": true,
	"years": true, "%": true, "nm": true, "ppm": true, "min": true, "hours": true, "minutes": true, "per hour": true, "% of LFL": true}

// splitUnit parts the unit words of a check ("m³ (0 means compute from
// the parts)") into the unit and the remark after it.
func splitUnit(words string) (unit, note string) {
	if siUnits[words] {
		return words, ""
	}
	u, rest, _ := strings.Cut(words, " ")
	if siUnits[u] {
		return u, rest
	}
	return "", words
}

// positive requires 0 < x ≤ hi.
func (c *checker) positive(field string, x, hi float64, unit string) {
	first := c.err
	defer c.rule(first, RulePositive, 0, hi, unit, "")
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
