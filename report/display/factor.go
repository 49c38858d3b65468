package display

import "ullage/hazards"

// SafetyFactor words a safety factor: ValueFigures significant figures,
// and "at least 1000" at hazards.SafetyFactorCap, the value that stands
// for a factor too large to tell apart (the same words a finding uses for
// a capped value, by BoundWords). A number that is not finite is NoValue.
func SafetyFactor(x float64) string {
	if x >= hazards.SafetyFactorCap {
		return BoundWords(hazards.AtLeast) + " " + Number(hazards.SafetyFactorCap, ValueFigures)
	}
	return Number(x, ValueFigures)
}
