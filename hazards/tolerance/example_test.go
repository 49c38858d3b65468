package tolerance_test

import (
	"context"
	"fmt"

	"ullage/fluids"
	"ullage/fluids/units"
	"ullage/hazards"
	"ullage/hazards/tolerance"
)

// A tolerance study of an invented desk ornament: 6 g of dichloromethane
// in two 40 mm soda-lime bulbs joined by a tube, with the fill, the walls
// and the hottest day all varying.
func ExampleRun() {
	lib, err := fluids.Builtin()
	if err != nil {
		panic(err)
	}
	d := hazards.Design{
		Fluid:               "dichloromethane",
		FillMassKg:          0.006,
		FillMassToleranceKg: 0.0003,
		Vessel: hazards.Vessel{Parts: []hazards.Part{
			{Name: "lower bulb", Shape: hazards.ShapeSphere, OuterDiameterM: 0.040, WallThicknessM: 0.001, WallToleranceM: 0.0002},
			{Name: "upper bulb", Shape: hazards.ShapeSphere, OuterDiameterM: 0.040, WallThicknessM: 0.001, WallToleranceM: 0.0002},
			{Name: "neck tube", Shape: hazards.ShapeTube, OuterDiameterM: 0.008, WallThicknessM: 0.001, WallToleranceM: 0.0001, LengthM: 0.2},
		}},
		SealingTemperatureK: units.CelsiusToKelvin(20),
		HottestK:            units.CelsiusToKelvin(76),
		ColdestK:            units.CelsiusToKelvin(-29),
		AmbientPressurePa:   101325,
		Glass:               hazards.GlassChoice{ID: "soda-lime-annealed"},
		ServiceLifeYears:    10,
		HoursAtHottest:      1000,
		Room: hazards.Room{VolumeM3: 30, AirChangesPerHour: 0.45, MixingFactor: 3,
			NearFieldRadiusM: 1, NearFieldAirSpeed: 0.1, ExposureMinutes: 480},
		Criteria: hazards.DefaultCriteria(),
	}
	r, err := tolerance.Run(context.Background(), d, lib, tolerance.Settings{
		Samples: 50_000, Seed: 1, HottestSpreadK: 5, HottestDistribution: tolerance.Triangle,
	})
	if err != nil {
		fmt.Println(err)
		return
	}
	b := r.BurstFraction
	fmt.Printf("burst: %d of %d, 95 %% upper bound %.1e\n", b.Count, b.Total, b.High)
	fmt.Printf("expected burst fraction: %.0e\n", r.MeanFailureProbability)
	fmt.Printf("liquid-full: %d\n", r.LiquidFullFraction.Count)
	fmt.Printf("safety factor: P1 %.1f, P50 %.1f, P99 %.1f\n", r.SafetyFactor.P1, r.SafetyFactor.P50, r.SafetyFactor.P99)
	for _, dr := range r.Sensitivity[:3] {
		fmt.Printf("%-20s %+.2f\n", dr.Label, dr.RankCorrelation)
	}
	// Output:
	// burst: 0 of 50000, 95 % upper bound 7.7e-05
	// expected burst fraction: 7e-09
	// liquid-full: 0
	// safety factor: P1 7.6, P50 14.1, P99 20.4
	// glass strength       +0.83
	// hottest temperature  -0.42
	// wall of lower bulb   +0.18
}

// A study in which no unit of 10 000 failed still bounds the failure rate.
func ExampleWilson() {
	p := tolerance.Wilson(0, 10_000)
	fmt.Printf("%g to %.2g\n", p.Low, p.High)
	p = tolerance.Wilson(37, 10_000)
	fmt.Printf("%.4f (%.4f to %.4f)\n", p.Estimate, p.Low, p.High)
	// Output:
	// 0 to 0.00038
	// 0.0037 (0.0027 to 0.0051)
}
