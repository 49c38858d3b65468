package report

import (
	"context"
	"strings"
	"testing"

	"ullage/fluids"
	"ullage/hazards/tolerance"
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
	for _, want := range []string{"Tolerance study", "3000 units were drawn (seed 5)", "Wilson, J. Am. Stat. Assoc. 22, 209 (1927)",
		"Liquid-full below the hottest temperature", "What drives the safety margin", "Spearman"} {
		if !strings.Contains(flat, want) {
			t.Errorf("record lacks %q", want)
		}
	}
}
