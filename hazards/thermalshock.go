package hazards

import (
	"fmt"
	"math"
	"strconv"
	"strings"
)

// ThermalShock is the largest sudden temperature change the device may
// meet, in each direction (K, positive). A zero change means that
// direction is not assessed; the zero value means no shock is assessed at
// all. The preset IDs say which built-in scenario the numbers came from
// ("" for a value of the reviewer's own).
type ThermalShock struct {
	HotToColdK        float64 `json:"hot_to_cold_k,omitzero"`
	HotToColdPresetID string  `json:"hot_to_cold_preset_id,omitzero"`
	ColdToHotK        float64 `json:"cold_to_hot_k,omitzero"`
	ColdToHotPresetID string  `json:"cold_to_hot_preset_id,omitzero"`
}

// Given reports whether any sudden change is given.
func (s ThermalShock) Given() bool { return s.HotToColdK > 0 || s.ColdToHotK > 0 }

// MaxShockK is the largest sudden change accepted (K).
const MaxShockK = 500

func (s *ThermalShock) validate(c *checker) {
	c.number(FieldHotToCold, s.HotToColdK, 0, MaxShockK, "K (0 when not assessed)")
	c.number(FieldColdToHot, s.ColdToHotK, 0, MaxShockK, "K (0 when not assessed)")
}

// ShockLoadSeconds is the load duration used for the strength under a
// thermal shock: the surface tension of a quench peaks within about the
// time heat takes to cross the wall, t ≈ L²/κ, a few seconds for a wall of
// 1–2 mm with the thermal diffusivity of glass κ ≈ 5·10⁻⁷ m²/s (from
// memory); 3 s is also the short load duration of ASTM E1300 (from memory).
const ShockLoadSeconds = 3.0

// ShockCase is one direction of sudden change applied to one part.
type ShockCase struct {
	Direction string
	DeltaK    float64
	// StartK is the temperature the device is at when the change comes
	// (the hottest for hot-to-cold, the coldest for cold-to-hot): its
	// pressure is the one present at that moment.
	StartK float64
	// OverPressurePa is the internal minus the outside pressure at StartK.
	OverPressurePa float64
	// ThermalStressPa = E·α·ΔT/(1 − ν); PressureStressPa the tensile hoop
	// stress from the internal overpressure at StartK (none under
	// vacuum); ResidualStressPa the seal's residual stress when this part
	// carries the seal; TotalStressPa their sum.
	ThermalStressPa  float64
	PressureStressPa float64
	ResidualStressPa float64
	TotalStressPa    float64
	// SafetyFactor is StrengthPa over TotalStressPa (capped at
	// SafetyFactorCap); FailureProbability the Weibull probability that one
	// such change breaks the part.
	SafetyFactor       float64
	FailureProbability float64
}

// PartShock is the thermal-shock result of one part.
type PartShock struct {
	Part int
	Name string
	// StressPerKelvin is E·α/(1 − ν), Pa/K.
	StressPerKelvin float64
	// StrengthPa is the part's characteristic (63.2 %) strength for its
	// outer area under a load of ShockLoadSeconds.
	StrengthPa float64
	// Cases holds one entry per direction given; Governing indexes the one
	// with the lowest safety factor.
	Cases     []ShockCase
	Governing int
	// AllowableDeltaK is the sudden change at which the safety factor
	// would equal the required one with no other stress present: the
	// thermal-shock resistance ΔT = S(1 − ν)/(SF·E·α).
	AllowableDeltaK float64
}

// ThermalShockResult is the thermal-shock review of the whole envelope.
type ThermalShockResult struct {
	// Assessed is false when the design gives no sudden change;
	// NotAssessedReason then says so in words.
	Assessed          bool
	NotAssessedReason string
	Parts             []PartShock
	// RequiredSafetyFactor is the same required safety factor as the burst
	// check's: the larger of the minimum and the one the failure-
	// probability limit needs.
	RequiredSafetyFactor float64
	// LoadSeconds is ShockLoadSeconds; ShortLoadFactor (t₀/t)^(1/n) ≥ 1 the
	// strength gained for a load shorter than the glass's reference t₀.
	LoadSeconds     float64
	ShortLoadFactor float64
}

