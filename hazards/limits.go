package hazards

import (
	"math"
	"slices"
	"strings"

	"ullage/fluids"
)

// AveragingKinds are the kinds of exposure limit the review judges, in the
// order their findings appear. Each kind gets one finding: the limit of
// that kind with the largest share of its limit governs, and a kind with
// no published limit for the fluid is listed as not assessed. A further
// limit set (public acute benchmarks, other countries' occupational
// limits) adds its kinds here and its limits through LimitSpecs.
var AveragingKinds = []string{fluids.AveragingIDLH, fluids.AveragingCeiling, fluids.AveragingSTEL, fluids.AveragingTWA}

// LimitSpec is one published exposure limit as the review applies it: the
// body, the averaging kind, the concentration and the averaging period as
// that body defines it.
type LimitSpec struct {
	// Body publishes the limit (NIOSH, OSHA, ACGIH, …); Name labels it
	// for people ("NIOSH REL TWA"); Kind is its averaging kind, one of
	// AveragingKinds.
	Body string
	Name string
	Kind string
	// PPM is the limit in ppm by volume; Source where it is published.
	PPM    float64
	Source string
	// PeriodS is the averaging period in seconds; 0 means the highest
	// value at any time, taken as the peak (PeakAveragingS). When
	// ShortestPeriodS is below PeriodS the period is the time a person
	// stays, kept between the two ("up to a 10-hour workday").
	PeriodS         float64
	ShortestPeriodS float64
	// Definition says how the body defines the averaging period, with its
	// source.
	Definition string
	// Set is the limit set the limit belongs to (LimitSetIDs).
	Set string
	// WholePeriod is true for a public acute benchmark: the person is
	// taken to stay for the whole averaging period, whatever the room's
	// exposure time (the benchmark is defined for an exposure of that
	// duration).
	WholePeriod bool
	// Standing is the value's standing as published ("final", "interim",
	// "indicative", "in-force" …), empty for the fluid records' limits;
	// Date the date or revision of the value.
	Standing string
	Date     string
	// Protects says whom and for how long the limit protects, in plain
	// words ("General public, children included, 30 minutes"); empty for
	// occupational limits.
	Protects string
}

// AveragingS returns the averaging period (s) that applies for a person
// who stays presentS seconds: the peak period for an instantaneous limit,
// the stay kept within [ShortestPeriodS, PeriodS] for a limit defined for
// "up to" a period, otherwise PeriodS.
func (l LimitSpec) AveragingS(presentS float64) float64 {
	if l.PeriodS <= PeakAveragingS {
		return PeakAveragingS
	}
	if l.ShortestPeriodS > 0 && l.ShortestPeriodS < l.PeriodS {
		return math.Min(math.Max(presentS, l.ShortestPeriodS), l.PeriodS)
	}
	return l.PeriodS
}

// averagingDef is how a body defines an averaging period.
type averagingDef struct {
	shortestS  float64 // for limits defined for "up to" their period
	definition string
}

// averagingDefinitions says how each body defines each averaging period.
// Keys are body + " " + averaging kind; the kind alone is the fallback.
var averagingDefinitions = map[string]averagingDef{
	"NIOSH TWA": {8 * 3600, "NIOSH: TWA concentration for up to a 10-hour workday during a 40-hour workweek (NIOSH Pocket Guide to Chemical Hazards, DHHS (NIOSH) Publication 2005-149, Introduction); averaged over the stay, kept between a conventional 8-hour day and 10 hours (our reading of \"up to\")"},
	"OSHA TWA":  {0, "OSHA: 8-hour time-weighted average, not to be exceeded in any 8-hour work shift of a 40-hour week (29 CFR 1910.1000, from memory)"},
	"ACGIH TWA": {0, "ACGIH: TWA concentration for a conventional 8-hour workday and a 40-hour workweek (ACGIH TLVs and BEIs, definitions, from memory)"},
	"TWA":       {0, "time-weighted average over the period the library lists for the limit"},
	"STEL":      {0, "15-minute TWA (or the period the body states) not to be exceeded at any time during a workday (NIOSH Pocket Guide, Introduction; 29 CFR 1910.1000)"},
	"ceiling":   {0, "not to be exceeded at any time; where the body states a sampling period, the highest average over that period (NIOSH Pocket Guide, Introduction; 29 CFR 1910.1000(a))"},
	"IDLH":      {0, "NIOSH IDLH: the concentration from which a person could escape within 30 minutes without escape-impairing or irreversible effects, judged on a 30-minute exposure (NIOSH Pocket Guide, Introduction; NIOSH Current Intelligence Bulletin 66, 2013) (from memory)"},
}

