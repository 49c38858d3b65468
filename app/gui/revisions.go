package gui

import (
	"fmt"
	"strings"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/dialog"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"

	"ullage/fluids"
	"ullage/hazards"
	"ullage/hazards/designfile"
)

// revisionsPanel lists the revisions of the design file, newest first,
// with the working copy on top when it has changes, and opens any of
// them in the form.
type revisionsPanel struct {
	s *session
	// rows are the revisions shown, newest first; a nil revision is the
	// working copy.
	rows     []*designfile.Revision
	verdicts map[string]hazards.Status // by fingerprint
	working  hazards.Status
	selected int

	list   *widget.List
	open   *widget.Button
	detail *widget.Label
	object fyne.CanvasObject

	// compareTwo shows the comparison of two revisions by label ("" for
	// the working copy); the window sets it to its compare screen.
	compareTwo func(earlier, later string)
}

// Columns of the revision list: label, date, author, verdict, change note.
var revisionColumns = columns{fractions: []float32{0.12, 0.13, 0.17, 0, 0.58}}

// workingCopyLabel names the working copy in lists.
const workingCopyLabel = "Working copy"

// newRevisionsPanel builds the "Revisions" screen.
func newRevisionsPanel(s *session) *revisionsPanel {
	r := &revisionsPanel{s: s, verdicts: map[string]hazards.Status{}, selected: -1}
	s.revs = r
	s.changes.subscribe(r.update)
	r.list = widget.NewList(
		func() int { return len(r.rows) },
		func() fyne.CanvasObject {
			cells := []fyne.CanvasObject{bold(""), widget.NewLabel(""), widget.NewLabel("")}
			icon := widget.NewIcon(nil)
			word := widget.NewLabelWithStyle("", fyne.TextAlignLeading, fyne.TextStyle{Bold: true})
			cells = append(cells, container.New(fixedWidth{statusColumnWidth}, container.NewBorder(nil, nil, icon, nil, word)))
			note := widget.NewLabel("")
			note.Truncation = fyne.TextTruncateEllipsis
			cells = append(cells, note)
			for _, c := range cells[:3] {
				c.(*widget.Label).Truncation = fyne.TextTruncateEllipsis
			}
			return container.New(revisionColumns, cells...)
		},
		func(id widget.ListItemID, o fyne.CanvasObject) {
			if id < 0 || id >= len(r.rows) {
				return
			}
			cells := o.(*fyne.Container).Objects
			label, date, author, note, status := r.describeRow(id)
			setText(cells[0].(*widget.Label), label)
			setText(cells[1].(*widget.Label), date)
			setText(cells[2].(*widget.Label), author)
			box := cells[3].(*fyne.Container).Objects[0].(*fyne.Container)
			word := box.Objects[0].(*widget.Label)
			icon := box.Objects[1].(*widget.Icon)
			if status == "" {
				setText(word, "…")
				icon.SetResource(nil)
			} else {
				setText(word, statusWord(status))
				word.Importance = statusImportance(status, false)
				word.Refresh()
				icon.SetResource(statusIcon(status))
			}
			setText(cells[4].(*widget.Label), note)
		})
	r.list.OnSelected = func(id widget.ListItemID) {
		r.selected = id
		r.describe()
	}
	r.open = widget.NewButtonWithIcon("Open in the form", theme.DocumentIcon(), func() {
		if r.selected >= 0 && r.selected < len(r.rows) && r.rows[r.selected] != nil {
			r.openRevision(r.rows[r.selected].Label)
		}
	})
	r.open.Disable()
	keep := widget.NewButtonWithIcon("Keep the working copy as a new revision…", theme.DocumentSaveIcon(), func() { s.askNewRevision(nil) })
	cmp := widget.NewButtonWithIcon("Compare with the one before", theme.ContentCopyIcon(), func() { r.compareSelected() })
	r.detail = widget.NewLabel("Select a revision to see its change note.")
	r.detail.Wrapping = fyne.TextWrapWord
	head := []fyne.CanvasObject{bold("Revision"), bold("Date"), bold("Author"), container.New(fixedWidth{statusColumnWidth}, bold("Verdict")), bold("Change note")}
	top := container.NewVBox(
		widget.NewLabel("Every revision kept in the design file, newest first. A revision is never changed once kept: edit the working copy and keep it as a new revision."),
		container.NewHBox(keep, r.open, cmp),
		container.New(revisionColumns, head...),
	)
	r.object = container.NewBorder(top, container.NewVBox(widget.NewSeparator(), r.detail), nil, nil, r.list)
	return r
}

