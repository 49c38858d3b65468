package hazards

import (
	"fmt"
	"math"
	"strings"
)

// SealStress is the residual stress measured at the seal (or another
// joint) and the part that carries it. Give either the stress itself, or
// the polariscope retardation with the optical path length through the
// glass at that point (ASTM C148 describes the measurement); the stress is
// then δ/(C·L) with the glass's stress-optic coefficient C. The measured
// value is taken as tension at the surface, which errs on the safe side
// since a polariscope gives the size of the principal-stress difference,
// not its sign. The zero value means no seal stress is given.
type SealStress struct {
	// Part names the part that carries the seal, as in vessel.parts.
	Part string `json:"part,omitzero"`
	// ResidualStressPa is a measured residual stress (Pa).
	ResidualStressPa float64 `json:"residual_stress_pa,omitzero"`
	// RetardationM is the measured optical retardation (m; 100 nm is
	// 1e-7 m) and PathLengthM the light's path through the glass (m).
	RetardationM float64 `json:"retardation_m,omitzero"`
	PathLengthM  float64 `json:"path_length_m,omitzero"`
}

// Given reports whether a seal stress is given.
func (s SealStress) Given() bool { return s != SealStress{} }

// Limits of a seal-stress input.
const (
	MaxResidualStressPa = 200e6
	MaxRetardationM     = 1e-5
	MaxPathLengthM      = 0.5
)

func (s *SealStress) validate(c *checker, parts []Part) {
	if !s.Given() {
		return
	}
	matches := 0
	for _, p := range parts {
		if p.Name == s.Part {
			matches++
		}
	}
	switch {
	case strings.TrimSpace(s.Part) == "":
		c.fail(FieldSealPart, `""`, "name the part that carries the seal")
	case matches == 0:
		c.fail(FieldSealPart, fmt.Sprintf("%q", s.Part), "must name one of the vessel's parts")
	case matches > 1:
		c.fail(FieldSealPart, fmt.Sprintf("%q", s.Part), "names more than one part; give the parts different names")
	}
	c.number(FieldResidualStress, s.ResidualStressPa, 0, MaxResidualStressPa, "Pa")
	c.number(FieldRetardation, s.RetardationM, 0, MaxRetardationM, "m")
	c.number(FieldSealPathLength, s.PathLengthM, 0, MaxPathLengthM, "m")
	switch {
	case s.ResidualStressPa > 0 && (s.RetardationM > 0 || s.PathLengthM > 0):
		c.fail(FieldRetardation, s.RetardationM, "give either residual_stress_pa or retardation_m with path_length_m, not both")
	case s.RetardationM > 0 && s.PathLengthM == 0:
		c.fail(FieldSealPathLength, s.PathLengthM, "must be greater than zero when a retardation is given (the glass thickness the light crosses)")
	case s.RetardationM == 0 && s.ResidualStressPa == 0:
		c.fail(FieldResidualStress, s.ResidualStressPa, "give residual_stress_pa, or retardation_m with path_length_m")
	}
}

// SealResult is the seal's residual stress and what it does to the burst
// resistance.
type SealResult struct {
	// Part indexes the part that carries the seal.
	Part int
	Name string
	// StressPa is the residual stress used (Pa).
	StressPa float64
	// FromRetardation is true when StressPa = δ/(C·L).
	FromRetardation bool
	RetardationM    float64
	PathLengthM     float64
	Coefficient     Sourced
	// LifeSeconds is the time the residual stress is held (the service
	// life); HotSeconds the time the pressure stress is held.
	LifeSeconds, HotSeconds float64
	// BurstWithoutPa and BurstWithPa are the long-term burst overpressure
	// without and with the residual stress; FailureWithout and FailureWith
	// the failure probability over the service life.
	BurstWithoutPa, BurstWithPa float64
	FailureWithout, FailureWith float64
}

// sealStressOn returns the residual stress carried by part i (Pa).
func (a *Assessment) sealStressOn(i int) float64 {
	if a.Seal == nil || a.Seal.Part != i {
		return 0
	}
	return a.Seal.StressPa
}

