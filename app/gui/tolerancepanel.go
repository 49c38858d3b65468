package gui

import (
	"context"
	"errors"
	"fmt"
	"strings"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/canvas"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"

	"ullage/app/parse"
	"ullage/hazards"
	"ullage/hazards/tolerance"
	"ullage/report/chartmodel"
	"ullage/report/display"
)

// Defaults of the study's settings.
const (
	defaultStudyUnits = 100_000
	defaultStudySeed  = 1
)

// maxStudySpreadK is the largest ± spread of the hottest temperature a
// study takes, in kelvin.
const maxStudySpreadK = 100

// tolerancePanel is the tolerance study screen: the study's settings and
// Run and Cancel on the left, the fractions of units that fail with their
// intervals, the spread of pressure and safety factor, a histogram and
// the ranked drivers of the margin on the right.
type tolerancePanel struct {
	s  *session
	st study

	units, seed, spread *widget.Entry
	spreadUnit          *widget.Label
	hotDist, dimDist    *widget.Select
	varies              *widget.Label
	problem             *widget.Label
	runBtn, cancelBtn   *widget.Button
	busy                *widget.ProgressBar
	status              *widget.Label

	// spreadK is the ± spread of the hottest temperature in kelvin, as
	// last read; shownUnits the unit system the spread entry is in.
	spreadK    float64
	shownUnits unitSystem

	empty     *widget.Label
	staleBox  *fyne.Container
	about     *widget.Label
	fractions *fyne.Container
	spreadTab *fyne.Container
	hist      *chart
	histNote  *widget.Label
	drivers   *chart
	driveNote *widget.Label
	inputs    *fyne.Container
	results   *fyne.Container
	scroll    *container.Scroll
	// afterRun, when set, runs once after the next study ends.
	afterRun func()

	object fyne.CanvasObject
}

