package hazards

import (
	"errors"
	"math"
	"strconv"
	"strings"
	"sync"

	"ullage/fluids"
)

// Limit sets a review can apply, by ID. LimitSetUSOccupational is the set
// of limits in the fluid records (NIOSH, OSHA, EPA, AIHA, ACGIH); the
// others are the built-in tables of fluids.LimitSets.
const (
	LimitSetUSOccupational = "us-occupational"
	LimitSetUSPublicAcute  = string(fluids.LimitSetUSPublicAcute)
	LimitSetEUOccupational = string(fluids.LimitSetEUOccupational)
	LimitSetUKWEL          = string(fluids.LimitSetUKWEL)
	LimitSetDEAGW          = string(fluids.LimitSetDEAGW)
)

// LimitSetIDs returns every limit set a design may name, in the order the
// record lists them.
func LimitSetIDs() []string { return append([]string(nil), limitSetIDs[:]...) }

// limitSetIDs are the sets of LimitSetIDs, in order; never written.
var limitSetIDs = [...]string{LimitSetUSOccupational, LimitSetUSPublicAcute, LimitSetEUOccupational, LimitSetUKWEL, LimitSetDEAGW}

// LimitSetName returns a set's name for people.
func LimitSetName(id string) string {
	switch id {
	case LimitSetUSOccupational:
		return "US occupational (NIOSH, OSHA, EPA, AIHA, ACGIH)"
	case LimitSetUSPublicAcute:
		return "US public acute (AEGL, DOE PAC)"
	case LimitSetEUOccupational:
		return "EU occupational (IOELV, BOELV)"
	case LimitSetUKWEL:
		return "UK workplace exposure limits (HSE EH40)"
	case LimitSetDEAGW:
		return "German AGW (TRGS 900)"
	}
	return id
}

// DefaultLimitSets are the sets applied when a design names none: a
// sealed glass device is a consumer product that may break where the
// general public, children included, breathes the release, so the public
// acute benchmarks apply beside the US occupational limits of the people
// who make, ship and sell it (our choice, stated in every record).
var DefaultLimitSets = []string{LimitSetUSOccupational, LimitSetUSPublicAcute}

// AppliedLimitSets returns the limit sets the criteria apply, in
// LimitSetIDs order: those named, or DefaultLimitSets when none is.
func (cr Criteria) AppliedLimitSets() []string { return cr.appendAppliedLimitSets(nil) }

// appendAppliedLimitSets appends AppliedLimitSets to out.
func (cr Criteria) appendAppliedLimitSets(out []string) []string {
	chosen := cr.LimitSets
	if len(chosen) == 0 {
		chosen = DefaultLimitSets
	}
	for _, id := range limitSetIDs {
		for _, c := range chosen {
			if c == id {
				out = append(out, id)
				break
			}
		}
	}
	return out
}

// Applies reports whether the criteria apply the given limit set: it is
// one of LimitSetIDs and among those AppliedLimitSets returns.
func (cr Criteria) Applies(set string) bool {
	if !knownLimitSet(set) {
		return false
	}
	chosen := cr.LimitSets
	if len(chosen) == 0 {
		chosen = DefaultLimitSets
	}
	for _, c := range chosen {
		if c == set {
			return true
		}
	}
	return false
}

// knownLimitSet reports whether id is one of LimitSetIDs.
func knownLimitSet(id string) bool {
	switch id {
	case LimitSetUSOccupational, LimitSetUSPublicAcute, LimitSetEUOccupational, LimitSetUKWEL, LimitSetDEAGW:
		return true
	}
	return false
}

// LimitNote is a limit set's word for a fluid where it gives no number to
// judge against: "none published", "not checked", or a "not recommended"
// (NR) cell of an AEGL table. Such a note is said in words and never
// treated as a number.
type LimitNote struct {
	// Set is the limit set's ID; Name the entry it concerns ("AEGL-1 10
	// min"), empty when the note is about the whole set.
	Set  string
	Name string
	// Reason is the standing in a few words; Statement the table's own
	// words, with their source.
	Reason    Reason
	Statement string
}

// Public tiers of the acute benchmarks: 1 (notable discomfort, the
// caution line), 2 (disabling or irreversible effects, the fail line), 3
// (life-threatening effects, against the peak).
var publicTiers = []int{1, 2, 3}

// publicPopulation says whom the public acute benchmarks protect, in the
// words every output prints before the duration.
const publicPopulation = "General public, children included"

