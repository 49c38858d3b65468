package gui

import (
	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"

	"ullage/hazards"
	"ullage/hazards/compare"
	"ullage/report/chartmodel"
	"ullage/report/display"
)

// comparePanel sets any two revisions (or a revision and the working
// copy) side by side: status changes first, then the inputs and results
// in two columns with the differences marked, and both pressure curves on
// one chart.
type comparePanel struct {
	s            *session
	pickA, pickB *widget.Select
	onlyChanged  *widget.Check
	options      map[string]string // option text → revision label ("" = working copy)

	statusBox *fyne.Container
	verdicts  *widget.Label
	inputs    *fyne.Container
	results   *fyne.Container
	chart     *chart
	export    *widget.Button

	// cmp is the last comparison shown; nil before the first.
	cmp        *compare.Comparison
	outA, outB outcome
	gen        int
	// shown, set by the window, reports whether the screen is in front;
	// behind, the comparison is drawn when it is brought forward
	// (pending until then).
	shown   func() bool
	pending bool
	object  fyne.CanvasObject
}

// Columns of the comparison tables: name, A, B, change.
var compareColumns = columns{fractions: []float32{0.38, 0.25, 0.25, 0.12}}

// newComparePanel builds the "Compare revisions" screen.
func newComparePanel(s *session) *comparePanel {
	c := &comparePanel{s: s, options: map[string]string{}}
	s.cmp = c
	s.changes.subscribe(c.update)
	c.pickA = widget.NewSelect(nil, func(string) { c.compute() })
	c.pickB = widget.NewSelect(nil, func(string) { c.compute() })
	c.onlyChanged = widget.NewCheck("Show only what changed", func(bool) { c.render() })
	c.statusBox = container.NewVBox()
	c.verdicts = widget.NewLabel("")
	c.verdicts.TextStyle = fyne.TextStyle{Bold: true}
	c.inputs = container.NewVBox()
	c.results = container.NewVBox()
	c.chart = newChart()
	c.export = widget.NewButtonWithIcon("Export comparison PDF…", theme.DocumentPrintIcon(), s.exportComparisonDialog)
	bar := container.NewHBox(
		widget.NewLabel("Earlier:"), container.New(fixedWidth{230}, c.pickA),
		widget.NewLabel("Later:"), container.New(fixedWidth{230}, c.pickB),
		c.onlyChanged, c.export)
	left := container.NewVScroll(container.NewVBox(
		c.statusBox, c.verdicts,
		sectionHeading("Inputs"), c.inputs,
		sectionHeading("Results"), c.results,
	))
	split := container.NewHSplit(left, c.chart)
	split.SetOffset(0.55)
	c.object = container.NewBorder(bar, nil, nil, nil, split)
	return c
}

// sectionHeading is a bold heading with a rule under it.
func sectionHeading(t string) fyne.CanvasObject {
	h := widget.NewLabelWithStyle(t, fyne.TextAlignLeading, fyne.TextStyle{Bold: true})
	h.SizeName = theme.SizeNameSubHeadingText
	return container.NewVBox(h, widget.NewSeparator())
}

// update compares again when the revisions, the working copy as a whole
// or the units changed.
func (c *comparePanel) update(ch change) {
	if ch.cause.reload() || ch.cause == causeKept {
		c.refresh()
	}
}

// refresh rebuilds the choice of revisions and compares again.
func (c *comparePanel) refresh() {
	doc := c.s.doc
	if doc == nil {
		return
	}
	c.options = map[string]string{}
	var opts []string
	for _, r := range doc.File.Revisions {
		o := "Revision " + r.Label + " (" + r.Date + ")"
		c.options[o] = r.Label
		opts = append(opts, o)
	}
	c.options[workingCopyLabel] = ""
	opts = append(opts, workingCopyLabel)
	keepA, keepB := c.pickA.Selected, c.pickB.Selected
	c.pickA.Options, c.pickB.Options = opts, opts
	if _, ok := c.options[keepA]; !ok || keepA == "" {
		keepA = opts[max(len(opts)-3, 0)]
	}
	if _, ok := c.options[keepB]; !ok || keepB == "" {
		keepB = opts[max(len(opts)-2, 0)]
	}
	if keepA == keepB && len(opts) > 1 {
		keepA, keepB = opts[len(opts)-2], opts[len(opts)-1]
	}
	showSelected(c.pickA, keepA)
	showSelected(c.pickB, keepB)
	c.compute()
}

