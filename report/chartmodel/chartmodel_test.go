package chartmodel

import (
	"encoding/json"
	"flag"
	"image/png"
	"math"
	"os"
	"path/filepath"
	"slices"
	"strconv"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"ullage/fluids"
	"ullage/fluids/units"
	"ullage/hazards"
	"ullage/hazards/tolerance"
)

var pngDir = flag.String("png", "", "write each test chart as a PNG into this folder, to look at")

func assess(t testing.TB, name string) *hazards.Assessment {
	t.Helper()
	b, err := os.ReadFile(filepath.Join("testdata", name))
	if err != nil {
		t.Fatal(err)
	}
	var d hazards.Design
	if err := json.Unmarshal(b, &d); err != nil {
		t.Fatal(err)
	}
	lib, err := fluids.Builtin()
	if err != nil {
		t.Fatal(err)
	}
	a, err := hazards.Assess(d, lib)
	if err != nil {
		t.Fatal(err)
	}
	return a
}

// si are plain SI-ish display units for the tests (°C and kPa).
var si = Units{
	Temperature: Quantity{Unit: "°C", FromSI: units.KelvinToCelsius, Format: func(k float64) string { return strconv.FormatFloat(units.KelvinToCelsius(k), 'f', 0, 64) + " °C" }},
	Pressure:    Quantity{Unit: "kPa", FromSI: func(p float64) float64 { return p / 1000 }, Format: func(p float64) string { return strconv.FormatFloat(p/1000, 'g', 3, 64) + " kPa" }},
	Number:      func(v float64) string { return strconv.FormatFloat(v, 'g', 3, 64) },
}

func labels(a Axis) []string {
	var out []string
	for _, t := range Ticks(a) {
		if t.Label != "" {
			out = append(out, t.Label)
		}
	}
	return out
}

// Expected labels are written out by hand from the tick rule in the doc
// comment of Ticks.
func TestTicks(t *testing.T) {
	cases := []struct {
		name string
		a    Axis
		want []string
	}{
		{"linear temperatures", Axis{Min: -29, Max: 101}, []string{"−20", "0", "20", "40", "60", "80", "100"}},
		{"linear fractions", Axis{Min: 0, Max: 1}, []string{"0.0", "0.2", "0.4", "0.6", "0.8", "1.0"}},
		{"log decades, all plain", Axis{Min: 1, Max: 1e4, Log: true}, []string{"1", "10", "100", "1000", "10000"}},
		{"log decades past 10⁴: all powers, never a mix", Axis{Min: 1, Max: 1e5, Log: true}, []string{"10⁰", "10¹", "10²", "10³", "10⁴", "10⁵"}},
		{"short log axis adds 2 and 5", Axis{Min: 100, Max: 1000, Log: true}, []string{"100", "200", "500", "1000"}},
		{"small decades", Axis{Min: 1e-4, Max: 1e-2, Log: true}, []string{"10⁻⁴", "2 × 10⁻⁴", "5 × 10⁻⁴", "10⁻³", "2 × 10⁻³", "5 × 10⁻³", "10⁻²"}},
		{"counts step in whole numbers", Axis{Min: 0, Max: 4, Whole: true}, []string{"0", "1", "2", "3", "4"}},
		{"counts over a wider range", Axis{Min: 0, Max: 12, Whole: true}, []string{"0", "2", "4", "6", "8", "10", "12"}},
		{"empty axis", Axis{Min: 1, Max: 1}, nil},
		{"log axis from zero", Axis{Min: 0, Max: 10, Log: true}, nil},
	}
	for _, c := range cases {
		if got := labels(c.a); !slices.Equal(got, c.want) {
			t.Errorf("%s: labels %q, want %q", c.name, got, c.want)
		}
	}
}

