package gui

import (
	"bytes"
	"path/filepath"
	"slices"
	"strings"
	"time"

	"ullage/app/recovery"
	"ullage/assets"
	"ullage/fluids"
	"ullage/hazards"
	"ullage/hazards/designfile"
	"ullage/hazards/tolerance"
)

// document is the plain state of what the reviewer is working on: the
// design file (product and revision history), where it lives, and the
// working copy of the design being edited.
//
// Once opened in the window, every change goes through its methods,
// which tell the window's panels what changed and why (a file opened, a
// keystroke, a choice, a revision kept) through its feed; the panels
// show the document and never write into each other.
type document struct {
	// File is the product and its revisions as they will be saved.
	File *designfile.File
	// Path is where the file lives; "" for the bundled example or a new
	// file that has never been saved.
	Path string
	// Name is what the window title calls the file.
	Name string
	// Base is the label of the revision the working copy started from.
	Base string
	// Work is the working copy of the design, edited by the form.
	Work hazards.Design
	// saved is the encoded file at the last load or save; it tells
	// whether the product or the revision list changed since.
	saved []byte
	// stamp is the file on disk as it was at the last load or save, to
	// tell whether another window or program changed it since.
	stamp designfile.Stamp
	// unread holds, by field path, the entries of the form that hold no
	// number the working copy can take: text typed that is not a number,
	// or a required field of a new design not typed yet (shown empty).
	// The working copy keeps its last value of each, and is not assessed
	// until every entry reads.
	unread map[string]unreadable
	// feed tells the window's panels of every change; nil until the
	// document is opened in a window.
	feed *feed
	// studied is the last tolerance study of the working copy that
	// finished, with what it ran on; its result is nil before the first.
	studied studied
}

// studied is a finished tolerance study and what it was run on.
type studied struct {
	result *tolerance.Result
	// design is the fingerprint of the design the result is of and lib
	// the fluid library it used: when either differs from the working
	// copy's, the result is out of date.
	design string
	lib    *fluids.Library
	// of says which revision the result is of, for the study screen;
	// took how long the run took.
	of   string
	took time.Duration
}

// keepStudy holds a finished study of the working copy and tells the
// panels.
func (d *document) keepStudy(st studied) {
	d.studied = st
	d.publish(change{cause: causeStudied})
}

// studyCurrent reports whether the last study is of the working copy as
// it is now, with the fluid library lib.
func (d *document) studyCurrent(lib *fluids.Library) bool {
	st := &d.studied
	return st.result != nil && st.lib == lib && st.design == designFingerprint(d.Work)
}

// studyFor returns the study the assessment record takes: the last one
// when it is of the working copy as it is now, with the fluid library
// lib; nil otherwise.
func (d *document) studyFor(lib *fluids.Library) *tolerance.Result {
	if !d.studyCurrent(lib) {
		return nil
	}
	return d.studied.result
}

// unreadable is an entry of the form with no number in it.
type unreadable struct {
	// typed is true for text typed that is not a number, text; false for
	// a required field of a new design not typed yet.
	typed bool
	text  string
	// needed is true for a required field of a new design: once typed
	// text is forgotten, the entry is empty again rather than showing the
	// working copy's value.
	needed bool
}

// newDocument wraps a loaded file, taking the newest revision as the
// working copy.
func newDocument(f *designfile.File, path, name string) (*document, error) {
	latest, err := f.Latest()
	if err != nil {
		return nil, err
	}
	d := &document{File: f, Path: path, Name: name}
	d.setWork(latest)
	d.markSaved()
	return d, nil
}

// exampleDocument opens the bundled example; it has no path, so saving
// it asks where.
func exampleDocument() (*document, error) {
	f, err := assets.ExampleFile()
	if err != nil {
		return nil, err
	}
	return newDocument(f, "", assets.ExampleName+" (example)")
}

// newBlankDocument starts a new product with no revision yet; its working
// copy starts from the bundled example's newest design with the given
// review criteria.
func newBlankDocument(criteria hazards.Criteria) (*document, error) {
	ex, err := exampleDocument()
	if err != nil {
		return nil, err
	}
	work := cloneDesign(ex.Work)
	work.Criteria = criteria
	work.Criteria.LimitBodies = nil
	f := &designfile.File{Format: designfile.FormatCurrent}
	d := &document{File: f, Name: "new design", Work: work, unread: map[string]unreadable{}}
	for _, ff := range designFields(&d.Work) {
		if requiredOnNew(ff.path) {
			d.unread[ff.path] = unreadable{needed: true}
		}
	}
	return d, nil
}

