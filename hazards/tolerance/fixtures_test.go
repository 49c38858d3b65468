package tolerance

import (
	"encoding/json"
	"errors"
	"fmt"
	"io/fs"
	"math"
	"os"
	"path/filepath"
	"reflect"
	"testing"

	"ullage/fluids"
	"ullage/hazards"
)

func testLibrary(t testing.TB) *fluids.Library {
	t.Helper()
	lib, err := fluids.Builtin()
	if err != nil {
		t.Fatal(err)
	}
	return lib
}

// loadDesign reads a design fixture from testdata, or from the shared
// top-level testdata (see its README): ornament.json (shared) is an
// invented desk ornament (two 40 mm bulbs joined by a 200 mm tube, 6 g of
// dichloromethane) with made-up tolerances; weak_bulb.json a single bulb of
// an invented weak glass, with no tolerances, so that a fair share of
// units burst.
func loadDesign(t testing.TB, name string) hazards.Design {
	t.Helper()
	b, err := os.ReadFile(filepath.Join("testdata", name))
	if errors.Is(err, fs.ErrNotExist) { // a design shared with other packages
		b, err = os.ReadFile(filepath.Join("..", "..", "testdata", name))
	}
	if err != nil {
		t.Fatal(err)
	}
	var d hazards.Design
	if err := json.Unmarshal(b, &d); err != nil {
		t.Fatalf("%s: %v", name, err)
	}
	return d
}

// checkFinite fails the test for any NaN or infinity in v, walking
// structs, slices and maps.
func checkFinite(t *testing.T, path string, v reflect.Value) {
	t.Helper()
	switch v.Kind() {
	case reflect.Float64:
		if f := v.Float(); math.IsNaN(f) || math.IsInf(f, 0) {
			t.Errorf("%s = %g: not finite", path, f)
		}
	case reflect.Pointer:
		if !v.IsNil() {
			checkFinite(t, path, v.Elem())
		}
	case reflect.Struct:
		for i := range v.NumField() {
			checkFinite(t, path+"."+v.Type().Field(i).Name, v.Field(i))
		}
	case reflect.Slice:
		for i := range v.Len() {
			checkFinite(t, fmt.Sprintf("%s[%d]", path, i), v.Index(i))
		}
	}
}
