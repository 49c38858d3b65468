package gui

import "ullage/report/display"

// unitSystem is the set of units the form and results are shown in.
type unitSystem string

// The two unit systems a reviewer can choose.
const (
	unitsSI unitSystem = "si"
	unitsUS unitSystem = "us"
)

// parseUnitSystem returns the unit system named s, SI for anything else.
func parseUnitSystem(s string) unitSystem {
	if s == string(unitsUS) {
		return unitsUS
	}
	return unitsSI
}

// quantity is the kind of a number on screen: the display layer's
// quantity, which decides the unit shown and the conversion from and to
// the engine's SI value.
type quantity = display.Quantity

// Quantities shown on screen, by the display layer's names.
const (
	qNumber       = display.Plain          // dimensionless (safety factor, mixing factor)
	qTemperature  = display.Temperature    // K ↔ °C / °F
	qMass         = display.Mass           // kg ↔ g / oz
	qLength       = display.Length         // m ↔ mm / in (glass dimensions)
	qVesselVolume = display.VesselVolume   // m³ ↔ mL / in³
	qPressure     = display.Pressure       // Pa ↔ kPa / psi
	qRoomVolume   = display.RoomVolume     // m³ ↔ m³ / ft³
	qRoomLength   = display.RoomLength     // m ↔ m / ft
	qAirSpeed     = display.Speed          // m/s ↔ m/s / ft/min
	qPercent      = display.Percent        // %
	qMinutes      = display.Minutes        // min
	qHours        = display.Hours          // h
	qYears        = display.Years          // years
	qPerHour      = display.AirChanges     // air changes per hour
	qProbability  = display.Probability    // a probability, no unit
	qTempDiff     = display.TempDifference // K ↔ K / °F (a temperature difference)
	qStress       = display.Stress         // Pa ↔ MPa / psi
	qRetardation  = display.Retardation    // m ↔ nm (polariscope retardation)
)

// display returns the display package's name for the unit system.
func (u unitSystem) display() display.System {
	if u == unitsUS {
		return display.US
	}
	return display.SI
}

// unit returns the unit label of q in the system, "" for plain numbers.
func (u unitSystem) unit(q quantity) string { return u.display().Unit(q) }

// fromSI converts an engine value to the display unit.
func (u unitSystem) fromSI(q quantity, x float64) float64 { return u.display().FromSI(q, x) }

// toSI converts a typed value in the display unit to the engine's SI.
func (u unitSystem) toSI(q quantity, x float64) float64 { return u.display().ToSI(q, x) }

// show formats an SI value in the display unit with its unit label, to n
// significant figures by the display rule.
func (u unitSystem) show(q quantity, x float64, n int) string {
	s := sigFigures(u.fromSI(q, x), n)
	if lbl := u.unit(q); lbl != "" {
		s += " " + lbl
	}
	return s
}

// entryText writes a value for an entry that is not in a unit system
// of its own (a study's settings, the default criteria): six significant
// figures, as display.Entry writes SI values.
func entryText(x float64) string { return display.Entry(x, display.SI) }

// sigFigures formats x to n significant digits by the display rule.
func sigFigures(x float64, n int) string { return display.Number(x, n) }
