package fluids

import (
	"math"
	"testing"

	"ullage/fluids/units"
)

// Liquid water at one atmosphere, CRC Handbook of Chemistry and Physics,
// "Properties of Water in the Range 0–100 °C" (densities in g/cm³ to five
// decimals, from the measurements of Kell; from memory). The tolerance,
// 0.02 kg/m³, is twice the table's last digit; IAPWS-95 reproduces these
// measurements to about 1e-6 (Wagner and Pruß 2002).
func TestWaterDensityAtOneAtmosphere(t *testing.T) {
	s := waterForTest(t)
	for _, c := range []struct{ celsius, kgm3 float64 }{
		{0.1, 999.85}, {4, 999.97}, {10, 999.70}, {20, 998.21}, {25, 997.05}, {40, 992.22}, {60, 983.20}, {80, 971.80},
	} {
		rho, _, err := s.Density(units.CelsiusToKelvin(c.celsius), 101325)
		if err != nil {
			t.Fatalf("%g °C: %v", c.celsius, err)
		}
		if math.Abs(rho-c.kgm3) > 0.02 {
			t.Errorf("%g °C: %.3f kg/m³, CRC %.2f", c.celsius, rho, c.kgm3)
		}
	}
}

// The saturated liquid is densest near 4 °C (CRC, same table: maximum
// 0.99997 g/cm³ at 3.98 °C); 0.2 K allows for the pressure difference
// between saturation and one atmosphere, which moves the maximum by
// under 0.05 K.
func TestWaterDensityMaximum(t *testing.T) {
	s := waterForTest(t)
	if c := units.KelvinToCelsius(s.tPeak); math.Abs(c-3.98) > 0.2 {
		t.Errorf("densest saturated liquid at %.3f °C, want 3.98 °C", c)
	}
	a, _ := s.SaturatedLiquidDensity(units.CelsiusToKelvin(0.01))
	b, _ := s.SaturatedLiquidDensity(s.tPeak)
	c, _ := s.SaturatedLiquidDensity(units.CelsiusToKelvin(8))
	if !(b > a && b > c) {
		t.Errorf("no maximum: %.4f at 0 °C, %.4f at the peak, %.4f at 8 °C", a, b, c)
	}
	// A fill denser than the maximum is liquid-full at every temperature.
	if tf, ok := s.LiquidFullTemperature(1000); !ok || tf != s.MinTemperature() {
		t.Errorf("1000 kg/m³: liquid-full at %.2f K (%v), want the freezing point", tf, ok)
	}
	// A fill between the liquid at 0 °C and the maximum goes liquid-full
	// on the warm side of the maximum.
	if tf, ok := s.LiquidFullTemperature(999.9); !ok || tf < s.tPeak || tf > units.CelsiusToKelvin(8) {
		t.Errorf("999.9 kg/m³: liquid-full at %.2f K (%v), want between the maximum and 8 °C", tf, ok)
	}
}

// Past liquid-full the pressure of water rises by α/κ per kelvin: at
// 25 °C the CRC Handbook gives α = 2.57e-4 /K ("Properties of Water in the
// Range 0–100 °C", cubic expansion coefficient) and κ = 4.525e-10 /Pa
// (same table, isothermal compressibility 45.25e-6 /bar), so 0.568 MPa/K
// (both from memory). 2 % is the accuracy asked of the slope and covers
// the table's rounding of α (0.2 %).
func TestWaterIsochoricSlope(t *testing.T) {
	s := waterForTest(t)
	temp := units.CelsiusToKelvin(25)
	sat, _ := s.Saturation(temp)
	slope, err := s.IsochoricSlope(temp, sat.LiquidDensity*(1+1e-6))
	if err != nil {
		t.Fatal(err)
	}
	if want := 2.57e-4 / 4.525e-10; math.Abs(slope/want-1) > 0.02 {
		t.Errorf("(∂P/∂T)ρ at 25 °C = %.4g MPa/K, CRC α/κ = %.4g MPa/K", slope/1e6, want/1e6)
	}
}

func waterForTest(t *testing.T) *Substance {
	t.Helper()
	s, err := builtinForTest(t).Lookup("water")
	if err != nil {
		t.Fatal(err)
	}
	if s.ref == nil {
		t.Fatal("water is not on the equation-of-state route")
	}
	return s
}
