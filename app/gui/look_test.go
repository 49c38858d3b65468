package gui

import (
	"testing"

	"ullage/app/look"
)

// TestLookIsKeptAndApplied: the light look is the default and the dark
// one is kept in the preferences (the looks themselves are tested in
// app/look).
func TestLookIsKeptAndApplied(t *testing.T) {
	h := newHarness(t)
	p := testApp().Preferences()
	if got := loadSettings(p).Look; got != look.Light {
		t.Errorf("default look %q, want %q", got, look.Light)
	}
	st := h.s.settings
	st.Look = look.Dark
	st.save(p)
	if got := loadSettings(p).Look; got != look.Dark {
		t.Errorf("look after saving dark: %q", got)
	}
}
