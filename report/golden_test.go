package report

import (
	"bytes"
	"crypto/sha256"
	"flag"
	"golang.org/x/image/font/gofont/goregular"
	"os"
	"path/filepath"
	"testing"
)

var update = flag.Bool("update", false, "rewrite testdata/*_golden.pdf from the current output")

// The golden file changes only on purpose: run the test with -update and
// look at the new record before committing it.
func TestAssessmentGolden(t *testing.T) {
	got := render(t, loadMeta(t, "meta_b.json"), assess(t, "typical_design.json"), Options{Deterministic: true})
	golden := filepath.Join("testdata", "assessment_golden.pdf")
	if *update {
		if err := os.WriteFile(golden, got, 0o644); err != nil {
			t.Fatal(err)
		}
	}
	want, err := os.ReadFile(golden)
	if err != nil {
		t.Fatalf("%v (run go test -run Golden -update to create it)", err)
	}
	if !bytes.Equal(got, want) {
		path := writeTemp(t, "assessment.pdf", got)
		t.Errorf("output differs from %s (%d bytes, want %d); new output in %s. If the change is intended, run go test -run Golden -update.",
			golden, len(got), len(want), path)
	}
}

func TestDeterministic(t *testing.T) {
	a := assess(t, "typical_design.json")
	m := loadMeta(t, "meta_b.json")
	cases := []struct {
		name string
		m    Meta
		date string // CreationDate as pdfinfo -isodates prints it
	}{
		{"record date", m, "2025-03-20T00:00:00Z"},
		{"no record date", Meta{Product: "x"}, "2000-01-01T00:00:00Z"},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			o := Options{Deterministic: true}
			first := render(t, c.m, a, o)
			if second := render(t, c.m, a, o); !bytes.Equal(first, second) {
				t.Fatal("two Deterministic renders differ")
			}
			if got := readInfo(t, writeTemp(t, "d.pdf", first)).creationDate; got != c.date {
				t.Errorf("creation date %q, want %q", got, c.date)
			}
		})
	}
}

// The PDF library writes into the font bytes it is given while
// subsetting; the report must hand it copies, or the shared Go fonts
// would change under every later document (and under the app).
func TestFontBytesUntouched(t *testing.T) {
	before := sha256.Sum256(goregular.TTF)
	render(t, loadMeta(t, "meta_b.json"), assess(t, "typical_design.json"), Options{})
	if sha256.Sum256(goregular.TTF) != before {
		t.Fatal("rendering changed the embedded font data")
	}
}
