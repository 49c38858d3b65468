package report

import (
	"errors"
	"fmt"
	"math"

	"ullage/fluids"
	"ullage/fluids/units"
	"ullage/hazards"
)

// Chart sizes in mm.
const (
	chartHeight     = 88
	curveSamples    = 160
	chartBeyondHotK = 25 // the pressure chart runs this far past the hottest
	chartReachK     = 60 // and further, up to this far, to show the liquid-full point
)

// stateAt is a.StateAt that turns a panic from an assessment not built by
// hazards.Assess into an error.
func stateAt(a *hazards.Assessment, t float64) (s hazards.VesselState, err error) {
	defer func() {
		if recover() != nil {
			err = errors.New("the assessment has no vessel model")
		}
	}()
	return a.StateAt(t)
}

// concentrationAt is a.Concentration with the same guard, in mg/m³.
func concentrationAt(a *hazards.Assessment, z hazards.Zone, t float64) (c float64) {
	defer func() {
		if recover() != nil {
			c = math.NaN()
		}
	}()
	return a.Concentration(z, t)
}

// pressureRange is the temperature span of the pressure chart, in K.
func pressureRange(a *hazards.Assessment) (float64, float64) {
	lo, hi := a.Design.ColdestK, a.Design.HottestK+chartBeyondHotK
	if a.LiquidFullReached && a.LiquidFullK > hi && a.LiquidFullK <= a.Design.HottestK+chartReachK {
		hi = a.LiquidFullK + 5
	}
	return lo, hi
}

// pressureCurve samples the absolute pressure (Pa) from lo to hi K, with
// the liquid-full and hottest temperatures as exact samples so that the
// knee is sharp. Temperatures where the model has no answer are left out.
func pressureCurve(a *hazards.Assessment, lo, hi float64) []xy {
	ts := make([]float64, 0, curveSamples+3)
	for i := 0; i <= curveSamples; i++ {
		ts = append(ts, lo+(hi-lo)*float64(i)/curveSamples)
	}
	extra := []float64{a.Design.HottestK}
	if a.LiquidFullReached {
		extra = append(extra, a.LiquidFullK)
	}
	for _, e := range extra {
		if e > lo && e < hi {
			ts = insertSorted(ts, e)
		}
	}
	pts := make([]xy, 0, len(ts))
	for _, t := range ts {
		s, err := stateAt(a, t)
		if err != nil || !finite(s.PressurePa) || s.PressurePa <= 0 {
			continue
		}
		pts = append(pts, xy{t, s.PressurePa})
	}
	return pts
}

func insertSorted(ts []float64, v float64) []float64 {
	for i, t := range ts {
		if math.Abs(t-v) < 1e-9 {
			return ts
		}
		if t > v {
			ts = append(ts, 0)
			copy(ts[i+1:], ts[i:])
			ts[i] = v
			return ts
		}
	}
	return append(ts, v)
}

// pressureScale decides the pressure axis: logarithmic when the rise past
// the liquid-full point (at pressure knee, 0 when the chart shows none)
// would flatten the rest of the curve on a linear axis.
func pressureScale(pts []xy, knee, allowable float64) (log bool, lo, hi float64) {
	pmin, pmax := math.Inf(1), 0.0
	for _, p := range pts {
		pmin, pmax = math.Min(pmin, p.y), math.Max(pmax, p.y)
	}
	if len(pts) == 0 {
		pmin, pmax = allowable/10, allowable
	}
	if knee > 0 && pmax > 2*math.Max(knee, allowable) {
		lo, hi := logRange(pmin, math.Max(pmax, allowable))
		return true, lo, hi
	}
	_, hi = niceRange(0, math.Max(pmax, allowable)*1.08)
	return false, 0, hi
}

