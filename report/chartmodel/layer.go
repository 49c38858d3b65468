package chartmodel

import (
	"image/color"
	"math"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"

	"ullage/report/display"
)

// layer draws everything of a chart inside the plot area: bars, boxes,
// series, lines, markers, the legend, and the labels, placed by the one
// label placer of the program.
type layer struct {
	ch     Chart
	o      Options
	yLabel string
}

// rect is a label's room on the canvas, in points.
type rect struct{ x0, y0, x1, y1 vg.Length }

func (a rect) overlaps(b rect) bool {
	return a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1
}

// placer keeps labels inside the plot, clear of one another, clear of
// every line but their own and, as far as it can, of the curves.
type placer struct {
	area   rect
	taken  []rect
	hLines []vg.Length // y of each horizontal line
	vLines []vg.Length // x of each vertical line
	points []vg.Point  // the curves' drawn points
}

// best returns the candidate that stays in the plot, overlaps no label
// and crosses no line other than own (an index into hLines or vLines, −1
// for none), covering the fewest curve points; ok is false when none
// does.
func (p *placer) best(cands []rect, ownH, ownV int) (rect, bool) {
	bi, bc := -1, 0
	for i, c := range cands {
		if c.x0 < p.area.x0 || c.x1 > p.area.x1 || c.y0 < p.area.y0 || c.y1 > p.area.y1 {
			continue
		}
		bad := false
		for _, t := range p.taken {
			bad = bad || c.overlaps(t)
		}
		for j, y := range p.hLines {
			bad = bad || (j != ownH && y >= c.y0-0.5 && y <= c.y1+0.5)
		}
		cover := 0
		for j, x := range p.vLines {
			if j != ownV && x >= c.x0 && x <= c.x1 {
				cover += 8
			}
		}
		if bad {
			continue
		}
		for _, q := range p.points {
			if q.X >= c.x0 && q.X <= c.x1 && q.Y >= c.y0 && q.Y <= c.y1 {
				cover++
			}
		}
		if bi < 0 || cover < bc {
			bi, bc = i, cover
		}
	}
	if bi < 0 {
		return rect{}, false
	}
	p.taken = append(p.taken, cands[bi])
	return cands[bi], true
}

const (
	swatchW = 14  // points: the sample of a line's pattern in its label
	pad     = 1.5 // points around a label's text
	gap     = 1.2 // points between a line and its label
)

