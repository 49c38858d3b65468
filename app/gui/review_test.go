package gui

import (
	"strings"
	"testing"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/widget"

	"ullage/hazards"
)

func TestExampleShowsResultsAtOnce(t *testing.T) {
	h := newHarness(t)
	a := h.s.last.assessment
	if a == nil {
		t.Fatal("no results after opening the example")
	}
	// The example's newest revision, B, passes (assets.ExampleName).
	if a.Verdict == hazards.StatusFail {
		t.Errorf("revision B verdict = %s, want pass or caution", a.Verdict)
	}
	if got := h.s.results.verdict.word.Text; got != statusWord(a.Verdict) {
		t.Errorf("verdict banner = %q", got)
	}
	if len(h.s.results.list.rows) == 0 {
		t.Error("no findings listed")
	}
	if len(h.s.results.pt.spec.Series) != 1 || len(h.s.results.pt.spec.Series[0].X) < 50 {
		t.Errorf("pressure chart not drawn: %+v", h.s.results.pt.spec.Series)
	}
	if len(h.s.results.conc.spec.Series) != 3 || len(h.s.results.conc.spec.Lines) == 0 {
		t.Errorf("release chart lacks curves or limit lines: %d series, %d lines", len(h.s.results.conc.spec.Series), len(h.s.results.conc.spec.Lines))
	}
	if h.s.doc.dirty() {
		t.Error("a freshly opened example counts as changed")
	}
	if d := h.s.results.list.detailText(); !strings.Contains(d, "Limit source") {
		t.Errorf("the selected finding's detail lacks its source: %q", d)
	}
}

func TestTypingUpdatesFindings(t *testing.T) {
	tests := []struct {
		name      string
		path      string
		text      string
		criterion string
		want      hazards.Status
	}{
		// Revision A's fill, 28.3 g (assets example), in B's thicker
		// bulbs leaves even less room: liquid-full in a hot car.
		{"overfilled", "fill_mass_kg", "28.3", hazards.CriterionUllage, hazards.StatusFail},
		// A small fill keeps plenty of vapour space.
		{"small fill", "fill_mass_kg", "5", hazards.CriterionUllage, hazards.StatusPass},
		// An ordinary room (23 °C) instead of a hot car.
		{"cool room", "hottest_k", "23", hazards.CriterionUllage, hazards.StatusPass},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			h := newHarness(t)
			h.typeInto(tc.path, tc.text)
			if h.s.stale() {
				t.Fatalf("results marked out of date: %+v", h.s.problem)
			}
			if got := h.findings()[tc.criterion]; got != string(tc.want) {
				t.Errorf("%s after typing %s = %q: %s = %q, want %q", tc.path, tc.text, got, tc.criterion, got, tc.want)
			}
			if !strings.Contains(h.s.results.verdict.word.Text, statusWord(h.s.last.assessment.Verdict)) {
				t.Errorf("verdict banner %q does not match verdict %s", h.s.results.verdict.word.Text, h.s.last.assessment.Verdict)
			}
			if !h.s.doc.workChanged() || !strings.Contains(h.w.Title(), "with changes") {
				t.Errorf("edit not reflected in the title: %q", h.w.Title())
			}
		})
	}
}

func TestInvalidValueKeepsLastResults(t *testing.T) {
	tests := []struct {
		name, path, text string
		// wantMsg must appear in the message under the field.
		wantMsg string
	}{
		{"not a number", "hottest_k", "7O", "not a number"},
		{"empty", "fill_mass_kg", "", "not a number"},
		{"negative fill", "fill_mass_kg", "-5", "must be from"},
		// 800 K is the engine's upper bound, shown here in °C.
		{"too hot", "hottest_k", "900", "526.85 °C"},
		{"wall thicker than the radius", "vessel.parts[0].wall_thickness_m", "30", "outer radius"},
		{"mixing below one", "room.mixing_factor", "0.5", "1 to 20"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			h := newHarness(t)
			before := h.s.last.assessment
			h.typeInto(tc.path, tc.text)
			f := h.field(tc.path)
			if !f.msgRow.Visible() || !strings.Contains(f.msg.Text, tc.wantMsg) {
				t.Errorf("message under %s = %q (shown %v), want it to mention %q", tc.path, f.msg.Text, f.msgRow.Visible(), tc.wantMsg)
			}
			if h.s.last.assessment != before {
				t.Error("the last good results were replaced")
			}
			if !h.s.results.stale.Visible() || !strings.Contains(h.s.results.staleText.Text, "OUT OF DATE") {
				t.Errorf("results not marked out of date: %q", h.s.results.staleText.Text)
			}
			if !h.s.results.pt.faded {
				t.Error("chart not faded while out of date")
			}
			if v := h.s.results.verdict; v.caption.Text != noVerdictCaption || v.word.Text == statusWord(before.Verdict) {
				t.Errorf("banner %q %q while an input is not acceptable, want no current verdict", v.caption.Text, v.word.Text)
			}
			// Correcting the field clears the mark and the results are current again.
			h.typeInto(tc.path, entryText(h.s.units().fromSI(f.q, f.get(&before.Design))))
			if f.msgRow.Visible() || h.s.stale() {
				t.Errorf("still marked after the fix: %q, problem %+v", f.msg.Text, h.s.problem)
			}
		})
	}
}

