package hazards

import (
	"fmt"
	"strings"

	"ullage/fluids"
	"ullage/fluids/units"
)

func (a *Assessment) findings() {
	d := &a.Design
	cr := d.Criteria
	f := a.Fluid
	var fs []Finding

	// Ullage and the liquid-full point.
	u := atLeast(CriterionUllage, "Ullage at the hottest temperature", "%", a.Hot.UllagePercent, cr.MinUllagePercent, 1,
		DefaultCriteriaGrounds["min_ullage_percent"])
	u.Margin = (a.Hot.UllagePercent - cr.MinUllagePercent) / 100
	if u.Status == StatusPass && a.Hot.UllagePercent < cr.MinUllagePercent+ullageCautionPoints {
		u.Status = StatusCaution
	}
	if a.Hot.Phase == PhaseLiquidFull {
		u.Status = StatusFail
	}
	u.Message, u.MessageUS = inBoth(func(m measure) string {
		switch {
		case a.Hot.Phase == PhaseLiquidFull:
			return fmt.Sprintf("The vessel goes liquid-full at %s, below the hottest temperature %s; past that point the pressure climbs by about a megapascal per kelvin (some 80 psi per °F) and the glass will break.",
				m.temp(a.LiquidFullK), m.temp(d.HottestK))
		case a.LiquidFullReached:
			return fmt.Sprintf("%.1f %% of the volume is vapour space at %s; the vessel would go liquid-full at %s.",
				a.Hot.UllagePercent, m.temp(d.HottestK), m.temp(a.LiquidFullK))
		default:
			return fmt.Sprintf("%.1f %% of the volume is vapour space at %s; the fill is too small for the vessel ever to go liquid-full.", a.Hot.UllagePercent, m.temp(d.HottestK))
		}
	})
	fs = append(fs, u)
	if w := a.Worst; w != nil {
		fs = append(fs, worstCaseFinding(a, w))
	}

	// Burst.
	b := atLeast(CriterionBurst, "Burst safety factor at the hottest temperature", "", a.BurstSafetyFactor, cr.MinBurstSafetyFactor,
		safetyFactorCautionBand, DefaultCriteriaGrounds["min_burst_safety_factor"])
	b.ValueBound = a.BurstSafetyFactorBound
	over := a.Hot.PressurePa - d.AmbientPressurePa
	b.Message, b.MessageUS = inBoth(func(m measure) string {
		if over <= 0 {
			return fmt.Sprintf("The vessel is not over-pressurised at %s (%s inside, %s outside): %s.", m.temp(d.HottestK), m.pressure(a.Hot.PressurePa), m.pressure(d.AmbientPressurePa), ReasonNoBurstLoad.Words())
		}
		return fmt.Sprintf("%s over ambient at %s against a long-term burst overpressure of %s (%s, %s).",
			m.pressure(over), m.temp(d.HottestK), m.pressure(a.Strength.LongTermBurstPa), a.Glass.Name, a.Parts[a.Strength.GoverningPart].Name)
	})
	if over <= 0 {
		b.Status, b.NotApplicable, b.Value, b.Margin = StatusPass, ReasonNoBurstLoad, 0, 0
	}
	fs = append(fs, b)
	if ws := a.WorstStrength; ws != nil {
		fs = append(fs, worstStrengthFinding(a, ws))
	}

	p := atMost(CriterionFailure, "Failure probability over the service life", "", a.FailureProbability, cr.MaxFailureProbability, probabilityCautionFactor,
		DefaultCriteriaGrounds["max_failure_probability"])
	p.ValueBound = a.FailureProbabilityBound
	switch {
	case over <= 0:
		p.Status, p.NotApplicable, p.Value, p.Margin = StatusPass, ReasonNoBurstLoad, 0, 0
		p.Message = fmt.Sprintf("No overpressure at the hottest temperature: %s, so no failure probability is computed.", ReasonNoBurstLoad.Words())
	case p.ValueBound == AtMost:
		p.Message = fmt.Sprintf("Weibull probability that a unit breaks with the hottest-temperature pressure held for %.0f h over %.3g years: at most %.2g (too small to compute; an upper bound).",
			d.HoursAtHottest, d.ServiceLifeYears, a.FailureProbability)
	default:
		p.Message = fmt.Sprintf("Weibull probability that a unit breaks with the hottest-temperature pressure held for %.0f h over %.3g years: %.2g.",
			d.HoursAtHottest, d.ServiceLifeYears, a.FailureProbability)
	}
	fs = append(fs, p)

	im := atLeast(CriterionImplosion, "Implosion safety factor at the coldest temperature", "", a.ImplosionSafetyFactor, cr.MinImplosionSafetyFactor,
		safetyFactorCautionBand, DefaultCriteriaGrounds["min_implosion_safety_factor"])
	im.Message, im.MessageUS = inBoth(func(m measure) string {
		if a.ExternalLoadPa <= 0 {
			return fmt.Sprintf("The vessel is not under external pressure at %s: %s.", m.temp(d.ColdestK), ReasonNoExternalLoad.Words())
		}
		return fmt.Sprintf("%s of external pressure at %s against a knocked-down buckling pressure of %s.",
			m.pressure(a.ExternalLoadPa), m.temp(d.ColdestK), m.pressure(a.ImplosionSafetyFactor*a.ExternalLoadPa))
	})
	switch {
	case a.ExternalLoadPa <= 0:
		im.Status, im.NotApplicable, im.Value, im.Margin = StatusPass, ReasonNoExternalLoad, 0, 0
	case a.ImplosionSafetyFactor >= SafetyFactorCap:
		im.ValueBound = AtLeast
	}
	fs = append(fs, im)
	fs = a.withShockAndSeal(fs)

	fs = append(fs, exposureFindings(f, &a.Release, cr)...)

	if f.Flammability.Flammable && f.Flammability.LFLPercent != nil {
		fl := atMost(CriterionFlammability, "Peak concentration as a percentage of the LFL", "% LFL", a.Release.PercentLFL, cr.MaxPercentLFL, lflCautionFraction,
			f.Flammability.LFLPercent.Source)
		fl.Message = fmt.Sprintf("Peak (highest one-minute average) %.3g ppm against an LFL of %.3g %% by volume (%.0f ppm).", a.Release.Peak.PPM, f.Flammability.LFLPercent.Value, f.Flammability.LFLPercent.Value*1e4)
		if a.Release.Peak.Bounded {
			fl.ValueBound = AtMost
			fl.Message += fmt.Sprintf(" The model's value lay above the physical bound (%s) and is held to it.", a.Release.Bound.By)
		}
		fs = append(fs, fl)
	} else {
		fs = append(fs, Finding{Criterion: CriterionFlammability, Title: "Flammability", Status: StatusPass, Unit: "% LFL",
			Limit: cr.MaxPercentLFL, Margin: 1, Source: "library: not flammable",
			Message: fmt.Sprintf("%s is not flammable. %s", f.Name, f.Flammability.Note)})
	}

	if a.Flags.Extrapolated() {
		all := a.stretchedValues(nil)
		fs = append(fs, Finding{Criterion: CriterionCorrelationUse, Title: "Correlations used outside their range", Status: StatusCaution,
			Source: "library validity ranges", Stretched: all,
			Message: "Part of this review was computed outside a correlation's published range (" + strings.Join(all, "; ") + "); the findings that used these values are marked; treat them as estimates and confirm by test."})
		for i := range fs {
			st := a.stretchedValues(a.findingStates(fs[i].Criterion))
			if len(st) == 0 || fs[i].Criterion == CriterionCorrelationUse {
				continue
			}
			fs[i].Stretched = st
			if fs[i].Status == StatusPass && fs[i].NotApplicable == "" {
				fs[i].Status = StatusCaution
				note := " Computed with a value outside a correlation's range (" + strings.Join(st, "; ") + "): not a clean pass."
				fs[i].Message += note
				fs[i].MessageUS += note
			}
		}
	}
	for i := range fs {
		if fs[i].MessageUS == "" {
			fs[i].MessageUS = fs[i].Message
		}
		fs[i].Value = finiteOr(fs[i].Value, 0)
		fs[i].Margin = finiteOr(fs[i].Margin, 0)
	}
	sortFindings(fs)
	a.Findings = fs
	a.Verdict = StatusPass
	for _, x := range fs {
		a.Verdict = Worse(a.Verdict, x.Status)
	}
	a.Cautions = append(append([]string(nil), StandardCautions...), fluidCautions(f, false)...)
	a.CautionsUS = append(append([]string(nil), StandardCautions...), fluidCautions(f, true)...)
}

