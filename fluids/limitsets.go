package fluids

import (
	"embed"
	"errors"
	"fmt"
	"math"
	"regexp"
	"sort"
	"strconv"
	"strings"
	"sync"

	"ullage/fluids/units"
)

// Limit sets are published exposure benchmarks kept apart from the
// occupational limits in the fluid records: the US public acute
// benchmarks (AEGL, DOE PAC), the EU occupational limit values, the UK
// workplace exposure limits and the German AGW. Each set is one readable
// table under limits/, one record per built-in fluid, and every record
// either lists its values with their sources or says in words that the
// set has none ("none published") or that the table could not be checked
// ("not checked").

//go:embed limits/*.json
var limitSetData embed.FS

// LimitSetID names a built-in limit set.
type LimitSetID string

// The built-in limit sets.
const (
	// LimitSetUSPublicAcute holds the US EPA acute exposure guideline
	// levels (AEGL-1, -2, -3 for 10 min to 8 h) and, where no AEGL exists,
	// the US DOE Protective Action Criteria (PAC-1, -2, -3, 60 min).
	LimitSetUSPublicAcute LimitSetID = "us-public-acute"
	// LimitSetEUOccupational holds the indicative and binding occupational
	// exposure limit values of the EU directives (8 h and 15 min).
	LimitSetEUOccupational LimitSetID = "eu-occupational"
	// LimitSetUKWEL holds the UK workplace exposure limits of HSE
	// EH40/2005 (8-h TWA and 15-min short-term).
	LimitSetUKWEL LimitSetID = "uk-wel"
	// LimitSetDEAGW holds the German workplace limit values (AGW) of
	// TRGS 900 with their excursion factors.
	LimitSetDEAGW LimitSetID = "de-agw"
)

// LimitSetIDs returns the built-in limit sets in a fixed order.
func LimitSetIDs() []LimitSetID {
	return []LimitSetID{LimitSetUSPublicAcute, LimitSetEUOccupational, LimitSetUKWEL, LimitSetDEAGW}
}

// LimitStatus is the standing of a published value.
type LimitStatus string

// Standing of a value as its publisher gives it.
const (
	// StatusFinal is a final AEGL.
	StatusFinal LimitStatus = "final"
	// StatusInterim is an interim AEGL (approved by the national advisory
	// committee, not yet final).
	StatusInterim LimitStatus = "interim"
	// StatusProposed is a proposed AEGL.
	StatusProposed LimitStatus = "proposed"
	// StatusPublished is a value of the DOE PAC data set (its revision is
	// in the entry's date).
	StatusPublished LimitStatus = "published"
	// StatusBinding is an EU binding occupational exposure limit value.
	StatusBinding LimitStatus = "binding"
	// StatusIndicative is an EU indicative occupational exposure limit
	// value.
	StatusIndicative LimitStatus = "indicative"
	// StatusInForce is a national limit in force (UK WEL, German AGW).
	StatusInForce LimitStatus = "in-force"
)

// AveragingAcute marks a public acute benchmark (AEGL, PAC): the
// concentration not to be exceeded as an average over a single exposure
// of the entry's duration. Occupational entries use AveragingTWA and
// AveragingSTEL.
const AveragingAcute = "acute"

// Coverage says what a limit set holds for one substance.
type Coverage string

// What a limit set holds for a substance.
const (
	// CoveragePublished: the set lists values (possibly all "not
	// recommended").
	CoveragePublished Coverage = "published"
	// CoverageNonePublished: the set has no value for the substance.
	CoverageNonePublished Coverage = "none published"
	// CoverageNotChecked: the published table could not be checked, so no
	// value is entered; this is not a statement that none exists.
	CoverageNotChecked Coverage = "not checked"
)

// LimitMinutes are the averaging periods a limit-set entry may have, in
// minutes: the AEGL durations (10, 30, 60, 240, 480), the short-term
// period of the occupational limits (15) and the 8-hour shift (480).
var LimitMinutes = []float64{10, 15, 30, 60, 240, 480}

// ErrInvalidLimitTable: a limit-set table failed to load or validate.
var ErrInvalidLimitTable = errors.New("invalid limit-set table")

