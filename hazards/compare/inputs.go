package compare

import (
	"fmt"
	"reflect"
	"strings"

	"ullage/hazards"
)

// inputChanges walks both designs field by field under their JSON names
// and lists every difference. Lists of parts are compared index by
// index, so a part added or removed at the end shows as one change; lists
// of plain values (limit bodies) are compared as a whole.
func inputChanges(a, b *hazards.Design) []InputChange {
	var out []InputChange
	diff(&out, "", "", reflect.ValueOf(a).Elem(), reflect.ValueOf(b).Elem())
	return out
}

// diff compares two values of the same type; name is the JSON name that
// carries the unit (for a sourced value, its parent's).
func diff(out *[]InputChange, path, name string, a, b reflect.Value) {
	switch a.Kind() {
	case reflect.Struct:
		for _, f := range jsonFields(a.Type()) {
			unitName := f.name
			if f.name == "value" {
				unitName = name // {"value": …, "source": …} under elastic_modulus_pa
			}
			diff(out, join(path, f.name), unitName, a.FieldByIndex(f.index), b.FieldByIndex(f.index))
		}
	case reflect.Pointer:
		switch {
		case a.IsNil() && b.IsNil():
		case a.IsNil():
			*out = append(*out, change(path, name, InputValue{Kind: KindAbsent}, read(path, name, b.Elem())))
		case b.IsNil():
			*out = append(*out, change(path, name, read(path, name, a.Elem()), InputValue{Kind: KindAbsent}))
		default:
			diff(out, path, name, a.Elem(), b.Elem())
		}
	case reflect.Slice:
		if a.Type().Elem().Kind() != reflect.Struct {
			if oldV, newV := read(path, name, a), read(path, name, b); !reflect.DeepEqual(oldV, newV) {
				*out = append(*out, change(path, name, oldV, newV))
			}
			return
		}
		for i := 0; i < max(a.Len(), b.Len()); i++ {
			at := fmt.Sprintf("%s[%d]", path, i)
			switch {
			case i >= a.Len():
				*out = append(*out, change(at, name, InputValue{Kind: KindAbsent}, read(at, name, b.Index(i))))
			case i >= b.Len():
				*out = append(*out, change(at, name, read(at, name, a.Index(i)), InputValue{Kind: KindAbsent}))
			default:
				diff(out, at, name, a.Index(i), b.Index(i))
			}
		}
	default:
		if !sameScalar(a, b) {
			*out = append(*out, change(path, name, read(path, name, a), read(path, name, b)))
		}
	}
}

// change is one InputChange, its unit the one its values carry.
func change(path, name string, oldV, newV InputValue) InputChange {
	return InputChange{Field: path, Unit: unitOf(path, name), Old: oldV, New: newV}
}

// sameScalar reports whether two plain values are equal (NaN equal to
// NaN, so that bad input never reports a change that shows none).
func sameScalar(a, b reflect.Value) bool {
	if a.Kind() == reflect.Float64 || a.Kind() == reflect.Float32 {
		x, y := a.Float(), b.Float()
		return x == y || (x != x && y != y)
	}
	return a.Interface() == b.Interface()
}

// read turns a design value into a typed InputValue: numbers in SI with
// the unit their JSON name carries, text, switches, lists and groups of
// named fields.
func read(path, name string, v reflect.Value) InputValue {
	switch v.Kind() {
	case reflect.Struct:
		g := InputValue{Kind: KindGroup}
		for _, f := range jsonFields(v.Type()) {
			if f.omitZero && v.FieldByIndex(f.index).IsZero() {
				continue
			}
			unitName := f.name
			if f.name == "value" {
				unitName = name
			}
			g.Fields = append(g.Fields, InputField{Name: f.name, Value: read(join(path, f.name), unitName, v.FieldByIndex(f.index))})
		}
		return g
	case reflect.Pointer:
		if v.IsNil() {
			return InputValue{Kind: KindAbsent}
		}
		return read(path, name, v.Elem())
	case reflect.Slice:
		l := InputValue{Kind: KindList, Items: []InputValue{}}
		for i := 0; i < v.Len(); i++ {
			l.Items = append(l.Items, read(fmt.Sprintf("%s[%d]", path, i), name, v.Index(i)))
		}
		return l
	case reflect.String:
		return InputValue{Kind: KindText, Text: v.String()}
	case reflect.Bool:
		return InputValue{Kind: KindSwitch, On: v.Bool()}
	case reflect.Float64, reflect.Float32:
		return InputValue{Kind: KindNumber, Unit: unitOf(path, name), Number: v.Float()}
	case reflect.Int, reflect.Int8, reflect.Int16, reflect.Int32, reflect.Int64:
		return InputValue{Kind: KindNumber, Number: float64(v.Int())}
	case reflect.Uint, reflect.Uint8, reflect.Uint16, reflect.Uint32, reflect.Uint64:
		return InputValue{Kind: KindNumber, Number: float64(v.Uint())}
	}
	return InputValue{Kind: KindText, Text: fmt.Sprint(v.Interface())}
}

// inputUnits maps the ending of a JSON name to its unit; the first match
// wins, so longer endings come before shorter ones they end with.
var inputUnits = []struct {
	suffix string
	unit   Unit
}{
	{"_per_hour", UnitPerHour},
	{"_per_k", UnitPerKelvin},
	{"_per_pa", UnitPerPascal},
	{"hot_to_cold_k", UnitTemperatureChange},
	{"cold_to_hot_k", UnitTemperatureChange},
	{"_difference_k", UnitTemperatureChange},
	{"_k", UnitTemperature},
	{"_m_s", UnitSpeed},
	{"_m3", UnitVolume},
	{"_m2", UnitArea},
	{"_kg", UnitMass},
	{"_pa", UnitPressure},
	{"_m", UnitLength},
	{"_years", UnitYears},
	{"_minutes", UnitMinutes},
	{"_seconds", UnitSeconds},
	{"_percent_lfl", UnitPercentLFL},
	{"_percent", UnitPercent},
	{hazards.FieldHoursAtHottest, UnitHours},
}

// unitOf returns the unit the JSON name carries; a length or a volume of
// the room (under "room.") is a room's, not the vessel's.
func unitOf(path, name string) Unit {
	for _, u := range inputUnits {
		if !strings.HasSuffix(name, u.suffix) {
			continue
		}
		if strings.HasPrefix(path, hazards.FieldRoom+".") {
			switch u.unit {
			case UnitLength:
				return UnitRoomLength
			case UnitVolume:
				return UnitRoomVolume
			}
		}
		return u.unit
	}
	return UnitNone
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

func join(path, key string) string {
	if path == "" {
		return key
	}
	return path + "." + key
}
