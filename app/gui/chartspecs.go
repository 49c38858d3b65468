package gui

import (
	"image/color"
	"math"
)

// Chart colours, chosen to stay apart for common colour-vision
// deficiencies; every line also carries a label, so colour is never the
// only key.
var (
	colourBlue   = color.NRGBA{R: 0x1f, G: 0x6f, B: 0xc5, A: 0xff}
	colourOrange = color.NRGBA{R: 0xe0, G: 0x7b, B: 0x10, A: 0xff}
	colourRed    = color.NRGBA{R: 0xc6, G: 0x28, B: 0x28, A: 0xff}
	colourGreen  = color.NRGBA{R: 0x2e, G: 0x8b, B: 0x57, A: 0xff}
	colourPurple = color.NRGBA{R: 0x7b, G: 0x3f, B: 0xa0, A: 0xff}
	colourGrey   = color.NRGBA{R: 0x80, G: 0x80, B: 0x80, A: 0xff}
)

// ptSide is one curve on the pressure chart, with its name in the legend
// (empty for a single design).
type ptSide struct {
	name   string
	curve  ptCurve
	colour color.Color
	dashed bool
}

// pressureChart draws one or more vessels' pressure against temperature
// on a log scale, with the allowable pressure, the outside pressure, the
// hottest and coldest temperatures and the liquid-full point.
func pressureChart(sides []ptSide, u unitSystem) chartSpec {
	spec := chartSpec{
		XLabel: "Temperature, " + u.unit(qTemperature),
		YLabel: "Pressure inside, " + u.unit(qPressure) + " absolute (log scale)",
		LogY:   true,
	}
	if len(sides) == 0 || len(sides[0].curve.T) == 0 {
		spec.Empty = "No pressure curve: the assessment has no results yet."
		return spec
	}
	yLo, yHi := math.Inf(1), 0.0
	xLo, xHi := math.Inf(1), math.Inf(-1)
	top := 0.0
	for i, sd := range sides {
		c := sd.curve
		col := sd.colour
		if col == nil {
			col = colourBlue
		}
		s := chartSeries{Name: sd.name, Colour: col, Width: 2.5, Dashed: sd.dashed}
		for j := range c.T {
			s.X = append(s.X, u.fromSI(qTemperature, c.T[j]))
			s.Y = append(s.Y, u.fromSI(qPressure, c.P[j]))
			yLo = math.Min(yLo, c.P[j])
			yHi = math.Max(yHi, c.P[j])
		}
		if len(c.T) > 0 {
			xLo = math.Min(xLo, c.T[0])
			xHi = math.Max(xHi, c.T[len(c.T)-1])
		}
		spec.Series = append(spec.Series, s)
		top = math.Max(top, math.Max(c.AllowablePa, c.AmbientPa))
		suffix := ""
		if len(sides) > 1 {
			suffix = " (" + sd.name + ")"
		}
		spec.Marks = append(spec.Marks, chartMark{
			Label: "allowable " + u.show(qPressure, c.AllowablePa, 3) + suffix, Value: u.fromSI(qPressure, c.AllowablePa),
			Colour: colourRed, Dashed: sd.dashed || len(sides) == 1,
		})
		if c.LiquidFull && c.LiquidFullK >= c.T[0] && c.LiquidFullK <= c.T[len(c.T)-1] {
			spec.Marks = append(spec.Marks, chartMark{
				Label: "liquid-full " + u.show(qTemperature, c.LiquidFullK, 3) + suffix, Value: u.fromSI(qTemperature, c.LiquidFullK),
				Vertical: true, Colour: colourPurple, Dashed: sd.dashed,
			})
		}
		if i == 0 || sides[i].curve.HottestK != sides[0].curve.HottestK {
			spec.Marks = append(spec.Marks, chartMark{
				Label: "hottest " + u.show(qTemperature, c.HottestK, 3), Value: u.fromSI(qTemperature, c.HottestK),
				Vertical: true, Colour: colourOrange,
			})
		}
		if i == 0 || sides[i].curve.ColdestK != sides[0].curve.ColdestK {
			spec.Marks = append(spec.Marks, chartMark{
				Label: "coldest " + u.show(qTemperature, c.ColdestK, 3), Value: u.fromSI(qTemperature, c.ColdestK),
				Vertical: true, Colour: colourBlue, Dashed: true,
			})
		}
		label := "at the hottest " + u.show(qPressure, c.HotPa, 3)
		if len(sides) > 1 {
			label = sd.name + ": " + u.show(qPressure, c.HotPa, 3)
		}
		spec.Points = append(spec.Points, chartPoint{X: u.fromSI(qTemperature, c.HottestK), Y: u.fromSI(qPressure, c.HotPa), Label: label, Colour: col})
	}
	amb := sides[0].curve.AmbientPa
	spec.Marks = append(spec.Marks, chartMark{Label: "outside " + u.show(qPressure, amb, 3), Value: u.fromSI(qPressure, amb), Colour: colourGrey, Dashed: true})

	// Keep the allowable pressure in view and cut off the near-vertical
	// climb past the liquid-full point, saying so.
	ceiling := top * 6
	hi := math.Max(math.Min(yHi*1.6, ceiling), top*1.6)
	lo := math.Max(yLo/1.6, 1)
	if yHi > hi {
		spec.Note = "The curve runs off the top of the chart: the liquid-full vessel's pressure climbs steeply."
		for _, sd := range sides {
			if sd.curve.HotPa > hi {
				spec.Note = "Off the top of the chart: " + u.show(qPressure, sd.curve.HotPa, 3) + " at the hottest temperature"
				if sd.name != "" {
					spec.Note += " (" + sd.name + ")"
				}
				spec.Note += "."
				break
			}
		}
	}
	if spec.Note == "" {
		for _, sd := range sides {
			if c := sd.curve; c.LiquidFull && c.LiquidFullK > xHi {
				spec.Note = "Goes liquid-full at " + u.show(qTemperature, c.LiquidFullK, 4) + ", beyond the right of the chart"
				if sd.name != "" {
					spec.Note += " (" + sd.name + ")"
				}
				spec.Note += "."
				break
			}
		}
	}
	spec.XMin, spec.XMax = u.fromSI(qTemperature, xLo), u.fromSI(qTemperature, xHi)
	spec.YMin, spec.YMax = u.fromSI(qPressure, lo), u.fromSI(qPressure, hi)
	return spec
}