// tableLimits returns the limits and notes of one built-in table for the
// fluid. Occupational tables give TWA and STEL limits averaged as the
// occupational limits are; the public acute table gives, per tier, the
// AEGL values (the PAC where the tier has no AEGL value: the DOE's own
// order of precedence, AEGL before ERPG and TEEL).
func tableLimits(f *fluids.Fluid, set string) ([]LimitSpec, []LimitNote) {
	return appendTableLimits(nil, f, set)
}

// appendTableLimits appends the limits of tableLimits to specs.
func appendTableLimits(specs []LimitSpec, f *fluids.Fluid, set string) ([]LimitSpec, []LimitNote) {
	sub, err := fluids.LimitsFor(f.ID, fluids.LimitSetID(set))
	if err != nil {
		if errors.Is(err, fluids.ErrUnknownFluid) {
			return specs, []LimitNote{{Set: set, Reason: ReasonNotListed, Statement: "the table does not list " + f.Name + " (a fluid of your own is in no built-in table)"}}
		}
		return specs, []LimitNote{{Set: set, Reason: ReasonNotChecked, Statement: err.Error()}}
	}
	return appendSubstanceLimits(specs, sub, set)
}

// appendSubstanceLimits appends the limits of what one table holds for
// one fluid (sub, of the given set) to specs, and returns the notes.
func appendSubstanceLimits(specs []LimitSpec, sub fluids.SubstanceLimits, set string) ([]LimitSpec, []LimitNote) {
	switch sub.Coverage {
	case fluids.CoverageNonePublished:
		return specs, []LimitNote{{Set: set, Reason: ReasonNonePublished, Statement: sub.Statement}}
	case fluids.CoverageNotChecked:
		return specs, []LimitNote{{Set: set, Reason: ReasonNotChecked, Statement: sub.Statement}}
	}
	if set != LimitSetUSPublicAcute {
		for _, e := range sub.Entries {
			l, ok := e.ExposureLimit()
			if !ok {
				continue
			}
			def, ok := averagingDefinitions[l.Averaging]
			if !ok {
				def = averagingDefinitions[fluids.AveragingTWA]
			}
			specs = append(specs, LimitSpec{Set: set, Body: l.Body, Name: e.Label(), Kind: l.Averaging, PPM: l.PPM,
				Source: l.Source, PeriodS: l.Minutes * 60, Definition: def.definition, Standing: string(e.Status), Date: e.Date})
		}
		return specs, nil
	}
	return appendPublicLimits(specs, sub)
}

// tableKey names one fluid (by ID) in one built-in table.
type tableKey struct{ set, fluidID string }

// preparedLimits is what one built-in table gives one fluid, as
// appendTableLimits gives it, with the words each limit's finding and
// step are named by: the tables are fixed, so all of it is worked out
// once for every assessment (preparedTables).
type preparedLimits struct {
	specs []LimitSpec
	notes []LimitNote
	// sources[i] is the source the finding on specs[i] prints
	// (findingSource); keys[i] the key of the step of its averaging
	// period, which for a table's limit does not depend on the stay.
	sources []string
	keys    []string
}

// preparedTables holds preparedLimits for every fluid of every built-in
// table, built on first use and only read after; nil when the tables do
// not load (then appendTableLimits says why, for each assessment).
var preparedTables = sync.OnceValue(func() map[tableKey]*preparedLimits {
	sets, err := fluids.LimitSets()
	if err != nil {
		return nil
	}
	m := make(map[tableKey]*preparedLimits)
	for _, ls := range sets {
		set := string(ls.ID)
		for _, sub := range ls.Substances {
			k := tableKey{set, sub.FluidID}
			if _, ok := m[k]; ok {
				continue // the first listed is the one LimitsFor gives
			}
			p := &preparedLimits{}
			p.specs, p.notes = appendSubstanceLimits(nil, sub, set)
			for i := range p.specs {
				s := &p.specs[i]
				if s.ShortestPeriodS != 0 {
					// A stay-dependent period: never in a table; kept
					// off the prepared path all the same.
					return nil
				}
				p.sources = append(p.sources, findingSource(s))
				p.keys = append(p.keys, s.stepKey(s.AveragingS(s.present(0))))
			}
			m[k] = p
		}
	}
	return m
})

