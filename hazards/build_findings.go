package hazards

import (
	"fmt"

	"ullage/fluids"
	"ullage/fluids/units"
)

func (a *Assessment) findings(sub *fluids.Substance) {
	d := &a.Design
	cr := d.Criteria
	f := a.Fluid
	hotC := units.KelvinToCelsius(d.HottestK)
	var fs []Finding

	// Ullage and the liquid-full point.
	u := atLeast(CriterionUllage, "Ullage at the hottest temperature", "%", a.Hot.UllagePercent, cr.MinUllagePercent, 1,
		DefaultCriteriaGrounds["min_ullage_percent"])
	u.Margin = (a.Hot.UllagePercent - cr.MinUllagePercent) / 100
	if u.Status == StatusPass && a.Hot.UllagePercent < cr.MinUllagePercent+ullageCautionPoints {
		u.Status = StatusCaution
	}
	switch {
	case a.Hot.Phase == PhaseLiquidFull:
		u.Status = StatusFail
		u.Message = fmt.Sprintf("The vessel goes liquid-full at %.1f °C, below the hottest temperature %.1f °C; past that point the pressure climbs by about a megapascal per kelvin and the glass will break.",
			units.KelvinToCelsius(a.LiquidFullK), hotC)
	case a.LiquidFullReached:
		u.Message = fmt.Sprintf("%.1f %% of the volume is vapour space at %.1f °C; the vessel would go liquid-full at %.1f °C.",
			a.Hot.UllagePercent, hotC, units.KelvinToCelsius(a.LiquidFullK))
	default:
		u.Message = fmt.Sprintf("%.1f %% of the volume is vapour space at %.1f °C; the fill is too small for the vessel ever to go liquid-full.", a.Hot.UllagePercent, hotC)
	}
	fs = append(fs, u)

	// Burst.
	b := atLeast(CriterionBurst, "Burst safety factor at the hottest temperature", "", a.BurstSafetyFactor, cr.MinBurstSafetyFactor,
		safetyFactorCautionBand, DefaultCriteriaGrounds["min_burst_safety_factor"])
	over := a.Hot.PressurePa - d.AmbientPressurePa
	if over <= 0 {
		b.Message = fmt.Sprintf("The vessel is not over-pressurised at %.1f °C (%.1f kPa inside, %.1f kPa outside).", hotC, a.Hot.PressurePa/1000, d.AmbientPressurePa/1000)
	} else {
		b.Message = fmt.Sprintf("%.1f kPa over ambient at %.1f °C against a long-term burst overpressure of %.1f kPa (%s, %s).",
			over/1000, hotC, a.Strength.LongTermBurstPa/1000, a.Glass.Name, a.Parts[a.Strength.GoverningPart].Name)
	}
	fs = append(fs, b)

	p := atMost(CriterionFailure, "Failure probability over the service life", "", a.FailureProbability, cr.MaxFailureProbability, probabilityCautionFactor,
		DefaultCriteriaGrounds["max_failure_probability"])
	p.Message = fmt.Sprintf("Weibull probability that a unit breaks with the hottest-temperature pressure held for %.0f h over %.3g years: %.2g.",
		d.HoursAtHottest, d.ServiceLifeYears, a.FailureProbability)
	fs = append(fs, p)

	im := atLeast(CriterionImplosion, "Implosion safety factor at the coldest temperature", "", a.ImplosionSafetyFactor, cr.MinImplosionSafetyFactor,
		safetyFactorCautionBand, DefaultCriteriaGrounds["min_implosion_safety_factor"])
	if a.ExternalLoadPa <= 0 {
		im.Message = fmt.Sprintf("The vessel is not under external pressure at %.1f °C.", units.KelvinToCelsius(d.ColdestK))
	} else {
		im.Message = fmt.Sprintf("%.1f kPa of external pressure at %.1f °C against a knocked-down buckling pressure of %.4g kPa.",
			a.ExternalLoadPa/1000, units.KelvinToCelsius(d.ColdestK), a.ImplosionSafetyFactor*a.ExternalLoadPa/1000)
	}
	fs = append(fs, im)

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
			case CriterionUllage, CriterionBurst, CriterionFailure, CriterionImplosion:
				if fs[i].Status == StatusPass {
					fs[i].Status = StatusCaution
					fs[i].Message += " Computed outside a correlation's range: not a clean pass."
				}
			}
		}
	}
	for i := range fs {
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
