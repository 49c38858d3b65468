package hazards_test

import (
	"fmt"

	"ullage/fluids"
	"ullage/fluids/units"
	"ullage/hazards"
)

// Assess a small evacuated bulb of acetone left in a hot car.
func ExampleAssess() {
	lib, err := fluids.Builtin()
	if err != nil {
		panic(err)
	}
	d := hazards.Design{
		Fluid:      "acetone",
		FillMassKg: 0.020, // 20 g
		Vessel: hazards.Vessel{Parts: []hazards.Part{
			{Name: "bulb", Shape: hazards.ShapeSphere, OuterDiameterM: 0.040, WallThicknessM: 0.0015},
		}},
		SealingTemperatureK: units.CelsiusToKelvin(20),
		HottestK:            units.CelsiusToKelvin(76),
		ColdestK:            units.CelsiusToKelvin(-20),
		AmbientPressurePa:   101325,
		Glass:               hazards.GlassChoice{ID: "borosilicate-3.3"},
		ServiceLifeYears:    10,
		HoursAtHottest:      1000,
		Room: hazards.Room{VolumeM3: 30, AirChangesPerHour: 0.45, MixingFactor: 3,
			NearFieldRadiusM: 1, NearFieldAirSpeed: 0.1, ExposureMinutes: 480},
		Criteria: hazards.DefaultCriteria(),
	}
	a, err := hazards.Assess(d, lib)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("at 76 °C: %s, %.0f kPa, ullage %.1f %%\n", a.Hot.Phase, a.Hot.PressurePa/1000, a.Hot.UllagePercent)
	fmt.Printf("liquid-full at %.1f °C\n", units.KelvinToCelsius(a.LiquidFullK))
	fmt.Println("verdict:", a.Verdict)
	for _, f := range a.Findings {
		fmt.Printf("%-7s %s\n", f.Status, f.Criterion)
	}
	// Output:
	// at 76 °C: liquid-full, 22457 kPa, ullage 0.0 %
	// liquid-full at 51.7 °C
	// verdict: fail
	// fail    ullage-at-hottest
	// fail    burst-safety-factor
	// fail    failure-probability
	// pass    implosion-safety-factor
	// pass    exposure-idlh
	// not-assessed exposure-ceiling
	// not-assessed exposure-stel
	// caution exposure-twa
	// caution exposure-public-1
	// pass    exposure-public-2
	// pass    exposure-public-3
	// pass    flammability
}

// A fill too large for the vessel is refused with the field named.
func ExampleAssess_overfilled() {
	lib, _ := fluids.Builtin()
	d := hazards.Design{
		Fluid: "water", FillMassKg: 0.05,
		Vessel:              hazards.Vessel{Parts: []hazards.Part{{Name: "bulb", Shape: hazards.ShapeSphere, OuterDiameterM: 0.04, WallThicknessM: 0.001}}},
		SealingTemperatureK: 293.15, HottestK: 320, ColdestK: 280, AmbientPressurePa: 101325,
		Glass: hazards.GlassChoice{ID: "soda-lime-annealed"}, ServiceLifeYears: 5, HoursAtHottest: 100,
		Room:     hazards.Room{VolumeM3: 30, AirChangesPerHour: 1, MixingFactor: 1, NearFieldRadiusM: 1, NearFieldAirSpeed: 0.1, ExposureMinutes: 60},
		Criteria: hazards.DefaultCriteria(),
	}
	_, err := hazards.Assess(d, lib)
	fmt.Println(err)
	// Output: fill_mass_kg = 0.05: must be less than 0.02868 kg: that much Water, as liquid, already fills the whole 2.873e-05 m³ at the sealing temperature: the fill does not fit in the vessel
}
