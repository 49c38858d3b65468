package display

import (
	"fmt"
	"slices"
	"strings"

	"ullage/hazards"
)

// FindingView is one finding as every output prints it: the words and
// numbers, already formatted, beside the typed finding they came from.
type FindingView struct {
	// Finding is the engine's typed finding.
	Finding hazards.Finding
	// Status is the status word: PASS, CAUTION, FAIL, NOT ASSESSED.
	Status string
	// Title names the criterion.
	Title string
	// Value is the value found ("23.1 %", "at most 1.2 × 10⁻⁹", "no burst
	// load"), Limit the limit it is held to ("at least 4", "at most
	// 300 ppm", "none published") and Margin how far the value is from
	// the limit, said by [Margin]; NoValue where none applies.
	Value, Limit, Margin string
	// Source is where the limit comes from.
	Source string
	// Detail words the facts behind the finding in the system's units.
	Detail string
	// Stretched names the values behind the finding that came from a
	// correlation used outside its range, in one sentence, or "".
	Stretched string
}

// Text returns the detail and the stretched-range note together.
func (v FindingView) Text() string {
	if v.Stretched == "" {
		return v.Detail
	}
	if v.Detail == "" {
		return v.Stretched
	}
	return v.Detail + " " + v.Stretched
}

// Numbers returns the value, limit and margin on one line, as the PDF and
// the command line print them.
func (v FindingView) Numbers() string {
	return "Value " + v.Value + "   ·   Limit " + v.Limit + "   ·   Margin " + v.Margin
}

// Findings returns the view of every finding of an assessment, in order.
func Findings(a *hazards.Assessment, s System) []FindingView {
	out := make([]FindingView, 0, len(a.Findings))
	for _, f := range a.Findings {
		out = append(out, Finding(f, s))
	}
	return out
}

// Finding returns the view of one finding. Findings carry their values in
// units that do not depend on the system (%, ppm, % LFL, plain factors
// and probabilities), so s changes only the words around them.
func Finding(f hazards.Finding, s System) FindingView {
	v := FindingView{Finding: f, Status: StatusWord(f.Status), Title: f.Title, Source: f.Source,
		Value: FindingValue(f), Limit: FindingLimit(f), Margin: FindingMargin(f), Detail: Detail(f, s)}
	if len(f.Stretched) > 0 {
		v.Stretched = "Computed outside a correlation's published range (treat as an estimate; not a clean pass): " + strings.Join(f.Stretched, "; ") + "."
	}
	return v
}

// StatusWord returns the word for a status: PASS, CAUTION, FAIL or NOT
// ASSESSED.
func StatusWord(st hazards.Status) string {
	switch st {
	case hazards.StatusPass:
		return "PASS"
	case hazards.StatusCaution:
		return "CAUTION"
	case hazards.StatusFail:
		return "FAIL"
	case hazards.StatusNotAssessed:
		return "NOT ASSESSED"
	}
	return strings.ToUpper(strings.ReplaceAll(string(st), "-", " "))
}

// ReasonWords returns the words printed in place of a value that does not
// apply: "no burst load", "no external load", "not flammable", "not
// assessed — no published limit".
func ReasonWords(r hazards.Reason) string {
	if r.NotAssessed() {
		return "not assessed — " + string(r)
	}
	return string(r)
}

// BoundWords returns "at least" or "at most" for a direction.
func BoundWords(d hazards.Direction) string {
	switch d {
	case hazards.AtLeast:
		return "at least"
	case hazards.AtMost:
		return "at most"
	}
	return ""
}

// quantityOf returns the quantity of a finding's unit.
func quantityOf(unit string) Quantity {
	switch unit {
	case "%":
		return Percent
	case "ppm":
		return Concentration
	case "% LFL":
		return PercentLFL
	}
	return Plain
}

// findingNumber formats a number in a finding's unit.
func findingNumber(f hazards.Finding, x float64) string {
	s := Number(x, ValueFigures)
	if lbl := SI.Unit(quantityOf(f.Unit)); lbl != "" && s != NoValue {
		s += " " + lbl
	} else if lbl == "" && f.Unit != "" && s != NoValue {
		s += " " + f.Unit
	}
	return s
}

// assessed reports whether a finding compares a value with a limit.
func assessed(f hazards.Finding) bool {
	return f.Direction != "" && f.Limit > 0
}

