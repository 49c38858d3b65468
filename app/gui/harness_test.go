package gui

import (
	"fmt"
	"os"
	"runtime/debug"
	"strings"
	"testing"
	"time"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
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

// Building the whole window costs far more than any check made on it
// (under the race detector about a second, most of it measuring text),
// so the tests of the package share one window: newHarness hands it out
// reset to the freshly opened example, and builds it again only when
// the reset could not bring it back to the state of a new window or a
// test failed on it. All windows live in one test app, so that Fyne's
// font and text-size caches, which test.NewApp empties, stay warm.
var shared struct {
	app fyne.App
	// h is the shared window, nil until the first test asks for it and
	// after a test failed on it.
	h *harness
	// pristine is the state of h right after it was built.
	pristine string
	// builds counts the windows built, for the log at the end.
	builds int
}

// testApp returns the package's test app, making it current.
func testApp() fyne.App {
	if shared.app == nil {
		a := test.NewApp()
		shared.app = measuringApp{App: a, d: &measuringDriver{Driver: a.Driver(), sizes: map[fontKey]map[string]textSize{}}}
	}
	fyne.SetCurrentApp(shared.app)
	return shared.app
}

// clearPreferences empties the test app's preferences, as a new app's.
func clearPreferences(t testing.TB, a fyne.App) {
	t.Helper()
	p, ok := a.Preferences().(interface{ WriteValues(func(map[string]any)) })
	if !ok {
		t.Fatalf("the test app's preferences (%T) cannot be cleared", a.Preferences())
	}
	p.WriteValues(func(m map[string]any) {
		for k := range m {
			delete(m, k)
		}
	})
}

// newHarness opens the bundled example in the shared test window, reset
// to the state of a window just opened on it, with an empty storage
// folder and default preferences. Tests using it must not run in
// parallel.
func newHarness(t testing.TB) *harness {
	t.Helper()
	return newHarnessIn(t, t.TempDir())
}

// newHarnessIn is newHarness with a chosen storage folder. Calling it
// again on the same folder is the next run of the program on the same
// storage, as after a crash: what the earlier run left in the folder is
// still there, everything else is as in a new window.
func newHarnessIn(t testing.TB, dataDir string) *harness {
	t.Helper()
	h := shared.h
	if h == nil || !h.resetIn(t, dataDir) {
		if h != nil {
			h.w.Close()
		}
		clearPreferences(t, testApp())
		shared.builds++
		h = buildHarness(t, dataDir, testApp().NewWindow(""))
		shared.h, shared.pristine = h, h.state()
	}
	t.Cleanup(func() {
		// Leave nothing running into the next test; a window a test
		// failed on is not handed out again.
		if !h.settle() || t.Failed() {
			if shared.h == h {
				shared.h = nil
			}
			h.w.Close()
		}
	})
	return h
}

// buildHarness builds the whole window on w and opens the example.
func buildHarness(t testing.TB, dataDir string, w fyne.Window) *harness {
	t.Helper()
	a := testApp()
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

// settle stops the study and any assessment and runs what is queued,
// reporting whether the window came to rest.
func (h *harness) settle() bool {
	h.s.stopStudy()
	h.s.assess.cancel()
	deadline := time.NewTimer(30 * time.Second)
	defer deadline.Stop()
	for {
		select {
		case f := <-h.queue:
			f()
			continue
		default:
		}
		if h.s.assess.pending.Load() == 0 {
			return true
		}
		select {
		case f := <-h.queue:
			f()
		case <-deadline.C:
			return false
		}
	}
}

// reset brings the shared window back to the state of a window just
// built on the example: no dialog, default preferences and units, no
// fluid of the reviewer's own, a new storage folder, the design review
// screen with the form, an empty fluid find, no study, and the example
// opened afresh. It reports false, and says why, when the window still
// differs from a new one in what it shows.
func (h *harness) reset(t testing.TB) bool {
	t.Helper()
	return h.resetIn(t, t.TempDir())
}

// resetIn is reset with a chosen storage folder.
func (h *harness) resetIn(t testing.TB, dataDir string) bool {
	t.Helper()
	h.t = t
	a := testApp()
	s, sh, c := h.s, h.s.shell, h.w.Canvas()
	if !h.settle() {
		t.Log("the shared window did not come to rest; building a new one")
		return false
	}
	for top := c.Overlays().Top(); top != nil; top = c.Overlays().Top() {
		c.Overlays().Remove(top)
	}
	if len(s.dialogs) > 0 {
		s.dialogs = nil
		c.SetOnTypedKey(s.windowKeys)
	}
	c.Unfocus()
	h.w.Resize(fyne.NewSize(1280, 800))

	s.stopAutosaving()
	s.opts.dataDir = dataDir
	clearPreferences(t, a)
	s.settings = loadSettings(a.Preferences())
	s.user = nil
	s.rebuildLibrary()

	sh.hideWorking()
	wp := s.working
	if wp.whole {
		wp.mode.SetSelected(workingBehind)
	}
	wp.subject = workSubject{}
	sh.showReview()
	sh.syncUnits()
	sh.rebuildMenu()
	s.results.tabs.SelectIndex(0)
	s.results.list.selected = -1
	s.cmp.onlyChanged.SetChecked(false)
	s.cmp.pickA.Selected, s.cmp.pickB.Selected = "", ""
	s.form.fluid.find.SetText("")

	// The fluid finder keeps its text across documents; a new window's
	// is empty (emptying it finds nothing, so chooses nothing).
	s.form.fluid.find.SetText("")

	tp := s.tol
	tp.st = study{gen: tp.st.gen}
	tp.afterRun = nil
	tp.units.SetText(fmt.Sprint(defaultStudyUnits))
	tp.seed.SetText(fmt.Sprint(defaultStudySeed))
	tp.spread.SetText("0")
	tp.hotDist.SetSelected(tp.hotDist.Options[0])
	tp.dimDist.SetSelected(tp.dimDist.Options[0])
	tp.problem.SetText("")
	tp.problem.Hide()
	tp.status.SetText("")
	tp.scroll.ScrollToTop()

	doc, err := exampleDocument()
	if err != nil {
		t.Fatal(err)
	}
	s.open(doc)
	h.idle()
	tp.refresh()
	s.form.scroll.ScrollToTop()
	if got := h.state(); got != shared.pristine {
		t.Logf("the shared window differs from a new one after the reset (%s); building a new one", firstDifference(got, shared.pristine))
		return false
	}
	return true
}

// state describes what the window shows: every visible object's kind,
// texts, choices, ticks, tabs and scroll positions, the title and the
// dialogs, and the values of the inputs on hidden screens (what is only
// displayed there is drawn again before it is shown). A list counts by
// its rows, which the tests read from the panels' own data. Two windows
// in the same state look and behave the same to a person using them.
func (h *harness) state() string {
	var b strings.Builder
	fmt.Fprintf(&b, "title %q overlays %d\n", h.w.Title(), len(h.w.Canvas().Overlays().List()))
	var visit func(o fyne.CanvasObject, hidden bool)
	visit = func(o fyne.CanvasObject, hidden bool) {
		if o == nil {
			return
		}
		hidden = hidden || !o.Visible()
		if !hidden {
			fmt.Fprintf(&b, "%T", o)
		}
		switch x := o.(type) {
		case *widget.Entry:
			fmt.Fprintf(&b, " entry %q %v", x.Text, x.Disabled())
		case *widget.Select:
			fmt.Fprintf(&b, " select %q %q %v", x.Selected, x.Options, x.Disabled())
		case *widget.Check:
			fmt.Fprintf(&b, " check %v %v", x.Checked, x.Disabled())
		case *widget.RadioGroup:
			fmt.Fprintf(&b, " radio %q", x.Selected)
		}
		if !hidden {
			switch x := o.(type) {
			case *widget.Label:
				fmt.Fprintf(&b, " %q %d", x.Text, x.Importance)
			case *fitLabel:
				fmt.Fprintf(&b, " %q %v", x.Text, x.TextStyle)
			case *widget.Button:
				fmt.Fprintf(&b, " %q %v", x.Text, x.Disabled())
			case *widget.RichText:
				fmt.Fprintf(&b, " %q", x.String())
			case *container.AppTabs:
				fmt.Fprintf(&b, " tab %d", x.SelectedIndex())
			case *container.Scroll:
				fmt.Fprintf(&b, " at %v", x.Offset)
			case *widget.List:
				fmt.Fprintf(&b, " rows %d\n", x.Length())
				return
			}
			b.WriteByte('\n')
		}
		switch x := o.(type) {
		case *widget.List, *widget.Entry:
			// Rows and the cursor come and go with scrolling and focus.
			return
		case *fyne.Container:
			for _, c := range x.Objects {
				visit(c, hidden)
			}
		case fyne.Widget:
			for _, c := range test.WidgetRenderer(x).Objects() {
				visit(c, hidden)
			}
		}
	}
	visit(h.w.Content(), false)
	return b.String()
}

// firstDifference quotes the first line where two states differ.
func firstDifference(a, b string) string {
	la, lb := strings.Split(a, "\n"), strings.Split(b, "\n")
	for i := range min(len(la), len(lb)) {
		if la[i] != lb[i] {
			return fmt.Sprintf("line %d: %q, new window %q, after %q", i+1, la[i], lb[i], la[max(i-3, 0):i])
		}
	}
	return fmt.Sprintf("%d lines, new window %d", len(la), len(lb))
}

// idle runs queued UI work until no assessment is pending. Every
// pending piece of work ends by posting to the queue, so idle blocks on
// the queue rather than polling: a poll loop steals a core from the
// background assessment it waits for.
func (h *harness) idle() {
	h.t.Helper()
	deadline := time.NewTimer(30 * time.Second)
	defer deadline.Stop()
	for {
		select {
		case f := <-h.queue:
			f()
			continue
		default:
		}
		if h.s.assess.pending.Load() == 0 {
			return
		}
		select {
		case f := <-h.queue:
			f()
		case <-deadline.C:
			h.t.Fatal("the window did not settle within 30 s")
		}
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
		switch l := o.(type) {
		case *widget.Label:
			out = append(out, l.Text)
		case *fitLabel:
			out = append(out, l.Text)
		}
	})
	return out
}

// walk visits o and every object inside it. A label of one line is one
// object: the part of its text that fits is not visited again.
func walk(o fyne.CanvasObject, visit func(fyne.CanvasObject)) {
	if o == nil {
		return
	}
	visit(o)
	switch x := o.(type) {
	case *fitLabel:
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
		switch e := o.(type) {
		case *widget.Entry:
			out = append(out, e)
		case *dialogEntry:
			out = append(out, &e.Entry)
		case *noTabEntry:
			out = append(out, &e.Entry)
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

// TestResetLeavesNothingBehind: after a test has changed everything a
// reviewer can change, the reset brings the shared window back to the
// state of a new one, so tests stay independent and the window is not
// built again for nothing.
func TestResetLeavesNothingBehind(t *testing.T) {
	h := newHarness(t)
	h.typeInto("fill_mass_kg", "oops")
	h.s.settings.Reviewer = "Someone"
	h.s.setUnits(unitsUS)
	h.idle()
	button(t, h.s.form.object, "Add a tube").OnTapped()
	h.idle()
	h.s.working.show(workSubject{criterion: h.s.results.list.rows[0].Criterion})
	h.s.cmp.onlyChanged.SetChecked(true)
	h.s.tol.units.SetText("lots")
	h.s.shell.tabs.SelectIndex(2)
	h.s.requestClose()
	h.idle()
	if h.w.Canvas().Overlays().Top() == nil {
		t.Fatal("closing with unsaved work asked nothing")
	}
	if !h.reset(t) {
		t.Fatal("the reset did not bring the window back to the state of a new one")
	}
	if h.s.settings.Reviewer != "" || h.s.units() != unitsSI || h.s.doc.dirty() || h.s.stale() || h.s.working.open {
		t.Errorf("after the reset: reviewer %q, units %s, dirty %v, stale %v, working open %v",
			h.s.settings.Reviewer, h.s.units(), h.s.doc.dirty(), h.s.stale(), h.s.working.open)
	}
}

// TestMain runs the package's tests and, with -v, says how many windows
// they built: one is the aim, each more costs a whole window's layout.
//
// The tests make a great deal of short-lived garbage (every layout
// shapes text again) and keep little: collecting when the heap has grown
// fivefold rather than twofold cuts their processor time by a quarter,
// for about 1 GB of memory at most (under 3 GB with the race detector).
func TestMain(m *testing.M) {
	debug.SetGCPercent(400)
	code := m.Run()
	if testing.Verbose() {
		fmt.Printf("%d test windows built\n", shared.builds)
		if a, ok := shared.app.(measuringApp); ok {
			fmt.Printf("text measured %d times, %d of them remembered\n", a.d.calls, a.d.found)
		}
	}
	os.Exit(code)
}
