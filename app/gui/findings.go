package gui

import (
	"strings"
	"sync"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"

	"ullage/app/look"
	"ullage/hazards"
	"ullage/report/display"
)

// findingsList is the table of findings, one row per criterion, with the
// selected finding's message and source under it.
type findingsList struct {
	rows     []hazards.Finding
	stale    bool
	selected int
	// fresh is true from the opening of a design or revision until its
	// first results: the selection then goes to the first fail or
	// caution, not to the criterion selected before.
	fresh bool
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

	// titleWidth is the width the longest criterion needs on one line,
	// numbersWidth the widths the value, limit and margin columns need;
	// heights are the rows' heights at the width last fitted, fitted that
	// width (see fit).
	titleWidth   float32
	numbersWidth [3]float32
	heights      []float32
	fitted       float32
	critHead     *widget.Label

	list    *widget.List
	head    *widget.Label
	detail  *widget.RichText
	working *widget.Button
	object  fyne.CanvasObject
}

// statusColumnWidth is the width of the findings table's status column.
const statusColumnWidth = 132

// findingGap is the space between the findings table's columns.
const findingGap = 6

// criterionWrapFrom is the narrowest the criterion column gets beside
// the value, limit and margin columns, its longer texts wrapping; in a
// narrower table those columns give way to it.
const criterionWrapFrom = 400

// numbersColumnMax are the widest the value, limit and margin columns
// grow; a longer text wraps ("not assessed — no published limit").
var numbersColumnMax = [3]float32{130, 135, 170}

// Headings of the criterion column, with and without the value, limit
// and margin columns beside it.
const (
	criterionHead      = "Criterion"
	criterionHeadAlone = "Criterion (value, limit and margin of the selected row below)"
)

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
			for _, c := range cells[1:] {
				c.(*widget.Label).Truncation = fyne.TextTruncateOff
				c.(*widget.Label).Wrapping = fyne.TextWrapWord
			}
			return container.New(findingRow{fl}, cells...)
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
	fl.critHead = bold(criterionHead)
	head := []fyne.CanvasObject{container.New(fixedWidth{statusColumnWidth}, bold("Status")), fl.critHead}
	for _, h := range []string{"Value", "Limit", "Margin"} {
		head = append(head, bold(h))
	}
	fl.detail = widget.NewRichText()
	fl.detail.Wrapping = fyne.TextWrapWord
	fl.working = widget.NewButtonWithIcon("Show the working", theme.NavigateNextIcon(), fl.pick)
	fl.working.IconPlacement = widget.ButtonIconTrailingText
	fl.working.Disable()
	fl.head = widget.NewLabelWithStyle("", fyne.TextAlignLeading, fyne.TextStyle{Bold: true})
	fl.head.Wrapping = fyne.TextWrapWord
	detail := container.NewVBox(widget.NewSeparator(),
		container.NewBorder(nil, nil, nil, container.NewVBox(fl.working), fl.head), fl.detail)
	table := container.NewBorder(container.New(findingRow{fl}, head...), detail, nil, nil, fl.list)
	fl.object = container.New(findingsTable{fl}, table)
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

// findingsTable lays the findings table out at its full size, once the
// rows are fitted to its width.
type findingsTable struct{ fl *findingsList }

// MinSize is the table's own.
func (t findingsTable) MinSize(objs []fyne.CanvasObject) fyne.Size { return objs[0].MinSize() }

// Layout fits the rows to the width and lays the table out.
func (t findingsTable) Layout(objs []fyne.CanvasObject, size fyne.Size) {
	t.fl.fit(size.Width)
	objs[0].Move(fyne.NewPos(0, 0))
	objs[0].Resize(size)
}

// findingRow lays out a row of the findings table: the status at a fixed
// width, then the criterion, then the value, limit and margin at the
// widths their texts need, when the row is wide enough for the whole
// criterion beside them. A narrower row shows the status and the
// criterion only, which wraps when it must; the detail under the table
// gives the selected row's value, limit and margin.
type findingRow struct{ fl *findingsList }

// MinSize is the status column and a narrow criterion.
func (r findingRow) MinSize(objs []fyne.CanvasObject) fyne.Size {
	s := fyne.NewSize(statusColumnWidth+findingGap+120, 0)
	for i, o := range objs {
		if i == 0 || o.Visible() {
			s.Height = max(s.Height, o.MinSize().Height)
		}
	}
	return s
}

// Layout places the cells left to right.
func (r findingRow) Layout(objs []fyne.CanvasObject, size fyne.Size) {
	crit, all := r.fl.criterionWidth(size.Width)
	x := float32(0)
	for i, o := range objs {
		var w float32 = statusColumnWidth
		switch {
		case i == 1:
			w = crit
		case i > 1 && !all:
			o.Hide()
			continue
		case i > 1:
			w = r.fl.numbersWidth[i-2]
			o.Show()
		}
		o.Move(fyne.NewPos(x, 0))
		o.Resize(fyne.NewSize(w, size.Height))
		x += w + findingGap
	}
}

// criterionWidth is the criterion column's width in a row of a width,
// and whether the value, limit and margin columns fit beside it.
func (fl *findingsList) criterionWidth(width float32) (float32, bool) {
	rest := width - statusColumnWidth - findingGap
	beside := rest
	for _, w := range fl.numbersWidth {
		beside -= w + findingGap
	}
	if beside >= min(fl.titleWidth, criterionWrapFrom) {
		return beside, true
	}
	return max(rest, 0), false
}

