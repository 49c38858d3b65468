package gui

import (
	"os"
	"path/filepath"
	"strings"
	"testing"

	"ullage/assets"
)

// TestRecentFilesAreAbsolute: a file opened by a relative name is
// remembered with its folder, so it opens from any working folder.
func TestRecentFilesAreAbsolute(t *testing.T) {
	h := newHarness(t)
	dir := t.TempDir()
	if err := os.WriteFile(filepath.Join(dir, "lamp.json"), assets.Example(), 0o644); err != nil {
		t.Fatal(err)
	}
	t.Chdir(dir)
	h.s.app.Preferences().SetStringList(prefRecent, []string{"old-relative.json"})
	if !h.s.openPath("lamp.json") {
		t.Fatal("lamp.json does not open")
	}
	want := filepath.Join(dir, "lamp.json")
	got := h.s.app.Preferences().StringList(prefRecent)
	if len(got) != 1 || got[0] != want {
		t.Errorf("recent files %q, want only %q (absolute; entries without a folder dropped)", got, want)
	}
}

// TestLostRecentFileIsSaid: when the most recent file is gone, the
// example opens, and a dialog says so and offers the other recent files.
func TestLostRecentFileIsSaid(t *testing.T) {
	dir := t.TempDir()
	other := filepath.Join(dir, "other.json")
	if err := os.WriteFile(other, assets.Example(), 0o644); err != nil {
		t.Fatal(err)
	}
	gone := filepath.Join(dir, "gone.json")
	tests := []struct {
		name   string
		recent []string
		says   string
	}{
		{"moved", []string{gone, other}, "is no longer there"},
		{"remembered without a folder", []string{"lamp.json", other}, "without its folder"},
		{"does not load", []string{filepath.Join(dir, "broken.json"), other}, "does not open"},
	}
	if err := os.WriteFile(filepath.Join(dir, "broken.json"), []byte("{"), 0o644); err != nil {
		t.Fatal(err)
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			h := newHarness(t)
			h.s.app.Preferences().SetStringList(prefRecent, tt.recent)
			doc, err := h.s.firstDocument(runArgs{})
			if err != nil || doc == nil {
				t.Fatalf("firstDocument: %v", err)
			}
			if doc.Path != "" {
				t.Errorf("opened %q, want the bundled example", doc.Path)
			}
			if !h.s.offerRecent() {
				t.Fatal("nothing was said about the lost file")
			}
			text := strings.Join(labels(h.topOverlay()), "\n")
			if !strings.Contains(text, tt.recent[0]) || !strings.Contains(text, tt.says) {
				t.Errorf("dialog says %q; want %q and %q", text, tt.recent[0], tt.says)
			}
			test := button(t, h.topOverlay(), other)
			test.OnTapped()
			h.idle()
			if h.s.doc.Path != other {
				t.Errorf("after choosing %s the window shows %q", other, h.s.doc.Path)
			}
		})
	}
}

// TestRecentFileOpensAtStart: the most recent file that is there opens,
// with nothing to say.
func TestRecentFileOpensAtStart(t *testing.T) {
	h := newHarness(t)
	path := filepath.Join(t.TempDir(), "lamp.json")
	if err := os.WriteFile(path, assets.Example(), 0o644); err != nil {
		t.Fatal(err)
	}
	h.s.app.Preferences().SetStringList(prefRecent, []string{path})
	doc, err := h.s.firstDocument(runArgs{})
	if err != nil || doc == nil || doc.Path != path {
		t.Fatalf("firstDocument = %v, %v; want %s", doc, err, path)
	}
	if h.s.offerRecent() {
		t.Error("a dialog was shown although the recent file opened")
	}
}
