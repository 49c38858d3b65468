package report

import (
	"image"
	"image/color"
	"math"

	xfont "golang.org/x/image/font"
	"gonum.org/v1/plot/font"
	"gonum.org/v1/plot/vg"

	"ullage/report/chartmodel"
)

// mmPerPoint converts gonum/plot's lengths (points) to the page's.
const mmPerPoint = 25.4 / 72

// affine is a 2-D affine transform: x' = a·x + c·y + e, y' = b·x + d·y + f.
type affine struct{ a, b, c, d, e, f float64 }

func (m affine) apply(p vg.Point) (float64, float64) {
	x, y := float64(p.X), float64(p.Y)
	return m.a*x + m.c*y + m.e, m.b*x + m.d*y + m.f
}

func (m affine) then(n affine) affine { // n applied first, then m
	return affine{
		a: m.a*n.a + m.c*n.b, b: m.b*n.a + m.d*n.b,
		c: m.a*n.c + m.c*n.d, d: m.b*n.c + m.d*n.d,
		e: m.a*n.e + m.c*n.f + m.e, f: m.b*n.e + m.d*n.f + m.f,
	}
}

// vgPage is gonum/plot's vg.Canvas drawn on the report's page canvas, so
// that charts stay vector in the record. It maps the chart's points (from
// the bottom left, y up) into a w × h mm box whose top left is at (x, y)
// on the page, and keeps gonum/plot's transform stack itself; everything
// reaches the page through the canvas seam.
type vgPage struct {
	c     *canvas
	m     affine
	stack []affine
	width float64
	dash  []float64
	col   color.Color
}

func newVGPage(c *canvas, x, y, h float64) *vgPage {
	return &vgPage{c: c, m: affine{a: mmPerPoint, d: -mmPerPoint, e: x, f: y + h}, width: 0.2, col: color.Black}
}

// scale is the transform's length scale (mm per point).
func (p *vgPage) scale() float64 { return math.Sqrt(math.Abs(p.m.a*p.m.d - p.m.b*p.m.c)) }

func (p *vgPage) SetLineWidth(w vg.Length) { p.width = float64(w) }

func (p *vgPage) SetLineDash(pattern []vg.Length, _ vg.Length) {
	p.dash = p.dash[:0]
	for _, d := range pattern {
		p.dash = append(p.dash, float64(d))
	}
}

func (p *vgPage) SetColor(c color.Color) {
	if c == nil {
		c = color.Black
	}
	p.col = c
}

func (p *vgPage) Rotate(rad float64) {
	s, c := math.Sincos(rad)
	p.m = p.m.then(affine{a: c, b: s, c: -s, d: c})
}

func (p *vgPage) Translate(pt vg.Point) {
	p.m = p.m.then(affine{a: 1, d: 1, e: float64(pt.X), f: float64(pt.Y)})
}

func (p *vgPage) Scale(x, y float64) { p.m = p.m.then(affine{a: x, d: y}) }

func (p *vgPage) Push() { p.stack = append(p.stack, p.m) }

func (p *vgPage) Pop() {
	if n := len(p.stack); n > 0 {
		p.m, p.stack = p.stack[n-1], p.stack[:n-1]
	}
}

// colour is the current colour as the page's, and whether it shows.
func (p *vgPage) colour() (rgb, bool) {
	r, g, b, a := p.col.RGBA()
	if a == 0 {
		return rgb{}, false
	}
	un := func(v uint32) int { return int(v * 0xffff / a >> 8) }
	return rgb{un(r), un(g), un(b)}, true
}

