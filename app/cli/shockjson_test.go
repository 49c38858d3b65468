package cli

import (
	"encoding/json"
	"testing"
)

// check --json carries thermal_shock: null with a reason for a design
// without a sudden change, and one entry per part with its
// thermal_shock_safety_factor when one is given (the bundled example).
func TestCheckJSONThermalShock(t *testing.T) {
	_, out, errs := run("check", "--json", "--rev", "A", "testdata/good.json")
	var m map[string]any
	if err := json.Unmarshal([]byte(out), &m); err != nil {
		t.Fatalf("not JSON: %v\n%s%s", err, out, errs)
	}
	if v, ok := m["thermal_shock"]; !ok || v != nil {
		t.Errorf("thermal_shock = %v (present %v); want null", v, ok)
	}
	if note, _ := m["thermal_shock_note"].(string); note == "" {
		t.Error("no reason given for the missing thermal-shock result")
	}
	if v, ok := m["seal_residual_stress_mpa"]; !ok || v != nil {
		t.Errorf("seal_residual_stress_mpa = %v (present %v); want null", v, ok)
	}

	_, out, errs = run("check", "--json", "--rev", "B", "../../assets/examples/tidemark-lantern.json")
	m = nil
	if err := json.Unmarshal([]byte(out), &m); err != nil {
		t.Fatalf("not JSON: %v\n%s%s", err, out, errs)
	}
	parts, _ := m["thermal_shock"].([]any)
	if len(parts) != 3 {
		t.Fatalf("thermal_shock = %v; want one entry per part", m["thermal_shock"])
	}
	for _, p := range parts {
		pm := p.(map[string]any)
		sf, ok := pm["thermal_shock_safety_factor"].(float64)
		if !ok || sf <= 0 || pm["part"] == "" || pm["direction"] != "hot-to-cold" {
			t.Errorf("entry %v", pm)
		}
	}
	if _, ok := m["thermal_shock_note"]; ok {
		t.Error("a reason is given although the shock was assessed")
	}
}
