package chartmodel

import (
	"math"

	"ullage/fluids"
	"ullage/hazards"
)

// fillMapSamples is the number of fill masses the fill–temperature map
// assesses.
const fillMapSamples = 40

// FillMapData are the lines of the fill–temperature map in SI, one entry
// per sampled fill mass (kg); a temperature (K) is NaN where the line does
// not exist for that fill (never liquid-full, or the limit lies outside
// the searched range).
type FillMapData struct {
	FillKg []float64
	// LiquidFullK is where the vessel goes liquid-full.
	LiquidFullK []float64
	// BurstLimitK is where the burst safety factor falls to the required
	// minimum; UllageLimitK where the ullage falls to the required minimum.
	BurstLimitK, UllageLimitK []float64
}

// FillMap assesses the design at fill masses from a tenth to twice its
// own fill, all else equal, and records for each the liquid-full
// temperature and the temperatures where the burst safety factor and the
// ullage reach their required minimums, each from the engine's own root
// search. Fills the engine refuses are left out.
func FillMap(d hazards.Design, lib *fluids.Library) FillMapData {
	var out FillMapData
	nominal := d.FillMassKg
	if !(nominal > 0) {
		return out
	}
	nan := math.NaN()
	_, _ = sample(0.1*nominal, 2*nominal, fillMapSamples, false, []float64{nominal}, func(m float64) (float64, bool) {
		dd := d
		dd.FillMassKg = m
		a, err := hazards.Assess(dd, lib)
		if err != nil {
			return 0, false
		}
		lf := nan
		if a.LiquidFullReached {
			lf = a.LiquidFullK
		}
		burst, ullage := nan, nan
		if r := a.MaxSafe.PressureRoot; r != nil {
			burst = r.X
		}
		if r := a.MaxSafe.UllageRoot; r != nil {
			ullage = r.X
		}
		out.FillKg = append(out.FillKg, m)
		out.LiquidFullK = append(out.LiquidFullK, lf)
		out.BurstLimitK = append(out.BurstLimitK, burst)
		out.UllageLimitK = append(out.UllageLimitK, ullage)
		return 0, true
	})
	return out
}

// FillMapFor is FillMap for an assessment, with its own fluid, so that
// the map agrees with the assessment whatever library it came from.
func FillMapFor(a *hazards.Assessment) FillMapData {
	if a == nil || a.Fluid == nil {
		return FillMapData{}
	}
	sub := fluids.BuiltinSubstanceOf(a.Fluid) // keeps a built-in fluid's reference equation
	if sub == nil {
		var err error
		if sub, err = fluids.NewSubstance(a.Fluid); err != nil {
			return FillMapData{}
		}
	}
	return FillMap(a.Design, (&fluids.Library{}).With(sub))
}

// MassQuantity converts and formats a fill mass for the map's axis.
type MassQuantity = Quantity

// FillTemperature describes the fill–temperature map: fill mass across,
// temperature up; the liquid-full line, the line where the burst safety
// factor reaches its minimum and the minimum-ullage line; the design
// point with its tolerance box (fill ± its tolerance, up to the hottest);
// and the hottest and coldest temperatures. Below all three lines a fill
// and temperature pass these criteria. The temperature axis depends only
// on the design's coldest and hottest temperatures.
func FillTemperature(title string, m FillMapData, a *hazards.Assessment, u Units, mass MassQuantity) Chart {
	ch := Chart{
		Title:  title,
		X:      Axis{Label: "Fill mass (" + mass.Unit + ")"},
		Y:      Axis{Label: "Temperature (" + u.Temperature.Unit + ")"},
		Legend: TopRight,
	}
	if a == nil || len(m.FillKg) < 2 {
		ch.Empty = "No fill–temperature map: there are no results yet."
		return ch
	}
	tq := u.Temperature
	line := func(name string, ys []float64, s Style) {
		ser := Series{Name: name, Style: s}
		for i, m := range m.FillKg {
			ser.X = append(ser.X, mass.FromSI(m))
			y := math.NaN()
			if finite(ys[i]) {
				y = tq.FromSI(ys[i])
			}
			ser.Y = append(ser.Y, y)
		}
		ch.Series = append(ch.Series, ser)
	}
	line("Liquid-full", m.LiquidFullK, Style{Solid, 2, Purple})
	line("Burst safety factor at its minimum", m.BurstLimitK, Style{Dashed, 2, Red})
	line("Ullage at its minimum", m.UllageLimitK, Style{DashDot, 2, Blue})
	d := a.Design
	ch.Lines = append(ch.Lines,
		Line{Label: "Hottest " + tq.Format(d.HottestK), Value: tq.FromSI(d.HottestK), Style: Style{LongDash, 1, Orange}},
		Line{Label: "Coldest " + tq.Format(d.ColdestK), Value: tq.FromSI(d.ColdestK), Style: Style{ShortDash, 1, Blue}})
	x := mass.FromSI(d.FillMassKg)
	ch.Markers = append(ch.Markers, Marker{Label: "Design: " + mass.Format(d.FillMassKg) + " at the hottest", X: x, Y: tq.FromSI(d.HottestK), Shape: Diamond, Filled: true, Colour: Green})
	if tol := d.FillMassToleranceKg; tol > 0 {
		ch.Boxes = append(ch.Boxes, Box{X0: mass.FromSI(d.FillMassKg - tol), X1: mass.FromSI(d.FillMassKg + tol), Y0: tq.FromSI(d.ColdestK), Y1: tq.FromSI(d.HottestK), Style: Style{Dotted, 1, Green}})
		ch.Notes = append(ch.Notes, "The dotted box spans the fill tolerance (± "+mass.Format(tol)+") from the coldest to the hottest temperature.")
	}
	// The temperature axis runs from the coldest to well past the hottest,
	// whatever the lines do, so that two revisions with the same
	// temperatures share their axes; lines beyond it are clipped.
	lo, hi := d.ColdestK, d.HottestK+2*reachK
	ch.X.Min, ch.X.Max = LinearRange(mass.FromSI(m.FillKg[0]), mass.FromSI(m.FillKg[len(m.FillKg)-1]))
	ch.Y.Min, ch.Y.Max = LinearRange(tq.FromSI(lo-5), tq.FromSI(hi+5))
	ch.Notes = append(ch.Notes, "Each line comes from assessing the design at that fill with everything else unchanged; a fill and temperature below all three lines meet the burst and ullage criteria and stay short of liquid-full.")
	return ch
}
