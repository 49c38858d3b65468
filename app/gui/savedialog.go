package gui

import (
	"errors"
	"fmt"
	"path/filepath"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/dialog"
	"fyne.io/fyne/v2/storage"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"
)

// whereDialog asks for a folder and a file name to write, and opens
// nothing itself: the folder comes from the toolkit's folder chooser or
// is typed, the name is typed. On confirm the path is checked with
// resolveTarget; a refusal is shown in the dialog, a file that would be
// replaced is confirmed first, and then write runs with the path.
type whereDialog struct {
	s      *session
	kind   targetKind
	inputs []string
	write  func(path string) error

	folder *dialogEntry
	name   *dialogEntry
	msg    *widget.Label
	dlg    *dialog.CustomDialog
}

// askWhere shows the dialog, starting in the last folder used.
func (s *session) askWhere(title, confirm string, kind targetKind, name string, inputs []string, write func(path string) error) *whereDialog {
	w := &whereDialog{s: s, kind: kind, inputs: inputs, write: write}
	w.folder = newDialogEntry()
	w.folder.SetText(s.startFolder())
	w.name = newDialogEntry()
	w.name.SetText(name)
	w.msg = widget.NewLabel("")
	w.msg.Wrapping = fyne.TextWrapWord
	w.msg.Importance = widget.DangerImportance
	w.msg.Hide()
	choose := widget.NewButtonWithIcon("Choose…", theme.FolderOpenIcon(), w.chooseFolder)
	form := widget.NewForm(
		widget.NewFormItem("Folder", container.NewBorder(nil, nil, nil, choose, w.folder)),
		widget.NewFormItem("File name", w.name),
	)
	ok := widget.NewButtonWithIcon(confirm, theme.DocumentSaveIcon(), w.confirm)
	ok.Importance = widget.HighImportance
	cancel := widget.NewButtonWithIcon("Cancel", theme.CancelIcon(), func() { w.dlg.Hide() })
	w.dlg = dialog.NewCustomWithoutButtons(title, container.NewVBox(form, w.msg), s.win)
	w.dlg.SetButtons([]fyne.CanvasObject{cancel, ok})
	w.folder.onEscape, w.name.onEscape = w.dlg.Hide, w.dlg.Hide
	w.folder.OnSubmitted = func(string) { w.confirm() }
	w.name.OnSubmitted = func(string) { w.confirm() }
	w.dlg.Resize(fyne.NewSize(680, 220))
	s.showKeyed(w.dlg, w.confirm, w.dlg.Hide)
	s.win.Canvas().Focus(w.name)
	s.lastWhere = w
	return w
}

// startFolder is the last folder used, or the document's folder.
func (s *session) startFolder() string {
	dir := s.app.Preferences().String(prefLastFolder)
	if dir == "" && s.doc != nil && s.doc.Path != "" {
		dir = filepath.Dir(s.doc.Path)
	}
	return dir
}

// chooseFolder fills the folder from the toolkit's folder chooser.
func (w *whereDialog) chooseFolder() {
	d := dialog.NewFolderOpen(func(u fyne.ListableURI, err error) {
		if err != nil || u == nil {
			return
		}
		w.folder.SetText(u.Path())
	}, w.s.win)
	if dir := w.folder.Text; dir != "" {
		if l, err := storage.ListerForURI(storage.NewFileURI(dir)); err == nil {
			d.SetLocation(l)
		}
	}
	d.Resize(fyne.NewSize(900, 600))
	d.Show()
}

// confirm checks the chosen path and writes, asking first when a file
// would be replaced.
func (w *whereDialog) confirm() {
	t, err := resolveTarget(w.folder.Text, w.name.Text, w.kind, w.inputs)
	if err != nil {
		w.msg.SetText(trimNotWritten(err))
		w.msg.Show()
		return
	}
	w.dlg.Hide()
	if !t.replaces {
		w.finish(t.path)
		return
	}
	var msg string
	switch {
	case w.kind == targetDesign && t.path == w.s.docPath():
		msg = fmt.Sprintf("Replace %s with this version? The version on disk is kept as %s.", t.path, filepath.Base(t.path)+".bak")
	case w.kind == targetDesign:
		msg = fmt.Sprintf("%s is another design file. Replace it with this design? Its present content is kept as %s.", t.path, filepath.Base(t.path)+".bak")
	case t.own:
		msg = fmt.Sprintf("%s is an earlier record. Replace it?", t.path)
	default:
		msg = fmt.Sprintf("%s exists and is not a record written by Ullage. Replace it anyway? Its content will be lost.", t.path)
	}
	w.s.showConfirm("Replace the file?", msg, func(ok bool) {
		if ok {
			w.finish(t.path)
		}
	})
}

// finish writes and remembers the folder.
func (w *whereDialog) finish(path string) {
	if err := w.write(path); err != nil {
		w.s.showFileProblem("Nothing was written", err)
		return
	}
	w.s.app.Preferences().SetString(prefLastFolder, filepath.Dir(path))
}

// docPath is the path of the open document, "" for a new one.
func (s *session) docPath() string {
	if s.doc == nil {
		return ""
	}
	return s.doc.Path
}

// trimNotWritten drops the errNotReplaced marker from a message.
func trimNotWritten(err error) string {
	msg := err.Error()
	suffix := ": " + errNotReplaced.Error()
	if errors.Is(err, errNotReplaced) && len(msg) > len(suffix) && msg[len(msg)-len(suffix):] == suffix {
		return msg[:len(msg)-len(suffix)]
	}
	return msg
}
