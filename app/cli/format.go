package cli

import (
	"fmt"

	"ullage/fluids/units"
)

// Text formatting for people, in SI or US customary units.

func tempText(k float64, system string) string {
	if system == "us" {
		return fmt.Sprintf("%.1f °F", units.KelvinToFahrenheit(k))
	}
	return fmt.Sprintf("%.1f °C", units.KelvinToCelsius(k))
}

func pressureText(pa float64, system string) string {
	if system == "us" {
		return fmt.Sprintf("%.4g psi", pa/units.PsiPa)
	}
	return fmt.Sprintf("%.4g kPa", pa/1000)
}

func massText(kg float64, system string) string {
	if system == "us" {
		return fmt.Sprintf("%.4g oz", kg/units.OunceKg)
	}
	return fmt.Sprintf("%.4g g", kg*1000)
}

func volumeText(m3 float64, system string) string {
	if system == "us" {
		return fmt.Sprintf("%.4g in³", m3/units.CubicInchM3)
	}
	return fmt.Sprintf("%.4g mL", m3*1e6)
}
