package gui

import (
	"path/filepath"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/driver/desktop"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"

	"ullage/hazards"
)

// shell is the window's frame: menus, tool bar, the screens and the
// caution footer. It builds the panels and wires the few requests one
// panel makes of another (show this working, compare these two, show
// that field); everything else they learn from the document.
type shell struct {
	s       *session
	tabs    *container.AppTabs
	review  *container.TabItem
	revs    *container.TabItem
	compare *container.TabItem
	study   *container.TabItem
	form    fyne.CanvasObject
	// left holds the design form and, below it while open, the working.
	left    *container.Split
	working *workingPanel
	units   *widget.RadioGroup
	object  fyne.CanvasObject
}

// Keyboard shortcuts of the main commands.
var (
	shortcutNew    = &desktop.CustomShortcut{KeyName: fyne.KeyN, Modifier: fyne.KeyModifierShortcutDefault}
	shortcutQuit   = &desktop.CustomShortcut{KeyName: fyne.KeyQ, Modifier: fyne.KeyModifierShortcutDefault}
	shortcutOpen   = &desktop.CustomShortcut{KeyName: fyne.KeyO, Modifier: fyne.KeyModifierShortcutDefault}
	shortcutSave   = &desktop.CustomShortcut{KeyName: fyne.KeyS, Modifier: fyne.KeyModifierShortcutDefault}
	shortcutSaveAs = &desktop.CustomShortcut{KeyName: fyne.KeyS, Modifier: fyne.KeyModifierShortcutDefault | fyne.KeyModifierShift}
	shortcutExport = &desktop.CustomShortcut{KeyName: fyne.KeyE, Modifier: fyne.KeyModifierShortcutDefault}
)

// defaultWindowSize is the window's size when it opens: smaller than a
// 1280×800 screen, so that it fits with a title bar and a panel.
var defaultWindowSize = fyne.NewSize(1200, 720)

// Unit choices on the tool bar.
const (
	unitsBarSI = "SI"
	unitsBarUS = "US customary"
)

// buildWindow assembles every panel into the window.
func buildWindow(s *session) *shell {
	sh := &shell{s: s}
	s.shell = sh
	form := newDesignForm(s)
	results := newResultsPanel(s)
	working := newWorkingPanel(s)
	revs := newRevisionsPanel(s)
	cmp := newComparePanel(s)
	study := newTolerancePanel(s)
	sh.working = working
	working.present = sh.showWorking
	working.back = sh.hideWorking
	working.selectFinding = results.list.selectCriterion
	working.markKey = results.keys.mark
	results.showField = func() {
		sh.hideWorking()
		form.reveal(s.problem)
	}
	revs.compareTwo = func(earlier, later string) {
		cmp.pickTwo(earlier, later)
		sh.showCompare()
	}
	results.list.onPick = func(f hazards.Finding) { working.show(workSubject{criterion: f.Criterion}) }
	// Selecting a finding keeps the design form in place; its working
	// opens with "Show the working", and follows the selection once open.
	results.list.onSelect = func(f hazards.Finding) {
		if working.open {
			working.show(workSubject{criterion: f.Criterion})
		}
	}
	results.keys.onPick = func(r keyRow) { working.show(workSubject{keyLabel: r.label}) }

	sh.form = form.object
	sh.left = container.NewVSplit(form.object, working.object)
	sh.left.SetOffset(0.42)
	split := container.NewHSplit(sh.left, results.object)
	split.SetOffset(0.44)
	sh.review = container.NewTabItemWithIcon("Design review", theme.DocumentCreateIcon(), split)
	sh.revs = container.NewTabItemWithIcon("Revisions", theme.ListIcon(), revs.object)
	sh.compare = container.NewTabItemWithIcon("Compare revisions", theme.ContentCopyIcon(), container.New(narrowable{1000}, cmp.object))
	sh.study = container.NewTabItemWithIcon("Tolerance study", theme.GridIcon(), study.object)
	sh.tabs = container.NewAppTabs(sh.review, sh.revs, sh.compare, sh.study)
	cmp.shown = func() bool { return sh.tabs.Selected() == sh.compare }
	sh.tabs.OnSelected = func(t *container.TabItem) {
		if t == sh.compare {
			cmp.bringForward()
		}
	}

	sh.units = widget.NewRadioGroup([]string{unitsBarSI, unitsBarUS}, func(opt string) {
		if opt == unitsBarUS {
			s.setUnits(unitsUS)
		} else if opt == unitsBarSI {
			s.setUnits(unitsSI)
		}
	})
	sh.units.Horizontal = true
	sh.units.Required = true
	sh.syncUnits()
	bar := container.NewHBox(
		widget.NewButtonWithIcon("Open…", theme.FolderOpenIcon(), s.openDialog),
		widget.NewButtonWithIcon("Save", theme.DocumentSaveIcon(), func() { s.save(nil) }),
		widget.NewButtonWithIcon("Keep as revision…", theme.ContentAddIcon(), func() { s.askNewRevision(nil) }),
		widget.NewButtonWithIcon("Export assessment PDF…", theme.DocumentPrintIcon(), s.exportAssessmentDialog),
		widget.NewSeparator(),
		widget.NewLabel("Units:"), sh.units,
	)
	footer := newCautionFooter()
	sh.object = container.NewBorder(container.NewVBox(bar, widget.NewSeparator()), footer, nil, nil, sh.tabs)
	sh.rebuildMenu()
	s.changes.subscribe(sh.update)
	// The session follows each change last, once every panel shows it.
	s.changes.subscribe(s.follow)
	for _, sc := range []struct {
		sc desktop.CustomShortcut
		do func()
	}{
		{*shortcutNew, sh.newDesign},
		{*shortcutQuit, s.requestClose},
		{*shortcutOpen, s.openDialog},
		{*shortcutSave, func() { s.save(nil) }},
		{*shortcutSaveAs, func() { s.saveAs(nil) }},
		{*shortcutExport, s.exportAssessmentDialog},
	} {
		do := sc.do
		s.win.Canvas().AddShortcut(&sc.sc, func(fyne.Shortcut) { do() })
	}
	return sh
}

