package designfile

import (
	"bytes"
	"errors"
	"io"
	"os"
	"path/filepath"
	"runtime"
	"sort"
	"strings"
	"testing"
)

// listDir returns the names in dir, sorted.
func listDir(t *testing.T, dir string) []string {
	t.Helper()
	entries, err := os.ReadDir(dir)
	if err != nil {
		t.Fatal(err)
	}
	var names []string
	for _, e := range entries {
		names = append(names, e.Name())
	}
	sort.Strings(names)
	return names
}

func TestSaveNewThenReplace(t *testing.T) {
	dir := t.TempDir()
	path := filepath.Join(dir, "ornament.json")
	f := typicalFile()
	if err := Save(path, f); err != nil {
		t.Fatal(err)
	}
	if got := listDir(t, dir); strings.Join(got, " ") != "ornament.json" {
		t.Errorf("after the first save the folder holds %v; want only ornament.json", got)
	}
	first := readFixture(t, path)
	if !bytes.Equal(first, encodeToBytes(t, f)) {
		t.Error("saved bytes differ from Encode's")
	}
	if runtime.GOOS != "windows" {
		if info, _ := os.Stat(path); info.Mode().Perm() != 0o644 {
			t.Errorf("new file mode %v; want 0644", info.Mode().Perm())
		}
	}

	// Second save: the first version is kept as .bak.
	if err := f.AddRevision(Revision{Label: "C", Date: "2024-09-01", Author: "R. Tester", ChangeNote: "Same design.", Design: typicalDesign()}); err != nil {
		t.Fatal(err)
	}
	if err := Save(path, f); err != nil {
		t.Fatal(err)
	}
	if got := listDir(t, dir); strings.Join(got, " ") != "ornament.json ornament.json.bak" {
		t.Errorf("after the second save the folder holds %v", got)
	}
	if bak := readFixture(t, path+BackupSuffix); !bytes.Equal(bak, first) {
		t.Error(".bak does not hold the previous version")
	}
	second := readFixture(t, path)
	g, err := Load(path)
	if err != nil || len(g.Revisions) != 3 {
		t.Fatalf("Load after save: %v, %v", g, err)
	}

	// Third save: the older .bak is replaced by the second version.
	f.Product.Description = "third"
	if err := Save(path, f); err != nil {
		t.Fatal(err)
	}
	if bak := readFixture(t, path+BackupSuffix); !bytes.Equal(bak, second) {
		t.Error(".bak was not replaced by the version before the last save")
	}
	if got := listDir(t, dir); len(got) != 2 {
		t.Errorf("after the third save the folder holds %v", got)
	}
}

func TestSaveKeepsMode(t *testing.T) {
	if runtime.GOOS == "windows" {
		t.Skip("no Unix permissions")
	}
	path := filepath.Join(t.TempDir(), "private.json")
	if err := os.WriteFile(path, readFixture(t, fixtureCurrent), 0o600); err != nil {
		t.Fatal(err)
	}
	if err := Save(path, typicalFile()); err != nil {
		t.Fatal(err)
	}
	if info, _ := os.Stat(path); info.Mode().Perm() != 0o600 {
		t.Errorf("mode after save %v; want the old file's 0600", info.Mode().Perm())
	}
}

func TestSaveRefusesInvalid(t *testing.T) {
	dir := t.TempDir()
	path := filepath.Join(dir, "ornament.json")
	original := readFixture(t, fixtureCurrent)
	if err := os.WriteFile(path, original, 0o644); err != nil {
		t.Fatal(err)
	}
	f := typicalFile()
	f.Revisions[1].Design.FillMassKg = 0
	err := Save(path, f)
	if !errors.Is(err, ErrInvalidFile) || !strings.Contains(err.Error(), "revisions[1].design.fill_mass_kg") || !strings.Contains(err.Error(), path) {
		t.Errorf("Save(invalid) = %v; want ErrInvalidFile naming the path and the field", err)
	}
	if !bytes.Equal(readFixture(t, path), original) {
		t.Error("the file was changed by a refused save")
	}
	if got := listDir(t, dir); len(got) != 1 {
		t.Errorf("a refused save left %v", got)
	}
}

