//go:build unix

package cli

import (
	"bufio"
	"bytes"
	"crypto/sha256"
	"encoding/json"
	"fmt"
	"io/fs"
	"os"
	"path/filepath"
	"strconv"
	"strings"
	"syscall"
	"testing"
	"time"

	"ullage/hazards/designfile"
)

// badInputsDir holds the bad inputs and their MANIFEST.
const badInputsDir = "../../testdata/bad-inputs"

// badCase is one line of the MANIFEST.
type badCase struct {
	id     string
	exit   int
	phrase string
	args   []string
	line   int
}

func readManifest(t *testing.T) []badCase {
	t.Helper()
	f, err := os.Open(filepath.Join(badInputsDir, "MANIFEST"))
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	var out []badCase
	sc := bufio.NewScanner(f)
	sc.Buffer(make([]byte, 1<<20), 1<<20)
	for n := 1; sc.Scan(); n++ {
		line := strings.TrimSpace(sc.Text())
		if line == "" || strings.HasPrefix(line, "#") {
			continue
		}
		parts := strings.Split(line, " | ")
		if len(parts) != 4 {
			t.Fatalf("MANIFEST:%d: want 4 fields separated by \" | \", got %d", n, len(parts))
		}
		code, err := strconv.Atoi(parts[1])
		if err != nil {
			t.Fatalf("MANIFEST:%d: exit status %q", n, parts[1])
		}
		args := strings.Split(parts[3], " ")
		for i, a := range args {
			if a == "''" {
				args[i] = ""
			}
		}
		out = append(out, badCase{id: parts[0], exit: code, phrase: parts[2], args: args, line: n})
	}
	if err := sc.Err(); err != nil {
		t.Fatal(err)
	}
	return out
}

// fileState is what a snapshot records of one file.
type fileState struct {
	mode fs.FileMode
	size int64
	sum  [sha256.Size]byte
	mod  time.Time
}

// snapshot records every file under dir (named pipes by type only: they
// must never be opened).
func snapshot(t *testing.T, dir string) map[string]fileState {
	t.Helper()
	out := map[string]fileState{}
	err := filepath.WalkDir(dir, func(path string, e fs.DirEntry, err error) error {
		if err != nil {
			return err
		}
		info, err := os.Lstat(path)
		if err != nil {
			return err
		}
		st := fileState{mode: info.Mode(), size: info.Size(), mod: info.ModTime()}
		if info.Mode().IsRegular() {
			b, err := os.ReadFile(path)
			if err != nil {
				return err
			}
			st.sum = sha256.Sum256(b)
		}
		out[path] = st
		return nil
	})
	if err != nil {
		t.Fatal(err)
	}
	return out
}

// makeSpecialFiles adds what a repository cannot hold: named pipes,
// links, a folder named like a PDF and an oversized file.
func makeSpecialFiles(t *testing.T, dir string) {
	t.Helper()
	for _, p := range []string{"pipe.json", "pipe.pdf", "folder-with-pipe/x.json"} {
		full := filepath.Join(dir, p)
		if err := os.MkdirAll(filepath.Dir(full), 0o755); err != nil {
			t.Fatal(err)
		}
		if err := syscall.Mkfifo(full, 0o644); err != nil {
			t.Skipf("named pipes not available: %v", err)
		}
	}
	if err := os.Mkdir(filepath.Join(dir, "a-folder.pdf"), 0o755); err != nil {
		t.Fatal(err)
	}
	if err := os.Symlink("good.json", filepath.Join(dir, "link-to-good.json")); err != nil {
		t.Fatal(err)
	}
	if err := os.Link(filepath.Join(dir, "good.json"), filepath.Join(dir, "hardlink-to-good.json")); err != nil {
		t.Fatal(err)
	}
	big := bytes.Repeat([]byte(" "), designfile.MaxFileBytes+1)
	if err := os.WriteFile(filepath.Join(dir, "big.json"), big, 0o644); err != nil {
		t.Fatal(err)
	}
}