// measure writes temperatures and pressures in one unit system, for the
// words of a finding.
type measure struct{ us bool }

func (m measure) temp(k float64) string {
	if m.us {
		return fmt.Sprintf("%.1f °F", units.KelvinToFahrenheit(k))
	}
	return fmt.Sprintf("%.1f °C", units.KelvinToCelsius(k))
}

func (m measure) mass(kg float64) string {
	if m.us {
		return fmt.Sprintf("%.4g oz", kg/units.OunceKg)
	}
	return fmt.Sprintf("%.4g g", kg*1000)
}

func (m measure) volume(m3 float64) string {
	if m.us {
		return fmt.Sprintf("%.4g in³", m3/units.CubicInchM3)
	}
	return fmt.Sprintf("%.4g mL", m3*1e6)
}

func (m measure) pressure(pa float64) string {
	if m.us {
		return fmt.Sprintf("%.4g psi", pa/units.PsiPa)
	}
	return fmt.Sprintf("%.4g kPa", pa/1000)
}

// inBoth writes a message in SI and in US customary units.
func inBoth(say func(measure) string) (si, us string) {
	return say(measure{}), say(measure{us: true})
}

// worstCaseFinding judges the worst-case unit's ullage by the same rule as
// the nominal unit's.
func worstCaseFinding(a *Assessment, w *WorstCase) Finding {
	d := &a.Design
	cr := d.Criteria
	f := atLeast(CriterionUllageWorst, "Ullage at the hottest temperature, worst-case unit", "%", w.Hot.UllagePercent, cr.MinUllagePercent, 1,
		DefaultCriteriaGrounds["min_ullage_percent"]+"; worst case: fill at its upper tolerance, internal volume at its lower (common practice)")
	f.Margin = (w.Hot.UllagePercent - cr.MinUllagePercent) / 100
	if f.Status == StatusPass && w.Hot.UllagePercent < cr.MinUllagePercent+ullageCautionPoints {
		f.Status = StatusCaution
	}
	if !w.Sealable || w.Hot.Phase == PhaseLiquidFull {
		f.Status = StatusFail
	}
	f.Message, f.MessageUS = inBoth(func(m measure) string {
		unit := fmt.Sprintf("A unit with %s of fill in %s (the tolerances stacked)", m.mass(w.FillMassKg), m.volume(w.VolumeM3))
		switch {
		case !w.Sealable:
			return unit + " cannot even be sealed: the fill, as liquid, does not fit at the sealing temperature."
		case w.Hot.Phase == PhaseLiquidFull:
			return fmt.Sprintf("%s goes liquid-full at %s, below the hottest temperature %s.", unit, m.temp(w.LiquidFullK), m.temp(d.HottestK))
		case w.LiquidFullReached:
			return fmt.Sprintf("%s keeps %.1f %% vapour space at %s and would go liquid-full at %s.", unit, w.Hot.UllagePercent, m.temp(d.HottestK), m.temp(w.LiquidFullK))
		default:
			return fmt.Sprintf("%s keeps %.1f %% vapour space at %s and never goes liquid-full.", unit, w.Hot.UllagePercent, m.temp(d.HottestK))
		}
	})
	return f
}

