package gui

import (
	"time"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/canvas"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"

	"ullage/app/look"
	"ullage/hazards"
)

// workSubject is the result whose working is shown: a finding, named by
// its criterion, or a key number, named by its label.
type workSubject struct {
	criterion string
	keyLabel  string
}

// workingLabelWidth is the label column of a working step.
const workingLabelWidth = 104

// copiedFor is how long the copy button says "Copied".
const copiedFor = 2 * time.Second

// closeWorking is the button that closes the working panel.
const closeWorking = "Close the working"

// Choices of what the working panel lists.
const (
	workingBehind = "Steps behind this result"
	workingWhole  = "Whole calculation record"
)

// workingPanel shows the working behind a finding or a key number: the
// numbered steps of the calculation record it rests on, each with its
// method, equation, substituted values, result and sources. While open
// it sits under the design form, beside the results.
type workingPanel struct {
	s       *session
	subject workSubject
	whole   bool
	open    bool

	title   *widget.Label
	summary *widget.Label
	stale   *fyne.Container
	mode    *widget.RadioGroup
	copyBtn *widget.Button
	steps   *fyne.Container
	compact *container.ThemeOverride
	scroll  *container.Scroll
	object  fyne.CanvasObject

	// shown is what is on screen: the assessment, the subject, the mode
	// and the step numbers, to skip rebuilding what has not changed.
	shownFor     *hazards.Assessment
	shownSubject workSubject
	shownWhole   bool
	shownStale   bool
	numbers      []int
	heading      string

	// The window sets these: present opens the panel under the design
	// form and back closes it; selectFinding selects a
	// finding in the results, markKey marks a row of the key numbers (""
	// for none).
	present, back func()
	selectFinding func(criterion string)
	markKey       func(label string)
}

// newWorkingPanel builds the panel, hidden.
func newWorkingPanel(s *session) *workingPanel {
	wp := &workingPanel{s: s}
	s.working = wp
	s.changes.subscribe(wp.update)
	back := widget.NewButtonWithIcon(closeWorking, theme.WindowCloseIcon(), func() {
		if wp.back != nil {
			wp.back()
		}
	})
	wp.copyBtn = widget.NewButtonWithIcon("Copy as text", theme.ContentCopyIcon(), wp.copyText)
	wp.title = widget.NewLabelWithStyle("", fyne.TextAlignLeading, fyne.TextStyle{Bold: true})
	wp.title.Wrapping = fyne.TextWrapWord
	wp.title.SizeName = theme.SizeNameSubHeadingText
	wp.summary = widget.NewLabel("")
	wp.summary.Wrapping = fyne.TextWrapWord
	wp.summary.SizeName = theme.SizeNameCaptionText
	staleText := widget.NewLabel("OUT OF DATE: this working is for the last acceptable inputs, not for those on the form now.")
	staleText.Wrapping = fyne.TextWrapWord
	staleText.TextStyle = fyne.TextStyle{Bold: true}
	wp.stale = container.NewStack(canvas.NewRectangle(tint(statusColour(hazards.StatusCaution), 70)),
		container.NewBorder(nil, nil, widget.NewIcon(theme.NewWarningThemedResource(theme.WarningIcon())), nil, staleText))
	wp.stale.Hide()
	wp.mode = widget.NewRadioGroup([]string{workingBehind, workingWhole}, func(opt string) {
		if opt == "" {
			return
		}
		wp.whole = opt == workingWhole
		wp.refresh()
	})
	wp.mode.Horizontal = true
	wp.mode.Required = true
	wp.mode.SetSelected(workingBehind)
	wp.steps = container.NewVBox()
	wp.compact = container.NewThemeOverride(wp.steps, look.Compact{})
	wp.scroll = container.NewVScroll(container.NewPadded(wp.compact))
	bar := container.NewBorder(nil, nil, back, wp.copyBtn)
	head := container.NewVBox(bar, wp.title, wp.summary, wp.mode, wp.stale, widget.NewSeparator())
	// Opening and closing the panel lays it out again; it redraws what
	// changed itself.
	wp.object = newRelaidBox(container.NewBorder(head, nil, nil, nil, wp.scroll))
	wp.object.Hide()
	return wp
}

// show opens the working of a subject.
func (wp *workingPanel) show(sub workSubject) {
	wp.subject = sub
	if sub.criterion != "" && wp.selectFinding != nil {
		wp.selectFinding(sub.criterion)
	}
	if wp.whole {
		wp.mode.SetSelected(workingBehind)
	}
	if wp.present != nil {
		wp.present()
	}
	wp.refresh()
	wp.scroll.ScrollToTop()
}

// resolve returns the heading and the step numbers of the subject in a
// (none for the whole record); ok is false when a has no such result.
func (wp *workingPanel) resolve(a *hazards.Assessment) (heading string, numbers []int, ok bool) {
	switch {
	case wp.subject.criterion != "":
		for _, f := range a.Findings {
			if f.Criterion == wp.subject.criterion {
				return f.Title + " — " + statusWord(f.Status), f.Steps(), true
			}
		}
	case wp.subject.keyLabel != "":
		for _, r := range keyRows(a, wp.s.units()) {
			if r.label == wp.subject.keyLabel {
				return r.label + ": " + r.value, r.steps(a), true
			}
		}
	}
	return "", nil, false
}

// update redraws the panel when the results or the units changed, or a
// document was opened.
func (wp *workingPanel) update(c change) {
	if c.cause.reload() || c.cause == causeResults {
		wp.refresh()
	}
}

