package report

import "ullage/report/display"

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

// q returns a displayed quantity with the display package's unit and
// conversion, the one place the factors live.
func (u unitSystem) q(k display.Quantity) quantity {
	s := u.system()
	return quantity{unit: s.Unit(k), conv: func(x float64) float64 { return s.FromSI(k, x) }}
}

// Quantities, SI and US.
func (u unitSystem) temperatureQ() quantity { return u.q(display.Temperature) }

// temperatureDifferenceQ converts a difference of temperatures (K).
func (u unitSystem) temperatureDifferenceQ() quantity { return u.q(display.TempDifference) }
func (u unitSystem) pressureQ() quantity              { return u.q(display.Pressure) }
func (u unitSystem) stressQ() quantity                { return u.q(display.Stress) }
func (u unitSystem) lengthQ() quantity                { return u.q(display.Length) }
func (u unitSystem) roomLengthQ() quantity            { return u.q(display.RoomLength) }
func (u unitSystem) massQ() quantity                  { return u.q(display.Mass) }
func (u unitSystem) vesselVolumeQ() quantity          { return u.q(display.VesselVolume) }
func (u unitSystem) roomVolumeQ() quantity            { return u.q(display.RoomVolume) }
func (u unitSystem) areaQ() quantity                  { return u.q(display.Area) }
func (u unitSystem) surfaceQ() quantity               { return u.q(display.Surface) }
func (u unitSystem) densityQ() quantity               { return u.q(display.Density) }
func (u unitSystem) speedQ() quantity                 { return u.q(display.Speed) }
func (u unitSystem) energyQ() quantity                { return u.q(display.Energy) }

// Computed values are formatted by the display package's rule for results
// (display.System.Format: three significant figures, temperatures to a
// tenth of a degree); values a person or a data table stated, by its rule
// for stated values (given: display.System.Input).
func (u unitSystem) f(k display.Quantity, x float64) string { return u.system().Format(k, x) }

// given formats a stated value: an input of the design or a value of the
// data, with the figures it was given (at most four).
func (u unitSystem) given(k display.Quantity, x float64) string { return u.system().Input(k, x) }

func (u unitSystem) temperature(k float64) string           { return u.f(display.Temperature, k) }
func (u unitSystem) temperatureDifference(k float64) string { return u.f(display.TempDifference, k) }
func (u unitSystem) pressure(pa float64) string             { return u.f(display.Pressure, pa) }
func (u unitSystem) stress(pa float64) string               { return u.f(display.Stress, pa) }
func (u unitSystem) length(m float64) string                { return u.f(display.Length, m) }
func (u unitSystem) roomLength(m float64) string            { return u.f(display.RoomLength, m) }
func (u unitSystem) mass(kg float64) string                 { return u.f(display.Mass, kg) }
func (u unitSystem) vesselVolume(m3 float64) string         { return u.f(display.VesselVolume, m3) }
func (u unitSystem) roomVolume(m3 float64) string           { return u.f(display.RoomVolume, m3) }
func (u unitSystem) area(m2 float64) string                 { return u.f(display.Area, m2) }
func (u unitSystem) surface(m2 float64) string              { return u.f(display.Surface, m2) }
func (u unitSystem) density(kgm3 float64) string            { return u.f(display.Density, kgm3) }
func (u unitSystem) speed(ms float64) string                { return u.f(display.Speed, ms) }
func (u unitSystem) energy(j float64) string                { return u.f(display.Energy, j) }
func (u unitSystem) plusMinus(s string) string              { return "± " + s }
func (u unitSystem) name() string {
	if u.us {
		return "US customary (°F, psi, in, oz, ft³)"
	}
	return "SI (°C, kPa, mm, g, m³)"
}
