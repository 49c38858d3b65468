package chartmodel

import (
	"image"
	"image/color"
	"math"

	xfont "golang.org/x/image/font"
	"gonum.org/v1/plot"
	"gonum.org/v1/plot/font"
	"gonum.org/v1/plot/text"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
	"gonum.org/v1/plot/vg/vgimg"
)

// Options say how a chart is drawn.
type Options struct {
	// Mono draws every colour as black or grey, for print.
	Mono bool
	// FontSize is the size of the axis labels in points (7 when zero);
	// the title is a point larger and the ticks and labels a point smaller.
	FontSize float64
	// Foreground and Background colour the text and the ground (black on
	// white when nil).
	Foreground, Background color.Color
}

// dashPatterns are the dash patterns in points.
var dashPatterns = [dashCount][]vg.Length{
	Solid:      nil,
	Dashed:     {5, 2.5},
	Dotted:     {1, 1.8},
	DashDot:    {6, 2, 1, 2},
	LongDash:   {10, 3},
	DashDotDot: {6, 1.8, 1, 1.8, 1, 1.8},
	ShortDash:  {2.5, 2},
}

func (o Options) fg() color.Color {
	if o.Foreground == nil {
		return color.Black
	}
	return o.Foreground
}

func (o Options) bg() color.Color {
	if o.Background == nil {
		return color.White
	}
	return o.Background
}

func (o Options) size(delta float64) font.Font {
	s := o.FontSize
	if s == 0 {
		s = 7
	}
	return font.Font{Typeface: Typeface, Size: font.Points(s + delta)}
}

// colour is c as drawn: grey levels only in Mono.
func (o Options) colour(c color.Color) color.Color {
	if c == nil {
		return o.fg()
	}
	if o.Mono {
		if c == Grey {
			return color.Gray{Y: 110}
		}
		return color.Black
	}
	return c
}

func (o Options) line(s Style) draw.LineStyle {
	w := s.Width
	if w == 0 {
		w = 1
	}
	if o.Mono {
		w *= 0.7
	}
	d := s.Dash
	if d < 0 || d >= dashCount {
		d = Solid
	}
	return draw.LineStyle{Color: o.colour(s.Colour), Width: vg.Points(w), Dashes: dashPatterns[d]}
}

func (o Options) text(f font.Font) text.Style {
	return text.Style{Color: o.fg(), Font: f, Handler: handler()}
}

// Plot turns a chart description into a gonum/plot plot.
func Plot(ch Chart, o Options) *plot.Plot {
	h := handler()
	p := plot.New()
	p.TextHandler = h
	p.BackgroundColor = o.bg()
	p.Title.Text = ch.Title
	bold := o.size(1)
	bold.Weight = xfont.WeightBold
	restyle(&p.Title.TextStyle, o, bold)
	p.Title.TextStyle.XAlign = draw.XLeft
	p.Title.Padding = vg.Points(3)
	for _, ax := range []*plot.Axis{&p.X, &p.Y} {
		restyle(&ax.Label.TextStyle, o, o.size(0))
		restyle(&ax.Tick.Label, o, o.size(-1))
		ax.Color, ax.Tick.Color = o.fg(), o.fg()
		ax.Tick.LineStyle.Color = o.fg()
		ax.LineStyle.Color = o.fg()
		ax.Padding = 0
	}
	if ch.Empty != "" {
		p.HideAxes()
		p.Add(emptyNote{ch.Empty, o})
		return p
	}
	setAxis(&p.X, ch.X)
	setAxis(&p.Y, ch.Y)
	// gonum/plot centres a vertical axis label on the mean of the data
	// range, which on a log axis lies near the top and pads the plot
	// there; the layer draws the label itself and the axis keeps room.
	yLabel := p.Y.Label.Text
	if yLabel != "" {
		p.Y.Label.Text = " "
	}
	if len(ch.Ranked) > 0 {
		p.Y.Label.Text = ""
		p.Y.Min, p.Y.Max = -0.5, float64(len(ch.Ranked))-0.5
		labels := make([]plot.Tick, len(ch.Ranked))
		for i, b := range ch.Ranked {
			labels[i] = plot.Tick{Value: float64(len(ch.Ranked) - 1 - i), Label: b.Label}
		}
		p.Y.Tick.Marker = plot.ConstantTicks(labels)
		p.Y.Scale = plot.LinearScale{}
	}
	p.Add(&grid{ch: ch, o: o})
	p.Add(&layer{ch: ch, o: o, yLabel: yLabel})
	return p
}