// ErrUnknownLimitSet: no built-in limit set has the ID given.
var ErrUnknownLimitSet = errors.New("no such limit set")

// LimitTableError names the table, the field, the value found and what is
// acceptable. It wraps ErrInvalidLimitTable.
type LimitTableError struct {
	Set   string // file or set ID
	Field string // JSON field path, e.g. "substances[3].entries[0].minutes"
	Value string
	Want  string
}

func (e *LimitTableError) Error() string {
	return fmt.Sprintf("limit table %s: field %s = %s: %s", e.Set, e.Field, e.Value, e.Want)
}

// Unwrap makes errors.Is(err, ErrInvalidLimitTable) true.
func (e *LimitTableError) Unwrap() error { return ErrInvalidLimitTable }

// LimitEntry is one published benchmark for one substance, shaped so that
// the same rule evaluates every set: the concentration averaged over
// Minutes is compared with PPM. Only entries with NotRecommended false
// carry a value.
type LimitEntry struct {
	Set       LimitSetID
	FluidID   string
	CAS       string
	Body      string  // "EPA/NRC", "DOE", "EU", "HSE", "AGS"
	Kind      string  // "AEGL-1" … "AEGL-3", "PAC-1" … "PAC-3", "IOELV", "BOELV", "WEL", "AGW", "AGW short-term"
	Averaging string  // AveragingAcute, AveragingTWA or AveragingSTEL
	Minutes   float64 // averaging period, one of LimitMinutes
	// PPM is the value in parts per million by volume. Where only mg/m³
	// is published it is converted once, at load, at 25 °C and
	// 101.325 kPa (units.MgPerM3ToPpm), and PPMConverted is true.
	PPM          float64
	PPMConverted bool
	// MgM3 is the value in mg/m³ as published (0 when not published). The
	// EU, UK and German tables state it at 20 °C and 101.3 kPa.
	MgM3 float64
	// NotRecommended is true for an "NR" cell of an AEGL table: the
	// value is not recommended because of insufficient data. PPM is 0.
	NotRecommended bool
	Status         LimitStatus
	Date           string // date or revision of the value as published
	// PeakCategory and ExcursionFactor are the TRGS 900 peak-limitation
	// category ("I" or "II") and excursion factor of an AGW.
	PeakCategory    string
	ExcursionFactor float64
	// Derived is true for an entry computed from a published rule rather
	// than printed in the table (the AGW short-term value, AGW × factor).
	Derived bool
	Source  string
	Note    string
}

// Label names the entry for people: "AEGL-2 60 min", "PAC-3 60 min",
// "EU IOELV STEL", "HSE WEL TWA", "AGS AGW short-term".
func (e LimitEntry) Label() string {
	if e.Averaging == AveragingAcute {
		return e.Kind + " " + strconv.FormatFloat(e.Minutes, 'f', -1, 64) + " min"
	}
	if strings.HasSuffix(e.Kind, "short-term") {
		return e.Body + " " + e.Kind
	}
	return e.Body + " " + e.Kind + " " + e.Averaging
}

// ExposureLimit returns the entry in the shape of the fluid records'
// occupational limits (body, kind, averaging, minutes, ppm, source), so
// that one rule can evaluate both. ok is false for a not-recommended
// entry, which has no value to compare with.
func (e LimitEntry) ExposureLimit() (l ExposureLimit, ok bool) {
	if e.NotRecommended {
		return ExposureLimit{}, false
	}
	return ExposureLimit{Body: e.Body, Kind: e.Kind, Averaging: e.Averaging, Minutes: e.Minutes, PPM: e.PPM, Source: e.Source}, true
}

// SubstanceLimits is what one limit set holds for one substance.
type SubstanceLimits struct {
	Set      LimitSetID
	FluidID  string
	CAS      string
	Name     string
	Coverage Coverage
	// Statement says in words why there are no entries (Coverage
	// CoverageNonePublished or CoverageNotChecked); empty otherwise.
	Statement string
	Entries   []LimitEntry
}

// LimitSet is one built-in table.
type LimitSet struct {
	ID         LimitSetID
	Name       string
	Population string // whom the values protect, in plain words
	Source     string
	Units      string
	Substances []SubstanceLimits
}

