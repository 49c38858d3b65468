package hazards

import "math"

// Strength is the burst resistance of the whole envelope, from the Weibull
// weakest-link model with static fatigue:
//
//	P_f = 1 − exp(−Σᵢ (Aᵢ/A₀) (σᵢ,eq/σ₀)^m),   σᵢ,eq = σᵢ (t/t₀)^(1/n)
//
// σ₀ is the glass's characteristic strength for area A₀ and load duration
// t₀, m the Weibull modulus and n the stress-corrosion exponent. The
// weakest-link form is Weibull's (W. Weibull, J. Appl. Mech. 18, 293
// (1951)); the load-duration equivalence σ^n t = constant is the static
// fatigue law used by the ASTM E1300 glass failure prediction model
// (Beason and Morgan, J. Struct. Eng. 110(2), 1984, from memory). Each
// part's stress is taken as uniform over its outer surface at its largest
// value, which errs on the safe side.
type Strength struct {
	// ShortTermBurstPa is the overpressure at which 63.2 % of units would
	// fail under a load held for the reference duration t₀.
	ShortTermBurstPa float64
	// LongTermBurstPa is the same for the load held for the whole time at
	// the hottest temperature.
	LongTermBurstPa float64
	// DurationFactor is (t₀/t)^(1/n), the strength lost to static fatigue.
	DurationFactor float64
	// GoverningPart indexes the part contributing most to failure;
	// GoverningStrengthPa is that part's characteristic strength for its
	// area and the load duration, and AllowableStressPa that strength
	// divided by the minimum burst safety factor.
	GoverningPart       int
	GoverningStrengthPa float64
	AllowableStressPa   float64
}

func glassStrength(parts []PartStress, g *Glass, loadSeconds, minSafetyFactor float64) Strength {
	m := g.WeibullModulus.Value
	n := g.StressCorrosionExponent.Value
	s0 := g.CharacteristicStrength.Value
	a0 := g.ReferenceArea.Value
	sum := 0.0
	best, bestTerm := 0, -1.0
	for i, p := range parts {
		term := weakestLinkTerm(p, g)
		sum += term
		if term > bestTerm {
			best, bestTerm = i, term
		}
	}
	dur := 1.0
	if loadSeconds > g.ReferenceLoad.Value {
		dur = math.Pow(g.ReferenceLoad.Value/loadSeconds, 1/n)
	}
	short := s0 / math.Pow(sum, 1/m)
	gp := parts[best]
	partStrength := s0 * math.Pow(a0/gp.AreaM2, 1/m) * dur
	return Strength{
		ShortTermBurstPa:    short,
		LongTermBurstPa:     short * dur,
		DurationFactor:      dur,
		GoverningPart:       best,
		GoverningStrengthPa: partStrength,
		AllowableStressPa:   partStrength / minSafetyFactor,
	}
}

// weakestLinkTerm is one part's term (A/A₀)·k^m of the weakest-link sum.
// When the Weibull modulus m is a whole number, as in every catalogue
// glass, k^m is taken by repeated squaring, several times faster than
// math.Pow and equal to it within a few units in the last place.
func weakestLinkTerm(p PartStress, g *Glass) float64 {
	m := g.WeibullModulus.Value
	var km float64
	if m == math.Trunc(m) && m <= 64 {
		km = powWhole(p.StressPerPascal, int(m))
	} else {
		km = math.Pow(p.StressPerPascal, m)
	}
	return p.AreaM2 / g.ReferenceArea.Value * km
}

// SafetyFactorCap is the largest safety factor reported; a part that
// carries no load reports this value rather than infinity.
const SafetyFactorCap = 1000

func safetyFactor(capacity, load float64) float64 {
	if load <= 0 || capacity/load > SafetyFactorCap {
		return SafetyFactorCap
	}
	return capacity / load
}

// boundedSafetyFactor returns the safety factor and, when it is capped at
// SafetyFactorCap, AtLeast: the true factor is at least the value. With no
// load it returns the cap; the findings then say there is no load.
func boundedSafetyFactor(capacity, load float64) (float64, Direction) {
	sf := safetyFactor(capacity, load)
	if load > 0 && sf >= SafetyFactorCap {
		return sf, AtLeast
	}
	return sf, ""
}

// smallestProbability is the upper bound reported when a failure
// probability is too small to represent: never exactly 0.
const smallestProbability = 1e-300

// boundedFailureProbability returns the failure probability and, when it
// is too small to compute, the bound smallestProbability with AtMost. With
// no load it returns 0; the findings then say there is no load.
func boundedFailureProbability(overPressure, longTermBurst, m float64) (float64, Direction) {
	p := failureProbability(overPressure, longTermBurst, m)
	if overPressure > 0 && !(p >= smallestProbability) {
		return smallestProbability, AtMost
	}
	return p, ""
}

// failureProbability returns the Weibull probability of failure for an
// overpressure held for the service load duration.
func failureProbability(overPressure, longTermBurst, m float64) float64 {
	if overPressure <= 0 {
		return 0
	}
	return -math.Expm1(-math.Pow(overPressure/longTermBurst, m))
}
