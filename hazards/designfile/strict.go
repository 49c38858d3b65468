package designfile

import (
	"errors"
	"fmt"
	"math"
	"reflect"
	"strconv"
	"strings"

	"ullage/hazards/jsonfields"
)

// strictDecoder fills Go values from a parsed tree, refusing unknown
// fields, missing fields and values of the wrong type. A field is
// required unless its JSON tag says omitempty or omitzero.
type strictDecoder struct {
	data []byte
	// at is the path to the value being filled, per level a key (index
	// -1) or an index, written out as a field path only for an error.
	at []pathStep
}

// path writes the path to the value being filled: "revisions[1].design".
func (d *strictDecoder) path() string { return writePath(d.at) }

func (d *strictDecoder) fail(n *node, field, value, problem string, err error) *FileError {
	return &FileError{Line: lineAt(d.data, n.offset), Field: field, Value: value, Problem: problem, Err: err}
}

// decode fills v (settable) from n, the value at d.path().
func (d *strictDecoder) decode(n *node, v reflect.Value) *FileError {
	switch v.Kind() {
	case reflect.Struct:
		return d.object(n, v)
	case reflect.Pointer:
		if n.kind == kindNull {
			v.SetZero()
			return nil
		}
		p := reflect.New(v.Type().Elem())
		if err := d.decode(n, p.Elem()); err != nil {
			return err
		}
		v.Set(p)
		return nil
	case reflect.Slice:
		if n.kind == kindNull {
			return d.fail(n, d.path(), "null", "must be a list in square brackets [ … ] (write [] for an empty list)", nil)
		}
		if n.kind != kindArray {
			return d.fail(n, d.path(), n.shown(), "must be a list in square brackets [ … ]", nil)
		}
		s := reflect.MakeSlice(v.Type(), len(n.elems), len(n.elems))
		for i, e := range n.elems {
			d.at = append(d.at, pathStep{index: i})
			err := d.decode(e, s.Index(i))
			d.at = d.at[:len(d.at)-1]
			if err != nil {
				return err
			}
		}
		v.Set(s)
		return nil
	case reflect.String:
		if n.kind != kindString {
			return d.fail(n, d.path(), n.shown(), "must be text in double quotes", nil)
		}
		v.SetString(n.text)
		return nil
	case reflect.Float64, reflect.Float32:
		if n.kind != kindNumber {
			return d.fail(n, d.path(), n.shown(), "must be a number", nil)
		}
		x, err := strconv.ParseFloat(n.text, v.Type().Bits())
		if err != nil || math.IsInf(x, 0) {
			return d.fail(n, d.path(), n.shown(), "is too large to be a number this program can hold", err)
		}
		v.SetFloat(x)
		return nil
	case reflect.Int, reflect.Int8, reflect.Int16, reflect.Int32, reflect.Int64:
		if n.kind != kindNumber {
			return d.fail(n, d.path(), n.shown(), "must be a whole number", nil)
		}
		x, err := strconv.ParseInt(n.text, 10, v.Type().Bits())
		if err != nil {
			return d.fail(n, d.path(), n.shown(), "must be a whole number in range", err)
		}
		v.SetInt(x)
		return nil
	case reflect.Bool:
		if n.kind != kindBool {
			return d.fail(n, d.path(), n.shown(), "must be true or false", nil)
		}
		v.SetBool(n.boolean)
		return nil
	}
	panic(fmt.Sprintf("designfile: no strict decoding for %s at %s", v.Type(), d.path()))
}

// object fills a struct from a JSON object, field by field.
func (d *strictDecoder) object(n *node, v reflect.Value) *FileError {
	if n.kind != kindObject {
		return d.fail(n, d.path(), n.shown(), "must be an object in braces { … }", nil)
	}
	fields := jsonfields.Of(v.Type())
	present := make(map[string]bool, len(n.members))
	for _, m := range n.members {
		f, ok := findField(fields, m.key)
		if !ok {
			problem := "unknown field; the fields here are " + fieldNames(fields)
			for _, g := range fields {
				if strings.EqualFold(g.Name, m.key) {
					problem = fmt.Sprintf("unknown field (names are lower case: did you mean %q?)", g.Name)
				}
			}
			return &FileError{Line: lineAt(d.data, m.offset), Field: joinPath(d.path(), m.key), Problem: problem, Err: errUnknownField}
		}
		present[m.key] = true
		d.at = append(d.at, pathStep{key: m.key, index: -1})
		err := d.decode(m.value, v.FieldByIndex(f.Index))
		d.at = d.at[:len(d.at)-1]
		if err != nil {
			return err
		}
	}
	for _, f := range fields {
		if !f.Optional && !present[f.Name] {
			return &FileError{Line: lineAt(d.data, n.offset), Field: joinPath(d.path(), f.Name),
				Problem: `is missing; every field must be given (write 0 or "" where it does not apply)`, Err: errMissingField}
		}
	}
	return nil
}

// Causes for the two structural errors, so tests and callers can tell them
// apart with errors.Is.
var (
	errUnknownField = errors.New("unknown field")
	errMissingField = errors.New("missing field")
)

func findField(fields []jsonfields.Field, name string) (jsonfields.Field, bool) {
	for _, f := range fields {
		if f.Name == name {
			return f, true
		}
	}
	return jsonfields.Field{}, false
}

func fieldNames(fields []jsonfields.Field) string {
	names := make([]string, len(fields))
	for i, f := range fields {
		names[i] = f.Name
	}
	return strings.Join(names, ", ")
}