// describeRow returns the texts of row id.
func (r *revisionsPanel) describeRow(id int) (label, date, author, note string, status hazards.Status) {
	rev := r.rows[id]
	if rev == nil {
		base := r.s.doc.Base
		note = "Unsaved changes"
		if base != "" {
			note = "Changes made to revision " + base + ", not yet kept"
		}
		return workingCopyLabel, "today", r.s.settings.Reviewer, note, r.working
	}
	return rev.Label, rev.Date, rev.Author, oneLine(rev.ChangeNote), r.verdicts[rev.Fingerprint()]
}

// oneLine joins the lines of a note.
func oneLine(s string) string { return strings.Join(strings.Fields(s), " ") }

// update follows the revisions of the document, and the working copy's
// verdict after each good assessment.
func (r *revisionsPanel) update(c change) {
	switch {
	case c.cause == causeOpened || c.cause == causeRevision || c.cause == causeKept:
		r.refresh()
	case c.cause == causeResults:
		if r.s.problem == nil && r.s.last.assessment != nil {
			r.workingVerdict(r.s.last.assessment.Verdict)
		}
	}
}

// refresh rebuilds the list from the document and assesses any revision
// whose verdict is not known yet.
func (r *revisionsPanel) refresh() {
	doc := r.s.doc
	if doc == nil {
		return
	}
	r.rows = nil
	if doc.workChanged() {
		r.rows = append(r.rows, nil)
	}
	revs := doc.File.Revisions
	var todo []designfile.Revision
	for i := len(revs) - 1; i >= 0; i-- {
		r.rows = append(r.rows, &revs[i])
		if _, ok := r.verdicts[revs[i].Fingerprint()]; !ok {
			todo = append(todo, revs[i])
		}
	}
	if r.s.last.assessment != nil {
		r.working = r.s.last.assessment.Verdict
	}
	r.selected = -1
	r.list.UnselectAll()
	r.list.Refresh()
	r.describe()
	if len(todo) > 0 {
		lib := r.s.lib
		background(r.s.assess, func() map[string]hazards.Status {
			return assessVerdicts(todo, lib)
		}, func(m map[string]hazards.Status) {
			for k, v := range m {
				r.verdicts[k] = v
			}
			r.list.Refresh()
		})
	}
}

// assessVerdicts returns each revision's verdict by fingerprint; a
// revision that cannot be assessed counts as failing.
func assessVerdicts(revs []designfile.Revision, lib *fluids.Library) map[string]hazards.Status {
	out := map[string]hazards.Status{}
	for i := range revs {
		o := evaluate(revs[i].Design, lib)
		st := hazards.StatusFail
		if o.err == nil {
			st = o.assessment.Verdict
		}
		out[revs[i].Fingerprint()] = st
	}
	return out
}

// workingVerdict updates the working copy's verdict after an assessment.
func (r *revisionsPanel) workingVerdict(st hazards.Status) {
	changed := r.s.doc.workChanged()
	hasRow := len(r.rows) > 0 && r.rows[0] == nil
	r.working = st
	if changed != hasRow {
		r.refresh()
		return
	}
	r.list.Refresh()
}

// compareSelected opens the comparison of the selected revision (the
// newest when none is selected) with the revision before it.
func (r *revisionsPanel) compareSelected() {
	revs := r.s.doc.File.Revisions
	later := ""
	if r.selected >= 0 && r.selected < len(r.rows) && r.rows[r.selected] != nil {
		later = r.rows[r.selected].Label
	}
	earlier := ""
	switch {
	case later == "" && len(revs) > 0:
		// the working copy against its base, or the newest revision
		earlier = revs[len(revs)-1].Label
		if r.s.doc.Base != "" {
			earlier = r.s.doc.Base
		}
		if !r.s.doc.workChanged() && len(revs) > 1 {
			earlier, later = revs[len(revs)-2].Label, revs[len(revs)-1].Label
		}
	default:
		for i := range revs {
			if revs[i].Label == later && i > 0 {
				earlier = revs[i-1].Label
			}
		}
	}
	if r.compareTwo != nil {
		r.compareTwo(earlier, later)
	}
}