// subpaths flattens a path into runs of page points, arcs and curves as
// short straight pieces; closed reports for each run whether it closes.
func (p *vgPage) subpaths(path vg.Path) (runs [][]point, closed []bool) {
	var run []point
	add := func(q vg.Point) {
		x, y := p.m.apply(q)
		run = append(run, point{x, y})
	}
	flush := func(c bool) {
		if len(run) > 0 {
			runs, closed = append(runs, run), append(closed, c)
		}
		run = nil
	}
	var at vg.Point
	for _, comp := range path {
		switch comp.Type {
		case vg.MoveComp:
			flush(false)
			add(comp.Pos)
			at = comp.Pos
		case vg.LineComp:
			add(comp.Pos)
			at = comp.Pos
		case vg.ArcComp:
			n := max(8, int(math.Abs(comp.Angle)/(math.Pi/24)))
			for i := 0; i <= n; i++ {
				t := comp.Start + comp.Angle*float64(i)/float64(n)
				at = vg.Point{X: comp.Pos.X + comp.Radius*vg.Length(math.Cos(t)), Y: comp.Pos.Y + comp.Radius*vg.Length(math.Sin(t))}
				add(at)
			}
		case vg.CurveComp:
			from := at
			for i := 1; i <= 12; i++ {
				t := vg.Length(float64(i) / 12)
				var q vg.Point
				switch len(comp.Control) {
				case 1:
					c := comp.Control[0]
					q = vg.Point{X: (1-t)*(1-t)*from.X + 2*(1-t)*t*c.X + t*t*comp.Pos.X, Y: (1-t)*(1-t)*from.Y + 2*(1-t)*t*c.Y + t*t*comp.Pos.Y}
				case 2:
					c1, c2 := comp.Control[0], comp.Control[1]
					u := 1 - t
					q = vg.Point{X: u*u*u*from.X + 3*u*u*t*c1.X + 3*u*t*t*c2.X + t*t*t*comp.Pos.X, Y: u*u*u*from.Y + 3*u*u*t*c1.Y + 3*u*t*t*c2.Y + t*t*t*comp.Pos.Y}
				default:
					q = comp.Pos
				}
				add(q)
			}
			at = comp.Pos
		case vg.CloseComp:
			flush(true)
		}
	}
	flush(false)
	return runs, closed
}

func (p *vgPage) Stroke(path vg.Path) {
	col, ok := p.colour()
	if !ok || p.width <= 0 {
		return
	}
	k := p.scale()
	dash := make([]float64, len(p.dash))
	for i, d := range p.dash {
		dash[i] = d * k
	}
	p.c.setDash(dash...)
	p.c.setLineWidth(p.width * k)
	p.c.setStroke(col)
	runs, closed := p.subpaths(path)
	for i, r := range runs {
		if closed[i] && len(r) > 2 {
			r = append(r, r[0])
		}
		p.c.polyline(r)
	}
}

func (p *vgPage) Fill(path vg.Path) {
	col, ok := p.colour()
	if !ok {
		return
	}
	p.c.setFill(col)
	runs, _ := p.subpaths(path)
	for _, r := range runs {
		if len(r) > 2 {
			p.c.polygon(r, fill)
		}
	}
}

func (p *vgPage) FillString(f font.Face, pt vg.Point, txt string) {
	col, ok := p.colour()
	if !ok || txt == "" {
		return
	}
	fc := faceRegular
	if f.Font.Weight >= xfont.WeightBold {
		fc = faceBold
	}
	size := f.Font.Size.Points() * p.scale() / mmPerPoint
	p.c.setFont(fc, size)
	p.c.setTextColour(col)
	x, y := p.m.apply(pt)
	// The angle of the text's baseline on the page, anticlockwise.
	deg := math.Atan2(-p.m.b, p.m.a) * 180 / math.Pi
	if math.Abs(deg) < 1e-6 {
		p.c.drawText(x, y, txt)
	} else {
		p.c.drawTextRotated(x, y, deg, txt)
	}
	p.c.setTextColour(black)
}

// DrawImage is not used by the record's charts; an image is left out
// rather than embedded as a bitmap.
func (p *vgPage) DrawImage(vg.Rectangle, image.Image) {}

var _ vg.Canvas = (*vgPage)(nil)

// drawModelChart draws a chart description across the text width, height
// mm tall, starting a new page if it does not fit, then its notes.
func (d *doc) drawModelChart(ch chartmodel.Chart, height float64) {
	d.need(height)
	w := d.width()
	pg := newVGPage(d.c, d.left, d.y, height)
	chartmodel.Draw(ch, pg, vg.Length(w/mmPerPoint), vg.Length(height/mmPerPoint), chartmodel.Options{Mono: true, FontSize: 7})
	d.c.setDash()
	d.c.setLineWidth(0.2)
	d.c.setStroke(black)
	d.c.setFill(white)
	d.y += height + 2
	for _, n := range ch.Notes {
		d.note(n)
	}
}
