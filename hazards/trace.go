package hazards

import (
	"encoding/json"
	"fmt"
	"math"
	"sort"
	"sync"

	"ullage/fluids"
	"ullage/fluids/solve"
	"ullage/fluids/units"
)

// Stages of the calculation record, in the order a hand check follows.
const (
	StageFluid    = "Fluid properties"
	StageVessel   = "Vessel state"
	StageStress   = "Stresses"
	StageStrength = "Allowable stress"
	StageSafety   = "Safety factor and failure probability"
	StageLimits   = "Limits found by root-finding"
	StageRupture  = "Rupture"
	StageRelease  = "Release"
	StageFindings = "Findings"
)

// Value is a named number in a calculation step, with its unit and, for
// data, its source.
type Value struct {
	Symbol string  `json:"symbol"`
	Value  float64 `json:"value"`
	Unit   string  `json:"unit,omitempty"`
	Source string  `json:"source,omitempty"`
}

// RootRecord says how a root-found result was found: the equation solved,
// the bracket searched, the tolerance, the residual at the answer and the
// number of evaluations; Bound says when the answer lies at a bracket end.
type RootRecord struct {
	Equation    string  `json:"equation"`
	Lo          float64 `json:"lo"`
	Hi          float64 `json:"hi"`
	Unit        string  `json:"unit"`
	Tolerance   float64 `json:"tolerance"`
	Residual    float64 `json:"residual"`
	Evaluations int     `json:"evaluations"`
	Bound       Bound   `json:"bound"`
}

// Step is one numbered step of the calculation record: the method by its
// published name, the equation as written in the source, the values
// substituted, intermediate values, the result and the sources.
type Step struct {
	Number       int         `json:"number"`
	Stage        string      `json:"stage"`
	Title        string      `json:"title"`
	Method       string      `json:"method"`
	Equation     string      `json:"equation"`
	Inputs       []Value     `json:"inputs"`
	Intermediate []Value     `json:"intermediate,omitempty"`
	Result       Value       `json:"result"`
	Source       string      `json:"source"`
	Root         *RootRecord `json:"root,omitempty"`
	Note         string      `json:"note,omitempty"`
	Extrapolated bool        `json:"extrapolated,omitempty"`
	// Uses are the numbers of the earlier steps whose results this step
	// takes, in the order it takes them.
	Uses []int `json:"uses,omitempty"`
	// Finding, set on the steps of the Findings stage only, is the
	// finding's outcome; Result is then unused (zero).
	Finding *FindingResult `json:"finding,omitempty"`
}

// FindingResult is the outcome a finding's step records: the criterion,
// the status, the value and the limit in Unit, which way the limit holds,
// the margin (a fraction of the limit, positive on the safe side) and the
// limit's source. When NotApplicable is set, Value and Margin are not
// results (the JSON gives null).
type FindingResult struct {
	Criterion     string    `json:"criterion"`
	Status        Status    `json:"status"`
	Value         float64   `json:"value"`
	Limit         float64   `json:"limit"`
	Unit          string    `json:"unit,omitempty"`
	Direction     Direction `json:"direction"`
	Margin        float64   `json:"margin"`
	LimitSource   string    `json:"limit_source"`
	NotApplicable Reason    `json:"not_applicable,omitempty"`
}

// MarshalJSON writes a finding's outcome with null value and margin when
// they were not computed (NotApplicable set).
func (r FindingResult) MarshalJSON() ([]byte, error) {
	type plain FindingResult
	out := struct {
		plain
		Value  *float64 `json:"value"`
		Margin *float64 `json:"margin"`
	}{plain: plain(r)}
	if r.NotApplicable == "" {
		out.Value, out.Margin = &r.Value, &r.Margin
	}
	return json.Marshal(out)
}

// tracer numbers steps as they are added and remembers which step gave
// each named result.
type tracer struct {
	steps []Step
	by    map[string]int
}

func (t *tracer) add(key string, s Step) int {
	s.Number = len(t.steps) + 1
	t.steps = append(t.steps, s)
	if key != "" {
		t.by[key] = s.Number
	}
	return s.Number
}

func fromExplanation(stage, title string, e fluids.Explanation) Step {
	s := Step{Stage: stage, Title: title, Method: e.Correlation, Equation: e.Equation, Source: e.Source,
		Result: Value{Symbol: e.Quantity, Value: e.Result, Unit: e.Unit}, Note: e.Note, Extrapolated: e.Extrapolated}
	for _, t := range e.Terms {
		s.Inputs = append(s.Inputs, Value{Symbol: t.Symbol, Value: t.Value, Unit: t.Unit, Source: t.Source})
	}
	return s
}

func rootRecord(eq string, r *solve.Root, b Bound, unit string) *RootRecord {
	rr := &RootRecord{Equation: eq, Unit: unit, Bound: b}
	if r != nil {
		rr.Lo, rr.Hi, rr.Tolerance, rr.Residual, rr.Evaluations = r.Lo, r.Hi, r.Tolerance, r.Residual, r.Evaluations
	}
	return rr
}

// record is an assessment's calculation record. No result rests on it, and
// writing it out is much of the work of an assessment, so it is built from
// the finished assessment on first use, once, safely from any number of
// goroutines.
type record struct {
	once sync.Once
	a    *Assessment
	// steps are the numbered steps, index the step number of each named
	// result, findings the steps behind each finding by its place in
	// Assessment.Findings.
	steps    []Step
	index    map[string]int
	findings [][]int
}