func TestUnitsSwitchConvertsEveryField(t *testing.T) {
	h := newHarness(t)
	fill := h.field("fill_mass_kg")
	h.s.setUnits(unitsUS)
	h.idle()
	// 21.0 g = 0.740753 oz (avoirdupois ounce 28.349523125 g, NIST
	// Handbook 44 appendix C), shown to four significant figures.
	if got := fill.entry.Text; got != "0.7408" || fill.unit.Text != "oz" {
		t.Errorf("fill in US units = %q %s, want 0.7408 oz", got, fill.unit.Text)
	}
	// 1.6 mm = 0.0629921 in, shown as 0.06299 in.
	if got := h.field("vessel.parts[0].wall_thickness_m").entry.Text; got != "0.06299" {
		t.Errorf("wall thickness in US units = %q in, want 0.06299", got)
	}
	hot := h.field("hottest_k")
	// 76 °C = 168.8 °F.
	if got := hot.entry.Text; got != "168.8" || hot.unit.Text != "°F" {
		t.Errorf("hottest in US units = %q %s, want 168.8 °F", got, hot.unit.Text)
	}
	h.typeInto("fill_mass_kg", "1")
	if got := h.s.doc.Work.FillMassKg; got < 0.028349 || got > 0.02835 {
		t.Errorf("1 oz stored as %g kg, want 0.0283495", got)
	}
	h.s.setUnits(unitsSI)
	h.idle()
	if got := fill.entry.Text; got != "28.3495" { // six significant digits
		t.Errorf("back in SI the fill reads %q g", got)
	}
}

func TestPartsCanBeAddedAndRemoved(t *testing.T) {
	h := newHarness(t)
	n := len(h.s.doc.Work.Vessel.Parts)
	vol := h.s.last.assessment.VolumeM3
	button(t, h.s.form.object, "Add a tube").OnTapped()
	h.idle()
	if got := len(h.s.doc.Work.Vessel.Parts); got != n+1 {
		t.Fatalf("%d parts after adding a tube, want %d", got, n+1)
	}
	if _, ok := h.s.form.byPath["vessel.parts[3].length_m"]; !ok {
		t.Error("the new tube has no length field")
	}
	if h.s.last.assessment.VolumeM3 <= vol {
		t.Error("the volume did not grow with the new tube")
	}
	// A sphere made a tube gets a length field and a length.
	var shape *widget.Select
	walk(h.s.form.vessel.parts.Objects[0], func(o fyne.CanvasObject) {
		if sel, ok := o.(*widget.Select); ok && shape == nil {
			shape = sel
		}
	})
	shape.SetSelected(shapeTubeText)
	h.idle()
	if p := h.s.doc.Work.Vessel.Parts[0]; p.Shape != hazards.ShapeTube || p.LengthM != newTubeLength {
		t.Errorf("part 1 after choosing a tube: %+v", p)
	}
	if _, ok := h.s.form.byPath["vessel.parts[0].length_m"]; !ok {
		t.Error("the part made a tube has no length field")
	}
	h.s.form.vessel.removePart(n)
	h.idle()
	if got := len(h.s.doc.Work.Vessel.Parts); got != n {
		t.Errorf("%d parts after removing, want %d", got, n)
	}
	if _, ok := h.s.form.byPath["vessel.parts[3].length_m"]; ok {
		t.Error("the removed part's fields are still registered")
	}
}

func TestPresetsFillTheirValues(t *testing.T) {
	h := newHarness(t)
	temps := h.s.form.temps
	temps.hotPick.SetSelected("Ordinary indoor room")
	h.idle()
	// 23 °C, ASTM D4332 conditioning atmosphere (hazards/data/temperature_presets.json).
	if got := h.field("hottest_k").entry.Text; got != "23" {
		t.Errorf("indoor preset gives %q °C", got)
	}
	if !strings.Contains(temps.hotSource.Text, "ASTM D4332") {
		t.Errorf("preset source not shown: %q", temps.hotSource.Text)
	}
	h.typeInto("hottest_k", "24")
	if temps.hotPick.Selected != customValue {
		t.Errorf("typed value keeps preset %q", temps.hotPick.Selected)
	}
	h.typeInto("room.volume_m3", "45")
	if h.s.doc.Work.Room.PresetID != "" || h.s.form.room.pick.Selected != customRoom {
		t.Errorf("edited room still claims preset %q", h.s.doc.Work.Room.PresetID)
	}
}
