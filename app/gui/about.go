package gui

import (
	"fmt"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/dialog"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"

	"ullage/app/buildinfo"
	"ullage/fluids"
	"ullage/hazards"
)

// dataSources names where the built-in numbers come from.
var dataSources = []string{
	"Exposure limits and flammability: NIOSH Pocket Guide to Chemical Hazards (DHHS (NIOSH) Publication 2005-149 and its online edition), OSHA and EPA rules, AIHA and ACGIH values where cited.",
	"Fluid properties: CRC Handbook of Chemistry and Physics, NIST Chemistry WebBook, Poling, Prausnitz and O'Connell, The Properties of Gases and Liquids, the VDI Heat Atlas, Perry's Chemical Engineers' Handbook.",
	"Glass strength: ASTM E1300 and manufacturers' glass data.",
	"Temperatures and rooms: the sources named beside each preset.",
	"Values recalled rather than looked up say \"(from memory)\"; facts of the trade without a citable source say \"common practice\". Every record lists the source of every value it used.",
}

// newAboutPanel builds the About content: version, data version,
// sources and every standard caution.
func newAboutPanel() fyne.CanvasObject {
	title := widget.NewLabelWithStyle(fmt.Sprintf("%s %s", buildinfo.Name, buildinfo.Describe()), fyne.TextAlignLeading, fyne.TextStyle{Bold: true})
	title.SizeName = theme.SizeNameHeadingText
	intro := widget.NewLabel("Reviews sealed glass devices filled with a volatile liquid: burst, implosion, liquid-full and the release of vapour into a room, revision after revision.")
	intro.Wrapping = fyne.TextWrapWord
	items := []fyne.CanvasObject{
		title, intro,
		widget.NewLabel("Fluid data version " + fluids.DataVersion),
		sectionHeading("Cautions"),
	}
	for _, c := range hazards.StandardCautions {
		l := widget.NewLabel("• " + c)
		l.Wrapping = fyne.TextWrapWord
		items = append(items, l)
	}
	items = append(items, sectionHeading("Data sources"))
	for _, s := range dataSources {
		l := widget.NewLabel("• " + s)
		l.Wrapping = fyne.TextWrapWord
		items = append(items, l)
	}
	return container.NewVScroll(container.NewVBox(items...))
}

// showAbout opens the About dialog.
func (s *session) showAbout() {
	d := dialog.NewCustom("About Ullage", "Close", newAboutPanel(), s.win)
	d.Resize(fyne.NewSize(760, 620))
	d.Show()
}
