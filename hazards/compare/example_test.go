package compare_test

import (
	"fmt"

	"ullage/fluids"
	"ullage/hazards"
	"ullage/hazards/compare"
)

// Compare two revisions of an invented bulb: revision B cuts the fill so
// that the vessel no longer goes liquid-full.
func ExampleCompare() {
	lib, err := fluids.Builtin()
	if err != nil {
		panic(err)
	}
	a := hazards.Design{
		Fluid:      "acetone",
		FillMassKg: 0.020,
		Vessel: hazards.Vessel{Parts: []hazards.Part{
			{Name: "bulb", Shape: hazards.ShapeSphere, OuterDiameterM: 0.040, WallThicknessM: 0.0015},
		}},
		SealingTemperatureK: 293.15, HottestK: 349.15, ColdestK: 253.15, AmbientPressurePa: 101325,
		Glass:            hazards.GlassChoice{ID: "borosilicate-3.3"},
		ServiceLifeYears: 10, HoursAtHottest: 1000,
		Room: hazards.Room{VolumeM3: 30, AirChangesPerHour: 0.45, MixingFactor: 3,
			NearFieldRadiusM: 1, NearFieldAirSpeed: 0.1, ExposureMinutes: 480},
		Criteria: hazards.DefaultCriteria(),
	}
	b := a
	b.FillMassKg = 0.012

	sides := make([]compare.Side, 2)
	for i, d := range []hazards.Design{a, b} {
		assessment, err := hazards.Assess(d, lib)
		if err != nil {
			panic(err)
		}
		sides[i] = compare.Side{Label: string(rune('A' + i)), Design: d, Assessment: assessment}
	}
	c := compare.Compare(sides[0], sides[1])

	for _, in := range c.Inputs {
		fmt.Printf("%s (%s, SI): %g → %g\n", in.Field, in.Unit, in.Old.Number, in.New.Number)
	}
	for _, s := range c.Statuses {
		fmt.Printf("%s: %s → %s\n", s.Criterion, s.Old, s.New)
	}
	for _, r := range c.Results[:4] {
		verdict := "unchanged"
		if r.Better {
			verdict = "better"
		} else if r.Worse {
			verdict = "worse"
		}
		fmt.Printf("%s: %s\n", r.Name, verdict)
	}
	// Output:
	// fill_mass_kg (mass, SI): 0.02 → 0.012
	// ullage-at-hottest: fail → pass
	// burst-safety-factor: fail → pass
	// failure-probability: fail → pass
	// exposure-twa: caution → pass
	// exposure-public-1: caution → pass
	// Pressure at the hottest temperature: better
	// Ullage at the hottest temperature: better
	// Liquid-full temperature: better
	// Burst safety factor: better
}
