package chartmodel

import (
	"image/color"
	"math"

	"ullage/hazards"
)

// Colours of the window's charts, apart for common colour-vision
// deficiencies; every line also has its own dash pattern and label, so
// colour is never the only key. The record prints them in black and grey.
var (
	Blue   color.Color = color.NRGBA{R: 0x1f, G: 0x6f, B: 0xc5, A: 0xff}
	Orange color.Color = color.NRGBA{R: 0xe0, G: 0x7b, B: 0x10, A: 0xff}
	Red    color.Color = color.NRGBA{R: 0xc6, G: 0x28, B: 0x28, A: 0xff}
	Green  color.Color = color.NRGBA{R: 0x2e, G: 0x8b, B: 0x57, A: 0xff}
	Purple color.Color = color.NRGBA{R: 0x7b, G: 0x3f, B: 0xa0, A: 0xff}
	Grey   color.Color = color.NRGBA{R: 0x80, G: 0x80, B: 0x80, A: 0xff}
)

// Side is one design on a pressure chart; Name is empty for a single
// design and names the revision on a comparison.
type Side struct {
	Name string
	A    *hazards.Assessment
}

// ceilingFactor bounds the pressure axis at this multiple of the highest
// of the allowable and the outside pressures, so that the near-vertical
// climb past a liquid-full point does not squeeze the rest of the curve.
const ceilingFactor = 20

// Pressure describes the chart of internal pressure against temperature
// for one design or for two revisions on shared axes. The pressure axis is
// always logarithmic, for every design, so that any two records compare
// side by side; its range covers the curves, the allowable and the outside
// pressure, and always reaches a ceiling (ceilingFactor times the higher
// of the allowable and the outside pressure), which the chart names when
// a curve runs past it.
func Pressure(title string, sides []Side, u Units) Chart {
	ch := Chart{
		Title:  title,
		X:      Axis{Label: "Temperature (" + u.Temperature.Unit + ")"},
		Y:      Axis{Label: "Absolute pressure inside (" + u.Pressure.Unit + "), log scale", Log: true},
		Legend: TopLeft,
	}
	var live []Side
	for _, s := range sides {
		if s.A != nil {
			live = append(live, s)
		}
	}
	if len(live) == 0 {
		ch.Empty = "No pressure curve: there are no results yet."
		return ch
	}
	lo, hi := math.Inf(1), math.Inf(-1)
	for _, s := range live {
		l, h := PressureSpan(s.A)
		lo, hi = math.Min(lo, l), math.Max(hi, h)
	}
	curveStyles := []Style{{Solid, 2, Blue}, {Dashed, 2, Orange}}
	allowDash := []Dash{Dashed, DashDot}
	shapes := []Shape{Square, Diamond}
	pmin, pmax, top := math.Inf(1), 0.0, 0.0
	tq, pq := u.Temperature, u.Pressure
	multi := len(live) > 1
	suffix := func(s Side) string {
		if multi {
			return ", " + s.Name
		}
		return ""
	}
	for i, s := range live {
		a := s.A
		ts, ps := PressureCurve(a, lo, hi)
		ser := Series{Name: "Internal pressure" + suffix(s), Style: curveStyles[i%2]}
		for j := range ts {
			ser.X = append(ser.X, tq.FromSI(ts[j]))
			ser.Y = append(ser.Y, pq.FromSI(ps[j]))
			pmin, pmax = math.Min(pmin, ps[j]), math.Max(pmax, ps[j])
		}
		if len(ts) == 0 {
			ch.Notes = append(ch.Notes, "The vessel model gave no pressure over this range"+suffix(s)+".")
		}
		ch.Series = append(ch.Series, ser)
		allow := a.AllowablePressurePa()
		top = math.Max(top, math.Max(allow, a.Design.AmbientPressurePa))
		if finite(allow) && allow > 0 {
			ch.Lines = append(ch.Lines, Line{Label: "Allowable " + pq.Format(allow) + suffix(s), Value: pq.FromSI(allow), Style: Style{allowDash[i%2], 1, Red}})
		}
		if a.LiquidFullReached {
			if st, err := stateAt(a, a.LiquidFullK); err == nil && a.LiquidFullK <= hi {
				ch.Markers = append(ch.Markers, Marker{Label: "Liquid-full at " + tq.Format(a.LiquidFullK) + suffix(s), X: tq.FromSI(a.LiquidFullK), Y: pq.FromSI(st.PressurePa), Shape: shapes[i%2], Colour: Purple})
			} else if a.LiquidFullK > hi {
				ch.Notes = append(ch.Notes, "The vessel would go liquid-full at "+tq.Format(a.LiquidFullK)+", beyond the right edge of the chart"+suffix(s)+".")
			}
		}
		ch.Markers = append(ch.Markers, Marker{Label: pq.Format(a.Hot.PressurePa) + " at the hottest" + suffix(s), X: tq.FromSI(a.Design.HottestK), Y: pq.FromSI(a.Hot.PressurePa), Shape: Circle, Filled: true, Colour: curveStyles[i%2].Colour})
		if a.Flags.Extrapolated() {
			ch.Notes = append(ch.Notes, "‡ Part of this curve was computed outside a correlation's published range ("+a.Flags.String()+")"+suffix(s)+".")
		}
	}
	amb := live[0].A.Design.AmbientPressurePa
	ch.Lines = append(ch.Lines, Line{Label: "Outside " + pq.Format(amb), Value: pq.FromSI(amb), Style: Style{Dotted, 1, Grey}})
	for i, s := range live {
		d := s.A.Design
		if i == 0 || d.HottestK != live[0].A.Design.HottestK {
			ch.Lines = append(ch.Lines, Line{Label: "Hottest " + tq.Format(d.HottestK) + suffix(s), Value: tq.FromSI(d.HottestK), Vertical: true, Style: Style{LongDash, 1, Orange}})
		}
		if i == 0 || d.ColdestK != live[0].A.Design.ColdestK {
			ch.Lines = append(ch.Lines, Line{Label: "Coldest " + tq.Format(d.ColdestK) + suffix(s), Value: tq.FromSI(d.ColdestK), Vertical: true, Style: Style{ShortDash, 1, Blue}})
		}
	}
	if pmax == 0 {
		pmin, pmax = top/10, top
	}
	ceiling := top * ceilingFactor
	if pmax > ceiling {
		ch.Notes = append(ch.Notes, "The curve runs off the top of the chart past "+pq.Format(ceiling)+": a liquid-full vessel's pressure climbs steeply.")
	}
	// The axis always reaches the ceiling, whatever the curve does, so
	// that the charts of two revisions with like glass and temperatures
	// share their axes and read side by side.
	ylo, yhi := LogRange(pq.FromSI(math.Min(pmin, amb)/1.5), pq.FromSI(ceiling*1.5))
	ch.X.Min, ch.X.Max = tq.FromSI(lo), tq.FromSI(hi)
	ch.Y.Min, ch.Y.Max = ylo, yhi
	return ch
}
