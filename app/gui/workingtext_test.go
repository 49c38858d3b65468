package gui

import (
	"strings"
	"testing"

	"ullage/hazards"
)

// sampleRecord is a small calculation record made up for the tests: the
// numbers are arbitrary, chosen to show the six-figure formatting.
func sampleRecord() *hazards.Assessment {
	return hazards.RecordOnly([]hazards.Step{
		{Number: 1, Stage: hazards.StageStress, Title: "Hoop stress, bulb", Method: "thin-wall sphere membrane stress",
			Equation: "σ = ΔP · r_m /(2t)",
			Inputs: []hazards.Value{
				{Symbol: "ΔP", Value: 123456.789, Unit: "Pa", Source: "hottest pressure minus ambient"},
				{Symbol: "t", Value: 0.0016, Unit: "m", Source: "design input"}},
			Intermediate: []hazards.Value{{Symbol: "σ per pascal", Value: 12.3456789}},
			Result:       hazards.Value{Symbol: "σ", Value: 1.23456789e7, Unit: "Pa"},
			Source:       "thin-shell theory"},
		{Number: 2, Stage: hazards.StageLimits, Title: "Maximum safe temperature", Method: "Brent's method",
			Equation: "P(T) − P_allow = 0",
			Result:   hazards.Value{Symbol: "T_max", Value: 456.2371, Unit: "K"},
			Root:     &hazards.RootRecord{Equation: "P(T) − P_allow = 0", Lo: 244.15, Hi: 470.165, Unit: "K", Tolerance: 1e-4, Residual: -2e-6, Evaluations: 8},
			Source:   "Brent (1973)", Extrapolated: true},
		{Number: 3, Stage: hazards.StageFindings, Title: "Burst safety factor", Method: "comparison with the criterion",
			Uses:    []int{1},
			Finding: &hazards.FindingResult{Status: hazards.StatusPass, Value: 2.5, Limit: 2, Direction: hazards.AtLeast, Margin: 0.25},
			Note:    "Passes with room to spare."},
	})
}

func TestWorkingTextLaysOutEachStep(t *testing.T) {
	a := sampleRecord()
	tests := []struct {
		name    string
		heading string
		steps   []int
		want    []string
		notWant []string
	}{
		{"finding and what it rests on", "Burst safety factor — PASS", []int{3, 1},
			[]string{
				"Working: Burst safety factor — PASS\n",
				"Steps 3 and 1 of the calculation record (3 steps)",
				"Step 3. Burst safety factor\n",
				"  Uses:          step 1, Hoop stress, bulb\n",
				"  Result:        PASS: value 2.5, limit at least 2, margin 25 % of the limit\n", // as the record words it
				"  Note:          Passes with room to spare.\n",
				"Step 1. Hoop stress, bulb\n",
				"  Equation:      σ = ΔP · r_m /(2t)\n",
				"  Given:         ΔP = 123457 Pa   [hottest pressure minus ambient]\n",
				"                 t = 0.0016 m   [design input]\n",
				"  Along the way: σ per pascal = 12.3457\n",
				"  Result:        σ = 1.23457 × 10⁷ Pa\n",
				"  Source:        thin-shell theory\n",
			},
			[]string{"Step 2.", "STRESSES"}},
		{"root-found step", "Maximum safe temperature", []int{2},
			[]string{
				"Step 2 of the calculation record",
				"Step 2. Maximum safe temperature  ‡ outside a correlation's published range\n",
				"  Root found:    P(T) − P_allow = 0 solved over [244.15, 470.165] K, tolerance 1 × 10⁻⁴ K, residual −2 × 10⁻⁶, 8 evaluations\n",
				"  Result:        T_max = 456.237 K\n",
			}, nil},
		{"whole record under stage headings", "Whole calculation record", nil,
			[]string{"Whole calculation record\n", "The whole calculation record, 3 steps", "\nSTRESSES\n", "\nLIMITS FOUND BY ROOT-FINDING\n", "\nFINDINGS\n", "Step 1.", "Step 2.", "Step 3."},
			[]string{"Working:"}},
		{"numbers the record lacks are skipped", "", []int{9, 1, 0},
			[]string{"Step 1. Hoop stress"}, []string{"Step 9", "Step 0"}},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			got := WorkingText(a, tc.heading, tc.steps)
			for _, w := range tc.want {
				if !strings.Contains(got, w) {
					t.Errorf("WorkingText lacks %q; got:\n%s", w, got)
				}
			}
			for _, w := range tc.notWant {
				if strings.Contains(got, w) {
					t.Errorf("WorkingText has %q; got:\n%s", w, got)
				}
			}
		})
	}
	if got := WorkingText(nil, "x", nil); got != "" {
		t.Errorf("WorkingText(nil) = %q, want empty", got)
	}
}

func TestWorkingTextOfTheExample(t *testing.T) {
	h := newHarness(t)
	a := h.s.last.assessment
	for _, f := range a.Findings {
		if len(f.Steps()) == 0 {
			t.Errorf("finding %s names no steps", f.Criterion)
			continue
		}
		text := WorkingText(a, f.Title, f.Steps())
		for _, n := range f.Steps() {
			st := a.Trace()[n-1]
			if !strings.Contains(text, stepHeading(st)) || !strings.Contains(text, st.Equation) {
				t.Errorf("%s: the text lacks step %d or its equation %q", f.Criterion, n, st.Equation)
			}
		}
		if strings.Contains(text, "NaN") {
			t.Errorf("%s: NaN in the working", f.Criterion)
		}
	}
	whole := WorkingText(a, "", nil)
	if got := strings.Count(whole, "\nStep "); got != len(a.Trace()) {
		t.Errorf("the whole record has %d steps, want %d", got, len(a.Trace()))
	}
}

func TestStepsPhrase(t *testing.T) {
	tests := []struct {
		in   []int
		want string
	}{
		{nil, "no steps"}, {[]int{4}, "step 4"}, {[]int{4, 2}, "steps 4 and 2"}, {[]int{34, 21, 20, 14}, "steps 34, 21, 20 and 14"},
	}
	for _, tc := range tests {
		if got := stepsPhrase(tc.in); got != tc.want {
			t.Errorf("stepsPhrase(%v) = %q, want %q", tc.in, got, tc.want)
		}
	}
}
