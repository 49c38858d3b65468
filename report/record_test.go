package report

import (
	"fmt"
	"strings"
	"testing"
)

// TestCalculationRecordReadsBack checks that the appendix prints every
// trace step with its number, equation and source, and that each finding
// points at its steps.
func TestCalculationRecordReadsBack(t *testing.T) {
	a := assess(t, "typical_design.json")
	pdf := render(t, loadMeta(t, "meta_a.json"), a, Options{Deterministic: true, Appendix: true})
	text := pdfText(t, writeTemp(t, "record.pdf", pdf))
	flat := strings.Join(strings.Fields(text), " ")
	if !strings.Contains(flat, "Appendix: Calculation record") {
		t.Fatal("appendix heading missing")
	}
	for _, s := range a.Trace {
		head := fmt.Sprintf("Step %d.", s.Number)
		if !strings.Contains(flat, head) {
			t.Errorf("%q missing", head)
		}
		eq := strings.Join(strings.Fields(s.Equation), " ")
		if len(eq) > 30 {
			eq = eq[:30]
		}
		if !strings.Contains(flat, eq) {
			t.Errorf("step %d: equation %q missing", s.Number, eq)
		}
	}
	// Links between steps and a finding's outcome read as words, never as
	// a step key or a "margin" unit.
	for _, bad := range []string{"[state_hot]", " margin [", "margin Result", "step 1 ["} {
		if strings.Contains(flat, bad) {
			t.Errorf("%q printed", bad)
		}
	}
	for _, s := range a.Trace {
		if len(s.Uses) > 1 && !strings.Contains(flat, usesText(a, s.Uses)[:20]) {
			t.Errorf("step %d: %q missing", s.Number, usesText(a, s.Uses))
		}
		if s.Finding != nil && !strings.Contains(flat, squash(findingResultText(s.Finding))[:25]) {
			t.Errorf("step %d: %q missing", s.Number, findingResultText(s.Finding))
		}
	}
	for _, want := range []string{"Weibull, J. Appl. Mech. 18, 293 (1951)", "Brent", "Working: calculation record, steps", "Uses steps"} {
		if !strings.Contains(flat, want) {
			t.Errorf("%q missing", want)
		}
	}
}
