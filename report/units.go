package report

import (
	"ullage/fluids/units"
	"ullage/report/display"
)

// Conversion factors for US customary display, derived from the exact
// definitions in package units.
const (
	standardG   = 9.80665                           // standard gravity, m/s² (CGPM 1901, exact)
	poundForceN = units.PoundKg * standardG         // pound-force (exact)
	footPoundJ  = units.FootM * poundForceN         // foot pound-force (exact)
	poundPerFt3 = units.PoundKg / units.CubicFootM3 // lb/ft³ in kg/m³
)

// unitSystem turns SI values into the strings a reader sees, in SI or US
// customary units. Temperatures convert through functions (affine).
type unitSystem struct{ us bool }

func newUnitSystem(name string) unitSystem { return unitSystem{us: name == UnitsUS} }

// system returns the display package's name for the unit system.
func (u unitSystem) system() display.System {
	if u.us {
		return display.US
	}
	return display.SI
}

// quantity is one displayed kind of value: its unit and converter.
type quantity struct {
	unit string
	conv func(float64) float64
}

func scale(f float64) func(float64) float64 { return func(x float64) float64 { return x / f } }

func (u unitSystem) pick(si, us quantity) quantity {
	if u.us {
		return us
	}
	return si
}

// Quantities, SI and US.
func (u unitSystem) temperatureQ() quantity {
	return u.pick(quantity{"°C", units.KelvinToCelsius}, quantity{"°F", units.KelvinToFahrenheit})
}

// temperatureDifferenceQ converts a difference of temperatures (K).
func (u unitSystem) temperatureDifferenceQ() quantity {
	return u.pick(quantity{"K", scale(1)}, quantity{"°F", scale(5.0 / 9.0)})
}
func (u unitSystem) pressureQ() quantity {
	return u.pick(quantity{"kPa", scale(1e3)}, quantity{"psi", scale(units.PsiPa)})
}
func (u unitSystem) stressQ() quantity {
	return u.pick(quantity{"MPa", scale(1e6)}, quantity{"psi", scale(units.PsiPa)})
}
func (u unitSystem) lengthQ() quantity {
	return u.pick(quantity{"mm", scale(1e-3)}, quantity{"in", scale(units.InchM)})
}
func (u unitSystem) roomLengthQ() quantity {
	return u.pick(quantity{"m", scale(1)}, quantity{"ft", scale(units.FootM)})
}
func (u unitSystem) massQ() quantity {
	return u.pick(quantity{"g", scale(1e-3)}, quantity{"oz", scale(units.OunceKg)})
}
func (u unitSystem) vesselVolumeQ() quantity {
	return u.pick(quantity{"mL", scale(1e-6)}, quantity{"in³", scale(units.CubicInchM3)})
}
func (u unitSystem) roomVolumeQ() quantity {
	return u.pick(quantity{"m³", scale(1)}, quantity{"ft³", scale(units.CubicFootM3)})
}
func (u unitSystem) areaQ() quantity {
	return u.pick(quantity{"cm²", scale(1e-4)}, quantity{"in²", scale(units.InchM * units.InchM)})
}
func (u unitSystem) surfaceQ() quantity {
	return u.pick(quantity{"m²", scale(1)}, quantity{"ft²", scale(units.FootM * units.FootM)})
}
func (u unitSystem) densityQ() quantity {
	return u.pick(quantity{"kg/m³", scale(1)}, quantity{"lb/ft³", scale(poundPerFt3)})
}
func (u unitSystem) speedQ() quantity {
	return u.pick(quantity{"m/s", scale(1)}, quantity{"ft/min", scale(units.FootPerMinuteMS)})
}
func (u unitSystem) energyQ() quantity {
	return u.pick(quantity{"J", scale(1)}, quantity{"ft·lbf", scale(footPoundJ)})
}

// with formats v in q to n significant figures with the unit.
func with(q quantity, v float64, n int) string {
	s := sig(q.conv(v), n)
	if s == noValue {
		return s
	}
	return s + " " + q.unit
}

func (u unitSystem) temperature(k float64) string {
	q := u.temperatureQ()
	return fixed(q.conv(k), 1) + " " + q.unit
}
func (u unitSystem) temperatureDifference(k float64) string {
	q := u.temperatureDifferenceQ()
	return fixed(q.conv(k), 1) + " " + q.unit
}
func (u unitSystem) pressure(pa float64) string { return with(u.pressureQ(), pa, 4) }
func (u unitSystem) stress(pa float64) string   { return with(u.stressQ(), pa, 3) }
func (u unitSystem) length(m float64) string    { return with(u.lengthQ(), m, 3) }
func (u unitSystem) roomLength(m float64) string {
	return with(u.roomLengthQ(), m, 3)
}
func (u unitSystem) mass(kg float64) string         { return with(u.massQ(), kg, 3) }
func (u unitSystem) vesselVolume(m3 float64) string { return with(u.vesselVolumeQ(), m3, 3) }
func (u unitSystem) roomVolume(m3 float64) string   { return with(u.roomVolumeQ(), m3, 3) }
func (u unitSystem) area(m2 float64) string         { return with(u.areaQ(), m2, 3) }
func (u unitSystem) surface(m2 float64) string      { return with(u.surfaceQ(), m2, 3) }
func (u unitSystem) density(kgm3 float64) string    { return with(u.densityQ(), kgm3, 4) }
func (u unitSystem) speed(ms float64) string        { return with(u.speedQ(), ms, 3) }
func (u unitSystem) energy(j float64) string        { return with(u.energyQ(), j, 3) }
func (u unitSystem) plusMinus(s string) string      { return "± " + s }
func (u unitSystem) name() string {
	if u.us {
		return "US customary (°F, psi, in, oz, ft³)"
	}
	return "SI (°C, kPa, mm, g, m³)"
}
