package gui

import (
	"fmt"
	"os"
	"path/filepath"
	"time"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/dialog"
	"fyne.io/fyne/v2/widget"
)

// recoveryFile is the name of the autosaved working copy in the app's
// storage.
const recoveryFile = "unsaved-work.json"

// dataDir returns the folder the working copy is autosaved in.
func (s *session) dataDir() string {
	if s.opts.dataDir != "" {
		return s.opts.dataDir
	}
	return s.app.Storage().RootURI().Path()
}

func (s *session) recoveryPath() string { return filepath.Join(s.dataDir(), recoveryFile) }

// startAutosave keeps the working copy in the app's storage every
// period while it has unsaved changes.
func (s *session) startAutosave(every time.Duration) {
	if every <= 0 {
		return
	}
	s.stopAutosave = make(chan struct{})
	stop := s.stopAutosave
	go func() {
		t := time.NewTicker(every)
		defer t.Stop()
		for {
			select {
			case <-stop:
				return
			case <-t.C:
				s.opts.post(func() { s.autosaveNow() })
			}
		}
	}()
}

// stopAutosaving ends the autosave loop.
func (s *session) stopAutosaving() {
	if s.stopAutosave != nil {
		close(s.stopAutosave)
		s.stopAutosave = nil
	}
}

// autosaveNow writes the working copy to the recovery file when it has
// unsaved changes; on the UI goroutine.
func (s *session) autosaveNow() {
	if s.doc == nil || !s.doc.dirty() {
		return
	}
	b, err := s.doc.snapshotOf(s.opts.now())
	if err != nil {
		return
	}
	if err := os.MkdirAll(s.dataDir(), 0o755); err != nil {
		return
	}
	tmp := s.recoveryPath() + ".tmp"
	if err := os.WriteFile(tmp, b, 0o600); err != nil {
		return
	}
	os.Rename(tmp, s.recoveryPath())
}

// clearAutosave removes the recovery file once the work is saved or
// deliberately discarded.
func (s *session) clearAutosave() { os.Remove(s.recoveryPath()) }

// offerRecovery asks whether to restore work autosaved before a crash;
// it reports whether there was any to offer.
func (s *session) offerRecovery() bool {
	b, err := os.ReadFile(s.recoveryPath())
	if err != nil {
		return false
	}
	doc, when, err := restoreSnapshot(b)
	if err != nil {
		s.clearAutosave()
		return false
	}
	where := doc.Name
	if doc.Path != "" {
		where = doc.Path
	}
	msg := widget.NewLabel(fmt.Sprintf("Ullage found unsaved work from %s that was not closed properly:\n%s, working copy of revision %s.\n\nRestore it? If not, it is deleted.",
		when.Local().Format("2 January 2006, 15:04"), where, doc.Base))
	msg.Wrapping = fyne.TextWrapWord
	d := dialog.NewCustomConfirm("Restore unsaved work?", "Restore", "Delete it", msg, func(ok bool) {
		if ok {
			s.open(doc)
			s.autosaveNow()
			return
		}
		s.clearAutosave()
	}, s.win)
	d.Resize(fyne.NewSize(560, 240))
	d.Show()
	return true
}
