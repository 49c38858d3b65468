package gui

import (
	"bytes"
	"encoding/json"
	"fmt"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"testing"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/test"
	"fyne.io/fyne/v2/widget"

	"ullage/app/cli"
	"ullage/fluids"
	"ullage/hazards"
	"ullage/hazards/designfile"
	"ullage/report"
	"ullage/report/display"
)

// sameWordsDesigns returns a design file holding the designs every output
// must word alike: both revisions of the bundled example, a design that
// goes liquid-full and one that stays below ambient pressure at its
// hottest temperature.
func sameWordsDesigns(t *testing.T) (path string, labels []string) {
	t.Helper()
	f, err := designfile.Load(filepath.Join("..", "..", "assets", "examples", "tidemark-lantern.json"))
	if err != nil {
		t.Fatal(err)
	}
	base := f.Revisions[len(f.Revisions)-1]
	add := func(label, file string, change func(*hazards.Design)) {
		r := base
		r.Label = label
		if file != "" {
			b, err := os.ReadFile(filepath.Join("..", "..", "testdata", file))
			if err != nil {
				t.Fatal(err)
			}
			r.Design = hazards.Design{}
			if err := json.Unmarshal(b, &r.Design); err != nil {
				t.Fatal(err)
			}
		}
		if change != nil {
			change(&r.Design)
		}
		f.Revisions = append(f.Revisions, r)
	}
	// Liquid-full near 53 °C below its hottest 76 °C (testdata/README.md).
	add("LF", "overfilled_acetone_bulb.json", nil)
	// Dichloromethane sealed evacuated, met at 25 °C at most: its vapour
	// pressure there is about 58 kPa (CRC Handbook of Chemistry and
	// Physics, vapour pressure of dichloromethane, from memory), below
	// the ambient 101 kPa, so nothing loads the vessel towards bursting.
	add("VAC", "typical_design.json", func(d *hazards.Design) { d.HottestK = 298.15 })
	path = filepath.Join(t.TempDir(), "designs.json")
	if err := designfile.Save(path, f); err != nil {
		t.Fatal(err)
	}
	return path, f.Labels()
}

// TestEveryOutputWordsFindingsAlike renders every finding of each design,
// in SI and US units, through the window's findings table, the PDF record
// and the command line's text, and checks that the value, limit, margin
// and the facts behind each read the same in all three.
func TestEveryOutputWordsFindingsAlike(t *testing.T) {
	pdftotext, err := exec.LookPath("pdftotext")
	if err != nil {
		t.Skip("pdftotext not installed (poppler-utils)")
	}
	testApp()
	path, labels := sameWordsDesigns(t)
	f, err := designfile.Load(path)
	if err != nil {
		t.Fatal(err)
	}
	lib, err := fluids.Builtin()
	if err != nil {
		t.Fatal(err)
	}
	seen := map[string]bool{}
	checked := 0
	for _, label := range labels {
		rev, err := f.Find(label)
		if err != nil {
			t.Fatal(err)
		}
		a, err := hazards.Assess(rev.Design, lib)
		if err != nil {
			t.Fatalf("revision %s: %v", label, err)
		}
		for _, c := range []struct {
			units string
			sys   display.System
		}{{report.UnitsSI, display.SI}, {report.UnitsUS, display.US}} {
			name := label + "/" + c.units
			window, details := windowRows(t, a, c.sys == display.US)
			pdf := pdfWords(t, pdftotext, a, report.Options{Units: c.units})
			text := cliWords(t, path, label, c.units)
			if len(window) != len(a.Findings) {
				t.Fatalf("%s: the window shows %d findings of %d", name, len(window), len(a.Findings))
			}
			for i, fd := range a.Findings {
				seen[fd.Criterion+" "+string(fd.Status)] = true
				seen[string(fd.NotApplicable)] = true
				checked++
				want := display.Finding(fd, c.sys)
				if got := window[i]; got != [3]string{want.Value, want.Limit, want.Margin} {
					t.Errorf("%s %s: window %q, want %q / %q / %q", name, fd.Criterion, got, want.Value, want.Limit, want.Margin)
				}
				line := squash(want.Numbers())
				if !strings.Contains(pdf, line) {
					t.Errorf("%s %s: the PDF lacks %q", name, fd.Criterion, line)
				}
				if !strings.Contains(text, line) {
					t.Errorf("%s %s: the command line lacks %q", name, fd.Criterion, line)
				}
				// The facts behind the finding, in the chosen units.
				detail := squash(want.Text())
				if !strings.Contains(squash(details[i]), detail) || !strings.Contains(pdf, detail) || !strings.Contains(text, detail) {
					t.Errorf("%s %s: the detail %q is not the same in the window (%q), the PDF and the command line", name, fd.Criterion, detail, details[i])
				}
			}
		}
	}
	// The designs between them must reach the states worded apart.
	for _, k := range []string{hazards.CriterionUllage + " fail", hazards.CriterionUllage + " pass", hazards.CriterionBurst + " pass", string(hazards.ReasonNoBurstLoad)} {
		if !seen[k] {
			t.Errorf("no design gives %s", k)
		}
	}
	t.Logf("%d revisions, %d findings in two unit systems, each read from the window, the PDF and the command line", len(labels), checked)
}

