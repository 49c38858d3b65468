package gui

import (
	"bytes"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/test"
)

// designBytes is a design file that loads: the bundled example saved.
func designBytes(t *testing.T) []byte {
	t.Helper()
	doc, err := exampleDocument()
	if err != nil {
		t.Fatal(err)
	}
	return doc.encoded()
}

// whereOf returns the where-dialog on top of the window, its folder and
// name filled in.
func (h *harness) fillWhere(w *whereDialog, dir, name string) {
	w.folder.SetText(dir)
	w.name.SetText(name)
}

// TestSaveAsNeverEmptiesAnExistingFile: choosing an existing design
// file in "Save as" leaves it byte for byte as it was until the reviewer
// confirms the replacement, and then the old content is kept as .bak; a
// file that is not a design file is refused and left alone.
func TestSaveAsNeverEmptiesAnExistingFile(t *testing.T) {
	h := newHarness(t)
	dir := t.TempDir()
	other := filepath.Join(dir, "other.json")
	old := designBytes(t)
	if err := os.WriteFile(other, old, 0o644); err != nil {
		t.Fatal(err)
	}
	notes := filepath.Join(dir, "notes.json")
	if err := os.WriteFile(notes, []byte("my notes, not a design"), 0o644); err != nil {
		t.Fatal(err)
	}

	h.s.saveAs(nil)
	w := h.s.lastWhere
	h.fillWhere(w, dir, "notes")
	w.confirm()
	if !w.msg.Visible() || !strings.Contains(w.msg.Text, "not a design file") {
		t.Errorf("saving over a file that is not a design file: message %q, want a refusal", w.msg.Text)
	}
	if got, _ := os.ReadFile(notes); string(got) != "my notes, not a design" {
		t.Fatalf("the refused file was changed: %q", got)
	}

	h.fillWhere(w, dir, "other.json")
	w.confirm()
	if got, _ := os.ReadFile(other); !bytes.Equal(got, old) {
		t.Fatalf("the chosen design file changed before the replacement was confirmed (%d bytes, was %d)", len(got), len(old))
	}
	// Escape on the question keeps the file.
	h.w.Canvas().OnTypedKey()(&fyne.KeyEvent{Name: fyne.KeyEscape})
	if got, _ := os.ReadFile(other); !bytes.Equal(got, old) {
		t.Fatal("the design file changed although the replacement was cancelled")
	}
	if h.s.doc.Path == other {
		t.Fatal("the document took the path of a file it did not write")
	}

	h.s.saveAs(nil)
	w = h.s.lastWhere
	h.fillWhere(w, dir, "other.json")
	w.confirm()
	h.w.Canvas().OnTypedKey()(&fyne.KeyEvent{Name: fyne.KeyReturn})
	if h.s.doc.Path != other {
		t.Fatalf("after confirming, the document is at %q, want %q", h.s.doc.Path, other)
	}
	if bak, _ := os.ReadFile(other + ".bak"); !bytes.Equal(bak, old) {
		t.Error("the replaced design file was not kept as .bak")
	}
	if overlays := h.w.Canvas().Overlays().List(); len(overlays) != 0 {
		t.Errorf("%d dialogs still open after the save", len(overlays))
	}
}

// TestExportNeverWritesOverTheDesignFile: the PDF record can never be
// written over the design file it is made from, and a file that is not
// one of Ullage's records is replaced only after a confirmation.
func TestExportNeverWritesOverTheDesignFile(t *testing.T) {
	h := newHarness(t)
	dir := t.TempDir()
	design := filepath.Join(dir, "design.json")
	h.s.saveAs(nil)
	h.fillWhere(h.s.lastWhere, dir, "design.json")
	h.s.lastWhere.confirm()
	saved, err := os.ReadFile(design)
	if err != nil || h.s.doc.Path != design {
		t.Fatalf("the design was not saved to %s: %v", design, err)
	}

	h.idle()
	before := h.s.lastWhere
	h.s.exportAssessmentWhere(h.s.assessmentPDFName(), false)
	w := h.s.lastWhere
	if w == before {
		t.Fatalf("the export dialog did not open: stale %v, results %v", h.s.stale(), h.s.last.assessment != nil)
	}
	// A link to the design file under a PDF name is the same file.
	link := filepath.Join(dir, "design.pdf")
	if err := os.Symlink(design, link); err != nil {
		t.Fatal(err)
	}
	h.fillWhere(w, dir, "design.pdf")
	w.confirm()
	if !w.msg.Visible() || !strings.Contains(w.msg.Text, "would destroy it") {
		t.Errorf("exporting over the design file: message %q, want a refusal", w.msg.Text)
	}
	if got, _ := os.ReadFile(design); !bytes.Equal(got, saved) {
		t.Fatal("the design file changed when it was chosen as the PDF target")
	}
	// The design file's own name gets the record's ending: a new file.
	if tg, err := resolveTarget(dir, "design.json", targetRecord, []string{design}); err != nil || tg.path != design+".pdf" || tg.replaces {
		t.Errorf("record named after the design file: %+v, %v; want a new %s", tg, err, design+".pdf")
	}

	text := filepath.Join(dir, "letter.pdf")
	if err := os.WriteFile(text, []byte("a letter"), 0o644); err != nil {
		t.Fatal(err)
	}
	h.fillWhere(w, dir, "letter")
	w.confirm()
	if got, _ := os.ReadFile(text); string(got) != "a letter" {
		t.Fatal("a file that is not a record changed before the reviewer confirmed")
	}
	test.Tap(button(t, h.topOverlay(), "Yes"))
	got, _ := os.ReadFile(text)
	if !bytes.HasPrefix(got, []byte("%PDF-")) {
		t.Fatalf("after confirming, the file holds %q…, want a PDF", got[:min(len(got), 8)])
	}
}
