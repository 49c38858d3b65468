package report

import (
	"fmt"
	"strconv"
	"strings"

	"ullage/hazards"
	"ullage/report/display"
)

// calculationRecord prints the appendix that walks through the engine's
// trace in the order a hand check follows: fluid properties, vessel
// state, stresses, allowable stress, safety factor and failure
// probability, limits, rupture, release, findings. Each step carries its
// number so that a reviewer can write "checked, step 14" in the margin.
// Values are printed in SI, as computed, with six significant figures.
func (w *assessmentWriter) calculationRecord() {
	d := w.d
	if len(w.a.Trace()) == 0 {
		return
	}
	d.newPage()
	d.heading("Appendix: Calculation record")
	d.lead("Every result in this record, step by step: the method by its published name, the equation as written in its source, the values substituted (SI units, as computed) and the result. Root-found results give the equation solved, the bracket searched, the tolerance and the residual. Each finding lists the steps behind it; long sources are cited by number and listed at the end of this annex.")
	w.refs = &references{index: map[string]int{}}
	stage := ""
	for _, s := range w.a.Trace() {
		if s.Stage != stage {
			stage = s.Stage
			d.subheading(stage)
		}
		w.traceStep(s)
	}
	d.subheading("References")
	d.lead("Sources cited in the calculation record by number, each once.")
	rows := make([][]cell, len(w.refs.list))
	for i, r := range w.refs.list {
		rows[i] = []cell{{text: fmt.Sprintf("[%d]", i+1), dim: true}, {text: r, italic: true}}
	}
	d.drawTable(table{cols: []col{{"", 0.08, 'L'}, {"", 0.92, 'L'}}, rows: rows, noHeader: true, size: 7.5})
}

// references numbers the sources of the calculation record in the order
// they are first cited.
type references struct {
	list  []string
	index map[string]int
}

// shortSource is the longest source printed in full at each use; a longer
// one is cited by its number in the reference list.
const shortSource = 40

// number returns "[n]" for any source, numbering it on first use: a list
// of the limits' sources, where even a short source is cited by number.
func (r *references) number(source string) string {
	n, ok := r.index[source]
	if !ok {
		r.list = append(r.list, source)
		n = len(r.list)
		r.index[source] = n
	}
	return fmt.Sprintf("[%d]", n)
}

// sourceList prints a numbered list of sources under a subheading.
func (d *doc) sourceList(title string, list []string) {
	if len(list) == 0 {
		return
	}
	rows := make([][]cell, len(list))
	for i, r := range list {
		rows[i] = []cell{{text: fmt.Sprintf("[%d]", i+1), dim: true}, {text: r, italic: true}}
	}
	d.subheading(title)
	d.drawTable(table{cols: []col{{"", 0.07, 'L'}, {"", 0.93, 'L'}}, rows: rows, noHeader: true, size: 7})
}

// cite returns "[n]" for a long source, numbering it on first use, or the
// source itself when it is short ("design input", "definition").
func (r *references) cite(source string) string {
	if r == nil || len([]rune(source)) <= shortSource {
		return source
	}
	n, ok := r.index[source]
	if !ok {
		r.list = append(r.list, source)
		n = len(r.list)
		r.index[source] = n
	}
	return fmt.Sprintf("[%d]", n)
}

func (w *assessmentWriter) traceStep(s hazards.Step) {
	d := w.d
	title := fmt.Sprintf("Step %d.  %s", s.Number, minusSigns(s.Title))
	if s.Extrapolated {
		title += "  ‡"
	}
	rows := [][]cell{
		{{text: "Method", dim: true}, {text: s.Method}},
		{{text: "Equation", dim: true}, {text: s.Equation, mono: true}},
	}
	if len(s.Uses) > 0 {
		rows = append(rows, []cell{{text: "Uses", dim: true}, {text: usesText(w.a, s.Uses)}})
	}
	for _, v := range s.Inputs {
		rows = append(rows, []cell{{text: v.Symbol, dim: true}, {text: w.traceValue(v)}})
	}
	for _, v := range s.Intermediate {
		rows = append(rows, []cell{{text: v.Symbol, dim: true, italic: true}, {text: w.traceValue(v), italic: true}})
	}
	if f := s.Finding; f != nil {
		rows = append(rows, []cell{{text: "Result", bold: true}, {text: findingResultText(f), bold: true}})
	} else {
		rows = append(rows, []cell{{text: "Result", bold: true}, {text: w.traceValue(s.Result), bold: true}})
	}
	if s.Root != nil {
		r := s.Root
		text := fmt.Sprintf("solved %s over [%s, %s] %s, tolerance %s, residual %s, %d evaluations (%s)",
			r.Equation, g6(r.Lo), g6(r.Hi), r.Unit, g6(r.Tolerance), g6(r.Residual), r.Evaluations, r.Bound)
		rows = append(rows, []cell{{text: "Root", dim: true}, {text: text}})
	}
	rows = append(rows, []cell{{text: "Source", dim: true}, {text: w.refs.cite(s.Source), italic: true}})
	if s.Note != "" {
		rows = append(rows, []cell{{text: "Note", dim: true}, {text: s.Note, italic: true}})
	}
	d.subheadingSmall(title)
	d.drawTable(table{cols: []col{{"", 0.22, 'L'}, {"", 0.78, 'L'}}, rows: rows, noHeader: true, size: 7.5, keep: 3})
	d.space(1.5)
}

// usesText is "steps 13 and 14 (Vessel at the hottest temperature …;
// Liquid-full temperature)": the steps whose results a step takes.
func usesText(a *hazards.Assessment, steps []int) string {
	var titles []string
	for _, n := range steps {
		if n >= 1 && n <= len(a.Trace()) {
			titles = append(titles, a.Trace()[n-1].Title)
		}
	}
	text := display.StepsPhrase(steps)
	if len(titles) > 0 {
		text += " (" + strings.Join(titles, "; ") + ")"
	}
	return text
}

// findingResultText is a finding's outcome in words, in SI as computed
// (display.StepFindingText).
func findingResultText(f *hazards.FindingResult) string { return display.StepFindingText(f) }

// traceValue prints a value with its unit and source, a long source by
// its number in the reference list.
func (w *assessmentWriter) traceValue(v hazards.Value) string {
	s := g6(v.Value)
	if v.Unit != "" {
		s += " " + v.Unit
	}
	if v.Source != "" {
		if c := w.refs.cite(v.Source); c != v.Source {
			s += "   " + c
		} else {
			s += "   (" + c + ")"
		}
	}
	return s
}

// g6 formats a number of the calculation record (display.RecordNumber).
func g6(x float64) string { return display.RecordNumber(x) }

// minusSigns writes a hyphen-minus that stands before a digit at the start
// of a word ("(-29.0 °C)") as the minus sign the rest of the record uses.
func minusSigns(s string) string {
	if !strings.Contains(s, "-") {
		return s
	}
	r := []rune(s)
	for i := range r {
		if r[i] == '-' && i+1 < len(r) && r[i+1] >= '0' && r[i+1] <= '9' && (i == 0 || strings.ContainsRune(" ([=", r[i-1])) {
			r[i] = '−'
		}
	}
	return string(r)
}

// stepNumbers names the calculation record's steps behind a finding in
// a few words: "calculation steps 50, 13, 14".
func stepNumbers(steps []int) string {
	if len(steps) == 0 {
		return ""
	}
	parts := make([]string, len(steps))
	for i, n := range steps {
		parts[i] = strconv.Itoa(n)
	}
	word := "calculation steps "
	if len(steps) == 1 {
		word = "calculation step "
	}
	return word + strings.Join(parts, ", ")
}
