package display

import "ullage/hazards"

// InputRule says what an input must be, from the typed rule of an input
// error: "must be from 20.0 °C to 80.0 °C", "must be at or above the
// freezing point of ethanol, −114.1 °C". bound writes a bound (given in
// the error's SI unit) in the reader's units; the sentence in the error's
// Want is used only when the error carries no rule.
func InputRule(e *hazards.InputError, bound func(float64) string) string {
	s := ""
	switch e.Rule {
	case hazards.RuleRange:
		s = "must be from " + bound(e.Min) + " to " + bound(e.Max)
	case hazards.RulePositive:
		s = "must be greater than zero and at most " + bound(e.Max)
	case hazards.RuleAtLeast:
		s = "must be at or above " + e.Subject + ", " + bound(e.Min)
	case hazards.RuleBelow:
		s = "must be below " + e.Subject + ", " + bound(e.Max)
	case hazards.RuleAtMost:
		s = "must not be above " + e.Subject + ", " + bound(e.Max)
	default:
		return e.Want
	}
	if e.Note != "" {
		s += " " + e.Note
	}
	return s
}

// SIBound writes a bound in its SI unit, for outputs that have no unit
// system of their own: "20 K", "0.1 m³".
func SIBound(unit string) func(float64) string {
	return func(x float64) string {
		s := Number(x, 5)
		if unit != "" {
			s += " " + unit
		}
		return s
	}
}