// denseSize is the size a label of the findings table needs on one line.
// Sizes are kept for the font and text size they were measured in: the
// table measures every row's texts on each new result.
func denseSize(text string, style fyne.TextStyle) fyne.Size {
	d := look.Dense{}
	k := denseKey{text: text, style: style, size: d.Size(theme.SizeNameText)}
	if f := d.Font(style); f != nil {
		k.font = f.Name()
	}
	denseSizes.mu.Lock()
	m, ok := denseSizes.m[k]
	denseSizes.mu.Unlock()
	if ok {
		return m
	}
	l := widget.NewLabelWithStyle(text, fyne.TextAlignLeading, style)
	container.NewThemeOverride(l, look.Dense{})
	m = l.MinSize()
	denseSizes.mu.Lock()
	if len(denseSizes.m) >= denseSizesKept {
		clear(denseSizes.m)
	}
	denseSizes.m[k] = m
	denseSizes.mu.Unlock()
	return m
}

// denseKey is a text measured for the findings table, in a font and size.
type denseKey struct {
	text  string
	style fyne.TextStyle
	font  string
	size  float32
}

// denseSizes are the sizes denseSize measured, at most denseSizesKept.
var denseSizes = struct {
	mu sync.Mutex
	m  map[denseKey]fyne.Size
}{m: map[denseKey]fyne.Size{}}

const denseSizesKept = 4096

// denseHeight is the height a label of the findings table needs with its
// text wrapped at word breaks to a width, as the label wraps it.
func denseHeight(text string, width float32) float32 {
	one := denseSize(text, fyne.TextStyle{}).Height
	line := denseSize("A\nA", fyne.TextStyle{}).Height - one
	d := look.Dense{}
	room := width - 2*d.Size(theme.SizeNameInnerPadding)
	size := d.Size(theme.SizeNameText)
	lines, cur := 1, ""
	for _, w := range strings.Fields(text) {
		next := w
		if cur != "" {
			next = cur + " " + w
		}
		if cur != "" && fyne.MeasureText(next, size, fyne.TextStyle{}).Width > room {
			lines++
			next = w
		}
		cur = next
	}
	return one + float32(lines-1)*line
}

// measure finds the widths the rows' texts need on one line.
func (fl *findingsList) measure() {
	fl.titleWidth = 0
	fl.numbersWidth = [3]float32{}
	for i, h := range []string{"Value", "Limit", "Margin"} {
		fl.numbersWidth[i] = denseSize(h, fyne.TextStyle{Bold: true}).Width
	}
	for _, f := range fl.rows {
		v := display.Finding(f, fl.system())
		fl.titleWidth = max(fl.titleWidth, denseSize(v.Title, fyne.TextStyle{}).Width)
		for i, t := range []string{v.Value, v.Limit, v.Margin} {
			fl.numbersWidth[i] = max(fl.numbersWidth[i], denseSize(t, fyne.TextStyle{}).Width)
		}
	}
	for i := range fl.numbersWidth {
		fl.numbersWidth[i] = min(fl.numbersWidth[i], numbersColumnMax[i])
	}
	fl.fitted = -1
}

// fit sets each row's height for a table of a width: one line, or more
// where the criterion wraps.
func (fl *findingsList) fit(width float32) {
	if width == fl.fitted && len(fl.heights) == len(fl.rows) {
		return
	}
	fl.fitted = width
	// The list insets its rows by its padding on either side.
	crit, all := fl.criterionWidth(width - 2*look.Dense{}.Size(theme.SizeNamePadding))
	head := criterionHeadAlone
	if all {
		head = criterionHead
	}
	if fl.critHead.Text != head {
		setText(fl.critHead, head)
	}
	base := fl.rowHeight()
	fl.heights = fl.heights[:0]
	for id, f := range fl.rows {
		v := display.Finding(f, fl.system())
		h := max(base, denseHeight(v.Title, crit))
		if all {
			for i, t := range []string{v.Value, v.Limit, v.Margin} {
				h = max(h, denseHeight(t, fl.numbersWidth[i]))
			}
		}
		fl.heights = append(fl.heights, h)
		fl.list.SetItemHeight(id, h)
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
	if fl.selected >= 0 && fl.selected < len(fl.rows) && !fl.fresh {
		keep = fl.rows[fl.selected].Criterion
	}
	counted := len(fl.rows)
	fl.rows, fl.stale = fs, stale
	fl.measure()
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
	if len(fs) != counted {
		// The table is laid out again for the new rows: the heading and
		// the rows may change between one and two lines of columns.
		fl.object.Refresh()
	} else {
		fl.list.Refresh()
	}
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
		setText(fl.head, "")
		fl.detail.Segments = nil
		fl.detail.Refresh()
		fl.working.Disable()
		return
	}
	f := fl.rows[fl.selected]
	v := display.Finding(f, fl.system())
	fl.working.Enable()
	caption := widget.RichTextStyle{Inline: true, SizeName: theme.SizeNameCaptionText, ColorName: theme.ColorNameForeground}
	setText(fl.head, statusWord(f.Status)+" — "+f.Title+".")
	fl.detail.Segments = []widget.RichTextSegment{
		&widget.TextSegment{Text: v.Numbers() + ".", Style: widget.RichTextStyleParagraph},
		&widget.TextSegment{Text: v.Text(), Style: widget.RichTextStyleParagraph},
		&widget.TextSegment{Text: "Limit source: " + f.Source + ". ", Style: caption},
	}
	if len(f.Steps()) > 0 {
		fl.detail.Segments = append(fl.detail.Segments, &widget.TextSegment{
			Text:  "Working: " + stepsPhrase(f.Steps()) + " of the calculation record.",
			Style: caption,
		})
	}
	fl.detail.Refresh()
}

// detailText returns the selected finding's description as shown.
func (fl *findingsList) detailText() string { return fl.head.Text + " " + fl.detail.String() }
