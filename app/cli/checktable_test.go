package cli

import (
	"os"
	"path/filepath"
	"strings"
	"testing"

	"ullage/fluids"
	"ullage/hazards"
	"ullage/hazards/designfile"
	"ullage/report/display"
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

// TestCheckFolderNamesFailingCriteriaByTitle: the folder table's
// failing-criteria column names the failing findings by the titles the
// window and the record print (display.FailingTitles), never by the
// engine's criterion ids. Revision A of the bundled example fails (its
// burst and ullage findings); good.json fails nothing.
func TestCheckFolderNamesFailingCriteriaByTitle(t *testing.T) {
	example, err := designfile.Load(filepath.Join("..", "..", "assets", "examples", "tidemark-lantern.json"))
	if err != nil {
		t.Fatal(err)
	}
	revA, err := example.Find("A")
	if err != nil {
		t.Fatal(err)
	}
	example.Revisions = []designfile.Revision{*revA}
	dir := t.TempDir()
	if err := designfile.Save(filepath.Join(dir, "lantern-a.json"), example); err != nil {
		t.Fatal(err)
	}
	good, err := os.ReadFile("testdata/good.json")
	if err != nil {
		t.Fatal(err)
	}
	if err := os.WriteFile(filepath.Join(dir, "good.json"), good, 0o644); err != nil {
		t.Fatal(err)
	}
	lib, err := fluids.Builtin()
	if err != nil {
		t.Fatal(err)
	}
	a, err := hazards.Assess(revA.Design, lib)
	if err != nil {
		t.Fatal(err)
	}
	for _, c := range []struct {
		units string
		sys   display.System
	}{{"si", display.SI}, {"us", display.US}} {
		_, out, errOut := run("check", "--units", c.units, dir)
		titles := display.FailingTitles(display.Findings(a, c.sys))
		if len(titles) == 0 {
			t.Fatal("revision A of the example fails nothing; the test needs a failing design")
		}
		var rowA, rowGood string
		for _, ln := range strings.Split(out, "\n") {
			switch {
			case strings.HasPrefix(ln, "lantern-a.json"):
				rowA = ln
			case strings.HasPrefix(ln, "good.json"):
				rowGood = ln
			}
		}
		if want := strings.Join(titles, "; "); !strings.HasSuffix(rowA, "  "+want) {
			t.Errorf("%s: the failing design's row %q does not end with its failing titles %q (stderr %q)", c.units, rowA, want, errOut)
		}
		if !strings.HasSuffix(rowGood, "  none") {
			t.Errorf("%s: the passing design's row %q does not end with none", c.units, rowGood)
		}
		for _, f := range a.Findings {
			if f.Status == hazards.StatusFail && f.Criterion != f.Title && strings.Contains(rowA, " "+f.Criterion) {
				t.Errorf("%s: the row names criterion id %q: %q", c.units, f.Criterion, rowA)
			}
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
