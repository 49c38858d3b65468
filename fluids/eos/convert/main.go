// Command convert writes the reference equation-of-state files
// fluids/eos/<fluid-id>.json (format "ullage-eos/1") from a transcription
// of the published coefficient tables and our own list of papers.
//
// The coefficients are read from the transcription in the open-source
// CoolProp repository (dev/fluids/<Name>.json, MIT licence): its residual
// Helmholtz terms, reducing constants, gas constant, molar mass, triple
// point, stated range and its ancillary equations (used by Ullage only to
// start the saturation solve). Everything else in an output file — the
// paper, its stated range and uncertainties, the notes — comes from
// papers.json beside this file, which names for each fluid the
// transcription file, the equation within it and the bibliography key that
// must name the paper we cite. The key is checked against the
// repository's bibliography (CoolPropBibTeXLibrary.bib).
//
// Usage, from the repository root:
//
//	go run ./fluids/eos/convert -src DIR -bib FILE [-out fluids/eos] [-papers fluids/eos/convert/papers.json]
//
// where DIR holds the transcription's <Name>.json files and FILE is its
// bibliography. The output is deterministic: running it twice gives the
// same bytes.
package main

import (
	"bytes"
	"encoding/json"
	"flag"
	"fmt"
	"math"
	"os"
	"path/filepath"
	"sort"
	"strings"

	"ullage/fluids"
)

// paperEntry is one fluid of papers.json.
type paperEntry struct {
	Fluid       string               `json:"fluid"`
	Source      string               `json:"source_file"`
	Index       int                  `json:"equation_index"`
	BibKey      string               `json:"bibtex_key"`
	Name        string               `json:"name"`
	Paper       fluids.Paper         `json:"paper"`
	Range       *fluids.Range        `json:"range,omitempty"`
	Uncertainty []fluids.Uncertainty `json:"uncertainty"`
	Notes       []string             `json:"notes,omitempty"`
}

// The transcription's layout, as far as this converter reads it.
type srcFile struct {
	EOS         []srcEOS `json:"EOS"`
	rawEOS      json.RawMessage
	Ancillaries map[string]json.RawMessage `json:"ANCILLARIES"`
	States      struct {
		Critical srcState `json:"critical"`
	} `json:"STATES"`
}

type srcState struct {
	T        float64 `json:"T"`
	P        float64 `json:"p"`
	RhoMolar float64 `json:"rhomolar"`
}

type srcEOS struct {
	BibTeX      string           `json:"BibTeX_EOS"`
	TMax        float64          `json:"T_max"`
	PMax        float64          `json:"p_max"`
	TTriple     float64          `json:"Ttriple"`
	GasConstant float64          `json:"gas_constant"`
	MolarMass   float64          `json:"molar_mass"`
	Alphar      []map[string]any `json:"alphar"`
	Alpha0      []map[string]any `json:"alpha0"`
	States      struct {
		Reducing srcState `json:"reducing"`
	} `json:"STATES"`
}

type srcAncillary struct {
	Type     string    `json:"type"`
	TR       float64   `json:"T_r"`
	Reducing float64   `json:"reducing_value"`
	UsingTau bool      `json:"using_tau_r"`
	N        []float64 `json:"n"`
	T        []float64 `json:"t"`
}

func main() {
	src := flag.String("src", "", "directory holding the transcription's <Name>.json files")
	bib := flag.String("bib", "", "the transcription's bibliography file")
	out := flag.String("out", "fluids/eos", "output directory")
	papers := flag.String("papers", "fluids/eos/convert/papers.json", "our list of papers")
	fixtures := flag.String("fixtures", "fluids/testdata/eos_saturation.json", "where to write the saturation check values")
	flag.Parse()
	if err := run(*src, *bib, *out, *papers, *fixtures); err != nil {
		fmt.Fprintln(os.Stderr, "convert:", err)
		os.Exit(1)
	}
}