// FindingValue formats a finding's value: the reason in words when it
// does not apply, "at most …"/"at least …" when it is a bound.
func FindingValue(f hazards.Finding) string {
	switch {
	case f.NotApplicable != "":
		return ReasonWords(f.NotApplicable)
	case f.Direction == "":
		if len(f.Stretched) > 0 {
			return "outside a correlation's range"
		}
		return NoValue
	}
	s := findingNumber(f, f.Value)
	if b := BoundWords(f.ValueBound); b != "" {
		s = b + " " + s
	}
	return s
}

// FindingLimit formats the limit a finding is held to with its direction:
// "at least 4", "at most 300 ppm"; "none published" for a limit that does
// not exist.
func FindingLimit(f hazards.Finding) string {
	switch {
	case f.Direction == "" && len(f.Stretched) > 0:
		return "within the published range"
	case f.NotApplicable == hazards.ReasonNoPublishedLimit, f.Direction == hazards.AtMost && f.Limit <= 0:
		return "none published"
	case f.Direction == "":
		return NoValue
	}
	return BoundWords(f.Direction) + " " + findingNumber(f, f.Limit)
}

// FindingMargin says how far a finding's value lies from its limit, by
// [Margin]; NoValue when the finding has no value or no limit.
func FindingMargin(f hazards.Finding) string {
	if f.NotApplicable != "" || !assessed(f) {
		return NoValue
	}
	return Margin(f.Value, f.Limit, f.Direction, f.ValueBound)
}

// Margin says how a value stands against its limit, the same way for
// every criterion, from the ratio of value to limit:
//
//	met with 18 % to spare    the value is on the safe side, by 18 % of the limit
//	met 250-fold              on the safe side by a factor of ten or more
//	at the limit              on the limit to the figures shown
//	missed by 23 %            on the wrong side, by 23 % of the limit
//	missed 2300-fold          on the wrong side by a factor of ten or more
//
// dir is the limit's direction (the value must be at least, or at most,
// the limit); bound, when set, says the value is itself a bound, and the
// words then say "at least" or "at most" about the margin as well.
// Percentages and factors take MarginFigures significant figures.
func Margin(value, limit float64, dir, bound hazards.Direction) string {
	if !(limit > 0) || value < 0 || dir == "" {
		return NoValue
	}
	// safe is the factor by which the value lies on the safe side (> 1),
	// or on the wrong side (< 1).
	var safe float64
	if dir == hazards.AtLeast {
		safe = value / limit
	} else {
		if value == 0 {
			return "met, nothing to hold against the limit"
		}
		safe = limit / value
	}
	// A bound on the safe side makes the margin a lower bound, and the
	// other way round.
	q := ""
	switch {
	case bound == "":
	case bound == dir:
		q = "at least "
	default:
		q = "at most "
	}
	if safe >= 1 {
		if safe >= 10 {
			return "met " + q + Number(safe, MarginFigures) + "-fold"
		}
		spare := value/limit - 1
		if dir == hazards.AtMost {
			spare = 1 - value/limit
		}
		p := Number(100*spare, MarginFigures)
		if p == "0" {
			return "at the limit"
		}
		return "met with " + q + p + " % to spare"
	}
	if q != "" {
		// On the wrong side, a bound on the safe side limits how far the
		// value misses.
		if q == "at least " {
			q = "at most "
		} else {
			q = "at least "
		}
	}
	if 1/safe >= 10 {
		return "missed " + q + Number(1/safe, MarginFigures) + "-fold"
	}
	short := 1 - value/limit
	if dir == hazards.AtMost {
		short = value/limit - 1
	}
	p := Number(100*short, MarginFigures)
	if p == "0" {
		return "at the limit"
	}
	return "missed by " + q + p + " %"
}

// MarginNote explains the margin column wherever findings are tabled.
const MarginNote = "Margin says whether the value meets its limit and by how much, as a share of the limit (\"met with 18 % to spare\", \"missed by 23 %\"), or as a factor from ten times on (\"met 250-fold\", \"missed 2300-fold\"); \"at least\" or \"at most\" marks a value that is itself a bound."