func (l *layer) Plot(c draw.Canvas, p *plot.Plot) {
	ch, o := l.ch, l.o
	trX, trY := p.Transforms(&c)
	ok := func(x, y float64) bool {
		return finite(x) && finite(y) && (!ch.X.Log || x > 0) && (!ch.Y.Log || y > 0)
	}
	if l.yLabel != "" {
		sty := o.text(o.size(0))
		sty.Rotation, sty.XAlign, sty.YAlign = math.Pi/2, draw.XCenter, draw.YTop
		c.FillText(sty, vg.Point{X: 1, Y: (c.Min.Y + c.Max.Y) / 2}, l.yLabel)
	}
	pl := &placer{area: rect{c.Min.X + 1, c.Min.Y + 1, c.Max.X - 1, c.Max.Y - 1}}
	if b := ch.Bars; b != nil {
		fill := color.Gray{Y: 200}
		if !o.Mono {
			fill = color.Gray{Y: 170}
		}
		for i, n := range b.Counts {
			if n == 0 {
				continue
			}
			x0, x1, y0, y1 := trX(b.Edges[i]), trX(b.Edges[i+1]), trY(0), trY(float64(n))
			pts := []vg.Point{{X: x0, Y: y0}, {X: x1, Y: y0}, {X: x1, Y: y1}, {X: x0, Y: y1}}
			c.FillPolygon(fill, c.ClipPolygonXY(pts))
			c.StrokeLines(draw.LineStyle{Color: o.fg(), Width: vg.Points(0.3)}, c.ClipLinesXY(append(pts, pts[0]))...)
		}
	}
	if len(ch.Ranked) > 0 {
		l.ranked(c, trX, trY)
	}
	for _, b := range ch.Boxes {
		pts := []vg.Point{{X: trX(b.X0), Y: trY(b.Y0)}, {X: trX(b.X1), Y: trY(b.Y0)}, {X: trX(b.X1), Y: trY(b.Y1)}, {X: trX(b.X0), Y: trY(b.Y1)}}
		c.StrokeLines(o.line(b.Style), c.ClipLinesXY(append(pts, pts[0]))...)
	}
	// Lines across the plot.
	for _, ln := range ch.Lines {
		if ln.Vertical {
			x := trX(ln.Value)
			if !finite(ln.Value) || (ch.X.Log && ln.Value <= 0) || x < c.Min.X || x > c.Max.X {
				pl.vLines = append(pl.vLines, vg.Length(math.Inf(1)))
				continue
			}
			c.StrokeLine2(o.line(ln.Style), x, c.Min.Y, x, c.Max.Y)
			pl.vLines = append(pl.vLines, x)
		} else {
			y := trY(ln.Value)
			if !finite(ln.Value) || (ch.Y.Log && ln.Value <= 0) || y < c.Min.Y || y > c.Max.Y {
				pl.hLines = append(pl.hLines, vg.Length(math.Inf(1)))
				continue
			}
			c.StrokeLine2(o.line(ln.Style), c.Min.X, y, c.Max.X, y)
			pl.hLines = append(pl.hLines, y)
		}
	}
	// Series, broken at points that cannot be drawn.
	for _, s := range ch.Series {
		var runs [][]vg.Point
		var run []vg.Point
		for i := range s.X {
			if i >= len(s.Y) || !ok(s.X[i], s.Y[i]) {
				if len(run) > 1 {
					runs = append(runs, run)
				}
				run = nil
				continue
			}
			q := vg.Point{X: clampL(trX(s.X[i]), c.Min.X-2000, c.Max.X+2000), Y: clampL(trY(s.Y[i]), c.Min.Y-2000, c.Max.Y+2000)}
			run = append(run, q)
			if c.Contains(q) {
				pl.points = append(pl.points, q)
			}
		}
		if len(run) > 1 {
			runs = append(runs, run)
		}
		c.StrokeLines(o.line(s.Style), c.ClipLinesXY(runs...)...)
	}
	// Markers and the legend take their room before the labels.
	type shown struct {
		m  Marker
		at vg.Point
	}
	var marks []shown
	for _, m := range ch.Markers {
		if !ok(m.X, m.Y) {
			continue
		}
		at := vg.Point{X: trX(m.X), Y: trY(m.Y)}
		if !c.Contains(at) {
			continue
		}
		marks = append(marks, shown{m, at})
		pl.taken = append(pl.taken, rect{at.X - 3, at.Y - 3, at.X + 3, at.Y + 3})
	}
	var named []entry
	for _, s := range ch.Series {
		if s.Name != "" {
			named = append(named, entry{s.Name, s.Style})
		}
	}
	l.legend(c, pl, named, []Corner{ch.Legend})
	var rest []entry
	for _, ln := range l.labelLines(c, pl) {
		rest = append(rest, entry{ln.Label, ln.Style})
	}
	l.legend(c, pl, rest, []Corner{BottomRight, BottomLeft, TopRight, TopLeft})
	ts := o.text(o.size(-1))
	for _, s := range marks {
		l.glyph(c, s.m, s.at)
		if s.m.Label == "" {
			continue
		}
		w, h := ts.Width(s.m.Label)+2*pad, ts.Height(s.m.Label)+2*pad
		var cands []rect
		for _, off := range []vg.Length{4, 9, 16, 26} {
			x, y := s.at.X, s.at.Y
			cands = append(cands,
				rect{x - off - w, y + off/2, x - off, y + off/2 + h},
				rect{x + off, y - off/2 - h, x + off + w, y - off/2},
				rect{x + off, y + off/2, x + off + w, y + off/2 + h},
				rect{x - off - w, y - off/2 - h, x - off, y - off/2})
		}
		if r, ok := pl.best(cands, -1, -1); ok {
			if dx, dy := (r.x0+r.x1)/2-s.at.X, (r.y0+r.y1)/2-s.at.Y; dx*dx+dy*dy > 180 {
				c.StrokeLine2(draw.LineStyle{Color: color.Gray{Y: 100}, Width: vg.Points(0.4)}, s.at.X, s.at.Y, clampL(s.at.X, r.x0, r.x1), clampL(s.at.Y, r.y0, r.y1))
			}
			l.label(c, r, nil, s.m.Label)
		}
	}
}

