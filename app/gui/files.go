package gui

import (
	"errors"
	"fmt"
	"os"
	"path/filepath"
	"slices"
	"strings"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/dialog"
	"fyne.io/fyne/v2/storage"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"

	"ullage/hazards/designfile"
)

// confirmLeave runs next when nothing unsaved would be lost; otherwise
// it asks whether to save first, go on without saving, or stay.
func (s *session) confirmLeave(what string, next func()) {
	if s.doc == nil || !s.doc.dirty() {
		next()
		return
	}
	var dlg *dialog.CustomDialog
	save := widget.NewButtonWithIcon("Save first", theme.DocumentSaveIcon(), func() {
		dlg.Hide()
		s.save(next)
	})
	save.Importance = widget.HighImportance
	discard := widget.NewButtonWithIcon("Don't save", theme.DeleteIcon(), func() {
		dlg.Hide()
		s.clearAutosave()
		next()
	})
	stay := widget.NewButtonWithIcon("Cancel", theme.CancelIcon(), func() { dlg.Hide() })
	msg := widget.NewLabel(fmt.Sprintf("%s has changes that are not saved.\nSave them before you %s?", s.doc.Name, what))
	dlg = dialog.NewCustomWithoutButtons("Unsaved changes", msg, s.win)
	dlg.SetButtons([]fyne.CanvasObject{stay, discard, save})
	s.showKeyed(dlg, save.OnTapped, dlg.Hide)
}

// designFilter limits file choosers to design files.
var designFilter = storage.NewExtensionFileFilter([]string{".json"})

// openDialog asks for a design file to open.
func (s *session) openDialog() {
	s.confirmLeave("open another file", func() {
		d := dialog.NewFileOpen(func(r fyne.URIReadCloser, err error) {
			if err != nil {
				s.showError(err)
				return
			}
			if r == nil {
				return
			}
			path := r.URI().Path()
			r.Close()
			s.openPath(path)
		}, s.win)
		d.SetFilter(designFilter)
		s.startIn(d)
		d.Resize(fyne.NewSize(900, 600))
		d.Show()
	})
}

// startIn points a file dialog at the last folder used.
func (s *session) startIn(d *dialog.FileDialog) {
	dir := s.app.Preferences().String(prefLastFolder)
	if dir == "" && s.doc != nil && s.doc.Path != "" {
		dir = filepath.Dir(s.doc.Path)
	}
	if dir == "" {
		return
	}
	if l, err := storage.ListerForURI(storage.NewFileURI(dir)); err == nil {
		d.SetLocation(l)
	}
}

// openPath loads a design file and shows it; a file that does not load
// is reported with the loader's message and nothing changes.
func (s *session) openPath(path string) bool {
	doc, err := loadDocument(path)
	if err != nil {
		s.showFileProblem("The design file cannot be opened", err)
		return false
	}
	s.rememberFile(path)
	s.open(doc)
	return true
}

// showFileProblem shows a loader's or saver's error in full.
func (s *session) showFileProblem(title string, err error) {
	msg := widget.NewLabel(err.Error())
	msg.Wrapping = fyne.TextWrapWord
	hintText := "Nothing was changed."
	if errors.Is(err, designfile.ErrInvalidFile) {
		hintText = "The file was left untouched; correct it and open it again."
	}
	content := container.NewVBox(msg, hint(hintText))
	d := dialog.NewCustom(title, "Close", content, s.win)
	d.Resize(fyne.NewSize(620, 240))
	s.showKeyed(d, d.Hide, d.Hide)
}

// rememberFile puts path at the top of the recent files, as an absolute
// path so that it opens from any working folder. Entries an older version
// kept without their folder are dropped. The menu shows them once the
// file is opened or saved.
func (s *session) rememberFile(path string) {
	if abs, err := filepath.Abs(path); err == nil {
		path = abs
	}
	p := s.app.Preferences()
	recent := slices.DeleteFunc(slices.Clone(p.StringList(prefRecent)), func(x string) bool { return x == path || !filepath.IsAbs(x) })
	recent = append([]string{path}, recent...)
	if len(recent) > maxRecent {
		recent = recent[:maxRecent]
	}
	p.SetStringList(prefRecent, recent)
	p.SetString(prefLastFolder, filepath.Dir(path))
}

