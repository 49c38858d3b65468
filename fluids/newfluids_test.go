package fluids

import (
	"encoding/json"
	"math"
	"os"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

// newFluid is one row of testdata/newfluids.json: a fluid added with a
// published reference equation of state, the names it must be found by,
// and published values, each with the source it was read from.
type newFluid struct {
	ID                 string       `json:"id"`
	Lookups            []string     `json:"lookups"`
	NormalBoilingPoint sourcedValue `json:"normal_boiling_point_k"`
	LiquidDensity298   sourcedValue `json:"liquid_density_298k_kg_m3"`
	Flammable          bool         `json:"flammable"`
	LFL                *float64     `json:"lfl_volume_percent"`
	UFL                *float64     `json:"ufl_volume_percent"`
	FlammabilitySource string       `json:"flammability_source"`
	ExposureLimits     []struct {
		Body      string  `json:"body"`
		Kind      string  `json:"kind"`
		Averaging string  `json:"averaging"`
		PPM       float64 `json:"ppm"`
		Source    string  `json:"source"`
	} `json:"exposure_limits"`
}

type sourcedValue struct {
	Value  float64 `json:"value"`
	Source string  `json:"source"`
}

func loadNewFluids(t *testing.T) []newFluid {
	t.Helper()
	b, err := os.ReadFile("testdata/newfluids.json")
	if err != nil {
		t.Fatal(err)
	}
	var doc struct {
		Fluids []newFluid `json:"fluids"`
	}
	if err := json.Unmarshal(b, &doc); err != nil {
		t.Fatalf("testdata/newfluids.json: %v", err)
	}
	if len(doc.Fluids) < 10 {
		t.Fatalf("testdata/newfluids.json lists %d fluids, want at least 10", len(doc.Fluids))
	}
	return doc.Fluids
}

// TestNewFluidsLoadAndLookup checks that every added fluid is in the
// built-in library and is found by its id, its chemical name, its ASHRAE 34
// designation with and without the hyphen, and its CAS number.
func TestNewFluidsLoadAndLookup(t *testing.T) {
	lib := builtinForTest(t)
	for _, nf := range loadNewFluids(t) {
		for _, key := range append([]string{nf.ID}, nf.Lookups...) {
			s, err := lib.Lookup(key)
			if err != nil {
				t.Errorf("%s: Lookup(%q): %v", nf.ID, key, err)
				continue
			}
			if got := s.Fluid().ID; got != nf.ID {
				t.Errorf("Lookup(%q) found %s, want %s", key, got, nf.ID)
			}
		}
	}
	if n := len(lib.All()); n < 30 {
		t.Logf("library holds %d fluids", n)
	}
}

// TestNewFluidsBoilingPoint checks that the library's vapour pressure
// reaches one standard atmosphere within 0.2 K of the cited normal boiling
// point (source on each fixture row). 0.2 K is the accuracy asked of the
// library for these fluids; the cited values are given to 0.01 K or better.
func TestNewFluidsBoilingPoint(t *testing.T) {
	lib := builtinForTest(t)
	for _, nf := range loadNewFluids(t) {
		s, err := lib.Lookup(nf.ID)
		if err != nil {
			t.Errorf("%s: %v", nf.ID, err)
			continue
		}
		tb, err := s.SaturationTemperature(101325)
		if err != nil {
			t.Errorf("%s: %v", nf.ID, err)
			continue
		}
		if want := nf.NormalBoilingPoint.Value; math.Abs(tb-want) > 0.2 {
			t.Errorf("%s boils at %.3f K, cited %.3f K (%+.3f K), source: %s", nf.ID, tb, want, tb-want, nf.NormalBoilingPoint.Source)
		}
	}
}

// TestNewFluidsLiquidDensity checks the saturated liquid density at 25 °C
// within 0.5 % of the cited value (source on each fixture row). 0.5 % is
// the accuracy asked of the library here; the reference equations state
// 0.1 % or better for saturated-liquid density near room temperature, and
// handbook densities are given to four figures.
func TestNewFluidsLiquidDensity(t *testing.T) {
	lib := builtinForTest(t)
	for _, nf := range loadNewFluids(t) {
		s, err := lib.Lookup(nf.ID)
		if err != nil {
			t.Errorf("%s: %v", nf.ID, err)
			continue
		}
		got, err := s.SaturatedLiquidDensity(298.15)
		if err != nil {
			t.Errorf("%s: %v", nf.ID, err)
			continue
		}
		want := nf.LiquidDensity298.Value
		if !scalar.EqualWithinRel(got, want, 0.005) {
			t.Errorf("%s at 298.15 K: liquid density %.5g kg/m³, cited %.5g (%+.2f %%), source: %s",
				nf.ID, got, want, 100*(got/want-1), nf.LiquidDensity298.Source)
		}
	}
}

// TestNewFluidsLimitsAndFlammability checks that each added fluid carries
// exactly the exposure limits of the cited sources (NIOSH Pocket Guide and
// IDLH documentation, OSHA tables, AIHA/OARS WEELs, ACGIH TLVs; source on
// each row) and the cited flammability: flammable or not, LFL and UFL.
func TestNewFluidsLimitsAndFlammability(t *testing.T) {
	lib := builtinForTest(t)
	for _, nf := range loadNewFluids(t) {
		s, err := lib.Lookup(nf.ID)
		if err != nil {
			t.Errorf("%s: %v", nf.ID, err)
			continue
		}
		f := s.Fluid()
		if len(f.ExposureLimits) != len(nf.ExposureLimits) {
			t.Errorf("%s: library has %d exposure limits, the cited sources give %d", nf.ID, len(f.ExposureLimits), len(nf.ExposureLimits))
		}
		for _, want := range nf.ExposureLimits {
			found := false
			for _, l := range f.ExposureLimits {
				if l.Body == want.Body && strings.EqualFold(l.Kind, want.Kind) && l.Averaging == want.Averaging {
					found = true
					if l.PPM != want.PPM {
						t.Errorf("%s: %s = %g ppm, cited %g ppm (source: %s)", nf.ID, l.Label(), l.PPM, want.PPM, want.Source)
					}
				}
			}
			if !found {
				t.Errorf("%s: no %s %s %s limit; cited %g ppm (source: %s)", nf.ID, want.Body, want.Kind, want.Averaging, want.PPM, want.Source)
			}
		}
		fl := f.Flammability
		if fl.Flammable != nf.Flammable {
			t.Errorf("%s: flammable = %v, cited %v (source: %s)", nf.ID, fl.Flammable, nf.Flammable, nf.FlammabilitySource)
		}
		checkLimit := func(name string, got *Sourced, want *float64) {
			switch {
			case want == nil && got != nil:
				t.Errorf("%s: %s %g %%, the cited source gives none (%s)", nf.ID, name, got.Value, nf.FlammabilitySource)
			case want != nil && got == nil:
				t.Errorf("%s: no %s, cited %g %% (source: %s)", nf.ID, name, *want, nf.FlammabilitySource)
			case want != nil && got.Value != *want:
				t.Errorf("%s: %s %g %%, cited %g %% (source: %s)", nf.ID, name, got.Value, *want, nf.FlammabilitySource)
			}
		}
		checkLimit("LFL", fl.LFLPercent, nf.LFL)
		checkLimit("UFL", fl.UFLPercent, nf.UFL)
	}
}
