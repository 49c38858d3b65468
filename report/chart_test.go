package report

import (
	"slices"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

func TestNiceStep(t *testing.T) {
	cases := []struct{ raw, want float64 }{
		{16.25, 20}, {0.3, 0.5}, {1, 1}, {7, 10}, {120, 200},
	}
	for _, c := range cases {
		// Exact decimal steps; the tolerance only absorbs binary rounding.
		if got := niceStep(c.raw); !scalar.EqualWithinAbsOrRel(got, c.want, 1e-12, 1e-12) {
			t.Errorf("niceStep(%g) = %g, want %g", c.raw, got, c.want)
		}
	}
}

func majorLabels(ts []tick) []string {
	var out []string
	for _, t := range ts {
		if t.label != "" {
			out = append(out, t.label)
		}
	}
	return out
}

func TestTicks(t *testing.T) {
	cases := []struct {
		name string
		a    axis
		want []string
	}{
		{"linear temperatures", axis{min: -29, max: 101}, []string{"−20", "0", "20", "40", "60", "80", "100"}},
		{"linear fractions", axis{min: 0, max: 1}, []string{"0.0", "0.2", "0.4", "0.6", "0.8", "1.0"}},
		{"log decades", axis{min: 1, max: 1e5, log: true}, []string{"1", "10", "100", "1000", "10000", "10⁵"}},
		{"short log axis adds 2 and 5", axis{min: 100, max: 1000, log: true}, []string{"100", "200", "500", "1000"}},
		{"small decades", axis{min: 1e-4, max: 1e-2, log: true}, []string{"10⁻⁴", "2×10⁻⁴", "5×10⁻⁴", "0.001", "0.002", "0.005", "0.01"}},
		{"empty axis", axis{min: 1, max: 1}, nil},
	}
	for _, c := range cases {
		if got := majorLabels(ticks(c.a)); !slices.Equal(got, c.want) {
			t.Errorf("%s: labels %q, want %q", c.name, got, c.want)
		}
	}
}

func TestLogRange(t *testing.T) {
	cases := []struct{ lo, hi, wantLo, wantHi float64 }{
		{3.7, 700, 1, 1000},
		{150, 900, 100, 1000},
		{0, 50, 0.01, 100}, // no positive minimum: from three decades below the top
	}
	for _, c := range cases {
		lo, hi := logRange(c.lo, c.hi)
		if !scalar.EqualWithinAbsOrRel(lo, c.wantLo, 0, 1e-9) || !scalar.EqualWithinAbsOrRel(hi, c.wantHi, 0, 1e-9) {
			t.Errorf("logRange(%g, %g) = %g, %g; want %g, %g", c.lo, c.hi, lo, hi, c.wantLo, c.wantHi)
		}
	}
}

// The pressure axis turns logarithmic only when a liquid-full rise would
// flatten the rest of the curve.
func TestPressureScale(t *testing.T) {
	rising := []xy{{0, 10}, {10, 30}, {20, 100}}
	steep := append(slices.Clone(rising), xy{25, 5000})
	cases := []struct {
		name       string
		pts        []xy
		knee, allo float64
		log        bool
	}{
		{"two-phase only", rising, 0, 200, false},
		{"liquid-full rise", steep, 100, 200, true},
		{"rise below the allowable", []xy{{0, 10}, {20, 100}, {25, 300}}, 100, 200, false},
	}
	for _, c := range cases {
		if log, _, _ := pressureScale(c.pts, c.knee, c.allo); log != c.log {
			t.Errorf("%s: log axis %v, want %v", c.name, log, c.log)
		}
	}
}