// pickTwo selects two sides by revision label ("" for the working copy).
func (c *comparePanel) pickTwo(a, b string) {
	find := func(label string) string {
		for o, l := range c.options {
			if l == label {
				return o
			}
		}
		return ""
	}
	for _, x := range []struct {
		pick  *widget.Select
		label string
	}{{c.pickA, a}, {c.pickB, b}} {
		if o := find(x.label); o != "" {
			showSelected(x.pick, o)
		}
	}
	c.compute()
}

// side returns the design and label behind an option.
func (c *comparePanel) side(opt string) (hazards.Design, string, bool) {
	label, ok := c.options[opt]
	if !ok {
		return hazards.Design{}, "", false
	}
	if label == "" {
		return cloneDesign(c.s.doc.Work), "working copy", true
	}
	r, err := c.s.doc.File.Find(label)
	if err != nil {
		return hazards.Design{}, "", false
	}
	return cloneDesign(r.Design), "revision " + label, true
}

// compute assesses both sides off the UI goroutine and shows them.
func (c *comparePanel) compute() {
	if c.s.doc == nil {
		return
	}
	da, la, okA := c.side(c.pickA.Selected)
	db, lb, okB := c.side(c.pickB.Selected)
	if !okA || !okB {
		return
	}
	if msg := c.pairProblem(); msg != "" {
		c.refusePair(msg)
		return
	}
	// Until both sides are assessed, nothing of the pair before can be
	// exported under the new pair's names.
	c.s.compared = nil
	c.gen++
	gen := c.gen
	lib := c.s.lib
	labelA, labelB := c.options[c.pickA.Selected], c.options[c.pickB.Selected]
	background(c.s.assess, func() [2]outcome {
		return [2]outcome{evaluate(da, lib), evaluate(db, lib)}
	}, func(o [2]outcome) {
		if gen != c.gen {
			return
		}
		c.outA, c.outB = o[0], o[1]
		cmp := compare.Compare(
			compare.Side{Label: la, Design: da, Assessment: o[0].assessment},
			compare.Side{Label: lb, Design: db, Assessment: o[1].assessment})
		c.cmp = &cmp
		c.s.compared = nil
		if o[0].assessment != nil && o[1].assessment != nil {
			c.s.compared = &comparedPair{cmp: &cmp, labelA: labelA, labelB: labelB}
		}
		c.render()
	})
}

// render draws the last comparison in the current units, or, while the
// screen is behind, leaves it to be drawn when it comes forward.
func (c *comparePanel) render() {
	if c.shown != nil && !c.shown() {
		c.pending = true
		return
	}
	c.pending = false
	cmp := c.cmp
	if cmp == nil {
		return
	}
	u := c.s.units()
	c.statusBox.Objects = statusChangeRows(cmp)
	c.statusBox.Refresh()
	setText(c.verdicts, "Verdict: "+verdictText(c.outA)+" ("+cmp.A.Label+")  →  "+verdictText(c.outB)+" ("+cmp.B.Label+")")

	only := c.onlyChanged.Checked
	rows := []fyne.CanvasObject{compareHeader("Input", cmp.A.Label, cmp.B.Label)}
	for _, r := range inputRows(&cmp.A.Design, &cmp.B.Design, c.s.lib, u) {
		if only && !r.Changed {
			continue
		}
		mark := ""
		if r.Changed {
			mark = "changed"
		}
		rows = append(rows, compareLine(r.Label, r.A, r.B, mark, r.Changed))
	}
	c.inputs.Objects = rows
	c.inputs.Refresh()

	rrows := []fyne.CanvasObject{compareHeader("Result", cmp.A.Label, cmp.B.Label)}
	for _, r := range cmp.Results {
		if only && !r.Changed() {
			continue
		}
		mark := ""
		switch {
		case r.Better:
			mark = "better"
		case r.Worse:
			mark = "worse"
		case r.Changed():
			mark = "changed"
		}
		rrows = append(rrows, compareLine(r.Name, display.ResultValue(r, r.Old, u.display()), display.ResultValue(r, r.New, u.display()), mark, r.Changed()))
	}
	c.results.Objects = rrows
	c.results.Refresh()

	spec := chartmodel.Pressure("Pressure against temperature, both sides",
		[]chartmodel.Side{{Name: cmp.A.Label, A: c.outA.assessment}, {Name: cmp.B.Label, A: c.outB.assessment}}, u.chartUnits())
	c.chart.set(spec, false)
}

