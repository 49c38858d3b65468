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

// keyNumbers lists the numbers behind the findings: the vessel at the
// hottest and coldest temperatures, the glass, the limits, the rupture
// and the release. Tapping a row opens the working behind it.
type keyNumbers struct {
	box    *fyne.Container
	rows   []keyRow
	taps   []*tapRow
	cells  []keyCells
	object fyne.CanvasObject
	// onPick runs when the reviewer taps a row.
	onPick func(keyRow)
	// marked is the label of the row whose working is shown, "" for none.
	marked string
}

func newKeyNumbers() *keyNumbers {
	k := &keyNumbers{box: container.NewVBox()}
	k.object = container.NewPadded(k.box)
	return k
}

// keyRow is one key number: its label, its value as shown and the
// calculation-record steps behind it, named by their trace keys
// (hazards.Assessment.TraceStep), the one that produced it first.
type keyRow struct {
	label, value string
	trace        []string
}

// keyRows returns every key number with the steps behind it.
func keyRows(a *hazards.Assessment, u unitSystem) []keyRow {
	d := a.Design
	lf := "never, below the critical temperature"
	if a.LiquidFullReached {
		lf = u.show(qTemperature, a.LiquidFullK, 4)
	}
	bound := func(b hazards.Bound) string {
		switch b {
		case hazards.BoundAbove:
			return " (or higher: the limit holds over the whole searched range)"
		case hazards.BoundBelow:
			return " (already exceeded at the bottom of the searched range)"
		}
		return ""
	}
	row := func(label, value string, trace ...string) keyRow { return keyRow{label, value, trace} }
	rows := []keyRow{
		row("Fluid", a.Fluid.Name, "psat_hottest", "rhol_hottest", "rhov_hottest"),
		row("Internal volume", u.show(qVesselVolume, a.VolumeM3, 4), "volume"),
		row("Fill density", sigFigures(a.FillDensity, 4)+" kg/m³", "fill_density", "volume"),
		row("Liquid share when sealed", sigFigures(a.LiquidFractionAtSealing*100, 3)+" %", "fill_density", "rhol_sealing", "rhov_sealing", "gas_moles"),
		row("State at the hottest", fmt.Sprintf("%s at %s", a.Hot.Phase, u.show(qTemperature, d.HottestK, 4)), "state_hot"),
		row("Pressure at the hottest (absolute)", u.show(qPressure, a.Hot.PressurePa, 4), "state_hot", "psat_hottest"),
		row("Ullage at the hottest", sigFigures(a.Hot.UllagePercent, 3)+" %", "state_hot", "liquid_full_temperature"),
		row("Goes liquid-full at", lf, "liquid_full_temperature"),
		row("Allowable pressure (absolute)", u.show(qPressure, a.AllowablePressurePa(), 4)+" at safety factor "+sigFigures(a.RequiredSafetyFactor, 3), "max_safe_temperature", "long_term_burst"),
		row("Long-term burst overpressure", u.show(qPressure, a.Strength.LongTermBurstPa, 3), "long_term_burst", "short_term_burst"),
		row("Burst safety factor", keyFinding(a, hazards.CriterionBurst), "burst_safety_factor", "long_term_burst", "state_hot"),
		row("Failure probability over the life", keyFinding(a, hazards.CriterionFailure), "failure_probability", "long_term_burst"),
		row("Pressure at the coldest (absolute)", u.show(qPressure, a.Cold.PressurePa, 4), "state_cold", "psat_coldest"),
		row("Implosion safety factor", keyFinding(a, hazards.CriterionImplosion), "implosion_safety_factor", "state_cold"),
		row("Maximum safe temperature", u.show(qTemperature, a.MaxSafe.TemperatureK, 4)+", set by "+a.MaxSafe.TemperatureLimitBy+bound(a.MaxSafe.TemperatureBound), "max_safe_temperature"),
		row("Maximum safe fill", u.show(qMass, a.MaxSafe.FillMassKg, 4)+bound(a.MaxSafe.FillBound), "max_safe_fill"),
		row("Stored energy at rupture", sigFigures(a.Rupture.StoredEnergyJ, 3)+" J", "stored_energy", "state_hot"),
		row("Flash fraction", sigFigures(a.Rupture.FlashFraction*100, 3)+" %", "stored_energy"),
		row("Peak concentration", sigFigures(a.Release.Peak.PPM, 3)+" ppm ("+zoneName(a.Release.Peak.Zone)+")", "exposure_peak", "near_field_model", "room_model"),
		row("15-minute average", sigFigures(a.Release.STEL.PPM, 3)+" ppm", "exposure_stel", "near_field_model", "room_model"),
		row("8-hour average", sigFigures(a.Release.TWA8h.PPM, 3)+" ppm", "exposure_twa", "room_model", "near_field_model"),
		row("Peak share of the LFL", sigFigures(a.Release.PercentLFL, 3)+" %", "percent_lfl", "exposure_peak"),
	}
	for i, p := range a.Parts {
		rows = append(rows, row(fmt.Sprintf("Hoop stress, part %d (%s)", i+1, p.Name),
			stressText(p.HoopStressPa, u)+", "+p.Form, fmt.Sprintf("stress_%d", i), "state_hot"))
	}
	rows = append(rows, shockKeyRows(a, u)...)
	if a.WorstStrength != nil {
		rows = append(rows, row("Burst safety factor, weakest permitted unit", keyFinding(a, hazards.CriterionBurstWorst), "burst_safety_factor_worst", "state_worst"))
	}
	if a.Flags.Extrapolated() {
		rows = append(rows, row("Correlations stretched", a.Flags.String(), "psat_hottest", "state_hot"))
	}
	return rows
}

