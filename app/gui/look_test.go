package gui

import (
	"testing"

	"fyne.io/fyne/v2/theme"
)

// TestLookIsKeptAndApplied: the light look is the default, the dark one
// is kept in the preferences, and both use Ullage's accent.
func TestLookIsKeptAndApplied(t *testing.T) {
	h := newHarness(t)
	p := testApp().Preferences()
	if got := loadSettings(p).Look; got != lookLight {
		t.Errorf("default look %q, want %q", got, lookLight)
	}
	st := h.s.settings
	st.Look = lookDark
	st.save(p)
	if got := loadSettings(p).Look; got != lookDark {
		t.Errorf("look after saving dark: %q", got)
	}
	light, dark := newLook(lookLight), newLook(lookDark)
	if light.Color(theme.ColorNamePrimary, theme.VariantDark) != accentColour {
		t.Error("the light look does not use the accent")
	}
	if light.Color(theme.ColorNameBackground, theme.VariantDark) != paperColour {
		t.Error("the light look is not on paper whatever the desktop's variant")
	}
	if dark.Color(theme.ColorNameBackground, theme.VariantLight) == paperColour {
		t.Error("the dark look is on paper")
	}
}
