package report

import "ullage/report/display"

// Names of design fields shown to people; they live in the display
// package, the one place the window, the records and the command line
// take them from.
const (
	// LabelResidualGas names residual_gas_pressure_pa (display.LabelResidualGas).
	LabelResidualGas = display.LabelResidualGas
	// LabelAmbientPressure names ambient_pressure_pa (display.LabelAmbientPressure).
	LabelAmbientPressure = display.LabelAmbientPressure
	// LabelExposureTime names room.exposure_minutes (display.LabelExposureTime).
	LabelExposureTime = display.LabelExposureTime
)
