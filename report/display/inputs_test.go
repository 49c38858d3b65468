package display

import (
	"testing"

	"ullage/hazards"
	"ullage/hazards/compare"
)

// The expected strings follow InputValueText's and FieldWords' doc
// comments; conversions by NIST SP 811 appendix B (1 oz = 28.349523125 g,
// 1 in = 25.4 mm, both exact).
func TestInputValueText(t *testing.T) {
	num := func(u compare.Unit, x float64) compare.InputValue {
		return compare.InputValue{Kind: compare.KindNumber, Unit: u, Number: x}
	}
	for _, c := range []struct {
		v    compare.InputValue
		s    System
		want string
	}{
		{num(compare.UnitMass, 0.0283), SI, "28.3 g"},
		{num(compare.UnitMass, 0.0283), US, "0.9983 oz"},
		{num(compare.UnitLength, 0.0014), SI, "1.4 mm"},
		{num(compare.UnitLength, 0.0254), US, "1 in"},
		{num(compare.UnitTemperature, 349.15), SI, "76.0 °C"},
		{num(compare.UnitTemperature, 349.15), US, "168.8 °F"},
		{num(compare.UnitRoomVolume, 30), SI, "30 m³"},
		{num(compare.UnitPerHour, 0.45), SI, "0.45 per hour"},
		{num(compare.UnitNone, 1e-4), SI, "1 × 10⁻⁴"},
		{compare.InputValue{Kind: compare.KindAbsent}, SI, "absent"},
		{compare.InputValue{Kind: compare.KindText, Text: "borosilicate-3.3"}, SI, "borosilicate-3.3"},
		{compare.InputValue{Kind: compare.KindList, Items: []compare.InputValue{}}, SI, "none"},
		{compare.InputValue{Kind: compare.KindGroup, Fields: []compare.InputField{
			{Name: "name", Value: compare.InputValue{Kind: compare.KindText, Text: "stem"}},
			{Name: "note", Value: compare.InputValue{Kind: compare.KindText}},
			{Name: "outer_diameter_m", Value: num(compare.UnitLength, 0.006)},
		}}, SI, "name: stem, outer diameter: 6 mm"},
	} {
		if got := InputValueText(c.v, c.s); got != c.want {
			t.Errorf("InputValueText(%+v, %s) = %q, want %q", c.v, c.s, got, c.want)
		}
	}
	for path, want := range map[string]string{
		"glass.custom.expansion_per_k.value": "glass, custom, expansion per k",
		"vessel.parts[1].name":               "vessel, parts[1], name",
		"room.near_field_air_speed_m_s":      "room, near field air speed",
	} {
		if got := FieldWords(path); got != want {
			t.Errorf("FieldWords(%q) = %q, want %q", path, got, want)
		}
	}
}

// Every changed field is marked on a row, and the rows marked are the
// count the outputs print.
func TestInputRowsMarkEveryChange(t *testing.T) {
	a := hazards.Design{Fluid: "ethanol", FillMassKg: 0.02, HottestK: 349.15,
		Vessel: hazards.Vessel{Parts: []hazards.Part{{Name: "bulb", Shape: hazards.ShapeSphere, OuterDiameterM: 0.04, WallThicknessM: 0.0015}}}}
	b := a
	b.FillMassKg = 0.012
	b.HottestK = 333.15
	b.Vessel.Parts = append([]hazards.Part(nil), a.Vessel.Parts...)
	b.Vessel.Parts[0].WallThicknessM = 0.002
	c := compare.Compare(compare.Side{Design: a}, compare.Side{Design: b})
	rows := InputRows(&c, SI)
	marked := map[string]bool{}
	for _, r := range rows {
		if r.Changed {
			marked[r.Label] = true
		}
	}
	for _, want := range []string{"Fill mass", "Hottest temperature", "Part 1", "Internal volume"} {
		if !marked[want] {
			t.Errorf("%q not marked changed; marked %v", want, marked)
		}
	}
	if n := ChangedCount(rows); n != len(marked) || CountInputs(n) != "4 inputs differ" {
		t.Errorf("%d rows marked, count says %q", len(marked), CountInputs(n))
	}
}
