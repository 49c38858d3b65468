package units

import (
	"math"
	"testing"
)

func TestTemperatureRoundTrip(t *testing.T) {
	tests := []struct {
		name string
		c, f float64
	}{
		{"water freezes (definition)", 0, 32},
		{"water boils at 1 atm (ITS-90, common practice)", 100, 212},
		{"minus forty coincides (definition)", -40, -40},
	}
	for _, tt := range tests {
		k := CelsiusToKelvin(tt.c)
		if got := KelvinToFahrenheit(k); math.Abs(got-tt.f) > 1e-9 {
			t.Errorf("%s: %g °C -> %g °F, want %g", tt.name, tt.c, got, tt.f)
		}
		if got := KelvinToCelsius(FahrenheitToKelvin(tt.f)); math.Abs(got-tt.c) > 1e-9 {
			t.Errorf("%s: %g °F -> %g °C, want %g", tt.name, tt.f, got, tt.c)
		}
	}
}

func TestPpmConversion(t *testing.T) {
	// NIOSH Pocket Guide, acetone: REL TWA 250 ppm (590 mg/m³), MW 58.1.
	got := PpmToMgPerM3(250, 0.05808)
	if math.Abs(got-590)/590 > 0.01 {
		t.Errorf("acetone 250 ppm = %g mg/m³, want 590 (NIOSH Pocket Guide)", got)
	}
	if back := MgPerM3ToPpm(got, 0.05808); math.Abs(back-250) > 1e-9 {
		t.Errorf("round trip gave %g ppm, want 250", back)
	}
}