func run(src, bib, out, papersPath, fixturesPath string) error {
	if src == "" || bib == "" {
		return fmt.Errorf("-src and -bib are required")
	}
	pb, err := os.ReadFile(papersPath)
	if err != nil {
		return err
	}
	var entries []paperEntry
	dec := json.NewDecoder(bytes.NewReader(pb))
	dec.DisallowUnknownFields()
	if err := dec.Decode(&entries); err != nil {
		return fmt.Errorf("%s: %w", papersPath, err)
	}
	bibText, err := os.ReadFile(bib)
	if err != nil {
		return err
	}
	var fx fixtureFile
	fx.About = fixtureAbout
	for _, p := range entries {
		e, err := convert(p, src, string(bibText))
		if err != nil {
			return fmt.Errorf("%s: %w", p.Fluid, err)
		}
		rows, err := saturationChecks(p, src, e)
		if err != nil {
			return fmt.Errorf("%s: %w", p.Fluid, err)
		}
		fx.Fluids = append(fx.Fluids, fixtureFluid{Fluid: p.Fluid, Rows: rows})
		b, err := json.MarshalIndent(e, "", "  ")
		if err != nil {
			return err
		}
		b = append(b, '\n')
		if err := os.WriteFile(filepath.Join(out, p.Fluid+".json"), b, 0o644); err != nil {
			return err
		}
	}
	b, err := json.MarshalIndent(fx, "", "  ")
	if err != nil {
		return err
	}
	return os.WriteFile(fixturesPath, append(b, '\n'), 0o644)
}

// readSource reads the transcription file named in the entry, or, when
// the entry gives "CAS:<number>", the one file whose INFO.CAS is that
// number. The second way keeps a file name we do not want to repeat out
// of our data: the returned label then describes the file by its CAS
// number.
func readSource(dir, src string) (srcFile, string, error) {
	var f srcFile
	name, label := src, "dev/fluids/"+src
	if cas, ok := strings.CutPrefix(src, "CAS:"); ok {
		name = ""
		entries, err := os.ReadDir(dir)
		if err != nil {
			return f, "", err
		}
		for _, e := range entries {
			b, err := os.ReadFile(filepath.Join(dir, e.Name()))
			if err != nil || !strings.HasSuffix(e.Name(), ".json") {
				continue
			}
			var info struct {
				INFO struct {
					CAS string `json:"CAS"`
				} `json:"INFO"`
			}
			if json.Unmarshal(b, &info) == nil && info.INFO.CAS == cas {
				name = e.Name()
				break
			}
		}
		if name == "" {
			return f, "", fmt.Errorf("no transcription file has CAS number %s", cas)
		}
		label = "the file of dev/fluids whose CAS number is " + cas
	}
	b, err := os.ReadFile(filepath.Join(dir, name))
	if err != nil {
		return f, "", err
	}
	if err := json.Unmarshal(b, &f); err != nil {
		return f, "", fmt.Errorf("%s: %w", label, err)
	}
	var rest struct {
		EOS json.RawMessage `json:"EOS"`
	}
	if err := json.Unmarshal(b, &rest); err != nil {
		return f, "", err
	}
	f.rawEOS = rest.EOS
	return f, label, nil
}

