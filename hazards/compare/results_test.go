package compare

import (
	"testing"

	"ullage/fluids"
	"ullage/hazards"
)

// fakeAssessment fills every quantity Compare reads with x (in SI where
// the engine is SI), so that two of them differ in every result at once.
func fakeAssessment(x float64) *hazards.Assessment {
	lfl := fluids.Sourced{Value: 2.5, Source: "test"}
	return &hazards.Assessment{
		Fluid:                 &fluids.Fluid{Flammability: fluids.Flammability{Flammable: true, LFLPercent: &lfl}},
		Hot:                   hazards.VesselState{PressurePa: x * 1000, UllagePercent: x},
		LiquidFullK:           273.15 + x,
		LiquidFullReached:     true,
		BurstSafetyFactor:     x,
		FailureProbability:    x / 1000,
		ImplosionSafetyFactor: x,
		MaxSafe:               hazards.MaxSafe{TemperatureK: 273.15 + x, TemperatureBound: hazards.BoundFound, FillMassKg: x / 1000, FillBound: hazards.BoundFound},
		Rupture:               hazards.Rupture{StoredEnergyJ: x},
		Release: hazards.Release{Peak: hazards.Exposure{PPM: x}, STEL: hazards.Exposure{PPM: x},
			TWA8h: hazards.Exposure{PPM: x}, PercentLFL: x},
		Seal: &hazards.SealResult{Name: "bulb", StressPa: x * 1e6},
		Shock: hazards.ThermalShockResult{Assessed: true, Parts: []hazards.PartShock{{Name: "bulb",
			Cases: []hazards.ShockCase{{Direction: hazards.ShockHotToCold, DeltaK: 50, SafetyFactor: x}}}}},
	}
}

// Every result rises from A to B; whether that is better is the
// quantity's direction, stated here independently of the code's table.
func TestResultDirections(t *testing.T) {
	higherIsBetter := map[string]bool{
		"Pressure at the hottest temperature":        false,
		"Ullage at the hottest temperature":          true,
		"Liquid-full temperature":                    true,
		"Burst safety factor":                        true,
		"Failure probability over the service life":  false,
		"Implosion safety factor":                    true,
		"Maximum safe temperature":                   true,
		"Maximum safe fill":                          true,
		"Stored energy at rupture":                   false,
		"Peak concentration":                         false,
		"15-minute average (STEL)":                   false,
		"8-hour time-weighted average (TWA)":         false,
		"Peak as a percentage of the LFL":            false,
		"Thermal-shock safety factor (weakest part)": true,
		"Residual stress at the seal":                false,
	}
	c := Compare(Side{Assessment: fakeAssessment(2)}, Side{Assessment: fakeAssessment(3)})
	if len(c.Results) != len(higherIsBetter) {
		t.Errorf("%d results; want %d", len(c.Results), len(higherIsBetter))
	}
	for _, r := range c.Results {
		want, ok := higherIsBetter[r.Name]
		if !ok {
			t.Errorf("unexpected result %q", r.Name)
			continue
		}
		if !(r.New > r.Old) {
			t.Errorf("%s: %g → %g; the fake assessments should make it rise", r.Name, r.Old, r.New)
		}
		if r.Better != want || r.Worse != !want {
			t.Errorf("%s rising: Better %v, Worse %v; want Better %v", r.Name, r.Better, r.Worse, want)
		}
	}
}

func TestResultUnitsAndText(t *testing.T) {
	a := fakeAssessment(2)
	c := Compare(Side{Assessment: a}, Side{Assessment: a})
	want := map[string][2]string{ // unit, text
		"Pressure at the hottest temperature":        {"kPa", "2.000 kPa"},
		"Ullage at the hottest temperature":          {"%", "2.0 %"},
		"Liquid-full temperature":                    {"°C", "2.0 °C"},
		"Burst safety factor":                        {"", "2.00"},
		"Failure probability over the service life":  {"", "0.0020"},
		"Maximum safe temperature":                   {"°C", "2.0 °C"},
		"Maximum safe fill":                          {"g", "2.00 g"},
		"Stored energy at rupture":                   {"J", "2.00 J"},
		"Peak concentration":                         {"ppm", "2.00 ppm"},
		"Peak as a percentage of the LFL":            {"% LFL", "2.0 % LFL"},
		"Thermal-shock safety factor (weakest part)": {"", "2.00 (bulb, 50.0 K hot-to-cold)"},
		"Residual stress at the seal":                {"MPa", "2.00 MPa (bulb)"},
	}
	for _, r := range c.Results {
		if w, ok := want[r.Name]; ok && (r.Unit != w[0] || r.NewText != w[1]) {
			t.Errorf("%s: unit %q, text %q; want %q, %q", r.Name, r.Unit, r.NewText, w[0], w[1])
		}
	}
}