// windowRows fills the window's findings table with an assessment's
// findings and reads each row's value, limit and margin back from its
// labels, and each finding's detail as shown when it is selected.
func windowRows(t *testing.T, a *hazards.Assessment, us bool) ([][3]string, []string) {
	t.Helper()
	fl := newFindingsList()
	fl.us = func() bool { return us }
	w := test.NewTempWindow(t, fl.object)
	w.Resize(fyne.NewSize(1000, 700))
	fl.set(a.Findings, false)
	var rows [][3]string
	var details []string
	for id := 0; id < fl.list.Length(); id++ {
		o := fl.list.CreateItem()
		fl.list.UpdateItem(id, o)
		cells := o.(*fyne.Container).Objects
		rows = append(rows, [3]string{cells[2].(*widget.Label).Text, cells[3].(*widget.Label).Text, cells[4].(*widget.Label).Text})
		fl.quiet = true
		fl.list.Select(id)
		fl.quiet = false
		details = append(details, fl.detailText())
	}
	return rows, details
}

// pdfWords writes the assessment record and returns its text with white
// space squashed, so that wrapped lines read as one, and without the
// running header and footer of each page, so that a paragraph broken
// across pages reads as one.
func pdfWords(t *testing.T, pdftotext string, a *hazards.Assessment, opts report.Options) string {
	t.Helper()
	var b bytes.Buffer
	if err := report.WriteAssessment(&b, report.Meta{Product: sameWordsProduct}, a, opts); err != nil {
		t.Fatal(err)
	}
	p := filepath.Join(t.TempDir(), "r.pdf")
	if err := os.WriteFile(p, b.Bytes(), 0o644); err != nil {
		t.Fatal(err)
	}
	out, err := exec.Command(pdftotext, "-enc", "UTF-8", "-raw", p, "-").Output()
	if err != nil {
		t.Fatal(err)
	}
	var body []string
	for _, ln := range strings.Split(string(out), "\n") {
		if !pageFurniture(ln) {
			body = append(body, ln)
		}
	}
	return squash(strings.Join(body, "\n"))
}

// sameWordsProduct names the product in the records pdfWords writes, so
// that their running headers can be told from the text.
const sameWordsProduct = "Same-words product"

// pageFurniture reports whether a line of a record's text is part of its
// running header or footer: "Page 9 of 11", or a line naming the
// product.
func pageFurniture(ln string) bool {
	var p, n int
	if k, _ := fmt.Sscanf(ln, "Page %d of %d", &p, &n); k == 2 {
		return true
	}
	return strings.Contains(ln, sameWordsProduct)
}

// cliWords runs the command line's check on one revision and returns its
// text output, squashed.
func cliWords(t *testing.T, path, label, units string) string {
	t.Helper()
	var out, errs bytes.Buffer
	cli.Run([]string{"check", "--units", units, "--rev", label, path}, &out, &errs)
	if out.Len() == 0 {
		t.Fatalf("check %s: no output; %s", label, errs.String())
	}
	return squash(out.String())
}

