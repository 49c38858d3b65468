package chartmodel

import (
	"math"

	"ullage/hazards"
)

// firstMinute is the first time on the release chart: three seconds
// after the breakage, where the near field changes fastest.
const firstMinute = 0.05

// limitDashes are the patterns limit lines take in turn, so that each
// limit of a chart has its own.
var limitDashes = []Dash{Dashed, DashDot, LongDash, DashDotDot, ShortDash, Dotted}

// Release describes the chart of vapour concentration against time after
// a breakage, on logarithmic axes, in the near field, the well-mixed room
// and the rest of the room, with every governing exposure limit and the
// flammability limit as labelled lines, each with its own dash pattern.
func Release(title string, a *hazards.Assessment, u Units) Chart {
	ch := Chart{
		Title:  title,
		X:      Axis{Label: "Time after the breakage (min), log scale", Log: true},
		Y:      Axis{Label: "Concentration, one-minute average (ppm), log scale", Log: true},
		Legend: TopRight,
	}
	if a == nil || a.Fluid == nil {
		ch.Empty = "No release curve: there are no results yet."
		return ch
	}
	last := math.Max(a.Design.Room.ExposureMinutes, 10)
	first := math.Min(firstMinute, last/100)
	zones := []struct {
		z     hazards.Zone
		name  string
		style Style
	}{
		{hazards.NearField, "Near the breakage", Style{Solid, 2, Red}},
		{hazards.WellMixedRoom, "Whole room, well mixed", Style{Dashed, 2, Blue}},
		{hazards.FarField, "Rest of the room", Style{Dotted, 2, Green}},
	}
	cmin, cmax := math.Inf(1), 0.0
	for _, z := range zones {
		xs, ys := ReleaseCurve(a, z.z, first, last)
		for _, y := range ys {
			cmin, cmax = math.Min(cmin, y), math.Max(cmax, y)
		}
		ch.Series = append(ch.Series, Series{Name: z.name, X: xs, Y: ys, Style: z.style})
	}
	lmin, lmax := math.Inf(1), 0.0
	for _, l := range Limits(a, u) {
		l.Style.Dash = limitDashes[len(ch.Lines)%len(limitDashes)]
		ch.Lines = append(ch.Lines, l)
		lmin, lmax = math.Min(lmin, l.Value), math.Max(lmax, l.Value)
	}
	if cmax == 0 {
		cmin, cmax = 1, 10
	}
	lo := math.Max(math.Min(cmin, lmin)/2, cmax*1e-6)
	ch.X.Min, ch.X.Max = first, last
	ch.Y.Min, ch.Y.Max = LogRange(lo, math.Max(cmax, lmax)*1.5)
	ch.Notes = append(ch.Notes, "Curves are one-minute averages (the average over the minute before each time); the peak is their highest point. Horizontal lines are the governing published limits; a limit with a longer averaging time applies to the average over that time, not to the curve.")
	return ch
}

// Limits returns the limit lines of the release chart, in ppm: each
// governing exposure limit of the assessment (whatever body or kind it
// is) and the chosen share of the lower flammability limit.
func Limits(a *hazards.Assessment, u Units) []Line {
	var out []Line
	for _, r := range a.Release.Limits {
		if !r.Governs || !(r.PPM > 0) || !finite(r.PPM) {
			continue
		}
		out = append(out, Line{Label: r.Kind + " " + u.Number(r.PPM) + " ppm (" + r.Name + ")", Value: r.PPM, Style: Style{Dashed, 1, Purple}})
	}
	if fl := a.Fluid.Flammability; fl.Flammable && fl.LFLPercent != nil {
		share := a.Design.Criteria.MaxPercentLFL
		v := fl.LFLPercent.Value * 1e4 * share / 100
		out = append(out, Line{Label: u.Number(share) + " % of the LFL, " + u.Number(v) + " ppm", Value: v, Style: Style{Dashed, 1, Orange}})
	}
	return out
}
