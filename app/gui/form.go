package gui

import (
	"cmp"
	"slices"
	"strings"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"

	"ullage/app/parse"
	"ullage/hazards"
)

// designForm is the left-hand form: every input of the working copy,
// grouped the way a reviewer goes through a design.
type designForm struct {
	s *session
	// fields are the number fields outside the parts list, in form order;
	// partFields those of the parts list, rebuilt with it.
	fields     []*numField
	partFields []*numField
	byPath     map[string]*numField

	product  *productSection
	fluid    *fluidSection
	vessel   *vesselSection
	temps    *temperatureSection
	shock    *shockSection
	room     *roomSection
	criteria *criteriaSection

	// scroll holds the sections; sections are their objects in order.
	scroll   *container.Scroll
	sections []fyne.CanvasObject

	// general shows a problem that belongs to no single number field.
	general    *widget.Label
	generalRow *fyne.Container

	object fyne.CanvasObject
}

// newDesignForm builds the form with all its sections.
func newDesignForm(s *session) *designForm {
	f := &designForm{s: s, byPath: map[string]*numField{}}
	s.form = f
	s.changes.subscribe(f.update)
	f.general = widget.NewLabel("")
	f.general.Wrapping = fyne.TextWrapWord
	f.general.Importance = widget.DangerImportance
	f.generalRow = container.NewBorder(nil, nil, widget.NewIcon(theme.ErrorIcon()), nil, f.general)
	f.generalRow.Hide()
	f.sections = []fyne.CanvasObject{
		newProductSection(f),
		newFluidSection(f),
		newVesselSection(f),
		newTemperatureSection(f),
		newShockSection(f),
		newRoomSection(f),
		newCriteriaSection(f),
	}
	// The form table decides the order of the fields, whatever the order
	// the sections made them in.
	slices.SortStableFunc(f.fields, func(a, b *numField) int { return cmp.Compare(fieldRank(a.path), fieldRank(b.path)) })
	f.scroll = container.NewVScroll(container.NewVBox(f.sections...))
	// Opening and closing the working beside the form lays the form out
	// again at its new height; it redraws what changed itself.
	f.object = newRelaidBox(container.NewBorder(f.generalRow, nil, nil, nil, f.scroll))
	return f
}

// reveal scrolls the form to the field a problem names and puts the
// cursor in it.
func (f *designForm) reveal(p *problem) {
	if p == nil {
		return
	}
	var target fyne.CanvasObject
	var focus fyne.Focusable
	if nf, ok := f.byPath[p.Path]; ok {
		target, focus = nf.object, nf.entry
	} else if p.Path == hazards.FieldFluid {
		target, focus = f.fluid.choose, f.fluid.choose
	} else if strings.HasPrefix(p.Path, hazards.FieldGlass) {
		target, focus = f.vessel.glass, f.vessel.glass
	} else if strings.HasPrefix(p.Path, hazards.FieldVessel+".") {
		target = f.vessel.parts
	}
	if target == nil {
		return
	}
	d := fyne.CurrentApp().Driver()
	y := d.AbsolutePositionForObject(target).Y - d.AbsolutePositionForObject(f.scroll.Content).Y
	f.scroll.ScrollToOffset(fyne.NewPos(0, max(y-60, 0)))
	if focus != nil {
		if c := fyne.CurrentApp().Driver().CanvasForObject(f.scroll); c != nil {
			c.Focus(focus)
		}
	}
}

// scrollTo brings section i (0 product … 6 criteria) to the top.
func (f *designForm) scrollTo(i int) {
	if i < 0 || i >= len(f.sections) {
		return
	}
	f.scroll.ScrollToOffset(fyne.NewPos(0, f.sections[i].Position().Y))
}

// field creates the number field of the form at path (one of
// formFields) and registers it.
func (f *designForm) field(path string) *numField {
	ff, ok := formFieldAt(path)
	if !ok {
		panic("gui: no form field " + path)
	}
	nf := newNumField(ff, f.typed)
	f.fields = append(f.fields, nf)
	f.byPath[path] = nf
	return nf
}

// typed handles a keystroke in a number field: the number goes into the
// document, or the document notes that the text is not one.
func (f *designForm) typed(nf *numField) {
	doc := f.s.doc
	if x, ok := parse.Number(nf.entry.Text); ok {
		doc.typeNumber(nf.path, f.s.units().toSI(nf.q, x))
	} else {
		doc.typeUnreadable(nf.path, nf.entry.Text)
	}
}

// update shows a change of the review on the form. A field the reviewer
// typed in shows the text already; what follows from it (presets, the
// volume of the parts, the revision line) is brought in step.
func (f *designForm) update(c change) {
	switch {
	case c.cause.reload():
		f.load()
	case c.cause == causeLibrary:
		f.fluid.load()
	case c.cause == causeTyped:
		if _, unread := f.s.doc.unread[c.field]; !unread {
			f.follow(c.field)
		}
		f.updateHeader()
	case c.cause == causeChosen:
		f.showChosen(c.field)
		f.updateHeader()
	case c.cause == causeKept:
		f.updateHeader()
	}
	f.showProblems(f.s.problem)
}