// labelLines labels each line beside itself: a horizontal line just above
// or below it at the right, left or middle, a vertical line just right or
// left of it from the top down, never where another line parallel to it
// crosses the label. Each label starts with a sample of its own line's
// pattern. It returns the lines it found no room for, for the legend.
func (l *layer) labelLines(c draw.Canvas, pl *placer) []Line {
	ts := l.o.text(l.o.size(-1))
	var unplaced []Line
	hi, vi := 0, 0
	for _, ln := range l.ch.Lines {
		own := -1
		var pos vg.Length
		if ln.Vertical {
			own, pos = vi, pl.vLines[vi]
			vi++
		} else {
			own, pos = hi, pl.hLines[hi]
			hi++
		}
		if ln.Label == "" || math.IsInf(float64(pos), 0) {
			continue
		}
		w := ts.Width(ln.Label) + swatchW + 3*pad
		h := ts.Height(ln.Label) + 2*pad
		var cands []rect
		if ln.Vertical {
			for y := c.Max.Y - 2; y-h > c.Min.Y; y -= h + 1 {
				cands = append(cands, rect{pos + gap, y - h, pos + gap + w, y}, rect{pos - gap - w, y - h, pos - gap, y})
			}
			r, ok := pl.best(cands, -1, own)
			if !ok {
				unplaced = append(unplaced, ln)
				continue
			}
			l.label(c, r, &ln.Style, ln.Label)
			continue
		}
		right, left, mid := c.Max.X-2-w, c.Min.X+2, (c.Min.X+c.Max.X-w)/2
		for _, x := range []vg.Length{right, left, mid} {
			cands = append(cands, rect{x, pos + gap, x + w, pos + gap + h})
		}
		for _, x := range []vg.Length{right, left, mid} {
			cands = append(cands, rect{x, pos - gap - h, x + w, pos - gap})
		}
		r, ok := pl.best(cands, own, -1)
		if !ok {
			unplaced = append(unplaced, ln)
			continue
		}
		l.label(c, r, &ln.Style, ln.Label)
	}
	return unplaced
}

// label draws a label on the ground colour in r, with a sample of the
// line style first when there is one.
func (l *layer) label(c draw.Canvas, r rect, sty *Style, txt string) {
	o := l.o
	ground := []vg.Point{{X: r.x0, Y: r.y0}, {X: r.x1, Y: r.y0}, {X: r.x1, Y: r.y1}, {X: r.x0, Y: r.y1}}
	c.FillPolygon(o.bg(), ground)
	x := r.x0 + pad
	if sty != nil {
		ym := (r.y0 + r.y1) / 2
		ls := o.line(*sty)
		c.StrokeLine2(ls, x, ym, x+swatchW, ym)
		x += swatchW + pad
	}
	ts := o.text(o.size(-1))
	ts.XAlign, ts.YAlign = draw.XLeft, draw.YBottom
	c.FillText(ts, vg.Point{X: x, Y: r.y0 + pad}, txt)
}

// entry is one row of a legend: a line sample and its name.
type entry struct {
	name string
	sty  Style
}

// legend draws a box of entries in the first of the corners where it
// overlaps nothing placed before (the last corner when none is free).
// Lines that found no room for a label beside themselves are listed in a
// second such box, so that no label is ever set against another line.
func (l *layer) legend(c draw.Canvas, pl *placer, es []entry, corners []Corner) {
	if len(es) == 0 {
		return
	}
	ts := l.o.text(l.o.size(-1))
	w, rowH := vg.Length(0), vg.Length(0)
	for _, e := range es {
		w = max(w, ts.Width(e.name))
		rowH = max(rowH, ts.Height(e.name)+1)
	}
	w += swatchW + 3*pad
	h := rowH*vg.Length(len(es)) + 2*pad
	var r rect
	for i, corner := range corners {
		x0, y1 := c.Min.X+3, c.Max.Y-3
		switch corner {
		case TopRight:
			x0 = c.Max.X - 3 - w
		case BottomLeft:
			y1 = c.Min.Y + 3 + h
		case BottomRight:
			x0, y1 = c.Max.X-3-w, c.Min.Y+3+h
		}
		r = rect{x0, y1 - h, x0 + w, y1}
		free := true
		for _, t := range pl.taken {
			free = free && !r.overlaps(t)
		}
		if free || i == len(corners)-1 {
			break
		}
	}
	pl.taken = append(pl.taken, r)
	c.FillPolygon(l.o.bg(), []vg.Point{{X: r.x0, Y: r.y0}, {X: r.x1, Y: r.y0}, {X: r.x1, Y: r.y1}, {X: r.x0, Y: r.y1}})
	c.StrokeLines(draw.LineStyle{Color: color.Gray{Y: 150}, Width: vg.Points(0.3)}, []vg.Point{{X: r.x0, Y: r.y0}, {X: r.x1, Y: r.y0}, {X: r.x1, Y: r.y1}, {X: r.x0, Y: r.y1}, {X: r.x0, Y: r.y0}})
	ts.XAlign, ts.YAlign = draw.XLeft, draw.YBottom
	for i, e := range es {
		yb := r.y1 - pad - rowH*vg.Length(i+1)
		c.StrokeLine2(l.o.line(e.sty), r.x0+pad, yb+rowH/2, r.x0+pad+swatchW, yb+rowH/2)
		c.FillText(ts, vg.Point{X: r.x0 + 2*pad + swatchW, Y: yb + 0.5}, e.name)
	}
}

