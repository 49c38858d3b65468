package report

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
	"gonum.org/v1/plot/vg"
)

// The adapter puts gonum/plot's points (from the bottom left, y up, in
// points of 1/72 in) into the chart's box on the page (from the top left,
// y down, in mm), through its own transform stack. Expected positions are
// worked by hand: 72 pt = 25.4 mm.
func TestVGPageMapping(t *testing.T) {
	p := newVGPage(nil, 10, 20, 50)
	cases := []struct {
		name   string
		setup  func()
		in     vg.Point
		wx, wy float64
	}{
		{"origin is the bottom left of the box", func() {}, vg.Point{}, 10, 70},
		{"72 points right and up", func() {}, vg.Point{X: 72, Y: 72}, 35.4, 44.6},
		{"translated", func() { p.Translate(vg.Point{X: 72}) }, vg.Point{}, 35.4, 70},
		{"rotated a quarter turn: x runs up the page", func() { p.Rotate(math.Pi / 2) }, vg.Point{X: 72}, 10, 44.6},
	}
	for _, c := range cases {
		p.Push()
		c.setup()
		x, y := p.m.apply(c.in)
		p.Pop()
		// Exact arithmetic up to binary rounding of 25.4/72.
		if !scalar.EqualWithinAbs(x, c.wx, 1e-9) || !scalar.EqualWithinAbs(y, c.wy, 1e-9) {
			t.Errorf("%s: (%g, %g) pt → (%g, %g) mm, want (%g, %g)", c.name, c.in.X, c.in.Y, x, y, c.wx, c.wy)
		}
	}
	if got := p.scale(); !scalar.EqualWithinAbs(got, mmPerPoint, 1e-12) {
		t.Errorf("length scale %g mm/pt after the stack unwound, want %g", got, mmPerPoint)
	}
}