func convert(p paperEntry, dir, bib string) (*fluids.EquationOfState, error) {
	f, label, err := readSource(dir, p.Source)
	if err != nil {
		return nil, err
	}
	if p.Index >= len(f.EOS) {
		return nil, fmt.Errorf("%s has no equation %d", label, p.Index)
	}
	s := f.EOS[p.Index]
	key := p.BibKey
	keyText := " " + key
	if key == "" {
		key, keyText = s.BibTeX, ""
	} else if s.BibTeX != key {
		return nil, fmt.Errorf("%s equation %d cites %q, papers.json expects %q", label, p.Index, s.BibTeX, key)
	}
	if err := checkBib(bib, key, p.Paper); err != nil {
		return nil, err
	}
	e := &fluids.EquationOfState{
		Format: fluids.FormatEquationOfState,
		Fluid:  p.Fluid,
		Name:   p.Name,
		Paper:  p.Paper,
		Transcription: fmt.Sprintf("Coefficients, reducing constants, gas constant, molar mass and triple point read from the transcription in the open-source CoolProp repository, %s (MIT licence), equation %d, whose bibliography key%s names the paper above (checked against the repository's CoolPropBibTeXLibrary.bib); converted by fluids/eos/convert.",
			label, p.Index, keyText),
		Uncertainty:   p.Uncertainty,
		MolarMass:     s.MolarMass,
		GasConstant:   s.GasConstant,
		Reducing:      fluids.Point{TemperatureK: s.States.Reducing.T, DensityMolM3: s.States.Reducing.RhoMolar},
		Critical:      fluids.Point{TemperatureK: f.States.Critical.T, PressurePa: f.States.Critical.P, DensityMolM3: f.States.Critical.RhoMolar},
		TriplePointK:  s.TTriple,
		Notes:         p.Notes,
		AncillaryNote: fmt.Sprintf("Ancillary equations fitted to this equation of state by the authors of the CoolProp transcription (%s, ANCILLARIES); Ullage uses them only to start the saturation solve, so they do not affect any result.", label),
	}
	if p.Index > 0 {
		// The transcription's critical state belongs to its first
		// equation; for another one use its own reducing point.
		e.Critical = fluids.Point{TemperatureK: s.States.Reducing.T, DensityMolM3: s.States.Reducing.RhoMolar}
	}
	if p.Range != nil {
		e.Range = *p.Range
	} else {
		e.Range = fluids.Range{TMinK: s.TTriple, TMaxK: s.TMax, PMaxPa: s.PMax,
			Source: "the paper's stated range as recorded in the transcription (T_max, p_max; lower limit the triple point)"}
	}
	for _, t := range s.Alphar {
		terms, err := convertTerms(t)
		if err != nil {
			return nil, err
		}
		e.Residual = append(e.Residual, terms...)
	}
	ideal, err := convertIdeal(s.Alpha0, s.States.Reducing.T, s.GasConstant)
	if err != nil {
		return nil, err
	}
	e.IdealHeatCapacity = ideal
	e.IdealSource = fmt.Sprintf("Ideal-gas part read from the same transcription (%s, alpha0) and written as cv0/R; its constant terms of the ideal Helmholtz energy carry no heat capacity and are left out.", label)
	for name, dst := range map[string]*fluids.Ancillary{"pS": &e.Ancillaries.VapourPressure, "rhoL": &e.Ancillaries.LiquidDensity, "rhoV": &e.Ancillaries.VapourDensity} {
		raw, ok := f.Ancillaries[name]
		if !ok {
			return nil, fmt.Errorf("no ancillary %s", name)
		}
		var a srcAncillary
		if err := json.Unmarshal(raw, &a); err != nil {
			return nil, fmt.Errorf("ancillary %s: %w", name, err)
		}
		*dst = fluids.Ancillary{Form: "exp", TrK: a.TR, Xr: a.Reducing, TrOverT: a.UsingTau, N: a.N, T: a.T}
		switch a.Type {
		case "pL", "pV", "rhoV", "rhoL":
		case "rhoLnoexp":
			dst.Form = "linear"
		default:
			return nil, fmt.Errorf("ancillary %s: unknown type %q", name, a.Type)
		}
	}
	return e, nil
}

func num(m map[string]any, k string, i int) (float64, error) {
	v, ok := m[k]
	if !ok {
		return 0, nil
	}
	arr, ok := v.([]any)
	if !ok || i >= len(arr) {
		return 0, fmt.Errorf("field %s is not a list long enough", k)
	}
	x, ok := arr[i].(float64)
	if !ok {
		return 0, fmt.Errorf("field %s[%d] is not a number", k, i)
	}
	return x, nil
}

