package hazards

import (
	"encoding/json"
	"reflect"
	"slices"
	"strings"
	"testing"
)

// A finding's JSON lists every exported field of Finding under its tag,
// and the steps behind it; the value and margin are null when not
// applicable. Finding.MarshalJSON spells the fields out, so a field added
// to Finding and not to it would be silently dropped.
func TestFindingJSONHasEveryField(t *testing.T) {
	a, err := Assess(typicalDesign(), testLibrary(t))
	if err != nil {
		t.Fatal(err)
	}
	want := []string{"steps"}
	ft := reflect.TypeFor[Finding]()
	for i := range ft.NumField() {
		f := ft.Field(i)
		if !f.IsExported() {
			continue
		}
		name, _, _ := strings.Cut(f.Tag.Get("json"), ",")
		want = append(want, name)
	}
	slices.Sort(want)
	for _, f := range a.Findings {
		f.Stretched, f.NotApplicable, f.ValueBound, f.Protects = []string{"x"}, ReasonNoBurstLoad, AtMost, "y"
		b, err := json.Marshal(f)
		if err != nil {
			t.Fatal(err)
		}
		var m map[string]json.RawMessage
		if err := json.Unmarshal(b, &m); err != nil {
			t.Fatal(err)
		}
		var got []string
		for k := range m {
			got = append(got, k)
		}
		slices.Sort(got)
		if !slices.Equal(got, want) {
			t.Fatalf("%s: JSON keys %v, want %v", f.Criterion, got, want)
		}
		if string(m["value"]) != "null" || string(m["margin"]) != "null" {
			t.Errorf("%s: value %s, margin %s with NotApplicable set; want null", f.Criterion, m["value"], m["margin"])
		}
		var steps []int
		if err := json.Unmarshal(m["steps"], &steps); err != nil || !slices.Equal(steps, f.Steps()) || len(steps) == 0 {
			t.Errorf("%s: steps %s in the JSON, want %v", f.Criterion, m["steps"], f.Steps())
		}
	}
}