// built returns the record, building it on the first call.
func (r *record) built() *record {
	r.once.Do(func() {
		if r.a != nil {
			r.a.buildTrace(r)
		}
	})
	return r
}

// RecordOnly returns an assessment that holds nothing but the given
// calculation record: for code that lays out records, and its tests.
func RecordOnly(steps []Step) *Assessment {
	r := &record{steps: steps, index: map[string]int{}}
	r.built()
	return &Assessment{rec: r}
}

// Trace returns the calculation record: numbered steps in the order a
// hand check follows (each finding's Steps lists those behind it). The
// first call builds it; the steps are shared, not to be changed.
func (a *Assessment) Trace() []Step {
	if a.rec == nil {
		return nil
	}
	return a.rec.built().steps
}

// TraceStep returns the number of the step that produced a named result
// (for example "burst_safety_factor"), or 0.
func (a *Assessment) TraceStep(key string) int {
	if a.rec == nil {
		return 0
	}
	return a.rec.built().index[key]
}

// buildTrace writes the calculation record of the finished assessment
// into rec.
func (a *Assessment) buildTrace(rec *record) {
	sub := a.vessel.fluid
	d := &a.Design
	f := a.Fluid
	tr := &tracer{steps: make([]Step, 0, 48), by: make(map[string]int, 48)}
	addFluid := func(tag string, temp float64) {
		label := fmt.Sprintf("%s at %.2f K (%.1f °C)", tag, temp, units.KelvinToCelsius(temp))
		if temp > sub.CriticalTemperature() {
			return
		}
		if e, err := sub.ExplainVapourPressure(temp); err == nil {
			tr.add("psat_"+tag, fromExplanation(StageFluid, "Vapour pressure, "+label, e))
		}
		if e, err := sub.ExplainLiquidDensity(temp); err == nil {
			tr.add("rhol_"+tag, fromExplanation(StageFluid, "Saturated liquid density, "+label, e))
		}
		if e, err := sub.ExplainVapourDensity(temp); err == nil {
			tr.add("rhov_"+tag, fromExplanation(StageFluid, "Saturated vapour density, "+label, e))
		}
	}
	addFluid("sealing", d.SealingTemperatureK)
	addFluid("hottest", d.HottestK)
	addFluid("coldest", d.ColdestK)

	// Vessel.
	volIn := []Value{}
	for _, p := range d.Vessel.Parts {
		volIn = append(volIn, Value{Symbol: p.Name + " inner radius", Value: p.InnerRadius(), Unit: "m"})
		if p.Shape == ShapeTube {
			volIn = append(volIn, Value{Symbol: p.Name + " length", Value: p.LengthM, Unit: "m"})
		}
	}
	volStep := Step{Stage: StageVessel, Title: "Internal volume", Method: "sum of part volumes",
		Equation: "V = Σ (4/3)π rᵢ³ (spheres) + Σ π rᵢ² L (tubes)", Inputs: volIn,
		Result: Value{Symbol: "V", Value: a.VolumeM3, Unit: "m³"}, Source: "geometry"}
	if d.Vessel.InternalVolumeM3 > 0 {
		volStep.Method, volStep.Equation = "measured volume", "V = measured internal volume"
		volStep.Inputs = []Value{{Symbol: "V", Value: d.Vessel.InternalVolumeM3, Unit: "m³", Source: "design input"}}
	}
	tr.add("volume", volStep)
	tr.add("fill_density", Step{Stage: StageVessel, Title: "Fill density", Method: "definition", Equation: "ρ_fill = m/V",
		Inputs: []Value{{Symbol: "m", Value: d.FillMassKg, Unit: "kg", Source: "design input"}, {Symbol: "V", Value: a.VolumeM3, Unit: "m³"}},
		Result: Value{Symbol: "ρ_fill", Value: a.FillDensity, Unit: "kg/m³"}, Source: "definition"})
	gasMoles := a.vessel.gasMoles
	tr.add("gas_moles", Step{Stage: StageVessel, Title: "Residual gas sealed in", Method: "ideal-gas law",
		Equation: "n = P_res · V_g,seal /(R · T_seal),  V_g,seal = (ρl·V − m)/(ρl − ρv) at T_seal",
		Inputs: []Value{{Symbol: "P_res", Value: d.ResidualGasPressurePa, Unit: "Pa", Source: "design input"},
			{Symbol: "T_seal", Value: d.SealingTemperatureK, Unit: "K", Source: "design input"},
			{Symbol: "R", Value: units.GasConstant, Unit: "J/(mol·K)", Source: "CODATA 2018"}},
		Result: Value{Symbol: "n", Value: gasMoles, Unit: "mol"}, Source: "common practice"})

	lf := Step{Stage: StageVessel, Title: "Liquid-full temperature", Method: "Rackett equation solved for T",
		Equation: "ρl(T) = ρ_fill, solved in closed form: T = Tc·[1 − (w_ref − ln(ρ_fill/ρ_ref)/ln Z_RA)^(7/2)]",
		Inputs: []Value{{Symbol: "ρ_fill", Value: a.FillDensity, Unit: "kg/m³"}, {Symbol: "Z_RA", Value: sub.RackettZ()},
			{Symbol: "ρc", Value: sub.CriticalDensity(), Unit: "kg/m³", Source: f.CriticalDensity.Source}},
		Source: "Rackett (1970), inverted (from memory)"}
	if eos := sub.EquationOfState(); eos != nil {
		lf.Method = "saturated-liquid density of the reference equation of state solved for T"
		lf.Equation = "ρ'(T) = ρ_fill, ρ'(T) from equal pressure and Gibbs energy of liquid and vapour (" + eos.Name + "), solved for T above the densest liquid"
		lf.Inputs = []Value{{Symbol: "ρ_fill", Value: a.FillDensity, Unit: "kg/m³"},
			{Symbol: "ρc", Value: sub.CriticalDensity(), Unit: "kg/m³", Source: eos.Paper.Citation()}}
		lf.Source = eos.Paper.Citation()
	}
	if a.LiquidFullReached {
		lf.Result = Value{Symbol: "T_full", Value: a.LiquidFullK, Unit: "K"}
		if rho, err := sub.SaturatedLiquidDensity(a.LiquidFullK); err == nil {
			lf.Root = &RootRecord{Equation: "ρl(T) − ρ_fill = 0", Lo: sub.MinTemperature(), Hi: sub.CriticalTemperature(), Unit: "K",
				Residual: rho - a.FillDensity, Bound: BoundFound}
		}
	} else {
		lf.Result = Value{Symbol: "T_full", Value: sub.CriticalTemperature(), Unit: "K"}
		lf.Note = "The fill density is at or below the critical density: the vessel never goes liquid-full below Tc."
	}
	tr.add("liquid_full_temperature", lf)
	tr.add("state_hot", a.stateStep("Vessel at the hottest temperature", a.Hot, "hottest", tr))
	tr.add("state_cold", a.stateStep("Vessel at the coldest temperature", a.Cold, "coldest", tr))
	if w := a.Worst; w != nil {
		ws := Step{Stage: StageVessel, Title: "Worst-case unit at the hottest temperature", Method: "tolerances stacked: most fill, least internal volume",
			Equation: "m_w = m + Δm;  V_w = V − ΔV (measured volume) or V(walls + Δt) − ΔV (volume from the parts); state as for the nominal unit",
			Inputs: []Value{{Symbol: "m_w", Value: w.FillMassKg, Unit: "kg", Source: "design fill plus its tolerance"},
				{Symbol: "V_w", Value: w.VolumeM3, Unit: "m³", Source: "design volume less its tolerance"},
				{Symbol: "T_hot", Value: d.HottestK, Unit: "K", Source: "design input"}},
			Source: "common practice (worst-case tolerance stack)"}
		if w.Sealable {
			ws.Intermediate = []Value{{Symbol: "ullage", Value: w.Hot.UllagePercent, Unit: "%"}, {Symbol: "T_full", Value: w.LiquidFullK, Unit: "K"}}
			ws.Result = Value{Symbol: "P", Value: w.Hot.PressurePa, Unit: "Pa"}
			ws.Extrapolated = w.Hot.Flags.Extrapolated()
		} else {
			ws.Note = "The worst-case fill does not fit as liquid at the sealing temperature."
		}
		tr.add("state_worst", ws)
	}

	// Stresses.
	over := a.Hot.PressurePa - d.AmbientPressurePa
	for i, p := range a.Parts {
		part := d.Vessel.Parts[i]
		eq := map[string]string{
			ShapeSphere + WallThin:  "σ = ΔP · r_m /(2t)",
			ShapeTube + WallThin:    "σ = ΔP · r_m / t",
			ShapeSphere + WallThick: "σ = ΔP (r_o³ + 2r_i³)/(2(r_o³ − r_i³))",
			ShapeTube + WallThick:   "σ = ΔP (r_o² + r_i²)/(r_o² − r_i²)",
		}[p.Shape+p.Form]
		tr.add(fmt.Sprintf("stress_%d", i), Step{Stage: StageStress, Title: "Hoop stress, " + p.Name,
			Method: fmt.Sprintf("%s %s membrane stress (t/r_i = %.3f)", p.Form, p.Shape, p.WallRatio), Equation: eq,
			Inputs: []Value{{Symbol: "ΔP", Value: math.Max(over, 0), Unit: "Pa", Source: "hottest pressure minus ambient"},
				{Symbol: "r_o", Value: part.OuterDiameterM / 2, Unit: "m", Source: "design input"},
				{Symbol: "t", Value: part.WallThicknessM, Unit: "m", Source: "design input"},
				{Symbol: "r_m", Value: part.OuterDiameterM/2 - part.WallThicknessM/2, Unit: "m"},
				{Symbol: "r_i", Value: part.InnerRadius(), Unit: "m"}},
			Intermediate: []Value{{Symbol: "σ per pascal", Value: p.StressPerPascal}},
			Result:       Value{Symbol: "σ", Value: p.HoopStressPa, Unit: "Pa"},
			Source:       "Roark's Formulas for Stress and Strain, 7th ed., Tables 13.1 and 13.5 (from memory)"})
	}
	g := a.Glass
	var sumIn []Value
	for _, p := range a.Parts {
		sumIn = append(sumIn, Value{Symbol: "A (" + p.Name + ")", Value: p.AreaM2, Unit: "m²"}, Value{Symbol: "k (" + p.Name + ")", Value: p.StressPerPascal})
	}
	sumIn = append(sumIn, Value{Symbol: "σ₀", Value: g.CharacteristicStrength.Value, Unit: "Pa", Source: g.CharacteristicStrength.Source},
		Value{Symbol: "A₀", Value: g.ReferenceArea.Value, Unit: "m²", Source: g.ReferenceArea.Source},
		Value{Symbol: "m", Value: g.WeibullModulus.Value, Source: g.WeibullModulus.Source})
	tr.add("short_term_burst", Step{Stage: StageStrength, Title: "Short-term burst overpressure (63.2 % failure)",
		Method: "Weibull weakest-link model", Equation: "ΔP_b = σ₀ / [Σ (Aᵢ/A₀) kᵢ^m]^(1/m)", Inputs: sumIn,
		Result: Value{Symbol: "ΔP_b", Value: a.Strength.ShortTermBurstPa, Unit: "Pa"}, Source: "Weibull, J. Appl. Mech. 18, 293 (1951)"})
	tr.add("long_term_burst", Step{Stage: StageStrength, Title: "Long-term burst overpressure (static fatigue)",
		Method: "load-duration equivalence σⁿ·t = constant", Equation: "ΔP_bL = ΔP_b · (t₀/t)^(1/n)",
		Inputs: []Value{{Symbol: "ΔP_b", Value: a.Strength.ShortTermBurstPa, Unit: "Pa"},
			{Symbol: "t₀", Value: g.ReferenceLoad.Value, Unit: "s", Source: g.ReferenceLoad.Source},
			{Symbol: "t", Value: d.HoursAtHottest * 3600, Unit: "s", Source: "design input (hours at the hottest temperature)"},
			{Symbol: "n", Value: g.StressCorrosionExponent.Value, Source: g.StressCorrosionExponent.Source}},
		Intermediate: []Value{{Symbol: "(t₀/t)^(1/n)", Value: a.Strength.DurationFactor},
			{Symbol: "allowable stress, " + a.Parts[a.Strength.GoverningPart].Name, Value: a.Strength.AllowableStressPa, Unit: "Pa"}},
		Result: Value{Symbol: "ΔP_bL", Value: a.Strength.LongTermBurstPa, Unit: "Pa"},
		Source: "ASTM E1300 glass failure prediction model (Beason and Morgan 1984) (from memory)"})
	a.traceSealStress(tr)
	tr.add("burst_safety_factor", Step{Stage: StageSafety, Title: "Burst safety factor", Method: "ratio of capacity to load",
		Equation: "SF = ΔP_bL / ΔP  (capped at 1000)",
		Inputs:   []Value{{Symbol: "ΔP_bL", Value: a.Strength.LongTermBurstPa, Unit: "Pa"}, {Symbol: "ΔP", Value: over, Unit: "Pa"}},
		Result:   Value{Symbol: "SF", Value: a.BurstSafetyFactor}, Source: "definition", Note: noLoadNote(a.HasBurstLoad(), ReasonNoBurstLoad)})
	tr.add("failure_probability", Step{Stage: StageSafety, Title: "Failure probability over the service life",
		Method: "Weibull distribution", Equation: "P_f = 1 − exp[−(ΔP/ΔP_bL)^m]",
		Inputs: []Value{{Symbol: "ΔP", Value: math.Max(over, 0), Unit: "Pa"}, {Symbol: "ΔP_bL", Value: a.Strength.LongTermBurstPa, Unit: "Pa"},
			{Symbol: "m", Value: g.WeibullModulus.Value, Source: g.WeibullModulus.Source}},
		Result: Value{Symbol: "P_f", Value: a.FailureProbability}, Source: "Weibull (1951)", Note: noLoadNote(a.HasBurstLoad(), ReasonNoBurstLoad)})
	if ws := a.WorstStrength; ws != nil {
		var in []Value
		for i, p := range ws.Parts {
			part := d.Vessel.Parts[i]
			in = append(in, Value{Symbol: "t_min (" + p.Name + ")", Value: part.WallThicknessM - part.WallToleranceM, Unit: "m", Source: "design wall less its tolerance"},
				Value{Symbol: "k (" + p.Name + ")", Value: p.StressPerPascal})
		}
		pSource := "nominal unit at the hottest temperature"
		if ws.FromWorstUnit {
			pSource = fmt.Sprintf("worst-case unit at the hottest temperature (step %d)", tr.by["state_worst"])
		}
		in = append(in, Value{Symbol: "P", Value: ws.PressurePa, Unit: "Pa", Source: pSource}, Value{Symbol: "P₀", Value: d.AmbientPressurePa, Unit: "Pa", Source: "design input"})
		st := Step{Stage: StageSafety, Title: "Burst safety factor, weakest permitted unit", Method: "Weibull weakest-link model and static fatigue with every wall at its thinnest",
			Equation: "t_min = t − Δt;  ΔP_bL = σ₀ (t₀/t_load)^(1/n) / [Σ (Aᵢ/A₀) kᵢ(t_min)^m]^(1/m);  SF = ΔP_bL/(P − P₀);  P_f = 1 − exp[−((P − P₀)/ΔP_bL)^m]",
			Inputs:   in,
			Intermediate: []Value{{Symbol: "ΔP_bL", Value: ws.Strength.LongTermBurstPa, Unit: "Pa"},
				{Symbol: "P_f", Value: ws.FailureProbability}},
			Result: Value{Symbol: "SF_min", Value: ws.SafetyFactor}, Source: "common practice (strength at the minimum permitted thickness); Weibull (1951); ASTM E1300 (from memory)"}
		if ws.OverPa <= 0 {
			st.Note = "No overpressure: " + recordWords(ReasonNoBurstLoad) + "; the safety factor shown is not a result."
		}
		tr.add("burst_safety_factor_worst", st)
	}
	var buckIn []Value
	for _, p := range a.Parts {
		buckIn = append(buckIn, Value{Symbol: "p_cr (" + p.Name + ")", Value: p.ClassicalBucklingPa, Unit: "Pa"},
			Value{Symbol: "knock-down (" + p.Name + ")", Value: p.KnockDown, Source: "NASA SP-8032 / SP-8007 (from memory)"})
	}
	buckIn = append(buckIn, Value{Symbol: "E", Value: g.ElasticModulus.Value, Unit: "Pa", Source: g.ElasticModulus.Source},
		Value{Symbol: "ν", Value: g.PoissonRatio.Value, Source: g.PoissonRatio.Source},
		Value{Symbol: "ΔP_ext", Value: a.ExternalLoadPa, Unit: "Pa", Source: "ambient minus coldest pressure"})
	tr.add("implosion_safety_factor", Step{Stage: StageSafety, Title: "Implosion safety factor",
		Method: "classical elastic buckling with knock-down", Equation: "sphere p_cr = 2E(t/r_m)²/√(3(1−ν²)); tube p_cr = E(t/r_m)³/(4(1−ν²)); SF = min(knock-down · p_cr)/ΔP_ext",
		Inputs: buckIn, Result: Value{Symbol: "SF_implosion", Value: a.ImplosionSafetyFactor},
		Source: "Zoelly (1915); Bresse–Bryan; Timoshenko and Gere, Theory of Elastic Stability, 2nd ed. (from memory)"})
	a.traceThermalShock(tr)

	// Root-found limits.
	ms := a.MaxSafe
	rootP := rootRecord("P(T) − P_allow = 0", ms.PressureRoot, ms.TemperatureBound, "K")
	if ms.TemperatureLimitBy == "ullage" {
		rootP = rootRecord("ullage(T) − minimum ullage = 0", ms.UllageRoot, ms.TemperatureBound, "K")
	}
	tr.add("max_safe_temperature", Step{Stage: StageLimits, Title: "Maximum safe temperature (limited by " + ms.TemperatureLimitBy + ")",
		Method: "Brent's method", Equation: rootP.Equation,
		Inputs: []Value{{Symbol: "P_allow", Value: a.AllowablePressurePa(), Unit: "Pa", Source: "ambient + ΔP_bL / required safety factor"},
			{Symbol: "required SF", Value: a.RequiredSafetyFactor, Source: "larger of the minimum safety factor and the one the failure-probability limit needs"},
			{Symbol: "minimum ullage", Value: d.Criteria.MinUllagePercent, Unit: "%", Source: "criteria"}},
		Result: Value{Symbol: "T_max", Value: ms.TemperatureK, Unit: "K"}, Root: rootP,
		Source: "Brent, Algorithms for Minimization without Derivatives (1973)"})
	tr.add("max_safe_fill", Step{Stage: StageLimits, Title: "Maximum safe fill at the hottest temperature",
		Method: "Brent's method", Equation: "max[(P(m) − P_allow)/P_allow, (minimum ullage − ullage(m))/100] = 0",
		Inputs: []Value{{Symbol: "P_allow", Value: a.AllowablePressurePa(), Unit: "Pa"}, {Symbol: "T_hot", Value: d.HottestK, Unit: "K"}},
		Result: Value{Symbol: "m_max", Value: ms.FillMassKg, Unit: "kg"}, Root: rootRecord("as above, in the fill mass m", ms.FillRoot, ms.FillBound, "kg"),
		Source: "Brent (1973)"})

	// Rupture.
	r := a.Rupture
	tr.add("stored_energy", Step{Stage: StageRupture, Title: "Stored energy at the hottest temperature",
		Method: "Brode's equation with the flashing liquid", Equation: "E = (P − P₀)(V_g + F·m_l/ρv)/(γ − 1) + ½(P − P_sat)²V_l/K;  F = 1 − exp(−c_p(T − T_b)/h_fg)",
		Inputs: []Value{{Symbol: "P", Value: a.Hot.PressurePa, Unit: "Pa"}, {Symbol: "P₀", Value: d.AmbientPressurePa, Unit: "Pa"},
			{Symbol: "V_g", Value: a.VolumeM3 * a.Hot.UllagePercent / 100, Unit: "m³"}, {Symbol: "m_l", Value: a.Hot.LiquidMassKg, Unit: "kg"},
			{Symbol: "γ", Value: VapourHeatCapacityRatio, Source: "common practice (conservative)"},
			{Symbol: "T_b", Value: f.NormalBoilingPoint.Value, Unit: "K", Source: f.NormalBoilingPoint.Source},
			{Symbol: "c_p", Value: f.LiquidHeatCapacity.Value / f.MolarMass.Value, Unit: "J/(kg·K)", Source: f.LiquidHeatCapacity.Source}},
		Intermediate: []Value{{Symbol: "F", Value: r.FlashFraction}, {Symbol: "E_gas", Value: r.GasEnergyJ, Unit: "J"},
			{Symbol: "E_flash", Value: r.FlashEnergyJ, Unit: "J"}, {Symbol: "E_liquid", Value: r.LiquidStrainEnergyJ, Unit: "J"}},
		Result: Value{Symbol: "E", Value: r.StoredEnergyJ, Unit: "J"},
		Source: "Brode, Phys. Fluids 2, 217 (1959); CCPS Guidelines for Chemical Process Quantitative Risk Analysis, 2nd ed. (from memory)"})

	// Release.
	rel := a.release
	room := d.Room
	tr.add("room_model", Step{Stage: StageRelease, Title: "Well-mixed room after the breakage",
		Method: "well-mixed box model, instantaneous release", Equation: "C(t) = (M/V_room)·exp(−Q t/(k V_room)),  Q = ACH·V_room/3600",
		Inputs: []Value{{Symbol: "M", Value: d.FillMassKg * 1e6, Unit: "mg"}, {Symbol: "V_room", Value: room.VolumeM3, Unit: "m³", Source: "design input"},
			{Symbol: "ACH", Value: room.AirChangesPerHour, Unit: "1/h", Source: "design input"}, {Symbol: "k", Value: room.MixingFactor, Source: "design input"}},
		Intermediate: []Value{{Symbol: "C(0)", Value: rel.Concentration(WellMixedRoom, 0), Unit: "mg/m³"}, {Symbol: "Q/(kV)", Value: rel.roomRate, Unit: "1/s"}},
		Result:       Value{Symbol: "C(0)", Value: units.MgPerM3ToPpm(rel.Concentration(WellMixedRoom, 0), f.MolarMass.Value), Unit: "ppm"},
		Source:       "AIHA, Mathematical Models for Estimating Occupational Exposure to Chemicals, 2nd ed. (2009) (from memory); ppm = mg/m³ × 24.45/MW (NIOSH Pocket Guide)"})
	tr.add("near_field_model", Step{Stage: StageRelease, Title: "Near field beside the breakage",
		Method: "near-field/far-field two-zone model", Equation: "V_N dC_N/dt = β(C_F − C_N); V_F dC_F/dt = β(C_N − C_F) − Q C_F; β = ½·2πr²·s",
		Inputs: []Value{{Symbol: "r", Value: room.NearFieldRadiusM, Unit: "m", Source: "design input"}, {Symbol: "s", Value: room.NearFieldAirSpeed, Unit: "m/s", Source: "design input"}},
		Intermediate: []Value{{Symbol: "V_N", Value: rel.nearVolume, Unit: "m³"}, {Symbol: "β", Value: rel.beta, Unit: "m³/s"},
			{Symbol: "λ₁", Value: rel.lambda1, Unit: "1/s"}, {Symbol: "λ₂", Value: rel.lambda2, Unit: "1/s"}},
		Result: Value{Symbol: "C_N, 1-minute average", Value: units.MgPerM3ToPpm(rel.Average(NearField, NearFieldMinimumAverageS), f.MolarMass.Value), Unit: "ppm"},
		Source: "Nicas, Appl. Occup. Environ. Hyg. 11(8) (1996) (from memory)"})
	bd := a.Release.Bound
	tr.add("concentration_bound", Step{Stage: StageRelease, Title: "Physical bound on the concentration", Method: "smallest of three physical ceilings",
		Equation: "C_max = min(P_sat(T_room)/P₀ · 10⁶ ppm, M/V_N, 10⁶ ppm)",
		Inputs: []Value{{Symbol: "T_room", Value: bd.RoomTemperatureK, Unit: "K", Source: "hottest temperature of the design, not below 25 °C (conservative)"},
			{Symbol: "P₀", Value: d.AmbientPressurePa, Unit: "Pa", Source: "design input"}, {Symbol: "M", Value: d.FillMassKg * 1e6, Unit: "mg"},
			{Symbol: "V_N", Value: rel.nearVolume, Unit: "m³"}},
		Intermediate: []Value{{Symbol: "saturated vapour", Value: bd.SaturatedPPM, Unit: "ppm"}, {Symbol: "whole fill in the near field", Value: bd.NearFieldPPM, Unit: "ppm"}},
		Result:       Value{Symbol: "C_max", Value: bd.PPM, Unit: "ppm"}, Source: "common practice (Dalton's law: a vapour's partial pressure cannot exceed its vapour pressure)",
		Note: "Bound by " + bd.By + "; a model value above it is replaced by it and marked as a bound."})
	for _, e := range a.exposurePeriods() {
		zone := "well-mixed room"
		if e.x.Zone == NearField {
			zone = "near field"
		}
		var shares []Value
		for _, l := range a.Release.Limits {
			if l.StepKey == exposureStepKey(e.x.AveragingS) {
				shares = append(shares, Value{Symbol: "share of " + l.Name, Value: l.Share, Source: fmt.Sprintf("%g ppm: %s", l.PPM, l.Source)})
			}
		}
		st := Step{Stage: StageRelease, Title: e.title, Method: "larger of the room and near-field averages (" + zone + " governs)",
			Equation:     "C̄ = (1/T_avg) ∫₀^min(T_avg, T_present) C(t) dt; near field never averaged over less than 60 s; C̄ ≤ C_max",
			Inputs:       []Value{{Symbol: "T_avg", Value: e.x.AveragingS, Unit: "s"}, {Symbol: "T_present", Value: room.ExposureMinutes * 60, Unit: "s", Source: "design input"}},
			Intermediate: append([]Value{{Symbol: "C̄", Value: e.x.MgM3, Unit: "mg/m³"}}, shares...),
			Result:       Value{Symbol: "C̄", Value: e.x.PPM, Unit: "ppm"}, Source: "as the models above"}
		if e.x.AveragingS <= PeakAveragingS {
			st.Equation = "C_peak = max over zones of (1/60 s) ∫₀^60 s C(t) dt, the top of the charted one-minute averages; C_peak ≤ C_max"
		}
		if e.x.Bounded {
			st.Note = "The model's average lay above the physical bound; the bound is reported (the true value is at most this)."
		}
		n := tr.add(exposureStepKey(e.x.AveragingS), st)
		for _, alias := range e.aliases {
			tr.by[alias] = n
		}
	}
	a.tracePublic(tr)
	if f.Flammability.LFLPercent != nil {
		tr.add("percent_lfl", Step{Stage: StageRelease, Title: "Peak as a percentage of the LFL", Method: "ratio", Equation: "%LFL = C_peak / (LFL·10⁴ ppm) × 100",
			Inputs: []Value{{Symbol: "C_peak", Value: a.Release.Peak.PPM, Unit: "ppm"}, {Symbol: "LFL", Value: f.Flammability.LFLPercent.Value, Unit: "% vol", Source: f.Flammability.LFLPercent.Source}},
			Result: Value{Symbol: "%LFL", Value: a.Release.PercentLFL, Unit: "%"}, Source: "definition"})
	}

	// Findings.
	steps := make([][]int, len(a.Findings))
	for i := range a.Findings {
		fd := &a.Findings[i]
		deps := stepNumbers(tr, a.findingDependencies(fd.Criterion))
		n := tr.add("finding_"+fd.Criterion, Step{Stage: StageFindings, Title: fd.Title, Method: "comparison with the criterion",
			Equation: "status from value against limit (caution band as documented)", Uses: deps,
			Finding: &FindingResult{Criterion: fd.Criterion, Status: fd.Status, Value: fd.Value, Limit: fd.Limit, Unit: fd.Unit,
				Direction: fd.Direction, Margin: fd.Margin, LimitSource: fd.Source, NotApplicable: fd.NotApplicable},
			Intermediate: factValues(fd.Facts), Source: fd.Source})
		steps[i] = append([]int{n}, deps...)
	}
	a.amendSealSteps(tr)
	rec.steps, rec.index, rec.findings = tr.steps, tr.by, steps
}

