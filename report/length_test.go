package report

import (
	"bytes"
	"fmt"
	"os/exec"
	"path/filepath"
	"strings"
	"testing"

	"golang.org/x/image/font/gofont/goregular"

	"ullage/fluids"
	"ullage/hazards"
	"ullage/hazards/compare"
	"ullage/hazards/designfile"
)

// exampleRecords assesses each revision of the bundled example.
func exampleRecords(t *testing.T) (*designfile.File, []*hazards.Assessment) {
	t.Helper()
	f, err := designfile.Load(filepath.Join("..", "assets", "examples", "tidemark-lantern.json"))
	if err != nil {
		t.Fatal(err)
	}
	lib, err := fluids.Builtin()
	if err != nil {
		t.Fatal(err)
	}
	var out []*hazards.Assessment
	for _, r := range f.Revisions {
		a, err := hazards.Assess(r.Design, lib)
		if err != nil {
			t.Fatalf("revision %s: %v", r.Label, err)
		}
		out = append(out, a)
	}
	return f, out
}

// maxRecordPages is the length the default record of the bundled example
// must stay within, the calculation record left to its annex.
const maxRecordPages = 10

// TestExampleRecordLength checks that the default record of each revision
// of the bundled example stays within maxRecordPages in either unit
// system, and that the calculation record appears only when asked for.
func TestExampleRecordLength(t *testing.T) {
	f, as := exampleRecords(t)
	for i, a := range as {
		r := f.Revisions[i]
		m := Meta{Product: f.Product.Name, PartNumber: f.Product.PartNumber, Revision: r.Label, Fingerprint: r.Fingerprint()}
		for _, units := range []string{UnitsSI, UnitsUS} {
			for _, annex := range []bool{false, true} {
				path := writeTemp(t, "r.pdf", render(t, m, a, Options{Units: units, Appendix: annex}))
				pages := readInfo(t, path).pages
				if !annex && pages > maxRecordPages {
					t.Errorf("revision %s, %s: %d pages without the annex, want at most %d", r.Label, units, pages, maxRecordPages)
				}
				if got := strings.Contains(pdfText(t, path), "Calculation record"); got != annex {
					t.Errorf("revision %s, %s: annex requested %v, printed %v", r.Label, units, annex, got)
				}
				if p := signOffPage(t, path); p < 1 || p > 2 {
					t.Errorf("revision %s, %s: the sign-off is on page %d, want page 1 or 2", r.Label, units, p)
				}
			}
		}
	}
}

// signOffPage returns the page of the record that holds the sign-off
// block, 0 when none does.
func signOffPage(t *testing.T, path string) int {
	t.Helper()
	for p := 1; p <= readInfo(t, path).pages; p++ {
		out, err := exec.Command(needTool(t, "pdftotext"), "-f", fmt.Sprint(p), "-l", fmt.Sprint(p), path, "-").Output()
		if err != nil {
			t.Fatal(err)
		}
		if strings.Contains(string(out), "Prepared by") {
			return p
		}
	}
	return 0
}

// TestHyphenReadsBack checks that a part number keeps its hyphen-minus
// (U+002D) in the text of the record, drawn with the ordinary hyphen's
// glyph: the rebuilt font maps U+002D to the soft hyphen's glyph.
func TestHyphenReadsBack(t *testing.T) {
	f, as := exampleRecords(t)
	m := Meta{Product: f.Product.Name, PartNumber: "BC-TL-1", Revision: "A"}
	text := pdfText(t, writeTemp(t, "h.pdf", render(t, m, as[0], Options{})))
	if !strings.Contains(text, "BC-TL-1") {
		t.Error("part number BC-TL-1 does not read back with U+002D")
	}
	if _, ok := rebuildHyphen(shortHyphen(goregular.TTF)); !ok {
		t.Error("the regular font could not be rebuilt")
	}
}

