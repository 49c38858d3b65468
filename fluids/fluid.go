package fluids

// FormatFluid is the format tag of a single fluid record, built-in or
// user-supplied.
const FormatFluid = "ullage-fluid/1"

// Sourced is one number together with the publication it came from.
// Source is "common practice" for an unsourced fact of the trade, and ends
// with "(from memory)" where the value was recalled rather than looked up.
type Sourced struct {
	Value  float64 `json:"value"`
	Source string  `json:"source"`
}

// SourcedAt is a number measured or tabulated at a stated temperature.
type SourcedAt struct {
	Value        float64 `json:"value"`
	TemperatureK float64 `json:"temperature_k"`
	Source       string  `json:"source"`
}

// Fluid is one entry of the fluid library, exactly as stored in its JSON
// record. All quantities are SI. Use Validate before trusting a Fluid that
// did not come from the built-in library; the library's constructors
// validate every record they load.
type Fluid struct {
	Format   string   `json:"format"`
	ID       string   `json:"id"`
	Name     string   `json:"name"`
	Synonyms []string `json:"synonyms"`
	CAS      string   `json:"cas"`
	Formula  string   `json:"formula"`

	MolarMass           Sourced               `json:"molar_mass_kg_mol"`
	CriticalTemperature Sourced               `json:"critical_temperature_k"`
	CriticalPressure    Sourced               `json:"critical_pressure_pa"`
	CriticalDensity     Sourced               `json:"critical_density_kg_m3"`
	AcentricFactor      Sourced               `json:"acentric_factor"`
	NormalBoilingPoint  Sourced               `json:"normal_boiling_point_k"`
	FreezingPoint       Sourced               `json:"freezing_point_k"`
	VapourPressure      []VapourPressurePiece `json:"vapour_pressure"`
	LiquidDensity       SourcedAt             `json:"liquid_density_kg_m3"`
	// LiquidDensityCorrelation is optional: a published saturated-liquid
	// density correlation used in place of the Rackett form below 0.95 Tc.
	LiquidDensityCorrelation *LiquidDensityCorrelation `json:"liquid_density_correlation,omitempty"`
	HeatOfVaporisation       SourcedAt                 `json:"heat_of_vaporisation_j_mol"`
	LiquidHeatCapacity       SourcedAt                 `json:"liquid_heat_capacity_j_mol_k"`
	Flammability             Flammability              `json:"flammability"`
	ExposureLimits           []ExposureLimit           `json:"exposure_limits"`
	NoNumericLimit           []NonNumericLimit         `json:"no_numeric_limit"`
	PotentialCarcinogen      CarcinogenFlag            `json:"potential_carcinogen"`
	// Warnings are the fluid's own cautions, one sentence each. A
	// temperature or pressure in them is written as an SI quantity in
	// braces ("{313.15 K}", "{5.7e5 Pa}"), which the display layer prints
	// in the reader's units; the same holds for Flammability.Note.
	Warnings []string `json:"warnings"`
	// Uncertainty is optional: the stated uncertainty of the record's
	// correlations, one entry per property. A fluid with a reference
	// equation of state takes the equation's statements instead.
	Uncertainty []Uncertainty `json:"uncertainty,omitempty"`

	// UserSupplied is true for a fluid loaded from a person's own file
	// rather than the built-in library. It is not part of the JSON record.
	UserSupplied bool `json:"-"`
}

// VapourPressurePiece is one vapour-pressure correlation valid over
// [TMinK, TMaxK]. Form is FormAntoine, FormWagner or FormDIPPR101 (which
// alone uses E).
type VapourPressurePiece struct {
	Form   string  `json:"form"`
	A      float64 `json:"a"`
	B      float64 `json:"b"`
	C      float64 `json:"c"`
	D      float64 `json:"d,omitempty"`
	E      float64 `json:"e,omitempty"`
	TMinK  float64 `json:"t_min_k"`
	TMaxK  float64 `json:"t_max_k"`
	Source string  `json:"source"`
}

// Flammability holds the fire data of a fluid. A non-flammable fluid has
// Flammable false and nil limits; "not flammable" is a value, not a gap.
type Flammability struct {
	Flammable     bool     `json:"flammable"`
	LFLPercent    *Sourced `json:"lfl_volume_percent"`
	UFLPercent    *Sourced `json:"ufl_volume_percent"`
	FlashPointK   *Sourced `json:"flash_point_k"`
	AutoignitionK *Sourced `json:"autoignition_k"`
	Note          string   `json:"note"`
}

// Averaging periods of exposure limits.
const (
	AveragingTWA     = "TWA"
	AveragingSTEL    = "STEL"
	AveragingCeiling = "ceiling"
	AveragingIDLH    = "IDLH"
)

// ExposureLimit is one published occupational exposure limit, tagged with
// the body that issued it (NIOSH, OSHA, EPA, AIHA, ACGIH), its kind (REL,
// PEL, IDLH, ECEL, WEEL, TLV), its averaging (TWA, STEL, ceiling, IDLH) and
// the averaging period in minutes (0 for an instantaneous ceiling).
type ExposureLimit struct {
	Body      string  `json:"body"`
	Kind      string  `json:"kind"`
	Averaging string  `json:"averaging"`
	Minutes   float64 `json:"minutes"`
	PPM       float64 `json:"ppm"`
	Source    string  `json:"source"`
}

// Label names the limit for people: body, kind and averaging, without
// repeating a word ("NIOSH REL TWA", "OSHA PEL ceiling", "NIOSH IDLH").
func (l ExposureLimit) Label() string {
	s := l.Body + " " + l.Kind
	if l.Averaging != l.Kind {
		s += " " + l.Averaging
	}
	return s
}

// NonNumericLimit records a limit that exists but has no number, such as
// NIOSH's "lowest feasible concentration" for a potential carcinogen.
type NonNumericLimit struct {
	Body string `json:"body"`
	Kind string `json:"kind"`
	Note string `json:"note"`
}

// CarcinogenFlag says whether a body lists the fluid as a potential
// occupational carcinogen.
type CarcinogenFlag struct {
	Value  bool   `json:"value"`
	Body   string `json:"body"`
	Source string `json:"source"`
}

// Matches reports whether key names this fluid: its ID, name, a synonym or
// its CAS number, compared without regard to case, spaces or hyphens.
func (f *Fluid) Matches(key string) bool {
	k := normaliseKey(key)
	if k == "" {
		return false
	}
	if normaliseKey(f.ID) == k || normaliseKey(f.Name) == k || normaliseKey(f.CAS) == k {
		return true
	}
	for _, s := range f.Synonyms {
		if normaliseKey(s) == k {
			return true
		}
	}
	return false
}

func normaliseKey(s string) string {
	b := make([]byte, 0, len(s))
	for i := 0; i < len(s); i++ {
		c := s[i]
		switch {
		case c >= 'A' && c <= 'Z':
			b = append(b, c+'a'-'A')
		case c == ' ' || c == '-' || c == '_' || c == ',' || c == '.':
		default:
			b = append(b, c)
		}
	}
	return string(b)
}
