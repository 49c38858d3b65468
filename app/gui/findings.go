package gui

import (
	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"

	"ullage/hazards"
	"ullage/report/display"
)

// findingsList is the table of findings, one row per criterion, with the
// selected finding's message and source under it.
type findingsList struct {
	rows     []hazards.Finding
	stale    bool
	selected int
	// onSelect, when set, runs instead of onPick when the reviewer
	// selects a row, so that the design form can stay in place.
	onSelect func(hazards.Finding)
	// quiet is true while the list selects a row itself, so that only the
	// reviewer's own choice opens the working.
	quiet bool
	// onPick runs when the reviewer chooses a finding, or asks for the
	// working of the one selected.
	onPick func(hazards.Finding)
	// us reports whether the window shows US customary units, for the
	// words of each finding.
	us func() bool

	list    *widget.List
	detail  *widget.RichText
	working *widget.Button
	object  fyne.CanvasObject
}

// Column widths of the findings table: status, criterion, value, limit,
// margin (fractions of the width left after the status column).
var findingColumns = columns{fractions: []float32{0, 0.44, 0.18, 0.20, 0.18}}

const statusColumnWidth = 132

func newFindingsList() *findingsList {
	fl := &findingsList{selected: -1}
	fl.list = widget.NewList(
		func() int { return len(fl.rows) },
		func() fyne.CanvasObject {
			icon := widget.NewIcon(nil)
			word := widget.NewLabelWithStyle("CAUTION", fyne.TextAlignLeading, fyne.TextStyle{Bold: true})
			status := container.New(fixedWidth{statusColumnWidth}, container.NewBorder(nil, nil, icon, nil, word))
			cells := []fyne.CanvasObject{status}
			for i := 0; i < 4; i++ {
				l := widget.NewLabel("")
				l.Truncation = fyne.TextTruncateEllipsis
				cells = append(cells, l)
			}
			return container.New(findingColumns, cells...)
		},
		func(id widget.ListItemID, o fyne.CanvasObject) {
			if id < 0 || id >= len(fl.rows) {
				return
			}
			f := fl.rows[id]
			cells := o.(*fyne.Container).Objects
			status := cells[0].(*fyne.Container).Objects[0].(*fyne.Container)
			status.Objects[1].(*widget.Icon).SetResource(statusIcon(f.Status))
			word := status.Objects[0].(*widget.Label)
			if w, imp := statusWord(f.Status), statusImportance(f.Status, fl.stale); word.Text != w || word.Importance != imp {
				word.Text, word.Importance = w, imp
				word.Refresh()
			}
			v := display.Finding(f, fl.system())
			setText(cells[1].(*widget.Label), v.Title)
			setText(cells[2].(*widget.Label), v.Value)
			setText(cells[3].(*widget.Label), v.Limit)
			setText(cells[4].(*widget.Label), v.Margin)
		})
	fl.list.OnSelected = func(id widget.ListItemID) {
		fl.selected = id
		fl.describe()
		if !fl.quiet {
			fl.chosen()
		}
	}
	head := []fyne.CanvasObject{container.New(fixedWidth{statusColumnWidth}, bold("Status"))}
	for _, h := range []string{"Criterion", "Value", "Limit", "Margin"} {
		head = append(head, bold(h))
	}
	fl.detail = widget.NewRichText()
	fl.detail.Wrapping = fyne.TextWrapWord
	fl.working = widget.NewButtonWithIcon("Show the working", theme.NavigateNextIcon(), fl.pick)
	fl.working.IconPlacement = widget.ButtonIconTrailingText
	fl.working.Disable()
	detail := container.NewVBox(widget.NewSeparator(),
		container.NewBorder(nil, nil, nil, container.NewVBox(fl.working), fl.detail))
	fl.object = container.NewBorder(container.New(findingColumns, head...), detail, nil, nil, fl.list)
	return fl
}

// setText shows text on a label, redrawing it only when the text
// changed: a label measures its text again on every redraw, and one that
// truncates or wraps does so many times over.
func setText(l *widget.Label, text string) {
	if l.Text != text {
		l.SetText(text)
	}
}

