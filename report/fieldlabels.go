package report

// Names of design fields shown to people, in one place so that the
// window, the record and the command line call each field the same.
const (
	// LabelResidualGas names residual_gas_pressure_pa, the pressure of
	// the air left in the vessel when it is sealed (Pa).
	LabelResidualGas = "Residual air when sealed"
	// LabelAmbientPressure names ambient_pressure_pa, the pressure
	// outside the vessel (Pa).
	LabelAmbientPressure = "Ambient pressure"
	// LabelExposureTime names room.exposure_minutes, how long a person
	// stays in the room after a breakage (min).
	LabelExposureTime = "Time in the room"
)