// stateUse names a vessel state a finding's calculation used.
type stateUse struct {
	name  string
	state *VesselState
}

// findingStates returns the vessel states behind a finding.
func (a *Assessment) findingStates(criterion string) []stateUse {
	hot := stateUse{fmt.Sprintf("at the hottest temperature, %.1f °C", units.KelvinToCelsius(a.Design.HottestK)), &a.Hot}
	cold := stateUse{fmt.Sprintf("at the coldest temperature, %.1f °C", units.KelvinToCelsius(a.Design.ColdestK)), &a.Cold}
	var worst []stateUse
	if a.Worst != nil && a.Worst.Sealable {
		worst = []stateUse{{"worst-case unit at the hottest temperature", &a.Worst.Hot}}
	}
	switch criterion {
	case CriterionUllage, CriterionBurst, CriterionFailure:
		return []stateUse{hot}
	case CriterionUllageWorst:
		return worst
	case CriterionBurstWorst:
		return append([]stateUse{hot}, worst...)
	case CriterionImplosion:
		return []stateUse{cold}
	}
	return nil
}

// stretchedValues names the values that came from a correlation outside
// its range, in the given states (all states when uses is nil).
func (a *Assessment) stretchedValues(uses []stateUse) []string {
	if uses == nil {
		uses = append(a.findingStates(CriterionBurstWorst), a.findingStates(CriterionImplosion)...)
	}
	var out []string
	for _, u := range uses {
		fl := u.state.Flags & (fluids.VapourPressureExtrapolated | fluids.CompressedLiquidExtrapolated | fluids.LiquidDensityExtrapolated)
		if fl != 0 {
			out = append(out, fl.String()+" "+u.name)
		}
	}
	return out
}