// releaseChart draws the concentration after a breakage against time (the
// one-minute averages whose top is the reported peak),
// on a log scale, with the exposure and flammability limits.
func releaseChart(c concCurves, u unitSystem) chartSpec {
	spec := chartSpec{
		XLabel: "Time after the breakage, minutes (log scale)",
		YLabel: "Concentration, one-minute average, ppm (log scale)",
		LogX:   true,
		LogY:   true,
	}
	if len(c.Minutes) == 0 {
		spec.Empty = "No release curve: the assessment has no results yet."
		return spec
	}
	spec.Series = []chartSeries{
		{Name: "near the breakage", X: c.Minutes, Y: c.Near, Colour: colourRed, Width: 2.5},
		{Name: "whole room, well mixed", X: c.Minutes, Y: c.Room, Colour: colourBlue, Width: 2.5},
		{Name: "rest of the room", X: c.Minutes, Y: c.Far, Colour: colourGreen, Width: 2, Dashed: true},
	}
	hi := 0.0
	for _, ys := range [][]float64{c.Near, c.Room, c.Far} {
		for _, y := range ys {
			hi = math.Max(hi, y)
		}
	}
	limLo := math.Inf(1)
	for _, l := range c.Limits {
		spec.Marks = append(spec.Marks, chartMark{Label: l.Label, Value: l.PPM, Colour: colourPurple, Dashed: true})
		hi = math.Max(hi, l.PPM)
		limLo = math.Min(limLo, l.PPM)
	}
	lo := hi / 1e4
	if finite(limLo) {
		lo = math.Min(lo, limLo/10)
	}
	spec.YMin, spec.YMax = lo, hi*2
	spec.XMin, spec.XMax = c.Minutes[0], c.ExposureMinutes
	return spec
}
