package fluids

import (
	"fmt"
	"math"
	"strings"
)

// FormatEquationOfState is the format tag of a reference equation-of-state
// file, fluids/eos/<fluid-id>.json.
const FormatEquationOfState = "ullage-eos/1"

// EquationOfState is one published multiparameter equation of state in
// the reduced residual Helmholtz energy, exactly as stored in its JSON
// file: the paper, its stated range and uncertainties, the reducing
// constants and the coefficient tables. All quantities are SI, amounts in
// mol.
type EquationOfState struct {
	Format string `json:"format"`
	// Fluid is the id of the fluid record this equation belongs to.
	Fluid string `json:"fluid"`
	// Name is a short name of the equation, e.g. "IAPWS-95".
	Name  string `json:"name"`
	Paper Paper  `json:"paper"`
	// Transcription says where the numbers were read.
	Transcription string `json:"transcription"`
	Range         Range  `json:"range"`
	// Uncertainty lists the paper's own statements of how good each
	// property is.
	Uncertainty []Uncertainty `json:"uncertainty"`

	MolarMass    float64         `json:"molar_mass_kg_mol"`
	GasConstant  float64         `json:"gas_constant_j_mol_k"`
	Reducing     Point           `json:"reducing"`
	Critical     Point           `json:"critical"`
	TriplePointK float64         `json:"triple_point_k"`
	Residual     []HelmholtzTerm `json:"residual"`
	// IdealHeatCapacity gives the ideal-gas heat capacity as
	// cv0/R = Σ terms, cp0/R = 1 + cv0/R; it is only needed for the
	// liquid heat capacity, the ideal-gas part cancelling in every other
	// property used here. Optional.
	IdealHeatCapacity []IdealTerm  `json:"ideal_heat_capacity,omitempty"`
	IdealSource       string       `json:"ideal_source,omitempty"`
	Ancillaries       AncillarySet `json:"ancillaries"`
	AncillaryNote     string       `json:"ancillary_source"`
	Notes             []string     `json:"notes,omitempty"`
}

// Paper is a publication: authors, title, journal (or publisher for a
// book), volume, pages and year.
type Paper struct {
	Authors string `json:"authors"`
	Title   string `json:"title"`
	Journal string `json:"journal"`
	Volume  string `json:"volume,omitempty"`
	Pages   string `json:"pages,omitempty"`
	Year    int    `json:"year"`
	Note    string `json:"note,omitempty"`
}

// Citation renders the paper in one line: "Authors, Title, Journal
// Volume, Pages (Year)".
func (p Paper) Citation() string {
	s := p.Authors + ", “" + p.Title + "”, " + p.Journal
	if p.Volume != "" {
		s += " " + p.Volume
	}
	if p.Pages != "" {
		s += ", " + p.Pages
	}
	s += fmt.Sprintf(" (%d)", p.Year)
	if p.Note != "" {
		s += "; " + p.Note
	}
	return s
}

// Range is an equation's stated range of validity: temperatures in K and
// the highest pressure in Pa.
type Range struct {
	TMinK  float64 `json:"t_min_k"`
	TMaxK  float64 `json:"t_max_k"`
	PMaxPa float64 `json:"p_max_pa"`
	Source string  `json:"source"`
}

// Property names used in Uncertainty.Property.
const (
	PropertyVapourPressure     = "vapour_pressure"
	PropertyLiquidDensity      = "liquid_density"
	PropertyVapourDensity      = "vapour_density"
	PropertyHeatOfVaporisation = "heat_of_vaporisation"
	PropertyLiquidHeatCapacity = "liquid_heat_capacity"
	PropertyCompressedLiquid   = "compressed_liquid_density"
)

// Uncertainty is a stated uncertainty of one property: Percent is the
// headline relative uncertainty (coverage factor as the paper states it),
// Statement the paper's wording of where it holds, Source where it was
// read.
type Uncertainty struct {
	Property  string  `json:"property"`
	Percent   float64 `json:"percent"`
	Statement string  `json:"statement"`
	Source    string  `json:"source"`
}

// Point is a (temperature, pressure, molar density) triple; the reducing
// point leaves the pressure zero.
type Point struct {
	TemperatureK float64 `json:"temperature_k"`
	PressurePa   float64 `json:"pressure_pa,omitempty"`
	DensityMolM3 float64 `json:"density_mol_m3"`
}