// pressureChart is figure 1: pressure against temperature.
func (w *assessmentWriter) pressureChart() {
	a, u := w.a, w.u
	lo, hi := pressureRange(a)
	curve := pressureCurve(a, lo, hi)
	tq, pq := u.temperatureQ(), u.pressureQ()
	allow := a.AllowablePressurePa()
	knee := 0.0
	var lfP float64
	if a.LiquidFullReached {
		if s, err := stateAt(a, a.LiquidFullK); err == nil {
			lfP = s.PressurePa
			if a.LiquidFullK <= hi {
				knee = lfP
			}
		}
	}
	shown := convertXY(curve, tq, pq)
	log, ylo, yhi := pressureScale(shown, pq.conv(knee), pq.conv(allow))
	ch := pressureTemperatureChart(u, "Figure 1. Internal pressure against temperature", lo, hi, log, ylo, yhi)
	ch.series = []series{{name: "Internal pressure (absolute)", pts: shown, style: solidLine}}
	ch.lines = []refLine{
		{value: pq.conv(allow), label: "Allowable " + u.pressure(allow), style: dashedLine},
		{value: pq.conv(a.Design.AmbientPressurePa), label: "Ambient " + u.pressure(a.Design.AmbientPressurePa), style: dottedLine},
		{value: tq.conv(a.Design.HottestK), vertical: true, label: "Hottest " + u.temperature(a.Design.HottestK), style: dashDotLine},
	}
	ch.marks = []mark{{at: xy{tq.conv(a.Design.HottestK), pq.conv(a.Hot.PressurePa)}, label: u.pressure(a.Hot.PressurePa) + " at the hottest", shape: markCircle, filled: true}}
	if a.LiquidFullReached && lfP > 0 {
		ch.marks = append(ch.marks, mark{at: xy{tq.conv(a.LiquidFullK), pq.conv(lfP)}, label: "Liquid-full at " + u.temperature(a.LiquidFullK), shape: markSquare})
	}
	w.d.drawChart(ch, chartHeight)
	var notes []string
	if log {
		notes = append(notes, "The pressure axis is logarithmic so that the steep rise past the liquid-full point does not flatten the rest of the curve.")
	}
	if a.LiquidFullReached && a.LiquidFullK > hi {
		notes = append(notes, "The vessel would go liquid-full at "+u.temperature(a.LiquidFullK)+", beyond the right edge of the chart.")
	}
	if a.Flags.Extrapolated() {
		notes = append(notes, "‡ Part of this curve was computed outside a correlation's published range ("+a.Flags.String()+"); see the data provenance.")
	}
	if len(curve) == 0 {
		notes = append(notes, "The vessel model gave no pressure over this range.")
	}
	for _, n := range notes {
		w.d.note(n)
	}
}

// pressureTemperatureChart sets up the axes of a pressure–temperature
// chart: lo and hi in K, ylo and yhi already in display units.
func pressureTemperatureChart(u unitSystem, title string, lo, hi float64, log bool, ylo, yhi float64) chart {
	tq, pq := u.temperatureQ(), u.pressureQ()
	ylab := "Absolute pressure (" + pq.unit + ")"
	if log {
		ylab += ", log scale"
	}
	return chart{
		title: title,
		x:     axis{label: "Temperature (" + tq.unit + ")", min: tq.conv(lo), max: tq.conv(hi)},
		y:     axis{label: ylab, min: ylo, max: yhi, log: log},
	}
}

func convertXY(pts []xy, xq, yq quantity) []xy {
	out := make([]xy, len(pts))
	for i, p := range pts {
		out[i] = xy{xq.conv(p.x), yq.conv(p.y)}
	}
	return out
}

// limitLabel names a limit briefly: "STEL 16 ppm (EPA ECEL)".
func limitLabel(l fluids.ExposureLimit) string {
	who := l.Body + " " + l.Kind
	if l.Kind == l.Averaging {
		who = l.Body
	}
	return fmt.Sprintf("%s %s ppm (%s)", l.Averaging, plain(l.PPM), who)
}

