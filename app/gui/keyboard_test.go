package gui

import (
	"strings"
	"testing"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/driver/desktop"
	"fyne.io/fyne/v2/test"
)

// press types a shortcut on the window as the keyboard would.
func (h *harness) press(sc *desktop.CustomShortcut) {
	h.w.Canvas().(interface{ TypedShortcut(fyne.Shortcut) }).TypedShortcut(sc)
	h.idle()
}

// TestShortcutsOfTheMainCommands: Ctrl+N starts a new design, Ctrl+O
// opens the file chooser, Ctrl+S saves (asking where for a new file) and
// Ctrl+Q asks before quitting when work would be lost.
func TestShortcutsOfTheMainCommands(t *testing.T) {
	h := newHarness(t)
	c := h.w.Canvas()
	h.press(shortcutNew)
	if h.s.doc.Name != "new design" {
		t.Errorf("Ctrl+N: the document is %q, want a new design", h.s.doc.Name)
	}

	h.press(shortcutSave)
	if c.Overlays().Top() == nil {
		t.Error("Ctrl+S on a new design asked nothing (a revision or where to save it)")
	} else {
		c.OnTypedKey()(&fyne.KeyEvent{Name: fyne.KeyEscape})
	}
	if c.Overlays().Top() != nil {
		t.Fatal("Escape did not close the dialog Ctrl+S opened")
	}

	h.press(shortcutOpen)
	if c.Overlays().Top() == nil {
		t.Error("Ctrl+O opened no chooser")
	}
	// The new design is unsaved: Ctrl+O asks about it first.
	c.OnTypedKey()(&fyne.KeyEvent{Name: fyne.KeyEscape})

	h.typeInto("fill_mass_kg", "19.5")
	h.press(shortcutQuit)
	top := c.Overlays().Top()
	if top == nil || !strings.Contains(strings.Join(labels(top), " "), "not saved") {
		t.Fatal("Ctrl+Q with unsaved changes did not ask first")
	}
	// Escape answers "Cancel": the window stays.
	c.OnTypedKey()(&fyne.KeyEvent{Name: fyne.KeyEscape})
	if c.Overlays().Top() != nil {
		t.Error("Escape did not close the question")
	}
	if len(h.s.dialogs) != 0 {
		t.Errorf("%d dialogs still take Enter and Escape", len(h.s.dialogs))
	}
}

// TestEnterAndEscapeAnswerDialogs: Enter confirms and Escape cancels a
// question, also when an entry of the dialog has the focus.
func TestEnterAndEscapeAnswerDialogs(t *testing.T) {
	h := newHarness(t)
	c := h.w.Canvas()
	var got []bool
	h.s.showConfirm("Question", "Go on?", func(ok bool) { got = append(got, ok) })
	c.OnTypedKey()(&fyne.KeyEvent{Name: fyne.KeyReturn})
	h.s.showConfirm("Question", "Go on?", func(ok bool) { got = append(got, ok) })
	c.OnTypedKey()(&fyne.KeyEvent{Name: fyne.KeyEscape})
	if len(got) != 2 || !got[0] || got[1] {
		t.Errorf("answers %v, want Enter yes then Escape no", got)
	}
	if c.Overlays().Top() != nil {
		t.Error("a question stayed open")
	}

	h.s.revs.askNewRevision(nil)
	var note *dialogEntry
	walk(h.topOverlay(), func(o fyne.CanvasObject) {
		if e, ok := o.(*dialogEntry); ok && e.MultiLine {
			note = e
		}
	})
	if note == nil {
		t.Fatal("no change note entry")
	}
	test.Type(note, "x")
	note.TypedKey(&fyne.KeyEvent{Name: fyne.KeyEscape})
	if c.Overlays().Top() != nil {
		t.Error("Escape in the change note did not cancel the dialog")
	}
}

// TestTabLeavesTheDescription: Tab and Shift+Tab move out of the
// multi-line description instead of typing a tab into it.
func TestTabLeavesTheDescription(t *testing.T) {
	h := newHarness(t)
	c := h.w.Canvas()
	d := h.s.form.product.descrBox
	c.Focus(d)
	before := d.Text
	test.FocusNext(c)
	if c.Focused() == d {
		t.Error("Tab stayed in the description")
	}
	if d.Text != before || strings.Contains(d.Text, "\t") {
		t.Errorf("Tab typed into the description: %q", d.Text)
	}
	c.Focus(d)
	test.FocusPrevious(c)
	if c.Focused() == d {
		t.Error("Shift+Tab stayed in the description")
	}
	if d.AcceptsTab() {
		t.Error("the description accepts Tab")
	}
}
