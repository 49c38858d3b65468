package cli

import (
	"fmt"
	"math"
	"reflect"
)

// firstNonFinite returns the path of the first NaN or infinite number
// reachable from v (through structs, pointers, slices, arrays and maps,
// exported fields only), or "" when there is none. The outputs check it
// before printing anything, so that no non-finite number reaches the
// text, the JSON or a PDF, and the JSON encoder can never fail on one.
func firstNonFinite(v any) string {
	seen := map[uintptr]bool{}
	var walk func(x reflect.Value, path string) string
	walk = func(x reflect.Value, path string) string {
		switch x.Kind() {
		case reflect.Float32, reflect.Float64:
			if f := x.Float(); math.IsNaN(f) || math.IsInf(f, 0) {
				return path
			}
		case reflect.Pointer, reflect.Interface:
			if x.IsNil() {
				return ""
			}
			if x.Kind() == reflect.Pointer {
				if seen[x.Pointer()] {
					return ""
				}
				seen[x.Pointer()] = true
			}
			return walk(x.Elem(), path)
		case reflect.Struct:
			t := x.Type()
			for i := 0; i < x.NumField(); i++ {
				if !t.Field(i).IsExported() {
					continue
				}
				if p := walk(x.Field(i), path+"."+t.Field(i).Name); p != "" {
					return p
				}
			}
		case reflect.Slice, reflect.Array:
			for i := 0; i < x.Len(); i++ {
				if p := walk(x.Index(i), fmt.Sprintf("%s[%d]", path, i)); p != "" {
					return p
				}
			}
		case reflect.Map:
			it := x.MapRange()
			for it.Next() {
				if p := walk(it.Value(), fmt.Sprintf("%s[%v]", path, it.Key())); p != "" {
					return p
				}
			}
		}
		return ""
	}
	return walk(reflect.ValueOf(v), "")
}