// steps returns the numbers of the steps behind a key number, without
// repeats, skipping keys the record does not hold.
func (r keyRow) steps(a *hazards.Assessment) []int {
	var out []int
	seen := map[int]bool{}
	for _, k := range r.trace {
		if n := a.TraceStep(k); n > 0 && !seen[n] {
			seen[n] = true
			out = append(out, n)
		}
	}
	return out
}

// stressText shows a stress in MPa or psi.
func stressText(pa float64, u unitSystem) string { return u.show(qStress, pa, 3) }

// zoneName names a release-model zone.
func zoneName(z hazards.Zone) string {
	switch z {
	case hazards.NearField:
		return "near the breakage"
	case hazards.FarField:
		return "rest of the room"
	}
	return "whole room"
}

// set shows an assessment's key numbers. Rows already on screen are
// kept and only their changed texts redrawn, so that new results of the
// same design do not build the list again.
func (k *keyNumbers) set(a *hazards.Assessment, u unitSystem) {
	if a == nil {
		k.rows, k.taps, k.cells = nil, nil, nil
		k.box.Objects = nil
		k.box.Refresh()
		return
	}
	k.rows = keyRows(a, u)
	built := len(k.cells) != len(k.rows)
	if built {
		k.build()
	}
	grown := false
	for i, r := range k.rows {
		c := k.cells[i]
		hint := ""
		if steps := r.steps(a); len(steps) > 0 {
			hint = fmt.Sprintf("step %d ›", steps[0])
		}
		setText(c.label, r.label)
		if c.value.Text != r.value {
			before := c.value.MinSize().Height
			setText(c.value, r.value)
			grown = grown || c.value.MinSize().Height != before
		}
		if c.hint.String() != hint {
			c.hint.Segments = nil
			if hint != "" {
				c.hint.Segments = []widget.RichTextSegment{&widget.TextSegment{Text: hint,
					Style: widget.RichTextStyle{SizeName: theme.SizeNameCaptionText, ColorName: theme.ColorNamePlaceHolder, Alignment: fyne.TextAlignTrailing}}}
			}
			c.hint.Refresh()
		}
		k.taps[i].setSelected(r.label == k.marked)
	}
	if built || grown {
		// New rows, or a value now takes more or fewer lines: the rows
		// are laid out again.
		k.box.Refresh()
	}
}

// keyCells are the widgets of one row of the key numbers.
type keyCells struct {
	label, value *widget.Label
	hint         *widget.RichText
}

// build makes a row of widgets for each key number, empty until set
// fills them and lays them out.
func (k *keyNumbers) build() {
	k.cells = make([]keyCells, len(k.rows))
	k.taps = make([]*tapRow, len(k.rows))
	objs := make([]fyne.CanvasObject, len(k.rows))
	for i := range k.rows {
		c := keyCells{label: widget.NewLabel(""), value: widget.NewLabelWithStyle("", fyne.TextAlignLeading, fyne.TextStyle{Bold: true}), hint: widget.NewRichText()}
		c.value.Wrapping = fyne.TextWrapWord
		k.cells[i] = c
		k.taps[i] = newTapRow(container.New(keyLayout{}, c.label, c.value, c.hint), func() {
			if k.onPick != nil {
				k.onPick(k.rows[i])
			}
		})
		objs[i] = k.taps[i]
	}
	k.box.Objects = objs
}

// mark highlights the row with the given label, none for "".
func (k *keyNumbers) mark(label string) {
	k.marked = label
	for i, t := range k.taps {
		t.setSelected(label != "" && k.rows[i].label == label)
	}
}

// keyLayout is one row of the key numbers: the label at a fixed width,
// the value filling the rest, and the step it comes from at the right.
type keyLayout struct{}

const (
	keyLabelWidth = 270
	keyHintWidth  = 76
)

// MinSize is the label column, a narrow value column and the hint.
func (keyLayout) MinSize(objs []fyne.CanvasObject) fyne.Size {
	h := float32(0)
	for _, o := range objs {
		h = max(h, o.MinSize().Height)
	}
	return fyne.NewSize(keyLabelWidth+200+keyHintWidth, h)
}

// Layout places the label, the value and the hint.
func (keyLayout) Layout(objs []fyne.CanvasObject, size fyne.Size) {
	if len(objs) < 3 {
		return
	}
	vw := max(size.Width-keyLabelWidth-keyHintWidth, 0)
	if objs[1].Size().Width != vw {
		// The wrapped value measures its lines at its width first.
		objs[1].Resize(fyne.NewSize(vw, objs[1].MinSize().Height))
	}
	objs[0].Move(fyne.NewPos(0, 0))
	objs[0].Resize(fyne.NewSize(keyLabelWidth, size.Height))
	objs[1].Move(fyne.NewPos(keyLabelWidth, 0))
	objs[1].Resize(fyne.NewSize(vw, size.Height))
	objs[2].Move(fyne.NewPos(keyLabelWidth+vw, 0))
	objs[2].Resize(fyne.NewSize(keyHintWidth, size.Height))
}

// keyFinding shows a finding's value in the words the findings table uses.
func keyFinding(a *hazards.Assessment, criterion string) string {
	return display.ValueOf(a, criterion)
}