// averagingDefinition returns the body's definition of an averaging kind
// from averagingDefinitions, or the kind's own when the body has none.
func averagingDefinition(body, kind string) averagingDef {
	var kb [32]byte // the key, built on the stack
	key := append(append(append(kb[:0], body...), ' '), kind...)
	if def, ok := averagingDefinitions[string(key)]; ok {
		return def
	}
	return averagingDefinitions[kind]
}

// LimitSpecs returns every published numeric limit of the fluid from the
// chosen bodies (all when bodies is empty), each with its averaging period
// as its body defines it, in library order.
func LimitSpecs(f *fluids.Fluid, bodies []string) []LimitSpec {
	return appendLimitSpecs(nil, f, bodies)
}

// appendLimitSpecs appends LimitSpecs(f, bodies) to out.
func appendLimitSpecs(out []LimitSpec, f *fluids.Fluid, bodies []string) []LimitSpec {
	for _, l := range f.ExposureLimits {
		if !bodyChosen(l.Body, bodies) {
			continue
		}
		def := averagingDefinition(l.Body, l.Averaging)
		s := LimitSpec{Set: LimitSetUSOccupational, Body: l.Body, Name: l.Label(), Kind: l.Averaging, PPM: l.PPM, Source: l.Source,
			PeriodS: l.Minutes * 60, Definition: def.definition}
		if def.shortestS > 0 && def.shortestS < s.PeriodS {
			s.ShortestPeriodS = def.shortestS
		}
		out = append(out, s)
	}
	return out
}

// AppliedLimitSpecs returns every numeric limit of the fluid from the sets
// the criteria apply (Criteria.AppliedLimitSets), in set order, and the
// notes of the sets that give no number (none published, not checked,
// not recommended). LimitBodies narrows the US occupational set only.
func AppliedLimitSpecs(f *fluids.Fluid, cr Criteria) ([]LimitSpec, []LimitNote) {
	return appendAppliedLimitSpecs(nil, f, cr)
}

// appendAppliedLimitSpecs appends the limits of AppliedLimitSpecs to specs
// and returns them with the notes.
func appendAppliedLimitSpecs(specs []LimitSpec, f *fluids.Fluid, cr Criteria) ([]LimitSpec, []LimitNote) {
	var notes []LimitNote
	for _, set := range cr.AppliedLimitSets() {
		if set == LimitSetUSOccupational {
			specs = appendLimitSpecs(specs, f, cr.LimitBodies)
			continue
		}
		var n []LimitNote
		specs, n = appendTableLimits(specs, f, set)
		notes = append(notes, n...)
	}
	return specs, notes
}

// LimitResult is one limit evaluated over its own averaging period.
type LimitResult struct {
	LimitSpec
	// Exposure is the highest average a person could receive over the
	// limit's period (Exposure.AveragingS).
	Exposure Exposure
	// Share is the average over the limit (1 = at the limit).
	Share float64
	// Governs marks the limit of its kind with the largest share.
	Governs bool
	// StepKey names the calculation step of the limit's averaging period.
	StepKey string
	// source is the source a finding on the limit prints (findingSource),
	// when worked out beforehand; empty otherwise.
	source string
}

