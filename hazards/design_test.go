package hazards

import (
	"errors"
	"math"
	"math/rand/v2"
	"strings"
	"testing"

	"ullage/fluids/units"
)

// TestBadInputs: every bad input is refused with an error naming the
// field, and nothing is computed.
func TestBadInputs(t *testing.T) {
	tests := []struct {
		name   string
		mutate func(*Design)
		field  string
	}{
		{"zero fill", func(d *Design) { d.FillMassKg = 0 }, "fill_mass_kg"},
		{"negative fill", func(d *Design) { d.FillMassKg = -0.001 }, "fill_mass_kg"},
		{"NaN fill", func(d *Design) { d.FillMassKg = math.NaN() }, "fill_mass_kg"},
		{"infinite volume", func(d *Design) { d.Vessel.InternalVolumeM3 = math.Inf(1) }, "vessel.internal_volume_m3"},
		{"negative volume", func(d *Design) { d.Vessel.InternalVolumeM3 = -1e-6 }, "vessel.internal_volume_m3"},
		{"no parts", func(d *Design) { d.Vessel.Parts = nil }, "vessel.parts"},
		{"wall thicker than radius", func(d *Design) { d.Vessel.Parts[0].WallThicknessM = 0.025 }, "vessel.parts[0].wall_thickness_m"},
		{"unknown shape", func(d *Design) { d.Vessel.Parts[1].Shape = "cube" }, "vessel.parts[1].shape"},
		{"tube without length", func(d *Design) { d.Vessel.Parts[2].LengthM = 0 }, "vessel.parts[2].length_m"},
		{"coldest above hottest", func(d *Design) { d.ColdestK = d.HottestK + 1 }, "coldest_k"},
		{"NaN hottest", func(d *Design) { d.HottestK = math.NaN() }, "hottest_k"},
		{"no glass", func(d *Design) { d.Glass = GlassChoice{} }, "glass.id"},
		{"unknown glass", func(d *Design) { d.Glass.ID = "crystal" }, "glass.id"},
		{"custom glass without sources", func(d *Design) {
			d.Glass = GlassChoice{Custom: &Glass{ElasticModulus: Sourced{Value: 70e9}}}
		}, "glass.custom"},
		{"unknown fluid", func(d *Design) { d.Fluid = "unobtainium" }, "fluid"},
		{"coldest below freezing", func(d *Design) { d.ColdestK = units.CelsiusToKelvin(-120) }, "coldest_k"},
		{"overfilled at sealing", func(d *Design) { d.FillMassKg = 0.1 }, "fill_mass_kg"},
		{"sealed above Tc", func(d *Design) { d.SealingTemperatureK = 600; d.HottestK = 620 }, "sealing_temperature_k"},
		{"hours beyond life", func(d *Design) { d.HoursAtHottest = 1e6 }, "hours_at_hottest"},
		{"room of zero volume", func(d *Design) { d.Room.VolumeM3 = 0 }, "room.volume_m3"},
		{"mixing factor below one", func(d *Design) { d.Room.MixingFactor = 0.5 }, "room.mixing_factor"},
		{"near field bigger than room", func(d *Design) { d.Room.NearFieldRadiusM = 3 }, "room.near_field_radius_m"},
		{"safety factor below one", func(d *Design) { d.Criteria.MinBurstSafetyFactor = 0.5 }, "criteria.min_burst_safety_factor"},
		{"unknown limit body", func(d *Design) { d.Criteria.LimitBodies = []string{"WHO"} }, "criteria.limit_bodies[0]"},
	}
	lib := testLibrary(t)
	for _, tt := range tests {
		d := typicalDesign()
		tt.mutate(&d)
		a, err := Assess(d, lib)
		if err == nil {
			t.Errorf("%s: accepted (verdict %s)", tt.name, a.Verdict)
			continue
		}
		if !errors.Is(err, ErrInvalidInput) {
			t.Errorf("%s: %v does not wrap ErrInvalidInput", tt.name, err)
		}
		if !strings.Contains(err.Error(), tt.field) {
			t.Errorf("%s: %q does not name %s", tt.name, err, tt.field)
		}
	}
}