// recentFiles returns the recent files that still exist, newest first.
func (s *session) recentFiles() []string {
	var out []string
	for _, p := range s.app.Preferences().StringList(prefRecent) {
		if _, err := os.Stat(p); err == nil && filepath.IsAbs(p) {
			out = append(out, p)
		}
	}
	return out
}

// save writes the file where it lives, asking where for a new file. The
// design file holds revisions only: a working copy with changes is first
// kept as a new revision. then runs after a successful save.
func (s *session) save(then func()) {
	if s.stale() {
		s.showInfo("Fix the inputs first",
			"The form holds an input that is not acceptable; fix the marked field, then save.")
		return
	}
	if s.doc.workChanged() {
		s.askNewRevision(func() { s.save(then) })
		return
	}
	if s.doc.Path == "" {
		s.saveAs(then)
		return
	}
	if s.doc.saved != nil && designfile.ChangedSince(s.doc.Path, s.doc.stamp) {
		path := s.doc.Path
		s.showConfirm("The file changed on disk",
			fmt.Sprintf("%s was changed by another window or program since it was opened here. Replace it with this version? The version on disk is kept as %s.", path, filepath.Base(path)+designfile.BackupSuffix),
			func(ok bool) {
				if !ok {
					return
				}
				if err := s.writeFile(path); err != nil {
					s.showFileProblem("The design file was not saved", err)
				} else if then != nil {
					then()
				}
			})
		return
	}
	if err := s.writeFile(s.doc.Path); err != nil {
		s.showFileProblem("The design file was not saved", err)
		return
	}
	if then != nil {
		then()
	}
}

// saveAs asks for a new path and writes the file there.
func (s *session) saveAs(then func()) {
	if s.stale() {
		s.showInfo("Fix the inputs first",
			"The form holds an input that is not acceptable; fix the marked field, then save.")
		return
	}
	if s.doc.workChanged() {
		s.askNewRevision(func() { s.saveAs(then) })
		return
	}
	// The toolkit's save chooser would empty an existing file before
	// the atomic save could keep it; askWhere opens nothing itself.
	s.askWhere("Save the design file as", "Save", targetDesign, suggestedName(s.doc.File.Product.Name, "", ".json"), nil, func(path string) error {
		if err := s.writeFile(path); err != nil {
			return err
		}
		if then != nil {
			then()
		}
		return nil
	})
}

// writeFile saves the document to path with the design file's atomic
// save, and makes path the document's home.
func (s *session) writeFile(path string) error {
	if path != s.doc.Path || s.doc.saved == nil {
		// Never replace a file that exists and does not load as a design
		// file: it may be something else, or one the reviewer is repairing.
		if info, err := os.Stat(path); err == nil && info.Size() > 0 {
			if _, err := designfile.Load(path); err != nil {
				return fmt.Errorf("%s exists and is not a design file that loads, so it was not replaced: %w", path, err)
			}
		}
	}
	stamp, err := designfile.SaveStamped(path, s.doc.File)
	if err != nil {
		return err
	}
	s.rememberFile(path)
	s.doc.savedAt(path, stamp)
	s.clearAutosave()
	return nil
}

// suggestedName makes a file name from the product's name.
func suggestedName(product, suffix, ext string) string {
	var b strings.Builder
	for _, r := range strings.ToLower(product) {
		switch {
		case r >= 'a' && r <= 'z', r >= '0' && r <= '9':
			b.WriteRune(r)
		case b.Len() > 0 && !strings.HasSuffix(b.String(), "-"):
			b.WriteRune('-')
		}
	}
	name := strings.Trim(b.String(), "-")
	if name == "" {
		name = "design"
	}
	if len(name) > 48 {
		name = strings.Trim(name[:48], "-")
	}
	return name + suffix + ext
}
