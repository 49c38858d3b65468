package gui

import (
	"math"

	"ullage/hazards"
)

// findingValue formats a finding's value in its own unit: the reason in
// words when there is no value, "≥" or "≤" before a value that is a bound.
func findingValue(f hazards.Finding, x float64) string {
	if f.NotApplicable != "" {
		return f.NotApplicable.Words()
	}
	switch f.ValueBound {
	case hazards.AtLeast:
		return "≥ " + findingNumber(f, x)
	case hazards.AtMost:
		return "≤ " + findingNumber(f, x)
	}
	return findingNumber(f, x)
}

// findingNumber formats a number in a finding's unit.
func findingNumber(f hazards.Finding, x float64) string {
	switch {
	case f.Criterion == hazards.CriterionCorrelationUse:
		return "—"
	case f.Criterion == hazards.CriterionFailure:
		return sigFigures(x, 2)
	case f.Unit == "%":
		if math.Abs(x) < 0.05 {
			return "0 %"
		}
		return sigFigures(x, 3) + " %"
	case f.Unit == "% LFL":
		return sigFigures(x, 3) + " % LFL"
	case f.Unit == "ppm":
		return sigFigures(x, 3) + " ppm"
	case f.Unit == "":
		return sigFigures(x, 3)
	}
	return sigFigures(x, 3) + " " + f.Unit
}

// findingLimit formats the limit a finding is held to, with "at least"
// or "at most" so the direction is plain.
func findingLimit(f hazards.Finding) string {
	if hazards.IsThermalShockCriterion(f.Criterion) {
		return "≥ " + findingValue(f, f.Limit)
	}
	switch f.Criterion {
	case hazards.CriterionCorrelationUse:
		return "—"
	case hazards.CriterionNoLimit:
		return "none published"
	}
	if f.Limit == 0 {
		return "—"
	}
	switch f.Criterion {
	case hazards.CriterionUllage, hazards.CriterionUllageWorst, hazards.CriterionBurst, hazards.CriterionBurstWorst, hazards.CriterionImplosion:
		return "≥ " + findingNumber(f, f.Limit)
	}
	if f.Direction == hazards.AtLeast {
		return "≥ " + findingNumber(f, f.Limit)
	}
	return "≤ " + findingNumber(f, f.Limit)
}

// findingMargin formats the margin: positive on the safe side.
func findingMargin(f hazards.Finding) string {
	if f.NotApplicable != "" {
		return "—"
	}
	switch f.Criterion {
	case hazards.CriterionCorrelationUse, hazards.CriterionNoLimit:
		return "—"
	case hazards.CriterionUllage, hazards.CriterionUllageWorst:
		return signedText(f.Margin*100, 2) + " points"
	}
	if hazards.IsThermalShockCriterion(f.Criterion) && f.Value >= hazards.SafetyFactorCap {
		return "no load"
	}
	if f.Criterion == hazards.CriterionFlammability && f.Limit > 0 && f.Value == 0 && f.Margin == 1 {
		return "—"
	}
	// Far from the limit a percentage says little: give the ratio.
	if math.Abs(f.Margin) > 9.99 && f.Limit > 0 {
		return sigFigures(f.Value/f.Limit, 2) + " × limit"
	}
	return signedText(f.Margin*100, 2) + " %"
}

// signedText writes a number with an explicit sign.
func signedText(x float64, n int) string {
	if math.Abs(x) < 1e-12 {
		return "0"
	}
	s := sigFigures(x, n)
	if x > 0 {
		return "+" + s
	}
	return "−" + s[1:]
}
