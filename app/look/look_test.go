package look

import (
	"testing"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/test"
	"fyne.io/fyne/v2/theme"
)

// TestLooksUseTheAccent: both looks use Ullage's accent; the light one is
// on paper whatever variant the desktop asks for, the dark one is not.
func TestLooksUseTheAccent(t *testing.T) {
	test.NewTempApp(t) // the toolkit's own colours need an app
	light, dark := New(Light), New(Dark)
	if light.Color(theme.ColorNamePrimary, theme.VariantDark) != accentColour {
		t.Error("the light look does not use the accent")
	}
	if dark.Color(theme.ColorNamePrimary, theme.VariantLight) != accentColourDark {
		t.Error("the dark look does not use its accent")
	}
	if light.Color(theme.ColorNameBackground, theme.VariantDark) != paperColour {
		t.Error("the light look is not on paper whatever the desktop's variant")
	}
	if dark.Color(theme.ColorNameBackground, theme.VariantLight) == paperColour {
		t.Error("the dark look is on paper")
	}
	if New("anything else") != New(Light) {
		t.Error("an unknown look is not the light one")
	}
}

// TestDenseIsTighterThanCompact: the findings table's theme pads less
// than the working's, which pads less than the toolkit's.
func TestDenseIsTighterThanCompact(t *testing.T) {
	for _, n := range []fyne.ThemeSizeName{theme.SizeNamePadding, theme.SizeNameInnerPadding} {
		d, c, k := Dense{}.Size(n), Compact{}.Size(n), theme.DefaultTheme().Size(n)
		if !(d < c && c < k) {
			t.Errorf("%s: dense %g, compact %g, toolkit %g", n, d, c, k)
		}
	}
}
