//go:build unix

package cli

import (
	"os"
	"path/filepath"
	"strings"
	"syscall"
	"testing"

	"ullage/report"
)

// TestPDFModes: a new record gets 0666 less the umask; replacing our own
// record keeps the mode it had; --replace allows replacing another file.
func TestPDFModes(t *testing.T) {
	old := syscall.Umask(0o027)
	defer syscall.Umask(old)
	dir := t.TempDir()
	design, err := filepath.Abs("testdata/good.json")
	if err != nil {
		t.Fatal(err)
	}
	out := filepath.Join(dir, "record.pdf")
	if code, _, errs := run("check", design, "--pdf", out); code != ExitPass {
		t.Fatalf("exit %d: %s", code, errs)
	}
	info, err := os.Stat(out)
	if err != nil {
		t.Fatal(err)
	}
	if got := info.Mode().Perm(); got != 0o640 {
		t.Errorf("new record mode %v, want 0640 (0666 less the umask 027)", got)
	}
	if err := os.Chmod(out, 0o604); err != nil {
		t.Fatal(err)
	}
	if code, _, errs := run("check", design, "--pdf", out); code != ExitPass {
		t.Fatalf("replacing our own record: exit %d: %s", code, errs)
	}
	if info, _ := os.Stat(out); info.Mode().Perm() != 0o604 {
		t.Errorf("replaced record mode %v, want the 0604 it had", info.Mode().Perm())
	}
	if b, _ := os.ReadFile(out); !report.IsRecord(b) {
		t.Error("the replaced file is not a record")
	}
	other := filepath.Join(dir, "notes.pdf")
	if err := os.WriteFile(other, []byte("notes"), 0o600); err != nil {
		t.Fatal(err)
	}
	if code, _, errs := run("check", design, "--pdf", other); code != ExitUsage || !strings.Contains(errs, "--replace") {
		t.Errorf("another file: exit %d, %s", code, errs)
	}
	if code, _, errs := run("check", design, "--pdf", other, "--replace"); code != ExitPass {
		t.Errorf("with --replace: exit %d, %s", code, errs)
	}
	entries, _ := os.ReadDir(dir)
	for _, e := range entries {
		if strings.Contains(e.Name(), ".tmp") {
			t.Errorf("left behind: %s", e.Name())
		}
	}
}

// TestReviewerNotUTF8: a reviewer name that is not UTF-8 is a usage error
// naming the flag, and no record is written.
func TestReviewerNotUTF8(t *testing.T) {
	out := filepath.Join(t.TempDir(), "r.pdf")
	code, _, errs := run("check", "testdata/good.json", "--reviewer", "R\xff", "--pdf", out)
	if code != ExitUsage || !strings.Contains(errs, "--reviewer") {
		t.Errorf("exit %d, %s", code, errs)
	}
	if _, err := os.Stat(out); err == nil {
		t.Error("a record was written")
	}
}
