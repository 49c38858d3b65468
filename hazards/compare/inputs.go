package compare

import (
	"fmt"
	"reflect"
	"strconv"
	"strings"
	"sync"

	"ullage/fluids/units"
	"ullage/hazards"
)

// inputChanges walks both designs field by field under their JSON names
// and lists every difference. Lists of parts are compared index by
// index, so a part added or removed at the end shows as one change; lists
// of plain values (limit bodies) are compared as a whole.
func inputChanges(a, b *hazards.Design) []InputChange {
	d := differ{path: make([]byte, 0, 64)}
	d.diff("", reflect.ValueOf(a).Elem(), reflect.ValueOf(b).Elem())
	return d.out
}

// designFields holds the JSON fields of every struct type a design is
// made of, read from the types once: a fixed table, never changed after.
var designFields = sync.OnceValue(func() map[reflect.Type][]jsonField {
	m := map[reflect.Type][]jsonField{}
	var walk func(t reflect.Type)
	walk = func(t reflect.Type) {
		switch t.Kind() {
		case reflect.Pointer, reflect.Slice, reflect.Array:
			walk(t.Elem())
		case reflect.Struct:
			if _, ok := m[t]; ok {
				return
			}
			fs := jsonFields(t)
			m[t] = fs
			for _, f := range fs {
				walk(t.FieldByIndex(f.index).Type)
			}
		}
	}
	walk(reflect.TypeFor[hazards.Design]())
	return m
})

// fieldsOf returns the JSON fields of a struct type.
func fieldsOf(t reflect.Type) []jsonField {
	if fs, ok := designFields()[t]; ok {
		return fs
	}
	return jsonFields(t)
}

// differ walks two designs: the changes found and the JSON path of the
// value being compared, written out only for a change.
type differ struct {
	out  []InputChange
	path []byte
}

// add records a change at the current path.
func (d *differ) add(old, new string) {
	d.out = append(d.out, InputChange{Field: string(d.path), Old: old, New: new})
}

// diff compares two values of the same type at the current path; name is
// the JSON name that carries the unit (for a sourced value, its parent's).
func (d *differ) diff(name string, a, b reflect.Value) {
	switch a.Kind() {
	case reflect.Struct:
		for _, f := range fieldsOf(a.Type()) {
			unitName := f.name
			if f.name == "value" {
				unitName = name // {"value": …, "source": …} under elastic_modulus_pa
			}
			n := len(d.path)
			if n > 0 {
				d.path = append(d.path, '.')
			}
			d.path = append(d.path, f.name...)
			d.diff(unitName, a.FieldByIndex(f.index), b.FieldByIndex(f.index))
			d.path = d.path[:n]
		}
	case reflect.Pointer:
		switch {
		case a.IsNil() && b.IsNil():
		case a.IsNil():
			d.add(Absent, describe(name, b.Elem()))
		case b.IsNil():
			d.add(describe(name, a.Elem()), Absent)
		default:
			d.diff(name, a.Elem(), b.Elem())
		}
	case reflect.Slice:
		if a.Type().Elem().Kind() != reflect.Struct {
			if oldV, newV := describe(name, a), describe(name, b); oldV != newV {
				d.add(oldV, newV)
			}
			return
		}
		for i := 0; i < max(a.Len(), b.Len()); i++ {
			n := len(d.path)
			d.path = append(strconv.AppendInt(append(d.path, '['), int64(i), 10), ']')
			switch {
			case i >= a.Len():
				d.add(Absent, describe(name, b.Index(i)))
			case i >= b.Len():
				d.add(describe(name, a.Index(i)), Absent)
			default:
				d.diff(name, a.Index(i), b.Index(i))
			}
			d.path = d.path[:n]
		}
	default:
		if !sameScalar(a, b) {
			d.add(describe(name, a), describe(name, b))
		}
	}
}

