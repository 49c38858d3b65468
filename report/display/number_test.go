package display

import "testing"

// The expected strings are written by hand from the rule in Number's doc
// comment (three figures, plain from 0.001 to below a million).
func TestNumber(t *testing.T) {
	for _, tc := range []struct {
		x    float64
		n    int
		want string
	}{
		{0, 3, "0"},
		{1189.4, 3, "1190"},
		{999.96, 3, "1000"},
		{23.14, 3, "23.1"},
		{4, 3, "4"},
		{0.5, 3, "0.5"},
		{-2.5, 3, "−2.5"},
		{0.001234, 3, "0.00123"},
		{0.0009994, 3, "9.99 × 10⁻⁴"},
		{1e-6, 3, "1 × 10⁻⁶"},
		{1.234e-9, 2, "1.2 × 10⁻⁹"},
		{2.5e6, 3, "2.5 × 10⁶"},
		{999999, 3, "1 × 10⁶"},
		{12345, 3, "12300"},
		{-0.0000001, 1, "−1 × 10⁻⁷"},
	} {
		if got := Number(tc.x, tc.n); got != tc.want {
			t.Errorf("Number(%g, %d) = %q, want %q", tc.x, tc.n, got, tc.want)
		}
	}
}

// The expected strings follow Stated's doc comment: the figures the
// number has, at most four, never fewer than its integer digits.
func TestStated(t *testing.T) {
	for _, tc := range []struct {
		x    float64
		want string
	}{
		{1000, "1000"}, {0.45, "0.45"}, {4, "4"}, {1e-4, "1 × 10⁻⁴"}, {2.123456, "2.123"},
		{23581.4, "23581"}, {0, "0"}, {-29, "−29"}, {280000, "280000"},
	} {
		if got := Stated(tc.x); got != tc.want {
			t.Errorf("Stated(%g) = %q, want %q", tc.x, got, tc.want)
		}
	}
}

func TestFixed(t *testing.T) {
	for _, tc := range []struct {
		x    float64
		want string
	}{{-0.04, "0.0"}, {-3.25, "−3.2"}, {21.96, "22.0"}} {
		if got := Fixed(tc.x, 1); got != tc.want {
			t.Errorf("Fixed(%g) = %q, want %q", tc.x, got, tc.want)
		}
	}
}

// Conversions: 101.325 kPa is 14.696 psi and 25 °C is 77 °F (exact
// definitions of the pound and inch, NIST SP 811 appendix B).
func TestFormat(t *testing.T) {
	for _, tc := range []struct {
		s    System
		q    Quantity
		x    float64
		want string
	}{
		{SI, Pressure, 101325, "101 kPa"},
		{US, Pressure, 101325, "14.7 psi"},
		{SI, Temperature, 298.15, "25.0 °C"},
		{US, Temperature, 298.15, "77.0 °F"},
		{US, TempDifference, 10, "18.0 °F"},
		{SI, Mass, 0.0042, "4.2 g"},
		{SI, Plain, 3.5, "3.5"},
	} {
		if got := tc.s.Format(tc.q, tc.x); got != tc.want {
			t.Errorf("%s Format(%d, %g) = %q, want %q", tc.s, tc.q, tc.x, got, tc.want)
		}
	}
}
