package main

import (
	"bytes"
	"debug/elf"
	"errors"
	"os"
	"os/exec"
	"path/filepath"
	"runtime"
	"strings"
	"testing"
)

// displayLibraries are the shared libraries of the window: none may be
// needed by the headless build. Matched as name prefixes.
var displayLibraries = []string{"libGL", "libEGL", "libGLX", "libX", "libxcb", "libwayland", "libxkb"}

// TestHeadlessBuild builds the command line as the README says for
// machines with no display (CGO_ENABLED=0 go build -tags nowindow),
// checks that the binary needs no display library, and runs it with an
// empty environment: check works, the window's entry points say in one
// line that there is no window.
func TestHeadlessBuild(t *testing.T) {
	if testing.Short() {
		t.Skip("builds a binary")
	}
	goCmd, err := exec.LookPath("go")
	if err != nil {
		goCmd = filepath.Join(runtime.GOROOT(), "bin", "go")
	}
	bin := filepath.Join(t.TempDir(), "ullage")
	build := exec.Command(goCmd, "build", "-tags", "nowindow", "-o", bin, ".")
	build.Env = append(os.Environ(), "CGO_ENABLED=0")
	if out, err := build.CombinedOutput(); err != nil {
		t.Fatalf("CGO_ENABLED=0 go build -tags nowindow: %v\n%s", err, out)
	}

	if runtime.GOOS == "linux" {
		f, err := elf.Open(bin)
		if err != nil {
			t.Fatal(err)
		}
		libs, err := f.ImportedLibraries()
		f.Close()
		if err != nil {
			t.Fatal(err)
		}
		for _, lib := range libs {
			for _, p := range displayLibraries {
				if strings.HasPrefix(lib, p) {
					t.Errorf("the headless build needs %s", lib)
				}
			}
		}
		if len(libs) != 0 {
			t.Errorf("the headless build needs shared libraries %v; with CGO_ENABLED=0 it should need none", libs)
		}
	}

	example, err := filepath.Abs("../../assets/examples/tidemark-lantern.json")
	if err != nil {
		t.Fatal(err)
	}
	tests := []struct {
		args   []string
		status int
		stdout string // a phrase the output must hold
		stderr string // the whole of stderr
	}{
		{[]string{"check", example}, 0, "PASS", ""},
		{[]string{"check", "--json", example}, 0, `"verdict": "pass"`, ""},
		{[]string{"version"}, 0, "Ullage 0.1.0", ""},
		{nil, 2, "", "ullage: this build has no window (built with -tags nowindow); the commands run as usual: ullage help\n"},
		{[]string{example}, 2, "", "ullage: this build has no window (built with -tags nowindow); the commands run as usual: ullage help\n"},
		{[]string{"chekc"}, 2, "", "ullage: unknown command 'chekc'; did you mean 'check'?\n"},
	}
	for _, tt := range tests {
		var out, errb bytes.Buffer
		cmd := exec.Command(bin, tt.args...)
		cmd.Env = []string{} // nothing at all: no PATH, no HOME, no DISPLAY, no LANG
		cmd.Dir = t.TempDir()
		cmd.Stdout, cmd.Stderr = &out, &errb
		status := 0
		if err := cmd.Run(); err != nil {
			var ee *exec.ExitError
			if !errors.As(err, &ee) {
				t.Fatalf("ullage %q: %v", tt.args, err)
			}
			status = ee.ExitCode()
		}
		if status != tt.status || !strings.Contains(out.String(), tt.stdout) || errb.String() != tt.stderr {
			t.Errorf("headless ullage %q: status %d, stdout %q, stderr %q; want %d, stdout with %q, stderr %q",
				tt.args, status, out.String(), errb.String(), tt.status, tt.stdout, tt.stderr)
		}
	}
}