// ShockNotAssessed is the reason given when a design states no sudden
// temperature change.
const ShockNotAssessed = "no sudden temperature change is given in the design, so thermal shock was not assessed"

// ThermalStressPerKelvin returns E·α/(1 − ν) in Pa/K: the surface stress
// per kelvin of a sudden change of surface temperature in a body that
// cannot bend (Kingery, Bowen and Uhlmann, Introduction to Ceramics, 2nd
// ed., Wiley 1976, ch. 16, σ = E·α·ΔT/(1 − ν) for the surface of a
// suddenly cooled plate, from memory).
func ThermalStressPerKelvin(g *Glass) float64 {
	return g.ElasticModulus.Value * g.Expansion.Value / (1 - g.PoissonRatio.Value)
}

// shortLoadFactor returns (t₀/t)^(1/n) for a load shorter than the glass's
// reference duration, the static-fatigue law σⁿ·t = constant (as used by
// the ASTM E1300 glass failure prediction model to restate 60-s
// resistances for 3-s loads, from memory), and 1 otherwise.
func shortLoadFactor(g *Glass, seconds float64) float64 {
	if seconds >= g.ReferenceLoad.Value {
		return 1
	}
	return math.Pow(g.ReferenceLoad.Value/seconds, 1/g.StressCorrosionExponent.Value)
}

// assessThermalShock fills a.Shock from the design's sudden changes, the
// part stresses and the vessel states already found.
func (a *Assessment) assessThermalShock() {
	d := &a.Design
	s := d.ThermalShock
	if !s.Given() {
		a.Shock = ThermalShockResult{NotAssessedReason: ShockNotAssessed}
		return
	}
	g := &a.Glass
	r := ThermalShockResult{Assessed: true, RequiredSafetyFactor: a.RequiredSafetyFactor,
		LoadSeconds: ShockLoadSeconds, ShortLoadFactor: shortLoadFactor(g, ShockLoadSeconds)}
	perK := ThermalStressPerKelvin(g)
	m := g.WeibullModulus.Value
	for i, p := range a.Parts {
		// The part's own weakest-link strength for its area (the burst
		// check's code, one part at a time), raised for the short load.
		strength := glassStrength([]PartStress{p}, g, ShockLoadSeconds, 1).GoverningStrengthPa * r.ShortLoadFactor
		ps := PartShock{Part: i, Name: p.Name, StressPerKelvin: perK, StrengthPa: strength,
			AllowableDeltaK: strength / (r.RequiredSafetyFactor * perK)}
		residual := a.sealStressOn(i)
		add := func(dir string, dk, startK, overPa float64) {
			c := ShockCase{Direction: dir, DeltaK: dk, StartK: startK, OverPressurePa: overPa, ThermalStressPa: perK * dk,
				PressureStressPa: p.StressPerPascal * math.Max(overPa, 0), ResidualStressPa: residual}
			c.TotalStressPa = c.ThermalStressPa + c.PressureStressPa + c.ResidualStressPa
			c.SafetyFactor = safetyFactor(strength, c.TotalStressPa)
			c.FailureProbability = -math.Expm1(-math.Pow(c.TotalStressPa/strength, m))
			ps.Cases = append(ps.Cases, c)
		}
		if s.HotToColdK > 0 {
			add(ShockHotToCold, s.HotToColdK, d.HottestK, a.Hot.PressurePa-d.AmbientPressurePa)
		}
		if s.ColdToHotK > 0 {
			add(ShockColdToHot, s.ColdToHotK, d.ColdestK, a.Cold.PressurePa-d.AmbientPressurePa)
		}
		for j, c := range ps.Cases {
			if c.SafetyFactor < ps.Cases[ps.Governing].SafetyFactor {
				ps.Governing = j
			}
		}
		r.Parts = append(r.Parts, ps)
	}
	a.Shock = r
}

// CriterionThermalShock prefixes the thermal-shock findings, one per part:
// "thermal-shock-1" for the first part, and so on.
const CriterionThermalShock = "thermal-shock"