// newCautionFooter shows the first standard caution at all times.
func newCautionFooter() fyne.CanvasObject {
	l := widget.NewLabel(hazards.StandardCautions[0])
	l.Wrapping = fyne.TextWrapWord
	l.SizeName = theme.SizeNameCaptionText
	return container.NewVBox(widget.NewSeparator(),
		container.NewBorder(nil, nil, widget.NewIcon(theme.InfoIcon()), nil, l))
}

// syncUnits sets the tool bar's unit choice from the settings.
func (sh *shell) syncUnits() {
	want := unitsBarSI
	if sh.s.settings.Units == unitsUS {
		want = unitsBarUS
	}
	if sh.units.Selected != want {
		showChoice(sh.units, want)
	}
}

// update follows the units shown and the recent files (which change
// when a file is opened or saved), and brings the design review to the
// front when a revision is opened in the form.
func (sh *shell) update(c change) {
	switch c.cause {
	case causeUnits:
		sh.syncUnits()
	case causeOpened, causeSaved:
		sh.rebuildMenu()
	case causeRevision:
		sh.showReview()
	}
}

// rebuildMenu sets the main menu, with the current recent files.
func (sh *shell) rebuildMenu() {
	s := sh.s
	recent := fyne.NewMenuItem("Open recent", nil)
	var items []*fyne.MenuItem
	for _, p := range s.recentFiles() {
		path := p
		items = append(items, fyne.NewMenuItem(filepath.Base(path)+"  —  "+filepath.Dir(path), func() {
			s.confirmLeave("open another file", func() { s.openPath(path) })
		}))
	}
	if len(items) == 0 {
		none := fyne.NewMenuItem("No recent files", nil)
		none.Disabled = true
		items = append(items, none)
	}
	recent.ChildMenu = fyne.NewMenu("", items...)

	item := func(label string, sc fyne.Shortcut, do func()) *fyne.MenuItem {
		m := fyne.NewMenuItem(label, do)
		m.Shortcut = sc
		return m
	}
	example := fyne.NewMenuItem("Open the example", func() {
		s.confirmLeave("open the example", func() {
			if doc, err := exampleDocument(); err == nil {
				s.open(doc)
			}
		})
	})
	newDesign := item("New design", shortcutNew, sh.newDesign)
	quit := item("Quit", shortcutQuit, s.requestClose)
	quit.IsQuit = true
	file := fyne.NewMenu("File",
		newDesign,
		item("Open…", shortcutOpen, s.openDialog),
		recent, example,
		fyne.NewMenuItemSeparator(),
		item("Save", shortcutSave, func() { s.save(nil) }),
		item("Save as…", shortcutSaveAs, func() { s.saveAs(nil) }),
		fyne.NewMenuItemSeparator(),
		item("Export assessment PDF…", shortcutExport, s.exportAssessmentDialog),
		fyne.NewMenuItem("Export comparison PDF…", func() { sh.showCompare(); s.exportComparisonDialog() }),
		fyne.NewMenuItemSeparator(),
		fyne.NewMenuItem("Add a fluid from a file…", s.askUserFluid),
		fyne.NewMenuItem("Preferences…", s.showPreferences),
		fyne.NewMenuItemSeparator(),
		quit,
	)
	revision := fyne.NewMenu("Revision",
		fyne.NewMenuItem("Keep the working copy as a new revision…", func() { s.askNewRevision(nil) }),
		fyne.NewMenuItem("List revisions", sh.showRevisions),
		fyne.NewMenuItem("Compare revisions", sh.showCompare),
	)
	help := fyne.NewMenu("Help", fyne.NewMenuItem("About Ullage", s.showAbout))
	s.win.SetMainMenu(fyne.NewMainMenu(file, revision, help))
}

func (sh *shell) showReview()    { sh.tabs.Select(sh.review) }
func (sh *shell) showRevisions() { sh.tabs.Select(sh.revs) }
func (sh *shell) showCompare()   { sh.tabs.Select(sh.compare) }
func (sh *shell) showStudy()     { sh.tabs.Select(sh.study) }

// showWorking opens the working panel under the design form, which
// stays in place.
func (sh *shell) showWorking() {
	wp := sh.working
	wp.open = true
	if !wp.object.Visible() {
		wp.object.Show()
		sh.left.Refresh()
	}
	sh.showReview()
}

// hideWorking closes the working panel; the form has the side again.
func (sh *shell) hideWorking() {
	wp := sh.working
	if !wp.open {
		return
	}
	wp.open = false
	wp.object.Hide()
	sh.left.Refresh()
	wp.refresh()
}

// newDesign starts a new, blank design on the design review screen,
// asking first when work would be lost.
func (sh *shell) newDesign() {
	s := sh.s
	s.confirmLeave("start a new design", func() {
		if doc, err := newBlankDocument(s.settings.Criteria); err == nil {
			s.open(doc)
			sh.showReview()
		}
	})
}

// requestClose asks before closing when work would be lost.
func (s *session) requestClose() {
	s.confirmLeave("close Ullage", func() {
		s.stopAutosaving()
		s.assess.cancel()
		s.stopStudy()
		if s.doc == nil || !s.doc.dirty() {
			s.clearAutosave()
		}
		s.app.Quit()
	})
}