// preparedRecords holds, for every fluid of the built-in library, the
// limits of its record from every body (appendLimitSpecs), with their
// findings' sources and, where the averaging period does not depend on
// the stay, their step keys (empty where it does); built on first use and
// only read after, nil when the library does not load.
var preparedRecords = sync.OnceValue(func() map[*fluids.Fluid]*preparedLimits {
	lib, err := fluids.Builtin()
	if err != nil {
		return nil
	}
	m := make(map[*fluids.Fluid]*preparedLimits)
	for _, sub := range lib.All() {
		f := sub.Fluid()
		p := &preparedLimits{specs: appendLimitSpecs(nil, f, nil)}
		for i := range p.specs {
			s := &p.specs[i]
			key := ""
			if s.ShortestPeriodS == 0 {
				key = s.stepKey(s.AveragingS(0))
			}
			p.sources = append(p.sources, findingSource(s))
			p.keys = append(p.keys, key)
		}
		m[f] = p
	}
	return m
})

// preparedTable returns the prepared limits of fluid f in a built-in
// table, or nil when the table does not list it or cannot be read.
func preparedTable(f *fluids.Fluid, set string) *preparedLimits {
	return preparedTables()[tableKey{set, f.ID}]
}

// publicLimits turns the public acute entries into limits: tiers 1 and 2
// at every published duration, each averaged over its own duration for a
// person present throughout; tier 3 as one limit against the peak, the
// AEGL-3 of the shortest published duration (or the PAC-3). NR cells
// become notes.
func publicLimits(sub fluids.SubstanceLimits) ([]LimitSpec, []LimitNote) {
	return appendPublicLimits(nil, sub)
}

// appendPublicLimits appends the limits of publicLimits to specs.
func appendPublicLimits(specs []LimitSpec, sub fluids.SubstanceLimits) ([]LimitSpec, []LimitNote) {
	var notes []LimitNote
	for _, tier := range publicTiers {
		var aegl, pac []fluids.LimitEntry
		for _, e := range sub.Entries {
			switch e.Kind {
			case "AEGL-" + strconv.Itoa(tier):
				if e.NotRecommended {
					notes = append(notes, LimitNote{Set: LimitSetUSPublicAcute, Name: e.Label(), Reason: ReasonNotRecommended,
						Statement: "not recommended (NR): insufficient data to set a value; " + e.Source})
					continue
				}
				aegl = append(aegl, e)
			case "PAC-" + strconv.Itoa(tier):
				pac = append(pac, e)
			}
		}
		use := aegl
		if len(use) == 0 {
			use = pac
		}
		if tier == 3 && len(use) > 1 {
			shortest := use[0]
			for _, e := range use[1:] {
				if e.Minutes < shortest.Minutes {
					shortest = e
				}
			}
			use = []fluids.LimitEntry{shortest}
		}
		for _, e := range use {
			l, _ := e.ExposureLimit()
			s := LimitSpec{Set: LimitSetUSPublicAcute, Body: l.Body, Name: e.Label(), Kind: e.Kind, PPM: l.PPM, Source: l.Source,
				PeriodS: e.Minutes * 60, WholePeriod: true, Standing: string(e.Status), Date: e.Date,
				Protects:   publicPopulation + ", " + durationWords(e.Minutes),
				Definition: "AEGL and PAC: the airborne concentration above which the general public, including susceptible individuals, could experience the tier's effects for a single exposure of the stated duration (AEGL tier definitions of the US EPA AEGL program, from memory; PAC tiers and their AEGL → ERPG → TEEL order as described on NOAA's page \"Protective Action Criteria for Chemicals (PACs)\", read in a stored copy); averaged over that duration for a person present throughout"}
			if tier == 3 {
				s.PeriodS = 0
				s.Definition = "the peak (highest one-minute average) against the life-threatening tier at its shortest published duration: the peak is at least every longer average (our screening rule)"
			}
			specs = append(specs, s)
		}
	}
	return specs, notes
}

// durationWords writes an AEGL duration in plain words: "10 minutes",
// "1 hour", "8 hours".
func durationWords(minutes float64) string {
	if minutes >= 60 && math.Mod(minutes, 60) == 0 {
		h := minutes / 60
		if h == 1 {
			return "1 hour"
		}
		return strconv.FormatFloat(h, 'f', -1, 64) + " hours"
	}
	return strconv.FormatFloat(minutes, 'f', -1, 64) + " minutes"
}

// IsPublicKind reports whether an averaging kind is a public acute tier
// (AEGL-1 … AEGL-3, PAC-1 … PAC-3).
func IsPublicKind(kind string) bool {
	return strings.HasPrefix(kind, "AEGL-") || strings.HasPrefix(kind, "PAC-")
}

// publicTier returns the tier of a public kind (0 for any other kind).
func publicTier(kind string) int {
	if !IsPublicKind(kind) {
		return 0
	}
	n, _ := strconv.Atoi(kind[strings.IndexByte(kind, '-')+1:])
	return n
}