// Term kinds of the residual Helmholtz energy.
const (
	TermPower          = "power"          // n δ^d τ^t exp(−c δ^l), no exponential when l = 0
	TermDoubleExp      = "double-exp"     // n δ^d τ^t exp(−c δ^l − g τ^m)
	TermGaussian       = "gaussian"       // n δ^d τ^t exp(−η(δ−ε)² − β(τ−γ)²)
	TermGaussianRation = "gaussian-ratio" // n δ^d τ^t exp(η(δ−ε)² + 1/(β(τ−γ)² + b))
	TermNonAnalytic    = "non-analytic"   // n Δ^b δ ψ (IAPWS-95 form)
	ancillaryExp       = "exp"            // x = xr exp(F Σ nᵢ θ^tᵢ)
	ancillaryLinear    = "linear"         // x = xr (1 + Σ nᵢ θ^tᵢ)
	ancillaryTermsNote = "θ = 1 − T/T_r; F = T_r/T when tr_over_t, else 1"
)

// HelmholtzTerm is one term of the residual Helmholtz energy. Which fields apply
// depends on Kind; see the Term* constants. C defaults to 1 for a power
// term with l > 0.
type HelmholtzTerm struct {
	Kind  string  `json:"kind"`
	N     float64 `json:"n"`
	D     float64 `json:"d,omitempty"`
	T     float64 `json:"t,omitempty"`
	L     float64 `json:"l,omitempty"`
	C     float64 `json:"c,omitempty"`
	G     float64 `json:"g,omitempty"`
	M     float64 `json:"m,omitempty"`
	Eta   float64 `json:"eta,omitempty"`
	Eps   float64 `json:"epsilon,omitempty"`
	Beta  float64 `json:"beta,omitempty"`
	Gamma float64 `json:"gamma,omitempty"`
	B     float64 `json:"b,omitempty"`
	// Non-analytic terms (IAPWS-95): a, b, β, A, B, C, D.
	A    float64 `json:"a,omitempty"`
	CapA float64 `json:"cap_a,omitempty"`
	CapB float64 `json:"cap_b,omitempty"`
	CapC float64 `json:"cap_c,omitempty"`
	CapD float64 `json:"cap_d,omitempty"`
}

// Ideal-gas heat capacity term kinds (contributions to cv0/R; T in K,
// τ = Tr/T with the reducing temperature).
const (
	IdealConstant = "constant"  // C
	IdealPowerT   = "power-t"   // C·T^t
	IdealPowerTau = "power-tau" // −N·t(t−1)·τ^t (from a term N·τ^t of the ideal Helmholtz energy)
	IdealEinstein = "einstein"  // N·(θ/T)²·e^(θ/T)/(e^(θ/T) − 1)²
	IdealSinh     = "sinh"      // N·[(θ/T)/sinh(θ/T)]²
	IdealCosh     = "cosh"      // N·[(θ/T)/cosh(θ/T)]²
)

// IdealTerm is one term of the ideal-gas heat capacity; see the Ideal*
// constants.
type IdealTerm struct {
	Kind   string  `json:"kind"`
	C      float64 `json:"c,omitempty"`
	N      float64 `json:"n,omitempty"`
	T      float64 `json:"t,omitempty"`
	ThetaK float64 `json:"theta_k,omitempty"`
}

// cv0OverR returns cv0/R at temperature t (K) for reducing temperature tr.
func idealCv0OverR(terms []IdealTerm, t, tr float64) float64 {
	var s float64
	for _, q := range terms {
		switch q.Kind {
		case IdealConstant:
			s += q.C
		case IdealPowerT:
			s += q.C * math.Pow(t, q.T)
		case IdealPowerTau:
			s -= q.N * q.T * (q.T - 1) * math.Pow(tr/t, q.T)
		case IdealEinstein:
			x := q.ThetaK / t
			e := math.Exp(-x)
			s += q.N * x * x * e / ((1 - e) * (1 - e))
		case IdealSinh:
			x := q.ThetaK / t
			y := x / math.Sinh(x)
			s += q.N * y * y
		case IdealCosh:
			x := q.ThetaK / t
			y := x / math.Cosh(x)
			s += q.N * y * y
		}
	}
	return s
}

// AncillarySet holds the ancillary equations that start the saturation
// solve: vapour pressure and saturated liquid and vapour densities.
type AncillarySet struct {
	VapourPressure Ancillary `json:"vapour_pressure"`
	LiquidDensity  Ancillary `json:"liquid_density"`
	VapourDensity  Ancillary `json:"vapour_density"`
}

