package report

import "testing"

func TestNumberFormats(t *testing.T) {
	cases := []struct {
		name string
		got  string
		want string
	}{
		{"percent", percent(0.0704, 3), "7.04 %"},
		{"percent trims zeros by the display rule", percent(0.25, 3), "25 %"},
		{"blank", orBlank("  "), "______________"},
	}
	for _, c := range cases {
		if c.got != c.want {
			t.Errorf("%s: got %q, want %q", c.name, c.got, c.want)
		}
	}
}

// Conversions checked against the definitions and tables of NIST Special
// Publication 811 (2008), Appendix B; the temperature scale relation
// t/°F = 1.8 t/°C + 32 is from the same publication, B.9.
func TestUnitConversions(t *testing.T) {
	si, us := newUnitSystem(UnitsSI), newUnitSystem(UnitsUS)
	cases := []struct {
		name string
		got  string
		want string
	}{
		{"76 °C", si.temperature(349.15), "76.0 °C"},
		{"76 °C in °F", us.temperature(349.15), "168.8 °F"},
		{"−40 °C is −40 °F", us.temperature(233.15), "−40.0 °F"},
		{"a difference of 10 K in °F", us.temperatureDifference(10), "18.0 °F"},
		{"1 atm in kPa", si.pressure(101325), "101 kPa"},
		{"1 atm in psi (14.696 psi)", us.pressure(101325), "14.7 psi"},
		{"1 oz = 28.349523125 g (exact)", us.mass(0.028349523125), "1 oz"},
		{"1 oz in grams", si.mass(0.028349523125), "28.3 g"},
		{"1 m³ = 35.3147 ft³", us.roomVolume(1), "35.3 ft³"},
		{"1 in = 25.4 mm (exact)", us.length(0.0254), "1 in"},
		{"1 in in mm", si.length(0.0254), "25.4 mm"},
		{"1 in³ = 16.387064 mL (exact)", us.vesselVolume(16.387064e-6), "1 in³"},
		{"1 ft·lbf = 1.355818 J", us.energy(1.355818), "1 ft·lbf"},
		{"1 ft/min = 0.00508 m/s (exact)", us.speed(0.00508), "1 ft/min"},
		{"1 lb/ft³ = 16.01846 kg/m³", us.density(16.01846), "1 lb/ft³"},
		{"1 MPa = 145.038 psi", us.stress(1e6), "145 psi"},
	}
	for _, c := range cases {
		if c.got != c.want {
			t.Errorf("%s: got %q, want %q", c.name, c.got, c.want)
		}
	}
}

func TestOptionsDefaults(t *testing.T) {
	o, err := Options{}.normalise()
	if err != nil || o.Units != UnitsSI || o.Paper != PaperA4 {
		t.Errorf("defaults: %+v, %v; want SI on A4", o, err)
	}
}
