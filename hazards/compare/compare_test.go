package compare

import (
	"reflect"
	"testing"

	"ullage/hazards"
)

// Revision A overfills the bulb and goes liquid-full below the hottest
// temperature; revision B cuts the fill from 20 g to 12 g and keeps 38 %
// ullage. The ullage finding must flip from fail to pass, and the fill
// must be the one input listed.
func TestFillCutFlipsUllage(t *testing.T) {
	a := side(t, "A", overfilledBulb())
	d := overfilledBulb()
	d.FillMassKg = 0.012
	b := side(t, "B", d)
	c := Compare(a, b)

	want := []InputChange{{Field: "fill_mass_kg", Unit: UnitMass, Old: num(UnitMass, 0.02), New: num(UnitMass, 0.012)}}
	if !reflect.DeepEqual(c.Inputs, want) {
		t.Errorf("inputs %+v; want %+v", c.Inputs, want)
	}
	flip, ok := findStatus(c, hazards.CriterionUllage)
	if !ok || flip.Old != hazards.StatusFail || flip.New != hazards.StatusPass || flip.Title == "" {
		t.Errorf("ullage status change %+v (found %v); want fail → pass with a title", flip, ok)
	}
	// Burst and failure probability fail with the vessel liquid-full and
	// pass with ullage left; implosion does not depend on the fill here.
	for _, id := range []string{hazards.CriterionBurst, hazards.CriterionFailure} {
		if s, ok := findStatus(c, id); !ok || s.Old != hazards.StatusFail || s.New != hazards.StatusPass {
			t.Errorf("%s: %+v (found %v); want fail → pass", id, s, ok)
		}
	}
	if s, ok := findStatus(c, hazards.CriterionImplosion); ok {
		t.Errorf("implosion listed as changed: %+v", s)
	}

	if got := len(c.Results); got != len(quantities) || got < 13 {
		t.Fatalf("%d results; want every one of the %d quantities", got, len(quantities))
	}
	lf := findResult(t, c, "Liquid-full temperature")
	if !lf.Better || lf.Worse || !(lf.New.Value > lf.Old.Value) {
		t.Errorf("liquid-full temperature %+v; want it higher and better", lf)
	}
	p := findResult(t, c, "Pressure at the hottest temperature")
	if !p.Better || !(p.New.Value < p.Old.Value) {
		t.Errorf("pressure %+v; want it lower and better", p)
	}
	im := findResult(t, c, "Implosion safety factor")
	if im.Old != im.New || im.Better || im.Worse || im.Changed() {
		t.Errorf("implosion safety factor %+v; want unchanged", im)
	}
	if !c.HasChanges() {
		t.Error("HasChanges() = false")
	}

	// The other way round every flip reverses.
	back := Compare(b, a)
	if s, ok := findStatus(back, hazards.CriterionUllage); !ok || s.Old != hazards.StatusPass || s.New != hazards.StatusFail {
		t.Errorf("B → A ullage %+v; want pass → fail", s)
	}
	if r := findResult(t, back, "Liquid-full temperature"); !r.Worse || r.Better {
		t.Errorf("B → A liquid-full temperature %+v; want worse", r)
	}
}

func TestIdenticalDesigns(t *testing.T) {
	a := side(t, "A", overfilledBulb())
	b := side(t, "B", overfilledBulb())
	c := Compare(a, b)
	if len(c.Inputs) != 0 || len(c.Statuses) != 0 || c.HasChanges() {
		t.Errorf("identical designs: inputs %+v, statuses %+v", c.Inputs, c.Statuses)
	}
	if len(c.Results) != len(quantities) {
		t.Fatalf("%d results; want all %d listed", len(c.Results), len(quantities))
	}
	for _, r := range c.Results {
		if r.Old != r.New || r.Better || r.Worse {
			t.Errorf("%s: %+v; want unchanged", r.Name, r)
		}
	}
}

// A change of fluid changes which findings apply: a fluid with no
// published exposure limit has a finding saying so, reported against
// "absent" on the other side.
func TestCriterionOnOneSideOnly(t *testing.T) {
	a := overfilledBulb()
	a.FillMassKg = 0.012
	b := a
	b.Fluid = "perfluoro-2-methyl-3-pentanone" // not flammable (no LFL), no published exposure limit, no AEGL or PAC
	b.FillMassKg = 0.015
	c := Compare(side(t, "A", a), side(t, "B", b))
	oldSet, newSet := map[string]bool{}, map[string]bool{}
	for _, f := range c.A.Assessment.Findings {
		oldSet[f.Criterion] = true
	}
	for _, f := range c.B.Assessment.Findings {
		newSet[f.Criterion] = true
	}
	found := 0
	for id := range oldSet {
		if !newSet[id] {
			found++
			if s, ok := findStatus(c, id); !ok || s.New != StatusAbsent {
				t.Errorf("%s only in A: %+v (listed %v); want New = absent", id, s, ok)
			}
		}
	}
	for id := range newSet {
		if !oldSet[id] {
			found++
			if s, ok := findStatus(c, id); !ok || s.Old != StatusAbsent {
				t.Errorf("%s only in B: %+v (listed %v); want Old = absent", id, s, ok)
			}
		}
	}
	if found == 0 {
		t.Fatal("the two fluids have the same criteria; pick another pair for this test")
	}
	if r := findResult(t, c, "Peak as a percentage of the LFL"); r.New.State != NotFlammable {
		t.Errorf("perfluoro(2-methyl-3-pentanone) %% LFL read as %+v; want not flammable", r.New)
	}
}

// A side that could not be assessed reads "not assessed", and the other
// side's findings all count as changed.
func TestSideWithoutAssessment(t *testing.T) {
	b := side(t, "B", overfilledBulb())
	c := Compare(Side{Label: "A", Design: overfilledBulb()}, b)
	if len(c.Inputs) != 0 {
		t.Errorf("inputs %+v; the designs are the same", c.Inputs)
	}
	for _, r := range c.Results {
		if r.Old.State != NotAssessed || r.Better || r.Worse || r.Old.Value != 0 {
			t.Errorf("%s: %+v; want A not assessed, neither better nor worse", r.Name, r)
		}
	}
	if len(c.Statuses) != len(b.Assessment.Findings) {
		t.Errorf("%d status changes; want one per finding of B (%d)", len(c.Statuses), len(b.Assessment.Findings))
	}
	for _, s := range c.Statuses {
		if s.Old != StatusAbsent {
			t.Errorf("%+v; want Old = absent", s)
		}
	}
	if none := Compare(Side{}, Side{}); len(none.Statuses) != 0 || len(none.Inputs) != 0 || len(none.Results) != len(quantities) {
		t.Errorf("two empty sides: %+v", none)
	}
}
