package display

import (
	"strings"
	"testing"
	"time"

	"ullage/hazards/tolerance"
)

// The expected strings are written by hand from the doc comments.
func TestToleranceWords(t *testing.T) {
	p := tolerance.Proportion{Count: 441, Total: 2000, Estimate: 0.2205, Low: 0.2032, High: 0.2388}
	if got, want := Proportion(p), "441 of 2000 units (22.1 %, 95 % interval 20.3 – 23.9 %)"; got != want {
		t.Errorf("Proportion = %q, want %q", got, want)
	}
	if got, want := Proportion(tolerance.Proportion{Total: 2000, High: 0.00192}), "0 of 2000 units (0 %, 95 % interval 0 – 0.192 %)"; got != want {
		t.Errorf("Proportion = %q, want %q", got, want)
	}
	wall := tolerance.Driver{Key: "vessel.parts[0].wall_thickness_m", Label: "wall of lower bulb", RankCorrelation: -0.712}
	fill := tolerance.Driver{Key: tolerance.KeyFillMass, Label: "fill mass", RankCorrelation: 0.001}
	for _, c := range []struct {
		ds   []tolerance.Driver
		want string
		wall bool
	}{
		{[]tolerance.Driver{wall, fill}, "wall of lower bulb (rank correlation −0.71: a larger value lowers the margin)", true},
		{[]tolerance.Driver{fill}, "none: no varied input moves the safety factor (every rank correlation rounds to zero)", false},
		{nil, "none: no varied input moves the safety factor (every rank correlation rounds to zero)", false},
		{[]tolerance.Driver{{Key: "vessel.parts[1].wall_thickness_m", Label: "wall of riser tube", RankCorrelation: 0.4}}, "wall of riser tube (rank correlation +0.40: a larger value raises the margin)", false},
	} {
		if got := StrongestDriver(c.ds); got != c.want {
			t.Errorf("StrongestDriver = %q, want %q", got, c.want)
		}
		if got := WallLowersMargin(c.ds); got != c.wall {
			t.Errorf("WallLowersMargin(%v) = %v, want %v", c.ds, got, c.wall)
		}
	}
	if DistributionWords(tolerance.Normal) != "Normal, ± is 3σ" {
		t.Errorf("normal: %q", DistributionWords(tolerance.Normal))
	}
}

// The expected strings are written by hand from the doc comments.
func TestCountUnitsDuration(t *testing.T) {
	for _, c := range []struct {
		n    int
		want string
	}{
		{0, "0"}, {999, "999"}, {2000, "2000"}, {9999, "9999"}, {10000, "10\u00a0000"}, {100000, "100\u00a0000"},
		{10000000, "10\u00a0000\u00a0000"}, {-1234, "−1234"}, {-123456, "−123\u00a0456"},
	} {
		if got := Count(c.n); got != c.want {
			t.Errorf("Count(%d) = %q, want %q", c.n, got, c.want)
		}
	}
	if got := Units(1); got != "1 unit" {
		t.Errorf("Units(1) = %q", got)
	}
	if got := Units(100000); got != "100\u00a0000 units" {
		t.Errorf("Units(100000) = %q", got)
	}
	for _, c := range []struct {
		d    time.Duration
		want string
	}{
		{420 * time.Millisecond, "0.42 s"}, {3140 * time.Millisecond, "3.1 s"}, {59 * time.Second, "59 s"},
		{125 * time.Second, "2 min 5 s"}, {59600 * time.Millisecond, "1 min 0 s"},
	} {
		if got := Duration(c.d); got != c.want {
			t.Errorf("Duration(%v) = %q, want %q", c.d, got, c.want)
		}
	}
	if got := Spread("P1", "P50", "P99"); got != "P1 / P50 / P99" {
		t.Errorf("Spread = %q", got)
	}
	if got := Capitalised("wall of lower bulb"); got != "Wall of lower bulb" {
		t.Errorf("Capitalised = %q", got)
	}
	if got := Capitalised(""); got != "" {
		t.Errorf("Capitalised(\"\") = %q", got)
	}
}

