// Package jsonfields reads the fields of Go struct types under the names
// encoding/json gives them, once per type. The design file's strict
// reader and fingerprint and the comparison of two designs walk designs
// by these names, so that all three agree with the file as written.
package jsonfields

import (
	"reflect"
	"sort"
	"strings"
	"sync"
)

// Field is one exported struct field under its JSON name.
type Field struct {
	// Name is the JSON name: the tag's, else the Go field's.
	Name string
	// Index is the field's index sequence, for reflect.Value.FieldByIndex.
	Index []int
	// Optional: the tag says omitempty or omitzero, so a file may leave
	// the field out.
	Optional bool
	// OmitZero: the tag says omitzero, so the field is left out while it
	// holds its zero value.
	OmitZero bool
}

// tables holds, per struct type, its fields in declaration order and
// sorted by name. Entries are written once and never changed.
var tables sync.Map // reflect.Type → *[2][]Field

// Of returns the JSON fields of a struct type in declaration order. The
// slice is shared: callers must not change it.
func Of(t reflect.Type) []Field { return table(t)[0] }

// ByName returns the JSON fields of a struct type sorted by name (the
// order of a canonical form). The slice is shared: callers must not
// change it.
func ByName(t reflect.Type) []Field { return table(t)[1] }

func table(t reflect.Type) *[2][]Field {
	if v, ok := tables.Load(t); ok {
		return v.(*[2][]Field)
	}
	fs := read(t)
	byName := append([]Field(nil), fs...)
	sort.Slice(byName, func(i, j int) bool { return byName[i].Name < byName[j].Name })
	v, _ := tables.LoadOrStore(t, &[2][]Field{fs, byName})
	return v.(*[2][]Field)
}

// read lists a struct's exported fields under their JSON names, by the
// encoding/json tag rules the design's types use: a name, "-" to leave a
// field out, and the omitempty and omitzero options.
func read(t reflect.Type) []Field {
	var out []Field
	for i := 0; i < t.NumField(); i++ {
		sf := t.Field(i)
		if !sf.IsExported() {
			continue
		}
		tag := sf.Tag.Get("json")
		if tag == "-" {
			continue
		}
		name, opts, _ := strings.Cut(tag, ",")
		if name == "" {
			name = sf.Name
		}
		opts = "," + opts + ","
		omitZero := strings.Contains(opts, ",omitzero,")
		out = append(out, Field{Name: name, Index: sf.Index, Optional: omitZero || strings.Contains(opts, ",omitempty,"), OmitZero: omitZero})
	}
	return out
}
