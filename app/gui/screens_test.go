package gui

import (
	"flag"
	"fmt"
	"image/png"
	"os"
	"path/filepath"
	"reflect"
	"slices"
	"testing"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/test"
	"fyne.io/fyne/v2/widget"

	"ullage/app/look"
	"ullage/hazards"
)

// screensDir is where TestScreens writes its captures; none when empty.
var screensDir = flag.String("screens", "", "write a PNG of every screen into DIR/1280 and DIR/1920")

// screenSizes are the screens every state is checked, and captured, at.
var screenSizes = []fyne.Size{{Width: 1280, Height: 800}, {Width: 1920, Height: 1080}}

// screenCase is one screen or state of the window: how to open it from
// the freshly opened example, and the object a reviewer looks for on it.
type screenCase struct {
	name string
	open func(h *harness)
	key  func(h *harness) fyne.CanvasObject
}

// screenStudyUnits is the size of the studies drawn for the captures:
// the panel's default when they are written, fewer for the checks.
func screenStudyUnits() string {
	if *screensDir != "" {
		return fmt.Sprint(defaultStudyUnits)
	}
	return "4000"
}

// screenCases lists every screen and state a reviewer meets.
func screenCases() []screenCase {
	findings := func(h *harness) fyne.CanvasObject { return h.s.results.list.object }
	// A chart tab, scrolled into view when the window is too short for
	// the charts beside the findings.
	tab := func(i int) func(h *harness) {
		return func(h *harness) {
			r := h.s.results
			r.tabs.SelectIndex(i)
			h.layOut()
			h.scrollToShow(r.areaScroll, r.tabs)
		}
	}
	tabContent := func(h *harness) fyne.CanvasObject { return h.s.results.tabs.Selected().Content }
	section := func(i int) screenCase {
		names := []string{"product", "fluid", "vessel", "temperatures", "shock", "room", "criteria"}
		return screenCase{"form-" + names[i], func(h *harness) { h.s.form.scrollTo(i) },
			func(h *harness) fyne.CanvasObject { return h.s.form.sections[i] }}
	}
	study := func(spread string, charts bool) func(h *harness) {
		return func(h *harness) {
			if spread != "0" {
				h.s.revs.openRevision("A")
				h.idle()
			}
			h.s.shell.showStudy()
			tp := h.s.tol
			if spread != "0" {
				tp.hotDist.SetSelected(distributionNames["triangle"])
			}
			h.runStudyWith(screenStudyUnits(), fmt.Sprint(defaultStudySeed), spread)
			if charts {
				h.layOut()
				h.scrollToShow(tp.scroll, tp.hist)
			}
		}
	}
	overlay := func(h *harness) fyne.CanvasObject { return h.topOverlay() }
	cases := []screenCase{
		{"review", func(*harness) {}, findings},
		{"results-pressure", tab(0), tabContent},
		{"results-vapour", tab(1), tabContent},
		{"results-fillmap", tab(2), tabContent},
		{"results-keys", tab(3), tabContent},
		{"results-exposure", tab(4), tabContent},
	}
	for i := range 7 {
		cases = append(cases, section(i))
	}
	cases = append(cases, []screenCase{
		{"revisions", func(h *harness) { h.s.shell.showRevisions() }, func(h *harness) fyne.CanvasObject { return h.s.revs.object }},
		{"compare", func(h *harness) { h.s.shell.showCompare() }, func(h *harness) fyne.CanvasObject { return h.s.cmp.object }},
		{"working", func(h *harness) {
			h.s.working.show(workSubject{criterion: hazards.CriterionBurst})
		}, func(h *harness) fyne.CanvasObject { return h.s.working.steps }},
		{"working-key-number", func(h *harness) {
			h.s.results.tabs.SelectIndex(3)
			h.s.working.show(workSubject{keyLabel: "Maximum safe temperature"})
		}, func(h *harness) fyne.CanvasObject { return h.s.working.steps }},
		{"working-whole-record", func(h *harness) {
			h.s.working.show(workSubject{criterion: hazards.CriterionBurst})
			h.s.working.mode.SetSelected(workingWhole)
		}, func(h *harness) fyne.CanvasObject { return h.s.working.steps }},
		{"study-plain", study("0", false), func(h *harness) fyne.CanvasObject { return h.s.tol.results }},
		{"study-spread", study("5", false), func(h *harness) fyne.CanvasObject { return h.s.tol.results }},
		{"study-charts", study("5", true), func(h *harness) fyne.CanvasObject { return h.s.tol.hist }},
		{"preferences", func(h *harness) { h.s.showPreferences() }, overlay},
		{"about", func(h *harness) { h.s.showAbout() }, overlay},
		{"new-revision", func(h *harness) {
			h.typeInto("fill_mass_kg", "20")
			h.s.revs.askNewRevision(nil)
		}, overlay},
		{"invalid-input", func(h *harness) { h.typeInto("fill_mass_kg", "-5") }, func(h *harness) fyne.CanvasObject { return h.s.results.stale }},
		{"typo", func(h *harness) { h.typeInto("hottest_k", "7O") }, func(h *harness) fyne.CanvasObject { return h.s.results.stale }},
		{"failing-revision-a", func(h *harness) { h.s.revs.openRevision("A") }, findings},
		{"us-units", func(h *harness) {
			h.s.setUnits(unitsUS)
			h.idle()
			h.s.form.scrollTo(2)
		}, func(h *harness) fyne.CanvasObject { return h.s.form.sections[2] }},
		{"new-design", func(h *harness) { h.s.shell.newDesign() }, func(h *harness) fyne.CanvasObject { return h.s.results.stale }},
		{"open-dialog", func(h *harness) { h.s.openDialog() }, overlay},
		{"unsaved-close", func(h *harness) {
			h.typeInto("fill_mass_kg", "20")
			h.s.requestClose()
		}, overlay},
	}...)
	return cases
}