// newTolerancePanel builds the study screen.
func newTolerancePanel(s *session) *tolerancePanel {
	tp := &tolerancePanel{s: s, shownUnits: s.units()}
	s.tol = tp
	s.changes.subscribe(tp.update)
	tp.units = widget.NewEntry()
	tp.units.SetText(fmt.Sprint(defaultStudyUnits))
	tp.units.Validator = func(t string) error { _, err := readStudyUnits(t); return err }
	tp.seed = widget.NewEntry()
	tp.seed.SetText(fmt.Sprint(defaultStudySeed))
	tp.seed.Validator = func(t string) error { _, err := readStudySeed(t); return err }
	tp.spread = widget.NewEntry()
	tp.spread.SetText("0")
	tp.spread.Validator = func(t string) error { _, err := readStudySpread(t, tp.s.units()); return err }
	tp.spread.OnChanged = func(string) { tp.showVaries() }
	tp.spreadUnit = widget.NewLabel(spreadUnit(s.units()))
	names := []string{distributionNames[tolerance.Normal], distributionNames[tolerance.Uniform], distributionNames[tolerance.Triangle]}
	tp.hotDist = widget.NewSelect(names, nil)
	tp.hotDist.SetSelected(names[0])
	tp.dimDist = widget.NewSelect(names[:2], nil)
	tp.dimDist.SetSelected(names[0])

	form := widget.NewForm(
		&widget.FormItem{Text: "Units to draw", Widget: tp.units, HintText: "1 to " + display.Count(tolerance.MaxSamples)},
		&widget.FormItem{Text: "Seed", Widget: tp.seed, HintText: "the same seed gives the same numbers"},
		&widget.FormItem{Text: "Hottest temperature ±", Widget: container.NewBorder(nil, nil, nil, tp.spreadUnit, tp.spread), HintText: "0: every unit at the design's hottest"},
		&widget.FormItem{Text: "Hottest spread as", Widget: tp.hotDist},
		&widget.FormItem{Text: "Fill, volume, walls as", Widget: tp.dimDist, HintText: "the ± tolerances on the design form"},
	)
	intro := widget.NewLabel("Draws many units of the working copy, each with its own fill, walls, hottest temperature and glass strength, and counts those that go liquid-full, burst or would release too much vapour.")
	intro.Wrapping = fyne.TextWrapWord
	tp.varies = widget.NewLabel("")
	tp.varies.Wrapping = fyne.TextWrapWord
	plusMinus := caption(display.PlusMinusNote)
	tp.problem = widget.NewLabel("")
	tp.problem.Wrapping = fyne.TextWrapWord
	tp.problem.Importance = widget.DangerImportance
	tp.problem.Hide()
	tp.runBtn = widget.NewButtonWithIcon("Run the study", theme.MediaPlayIcon(), tp.run)
	tp.runBtn.Importance = widget.HighImportance
	tp.cancelBtn = widget.NewButtonWithIcon("Cancel", theme.CancelIcon(), s.stopStudy)
	tp.cancelBtn.Disable()
	tp.busy = widget.NewProgressBar()
	tp.busy.Hide()
	tp.status = widget.NewLabel("")
	tp.status.Wrapping = fyne.TextWrapWord
	left := container.NewVBox(
		heading("Unit-to-unit variation"), intro, form, tp.problem,
		container.NewGridWithColumns(2, tp.runBtn, tp.cancelBtn), tp.busy, tp.status,
		widget.NewSeparator(), bold("What varies from unit to unit"), tp.varies, plusMinus,
	)

	tp.empty = widget.NewLabel("No study yet. Choose the settings on the left and run it; it takes a second or so.")
	tp.empty.Wrapping = fyne.TextWrapWord
	staleText := widget.NewLabel("OUT OF DATE: the design changed after this study was run. It is left out of the exported record until it is run again.")
	staleText.Wrapping = fyne.TextWrapWord
	staleText.TextStyle = fyne.TextStyle{Bold: true}
	tp.staleBox = container.NewStack(canvas.NewRectangle(tint(statusColour(hazards.StatusCaution), 70)),
		container.NewBorder(nil, nil, widget.NewIcon(theme.NewWarningThemedResource(theme.WarningIcon())), nil, staleText))
	tp.staleBox.Hide()
	tp.about = widget.NewLabel("")
	tp.about.Wrapping = fyne.TextWrapWord
	tp.fractions = container.NewVBox()
	tp.spreadTab = container.NewVBox()
	tp.hist = newChart()
	tp.histNote = caption("")
	tp.drivers = newChart()
	tp.driveNote = caption("")
	tp.inputs = container.NewVBox()
	tp.results = container.NewVBox(
		tp.about,
		heading("Units that fail"), tp.fractions,
		caption("Intervals are 95 % Wilson score intervals (Wilson, J. Am. Stat. Assoc. 22, 209 (1927)). A unit bursts when its own glass strength, a Weibull draw, is below its hoop stress at its hottest temperature. The expected burst fraction averages each unit's failure probability with the strength integrated out: far more precise than the count when bursts are rare."),
		heading("Spread over the units"), tp.spreadTab,
		tp.hist, tp.histNote,
		tp.drivers, tp.driveNote,
		heading("Inputs that varied"), tp.inputs,
	)
	tp.results.Hide()
	right := container.NewVScroll(container.NewPadded(container.NewVBox(tp.staleBox, tp.empty, tp.results)))
	tp.scroll = right

	split := container.NewHSplit(container.NewVScroll(container.NewPadded(left)), right)
	split.SetOffset(0.32)
	tp.object = split
	return tp
}

// heading is a section heading of the study screen.
func heading(s string) *widget.Label {
	l := widget.NewLabelWithStyle(s, fyne.TextAlignLeading, fyne.TextStyle{Bold: true})
	l.SizeName = theme.SizeNameSubHeadingText
	return l
}

// caption is a small wrapped note.
func caption(s string) *widget.Label {
	l := widget.NewLabel(s)
	l.Wrapping = fyne.TextWrapWord
	l.SizeName = theme.SizeNameCaptionText
	return l
}

// readStudyUnits reads the number of units.
func readStudyUnits(t string) (int, error) {
	n, ok := parse.Count(t)
	if !ok || n < 1 || n > tolerance.MaxSamples {
		return 0, fmt.Errorf("units to draw %q: give a whole number from 1 to %s", strings.TrimSpace(t), display.Count(tolerance.MaxSamples))
	}
	return int(n), nil
}

