package hazards

import (
	"testing"

	"ullage/fluids"
	"ullage/fluids/units"
)

func testLibrary(t testing.TB) *fluids.Library {
	t.Helper()
	lib, err := fluids.Builtin()
	if err != nil {
		t.Fatal(err)
	}
	return lib
}

// typicalDesign is an invented desk ornament: two 40 mm bulbs joined by a
// 200 mm tube, 1 mm soda-lime walls, 6 g of dichloromethane sealed
// evacuated at 20 °C. Used only as a test fixture.
func typicalDesign() Design {
	return Design{
		Fluid:               "dichloromethane",
		FillMassKg:          0.006,
		FillMassToleranceKg: 0.0002,
		Vessel: Vessel{Parts: []Part{
			{Name: "lower bulb", Shape: ShapeSphere, OuterDiameterM: 0.040, WallThicknessM: 0.001},
			{Name: "upper bulb", Shape: ShapeSphere, OuterDiameterM: 0.040, WallThicknessM: 0.001},
			{Name: "neck tube", Shape: ShapeTube, OuterDiameterM: 0.008, WallThicknessM: 0.001, LengthM: 0.2},
		}},
		SealingTemperatureK:   units.CelsiusToKelvin(20),
		ResidualGasPressurePa: 0,
		HottestK:              units.CelsiusToKelvin(76),
		ColdestK:              units.CelsiusToKelvin(-29),
		AmbientPressurePa:     101325,
		Glass:                 GlassChoice{ID: "soda-lime-annealed"},
		ServiceLifeYears:      10,
		HoursAtHottest:        1000,
		Room: Room{VolumeM3: 30, AirChangesPerHour: 0.45, MixingFactor: 3, NearFieldRadiusM: 1,
			NearFieldAirSpeed: 0.1, ExposureMinutes: 480},
		Criteria: DefaultCriteria(),
	}
}
