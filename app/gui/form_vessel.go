package gui

import (
	"fmt"
	"slices"
	"strings"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"

	"ullage/hazards"
)

// vesselSection describes the glass envelope: its parts, its volume and
// the glass it is made of.
type vesselSection struct {
	f            *designForm
	parts        *fyne.Container
	volumeInfo   *widget.Label
	partsProblem *widget.Label

	glass        *widget.Select
	glassIDs     map[string]string
	glassInfo    *widget.Label
	glassProblem *widget.Label

	// names are the parts' name entries, and shapes the parts' shapes
	// the blocks were built for.
	names  []*widget.Entry
	shapes []string
}

// Shape names on screen.
const (
	shapeSphereText = "Sphere"
	shapeTubeText   = "Tube"
)

// newTubeLength is the length a part gets when it becomes a tube.
const newTubeLength = 0.05

// newVesselSection builds the "Vessel and glass" group.
func newVesselSection(f *designForm) fyne.CanvasObject {
	v := &vesselSection{f: f}
	f.vessel = v
	v.parts = container.NewVBox()
	v.volumeInfo = hint("")
	v.partsProblem = widget.NewLabel("")
	v.partsProblem.Importance = widget.DangerImportance
	v.partsProblem.Wrapping = fyne.TextWrapWord
	v.partsProblem.Hide()
	addSphere := widget.NewButtonWithIcon("Add a sphere", theme.ContentAddIcon(), func() {
		v.addPart(hazards.Part{Name: "bulb", Shape: hazards.ShapeSphere, OuterDiameterM: 0.03, WallThicknessM: 0.0015, WallToleranceM: 0.0002})
	})
	addTube := widget.NewButtonWithIcon("Add a tube", theme.ContentAddIcon(), func() {
		v.addPart(hazards.Part{Name: "tube", Shape: hazards.ShapeTube, OuterDiameterM: 0.008, WallThicknessM: 0.0012, WallToleranceM: 0.0002, LengthM: newTubeLength})
	})
	vol := f.field(hazards.FieldInternalVolume)
	volTol := f.field(hazards.FieldVolumeTolerance)

	v.glass = widget.NewSelect(nil, func(opt string) {
		id, ok := v.glassIDs[opt]
		if !ok {
			return
		}
		f.s.doc.choose(hazards.FieldGlass, func(d *hazards.Design) { d.Glass = hazards.GlassChoice{ID: id} })
	})
	v.glass.PlaceHolder = "Choose a glass"
	v.glassInfo = hint("")
	v.glassProblem = widget.NewLabel("")
	v.glassProblem.Importance = widget.DangerImportance
	v.glassProblem.Wrapping = fyne.TextWrapWord
	v.glassProblem.Hide()
	return section("Vessel and glass",
		v.parts,
		indented(v.partsProblem),
		indented(container.NewHBox(addSphere, addTube)),
		vol.object,
		indented(v.volumeInfo),
		volTol.object,
		labelled("Glass", v.glass),
		indented(v.glassProblem),
		indented(v.glassInfo),
	)
}

// load rebuilds the parts list and selects the glass.
func (v *vesselSection) load() {
	v.rebuildParts()
	gl, err := hazards.Glasses()
	v.glassIDs = map[string]string{}
	var opts []string
	if err == nil {
		for _, g := range gl {
			v.glassIDs[g.Name] = g.ID
			opts = append(opts, g.Name)
		}
	}
	d := &v.f.s.doc.Work
	if d.Glass.Custom != nil {
		name := "Custom glass from the file: " + d.Glass.Custom.Name
		opts = append(opts, name)
		v.glass.Options = opts
		showSelected(v.glass, name)
	} else {
		v.glass.Options = opts
		showSelected(v.glass, "")
		for name, id := range v.glassIDs {
			if id == d.Glass.ID {
				showSelected(v.glass, name)
			}
		}
	}
	v.glass.Refresh()
	v.describeGlass()
	v.updateVolume()
}

// describeGlass summarises the chosen glass's strength data.
func (v *vesselSection) describeGlass() {
	d := &v.f.s.doc.Work
	var g hazards.Glass
	if d.Glass.Custom != nil {
		g = *d.Glass.Custom
	} else {
		var err error
		if g, err = hazards.LookupGlass(d.Glass.ID); err != nil {
			setText(v.glassInfo, "")
			return
		}
	}
	strength := stressText(g.CharacteristicStrength.Value, v.f.s.units())
	setText(v.glassInfo, fmt.Sprintf("Characteristic strength %s, Weibull modulus %s, stress-corrosion exponent %s. %s",
		strength, sigFigures(g.WeibullModulus.Value, 3), sigFigures(g.StressCorrosionExponent.Value, 3), g.Note))
}

// updateVolume shows the volume the parts add up to.
func (v *vesselSection) updateVolume() {
	d := &v.f.s.doc.Work
	u := v.f.s.units()
	pv := d.Vessel.PartsVolume()
	if d.Vessel.InternalVolumeM3 > 0 {
		setText(v.volumeInfo, fmt.Sprintf("The measured volume is used. The parts add up to %s.", u.show(qVesselVolume, pv, 4)))
	} else {
		setText(v.volumeInfo, fmt.Sprintf("0 means the volume is computed from the parts: %s.", u.show(qVesselVolume, pv, 4)))
	}
}

