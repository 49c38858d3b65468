package report_test

import (
	"bytes"
	"fmt"
	"time"

	"ullage/fluids"
	"ullage/fluids/units"
	"ullage/hazards"
	"ullage/report"
)

// Write the record of a small evacuated acetone bulb to a buffer; the app
// or the command line chooses the file.
func ExampleWriteAssessment() {
	lib, err := fluids.Builtin()
	if err != nil {
		panic(err)
	}
	d := hazards.Design{
		Fluid:      "acetone",
		FillMassKg: 0.020,
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
		panic(err)
	}
	m := report.Meta{
		Product: "Example bulb", PartNumber: "EX-1", Company: "Example Works",
		Revision: "A", Reviewer: "R. Reviewer", Date: time.Date(2025, 3, 20, 0, 0, 0, 0, time.UTC),
		ToolVersion: "0.3.0",
	}
	var buf bytes.Buffer
	err = report.WriteAssessment(&buf, m, a, report.Options{Units: report.UnitsSI, Paper: report.PaperA4, Deterministic: true})
	if err != nil {
		panic(err)
	}
	pages := bytes.Count(buf.Bytes(), []byte("/Type /Page")) - bytes.Count(buf.Bytes(), []byte("/Type /Pages"))
	fmt.Printf("%s, %d pages, verdict %s\n", buf.Bytes()[:8], pages, a.Verdict)
	// Output: %PDF-1.3, 9 pages, verdict fail
}
