package hazards

import (
	"errors"
	"strings"
	"testing"

	"ullage/fluids/units"
)

// A fill that cannot be sealed is refused. 10.00 g of water in 10.00 mL
// is a fill density of 1000.0 kg/m³; liquid water at 20 °C has 998.2
// kg/m³ (CRC Handbook of Chemistry and Physics, "Properties of Water in
// the Range 0–100 °C": 0.99821 g/cm³ at 20 °C) and is never denser than
// 999.97 kg/m³ (the maximum near 4 °C, same table), so that much water
// cannot fit as liquid at any temperature, and the design must be an error
// that names the fill, never an assessment.
func TestWaterFillThatCannotBeSealed(t *testing.T) {
	lib := testLibrary(t)
	d := typicalDesign()
	d.Fluid = "water"
	d.FillMassKg = 0.01000
	d.FillMassToleranceKg = 0
	d.Vessel.InternalVolumeM3 = 10.00e-6
	d.Vessel.VolumeToleranceM3 = 0
	d.SealingTemperatureK = units.CelsiusToKelvin(20)
	d.ColdestK = units.CelsiusToKelvin(5)
	_, err := Assess(d, lib)
	if !errors.Is(err, ErrOverfilled) {
		t.Fatalf("got %v, want an error wrapping ErrOverfilled", err)
	}
	if !strings.Contains(err.Error(), "fill_mass_kg") || !strings.Contains(err.Error(), "Water") {
		t.Errorf("error %q should name the field and the fluid", err)
	}
	// Just below what fits at 20 °C (998.2 kg/m³ × 10.00 mL = 9.982 g) the
	// design is accepted.
	d.FillMassKg = 0.00997
	if _, err := Assess(d, lib); err != nil {
		t.Errorf("9.97 g in 10.00 mL at 20 °C: %v", err)
	}
}
