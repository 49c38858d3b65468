package gui

import (
	"image/png"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/test"

	"ullage/hazards"
)

// The criteria form ticks the default limit sets for the example (which
// names none), the exposure table shows occupational and public limits
// side by side with one governing each kind, ticking a further set adds
// its limits, and ticking back to the default leaves the field out.
func TestLimitSetsInTheWindow(t *testing.T) {
	h := newHarness(t)
	c := h.s.form.criteria
	want := []string{hazards.LimitSetName(hazards.LimitSetUSOccupational), hazards.LimitSetName(hazards.LimitSetUSPublicAcute)}
	if got := c.sets.Selected; len(got) != 2 || got[0] != want[0] || got[1] != want[1] {
		t.Fatalf("ticked %q; want the default %q", got, want)
	}
	fs := h.findings()
	for _, crit := range []string{hazards.CriterionTWA, hazards.CriterionPublic1, hazards.CriterionPublic2, hazards.CriterionPublic3} {
		if _, ok := fs[crit]; !ok {
			t.Errorf("no finding %s in the window; have %v", crit, fs)
		}
	}
	rows, governs := exposureRows(h.s.last.assessment)
	gov := map[string]int{}
	for i, r := range rows {
		if governs[i] {
			gov[r[0]]++
		}
	}
	if gov["US work"] == 0 || gov["US public"] == 0 {
		t.Errorf("governing rows by set %v; want occupational and public", gov)
	}
	c.sets.SetSelected(append(want, hazards.LimitSetName(hazards.LimitSetUKWEL)))
	h.idle()
	if got := h.s.doc.Work.Criteria.LimitSets; len(got) != 3 || got[2] != hazards.LimitSetUKWEL {
		t.Errorf("limit sets %v after ticking the UK set", got)
	}
	uk := false
	for _, l := range h.s.last.assessment.Release.Limits {
		uk = uk || l.Set == hazards.LimitSetUKWEL
	}
	if !uk {
		t.Error("no UK limit assessed after ticking the UK set")
	}
	c.sets.SetSelected(want)
	h.idle()
	if got := h.s.doc.Work.Criteria.LimitSets; got != nil {
		t.Errorf("limit sets %v after ticking the default; want none stored", got)
	}
}

// The room form offers the public places among its presets.
func TestPublicRoomPresetsOffered(t *testing.T) {
	h := newHarness(t)
	presets, err := hazards.RoomPresets()
	if err != nil {
		t.Fatal(err)
	}
	for _, id := range []string{"child-bedroom", "living-room", "car-closed-in-sun", "shop-window-display"} {
		var name string
		for _, p := range presets {
			if p.ID == id {
				name = p.Name
			}
		}
		found := false
		for _, o := range h.s.form.room.pick.Options {
			found = found || (name != "" && o == name)
		}
		if !found {
			t.Errorf("preset %s (%q) not offered among %q", id, name, h.s.form.room.pick.Options)
		}
	}
}

// TestLimitSetsScreenshot writes the window's exposure table for the
// example and for a dichloromethane design to $ULLAGE_SHOT_DIR for a
// person to look at; it is skipped otherwise.
func TestLimitSetsScreenshot(t *testing.T) {
	dir := os.Getenv("ULLAGE_SHOT_DIR")
	if dir == "" {
		t.Skip("set ULLAGE_SHOT_DIR to write screenshots")
	}
	h := newHarness(t)
	shot := func(name, criterion string) {
		h.s.results.tabs.SelectIndex(3)
		h.s.results.list.selectCriterion(criterion)
		h.s.form.scroll.ScrollToBottom()
		h.idle()
		h.w.Resize(fyne.NewSize(1280, 800))
		f, err := os.Create(filepath.Join(dir, name))
		if err != nil {
			t.Fatal(err)
		}
		defer f.Close()
		if err := png.Encode(f, h.w.Canvas().Capture()); err != nil {
			t.Fatal(err)
		}
		// The exposure tab alone, at the size a reviewer gives it.
		tab := newExposureTable()
		tab.set(h.s.last.assessment)
		w := test.NewTempWindow(t, tab.object)
		w.Resize(fyne.NewSize(660, 560))
		g, err := os.Create(filepath.Join(dir, "tab-"+name))
		if err != nil {
			t.Fatal(err)
		}
		defer g.Close()
		if err := png.Encode(g, w.Canvas().Capture()); err != nil {
			t.Fatal(err)
		}
	}
	shot("limits-example.png", hazards.CriterionPublic1)
	for _, o := range h.s.form.fluid.choose.Options {
		if strings.HasPrefix(o, "Dichloromethane") {
			h.s.form.fluid.choose.SetSelected(o)
		}
	}
	h.idle()
	if h.s.last.assessment == nil || h.s.last.assessment.Fluid.ID != "dichloromethane" {
		t.Fatal("the dichloromethane design was not assessed")
	}
	shot("limits-dichloromethane.png", hazards.CriterionPublicNone)
}