var findingDeps = map[string][]string{
	CriterionUllage:         {"state_hot", "liquid_full_temperature"},
	CriterionUllageWorst:    {"state_worst", "state_hot"},
	CriterionBurst:          {"burst_safety_factor", "long_term_burst", "state_hot"},
	CriterionBurstWorst:     {"burst_safety_factor_worst", "state_worst", "state_hot"},
	CriterionFailure:        {"failure_probability", "long_term_burst"},
	CriterionImplosion:      {"implosion_safety_factor", "state_cold"},
	CriterionNoLimit:        {"exposure_peak"},
	CriterionFlammability:   {"percent_lfl", "exposure_peak"},
	CriterionCorrelationUse: {"psat_hottest", "state_hot"},
}

// findingDependencies returns the keys of the steps behind a finding: for
// an exposure finding, the step of its governing limit's averaging period.
func (a *Assessment) findingDependencies(criterion string) []string {
	if IsThermalShockCriterion(criterion) || criterion == CriterionBurst || criterion == CriterionFailure {
		return findingDepsOf(criterion)
	}
	if deps, ok := findingDeps[criterion]; ok {
		return deps
	}
	for _, l := range a.Release.Limits {
		if l.Governs && IsPublicKind(l.Kind) && fmt.Sprintf("exposure-public-%d", publicTier(l.Kind)) == criterion {
			return []string{l.StepKey, "concentration_bound", "near_field_model", "room_model"}
		}
		if l.Governs && !IsPublicKind(l.Kind) && exposureCriterion(l.Kind) == criterion {
			return []string{l.StepKey, "concentration_bound", "near_field_model", "room_model"}
		}
	}
	// A kind with no published limit: the release it could not be judged on.
	return []string{"exposure_peak", "room_model", "near_field_model"}
}