// randomDesign draws a plausible design from wide ranges.
func randomDesign(r *rand.Rand, fluidIDs []string) Design {
	d := typicalDesign()
	d.Fluid = fluidIDs[r.IntN(len(fluidIDs))]
	od := 0.01 + 0.08*r.Float64()
	wall := od * (0.01 + 0.2*r.Float64())
	d.Vessel.Parts = []Part{{Name: "bulb", Shape: ShapeSphere, OuterDiameterM: od, WallThicknessM: wall}}
	if r.IntN(2) == 0 {
		tod := 0.004 + 0.02*r.Float64()
		d.Vessel.Parts = append(d.Vessel.Parts, Part{Name: "tube", Shape: ShapeTube, OuterDiameterM: tod, WallThicknessM: tod * (0.05 + 0.3*r.Float64()), LengthM: 0.02 + 0.3*r.Float64()})
	}
	d.Vessel.InternalVolumeM3 = 0
	vol := d.Vessel.PartsVolume()
	d.FillMassKg = vol * (10 + 1000*r.Float64())
	d.FillMassToleranceKg = 0
	d.SealingTemperatureK = units.CelsiusToKelvin(-20 + 40*r.Float64())
	d.ResidualGasPressurePa = []float64{0, 500, 20000}[r.IntN(3)]
	d.HottestK = units.CelsiusToKelvin(20 + 100*r.Float64())
	d.ColdestK = units.CelsiusToKelvin(-25 + 40*r.Float64())
	return d
}

// TestRandomDesigns: random designs never panic, never give NaN or
// infinity, and their pressure never falls with temperature.
func TestRandomDesigns(t *testing.T) {
	lib := testLibrary(t)
	var ids []string
	for _, s := range lib.All() {
		ids = append(ids, s.Fluid().ID)
	}
	r := rand.New(rand.NewPCG(1, 2))
	assessed := 0
	for i := 0; i < 300; i++ {
		d := randomDesign(r, ids)
		a, err := Assess(d, lib)
		if err != nil {
			if !errors.Is(err, ErrInvalidInput) {
				t.Errorf("design %d (%s): unexpected error kind: %v", i, d.Fluid, err)
			}
			continue
		}
		assessed++
		checkFinite(t, a)
		prev := 0.0
		for k := 0; k <= 40; k++ {
			temp := d.ColdestK + (d.HottestK+60-d.ColdestK)*float64(k)/40
			st, err := a.StateAt(temp)
			if err != nil {
				t.Errorf("design %d (%s) at %.1f K: %v", i, d.Fluid, temp, err)
				break
			}
			if st.PressurePa < prev*(1-1e-9) {
				t.Errorf("design %d (%s): pressure falls at %.1f K", i, d.Fluid, temp)
			}
			prev = st.PressurePa
		}
	}
	if assessed < 100 {
		t.Errorf("only %d of 300 random designs were assessable; the generator is too wild to test much", assessed)
	}
}

func checkFinite(t *testing.T, a *Assessment) {
	t.Helper()
	// A plain list (no map, no names built) keeps this cheap for the fuzz
	// target, which runs it on every assessable input.
	nums := [...]struct {
		name string
		x    float64
	}{
		{"hot pressure", a.Hot.PressurePa}, {"hot ullage", a.Hot.UllagePercent}, {"cold pressure", a.Cold.PressurePa},
		{"burst SF", a.BurstSafetyFactor}, {"P_f", a.FailureProbability}, {"implosion SF", a.ImplosionSafetyFactor},
		{"max safe T", a.MaxSafe.TemperatureK}, {"max safe fill", a.MaxSafe.FillMassKg}, {"stored energy", a.Rupture.StoredEnergyJ},
		{"peak", a.Release.Peak.PPM}, {"STEL", a.Release.STEL.PPM}, {"TWA", a.Release.TWA8h.PPM}, {"%LFL", a.Release.PercentLFL},
		{"liquid-full T", a.LiquidFullK},
	}
	bad := func(x float64) bool { return math.IsNaN(x) || math.IsInf(x, 0) }
	for _, n := range nums {
		if bad(n.x) {
			t.Errorf("%s (%s): %s is %v", a.Design.Fluid, a.Verdict, n.name, n.x)
		}
	}
	for _, f := range a.Findings {
		if bad(f.Value) {
			t.Errorf("%s (%s): %s value is %v", a.Design.Fluid, a.Verdict, f.Criterion, f.Value)
		}
		if bad(f.Margin) {
			t.Errorf("%s (%s): %s margin is %v", a.Design.Fluid, a.Verdict, f.Criterion, f.Margin)
		}
	}
}

