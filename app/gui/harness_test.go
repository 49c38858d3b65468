package gui

import (
	"testing"
	"time"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/test"
	"fyne.io/fyne/v2/widget"
)

// harness is a review window on Fyne's headless test driver. Work that
// the program hands to the UI goroutine with fyne.Do is queued here and
// run on the test's goroutine by idle, so tests read widgets without
// racing the background assessment.
type harness struct {
	t     testing.TB
	s     *session
	w     fyne.Window
	queue chan func()
}

// fixedNow is the date new revisions get in tests.
var fixedNow = time.Date(2026, 11, 3, 10, 0, 0, 0, time.UTC)

// newHarness opens the bundled example in a test window.
func newHarness(t testing.TB) *harness {
	t.Helper()
	return newHarnessIn(t, t.TempDir())
}

// newHarnessIn is newHarness with a chosen storage folder.
func newHarnessIn(t testing.TB, dataDir string) *harness {
	t.Helper()
	a := test.NewTempApp(t)
	w := test.NewTempWindow(t, widget.NewLabel(""))
	h := &harness{t: t, w: w, queue: make(chan func(), 4096)}
	s, err := newSession(a, w, options{
		post:    func(f func()) { h.queue <- f },
		delay:   0,
		dataDir: dataDir,
		now:     func() time.Time { return fixedNow },
	})
	if err != nil {
		t.Fatal(err)
	}
	h.s = s
	sh := buildWindow(s)
	w.SetContent(sh.object)
	w.Resize(fyne.NewSize(1280, 800))
	doc, err := exampleDocument()
	if err != nil {
		t.Fatal(err)
	}
	s.open(doc)
	h.idle()
	return h
}

// idle runs queued UI work until no assessment is pending.
func (h *harness) idle() {
	h.t.Helper()
	deadline := time.Now().Add(30 * time.Second)
	for {
		select {
		case f := <-h.queue:
			f()
			continue
		default:
		}
		if h.s.assess.pending.Load() == 0 && len(h.queue) == 0 {
			return
		}
		if time.Now().After(deadline) {
			h.t.Fatal("the window did not settle within 30 s")
		}
		time.Sleep(200 * time.Microsecond)
	}
}

// field returns the number field at a JSON path.
func (h *harness) field(path string) *numField {
	h.t.Helper()
	f, ok := h.s.form.byPath[path]
	if !ok {
		h.t.Fatalf("no field %s on the form", path)
	}
	return f
}

// typeInto replaces a field's text by typing, as a person would, and
// waits for the results.
func (h *harness) typeInto(path, text string) {
	h.t.Helper()
	f := h.field(path)
	h.w.Canvas().Focus(f.entry)
	f.entry.SetText("")
	test.Type(f.entry, text)
	h.idle()
}

// findings returns the findings on screen by criterion.
func (h *harness) findings() map[string]string {
	out := map[string]string{}
	for _, f := range h.s.results.list.rows {
		out[f.Criterion] = string(f.Status)
	}
	return out
}

// labels returns the text of every label under o, in tree order.
func labels(o fyne.CanvasObject) []string {
	var out []string
	walk(o, func(o fyne.CanvasObject) {
		if l, ok := o.(*widget.Label); ok {
			out = append(out, l.Text)
		}
	})
	return out
}

// walk visits o and every object inside it.
func walk(o fyne.CanvasObject, visit func(fyne.CanvasObject)) {
	if o == nil {
		return
	}
	visit(o)
	switch x := o.(type) {
	case *fyne.Container:
		for _, c := range x.Objects {
			walk(c, visit)
		}
	case fyne.Widget:
		r := test.WidgetRenderer(x)
		for _, c := range r.Objects() {
			walk(c, visit)
		}
	}
}

// button finds a button by its text under o.
func button(t testing.TB, o fyne.CanvasObject, text string) *widget.Button {
	t.Helper()
	var found *widget.Button
	walk(o, func(o fyne.CanvasObject) {
		if b, ok := o.(*widget.Button); ok && b.Text == text && found == nil {
			found = b
		}
	})
	if found == nil {
		t.Fatalf("no button %q", text)
	}
	return found
}

// entries lists the entries under o in tree order.
func entries(o fyne.CanvasObject) []*widget.Entry {
	var out []*widget.Entry
	walk(o, func(o fyne.CanvasObject) {
		if e, ok := o.(*widget.Entry); ok {
			out = append(out, e)
		}
	})
	return out
}

// topOverlay returns the dialog on top of the window.
func (h *harness) topOverlay() fyne.CanvasObject {
	h.t.Helper()
	top := h.w.Canvas().Overlays().Top()
	if top == nil {
		h.t.Fatal("no dialog is open")
	}
	return top
}
