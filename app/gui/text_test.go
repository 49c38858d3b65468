package gui

import (
	"os"
	"strings"
	"testing"

	"ullage/hazards"
)

func TestProblemsShowBoundsInScreenUnits(t *testing.T) {
	tests := []struct {
		e    hazards.InputError
		q    quantity
		u    unitSystem
		want string
	}{
		// Rules as hazards.Design.Validate gives them.
		{hazards.InputError{Field: "hottest_k", Rule: hazards.RuleRange, Min: 20, Max: 800, Unit: "K"}, qTemperature, unitsSI, "must be from −253.15 °C to 526.85 °C"},
		{hazards.InputError{Field: "hottest_k", Rule: hazards.RuleRange, Min: 20, Max: 800, Unit: "K"}, qTemperature, unitsUS, "must be from −423.67 °F to 980.33 °F"},
		{hazards.InputError{Field: "fill_mass_kg", Rule: hazards.RulePositive, Max: 10, Unit: "kg"}, qMass, unitsSI, "must be greater than zero and at most 10000 g"},
		{hazards.InputError{Field: "coldest_k", Rule: hazards.RuleAtMost, Max: 349.15, Unit: "K", Subject: "the hottest temperature"}, qTemperature, unitsSI, "must not be above the hottest temperature, 76 °C"},
		{hazards.InputError{Field: "coldest_k", Rule: hazards.RuleAtLeast, Min: 159.05, Unit: "K", Subject: "the freezing point of Ethanol"}, qTemperature, unitsUS, "must be at or above the freezing point of Ethanol, −173.38 °F"},
		{hazards.InputError{Field: "room.mixing_factor", Rule: hazards.RuleRange, Min: 1, Max: 20, Note: "(1 = perfectly mixed)"}, qNumber, unitsSI, "must be from 1 to 20 (1 = perfectly mixed)"},
		{hazards.InputError{Field: "vessel.internal_volume_m3", Rule: hazards.RuleRange, Max: 0.1, Unit: "m³", Note: "(0 means compute from the parts)"}, qVesselVolume, unitsSI, "must be from 0 mL to 100000 mL (0 means compute from the parts)"},
		{hazards.InputError{Field: "temperature", Rule: hazards.RuleAtLeast, Min: 159.05, Unit: "K", Subject: "the freezing point of Ethanol"}, qNumber, unitsSI, "must be at or above the freezing point of Ethanol, −114.1 °C"},
		{hazards.InputError{Field: "fluid", Want: "name a fluid from the library"}, qNumber, unitsSI, "name a fluid from the library"},
	}
	for _, tc := range tests {
		e := tc.e
		got := problemOf(&e, tc.u, func(string) (quantity, bool) { return tc.q, tc.q != qNumber }).Text
		if got != tc.want {
			t.Errorf("%+v in %s: %q, want %q", tc.e, tc.u, got, tc.want)
		}
	}
}

func TestUnitConversionsRoundTrip(t *testing.T) {
	for _, u := range []unitSystem{unitsSI, unitsUS} {
		for q := qNumber; q <= qProbability; q++ {
			for _, x := range []float64{0.0015, 1, 349.15, 101325} {
				back := u.toSI(q, u.fromSI(q, x))
				if d := back - x; d > 1e-9*x || d < -1e-9*x {
					t.Errorf("%s quantity %d: %g → %g", u, q, x, back)
				}
			}
		}
	}
	// 1 psi = 6.894757 kPa, 1 in = 25.4 mm (NIST SP 811 appendix B).
	if got := unitsUS.show(qPressure, 6894.757293168, 4); got != "1 psi" {
		t.Errorf("1 psi shown as %q", got)
	}
	if got := unitsUS.show(qLength, 0.0254, 4); got != "1 in" {
		t.Errorf("1 in shown as %q", got)
	}
}

func TestParseRunArgs(t *testing.T) {
	tests := []struct {
		args    []string
		want    runArgs
		wantErr string
	}{
		{nil, runArgs{}, ""},
		{[]string{"a.json"}, runArgs{file: "a.json"}, ""},
		{[]string{"--smoke", "out.pdf"}, runArgs{smoke: "out.pdf"}, ""},
		{[]string{"a.json", "--smoke", "out.pdf"}, runArgs{file: "a.json", smoke: "out.pdf"}, ""},
		{[]string{"--show", "compare"}, runArgs{}, "unknown option"},
		{[]string{"--smoke"}, runArgs{}, "needs a value"},
		{[]string{"--frobnicate"}, runArgs{}, "unknown option"},
		{[]string{"a.json", "b.json"}, runArgs{}, "one design file"},
	}
	for _, tc := range tests {
		got, err := parseRunArgs(tc.args)
		if tc.wantErr != "" {
			if err == nil || !strings.Contains(err.Error(), tc.wantErr) {
				t.Errorf("parseRunArgs(%q) error %v, want %q", tc.args, err, tc.wantErr)
			}
			continue
		}
		if err != nil || got != tc.want {
			t.Errorf("parseRunArgs(%q) = %+v, %v", tc.args, got, err)
		}
	}
}

func TestUserFluidIsCheckedBeforeUse(t *testing.T) {
	h := newHarness(t)
	bad, err := os.Open("testdata/fluid_bad.json")
	if err != nil {
		t.Fatal(err)
	}
	defer bad.Close()
	if _, err := readUserFluids(bad); err == nil {
		t.Error("a fluid whose curve misses its boiling point was accepted")
	}
	good, err := os.Open("testdata/fluid_good.json")
	if err != nil {
		t.Fatal(err)
	}
	defer good.Close()
	subs, err := readUserFluids(good)
	if err != nil {
		t.Fatal(err)
	}
	h.s.addUserFluids("", subs)
	h.idle()
	opt := fluidOption(subs[0].Fluid())
	found := false
	for _, o := range h.s.form.fluid.choose.Options {
		found = found || o == opt
	}
	if !found {
		t.Fatalf("%q not offered among %v", opt, h.s.form.fluid.choose.Options)
	}
	h.s.form.fluid.choose.SetSelected(opt)
	h.idle()
	if h.s.last.assessment == nil || h.s.last.assessment.Fluid.ID != subs[0].Fluid().ID {
		t.Error("the design was not assessed with the added fluid")
	}
	if !strings.Contains(h.s.form.fluid.info.Text, "supplied by you") {
		t.Errorf("fluid summary does not say the data are the reviewer's: %q", h.s.form.fluid.info.Text)
	}
}