// LimitSets returns every built-in limit set, in LimitSetIDs order. The
// tables are parsed and checked once; an error names the table and field.
func LimitSets() ([]LimitSet, error) {
	sets, err := builtinLimitSets()
	if err != nil {
		return nil, err
	}
	out := make([]LimitSet, len(sets))
	for i, s := range sets {
		out[i] = s.clone()
	}
	return out, nil
}

// LookupLimitSet returns the built-in set with the given ID, or an error
// wrapping ErrUnknownLimitSet.
func LookupLimitSet(id LimitSetID) (LimitSet, error) {
	sets, err := builtinLimitSets()
	if err != nil {
		return LimitSet{}, err
	}
	for _, s := range sets {
		if s.ID == id {
			return s.clone(), nil
		}
	}
	return LimitSet{}, fmt.Errorf("limit set %q: %w", id, ErrUnknownLimitSet)
}

// LimitsFor returns what the given set holds for the fluid with the given
// built-in ID. A fluid the table does not list (a user fluid) gives an
// error wrapping ErrUnknownFluid; an unknown set, ErrUnknownLimitSet.
func LimitsFor(fluidID string, set LimitSetID) (SubstanceLimits, error) {
	sets, err := builtinLimitSets()
	if err != nil {
		return SubstanceLimits{}, err
	}
	for i := range sets {
		if sets[i].ID != set {
			continue
		}
		// Only the one substance is copied, not the whole table.
		for _, sub := range sets[i].Substances {
			if sub.FluidID == fluidID {
				sub.Entries = append([]LimitEntry(nil), sub.Entries...)
				return sub, nil
			}
		}
		return SubstanceLimits{}, fmt.Errorf("fluid %q in limit set %s: %w", fluidID, set, ErrUnknownFluid)
	}
	return SubstanceLimits{}, fmt.Errorf("limit set %q: %w", set, ErrUnknownLimitSet)
}

func (s LimitSet) clone() LimitSet {
	c := s
	c.Substances = make([]SubstanceLimits, len(s.Substances))
	for i, sub := range s.Substances {
		sub.Entries = append([]LimitEntry(nil), sub.Entries...)
		c.Substances[i] = sub
	}
	return c
}

var builtinLimitSets = sync.OnceValues(func() ([]LimitSet, error) {
	var sets []LimitSet
	for _, id := range LimitSetIDs() {
		name := "limits/" + string(id) + ".json"
		b, err := limitSetData.ReadFile(name)
		if err != nil {
			return nil, &LimitTableError{Set: name, Field: "(file)", Value: "missing", Want: "one embedded table per built-in set"}
		}
		s, err := parseLimitSet(name, b)
		if err != nil {
			return nil, err
		}
		if s.ID != id {
			return nil, &LimitTableError{Set: name, Field: "set", Value: strconv.Quote(string(s.ID)), Want: "must match the file name " + strconv.Quote(string(id))}
		}
		sets = append(sets, s)
	}
	return sets, nil
})

// The file format, ullage-limitset/1.
type limitSetFile struct {
	Format     string           `json:"format"`
	Set        string           `json:"set"`
	Name       string           `json:"name"`
	Population string           `json:"population"`
	Source     string           `json:"source"`
	Units      string           `json:"units"`
	Substances []limitSubstance `json:"substances"`
}

type limitSubstance struct {
	Fluid         string       `json:"fluid"`
	CAS           string       `json:"cas"`
	Name          string       `json:"name"`
	MolarMass     *Sourced     `json:"molar_mass_kg_mol,omitempty"`
	Entries       []limitValue `json:"entries,omitempty"`
	NonePublished string       `json:"none_published,omitempty"`
	NotChecked    string       `json:"not_checked,omitempty"`
}

type limitValue struct {
	Body            string   `json:"body"`
	Kind            string   `json:"kind"`
	Averaging       string   `json:"averaging"`
	Minutes         float64  `json:"minutes"`
	PPM             *float64 `json:"ppm,omitempty"`
	MgM3            *float64 `json:"mg_m3,omitempty"`
	NotRecommended  bool     `json:"not_recommended,omitempty"`
	Status          string   `json:"status"`
	Date            string   `json:"date"`
	PeakCategory    string   `json:"peak_category,omitempty"`
	ExcursionFactor float64  `json:"excursion_factor,omitempty"`
	Source          string   `json:"source"`
	Note            string   `json:"note,omitempty"`
}

