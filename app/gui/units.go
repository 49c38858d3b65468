package gui

import (
	"math"
	"strconv"
	"strings"

	"ullage/fluids/units"
	"ullage/report/display"
)

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

// quantity is the kind of a number on screen: it decides the unit shown
// and the conversion from and to the engine's SI value.
type quantity int

// Quantities shown on screen.
const (
	qNumber       quantity = iota // dimensionless (safety factor, mixing factor)
	qTemperature                  // K ↔ °C / °F
	qMass                         // kg ↔ g / oz
	qLength                       // m ↔ mm / in (glass dimensions)
	qVesselVolume                 // m³ ↔ mL / in³
	qPressure                     // Pa ↔ kPa / psi
	qRoomVolume                   // m³ ↔ m³ / ft³
	qRoomLength                   // m ↔ m / ft
	qAirSpeed                     // m/s ↔ m/s / ft/min
	qPercent                      // %
	qMinutes                      // min
	qHours                        // h
	qYears                        // years
	qPerHour                      // air changes per hour
	qProbability                  // a probability, no unit
	qTempDiff                     // K ↔ K / °F (a temperature difference)
	qStress                       // Pa ↔ MPa / psi
	qRetardation                  // m ↔ nm (polariscope retardation)
)

// display returns the display package's name for the unit system.
func (u unitSystem) display() display.System {
	if u == unitsUS {
		return display.US
	}
	return display.SI
}

// unit returns the unit label of q in the system, "" for plain numbers.
func (u unitSystem) unit(q quantity) string {
	us := u == unitsUS
	pick := func(si, usName string) string {
		if us {
			return usName
		}
		return si
	}
	switch q {
	case qTemperature:
		return pick("°C", "°F")
	case qMass:
		return pick("g", "oz")
	case qLength:
		return pick("mm", "in")
	case qVesselVolume:
		return pick("mL", "in³")
	case qPressure:
		return pick("kPa", "psi")
	case qRoomVolume:
		return pick("m³", "ft³")
	case qRoomLength:
		return pick("m", "ft")
	case qAirSpeed:
		return pick("m/s", "ft/min")
	case qPercent:
		return "%"
	case qMinutes:
		return "min"
	case qHours:
		return "h"
	case qYears:
		return "years"
	case qPerHour:
		return "per h"
	case qTempDiff:
		return pick("K", "°F")
	case qStress:
		return pick("MPa", "psi")
	case qRetardation:
		return "nm"
	}
	return ""
}

// scale returns the size of one display unit of q in SI; temperature is
// handled apart because it is affine.
func (u unitSystem) scale(q quantity) float64 {
	us := u == unitsUS
	pick := func(si, usScale float64) float64 {
		if us {
			return usScale
		}
		return si
	}
	switch q {
	case qMass:
		return pick(1e-3, units.OunceKg)
	case qLength:
		return pick(1e-3, units.InchM)
	case qVesselVolume:
		return pick(1e-6, units.CubicInchM3)
	case qPressure:
		return pick(1e3, units.PsiPa)
	case qRoomVolume:
		return pick(1, units.CubicFootM3)
	case qRoomLength:
		return pick(1, units.FootM)
	case qAirSpeed:
		return pick(1, units.FootPerMinuteMS)
	case qTempDiff:
		return pick(1, 5.0/9.0)
	case qStress:
		return pick(1e6, units.PsiPa)
	case qRetardation:
		return 1e-9
	}
	return 1
}

// fromSI converts an engine value to the display unit.
func (u unitSystem) fromSI(q quantity, x float64) float64 {
	if q == qTemperature {
		if u == unitsUS {
			return units.KelvinToFahrenheit(x)
		}
		return units.KelvinToCelsius(x)
	}
	return x / u.scale(q)
}

// toSI converts a typed value in the display unit to the engine's SI.
func (u unitSystem) toSI(q quantity, x float64) float64 {
	if q == qTemperature {
		if u == unitsUS {
			return units.FahrenheitToKelvin(x)
		}
		return units.CelsiusToKelvin(x)
	}
	return x * u.scale(q)
}

// show formats an SI value in the display unit with its unit label, to n
// significant digits.
func (u unitSystem) show(q quantity, x float64, n int) string {
	s := sigFigures(u.fromSI(q, x), n)
	if lbl := u.unit(q); lbl != "" {
		s += " " + lbl
	}
	return s
}

// entryText formats a value for an entry field to six significant
// digits: what people type, without the noise a unit conversion leaves.
// The engine keeps the exact value until the field is edited.
func entryText(x float64) string {
	if x == 0 {
		return "0"
	}
	r, err := strconv.ParseFloat(strconv.FormatFloat(x, 'g', 6, 64), 64)
	if err != nil {
		return strconv.FormatFloat(x, 'g', -1, 64)
	}
	return strconv.FormatFloat(r, 'g', -1, 64)
}

// sigFigures formats x to n significant digits by the display rule.
func sigFigures(x float64, n int) string { return display.Number(x, n) }

// parseNumber reads a number typed by a person: surrounding blanks are
// ignored and a single decimal comma is accepted in place of a point.
func parseNumber(s string) (float64, bool) {
	s = strings.TrimSpace(s)
	if s == "" {
		return 0, false
	}
	if strings.Count(s, ",") == 1 && !strings.Contains(s, ".") {
		s = strings.Replace(s, ",", ".", 1)
	}
	x, err := strconv.ParseFloat(s, 64)
	if err != nil || math.IsNaN(x) || math.IsInf(x, 0) {
		return 0, false
	}
	return x, true
}

// superscript writes an integer exponent in superscript digits (the
// window's chart axis labels; the results use display.Number).
func superscript(n int) string {
	sup := []rune("⁰¹²³⁴⁵⁶⁷⁸⁹")
	var b strings.Builder
	if n < 0 {
		b.WriteRune('⁻')
		n = -n
	}
	for _, c := range strconv.Itoa(n) {
		b.WriteRune(sup[c-'0'])
	}
	return b.String()
}