// readStudySeed reads the seed.
func readStudySeed(t string) (uint64, error) {
	n, ok := parse.Count(t)
	if !ok {
		return 0, fmt.Errorf("seed %q: give a whole number, 0 or more", strings.TrimSpace(t))
	}
	return n, nil
}

// readStudySpread reads the hottest temperature's spread, typed in K or
// °F, and returns it in kelvin.
func readStudySpread(t string, u unitSystem) (float64, error) {
	x, ok := parse.Number(t)
	k := u.toSI(qTempDiff, x)
	if !ok || k < 0 || k > maxStudySpreadK {
		return 0, fmt.Errorf("hottest temperature spread %q: give 0 to %s %s", strings.TrimSpace(t), display.Stated(u.fromSI(qTempDiff, maxStudySpreadK)), spreadUnit(u))
	}
	return k, nil
}

// settings reads the study's settings from the panel, or says which
// entry is not acceptable.
func (tp *tolerancePanel) settings() (tolerance.Settings, error) {
	n, err := readStudyUnits(tp.units.Text)
	if err != nil {
		return tolerance.Settings{}, err
	}
	seed, err := readStudySeed(tp.seed.Text)
	if err != nil {
		return tolerance.Settings{}, err
	}
	spread, err := readStudySpread(tp.spread.Text, tp.s.units())
	if err != nil {
		return tolerance.Settings{}, err
	}
	return tolerance.Settings{
		Samples: n, Seed: seed, Workers: studyWorkers(), HottestSpreadK: spread,
		HottestDistribution: distributionOf(tp.hotDist.Selected), DimensionDistribution: distributionOf(tp.dimDist.Selected),
	}, nil
}

// run starts a study of the working copy with the panel's settings.
func (tp *tolerancePanel) run() {
	s := tp.s
	set, err := tp.settings()
	if _, _, unread := s.doc.firstUnread(); err == nil && unread {
		err = errors.New("a field on the design form is not a number: fix the marked input first")
	}
	if err != nil {
		setText(tp.problem, err.Error())
		tp.problem.Show()
		return
	}
	tp.problem.Hide()
	tp.busy.SetValue(0)
	tp.startStudy(set, func() {
		tp.refresh()
		if f := tp.afterRun; f != nil {
			tp.afterRun = nil
			f()
		}
	})
	setText(tp.status, "Drawing "+display.Units(set.Samples)+"…")
	tp.refresh()
}

// showVaries lists what will vary, from the design and the spread typed.
func (tp *tolerancePanel) showVaries() {
	if tp.s.doc == nil {
		return
	}
	k, err := readStudySpread(tp.spread.Text, tp.s.units())
	if err != nil {
		k = tp.spreadK
	}
	tp.spreadK = k
	setText(tp.varies, "• "+strings.Join(variedInputs(&tp.s.doc.Work, k, tp.s.units()), "\n• "))
}

// update redraws the panel when the results or the units changed, or a
// document was opened: a study is out of date once the design differs
// from the one it ran on.
func (tp *tolerancePanel) update(c change) {
	switch {
	case c.cause == causeStop:
		tp.stop()
	case c.cause.reload() || c.cause == causeResults || c.cause == causeStudied:
		tp.refresh()
	}
}

// refresh redraws the panel from the study's state.
func (tp *tolerancePanel) refresh() {
	s, st, last := tp.s, &tp.st, tp.last()
	u := s.units()
	if u != tp.shownUnits {
		tp.shownUnits = u
		tp.spread.SetText(entryText(u.fromSI(qTempDiff, tp.spreadK)))
		setText(tp.spreadUnit, spreadUnit(u))
	}
	tp.showVaries()
	if st.running {
		tp.runBtn.Disable()
		tp.cancelBtn.Enable()
		tp.busy.Show()
	} else {
		tp.runBtn.Enable()
		tp.cancelBtn.Disable()
		tp.busy.Hide()
		switch {
		case errors.Is(st.err, context.Canceled):
			setText(tp.status, "Cancelled. The results shown, if any, are from the run before.")
		case st.err != nil:
			setText(tp.status, "The study could not run: "+st.err.Error())
		case last.result != nil:
			setText(tp.status, "Finished in "+display.Duration(last.took)+".")
		}
	}
	r := last.result
	if r == nil {
		tp.empty.Show()
		tp.results.Hide()
		tp.staleBox.Hide()
		return
	}
	tp.empty.Hide()
	current := tp.current()
	if current {
		tp.staleBox.Hide()
	} else {
		tp.staleBox.Show()
	}
	in := "It goes into the exported assessment record."
	if !current {
		in = "It is out of date and stays out of the exported record."
	}
	setText(tp.about, "Of "+last.of+": "+display.StudyAbout(r, u.display())+" "+in)
	tp.showFractions(r)
	tp.showSpread(r, u)
	hist := chartmodel.Histogram("", r.Histogram)
	tp.hist.set(hist, !current)
	setText(tp.histNote, histogramNotes(hist, r))
	tp.drivers.set(chartmodel.Drivers("", r.Sensitivity), !current)
	setText(tp.driveNote, display.DriversNote(r.Sensitivity, r.SensitivityUnits))
	tp.showInputs(r, u)
	tp.results.Show()
}

