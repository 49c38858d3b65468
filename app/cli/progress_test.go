package cli

import (
	"bytes"
	"io"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"ullage/report/display"
)

// A tolerance study run with stderr piped (or written to a file or a
// buffer, as in a pipeline) prints no progress line: stderr holds nothing
// but what it holds without a study's progress, and no carriage return.
func TestStudyProgressNotPiped(t *testing.T) {
	args := []string{"check", "testdata/good.json", "--samples", "20000", "--seed", "3"}
	r, w, err := os.Pipe()
	if err != nil {
		t.Fatal(err)
	}
	got := make(chan string)
	go func() {
		b, _ := io.ReadAll(r)
		got <- string(b)
	}()
	var out bytes.Buffer
	code := Run(args, &out, w)
	w.Close()
	piped := <-got
	if code != ExitPass {
		t.Fatalf("exit %d, stderr %q", code, piped)
	}
	f, err := os.Create(filepath.Join(t.TempDir(), "stderr.txt"))
	if err != nil {
		t.Fatal(err)
	}
	Run(args, io.Discard, f)
	f.Close()
	inFile, err := os.ReadFile(f.Name())
	if err != nil {
		t.Fatal(err)
	}
	_, _, buffered := run(args...)
	for name, s := range map[string]string{"pipe": piped, "file": string(inFile), "buffer": buffered} {
		if strings.Contains(s, "\r") || strings.Contains(s, "units (") || s != buffered {
			t.Errorf("stderr to a %s: %q, want no progress (and what a buffer gets, %q)", name, s, buffered)
		}
	}
	if !strings.Contains(out.String(), "tolerance study: "+display.Units(20000)) {
		t.Errorf("the study is missing from stdout:\n%s", out.String())
	}
}

// Only a character device counts as a terminal: not a pipe, a file or a
// buffer.
func TestIsTerminal(t *testing.T) {
	r, w, err := os.Pipe()
	if err != nil {
		t.Fatal(err)
	}
	defer r.Close()
	defer w.Close()
	f, err := os.Create(filepath.Join(t.TempDir(), "x"))
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	for name, tc := range map[string]struct {
		w    io.Writer
		want bool
	}{"pipe": {w, false}, "file": {f, false}, "buffer": {&bytes.Buffer{}, false}} {
		if got := isTerminal(tc.w); got != tc.want {
			t.Errorf("%s: isTerminal %v, want %v", name, got, tc.want)
		}
	}
	if null, err := os.OpenFile(os.DevNull, os.O_WRONLY, 0); err == nil {
		defer null.Close()
		if !isTerminal(null) {
			t.Errorf("%s is a character device; isTerminal says no", os.DevNull)
		}
	}
}

// The progress line is rewritten in place, padded over a longer one, and
// cleared at the end, leaving the cursor at the start of a blank line.
func TestProgressLine(t *testing.T) {
	var b bytes.Buffer
	p := &progressLine{w: &b, label: "study"}
	p.report(100000, 1000000)
	p.report(1000000, 1000000)
	p.clear()
	// Counts are grouped by the display layer (a no-break space between
	// groups); the padding counts characters, not bytes.
	want := "\rstudy: 100\u00a0000 of 1\u00a0000\u00a0000 units (10 %)" +
		"\rstudy: 1\u00a0000\u00a0000 of 1\u00a0000\u00a0000 units (100 %)" +
		"\r" + strings.Repeat(" ", len("study: 1 000 000 of 1 000 000 units (100 %)")) + "\r"
	if b.String() != want {
		t.Errorf("wrote %q\nwant  %q", b.String(), want)
	}
	b.Reset()
	p.report(5, 10)
	p.report(10, 100) // longer than the line before: no padding; then one shorter
	p.report(1, 1)
	if !strings.HasSuffix(b.String(), "\rstudy: 1 of 1 unit (100 %)   ") {
		t.Errorf("a shorter line is not padded over the longer one: %q", b.String())
	}
}
