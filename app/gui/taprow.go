package gui

import (
	"image/color"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/canvas"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/driver/desktop"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"
)

// tapRow is a row of other widgets that can be tapped as a whole, like a
// list row: it lights up under the pointer and stays marked while
// selected.
type tapRow struct {
	widget.BaseWidget
	content  fyne.CanvasObject
	onTap    func()
	hovered  bool
	selected bool
}

// newTapRow wraps content; onTap runs when the row is tapped.
func newTapRow(content fyne.CanvasObject, onTap func()) *tapRow {
	r := &tapRow{content: content, onTap: onTap}
	r.ExtendBaseWidget(r)
	return r
}

// setSelected marks the row as the one whose details are shown.
func (r *tapRow) setSelected(on bool) {
	if r.selected != on {
		r.selected = on
		r.Refresh()
	}
}

// Tapped runs the row's action.
func (r *tapRow) Tapped(*fyne.PointEvent) {
	if r.onTap != nil {
		r.onTap()
	}
}

// Cursor shows a pointing hand over the row.
func (r *tapRow) Cursor() desktop.Cursor { return desktop.PointerCursor }

// MouseIn lights the row up.
func (r *tapRow) MouseIn(*desktop.MouseEvent) { r.hovered = true; r.Refresh() }

// MouseMoved does nothing.
func (r *tapRow) MouseMoved(*desktop.MouseEvent) {}

// MouseOut turns the light off.
func (r *tapRow) MouseOut() { r.hovered = false; r.Refresh() }

// CreateRenderer puts the content over a background that shows the
// hover and selection.
func (r *tapRow) CreateRenderer() fyne.WidgetRenderer {
	bg := canvas.NewRectangle(color.Transparent)
	bg.CornerRadius = 3
	rr := &tapRowRenderer{r: r, bg: bg, stack: container.NewStack(bg, r.content)}
	rr.Refresh()
	return rr
}

type tapRowRenderer struct {
	r     *tapRow
	bg    *canvas.Rectangle
	stack *fyne.Container
}

func (rr *tapRowRenderer) Destroy()                     {}
func (rr *tapRowRenderer) Layout(s fyne.Size)           { rr.stack.Resize(s) }
func (rr *tapRowRenderer) MinSize() fyne.Size           { return rr.stack.MinSize() }
func (rr *tapRowRenderer) Objects() []fyne.CanvasObject { return []fyne.CanvasObject{rr.stack} }

func (rr *tapRowRenderer) Refresh() {
	th := rr.r.Theme()
	v := fyne.CurrentApp().Settings().ThemeVariant()
	switch {
	case rr.r.selected:
		rr.bg.FillColor = th.Color(theme.ColorNameSelection, v)
	case rr.r.hovered:
		rr.bg.FillColor = th.Color(theme.ColorNameHover, v)
	default:
		rr.bg.FillColor = color.Transparent
	}
	rr.bg.Refresh()
	rr.stack.Refresh()
}