func squash(s string) string { return strings.Join(strings.Fields(s), " ") }

// TestEveryOutputWordsTheStudyAlike runs a tolerance study of each design
// in the window, in SI and US units, and checks that the study screen,
// the PDF record of that study and the command line's text of the same
// study (same units drawn, seed and spread) word it alike: what was drawn,
// each varied input with its distribution and what its ± stands for, the
// fractions, the spread of pressure and safety factor and the strongest
// driver.
func TestEveryOutputWordsTheStudyAlike(t *testing.T) {
	pdftotext, err := exec.LookPath("pdftotext")
	if err != nil {
		t.Skip("pdftotext not installed (poppler-utils)")
	}
	path, labels := sameWordsDesigns(t)
	h := newHarness(t)
	doc, err := loadDocument(path)
	if err != nil {
		t.Fatal(err)
	}
	h.s.open(doc)
	h.idle()
	tp := h.s.tol
	defer h.s.setUnits(unitsSI)
	checked := 0
	for _, c := range []struct {
		units, spread, spreadK string
		u                      unitSystem
	}{{report.UnitsSI, "5", "5", unitsSI}, {report.UnitsUS, "0", "0", unitsUS}} {
		h.s.setUnits(c.u)
		h.idle()
		sys := c.u.display()
		for _, label := range labels {
			name := label + "/" + c.units
			rev, err := h.s.doc.File.Find(label)
			if err != nil {
				t.Fatal(err)
			}
			h.s.doc.openRevision(rev)
			h.idle()
			h.runStudyWith("2000", "7", c.spread)
			r := h.s.currentStudy()
			if r == nil || h.s.last.assessment == nil {
				t.Fatalf("%s: no study of the working copy (status %q)", name, tp.status.Text)
			}
			window := squash(shownText(tp.object))
			pdf := pdfWords(t, pdftotext, h.s.last.assessment, report.Options{Units: c.units, Tolerance: r})
			var out, errs bytes.Buffer
			cli.Run([]string{"check", "--units", c.units, "--rev", label, "--samples", "2000", "--seed", "7", "--hot-spread-k", c.spreadK, path}, &out, &errs)
			text := squash(out.String())

			everywhere := []string{display.StudyAbout(r, sys), display.PlusMinusNote, display.StrongestDriverLabel, display.StrongestDriver(r.Sensitivity)}
			for _, in := range display.StudyInputs(r, sys) {
				everywhere = append(everywhere, in.Label, in.Distribution, in.Nominal, in.Spread)
			}
			for _, f := range display.StudyFractions(r) {
				everywhere = append(everywhere, f.Label, f.Value)
			}
			for _, sp := range display.StudySpread(r, sys) {
				everywhere = append(everywhere, sp.Label)
				// The window shows every percentile, the record and the
				// command line the 1st, 50th and 99th.
				for _, x := range sp.P {
					if !strings.Contains(window, squash(x)) {
						t.Errorf("%s: the window lacks %s percentile %q", name, sp.Label, x)
					}
				}
				three := squash(display.Spread(sp.P[0], sp.P[2], sp.P[4]))
				if !strings.Contains(pdf, three) || !strings.Contains(text, three) {
					t.Errorf("%s: %s %q is not the same in the PDF and the command line", name, sp.Label, three)
				}
			}
			if display.WallLowersMargin(r.Sensitivity) {
				everywhere = append(everywhere, display.WallVolumeNote)
			}
			for _, want := range everywhere {
				w := squash(want)
				for where, got := range map[string]string{"window": window, "PDF": pdf, "command line": text} {
					if !strings.Contains(got, w) {
						t.Errorf("%s: the %s lacks %q", name, where, w)
					}
				}
				checked++
			}
			if note := squash(display.DriversNote(r.Sensitivity, r.SensitivityUnits)); !strings.Contains(window, note) || !strings.Contains(pdf, note) {
				t.Errorf("%s: the drivers' note %q is not the same in the window and the PDF", name, note)
			}
		}
	}
	t.Logf("%d study strings of %d designs in two unit systems, each read from the window, the PDF and the command line", checked, len(labels))
}
