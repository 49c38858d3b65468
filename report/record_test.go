package report

import (
	"fmt"
	"strings"
	"testing"

	"ullage/hazards"
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
	for _, s := range a.Trace() {
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
	for _, s := range a.Trace() {
		if len(s.Uses) > 1 && !strings.Contains(flat, usesText(a, s.Uses)[:20]) {
			t.Errorf("step %d: %q missing", s.Number, usesText(a, s.Uses))
		}
		if s.Finding != nil && !strings.Contains(flat, squash(findingResultText(s.Finding))[:25]) {
			t.Errorf("step %d: %q missing", s.Number, findingResultText(s.Finding))
		}
	}
	for _, want := range []string{"Weibull, J. Appl. Mech. 18, 293 (1951)", "Brent", "Calculation steps", "Uses steps"} {
		if !strings.Contains(flat, want) {
			t.Errorf("%q missing", want)
		}
	}
}

// TestReferenceNumbersResolve checks that every source number cited in
// the calculation record has its entry in the reference list, and that a
// long source is printed in full once only.
func TestReferenceNumbersResolve(t *testing.T) {
	a := assess(t, "typical_design.json")
	text := squash(pdfText(t, writeTemp(t, "refs.pdf", render(t, loadMeta(t, "meta_a.json"), a, Options{Appendix: true}))))
	long := map[string]bool{}
	for _, s := range a.Trace() {
		for _, src := range append([]string{s.Source}, valueSources(s)...) {
			if len([]rune(src)) > shortSource {
				long[src] = true
			}
		}
	}
	_, refs, ok := strings.Cut(text, "Sources cited in the calculation record by number")
	if !ok {
		t.Fatal("reference list missing")
	}
	for n := 1; n <= len(long); n++ {
		if !strings.Contains(refs, fmt.Sprintf("[%d]", n)) {
			t.Errorf("reference [%d] has no entry (%d sources)", n, len(long))
		}
	}
	if strings.Contains(refs, fmt.Sprintf("[%d]", len(long)+1)) {
		t.Errorf("more than %d references listed", len(long))
	}
	_, annex, _ := strings.Cut(text, "Appendix: Calculation record")
	for src := range long {
		// A source may also be part of a longer one (a limit's value and
		// citation inside the finding's source): each such one adds one.
		within := 0
		for other := range long {
			if strings.Contains(squash(other), squash(src)) {
				within++
			}
		}
		if c := strings.Count(annex, squash(src)); c > within {
			t.Errorf("source %.50q printed %d times in the annex, want once", src, c)
		}
	}
}

func valueSources(s hazards.Step) []string {
	var out []string
	for _, v := range append(append([]hazards.Value{s.Result}, s.Inputs...), s.Intermediate...) {
		out = append(out, v.Source)
	}
	return out
}
