package gui

import (
	"image/png"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"fyne.io/fyne/v2"

	"ullage/hazards"
)

// The example's revision B meets a hot car and cold tap water
// (hazards/data/shock_presets.json: 76 °C cabin air into 20 °C water,
// 56 K): the form shows the preset and the value, and each part has a
// thermal-shock finding and key number.
func TestShockFormAndFindings(t *testing.T) {
	h := newHarness(t)
	s := h.s.form.shock
	if got := h.field("thermal_shock.hot_to_cold_k").entry.Text; got != "56" {
		t.Errorf("hot-to-cold change shows %q K", got)
	}
	if !strings.Contains(s.hotPick.Selected, "hot car into cold tap water") || !strings.Contains(s.hotSource.Text, "Grundstein") {
		t.Errorf("preset %q, source %q", s.hotPick.Selected, s.hotSource.Text)
	}
	if s.coldPick.Selected != noShock {
		t.Errorf("cold-to-hot preset %q; want %q", s.coldPick.Selected, noShock)
	}
	fs := h.findings()
	for i := 1; i <= 3; i++ {
		c := hazards.ThermalShockCriterion(i - 1)
		if fs[c] == "" {
			t.Errorf("no %s finding in the window; findings %v", c, fs)
		}
	}
	found := false
	for _, r := range keyRows(h.s.last.assessment, h.s.units()) {
		if strings.HasPrefix(r.label, "Thermal-shock safety factor, part 1") && len(r.steps(h.s.last.assessment)) == 4 {
			found = true
		}
	}
	if !found {
		t.Error("no thermal-shock key number with its four steps")
	}

	// Typing a value of one's own leaves the preset; choosing "not
	// assessed" clears the change and the findings.
	h.typeInto("thermal_shock.hot_to_cold_k", "30")
	if s.hotPick.Selected != customValue || h.s.doc.Work.ThermalShock.HotToColdPresetID != "" {
		t.Errorf("typed value keeps preset %q / %q", s.hotPick.Selected, h.s.doc.Work.ThermalShock.HotToColdPresetID)
	}
	s.hotPick.SetSelected(noShock)
	h.idle()
	if h.s.doc.Work.ThermalShock.Given() {
		t.Errorf("not assessed leaves %+v", h.s.doc.Work.ThermalShock)
	}
	for c := range h.findings() {
		if hazards.IsThermalShockCriterion(c) {
			t.Errorf("finding %s after choosing not assessed", c)
		}
	}

	// A seal stress on the lower bulb reaches the burst check.
	before := h.s.last.assessment.FailureProbability
	s.sealPart.SetText("lower bulb")
	h.typeInto("seal_stress.residual_stress_pa", "8")
	h.idle()
	a := h.s.last.assessment
	if a.Seal == nil || a.Seal.StressPa != 8e6 || !(a.FailureProbability > before) {
		t.Errorf("seal %+v, failure probability %g (before %g)", a.Seal, a.FailureProbability, before)
	}
}

// TestShockScreenshot writes the window with the thermal-shock findings
// to $ULLAGE_SHOT_DIR for a person to look at; it is skipped otherwise.
func TestShockScreenshot(t *testing.T) {
	dir := os.Getenv("ULLAGE_SHOT_DIR")
	if dir == "" {
		t.Skip("set ULLAGE_SHOT_DIR to write screenshots")
	}
	h := newHarness(t)
	for _, rev := range []string{"B", "A"} {
		if rev == "A" {
			h.s.revs.openRevision("A")
			h.idle()
		}
		h.s.results.list.selectCriterion(shotCriterion())
		h.s.form.scrollTo(4)
		h.idle()
		h.w.Resize(fyne.NewSize(1280, 800))
		img := h.w.Canvas().Capture()
		f, err := os.Create(filepath.Join(dir, "shock-"+rev+".png"))
		if err != nil {
			t.Fatal(err)
		}
		if err := png.Encode(f, img); err != nil {
			t.Fatal(err)
		}
		f.Close()
	}
	h.s.shell.showCompare()
	h.idle()
	f, err := os.Create(filepath.Join(dir, "shock-compare.png"))
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	if err := png.Encode(f, h.w.Canvas().Capture()); err != nil {
		t.Fatal(err)
	}
}

// The comparison of the example's revisions shows the thermal-shock
// findings changing status and the safety factors side by side.
func TestShockInTheComparison(t *testing.T) {
	h := newHarness(t)
	h.s.shell.showCompare()
	h.idle()
	c := h.s.cmp.cmp
	if c == nil {
		t.Fatal("no comparison")
	}
	changed := 0
	for _, sc := range c.Statuses {
		if hazards.IsThermalShockCriterion(sc.Criterion) && sc.Old == hazards.StatusFail && sc.New == hazards.StatusPass {
			changed++
		}
	}
	if changed != 3 {
		t.Errorf("%d thermal-shock findings go from fail to pass; want 3 (one per part)", changed)
	}
	found := false
	for _, r := range c.Results {
		if r.Name == "Thermal-shock safety factor (weakest part)" && r.Better && strings.Contains(r.New.Part, "lower bulb") {
			found = true
		}
	}
	if !found {
		t.Errorf("no better thermal-shock safety factor in the results: %+v", c.Results)
	}
	status := strings.Join(labels(h.s.cmp.statusBox), " | ")
	if !strings.Contains(status, "Thermal shock, lower bulb") {
		t.Errorf("status changes on screen lack the thermal shock: %s", status)
	}
}

// shotCriterion is the finding selected for the screenshots:
// $ULLAGE_SHOT_CRITERION, or the first part's thermal shock.
func shotCriterion() string {
	if c := os.Getenv("ULLAGE_SHOT_CRITERION"); c != "" {
		return c
	}
	return hazards.ThermalShockCriterion(0)
}
