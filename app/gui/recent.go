package gui

import (
	"errors"
	"fmt"
	"io/fs"
	"os"
	"path/filepath"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/dialog"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"
)

// lostRecent is the most recent design file when it could not be opened
// at start, and why.
type lostRecent struct {
	path string
	err  error
}

// errNoFolder marks a recent file that an older version remembered
// without its folder, so that where it is cannot be known.
var errNoFolder = errors.New("it was remembered without its folder")

// loadRecent loads a file from the recent list.
func loadRecent(path string) (*document, error) {
	if !filepath.IsAbs(path) {
		return nil, errNoFolder
	}
	if _, err := os.Stat(path); err != nil {
		return nil, err
	}
	return loadDocument(path)
}

// lostText says in a sentence what happened to the most recent file.
func (l *lostRecent) text() string {
	switch {
	case errors.Is(l.err, fs.ErrNotExist):
		return fmt.Sprintf("The design file you had open last, %s, is no longer there: it was moved, renamed or deleted.", l.path)
	case errors.Is(l.err, errNoFolder):
		return fmt.Sprintf("The design file you had open last, %s, was remembered without its folder, so it cannot be found.", l.path)
	default:
		return fmt.Sprintf("The design file you had open last, %s, does not open: %v", l.path, l.err)
	}
}

// offerRecent tells the reviewer when the most recent file could not be
// opened at start, and offers the other recent files, the file chooser
// or the bundled example, which is open meanwhile. It reports whether
// there was anything to say.
func (s *session) offerRecent() bool {
	if s.lost == nil {
		return false
	}
	lost := s.lost
	s.lost = nil
	msg := widget.NewLabel(lost.text() + "\nThe bundled example is open instead; nothing was changed.")
	msg.Wrapping = fyne.TextWrapWord
	box := container.NewVBox(msg)
	var dlg *dialog.CustomDialog
	others := s.recentFiles()
	if len(others) > 0 {
		box.Add(widget.NewLabelWithStyle("Open one of your other recent files:", fyne.TextAlignLeading, fyne.TextStyle{Bold: true}))
		for _, p := range others {
			p := p
			box.Add(widget.NewButtonWithIcon(p, theme.DocumentIcon(), func() {
				dlg.Hide()
				s.openPath(p)
			}))
		}
	}
	choose := widget.NewButtonWithIcon("Open a file…", theme.FolderOpenIcon(), func() {
		dlg.Hide()
		s.openDialog()
	})
	stay := widget.NewButtonWithIcon("Keep the example", theme.CancelIcon(), func() { dlg.Hide() })
	dlg = dialog.NewCustomWithoutButtons("The last design file cannot be opened", box, s.win)
	dlg.SetButtons([]fyne.CanvasObject{stay, choose})
	dlg.Resize(fyne.NewSize(640, 0))
	dlg.Show()
	return true
}
