package fluids

import (
	"encoding/json"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

// referenceSet is one fixture in testdata/reference: published values,
// each row naming its source, that the library must reproduce.
type referenceSet struct {
	Fluid          string `json:"fluid"`
	VapourPressure []struct {
		TK     float64 `json:"t_k"`
		PPa    float64 `json:"p_pa"`
		Source string  `json:"source"`
	} `json:"vapour_pressure"`
	NormalBoilingPoint struct {
		Value  float64 `json:"value"`
		Source string  `json:"source"`
	} `json:"normal_boiling_point_k"`
	LiquidDensity    []densityRow `json:"liquid_density"`
	LiquidDensityHot []densityRow `json:"liquid_density_hot"`
	PocketGuide      struct {
		Entry      string   `json:"entry"`
		RELTWA     *float64 `json:"rel_twa_ppm"`
		RELSTEL    *float64 `json:"rel_stel_ppm"`
		RELCeiling *float64 `json:"rel_ceiling_ppm"`
		PELTWA     *float64 `json:"pel_twa_ppm"`
		PELSTEL    *float64 `json:"pel_stel_ppm"`
		PELCeiling *float64 `json:"pel_ceiling_ppm"`
		IDLH       *float64 `json:"idlh_ppm"`
		Carcinogen bool     `json:"carcinogen"`
		LFL        *float64 `json:"lfl_volume_percent"`
		UFL        *float64 `json:"ufl_volume_percent"`
	} `json:"pocket_guide"`
}

type densityRow struct {
	TK     float64 `json:"t_k"`
	KgM3   float64 `json:"kg_m3"`
	Source string  `json:"source"`
}

func loadReferences(t *testing.T) []referenceSet {
	t.Helper()
	files, err := filepath.Glob("testdata/reference/*.json")
	if err != nil || len(files) == 0 {
		t.Fatalf("no reference fixtures: %v", err)
	}
	var out []referenceSet
	for _, f := range files {
		b, err := os.ReadFile(f)
		if err != nil {
			t.Fatal(err)
		}
		var r referenceSet
		if err := json.Unmarshal(b, &r); err != nil {
			t.Fatalf("%s: %v", f, err)
		}
		out = append(out, r)
	}
	return out
}

func builtinForTest(t testing.TB) *Library {
	t.Helper()
	lib, err := Builtin()
	if err != nil {
		t.Fatalf("built-in library: %v", err)
	}
	return lib
}

// TestEveryFluidHasReferences makes sure no library fluid escapes the
// published-value checks below.
func TestEveryFluidHasReferences(t *testing.T) {
	lib := builtinForTest(t)
	have := map[string]bool{}
	for _, r := range loadReferences(t) {
		have[r.Fluid] = true
	}
	for _, s := range lib.All() {
		if !have[s.Fluid().ID] {
			t.Errorf("%s has no testdata/reference fixture", s.Fluid().ID)
		}
	}
	if n := len(lib.All()); n < 20 {
		t.Errorf("library holds %d fluids, want at least 20", n)
	}
}

// TestVapourPressureAgainstPublished checks every fluid against its
// published vapour pressures (source on each row of the fixture: NIST
// Chemistry WebBook, CRC Handbook, Perry's, VDI Heat Atlas) to within 2 %,
// the accuracy asked of the library, at three or more temperatures
// between 0 °C and 0.85 Tc.
func TestVapourPressureAgainstPublished(t *testing.T) {
	lib := builtinForTest(t)
	for _, r := range loadReferences(t) {
		s, err := lib.Lookup(r.Fluid)
		if err != nil {
			t.Errorf("%s: %v", r.Fluid, err)
			continue
		}
		inBand := 0
		for _, row := range r.VapourPressure {
			got, _, err := s.SaturationPressure(row.TK)
			if err != nil {
				t.Errorf("%s at %g K: %v", r.Fluid, row.TK, err)
				continue
			}
			if !scalar.EqualWithinRel(got, row.PPa, 0.02) {
				t.Errorf("%s at %g K: Psat = %.6g Pa, published %.6g Pa (%+.2f %%), source: %s",
					r.Fluid, row.TK, got, row.PPa, 100*(got/row.PPa-1), row.Source)
			}
			if row.TK >= 273.15-1e-9 && row.TK <= 0.85*s.CriticalTemperature()+1e-9 {
				inBand++
			}
		}
		if inBand < 3 {
			t.Errorf("%s: %d published vapour pressures between 273.15 K and 0.85 Tc, want at least 3", r.Fluid, inBand)
		}
	}
}

// TestNormalBoilingPoint checks that each vapour-pressure curve boils at
// one standard atmosphere within 0.5 K of the published normal boiling
// point (source on each fixture).
func TestNormalBoilingPoint(t *testing.T) {
	lib := builtinForTest(t)
	for _, r := range loadReferences(t) {
		s, err := lib.Lookup(r.Fluid)
		if err != nil {
			t.Fatal(err)
		}
		tb, err := s.SaturationTemperature(101325)
		if err != nil {
			t.Errorf("%s: %v", r.Fluid, err)
			continue
		}
		if math.Abs(tb-r.NormalBoilingPoint.Value) > 0.5 {
			t.Errorf("%s boils at %.3f K, published %.3f K (source: %s)", r.Fluid, tb, r.NormalBoilingPoint.Value, r.NormalBoilingPoint.Source)
		}
	}
}

// TestLiquidDensityAgainstPublished checks the saturated liquid density at
// 20–25 °C within 1.5 % of the published value named in each fixture row.
func TestLiquidDensityAgainstPublished(t *testing.T) {
	lib := builtinForTest(t)
	for _, r := range loadReferences(t) {
		s, err := lib.Lookup(r.Fluid)
		if err != nil {
			t.Fatal(err)
		}
		if len(r.LiquidDensity) == 0 {
			t.Errorf("%s: no published liquid density in its fixture", r.Fluid)
		}
		for _, row := range r.LiquidDensity {
			got, err := s.SaturatedLiquidDensity(row.TK)
			if err != nil {
				t.Errorf("%s: %v", r.Fluid, err)
				continue
			}
			if !scalar.EqualWithinRel(got, row.KgM3, 0.015) {
				t.Errorf("%s at %g K: liquid density %.5g kg/m³, published %.5g (%+.2f %%), source: %s",
					r.Fluid, row.TK, got, row.KgM3, 100*(got/row.KgM3-1), row.Source)
			}
		}
	}
}

// TestPocketGuideLimits checks that the library's NIOSH and OSHA limits
// and flammability limits equal those of the NIOSH Pocket Guide to
// Chemical Hazards (DHHS (NIOSH) Publication 2005-149 and its online
// edition), as transcribed entry by entry in each fixture.
func TestPocketGuideLimits(t *testing.T) {
	lib := builtinForTest(t)
	for _, r := range loadReferences(t) {
		s, err := lib.Lookup(r.Fluid)
		if err != nil {
			t.Fatal(err)
		}
		f := s.Fluid()
		pg := r.PocketGuide
		checks := []struct {
			name            string
			body, averaging string
			kinds           []string
			want            *float64
		}{
			{"NIOSH REL TWA", "NIOSH", AveragingTWA, []string{"REL"}, pg.RELTWA},
			{"NIOSH REL STEL", "NIOSH", AveragingSTEL, []string{"REL"}, pg.RELSTEL},
			{"NIOSH REL ceiling", "NIOSH", AveragingCeiling, []string{"REL"}, pg.RELCeiling},
			{"OSHA PEL TWA", "OSHA", AveragingTWA, []string{"PEL"}, pg.PELTWA},
			{"OSHA PEL STEL", "OSHA", AveragingSTEL, []string{"PEL"}, pg.PELSTEL},
			{"OSHA PEL ceiling", "OSHA", AveragingCeiling, []string{"PEL"}, pg.PELCeiling},
			{"IDLH", "NIOSH", AveragingIDLH, []string{"IDLH"}, pg.IDLH},
		}
		for _, c := range checks {
			got := findLimit(f, c.body, c.averaging, c.kinds)
			switch {
			case c.want == nil && got != nil:
				t.Errorf("%s (%s): library has %s %g ppm, the Pocket Guide has none", r.Fluid, pg.Entry, c.name, *got)
			case c.want != nil && got == nil:
				t.Errorf("%s (%s): library lacks %s, the Pocket Guide gives %g ppm", r.Fluid, pg.Entry, c.name, *c.want)
			case c.want != nil && *got != *c.want:
				t.Errorf("%s (%s): %s = %g ppm, the Pocket Guide gives %g ppm", r.Fluid, pg.Entry, c.name, *got, *c.want)
			}
		}
		if f.PotentialCarcinogen.Value != pg.Carcinogen {
			t.Errorf("%s: potential carcinogen %v, the Pocket Guide says %v", r.Fluid, f.PotentialCarcinogen.Value, pg.Carcinogen)
		}
		if pg.LFL != nil && (f.Flammability.LFLPercent == nil || f.Flammability.LFLPercent.Value != *pg.LFL) {
			t.Errorf("%s: LFL %v, the Pocket Guide gives %g %%", r.Fluid, f.Flammability.LFLPercent, *pg.LFL)
		}
	}
}

func findLimit(f *Fluid, body, averaging string, kinds []string) *float64 {
	for _, l := range f.ExposureLimits {
		if l.Body != body || l.Averaging != averaging {
			continue
		}
		for _, k := range kinds {
			if strings.EqualFold(l.Kind, k) {
				v := l.PPM
				return &v
			}
		}
	}
	return nil
}

// TestHotLiquidDensity checks the saturated liquid density near the
// boiling point and at 0.7–0.8 Tc within 2 % of published values (source
// on each fixture row: IAPWS-95, reference equations of state used by the
// NIST Chemistry WebBook, the VDI Heat Atlas). The liquid-full temperature
// of a sealed vessel rests on this density.
func TestHotLiquidDensity(t *testing.T) {
	lib := builtinForTest(t)
	for _, r := range loadReferences(t) {
		s, err := lib.Lookup(r.Fluid)
		if err != nil {
			t.Fatal(err)
		}
		if len(r.LiquidDensityHot) == 0 {
			t.Errorf("%s: no published hot liquid density in its fixture", r.Fluid)
		}
		for _, row := range r.LiquidDensityHot {
			got, err := s.SaturatedLiquidDensity(row.TK)
			if err != nil {
				t.Errorf("%s: %v", r.Fluid, err)
				continue
			}
			if !scalar.EqualWithinRel(got, row.KgM3, 0.02) {
				t.Errorf("%s at %g K: liquid density %.5g kg/m³, published %.5g (%+.2f %%), source: %s",
					r.Fluid, row.TK, got, row.KgM3, 100*(got/row.KgM3-1), row.Source)
			}
		}
	}
}
