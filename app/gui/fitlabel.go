package gui

import (
	"strings"
	"unicode"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"
)

// fitLabel is a label of one line that shows as much of its text as its
// width holds, ending in an ellipsis when the rest is cut off. It works
// the cut out from measured text sizes, which the driver keeps, and only
// when the text, its style or the width changed; a label cut by Fyne
// itself shapes its text afresh at every layout and refresh, which the
// window's tables and form, laid out again on every result, cannot
// afford. Like such a label it asks for the width of one letter and an
// ellipsis only.
type fitLabel struct {
	widget.BaseWidget
	// Text is the whole text; Refresh after changing it or TextStyle.
	Text      string
	TextStyle fyne.TextStyle
}

// newFitLabel returns a label of one line showing as much of text as fits.
func newFitLabel(text string, style fyne.TextStyle) *fitLabel {
	l := &fitLabel{Text: text, TextStyle: style}
	l.ExtendBaseWidget(l)
	return l
}

// SetText replaces the text, redrawing only when it changed.
func (l *fitLabel) SetText(text string) {
	if l.Text == text {
		return
	}
	l.Text = text
	l.Refresh()
}

// CreateRenderer builds the label's renderer: a plain label of the part
// that fits.
func (l *fitLabel) CreateRenderer() fyne.WidgetRenderer {
	l.ExtendBaseWidget(l)
	shown := widget.NewLabelWithStyle(l.Text, fyne.TextAlignLeading, l.TextStyle)
	return &fitLabelRenderer{l: l, shown: shown, width: -1}
}

type fitLabelRenderer struct {
	l     *fitLabel
	shown *widget.Label
	// The text, style, text size and width the shown part was cut for.
	text  string
	style fyne.TextStyle
	size  float32
	width float32
}

func (r *fitLabelRenderer) Destroy() {}

func (r *fitLabelRenderer) Objects() []fyne.CanvasObject { return []fyne.CanvasObject{r.shown} }

// MinSize is a line's height and, as for a label that Fyne cuts, the
// width of one letter and the ellipsis.
func (r *fitLabelRenderer) MinSize() fyne.Size {
	th := r.l.Theme()
	size := th.Size(theme.SizeNameText)
	pad := th.Size(theme.SizeNameInnerPadding)
	m := fyne.MeasureText("M", size, fyne.TextStyle{})
	e := fyne.MeasureText("…", size, fyne.TextStyle{})
	line := fyne.MeasureText("M", size, r.l.TextStyle)
	return fyne.NewSize(m.Width+e.Width, line.Height+2*pad)
}

func (r *fitLabelRenderer) Layout(size fyne.Size) {
	r.fit(size.Width)
	r.shown.Move(fyne.NewPos(0, 0))
	r.shown.Resize(size)
}

func (r *fitLabelRenderer) Refresh() {
	r.fit(r.l.Size().Width)
}

// fit shows the part of the text that fits a width, working it out
// again only when something it depends on changed.
func (r *fitLabelRenderer) fit(width float32) {
	th := r.l.Theme()
	size := th.Size(theme.SizeNameText)
	l := r.l
	if l.Text == r.text && l.TextStyle == r.style && size == r.size && width == r.width {
		return
	}
	r.text, r.style, r.size, r.width = l.Text, l.TextStyle, size, width
	shown := fitText(l.Text, width-2*th.Size(theme.SizeNameInnerPadding), size, l.TextStyle)
	if r.shown.Text != shown || r.shown.TextStyle != l.TextStyle {
		r.shown.Text, r.shown.TextStyle = shown, l.TextStyle
		r.shown.Refresh()
	}
}

// fitText returns text whole if it is no wider than width at the given
// size and style, and otherwise the longest start of it that, followed
// by an ellipsis, is no wider (trailing spaces dropped before the
// ellipsis). A width of zero or less is a label not laid out yet, which
// shows the whole text.
func fitText(text string, width, size float32, style fyne.TextStyle) string {
	if width <= 0 || text == "" || fyne.MeasureText(text, size, style).Width <= width {
		return text
	}
	runes := []rune(text)
	cut := func(n int) string {
		return strings.TrimRightFunc(string(runes[:n]), unicode.IsSpace) + "…"
	}
	// The longest n in [0, len) whose cut fits; n = 0 is the ellipsis
	// alone, shown even when it does not fit.
	lo, hi := 0, len(runes)-1
	for lo < hi {
		mid := (lo + hi + 1) / 2
		if fyne.MeasureText(cut(mid), size, style).Width <= width {
			lo = mid
		} else {
			hi = mid - 1
		}
	}
	return cut(lo)
}
