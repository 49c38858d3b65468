package gui

import (
	"fmt"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"

	"ullage/hazards"
	"ullage/report/display"
)

// Widths of the label and unit columns of the form.
const (
	labelWidth = 218
	unitWidth  = 54
)

// numField is one number of the design on the form: a label, an entry in
// the chosen units, the unit, and a message under it when the entry is not
// acceptable.
type numField struct {
	// path is the field's JSON path in hazards.Design
	// (fill_mass_kg, vessel.parts[0].wall_thickness_m …), the name the
	// engine's InputError uses.
	path  string
	label string
	q     quantity
	get   func(*hazards.Design) float64
	set   func(*hazards.Design, float64)

	entry   *widget.Entry
	unit    *widget.Label
	msg     *widget.Label
	msgIcon *widget.Icon
	msgRow  *fyne.Container
	object  fyne.CanvasObject

	// parseProblem is the message for text that is not a number, "" when
	// the text reads.
	parseProblem string
}

// newNumField builds the entry of a form field; onEdit is called with
// the field after the reviewer changes its text.
func newNumField(ff formField, onEdit func(*numField)) *numField {
	f := &numField{path: ff.path, label: ff.label, q: ff.q, get: ff.get, set: ff.set}
	f.entry = widget.NewEntry()
	f.entry.OnChanged = func(string) { onEdit(f) }
	f.unit = widget.NewLabel("")
	f.msg = widget.NewLabel("")
	f.msg.Wrapping = fyne.TextWrapWord
	f.msg.Importance = widget.DangerImportance
	f.msg.SizeName = theme.SizeNameCaptionText
	f.msgIcon = widget.NewIcon(theme.ErrorIcon())
	f.msgRow = container.NewBorder(nil, nil, container.NewCenter(f.msgIcon), nil, f.msg)
	f.msgRow.Hide()
	lbl := widget.NewLabel(ff.label)
	lbl.Truncation = fyne.TextTruncateEllipsis
	row := container.NewBorder(nil, nil,
		container.New(fixedWidth{labelWidth}, lbl),
		container.New(fixedWidth{unitWidth}, f.unit), f.entry)
	f.object = container.NewVBox(row, container.NewBorder(nil, nil, container.New(fixedWidth{labelWidth}), nil, f.msgRow))
	return f
}

// show fills the entry from the design in the given units.
func (f *numField) show(d *hazards.Design, u unitSystem) {
	f.unit.SetText(u.unit(f.q))
	f.entry.SetText(display.Entry(u.fromSI(f.q, f.get(d)), u.display()))
	f.parseProblem = ""
}

// read parses the entry; on success it stores the SI value in d.
func (f *numField) read(d *hazards.Design, u unitSystem) bool {
	x, ok := parseNumber(f.entry.Text)
	if !ok {
		unit := u.unit(f.q)
		if unit != "" {
			unit = " in " + unit
		}
		f.parseProblem = fmt.Sprintf("%q is not a number: type a number%s, such as %s", f.entry.Text, unit, display.Entry(u.fromSI(f.q, f.get(d)), u.display()))
		return false
	}
	f.parseProblem = ""
	f.set(d, u.toSI(f.q, x))
	return true
}

// setProblem shows or hides the message under the field.
func (f *numField) setProblem(msg string) {
	if msg == "" {
		if f.msgRow.Visible() {
			f.msgRow.Hide()
			f.msg.SetText("")
		}
		return
	}
	if f.msg.Text != msg {
		f.msg.SetText(msg)
	}
	f.msgRow.Show()
}
