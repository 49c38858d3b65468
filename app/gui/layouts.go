package gui

import (
	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/canvas"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"
)

// fixedWidth lays out its objects stacked, at least w wide: it keeps the
// labels of a form in one column.
type fixedWidth struct{ w float32 }

// MinSize is the widest of w and the objects' own widths.
func (f fixedWidth) MinSize(objs []fyne.CanvasObject) fyne.Size {
	s := fyne.NewSize(f.w, 0)
	for _, o := range objs {
		if !o.Visible() {
			continue
		}
		m := o.MinSize()
		s.Height = max(s.Height, m.Height)
	}
	return s
}

// Layout stretches every object over the whole space.
func (f fixedWidth) Layout(objs []fyne.CanvasObject, size fyne.Size) {
	for _, o := range objs {
		o.Move(fyne.NewPos(0, 0))
		o.Resize(size)
	}
}

// columns lays out a row of cells at fixed fractions of the width, the
// same in every row, so that rows line up as a table. A fraction of 0
// gives the cell its minimum width.
type columns struct{ fractions []float32 }

// MinSize is the sum of the cells' minimum widths and the tallest cell.
func (c columns) MinSize(objs []fyne.CanvasObject) fyne.Size {
	var s fyne.Size
	for _, o := range objs {
		m := o.MinSize()
		s.Width += m.Width + 6
		s.Height = max(s.Height, m.Height)
	}
	return s
}

// Layout places the cells left to right.
func (c columns) Layout(objs []fyne.CanvasObject, size fyne.Size) {
	const gap = 6
	fixed := float32(0)
	for i, o := range objs {
		if i >= len(c.fractions) || c.fractions[i] == 0 {
			fixed += o.MinSize().Width
		}
	}
	flex := size.Width - fixed - gap*float32(max(len(objs)-1, 0))
	if flex < 0 {
		flex = 0
	}
	x := float32(0)
	for i, o := range objs {
		w := o.MinSize().Width
		if i < len(c.fractions) && c.fractions[i] > 0 {
			w = flex * c.fractions[i]
		}
		o.Move(fyne.NewPos(x, 0))
		o.Resize(fyne.NewSize(w, size.Height))
		x += w + gap
	}
}

// labelColumn lays out a label at a fixed width w and a text filling the
// rest of the row, the row as tall as the taller of the two at those
// widths (the text may wrap).
type labelColumn struct{ w float32 }

// MinSize is the label column, a narrow text column and the height of
// the taller cell.
func (l labelColumn) MinSize(objs []fyne.CanvasObject) fyne.Size {
	h := float32(0)
	for _, o := range objs {
		h = max(h, o.MinSize().Height)
	}
	return fyne.NewSize(l.w+160, h)
}

// Layout places the label and, after it, the text.
func (l labelColumn) Layout(objs []fyne.CanvasObject, size fyne.Size) {
	if len(objs) < 2 {
		return
	}
	tw := max(size.Width-l.w, 0)
	// A wrapped text is given its width before its height, so that it
	// measures its lines at that width; laid out again at the same
	// width it knows them already.
	if objs[0].Size().Width != l.w {
		objs[0].Resize(fyne.NewSize(l.w, objs[0].MinSize().Height))
	}
	if objs[1].Size().Width != tw {
		objs[1].Resize(fyne.NewSize(tw, objs[1].MinSize().Height))
	}
	objs[0].Move(fyne.NewPos(0, 0))
	objs[0].Resize(fyne.NewSize(l.w, size.Height))
	objs[1].Move(fyne.NewPos(l.w, 0))
	objs[1].Resize(fyne.NewSize(tw, size.Height))
}

// findingsFirst lays out two objects one above the other: the first as
// tall as want says it needs at the width (all the findings rows), the
// second, the charts, in the height left over but at least
// minChartHeight. It sits in a scroll: when the window is too short for
// both, the findings stay in view and the charts move below them, a
// scroll away.
type findingsFirst struct {
	want func(width float32) float32
	// width is the width last laid out, for MinSize; resized, when set,
	// runs when it changed, for the scroll to measure the findings again.
	width   *float32
	resized func()
}

