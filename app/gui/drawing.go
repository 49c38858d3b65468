package gui

import (
	"image/color"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/canvas"
)

// drawing collects the canvas objects of a hand-drawn chart, starting
// with its background.
type drawing struct {
	objs []fyne.CanvasObject
}

// newDrawing starts a drawing of the given size on a background colour,
// reusing objs' storage.
func newDrawing(objs []fyne.CanvasObject, size fyne.Size, bg color.Color) *drawing {
	d := &drawing{objs: objs[:0]}
	back := canvas.NewRectangle(bg)
	back.Resize(size)
	d.add(back)
	return d
}

func (d *drawing) add(o fyne.CanvasObject) { d.objs = append(d.objs, o) }

// text places a run of text with its top-left corner at (x, y).
func (d *drawing) text(s string, x, y, size float32, col color.Color, bold bool) *canvas.Text {
	t := canvas.NewText(s, col)
	t.TextSize = size
	t.TextStyle = fyne.TextStyle{Bold: bold}
	t.Move(fyne.NewPos(x, y))
	t.Resize(t.MinSize())
	d.add(t)
	return t
}