// refresh redraws the panel from the session's last results, when it is
// open and something changed.
func (wp *workingPanel) refresh() {
	s := wp.s
	if wp.markKey != nil {
		mark := ""
		if wp.open && !wp.whole {
			mark = wp.subject.keyLabel
		}
		wp.markKey(mark)
	}
	if !wp.open {
		return
	}
	a := s.last.assessment
	stale := s.stale()
	if a == wp.shownFor && wp.subject == wp.shownSubject && wp.whole == wp.shownWhole && stale == wp.shownStale {
		return
	}
	wp.shownFor, wp.shownSubject, wp.shownWhole, wp.shownStale = a, wp.subject, wp.whole, stale
	if stale {
		wp.stale.Show()
	} else {
		wp.stale.Hide()
	}
	if a == nil {
		setText(wp.title, "No results yet")
		setText(wp.summary, "The working appears once the design on the form has been assessed.")
		wp.heading, wp.numbers = "", nil
		wp.steps.Objects = nil
		wp.steps.Refresh()
		wp.copyBtn.Disable()
		return
	}
	heading, numbers, ok := wp.resolve(a)
	switch {
	case wp.whole:
		heading, numbers = "Whole calculation record", nil
		if note := s.revisionNote(); note != "" {
			heading += " of " + note
		}
	case !ok:
		setText(wp.title, "Choose a finding or a key number")
		setText(wp.summary, "Select a finding in the list, or tap a row of the key numbers, to see the steps behind it.")
		wp.heading, wp.numbers = "", nil
		wp.steps.Objects = nil
		wp.steps.Refresh()
		wp.copyBtn.Disable()
		return
	}
	wp.heading, wp.numbers = heading, numbers
	wp.copyBtn.Enable()
	if wp.whole {
		setText(wp.title, heading)
	} else {
		setText(wp.title, "Working: "+heading)
	}
	setText(wp.summary, workingSummary(a, numbers))
	var objs []fyne.CanvasObject
	stage := ""
	for _, st := range pickSteps(a, numbers) {
		if wp.whole && st.Stage != stage {
			stage = st.Stage
			h := widget.NewLabelWithStyle(stage, fyne.TextAlignLeading, fyne.TextStyle{Bold: true})
			h.SizeName = theme.SizeNameSubHeadingText
			objs = append(objs, h)
		}
		objs = append(objs, stepBlock(a, st))
	}
	wp.steps.Objects = objs
	wp.compact.Refresh()
}

// text is the working on screen as plain text, marked when out of date.
func (wp *workingPanel) text() string {
	a := wp.s.last.assessment
	if a == nil {
		return ""
	}
	t := WorkingText(a, wp.heading, wp.numbers)
	if wp.s.stale() {
		t = "OUT OF DATE: this working is for the last acceptable inputs, not for those on the form now.\n" + t
	}
	return t
}

// copyText puts the working on the clipboard.
func (wp *workingPanel) copyText() {
	t := wp.text()
	if t == "" {
		return
	}
	wp.s.app.Clipboard().SetContent(t)
	wp.copyBtn.SetText("Copied")
	wp.copyBtn.SetIcon(theme.ConfirmIcon())
	go func() {
		<-time.After(copiedFor)
		wp.s.opts.post(func() {
			wp.copyBtn.SetText("Copy as text")
			wp.copyBtn.SetIcon(theme.ContentCopyIcon())
		})
	}()
}

// stepBlock draws one step: its number and title, then its lines in two
// columns, the labels on the left.
func stepBlock(a *hazards.Assessment, st hazards.Step) fyne.CanvasObject {
	title := widget.NewLabelWithStyle(stepHeading(st), fyne.TextAlignLeading, fyne.TextStyle{Bold: true})
	title.Wrapping = fyne.TextWrapWord
	rows := []fyne.CanvasObject{title}
	for _, l := range stepLines(a, st) {
		lbl := widget.NewRichText(&widget.TextSegment{Text: l.label,
			Style: widget.RichTextStyle{ColorName: theme.ColorNamePlaceHolder}})
		rows = append(rows, container.New(labelColumn{w: workingLabelWidth}, lbl, lineText(l)))
	}
	bg := canvas.NewRectangle(theme.Color(theme.ColorNameInputBackground))
	bg.CornerRadius = 4
	return container.NewVBox(container.NewStack(bg, container.NewPadded(container.NewVBox(rows...))), widget.NewLabel(""))
}

// lineText sets a line of a step in its style, the note dimmed after it.
func lineText(l stepLine) *widget.RichText {
	style := widget.RichTextStyle{Inline: true}
	switch l.kind {
	case lineEquation:
		style.TextStyle = fyne.TextStyle{Monospace: true}
	case lineIntermediate:
		style.TextStyle = fyne.TextStyle{Italic: true}
	case lineResult:
		style.TextStyle = fyne.TextStyle{Bold: true}
	case lineDim:
		style.TextStyle = fyne.TextStyle{Italic: true}
		style.SizeName = theme.SizeNameCaptionText
	}
	segs := []widget.RichTextSegment{&widget.TextSegment{Text: l.text, Style: style}}
	if l.note != "" {
		segs = append(segs, &widget.TextSegment{Text: "   " + l.note,
			Style: widget.RichTextStyle{Inline: true, SizeName: theme.SizeNameCaptionText, ColorName: theme.ColorNamePlaceHolder}})
	}
	rt := widget.NewRichText(segs...)
	rt.Wrapping = fyne.TextWrapWord
	return rt
}