// ThermalShockCriterion returns the criterion of part i's thermal-shock
// finding.
func ThermalShockCriterion(i int) string { return CriterionThermalShock + "-" + strconv.Itoa(i+1) }

// IsThermalShockCriterion reports whether a criterion is a thermal-shock
// finding's.
func IsThermalShockCriterion(c string) bool { return strings.HasPrefix(c, CriterionThermalShock+"-") }

func shockStepKey(what string, part int) string {
	return "thermal_shock_" + what + "_" + strconv.Itoa(part+1)
}

// shockDirectionWords describes a direction for a message.
func shockDirectionWords(dir string) string {
	if dir == ShockColdToHot {
		return "sudden rise"
	}
	return "sudden drop"
}

func shockPresetName(id string) string {
	if id == "" {
		return ""
	}
	if p, err := LookupShockPreset(id); err == nil {
		return " (" + strings.ToLower(p.Name[:1]) + p.Name[1:] + ")"
	}
	return ""
}

// thermalShockFindings returns one finding per part, judged by the burst
// check's rule: the safety factor on the short-term strength must reach
// the required safety factor, with the same caution band.
func (a *Assessment) thermalShockFindings(ar *factArena) []Finding {
	if !a.Shock.Assessed {
		return nil
	}
	d := &a.Design
	g := &a.Glass
	src := "Kingery, Bowen and Uhlmann, Introduction to Ceramics, 2nd ed. (1976), ch. 16: σ = E·α·ΔT/(1 − ν) for a suddenly cooled surface (from memory); limit as the burst check: " +
		DefaultCriteriaGrounds[CriterionMinBurstSafetyFactor]
	var out []Finding
	for _, ps := range a.Shock.Parts {
		c := ps.Cases[ps.Governing]
		f := atLeast(ThermalShockCriterion(ps.Part), "Thermal shock, "+ps.Name, "", c.SafetyFactor, a.Shock.RequiredSafetyFactor,
			safetyFactorCautionBand, src)
		if c.SafetyFactor >= SafetyFactorCap {
			f.ValueBound = AtLeast
		}
		preset := d.ThermalShock.HotToColdPresetID
		if c.Direction == ShockColdToHot {
			preset = d.ThermalShock.ColdToHotPresetID
		}
		where := "the cooled outer surface"
		if c.Direction == ShockColdToHot {
			where = "the inner surface (bounded by the cooled-surface value)"
		}
		f.Facts = ar.keep(named("direction", c.Direction+shockPresetName(preset)), fact("sudden change", FactTempDifference, c.DeltaK),
			fact("starting temperature", FactTemperature, c.StartK), named("tension on", where),
			fact("thermal stress", FactStress, c.ThermalStressPa), fact("stress per degree", FactStressPerKelvin, ps.StressPerKelvin))
		if c.PressureStressPa > 0 {
			f.Facts = ar.extend(f.Facts, fact("stress from the pressure", FactStress, c.PressureStressPa))
		}
		if c.ResidualStressPa > 0 {
			f.Facts = ar.extend(f.Facts, fact("residual stress at the seal", FactStress, c.ResidualStressPa))
		}
		f.Facts = ar.extend(f.Facts, fact("short-term strength", FactStress, ps.StrengthPa),
			fact("breakages per event", FactProbability, c.FailureProbability),
			fact("change withstood at the required safety factor", FactTempDifference, ps.AllowableDeltaK))
		if g.RatedShockDifference.Value > 0 {
			f.Facts = ar.extend(f.Facts, fact("stated rating for ware of this glass", FactTempDifference, g.RatedShockDifference.Value))
		} else {
			f.Facts = ar.extend(f.Facts, named("stated rating for ware of this glass", "none in the library"))
		}
		if a.Flags.Extrapolated() && f.Status == StatusPass {
			f.Status = StatusCaution
			f.Stretched = a.stretchedValues(nil)
		}
		out = append(out, f)
	}
	return out
}