// minChartHeight is the least height the charts keep below the findings.
const minChartHeight = 340

// MinSize is the wider object's width and the findings' wanted height
// with the charts' least height below.
func (f findingsFirst) MinSize(objs []fyne.CanvasObject) fyne.Size {
	var s fyne.Size
	for _, o := range objs {
		s.Width = max(s.Width, o.MinSize().Width)
	}
	if len(objs) > 1 {
		top := objs[0].MinSize().Height
		if *f.width > 0 {
			top = max(f.want(*f.width), top)
		}
		s.Height = top + theme.Padding() + max(objs[1].MinSize().Height, minChartHeight)
	}
	return s
}

// Layout gives the first object its wanted height and the second the
// rest.
func (f findingsFirst) Layout(objs []fyne.CanvasObject, size fyne.Size) {
	if len(objs) < 2 {
		return
	}
	if *f.width != size.Width {
		*f.width = size.Width
		if f.resized != nil {
			defer f.resized()
		}
	}
	top := max(f.want(size.Width), objs[0].MinSize().Height)
	top = min(top, size.Height)
	objs[0].Move(fyne.NewPos(0, 0))
	objs[0].Resize(fyne.NewSize(size.Width, top))
	gap := theme.Padding()
	objs[1].Move(fyne.NewPos(0, top+gap))
	objs[1].Resize(fyne.NewSize(size.Width, max(size.Height-top-gap, 0)))
}

// narrowable lays out one object over the whole space but reports a
// minimum width of at most w, so that a row of tabs whose labels are
// wider than w does not hold the window wide; the tab labels then run
// past the right edge instead.
type narrowable struct{ w float32 }

// MinSize is the object's minimum, at most w wide.
func (n narrowable) MinSize(objs []fyne.CanvasObject) fyne.Size {
	var s fyne.Size
	for _, o := range objs {
		m := o.MinSize()
		s = s.Max(m)
	}
	s.Width = min(s.Width, n.w)
	return s
}

// Layout gives every object the whole space, and at least its own
// minimum width.
func (n narrowable) Layout(objs []fyne.CanvasObject, size fyne.Size) {
	for _, o := range objs {
		o.Move(fyne.NewPos(0, 0))
		o.Resize(fyne.NewSize(max(size.Width, o.MinSize().Width), size.Height))
	}
}

// relaidBox holds a container and, when refreshed, lays it out again
// and repaints it without refreshing every object inside it. A scroll
// refreshes its content to measure it again: the results area is
// measured again whenever the number of findings changes, and each of
// its parts redraws itself when its own content changes, so refreshing
// all of them would draw the same again. A change of look still reaches
// every object: Fyne applies a theme to each object of the tree.
type relaidBox struct {
	widget.BaseWidget
	c *fyne.Container
}

// newRelaidBox wraps c.
func newRelaidBox(c *fyne.Container) *relaidBox {
	b := &relaidBox{c: c}
	b.ExtendBaseWidget(b)
	return b
}

// CreateRenderer returns the box's renderer.
func (b *relaidBox) CreateRenderer() fyne.WidgetRenderer { return relaidRenderer{b.c} }

type relaidRenderer struct{ c *fyne.Container }

func (r relaidRenderer) Destroy() {}

func (r relaidRenderer) Objects() []fyne.CanvasObject { return []fyne.CanvasObject{r.c} }

func (r relaidRenderer) MinSize() fyne.Size { return r.c.MinSize() }

func (r relaidRenderer) Layout(size fyne.Size) {
	r.c.Move(fyne.NewPos(0, 0))
	r.c.Resize(size)
}

func (r relaidRenderer) Refresh() {
	if r.c.Layout != nil {
		r.c.Layout.Layout(r.c.Objects, r.c.Size())
	}
	canvas.Refresh(r.c)
}
