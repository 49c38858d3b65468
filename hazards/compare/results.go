package compare

import (
	"math"

	"ullage/hazards"
)

// Quantity is the kind of a headline result.
type Quantity string

// Kinds of headline result.
const (
	Pressure      Quantity = "pressure"       // Pa
	Percent       Quantity = "percent"        // %
	Temperature   Quantity = "temperature"    // K
	Factor        Quantity = "factor"         // a safety factor
	Probability   Quantity = "probability"    // a probability
	Stress        Quantity = "stress"         // Pa
	Mass          Quantity = "mass"           // kg
	Energy        Quantity = "energy"         // J
	Concentration Quantity = "concentration"  // ppm
	PercentLFL    Quantity = "percent-of-lfl" // % of the lower flammable limit
)

// State says why a reading has no value.
type State string

// States of a reading without a value.
const (
	NotReached   State = "not reached"  // the vessel never goes liquid-full
	NotAssessed  State = "not assessed" // no assessment, or no sudden change given
	NotFlammable State = "not flammable"
	NoneGiven    State = "none given"   // no residual stress given at the seal
	NotComputed  State = "not computed" // a value that was not finite
	// NoBurstLoad: the vessel is not above ambient pressure at the
	// hottest temperature, so the burst safety factor and the failure
	// probability are not results (the best case of each).
	NoBurstLoad State = State(hazards.ReasonNoBurstLoad)
	// NoExternalLoad: the vessel is not below ambient pressure at the
	// coldest temperature, so the implosion safety factor is not a result.
	NoExternalLoad State = State(hazards.ReasonNoExternalLoad)
)

// Reading is one side of a headline result. Value is in SI units and is
// 0 when State says why there is none. Bound, when set, says the value
// is a bound: "above" or "below" for a searched limit outside its search
// range, "at-least" for a safety factor at the cap that stands for no
// load. Part names the part the value belongs to, and for a thermal-shock
// result ShockDeltaK and ShockDirection give the governing sudden change.
type Reading struct {
	Value          float64 `json:"value"`
	State          State   `json:"state,omitempty"`
	Bound          string  `json:"bound,omitempty"`
	Part           string  `json:"part,omitempty"`
	ShockDeltaK    float64 `json:"shock_delta_k,omitempty"`
	ShockDirection string  `json:"shock_direction,omitempty"`
	// rank is what Better/Worse compare; it may be ±Inf ("not reached").
	rank float64
	// unranked: nothing to compare, so no better or worse is claimed.
	unranked bool
}

// quantity is one headline result and how to read it.
type quantity struct {
	name           string
	kind           Quantity
	unit           string
	higherIsBetter bool
	read           func(a *hazards.Assessment) Reading
}

// value is a reading whose number says it all.
func value(x float64) Reading { return Reading{Value: x, rank: x} }

// quantities are the headline results, in the order Compare lists them.
var quantities = []quantity{
	{"Pressure at the hottest temperature", Pressure, "Pa", false, func(a *hazards.Assessment) Reading {
		return value(a.Hot.PressurePa)
	}},
	{"Ullage at the hottest temperature", Percent, "%", true, func(a *hazards.Assessment) Reading {
		return value(a.Hot.UllagePercent)
	}},
	{"Liquid-full temperature", Temperature, "K", true, func(a *hazards.Assessment) Reading {
		if !a.LiquidFullReached {
			return Reading{rank: math.Inf(1), State: NotReached}
		}
		return value(a.LiquidFullK)
	}},
	{"Burst safety factor", Factor, "", true, func(a *hazards.Assessment) Reading {
		if !a.HasBurstLoad() {
			return Reading{State: NoBurstLoad, rank: math.Inf(1)}
		}
		return safetyFactor(a.BurstSafetyFactor)
	}},
	{"Failure probability over the service life", Probability, "", false, func(a *hazards.Assessment) Reading {
		if !a.HasBurstLoad() {
			return Reading{State: NoBurstLoad, rank: math.Inf(-1)}
		}
		return value(a.FailureProbability)
	}},
	{"Implosion safety factor", Factor, "", true, func(a *hazards.Assessment) Reading {
		if !a.HasExternalLoad() {
			return Reading{State: NoExternalLoad, rank: math.Inf(1)}
		}
		return safetyFactor(a.ImplosionSafetyFactor)
	}},
	{"Thermal-shock safety factor (weakest part)", Factor, "", true, thermalShockReading},
	{"Residual stress at the seal", Stress, "Pa", false, sealStressReading},
	{"Maximum safe temperature", Temperature, "K", true, func(a *hazards.Assessment) Reading {
		return bounded(a.MaxSafe.TemperatureBound, value(a.MaxSafe.TemperatureK))
	}},
	{"Maximum safe fill", Mass, "kg", true, func(a *hazards.Assessment) Reading {
		return bounded(a.MaxSafe.FillBound, value(a.MaxSafe.FillMassKg))
	}},
	{"Stored energy at rupture", Energy, "J", false, func(a *hazards.Assessment) Reading {
		return value(a.Rupture.StoredEnergyJ)
	}},
	{"Peak concentration", Concentration, "ppm", false, func(a *hazards.Assessment) Reading {
		return value(a.Release.Peak.PPM)
	}},
	{"15-minute average (STEL)", Concentration, "ppm", false, func(a *hazards.Assessment) Reading {
		return value(a.Release.STEL.PPM)
	}},
	{"8-hour time-weighted average (TWA)", Concentration, "ppm", false, func(a *hazards.Assessment) Reading {
		return value(a.Release.TWA8h.PPM)
	}},
	{"Peak as a percentage of the LFL", PercentLFL, "% LFL", false, func(a *hazards.Assessment) Reading {
		if a.Fluid == nil || !a.Fluid.Flammability.Flammable || a.Fluid.Flammability.LFLPercent == nil {
			return Reading{State: NotFlammable}
		}
		return value(a.Release.PercentLFL)
	}},
}

// safetyFactor reads a safety factor, marking the cap that stands for
// "no load" as a lower bound.
func safetyFactor(x float64) Reading {
	r := value(x)
	if x >= hazards.SafetyFactorCap {
		r.Bound = string(hazards.AtLeast)
	}
	return r
}

// bounded marks a searched limit that lies outside its search range.
func bounded(b hazards.Bound, r Reading) Reading {
	switch b {
	case hazards.BoundAbove:
		r.Bound = "above"
	case hazards.BoundBelow:
		r.Bound = "below"
	}
	return r
}

// notAssessed is the reading of a side without an assessment.
var notAssessed = Reading{State: NotAssessed, unranked: true}

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
		rc := ResultChange{Name: q.name, Quantity: q.kind, Unit: q.unit}
		if a != nil && b != nil && !oldR.unranked && !newR.unranked && oldR.rank != newR.rank {
			rc.Better = (newR.rank > oldR.rank) == q.higherIsBetter
			rc.Worse = !rc.Better
		}
		oldR.rank, oldR.unranked, newR.rank, newR.unranked = 0, false, 0, false
		rc.Old, rc.New = oldR, newR
		out[i] = rc
	}
	return out
}

// sanitise keeps a non-finite number (which the engine never produces)
// from reaching a result.
func sanitise(r Reading) Reading {
	if math.IsNaN(r.Value) || math.IsInf(r.Value, 0) {
		return Reading{State: NotComputed, unranked: true}
	}
	if math.IsNaN(r.rank) {
		r.rank = r.Value
	}
	return r
}
