package gui

import "fyne.io/fyne/v2/widget"

// A panel that shows the document sets its widgets with these functions:
// each sets the value with the widget's change callback detached, so that
// showing the document never counts as an edit of it. Only the
// reviewer's own typing, ticking and choosing reach the callbacks.

// showText sets an entry's text.
func showText(e *widget.Entry, text string) {
	cb := e.OnChanged
	e.OnChanged = nil
	e.SetText(text)
	e.OnChanged = cb
}

// showSelected selects opt in a selector ("" clears it).
func showSelected(s *widget.Select, opt string) {
	cb := s.OnChanged
	s.OnChanged = nil
	if opt == "" {
		s.ClearSelected()
	} else {
		s.SetSelected(opt)
	}
	s.OnChanged = cb
}

// showChecked ticks the options of a check group.
func showChecked(g *widget.CheckGroup, opts []string) {
	cb := g.OnChanged
	g.OnChanged = nil
	g.SetSelected(opts)
	g.OnChanged = cb
}

// showChoice selects opt in a radio group.
func showChoice(r *widget.RadioGroup, opt string) {
	cb := r.OnChanged
	r.OnChanged = nil
	r.SetSelected(opt)
	r.OnChanged = cb
}
