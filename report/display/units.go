package display

import "ullage/fluids/units"

// footPoundJ is the foot pound-force in joules: 0.3048 m × 0.45359237 kg
// × 9.80665 m/s² (all three exact by definition, NIST SP 811 appendix B).
const footPoundJ = units.FootM * units.PoundKg * 9.80665

// psiPa is the pound-force per square inch in pascals (NIST SP 811
// appendix B, from exact definitions).
const psiPa = units.PsiPa

// System is a set of units results are shown in.
type System string

// The two unit systems.
const (
	SI System = "si"
	US System = "us"
)

// ParseSystem returns the system named s ("us" for US customary), SI for
// anything else.
func ParseSystem(s string) System {
	if s == string(US) {
		return US
	}
	return SI
}

// Quantity is a kind of value shown to people: it decides the unit label
// and the conversion from the engine's SI value.
type Quantity int

// Quantities shown to people, with their SI and US units.
const (
	Plain          Quantity = iota // dimensionless (safety factor)
	Temperature                    // K → °C / °F
	TempDifference                 // K → K / °F
	Pressure                       // Pa → kPa / psi
	Stress                         // Pa → MPa / psi
	Mass                           // kg → g / oz
	VesselVolume                   // m³ → mL / in³
	Length                         // m → mm / in
	RoomVolume                     // m³ → m³ / ft³
	RoomLength                     // m → m / ft
	Speed                          // m/s → m/s / ft/min
	Percent                        // %
	Concentration                  // ppm
	PercentLFL                     // % of the lower flammable limit
	Energy                         // J → J / ft·lbf
	Area                           // m² → cm² / in² (a glass surface)
	Surface                        // m² → m² / ft² (a room surface)
	Density                        // kg/m³ → kg/m³ / lb/ft³
	Minutes                        // min
	Hours                          // h
	Years                          // years
	AirChanges                     // air changes per hour: per h
	Retardation                    // m → nm (optical retardation)
	Probability                    // a probability, no unit
)

// Unit returns the unit label of q in the system, "" for plain numbers.
func (s System) Unit(q Quantity) string {
	si, us := labels(q)
	if s == US {
		return us
	}
	return si
}

func labels(q Quantity) (si, us string) {
	switch q {
	case Temperature:
		return "°C", "°F"
	case TempDifference:
		return "K", "°F"
	case Pressure:
		return "kPa", "psi"
	case Stress:
		return "MPa", "psi"
	case Mass:
		return "g", "oz"
	case VesselVolume:
		return "mL", "in³"
	case Length:
		return "mm", "in"
	case RoomVolume:
		return "m³", "ft³"
	case RoomLength:
		return "m", "ft"
	case Speed:
		return "m/s", "ft/min"
	case Percent:
		return "%", "%"
	case Concentration:
		return "ppm", "ppm"
	case PercentLFL:
		return "% LFL", "% LFL"
	case Energy:
		return "J", "ft·lbf"
	case Area:
		return "cm²", "in²"
	case Surface:
		return "m²", "ft²"
	case Density:
		return "kg/m³", "lb/ft³"
	case Minutes:
		return "min", "min"
	case Hours:
		return "h", "h"
	case Years:
		return "years", "years"
	case AirChanges:
		return "per h", "per h"
	case Retardation:
		return "nm", "nm"
	}
	return "", ""
}

// FromSI converts an engine value in SI to the system's unit of q.
func (s System) FromSI(q Quantity, x float64) float64 {
	us := s == US
	switch q {
	case Temperature:
		if us {
			return units.KelvinToFahrenheit(x)
		}
		return units.KelvinToCelsius(x)
	case TempDifference:
		if us {
			return x * 9 / 5
		}
	case Pressure:
		if us {
			return x / units.PsiPa
		}
		return x / 1e3
	case Stress:
		if us {
			return x / units.PsiPa
		}
		return x / 1e6
	case Mass:
		if us {
			return x / units.OunceKg
		}
		return x * 1e3
	case VesselVolume:
		if us {
			return x / units.CubicInchM3
		}
		return x * 1e6
	case Length:
		if us {
			return x / units.InchM
		}
		return x * 1e3
	case RoomVolume:
		if us {
			return x / units.CubicFootM3
		}
	case RoomLength:
		if us {
			return x / units.FootM
		}
	case Speed:
		if us {
			return x / units.FootPerMinuteMS
		}
	case Energy:
		if us {
			return x / footPoundJ
		}
	case Area:
		if us {
			return x / (units.InchM * units.InchM)
		}
		return x / 1e-4
	case Surface:
		if us {
			return x / (units.FootM * units.FootM)
		}
	case Density:
		if us {
			return x / (units.PoundKg / units.CubicFootM3)
		}
	case Retardation:
		return x * 1e9
	}
	return x
}

// ToSI converts a value of q typed in the system's unit to the engine's
// SI value: the inverse of FromSI. A metric unit smaller than the SI one
// (g, mL, mm, cm², nm) divides by its power of ten, so that a value typed
// as 1.4 mm is the SI value 0.0014 its digits name; a US customary value
// is multiplied by its factor from fluids/units.
func (s System) ToSI(q Quantity, x float64) float64 {
	us := s == US
	switch q {
	case Temperature:
		if us {
			return units.FahrenheitToKelvin(x)
		}
		return units.CelsiusToKelvin(x)
	case TempDifference:
		if us {
			return x * 5 / 9
		}
	case Pressure:
		if us {
			return x * units.PsiPa
		}
		return x * 1e3
	case Stress:
		if us {
			return x * units.PsiPa
		}
		return x * 1e6
	case Mass:
		if us {
			return x * units.OunceKg
		}
		return x / 1e3
	case VesselVolume:
		if us {
			return x * units.CubicInchM3
		}
		return x / 1e6
	case Length:
		if us {
			return x * units.InchM
		}
		return x / 1e3
	case RoomVolume:
		if us {
			return x * units.CubicFootM3
		}
	case RoomLength:
		if us {
			return x * units.FootM
		}
	case Speed:
		if us {
			return x * units.FootPerMinuteMS
		}
	case Energy:
		if us {
			return x * footPoundJ
		}
	case Area:
		if us {
			return x * (units.InchM * units.InchM)
		}
		return x / 1e4
	case Surface:
		if us {
			return x * (units.FootM * units.FootM)
		}
	case Density:
		if us {
			return x * (units.PoundKg / units.CubicFootM3)
		}
	case Retardation:
		return x / 1e9
	}
	return x
}

// Format writes an SI value of q in the system's unit with its label:
// temperatures and temperature differences to a tenth of a degree, every
// other quantity to ValueFigures significant figures.
func (s System) Format(q Quantity, x float64) string {
	v := s.FromSI(q, x)
	var t string
	if q == Temperature || q == TempDifference {
		t = Fixed(v, 1)
	} else {
		t = Number(v, ValueFigures)
	}
	if lbl := s.Unit(q); lbl != "" && t != NoValue {
		t += " " + lbl
	}
	return t
}
