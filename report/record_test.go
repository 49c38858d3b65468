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
	for _, want := range []string{"Weibull, J. Appl. Mech. 18, 293 (1951)", "Brent", "Working: calculation record, steps"} {
		if !strings.Contains(flat, want) {
			t.Errorf("%q missing", want)
		}
	}
}
