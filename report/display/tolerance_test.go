package display

import (
	"testing"

	"ullage/hazards/tolerance"
)

// The expected strings are written by hand from the doc comments.
func TestToleranceWords(t *testing.T) {
	p := tolerance.Proportion{Count: 441, Total: 2000, Estimate: 0.2205, Low: 0.2032, High: 0.2388}
	if got, want := Proportion(p), "441 of 2000 (22.1 %, 95 % interval 20.3 – 23.9 %)"; got != want {
		t.Errorf("Proportion = %q, want %q", got, want)
	}
	if got, want := Proportion(tolerance.Proportion{Total: 2000, High: 0.00192}), "0 of 2000 (0 %, 95 % interval 0 – 0.192 %)"; got != want {
		t.Errorf("Proportion = %q, want %q", got, want)
	}
	wall := tolerance.Driver{Key: "vessel.parts[0].wall_thickness_m", Label: "wall of lower bulb", RankCorrelation: -0.712}
	fill := tolerance.Driver{Key: tolerance.KeyFillMass, Label: "fill mass", RankCorrelation: 0.001}
	for _, c := range []struct {
		ds   []tolerance.Driver
		want string
		wall bool
	}{
		{[]tolerance.Driver{wall, fill}, "wall of lower bulb (rank correlation −0.71: a larger value lowers the margin)", true},
		{[]tolerance.Driver{fill}, "none: no varied input moves the safety factor (every rank correlation rounds to zero)", false},
		{nil, "none: no varied input moves the safety factor (every rank correlation rounds to zero)", false},
		{[]tolerance.Driver{{Key: "vessel.parts[1].wall_thickness_m", Label: "wall of riser tube", RankCorrelation: 0.4}}, "wall of riser tube (rank correlation +0.40: a larger value raises the margin)", false},
	} {
		if got := StrongestDriver(c.ds); got != c.want {
			t.Errorf("StrongestDriver = %q, want %q", got, c.want)
		}
		if got := WallLowersMargin(c.ds); got != c.wall {
			t.Errorf("WallLowersMargin(%v) = %v, want %v", c.ds, got, c.wall)
		}
	}
	if DistributionWords(tolerance.Normal) != "normal, ± is 3σ" {
		t.Errorf("normal: %q", DistributionWords(tolerance.Normal))
	}
}