// findingSource returns the source a finding on l prints.
func (l *LimitResult) findingSource() string {
	if l.source != "" {
		return l.source
	}
	return findingSource(&l.LimitSpec)
}

// present returns how long (s) the person judged against l stays, for
// a room's stay of presentS: a public acute benchmark's whole period
// (never less than the peak's), any other limit's presentS.
func (l *LimitSpec) present(presentS float64) float64 {
	if l.WholePeriod {
		return math.Max(l.PeriodS, PeakAveragingS)
	}
	return presentS
}

// stepKey returns the key of the calculation step of l's averaging
// period averagingS: a public acute benchmark's own step, any other
// limit's exposure step.
func (l *LimitSpec) stepKey(averagingS float64) string {
	if l.WholePeriod {
		return publicStepKey(averagingS)
	}
	return exposureStepKey(averagingS)
}

// findingSource words the source of a finding on limit l (limitSource),
// with the value's standing for an interim or proposed public acute
// value.
func findingSource(l *LimitSpec) string {
	standing := ""
	if l.Set == LimitSetUSPublicAcute && (l.Standing == string(fluids.StatusInterim) || l.Standing == string(fluids.StatusProposed)) {
		standing = l.Standing + " value"
	}
	return limitSource(l.Name, l.PPM, standing, l.Source)
}

// limitGroup is a run of limits to evaluate: their specs (the fluid
// record's when occupational is set), those of the bodies chosen (all
// when bodies is empty), and, when known beforehand (a built-in table's
// or a built-in fluid's), their findings' sources and step keys (a key
// left empty is worked out).
type limitGroup struct {
	specs         []LimitSpec
	sources, keys []string
	bodies        []string
	occupational  bool
}

// appliedLimits evaluates every limit of the sets the criteria apply
// (AppliedLimitSpecs, in the same order) over its own averaging period for
// a stay of presentS, marks within each kind the one with the largest
// share (the first listed on a tie), and returns them with the notes of
// the sets that give no number.
func appliedLimits(f *fluids.Fluid, cr Criteria, rel *releaseModel, presentS, molarMass float64) ([]LimitResult, []LimitNote) {
	var notes []LimitNote
	var gb [8]limitGroup
	groups := gb[:0]
	var occ []LimitSpec
	n := 0
	var sb [8]string
	for _, set := range cr.appendAppliedLimitSets(sb[:0]) {
		if set == LimitSetUSOccupational {
			if p := preparedRecords()[f]; p != nil {
				groups = append(groups, limitGroup{specs: p.specs, sources: p.sources, keys: p.keys, bodies: cr.LimitBodies})
				for i := range p.specs {
					if bodyChosen(p.specs[i].Body, cr.LimitBodies) {
						n++
					}
				}
				continue
			}
			occ = appendLimitSpecs(nil, f, cr.LimitBodies) // a fluid of the reviewer's own
			groups = append(groups, limitGroup{occupational: true})
			n += len(occ)
			continue
		}
		if p := preparedTable(f, set); p != nil {
			groups = append(groups, limitGroup{specs: p.specs, sources: p.sources, keys: p.keys})
			n += len(p.specs)
			notes = append(notes, p.notes...)
			continue
		}
		specs, nt := appendTableLimits(nil, f, set)
		groups = append(groups, limitGroup{specs: specs})
		n += len(specs)
		notes = append(notes, nt...)
	}
	if n == 0 {
		return []LimitResult{}, notes
	}
	out := make([]LimitResult, n)
	// The exposures already worked out, by averaging period and stay
	// (and the limit they were worked out for): limits of one period
	// share them.
	type seen struct {
		avg, present float64
		at           int
	}
	var eb [16]seen
	done := eb[:0]
	i := 0
	for _, g := range groups {
		specs := g.specs
		if g.occupational {
			specs = occ
		}
		for k := range specs {
			s := &specs[k]
			if !bodyChosen(s.Body, g.bodies) {
				continue
			}
			present := s.present(presentS)
			avg := s.AveragingS(present)
			r := &out[i]
			found := false
			for _, d := range done {
				if d.avg == avg && d.present == present {
					r.Exposure, found = out[d.at].Exposure, true
					break
				}
			}
			if !found {
				r.Exposure = rel.exposure(avg, present, molarMass)
				done = append(done, seen{avg, present, i})
			}
			r.LimitSpec = *s
			r.Share = r.Exposure.PPM / s.PPM
			if g.keys != nil {
				r.StepKey, r.source = g.keys[k], g.sources[k]
			}
			if r.StepKey == "" {
				// Limits of one period share their step and so its key.
				for j := range i {
					if out[j].WholePeriod == s.WholePeriod && out[j].Exposure.AveragingS == r.Exposure.AveragingS {
						r.StepKey = out[j].StepKey
						break
					}
				}
				if r.StepKey == "" {
					r.StepKey = s.stepKey(r.Exposure.AveragingS)
				}
			}
			i++
		}
	}
	markGoverning(out)
	return out, notes
}

