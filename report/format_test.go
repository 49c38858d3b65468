package report

import (
	"math"
	"testing"
)

func TestNumberFormats(t *testing.T) {
	cases := []struct {
		name string
		got  string
		want string
	}{
		{"sig plain", sig(312.5123, 4), "312.5"},
		{"sig keeps integer digits", sig(23581.4, 4), "23581"},
		{"sig negative uses the minus sign", sig(-29, 3), "−29.0"},
		{"sig rounding into the next decade", sig(9.9996, 4), "10.00"},
		{"sig zero", sig(0, 3), "0"},
		{"sig small as a power", sig(0.0000055, 2), "5.5×10⁻⁶"},
		{"sig large as a power", sig(1e7, 3), "1.00×10⁷"},
		{"sig many surplus digits as a power", sig(9137377, 3), "9.14×10⁶"},
		{"sig not a number", sig(math.NaN(), 3), "—"},
		{"sig infinity", sig(math.Inf(1), 3), "—"},
		{"fixed never prints minus zero", fixed(-0.04, 1), "0.0"},
		{"fixed negative", fixed(-1.26, 1), "−1.3"},
		{"plain integer", plain(1000), "1000"},
		{"plain fraction", plain(0.45), "0.45"},
		{"plain whole", plain(4), "4"},
		{"plain power", plain(1e-4), "1×10⁻⁴"},
		{"plain keeps four figures at most", plain(2.123456), "2.123"},
		{"percent", percent(0.0704, 3), "7.04 %"},
		{"margin small", margin(0.25, true), "+25 %"},
		{"margin negative", margin(-0.92, true), "−92 %"},
		{"margin large at-least", margin(76.8, true), "78× the limit"},
		{"margin large at-most", margin(-9999, false), "1.0×10⁴× the limit"},
		{"margin not a number", margin(math.NaN(), false), "—"},
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
		{"1 atm in kPa", si.pressure(101325), "101.3 kPa"},
		{"1 atm in psi (14.696 psi)", us.pressure(101325), "14.70 psi"},
		{"1 oz = 28.349523125 g (exact)", us.mass(0.028349523125), "1.00 oz"},
		{"1 oz in grams", si.mass(0.028349523125), "28.3 g"},
		{"1 m³ = 35.3147 ft³", us.roomVolume(1), "35.3 ft³"},
		{"1 in = 25.4 mm (exact)", us.length(0.0254), "1.00 in"},
		{"1 in in mm", si.length(0.0254), "25.4 mm"},
		{"1 in³ = 16.387064 mL (exact)", us.vesselVolume(16.387064e-6), "1.00 in³"},
		{"1 ft·lbf = 1.355818 J", us.energy(1.355818), "1.00 ft·lbf"},
		{"1 ft/min = 0.00508 m/s (exact)", us.speed(0.00508), "1.00 ft/min"},
		{"1 lb/ft³ = 16.01846 kg/m³", us.density(16.01846), "1.000 lb/ft³"},
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