// glyph draws a marker's shape.
func (l *layer) glyph(c draw.Canvas, m Marker, at vg.Point) {
	col := l.o.colour(m.Colour)
	var shape draw.GlyphDrawer
	switch m.Shape {
	case Square:
		shape = draw.SquareGlyph{}
	case Diamond:
		shape = diamond{}
	case Triangle:
		shape = draw.TriangleGlyph{}
	default:
		shape = draw.CircleGlyph{}
	}
	r := vg.Points(2.6)
	if !m.Filled {
		c.DrawGlyph(draw.GlyphStyle{Color: l.o.bg(), Radius: r, Shape: shape}, at)
		c.DrawGlyph(draw.GlyphStyle{Color: col, Radius: r, Shape: outline{shape}}, at)
		return
	}
	c.DrawGlyph(draw.GlyphStyle{Color: col, Radius: r, Shape: shape}, at)
}

// ranked draws horizontal bars from zero, one row each, red (dark grey in
// print) when the value is negative (a larger input lowers the margin),
// blue (light grey) otherwise, with the value.
func (l *layer) ranked(c draw.Canvas, trX, trY func(float64) vg.Length) {
	n := len(l.ch.Ranked)
	ts := l.o.text(l.o.size(-1))
	ts.YAlign = draw.YCenter
	for i, b := range l.ch.Ranked {
		row := float64(n - 1 - i)
		y0, y1 := trY(row-0.32), trY(row+0.32)
		x0, x1 := trX(0), trX(math.Max(-1, math.Min(1, b.Value)))
		fill := l.o.colour(Blue)
		if l.o.Mono {
			fill = color.Gray{Y: 215}
		}
		if b.Value < 0 {
			fill = l.o.colour(Red)
			if l.o.Mono {
				fill = color.Gray{Y: 90}
			}
		}
		pts := []vg.Point{{X: x0, Y: y0}, {X: x1, Y: y0}, {X: x1, Y: y1}, {X: x0, Y: y1}}
		c.FillPolygon(fill, pts)
		c.StrokeLines(draw.LineStyle{Color: l.o.fg(), Width: vg.Points(0.3)}, append(pts, pts[0]))
		txt := display.Correlation(b.Value)
		if b.Value < 0 {
			ts.XAlign = draw.XLeft
			c.FillText(ts, vg.Point{X: x0 + 3, Y: (y0 + y1) / 2}, txt)
		} else {
			ts.XAlign = draw.XRight
			c.FillText(ts, vg.Point{X: x0 - 3, Y: (y0 + y1) / 2}, txt)
		}
	}
	c.StrokeLine2(draw.LineStyle{Color: l.o.fg(), Width: vg.Points(0.5)}, trX(0), c.Min.Y, trX(0), c.Max.Y)
}

func clampL(v, lo, hi vg.Length) vg.Length { return max(lo, min(hi, v)) }

// diamond is a filled diamond glyph.
type diamond struct{}

func (diamond) DrawGlyph(c *draw.Canvas, sty draw.GlyphStyle, pt vg.Point) {
	c.SetColor(sty.Color)
	r := sty.Radius * 1.3
	var p vg.Path
	p.Move(vg.Point{X: pt.X, Y: pt.Y + r})
	p.Line(vg.Point{X: pt.X + r, Y: pt.Y})
	p.Line(vg.Point{X: pt.X, Y: pt.Y - r})
	p.Line(vg.Point{X: pt.X - r, Y: pt.Y})
	p.Close()
	c.Fill(p)
}

// outline strokes the edge of a filled glyph shape instead of filling it.
type outline struct{ g draw.GlyphDrawer }

func (o outline) DrawGlyph(c *draw.Canvas, sty draw.GlyphStyle, pt vg.Point) {
	switch o.g.(type) {
	case draw.SquareGlyph:
		draw.BoxGlyph{}.DrawGlyph(c, sty, pt)
	case draw.TriangleGlyph:
		draw.PyramidGlyph{}.DrawGlyph(c, sty, pt)
	case draw.CircleGlyph:
		draw.RingGlyph{}.DrawGlyph(c, sty, pt)
	default:
		c.SetLineStyle(draw.LineStyle{Color: sty.Color, Width: vg.Points(0.8)})
		r := sty.Radius * 1.3
		var p vg.Path
		p.Move(vg.Point{X: pt.X, Y: pt.Y + r})
		p.Line(vg.Point{X: pt.X + r, Y: pt.Y})
		p.Line(vg.Point{X: pt.X, Y: pt.Y - r})
		p.Line(vg.Point{X: pt.X - r, Y: pt.Y})
		p.Close()
		c.Stroke(p)
	}
}