// FuzzAssess: whatever numbers arrive, Assess returns an error or finite
// results, never a panic.
func FuzzAssess(f *testing.F) {
	d := typicalDesign()
	r, c := d.Room, d.Criteria
	f.Add(d.FillMassKg, d.Vessel.Parts[0].OuterDiameterM, d.Vessel.Parts[0].WallThicknessM, d.HottestK, d.ColdestK, d.SealingTemperatureK, d.ResidualGasPressurePa, d.Room.VolumeM3, 0,
		0, 1e9, r.AirChangesPerHour, r.MixingFactor, r.NearFieldRadiusM, r.NearFieldAirSpeed, r.ExposureMinutes, 0,
		d.ServiceLifeYears, d.HoursAtHottest, c.MinBurstSafetyFactor, c.MinImplosionSafetyFactor, c.MaxFailureProbability, c.MinUllagePercent, c.MaxFractionOfLimit, c.MaxPercentLFL, uint8(0))
	f.Add(0.03, 0.04, 0.001, 400.0, 250.0, 293.0, 1000.0, 3.0, 3,
		2, 5e7, 4.0, 1.0, 0.5, 0.05, 15.0, 3,
		1.0, 100.0, 2.0, 2.0, 1e-3, 0.0, 0.5, 10.0, uint8(5))
	f.Add(math.NaN(), -1.0, 0.0, math.Inf(1), 0.0, 0.0, -5.0, 0.0, math.MinInt,
		math.MinInt, math.Inf(-1), math.NaN(), 0.0, -1.0, 0.0, 0.0, math.MaxInt,
		0.0, math.NaN(), 0.0, 1e300, -1.0, 100.0, 0.0, math.Inf(1), uint8(255))
	f.Add(5e-324, 5e-324, 5e-324, 300.0, 250.0, 293.0, 0.0, 5e-324, 1,
		1, 5e-324, 0.0, 1.0, 5e-324, 5e-324, 5e-324, 1,
		5e-324, 5e-324, 1.0, 1.0, 1e-12, 50.0, 0.01, 1.0, uint8(31))
	library := testLibrary(f)
	ids := []string{}
	for _, s := range library.All() {
		ids = append(ids, s.Fluid().ID)
	}
	glasses, err := Glasses()
	if err != nil {
		f.Fatal(err)
	}
	presets, err := RoomPresets()
	if err != nil {
		f.Fatal(err)
	}
	bodies := []string{"NIOSH", "OSHA", "EPA", "AIHA", "ACGIH"}
	// pick maps any int, the smallest included, to an index below n
	// (negating math.MinInt would overflow).
	pick := func(i, n int) int { return int(uint(i) % uint(n)) }
	f.Fuzz(func(t *testing.T, fill, od, wall, hot, cold, seal, gas, room float64, fluid int,
		glass int, strength, ach, mixing, nearRadius, airSpeed, exposure float64, preset int,
		life, hours, minBurst, minImplosion, maxFailure, minUllage, maxFraction, maxLFL float64, bodyMask uint8) {
		d := typicalDesign()
		d.Fluid = ids[pick(fluid, len(ids))]
		d.FillMassKg = fill
		d.Vessel.Parts[0].OuterDiameterM = od
		d.Vessel.Parts[0].WallThicknessM = wall
		d.HottestK, d.ColdestK, d.SealingTemperatureK = hot, cold, seal
		d.ResidualGasPressurePa = gas
		d.Room.VolumeM3 = room
		// The glass: a catalogue one, or a custom copy with another
		// characteristic strength.
		if g := pick(glass, len(glasses)+1); g < len(glasses) {
			d.Glass = GlassChoice{ID: glasses[g].ID}
		} else {
			custom := glasses[0]
			custom.ID = "fuzzed"
			custom.CharacteristicStrength.Value = strength
			d.Glass = GlassChoice{Custom: &custom}
		}
		d.Room.AirChangesPerHour, d.Room.MixingFactor = ach, mixing
		d.Room.NearFieldRadiusM, d.Room.NearFieldAirSpeed, d.Room.ExposureMinutes = nearRadius, airSpeed, exposure
		if p := pick(preset, len(presets)+1); p < len(presets) {
			d.Room.PresetID = presets[p].ID
		} else {
			d.Room.PresetID = ""
		}
		d.ServiceLifeYears, d.HoursAtHottest = life, hours
		d.Criteria = Criteria{MinBurstSafetyFactor: minBurst, MinImplosionSafetyFactor: minImplosion, MaxFailureProbability: maxFailure,
			MinUllagePercent: minUllage, MaxFractionOfLimit: maxFraction, MaxPercentLFL: maxLFL}
		for i, b := range bodies {
			if bodyMask&(1<<i) != 0 {
				d.Criteria.LimitBodies = append(d.Criteria.LimitBodies, b)
			}
		}
		if bodyMask&(1<<7) != 0 {
			d.Criteria.LimitBodies = append(d.Criteria.LimitBodies, "WHO")
		}
		a, err := Assess(d, library)
		if err != nil {
			if err.Error() == "" {
				t.Error("empty error message")
			}
			return
		}
		checkFinite(t, a)
	})
}
