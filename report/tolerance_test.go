package report

import (
	"context"
	"strings"
	"testing"

	"ullage/fluids"
	"ullage/hazards/tolerance"
	"ullage/report/display"
)

// TestToleranceSection: the study appears in the record with its
// intervals, the driver ranking and the interval's source.
func TestToleranceSection(t *testing.T) {
	a := assess(t, "liquidfull_design.json")
	lib, err := fluids.Builtin()
	if err != nil {
		t.Fatal(err)
	}
	r, err := tolerance.Run(context.Background(), a.Design, lib, tolerance.Settings{Samples: 3000, Seed: 5, Workers: 1})
	if err != nil {
		t.Fatal(err)
	}
	pdf := render(t, loadMeta(t, "meta_a.json"), a, Options{Deterministic: true, Tolerance: r})
	flat := strings.Join(strings.Fields(pdfText(t, writeTemp(t, "tol.pdf", pdf))), " ")
	for _, want := range []string{"Tolerance study", "3000 units, seed 5", "Wilson, J. Am. Stat. Assoc. 22, 209 (1927)",
		"Liquid-full below their hottest temperature", "What drives the safety margin", "Spearman",
		squashed(display.PlusMinusNote), "Strongest driver of the safety factor"} {
		if !strings.Contains(flat, want) {
			t.Errorf("record lacks %q", want)
		}
	}
	if strings.Contains(flat, "e+0") || strings.Contains(flat, "e-0") {
		t.Error("the tolerance section prints e-notation")
	}
	// The note may break across a page; its opening words say why.
	if display.WallLowersMargin(r.Sensitivity) && !strings.Contains(flat, "A thicker wall can lower the margin: the outside size is fixed, so a thicker wall shrinks") {
		t.Error("a wall lowers the margin, but the record does not say why")
	}
}

// squashed is s with its runs of white space made single spaces, as the
// record's text reads back.
func squashed(s string) string { return strings.Join(strings.Fields(s), " ") }
