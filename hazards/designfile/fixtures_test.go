package designfile

import (
	"bytes"
	"os"
	"path/filepath"
	"testing"

	"ullage/hazards"
)

// Fixture paths: one file of each format.
var (
	fixtureCurrent     = filepath.Join("testdata", "twin_bulb_v2.json")
	fixtureSingleSheet = filepath.Join("testdata", "twin_bulb_v1.json")
)

// typicalDesign has the numbers of hazards' own test fixture (an invented
// desk ornament: two 40 mm bulbs and a 200 mm neck, 1 mm soda-lime walls,
// 6 g of dichloromethane sealed evacuated at 20 °C), written out in
// kelvin as they appear in the JSON fixtures. Revision A of both fixtures.
func typicalDesign() hazards.Design {
	return hazards.Design{
		Fluid:               "dichloromethane",
		FillMassKg:          0.006,
		FillMassToleranceKg: 0.0002,
		Vessel: hazards.Vessel{Parts: []hazards.Part{
			{Name: "lower bulb", Shape: hazards.ShapeSphere, OuterDiameterM: 0.040, WallThicknessM: 0.001},
			{Name: "upper bulb", Shape: hazards.ShapeSphere, OuterDiameterM: 0.040, WallThicknessM: 0.001},
			{Name: "neck tube", Shape: hazards.ShapeTube, OuterDiameterM: 0.008, WallThicknessM: 0.001, LengthM: 0.2},
		}},
		SealingTemperatureK: 293.15,
		HottestK:            349.15,
		ColdestK:            244.15,
		AmbientPressurePa:   101325,
		Glass:               hazards.GlassChoice{ID: "soda-lime-annealed"},
		ServiceLifeYears:    10,
		HoursAtHottest:      1000,
		Room: hazards.Room{VolumeM3: 30, AirChangesPerHour: 0.45, MixingFactor: 3, NearFieldRadiusM: 1,
			NearFieldAirSpeed: 0.1, ExposureMinutes: 480},
		Criteria: hazards.DefaultCriteria(),
	}
}

// typicalFile is a valid two-revision file built in memory.
func typicalFile() *File {
	b := typicalDesign()
	b.FillMassKg = 0.0055
	return &File{
		Product: Product{Name: "Twin-bulb desk ornament TB-40", PartNumber: "EX-TB40", Company: "Example Glassworks Ltd (invented for tests)"},
		Revisions: []Revision{
			{Label: "A", Date: "2024-03-04", Author: "R. Tester", ChangeNote: "First release.", Design: typicalDesign()},
			{Label: "B", Date: "2024-06-17", Author: "R. Tester", ChangeNote: "Less fill.", Design: b},
		},
	}
}

func readFixture(t testing.TB, path string) []byte {
	t.Helper()
	b, err := os.ReadFile(path)
	if err != nil {
		t.Fatal(err)
	}
	return b
}

func encodeToBytes(t testing.TB, f *File) []byte {
	t.Helper()
	var b bytes.Buffer
	if err := Encode(&b, f); err != nil {
		t.Fatal(err)
	}
	return b.Bytes()
}