// sameScalar reports whether two plain values are equal (NaN equal to
// NaN, so that bad input never reports a change that shows none).
func sameScalar(a, b reflect.Value) bool {
	switch a.Kind() {
	case reflect.Float64, reflect.Float32:
		x, y := a.Float(), b.Float()
		return x == y || (x != x && y != y)
	case reflect.String:
		return a.String() == b.String()
	case reflect.Bool:
		return a.Bool() == b.Bool()
	case reflect.Int, reflect.Int8, reflect.Int16, reflect.Int32, reflect.Int64:
		return a.Int() == b.Int()
	case reflect.Uint, reflect.Uint8, reflect.Uint16, reflect.Uint32, reflect.Uint64, reflect.Uintptr:
		return a.Uint() == b.Uint()
	}
	return a.Interface() == b.Interface()
}

// describe formats a value for a person: numbers with the unit their JSON
// name carries, text quoted, lists in brackets, structures as
// "name: value" pairs.
func describe(name string, v reflect.Value) string {
	switch v.Kind() {
	case reflect.Struct:
		var parts []string
		for _, f := range fieldsOf(v.Type()) {
			if f.omitZero && v.FieldByIndex(f.index).IsZero() {
				continue
			}
			unitName := f.name
			if f.name == "value" {
				unitName = name
			}
			parts = append(parts, f.name+": "+describe(unitName, v.FieldByIndex(f.index)))
		}
		return "{" + strings.Join(parts, ", ") + "}"
	case reflect.Pointer:
		if v.IsNil() {
			return Absent
		}
		return describe(name, v.Elem())
	case reflect.Slice:
		items := make([]string, v.Len())
		for i := range items {
			items[i] = describe(name, v.Index(i))
		}
		return "[" + strings.Join(items, ", ") + "]"
	case reflect.String:
		return strconv.Quote(v.String())
	case reflect.Float64, reflect.Float32:
		return withUnit(name, v.Float())
	}
	return fmt.Sprint(v.Interface())
}

// kelvin is the unit that also shows degrees Celsius.
const kelvin = "K"

// inputUnits maps the ending of a JSON name to its unit; the first match
// wins, so longer endings come before shorter ones they end with.
var inputUnits = []struct{ suffix, unit string }{
	{"_per_hour", "per hour"},
	{"_per_k", "1/K"},
	{"_per_pa", "1/Pa"},
	{"hot_to_cold_k", "K change"},
	{"cold_to_hot_k", "K change"},
	{"_difference_k", "K change"},
	{"_k", kelvin},
	{"_m_s", "m/s"},
	{"_m3", "m³"},
	{"_m2", "m²"},
	{"_kg", "kg"},
	{"_pa", "Pa"},
	{"_m", "m"},
	{"_years", "years"},
	{"_minutes", "min"},
	{"_seconds", "s"},
	{"_percent", "%"},
	{"_percent_lfl", "% of LFL"},
	{"hours_at_hottest", "h"},
}

// withUnit formats x with the unit named by the JSON name; temperatures
// in kelvin also show degrees Celsius.
func withUnit(name string, x float64) string {
	s := strconv.FormatFloat(x, 'g', -1, 64)
	for _, u := range inputUnits {
		if !strings.HasSuffix(name, u.suffix) {
			continue
		}
		if u.unit == kelvin {
			return s + " K (" + trimZeros(strconv.FormatFloat(units.KelvinToCelsius(x), 'f', 2, 64)) + " °C)"
		}
		return s + " " + u.unit
	}
	return s
}

// trimZeros drops trailing zeros after a decimal point: "76.00" → "76".
func trimZeros(s string) string {
	if !strings.Contains(s, ".") {
		return s
	}
	s = strings.TrimRight(strings.TrimRight(s, "0"), ".")
	if s == "-0" {
		return "0"
	}
	return s
}

// jsonField is one struct field under its JSON name.
type jsonField struct {
	name  string
	index []int
	// omitZero: an optional field (tag omitzero), left out of a
	// description while it holds its zero value.
	omitZero bool
}

// jsonFields lists a struct's exported fields under their JSON names.
func jsonFields(t reflect.Type) []jsonField {
	var out []jsonField
	for i := 0; i < t.NumField(); i++ {
		sf := t.Field(i)
		if !sf.IsExported() {
			continue
		}
		name, opts, _ := strings.Cut(sf.Tag.Get("json"), ",")
		if name == "-" {
			continue
		}
		if name == "" {
			name = sf.Name
		}
		out = append(out, jsonField{name: name, index: sf.Index, omitZero: strings.Contains(","+opts+",", ",omitzero,")})
	}
	return out
}