// setRules are what each set's entries may say.
type setRules struct {
	kinds    map[string]bool
	averages map[string]bool
	statuses map[LimitStatus]bool
}

var limitSetRules = map[LimitSetID]setRules{
	LimitSetUSPublicAcute: {
		kinds:    map[string]bool{"AEGL-1": true, "AEGL-2": true, "AEGL-3": true, "PAC-1": true, "PAC-2": true, "PAC-3": true},
		averages: map[string]bool{AveragingAcute: true},
		statuses: map[LimitStatus]bool{StatusFinal: true, StatusInterim: true, StatusProposed: true, StatusPublished: true},
	},
	LimitSetEUOccupational: {
		kinds:    map[string]bool{"IOELV": true, "BOELV": true},
		averages: map[string]bool{AveragingTWA: true, AveragingSTEL: true},
		statuses: map[LimitStatus]bool{StatusIndicative: true, StatusBinding: true},
	},
	LimitSetUKWEL: {
		kinds:    map[string]bool{"WEL": true},
		averages: map[string]bool{AveragingTWA: true, AveragingSTEL: true},
		statuses: map[LimitStatus]bool{StatusInForce: true},
	},
	LimitSetDEAGW: {
		kinds:    map[string]bool{"AGW": true},
		averages: map[string]bool{AveragingTWA: true},
		statuses: map[LimitStatus]bool{StatusInForce: true},
	},
}

var casPattern = regexp.MustCompile(`^[1-9][0-9]{1,6}-[0-9]{2}-[0-9]$`)

// ValidCAS reports whether s is a CAS registry number with a correct check
// digit (the last digit equals the sum of the other digits, each weighted
// by its position counted from the right, modulo 10).
func ValidCAS(s string) bool {
	if !casPattern.MatchString(s) {
		return false
	}
	digits := strings.ReplaceAll(s[:len(s)-2], "-", "")
	sum := 0
	for i := range len(digits) {
		sum += int(digits[len(digits)-1-i]-'0') * (i + 1)
	}
	return sum%10 == int(s[len(s)-1]-'0')
}

func allowedMinutes(m float64) bool {
	for _, a := range LimitMinutes {
		if m == a {
			return true
		}
	}
	return false
}

