package display

import (
	"testing"

	"ullage/hazards"
)

// The expected strings are written by hand from the doc comments.
func TestRecordWords(t *testing.T) {
	for _, c := range []struct {
		in   []int
		want string
	}{{nil, "no steps"}, {[]int{14}, "step 14"}, {[]int{13, 14}, "steps 13 and 14"}, {[]int{45, 33, 31}, "steps 45, 33 and 31"}} {
		if got := StepsPhrase(c.in); got != c.want {
			t.Errorf("StepsPhrase(%v) = %q, want %q", c.in, got, c.want)
		}
	}
	if got := RecordNumber(2.123456789); got != "2.12346" {
		t.Errorf("RecordNumber = %q, want 2.12346", got)
	}
	for _, c := range []struct {
		f    hazards.FindingResult
		want string
	}{
		{hazards.FindingResult{Status: hazards.StatusFail, Value: 2.1, Limit: 5, Unit: "%", Direction: hazards.AtLeast, Margin: -0.58},
			"FAIL: value 2.1 %, limit at least 5 %, margin −58 % of the limit"},
		{hazards.FindingResult{Status: hazards.StatusPass, Value: 0.2, Limit: 1, Direction: hazards.AtMost, Margin: 0.8},
			"PASS: value 0.2, limit at most 1, margin 80 % of the limit"},
		{hazards.FindingResult{Status: hazards.StatusPass, NotApplicable: hazards.ReasonNoBurstLoad},
			"PASS: " + ReasonWords(hazards.ReasonNoBurstLoad)},
	} {
		if got := StepFindingText(&c.f); got != c.want {
			t.Errorf("StepFindingText = %q, want %q", got, c.want)
		}
	}
}