func bold(s string) *widget.Label {
	return widget.NewLabelWithStyle(s, fyne.TextAlignLeading, fyne.TextStyle{Bold: true})
}

// system returns the unit system the window shows.
func (fl *findingsList) system() display.System {
	if fl.us != nil && fl.us() {
		return display.US
	}
	return display.SI
}

// statusImportance colours a status word; out-of-date words are grey.
func statusImportance(s hazards.Status, stale bool) widget.Importance {
	if stale {
		return widget.LowImportance
	}
	switch s {
	case hazards.StatusPass:
		return widget.SuccessImportance
	case hazards.StatusCaution:
		return widget.WarningImportance
	case hazards.StatusFail:
		return widget.DangerImportance
	}
	return widget.MediumImportance
}

// set shows new findings, keeping the selected criterion selected, or
// selecting the first that is not a pass.
func (fl *findingsList) set(fs []hazards.Finding, stale bool) {
	keep := ""
	if fl.selected >= 0 && fl.selected < len(fl.rows) {
		keep = fl.rows[fl.selected].Criterion
	}
	fl.rows, fl.stale = fs, stale
	fl.selected = -1
	for i, f := range fs {
		if f.Criterion == keep {
			fl.selected = i
		}
	}
	if fl.selected < 0 {
		for i, f := range fs {
			if f.Status != hazards.StatusPass {
				fl.selected = i
				break
			}
		}
	}
	if fl.selected < 0 && len(fs) > 0 {
		fl.selected = 0
	}
	fl.list.Refresh()
	fl.quiet = true
	if fl.selected >= 0 {
		fl.list.Select(fl.selected)
	} else {
		fl.list.UnselectAll()
	}
	fl.quiet = false
	fl.describe()
}

// selectCriterion selects the finding of a criterion without opening
// its working again.
func (fl *findingsList) selectCriterion(c string) {
	for i, f := range fl.rows {
		if f.Criterion == c && i != fl.selected {
			fl.quiet = true
			fl.list.Select(i)
			fl.quiet = false
		}
	}
}

// chosen runs when the reviewer selects a row: onSelect when set,
// otherwise the row's working opens.
func (fl *findingsList) chosen() {
	if fl.onSelect != nil {
		if fl.selected >= 0 && fl.selected < len(fl.rows) {
			fl.onSelect(fl.rows[fl.selected])
		}
		return
	}
	fl.pick()
}

// pick opens the working of the selected finding.
func (fl *findingsList) pick() {
	if fl.onPick != nil && fl.selected >= 0 && fl.selected < len(fl.rows) {
		fl.onPick(fl.rows[fl.selected])
	}
}

// describe shows the selected finding's message and limit source.
func (fl *findingsList) describe() {
	if fl.selected < 0 || fl.selected >= len(fl.rows) {
		fl.detail.Segments = nil
		fl.detail.Refresh()
		fl.working.Disable()
		return
	}
	f := fl.rows[fl.selected]
	fl.working.Enable()
	fl.detail.Segments = []widget.RichTextSegment{
		&widget.TextSegment{Text: statusWord(f.Status) + " — " + f.Title + ". ", Style: widget.RichTextStyle{Inline: true, TextStyle: fyne.TextStyle{Bold: true}}},
		&widget.TextSegment{Text: display.Finding(f, fl.system()).Text(), Style: widget.RichTextStyleParagraph},
		&widget.TextSegment{Text: "Limit source: " + f.Source, Style: widget.RichTextStyle{SizeName: theme.SizeNameCaptionText, ColorName: theme.ColorNameForeground}},
	}
	if len(f.Steps()) > 0 {
		fl.detail.Segments = append(fl.detail.Segments, &widget.TextSegment{
			Text:  "Working: " + stepsPhrase(f.Steps()) + " of the calculation record.",
			Style: widget.RichTextStyle{SizeName: theme.SizeNameCaptionText, ColorName: theme.ColorNameForeground},
		})
	}
	fl.detail.Refresh()
}

// detailText returns the selected finding's description as shown.
func (fl *findingsList) detailText() string { return fl.detail.String() }