// ValueOf returns the value of an assessment's finding for a criterion as
// FindingValue words it, or NoValue when the assessment has no such
// finding.
func ValueOf(a *hazards.Assessment, criterion string) string {
	for _, f := range a.Findings {
		if f.Criterion == criterion {
			return FindingValue(f)
		}
	}
	return NoValue
}

// factQuantity returns the quantity a fact is shown in.
func factQuantity(k hazards.FactKind) Quantity {
	switch k {
	case hazards.FactTemperature:
		return Temperature
	case hazards.FactTempDifference:
		return TempDifference
	case hazards.FactPressure:
		return Pressure
	case hazards.FactStress:
		return Stress
	case hazards.FactMass:
		return Mass
	case hazards.FactVolume:
		return VesselVolume
	case hazards.FactPercent:
		return Percent
	case hazards.FactConcentration:
		return Concentration
	}
	return Plain
}

// StressPerDegree formats a stress per kelvin of temperature change
// (Pa/K): "0.787 MPa per K", or in psi per °F.
func (s System) StressPerDegree(paPerK float64) string {
	if s == US {
		return Number(paPerK*5/9/psiPa, ValueFigures) + " psi per °F"
	}
	return Number(paPerK/1e6, ValueFigures) + " MPa per K"
}

// FactText words one fact in the system's units: "hottest temperature:
// 76.0 °C", "glass: soda-lime-silica glass", "liquid-full temperature:
// not reached".
func FactText(f hazards.Fact, s System) string {
	if f.Text != "" {
		return f.Name + ": " + Warning(f.Text, s)
	}
	var v string
	switch f.Kind {
	case hazards.FactStressPerKelvin:
		v = s.StressPerDegree(f.Value)
	case hazards.FactMinutes:
		v = Number(f.Value, ValueFigures) + " min"
	case hazards.FactHours:
		v = Number(f.Value, ValueFigures) + " h"
	case hazards.FactYears:
		v = Number(f.Value, ValueFigures) + " years"
	default:
		v = s.Format(factQuantity(f.Kind), f.Value)
	}
	if b := BoundWords(f.Bound); b != "" {
		v = b + " " + v
	}
	return f.Name + ": " + v
}

// Detail words the facts behind a finding, in order, in one line.
func Detail(f hazards.Finding, s System) string {
	parts := make([]string, 0, len(f.Facts))
	for _, x := range f.Facts {
		parts = append(parts, FactText(x, s))
	}
	if len(parts) == 0 {
		return ""
	}
	return strings.Join(parts, "; ") + "."
}

// LimitSetShort names a limit set in a table cell: "US work", "US
// public", "EU work", "UK WEL", "DE AGW"; an unknown id as it is.
func LimitSetShort(id string) string {
	switch id {
	case hazards.LimitSetUSOccupational:
		return "US work"
	case hazards.LimitSetUSPublicAcute:
		return "US public"
	case hazards.LimitSetEUOccupational:
		return "EU work"
	case hazards.LimitSetUKWEL:
		return "UK WEL"
	case hazards.LimitSetDEAGW:
		return "DE AGW"
	}
	return id
}

// FailingTitles names the findings that fail by the titles the window's
// and the record's findings tables print, each title once, in the
// findings' order; nil when none fails.
func FailingTitles(vs []FindingView) []string {
	var out []string
	for _, v := range vs {
		if v.Finding.Status == hazards.StatusFail && !slices.Contains(out, v.Title) {
			out = append(out, v.Title)
		}
	}
	return out
}

// Tally counts findings by status in one line, fails first, the same
// in the window's verdict banner, the record's verdict box and the
// command line: "0 fail · 0 caution · 15 pass · 2 not assessed, of 17
// criteria" (a status no finding has is still counted, except not
// assessed).
func Tally(fs []hazards.Finding) string {
	var pass, caution, fail, other int
	for _, f := range fs {
		switch f.Status {
		case hazards.StatusPass:
			pass++
		case hazards.StatusCaution:
			caution++
		case hazards.StatusFail:
			fail++
		default:
			other++
		}
	}
	s := fmt.Sprintf("%d fail · %d caution · %d pass", fail, caution, pass)
	if other > 0 {
		s += fmt.Sprintf(" · %d not assessed", other)
	}
	return s + fmt.Sprintf(", of %d %s", len(fs), Agree(len(fs), "criterion", "criteria"))
}
