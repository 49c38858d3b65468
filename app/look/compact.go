package look

import (
	"image/color"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/theme"
)

// Compact is the app's theme with tighter padding, for long runs of
// short lines such as the steps of the working. Everything but the
// padding comes from the theme in use when it is asked.
type Compact struct{}

// current is the theme in use.
func (Compact) current() fyne.Theme { return fyne.CurrentApp().Settings().Theme() }

// Color is the current theme's colour.
func (t Compact) Color(n fyne.ThemeColorName, v fyne.ThemeVariant) color.Color {
	return t.current().Color(n, v)
}

// Font is the current theme's font.
func (t Compact) Font(s fyne.TextStyle) fyne.Resource { return t.current().Font(s) }

// Icon is the current theme's icon.
func (t Compact) Icon(n fyne.ThemeIconName) fyne.Resource { return t.current().Icon(n) }

// Size is the current theme's size, with less padding around text.
func (t Compact) Size(n fyne.ThemeSizeName) float32 {
	switch n {
	case theme.SizeNameInnerPadding:
		return 3
	case theme.SizeNamePadding:
		return 2
	}
	return t.current().Size(n)
}

// Dense is Compact with the least padding that still keeps rows apart,
// for the findings table, whose every row must stay in view on a 1280×800
// screen.
type Dense struct{ Compact }

// Size is Compact's size with tighter padding still.
func (t Dense) Size(n fyne.ThemeSizeName) float32 {
	switch n {
	case theme.SizeNameInnerPadding:
		return 2
	case theme.SizeNamePadding:
		return 1
	}
	return t.Compact.Size(n)
}
