package cli

import (
	"encoding/json"
	"strings"
	"testing"

	"ullage/fluids"
	"ullage/fluids/units"
	"ullage/hazards"
	"ullage/hazards/designfile"
)

func assessForJSON(t *testing.T, d hazards.Design) map[string]any {
	t.Helper()
	lib, err := fluids.Builtin()
	if err != nil {
		t.Fatal(err)
	}
	a, err := hazards.Assess(d, lib)
	if err != nil {
		t.Fatal(err)
	}
	rev := &designfile.Revision{Label: "A", Design: d}
	b, err := json.Marshal(checkJSON(checked{path: "x.json", file: &designfile.File{}, revision: rev, assessment: a}))
	if err != nil {
		t.Fatal(err)
	}
	var m map[string]any
	if err := json.Unmarshal(b, &m); err != nil {
		t.Fatal(err)
	}
	return m
}

func jsonDesign() hazards.Design {
	return hazards.Design{
		Fluid: "n-hexane", FillMassKg: 0.0023,
		Vessel:              hazards.Vessel{Parts: []hazards.Part{{Name: "bulb", Shape: hazards.ShapeSphere, OuterDiameterM: 0.04, WallThicknessM: 0.0012, WallToleranceM: 0.0002}}},
		SealingTemperatureK: units.CelsiusToKelvin(20), HottestK: units.CelsiusToKelvin(40), ColdestK: units.CelsiusToKelvin(0),
		AmbientPressurePa: 101325, Glass: hazards.GlassChoice{ID: "soda-lime-annealed"}, ServiceLifeYears: 10, HoursAtHottest: 1000,
		Room:     hazards.Room{VolumeM3: 3, AirChangesPerHour: 0.5, MixingFactor: 1, NearFieldRadiusM: 0.5, NearFieldAirSpeed: 0.05, ExposureMinutes: 480},
		Criteria: hazards.DefaultCriteria(),
	}
}

// TestJSONLimitsTable: every applicable limit appears with its own
// period, average and share, the governing one marked, and the TWA
// finding's value is the governing limit's average (common practice: the
// record gives one number for one quantity). n-hexane limits: NIOSH REL
// TWA 50 ppm (up to 10 h), OSHA PEL TWA 500 ppm (8 h), NIOSH IDLH 1100 ppm
// (30 min), ACGIH TLV TWA 50 ppm (8 h) (NIOSH Pocket Guide; ACGIH).
func TestJSONLimitsTable(t *testing.T) {
	d := jsonDesign()
	d.Criteria.LimitSets = []string{hazards.LimitSetUSOccupational} // the occupational limits alone; n-hexane also has DOE PACs
	m := assessForJSON(t, d)
	limits, _ := m["limits"].([]any)
	if len(limits) != 4 {
		t.Fatalf("limits %v; want the four n-hexane limits", m["limits"])
	}
	var governing float64
	for _, l := range limits {
		lm := l.(map[string]any)
		for _, k := range []string{"body", "kind", "minutes", "average_ppm", "share", "governs"} {
			if _, ok := lm[k]; !ok {
				t.Errorf("limit lacks %q: %v", k, lm)
			}
		}
		if lm["kind"] == "TWA" && lm["governs"] == true {
			governing = lm["average_ppm"].(float64)
		}
	}
	for _, f := range m["findings"].([]any) {
		fm := f.(map[string]any)
		if fm["criterion"] == hazards.CriterionTWA && (fm["value"] != governing || fm["status"] != "fail") {
			t.Errorf("TWA finding %v (%v); want fail at the governing limit's average %v", fm["value"], fm["status"], governing)
		}
		if fm["criterion"] == hazards.CriterionSTEL && (fm["value"] != nil || fm["not_applicable"] != "no published limit") {
			t.Errorf("STEL finding %v; want null value, not assessed — no published limit", fm)
		}
	}
}

// TestJSONNoBurstLoad: n-hexane at 40 °C (37 kPa, NIST WebBook) is below
// ambient, so the glass results that need a burst load are null with
// "burst_load": "none", never 1000 or 0 (common practice).
func TestJSONNoBurstLoad(t *testing.T) {
	m := assessForJSON(t, jsonDesign())
	if m["burst_safety_factor"] != nil || m["failure_probability"] != nil || m["burst_load"] != "none" {
		t.Errorf("burst_safety_factor %v, failure_probability %v, burst_load %v; want null, null, none",
			m["burst_safety_factor"], m["failure_probability"], m["burst_load"])
	}
	for _, f := range m["findings"].([]any) {
		fm := f.(map[string]any)
		if c := fm["criterion"].(string); strings.HasPrefix(c, "burst-safety-factor") || c == hazards.CriterionFailure {
			if fm["value"] != nil || fm["not_applicable"] != "no burst load" || !strings.Contains(fm["message"].(string), "no burst load") {
				t.Errorf("%s: %v; want null value and the words no burst load", c, fm)
			}
		}
	}
}

// TestJSONLimitSets: by default the US occupational and public sets
// apply; every limit names its set, the public ones say whom they
// protect, and a set that gives no number says so in limit_notes.
// Toluene has final AEGLs at all five durations (AEGL-2 1400, 760, 560,
// 310, 250 ppm, as in fluids/limits/us-public-acute.json).
func TestJSONLimitSets(t *testing.T) {
	d := jsonDesign()
	d.Fluid = "toluene"
	m := assessForJSON(t, d)
	if sets, _ := m["limit_sets"].([]any); len(sets) != 2 || sets[0] != hazards.LimitSetUSOccupational || sets[1] != hazards.LimitSetUSPublicAcute {
		t.Errorf("limit_sets %v; want the default", m["limit_sets"])
	}
	bySet := map[string]int{}
	for _, l := range m["limits"].([]any) {
		lm := l.(map[string]any)
		set, _ := lm["set"].(string)
		bySet[set]++
		if set == hazards.LimitSetUSPublicAcute && !strings.HasPrefix(lm["protects"].(string), "General public, children included, ") {
			t.Errorf("public limit %v does not say whom it protects", lm)
		}
	}
	// 5 AEGL-1, 5 AEGL-2 and the AEGL-3 held to the peak.
	if bySet[hazards.LimitSetUSPublicAcute] != 11 || bySet[hazards.LimitSetUSOccupational] == 0 {
		t.Errorf("limits by set %v; want 11 public and the occupational ones", bySet)
	}
	d.Fluid = "perfluoro-2-methyl-3-pentanone"
	m = assessForJSON(t, d)
	notes, _ := m["limit_notes"].([]any)
	if len(notes) != 1 || notes[0].(map[string]any)["reason"] != string(hazards.ReasonNonePublished) {
		t.Errorf("limit_notes %v; want the public table's word that none is published", notes)
	}
}
