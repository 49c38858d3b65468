package gui

import (
	"fmt"
	"strings"
	"ullage/report/display"

	"ullage/hazards"
)

// lineKind says how a line of a working step is set: the equation in a
// fixed-width face, the result in bold, sources and notes dimmed.
type lineKind int

const (
	linePlain lineKind = iota
	lineEquation
	lineValue
	lineIntermediate
	lineResult
	lineDim
)

// stepLine is one line of a working step: a label ("Method", "Given" …,
// empty to continue the line above), the text, and a note printed after
// it (a value's source).
type stepLine struct {
	label, text, note string
	kind              lineKind
}

// Labels of the lines of a working step.
const (
	labelMethod       = "Method"
	labelEquation     = "Equation"
	labelUses         = "Uses"
	labelGiven        = "Given"
	labelIntermediate = "Along the way"
	labelResult       = "Result"
	labelRoot         = "Root found"
	labelSource       = "Source"
	labelNote         = "Note"
)

// stepHeading is a step's number and title, marked ‡ when a correlation
// was used outside its range.
func stepHeading(s hazards.Step) string {
	h := fmt.Sprintf("Step %d. %s", s.Number, s.Title)
	if s.Extrapolated {
		h += "  ‡ outside a correlation's published range"
	}
	return h
}

// stepLines lays a step of a's calculation record out line by line, in
// SI units as computed, to six significant figures: the method, the
// equation as written, the values substituted with their units and
// sources, the intermediate values, the result, the root-finding record,
// the source and the note.
func stepLines(a *hazards.Assessment, s hazards.Step) []stepLine {
	var out []stepLine
	add := func(label, text, note string, kind lineKind) {
		out = append(out, stepLine{label: label, text: text, note: note, kind: kind})
	}
	if s.Method != "" {
		add(labelMethod, s.Method, "", linePlain)
	}
	if s.Equation != "" {
		add(labelEquation, s.Equation, "", lineEquation)
	}
	uses := labelUses
	for _, n := range s.Uses {
		add(uses, stepReference(a, n), "", linePlain)
		uses = ""
	}
	given := labelGiven
	for _, v := range s.Inputs {
		add(given, valueText(v), v.Source, lineValue)
		given = ""
	}
	along := labelIntermediate
	for _, v := range s.Intermediate {
		add(along, valueText(v), v.Source, lineIntermediate)
		along = ""
	}
	add(labelResult, stepResultText(s), "", lineResult)
	if r := s.Root; r != nil {
		add(labelRoot, rootText(r), "", linePlain)
	}
	if s.Source != "" {
		add(labelSource, s.Source, "", lineDim)
	}
	if s.Note != "" {
		add(labelNote, s.Note, "", lineDim)
	}
	return out
}

// stepReference names another step of the record: "step 33, Burst
// safety factor".
func stepReference(a *hazards.Assessment, n int) string {
	if n >= 1 && n <= len(a.Trace()) {
		return fmt.Sprintf("step %d, %s", n, a.Trace()[n-1].Title)
	}
	return fmt.Sprintf("step %d", n)
}

// valueText is "symbol = value unit", the value to six significant
// figures.
func valueText(v hazards.Value) string {
	s := six(v.Value)
	if v.Unit != "" {
		s += " " + v.Unit
	}
	if v.Symbol == "" {
		return s
	}
	return v.Symbol + " = " + s
}

// stepResultText is a step's result; a finding's result is its status,
// its value, its limit and its margin (display.StepFindingText).
func stepResultText(s hazards.Step) string {
	if s.Finding == nil {
		return valueText(s.Result)
	}
	return display.StepFindingText(s.Finding)
}

// rootText says how a root was found.
func rootText(r *hazards.RootRecord) string {
	unit := ""
	if r.Unit != "" {
		unit = " " + r.Unit
	}
	text := fmt.Sprintf("%s solved over [%s, %s]%s", r.Equation, six(r.Lo), six(r.Hi), unit)
	if r.Tolerance > 0 {
		text += ", tolerance " + six(r.Tolerance) + unit
	}
	text += ", residual " + six(r.Residual)
	if r.Evaluations > 0 {
		text += ", " + plural(r.Evaluations, "evaluation")
	}
	switch r.Bound {
	case hazards.BoundAbove:
		text += "; the limit holds over the whole bracket, so the answer is its upper end"
	case hazards.BoundBelow:
		text += "; the limit is already exceeded at the bottom of the bracket"
	}
	return text
}

// six writes a number of the calculation record as the PDF does
// (display.RecordNumber).
func six(x float64) string { return display.RecordNumber(x) }

// stepsPhrase is "steps 45, 33 and 31" (display.StepsPhrase).
func stepsPhrase(steps []int) string { return display.StepsPhrase(steps) }

// pickSteps returns the steps of a's record with the given numbers, in
// the order given, skipping numbers the record does not hold; with no
// numbers it returns the whole record.
func pickSteps(a *hazards.Assessment, numbers []int) []hazards.Step {
	if len(numbers) == 0 {
		return a.Trace()
	}
	var out []hazards.Step
	for _, n := range numbers {
		if n >= 1 && n <= len(a.Trace()) {
			out = append(out, a.Trace()[n-1])
		}
	}
	return out
}

// workingSummary says which steps are shown and in what units.
func workingSummary(a *hazards.Assessment, numbers []int) string {
	total := plural(len(a.Trace()), "step")
	if len(numbers) == 0 {
		return "The whole calculation record, " + total + ", in the order a hand check follows. SI units as computed, six significant figures."
	}
	return fmt.Sprintf("%s of the calculation record (%s), the result first and then what it rests on. SI units as computed, six significant figures.",
		capitalise(stepsPhrase(numbers)), total)
}

func capitalise(s string) string {
	if s == "" {
		return s
	}
	return strings.ToUpper(s[:1]) + s[1:]
}

// WorkingText returns the working behind a result of an assessment as
// plain text, as the "Copy as text" button puts it on the clipboard: the
// heading, a line saying which steps follow, then each of the numbered
// steps of a.Trace() given in steps, in that order, with its method, the
// equation as written in its source, the values substituted (SI units, as
// computed, six significant figures) with their sources, the intermediate
// values, the result, the root-finding record where there is one, the
// source and any note. With no step numbers it writes the whole record,
// under the headings of its stages. Numbers the record does not hold are
// skipped; a nil assessment gives "".
func WorkingText(a *hazards.Assessment, heading string, steps []int) string {
	if a == nil {
		return ""
	}
	var b strings.Builder
	switch {
	case heading != "" && len(steps) == 0:
		b.WriteString(heading + "\n")
	case heading != "":
		b.WriteString("Working: " + heading + "\n")
	}
	b.WriteString(workingSummary(a, steps) + "\n")
	width := 0
	for _, l := range []string{labelMethod, labelEquation, labelUses, labelGiven, labelIntermediate, labelResult, labelRoot, labelSource, labelNote} {
		width = max(width, len([]rune(l)))
	}
	stage := ""
	for _, s := range pickSteps(a, steps) {
		if len(steps) == 0 && s.Stage != stage {
			stage = s.Stage
			b.WriteString("\n" + strings.ToUpper(stage) + "\n")
		}
		b.WriteString("\n" + stepHeading(s) + "\n")
		for _, l := range stepLines(a, s) {
			label := ""
			if l.label != "" {
				label = l.label + ":"
			}
			b.WriteString("  " + label + strings.Repeat(" ", width+2-len([]rune(label))) + l.text)
			if l.note != "" {
				b.WriteString("   [" + l.note + "]")
			}
			b.WriteString("\n")
		}
	}
	return b.String()
}
