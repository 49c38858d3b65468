package report

import (
	"bytes"
	"errors"
	"fmt"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"ullage/hazards"
	"ullage/hazards/compare"
)

// revisions assesses the two revision fixtures and compares them.
func revisions(t testing.TB) compare.Comparison {
	t.Helper()
	a, b := assess(t, "revision_a_design.json"), assess(t, "revision_b_design.json")
	return compare.Compare(compare.Side{Label: "A", Design: a.Design, Assessment: a}, compare.Side{Label: "B", Design: b.Design, Assessment: b})
}

func renderComparison(t testing.TB, c compare.Comparison, o Options) []byte {
	t.Helper()
	var buf bytes.Buffer
	if err := WriteComparison(&buf, loadMeta(t, "meta_a.json"), loadMeta(t, "meta_b.json"), c, o); err != nil {
		t.Fatal(err)
	}
	return buf.Bytes()
}

func TestComparisonReadsBack(t *testing.T) {
	c := revisions(t)
	if len(c.Statuses) == 0 || len(c.Inputs) == 0 {
		t.Fatalf("fixtures: %d status changes and %d input changes, want some of each", len(c.Statuses), len(c.Inputs))
	}
	cases := []struct {
		name string
		o    Options
		w, h float64
		want []string // the fill change is the fixtures' own numbers: 44 g and 30 g, 1.552 oz and 1.058 oz to four figures (1 oz = 28.349523125 g)
	}{
		{"si-a4", Options{}, a4W, a4H, []string{"► Fill mass 44 g ± 0.5 g 30 g ± 0.5 g", "Hottest temperature 76.0 °C 76.0 °C"}},
		{"us-letter", Options{Units: UnitsUS, Paper: PaperLetter}, letterW, letterH, []string{"► Fill mass 1.552 oz ± 0.01764 oz 1.058 oz ± 0.01764 oz", "Hottest temperature 168.8 °F 168.8 °F"}},
	}
	for _, tc := range cases {
		t.Run(tc.name, func(t *testing.T) {
			path := writeTemp(t, "c.pdf", renderComparison(t, c, tc.o))
			info := readInfo(t, path)
			text := pdfText(t, path)
			if !scalar.EqualWithinAbs(info.width, tc.w, 0.5) || !scalar.EqualWithinAbs(info.height, tc.h, 0.5) {
				t.Errorf("page size %g × %g pt, want %g × %g", info.width, info.height, tc.w, tc.h)
			}
			if n := renderPages(t, path); n != info.pages || n < 2 {
				t.Errorf("pdftoppm drew %d pages, pdfinfo counts %d", n, info.pages)
			}
			want := append([]string{
				"Overall verdict and findings whose status changed", "Rev. A", "Rev. B",
				"Inputs side by side", "Results side by side", "Findings side by side",
				"Figure 1. Internal pressure against temperature, both revisions",
				"Internal pressure, Rev. A", "Internal pressure, Rev. B", "qualified, licensed professionals",
				"Approved by", fmt.Sprintf("Page %d of %d", info.pages, info.pages),
			}, tc.want...)
			for _, s := range c.Statuses {
				want = append(want, fmt.Sprintf("► %s %s → %s", s.Title, statusWord(s.Old), statusWord(s.New)))
			}
			for _, r := range c.Results {
				switch {
				case r.Better:
					want = append(want, "► "+r.Name)
				case r.Worse:
					want = append(want, "► "+r.Name)
				}
			}
			for _, s := range want {
				if !strings.Contains(text, s) {
					t.Errorf("missing %q", s)
				}
			}
			if !strings.Contains(text, "▲ better") {
				t.Error("no result marked better")
			}
			// The status box comes before the inputs.
			if strings.Index(text, "findings whose status changed") > strings.Index(text, "Inputs side by side") {
				t.Error("the status changes are not first")
			}
		})
	}
}

// A side that could not be assessed reads "not assessed".
func TestComparisonOneSideNotAssessed(t *testing.T) {
	c := revisions(t)
	c = compare.Compare(compare.Side{Label: "A", Design: c.A.Design}, c.B)
	text := pdfText(t, writeTemp(t, "c.pdf", renderComparison(t, c, Options{})))
	if !strings.Contains(text, "not assessed") {
		t.Error(`missing "not assessed"`)
	}
}

func TestComparisonErrors(t *testing.T) {
	c := revisions(t)
	cases := []struct {
		name  string
		c     compare.Comparison
		o     Options
		field string
	}{
		{"units", c, Options{Units: "metric"}, "Units"},
		{"nothing assessed", compare.Comparison{A: compare.Side{Design: c.A.Design}, B: compare.Side{Design: c.B.Design}}, Options{}, "comparison"},
		{"incomplete side", compare.Comparison{A: compare.Side{Assessment: &hazards.Assessment{}}, B: c.B}, Options{}, "comparison.A.Assessment"},
	}
	for _, tc := range cases {
		t.Run(tc.name, func(t *testing.T) {
			var buf bytes.Buffer
			err := WriteComparison(&buf, Meta{}, Meta{}, tc.c, tc.o)
			var oe *OptionError
			if !errors.As(err, &oe) || oe.Field != tc.field {
				t.Fatalf("error %v, want an *OptionError for %s", err, tc.field)
			}
		})
	}
}