// convertTerms turns one block of the transcription's residual terms into
// ours. Known blocks: power (n δ^d τ^t exp(−δ^l)), exponential (with a
// coefficient g on δ^l), double exponential, Gaussian, the Gaussian with a
// rational temperature part, and the IAPWS-95 non-analytic terms.
func convertTerms(t map[string]any) ([]fluids.HelmholtzTerm, error) {
	typ, _ := t["type"].(string)
	ns, _ := t["n"].([]any)
	var out []fluids.HelmholtzTerm
	allowed := map[string][]string{
		"ResidualHelmholtzPower":             {"n", "d", "t", "l"},
		"ResidualHelmholtzExponential":       {"n", "d", "t", "l", "g"},
		"ResidualHelmholtzDoubleExponential": {"n", "d", "t", "gd", "ld", "gt", "lt"},
		"ResidualHelmholtzGaussian":          {"n", "d", "t", "eta", "epsilon", "beta", "gamma"},
		"ResidualHelmholtzGaoB":              {"n", "d", "t", "eta", "epsilon", "beta", "gamma", "b"},
		"ResidualHelmholtzNonAnalytic":       {"n", "a", "b", "beta", "A", "B", "C", "D"},
	}
	keys, ok := allowed[typ]
	if !ok {
		return nil, fmt.Errorf("residual term block %q is not supported", typ)
	}
	var present []string
	for k := range t {
		if k != "type" {
			present = append(present, k)
		}
	}
	sort.Strings(present)
	want := append([]string(nil), keys...)
	sort.Strings(want)
	if strings.Join(present, ",") != strings.Join(want, ",") {
		return nil, fmt.Errorf("residual term block %q has fields %v, expected %v", typ, present, want)
	}
	for i := range ns {
		v := map[string]float64{}
		for _, k := range keys {
			x, err := num(t, k, i)
			if err != nil {
				return nil, fmt.Errorf("%s: %w", typ, err)
			}
			v[k] = x
		}
		var h fluids.HelmholtzTerm
		switch typ {
		case "ResidualHelmholtzPower":
			h = fluids.HelmholtzTerm{Kind: fluids.TermPower, N: v["n"], D: v["d"], T: v["t"], L: v["l"]}
			if v["l"] > 0 {
				h.C = 1
			}
		case "ResidualHelmholtzExponential":
			h = fluids.HelmholtzTerm{Kind: fluids.TermPower, N: v["n"], D: v["d"], T: v["t"], L: v["l"], C: v["g"]}
			if v["l"] == 0 {
				h.C = 0
			}
		case "ResidualHelmholtzDoubleExponential":
			h = fluids.HelmholtzTerm{Kind: fluids.TermDoubleExp, N: v["n"], D: v["d"], T: v["t"], L: v["ld"], C: v["gd"], G: v["gt"], M: v["lt"]}
		case "ResidualHelmholtzGaussian":
			h = fluids.HelmholtzTerm{Kind: fluids.TermGaussian, N: v["n"], D: v["d"], T: v["t"], Eta: v["eta"], Eps: v["epsilon"], Beta: v["beta"], Gamma: v["gamma"]}
		case "ResidualHelmholtzGaoB":
			h = fluids.HelmholtzTerm{Kind: fluids.TermGaussianRation, N: v["n"], D: v["d"], T: v["t"], Eta: v["eta"], Eps: v["epsilon"], Beta: v["beta"], Gamma: v["gamma"], B: v["b"]}
		case "ResidualHelmholtzNonAnalytic":
			h = fluids.HelmholtzTerm{Kind: fluids.TermNonAnalytic, N: v["n"], A: v["a"], B: v["b"], Beta: v["beta"], CapA: v["A"], CapB: v["B"], CapC: v["C"], CapD: v["D"]}
		}
		out = append(out, h)
	}
	return out, nil
}

// checkBib finds the bibliography entry for key and checks that its year
// and the first author's surname match the paper we cite.
func checkBib(bib, key string, p fluids.Paper) error {
	i := strings.Index(bib, "{"+key+",")
	if i < 0 {
		return fmt.Errorf("bibliography has no entry %q", key)
	}
	entry := bib[i:]
	if j := strings.Index(entry, "\n}"); j > 0 {
		entry = entry[:j]
	}
	low := strings.ToLower(entry)
	if !strings.Contains(low, fmt.Sprint(p.Year)) && !strings.Contains(low, "submitted") {
		return fmt.Errorf("bibliography entry %q does not give the year %d", key, p.Year)
	}
	first := strings.Fields(strings.Split(strings.Split(p.Authors, " and ")[0], ",")[0])
	surname := strings.ToLower(first[len(first)-1])
	surname = strings.NewReplacer("ü", "ue", "ö", "oe", "ä", "ae").Replace(surname)
	if !strings.Contains(low, surname) {
		return fmt.Errorf("bibliography entry %q does not name %q", key, surname)
	}
	return nil
}

