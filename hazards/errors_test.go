package hazards

import (
	"errors"
	"testing"
)

// An input error carries its rule as data: the bound in SI units, what
// the bound is, and the words after it.
func TestInputErrorCarriesItsRule(t *testing.T) {
	for _, tc := range []struct {
		name   string
		change func(*Design)
		field  string
		rule   Rule
		min    float64
		max    float64
		unit   string
	}{
		{"hottest far too hot", func(d *Design) { d.HottestK = 5000 }, "hottest_k", RuleRange, 20, 800, "K"},
		{"coldest above hottest", func(d *Design) { d.ColdestK = d.HottestK + 1 }, "coldest_k", RuleAtMost, 0, 349.15, "K"},
		{"no fill", func(d *Design) { d.FillMassKg = 0 }, "fill_mass_kg", RuleRange, 1e-6, 10, "kg"},
	} {
		d := typicalDesign()
		tc.change(&d)
		err := d.Validate()
		var ie *InputError
		if !errors.As(err, &ie) {
			t.Fatalf("%s: %v, want an InputError", tc.name, err)
		}
		if ie.Field != tc.field || ie.Rule != tc.rule || ie.Unit != tc.unit || ie.Min != tc.min || (tc.max != 0 && ie.Max != tc.max) {
			t.Errorf("%s: %+v, want field %s rule %s %g–%g %s", tc.name, *ie, tc.field, tc.rule, tc.min, tc.max, tc.unit)
		}
	}
}