// governingLimits returns the library limits that govern the review, one
// per averaging kind.
func governingLimits(a *hazards.Assessment) []fluids.ExposureLimit {
	var out []fluids.ExposureLimit
	for _, r := range a.Release.Limits {
		for _, l := range a.Fluid.ExposureLimits {
			if r.Governs && r.Name == l.Label() && r.PPM == l.PPM && r.Kind == l.Averaging {
				out = append(out, l)
				break
			}
		}
	}
	return out
}

var limitStyles = map[string]lineStyle{
	fluids.AveragingIDLH:    longDashLine,
	fluids.AveragingCeiling: dashDotLine,
	fluids.AveragingSTEL:    dashedLine,
	fluids.AveragingTWA:     dottedLine,
}

// concentrationChart is figure 2: concentration against time after the
// breakage, in the well-mixed room and the near field.
func (w *assessmentWriter) concentrationChart() {
	a := w.a
	mm := a.Fluid.MolarMass.Value
	tEnd := math.Max(a.Design.Room.ExposureMinutes, 10)
	tStart := 0.1
	zones := []struct {
		z    hazards.Zone
		name string
		st   lineStyle
	}{
		{hazards.WellMixedRoom, "Well-mixed room", solidLine},
		{hazards.NearField, "Near field, beside the breakage", dashedLine},
	}
	cmin, cmax := math.Inf(1), 0.0
	var ss []series
	for _, z := range zones {
		pts := make([]xy, 0, curveSamples+1)
		peakMin := hazards.PeakAveragingS / 60.0 // the curves top out here: sample it exactly
		peakAt := int(math.Round(curveSamples * math.Log(peakMin/tStart) / math.Log(tEnd/tStart)))
		for i := 0; i <= curveSamples; i++ {
			t := tStart * math.Pow(tEnd/tStart, float64(i)/curveSamples)
			if i == peakAt && i > 0 && i < curveSamples {
				t = peakMin
			}
			ppm := units.MgPerM3ToPpm(concentrationAt(a, z.z, t*60), mm)
			if finite(ppm) && ppm > 0 {
				pts = append(pts, xy{t, ppm})
				cmin, cmax = math.Min(cmin, ppm), math.Max(cmax, ppm)
			}
		}
		ss = append(ss, series{name: z.name, pts: pts, style: z.st})
	}
	var lines []refLine
	lmin, lmax := math.Inf(1), 0.0
	for _, l := range governingLimits(a) {
		lines = append(lines, refLine{value: l.PPM, label: limitLabel(l), style: limitStyles[l.Averaging]})
		lmin, lmax = math.Min(lmin, l.PPM), math.Max(lmax, l.PPM)
	}
	if fl := a.Fluid.Flammability; fl.Flammable && fl.LFLPercent != nil {
		v := fl.LFLPercent.Value * 1e4 * a.Design.Criteria.MaxPercentLFL / 100
		lines = append(lines, refLine{value: v, label: fmt.Sprintf("%s %% of the LFL, %s ppm", plain(a.Design.Criteria.MaxPercentLFL), plain(v)),
			style: lineStyle{dash: []float64{1.2, 0.6}, width: 0.35, colour: midGrey}})
		lmin, lmax = math.Min(lmin, v), math.Max(lmax, v)
	}
	if cmax == 0 {
		cmin, cmax = 1, 10
	}
	lo := math.Max(math.Min(cmin, lmin)/2, cmax*1e-6)
	hi := math.Max(cmax, lmax) * 1.5
	ylo, yhi := logRange(lo, hi)
	ch := chart{
		title:  "Figure 2. Vapour concentration after a breakage",
		x:      axis{label: "Time after the breakage (min), log scale", min: tStart, max: tEnd, log: true},
		y:      axis{label: "Concentration, 1-minute average (ppm), log scale", min: ylo, max: yhi, log: true},
		series: ss,
		lines:  lines,
	}
	w.d.drawChart(ch, chartHeight)
	w.d.note("Curves are one-minute averages (the average over the minute before each time), held to the physical bound; the peak is their highest point. Horizontal lines are the governing published limits for the chosen bodies; a limit with a longer averaging time applies to the average over that time, not to the curve.")
}
