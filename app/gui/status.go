package gui

import (
	"image/color"
	"ullage/report/display"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/theme"

	"ullage/hazards"
)

// statusWord is a status in capitals, readable without colour.
func statusWord(s hazards.Status) string { return display.StatusWord(s) }

// statusIcon gives each status a shape of its own — a tick, a warning
// triangle, a cross — coloured as well, so that neither colour nor shape
// alone carries the meaning.
func statusIcon(s hazards.Status) fyne.Resource {
	switch s {
	case hazards.StatusPass:
		return theme.NewSuccessThemedResource(theme.ConfirmIcon())
	case hazards.StatusCaution:
		return theme.NewWarningThemedResource(theme.WarningIcon())
	case hazards.StatusFail:
		return theme.NewErrorThemedResource(theme.CancelIcon())
	}
	return theme.QuestionIcon()
}

// statusColour is the theme colour of a status.
func statusColour(s hazards.Status) color.Color {
	v := fyne.CurrentApp().Settings().ThemeVariant()
	th := fyne.CurrentApp().Settings().Theme()
	switch s {
	case hazards.StatusPass:
		return th.Color(theme.ColorNameSuccess, v)
	case hazards.StatusCaution:
		return th.Color(theme.ColorNameWarning, v)
	case hazards.StatusFail:
		return th.Color(theme.ColorNameError, v)
	}
	return th.Color(theme.ColorNameForeground, v)
}

// tint returns a colour at low opacity, for a banner's background.
func tint(c color.Color, alpha uint8) color.Color {
	r, g, b, _ := c.RGBA()
	return color.NRGBA{R: uint8(r >> 8), G: uint8(g >> 8), B: uint8(b >> 8), A: alpha}
}