// TestStudyWords: a study's inputs, fractions and spread in words, each
// string written by hand from the doc comments (SI and US units).
func TestStudyWords(t *testing.T) {
	r := &tolerance.Result{
		Samples: 2000, Seed: 7, HottestSpreadK: 5, HottestDistribution: tolerance.Normal, DimensionDistribution: tolerance.Uniform,
		Inputs: []tolerance.Input{
			{Key: tolerance.KeyFillMass, Label: "fill mass", Distribution: tolerance.Uniform, Nominal: 0.0283, PlusMinus: 0.0003},
			{Key: tolerance.KeyHottest, Label: "hottest temperature", Distribution: tolerance.Normal, Nominal: 323.15, PlusMinus: 5},
			{Key: "vessel.parts[1].wall_thickness_m", Label: "wall of riser tube", Distribution: tolerance.Uniform, Nominal: 0.0012, PlusMinus: 0.0002},
			{Key: tolerance.KeyGlassStrength, Label: "glass strength", Distribution: tolerance.Weibull, Nominal: 35.33e6, Shape: 7},
		},
		LiquidFullFraction:     tolerance.Proportion{Count: 1015, Total: 2000, Estimate: 0.5075, Low: 0.4856, High: 0.5294},
		BurstFraction:          tolerance.Proportion{Count: 0, Total: 2000, High: 0.00192},
		MeanFailureProbability: 0.2182,
		UnsealableUnits:        1,
		SafetyFactor:           tolerance.Percentiles{P1: 0.3051, P5: 1.234, P50: 20.44, P95: 999, P99: 1000},
		PressurePa:             tolerance.Percentiles{P1: 94100, P5: 101000, P50: 302000, P95: 1.2e6, P99: 1.53e7},
	}
	if got, want := StudyAbout(r, SI), "2000 units, seed 7; hottest temperature ± 5.0 K (Normal, ± is 3σ); fill, volume and walls Uniform, ± is the half-width."; got != want {
		t.Errorf("StudyAbout = %q, want %q", got, want)
	}
	wantIn := []StudyInput{
		{"Fill mass", "Uniform, ± is the half-width", "28.3 g", "± 0.3 g"},
		{"Hottest temperature", "Normal, ± is 3σ", "50.0 °C", "± 5.0 K"},
		{"Wall of riser tube", "Uniform, ± is the half-width", "1.2 mm", "± 0.2 mm"},
		{"Glass strength", "Weibull", "35.33 MPa", "Weibull modulus 7"},
	}
	got := StudyInputs(r, SI)
	if len(got) != len(wantIn) {
		t.Fatalf("StudyInputs: %d rows, want %d", len(got), len(wantIn))
	}
	for i := range got {
		if got[i] != wantIn[i] {
			t.Errorf("StudyInputs[%d] = %+v, want %+v", i, got[i], wantIn[i])
		}
	}
	for i, want := range []string{"28.3 g, ± 0.3 g (Uniform, ± is the half-width)", "50.0 °C, ± 5.0 K (Normal, ± is 3σ)",
		"1.2 mm, ± 0.2 mm (Uniform, ± is the half-width)", "35.33 MPa, Weibull modulus 7"} {
		if line := got[i].Line(); line != want {
			t.Errorf("StudyInputs[%d].Line() = %q, want %q", i, line, want)
		}
	}
	// 5 K is 9 °F as a difference; 50 °C is 122 °F.
	if us := StudyInputs(r, US); us[1].Nominal != "122.0 °F" || us[1].Spread != "± 9.0 °F" {
		t.Errorf("US hottest temperature: %+v", us[1])
	}
	wantFr := []Row{
		{"Liquid-full below their hottest temperature", "1015 of 2000 units (50.7 %, 95 % interval 48.6 – 52.9 %)"},
		{"Burst over the service life", "0 of 2000 units (0 %, 95 % interval 0 – 0.192 %)"},
		{"Release above a governing exposure limit", "not assessed: no published numeric limit applies to this fluid"},
		{"Expected burst fraction", "0.218 (each unit's failure probability with the strength integrated out)"},
		{"Units that could not be sealed", "1 unit: their fill would not fit as liquid; counted as liquid-full and burst"},
	}
	fr := StudyFractions(r)
	if len(fr) != len(wantFr) {
		t.Fatalf("StudyFractions: %v", fr)
	}
	for i := range fr {
		if fr[i] != wantFr[i] {
			t.Errorf("StudyFractions[%d] = %+v, want %+v", i, fr[i], wantFr[i])
		}
	}
	sp := StudySpread(r, SI)
	if want := [5]string{"94.1 kPa", "101 kPa", "302 kPa", "1200 kPa", "15300 kPa"}; sp[0].P != want {
		t.Errorf("pressure spread %v, want %v", sp[0].P, want)
	}
	if want := [5]string{"0.305", "1.23", "20.4", "999", "at least 1000"}; sp[1].P != want {
		t.Errorf("safety factor spread %v, want %v", sp[1].P, want)
	}
	wall := []tolerance.Driver{{Key: "vessel.parts[0].wall_thickness_m", Label: "wall", RankCorrelation: -0.5}}
	if n := DriversNote(wall, 1000); !strings.HasPrefix(n, "Spearman rank correlation of each input with the unit safety factor over the first 1000 units,") || !strings.HasSuffix(n, WallVolumeNote) {
		t.Errorf("DriversNote = %q", n)
	}
}
