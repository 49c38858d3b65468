package display

import (
	"strconv"
	"strings"

	"ullage/hazards"
)

// RecordFigures is the number of significant figures of the calculation
// record, in the window's working and in the PDF's annex: enough to
// repeat a step by hand.
const RecordFigures = 6

// RecordNumber writes a value of the calculation record to
// RecordFigures significant figures by [Number]'s rule.
func RecordNumber(x float64) string { return Number(x, RecordFigures) }

// StepsPhrase names steps of the calculation record: "step 14", "steps
// 45, 33 and 31", "no steps".
func StepsPhrase(steps []int) string {
	parts := make([]string, len(steps))
	for i, n := range steps {
		parts[i] = strconv.Itoa(n)
	}
	switch len(parts) {
	case 0:
		return "no steps"
	case 1:
		return "step " + parts[0]
	}
	return "steps " + strings.Join(parts[:len(parts)-1], ", ") + " and " + parts[len(parts)-1]
}

// StepFindingText is a finding's outcome as its step of the calculation
// record gives it, in SI as computed: "FAIL: value 2.1 %, limit at least
// 5 %, margin −58 % of the limit", or the status and why it does not
// apply.
func StepFindingText(f *hazards.FindingResult) string {
	word := StatusWord(f.Status)
	if f.Status == "" {
		word = "NONE"
	}
	if f.NotApplicable != "" {
		return word + ": " + ReasonWords(f.NotApplicable)
	}
	unit := ""
	if f.Unit != "" {
		unit = " " + f.Unit
	}
	dir := ""
	if f.Direction == hazards.AtLeast || f.Direction == hazards.AtMost {
		dir = BoundWords(f.Direction) + " "
	}
	return word + ": value " + RecordNumber(f.Value) + unit + ", limit " + dir + RecordNumber(f.Limit) + unit +
		", margin " + RecordNumber(100*f.Margin) + " % of the limit"
}