func TestRanges(t *testing.T) {
	cases := []struct {
		name                   string
		log                    bool
		lo, hi, wantLo, wantHi float64
	}{
		{"log decades", true, 3.7, 700, 1, 1000},
		{"short log span in 1-2-5 steps", true, 150, 900, 100, 1000},
		{"no positive minimum: three decades below the top", true, 0, 50, 0.01, 100},
		{"linear whole steps", false, 0, 107, 0, 120},
	}
	for _, c := range cases {
		f := LinearRange
		if c.log {
			f = LogRange
		}
		lo, hi := f(c.lo, c.hi)
		// Exact decimal bounds; the tolerance only absorbs binary rounding.
		if !scalar.EqualWithinAbsOrRel(lo, c.wantLo, 1e-12, 1e-9) || !scalar.EqualWithinAbsOrRel(hi, c.wantHi, 1e-12, 1e-9) {
			t.Errorf("%s: (%g, %g) gives %g, %g; want %g, %g", c.name, c.lo, c.hi, lo, hi, c.wantLo, c.wantHi)
		}
	}
}

// The one sampling loop keeps its span, adds the exact points once and
// leaves out points without an answer.
func TestSample(t *testing.T) {
	xs, ys := sample(0, 10, 10, false, []float64{2.5, 5, 11}, func(x float64) (float64, bool) { return x * x, x != 3 })
	want := []float64{0, 1, 2, 2.5, 4, 5, 6, 7, 8, 9, 10}
	if !slices.Equal(xs, want) {
		t.Fatalf("sampled at %v, want %v", xs, want)
	}
	for i := range xs {
		if ys[i] != xs[i]*xs[i] {
			t.Errorf("y(%g) = %g", xs[i], ys[i])
		}
	}
	xs, _ = sample(1, 1000, 3, true, nil, func(x float64) (float64, bool) { return x, true })
	for i, w := range []float64{1, 10, 100, 1000} {
		// Powers of ten from exp and log: a few ulps apart at most.
		if !scalar.EqualWithinAbsOrRel(xs[i], w, 0, 1e-12) {
			t.Errorf("log-spaced sample %d = %g, want %g", i, xs[i], w)
		}
	}
}

// Charts of the same kind use the same axes: every pressure chart is
// logarithmic in pressure, whether or not the design goes liquid-full.
func TestPressureAlwaysLog(t *testing.T) {
	for _, name := range []string{"revision_a_design.json", "revision_b_design.json", "liquidfull_design.json"} {
		ch := Pressure("Figure", []Side{{A: assess(t, name)}}, si)
		if !ch.Y.Log || ch.X.Log {
			t.Errorf("%s: log x %v, log y %v; want a linear temperature and a log pressure axis", name, ch.X.Log, ch.Y.Log)
		}
		if len(ch.Series) != 1 || len(ch.Series[0].X) < 100 {
			t.Errorf("%s: series %d, want one sampled curve", name, len(ch.Series))
		}
		writePNG(t, "pressure-"+strings.TrimSuffix(name, ".json"), ch)
	}
	ab := Pressure("Both", []Side{{Name: "A", A: assess(t, "revision_a_design.json")}, {Name: "B", A: assess(t, "revision_b_design.json")}}, si)
	writePNG(t, "pressure-both", ab)
}

// Each limit line of a chart has its own dash pattern.
func TestReleaseLimitsDistinct(t *testing.T) {
	ch := Release("Release", assess(t, "revision_a_design.json"), si)
	seen := map[Dash]string{}
	for _, l := range ch.Lines {
		if o, ok := seen[l.Style.Dash]; ok {
			t.Errorf("%q and %q share a dash pattern", o, l.Label)
		}
		seen[l.Style.Dash] = l.Label
	}
	if len(ch.Lines) == 0 {
		t.Error("no limit lines")
	}
	writePNG(t, "release-a", ch)
}

func writePNG(t *testing.T, name string, ch Chart) {
	t.Helper()
	img := Image(ch, 900, 480, 120, Options{})
	if b := img.Bounds(); b.Dx() != 900 || b.Dy() != 480 {
		t.Fatalf("%s: image %v", name, b)
	}
	if *pngDir == "" {
		return
	}
	f, err := os.Create(filepath.Join(*pngDir, name+".png"))
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	if err := png.Encode(f, img); err != nil {
		t.Fatal(err)
	}
}

