package display

import (
	"testing"

	"ullage/hazards/compare"
)

// Expected strings follow the display rules by hand; 101325 Pa is
// 14.696 psi (NIST SP 811 appendix B, exact definitions).
func TestResultWords(t *testing.T) {
	p := compare.ResultChange{Quantity: compare.Pressure, Unit: "Pa", Old: compare.Reading{Value: 101325}, New: compare.Reading{Value: 201325}}
	sf := compare.ResultChange{Quantity: compare.Factor, Old: compare.Reading{Value: 16.3}, New: compare.Reading{Value: 1000, Bound: "at-least"}}
	lf := compare.ResultChange{Quantity: compare.Temperature, Unit: "K", Old: compare.Reading{Value: 349.15}, New: compare.Reading{State: compare.NotReached}}
	shock := compare.ResultChange{Quantity: compare.Factor, New: compare.Reading{Value: 1.78, Part: "lower bulb", ShockDeltaK: 56, ShockDirection: "hot-to-cold"}}
	for _, tc := range []struct {
		got, want string
	}{
		{ResultValue(p, p.Old, US), "14.7 psi"},
		{ResultDelta(p, SI), "+100 kPa"},
		{ResultValue(sf, sf.New, SI), "at least 1000"},
		{ResultDelta(sf, SI), NoValue},
		{ResultValue(lf, lf.New, SI), "not reached"},
		{ResultValue(lf, lf.Old, US), "168.8 °F"},
		{ResultValue(shock, shock.New, SI), "1.78 (lower bulb, 56.0 K hot-to-cold)"},
	} {
		if tc.got != tc.want {
			t.Errorf("%q, want %q", tc.got, tc.want)
		}
	}
}
