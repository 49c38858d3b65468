package report

import (
	"bytes"
	"errors"
	"fmt"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"ullage/hazards"
	"ullage/report/display"
)

// Paper sizes in points: A4 is 210 × 297 mm (ISO 216), Letter 8.5 × 11 in
// (ANSI/ASME Y14.1); 1 pt = 1/72 in.
const (
	a4W, a4H         = 595.28, 841.89
	letterW, letterH = 612.0, 792.0
)

// squash makes every run of white space a single space.
func squash(s string) string { return strings.Join(strings.Fields(s), " ") }

func TestAssessmentReadsBack(t *testing.T) {
	a := assess(t, "typical_design.json")
	m := loadMeta(t, "meta_b.json")
	cases := []struct {
		name string
		o    Options
		w, h float64
		// want are strings the record must contain. The conversions of
		// the design's inputs are plain arithmetic on the fixture:
		// 76 °C = 168.8 °F, 30 m³ = 1059.4 ft³ (1 ft³ = 0.028316846592 m³,
		// exact), 6 g = 0.2116 oz (1 oz = 28.349523125 g, exact); inputs
		// print with four figures at most, results with three.
		want []string
	}{
		{"si-a4", Options{Units: UnitsSI, Paper: PaperA4}, a4W, a4H, []string{
			"Hottest temperature 76.0 °C", "Coldest temperature −29.0 °C", "Room volume 30 m³", "Fill mass 6 g ± 0.2 g",
			fmt.Sprintf("%.3g kPa", a.Hot.PressurePa/1000), "mg/m³", "Units SI (°C, kPa, mm, g, m³)",
		}},
		{"us-letter", Options{Units: UnitsUS, Paper: PaperLetter}, letterW, letterH, []string{
			"Hottest temperature 168.8 °F", "Room volume 1059 ft³", "Fill mass 0.2116 oz",
			fmt.Sprintf("%.3g psi", a.Hot.PressurePa/6894.757293168), "mg/m³", "US customary (°F, psi, in, oz, ft³)",
		}},
		{"si-letter", Options{Units: UnitsSI, Paper: PaperLetter}, letterW, letterH, []string{"Hottest temperature 76.0 °C"}},
		{"us-a4", Options{Units: UnitsUS, Paper: PaperA4}, a4W, a4H, []string{"Hottest temperature 168.8 °F"}},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			path := writeTemp(t, c.name+".pdf", render(t, m, a, c.o))
			info := readInfo(t, path)
			text := pdfText(t, path)
			// pdfinfo prints sizes to 0.01 pt; half a point is far below any paper mix-up.
			if !scalar.EqualWithinAbs(info.width, c.w, 0.5) || !scalar.EqualWithinAbs(info.height, c.h, 0.5) {
				t.Errorf("page size %g × %g pt, want %g × %g", info.width, info.height, c.w, c.h)
			}
			if info.pages < 5 {
				t.Errorf("%d pages, want at least 5 for a full record", info.pages)
			}
			if n := renderPages(t, path); n != info.pages {
				t.Errorf("pdftoppm drew %d pages, pdfinfo counts %d", n, info.pages)
			}
			for p := 1; p <= info.pages; p++ {
				if want := fmt.Sprintf("Page %d of %d", p, info.pages); !strings.Contains(text, want) {
					t.Errorf("missing footer %q", want)
				}
			}
			if !strings.Contains(info.title, m.Product) || !strings.Contains(info.title, "revision B") {
				t.Errorf("title %q, want the product and revision", info.title)
			}
			if info.creator != "Ullage 0.3.0" || info.author != m.Reviewer || info.subject == "" {
				t.Errorf("metadata creator %q author %q subject %q", info.creator, info.author, info.subject)
			}
			want := append([]string{
				m.Product, m.PartNumber, m.Company, m.ChangeNote, m.Fingerprint, m.FluidDataVersion, m.RevisionAuthor,
				"OVERALL VERDICT", strings.ToUpper(string(a.Verdict)), "Summary of findings",
				"Figure 1. Internal pressure against temperature", "Figure 2. Vapour concentration after a breakage",
				"Prepared by", "Reviewed by", "Approved by", "Signature",
				"Fingerprint " + m.Fingerprint[:20],
			}, c.want...)
			for _, f := range a.Findings {
				want = append(want, f.Title, squash(display.Finding(f, newUnitSystem(c.o.Units).system()).Text()))
			}
			for _, s := range want {
				if !strings.Contains(text, squash(s)) {
					t.Errorf("missing %q", s)
				}
			}
		})
	}
}