// The saturation check values: for every fluid, the vapour pressure and
// the saturated-liquid density of its reference equation at temperatures
// from max(triple point, 0 °C) to 0.95 Tc, read from outside our code:
// the transcription publishes, for each equation, "superancillary"
// Chebyshev expansions of the equation's own saturation curve, fitted in
// extended precision to within about 1e-12, and a few check points solved
// in multiple precision. The converter copies the check points and
// evaluates the expansions (a plain Chebyshev sum, not our solver).
const fixtureAbout = "Saturation pressure and saturated-liquid density of each reference equation of state. Rows marked 'check point' are the transcription's multiple-precision solutions of the equation (CoolProp dev/fluids/<Name>.json, EOS[...].SUPERANCILLARY.check_points); the other rows are its superancillary Chebyshev expansions of the same equation (SUPERANCILLARY.jexpansions_p, jexpansions_rhoL; I. H. Bell and U. K. Deiters, superancillary equations for multiparameter equations of state (from memory)) evaluated at the row's temperature by fluids/eos/convert. Densities converted with the equation's own molar mass."

type fixtureFile struct {
	About  string         `json:"about"`
	Fluids []fixtureFluid `json:"fluids"`
}

type fixtureFluid struct {
	Fluid string       `json:"fluid"`
	Rows  []fixtureRow `json:"rows"`
}

type fixtureRow struct {
	TK     float64 `json:"t_k"`
	PPa    float64 `json:"p_pa"`
	RhoL   float64 `json:"rho_liquid_kg_m3"`
	Source string  `json:"source"`
}

type chebPiece struct {
	Coef []float64 `json:"coef"`
	XMin float64   `json:"xmin"`
	XMax float64   `json:"xmax"`
}

type superancillary struct {
	P      []chebPiece          `json:"jexpansions_p"`
	RhoL   []chebPiece          `json:"jexpansions_rhoL"`
	Meta   map[string]any       `json:"meta"`
	Checks []map[string]float64 `json:"check_points"`
}

func chebAt(ps []chebPiece, x float64) (float64, bool) {
	for _, p := range ps {
		if x < p.XMin || x > p.XMax {
			continue
		}
		u := (2*x - p.XMax - p.XMin) / (p.XMax - p.XMin)
		// Direct sum with T_k(u) by recurrence.
		t0, t1 := 1.0, u
		sum := p.Coef[0]
		for k := 1; k < len(p.Coef); k++ {
			sum += p.Coef[k] * t1
			t0, t1 = t1, 2*u*t1-t0
		}
		return sum, true
	}
	return 0, false
}

func saturationChecks(p paperEntry, dir string, e *fluids.EquationOfState) ([]fixtureRow, error) {
	raw, err := os.ReadFile(filepath.Join(dir, strings.TrimPrefix(p.Source, "CAS:")))
	if strings.HasPrefix(p.Source, "CAS:") {
		f, _, err2 := readSource(dir, p.Source)
		if err2 != nil {
			return nil, err2
		}
		raw, err = json.Marshal(map[string]any{"EOS": f.rawEOS})
	}
	if err != nil {
		return nil, err
	}
	var f struct {
		EOS []struct {
			SA superancillary `json:"SUPERANCILLARY"`
		} `json:"EOS"`
	}
	if err := json.Unmarshal(raw, &f); err != nil {
		return nil, err
	}
	sa := f.EOS[p.Index].SA
	tcTrue, _ := sa.Meta["Tcrittrue / K"].(float64)
	if tcTrue == 0 || len(sa.P) == 0 {
		return nil, fmt.Errorf("no superancillary expansions")
	}
	lo := math.Max(e.TriplePointK, 273.15)
	hi := 0.95 * tcTrue
	m := e.MolarMass
	var rows []fixtureRow
	const n = 12
	for i := 0; i <= n; i++ {
		t := lo + (hi-lo)*float64(i)/n
		t = math.Round(t*100) / 100
		pp, ok1 := chebAt(sa.P, t)
		rl, ok2 := chebAt(sa.RhoL, t)
		if !ok1 || !ok2 {
			return nil, fmt.Errorf("superancillary does not cover %.2f K", t)
		}
		rows = append(rows, fixtureRow{TK: t, PPa: sig(pp, 10), RhoL: sig(rl*m, 10), Source: "superancillary expansion of this equation, evaluated at this temperature"})
	}
	for _, c := range sa.Checks {
		t := c["T / K"]
		if t < lo || t > hi {
			continue
		}
		rows = append(rows, fixtureRow{TK: t, PPa: sig(c["p(mp) / Pa"], 12), RhoL: sig(c["rho'(mp) / mol/m^3"]*m, 12), Source: "check point: multiple-precision solution of this equation"})
	}
	sort.Slice(rows, func(i, j int) bool { return rows[i].TK < rows[j].TK })
	return rows, nil
}

