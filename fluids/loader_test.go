package fluids

import (
	"bytes"
	"errors"
	"os"
	"strings"
	"testing"
)

func TestLoadUserFluids(t *testing.T) {
	for _, name := range []string{"good_single.json", "good_collection.json"} {
		b, err := os.ReadFile("testdata/user/" + name)
		if err != nil {
			t.Fatal(err)
		}
		subs, err := LoadUserFluids(bytes.NewReader(b))
		if err != nil {
			t.Fatalf("%s: %v", name, err)
		}
		if len(subs) != 1 || !subs[0].Fluid().UserSupplied {
			t.Fatalf("%s: got %d fluids, user flag %v", name, len(subs), subs[0].Fluid().UserSupplied)
		}
		lib := builtinForTest(t)
		n := len(lib.All())
		extended := lib.With(subs...)
		if len(extended.All()) != n+1 {
			t.Errorf("%s: extended library has %d fluids, want %d", name, len(extended.All()), n+1)
		}
		if len(lib.All()) != n {
			t.Errorf("%s: built-in library changed", name)
		}
		if _, err := extended.Lookup("acetone-supplier-sheet"); err != nil {
			t.Errorf("%s: %v", name, err)
		}
	}
}

// TestLoadUserFluidsRejects checks that each bad file is refused with a
// message naming the field at fault, and that the built-in library stays
// intact.
func TestLoadUserFluidsRejects(t *testing.T) {
	tests := []struct {
		file, wantInMessage string
	}{
		{"bad_tc_below_tb.json", "critical_temperature_k"},
		{"bad_no_source.json", "molar_mass_kg_mol.source"},
		{"bad_negative_mass.json", "molar_mass_kg_mol.value"},
		{"bad_falling_pressure.json", "vapour_pressure"},
		{"bad_unknown_form.json", "vapour_pressure[0].form"},
		{"bad_unknown_field.json", "colour"},
		{"bad_wrong_boiling_point.json", "normal_boiling_point_k"},
		{"bad_limit.json", "exposure_limits[0].averaging"},
		{"bad_wrong_type.json", "molar_mass_kg_mol.value"},
		{"bad_truncated.json", "line"},
	}
	before := len(builtinForTest(t).All())
	for _, tt := range tests {
		b, err := os.ReadFile("testdata/user/" + tt.file)
		if err != nil {
			t.Fatal(err)
		}
		subs, err := LoadUserFluids(bytes.NewReader(b))
		if err == nil {
			t.Errorf("%s: accepted (%d fluids)", tt.file, len(subs))
			continue
		}
		if !errors.Is(err, ErrInvalidFluid) {
			t.Errorf("%s: error %v does not wrap ErrInvalidFluid", tt.file, err)
		}
		if !strings.Contains(err.Error(), tt.wantInMessage) {
			t.Errorf("%s: message %q does not name %q", tt.file, err, tt.wantInMessage)
		}
	}
	if after := len(builtinForTest(t).All()); after != before {
		t.Errorf("built-in library changed from %d to %d fluids", before, after)
	}
}

func TestLoadUserFluidsTooLarge(t *testing.T) {
	big := bytes.Repeat([]byte(" "), MaxUserFileBytes+10)
	if _, err := LoadUserFluids(bytes.NewReader(big)); !errors.Is(err, ErrFileTooLarge) {
		t.Errorf("got %v, want ErrFileTooLarge", err)
	}
}

// FuzzLoadUserFluids: no input may panic, and whatever is accepted must
// give finite saturation properties across its whole liquid range.
func FuzzLoadUserFluids(f *testing.F) {
	for _, name := range []string{"good_single.json", "good_collection.json", "bad_truncated.json", "bad_falling_pressure.json"} {
		b, err := os.ReadFile("testdata/user/" + name)
		if err != nil {
			f.Fatal(err)
		}
		f.Add(b)
	}
	f.Add([]byte(`{"format":"ullage-user-fluids/1","fluids":[]}`))
	f.Fuzz(func(t *testing.T, b []byte) {
		subs, err := LoadUserFluids(bytes.NewReader(b))
		if err != nil {
			return
		}
		for _, s := range subs {
			for i := 0; i <= 20; i++ {
				temp := s.MinTemperature() + (s.CriticalTemperature()-s.MinTemperature())*float64(i)/20
				sat, err := s.Saturation(temp)
				if err != nil {
					continue
				}
				if !finite(sat.PressurePa) || !finite(sat.LiquidDensity) || !finite(sat.VapourDensity) {
					t.Fatalf("accepted fluid gives non-finite state at %g K: %+v", temp, sat)
				}
			}
		}
	})
}
