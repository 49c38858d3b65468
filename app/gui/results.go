package gui

import (
	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/canvas"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"

	"ullage/app/look"
	"ullage/hazards"
	"ullage/report/chartmodel"
	"ullage/report/display"
)

// resultsPanel shows the last good results: the verdict, the findings,
// the key numbers and the charts, marked out of date when the inputs on
// the form are not acceptable.
type resultsPanel struct {
	s *session

	verdict   *verdictBanner
	stale     *container.ThemeOverride
	staleText *widget.Label

	list     *findingsList
	keys     *keyNumbers
	expo     *exposureTable
	pt, conc *chart
	fill     *chart
	// fillPending draws the fill–temperature map of the latest results;
	// the map re-assesses some forty fills, so it is drawn only while its
	// tab is in front (nil once drawn).
	fillPending func()
	fillTab     *container.TabItem
	tabs        *container.AppTabs
	// area holds the findings and, below them, the charts; laid out
	// again when the number of findings changes. areaScroll scrolls it
	// when the window is too short for both.
	area       *fyne.Container
	areaScroll *container.Scroll

	// showField, set by the window, brings the design form back and puts
	// the cursor in the field the problem names.
	showField func()

	object fyne.CanvasObject
}

// newResultsPanel builds the right-hand side of the review screen.
func newResultsPanel(s *session) *resultsPanel {
	r := &resultsPanel{s: s}
	s.results = r
	s.changes.subscribe(r.update)
	r.staleText = widget.NewLabel("")
	r.staleText.Wrapping = fyne.TextWrapWord
	staleBg := canvas.NewRectangle(tint(statusColour(hazards.StatusCaution), 70))
	show := widget.NewButton("Show the field", func() {
		if r.showField != nil {
			r.showField()
		}
	})
	r.stale = container.NewThemeOverride(container.NewStack(staleBg, container.NewBorder(nil, nil,
		widget.NewIcon(theme.NewWarningThemedResource(theme.WarningIcon())), container.NewCenter(show), r.staleText)), look.Compact{})
	r.stale.Hide()
	r.verdict = newVerdictBanner(r.stale)
	r.list = newFindingsList()
	r.list.us = func() bool { return s.units() == unitsUS }
	r.keys = newKeyNumbers()
	r.expo = newExposureTable()
	r.pt, r.conc, r.fill = newChart(), newChart(), newChart()
	r.tabs = container.NewAppTabs(
		container.NewTabItem("Pressure", r.pt),
		container.NewTabItem("Vapour", r.conc),
		r.newFillTab(),
		container.NewTabItem("Key numbers", container.NewVScroll(r.keys.object)),
		container.NewTabItem("Exposure limits", r.expo.object),
	)
	r.tabs.OnSelected = func(t *container.TabItem) {
		if t == r.fillTab {
			r.drawFill()
		}
	}
	// Every finding is shown without scrolling; the charts take what
	// height is left.
	findings := container.NewThemeOverride(r.list.object, look.Dense{})
	ff := findingsFirst{want: r.list.wantedHeight, width: new(float32)}
	split := container.New(ff, findings, container.New(narrowable{360}, r.tabs))
	r.area = split
	r.areaScroll = container.NewVScroll(newRelaidBox(split))
	split.Layout = findingsFirst{want: ff.want, width: ff.width, resized: r.areaScroll.Refresh}
	r.object = container.NewBorder(r.verdict.object, nil, nil, nil, r.areaScroll)
	return r
}

// update redraws the panel when the results or the units changed, or a
// document was opened.
func (r *resultsPanel) update(c change) {
	if c.cause == causeOpened || c.cause == causeRevision {
		// Another design or revision: its first fail or caution is
		// selected, not the criterion selected before, and the findings
		// are in view.
		r.list.fresh = true
		r.areaScroll.ScrollToTop()
	}
	if c.cause.reload() || c.cause == causeResults {
		r.draw()
	}
	if c.cause == causeResults {
		r.list.fresh = false
	}
}

// draw redraws the results panel itself.
func (r *resultsPanel) draw() {
	s := r.s
	o := s.last
	u := s.units()
	if s.problem != nil {
		where := ""
		if s.problem.Path != "" {
			where = labelOf(s.problem.Path) + ": "
		}
		if o.assessment == nil {
			setText(r.staleText, "No results yet. Fix the marked input — "+where+s.problem.Text)
		} else {
			setText(r.staleText, "OUT OF DATE: the findings below are for the last acceptable inputs. "+where+s.problem.Text)
		}
		r.stale.Show()
		r.verdict.words.Hide()
	} else {
		r.stale.Hide()
		r.verdict.words.Show()
	}
	a := o.assessment
	// Both branches set these charts after the findings, which may lay
	// the panel out again.
	r.pt.held, r.conc.held = true, true
	if a == nil {
		r.verdict.clear()
		r.list.set(nil, true)
		r.areaScroll.Refresh()
		r.keys.set(nil, u)
		r.expo.set(nil)
		r.pt.set(chartmodel.Chart{Empty: "No results yet."}, false)
		r.conc.set(chartmodel.Chart{Empty: "No results yet."}, false)
		r.fillPending = nil
		r.fill.set(chartmodel.Chart{Empty: "No results yet."}, false)
		return
	}
	stale := s.problem != nil
	r.verdict.set(a, s.revisionNote(), stale)
	n := len(r.list.rows)
	r.list.set(orderFindings(a.Findings), stale)
	if len(r.list.rows) != n {
		r.areaScroll.Refresh()
	}
	r.keys.set(a, u)
	r.expo.set(a)
	r.pt.set(chartmodel.Pressure("", []chartmodel.Side{{A: a}}, u.chartUnits()), stale)
	r.conc.set(chartmodel.Release("", a, u.chartUnits()), stale)
	mass := chartmodel.Quantity{Unit: u.unit(qMass), FromSI: func(x float64) float64 { return u.fromSI(qMass, x) }, Format: func(x float64) string { return u.show(qMass, x, 3) }}
	r.fillPending = func() {
		r.fill.set(chartmodel.FillTemperature("", chartmodel.FillMapFor(a), a, u.chartUnits(), mass), stale)
	}
	if r.tabs.Selected() == r.fillTab {
		r.drawFill()
	}
}