// worstStrengthFinding judges the weakest permitted unit's burst safety
// factor by the same rule as the nominal unit's.
func worstStrengthFinding(a *Assessment, ws *WorstStrength) Finding {
	d := &a.Design
	cr := d.Criteria
	f := atLeast(CriterionBurstWorst, "Burst safety factor at the hottest temperature, weakest permitted unit", "", ws.SafetyFactor, cr.MinBurstSafetyFactor,
		safetyFactorCautionBand, DefaultCriteriaGrounds["min_burst_safety_factor"]+"; weakest unit: every wall at its thinnest, fill and volume tolerances stacked to raise the pressure (common practice)")
	f.ValueBound = ws.SafetyFactorBound
	if ws.OverPa <= 0 {
		f.Status, f.NotApplicable, f.Value, f.Margin = StatusPass, ReasonNoBurstLoad, 0, 0
	}
	whose := "the nominal unit's pressure"
	if ws.FromWorstUnit {
		whose = "the worst-case unit's pressure (fill and volume tolerances stacked)"
	} else if a.Worst != nil && !a.Worst.Sealable {
		whose = "the nominal unit's pressure (the worst-case fill cannot be sealed; see the worst-case ullage)"
	}
	f.Message, f.MessageUS = inBoth(func(m measure) string {
		if ws.OverPa <= 0 {
			return fmt.Sprintf("With the walls at their thinnest the vessel is still not over-pressurised at %s: %s.", m.temp(d.HottestK), ReasonNoBurstLoad.Words())
		}
		pf := fmt.Sprintf("%.2g", ws.FailureProbability)
		if ws.FailureProbabilityBound == AtMost {
			pf = "at most " + pf
		}
		return fmt.Sprintf("Walls at their thinnest, %s over ambient at %s (%s) against a long-term burst overpressure of %s; failure probability over the life %s.",
			m.pressure(ws.OverPa), m.temp(d.HottestK), whose, m.pressure(ws.Strength.LongTermBurstPa), pf)
	})
	return f
}