// copyTree copies the regular files and folders under src to dst.
func copyTree(t *testing.T, src, dst string) {
	t.Helper()
	err := filepath.WalkDir(src, func(path string, e fs.DirEntry, err error) error {
		if err != nil {
			return err
		}
		rel, _ := filepath.Rel(src, path)
		target := filepath.Join(dst, rel)
		if e.IsDir() {
			return os.MkdirAll(target, 0o755)
		}
		b, err := os.ReadFile(path)
		if err != nil {
			return err
		}
		return os.WriteFile(target, b, 0o644)
	})
	if err != nil {
		t.Fatal(err)
	}
}

// TestBadInputs runs every case of testdata/bad-inputs/MANIFEST through
// the command line in-process: each must end with its exit status, name
// its phrase, never panic or hang, print no passing verdict, print valid
// JSON when it prints JSON, and create, change or remove no file.
func TestBadInputs(t *testing.T) {
	cases := readManifest(t)
	if len(cases) < 150 {
		t.Errorf("%d bad inputs, want at least 150", len(cases))
	}
	dir := t.TempDir()
	copyTree(t, badInputsDir, dir)
	makeSpecialFiles(t, dir)
	t.Chdir(dir)
	before := snapshot(t, ".")
	for _, c := range cases {
		code, stdout, stderr, hung := runWithTimeout(c.args, 60*time.Second)
		where := fmt.Sprintf("MANIFEST:%d %s (ullage %s)", c.line, c.id, strings.Join(c.args, " "))
		if hung {
			t.Errorf("%s: did not finish within a minute", where)
			continue
		}
		both := stderr + stdout
		if code != c.exit {
			t.Errorf("%s: exit %d, want %d\nstderr: %s", where, code, c.exit, clipText(stderr))
		}
		if !strings.Contains(both, c.phrase) {
			t.Errorf("%s: the message does not name %q\nstderr: %s\nstdout: %s", where, c.phrase, clipText(stderr), clipText(stdout))
		}
		if strings.Contains(both, "panic") || strings.Contains(both, "goroutine ") {
			t.Errorf("%s: panic or stack trace:\n%s", where, clipText(both))
		}
		if strings.Contains(strings.ToLower(stdout), "verdict: pass") || strings.Contains(stdout, `"verdict": "pass"`) && !strings.Contains(stdout, `"verdict": "error"`) {
			t.Errorf("%s: a passing verdict for a bad input:\n%s", where, clipText(stdout))
		}
		if strings.Contains(both, ".tmp") {
			t.Errorf("%s: the message names a temporary file:\n%s", where, clipText(both))
		}
		if s := strings.TrimSpace(stdout); strings.HasPrefix(s, "{") {
			var v map[string]any
			if err := json.Unmarshal([]byte(s), &v); err != nil {
				t.Errorf("%s: stdout is not valid JSON: %v", where, err)
			} else if code == ExitUsage && v["verdict"] != verdictError {
				t.Errorf("%s: JSON verdict %v for an input that was not assessed", where, v["verdict"])
			}
		}
		after := snapshot(t, ".")
		if d := diffSnapshots(before, after); d != "" {
			t.Errorf("%s: files changed: %s", where, d)
			before = after
		}
	}
}

// runWithTimeout runs the command line in-process; hung is set when it
// does not return in time (the goroutine is then left behind).
func runWithTimeout(args []string, limit time.Duration) (code int, stdout, stderr string, hung bool) {
	type result struct {
		code     int
		out, err string
	}
	done := make(chan result, 1)
	go func() {
		var o, e bytes.Buffer
		c := Run(args, &o, &e)
		done <- result{c, o.String(), e.String()}
	}()
	select {
	case r := <-done:
		return r.code, r.out, r.err, false
	case <-time.After(limit):
		return 0, "", "", true
	}
}

func diffSnapshots(before, after map[string]fileState) string {
	var d []string
	for p, a := range after {
		b, ok := before[p]
		switch {
		case !ok:
			d = append(d, "created "+p)
		case a.mode != b.mode:
			d = append(d, "mode of "+p)
		case a.size != b.size || a.sum != b.sum || !a.mod.Equal(b.mod):
			d = append(d, "changed "+p)
		}
	}
	for p := range before {
		if _, ok := after[p]; !ok {
			d = append(d, "removed "+p)
		}
	}
	return strings.Join(d, ", ")
}

func clipText(s string) string {
	if len(s) > 600 {
		return s[:600] + "…"
	}
	return s
}
