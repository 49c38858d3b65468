package gui

import (
	"fyne.io/fyne/v2"

	"ullage/app/prefs"
	"ullage/hazards"
	"ullage/report"
	"ullage/report/display"
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

// loadSettings reads the preferences, falling back to the defaults for
// anything missing or out of range.
func loadSettings(p fyne.Preferences) settings {
	l := prefs.Load(p)
	return settings{Units: parseUnitSystem(string(l.Units)), Paper: l.Paper, Reviewer: l.Reviewer, Look: l.Look, Criteria: l.Criteria}
}

// save writes the settings to the preferences.
func (s settings) save(p fyne.Preferences) {
	prefs.Settings{Units: display.ParseSystem(string(s.Units)), Paper: s.Paper, Reviewer: s.Reviewer, Look: s.Look, Criteria: s.Criteria}.Save(p)
}

// reportOptions returns the PDF options for these settings.
func (s settings) reportOptions() report.Options {
	return report.Options{Units: string(s.Units), Paper: s.Paper}
}
