package display

import (
	"math"
	"testing"

	"ullage/fluids/units"
)

// The expected strings are worked by hand from Entry's doc comment; the
// inch is 25.4 mm exactly (NIST SP 811, appendix B).
func TestEntry(t *testing.T) {
	for _, tc := range []struct {
		name string
		x    float64
		s    System
		want string
	}{
		{"zero", 0, SI, "0"},
		{"a conversion's noise goes", 1.5000000000000002, SI, "1.5"},
		{"six figures in SI", 1.58775400001, SI, "1.58775"},
		{"negative, typed back with a hyphen", -12.5, SI, "-12.5"},
		{"small in e-notation", 1.5e-5, SI, "1.5e-05"},
		{"large in e-notation", 2.5e6, SI, "2.5e+06"},
		{"1.6 mm in inches: four figures", 0.0016 / units.InchM, US, "0.06299"},
		{"1/16 in as typed", (0.0625 * units.InchM) / units.InchM, US, "0.0625"},
		{"five figures typed in inches", (0.06251 * units.InchM) / units.InchM, US, "0.06251"},
		{"21 g in ounces", 0.021 / units.OunceKg, US, "0.7408"},
		{"76 °C in °F", units.KelvinToFahrenheit(349.15), US, "168.8"},
		{"not finite", math.Inf(1), US, NoValue},
	} {
		if got := Entry(tc.x, tc.s); got != tc.want {
			t.Errorf("%s: Entry(%v, %s) = %q, want %q", tc.name, tc.x, tc.s, got, tc.want)
		}
	}
}

// TestToSIUndoesFromSI: every quantity comes back from its unit, in both
// systems, to within a few parts in 10¹⁵ (two roundings of a float64) of
// the value, or of the 459.67 offset of a temperature in °F, the largest
// number the conversion passes through.
func TestToSIUndoesFromSI(t *testing.T) {
	for _, s := range []System{SI, US} {
		for q := Plain; q <= Probability; q++ {
			for _, x := range []float64{0.0015, 1, 349.15, 101325} {
				if back := s.ToSI(q, s.FromSI(q, x)); math.Abs(back-x) > 1e-14*math.Max(x, 460) {
					t.Errorf("%s quantity %d: %g → %g → %g", s, q, x, s.FromSI(q, x), back)
				}
			}
		}
	}
	// Digits typed in a metric unit name the SI value (0.0014 m, not
	// 0.0014000000000000002 m).
	if got := SI.ToSI(Length, 1.4); got != 0.0014 {
		t.Errorf("1.4 mm is %v m, want 0.0014", got)
	}
}
