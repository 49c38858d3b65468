package compare

import (
	"fmt"
	"reflect"
	"strconv"
	"strings"

	"ullage/hazards"
	"ullage/hazards/jsonfields"
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

// differ walks two designs: the changes found, and the JSON path of the
// value being compared, written out as a string only for a change.
type differ struct {
	out  []InputChange
	path []byte
}

// add records a change at the current path.
func (d *differ) add(name string, oldV, newV InputValue) {
	d.out = append(d.out, change(string(d.path), name, oldV, newV))
}

// at returns the current path as a string, for the values of a change.
func (d *differ) at() string { return string(d.path) }

// diff compares two values of the same type at the current path; name is
// the JSON name that carries the unit (for a sourced value, its parent's).
func (d *differ) diff(name string, a, b reflect.Value) {
	switch a.Kind() {
	case reflect.Struct:
		for _, f := range jsonfields.Of(a.Type()) {
			unitName := f.Name
			if f.Name == "value" {
				unitName = name // {"value": …, "source": …} under elastic_modulus_pa
			}
			n := len(d.path)
			if n > 0 {
				d.path = append(d.path, '.')
			}
			d.path = append(d.path, f.Name...)
			d.diff(unitName, a.FieldByIndex(f.Index), b.FieldByIndex(f.Index))
			d.path = d.path[:n]
		}
	case reflect.Pointer:
		switch {
		case a.IsNil() && b.IsNil():
		case a.IsNil():
			d.add(name, InputValue{Kind: KindAbsent}, read(d.at(), name, b.Elem()))
		case b.IsNil():
			d.add(name, read(d.at(), name, a.Elem()), InputValue{Kind: KindAbsent})
		default:
			d.diff(name, a.Elem(), b.Elem())
		}
	case reflect.Slice:
		if a.Type().Elem().Kind() != reflect.Struct {
			if !sameList(a, b) {
				d.add(name, read(d.at(), name, a), read(d.at(), name, b))
			}
			return
		}
		for i := 0; i < max(a.Len(), b.Len()); i++ {
			n := len(d.path)
			d.path = append(strconv.AppendInt(append(d.path, '['), int64(i), 10), ']')
			switch {
			case i >= a.Len():
				d.add(name, InputValue{Kind: KindAbsent}, read(d.at(), name, b.Index(i)))
			case i >= b.Len():
				d.add(name, read(d.at(), name, a.Index(i)), InputValue{Kind: KindAbsent})
			default:
				d.diff(name, a.Index(i), b.Index(i))
			}
			d.path = d.path[:n]
		}
	default:
		if !sameScalar(a, b) {
			d.add(name, read(d.at(), name, a), read(d.at(), name, b))
		}
	}
}

// sameList reports whether two lists of plain values hold the same
// values in the same order (a nil list and an empty one are the same, as
// their descriptions are).
func sameList(a, b reflect.Value) bool {
	if a.Len() != b.Len() {
		return false
	}
	for i := 0; i < a.Len(); i++ {
		if !sameScalar(a.Index(i), b.Index(i)) {
			return false
		}
	}
	return true
}

// change is one InputChange, its unit the one its values carry.
func change(path, name string, oldV, newV InputValue) InputChange {
	return InputChange{Field: path, Unit: unitOf(path, name), Old: oldV, New: newV}
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

// read turns a design value into a typed InputValue: numbers in SI with
// the unit their JSON name carries, text, switches, lists and groups of
// named fields.
func read(path, name string, v reflect.Value) InputValue {
	switch v.Kind() {
	case reflect.Struct:
		g := InputValue{Kind: KindGroup}
		for _, f := range jsonfields.Of(v.Type()) {
			if f.OmitZero && v.FieldByIndex(f.Index).IsZero() {
				continue
			}
			unitName := f.Name
			if f.Name == "value" {
				unitName = name
			}
			g.Fields = append(g.Fields, InputField{Name: f.Name, Value: read(join(path, f.Name), unitName, v.FieldByIndex(f.Index))})
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

// join appends a key to a field path.
func join(path, key string) string {
	if path == "" {
		return key
	}
	return path + "." + key
}
