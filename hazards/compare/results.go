package compare

import (
	"math"
	"strconv"

	"ullage/fluids/units"
	"ullage/hazards"
)

// reading is one result of one assessment.
type reading struct {
	value float64 // in the display unit; 0 when there is no number
	rank  float64 // what Better/Worse compare; may be ±Inf ("not reached")
	text  string  // for a person, with the unit
	// unranked: nothing to compare (not assessed on this side), so no
	// better or worse is claimed.
	unranked bool
}

// quantity is one headline result and how to read it.
type quantity struct {
	name, unit     string
	higherIsBetter bool
	read           func(a *hazards.Assessment) reading
}

// plain is a reading whose number says it all.
func plain(value float64, text string) reading { return reading{value: value, rank: value, text: text} }

// quantities are the headline results, in the order Compare lists them.
var quantities = []quantity{
	{"Pressure at the hottest temperature", "kPa", false, func(a *hazards.Assessment) reading {
		kPa := a.Hot.PressurePa / 1000
		return plain(kPa, sig(kPa, 4)+" kPa")
	}},
	{"Ullage at the hottest temperature", "%", true, func(a *hazards.Assessment) reading {
		return plain(a.Hot.UllagePercent, fixed(a.Hot.UllagePercent, 1)+" %")
	}},
	{"Liquid-full temperature", "°C", true, func(a *hazards.Assessment) reading {
		if !a.LiquidFullReached {
			return reading{rank: math.Inf(1), text: "not reached"}
		}
		c := units.KelvinToCelsius(a.LiquidFullK)
		return plain(c, fixed(c, 1)+" °C")
	}},
	{"Burst safety factor", "", true, func(a *hazards.Assessment) reading {
		return safetyFactor(a.BurstSafetyFactor)
	}},
	{"Failure probability over the service life", "", false, func(a *hazards.Assessment) reading {
		return plain(a.FailureProbability, sig(a.FailureProbability, 2))
	}},
	{"Implosion safety factor", "", true, func(a *hazards.Assessment) reading {
		return safetyFactor(a.ImplosionSafetyFactor)
	}},
	{"Thermal-shock safety factor (weakest part)", "", true, thermalShockReading},
	{"Residual stress at the seal", "MPa", false, sealStressReading},
	{"Maximum safe temperature", "°C", true, func(a *hazards.Assessment) reading {
		c := units.KelvinToCelsius(a.MaxSafe.TemperatureK)
		return plain(c, bounded(a.MaxSafe.TemperatureBound, fixed(c, 1)+" °C"))
	}},
	{"Maximum safe fill", "g", true, func(a *hazards.Assessment) reading {
		g := a.MaxSafe.FillMassKg * 1000
		return plain(g, bounded(a.MaxSafe.FillBound, sig(g, 3)+" g"))
	}},
	{"Stored energy at rupture", "J", false, func(a *hazards.Assessment) reading {
		return plain(a.Rupture.StoredEnergyJ, sig(a.Rupture.StoredEnergyJ, 3)+" J")
	}},
	{"Peak concentration", "ppm", false, func(a *hazards.Assessment) reading {
		return plain(a.Release.Peak.PPM, sig(a.Release.Peak.PPM, 3)+" ppm")
	}},
	{"15-minute average (STEL)", "ppm", false, func(a *hazards.Assessment) reading {
		return plain(a.Release.STEL.PPM, sig(a.Release.STEL.PPM, 3)+" ppm")
	}},
	{"8-hour time-weighted average (TWA)", "ppm", false, func(a *hazards.Assessment) reading {
		return plain(a.Release.TWA8h.PPM, sig(a.Release.TWA8h.PPM, 3)+" ppm")
	}},
	{"Peak as a percentage of the LFL", "% LFL", false, func(a *hazards.Assessment) reading {
		if a.Fluid == nil || !a.Fluid.Flammability.Flammable || a.Fluid.Flammability.LFLPercent == nil {
			return reading{text: "not flammable"}
		}
		return plain(a.Release.PercentLFL, fixed(a.Release.PercentLFL, 1)+" % LFL")
	}},
}

// safetyFactor reads a safety factor, saying when it is at the cap that
// stands for "no load".
func safetyFactor(x float64) reading {
	if x >= hazards.SafetyFactorCap {
		return plain(x, "≥ "+sig(hazards.SafetyFactorCap, 4)+" (no load)")
	}
	return plain(x, sig(x, 3))
}

// bounded marks a searched limit that lies outside its search range.
func bounded(b hazards.Bound, text string) string {
	switch b {
	case hazards.BoundAbove:
		return "above " + text
	case hazards.BoundBelow:
		return "below " + text
	}
	return text
}

// notAssessed is the reading of a side without an assessment.
var notAssessed = reading{text: "not assessed"}

func resultChanges(a, b *hazards.Assessment) []ResultChange {
	out := make([]ResultChange, len(quantities))
	for i, q := range quantities {
		oldR, newR := notAssessed, notAssessed
		if a != nil {
			oldR = sanitise(q.read(a))
		}
		if b != nil {
			newR = sanitise(q.read(b))
		}
		rc := ResultChange{Name: q.name, Unit: q.unit, Old: oldR.value, New: newR.value, OldText: oldR.text, NewText: newR.text}
		if a != nil && b != nil && !oldR.unranked && !newR.unranked && oldR.rank != newR.rank {
			rc.Better = (newR.rank > oldR.rank) == q.higherIsBetter
			rc.Worse = !rc.Better
		}
		out[i] = rc
	}
	return out
}

// sanitise keeps a non-finite number (which the engine never produces)
// from reaching a result.
func sanitise(r reading) reading {
	if math.IsNaN(r.value) || math.IsInf(r.value, 0) {
		return reading{text: "not computed"}
	}
	if math.IsNaN(r.rank) {
		r.rank = r.value
	}
	return r
}

// sig formats x with the given number of significant digits, in plain
// notation between 0.001 and 10 million and in exponent notation outside.
func sig(x float64, digits int) string {
	ax := math.Abs(x)
	switch {
	case x == 0:
		return "0"
	case ax >= 1e-3 && ax < 1e7:
		exp := int(math.Floor(math.Log10(ax)))
		return strconv.FormatFloat(x, 'f', max(digits-1-exp, 0), 64)
	}
	return strconv.FormatFloat(x, 'e', digits-1, 64)
}

// fixed formats x with the given number of decimals, without "-0.0".
func fixed(x float64, decimals int) string {
	s := strconv.FormatFloat(x, 'f', decimals, 64)
	if s[0] == '-' && isZeroText(s[1:]) {
		return s[1:]
	}
	return s
}

func isZeroText(s string) bool {
	for _, c := range s {
		if c != '0' && c != '.' {
			return false
		}
	}
	return true
}
