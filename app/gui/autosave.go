package gui

import (
	"fmt"
	"io"
	"os"
	"path/filepath"
	"strings"
	"time"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/dialog"
	"fyne.io/fyne/v2/widget"

	"ullage/hazards/designfile"
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
	// The design file's atomic writer: synced to disk and renamed into
	// place, like a real save. Private to the user, like the app's storage.
	designfile.WriteFile(s.recoveryPath(), 0o600, func(w io.Writer) error {
		_, err := w.Write(b)
		return err
	})
}

// clearAutosave removes the recovery file once the work is saved or
// deliberately discarded.
func (s *session) clearAutosave() { os.Remove(s.recoveryPath()) }

// offerRecovery asks whether to restore work autosaved before a crash;
// it reports whether there was any to offer. A recovery file that cannot
// be restored is never deleted: it is kept aside under a name with the
// time, the reviewer is told where, and whatever can still be read is
// offered.
func (s *session) offerRecovery() bool {
	info, err := os.Stat(s.recoveryPath())
	if err != nil || !info.Mode().IsRegular() {
		return false
	}
	b, err := os.ReadFile(s.recoveryPath())
	if err != nil {
		return false
	}
	doc, when, err := restoreSnapshot(b)
	if err != nil {
		s.offerDamagedRecovery(b, err)
		return true
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

// damagedName is the name a damaged recovery file is kept under.
func damagedName(now time.Time) string {
	return strings.TrimSuffix(recoveryFile, ".json") + ".damaged-" + now.UTC().Format("20060102-150405") + ".json"
}

// offerDamagedRecovery keeps a recovery file that does not restore aside,
// says so, and offers the working copy when that much can be read.
func (s *session) offerDamagedRecovery(b []byte, cause error) {
	kept := filepath.Join(s.dataDir(), damagedName(s.opts.now()))
	text := fmt.Sprintf("Ullage found unsaved work from a session that was not closed properly, but the file is damaged and cannot be restored in full:\n%v\n\n", cause)
	if err := os.Rename(s.recoveryPath(), kept); err != nil {
		kept = s.recoveryPath()
		text += fmt.Sprintf("It was left where it is: %s (%v).", kept, err)
	} else {
		text += "It was kept, unchanged, as " + kept + "."
	}
	partial := salvageSnapshot(b)
	if partial != nil {
		text += "\n\nThe working copy of the design can still be read. Open it as a new, unsaved design?"
	}
	msg := widget.NewLabel(text)
	msg.Wrapping = fyne.TextWrapWord
	var d dialog.Dialog
	if partial != nil {
		d = dialog.NewCustomConfirm("Unsaved work is damaged", "Open what can be read", "Not now", msg, func(ok bool) {
			if ok {
				s.open(partial)
			}
		}, s.win)
	} else {
		d = dialog.NewCustom("Unsaved work is damaged", "Close", msg, s.win)
	}
	d.Resize(fyne.NewSize(600, 280))
	d.Show()
}