// addPart appends a part to the vessel.
func (v *vesselSection) addPart(p hazards.Part) {
	v.f.s.doc.reshapeParts(func(ves *hazards.Vessel) {
		p.Name = fmt.Sprintf("%s %d", p.Name, len(ves.Parts)+1)
		ves.Parts = append(ves.Parts, p)
	})
}

// removePart deletes part i, unless it is the only one.
func (v *vesselSection) removePart(i int) {
	if n := len(v.f.s.doc.Work.Vessel.Parts); i < 0 || i >= n || n == 1 {
		return
	}
	v.f.s.doc.reshapeParts(func(ves *hazards.Vessel) {
		ves.Parts = append(ves.Parts[:i:i], ves.Parts[i+1:]...)
	})
}

// rebuildParts recreates one block per part with its own fields. When
// the blocks on screen are for as many parts of the same shapes, they
// are kept and show the parts' names and values again instead.
func (v *vesselSection) rebuildParts() {
	f := v.f
	d := &f.s.doc.Work
	if slices.Equal(v.shapes, partShapes(d)) {
		u := f.s.units()
		for i, e := range v.names {
			showText(e, d.Vessel.Parts[i].Name)
		}
		for _, nf := range f.partFields {
			nf.show(d, u)
		}
		f.showUnread()
		f.showProblems(f.s.problem)
		return
	}
	v.shapes, v.names = partShapes(d), nil
	for _, nf := range f.partFields {
		delete(f.byPath, nf.path)
	}
	f.partFields = nil
	u := f.s.units()
	var blocks []fyne.CanvasObject
	for i := range d.Vessel.Parts {
		if i > 0 {
			blocks = append(blocks, indented(widget.NewSeparator()))
		}
		blocks = append(blocks, v.partBlock(i, d, u))
	}
	f.showUnread()
	v.parts.Objects = blocks
	v.parts.Refresh()
	if f.scroll != nil {
		// The section grew or shrank: lay the whole form out again. The
		// scroll's own renderer does only that; Refresh would also redraw
		// every widget of the form, which costs more than the rebuild.
		f.scroll.Base.Refresh()
	}
	f.showProblems(f.s.problem)
}

// partShapes lists the shapes of a design's parts, nil for none.
func partShapes(d *hazards.Design) []string {
	var out []string
	for _, p := range d.Vessel.Parts {
		out = append(out, p.Shape)
	}
	return out
}

// partBlock builds the block of part i: name, shape, remove, and its
// dimensions.
func (v *vesselSection) partBlock(i int, d *hazards.Design, u unitSystem) fyne.CanvasObject {
	f := v.f
	part := func(d *hazards.Design) *hazards.Part { return &d.Vessel.Parts[i] }
	pf := func(spec partFieldSpec) *numField {
		nf := newNumField(partFormField(i, spec), f.typed)
		f.partFields = append(f.partFields, nf)
		f.byPath[nf.path] = nf
		nf.show(d, u)
		return nf
	}
	name := widget.NewEntry()
	name.SetText(d.Vessel.Parts[i].Name)
	v.names = append(v.names, name)
	name.OnChanged = func(t string) {
		f.s.doc.typeText(hazards.PartField(i, hazards.PartName), func(d *hazards.Design) { part(d).Name = t })
	}
	shape := widget.NewSelect([]string{shapeSphereText, shapeTubeText}, nil)
	if d.Vessel.Parts[i].Shape == hazards.ShapeTube {
		shape.SetSelected(shapeTubeText)
	} else {
		shape.SetSelected(shapeSphereText)
	}
	shape.OnChanged = func(opt string) {
		f.s.doc.reshapeParts(func(ves *hazards.Vessel) {
			p := &ves.Parts[i]
			if opt == shapeTubeText {
				p.Shape = hazards.ShapeTube
				if p.LengthM == 0 {
					p.LengthM = newTubeLength
				}
			} else {
				p.Shape, p.LengthM = hazards.ShapeSphere, 0
			}
		})
	}
	remove := widget.NewButtonWithIcon("Remove", theme.DeleteIcon(), func() { v.removePart(i) })
	if len(d.Vessel.Parts) == 1 {
		remove.Disable()
	}
	rows := []fyne.CanvasObject{
		labelled(fmt.Sprintf("Part %d", i+1), container.NewBorder(nil, nil, nil, container.NewHBox(shape, remove), name)),
	}
	for _, spec := range partFieldSpecs {
		if spec.key == hazards.PartLength && d.Vessel.Parts[i].Shape != hazards.ShapeTube {
			continue
		}
		rows = append(rows, pf(spec).object)
	}
	return container.NewVBox(rows...)
}

// showProblem shows an engine problem about the parts list or the glass
// that no number field carries; it reports whether it was placed here.
func (v *vesselSection) showProblem(p *problem) bool {
	v.partsProblem.Hide()
	v.glassProblem.Hide()
	if p == nil {
		return false
	}
	switch {
	case p.Path == hazards.FieldParts || (hazards.IsPartField(p.Path) && v.f.byPath[p.Path] == nil):
		setText(v.partsProblem, p.Text)
		v.partsProblem.Show()
		return true
	case strings.HasPrefix(p.Path, hazards.FieldGlass):
		setText(v.glassProblem, p.Text)
		v.glassProblem.Show()
		return true
	}
	return false
}
