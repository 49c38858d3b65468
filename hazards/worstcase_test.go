package hazards

import (
	"testing"

	"ullage/fluids/units"
)

// TestWorstCaseUnit: with the tolerances stacked (most fill, least
// volume) a unit that keeps its ullage at nominal size can go
// liquid-full; the review must say so (common practice: worst-case
// tolerance stack).
func TestWorstCaseUnit(t *testing.T) {
	lib := testLibrary(t)
	s, err := lib.Lookup("ethanol")
	if err != nil {
		t.Fatal(err)
	}
	hot := units.CelsiusToKelvin(76)
	rhoHot, _ := s.SaturatedLiquidDensity(hot)
	d := typicalDesign()
	d.Fluid = "ethanol"
	d.HottestK = hot
	d.Vessel.InternalVolumeM3 = 40e-6
	d.Vessel.VolumeToleranceM3 = 2e-6
	d.FillMassKg = 0.90 * rhoHot * d.Vessel.InternalVolumeM3 // about 10 % ullage at nominal size
	d.FillMassToleranceKg = 0.003
	a, err := Assess(d, lib)
	if err != nil {
		t.Fatal(err)
	}
	if a.Worst == nil || !a.Worst.Sealable {
		t.Fatalf("no worst-case unit: %+v", a.Worst)
	}
	if a.Worst.Hot.UllagePercent >= a.Hot.UllagePercent {
		t.Errorf("worst-case ullage %.2f %% not below nominal %.2f %%", a.Worst.Hot.UllagePercent, a.Hot.UllagePercent)
	}
	var nominal, worst Finding
	for _, f := range a.Findings {
		switch f.Criterion {
		case CriterionUllage:
			nominal = f
		case CriterionUllageWorst:
			worst = f
		}
	}
	if nominal.Status == StatusFail {
		t.Errorf("nominal unit fails: %+v", nominal.Facts)
	}
	if worst.Status != StatusFail || a.Worst.Hot.Phase != PhaseLiquidFull {
		t.Errorf("worst-case unit: %s (%s), want fail, liquid-full: %+v", worst.Status, a.Worst.Hot.Phase, worst.Facts)
	}
	// No tolerances: no worst-case finding.
	d.FillMassToleranceKg, d.Vessel.VolumeToleranceM3 = 0, 0
	a, err = Assess(d, lib)
	if err != nil {
		t.Fatal(err)
	}
	if a.Worst != nil {
		t.Error("a design without tolerances has a worst-case unit")
	}
	// Walls at their thickest shrink a volume computed from the parts.
	p := typicalDesign()
	p.FillMassToleranceKg = 0
	p.Vessel.Parts[0].WallToleranceM = 0.0002
	a, err = Assess(p, lib)
	if err != nil {
		t.Fatal(err)
	}
	if a.Worst == nil || a.Worst.VolumeM3 >= a.VolumeM3 {
		t.Errorf("thicker walls did not shrink the worst-case volume: %+v vs %g", a.Worst, a.VolumeM3)
	}
}