// newFillTab makes the tab of the fill–temperature map.
func (r *resultsPanel) newFillTab() *container.TabItem {
	r.fillTab = container.NewTabItem("Fill map", r.fill)
	return r.fillTab
}

// drawFill draws the fill–temperature map if the latest results have not
// been drawn yet.
func (r *resultsPanel) drawFill() {
	if f := r.fillPending; f != nil {
		r.fillPending = nil
		f()
	}
}

// revisionNote says what the results are of: which revision, changed or
// not.
func (s *session) revisionNote() string {
	if s.doc == nil {
		return ""
	}
	note := s.doc.File.Product.Name
	if s.doc.Base != "" {
		note += " — revision " + s.doc.Base
		if s.doc.workChanged() {
			note += " with changes not yet kept"
		}
	}
	return note
}

// verdictBanner is the overall verdict, large, in a word and a symbol,
// with the count of findings by status and what the results are of.
type verdictBanner struct {
	bg      *canvas.Rectangle
	icon    *widget.Icon
	caption *canvas.Text
	word    *canvas.Text
	counts  *widget.Label // wraps: the tally and the no-verdict sentence are long
	note    *fitLabel
	// words holds the counts and the note; while the inputs are not
	// acceptable the problem takes their place.
	words  fyne.CanvasObject
	object fyne.CanvasObject
}

// newVerdictBanner builds the banner; problem, the box saying which
// input is not acceptable, takes the place of the counts when shown.
func newVerdictBanner(problem fyne.CanvasObject) *verdictBanner {
	v := &verdictBanner{}
	v.bg = canvas.NewRectangle(tint(statusColour(""), 0))
	v.bg.CornerRadius = 4
	v.icon = widget.NewIcon(theme.QuestionIcon())
	v.caption = canvas.NewText("OVERALL VERDICT", statusColour(""))
	v.caption.TextSize = 10
	v.caption.TextStyle = fyne.TextStyle{Bold: true}
	v.word = canvas.NewText("—", statusColour(""))
	v.word.TextSize = 28
	v.word.TextStyle = fyne.TextStyle{Bold: true}
	v.counts = widget.NewLabelWithStyle("", fyne.TextAlignLeading, fyne.TextStyle{Bold: true})
	v.counts.Wrapping = fyne.TextWrapWord
	v.note = newFitLabel("", fyne.TextStyle{})
	iconBox := container.New(fixedWidth{44}, v.icon)
	words := container.New(fixedWidth{150}, container.NewVBox(v.caption, v.word))
	left := container.NewHBox(iconBox, words)
	// The words beside the verdict take the compact theme, so that the
	// banner leaves the findings as much height as it can.
	v.words = container.NewThemeOverride(container.NewVBox(v.counts, v.note), look.Compact{})
	right := container.NewStack(v.words, problem)
	v.object = container.NewStack(v.bg, container.NewPadded(container.NewBorder(nil, nil, left, nil, right)))
	return v
}

func (v *verdictBanner) clear() {
	v.icon.SetResource(theme.QuestionIcon())
	v.word.Text = "NONE"
	v.word.Color = statusColour("")
	v.word.Refresh()
	v.bg.FillColor = tint(statusColour(""), 0)
	v.bg.Refresh()
	setText(v.counts, "No results yet")
	v.note.SetText("")
}

// noVerdict is the banner while the inputs are not acceptable: no
// verdict at all, not the last one dimmed, until they are fixed.
func (v *verdictBanner) noVerdict(note string) {
	v.icon.SetResource(theme.WarningIcon())
	v.caption.Text = noVerdictCaption
	v.caption.Color = statusColour("")
	v.caption.Refresh()
	v.word.Text = "NONE"
	v.word.Color = statusColour("")
	v.word.Refresh()
	v.bg.FillColor = tint(statusColour(""), 0)
	v.bg.Refresh()
	setText(v.counts, "No current verdict: an input is not acceptable. Fix the marked field; the findings below are for the last acceptable inputs.")
	v.note.SetText(note)
}

// noVerdictCaption heads the banner while there is no current verdict.
const noVerdictCaption = "NO CURRENT VERDICT"

func (v *verdictBanner) set(a *hazards.Assessment, note string, stale bool) {
	if stale {
		v.noVerdict(note)
		return
	}
	v.icon.SetResource(statusIcon(a.Verdict))
	v.word.Text = statusWord(a.Verdict)
	v.word.Color = statusColour(a.Verdict)
	if stale {
		v.word.Color = tint(statusColour(a.Verdict), 110)
	}
	v.caption.Color = statusColour(a.Verdict)
	alpha := uint8(55)
	// A row not assessed says why (no published limit) when selected.
	counts := display.Tally(a.Findings)
	if stale {
		alpha = 18
		v.caption.Text = "OUT OF DATE"
		counts = "Last acceptable inputs: " + counts
	} else {
		v.caption.Text = "OVERALL VERDICT"
	}
	v.caption.Refresh()
	v.word.Refresh()
	v.bg.FillColor = tint(statusColour(a.Verdict), alpha)
	v.bg.Refresh()
	setText(v.counts, counts)
	v.note.SetText(note)
}
