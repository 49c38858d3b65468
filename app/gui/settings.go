package gui

import (
	"fyne.io/fyne/v2"

	"ullage/app/look"
	"ullage/hazards"
	"ullage/report"
)

// settings are the reviewer's preferences.
type settings struct {
	Units    unitSystem
	Paper    string
	Reviewer string
	// Look is the window's look, look.Light or look.Dark.
	Look string
	// Criteria are the pass marks a new design starts with.
	Criteria hazards.Criteria
}

// criterionPref ties a default criterion to its preference key.
type criterionPref struct {
	key string // JSON field name, also the key of DefaultCriteriaGrounds
	get func(*hazards.Criteria) *float64
}

// criterionPrefs lists the numeric criteria kept in preferences.
var criterionPrefs = []criterionPref{
	{hazards.CriterionMinBurstSafetyFactor, func(c *hazards.Criteria) *float64 { return &c.MinBurstSafetyFactor }},
	{hazards.CriterionMinImplosionSafetyFactor, func(c *hazards.Criteria) *float64 { return &c.MinImplosionSafetyFactor }},
	{hazards.CriterionMaxFailureProbability, func(c *hazards.Criteria) *float64 { return &c.MaxFailureProbability }},
	{hazards.CriterionMinUllagePercent, func(c *hazards.Criteria) *float64 { return &c.MinUllagePercent }},
	{hazards.CriterionMaxFractionOfLimit, func(c *hazards.Criteria) *float64 { return &c.MaxFractionOfLimit }},
	{hazards.CriterionMaxPercentLFL, func(c *hazards.Criteria) *float64 { return &c.MaxPercentLFL }},
}

// loadSettings reads the preferences, falling back to the defaults for
// anything missing or out of range.
func loadSettings(p fyne.Preferences) settings {
	s := settings{
		Units:    parseUnitSystem(p.StringWithFallback(prefUnits, string(unitsSI))),
		Paper:    p.StringWithFallback(prefPaper, report.PaperA4),
		Reviewer: p.String(prefReviewer),
		Look:     p.StringWithFallback(prefLook, look.Light),
		Criteria: hazards.DefaultCriteria(),
	}
	if s.Look != look.Dark {
		s.Look = look.Light
	}
	if s.Paper != report.PaperA4 && s.Paper != report.PaperLetter {
		s.Paper = report.PaperA4
	}
	c := s.Criteria
	for _, cp := range criterionPrefs {
		*cp.get(&c) = p.FloatWithFallback(prefCriteriaPrefix+cp.key, *cp.get(&c))
	}
	// Criteria that would not pass validation are not used.
	probe := hazards.Design{Criteria: c}
	if err := criteriaError(&probe); err == nil {
		s.Criteria = c
	}
	return s
}

// save writes the settings to the preferences.
func (s settings) save(p fyne.Preferences) {
	p.SetString(prefUnits, string(s.Units))
	p.SetString(prefPaper, s.Paper)
	p.SetString(prefReviewer, s.Reviewer)
	p.SetString(prefLook, s.Look)
	c := s.Criteria
	for _, cp := range criterionPrefs {
		p.SetFloat(prefCriteriaPrefix+cp.key, *cp.get(&c))
	}
}

// reportOptions returns the PDF options for these settings.
func (s settings) reportOptions() report.Options {
	return report.Options{Units: string(s.Units), Paper: s.Paper}
}

// criteriaError validates only the criteria of d, returning the engine's
// error when one of them is out of range.
func criteriaError(d *hazards.Design) error {
	probe := exampleDesignForChecks()
	probe.Criteria = d.Criteria
	return probe.Validate()
}