// bringForward draws the comparison left to draw while the screen was
// behind.
func (c *comparePanel) bringForward() {
	if c.pending {
		c.render()
	}
}

// verdictText is an outcome's verdict in words.
func verdictText(o outcome) string {
	if o.assessment == nil {
		if o.err != nil {
			return "NOT ASSESSED"
		}
		return "…"
	}
	return statusWord(o.assessment.Verdict)
}

// statusChangeRows lists the findings that changed status, first thing
// on the screen.
func statusChangeRows(cmp *compare.Comparison) []fyne.CanvasObject {
	if len(cmp.Statuses) == 0 {
		return []fyne.CanvasObject{widget.NewLabelWithStyle("No finding changed status.", fyne.TextAlignLeading, fyne.TextStyle{Bold: true})}
	}
	objs := []fyne.CanvasObject{sectionHeading(plural(len(cmp.Statuses), "finding") + " changed status")}
	for _, st := range cmp.Statuses {
		objs = append(objs, container.NewHBox(
			statusChip(st.Old), widget.NewLabel("→"), statusChip(st.New),
			widget.NewLabel(st.Title)))
	}
	return objs
}

// statusChip is a status as icon and word; "absent" for a criterion one
// side does not have.
func statusChip(s hazards.Status) fyne.CanvasObject {
	if s == compare.StatusAbsent {
		return widget.NewLabel("(not assessed)")
	}
	w := widget.NewLabelWithStyle(statusWord(s), fyne.TextAlignLeading, fyne.TextStyle{Bold: true})
	w.Importance = statusImportance(s, false)
	return container.NewHBox(widget.NewIcon(statusIcon(s)), w)
}

func compareHeader(name, a, b string) fyne.CanvasObject {
	return container.New(compareColumns, bold(name), bold(a), bold(b), bold(""))
}

// compareLine is one row; changed values are bold and marked in words.
func compareLine(name, a, b, mark string, changed bool) fyne.CanvasObject {
	cell := func(s string, strong bool) *widget.Label {
		l := widget.NewLabelWithStyle(s, fyne.TextAlignLeading, fyne.TextStyle{Bold: strong})
		l.Wrapping = fyne.TextWrapWord
		return l
	}
	m := cell(mark, true)
	switch mark {
	case "better":
		m.Importance = widget.SuccessImportance
	case "worse":
		m.Importance = widget.DangerImportance
	case "changed":
		m.Importance = widget.WarningImportance
	}
	return container.New(compareColumns, cell(name, false), cell(a, false), cell(b, changed), m)
}

// comparedPair is a comparison on the compare screen with both sides
// assessed, as the comparison record is made from it: the comparison and
// the revision labels of its sides ("" for the working copy).
type comparedPair struct {
	cmp            *compare.Comparison
	labelA, labelB string
}

// current returns the comparison shown, for export, when both sides
// were assessed.
func (c *comparePanel) current() (*compare.Comparison, bool) {
	if p := c.s.compared; p != nil {
		return p.cmp, true
	}
	return nil, false
}