// withShockAndSeal appends the thermal-shock findings and, when the seal
// carries a residual stress, says so in the burst and failure-probability
// findings it changed.
func (a *Assessment) withShockAndSeal(fs []Finding, ar *factArena) []Finding {
	if s := a.Seal; s != nil {
		for i := range fs {
			if fs[i].Criterion != CriterionBurst && fs[i].Criterion != CriterionFailure {
				continue
			}
			fs[i].Facts = ar.extend(fs[i].Facts, fact("residual stress at the seal, held for the service life", FactStress, s.StressPa), named("seal", s.Name))
		}
	}
	return append(fs, a.thermalShockFindings(ar)...)
}

// traceThermalShock adds the thermal-shock steps: per part, the stress,
// the strength, the safety factor and the failure probability.
func (a *Assessment) traceThermalShock(tr *tracer) {
	if !a.Shock.Assessed {
		return
	}
	g := &a.Glass
	for _, ps := range a.Shock.Parts {
		c := ps.Cases[ps.Governing]
		part := a.Parts[ps.Part]
		surface := "cooled outer surface"
		if c.Direction == ShockColdToHot {
			surface = "inner surface, bounded by the cooled-surface value"
		}
		in := []Value{{Symbol: "E", Value: g.ElasticModulus.Value, Unit: "Pa", Source: g.ElasticModulus.Source},
			{Symbol: "α", Value: g.Expansion.Value, Unit: "1/K", Source: g.Expansion.Source},
			{Symbol: "ν", Value: g.PoissonRatio.Value, Source: g.PoissonRatio.Source},
			{Symbol: "ΔT", Value: c.DeltaK, Unit: "K", Source: "design input (" + c.Direction + ")"},
			{Symbol: "k (" + ps.Name + ")", Value: part.StressPerPascal, Source: "hoop stress per pascal, as in the stress step"},
			{Symbol: "ΔP at the start", Value: c.OverPressurePa, Unit: "Pa", Source: fmt.Sprintf("overpressure at %.2f K (a vacuum adds no tension)", c.StartK)}}
		if c.ResidualStressPa > 0 {
			in = append(in, Value{Symbol: "σ_r", Value: c.ResidualStressPa, Unit: "Pa", Source: "seal residual stress step"})
		}
		tr.add(shockStepKey("stress", ps.Part), Step{Stage: StageStress, Title: "Thermal-shock surface stress, " + ps.Name + " (" + c.Direction + ", " + surface + ")",
			Method:   "surface stress of a suddenly cooled body, with the pressure and residual stresses present at that moment",
			Equation: "σ = E·α·ΔT/(1 − ν) + k·max(ΔP, 0) + σ_r",
			Inputs:   in,
			Intermediate: []Value{{Symbol: "E·α/(1 − ν)", Value: ps.StressPerKelvin, Unit: "Pa/K"},
				{Symbol: "σ_thermal", Value: c.ThermalStressPa, Unit: "Pa"}, {Symbol: "σ_pressure", Value: c.PressureStressPa, Unit: "Pa"}},
			Result: Value{Symbol: "σ", Value: c.TotalStressPa, Unit: "Pa"},
			Source: "Kingery, Bowen and Uhlmann, Introduction to Ceramics, 2nd ed. (1976), ch. 16 (from memory)",
			Note:   "Infinite surface heat transfer (Biot number → ∞): an upper bound; a finite heat-transfer coefficient gives less, which is not credited. The pressure stress at the wall's worst point is added to the surface stress, which errs on the safe side."})
		tr.add(shockStepKey("strength", ps.Part), Step{Stage: StageStrength, Title: "Short-term strength for a thermal shock, " + ps.Name,
			Method:   "Weibull size effect for the part's outer area, with the static-fatigue law for a load of seconds",
			Equation: "S = σ₀·(A₀/A)^(1/m)·(t₀/t)^(1/n),  t = " + strconv.FormatFloat(ShockLoadSeconds, 'g', -1, 64) + " s",
			Inputs: []Value{{Symbol: "σ₀", Value: g.CharacteristicStrength.Value, Unit: "Pa", Source: g.CharacteristicStrength.Source},
				{Symbol: "A₀", Value: g.ReferenceArea.Value, Unit: "m²", Source: g.ReferenceArea.Source},
				{Symbol: "A", Value: part.AreaM2, Unit: "m²", Source: "outer surface of the part"},
				{Symbol: "m", Value: g.WeibullModulus.Value, Source: g.WeibullModulus.Source},
				{Symbol: "t₀", Value: g.ReferenceLoad.Value, Unit: "s", Source: g.ReferenceLoad.Source},
				{Symbol: "t", Value: ShockLoadSeconds, Unit: "s", Source: "peak of a quench lasts about the time heat takes to cross the wall (from memory)"},
				{Symbol: "n", Value: g.StressCorrosionExponent.Value, Source: g.StressCorrosionExponent.Source}},
			Intermediate: []Value{{Symbol: "(t₀/t)^(1/n)", Value: a.Shock.ShortLoadFactor}},
			Result:       Value{Symbol: "S", Value: ps.StrengthPa, Unit: "Pa"},
			Source:       "Weibull, J. Appl. Mech. 18, 293 (1951); ASTM E1300 load-duration relation (from memory)"})
		tr.add(shockStepKey("safety_factor", ps.Part), Step{Stage: StageSafety, Title: "Thermal-shock safety factor, " + ps.Name,
			Method:   "ratio of strength to stress",
			Equation: "SF = S/σ  (capped at 1000)",
			Inputs:   []Value{{Symbol: "S", Value: ps.StrengthPa, Unit: "Pa"}, {Symbol: "σ", Value: c.TotalStressPa, Unit: "Pa"}},
			Intermediate: append([]Value{{Symbol: "required SF", Value: a.Shock.RequiredSafetyFactor, Source: "as the burst check"},
				{Symbol: "ΔT withstood at the required SF", Value: ps.AllowableDeltaK, Unit: "K"}}, ratedShock(g)...),
			Result: Value{Symbol: "SF_shock", Value: c.SafetyFactor},
			Source: "definition; thermal-shock resistance ΔT = S(1 − ν)/(E·α) as in Kingery, Bowen and Uhlmann (1976), ch. 16 (from memory)"})
		tr.add(shockStepKey("failure_probability", ps.Part), Step{Stage: StageSafety, Title: "Thermal-shock failure probability per event, " + ps.Name,
			Method:   "Weibull distribution",
			Equation: "P_f = 1 − exp[−(σ/S)^m]",
			Inputs: []Value{{Symbol: "σ", Value: c.TotalStressPa, Unit: "Pa"}, {Symbol: "S", Value: ps.StrengthPa, Unit: "Pa"},
				{Symbol: "m", Value: g.WeibullModulus.Value, Source: g.WeibullModulus.Source}},
			Result: Value{Symbol: "P_f,shock", Value: c.FailureProbability}, Source: "Weibull (1951)"})
	}
}

