package gui

import (
	"fmt"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/dialog"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"

	"ullage/app/look"
	"ullage/app/parse"
	"ullage/app/prefs"
	"ullage/hazards"
	"ullage/report"
)

// Unit and paper choices as shown.
const (
	unitsSIText     = "SI (°C, g, mm, mL, kPa, m³)"
	unitsUSText     = "US customary (°F, oz, in, in³, psi, ft³)"
	paperA4Text     = "A4"
	paperLetterText = "US Letter"
	lookLightText   = "Light, like the printed record"
	lookDarkText    = "Dark"
)

// preferencesPanel is the content of the preferences dialog over a copy
// of the settings.
type preferencesPanel struct {
	s        *session
	units    *widget.RadioGroup
	paper    *widget.RadioGroup
	look     *widget.RadioGroup
	reviewer *widget.Entry
	criteria map[string]*widget.Entry
	problem  *widget.Label
	object   fyne.CanvasObject
}

// newPreferencesPanel builds the preferences form from the settings.
func newPreferencesPanel(s *session) *preferencesPanel {
	p := &preferencesPanel{s: s, criteria: map[string]*widget.Entry{}}
	p.units = widget.NewRadioGroup([]string{unitsSIText, unitsUSText}, nil)
	p.units.Required = true
	p.units.SetSelected(unitsSIText)
	if s.settings.Units == unitsUS {
		p.units.SetSelected(unitsUSText)
	}
	p.paper = widget.NewRadioGroup([]string{paperA4Text, paperLetterText}, nil)
	p.paper.Horizontal = true
	p.paper.Required = true
	p.paper.SetSelected(paperA4Text)
	if s.settings.Paper == report.PaperLetter {
		p.paper.SetSelected(paperLetterText)
	}
	p.look = widget.NewRadioGroup([]string{lookLightText, lookDarkText}, nil)
	p.look.Horizontal = true
	p.look.Required = true
	p.look.SetSelected(lookLightText)
	if s.settings.Look == look.Dark {
		p.look.SetSelected(lookDarkText)
	}
	p.reviewer = widget.NewEntry()
	p.reviewer.SetText(s.settings.Reviewer)
	p.reviewer.SetPlaceHolder("your name, as printed on records")
	items := []fyne.CanvasObject{
		labelled("Units", p.units),
		labelled("Paper for records", p.paper),
		labelled("Look of the window", p.look),
		// As wide as the number fields below, clear of the scroll bar.
		labelled("Reviewer", container.NewBorder(nil, nil, nil, container.New(fixedWidth{unitWidth}), p.reviewer)),
		sectionHeading("Default review criteria for new designs"),
	}
	c := s.settings.Criteria
	for _, cp := range prefs.Criteria {
		cf, _ := formFieldAt(criterionPath(cp.Key))
		e := widget.NewEntry()
		e.SetText(entryText(*cp.Get(&c)))
		p.criteria[cp.Key] = e
		unit := widget.NewLabel(unitsSI.unit(cf.q))
		items = append(items,
			container.NewBorder(nil, nil, container.New(fixedWidth{labelWidth}, widget.NewLabel(cf.label)), container.New(fixedWidth{unitWidth}, unit), e),
			indented(hint(hazards.DefaultCriteriaGrounds[cp.Key])))
	}
	reset := widget.NewButtonWithIcon("Restore the built-in criteria", theme.HistoryIcon(), func() {
		d := hazards.DefaultCriteria()
		for _, cp := range prefs.Criteria {
			p.criteria[cp.Key].SetText(entryText(*cp.Get(&d)))
		}
	})
	p.problem = widget.NewLabel("")
	p.problem.Importance = widget.DangerImportance
	p.problem.Wrapping = fyne.TextWrapWord
	items = append(items, indented(container.NewHBox(reset)), p.problem)
	p.object = container.NewVScroll(container.NewVBox(items...))
	return p
}

// read returns the settings the panel describes, or a problem.
func (p *preferencesPanel) read() (settings, error) {
	st := p.s.settings
	st.Units = unitsSI
	if p.units.Selected == unitsUSText {
		st.Units = unitsUS
	}
	st.Paper = report.PaperA4
	if p.paper.Selected == paperLetterText {
		st.Paper = report.PaperLetter
	}
	st.Look = look.Light
	if p.look.Selected == lookDarkText {
		st.Look = look.Dark
	}
	st.Reviewer = p.reviewer.Text
	c := st.Criteria
	for _, cp := range prefs.Criteria {
		x, ok := parse.Number(p.criteria[cp.Key].Text)
		if !ok {
			return st, fmt.Errorf("%s: %q is not a number", labelOf(criterionPath(cp.Key)), p.criteria[cp.Key].Text)
		}
		*cp.Get(&c) = x
	}
	if err := prefs.CriteriaError(c); err != nil {
		pr := problemOf(err, unitsSI, func(string) (quantity, bool) { return qNumber, false })
		return st, fmt.Errorf("%s: %s", labelOf(pr.Path), pr.Text)
	}
	st.Criteria = c
	return st, nil
}

// showPreferences opens the preferences dialog.
func (s *session) showPreferences() {
	p := newPreferencesPanel(s)
	var dlg *dialog.CustomDialog
	ok := widget.NewButtonWithIcon("Save preferences", theme.ConfirmIcon(), func() {
		st, err := p.read()
		if err != nil {
			p.problem.SetText(err.Error())
			return
		}
		units := st.Units
		st.Units = s.settings.Units
		s.settings = st
		s.settings.save(s.app.Preferences())
		s.setUnits(units)
		s.applyLook()
		dlg.Hide()
	})
	ok.Importance = widget.HighImportance
	cancel := widget.NewButtonWithIcon("Cancel", theme.CancelIcon(), func() { dlg.Hide() })
	dlg = dialog.NewCustomWithoutButtons("Preferences", p.object, s.win)
	dlg.SetButtons([]fyne.CanvasObject{cancel, ok})
	dlg.Resize(fyne.NewSize(760, 640))
	s.showKeyed(dlg, ok.OnTapped, dlg.Hide)
}

// applyLook sets the window's look from the settings.
func (s *session) applyLook() {
	s.app.Settings().SetTheme(look.New(s.settings.Look))
}
