package display

import (
	"regexp"
	"strings"
	"testing"

	"ullage/fluids"
)

// bareDegrees finds a number followed by a bare C or F ("160 C", "55 F"):
// a temperature written without its degree sign.
var bareDegrees = regexp.MustCompile(`\d\s?[CF]\b`)

// TestEveryFluidCautionReadsInItsUnits words the cautions of every
// built-in fluid in both unit systems and requires: no temperature without
// its degree sign, no unit of the other system and no brace left from the
// data's quantities in the cautions or the flammability note, and the
// flash point stated at most once in the cautions.
func TestEveryFluidCautionReadsInItsUnits(t *testing.T) {
	lib, err := fluids.Builtin()
	if err != nil {
		t.Fatal(err)
	}
	for _, sub := range lib.All() {
		f := sub.Fluid()
		for _, s := range []System{SI, US} {
			cautions := strings.Join(FluidCautions(f, s), "\n")
			all := cautions + "\n" + Warning(f.Flammability.Note, s)
			if m := bareDegrees.FindString(all); m != "" {
				t.Errorf("%s, %s: %q has no degree sign in %q", f.ID, s, m, all)
			}
			if strings.ContainsAny(all, "{}") {
				t.Errorf("%s, %s: a quantity in braces is left: %q", f.ID, s, all)
			}
			other := "°F"
			if s == US {
				other = "°C"
			}
			if strings.Contains(all, other) || strings.Contains(all, " bar") {
				t.Errorf("%s, %s: a unit of the other system in %q", f.ID, s, all)
			}
			if n := strings.Count(strings.ToLower(cautions), "flash point"); n > 1 {
				t.Errorf("%s, %s: the flash point is stated %d times", f.ID, s, n)
			}
		}
	}
}

// The expected strings follow the doc comment of Warning and Approx:
// 160 °C = 433.15 K = 320 °F; 5.7 bar = 570 kPa = 82.7 psi (1 psi =
// 6894.757 Pa, NIST SP 811 appendix B).
func TestWarningQuantities(t *testing.T) {
	for _, c := range []struct {
		s        System
		in, want string
	}{
		{SI, "autoignition about {433.15 K}.", "autoignition about 160 °C."},
		{US, "autoignition about {433.15 K}.", "autoignition about 320 °F."},
		{SI, "about {5.7e5 Pa} at {293.15 K}", "about 570 kPa at 20 °C"},
		{US, "about {5.7e5 Pa} at {293.15 K}", "about 82.7 psi at 68 °F"},
		{SI, "freezes at {256.55 K}", "freezes at −17 °C"},
		{SI, "a {brace} kept, {12 furlongs} kept, {x K} kept, {", "a {brace} kept, {12 furlongs} kept, {x K} kept, {"},
	} {
		if got := Warning(c.in, c.s); got != c.want {
			t.Errorf("Warning(%q, %s) = %q, want %q", c.in, c.s, got, c.want)
		}
	}
}
