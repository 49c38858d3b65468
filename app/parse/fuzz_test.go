package parse_test

import (
	"math"
	"testing"

	"ullage/app/parse"
	"ullage/assets"
	"ullage/report/display"
)

// FuzzParseNumber: the form's number parser accepts only finite numbers,
// and whatever it accepts converts, in every unit the form offers, to a
// value the engine either takes or refuses with a message (never a NaN
// slipped through). It lives here, in a small package, so that each
// input costs the parser and not the window's whole program.
func FuzzParseNumber(f *testing.F) {
	for _, s := range []string{"0", " 12,5 ", "1e308", "-1e-320", "NaN", "inf", "1,2,3", "0x1p-2", "１２", "", ",", "1_000", "+.5", "5e-324"} {
		f.Add(s, uint8(0))
	}
	base, err := assets.ExampleDesign()
	if err != nil {
		f.Fatal(err)
	}
	f.Fuzz(func(t *testing.T, s string, q uint8) {
		x, ok := parse.Number(s)
		if !ok {
			if x != 0 {
				t.Errorf("%q refused but gave %g", s, x)
			}
			return
		}
		if math.IsNaN(x) || math.IsInf(x, 0) {
			t.Fatalf("%q read as %g", s, x)
		}
		quantity := display.Quantity(q % uint8(display.Probability+1))
		for _, u := range []display.System{display.SI, display.US} {
			si := u.ToSI(quantity, x)
			if !math.IsNaN(si) && !math.IsInf(si, 0) {
				continue
			}
			// A huge number in a large unit may overflow: the engine
			// must then refuse it.
			d := base
			d.FillMassKg = si
			if err := d.Validate(); err == nil {
				t.Fatalf("%q in %s gave %g and the engine took it", s, u, si)
			}
		}
	})
}
