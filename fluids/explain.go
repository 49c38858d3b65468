package fluids

import (
	"fmt"
	"math"
)

// Term is one named value substituted into an equation, with its unit and
// the source of the value.
type Term struct {
	Symbol string
	Value  float64
	Unit   string
	Source string
}

// Explanation records how one property was computed so that a person can
// check it by hand: the correlation by its published name, the equation as
// written there, the values substituted, the result and its source.
type Explanation struct {
	Quantity     string
	Correlation  string
	Equation     string
	Terms        []Term
	Result       float64
	Unit         string
	Source       string
	Extrapolated bool
	Note         string
}

// ExplainVapourPressure shows how the vapour pressure at t was obtained.
func (s *Substance) ExplainVapourPressure(t float64) (Explanation, error) {
	p, fl, err := s.SaturationPressure(t)
	if err != nil {
		return Explanation{}, err
	}
	e := Explanation{Quantity: "vapour pressure", Result: p, Unit: "Pa", Extrapolated: fl.Extrapolated()}
	if s.ref != nil {
		s.explainEOS(&e, t, "saturation")
		return e, nil
	}
	c := s.vp
	tt := Term{Symbol: "T", Value: t, Unit: "K"}
	piece := -1
	for i, pc := range c.pieces {
		if t >= pc.TMinK && t <= pc.TMaxK {
			if piece >= 0 {
				e.Note = fmt.Sprintf("T lies where pieces %d and %d overlap; ln P is blended linearly across the overlap, and the first piece alone is shown.", piece+1, i+1)
				break
			}
			piece = i
		}
	}
	switch {
	case piece >= 0:
		describePiece(&e, &c.pieces[piece], s, tt)
	case t >= c.extFrom:
		last := &c.pieces[len(c.pieces)-1]
		e.Correlation = "Riedel-type form joined to the critical point"
		e.Equation = "ln(P/Pa) = α + β/T + γ ln(T/K)"
		e.Terms = []Term{tt,
			{Symbol: "α", Value: c.extA, Source: "fitted to the last piece's value and slope at its upper limit and to the critical point"},
			{Symbol: "β", Value: c.extB, Unit: "K"},
			{Symbol: "γ", Value: c.extC},
			{Symbol: "T_join", Value: c.extFrom, Unit: "K", Source: last.Source},
			{Symbol: "Pc", Value: s.pc, Unit: "Pa", Source: s.fluid.CriticalPressure.Source},
		}
		e.Source = "Riedel, Chem.-Ing.-Tech. 26, 83 (1954) (from memory); the join to the critical point is Ullage's own"
		e.Note = "Above the published range of every correlation piece: an estimate."
	default:
		e.Correlation = "interpolation outside the published pieces"
		e.Equation = "ln P linear in 1/T between the nearest piece ends (Clausius–Clapeyron form)"
		e.Terms = []Term{tt}
		e.Source = "common practice"
		e.Note = "Outside the published range of every correlation piece: an estimate."
	}
	return e, nil
}

func describePiece(e *Explanation, p *VapourPressurePiece, s *Substance, tt Term) {
	e.Source = p.Source
	rng := fmt.Sprintf("valid %.2f–%.2f K", p.TMinK, p.TMaxK)
	if p.Form == FormWagner {
		e.Correlation = "Wagner equation (2.5-5 form), " + rng
		e.Equation = "ln(P/Pc) = (a·τ + b·τ^1.5 + c·τ^2.5 + d·τ^5)/Tr,  τ = 1 − Tr,  Tr = T/Tc"
		e.Terms = []Term{tt,
			{Symbol: "Tc", Value: s.tc, Unit: "K", Source: s.fluid.CriticalTemperature.Source},
			{Symbol: "Pc", Value: s.pc, Unit: "Pa", Source: s.fluid.CriticalPressure.Source},
			{Symbol: "a", Value: p.A}, {Symbol: "b", Value: p.B}, {Symbol: "c", Value: p.C}, {Symbol: "d", Value: p.D},
		}
		return
	}
	if p.Form == FormDIPPR101 {
		e.Correlation = "DIPPR equation 101, " + rng
		e.Equation = "ln(P/Pa) = A + B/T + C·ln(T/K) + D·T^E"
		e.Terms = []Term{tt, {Symbol: "A", Value: p.A}, {Symbol: "B", Value: p.B, Unit: "K"}, {Symbol: "C", Value: p.C}, {Symbol: "D", Value: p.D}, {Symbol: "E", Value: p.E}}
		return
	}
	e.Correlation = "Antoine equation, " + rng
	e.Equation = "log10(P/bar) = A − B/(T/K + C)"
	e.Terms = []Term{tt, {Symbol: "A", Value: p.A}, {Symbol: "B", Value: p.B, Unit: "K"}, {Symbol: "C", Value: p.C, Unit: "K"}}
}

