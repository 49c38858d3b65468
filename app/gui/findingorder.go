package gui

import (
	"slices"

	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/theme"

	"ullage/app/look"
	"ullage/hazards"
)

// statusRank orders findings for the screen: fails first, then
// cautions, then findings with no published limit, then passes.
func statusRank(s hazards.Status) int {
	switch s {
	case hazards.StatusFail:
		return 0
	case hazards.StatusCaution:
		return 1
	case hazards.StatusPass:
		return 3
	}
	return 2
}

// orderFindings returns the findings with fails and cautions first, in
// the engine's order within each status; fs is not changed.
func orderFindings(fs []hazards.Finding) []hazards.Finding {
	out := slices.Clone(fs)
	slices.SortStableFunc(out, func(a, b hazards.Finding) int { return statusRank(a.Status) - statusRank(b.Status) })
	return out
}

// wantedHeight is the height the findings table needs at a width to
// show every row without scrolling in the compact theme it is drawn in:
// its heading and detail, and each row with the list's separator space.
func (fl *findingsList) wantedHeight(width float32) float32 {
	fl.fit(width)
	pad := look.Compact{}.Size(theme.SizeNamePadding)
	rows := fl.rowHeight() + pad
	if len(fl.heights) > 0 {
		rows = 0
		for _, h := range fl.heights {
			rows += h + pad
		}
	}
	return fl.object.MinSize().Height - fl.list.MinSize().Height + rows
}

// rowHeight is the height of one findings row in the compact theme.
func (fl *findingsList) rowHeight() float32 {
	return container.NewThemeOverride(fl.list.CreateItem(), look.Dense{}).MinSize().Height
}