// loadDocument opens a design file from disk.
func loadDocument(path string) (*document, error) {
	f, stamp, err := designfile.LoadStamped(path)
	if err != nil {
		return nil, err
	}
	d, err := newDocument(f, path, filepath.Base(path))
	if err != nil {
		return nil, err
	}
	d.stamp = stamp
	return d, nil
}

// setWork makes a copy of a revision's design the working copy.
func (d *document) setWork(r *designfile.Revision) {
	d.Base = r.Label
	d.Work = cloneDesign(r.Design)
}

// cloneDesign copies a design deeply, so that the copy shares no slice
// or pointer with the original.
func cloneDesign(x hazards.Design) hazards.Design {
	x.Vessel.Parts = slices.Clone(x.Vessel.Parts)
	x.Criteria.LimitBodies = slices.Clone(x.Criteria.LimitBodies)
	if x.Glass.Custom != nil {
		g := *x.Glass.Custom
		x.Glass.Custom = &g
	}
	return x
}

// encoded returns the file as it would be written.
func (d *document) encoded() []byte {
	var b bytes.Buffer
	if err := designfile.Encode(&b, d.File); err != nil {
		return nil
	}
	return b.Bytes()
}

// markSaved records the file's current content as saved.
func (d *document) markSaved() { d.saved = d.encoded() }

// fileChanged reports whether the product or revision list changed since
// the last load or save.
func (d *document) fileChanged() bool { return !bytes.Equal(d.saved, d.encoded()) }

// base returns the revision the working copy started from, or nil.
func (d *document) base() *designfile.Revision {
	r, err := d.File.Find(d.Base)
	if err != nil {
		return nil
	}
	return r
}

// workChanged reports whether the working copy differs from the revision
// it started from.
func (d *document) workChanged() bool {
	b := d.base()
	if b == nil {
		return true
	}
	w := designfile.Revision{Design: d.Work}
	return w.Fingerprint() != b.Fingerprint()
}

// dirty reports whether anything would be lost by closing now.
func (d *document) dirty() bool { return d.fileChanged() || d.workChanged() }

// newRevision returns a revision holding the working copy, dated today.
func (d *document) newRevision(label, author, note string, now time.Time) designfile.Revision {
	return designfile.Revision{
		Label:      label,
		Date:       now.Format("2006-01-02"),
		Author:     author,
		ChangeNote: note,
		Design:     cloneDesign(d.Work),
	}
}

// addRevision appends the working copy as a new revision and makes it the
// base of the working copy. The file is checked as it would be on saving,
// and left unchanged when the revision is refused; a revision kept is
// published as causeKept.
func (d *document) addRevision(r designfile.Revision) error {
	trial := *d.File
	trial.Revisions = slices.Clone(d.File.Revisions)
	if err := trial.AddRevision(r); err != nil {
		return err
	}
	if err := trial.Validate(); err != nil {
		return err
	}
	d.File.Revisions = trial.Revisions
	d.Base = r.Label
	d.publish(change{cause: causeKept})
	return nil
}

// openIn opens the document in a window whose panels listen on f: the
// sudden-change presets are brought in step with their values, and the
// opening is published.
func (d *document) openIn(f *feed) {
	d.feed = f
	matchShockPresets(&d.Work)
	d.publish(change{cause: causeOpened})
}

// publish tells the panels of a change.
func (d *document) publish(c change) { d.feed.publish(c) }

// openRevision makes a copy of revision r the working copy, forgetting
// every entry that did not read.
func (d *document) openRevision(r *designfile.Revision) {
	d.setWork(r)
	matchShockPresets(&d.Work)
	d.unread = nil
	d.publish(change{cause: causeRevision})
}

// typeNumber stores x, typed by the reviewer, in the number at path
// (one of the form's fields) and keeps the presets in step with it.
func (d *document) typeNumber(path string, x float64) {
	ff, ok := formFieldAt(path)
	if !ok {
		return
	}
	ff.set(&d.Work, x)
	delete(d.unread, path)
	followPresets(&d.Work, path)
	d.publish(change{cause: causeTyped, field: path})
}

// followPresets keeps the presets a design names in step with a value
// typed at path: a room that no longer matches its preset becomes the
// reviewer's own, and a sudden change names the preset it matches.
func followPresets(d *hazards.Design, path string) {
	switch {
	case strings.HasPrefix(path, hazards.FieldRoom+"."):
		roomFollowsPreset(d)
	case strings.HasPrefix(path, hazards.FieldThermalShock+"."):
		matchShockPresets(d)
	}
}

