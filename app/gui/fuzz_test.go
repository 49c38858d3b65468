package gui

import (
	"math"
	"strings"
	"testing"
	"unicode/utf8"

	"fyne.io/fyne/v2/test"

	"ullage/app/parse"
	"ullage/hazards"
	"ullage/report"
)

// FuzzRestoreSnapshot: the recovery-file reader never panics on any
// bytes; what it restores is a document with a valid file, and what it
// salvages has no path (so saving it asks where).
func FuzzRestoreSnapshot(f *testing.F) {
	doc, err := exampleDocument()
	if err != nil {
		f.Fatal(err)
	}
	good, err := doc.snapshotOf(fixedNow)
	if err != nil {
		f.Fatal(err)
	}
	f.Add([]byte(`{"path": "", "name": "x", "base": "B", "saved": "2026-01-01T00:00:00Z", "file": null, "work": {}}`))
	f.Add([]byte(`{"file": {"format": "ullage-design/2"}}`))
	f.Add([]byte(`{"saved": "not a time"}`))
	f.Add([]byte("\xef\xbb\xbf{}"))
	f.Add([]byte(`[]`))
	if len(good) < 8000 {
		f.Add(good)
	}
	f.Fuzz(func(t *testing.T, b []byte) {
		d, _, err := restoreSnapshot(b)
		if err == nil {
			if d == nil || d.File == nil || d.File.Validate() != nil {
				t.Fatal("restored a document whose file does not validate")
			}
			if d.Name == "" {
				t.Error("restored document has no name")
			}
		}
		if s := salvageSnapshot(b); s != nil {
			if s.Path != "" {
				t.Errorf("salvaged work would save over %s", s.Path)
			}
			if s.Work.Validate() != nil {
				t.Error("salvaged a working copy that does not validate")
			}
		}
	})
}

// FuzzParseNumber: the form's number parser accepts only finite numbers,
// and whatever it accepts converts to a value the engine either takes or
// refuses with a message (never a NaN slipped through).
func FuzzParseNumber(f *testing.F) {
	for _, s := range []string{"0", " 12,5 ", "1e308", "-1e-320", "NaN", "inf", "1,2,3", "0x1p-2", "１２", "", ",", "1_000", "+.5", "5e-324"} {
		f.Add(s, uint8(0))
	}
	base := exampleDesignForChecks()
	f.Fuzz(func(t *testing.T, s string, q uint8) {
		x, ok := parse.Number(s)
		if !ok {
			if x != 0 {
				t.Errorf("%q refused but gave %g", s, x)
			}
			return
		}
		if math.IsNaN(x) || math.IsInf(x, 0) {
			t.Fatalf("%q read as %g", s, x)
		}
		for _, u := range []unitSystem{unitsSI, unitsUS} {
			si := u.toSI(quantity(q%uint8(qProbability+1)), x)
			if !math.IsNaN(si) && !math.IsInf(si, 0) {
				continue
			}
			// A huge number in a large unit may overflow: the engine
			// must then refuse it.
			d := base
			d.FillMassKg = si
			if err := d.Validate(); err == nil {
				t.Fatalf("%q in %s gave %g and the engine took it", s, u, si)
			}
		}
	})
}

// FuzzLoadSettings: whatever the preferences hold, the settings read
// from them have a known unit system and paper, criteria that validate
// and finite numbers.
func FuzzLoadSettings(f *testing.F) {
	f.Add("si", "a4", "R. Reviewer", 4.0, 4.0, 1e-4, 5.0, 1.0, 25.0)
	f.Add("us", "letter", "", 1.0, 100.0, 0.5, 50.0, 0.01, 100.0)
	f.Add("cubits", "", strings.Repeat("x", 300), math.NaN(), math.Inf(1), -1.0, 0.0, 0.0, 1e308)
	app := test.NewTempApp(f)
	p := app.Preferences()
	f.Fuzz(func(t *testing.T, units, paper, reviewer string, burst, implosion, failure, ullage, fraction, lfl float64) {
		p.SetString(prefUnits, units)
		p.SetString(prefPaper, paper)
		p.SetString(prefReviewer, reviewer)
		for i, x := range []float64{burst, implosion, failure, ullage, fraction, lfl} {
			p.SetFloat(prefCriteriaPrefix+criterionPrefs[i].key, x)
		}
		s := loadSettings(p)
		if s.Units != unitsSI && s.Units != unitsUS {
			t.Errorf("units %q", s.Units)
		}
		if s.Paper != report.PaperA4 && s.Paper != report.PaperLetter {
			t.Errorf("paper %q", s.Paper)
		}
		d := hazards.Design{Criteria: s.Criteria}
		if err := criteriaError(&d); err != nil {
			t.Errorf("criteria from preferences do not validate: %v", err)
		}
		if !utf8.ValidString(s.Reviewer) && utf8.ValidString(reviewer) {
			t.Error("a valid reviewer name came back broken")
		}
	})
}
