//go:build unix

package designfile

import (
	"io"
	"path/filepath"
	"strings"
	"syscall"
	"testing"
)

// TestWriteFileRefusesNonRegular: a named pipe or a folder at the path is
// refused before anything is opened, and nothing is left behind.
func TestWriteFileRefusesNonRegular(t *testing.T) {
	dir := t.TempDir()
	pipe := filepath.Join(dir, "pipe.json")
	if err := syscall.Mkfifo(pipe, 0o644); err != nil {
		t.Skipf("no named pipes: %v", err)
	}
	for _, p := range []string{pipe, dir} {
		err := WriteFile(p, 0o666, func(w io.Writer) error { _, err := w.Write([]byte("x")); return err })
		if err == nil || !strings.Contains(err.Error(), "not a regular file") {
			t.Errorf("%s: %v", p, err)
		}
	}
	if _, err := Load(pipe); err == nil || !strings.Contains(err.Error(), "named pipe") {
		t.Errorf("Load of a named pipe: %v", err)
	}
	if got := listDir(t, dir); len(got) != 1 {
		t.Errorf("left behind: %v", got)
	}
}
