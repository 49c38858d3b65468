package gui

import (
	"math"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/widget"

	"ullage/hazards"
)

// customValue is the preset choice for a value typed by the reviewer.
const customValue = "Your own value"

// temperatureSection holds the temperatures the device meets, with the
// named presets and their sources, and its service.
type temperatureSection struct {
	f                     *designForm
	presets               []hazards.TemperaturePreset
	hotPick, coldPick     *widget.Select
	hotSource, coldSource *widget.Label
	hot, cold             *numField
}

// newTemperatureSection builds the "Temperatures and service" group.
func newTemperatureSection(f *designForm) fyne.CanvasObject {
	t := &temperatureSection{f: f}
	f.temps = t
	t.presets, _ = hazards.TemperaturePresets()
	t.hot = f.field(hazards.FieldHottest)
	t.cold = f.field(hazards.FieldColdest)
	t.hotPick, t.hotSource = t.picker("hottest", t.hot)
	t.coldPick, t.coldSource = t.picker("coldest", t.cold)
	seal := f.field(hazards.FieldSealingTemperature)
	gas := f.field(hazards.FieldResidualGasPressure)
	amb := f.field(hazards.FieldAmbientPressure)
	life := f.field(hazards.FieldServiceLife)
	hours := f.field(hazards.FieldHoursAtHottest)
	return section("Temperatures and service",
		labelled("Hottest it will meet", t.hotPick), t.hot.object, indented(t.hotSource),
		labelled("Coldest it will meet", t.coldPick), t.cold.object, indented(t.coldSource),
		seal.object, indented(hint("Temperature of the fill when the glass was flame-sealed.")),
		gas.object, indented(hint("Partial pressure of air left inside at the sealing temperature; 0 for a fully evacuated vessel.")),
		amb.object,
		life.object, hours.object,
		indented(hint("Total hours over the whole life spent at the hottest temperature: the load duration for the glass's static fatigue.")),
	)
}

// picker builds a preset selector for one kind of temperature.
func (t *temperatureSection) picker(kind string, field *numField) (*widget.Select, *widget.Label) {
	opts := []string{customValue}
	for _, p := range t.presets {
		if p.Kind == kind {
			opts = append(opts, p.Name)
		}
	}
	source := hint("")
	var sel *widget.Select
	sel = widget.NewSelect(opts, func(opt string) {
		p, ok := t.byName(opt)
		if !ok {
			// The reviewer's own value: the number stays as typed.
			t.describe(sel, source)
			return
		}
		t.f.s.doc.choose(field.path, func(d *hazards.Design) { field.set(d, p.Temperature.Value) })
	})
	return sel, source
}

// describeAll shows the source and note of both selected presets.
func (t *temperatureSection) describeAll() {
	t.describe(t.hotPick, t.hotSource)
	t.describe(t.coldPick, t.coldSource)
}

func (t *temperatureSection) byName(name string) (hazards.TemperaturePreset, bool) {
	for _, p := range t.presets {
		if p.Name == name {
			return p, true
		}
	}
	return hazards.TemperaturePreset{}, false
}

// describe shows the source and note of the selected preset.
func (t *temperatureSection) describe(sel *widget.Select, source *widget.Label) {
	p, ok := t.byName(sel.Selected)
	if !ok {
		setText(source, "Your own value: state its grounds in the change note.")
		return
	}
	setText(source, "Source: "+p.Temperature.Source+". "+p.Note)
}

// syncPresets selects the preset matching each typed temperature, or
// "your own value".
func (t *temperatureSection) syncPresets() {
	d := &t.f.s.doc.Work
	for _, x := range []struct {
		sel    *widget.Select
		source *widget.Label
		kind   string
		k      float64
	}{{t.hotPick, t.hotSource, "hottest", d.HottestK}, {t.coldPick, t.coldSource, "coldest", d.ColdestK}} {
		choice := customValue
		for _, p := range t.presets {
			if p.Kind == x.kind && math.Abs(p.Temperature.Value-x.k) < 0.005 {
				choice = p.Name
				break
			}
		}
		if x.sel.Selected != choice {
			showSelected(x.sel, choice)
		}
		t.describe(x.sel, x.source)
	}
}