// restyle sets a text style's font, colour and handler, keeping its
// alignment and rotation.
func restyle(s *text.Style, o Options, f font.Font) {
	s.Font, s.Color, s.Handler = f, o.fg(), handler()
}

func setAxis(pa *plot.Axis, a Axis) {
	pa.Label.Text = a.Label
	pa.Min, pa.Max = a.Min, a.Max
	pa.Tick.Marker = ticker{a}
	if a.Log {
		pa.Scale = plot.LogScale{}
	}
}

// ticker hands the one tick maker to gonum/plot.
type ticker struct{ a Axis }

func (t ticker) Ticks(lo, hi float64) []plot.Tick {
	a := t.a
	a.Min, a.Max = lo, hi
	ts := Ticks(a)
	out := make([]plot.Tick, len(ts))
	for i, x := range ts {
		out[i] = plot.Tick{Value: x.Value, Label: x.Label}
	}
	return out
}

// grid draws light lines at the labelled ticks.
type grid struct {
	ch Chart
	o  Options
}

func (g *grid) Plot(c draw.Canvas, p *plot.Plot) {
	trX, trY := p.Transforms(&c)
	sty := draw.LineStyle{Color: mix(g.o.bg(), g.o.fg(), 0.18), Width: vg.Points(0.35)}
	if len(g.ch.Ranked) == 0 {
		for _, t := range Ticks(g.ch.Y) {
			if t.Label != "" {
				y := trY(t.Value)
				c.StrokeLine2(sty, c.Min.X, y, c.Max.X, y)
			}
		}
	}
	for _, t := range Ticks(g.ch.X) {
		if t.Label != "" {
			x := trX(t.Value)
			c.StrokeLine2(sty, x, c.Min.Y, x, c.Max.Y)
		}
	}
}

// Draw draws the chart on a canvas of w by h points.
func Draw(ch Chart, c vg.Canvas, w, h vg.Length, o Options) {
	Plot(ch, o).Draw(draw.NewCanvas(c, w, h))
}

// Image draws the chart as an image of w by h pixels at dpi dots per inch.
func Image(ch Chart, w, h int, dpi float64, o Options) image.Image {
	if w < 1 || h < 1 || !(dpi > 0) {
		return image.NewRGBA(image.Rect(0, 0, max(w, 1), max(h, 1)))
	}
	pt := func(px int) vg.Length { return vg.Length(float64(px) * 72 / dpi) }
	c := vgimg.NewWith(vgimg.UseWH(pt(w), pt(h)), vgimg.UseDPI(int(math.Round(dpi))), vgimg.UseBackgroundColor(o.bg()))
	Draw(ch, c, pt(w), pt(h), o)
	return c.Image()
}

// emptyNote writes why there is nothing to draw.
type emptyNote struct {
	text string
	o    Options
}

func (e emptyNote) Plot(c draw.Canvas, _ *plot.Plot) {
	sty := e.o.text(e.o.size(0))
	sty.XAlign, sty.YAlign = draw.XCenter, draw.YCenter
	c.FillText(sty, c.Center(), e.text)
}

// mix is the colour a share t of the way from a to b.
func mix(a, b color.Color, t float64) color.Color {
	r1, g1, b1, _ := a.RGBA()
	r2, g2, b2, _ := b.RGBA()
	m := func(x, y uint32) uint8 { return uint8((float64(x)*(1-t) + float64(y)*t) / 257) }
	return color.NRGBA{R: m(r1, r2), G: m(g1, g2), B: m(b1, b2), A: 0xff}
}