// "Not reached" beats any liquid-full temperature; limits outside their
// search range say so; a capped safety factor says it carries no load.
func TestResultSpecialCases(t *testing.T) {
	reached := fakeAssessment(2)
	never := fakeAssessment(2)
	never.LiquidFullReached = false
	never.MaxSafe.TemperatureBound = hazards.BoundAbove
	never.MaxSafe.FillBound = hazards.BoundBelow
	never.ImplosionSafetyFactor = hazards.SafetyFactorCap
	c := Compare(Side{Assessment: reached}, Side{Assessment: never})
	tests := []struct {
		name, newText string
		better        bool
		changed       bool
	}{
		{"Liquid-full temperature", "not reached", true, true},
		{"Maximum safe temperature", "above 2.0 °C", false, true},
		{"Maximum safe fill", "below 2.00 g", false, true},
		{"Implosion safety factor", "≥ 1000 (no load)", true, true},
	}
	for _, tt := range tests {
		r := findResult(t, c, tt.name)
		if r.NewText != tt.newText || r.Better != tt.better || r.Changed() != tt.changed {
			t.Errorf("%s: %+v; want text %q, better %v, changed %v", tt.name, r, tt.newText, tt.better, tt.changed)
		}
	}
	if r := findResult(t, c, "Liquid-full temperature"); r.New != 0 {
		t.Errorf("not reached reported as %g; want 0 with the text saying why", r.New)
	}
	back := Compare(Side{Assessment: never}, Side{Assessment: never})
	if r := findResult(t, back, "Liquid-full temperature"); r.Changed() {
		t.Errorf("not reached on both sides: %+v", r)
	}
}

func TestNumberFormats(t *testing.T) {
	tests := []struct {
		got, want string
	}{
		{sig(23581.4, 4), "23581"},
		{sig(191.46, 4), "191.5"},
		{sig(0.328156, 3), "0.328"},
		{sig(3.0e-14, 2), "3.0e-14"},
		{sig(1, 2), "1.0"},
		{sig(0, 3), "0"},
		{sig(1.5e8, 3), "1.50e+08"},
		{sig(-2.5, 2), "-2.5"},
		{fixed(-0.01, 1), "0.0"},
		{fixed(-0.06, 1), "-0.1"},
		{fixed(52.8877, 1), "52.9"},
	}
	for i, tt := range tests {
		if tt.got != tt.want {
			t.Errorf("case %d: %q; want %q", i, tt.got, tt.want)
		}
	}
}

// A side with no sudden change or no seal stress says so in words and
// claims neither better nor worse.
func TestShockAndSealNotAssessed(t *testing.T) {
	given := fakeAssessment(2)
	none := fakeAssessment(2)
	none.Shock = hazards.ThermalShockResult{NotAssessedReason: hazards.ShockNotAssessed}
	none.Seal = nil
	c := Compare(Side{Assessment: none}, Side{Assessment: given})
	for _, name := range []string{"Thermal-shock safety factor (weakest part)", "Residual stress at the seal"} {
		r := findResult(t, c, name)
		if r.Better || r.Worse || !r.Changed() {
			t.Errorf("%s: %+v; want changed text, neither better nor worse", name, r)
		}
	}
	if r := findResult(t, c, "Thermal-shock safety factor (weakest part)"); r.OldText != "not assessed (no sudden change given)" {
		t.Errorf("old side reads %q", r.OldText)
	}
}