// exposurePeriod is one averaging period of the release with its step.
type exposurePeriod struct {
	title   string
	x       Exposure
	aliases []string
}

// exposurePeriods returns one entry per averaging period the review uses,
// shortest first: the peak, 15 minutes, 8 hours and each limit's own.
func (a *Assessment) exposurePeriods() []exposurePeriod {
	out := []exposurePeriod{
		{"Peak exposure (highest one-minute average)", a.Release.Peak, []string{"exposure_peak"}},
		{"15-minute average exposure", a.Release.STEL, []string{"exposure_stel"}},
		{"8-hour time-weighted average", a.Release.TWA8h, []string{"exposure_twa"}},
	}
	for _, l := range a.Release.Limits {
		if l.WholePeriod {
			continue // public durations have steps of their own (tracePublic)
		}
		found := false
		for _, p := range out {
			found = found || p.x.AveragingS == l.Exposure.AveragingS
		}
		if !found {
			out = append(out, exposurePeriod{title: fmt.Sprintf("%g-minute average exposure", l.Exposure.AveragingS/60), x: l.Exposure})
		}
	}
	sort.SliceStable(out, func(i, j int) bool { return out[i].x.AveragingS < out[j].x.AveragingS })
	return out
}

// noLoadNote is the note of a step whose result is not a result for want
// of a load.
func noLoadNote(loaded bool, r Reason) string {
	if loaded {
		return ""
	}
	return recordWords(r) + ": the number above only carries the calculation on; it is not a result."
}