// TestScreens opens every screen and state at 1280×800 and 1920×1080 in
// the program's own look, and checks that the object a reviewer looks
// for is in view and that no text is squeezed below its size or pushed
// off the window. With -screens DIR it writes each as DIR/1280/NAME.png
// and DIR/1920/NAME.png.
func TestScreens(t *testing.T) {
	if *screensDir != "" {
		for _, s := range screenSizes {
			if err := os.MkdirAll(filepath.Join(*screensDir, fmt.Sprint(s.Width)), 0o777); err != nil {
				t.Fatal(err)
			}
		}
	}
	set := testApp().Settings()
	was := set.Theme()
	set.SetTheme(look.New(look.Light))
	defer set.SetTheme(was)
	for _, sc := range screenCases() {
		t.Run(sc.name, func(t *testing.T) {
			h := newHarness(t)
			sc.open(h)
			h.idle()
			for _, size := range screenSizes {
				h.w.Resize(size)
				h.idle()
				h.layOut()
				h.checkScreen(t, sc, size)
				if *screensDir != "" {
					h.capture(t, filepath.Join(*screensDir, fmt.Sprint(size.Width), sc.name+".png"))
				}
			}
		})
	}
}

// capture writes the window as a PNG.
func (h *harness) capture(t *testing.T, path string) {
	t.Helper()
	f, err := os.Create(path)
	if err != nil {
		t.Fatal(err)
	}
	if err := png.Encode(f, h.w.Canvas().Capture()); err != nil {
		f.Close()
		t.Fatal(err)
	}
	if err := f.Close(); err != nil {
		t.Fatal(err)
	}
}

// box is a rectangle of the window.
type box struct{ x0, y0, x1, y1 float32 }

func boxAt(p fyne.Position, s fyne.Size) box { return box{p.X, p.Y, p.X + s.Width, p.Y + s.Height} }

func (b box) and(c box) box {
	return box{max(b.x0, c.x0), max(b.y0, c.y0), min(b.x1, c.x1), min(b.y1, c.y1)}
}

func (b box) empty() bool { return b.x1 <= b.x0 || b.y1 <= b.y0 }

// inside reports whether b lies within c, give or take half a pixel.
func (b box) inside(c box) bool {
	const e = 0.5
	return b.x0+e >= c.x0 && b.y0+e >= c.y0 && b.x1 <= c.x1+e && b.y1 <= c.y1+e
}

func (b box) String() string {
	return fmt.Sprintf("%.0f,%.0f–%.0f,%.0f", b.x0, b.y0, b.x1, b.y1)
}

// seen is a visible object: where it is in the window, the part of the
// window it can be seen through (its scrolls' views), and whether it is
// inside a scroll.
type seen struct {
	o        fyne.CanvasObject
	at, view box
	scrolled bool
}

// visibleObjects visits every visible object of the window and of its
// dialogs, with where it is.
func (h *harness) visibleObjects(visit func(seen)) {
	c := h.w.Canvas()
	win := boxAt(fyne.NewPos(0, 0), c.Size())
	var walkSeen func(o fyne.CanvasObject, origin fyne.Position, view box, scrolled bool)
	walkSeen = func(o fyne.CanvasObject, origin fyne.Position, view box, scrolled bool) {
		if o == nil || !o.Visible() {
			return
		}
		pos := origin.Add(o.Position())
		at := boxAt(pos, o.Size())
		visit(seen{o: o, at: at, view: view, scrolled: scrolled})
		switch x := o.(type) {
		case *container.Scroll:
			view, scrolled = view.and(at), true
		case *widget.List:
			view, scrolled = view.and(at), true
		case *widget.Entry, *widget.SelectEntry:
			// An entry scrolls its own text, and lays out its own
			// drop-down button.
			return
		case *fyne.Container:
			for _, k := range x.Objects {
				walkSeen(k, pos, view, scrolled)
			}
			return
		}
		if w, ok := o.(fyne.Widget); ok {
			for _, k := range test.WidgetRenderer(w).Objects() {
				walkSeen(k, pos, view, scrolled)
			}
		}
	}
	walkSeen(c.Content(), fyne.NewPos(0, 0), win, false)
	for _, o := range c.Overlays().List() {
		walkSeen(o, fyne.NewPos(0, 0), win, false)
	}
}