// Every caution and the source of every fluid and glass value used must be
// in the record, word for word.
func TestAssessmentCautionsAndSources(t *testing.T) {
	a := assess(t, "typical_design.json")
	text := pdfText(t, writeTemp(t, "r.pdf", render(t, loadMeta(t, "meta_b.json"), a, Options{})))
	f, g := a.Fluid, a.Glass
	want := map[string]string{
		"licensed professionals": "qualified, licensed professionals",
		"molar mass":             f.MolarMass.Source,
		"critical temperature":   f.CriticalTemperature.Source,
		"critical pressure":      f.CriticalPressure.Source,
		"critical density":       f.CriticalDensity.Source,
		"acentric factor":        f.AcentricFactor.Source,
		"boiling point":          f.NormalBoilingPoint.Source,
		"freezing point":         f.FreezingPoint.Source,
		"liquid density":         f.LiquidDensity.Source,
		"heat of vaporisation":   f.HeatOfVaporisation.Source,
		"heat capacity":          f.LiquidHeatCapacity.Source,
		"LFL":                    f.Flammability.LFLPercent.Source,
		"glass strength":         g.CharacteristicStrength.Source,
		"Weibull modulus":        g.WeibullModulus.Source,
		"stress corrosion":       g.StressCorrosionExponent.Source,
	}
	for i, c := range display.Cautions(a, display.SI) {
		want[fmt.Sprintf("caution %d", i)] = c
	}
	for i, p := range f.VapourPressure {
		want[fmt.Sprintf("vapour-pressure piece %d", i)] = p.Source
	}
	for i, l := range f.ExposureLimits {
		want[fmt.Sprintf("exposure limit %d", i)] = l.Source
	}
	for what, s := range want {
		if !strings.Contains(text, squash(s)) {
			t.Errorf("%s: missing %q", what, s)
		}
	}
}

// A value computed outside a correlation's range is marked.
func TestAssessmentMarksExtrapolation(t *testing.T) {
	cases := []struct {
		design string
		marked bool
	}{
		{"extrapolated_design.json", true}, // water's equation of state (IAPWS-95) is stated from the triple point, 273.16 K; the design's coldest is 273.15 K
		{"typical_design.json", false},
	}
	for _, c := range cases {
		a := assess(t, c.design)
		if a.Flags.Extrapolated() != c.marked {
			t.Fatalf("%s: fixture flags %s, want extrapolated = %v", c.design, a.Flags, c.marked)
		}
		text := pdfText(t, writeTemp(t, "r.pdf", render(t, loadMeta(t, "meta_b.json"), a, Options{})))
		if got := strings.Contains(text, "‡"); got != c.marked {
			t.Errorf("%s: mark ‡ shown = %v, want %v", c.design, got, c.marked)
		}
		if c.marked && !strings.Contains(text, "outside the equation of state's stated range") {
			t.Errorf("%s: the stretched correlation is not named", c.design)
		}
	}
}

// A vessel that goes liquid-full gets the log pressure axis and the
// liquid-full point marked.
func TestAssessmentLiquidFull(t *testing.T) {
	a := assess(t, "liquidfull_design.json")
	if !a.LiquidFullReached || a.Hot.Phase != hazards.PhaseLiquidFull {
		t.Fatalf("fixture: liquid-full %v at %.1f K, hot phase %s", a.LiquidFullReached, a.LiquidFullK, a.Hot.Phase)
	}
	text := pdfText(t, writeTemp(t, "r.pdf", render(t, loadMeta(t, "meta_a.json"), a, Options{})))
	for _, s := range []string{
		"log scale", fmt.Sprintf("Liquid-full at %.1f °C", a.LiquidFullK-273.15), "liquid-full", "FAIL",
	} {
		if !strings.Contains(text, s) {
			t.Errorf("missing %q", s)
		}
	}
}

type failingWriter struct{}

var errDiskFull = errors.New("disk full")

func (failingWriter) Write([]byte) (int, error) { return 0, errDiskFull }

func TestAssessmentErrors(t *testing.T) {
	a := assess(t, "typical_design.json")
	cases := []struct {
		name  string
		a     *hazards.Assessment
		o     Options
		field string
	}{
		{"units", a, Options{Units: "imperial"}, "Units"},
		{"paper", a, Options{Paper: "A3"}, "Paper"},
		{"nil assessment", nil, Options{}, "assessment"},
		{"empty assessment", &hazards.Assessment{}, Options{}, "assessment"},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			var buf bytes.Buffer
			err := WriteAssessment(&buf, Meta{}, c.a, c.o)
			var oe *OptionError
			if !errors.As(err, &oe) || !errors.Is(err, ErrInvalidOptions) || oe.Field != c.field {
				t.Fatalf("error %v, want an *OptionError for %s", err, c.field)
			}
			if oe.Want == "" || buf.Len() != 0 {
				t.Errorf("error %q says nothing acceptable, or %d bytes were written", err, buf.Len())
			}
		})
	}
	if err := WriteAssessment(failingWriter{}, Meta{}, a, Options{}); !errors.Is(err, errDiskFull) {
		t.Errorf("writer failure: %v, want it wrapped", err)
	}
}

// An empty header prints blanks to fill in by hand, never a panic.
func TestAssessmentEmptyMeta(t *testing.T) {
	text := pdfText(t, writeTemp(t, "r.pdf", render(t, Meta{}, assess(t, "typical_design.json"), Options{})))
	for _, s := range []string{"unnamed product", "______________", "Page 1 of"} {
		if !strings.Contains(strings.ToLower(text), strings.ToLower(s)) {
			t.Errorf("missing %q", s)
		}
	}
}

// TestIsRecord: a record this package wrote is recognised; other files,
// including a PDF that merely mentions Ullage, are not.
func TestIsRecord(t *testing.T) {
	pdf := render(t, loadMeta(t, "meta_a.json"), assess(t, "typical_design.json"), Options{})
	if !IsRecord(pdf) {
		t.Error("our own record is not recognised")
	}
	for _, other := range []string{"", "{\"format\": \"ullage-design/2\"}", "%PDF-1.4\n/Creator (Ullage)\n", "/Creator (\xFE\xFF\x00U\x00l\x00l\x00a\x00g\x00e)"} {
		if IsRecord([]byte(other)) {
			t.Errorf("%q is taken for a record", other)
		}
	}
}