// describe shows the selected revision's details.
func (r *revisionsPanel) describe() {
	if r.selected < 0 || r.selected >= len(r.rows) {
		r.open.Disable()
		setText(r.detail, "Select a revision to see its change note.")
		return
	}
	rev := r.rows[r.selected]
	if rev == nil {
		r.open.Disable()
		setText(r.detail, "The working copy is what the form shows. Keep it as a new revision to record it in the design file.")
		return
	}
	r.open.Enable()
	setText(r.detail, fmt.Sprintf("Revision %s, %s, by %s. %s\nDesign fingerprint %s", rev.Label, rev.Date, rev.Author, rev.ChangeNote, rev.Fingerprint()))
}

// openRevision loads a revision into the form, asking first when the
// working copy has changes that would be lost.
func (r *revisionsPanel) openRevision(label string) {
	s := r.s
	rev, err := s.doc.File.Find(label)
	if err != nil {
		s.showError(err)
		return
	}
	load := func() { s.doc.openRevision(rev) }
	if !s.doc.workChanged() {
		load()
		return
	}
	s.showConfirm("Discard the changes?",
		fmt.Sprintf("The working copy has changes not kept as a revision.\nOpening revision %s replaces them.", label),
		func(ok bool) {
			if ok {
				load()
			}
		})
}

// askNewRevision is the session's command of the same name, for callers
// that hold the panel.
func (r *revisionsPanel) askNewRevision(then func()) { r.s.askNewRevision(then) }

// askNewRevision asks for a label and change note and keeps the working
// copy as a new revision; then runs after it is kept.
func (s *session) askNewRevision(then func()) {
	if s.stale() {
		s.showInfo("Fix the inputs first",
			"The form holds an input that is not acceptable. Fix the marked field before keeping a revision.")
		return
	}
	label := newDialogEntry()
	label.SetText(s.doc.File.NextLabel())
	author := newDialogEntry()
	author.SetText(s.settings.Reviewer)
	author.SetPlaceHolder("who made this revision")
	note := newDialogEntry()
	note.MultiLine = true
	note.Wrapping = fyne.TextWrapWord
	note.SetPlaceHolder("what changed and why")
	note.SetMinRowsVisible(3)
	problem := widget.NewLabel("")
	problem.Importance = widget.DangerImportance
	problem.Wrapping = fyne.TextWrapWord
	var dlg *dialog.CustomDialog
	keep := widget.NewButtonWithIcon("Keep revision", theme.ConfirmIcon(), func() {
		if s.stale() {
			setText(problem, "The form holds an input that is not acceptable: fix the marked field first.")
			return
		}
		if strings.TrimSpace(note.Text) == "" {
			setText(problem, "Write a change note: the record must say what changed.")
			return
		}
		if strings.TrimSpace(author.Text) == "" {
			setText(problem, "Write the author's name: the record must say who made the revision (the reviewer's name in Preferences fills it in).")
			return
		}
		rev := s.doc.newRevision(strings.TrimSpace(label.Text), strings.TrimSpace(author.Text), strings.TrimSpace(note.Text), s.opts.now())
		if err := s.keepRevision(rev); err != nil {
			setText(problem, problemOf(err, s.units(), quantityOf).Text)
			return
		}
		dlg.Hide()
		if then != nil {
			then()
		}
	})
	keep.Importance = widget.HighImportance
	cancel := widget.NewButtonWithIcon("Cancel", theme.CancelIcon(), func() { dlg.Hide() })
	form := widget.NewForm(
		widget.NewFormItem("Label", label),
		widget.NewFormItem("Author", author),
		widget.NewFormItem("Change note", note),
	)
	content := container.NewVBox(
		widget.NewLabel("The working copy's inputs become a new revision of the design file."),
		form, problem)
	dlg = dialog.NewCustomWithoutButtons("Keep as a new revision", content, s.win)
	dlg.SetButtons([]fyne.CanvasObject{cancel, keep})
	dlg.Resize(fyne.NewSize(560, 360))
	label.onEscape, author.onEscape, note.onEscape = dlg.Hide, dlg.Hide, dlg.Hide
	label.OnSubmitted = func(string) { keep.OnTapped() }
	author.OnSubmitted = func(string) { keep.OnTapped() }
	s.showKeyed(dlg, keep.OnTapped, dlg.Hide)
	s.win.Canvas().Focus(note)
}

// keepRevision adds a revision to the document, which tells the panels.
func (s *session) keepRevision(rev designfile.Revision) error { return s.doc.addRevision(rev) }