// ExplainLiquidDensity shows how the saturated liquid density at t was
// obtained (Rackett equation through the reference and critical
// densities).
func (s *Substance) ExplainLiquidDensity(t float64) (Explanation, error) {
	rho, err := s.SaturatedLiquidDensity(t)
	if err != nil {
		return Explanation{}, err
	}
	f := s.fluid
	c := &s.liquid
	e := Explanation{Quantity: "saturated liquid density", Result: rho, Unit: "kg/m³"}
	if s.ref != nil {
		e.Extrapolated = s.refFlags(t, 0).Extrapolated()
		s.explainEOS(&e, t, "saturation")
		return e, nil
	}
	tTerm := Term{Symbol: "T", Value: t, Unit: "K"}
	if c.corr != nil && t <= c.tJoin {
		k := c.corr
		e.Source = k.Source
		e.Extrapolated = t < k.TMinK
		e.Terms = []Term{tTerm, {Symbol: "M", Value: s.molarMass * 1000, Unit: "kg/kmol", Source: f.MolarMass.Source},
			{Symbol: "A", Value: k.A}, {Symbol: "B", Value: k.B}, {Symbol: "C", Value: k.C}, {Symbol: "D", Value: k.D}}
		rng := fmt.Sprintf(", valid %.2f–%.2f K", k.TMinK, k.TMaxK)
		if k.Form == FormDIPPR116 {
			e.Correlation = "DIPPR equation 116" + rng
			e.Equation = "ρ = M·(A + B·τ^0.35 + C·τ^(2/3) + D·τ + E·τ^(4/3)),  τ = 1 − T/Tc  (kmol/m³ × kg/kmol)"
			e.Terms = append(e.Terms, Term{Symbol: "E", Value: k.E}, Term{Symbol: "Tc", Value: k.TcK, Unit: "K"})
		} else {
			e.Correlation = "DIPPR equation 105" + rng
			e.Equation = "ρ = M·A / B^(1 + (1 − T/C)^D)  (kmol/m³ × kg/kmol)"
		}
		return e, nil
	}
	rr := &c.near
	refSource := f.LiquidDensity.Source
	if c.corr != nil {
		refSource = "the published correlation at its hand-over temperature"
	}
	e.Correlation = "Rackett equation, reference-point form"
	e.Equation = "ρ = ρ_ref · Z_RA^−[(1 − T/Tc)^(2/7) − (1 − T_ref/Tc)^(2/7)],  Z_RA = (ρc/ρ_ref)^(1/(1 − T_ref/Tc)^(2/7))"
	e.Terms = []Term{tTerm,
		{Symbol: "ρ_ref", Value: rr.rhoRef, Unit: "kg/m³", Source: refSource},
		{Symbol: "T_ref", Value: rr.tc * (1 - math.Pow(rr.wRef, 3.5)), Unit: "K"},
		{Symbol: "ρc", Value: s.rhoC, Unit: "kg/m³", Source: f.CriticalDensity.Source},
		{Symbol: "Tc", Value: s.tc, Unit: "K", Source: f.CriticalTemperature.Source},
		{Symbol: "Z_RA", Value: rr.z()},
	}
	e.Source = "Rackett, J. Chem. Eng. Data 15, 514 (1970); Spencer and Danner, J. Chem. Eng. Data 17, 236 (1972) (from memory)"
	return e, nil
}

// ExplainVapourDensity shows how the saturated vapour density at t was
// obtained: the Peng–Robinson vapour root at the vapour pressure, or the
// rectilinear diameter near the critical point.
func (s *Substance) ExplainVapourDensity(t float64) (Explanation, error) {
	sat, err := s.Saturation(t)
	if err != nil {
		return Explanation{}, err
	}
	f := s.fluid
	e := Explanation{Quantity: "saturated vapour density", Result: sat.VapourDensity, Unit: "kg/m³", Extrapolated: sat.Flags.Extrapolated()}
	if s.ref != nil {
		s.explainEOS(&e, t, "saturation")
		return e, nil
	}
	if sat.Flags&NearCriticalVapour != 0 {
		e.Correlation = "law of rectilinear diameters (Cailletet–Mathias)"
		e.Equation = "ρv = 2·[d₀ + (ρc − d₀)(T − T₀)/(Tc − T₀)] − ρl"
		e.Terms = []Term{{Symbol: "T", Value: t, Unit: "K"}, {Symbol: "T₀", Value: s.blendT, Unit: "K"},
			{Symbol: "d₀", Value: s.diameterAtBlend, Unit: "kg/m³"}, {Symbol: "ρc", Value: s.rhoC, Unit: "kg/m³", Source: f.CriticalDensity.Source},
			{Symbol: "ρl", Value: sat.LiquidDensity, Unit: "kg/m³"}}
		e.Source = "Cailletet and Mathias, C. R. Acad. Sci. 102, 1202 (1886) (from memory)"
		return e, nil
	}
	rt := s.eos.r * t
	aa := s.eos.aAlpha(t)
	A := aa * sat.PressurePa / (rt * rt)
	B := s.eos.b * sat.PressurePa / rt
	z := largestCubicRoot(-(1 - B), A-3*B*B-2*B, -(A*B - B*B - B*B*B))
	e.Correlation = "Peng–Robinson equation of state, vapour root, with volume translation"
	e.Equation = "Z³ − (1 − B)Z² + (A − 3B² − 2B)Z − (AB − B² − B³) = 0,  A = aα·P/(RT)², B = bP/(RT),  ρv = M/(Z·RT/P − c)"
	e.Terms = []Term{
		{Symbol: "T", Value: t, Unit: "K"},
		{Symbol: "P", Value: sat.PressurePa, Unit: "Pa", Source: "vapour pressure at T"},
		{Symbol: "Tc", Value: s.tc, Unit: "K", Source: f.CriticalTemperature.Source},
		{Symbol: "Pc", Value: s.pc, Unit: "Pa", Source: f.CriticalPressure.Source},
		{Symbol: "ω", Value: f.AcentricFactor.Value, Source: f.AcentricFactor.Source},
		{Symbol: "M", Value: s.molarMass, Unit: "kg/mol", Source: f.MolarMass.Source},
		{Symbol: "A", Value: A}, {Symbol: "B", Value: B}, {Symbol: "Z", Value: z},
		{Symbol: "c", Value: s.eos.shift, Unit: "m³/mol", Source: "volume translation fixing the critical density"},
	}
	e.Source = "Peng and Robinson, Ind. Eng. Chem. Fundam. 15, 59 (1976); Péneloux, Rauzy and Fréze, Fluid Phase Equilib. 8, 7 (1982)"
	return e, nil
}