// showFractions lists what the study counted, each fraction with its
// interval, and its strongest driver, in the display layer's words.
func (tp *tolerancePanel) showFractions(r *tolerance.Result) {
	var rows [][2]string
	for _, f := range display.StudyFractions(r) {
		rows = append(rows, [2]string{f.Label, f.Value})
	}
	rows = append(rows, [2]string{display.StrongestDriverLabel, display.StrongestDriver(r.Sensitivity)})
	tp.fractions.Objects = pairRows(rows)
	tp.fractions.Refresh()
}

// showSpread tabulates the percentiles of pressure and safety factor.
func (tp *tolerancePanel) showSpread(r *tolerance.Result, u unitSystem) {
	widths := columns{fractions: []float32{0.3, 0.14, 0.14, 0.14, 0.14, 0.14}}
	head := []fyne.CanvasObject{bold("")}
	for _, h := range display.Percentiles {
		head = append(head, widget.NewLabelWithStyle(h, fyne.TextAlignTrailing, fyne.TextStyle{Bold: true}))
	}
	tp.spreadTab.Objects = []fyne.CanvasObject{container.New(widths, head...)}
	for _, sp := range display.StudySpread(r, u.display()) {
		cells := []fyne.CanvasObject{widget.NewLabel(sp.Label)}
		for _, x := range sp.P {
			cells = append(cells, widget.NewLabelWithStyle(x, fyne.TextAlignTrailing, fyne.TextStyle{}))
		}
		tp.spreadTab.Objects = append(tp.spreadTab.Objects, container.New(widths, cells...))
	}
	tp.spreadTab.Refresh()
}

// showInputs lists the inputs that varied and their distributions.
func (tp *tolerancePanel) showInputs(r *tolerance.Result, u unitSystem) {
	var rows [][2]string
	for _, in := range display.StudyInputs(r, u.display()) {
		rows = append(rows, [2]string{in.Label, in.Line()})
	}
	tp.inputs.Objects = pairRows(rows)
	tp.inputs.Refresh()
}

// studyLabelWidth is the label column of the study's results.
const studyLabelWidth = 250

// pairRows lays label and value pairs out as rows of two columns.
func pairRows(rows [][2]string) []fyne.CanvasObject {
	out := make([]fyne.CanvasObject, len(rows))
	for i, r := range rows {
		v := widget.NewLabelWithStyle(r[1], fyne.TextAlignLeading, fyne.TextStyle{Bold: true})
		v.Wrapping = fyne.TextWrapWord
		l := widget.NewLabel(r[0])
		l.Wrapping = fyne.TextWrapWord
		out[i] = container.New(labelColumn{w: studyLabelWidth}, l, v)
	}
	return out
}

// histogramNotes says what the histogram leaves out (the chart model's
// notes) and which units count at a factor of 0.
func histogramNotes(h chartmodel.Chart, r *tolerance.Result) string {
	notes := append([]string(nil), h.Notes...)
	if r != nil && r.UnsealableUnits > 0 {
		notes = append(notes, display.Units(r.UnsealableUnits)+" could not be sealed (their fill would not fit as liquid) and count at a factor of 0.")
	}
	return strings.Join(notes, " ")
}
