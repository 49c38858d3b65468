package gui

import (
	"encoding/json"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"fyne.io/fyne/v2/test"
)

// TestDamagedRecoveryIsKept: a recovery file that cannot be restored is
// kept aside under a dated name, never deleted, and the reviewer is told.
func TestDamagedRecoveryIsKept(t *testing.T) {
	dir := t.TempDir()
	damaged := []byte(`{"path": "", "name": "x", "file": {"format": "ullage-des`)
	if err := os.WriteFile(filepath.Join(dir, recoveryFile), damaged, 0o600); err != nil {
		t.Fatal(err)
	}
	h := newHarnessIn(t, dir)
	if !h.s.offerRecovery() {
		t.Fatal("a damaged recovery file was passed over in silence")
	}
	kept := filepath.Join(dir, damagedName(fixedNow))
	if b, err := os.ReadFile(kept); err != nil || string(b) != string(damaged) {
		t.Fatalf("damaged file not kept as %s unchanged: %v", kept, err)
	}
	if _, err := os.Stat(filepath.Join(dir, recoveryFile)); err == nil {
		t.Error("the damaged file is still offered under its own name")
	}
	if text := shownText(h.topOverlay()); !strings.Contains(text, kept) {
		t.Errorf("the message does not say where the file was kept:\n%s", text)
	}
}

// TestDamagedRecoveryOffersWhatCanBeRead: when the saved file inside the
// recovery file is damaged but the working copy is intact, the working
// copy is offered as a new, unsaved design.
func TestDamagedRecoveryOffersWhatCanBeRead(t *testing.T) {
	dir := t.TempDir()
	h := newHarnessIn(t, dir)
	h.typeInto("fill_mass_kg", "18")
	h.s.autosaveNow()
	path := filepath.Join(dir, recoveryFile)
	b, err := os.ReadFile(path)
	if err != nil {
		t.Fatal(err)
	}
	var snap map[string]json.RawMessage
	if err := json.Unmarshal(b, &snap); err != nil {
		t.Fatal(err)
	}
	snap["file"] = json.RawMessage(`{"format": "ullage-design/2"}`)
	b, _ = json.Marshal(snap)
	if err := os.WriteFile(path, b, 0o600); err != nil {
		t.Fatal(err)
	}
	h2 := newHarnessIn(t, dir)
	if !h2.s.offerRecovery() {
		t.Fatal("nothing offered")
	}
	test.Tap(button(t, h2.topOverlay(), "Open what can be read"))
	h2.idle()
	if got := h2.s.doc.Work.FillMassKg; math.Abs(got-0.018) > 1e-12 {
		t.Errorf("salvaged fill %g kg, want 0.018", got)
	}
	if h2.s.doc.Path != "" {
		t.Errorf("salvaged work would save over %s", h2.s.doc.Path)
	}
}

// TestAutosaveLeavesNoTemporary: the autosave goes through the design
// file's atomic writer and leaves only the recovery file.
func TestAutosaveLeavesNoTemporary(t *testing.T) {
	dir := t.TempDir()
	h := newHarnessIn(t, dir)
	h.typeInto("fill_mass_kg", "18")
	h.s.autosaveNow()
	entries, _ := os.ReadDir(dir)
	for _, e := range entries {
		if e.Name() != recoveryFile && !strings.HasPrefix(e.Name(), "preferences") {
			t.Errorf("left behind: %s", e.Name())
		}
	}
}

// TestSaveWarnsWhenChangedOnDisk: a file changed by another program after
// it was opened is not replaced without asking.
func TestSaveWarnsWhenChangedOnDisk(t *testing.T) {
	dir := t.TempDir()
	path := filepath.Join(dir, "d.json")
	src, err := os.ReadFile(filepath.Join("..", "cli", "testdata", "good.json"))
	if err != nil {
		t.Fatal(err)
	}
	if err := os.WriteFile(path, src, 0o644); err != nil {
		t.Fatal(err)
	}
	h := newHarnessIn(t, dir)
	if !h.s.openPath(path) {
		t.Fatal("fixture does not open")
	}
	h.idle()
	other := append([]byte(nil), src...)
	other = append(other, '\n')
	if err := os.WriteFile(path, other, 0o644); err != nil {
		t.Fatal(err)
	}
	h.s.doc.File.Product.Description += " (edited)"
	h.s.save(nil)
	if text := shownText(h.topOverlay()); !strings.Contains(text, "changed by another window or program") {
		t.Fatalf("no warning; shown:\n%s", text)
	}
	if b, _ := os.ReadFile(path); string(b) != string(other) {
		t.Error("the file changed on disk was replaced before the reviewer answered")
	}
}
