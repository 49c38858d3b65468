package display

import (
	"testing"

	"ullage/hazards"
)

func TestInputRule(t *testing.T) {
	for _, tc := range []struct {
		e    hazards.InputError
		want string
	}{
		{hazards.InputError{Rule: hazards.RuleRange, Min: 20, Max: 800, Unit: "K"}, "must be from 20 K to 800 K"},
		{hazards.InputError{Rule: hazards.RuleRange, Min: 0, Max: 0.1, Unit: "m³", Note: "(0 means compute from the parts)"}, "must be from 0 m³ to 0.1 m³ (0 means compute from the parts)"},
		{hazards.InputError{Rule: hazards.RuleAtLeast, Min: 159.05, Unit: "K", Subject: "the freezing point of Ethanol"}, "must be at or above the freezing point of Ethanol, 159.05 K"},
		{hazards.InputError{Want: "name a fluid from the library"}, "name a fluid from the library"},
	} {
		if got := InputRule(&tc.e, SIBound(tc.e.Unit)); got != tc.want {
			t.Errorf("%+v: %q, want %q", tc.e, got, tc.want)
		}
	}
}
