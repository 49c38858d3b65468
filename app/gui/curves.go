package gui

import (
	"math"

	"ullage/fluids"
	"ullage/fluids/units"
	"ullage/hazards"
)

// ptCurve is the vessel's pressure against temperature, in SI, with the
// points a reviewer checks it against.
type ptCurve struct {
	T, P []float64 // K, Pa absolute
	// AllowablePa is the pressure at which the burst safety factor equals
	// the required one; AmbientPa the outside pressure.
	AllowablePa, AmbientPa float64
	HottestK, ColdestK     float64
	HotPa                  float64
	// LiquidFullK is where the vessel goes liquid-full; shown when
	// LiquidFull is true.
	LiquidFullK float64
	LiquidFull  bool
	// MaxSafeK is the maximum safe temperature when it was found inside
	// the searched range.
	MaxSafeK     float64
	MaxSafeFound bool
	// RequiredSF is the safety factor the allowable pressure carries.
	RequiredSF float64
}

// ptPoints is the number of temperatures sampled for the chart.
const ptPoints = 140

// pressureCurve samples the vessel state from below the coldest to past
// the hottest temperature (and the liquid-full point when it is near).
func pressureCurve(a *hazards.Assessment) ptCurve {
	d := a.Design
	c := ptCurve{
		AllowablePa: a.AllowablePressurePa(), AmbientPa: d.AmbientPressurePa,
		HottestK: d.HottestK, ColdestK: d.ColdestK, HotPa: a.Hot.PressurePa,
		LiquidFullK: a.LiquidFullK, LiquidFull: a.LiquidFullReached,
		MaxSafeK: a.MaxSafe.TemperatureK, MaxSafeFound: a.MaxSafe.TemperatureBound == hazards.BoundFound,
		RequiredSF: a.RequiredSafetyFactor,
	}
	lo, hi := ptRange(a)
	c.T = make([]float64, 0, ptPoints+3)
	c.P = make([]float64, 0, ptPoints+3)
	temps := make([]float64, 0, ptPoints+3)
	for i := 0; i <= ptPoints; i++ {
		temps = append(temps, lo+(hi-lo)*float64(i)/ptPoints)
	}
	// Sample exactly at the liquid-full point so the kink is drawn sharp.
	if c.LiquidFull && c.LiquidFullK > lo && c.LiquidFullK < hi {
		temps = insertSorted(temps, c.LiquidFullK)
	}
	for _, t := range temps {
		st, err := a.StateAt(t)
		if err != nil || !finite(st.PressurePa) {
			continue
		}
		c.T = append(c.T, t)
		c.P = append(c.P, st.PressurePa)
	}
	return c
}

// ptRange returns the temperatures the chart spans: from a little below
// the coldest to a little past the hottest, or past the liquid-full point
// when that lies not far above the hottest.
func ptRange(a *hazards.Assessment) (lo, hi float64) {
	d := a.Design
	lo = d.ColdestK - 10
	hi = d.HottestK + 20
	if a.LiquidFullReached && a.LiquidFullK+10 > hi && a.LiquidFullK < d.HottestK+60 {
		hi = a.LiquidFullK + 10
	}
	if a.MaxSafe.TemperatureBound == hazards.BoundFound && a.MaxSafe.TemperatureK+10 > hi && a.MaxSafe.TemperatureK < d.HottestK+60 {
		hi = a.MaxSafe.TemperatureK + 10
	}
	if m := minTemperature(a); lo < m {
		lo = m
	}
	return lo, hi
}

// minTemperature is the lowest temperature the fluid's state is defined
// at (its freezing point, taken from the fluid data).
func minTemperature(a *hazards.Assessment) float64 {
	if a.Fluid == nil {
		return 0
	}
	return a.Fluid.FreezingPoint.Value + 0.01
}

func insertSorted(xs []float64, x float64) []float64 {
	for i, v := range xs {
		if v > x {
			xs = append(xs, 0)
			copy(xs[i+1:], xs[i:])
			xs[i] = x
			return xs
		}
	}
	return append(xs, x)
}

// limitLine is an exposure or flammability limit for the release chart.
type limitLine struct {
	Label string
	PPM   float64
}

// concCurves are the concentrations after a breakage, in ppm.
type concCurves struct {
	Minutes          []float64
	Room, Near, Far  []float64
	Limits           []limitLine
	ExposureMinutes  float64
	PeakPPM, STELPPM float64
}

// concPoints is the number of times sampled for the release chart.
const concPoints = 160

// firstMinute is the first time on the release chart, in minutes: three
// seconds after the breakage.
const firstMinute = 0.05

// releaseCurves samples the room models over the exposure time and
// gathers the limits that apply.
func releaseCurves(a *hazards.Assessment) concCurves {
	room := a.Design.Room
	end := room.ExposureMinutes
	if !(end > 0) {
		end = 480
	}
	mm := a.Fluid.MolarMass.Value
	c := concCurves{ExposureMinutes: end, PeakPPM: a.Release.Peak.PPM, STELPPM: a.Release.STEL.PPM}
	n := concPoints
	c.Minutes = make([]float64, n+1)
	c.Room = make([]float64, n+1)
	c.Near = make([]float64, n+1)
	c.Far = make([]float64, n+1)
	// Times are spaced evenly on a log scale from a few seconds after the
	// breakage, where the near field changes fastest, to the end of the
	// stay.
	first := math.Min(firstMinute, end/100)
	peakMin := hazards.PeakAveragingS / 60.0 // the curves top out here: sample it exactly
	peakAt := int(math.Round(float64(n) * math.Log(peakMin/first) / math.Log(end/first)))
	for i := 0; i <= n; i++ {
		m := first * math.Pow(end/first, float64(i)/float64(n))
		if i == peakAt && i > 0 && i < n {
			m = peakMin
		}
		s := m * 60
		c.Minutes[i] = m
		c.Room[i] = units.MgPerM3ToPpm(a.Concentration(hazards.WellMixedRoom, s), mm)
		c.Near[i] = units.MgPerM3ToPpm(a.Concentration(hazards.NearField, s), mm)
		c.Far[i] = units.MgPerM3ToPpm(a.Concentration(hazards.FarField, s), mm)
	}
	for _, f := range a.Findings {
		var name string
		switch f.Criterion {
		case hazards.CriterionIDLH:
			name = "IDLH"
		case hazards.CriterionCeiling:
			name = "ceiling"
		case hazards.CriterionSTEL:
			name = "STEL"
		case hazards.CriterionTWA:
			name = "TWA"
		default:
			continue
		}
		if f.Limit > 0 && finite(f.Limit) {
			c.Limits = append(c.Limits, limitLine{Label: name + " " + sigFigures(f.Limit, 3) + " ppm", PPM: f.Limit})
		}
	}
	if fl := a.Fluid.Flammability; fl.Flammable && fl.LFLPercent != nil {
		frac := a.Design.Criteria.MaxPercentLFL
		ppm := fl.LFLPercent.Value * 1e4 * frac / 100
		c.Limits = append(c.Limits, limitLine{Label: sigFigures(frac, 3) + " % of LFL, " + sigFigures(ppm, 3) + " ppm", PPM: ppm})
	}
	return c
}

// exposureSummary lists the fluid's published exposure limits for the
// fluid section: body, kind, averaging and value.
func exposureSummary(f *fluids.Fluid) string {
	out := ""
	for _, l := range f.ExposureLimits {
		if out != "" {
			out += "; "
		}
		out += l.Label() + " " + sigFigures(l.PPM, 4) + " ppm"
	}
	if out == "" {
		return "no published numeric exposure limit in the library"
	}
	return out
}
