package report

import (
	"fmt"

	"ullage/hazards"
	"ullage/report/display"
)

// thermalShock prints the thermal-shock review of each part and the seal's
// residual stress, or says that neither was given.
func (w *assessmentWriter) thermalShock() {
	d, a, u := w.d, w.a, w.u
	ds := &a.Design
	d.heading("Thermal shock and seal stress")
	if !a.Shock.Assessed {
		d.lead("Thermal shock: not assessed. " + display.Capitalised(hazards.ShockNotAssessed) + ".")
	} else {
		d.lead(fmt.Sprintf("A sudden change of surface temperature ΔT puts the surface of the glass into a stress E·α·ΔT/(1 − ν) (Kingery, Bowen and Uhlmann, Introduction to Ceramics, ch. 16): tension on a surface cooled suddenly, the dangerous case; when the outside is warmed suddenly the tension appears on the inner surface and around the warmed patch, and is taken at the same bound, which it cannot exceed. The value is the upper bound for instant surface cooling; the pressure stress at the start and any residual stress at the seal are added. Each part is held against its own short-term strength for its outer area and a load of %s s, with the burst check's required safety factor (%s).",
			display.Stated(a.Shock.LoadSeconds), display.Number(a.Shock.RequiredSafetyFactor, 3)))
		rows := make([][]cell, 0, len(a.Shock.Parts))
		for _, ps := range a.Shock.Parts {
			c := ps.Cases[ps.Governing]
			rows = append(rows, []cell{
				{text: ps.Name}, {text: c.Direction + ", " + u.temperatureDifference(c.DeltaK)},
				{text: u.system().StressPerDegree(ps.StressPerKelvin)}, {text: u.stress(c.ThermalStressPa)},
				{text: u.stress(c.PressureStressPa + c.ResidualStressPa)}, {text: u.stress(ps.StrengthPa)},
				{text: display.ValueOf(a, hazards.ThermalShockCriterion(ps.Part)), bold: true}, {text: display.Number(c.FailureProbability, 2)},
				{text: u.temperatureDifference(ps.AllowableDeltaK)},
			})
		}
		d.drawTable(table{cols: []col{
			{"Part", 1.3, 'L'}, {"Sudden change", 1.4, 'L'}, {"E·α/(1 − ν)", 1.2, 'R'}, {"Thermal stress", 1.1, 'R'},
			{"Pressure and seal stress", 1.2, 'R'}, {"Short-term strength", 1.2, 'R'}, {"Safety factor", 1, 'R'},
			{"Failure probability per event", 1.3, 'R'}, {"Change withstood at the required factor", 1.5, 'R'},
		}, rows: rows, zebra: true, size: 7.5})
		rating := "none stated in the library for " + a.Glass.Name + " (ISO 718 and ASTM C149 are the test methods for ware)"
		if r := a.Glass.RatedShockDifference; r.Value > 0 {
			rating = u.temperatureDifference(r.Value) + " (" + r.Source + ")"
		}
		d.keyValues([][2]string{{"Stated thermal-shock rating of the glass", rating}}, 1)
	}
	if s := a.Seal; s != nil {
		how := "measured stress, as given"
		if s.FromRetardation {
			how = fmt.Sprintf("from a retardation of %s nm over %s of glass, σ = δ/(C·L) with C = %s /Pa (%s); retardation by the polariscope methods of ASTM C148",
				display.Number(s.RetardationM*1e9, 3), u.length(s.PathLengthM), display.Number(s.Coefficient.Value, 3), s.Coefficient.Source)
		}
		d.keyValues([][2]string{
			{"Residual stress at the seal", u.stress(s.StressPa) + " in the " + s.Name + ": " + how},
			{"Burst resistance with it", u.pressure(s.BurstWithPa) + " long-term burst overpressure (" + u.pressure(s.BurstWithoutPa) + " without); failure probability " + display.Number(s.FailureWith, 2) + " (" + display.Number(s.FailureWithout, 2) + " without)"},
		}, 1)
	} else if ds.Vessel.Parts != nil {
		d.keyValues([][2]string{{"Residual stress at the seal", "none given: the burst check assumes well-annealed seals"}}, 1)
	}
}