// The fill–temperature map: a larger fill goes liquid-full at a lower
// temperature (the liquid swells into less ullage), so the liquid-full
// line falls from left to right wherever it exists.
func TestFillMapFalls(t *testing.T) {
	a := assess(t, "liquidfull_design.json")
	lib, err := fluids.Builtin()
	if err != nil {
		t.Fatal(err)
	}
	m := FillMap(a.Design, lib)
	// The map through the assessment's own fluid is the same map.
	if own := FillMapFor(a); !slices.Equal(own.FillKg, m.FillKg) || !slices.EqualFunc(own.LiquidFullK, m.LiquidFullK, func(x, y float64) bool { return x == y || (x != x && y != y) }) {
		t.Error("the map through the assessment's fluid differs from the map through the library")
	}
	// At the design's own fill (an exact sample) the line meets the
	// assessment's liquid-full temperature.
	for i, f := range m.FillKg {
		if f == a.Design.FillMassKg && m.LiquidFullK[i] != a.LiquidFullK {
			t.Errorf("liquid-full at the design fill %g K, the assessment says %g K", m.LiquidFullK[i], a.LiquidFullK)
		}
	}
	if len(m.FillKg) < 20 {
		t.Fatalf("%d fills assessed", len(m.FillKg))
	}
	prev, seen := 1e9, 0
	for i, lf := range m.LiquidFullK {
		if !(lf > 0) {
			continue
		}
		seen++
		if lf > prev+1e-6 {
			t.Errorf("liquid-full at %g K for %g kg, above %g K for a smaller fill", lf, m.FillKg[i], prev)
		}
		prev = lf
	}
	if seen == 0 {
		t.Error("no fill goes liquid-full")
	}
	kg := Quantity{Unit: "g", FromSI: func(x float64) float64 { return x * 1000 }, Format: func(x float64) string { return strconv.FormatFloat(x*1000, 'g', 3, 64) + " g" }}
	writePNG(t, "fillmap-liquidfull", FillTemperature("Fill–temperature map", m, a, si, kg))
	b := assess(t, "revision_b_design.json")
	writePNG(t, "fillmap-b", FillTemperature("Fill–temperature map", FillMap(b.Design, lib), b, si, kg))
}

// A count axis has no tick, labelled or not, between whole numbers, for
// any number of units a histogram bar can hold.
func TestWholeTicks(t *testing.T) {
	for _, hi := range []float64{1, 2, 3, 4, 5, 7, 11, 13, 40, 110, 1200} {
		lo, top := LinearRange(0, hi*1.1)
		for _, tk := range Ticks(Axis{Min: lo, Max: math.Max(math.Ceil(top), 1), Whole: true}) {
			if tk.Value != math.Trunc(tk.Value) {
				t.Errorf("count axis up to %g: tick at %g", hi, tk.Value)
			}
		}
	}
}

// TestHistogramNotesAgree: the histogram's notes agree in number with
// their counts, one unit or many.
func TestHistogramNotesAgree(t *testing.T) {
	for _, c := range []struct {
		h    tolerance.Histogram
		want []string
	}{
		{tolerance.Histogram{Edges: []float64{1, 2, 3}, Counts: []int{1, 0}, Below: 1, Above: 0, NoLoad: 1},
			[]string{"1 of 3 units is drawn; 1 lies below and 0 above the range shown.",
				"1 unit is not over-pressurised at its hottest temperature and carries no burst load; it is not drawn."}},
		{tolerance.Histogram{Edges: []float64{1, 2, 3}, Counts: []int{2, 1}, Below: 2, Above: 1, NoLoad: 2},
			[]string{"3 of 8 units are drawn; 2 lie below and 1 above the range shown.",
				"2 units are not over-pressurised at their hottest temperature and carry no burst load; they are not drawn."}},
	} {
		got := Histogram("t", c.h).Notes
		if len(got) != len(c.want) {
			t.Fatalf("%+v: notes %q, want %q", c.h, got, c.want)
		}
		for i := range got {
			if got[i] != c.want[i] {
				t.Errorf("note %d: %q, want %q", i, got[i], c.want[i])
			}
		}
	}
}
