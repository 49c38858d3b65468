package hazards

import (
	"fmt"

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
	over := a.Hot.PressurePa - d.AmbientPressurePa
	b.Message, b.MessageUS = inBoth(func(m measure) string {
		if over <= 0 {
			return fmt.Sprintf("The vessel is not over-pressurised at %s (%s inside, %s outside).", m.temp(d.HottestK), m.pressure(a.Hot.PressurePa), m.pressure(d.AmbientPressurePa))
		}
		return fmt.Sprintf("%s over ambient at %s against a long-term burst overpressure of %s (%s, %s).",
			m.pressure(over), m.temp(d.HottestK), m.pressure(a.Strength.LongTermBurstPa), a.Glass.Name, a.Parts[a.Strength.GoverningPart].Name)
	})
	fs = append(fs, b)

	p := atMost(CriterionFailure, "Failure probability over the service life", "", a.FailureProbability, cr.MaxFailureProbability, probabilityCautionFactor,
		DefaultCriteriaGrounds["max_failure_probability"])
	p.Message = fmt.Sprintf("Weibull probability that a unit breaks with the hottest-temperature pressure held for %.0f h over %.3g years: %.2g.",
		d.HoursAtHottest, d.ServiceLifeYears, a.FailureProbability)
	fs = append(fs, p)

	im := atLeast(CriterionImplosion, "Implosion safety factor at the coldest temperature", "", a.ImplosionSafetyFactor, cr.MinImplosionSafetyFactor,
		safetyFactorCautionBand, DefaultCriteriaGrounds["min_implosion_safety_factor"])
	im.Message, im.MessageUS = inBoth(func(m measure) string {
		if a.ExternalLoadPa <= 0 {
			return fmt.Sprintf("The vessel is not under external pressure at %s.", m.temp(d.ColdestK))
		}
		return fmt.Sprintf("%s of external pressure at %s against a knocked-down buckling pressure of %s.",
			m.pressure(a.ExternalLoadPa), m.temp(d.ColdestK), m.pressure(a.ImplosionSafetyFactor*a.ExternalLoadPa))
	})
	fs = append(fs, im)
	fs = a.withShockAndSeal(fs)

	fs = append(fs, exposureFindings(f, a.release, d.Room.ExposureMinutes*60, cr)...)

	if f.Flammability.Flammable && f.Flammability.LFLPercent != nil {
		fl := atMost(CriterionFlammability, "Peak concentration as a percentage of the LFL", "% LFL", a.Release.PercentLFL, cr.MaxPercentLFL, lflCautionFraction,
			f.Flammability.LFLPercent.Source)
		fl.Message = fmt.Sprintf("Peak %.3g ppm against an LFL of %.3g %% by volume (%.0f ppm).", a.Release.Peak.PPM, f.Flammability.LFLPercent.Value, f.Flammability.LFLPercent.Value*1e4)
		fs = append(fs, fl)
	} else {
		fs = append(fs, Finding{Criterion: CriterionFlammability, Title: "Flammability", Status: StatusPass, Unit: "% LFL",
			Limit: cr.MaxPercentLFL, Margin: 1, Source: "library: not flammable",
			Message: fmt.Sprintf("%s is not flammable. %s", f.Name, f.Flammability.Note)})
	}

	if a.Flags.Extrapolated() {
		fs = append(fs, Finding{Criterion: CriterionCorrelationUse, Title: "Correlations used outside their range", Status: StatusCaution,
			Source:  "library validity ranges",
			Message: "Part of this review was computed outside a correlation's published range (" + a.Flags.String() + "); treat the affected numbers as estimates and confirm by test."})
		for i := range fs {
			switch fs[i].Criterion {
			case CriterionUllage, CriterionUllageWorst, CriterionBurst, CriterionFailure, CriterionImplosion:
				if fs[i].Status == StatusPass {
					fs[i].Status = StatusCaution
					fs[i].Message += " Computed outside a correlation's range: not a clean pass."
					fs[i].MessageUS += " Computed outside a correlation's range: not a clean pass."
				}
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
	a.Cautions = append(append([]string(nil), StandardCautions...), fluidCautions(f)...)
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
