package gui

import (
	"fmt"
	"strings"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"

	"ullage/app/fluidfind"
	"ullage/fluids"
	"ullage/hazards"
)

// fluidSection chooses the working liquid and its fill.
type fluidSection struct {
	f      *designForm
	choose *widget.Select
	// find picks the fluid as the reviewer types a name, a synonym or a
	// CAS number.
	find    *widget.Entry
	ids     map[string]string // option text → fluid ID
	info    *widget.Label
	problem *widget.Label
}

// newFluidSection builds the "Fluid and fill" group.
func newFluidSection(f *designForm) fyne.CanvasObject {
	fs := &fluidSection{f: f}
	f.fluid = fs
	fs.choose = widget.NewSelect(nil, func(opt string) {
		id, ok := fs.ids[opt]
		if !ok {
			return
		}
		f.s.doc.choose(hazards.FieldFluid, func(d *hazards.Design) { d.Fluid = id })
	})
	fs.choose.PlaceHolder = "Choose a fluid"
	fs.info = hint("")
	fs.problem = widget.NewLabel("")
	fs.problem.Importance = widget.DangerImportance
	fs.problem.Wrapping = fyne.TextWrapWord
	fs.problem.Hide()
	fs.find = widget.NewEntry()
	fs.find.SetPlaceHolder("Find: name, synonym or CAS (R-134a, methylene chloride …)")
	fs.find.OnChanged = func(text string) {
		// A fluid found is chosen in the selector, as if picked there.
		if sub := fluidfind.Find(f.s.lib, text); sub != nil {
			if o := fluidOption(sub.Fluid()); fs.choose.Selected != o {
				fs.choose.SetSelected(o)
			}
		}
	}
	add := widget.NewButtonWithIcon("Add a fluid from a file…", theme.ContentAddIcon(), f.s.askUserFluid)
	mass := f.field(hazards.FieldFillMass)
	tol := f.field(hazards.FieldFillMassTolerance)
	return section("Fluid and fill",
		labelled("Fluid", container.NewBorder(nil, nil, nil, add, fs.choose)),
		labelled("", fs.find),
		indented(fs.problem),
		indented(fs.info),
		mass.object, tol.object,
	)
}

// fluidOption is how a fluid is listed in the selector.
func fluidOption(f *fluids.Fluid) string {
	if f.UserSupplied {
		return f.Name + " (your data)"
	}
	return f.Name
}

// load lists the library's fluids and selects the working copy's.
func (fs *fluidSection) load() {
	lib := fs.f.s.lib
	fs.ids = map[string]string{}
	var opts []string
	for _, sub := range lib.All() {
		o := fluidOption(sub.Fluid())
		fs.ids[o] = sub.Fluid().ID
		opts = append(opts, o)
	}
	fluidfind.Sort(opts)
	fs.choose.Options = opts
	if sub, err := lib.Lookup(fs.f.s.doc.Work.Fluid); err == nil {
		showSelected(fs.choose, fluidOption(sub.Fluid()))
	} else {
		showSelected(fs.choose, "")
	}
	fs.choose.Refresh()
	fs.describe()
}

// describe summarises the chosen fluid's key data in the display units.
func (fs *fluidSection) describe() {
	sub, err := fs.f.s.lib.Lookup(fs.f.s.doc.Work.Fluid)
	if err != nil {
		setText(fs.info, "")
		return
	}
	setText(fs.info, fluidSummary(sub, fs.f.s.units()))
}

// fluidSummary is a short description of a fluid for the form and the
// fluid check dialog.
func fluidSummary(sub *fluids.Substance, u unitSystem) string {
	f := sub.Fluid()
	var b strings.Builder
	fmt.Fprintf(&b, "%s, CAS %s. Boils at %s; critical point %s, %s; freezes at %s.",
		f.Formula, f.CAS, u.show(qTemperature, f.NormalBoilingPoint.Value, 4),
		u.show(qTemperature, sub.CriticalTemperature(), 4), u.show(qPressure, sub.CriticalPressure(), 3),
		u.show(qTemperature, f.FreezingPoint.Value, 3))
	if f.Flammability.Flammable && f.Flammability.LFLPercent != nil {
		fmt.Fprintf(&b, " Flammable, LFL %s %% by volume.", sigFigures(f.Flammability.LFLPercent.Value, 3))
	} else if !f.Flammability.Flammable {
		b.WriteString(" Not flammable.")
	}
	b.WriteString(" Limits: " + exposureSummary(f) + ".")
	if f.UserSupplied {
		b.WriteString(" Data supplied by you, not from the built-in library.")
	}
	return b.String()
}

// showProblem shows an engine problem about the fluid; it reports
// whether the problem was placed here.
func (fs *fluidSection) showProblem(p *problem) bool {
	if p == nil || p.Path != hazards.FieldFluid {
		fs.problem.Hide()
		return false
	}
	setText(fs.problem, p.Text)
	fs.problem.Show()
	return true
}
