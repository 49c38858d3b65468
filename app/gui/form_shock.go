package gui

import (
	"math"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/widget"

	"ullage/hazards"
)

// noShock is the preset choice for a direction that is not assessed.
const noShock = "Not assessed"

// shockSection holds the sudden temperature changes the device may meet,
// with the named presets and their sources, and the residual stress
// measured at the seal.
type shockSection struct {
	f                     *designForm
	presets               []hazards.ShockPreset
	hotPick, coldPick     *widget.Select
	hotSource, coldSource *widget.Label
	hot, cold             *numField
	sealPart              *widget.SelectEntry
}

// newShockSection builds the "Sudden temperature changes and seal" group.
func newShockSection(f *designForm) fyne.CanvasObject {
	s := &shockSection{f: f}
	f.shock = s
	s.presets, _ = hazards.ShockPresets()
	s.hot = f.field(hazards.FieldHotToCold)
	s.cold = f.field(hazards.FieldColdToHot)
	s.hotPick, s.hotSource = s.picker(hazards.ShockHotToCold, s.hot)
	s.coldPick, s.coldSource = s.picker(hazards.ShockColdToHot, s.cold)

	s.sealPart = widget.NewSelectEntry(nil)
	s.sealPart.PlaceHolder = "none: no seal stress given"
	s.sealPart.OnChanged = func(text string) {
		f.s.doc.typeText(hazards.FieldSealPart, func(d *hazards.Design) { d.SealStress.Part = text })
	}
	stress := f.field(hazards.FieldResidualStress)
	retard := f.field(hazards.FieldRetardation)
	path := f.field(hazards.FieldSealPathLength)
	return section("Sudden temperature changes and seal",
		labelled("Hot to cold", s.hotPick), s.hot.object, indented(s.hotSource),
		labelled("Cold to hot", s.coldPick), s.cold.object, indented(s.coldSource),
		indented(hint("The largest sudden change of surface temperature the device may meet; 0 when not assessed. The suddenly cooled surface goes into tension of E·α·ΔT/(1 − ν), about 0.8 MPa per kelvin for annealed soda-lime glass and 0.26 MPa per kelvin for borosilicate 3.3.")),
		labelled("Part carrying the seal", s.sealPart),
		stress.object, retard.object, path.object,
		indented(hint("Measured with a polariscope or strain viewer (ASTM C148). Give the stress, or the retardation with the thickness of glass the light crosses: the stress is retardation / (stress-optic coefficient × path). Leave all at 0 when not measured.")),
	)
}

// picker builds a preset selector for one direction of sudden change.
func (s *shockSection) picker(dir string, field *numField) (*widget.Select, *widget.Label) {
	opts := []string{noShock}
	for _, p := range s.presets {
		if p.Direction == dir {
			opts = append(opts, p.Name)
		}
	}
	opts = append(opts, customValue)
	source := hint("")
	var sel *widget.Select
	sel = widget.NewSelect(opts, func(opt string) {
		s.f.s.doc.choose(field.path, func(d *hazards.Design) {
			switch p, ok := s.byName(opt); {
			case ok:
				field.set(d, p.DeltaK())
				setShockPreset(d, dir, p.ID)
			case opt == noShock:
				field.set(d, 0)
				setShockPreset(d, dir, "")
			default:
				setShockPreset(d, dir, "")
			}
		})
	})
	return sel, source
}

// describeAll shows the sources and note of both selected presets.
func (s *shockSection) describeAll() {
	s.describe(s.hotPick, s.hotSource)
	s.describe(s.coldPick, s.coldSource)
}

// setShockPreset names the preset of one direction of sudden change.
func setShockPreset(d *hazards.Design, dir, id string) {
	if dir == hazards.ShockColdToHot {
		d.ThermalShock.ColdToHotPresetID = id
	} else {
		d.ThermalShock.HotToColdPresetID = id
	}
}

func (s *shockSection) byName(name string) (hazards.ShockPreset, bool) {
	for _, p := range s.presets {
		if p.Name == name {
			return p, true
		}
	}
	return hazards.ShockPreset{}, false
}

// describe shows the sources and note of the selected preset.
func (s *shockSection) describe(sel *widget.Select, source *widget.Label) {
	p, ok := s.byName(sel.Selected)
	switch {
	case ok:
		setText(source, "From: "+p.From.Source+". To: "+p.To.Source+". "+p.Note)
	case sel.Selected == noShock:
		setText(source, "Not assessed: the record says so.")
	default:
		setText(source, "Your own value: state its grounds in the change note.")
	}
}

// matchShockPresets names, for each direction of sudden change, the
// preset whose change the design's value matches (the one already named
// when several do), or none; a typed value that no longer matches its
// preset becomes the reviewer's own.
func matchShockPresets(d *hazards.Design) {
	presets, _ := hazards.ShockPresets()
	for _, x := range []struct {
		dir string
		k   float64
		id  *string
	}{
		{hazards.ShockHotToCold, d.ThermalShock.HotToColdK, &d.ThermalShock.HotToColdPresetID},
		{hazards.ShockColdToHot, d.ThermalShock.ColdToHotK, &d.ThermalShock.ColdToHotPresetID},
	} {
		found := ""
		for _, p := range presets {
			if p.Direction == x.dir && math.Abs(p.DeltaK()-x.k) < 0.005 && (found == "" || p.ID == *x.id) {
				found = p.ID
			}
		}
		*x.id = found
	}
}

// syncPresets selects each direction's preset as the document names it,
// "not assessed" for 0, or "your own value"; and offers the parts' names
// for the seal.
func (s *shockSection) syncPresets() {
	d := &s.f.s.doc.Work
	for _, x := range []struct {
		sel    *widget.Select
		source *widget.Label
		k      float64
		id     string
	}{
		{s.hotPick, s.hotSource, d.ThermalShock.HotToColdK, d.ThermalShock.HotToColdPresetID},
		{s.coldPick, s.coldSource, d.ThermalShock.ColdToHotK, d.ThermalShock.ColdToHotPresetID},
	} {
		choice := customValue
		if x.k == 0 {
			choice = noShock
		}
		for _, p := range s.presets {
			if p.ID == x.id && x.id != "" {
				choice = p.Name
			}
		}
		if x.sel.Selected != choice {
			showSelected(x.sel, choice)
		}
		s.describe(x.sel, x.source)
	}
	s.refreshParts()
}

// refreshParts offers the names of the vessel's parts for the seal and
// shows the part the design names.
func (s *shockSection) refreshParts() {
	d := &s.f.s.doc.Work
	names := make([]string, 0, len(d.Vessel.Parts))
	for _, p := range d.Vessel.Parts {
		names = append(names, p.Name)
	}
	s.sealPart.SetOptions(names)
	if s.sealPart.Text != d.SealStress.Part {
		showText(&s.sealPart.Entry, d.SealStress.Part)
	}
}

// shockPresetName names a sudden-change preset for the comparison, or
// says the value is the reviewer's own or not given.
func shockPresetName(id string) string {
	if id == "" {
		return "your own value, or none"
	}
	if p, err := hazards.LookupShockPreset(id); err == nil {
		return p.Name
	}
	return id
}

// firstNonEmpty returns s, or alt when s is blank.
func firstNonEmpty(s, alt string) string {
	if s == "" {
		return alt
	}
	return s
}
