package gui

import (
	"fmt"
	"strings"
	"time"

	"fyne.io/fyne/v2"

	"ullage/fluids"
)

// options adjust a session for tests; the program uses the defaults.
type options struct {
	// post runs a function on the UI goroutine; fyne.Do when nil.
	post func(func())
	// delay is the pause after a keystroke before the assessment runs.
	delay time.Duration
	// dataDir is where the working copy is autosaved; the app's storage
	// when empty.
	dataDir string
	// autosaveEvery is the autosave period; 0 turns autosave off.
	autosaveEvery time.Duration
	// now gives the time for revision dates; time.Now when nil.
	now func() time.Time
}

// typingDelay is how long the form waits after the last keystroke before
// assessing: long enough to merge a burst of typing, short enough to feel
// immediate.
const typingDelay = 150 * time.Millisecond

// autosavePeriod is how often the working copy is kept in the app's
// storage while it has unsaved changes.
const autosavePeriod = 30 * time.Second

// session is one review window: the document, the reviewer's settings,
// the fluid library, the last results and the panels that show them.
type session struct {
	app  fyne.App
	win  fyne.Window
	opts options

	settings settings
	builtin  *fluids.Library
	user     []*fluids.Substance
	lib      *fluids.Library

	doc *document

	assess *assessor
	// last is the newest good outcome; its assessment is nil before the
	// first one arrives.
	last outcome
	// problem is the input refused, by the engine or because an entry
	// holds no number; nil when the inputs are good.
	problem *problem
	// compared is the comparison the compare screen shows, nil while it
	// shows none that can be exported.
	compared *comparedPair

	// changes tells the panels of every change of the document, its
	// results and the units shown; the panels subscribe as they are
	// built, the session itself last.
	changes *feed

	form    *designForm
	results *resultsPanel
	working *workingPanel
	tol     *tolerancePanel
	revs    *revisionsPanel
	cmp     *comparePanel
	shell   *shell

	// dialogs are the open dialogs that Enter and Escape answer, newest
	// last; windowKeys is the window's key handler while they are open.
	dialogs    []*dialogKeys
	windowKeys func(*fyne.KeyEvent)
	// lastWhere is the newest where-to-write dialog, for tests.
	lastWhere *whereDialog

	stopAutosave chan struct{}
	// lost is the most recent file when it could not be opened at start.
	lost *lostRecent
}

// newSession builds a session on a window, without content yet.
func newSession(a fyne.App, w fyne.Window, o options) (*session, error) {
	if o.post == nil {
		o.post = fyne.Do
	}
	if o.now == nil {
		o.now = time.Now
	}
	lib, err := fluids.Builtin()
	if err != nil {
		return nil, fmt.Errorf("the fluid library does not load: %w", err)
	}
	s := &session{app: a, win: w, opts: o, builtin: lib, lib: lib, changes: &feed{}}
	s.settings = loadSettings(a.Preferences())
	s.assess = &assessor{delay: o.delay, post: o.post}
	s.loadUserFluidsFromPrefs()
	return s, nil
}

// units returns the unit system in use.
func (s *session) units() unitSystem { return s.settings.Units }

// open makes doc the document of the window; its opening is published
// to every panel.
func (s *session) open(doc *document) {
	s.assess.cancel()
	if s.doc != nil {
		s.doc.feed = nil
	}
	s.doc = doc
	s.last = outcome{}
	s.problem = nil
	doc.openIn(s.changes)
}

// follow is the session's own part in a change, after every panel has
// shown it: the title, and an assessment of the working copy when its
// inputs changed.
func (s *session) follow(c change) {
	switch {
	case c.cause == causeOpened || c.cause == causeRevision:
		s.updateTitle()
		s.reassess(true)
	case c.cause.edit():
		s.updateTitle()
		s.reassess(false)
	case c.cause == causeKept || c.cause == causeSaved:
		s.updateTitle()
	case c.cause == causeUnits:
		if s.problem != nil {
			s.reassess(true)
		}
	case c.cause == causeLibrary:
		s.reassess(true)
	}
}

// reassess schedules an assessment of the working copy, unless an entry
// of the form holds no number, in which case the results are marked out
// of date until it is fixed.
func (s *session) reassess(now bool) {
	if ff, e, ok := s.doc.firstUnread(); ok {
		s.assess.cancel()
		s.problem = &problem{Path: ff.path, Text: e.message(ff, &s.doc.Work, s.units())}
		s.changes.publish(change{cause: causeResults})
		return
	}
	delay := s.assess.delay
	if now {
		s.assess.delay = 0
	}
	s.assess.schedule(s.doc.Work, s.lib, s.applyOutcome)
	s.assess.delay = delay
}

// applyOutcome shows a finished assessment; on the UI goroutine.
func (s *session) applyOutcome(o outcome) {
	if o.err != nil {
		p := problemOf(o.err, s.units(), quantityOf)
		s.problem = &p
	} else {
		s.problem = nil
		s.last = o
	}
	s.changes.publish(change{cause: causeResults})
}

// stale reports whether the results on screen are older than the inputs.
func (s *session) stale() bool { return s.problem != nil }

// setUnits switches the unit system everywhere. The entries show the
// working copy afresh in the new units: text typed that was not a
// number is forgotten.
func (s *session) setUnits(u unitSystem) {
	if s.settings.Units == u {
		return
	}
	s.settings.Units = u
	s.settings.save(s.app.Preferences())
	if s.doc == nil {
		return
	}
	s.doc.forgetTyped(nil)
	s.changes.publish(change{cause: causeUnits})
}

// updateTitle names the file, the revision and unsaved changes in the
// window title.
func (s *session) updateTitle() {
	if s.doc == nil {
		return
	}
	t := "Ullage — " + s.doc.Name
	if s.doc.Base != "" {
		t += " — revision " + s.doc.Base
		if s.doc.workChanged() {
			t += " with changes"
		}
	}
	if s.doc.dirty() {
		t += " (unsaved)"
	}
	s.win.SetTitle(t)
}

// rebuildLibrary rebuilds the library from the built-in fluids and the
// reviewer's own.
func (s *session) rebuildLibrary() {
	s.lib = s.builtin.With(s.user...)
}

// plural returns "n thing" or "n things".
func plural(n int, thing string) string {
	if n == 1 {
		return fmt.Sprintf("1 %s", thing)
	}
	if strings.HasSuffix(thing, "y") {
		return fmt.Sprintf("%d %sies", n, strings.TrimSuffix(thing, "y"))
	}
	return fmt.Sprintf("%d %ss", n, thing)
}