// follow keeps the preset selectors and the volume of the parts in step
// with a value typed at path.
func (f *designForm) follow(path string) {
	switch {
	case path == hazards.FieldHottest || path == hazards.FieldColdest:
		f.temps.syncPresets()
	case strings.HasPrefix(path, hazards.FieldRoom+"."):
		f.room.syncPick()
	case strings.HasPrefix(path, hazards.FieldVessel+"."):
		f.vessel.updateVolume()
	case strings.HasPrefix(path, hazards.FieldThermalShock+"."):
		f.shock.syncPresets()
	}
}

// showChosen redraws what a choice at path changed: the number fields at
// or below it, and the notes that describe the choice.
func (f *designForm) showChosen(path string) {
	d, u := &f.s.doc.Work, f.s.units()
	for _, nf := range f.fields {
		if below(nf.path, path) {
			nf.show(d, u)
		}
	}
	switch path {
	case hazards.FieldFluid:
		f.fluid.describe()
	case hazards.FieldGlass:
		f.vessel.describeGlass()
	case hazards.FieldParts:
		f.vessel.rebuildParts()
		f.vessel.updateVolume()
	case hazards.FieldHottest, hazards.FieldColdest:
		f.temps.describeAll()
	case hazards.FieldHotToCold, hazards.FieldColdToHot:
		f.shock.describeAll()
	case hazards.FieldRoom, hazards.FieldRoomPreset:
		f.room.describe()
	}
}

// load fills every widget from the document.
func (f *designForm) load() {
	d := &f.s.doc.Work
	u := f.s.units()
	f.product.load()
	f.fluid.load()
	f.vessel.load()
	for _, nf := range f.fields {
		nf.show(d, u)
	}
	f.temps.syncPresets()
	f.shock.syncPresets()
	f.room.load()
	f.criteria.load()
	f.showUnread()
	f.showProblems(f.s.problem)
}

// showUnread empties the entries of the required fields of a new design
// not typed yet; showProblems marks each as required, which holds the
// assessment back.
func (f *designForm) showUnread() {
	unread := f.s.doc.unread
	if len(unread) == 0 {
		return
	}
	for _, nf := range f.all() {
		if e, ok := unread[nf.path]; ok && !e.typed {
			showText(nf.entry, "")
		}
	}
}

// updateHeader refreshes the line saying which revision is being edited.
func (f *designForm) updateHeader() { f.product.updateHeader() }

// all returns every number field in form order.
func (f *designForm) all() []*numField {
	out := make([]*numField, 0, len(f.fields)+len(f.partFields))
	// the parts come after the fill and before the temperatures; the
	// order only matters for which problem is named first.
	out = append(out, f.fields...)
	return append(out, f.partFields...)
}

// showProblems marks every field: an entry that holds no number first,
// then the engine's problem when it names this field. A problem that
// names no field of the form is shown at the top of the form.
func (f *designForm) showProblems(p *problem) {
	placed := false
	doc, u := f.s.doc, f.s.units()
	for _, nf := range f.all() {
		msg := ""
		if e, ok := doc.unread[nf.path]; ok {
			msg = e.message(nf.formField, &doc.Work, u)
		}
		if msg == "" && p != nil && p.Path == nf.path {
			msg = p.Text
		}
		if p != nil && p.Path == nf.path {
			placed = true
		}
		nf.setProblem(msg)
	}
	placed = f.fluid.showProblem(p) || placed
	placed = f.vessel.showProblem(p) || placed
	if p == nil || placed {
		f.generalRow.Hide()
		return
	}
	text := p.Text
	if p.Path != "" {
		text = labelOf(p.Path) + ": " + text
	}
	setText(f.general, text)
	f.generalRow.Show()
}

// section wraps a group of the form under a heading.
func section(title string, objs ...fyne.CanvasObject) fyne.CanvasObject {
	head := widget.NewLabelWithStyle(title, fyne.TextAlignLeading, fyne.TextStyle{Bold: true})
	head.SizeName = theme.SizeNameSubHeadingText
	items := append([]fyne.CanvasObject{head, widget.NewSeparator()}, objs...)
	return container.NewVBox(append(items, widget.NewLabel(""))...)
}

// hint is a small wrapped note under a field: a source, a ground, a unit
// explanation.
func hint(text string) *widget.Label {
	l := widget.NewLabel(text)
	l.Wrapping = fyne.TextWrapWord
	l.SizeName = theme.SizeNameCaptionText
	return l
}

// indented places an object under the entry column of the form.
func indented(o fyne.CanvasObject) fyne.CanvasObject {
	return container.NewBorder(nil, nil, container.New(fixedWidth{labelWidth}), nil, o)
}

// labelled places a widget in the entry column with a label on the left.
func labelled(label string, o fyne.CanvasObject) fyne.CanvasObject {
	l := newFitLabel(label, fyne.TextStyle{})
	return container.NewBorder(nil, nil, container.New(fixedWidth{labelWidth}, l), nil, o)
}
