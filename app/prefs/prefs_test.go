package prefs

import (
	"math"
	"reflect"
	"strings"
	"testing"
	"unicode/utf8"

	"ullage/hazards"
	"ullage/report"
	"ullage/report/display"
)

// memoryStore is a preferences store in a map, as the toolkit's reads
// and writes it: a missing or mistyped key reads as the fallback.
type memoryStore map[string]any

func (m memoryStore) String(key string) string { return m.StringWithFallback(key, "") }

func (m memoryStore) StringWithFallback(key, fallback string) string {
	if s, ok := m[key].(string); ok {
		return s
	}
	return fallback
}

func (m memoryStore) FloatWithFallback(key string, fallback float64) float64 {
	if x, ok := m[key].(float64); ok {
		return x
	}
	return fallback
}

func (m memoryStore) SetString(key, value string)        { m[key] = value }
func (m memoryStore) SetFloat(key string, value float64) { m[key] = value }

func TestLoadEmptyGivesDefaults(t *testing.T) {
	s := Load(memoryStore{})
	want := Settings{Units: display.SI, Paper: report.PaperA4, Look: LookLight, Criteria: hazards.DefaultCriteria()}
	if s.Units != want.Units || s.Paper != want.Paper || s.Look != want.Look || s.Reviewer != "" || s.Criteria.MinBurstSafetyFactor != want.Criteria.MinBurstSafetyFactor {
		t.Errorf("Load of an empty store = %+v, want the defaults %+v", s, want)
	}
}

func TestSaveThenLoad(t *testing.T) {
	s := Load(memoryStore{})
	s.Units, s.Paper, s.Reviewer, s.Look = display.US, report.PaperLetter, "A. Reviewer", LookDark
	s.Criteria.MinBurstSafetyFactor = 6
	m := memoryStore{}
	s.Save(m)
	got := Load(m)
	if got.Units != s.Units || got.Paper != s.Paper || got.Reviewer != s.Reviewer || got.Look != s.Look || got.Criteria.MinBurstSafetyFactor != 6 {
		t.Errorf("saved %+v, loaded %+v", s, got)
	}
}

func TestLoadRefusesWhatIsOutOfRange(t *testing.T) {
	tests := []struct {
		name  string
		store memoryStore
		check func(Settings) bool
	}{
		{"unknown units", memoryStore{KeyUnits: "cubits"}, func(s Settings) bool { return s.Units == display.SI }},
		{"unknown paper", memoryStore{KeyPaper: "foolscap"}, func(s Settings) bool { return s.Paper == report.PaperA4 }},
		{"unknown look", memoryStore{KeyLook: "sepia"}, func(s Settings) bool { return s.Look == LookLight }},
		{"mistyped value", memoryStore{KeyPaper: 3.0}, func(s Settings) bool { return s.Paper == report.PaperA4 }},
		{"negative burst factor", memoryStore{KeyCriteriaPrefix + hazards.CriterionMinBurstSafetyFactor: -1.0},
			func(s Settings) bool { return reflect.DeepEqual(s.Criteria, hazards.DefaultCriteria()) }},
		{"NaN probability", memoryStore{KeyCriteriaPrefix + hazards.CriterionMaxFailureProbability: math.NaN()},
			func(s Settings) bool { return reflect.DeepEqual(s.Criteria, hazards.DefaultCriteria()) }},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			if s := Load(tt.store); !tt.check(s) {
				t.Errorf("Load = %+v", s)
			}
		})
	}
}

// FuzzLoadSettings: whatever the preferences hold, the settings read
// from them have a known unit system, paper and look, criteria that
// validate and a reviewer's name that is the one stored.
func FuzzLoadSettings(f *testing.F) {
	f.Add("si", "a4", "R. Reviewer", "light", 4.0, 4.0, 1e-4, 5.0, 1.0, 25.0)
	f.Add("us", "letter", "", "dark", 1.0, 100.0, 0.5, 50.0, 0.01, 100.0)
	f.Add("cubits", "", strings.Repeat("x", 300), "", math.NaN(), math.Inf(1), -1.0, 0.0, 0.0, 1e308)
	m := memoryStore{}
	f.Fuzz(func(t *testing.T, units, paper, reviewer, lookName string, burst, implosion, failure, ullage, fraction, lfl float64) {
		m.SetString(KeyUnits, units)
		m.SetString(KeyPaper, paper)
		m.SetString(KeyReviewer, reviewer)
		m.SetString(KeyLook, lookName)
		for i, x := range []float64{burst, implosion, failure, ullage, fraction, lfl} {
			m.SetFloat(KeyCriteriaPrefix+Criteria[i].Key, x)
		}
		s := Load(m)
		if s.Units != display.SI && s.Units != display.US {
			t.Errorf("units %q", s.Units)
		}
		if s.Paper != report.PaperA4 && s.Paper != report.PaperLetter {
			t.Errorf("paper %q", s.Paper)
		}
		if s.Look != LookLight && s.Look != LookDark {
			t.Errorf("look %q", s.Look)
		}
		if err := CriteriaError(s.Criteria); err != nil {
			t.Errorf("criteria from preferences do not validate: %v", err)
		}
		if s.Reviewer != reviewer || (!utf8.ValidString(s.Reviewer) && utf8.ValidString(reviewer)) {
			t.Errorf("reviewer %q came back as %q", reviewer, s.Reviewer)
		}
	})
}
