package cli

import (
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// TestCheckFolderGivesTheTable: a folder gets the summary table with a
// column of failing criteria and an overall verdict line, also when the
// folder holds a single design.
func TestCheckFolderGivesTheTable(t *testing.T) {
	dir := t.TempDir()
	good, err := os.ReadFile("testdata/good.json")
	if err != nil {
		t.Fatal(err)
	}
	if err := os.WriteFile(filepath.Join(dir, "only.json"), good, 0o644); err != nil {
		t.Fatal(err)
	}
	code, out, errOut := run("check", dir)
	if code != ExitPass {
		t.Fatalf("check on a folder of one good design = %d, stderr %q", code, errOut)
	}
	for _, want := range []string{"failing criteria", "only.json", "verdict: PASS (overall, 0 of 1 designs fail)"} {
		if !strings.Contains(out, want) {
			t.Errorf("the folder's output lacks %q:\n%s", want, out)
		}
	}
}

// TestCheckPDFSaysWhereItWrote: --pdf names the record it wrote on
// stderr, as an absolute path.
func TestCheckPDFSaysWhereItWrote(t *testing.T) {
	out := filepath.Join(t.TempDir(), "record.pdf")
	code, _, errOut := run("check", "testdata/good.json", "--pdf", out)
	if code != ExitPass {
		t.Fatalf("check --pdf = %d, stderr %q", code, errOut)
	}
	if !strings.Contains(errOut, "record written to "+out) {
		t.Errorf("stderr %q does not say where the record went (%s)", errOut, out)
	}
}
