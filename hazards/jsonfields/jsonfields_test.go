package jsonfields

import (
	"reflect"
	"testing"
)

type inner struct {
	Z float64 `json:"z_m"`
}

type sample struct {
	B        string  `json:"b"`
	A        float64 `json:"a_k,omitempty"`
	C        inner   `json:"c,omitzero"`
	Skipped  int     `json:"-"`
	Untagged bool
	hidden   int
}

func TestOf(t *testing.T) {
	_ = sample{}.hidden
	got := Of(reflect.TypeFor[sample]())
	want := []Field{
		{Name: "b", Index: []int{0}},
		{Name: "a_k", Index: []int{1}, Optional: true},
		{Name: "c", Index: []int{2}, Optional: true, OmitZero: true},
		{Name: "Untagged", Index: []int{4}},
	}
	if !reflect.DeepEqual(got, want) {
		t.Errorf("Of = %+v\nwant %+v", got, want)
	}
	names := []string{}
	for _, f := range ByName(reflect.TypeFor[sample]()) {
		names = append(names, f.Name)
	}
	if !reflect.DeepEqual(names, []string{"Untagged", "a_k", "b", "c"}) {
		t.Errorf("ByName order %q", names)
	}
	if &Of(reflect.TypeFor[sample]())[0] != &got[0] {
		t.Error("the fields of a type are read again on every call")
	}
}
