// Package prefs reads and writes the reviewer's settings kept between
// runs: the unit system, the paper, the reviewer's name printed on
// records, the window's look and the pass marks a new design starts
// with. Anything missing or out of range reads as the default, so a
// damaged preferences store never stops the program or slips an invalid
// criterion into a design.
package prefs

import (
	"sync"

	"ullage/assets"
	"ullage/hazards"
	"ullage/report"
	"ullage/report/display"
)

// Keys of the settings in the preferences store.
const (
	// KeyUnits holds "si" or "us".
	KeyUnits = "units"
	// KeyPaper holds "a4" or "letter".
	KeyPaper = "paper"
	// KeyReviewer holds the reviewer's name printed on records.
	KeyReviewer = "reviewer"
	// KeyLook holds the window's look, LookLight or LookDark.
	KeyLook = "look"
	// KeyCriteriaPrefix prefixes the default criteria, one key per
	// criterion named by its JSON field (criteria.min_burst_safety_factor …).
	KeyCriteriaPrefix = hazards.FieldCriteria + "."
)

// The window's two looks.
const (
	// LookLight is paper-white with dark ink, like the printed record.
	LookLight = "light"
	// LookDark is the same accent on a dark ground.
	LookDark = "dark"
)

// Store is the part of a preferences store the settings use; the
// window toolkit's preferences have these methods.
type Store interface {
	String(key string) string
	StringWithFallback(key, fallback string) string
	FloatWithFallback(key string, fallback float64) float64
	SetString(key, value string)
	SetFloat(key string, value float64)
}

// Settings are the reviewer's preferences.
type Settings struct {
	Units    display.System
	Paper    string
	Reviewer string
	// Look is LookLight or LookDark.
	Look string
	// Criteria are the pass marks a new design starts with.
	Criteria hazards.Criteria
}

// Criterion ties a numeric review criterion to its preference key.
type Criterion struct {
	// Key is the criterion's JSON field name, also its key in
	// hazards.DefaultCriteriaGrounds.
	Key string
	// Get returns the criterion's field in c.
	Get func(c *hazards.Criteria) *float64
}

// Criteria lists the numeric criteria kept in preferences, in the order
// the preferences dialog shows them.
var Criteria = []Criterion{
	{hazards.CriterionMinBurstSafetyFactor, func(c *hazards.Criteria) *float64 { return &c.MinBurstSafetyFactor }},
	{hazards.CriterionMinImplosionSafetyFactor, func(c *hazards.Criteria) *float64 { return &c.MinImplosionSafetyFactor }},
	{hazards.CriterionMaxFailureProbability, func(c *hazards.Criteria) *float64 { return &c.MaxFailureProbability }},
	{hazards.CriterionMinUllagePercent, func(c *hazards.Criteria) *float64 { return &c.MinUllagePercent }},
	{hazards.CriterionMaxFractionOfLimit, func(c *hazards.Criteria) *float64 { return &c.MaxFractionOfLimit }},
	{hazards.CriterionMaxPercentLFL, func(c *hazards.Criteria) *float64 { return &c.MaxPercentLFL }},
}

// Load reads the settings, falling back to the defaults for anything
// missing or out of range; criteria that would not pass the engine's
// validation as a whole are replaced by the defaults as a whole.
func Load(p Store) Settings {
	s := Settings{
		Units:    display.ParseSystem(p.StringWithFallback(KeyUnits, string(display.SI))),
		Paper:    p.StringWithFallback(KeyPaper, report.PaperA4),
		Reviewer: p.String(KeyReviewer),
		Look:     p.StringWithFallback(KeyLook, LookLight),
		Criteria: hazards.DefaultCriteria(),
	}
	if s.Look != LookDark {
		s.Look = LookLight
	}
	if s.Paper != report.PaperA4 && s.Paper != report.PaperLetter {
		s.Paper = report.PaperA4
	}
	c := s.Criteria
	for _, cp := range Criteria {
		*cp.Get(&c) = p.FloatWithFallback(KeyCriteriaPrefix+cp.Key, *cp.Get(&c))
	}
	if CriteriaError(c) == nil {
		s.Criteria = c
	}
	return s
}

// Save writes the settings to the store.
func (s Settings) Save(p Store) {
	p.SetString(KeyUnits, string(s.Units))
	p.SetString(KeyPaper, s.Paper)
	p.SetString(KeyReviewer, s.Reviewer)
	p.SetString(KeyLook, s.Look)
	c := s.Criteria
	for _, cp := range Criteria {
		p.SetFloat(KeyCriteriaPrefix+cp.Key, *cp.Get(&c))
	}
}

// probeDesign is the bundled example's newest design, a design valid in
// every field, into which criteria are put to be validated alone.
var probeDesign = sync.OnceValue(func() hazards.Design {
	d, err := assets.ExampleDesign()
	if err != nil {
		return hazards.Design{}
	}
	return d
})

// CriteriaError validates the criteria alone, returning the engine's
// error when one of them is out of range.
func CriteriaError(c hazards.Criteria) error {
	probe := probeDesign()
	probe.Criteria = c
	return probe.Validate()
}
