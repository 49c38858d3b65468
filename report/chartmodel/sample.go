package chartmodel

import (
	"errors"
	"math"
	"slices"

	"ullage/fluids/units"
	"ullage/hazards"
)

// Sampling densities of the curves.
const (
	pressureSamples = 160
	releaseSamples  = 160
)

// sample evaluates f at n+1 points from lo to hi, evenly spaced (on a log
// scale when logSpaced), and exactly at each of the exact values inside
// the span, so that a knee or a peak is drawn sharp. Points where f has no
// answer are left out. This is the only sampling loop of the charts.
func sample(lo, hi float64, n int, logSpaced bool, exact []float64, f func(float64) (float64, bool)) (xs, ys []float64) {
	at := make([]float64, 0, n+1+len(exact))
	for i := 0; i <= n; i++ {
		t := float64(i) / float64(n)
		if logSpaced {
			at = append(at, lo*math.Pow(hi/lo, t))
		} else {
			at = append(at, lo+(hi-lo)*t)
		}
	}
	for _, e := range exact {
		if e > lo && e < hi {
			at = append(at, e)
		}
	}
	slices.Sort(at)
	at = slices.CompactFunc(at, func(a, b float64) bool { return math.Abs(a-b) <= 1e-9*math.Abs(b) })
	xs, ys = make([]float64, 0, len(at)), make([]float64, 0, len(at))
	for _, x := range at {
		if y, ok := f(x); ok && finite(y) {
			xs, ys = append(xs, x), append(ys, y)
		}
	}
	return xs, ys
}

// stateAt is a.StateAt that turns the panic of an assessment not built by
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

// Temperature span of the pressure chart, in K past the design's own
// temperatures.
const (
	belowColdestK = 10 // the chart starts this far below the coldest
	beyondHotK    = 25 // and runs this far past the hottest,
	reachK        = 60 // or up to this far, to show the liquid-full point or the maximum safe temperature
)

// PressureSpan is the temperature span of the pressure chart of a, in K:
// from a little below the coldest (not below the fluid's freezing point)
// to a little past the hottest, or past the liquid-full point or the
// maximum safe temperature when either lies not far above the hottest.
func PressureSpan(a *hazards.Assessment) (lo, hi float64) {
	d := a.Design
	lo, hi = d.ColdestK-belowColdestK, d.HottestK+beyondHotK
	if a.LiquidFullReached && a.LiquidFullK+5 > hi && a.LiquidFullK < d.HottestK+reachK {
		hi = a.LiquidFullK + 5
	}
	if a.MaxSafe.TemperatureBound == hazards.BoundFound && a.MaxSafe.TemperatureK+5 > hi && a.MaxSafe.TemperatureK < d.HottestK+reachK {
		hi = a.MaxSafe.TemperatureK + 5
	}
	if a.Fluid != nil {
		lo = math.Max(lo, a.Fluid.FreezingPoint.Value+0.01)
	}
	return lo, hi
}

// PressureCurve samples the absolute pressure inside the vessel (Pa)
// from lo to hi K, exactly at the hottest and the liquid-full
// temperatures. Temperatures where the model has no answer are left out.
func PressureCurve(a *hazards.Assessment, lo, hi float64) (tK, pPa []float64) {
	exact := []float64{a.Design.HottestK}
	if a.LiquidFullReached {
		exact = append(exact, a.LiquidFullK)
	}
	return sample(lo, hi, pressureSamples, false, exact, func(t float64) (float64, bool) {
		s, err := stateAt(a, t)
		return s.PressurePa, err == nil && s.PressurePa > 0
	})
}

// ReleaseCurve samples the one-minute average concentration (ppm) in a
// zone of the room from first to last minutes after the breakage, evenly
// on a log scale and exactly where the curves top out.
func ReleaseCurve(a *hazards.Assessment, z hazards.Zone, first, last float64) (minutes, ppm []float64) {
	mm := a.Fluid.MolarMass.Value
	return sample(first, last, releaseSamples, true, []float64{hazards.PeakAveragingS / 60}, func(m float64) (float64, bool) {
		c := units.MgPerM3ToPpm(concentrationAt(a, z, m*60), mm)
		return c, c > 0
	})
}