// TestFlammabilityCautionOnce checks that the example's flammability
// caution is printed once, with the flash point in the record's units:
// ethanol's flash point in the library is 285.93 K, the NIOSH Pocket
// Guide's 55 °F converted (12.8 °C, printed to the nearest degree).
func TestFlammabilityCautionOnce(t *testing.T) {
	f, as := exampleRecords(t)
	m := Meta{Product: f.Product.Name, Revision: "A"}
	for _, c := range []struct{ units, want string }{{UnitsSI, "flash point 13 °C"}, {UnitsUS, "flash point 55 °F"}} {
		text := squash(pdfText(t, writeTemp(t, "c.pdf", render(t, m, as[0], Options{Units: c.units}))))
		if n := strings.Count(strings.ToLower(text), "flash point"); n != 2 { // the caution and the property table
			t.Errorf("%s: %q appears %d times, want twice (once in the cautions, once in the fluid's properties)", c.units, "flash point", n)
		}
		if !strings.Contains(text, c.want) {
			t.Errorf("%s: %q missing", c.units, c.want)
		}
		if strings.Contains(text, "13 C") {
			t.Errorf("%s: flash point without the degree sign", c.units)
		}
	}
}

// TestDataBehindVerdict checks that page 1 lists the soft inputs taken
// from the data's own source fields: revision B's borosilicate glass
// states its strength and Weibull modulus as assumptions in its source.
func TestDataBehindVerdict(t *testing.T) {
	f, as := exampleRecords(t)
	b := as[len(as)-1]
	var assumed []string
	for _, v := range softInputs(b) {
		if v.kind == softAssumed {
			assumed = append(assumed, v.name)
		}
	}
	if !strings.Contains(strings.Join(assumed, ","), "characteristic strength") || !strings.Contains(strings.Join(assumed, ","), "Weibull modulus") {
		t.Errorf("assumed inputs %q, want the glass strength and Weibull modulus", assumed)
	}
	path := writeTemp(t, "d.pdf", render(t, Meta{Product: f.Product.Name, Revision: "B"}, b, Options{}))
	out, err := exec.Command(needTool(t, "pdftotext"), "-f", "1", "-l", "1", path, "-").Output()
	if err != nil {
		t.Fatal(err)
	}
	if p1 := squash(string(out)); !strings.Contains(p1, "Data behind this verdict") || !strings.Contains(p1, "Stated assumptions") {
		t.Error("page 1 has no data-behind-the-verdict box with the stated assumptions")
	}
}

// TestComparisonCountsMarkedRows checks that the comparison's count of
// differing inputs equals the rows it marks, and that its findings table
// cites the limits' sources.
func TestComparisonCountsMarkedRows(t *testing.T) {
	f, as := exampleRecords(t)
	c := compare.Compare(compare.Side{Label: "A", Design: as[0].Design, Assessment: as[0]}, compare.Side{Label: "B", Design: as[1].Design, Assessment: as[1]})
	var buf bytes.Buffer
	if err := WriteComparison(&buf, Meta{Product: f.Product.Name, Revision: "A"}, Meta{Product: f.Product.Name, Revision: "B"}, c, Options{}); err != nil {
		t.Fatal(err)
	}
	text := pdfText(t, writeTemp(t, "c.pdf", buf.Bytes()))
	_, inputs, _ := strings.Cut(text, "Inputs side by side")
	inputs, _, _ = strings.Cut(inputs, "Results side by side")
	marked := strings.Count(inputs, changedMark) - 1 // the lead names the mark once
	if want := fmt.Sprintf("%d inputs differ", marked); !strings.Contains(inputs, want) {
		t.Errorf("%d rows marked, but the record does not say %q", marked, want)
	}
	if !strings.Contains(text, "Sources of the limits") {
		t.Error("the findings table cites no sources of its limits")
	}
	// The sign-off never stands alone on a page: the cautions it signs
	// for come just before it.
	path := writeTemp(t, "c2.pdf", buf.Bytes())
	p := signOffPage(t, path)
	out, err := exec.Command(needTool(t, "pdftotext"), "-f", fmt.Sprint(p), "-l", fmt.Sprint(p), path, "-").Output()
	if err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(string(out), "Prepared by") || !strings.Contains(string(out), "Read before relying on this record") {
		t.Errorf("page %d holds the sign-off without the cautions before it", p)
	}
}