// applySealStress adds the seal's residual stress to the sustained stress
// of the part that carries it and recomputes the burst resistance and the
// failure probability. The residual stress is held for the whole service
// life and the pressure stress for the time at the hottest temperature;
// the static-fatigue law σⁿ·t = constant (ASTM E1300 glass failure
// prediction model, from memory) turns the part's stress history into an
// equivalent stress for the reference duration t₀:
//
//	σ_eq = [((k·ΔP + σ_r)ⁿ·t_hot + σ_rⁿ·(t_life − t_hot)) / t₀]^(1/n)
//
// and the weakest-link sum gives P_f = 1 − exp(−Σ (Aᵢ/A₀)(σ_eq,ᵢ/σ₀)^m).
// The long-term burst overpressure is the ΔP at which the sum is 1.
func (a *Assessment) applySealStress() error {
	d := &a.Design
	s := d.SealStress
	if !s.Given() {
		return nil
	}
	g := &a.Glass
	r := &SealResult{StressPa: s.ResidualStressPa, Coefficient: g.StressOpticCoefficient}
	for i, p := range d.Vessel.Parts {
		if p.Name == s.Part {
			r.Part, r.Name = i, p.Name
			break
		}
	}
	if s.RetardationM > 0 {
		if g.StressOpticCoefficient.Value <= 0 {
			return &InputError{Field: FieldRetardation, Value: fmt.Sprintf("%g", s.RetardationM),
				Want: fmt.Sprintf("needs the stress-optic coefficient of the glass, which %s does not state; give residual_stress_pa instead, or a custom glass with stress_optic_coefficient_per_pa", g.Name)}
		}
		r.FromRetardation, r.RetardationM, r.PathLengthM = true, s.RetardationM, s.PathLengthM
		r.StressPa = s.RetardationM / (g.StressOpticCoefficient.Value * s.PathLengthM)
		if r.StressPa > MaxResidualStressPa {
			return &InputError{Field: FieldRetardation, Value: fmt.Sprintf("%g", s.RetardationM),
				Want: fmt.Sprintf("gives %.3g MPa over %g m of path, more than the %g MPa accepted; check the reading and the path length", r.StressPa/1e6, s.PathLengthM, MaxResidualStressPa/1e6)}
		}
	}
	t0 := g.ReferenceLoad.Value
	r.HotSeconds = math.Max(d.HoursAtHottest*3600, t0)
	r.LifeSeconds = math.Max(d.ServiceLifeYears*8766*3600, r.HotSeconds)
	r.BurstWithoutPa = a.Strength.LongTermBurstPa
	r.FailureWithout = a.FailureProbability

	over := math.Max(a.Hot.PressurePa-d.AmbientPressurePa, 0)
	r.FailureWith = -math.Expm1(-a.sealWeakestLinkSum(r, over))
	// Bisection on the rising sum for the overpressure that gives 1.
	lo, hi := 0.0, r.BurstWithoutPa
	if a.sealWeakestLinkSum(r, 0) >= 1 {
		hi = 0
	}
	for i := 0; i < 200 && hi-lo > 1e-12*r.BurstWithoutPa; i++ {
		mid := (lo + hi) / 2
		if a.sealWeakestLinkSum(r, mid) < 1 {
			lo = mid
		} else {
			hi = mid
		}
	}
	r.BurstWithPa = lo
	a.Seal = r
	a.Strength.LongTermBurstPa = r.BurstWithPa
	a.BurstSafetyFactor = safetyFactor(r.BurstWithPa, a.Hot.PressurePa-d.AmbientPressurePa)
	if r.BurstWithPa <= 0 && a.Hot.PressurePa > d.AmbientPressurePa {
		a.BurstSafetyFactor = 0
	}
	a.FailureProbability = r.FailureWith
	return nil
}

// sealWeakestLinkSum is Σ (Aᵢ/A₀)(σ_eq,ᵢ/σ₀)^m at overpressure x.
func (a *Assessment) sealWeakestLinkSum(r *SealResult, x float64) float64 {
	g := &a.Glass
	m, n := g.WeibullModulus.Value, g.StressCorrosionExponent.Value
	s0, a0, t0 := g.CharacteristicStrength.Value, g.ReferenceArea.Value, g.ReferenceLoad.Value
	sum := 0.0
	for i, p := range a.Parts {
		u := p.StressPerPascal * x / s0 // pressure stress over σ₀
		var eq float64
		if i == r.Part {
			total := u + r.StressPa/s0
			if total > 0 {
				// Factor out the larger term so that the n-th powers cannot overflow.
				ratio := (r.StressPa / s0) / total
				eq = total * math.Pow(r.HotSeconds/t0+math.Pow(ratio, n)*(r.LifeSeconds-r.HotSeconds)/t0, 1/n)
			}
		} else {
			eq = u * math.Pow(r.HotSeconds/t0, 1/n)
		}
		sum += p.AreaM2 / a0 * math.Pow(eq, m)
	}
	return sum
}