// markGoverning marks, within each kind, the limit with the largest
// share, the first listed on a tie.
func markGoverning(out []LimitResult) {
	type best struct {
		kind string
		at   int
	}
	var bb [16]best
	bests := bb[:0]
	for i := range out {
		l := &out[i]
		found := false
		for j := range bests {
			if b := &bests[j]; b.kind == l.Kind {
				if l.Share > out[b.at].Share {
					b.at = i
				}
				found = true
				break
			}
		}
		if !found {
			bests = append(bests, best{l.Kind, i})
		}
	}
	for _, b := range bests {
		out[b.at].Governs = true
	}
}

// appendOccupationalKinds appends to kinds AveragingKinds followed by
// every other occupational kind the limits use (the public acute kinds
// left out), in order of first appearance.
func appendOccupationalKinds(kinds []string, limits []LimitResult) []string {
	kinds = append(kinds, AveragingKinds...)
	for i := range limits {
		if k := limits[i].Kind; !IsPublicKind(k) {
			kinds = addKind(kinds, k)
		}
	}
	return kinds
}

// addKind appends kind to kinds unless it is there already.
func addKind(kinds []string, kind string) []string {
	for _, k := range kinds {
		if k == kind {
			return kinds
		}
	}
	return append(kinds, kind)
}

// exposureCriterion returns the criterion identifier of an averaging kind.
func exposureCriterion(kind string) string {
	switch kind {
	case fluids.AveragingIDLH:
		return CriterionIDLH
	case fluids.AveragingCeiling:
		return CriterionCeiling
	case fluids.AveragingSTEL:
		return CriterionSTEL
	case fluids.AveragingTWA:
		return CriterionTWA
	}
	return "exposure-" + strings.ToLower(strings.ReplaceAll(kind, " ", "-"))
}

// exposureTitle returns the title of an averaging kind's finding.
func exposureTitle(kind string) string {
	switch kind {
	case fluids.AveragingIDLH:
		return "30-minute average against the IDLH"
	case fluids.AveragingCeiling:
		return "Highest concentration against the ceiling limit"
	case fluids.AveragingSTEL:
		return "Short-term average against the STEL"
	case fluids.AveragingTWA:
		return "Time-weighted average against the TWA limit"
	}
	return "Average against the " + kind + " limit"
}

func bodyChosen(body string, bodies []string) bool {
	if len(bodies) == 0 {
		return true
	}
	for _, b := range bodies {
		if b == body {
			return true
		}
	}
	return false
}

// countOtherKinds bounds the number of occupational averaging kinds of the
// limits beyond AveragingKinds: each limit of such a kind counts.
func countOtherKinds(limits []LimitResult) int {
	n := 0
	for i := range limits {
		if !IsPublicKind(limits[i].Kind) && !slices.Contains(AveragingKinds, limits[i].Kind) {
			n++
		}
	}
	return n
}
