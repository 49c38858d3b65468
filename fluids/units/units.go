// Package units converts between the SI units used inside Ullage and the
// units people read and type (°C, °F, kPa, bar, psi, g, mL, in, ft³).
//
// Temperature is affine, so it converts through functions rather than
// factors.
package units

// Physical constants and conversion factors. Exact values by definition
// unless stated.
const (
	// ZeroCelsiusK is 0 °C in kelvin (SI Brochure, 9th ed., 2019).
	ZeroCelsiusK = 273.15
	// StandardAtmospherePa is one standard atmosphere in pascal (SI Brochure, 9th ed., 2019).
	StandardAtmospherePa = 101325.0
	// GasConstant is the molar gas constant R in J/(mol·K) (CODATA 2018, exact).
	GasConstant = 8.314462618
	// PsiPa is one pound-force per square inch in pascal (NIST SP 811, Appendix B.8).
	PsiPa = 6894.757293168
	// InchM is one inch in metres (international inch, exact).
	InchM = 0.0254
	// PoundKg is one avoirdupois pound in kilograms (exact).
	PoundKg = 0.45359237
	// CubicFootM3 is one cubic foot in cubic metres (exact).
	CubicFootM3 = 0.028316846592
	// OunceKg is one avoirdupois ounce in kilograms, a sixteenth of a
	// pound (exact).
	OunceKg = PoundKg / 16
	// FootM is one international foot in metres, twelve inches (exact).
	FootM = 12 * InchM
	// CubicInchM3 is one cubic inch in cubic metres (exact).
	CubicInchM3 = InchM * InchM * InchM
	// FootPerMinuteMS is one foot per minute in metres per second (exact).
	FootPerMinuteMS = FootM / 60
	// MolarVolume25CL is the molar volume of an ideal gas at 25 °C and
	// 1 atm in litres per mole, the figure used to convert ppm to mg/m³ in
	// the NIOSH Pocket Guide (DHHS (NIOSH) Publication 2005-149,
	// introduction: mg/m³ = ppm × MW / 24.45).
	MolarVolume25CL = 24.45
)

// CelsiusToKelvin converts a Celsius temperature to kelvin.
func CelsiusToKelvin(c float64) float64 { return c + ZeroCelsiusK }

// KelvinToCelsius converts a temperature in kelvin to degrees Celsius.
func KelvinToCelsius(k float64) float64 { return k - ZeroCelsiusK }

// FahrenheitToKelvin converts a Fahrenheit temperature to kelvin.
func FahrenheitToKelvin(f float64) float64 { return (f-32)*5/9 + ZeroCelsiusK }

// KelvinToFahrenheit converts a temperature in kelvin to degrees Fahrenheit.
func KelvinToFahrenheit(k float64) float64 { return (k-ZeroCelsiusK)*9/5 + 32 }

// PpmToMgPerM3 converts a volume fraction in ppm to a mass concentration in
// mg/m³ at 25 °C and 1 atm for a substance of molar mass kg/mol.
func PpmToMgPerM3(ppm, molarMassKgMol float64) float64 {
	return ppm * molarMassKgMol * 1000 / MolarVolume25CL
}

// MgPerM3ToPpm converts a mass concentration in mg/m³ to ppm by volume at
// 25 °C and 1 atm for a substance of molar mass kg/mol.
func MgPerM3ToPpm(mgm3, molarMassKgMol float64) float64 {
	return mgm3 * MolarVolume25CL / (molarMassKgMol * 1000)
}
