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
// acceptable. Its formField gives the path (the name the engine's
// InputError uses), label, quantity and accessors.
type numField struct {
	formField

	entry   *widget.Entry
	unit    *widget.Label
	msg     *widget.Label
	msgIcon *widget.Icon
	msgRow  *fyne.Container
	object  fyne.CanvasObject
}

// newNumField builds the entry of a form field; onEdit is called with
// the field after the reviewer changes its text.
func newNumField(ff formField, onEdit func(*numField)) *numField {
	f := &numField{formField: ff}
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
	lbl := newFitLabel(ff.label, fyne.TextStyle{})
	row := container.NewBorder(nil, nil,
		container.New(fixedWidth{labelWidth}, lbl),
		container.New(fixedWidth{unitWidth}, f.unit), f.entry)
	f.object = container.NewVBox(row, container.NewBorder(nil, nil, container.New(fixedWidth{labelWidth}), nil, f.msgRow))
	return f
}

// show fills the entry from the design in the given units, without
// counting as an edit.
func (f *numField) show(d *hazards.Design, u unitSystem) {
	setText(f.unit, u.unit(f.q))
	showText(f.entry, display.Entry(u.fromSI(f.q, f.get(d)), u.display()))
}

// message says what is wrong with the entry of ff, in the units on
// screen: the text typed is not a number (with the working copy's value
// as an example), or a new design needs the value.
func (e unreadable) message(ff formField, d *hazards.Design, u unitSystem) string {
	unit := u.unit(ff.q)
	if unit != "" {
		unit = " in " + unit
	}
	if e.typed {
		return fmt.Sprintf("%q is not a number: type a number%s, such as %s", e.text, unit, display.Entry(u.fromSI(ff.q, ff.get(d)), u.display()))
	}
	return fmt.Sprintf("%s is needed for a new design: type a number%s", ff.label, unit)
}

// setProblem shows or hides the message under the field.
func (f *numField) setProblem(msg string) {
	if msg == "" {
		if f.msgRow.Visible() {
			f.msgRow.Hide()
			setText(f.msg, "")
		}
		return
	}
	if f.msg.Text != msg {
		setText(f.msg, msg)
	}
	f.msgRow.Show()
}