// parseLimitSet decodes and checks one table; name is used in errors.
func parseLimitSet(name string, b []byte) (LimitSet, error) {
	var f limitSetFile
	if err := strictDecode(b, &f); err != nil {
		return LimitSet{}, &LimitTableError{Set: name, Field: "(json)", Value: "", Want: err.Error()}
	}
	fail := func(field string, value any, want string) (LimitSet, error) {
		return LimitSet{}, &LimitTableError{Set: name, Field: field, Value: fmt.Sprint(value), Want: want}
	}
	if f.Format != "ullage-limitset/1" {
		return fail("format", strconv.Quote(f.Format), `must be "ullage-limitset/1"`)
	}
	id := LimitSetID(f.Set)
	rules, ok := limitSetRules[id]
	if !ok {
		return fail("set", strconv.Quote(f.Set), "must name a built-in limit set")
	}
	for field, v := range map[string]string{"name": f.Name, "population": f.Population, "source": f.Source, "units": f.Units} {
		if strings.TrimSpace(v) == "" {
			return fail(field, `""`, "must not be empty")
		}
	}
	if len(f.Substances) == 0 {
		return fail("substances", "[]", "must list at least one substance")
	}
	set := LimitSet{ID: id, Name: f.Name, Population: f.Population, Source: f.Source, Units: f.Units}
	seen := map[string]bool{}
	for i, sub := range f.Substances {
		at := fmt.Sprintf("substances[%d]", i)
		if strings.TrimSpace(sub.Fluid) == "" {
			return fail(at+".fluid", `""`, "must name a built-in fluid ID")
		}
		if seen[sub.Fluid] {
			return fail(at+".fluid", strconv.Quote(sub.Fluid), "is listed twice")
		}
		seen[sub.Fluid] = true
		if !ValidCAS(sub.CAS) {
			return fail(at+".cas", strconv.Quote(sub.CAS), "must be a CAS number with a correct check digit")
		}
		if strings.TrimSpace(sub.Name) == "" {
			return fail(at+".name", `""`, "must not be empty")
		}
		kinds := 0
		for _, present := range []bool{len(sub.Entries) > 0, sub.NonePublished != "", sub.NotChecked != ""} {
			if present {
				kinds++
			}
		}
		if kinds != 1 {
			return fail(at, strconv.Quote(sub.Fluid), "must have exactly one of entries, none_published or not_checked")
		}
		out := SubstanceLimits{Set: id, FluidID: sub.Fluid, CAS: sub.CAS, Name: sub.Name}
		switch {
		case sub.NonePublished != "":
			if !strings.HasPrefix(sub.NonePublished, "none published") {
				return fail(at+".none_published", strconv.Quote(sub.NonePublished), `must begin with the words "none published"`)
			}
			out.Coverage, out.Statement = CoverageNonePublished, sub.NonePublished
		case sub.NotChecked != "":
			out.Coverage, out.Statement = CoverageNotChecked, sub.NotChecked
		default:
			out.Coverage = CoveragePublished
		}
		if sub.MolarMass != nil {
			if !(sub.MolarMass.Value > 0.001 && sub.MolarMass.Value < 1) {
				return fail(at+".molar_mass_kg_mol.value", sub.MolarMass.Value, "must be between 0.001 and 1 kg/mol")
			}
			if strings.TrimSpace(sub.MolarMass.Source) == "" {
				return fail(at+".molar_mass_kg_mol.source", `""`, "every value needs its source")
			}
		}
		for j, v := range sub.Entries {
			e, err := checkLimitValue(name, fmt.Sprintf("%s.entries[%d]", at, j), id, rules, sub, v)
			if err != nil {
				return LimitSet{}, err
			}
			out.Entries = append(out.Entries, e)
			if e.ExcursionFactor > 0 {
				out.Entries = append(out.Entries, agwShortTerm(e))
			}
		}
		if err := checkDuplicates(name, at, out.Entries); err != nil {
			return LimitSet{}, err
		}
		set.Substances = append(set.Substances, out)
	}
	return set, nil
}

