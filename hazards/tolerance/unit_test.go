package tolerance

import (
	"errors"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"ullage/hazards"
)

// The engine's per-unit path (hazards.UnitModel, which this package relies
// on) gives the nominal unit exactly what the full assessment gives, with
// and without residual gas (which takes the gas-bubble solve).
func TestUnitModelMatchesAssess(t *testing.T) {
	lib := testLibrary(t)
	for _, tc := range []struct {
		name       string
		residualPa float64
		hottestK   float64
	}{
		{"evacuated", 0, 349.15},
		{"residual air", 2000, 349.15},
		{"supercritical", 0, 530},
	} {
		d := loadDesign(t, "ornament.json")
		d.ResidualGasPressurePa, d.HottestK = tc.residualPa, tc.hottestK
		a, err := hazards.Assess(d, lib)
		if err != nil {
			t.Fatalf("%s: %v", tc.name, err)
		}
		m, err := hazards.NewUnitModel(d, lib)
		if err != nil {
			t.Fatalf("%s: %v", tc.name, err)
		}
		u, err := m.Evaluate(hazards.Unit{FillMassKg: d.FillMassKg, HottestK: d.HottestK})
		if err != nil {
			t.Fatalf("%s: %v", tc.name, err)
		}
		for _, c := range []struct {
			what      string
			got, want float64
		}{
			{"pressure", u.Hot.PressurePa, a.Hot.PressurePa},
			{"ullage", u.Hot.UllagePercent, a.Hot.UllagePercent},
			{"volume", u.VolumeM3, a.VolumeM3},
			{"long-term burst", u.LongTermBurstPa, a.Strength.LongTermBurstPa},
			{"safety factor", u.BurstSafetyFactor, a.BurstSafetyFactor},
			{"failure probability", u.FailureProbability, a.FailureProbability},
			{"liquid-full temperature", u.LiquidFullK, a.LiquidFullK},
		} {
			// Same code, same inputs: equal to rounding.
			if !scalar.EqualWithinAbsOrRel(c.got, c.want, 1e-300, 1e-12) {
				t.Errorf("%s: %s %g from the unit model, %g from Assess", tc.name, c.what, c.got, c.want)
			}
		}
		if u.Hot.Phase != a.Hot.Phase || u.LiquidFull != (a.LiquidFullReached && a.LiquidFullK < d.HottestK) {
			t.Errorf("%s: phase %s liquid-full %v, Assess %s (liquid-full at %g K)", tc.name, u.Hot.Phase, u.LiquidFull, a.Hot.Phase, a.LiquidFullK)
		}
	}
}

func TestUnitModelBadUnit(t *testing.T) {
	lib := testLibrary(t)
	d := loadDesign(t, "ornament.json")
	m, err := hazards.NewUnitModel(d, lib)
	if err != nil {
		t.Fatal(err)
	}
	good := hazards.Unit{FillMassKg: d.FillMassKg, WallThicknessM: []float64{0.001, 0.001, 0.001}, HottestK: d.HottestK}
	tests := []struct {
		name  string
		edit  func(*hazards.Unit)
		field string
	}{
		{"no fill", func(u *hazards.Unit) { u.FillMassKg = 0 }, "unit.fill_mass_kg"},
		{"negative volume", func(u *hazards.Unit) { u.VolumeM3 = -1e-6 }, "unit.volume_m3"},
		{"too few walls", func(u *hazards.Unit) { u.WallThicknessM = u.WallThicknessM[:2] }, "unit.wall_thickness_m"},
		{"wall past the radius", func(u *hazards.Unit) { u.WallThicknessM = []float64{0.001, 0.001, 0.004} }, "unit.wall_thickness_m[2]"},
		{"frozen", func(u *hazards.Unit) { u.HottestK = 100 }, "unit.hottest_k"},
	}
	for _, tc := range tests {
		u := good
		tc.edit(&u)
		_, err := m.Evaluate(u)
		var ie *hazards.InputError
		if !errors.As(err, &ie) || ie.Field != tc.field {
			t.Errorf("%s: error %v, want an InputError for %s", tc.name, err, tc.field)
		}
	}
	u := good
	u.FillMassKg = 0.1 // more than the 83.7 g of liquid the vessel holds when sealed
	if _, err := m.Evaluate(u); !errors.Is(err, hazards.ErrOverfilled) {
		t.Errorf("overfilled unit: error %v, want ErrOverfilled", err)
	}
}