// sig rounds x to n significant digits, so that the fixture holds no
// digits beyond the expansions' accuracy.
func sig(x float64, n int) float64 {
	if x == 0 {
		return 0
	}
	e := math.Floor(math.Log10(math.Abs(x)))
	f := math.Pow(10, float64(n-1)-e)
	return math.Round(x*f) / f
}

func floats(m map[string]any, k string) []float64 {
	var out []float64
	switch v := m[k].(type) {
	case []any:
		for _, x := range v {
			f, _ := x.(float64)
			out = append(out, f)
		}
	case float64:
		out = append(out, v)
	}
	return out
}

// convertIdeal turns the transcription's ideal-gas Helmholtz terms into
// contributions to cv0/R. Helmholtz-form terms (a·ln τ, n·ln(1 − e^(−tτ)),
// n·τ^t) give cv0/R = −τ²·∂²α°/∂τ²; heat-capacity forms give cp0/R and
// come with a ln τ term of −1 that turns them into cv0/R.
func convertIdeal(terms []map[string]any, tr, r float64) ([]fluids.IdealTerm, error) {
	var out []fluids.IdealTerm
	for _, t := range terms {
		typ, _ := t["type"].(string)
		scale := 1.0
		if rr, ok := t["R"].(float64); ok && rr > 0 {
			scale = rr / r
		}
		switch typ {
		case "IdealGasHelmholtzLead", "IdealGasHelmholtzEnthalpyEntropyOffset":
		case "IdealGasHelmholtzLogTau":
			out = append(out, fluids.IdealTerm{Kind: fluids.IdealConstant, C: t["a"].(float64)})
		case "IdealGasHelmholtzPlanckEinstein":
			n, ts := floats(t, "n"), floats(t, "t")
			for i := range n {
				out = append(out, fluids.IdealTerm{Kind: fluids.IdealEinstein, N: n[i], ThetaK: ts[i] * tr})
			}
		case "IdealGasHelmholtzPower":
			n, ts := floats(t, "n"), floats(t, "t")
			for i := range n {
				out = append(out, fluids.IdealTerm{Kind: fluids.IdealPowerTau, N: n[i], T: ts[i]})
			}
		case "IdealGasHelmholtzCP0Constant":
			out = append(out, fluids.IdealTerm{Kind: fluids.IdealConstant, C: t["cp_over_R"].(float64) * scale})
		case "IdealGasHelmholtzCP0PolyT":
			c, ts := floats(t, "c"), floats(t, "t")
			for i := range c {
				if ts[i] == 0 {
					out = append(out, fluids.IdealTerm{Kind: fluids.IdealConstant, C: c[i] * scale})
					continue
				}
				out = append(out, fluids.IdealTerm{Kind: fluids.IdealPowerT, C: c[i] * scale, T: ts[i]})
			}
		case "IdealGasHelmholtzPlanckEinsteinFunctionT":
			n, v := floats(t, "n"), floats(t, "v")
			for i := range n {
				out = append(out, fluids.IdealTerm{Kind: fluids.IdealEinstein, N: n[i] * scale, ThetaK: v[i]})
			}
		case "IdealGasHelmholtzCP0AlyLee":
			c := floats(t, "c")
			if len(c) != 5 {
				return nil, fmt.Errorf("%s: want 5 coefficients", typ)
			}
			if c[0] != 0 {
				out = append(out, fluids.IdealTerm{Kind: fluids.IdealConstant, C: c[0] * scale})
			}
			if c[1] != 0 {
				out = append(out, fluids.IdealTerm{Kind: fluids.IdealSinh, N: c[1] * scale, ThetaK: c[2]})
			}
			if c[3] != 0 {
				out = append(out, fluids.IdealTerm{Kind: fluids.IdealCosh, N: c[3] * scale, ThetaK: c[4]})
			}
		default:
			return nil, fmt.Errorf("ideal-gas term %q is not supported", typ)
		}
	}
	return out, nil
}
