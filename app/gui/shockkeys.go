package gui

import (
	"fmt"
	"strconv"

	"ullage/hazards"
	"ullage/report/display"
)

// shockKeyRows lists the thermal-shock result of each part and the seal's
// residual stress. (A design without a sudden change has no row: the form
// says "not assessed", and every key row must lead to its working.)
func shockKeyRows(a *hazards.Assessment, u unitSystem) []keyRow {
	var rows []keyRow
	for _, ps := range a.Shock.Parts {
		c := ps.Cases[ps.Governing]
		n := strconv.Itoa(ps.Part + 1)
		rows = append(rows, keyRow{
			label: fmt.Sprintf("Thermal-shock safety factor, part %s (%s)", n, ps.Name),
			value: fmt.Sprintf("%s (%s %s: %s against %s)", display.Number(c.SafetyFactor, display.ValueFigures), c.Direction,
				u.show(qTempDiff, c.DeltaK, 3), stressText(c.TotalStressPa, u), stressText(ps.StrengthPa, u)),
			trace: []string{"thermal_shock_safety_factor_" + n, "thermal_shock_stress_" + n, "thermal_shock_strength_" + n, "thermal_shock_failure_probability_" + n},
		})
	}
	if s := a.Seal; s != nil {
		rows = append(rows, keyRow{label: "Residual stress at the seal", value: stressText(s.StressPa, u) + " (" + s.Name + ")",
			trace: []string{"seal_residual_stress", "seal_burst"}})
	}
	return rows
}
