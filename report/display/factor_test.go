package display

import (
	"math"
	"testing"

	"ullage/hazards"
)

// The expected strings follow SafetyFactor's doc comment: three figures,
// and the cap worded as a lower bound as findings word it.
func TestSafetyFactor(t *testing.T) {
	for _, tc := range []struct {
		x    float64
		want string
	}{
		{4.26, "4.26"},
		{0.5, "0.5"},
		{999.4, "999"},
		{hazards.SafetyFactorCap, "at least 1000"},
		{2 * hazards.SafetyFactorCap, "at least 1000"},
		{math.NaN(), NoValue},
	} {
		if got := SafetyFactor(tc.x); got != tc.want {
			t.Errorf("SafetyFactor(%g) = %q, want %q", tc.x, got, tc.want)
		}
	}
}
