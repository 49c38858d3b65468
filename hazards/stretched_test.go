package hazards

import (
	"strings"
	"testing"

	"ullage/fluids/units"
)

// TestStretchedOnlyWhereUsed: dichloromethane's vapour-pressure
// correlation starts at 178.05 K, above its freezing point, so at a coldest
// temperature of 177.15 K only the findings computed from the coldest state
// (the implosion safety factor) may lose a clean pass; the hottest-
// temperature findings keep theirs, and the record says which value was
// stretched (common practice: a flag follows the number it qualifies).
func TestStretchedOnlyWhereUsed(t *testing.T) {
	d := typicalDesign()
	d.Fluid = "dichloromethane"
	d.FillMassKg = 0.004
	d.HottestK = units.CelsiusToKelvin(40)
	d.ColdestK = 177.15
	a, err := Assess(d, testLibrary(t))
	if err != nil {
		t.Fatal(err)
	}
	if !a.Cold.Flags.Extrapolated() || a.Hot.Flags.Extrapolated() {
		t.Fatalf("fixture no longer stretches only the coldest state (hot %v, cold %v); pick another", a.Hot.Flags, a.Cold.Flags)
	}
	for _, id := range []string{CriterionUllage, CriterionBurst, CriterionFailure} {
		if f := findingOf(t, a, id); f.Status != StatusPass || len(f.Stretched) != 0 {
			t.Errorf("%s: %s, stretched %v; want a clean pass, it used no stretched value", id, f.Status, f.Stretched)
		}
	}
	im := findingOf(t, a, CriterionImplosion)
	if im.Status != StatusCaution || len(im.Stretched) != 1 || !strings.Contains(im.Stretched[0], "vapour pressure") || !strings.Contains(im.Stretched[0], "coldest") {
		t.Errorf("implosion: %s, stretched %q; want caution naming the vapour pressure at the coldest temperature", im.Status, im.Stretched)
	}
	if c := findingOf(t, a, CriterionCorrelationUse); !strings.Contains(strings.Join(c.Stretched, " "), "coldest") {
		t.Errorf("correlation finding %q; want it to say which value was stretched", c.Stretched)
	}
}