// traceSealStress adds the seal steps: the residual stress (from the
// retardation when given) and the burst resistance with it.
func (a *Assessment) traceSealStress(tr *tracer) {
	r := a.Seal
	if r == nil {
		return
	}
	if n := tr.by["long_term_burst"]; n > 0 {
		// That step is the plain burst check's; the seal's effect follows.
		tr.steps[n-1].Result.Value = r.BurstWithoutPa
		tr.steps[n-1].Note = "Without the seal's residual stress; the step after next adds it."
	}
	st := Step{Stage: StageStress, Title: "Residual stress at the seal, " + r.Name,
		Result: Value{Symbol: "σ_r", Value: r.StressPa, Unit: "Pa"}}
	if r.FromRetardation {
		st.Method = "photoelastic conversion of a polariscope retardation"
		st.Equation = "σ_r = δ / (C·L)"
		st.Inputs = []Value{{Symbol: "δ", Value: r.RetardationM, Unit: "m", Source: "design input (polariscope reading, ASTM C148)"},
			{Symbol: "C", Value: r.Coefficient.Value, Unit: "1/Pa", Source: r.Coefficient.Source},
			{Symbol: "L", Value: r.PathLengthM, Unit: "m", Source: "design input (path through the glass)"}}
		st.Intermediate = []Value{{Symbol: "δ", Value: r.RetardationM * 1e9, Unit: "nm"}}
		st.Source = "ASTM C148, Standard Test Methods for Polariscopic Examination of Glass Containers (retardation); stress-optic law σ = δ/(C·L) (common practice)"
	} else {
		st.Method = "measured residual stress"
		st.Equation = "σ_r = measured value"
		st.Inputs = []Value{{Symbol: "σ_r", Value: r.StressPa, Unit: "Pa", Source: "design input"}}
		st.Source = "design input"
	}
	st.Note = "Taken as surface tension held for the whole service life: a polariscope gives the size of the stress difference, not its sign."
	tr.add("seal_residual_stress", st)
	tr.add("seal_burst", Step{Stage: StageStrength, Title: "Long-term burst overpressure with the seal's residual stress",
		Method:   "Weibull weakest-link model with each part's stress history turned into an equivalent stress by σⁿ·t = constant",
		Equation: "Σ (Aᵢ/A₀)(σ_eq,ᵢ/σ₀)^m = 1;  σ_eq = [((k·ΔP + σ_r)ⁿ·t_hot + σ_rⁿ·(t_life − t_hot))/t₀]^(1/n) for the seal's part, k·ΔP·(t_hot/t₀)^(1/n) for the others",
		Inputs: []Value{{Symbol: "σ_r", Value: r.StressPa, Unit: "Pa"}, {Symbol: "t_hot", Value: r.HotSeconds, Unit: "s", Source: "design input (hours at the hottest temperature)"},
			{Symbol: "t_life", Value: r.LifeSeconds, Unit: "s", Source: "design input (service life)"},
			{Symbol: "ΔP_bL without σ_r", Value: r.BurstWithoutPa, Unit: "Pa"}},
		Intermediate: []Value{{Symbol: "P_f without σ_r", Value: r.FailureWithout}, {Symbol: "P_f with σ_r", Value: r.FailureWith}},
		Result:       Value{Symbol: "ΔP_bL", Value: r.BurstWithPa, Unit: "Pa"},
		Source:       "Weibull (1951); ASTM E1300 load-duration relation (Beason and Morgan 1984) (from memory)"})
}

// amendSealSteps rewrites the failure-probability step's equation when
// the seal's residual stress is part of it.
func (a *Assessment) amendSealSteps(tr *tracer) {
	if a.Seal == nil {
		return
	}
	if n := tr.by["failure_probability"]; n > 0 {
		s := &tr.steps[n-1]
		s.Equation = "P_f = 1 − exp[−Σ (Aᵢ/A₀)(σ_eq,ᵢ/σ₀)^m], σ_eq with the seal's residual stress (see the seal steps)"
		s.Note = fmt.Sprintf("Includes %.3g MPa of residual stress at the seal of the %s.", a.Seal.StressPa/1e6, a.Seal.Name)
	}
}