func TestSaveRefusesFolderAndMissingFolder(t *testing.T) {
	dir := t.TempDir()
	if err := Save(dir, typicalFile()); err == nil || !strings.Contains(err.Error(), "not a regular file") {
		t.Errorf("Save over a folder = %v", err)
	}
	if err := Save(filepath.Join(dir, "absent", "x.json"), typicalFile()); err == nil {
		t.Error("Save into a missing folder succeeded")
	}
	if got := listDir(t, dir); len(got) != 0 {
		t.Errorf("failed saves left %v", got)
	}
}

// halfWriter passes on the first half of what it is given, then fails, as
// a full disk or a pulled cable would.
type halfWriter struct {
	w    io.Writer
	fail error
}

func (h *halfWriter) Write(p []byte) (int, error) {
	n, _ := h.w.Write(p[:len(p)/2])
	return n, h.fail
}

// Crash safety: a save that fails half way through writing leaves the
// original file intact and loadable, and no temporary file behind.
func TestSaveFailingHalfWay(t *testing.T) {
	dir := t.TempDir()
	path := filepath.Join(dir, "ornament.json")
	original := readFixture(t, fixtureCurrent)
	if err := os.WriteFile(path, original, 0o644); err != nil {
		t.Fatal(err)
	}
	diskFull := errors.New("no space left on device (simulated)")
	var wrote *halfWriter
	f := typicalFile()
	f.Product.Description = "a change that must not reach the disk"
	err := save(path, f, func(w io.Writer) io.Writer {
		wrote = &halfWriter{w: w, fail: diskFull}
		return wrote
	})
	if wrote == nil {
		t.Fatal("the failing writer was never used")
	}
	if !errors.Is(err, diskFull) || !strings.Contains(err.Error(), path) {
		t.Errorf("save = %v; want the write error naming the path", err)
	}
	if !bytes.Equal(readFixture(t, path), original) {
		t.Error("the original file changed")
	}
	if _, err := Load(path); err != nil {
		t.Errorf("the original no longer loads: %v", err)
	}
	if got := listDir(t, dir); strings.Join(got, " ") != "ornament.json" {
		t.Errorf("the folder holds %v after the failed save; want only ornament.json", got)
	}
	// And the next, healthy save works.
	if err := Save(path, f); err != nil {
		t.Fatal(err)
	}
	if !bytes.Equal(readFixture(t, path+BackupSuffix), original) {
		t.Error("the healthy save did not keep the original as .bak")
	}
}

// TestSaveCleansAndHandlesHardLinkedBackup: a save removes temporaries of
// its own naming left by a killed save (and nothing else), and keeps a
// correct backup when FILE.bak is a hard link of FILE.
func TestSaveCleansAndHandlesHardLinkedBackup(t *testing.T) {
	dir := t.TempDir()
	path := filepath.Join(dir, "d.json")
	f := typicalFile()
	if err := Save(path, f); err != nil {
		t.Fatal(err)
	}
	first := readFixture(t, path)
	if err := os.Link(path, path+BackupSuffix); err != nil {
		t.Skipf("no hard links here: %v", err)
	}
	for _, name := range []string{".d.json.0123456789abcdef.tmp", ".d.json.0123456789abcdef.tmp.bak", ".d.json.fedcba9876543210.tmp.bak"} {
		if err := os.WriteFile(filepath.Join(dir, name), []byte("partial"), 0o600); err != nil {
			t.Fatal(err)
		}
	}
	keep := []string{".d.json.notes.tmp", ".other.json.0123456789abcdef.tmp", "d.json.tmp"}
	for _, name := range keep {
		if err := os.WriteFile(filepath.Join(dir, name), []byte("not ours"), 0o600); err != nil {
			t.Fatal(err)
		}
	}
	f.Product.Description = "second"
	if err := Save(path, f); err != nil {
		t.Fatal(err)
	}
	want := append([]string{}, keep...)
	want = append(want, "d.json", "d.json.bak")
	sort.Strings(want)
	if got := listDir(t, dir); strings.Join(got, " ") != strings.Join(want, " ") {
		t.Errorf("folder holds %v; want %v", got, want)
	}
	if bak := readFixture(t, path+BackupSuffix); !bytes.Equal(bak, first) {
		t.Error(".bak does not hold the version before the save")
	}
}
