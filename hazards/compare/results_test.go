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
		ExternalLoadPa:        1,
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
		if !(r.New.Value > r.Old.Value) {
			t.Errorf("%s: %g → %g; the fake assessments should make it rise", r.Name, r.Old.Value, r.New.Value)
		}
		if r.Better != want || r.Worse != !want {
			t.Errorf("%s rising: Better %v, Worse %v; want Better %v", r.Name, r.Better, r.Worse, want)
		}
	}
}

func TestResultUnitsAndValues(t *testing.T) {
	a := fakeAssessment(2)
	c := Compare(Side{Assessment: a}, Side{Assessment: a})
	want := map[string]struct {
		q    Quantity
		unit string
		part string
	}{
		"Pressure at the hottest temperature":        {Pressure, "Pa", ""},
		"Ullage at the hottest temperature":          {Percent, "%", ""},
		"Liquid-full temperature":                    {Temperature, "K", ""},
		"Burst safety factor":                        {Factor, "", ""},
		"Failure probability over the service life":  {Probability, "", ""},
		"Maximum safe fill":                          {Mass, "kg", ""},
		"Stored energy at rupture":                   {Energy, "J", ""},
		"Peak concentration":                         {Concentration, "ppm", ""},
		"Peak as a percentage of the LFL":            {PercentLFL, "% LFL", ""},
		"Thermal-shock safety factor (weakest part)": {Factor, "", "bulb"},
		"Residual stress at the seal":                {Stress, "Pa", "bulb"},
	}
	for _, r := range c.Results {
		if w, ok := want[r.Name]; ok && (r.Quantity != w.q || r.Unit != w.unit || r.New.Part != w.part || r.New.State != "") {
			t.Errorf("%s: %s %q %+v; want %s %q part %q", r.Name, r.Quantity, r.Unit, r.New, w.q, w.unit, w.part)
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
		name    string
		state   State
		bound   string
		better  bool
		changed bool
	}{
		{"Liquid-full temperature", NotReached, "", true, true},
		{"Maximum safe temperature", "", "above", false, true},
		{"Maximum safe fill", "", "below", false, true},
		{"Implosion safety factor", "", "at-least", true, true},
	}
	for _, tt := range tests {
		r := findResult(t, c, tt.name)
		if r.New.State != tt.state || r.New.Bound != tt.bound || r.Better != tt.better || r.Changed() != tt.changed {
			t.Errorf("%s: %+v; want state %q, bound %q, better %v, changed %v", tt.name, r, tt.state, tt.bound, tt.better, tt.changed)
		}
	}
	if r := findResult(t, c, "Liquid-full temperature"); r.New.Value != 0 {
		t.Errorf("not reached reported as %g; want 0 with the state saying why", r.New.Value)
	}
	back := Compare(Side{Assessment: never}, Side{Assessment: never})
	if r := findResult(t, back, "Liquid-full temperature"); r.Changed() {
		t.Errorf("not reached on both sides: %+v", r)
	}
}

// A vessel never above ambient at its hottest carries no burst load, and
// one never below ambient at its coldest no external load: the readings
// say so in words, never a probability of 0 or a capped factor, and count
// as the better side.
func TestNoLoadStates(t *testing.T) {
	loaded := fakeAssessment(2)
	free := fakeAssessment(2)
	free.Design.AmbientPressurePa = 1e6 // above the hottest pressure, 2 kPa
	free.ExternalLoadPa = -1
	free.FailureProbability = 0
	c := Compare(Side{Assessment: loaded}, Side{Assessment: free})
	for _, tt := range []struct {
		name  string
		state State
	}{
		{"Burst safety factor", NoBurstLoad},
		{"Failure probability over the service life", NoBurstLoad},
		{"Implosion safety factor", NoExternalLoad},
	} {
		r := findResult(t, c, tt.name)
		if r.New.State != tt.state || !r.Better || r.Old.State != "" {
			t.Errorf("%s: %+v; want %q on the new side only, better", tt.name, r, tt.state)
		}
	}
	if r := findResult(t, Compare(Side{Assessment: free}, Side{Assessment: free}), "Burst safety factor"); r.Changed() {
		t.Errorf("no burst load on both sides: %+v", r)
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
	if r := findResult(t, c, "Thermal-shock safety factor (weakest part)"); r.Old.State != NotAssessed {
		t.Errorf("old side reads %+v", r.Old)
	}
}