func checkLimitValue(name, at string, id LimitSetID, rules setRules, sub limitSubstance, v limitValue) (LimitEntry, error) {
	fail := func(field string, value any, want string) (LimitEntry, error) {
		return LimitEntry{}, &LimitTableError{Set: name, Field: at + "." + field, Value: fmt.Sprint(value), Want: want}
	}
	if strings.TrimSpace(v.Source) == "" {
		return fail("source", `""`, `every value needs its source (document and table; "(from memory)" for a recalled value)`)
	}
	if strings.TrimSpace(v.Body) == "" {
		return fail("body", `""`, "must name the issuing body")
	}
	if !rules.kinds[v.Kind] {
		return fail("kind", strconv.Quote(v.Kind), "must be a kind of limit this set holds: "+keys(rules.kinds))
	}
	if !rules.averages[v.Averaging] {
		return fail("averaging", strconv.Quote(v.Averaging), "must be one of "+keys(rules.averages))
	}
	if !allowedMinutes(v.Minutes) {
		return fail("minutes", v.Minutes, "must be one of 10, 15, 30, 60, 240, 480")
	}
	switch {
	case v.Averaging == AveragingTWA && v.Minutes != 480:
		return fail("minutes", v.Minutes, "a TWA limit here is an 8-hour (480 min) average")
	case v.Averaging == AveragingSTEL && v.Minutes != 15:
		return fail("minutes", v.Minutes, "a short-term limit here is a 15-minute average")
	case v.Averaging == AveragingAcute && v.Minutes == 15:
		return fail("minutes", v.Minutes, "acute benchmarks are given for 10, 30, 60, 240 or 480 minutes")
	case strings.HasPrefix(v.Kind, "PAC-") && v.Minutes != 60:
		return fail("minutes", v.Minutes, "PAC values are 60-minute values")
	}
	if !rules.statuses[LimitStatus(v.Status)] {
		return fail("status", strconv.Quote(v.Status), "must be a status this set uses")
	}
	if strings.TrimSpace(v.Date) == "" {
		return fail("date", `""`, "must give the date or revision of the value")
	}
	e := LimitEntry{
		Set: id, FluidID: sub.Fluid, CAS: sub.CAS, Body: v.Body, Kind: v.Kind, Averaging: v.Averaging,
		Minutes: v.Minutes, NotRecommended: v.NotRecommended, Status: LimitStatus(v.Status), Date: v.Date,
		PeakCategory: v.PeakCategory, ExcursionFactor: v.ExcursionFactor, Source: v.Source, Note: v.Note,
	}
	if v.NotRecommended {
		if !strings.HasPrefix(v.Kind, "AEGL-") {
			return fail("not_recommended", true, `only AEGL tables mark values "NR"`)
		}
		if v.PPM != nil || v.MgM3 != nil {
			return fail("ppm", "a value", "a not-recommended entry carries no value")
		}
		return e, nil
	}
	positive := func(p *float64) bool { return p != nil && *p > 0 && !math.IsInf(*p, 0) && !math.IsNaN(*p) }
	if v.PPM != nil && !positive(v.PPM) {
		return fail("ppm", *v.PPM, "must be a positive finite number")
	}
	if v.MgM3 != nil && !positive(v.MgM3) {
		return fail("mg_m3", *v.MgM3, "must be a positive finite number")
	}
	switch {
	case v.PPM != nil:
		e.PPM = *v.PPM
	case v.MgM3 != nil:
		if sub.MolarMass == nil {
			return fail("ppm", "missing", "give ppm, or give the substance's molar_mass_kg_mol so that mg/m³ can be converted at 25 °C and 101.325 kPa")
		}
		e.PPM = units.MgPerM3ToPpm(*v.MgM3, sub.MolarMass.Value)
		e.PPMConverted = true
	default:
		return fail("ppm", "missing", "give the value in ppm or mg/m³, or mark it not_recommended")
	}
	if v.MgM3 != nil {
		e.MgM3 = *v.MgM3
	}
	if id == LimitSetDEAGW {
		if v.PeakCategory != "I" && v.PeakCategory != "II" {
			return fail("peak_category", strconv.Quote(v.PeakCategory), `must be "I" or "II" (TRGS 900 Spitzenbegrenzung)`)
		}
		if !(v.ExcursionFactor >= 1 && v.ExcursionFactor <= 8) {
			return fail("excursion_factor", v.ExcursionFactor, "must be between 1 and 8")
		}
	} else if v.PeakCategory != "" || v.ExcursionFactor != 0 {
		return fail("peak_category", strconv.Quote(v.PeakCategory), "only the German AGW table has peak categories")
	}
	return e, nil
}

// agwShortTerm derives the TRGS 900 short-term value of an AGW: the AGW
// times its excursion factor, as a 15-minute average (TRGS 900,
// number 2.3).
func agwShortTerm(agw LimitEntry) LimitEntry {
	s := agw
	s.Kind = "AGW short-term"
	s.Averaging = AveragingSTEL
	s.Minutes = 15
	s.PPM = agw.PPM * agw.ExcursionFactor
	s.MgM3 = agw.MgM3 * agw.ExcursionFactor
	s.Derived = true
	s.Source = fmt.Sprintf("TRGS 900 number 2.3: short-term value = AGW × excursion factor %s(%s), as a 15-minute average (rule from memory); AGW from %s",
		strconv.FormatFloat(agw.ExcursionFactor, 'f', -1, 64), agw.PeakCategory, agw.Source)
	return s
}

func checkDuplicates(name, at string, entries []LimitEntry) error {
	seen := map[string]bool{}
	for _, e := range entries {
		k := e.Kind + "/" + e.Averaging + "/" + strconv.FormatFloat(e.Minutes, 'f', -1, 64)
		if seen[k] {
			return &LimitTableError{Set: name, Field: at + ".entries", Value: k, Want: "each kind and averaging period at most once"}
		}
		seen[k] = true
	}
	return nil
}

func keys[V any](m map[string]V) string {
	var ks []string
	for k := range m {
		ks = append(ks, k)
	}
	sort.Strings(ks)
	return strings.Join(ks, ", ")
}
