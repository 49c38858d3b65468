package look

import (
	"image/color"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/theme"

	"ullage/app/prefs"
)

// Looks of the window, as kept in the preferences.
const (
	// Light is paper-white with dark ink, like the printed record.
	Light = prefs.LookLight
	// Dark is the same accent on a dark ground.
	Dark = prefs.LookDark
)

// Ullage's own colours: a deep blue-green accent and a warm paper
// ground, chosen for this program.
var (
	accentColour     = color.NRGBA{R: 0x1b, G: 0x6a, B: 0x72, A: 0xff}
	accentColourDark = color.NRGBA{R: 0x5c, G: 0xb3, B: 0xb9, A: 0xff}
	paperColour      = color.NRGBA{R: 0xfb, G: 0xfa, B: 0xf6, A: 0xff}
	paperInputColour = color.NRGBA{R: 0xff, G: 0xff, B: 0xff, A: 0xff}
	inkColour        = color.NRGBA{R: 0x1f, G: 0x23, B: 0x28, A: 0xff}
	ruleColour       = color.NRGBA{R: 0xd9, G: 0xd5, B: 0xcc, A: 0xff}
)

// look is the window's theme: the toolkit's own sizes, fonts and icons
// with Ullage's colours, in the light or the dark variant whatever the
// desktop asks for.
type look struct{ dark bool }

// New returns the look named by a preference value; light for anything
// but Dark.
func New(name string) fyne.Theme { return look{dark: name == Dark} }

// Color is Ullage's colour for n, or the toolkit's in the chosen variant.
func (l look) Color(n fyne.ThemeColorName, _ fyne.ThemeVariant) color.Color {
	v := theme.VariantLight
	if l.dark {
		v = theme.VariantDark
	}
	switch n {
	case theme.ColorNamePrimary, theme.ColorNameFocus, theme.ColorNameHyperlink:
		if l.dark {
			return accentColourDark
		}
		return accentColour
	}
	if !l.dark {
		switch n {
		case theme.ColorNameBackground, theme.ColorNameMenuBackground, theme.ColorNameOverlayBackground:
			return paperColour
		case theme.ColorNameInputBackground:
			return paperInputColour
		case theme.ColorNameForeground:
			return inkColour
		case theme.ColorNameSeparator, theme.ColorNameInputBorder:
			return ruleColour
		}
	}
	return theme.DefaultTheme().Color(n, v)
}

// Font is the toolkit's font.
func (look) Font(s fyne.TextStyle) fyne.Resource { return theme.DefaultTheme().Font(s) }

// Icon is the toolkit's icon.
func (look) Icon(n fyne.ThemeIconName) fyne.Resource { return theme.DefaultTheme().Icon(n) }

// Size is the toolkit's size.
func (look) Size(n fyne.ThemeSizeName) float32 { return theme.DefaultTheme().Size(n) }