// Ancillary is x(T) = x_r·exp(F·Σ nᵢ θ^tᵢ) (Form "exp") or
// x_r·(1 + Σ nᵢ θ^tᵢ) (Form "linear"), θ = 1 − T/T_r, F = T_r/T when
// TrOverT, else 1. Pressure in Pa, density in mol/m³.
type Ancillary struct {
	Form    string    `json:"form"`
	TrK     float64   `json:"tr_k"`
	Xr      float64   `json:"xr"`
	TrOverT bool      `json:"tr_over_t"`
	N       []float64 `json:"n"`
	T       []float64 `json:"t"`
}

func (a *Ancillary) eval(t float64) float64 {
	th := 1 - t/a.TrK
	if th < 0 {
		th = 0
	}
	var s float64
	for i, n := range a.N {
		s += n * math.Pow(th, a.T[i])
	}
	if a.Form == ancillaryLinear {
		return a.Xr * (1 + s)
	}
	if a.TrOverT {
		s *= a.TrK / t
	}
	return a.Xr * math.Exp(s)
}

// validate checks an equation-of-state file: format, identity, paper,
// range, constants and every term finite and of a known kind.
func (e *EquationOfState) validate() error {
	v := &validator{id: e.Fluid}
	if e.Format != FormatEquationOfState {
		v.fail("format", fmt.Sprintf("%q", e.Format), "must be %q", FormatEquationOfState)
	}
	if strings.TrimSpace(e.Fluid) == "" {
		v.fail("fluid", `""`, "names the fluid record this equation belongs to")
	}
	if e.Paper.Authors == "" || e.Paper.Title == "" || e.Paper.Journal == "" || e.Paper.Year < 1900 {
		v.fail("paper", e.Paper.Citation(), "needs authors, title, journal or publisher and year")
	}
	v.source("transcription", e.Transcription)
	v.number("molar_mass_kg_mol", e.MolarMass, 0.002, 1, "kg/mol")
	v.number("gas_constant_j_mol_k", e.GasConstant, 8.31, 8.32, "J/(mol·K)")
	v.number("reducing.temperature_k", e.Reducing.TemperatureK, 5, 1500, "K")
	v.number("reducing.density_mol_m3", e.Reducing.DensityMolM3, 10, 1e6, "mol/m³")
	v.number("critical.temperature_k", e.Critical.TemperatureK, 5, 1500, "K")
	v.number("critical.pressure_pa", e.Critical.PressurePa, 1e5, 1e8, "Pa")
	v.number("critical.density_mol_m3", e.Critical.DensityMolM3, 10, 1e6, "mol/m³")
	v.number("triple_point_k", e.TriplePointK, 1, e.Critical.TemperatureK, "K")
	v.number("range.t_min_k", e.Range.TMinK, 1, e.Critical.TemperatureK, "K")
	v.number("range.t_max_k", e.Range.TMaxK, e.Critical.TemperatureK, 5000, "K")
	v.number("range.p_max_pa", e.Range.PMaxPa, 1e6, 1e11, "Pa")
	v.source("range.source", e.Range.Source)
	if len(e.Residual) == 0 {
		v.fail("residual", "[]", "needs the terms of the residual Helmholtz energy")
	}
	for i, t := range e.Residual {
		f := fmt.Sprintf("residual[%d]", i)
		for _, x := range []float64{t.N, t.D, t.T, t.L, t.C, t.G, t.M, t.Eta, t.Eps, t.Beta, t.Gamma, t.B, t.A, t.CapA, t.CapB, t.CapC, t.CapD} {
			if !finite(x) {
				v.fail(f, x, "every coefficient must be a finite number")
			}
		}
		switch t.Kind {
		case TermPower, TermDoubleExp:
			if t.D != math.Trunc(t.D) || t.D < 0 || t.D > maxPowerTable || t.L != math.Trunc(t.L) || t.L < 0 || t.L > maxPowerTable ||
				t.M != math.Trunc(t.M) || t.M < 0 || t.M > maxPowerTable {
				v.fail(f+".d", t.D, "d, l and m must be whole numbers from 0 to %d", maxPowerTable)
			}
		case TermGaussian, TermGaussianRation:
			if t.D != math.Trunc(t.D) || t.D < 0 || t.D > maxPowerTable {
				v.fail(f+".d", t.D, "must be a whole number from 0 to %d", maxPowerTable)
			}
		case TermNonAnalytic:
		default:
			v.fail(f+".kind", fmt.Sprintf("%q", t.Kind), "must be one of %q, %q, %q, %q, %q", TermPower, TermDoubleExp, TermGaussian, TermGaussianRation, TermNonAnalytic)
		}
	}
	for name, a := range map[string]Ancillary{"vapour_pressure": e.Ancillaries.VapourPressure, "liquid_density": e.Ancillaries.LiquidDensity, "vapour_density": e.Ancillaries.VapourDensity} {
		if (a.Form != ancillaryExp && a.Form != ancillaryLinear) || len(a.N) == 0 || len(a.N) != len(a.T) || a.TrK <= 0 || a.Xr <= 0 {
			v.fail("ancillaries."+name, a.Form, "needs form %q or %q, tr_k, xr and n and t of equal length", ancillaryExp, ancillaryLinear)
		}
	}
	v.source("ancillary_source", e.AncillaryNote)
	for i, q := range e.IdealHeatCapacity {
		f := fmt.Sprintf("ideal_heat_capacity[%d]", i)
		switch q.Kind {
		case IdealConstant, IdealPowerT, IdealPowerTau, IdealEinstein, IdealSinh, IdealCosh:
		default:
			v.fail(f+".kind", fmt.Sprintf("%q", q.Kind), "must be one of constant, power-t, power-tau, einstein, sinh, cosh")
		}
		for _, x := range []float64{q.C, q.N, q.T, q.ThetaK} {
			if !finite(x) {
				v.fail(f, x, "every coefficient must be a finite number")
			}
		}
		if (q.Kind == IdealEinstein || q.Kind == IdealSinh || q.Kind == IdealCosh) && !(q.ThetaK > 0) {
			v.fail(f+".theta_k", q.ThetaK, "must be a positive temperature in K")
		}
	}
	if len(e.IdealHeatCapacity) > 0 {
		v.source("ideal_source", e.IdealSource)
	}
	for _, u := range e.Uncertainty {
		v.number("uncertainty."+u.Property+".percent", u.Percent, 0, 100, "%")
		v.source("uncertainty."+u.Property+".source", u.Source)
	}
	return v.err
}