// checkScreen asserts that the screen's key object is in view and that
// no label, button or choice is smaller than it needs or lies beyond
// the window's edge.
func (h *harness) checkScreen(t *testing.T, sc screenCase, size fyne.Size) {
	t.Helper()
	key := sc.key(h)
	found := false
	var problems []string
	h.visibleObjects(func(v seen) {
		if v.o == key {
			found = true
			if v.at.and(v.view).empty() {
				problems = append(problems, fmt.Sprintf("the key object (%T at %v) is scrolled out of view %v", key, v.at, v.view))
			}
		}
		if !v.scrolled && !v.at.inside(v.view) && v.o.Size().Width > 0 && v.o.Size().Height > 0 {
			problems = append(problems, fmt.Sprintf("%s at %v lies beyond the window %v", describe(v.o), v.at, v.view))
		}
		if v.at.and(v.view).empty() {
			return
		}
		if squeezed(v.o) {
			problems = append(problems, fmt.Sprintf("%s is %.0f×%.0f, needs %.0f×%.0f",
				describe(v.o), v.o.Size().Width, v.o.Size().Height, v.o.MinSize().Width, v.o.MinSize().Height))
		}
	})
	if !found {
		problems = append(problems, fmt.Sprintf("the key object (%T) is not shown", key))
	}
	if len(problems) > 10 {
		problems = append(problems[:10], fmt.Sprintf("and %d more", len(problems)-10))
	}
	for _, p := range problems {
		t.Errorf("%s at %s: %s", sc.name, fmtSize(size), p)
	}
}

// squeezed reports whether a text-bearing widget was laid out smaller
// than its text needs, so that part of it is cut off.
func squeezed(o fyne.CanvasObject) bool {
	switch x := o.(type) {
	case *widget.Label:
		if x.Truncation != fyne.TextTruncateOff || x.Text == "" {
			return false
		}
	case *widget.Button, *widget.Check, *widget.RadioGroup, *widget.Select, *widget.Hyperlink:
	default:
		return false
	}
	const e = 0.5
	s, m := o.Size(), o.MinSize()
	return s.Width+e < m.Width || s.Height+e < m.Height
}

// describe names an object for a failure message.
func describe(o fyne.CanvasObject) string {
	switch x := o.(type) {
	case *widget.Label:
		return fmt.Sprintf("label %q", x.Text)
	case *fitLabel:
		return fmt.Sprintf("label %q", x.Text)
	case *widget.Button:
		if x.Text == "" && x.Icon != nil {
			return fmt.Sprintf("button %s", x.Icon.Name())
		}
		return fmt.Sprintf("button %q", x.Text)
	case *widget.Check:
		return fmt.Sprintf("tick box %q", x.Text)
	case *widget.Select:
		return fmt.Sprintf("choice %q", x.Selected)
	case *widget.RadioGroup:
		return fmt.Sprintf("choices %q", x.Options)
	}
	return fmt.Sprintf("%T", o)
}

// scrollToShow scrolls so that o, inside sc, is at the top of its view.
func (h *harness) scrollToShow(sc *container.Scroll, o fyne.CanvasObject) {
	h.t.Helper()
	d := fyne.CurrentApp().Driver()
	y := d.AbsolutePositionForObject(o).Y - d.AbsolutePositionForObject(sc.Content).Y
	sc.ScrollToOffset(fyne.NewPos(0, y))
}

// layOut lays the window and its dialogs out again from the top until
// nothing moves, as the real driver does over its first frames: it lays
// out again whatever holds an object whose minimum size changed (a
// panel just shown, a wrapped text given its width). The test driver
// lays out only on a resize or a refresh.
func (h *harness) layOut() {
	h.t.Helper()
	c := h.w.Canvas()
	var visit func(o fyne.CanvasObject, record func(fyne.CanvasObject))
	visit = func(o fyne.CanvasObject, record func(fyne.CanvasObject)) {
		if o == nil || !o.Visible() {
			return
		}
		record(o)
		switch x := o.(type) {
		case *fyne.Container:
			if x.Layout != nil {
				x.Layout.Layout(x.Objects, x.Size())
			}
			for _, k := range x.Objects {
				visit(k, record)
			}
		case fyne.Widget:
			r := test.WidgetRenderer(x)
			r.Layout(x.Size())
			for _, k := range r.Objects() {
				visit(k, record)
			}
		}
	}
	// A pass records every object visited: its kind, place and size.
	type placed struct {
		kind reflect.Type
		pos  fyne.Position
		s    fyne.Size
	}
	pass := func(into []placed) []placed {
		into = into[:0]
		record := func(o fyne.CanvasObject) { into = append(into, placed{reflect.TypeOf(o), o.Position(), o.Size()}) }
		visit(c.Content(), record)
		for _, o := range c.Overlays().List() {
			visit(o, record)
		}
		return into
	}
	last := pass(nil)
	var now []placed
	for range 8 {
		now = pass(now)
		if slices.Equal(now, last) {
			return
		}
		last, now = now, last
	}
	h.t.Error("the window's layout does not come to rest")
}
