package gui

import (
	"slices"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/dialog"
	"fyne.io/fyne/v2/widget"
)

// keyedDialog is a dialog that Enter confirms and Escape cancels.
type keyedDialog interface {
	Show()
	Hide()
	SetOnClosed(func())
}

// dialogKeys is what Enter and Escape do for one open dialog.
type dialogKeys struct{ confirm, cancel func() }

// showKeyed shows d with Return and Enter running confirm (nothing when
// confirm is nil) and Escape running cancel (hiding d when cancel is
// nil) while it is the newest open dialog, whatever has the focus outside
// an entry. The window's own key handler comes back when the last dialog
// closes.
func (s *session) showKeyed(d keyedDialog, confirm, cancel func()) {
	c := s.win.Canvas()
	if cancel == nil {
		cancel = d.Hide
	}
	k := &dialogKeys{confirm: confirm, cancel: cancel}
	if len(s.dialogs) == 0 {
		prev := c.OnTypedKey()
		s.windowKeys = prev
		c.SetOnTypedKey(func(ev *fyne.KeyEvent) {
			if len(s.dialogs) == 0 {
				if prev != nil {
					prev(ev)
				}
				return
			}
			top := s.dialogs[len(s.dialogs)-1]
			switch ev.Name {
			case fyne.KeyReturn, fyne.KeyEnter:
				if top.confirm != nil {
					top.confirm()
				}
			case fyne.KeyEscape:
				top.cancel()
			}
		})
	}
	s.dialogs = append(s.dialogs, k)
	d.SetOnClosed(func() {
		i := slices.Index(s.dialogs, k)
		if i < 0 {
			return
		}
		s.dialogs = slices.Delete(s.dialogs, i, i+1)
		if len(s.dialogs) == 0 {
			c.SetOnTypedKey(s.windowKeys)
		}
	})
	d.Show()
}

// showInfo is dialog.ShowInformation that Enter and Escape close.
func (s *session) showInfo(title, message string) {
	d := dialog.NewInformation(title, message, s.win)
	s.showKeyed(d, d.Hide, d.Hide)
}

// showError is dialog.ShowError that Enter and Escape close.
func (s *session) showError(err error) {
	d := dialog.NewError(err, s.win)
	s.showKeyed(d, d.Hide, d.Hide)
}

// showConfirm is dialog.ShowConfirm that Enter confirms and Escape
// cancels.
func (s *session) showConfirm(title, message string, answer func(bool)) {
	d := dialog.NewConfirm(title, message, answer, s.win)
	s.showKeyed(d, d.Confirm, d.Hide)
}

// dialogEntry is a one-line entry inside a dialog: Enter submits it and
// Escape cancels the dialog, as they do when the entry has no focus.
type dialogEntry struct {
	widget.Entry
	onEscape func()
}

// newDialogEntry makes a dialog's entry.
func newDialogEntry() *dialogEntry {
	e := &dialogEntry{}
	e.ExtendBaseWidget(e)
	return e
}

// TypedKey passes Escape to the dialog and every other key to the entry.
func (e *dialogEntry) TypedKey(k *fyne.KeyEvent) {
	if k.Name == fyne.KeyEscape && e.onEscape != nil {
		e.onEscape()
		return
	}
	e.Entry.TypedKey(k)
}

// noTabEntry is a multi-line entry that Tab and Shift+Tab leave, as
// they leave every other field of the form, instead of typing a tab.
type noTabEntry struct {
	widget.Entry
}

// newNoTabEntry makes a multi-line entry that Tab leaves.
func newNoTabEntry() *noTabEntry {
	e := &noTabEntry{}
	e.MultiLine = true
	e.ExtendBaseWidget(e)
	return e
}

// AcceptsTab is false: Tab moves the focus on.
func (e *noTabEntry) AcceptsTab() bool { return false }
