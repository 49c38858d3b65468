package gui

import (
	"strings"
	"testing"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/test"
	"fyne.io/fyne/v2/widget"
)

func TestTabOrderFollowsTheForm(t *testing.T) {
	h := newHarness(t)
	c := h.w.Canvas()
	first := h.s.form.product.name
	c.Focus(first)
	// Walk the focus through the whole form: every number field must be
	// reached, in the order the fields appear from top to bottom.
	want := map[*widget.Entry]*numField{}
	for _, nf := range h.s.form.all() {
		want[nf.entry] = nf
	}
	var order []*numField
	for i := 0; i < 400 && len(order) < len(want); i++ {
		test.FocusNext(c)
		if e, ok := c.Focused().(*widget.Entry); ok {
			if nf, ok := want[e]; ok {
				order = append(order, nf)
			}
		}
	}
	if len(order) != len(want) {
		t.Fatalf("tab reached %d of %d number fields", len(order), len(want))
	}
	d := fyne.CurrentApp().Driver()
	lastY := float32(-1)
	for _, nf := range order {
		y := d.AbsolutePositionForObject(nf.entry).Y
		if y < lastY {
			t.Errorf("tab reaches %s (y %.0f) after a field below it (y %.0f)", nf.label, y, lastY)
		}
		lastY = y
	}
	if order[0].path != "fill_mass_kg" {
		t.Errorf("first number field reached is %s, want the fill", order[0].path)
	}
}

func TestMenuShortcuts(t *testing.T) {
	h := newHarness(t)
	want := map[string]string{
		shortcutOpen.ShortcutName():   "Open…",
		shortcutSave.ShortcutName():   "Save",
		shortcutSaveAs.ShortcutName(): "Save as…",
		shortcutExport.ShortcutName(): "Export assessment PDF…",
	}
	found := map[string]string{}
	for _, m := range h.w.MainMenu().Items {
		for _, it := range m.Items {
			if it.Shortcut != nil && it.Action != nil {
				found[it.Shortcut.ShortcutName()] = it.Label
			}
		}
	}
	for sc, label := range want {
		if found[sc] != label {
			t.Errorf("shortcut %s runs %q, want %q", sc, found[sc], label)
		}
	}
	// Ctrl+S on a changed working copy asks to keep it as a revision:
	// a design file holds revisions only.
	h.typeInto("fill_mass_kg", "20")
	h.w.Canvas().Unfocus()
	h.w.Canvas().(fyne.Shortcutable).TypedShortcut(shortcutSave)
	if got := strings.Join(labels(h.topOverlay()), " "); !strings.Contains(got, "become a new revision") {
		t.Errorf("Ctrl+S opened %q", got)
	}
}

func TestCloseAsksBeforeLosingWork(t *testing.T) {
	h := newHarness(t)
	h.typeInto("fill_mass_kg", "20")
	h.s.requestClose()
	dlg := h.topOverlay()
	if got := strings.Join(labels(dlg), " "); !strings.Contains(got, "not saved") {
		t.Fatalf("close dialog says %q", got)
	}
	test.Tap(button(t, dlg, "Cancel"))
	if h.w.Canvas().Overlays().Top() != nil || h.s.doc.Work.FillMassKg != 0.02 {
		t.Error("Cancel did not keep the work open")
	}
	h.s.autosaveNow()
	h.s.requestClose()
	test.Tap(button(t, h.topOverlay(), "Don't save"))
	if h.s.offerRecovery() {
		t.Error("work deliberately discarded is offered for recovery")
	}
}
