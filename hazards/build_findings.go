package hazards

import (
	"ullage/fluids"
)

func (a *Assessment) findings() {
	d := &a.Design
	cr := d.Criteria
	f := a.Fluid
	var ar factArena
	// Room for every finding: the nine below, one per thermal-shock part,
	// per averaging kind and per public tier.
	fs := make([]Finding, 0, 9+len(a.Shock.Parts)+len(AveragingKinds)+len(publicTiers)+countOtherKinds(a.Release.Limits))

	// Ullage and the liquid-full point.
	u := atLeast(CriterionUllage, "Ullage at the hottest temperature", "%", a.Hot.UllagePercent, cr.MinUllagePercent, 1,
		DefaultCriteriaGrounds[CriterionMinUllagePercent])
	u.Margin = (a.Hot.UllagePercent - cr.MinUllagePercent) / 100
	if u.Status == StatusPass && a.Hot.UllagePercent < cr.MinUllagePercent+ullageCautionPoints {
		u.Status = StatusCaution
	}
	if a.Hot.Phase == PhaseLiquidFull {
		u.Status = StatusFail
	}
	u.Facts = ar.keep(fact("hottest temperature", FactTemperature, d.HottestK), liquidFullFact(a.LiquidFullReached || a.Hot.Phase == PhaseLiquidFull, a.LiquidFullK))
	fs = append(fs, u)
	if w := a.Worst; w != nil {
		fs = append(fs, worstCaseFinding(a, w, &ar))
	}

	// Burst.
	b := atLeast(CriterionBurst, "Burst safety factor at the hottest temperature", "", a.BurstSafetyFactor, cr.MinBurstSafetyFactor,
		safetyFactorCautionBand, DefaultCriteriaGrounds[CriterionMinBurstSafetyFactor])
	b.ValueBound = a.BurstSafetyFactorBound
	over := a.Hot.PressurePa - d.AmbientPressurePa
	b.Facts = ar.keep(fact("hottest temperature", FactTemperature, d.HottestK), fact("pressure inside", FactPressure, a.Hot.PressurePa),
		fact("ambient pressure", FactPressure, d.AmbientPressurePa))
	if over > 0 {
		b.Facts = ar.extend(b.Facts, fact("overpressure", FactPressure, over), fact("long-term burst overpressure", FactPressure, a.Strength.LongTermBurstPa),
			named("glass", a.Glass.Name), named("governing part", a.Parts[a.Strength.GoverningPart].Name))
	}
	if over <= 0 {
		b.Status, b.NotApplicable, b.Value, b.Margin = StatusPass, ReasonNoBurstLoad, 0, 0
	}
	fs = append(fs, b)
	if ws := a.WorstStrength; ws != nil {
		fs = append(fs, worstStrengthFinding(a, ws, &ar))
	}

	p := atMost(CriterionFailure, "Failure probability over the service life", "", a.FailureProbability, cr.MaxFailureProbability, probabilityCautionFactor,
		DefaultCriteriaGrounds["max_failure_probability"])
	p.ValueBound = a.FailureProbabilityBound
	p.Facts = ar.keep(fact("hours at the hottest temperature", FactHours, d.HoursAtHottest), fact("service life", FactYears, d.ServiceLifeYears))
	if over <= 0 {
		p.Status, p.NotApplicable, p.Value, p.Margin = StatusPass, ReasonNoBurstLoad, 0, 0
	}
	fs = append(fs, p)

	im := atLeast(CriterionImplosion, "Implosion safety factor at the coldest temperature", "", a.ImplosionSafetyFactor, cr.MinImplosionSafetyFactor,
		safetyFactorCautionBand, DefaultCriteriaGrounds[CriterionMinImplosionSafetyFactor])
	im.Facts = ar.keep(fact("coldest temperature", FactTemperature, d.ColdestK))
	if a.ExternalLoadPa > 0 {
		im.Facts = ar.extend(im.Facts, fact("external pressure", FactPressure, a.ExternalLoadPa),
			fact("knocked-down buckling pressure", FactPressure, a.ImplosionSafetyFactor*a.ExternalLoadPa))
	}
	switch {
	case a.ExternalLoadPa <= 0:
		im.Status, im.NotApplicable, im.Value, im.Margin = StatusPass, ReasonNoExternalLoad, 0, 0
	case a.ImplosionSafetyFactor >= SafetyFactorCap:
		im.ValueBound = AtLeast
	}
	fs = append(fs, im)
	fs = a.withShockAndSeal(fs, &ar)

	fs = appendExposureFindings(fs, f, &a.Release, cr, &ar)

	if f.Flammability.Flammable && f.Flammability.LFLPercent != nil {
		fl := atMost(CriterionFlammability, "Peak concentration as a percentage of the LFL", "% LFL", a.Release.PercentLFL, cr.MaxPercentLFL, lflCautionFraction,
			f.Flammability.LFLPercent.Source)
		fl.Facts = ar.keep(fact("peak concentration (highest one-minute average)", FactConcentration, a.Release.Peak.PPM),
			fact("lower flammable limit, % by volume", FactPercent, f.Flammability.LFLPercent.Value))
		if a.Release.Peak.Bounded {
			fl.ValueBound = AtMost
			fl.Facts[0].Bound = AtMost
			fl.Facts = ar.extend(fl.Facts, named("held to the physical bound", a.Release.Bound.By))
		}
		fs = append(fs, fl)
	} else {
		fs = append(fs, Finding{Criterion: CriterionFlammability, Title: "Flammability", Status: StatusPass, Unit: "% LFL",
			Limit: cr.MaxPercentLFL, Direction: AtMost, NotApplicable: ReasonNotFlammable, Source: "library: not flammable",
			Facts: ar.keep(named("fluid", f.Name), named("note", f.Flammability.Note))})
	}

	if a.Flags.Extrapolated() {
		all := a.stretchedValues(nil)
		fs = append(fs, Finding{Criterion: CriterionCorrelationUse, Title: "Correlations used outside their range", Status: StatusCaution,
			Source: "library validity ranges", Stretched: all})
		for i := range fs {
			st := a.stretchedValues(a.findingStates(fs[i].Criterion))
			if len(st) == 0 || fs[i].Criterion == CriterionCorrelationUse {
				continue
			}
			fs[i].Stretched = st
			if fs[i].Status == StatusPass && fs[i].NotApplicable == "" {
				fs[i].Status = StatusCaution
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
}

// The sources of the worst-case unit's and the weakest unit's findings:
// the grounds of their criteria and how the unit is made up.
var (
	worstUllageSource = DefaultCriteriaGrounds[CriterionMinUllagePercent] + "; worst case: fill at its upper tolerance, internal volume at its lower (common practice)"
	weakestUnitSource = DefaultCriteriaGrounds[CriterionMinBurstSafetyFactor] + "; weakest unit: every wall at its thinnest, fill and volume tolerances stacked to raise the pressure (common practice)"
)

// worstCaseFinding judges the worst-case unit's ullage by the same rule as
// the nominal unit's.
func worstCaseFinding(a *Assessment, w *WorstCase, ar *factArena) Finding {
	d := &a.Design
	cr := d.Criteria
	f := atLeast(CriterionUllageWorst, "Ullage at the hottest temperature, worst-case unit", "%", w.Hot.UllagePercent, cr.MinUllagePercent, 1,
		worstUllageSource)
	f.Margin = (w.Hot.UllagePercent - cr.MinUllagePercent) / 100
	if f.Status == StatusPass && w.Hot.UllagePercent < cr.MinUllagePercent+ullageCautionPoints {
		f.Status = StatusCaution
	}
	if !w.Sealable || w.Hot.Phase == PhaseLiquidFull {
		f.Status = StatusFail
	}
	f.Facts = ar.keep(fact("fill of the worst-case unit", FactMass, w.FillMassKg), fact("internal volume of the worst-case unit", FactVolume, w.VolumeM3),
		fact("hottest temperature", FactTemperature, d.HottestK))
	if !w.Sealable {
		f.Facts = ar.extend(f.Facts, named("sealing", "not possible: the fill, as liquid, does not fit at the sealing temperature"))
	} else {
		f.Facts = ar.extend(f.Facts, liquidFullFact(w.LiquidFullReached || w.Hot.Phase == PhaseLiquidFull, w.LiquidFullK))
	}
	return f
}

// liquidFullFact gives the liquid-full temperature, or says it is not
// reached.
func liquidFullFact(reached bool, k float64) Fact {
	if !reached {
		return Fact{Name: "liquid-full temperature", Kind: FactTemperature, Text: "not reached"}
	}
	return fact("liquid-full temperature", FactTemperature, k)
}

// stateUse names a vessel state a finding's calculation used.
type stateUse struct {
	name  string
	state *VesselState
}

// findingStates returns the vessel states behind a finding.
func (a *Assessment) findingStates(criterion string) []stateUse {
	hot := stateUse{"at the hottest temperature", &a.Hot}
	cold := stateUse{"at the coldest temperature", &a.Cold}
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
func worstStrengthFinding(a *Assessment, ws *WorstStrength, ar *factArena) Finding {
	d := &a.Design
	cr := d.Criteria
	f := atLeast(CriterionBurstWorst, "Burst safety factor at the hottest temperature, weakest permitted unit", "", ws.SafetyFactor, cr.MinBurstSafetyFactor,
		safetyFactorCautionBand, weakestUnitSource)
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
	f.Facts = ar.keep(fact("hottest temperature", FactTemperature, d.HottestK), named("pressure used", whose))
	if ws.OverPa > 0 {
		pf := fact("failure probability over the life", FactProbability, ws.FailureProbability)
		pf.Bound = ws.FailureProbabilityBound
		f.Facts = ar.extend(f.Facts, fact("overpressure, walls at their thinnest", FactPressure, ws.OverPa),
			fact("long-term burst overpressure, walls at their thinnest", FactPressure, ws.Strength.LongTermBurstPa), pf)
	}
	return f
}