func stepNumbers(tr *tracer, keys []string) []int {
	var out []int
	for _, k := range keys {
		if n := tr.by[k]; n > 0 {
			out = append(out, n)
		}
	}
	return out
}

// stateStep records how the vessel state at one temperature was found.
func (a *Assessment) stateStep(title string, st VesselState, tag string, tr *tracer) Step {
	d := &a.Design
	s := Step{Stage: StageVessel, Title: fmt.Sprintf("%s, %.2f K (%.1f °C): %s", title, st.TemperatureK, units.KelvinToCelsius(st.TemperatureK), st.Phase),
		Extrapolated: st.Flags.Extrapolated(), Result: Value{Symbol: "P", Value: st.PressurePa, Unit: "Pa"}}
	refs := []Value{{Symbol: "m", Value: d.FillMassKg, Unit: "kg"}, {Symbol: "V", Value: a.VolumeM3, Unit: "m³"}}
	for _, k := range []struct{ key, symbol, unit string }{{"psat_", "P_sat", "Pa"}, {"rhol_", "ρl", "kg/m³"}, {"rhov_", "ρv", "kg/m³"}} {
		if n := tr.by[k.key+tag]; n > 0 {
			refs = append(refs, Value{Symbol: k.symbol, Value: tr.steps[n-1].Result.Value, Unit: k.unit})
			s.Uses = append(s.Uses, n)
		}
	}
	refs = append(refs, Value{Symbol: "n_gas", Value: a.vessel.gasMoles, Unit: "mol"})
	s.Inputs = refs
	s.Intermediate = []Value{{Symbol: "ullage", Value: st.UllagePercent, Unit: "%"}, {Symbol: "p_gas", Value: st.GasPressurePa, Unit: "Pa"},
		{Symbol: "liquid mass", Value: st.LiquidMassKg, Unit: "kg"}, {Symbol: "vapour mass", Value: st.VapourMassKg, Unit: "kg"}}
	switch {
	case st.Phase == PhaseTwoPhase && a.vessel.gasMoles == 0:
		s.Method = "mass balance of saturated liquid and vapour"
		s.Equation = "V_l = (m − ρv·V)/(ρl − ρv);  ullage = 1 − V_l/V;  P = P_sat"
		s.Source = "common practice (lever rule)"
	case st.Phase == PhaseTwoPhase || (st.Phase == PhaseLiquidFull && a.vessel.gasMoles > 0):
		s.Method = "mass balance with the residual gas squeezed by the liquid"
		s.Equation = "V_g + (m − ρv·V_g)/ρl(T, P) = V,  P = P_sat + n·R·T/V_g  (ρl(T, P) from the Tait equation)"
		s.Source = "common practice; Thomson, Brobst and Hankinson, AIChE J. 28, 671 (1982)"
	case st.Phase == PhaseLiquidFull:
		s.Method = "compressed liquid at the fill density"
		s.Equation = "Tait: V = Vs[1 − C ln((B + P)/(B + P_sat))], solved for P at ρ = ρ_fill"
		s.Source = "Thomson, Brobst and Hankinson, AIChE J. 28, 671 (1982)"
	case st.Phase == PhaseVapour:
		s.Method = "superheated vapour at the fill density"
		s.Equation = "P = P_sat(T_dew) + P_PR(T, ρ) − P_PR(T_dew, ρ) + n·R·T/V"
		s.Source = "Peng and Robinson (1976), anchored on the saturation curve"
	default:
		s.Method = "supercritical fluid at the fill density"
		s.Equation = "P = P_sat(T_s) + P_PR(T, ρ) − P_PR(T_s, ρ) + n·R·T/V"
		s.Source = "Peng and Robinson (1976), anchored on the saturation curve"
	}
	return s
}