// compile builds the evaluator from the validated terms.
func (e *EquationOfState) compile() *helmholtz {
	h := &helmholtz{tr: e.Reducing.TemperatureK, rhor: e.Reducing.DensityMolM3, r: e.GasConstant, molar: e.MolarMass}
	group := func(c float64, l int) int {
		for i, g := range h.groups {
			if g.c == c && g.l == l {
				return i
			}
		}
		h.groups = append(h.groups, expGroup{c: c, l: l})
		return len(h.groups) - 1
	}
	asInt := func(t float64) (int, bool) {
		if t == math.Trunc(t) && math.Abs(t) <= maxPowerTable {
			return int(t), true
		}
		return 0, false
	}
	for _, t := range e.Residual {
		switch t.Kind {
		case TermPower, TermDoubleExp:
			x := expTerm{n: t.N, d: int(t.D), t: t.T, group: -1, l: int(t.L)}
			x.ti, x.tInt = asInt(t.T)
			if x.l > 0 {
				c := t.C
				if c == 0 {
					c = 1
				}
				x.group = group(c, x.l)
				x.cl = c * float64(x.l)
				x.cl2 = x.cl * float64(x.l)
			}
			if t.Kind == TermDoubleExp && t.G != 0 {
				x.g, x.m = t.G, int(t.M)
				h.maxTInt = max(h.maxTInt, x.m)
			}
			h.maxD = max(h.maxD, x.d, x.l)
			if x.tInt {
				h.maxTInt = max(h.maxTInt, x.ti, -x.ti)
			}
			h.exps = append(h.exps, x)
		case TermGaussian, TermGaussianRation:
			g := gaussTerm{n: t.N, t: t.T, d: int(t.D), eta: t.Eta, eps: t.Eps, beta: t.Beta, gamma: t.Gamma,
				rational: t.Kind == TermGaussianRation, b: t.B}
			g.ti, g.tInt = asInt(t.T)
			if g.ti < 0 {
				g.tInt = false
			}
			h.maxD = max(h.maxD, g.d)
			if g.tInt {
				h.maxTInt = max(h.maxTInt, g.ti)
			}
			h.gauss = append(h.gauss, g)
		case TermNonAnalytic:
			h.nonAn = append(h.nonAn, nonAnalyticTerm{n: t.N, a: t.A, b: t.B, beta: t.Beta, capA: t.CapA, capB: t.CapB, capC: t.CapC, capD: t.CapD})
		}
	}
	return h
}