// ratedShock returns the glass's stated thermal-shock rating as a value
// for the record, or nothing when the library states none.
func ratedShock(g *Glass) []Value {
	if g.RatedShockDifference.Value <= 0 {
		return nil
	}
	return []Value{{Symbol: "stated rating (trade)", Value: g.RatedShockDifference.Value, Unit: "K", Source: g.RatedShockDifference.Source}}
}

// shockFindingDeps lists the steps behind a thermal-shock finding.
func shockFindingDeps(criterion string) []string {
	n, err := strconv.Atoi(strings.TrimPrefix(criterion, CriterionThermalShock+"-"))
	if err != nil || n < 1 {
		return nil
	}
	return []string{shockStepKey("safety_factor", n-1), shockStepKey("failure_probability", n-1),
		shockStepKey("strength", n-1), shockStepKey("stress", n-1), "state_hot"}
}

// findingDepsOf returns the keys of the steps behind a finding.
func findingDepsOf(criterion string) []string {
	if IsThermalShockCriterion(criterion) {
		return shockFindingDeps(criterion)
	}
	deps := findingDeps[criterion]
	if criterion == CriterionBurst || criterion == CriterionFailure {
		// Present only when the design gives a seal stress.
		deps = append(append([]string(nil), deps...), "seal_residual_stress", "seal_burst")
	}
	return deps
}