// tracePublic adds one step per public acute duration: the average over
// the duration for a person present throughout, with the share of each
// benchmark of that duration.
func (a *Assessment) tracePublic(tr *tracer) {
	done := map[string]bool{}
	for _, l := range a.Release.Limits {
		if !l.WholePeriod || done[l.StepKey] || tr.by[l.StepKey] > 0 {
			continue
		}
		done[l.StepKey] = true
		e := l.Exposure
		zone := "well-mixed room"
		if e.Zone == NearField {
			zone = "near field"
		}
		var shares []Value
		for _, o := range a.Release.Limits {
			if o.StepKey == l.StepKey {
				shares = append(shares, Value{Symbol: "share of " + o.Name, Value: o.Share, Source: fmt.Sprintf("%g ppm: %s", o.PPM, o.Source)})
			}
		}
		st := Step{Stage: StageRelease, Title: fmt.Sprintf("Public: %s average, present throughout", durationWords(e.AveragingS/60)),
			Method:       "larger of the room and near-field averages (" + zone + " governs)",
			Equation:     "C̄ = (1/T) ∫₀^T C(t) dt; well-mixed room: C̄ = (M/V)·(τ/T)·(1 − e^(−T/τ)), τ = kV/Q; C̄ ≤ C_max",
			Inputs:       []Value{{Symbol: "T", Value: e.AveragingS, Unit: "s", Source: "AEGL duration"}},
			Intermediate: append([]Value{{Symbol: "C̄", Value: e.MgM3, Unit: "mg/m³"}}, shares...),
			Result:       Value{Symbol: "C̄", Value: e.PPM, Unit: "ppm"}, Source: "as the models above"}
		if e.Bounded {
			st.Note = "The model's average lay above the physical bound; the bound is reported (the true value is at most this)."
		}
		tr.add(l.StepKey, st)
	}
}

// factValues lists a finding's numeric facts as values of its step.
func factValues(fs []Fact) []Value {
	var out []Value
	for _, f := range fs {
		if f.Kind == FactName || f.Text != "" {
			continue
		}
		out = append(out, Value{Symbol: f.Name, Value: f.Value, Unit: f.Kind.unitOf()})
	}
	return out
}

// recordWords is how the calculation record names a reason in its notes.
func recordWords(r Reason) string {
	if r.NotAssessed() {
		return "not assessed — " + string(r)
	}
	return "none — " + string(r)
}
