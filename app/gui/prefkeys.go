package gui

import "ullage/app/prefs"

// Preference keys. Every value the program keeps between runs is stored
// under one of these names in the app's preferences.
const (
	// prefUnits holds "si" or "us".
	prefUnits = prefs.KeyUnits
	// prefPaper holds "a4" or "letter".
	prefPaper = prefs.KeyPaper
	// prefReviewer holds the reviewer's name printed on records.
	prefReviewer = prefs.KeyReviewer
	// prefRecent holds the recently opened design files, newest first.
	prefRecent = "recent_files"
	// prefCriteriaPrefix prefixes the default criteria, one key per
	// criterion named by its JSON field (criteria.min_burst_safety_factor …).
	prefCriteriaPrefix = prefs.KeyCriteriaPrefix
	// prefUserFluids holds the paths of the fluid files the reviewer
	// added, reloaded at start.
	prefUserFluids = "user_fluid_files"
	// prefLook holds the window's look, look.Light or look.Dark.
	prefLook = prefs.KeyLook
	// prefLastFolder holds the folder of the last file opened or saved.
	prefLastFolder = "last_folder"
)

// maxRecent is the number of recent files remembered.
const maxRecent = 8
