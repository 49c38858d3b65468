package display

import (
	"slices"
	"testing"

	"ullage/hazards"
)

// Each expected margin is worked by hand from the ratio of value to limit.
func TestMargin(t *testing.T) {
	for _, tc := range []struct {
		v, l       float64
		dir, bound hazards.Direction
		want       string
	}{
		{4.72, 4, hazards.AtLeast, "", "met with 18 % to spare"},
		{1000, 4, hazards.AtLeast, hazards.AtLeast, "met at least 250-fold"},
		{3, 4, hazards.AtLeast, "", "missed by 25 %"},
		{0.2, 4, hazards.AtLeast, "", "missed 20-fold"},
		{82, 100, hazards.AtMost, "", "met with 18 % to spare"},
		{123, 100, hazards.AtMost, "", "missed by 23 %"},
		{233700, 100, hazards.AtMost, "", "missed 2300-fold"},
		{1e-12, 1e-6, hazards.AtMost, hazards.AtMost, "met at least 1 × 10⁶-fold"},
		{2e-6, 1e-6, hazards.AtMost, hazards.AtMost, "missed by at most 100 %"},
		{4, 4, hazards.AtLeast, "", "at the limit"},
		{1, 0, hazards.AtMost, "", NoValue},
	} {
		if got := Margin(tc.v, tc.l, tc.dir, tc.bound); got != tc.want {
			t.Errorf("Margin(%g, %g, %s, %q) = %q, want %q", tc.v, tc.l, tc.dir, tc.bound, got, tc.want)
		}
	}
}

func TestFindingWords(t *testing.T) {
	for _, tc := range []struct {
		name               string
		f                  hazards.Finding
		value, limit, marg string
	}{
		{"ullage", hazards.Finding{Unit: "%", Value: 23.14, Limit: 5, Direction: hazards.AtLeast}, "23.1 %", "at least 5 %", "met with 360 % to spare"},
		{"no burst load", hazards.Finding{Limit: 4, Direction: hazards.AtLeast, NotApplicable: hazards.ReasonNoBurstLoad}, "no burst load", "at least 4", NoValue},
		{"no limit", hazards.Finding{Unit: "ppm", Direction: hazards.AtMost, NotApplicable: hazards.ReasonNoPublishedLimit}, "not assessed — no published limit", "none published", NoValue},
		{"probability bound", hazards.Finding{Value: 1e-12, Limit: 1e-6, Direction: hazards.AtMost, ValueBound: hazards.AtMost}, "at most 1 × 10⁻¹²", "at most 1 × 10⁻⁶", "met at least 1 × 10⁶-fold"},
		{"exposure", hazards.Finding{Unit: "ppm", Value: 1189.4, Limit: 1190, Direction: hazards.AtMost}, "1190 ppm", "at most 1190 ppm", "met with 0.05 % to spare"},
		{"stretched", hazards.Finding{Stretched: []string{"x"}}, "outside a correlation's range", "within the published range", NoValue},
	} {
		v := Finding(tc.f, SI)
		if v.Value != tc.value || v.Limit != tc.limit || v.Margin != tc.marg {
			t.Errorf("%s: %q / %q / %q, want %q / %q / %q", tc.name, v.Value, v.Limit, v.Margin, tc.value, tc.limit, tc.marg)
		}
	}
}

// 349.15 K is 76.0 °C and 168.8 °F; 312 kPa is 45.3 psi (NIST SP 811
// appendix B).
func TestDetail(t *testing.T) {
	f := hazards.Finding{Facts: []hazards.Fact{
		{Name: "hottest temperature", Kind: hazards.FactTemperature, Value: 349.15},
		{Name: "pressure inside", Kind: hazards.FactPressure, Value: 312e3},
		{Name: "liquid-full temperature", Kind: hazards.FactTemperature, Text: "not reached"},
		{Name: "glass", Kind: hazards.FactName, Text: "borosilicate"},
	}}
	if got, want := Detail(f, SI), "hottest temperature: 76.0 °C; pressure inside: 312 kPa; liquid-full temperature: not reached; glass: borosilicate."; got != want {
		t.Errorf("SI %q, want %q", got, want)
	}
	if got, want := Detail(f, US), "hottest temperature: 168.8 °F; pressure inside: 45.3 psi; liquid-full temperature: not reached; glass: borosilicate."; got != want {
		t.Errorf("US %q, want %q", got, want)
	}
}

// TestFailingTitles: the failing findings by title, each once, in order.
func TestFailingTitles(t *testing.T) {
	vs := []FindingView{
		{Finding: hazards.Finding{Status: hazards.StatusPass}, Title: "Implosion"},
		{Finding: hazards.Finding{Status: hazards.StatusFail}, Title: "Burst"},
		{Finding: hazards.Finding{Status: hazards.StatusCaution}, Title: "Cold"},
		{Finding: hazards.Finding{Status: hazards.StatusFail}, Title: "Ullage"},
		{Finding: hazards.Finding{Status: hazards.StatusFail}, Title: "Burst"},
	}
	if got := FailingTitles(vs); !slices.Equal(got, []string{"Burst", "Ullage"}) {
		t.Errorf("FailingTitles = %q, want Burst, Ullage", got)
	}
	if got := FailingTitles(vs[:1]); got != nil {
		t.Errorf("FailingTitles with no fail = %q, want nil", got)
	}
}

// TestTally counts findings by status, fails first, with "not assessed"
// only when a finding is.
func TestTally(t *testing.T) {
	fs := func(sts ...hazards.Status) []hazards.Finding {
		out := make([]hazards.Finding, len(sts))
		for i, st := range sts {
			out[i].Status = st
		}
		return out
	}
	for _, c := range []struct {
		in   []hazards.Finding
		want string
	}{
		{fs(hazards.StatusPass), "0 fail · 0 caution · 1 pass, of 1 criterion"},
		{fs(hazards.StatusPass, hazards.StatusFail, hazards.StatusCaution, hazards.StatusNotAssessed, hazards.StatusNotAssessed),
			"1 fail · 1 caution · 1 pass · 2 not assessed, of 5 criteria"},
		{nil, "0 fail · 0 caution · 0 pass, of 0 criteria"},
	} {
		if got := Tally(c.in); got != c.want {
			t.Errorf("Tally = %q, want %q", got, c.want)
		}
	}
}