// typeUnreadable notes text typed at path that is not a number; the
// working copy keeps its value.
func (d *document) typeUnreadable(path, text string) {
	if d.unread == nil {
		d.unread = map[string]unreadable{}
	}
	e := d.unread[path]
	e.typed, e.text = true, text
	d.unread[path] = e
	d.publish(change{cause: causeTyped, field: path})
}

// typeText stores text typed by the reviewer in the design (a part's
// name, the part carrying the seal); set writes it at path.
func (d *document) typeText(path string, set func(*hazards.Design)) {
	set(&d.Work)
	d.publish(change{cause: causeTyped, field: path})
}

// typeProduct stores what the reviewer typed about the product.
func (d *document) typeProduct(set func(*designfile.Product)) {
	set(&d.File.Product)
	d.publish(change{cause: causeTyped, field: fieldProduct})
}

// choose applies a choice of the reviewer: set changes the input at
// path, or every input below it (a preset fills a group, the default
// criteria replace the criteria), whose entries then all read.
func (d *document) choose(path string, set func(*hazards.Design)) {
	set(&d.Work)
	for p := range d.unread {
		if below(p, path) {
			delete(d.unread, p)
		}
	}
	d.publish(change{cause: causeChosen, field: path})
}

// reshapeParts adds, removes or reshapes parts of the vessel. The parts'
// entries are made again: text typed in them that was not a number is
// forgotten, and a required dimension of a new design stays required.
func (d *document) reshapeParts(set func(*hazards.Vessel)) {
	set(&d.Work.Vessel)
	d.forgetTyped(hazards.IsPartField)
	d.publish(change{cause: causeChosen, field: hazards.FieldParts})
}

// forgetTyped forgets the text typed that was not a number in the
// entries at the paths which selects (every entry when which is nil), as
// when the entries show the working copy again in other units.
func (d *document) forgetTyped(which func(path string) bool) {
	for p, e := range d.unread {
		if !e.typed || (which != nil && !which(p)) {
			continue
		}
		if e.needed {
			d.unread[p] = unreadable{needed: true}
		} else {
			delete(d.unread, p)
		}
	}
}

// firstUnread returns the first entry of the working copy's fields, in
// the order of the form, that holds no number.
func (d *document) firstUnread() (formField, unreadable, bool) {
	if len(d.unread) == 0 {
		return formField{}, unreadable{}, false
	}
	for _, ff := range designFields(&d.Work) {
		if e, ok := d.unread[ff.path]; ok {
			return ff, e, true
		}
	}
	return formField{}, unreadable{}, false
}

// savedAt records that the file was saved at path with the given stamp.
func (d *document) savedAt(path string, stamp designfile.Stamp) {
	d.stamp = stamp
	d.Path = path
	d.Name = filepath.Base(path)
	d.markSaved()
	d.publish(change{cause: causeSaved})
}

// below reports whether path is at or below the field or group at top
// ("room.volume_m3" is below "room", "vessel.parts[0].length_m" below
// "vessel.parts").
func below(path, top string) bool {
	if path == top {
		return true
	}
	return strings.HasPrefix(path, top) && (path[len(top)] == '.' || path[len(top)] == '[')
}

// snapshotOf captures the document for autosave.
func (d *document) snapshotOf(now time.Time) ([]byte, error) {
	return recovery.Encode(recovery.Snapshot{Path: d.Path, Name: d.Name, Base: d.Base, Saved: now, File: d.encoded(), Work: d.Work})
}

// restoreSnapshot rebuilds a document from an autosaved snapshot. The
// restored document counts as changed, so that it is saved on purpose.
func restoreSnapshot(b []byte) (*document, time.Time, error) {
	r, err := recovery.Restore(b)
	if err != nil {
		return nil, time.Time{}, err
	}
	return &document{File: r.File, Path: r.Path, Name: r.Name, Base: r.Base, Work: cloneDesign(r.Work)}, r.Saved, nil
}

// salvageSnapshot reads what it can of a recovery file that does not
// restore whole: the working copy of the design, when it is intact, as a
// new document with no path (so that saving it asks where, and nothing on
// disk is replaced). It returns nil when nothing can be read.
func salvageSnapshot(b []byte) *document {
	work, path, ok := recovery.Salvage(b)
	if !ok {
		return nil
	}
	f := &designfile.File{Format: designfile.FormatCurrent, Product: designfile.Product{Name: "Recovered work"}}
	if path != "" {
		if g, err := designfile.Load(path); err == nil {
			f = g
		}
	}
	d := &document{File: f, Name: recovery.DefaultName, Work: cloneDesign(work)}
	if r, err := f.Latest(); err == nil {
		d.Base = r.Label
	}
	return d
}
