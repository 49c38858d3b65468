package hazards

import (
	"fmt"
	"strconv"

	"ullage/fluids"
)

// Criteria of the public acute findings, one per tier.
const (
	// CriterionPublic1: the averages over each AEGL duration against
	// AEGL-1 (or PAC-1), the caution line: above it, caution, never fail.
	CriterionPublic1 = "exposure-public-1"
	// CriterionPublic2: the averages over each AEGL duration against
	// AEGL-2 (or PAC-2), the fail line.
	CriterionPublic2 = "exposure-public-2"
	// CriterionPublic3: the peak against AEGL-3 (or PAC-3), the fail line.
	CriterionPublic3 = "exposure-public-3"
	// CriterionPublicNone: the fluid has no public acute benchmark; the
	// finding says why (none published, not checked, not listed) and is
	// not assessed, never a pass.
	CriterionPublicNone = "exposure-public-none"
)

// IsPublicCriterion reports whether a criterion is a public acute finding.
func IsPublicCriterion(c string) bool {
	switch c {
	case CriterionPublic1, CriterionPublic2, CriterionPublic3, CriterionPublicNone:
		return true
	}
	return false
}

// publicCriteria are the criteria of the tiers, by tier.
var publicCriteria = [...]string{1: CriterionPublic1, 2: CriterionPublic2, 3: CriterionPublic3}

var publicTitles = map[int]string{
	1: "Public: average over each AEGL duration against AEGL-1 / PAC-1 (caution line)",
	2: "Public: average over each AEGL duration against AEGL-2 / PAC-2 (fail line)",
	3: "Public: peak against AEGL-3 / PAC-3 (life-threatening)",
}

// appliesOccupational reports whether any occupational set applies.
func (cr Criteria) appliesOccupational() bool {
	for _, s := range []string{LimitSetUSOccupational, LimitSetEUOccupational, LimitSetUKWEL, LimitSetDEAGW} {
		if cr.Applies(s) {
			return true
		}
	}
	return false
}

// publicFindings gives the public acute findings: for tiers 1 and 2 the
// limit with the largest share over the AEGL durations governs (tier 2
// fails above max_fraction_of_limit of its limit; tier 1 gives a caution
// above its limit and never fails); tier 3 holds the peak to the AEGL-3
// or PAC-3. A tier with no value says why in words; a fluid with none at
// all gets one not-assessed finding.
func publicFindings(f *fluids.Fluid, r *Release, cr Criteria) []Finding {
	return appendPublicFindings(nil, f, r, cr, &factArena{})
}

// appendPublicFindings appends the findings of publicFindings to out, their
// facts from ar.
func appendPublicFindings(out []Finding, f *fluids.Fluid, r *Release, cr Criteria, ar *factArena) []Finding {
	any := false
	for i := range r.Limits {
		any = any || r.Limits[i].Set == LimitSetUSPublicAcute
	}
	if !any {
		reason, src := ReasonNonePublished, "US public acute benchmarks (AEGL, DOE PAC): none published for "+f.Name
		for _, n := range r.LimitNotes {
			if n.Set == LimitSetUSPublicAcute && n.Name == "" {
				reason, src = n.Reason, n.Statement
			}
		}
		return append(out, Finding{Criterion: CriterionPublicNone, Title: "Public acute benchmarks (AEGL, PAC)", Status: StatusNotAssessed,
			Unit: "ppm", Direction: AtMost, NotApplicable: reason, Source: src, Protects: publicPopulation + ", 10 minutes to 8 hours",
			Facts: ar.keep(named("fluid", f.Name))})
	}
	for _, tier := range publicTiers {
		id := publicCriteria[tier]
		gov := -1
		for i := range r.Limits {
			if l := &r.Limits[i]; l.Set == LimitSetUSPublicAcute && l.Governs && publicTier(l.Kind) == tier {
				gov = i
			}
		}
		if gov < 0 {
			reason, src := ReasonNonePublished, fmt.Sprintf("no AEGL-%d or PAC-%d value for %s", tier, tier, f.Name)
			for _, n := range r.LimitNotes {
				if n.Set == LimitSetUSPublicAcute && n.Reason == ReasonNotRecommended && publicTier(kindOfLabel(n.Name)) == tier {
					reason, src = ReasonNotRecommended, n.Statement
				}
			}
			out = append(out, Finding{Criterion: id, Title: publicTitles[tier], Status: StatusNotAssessed, Unit: "ppm", Direction: AtMost,
				NotApplicable: reason, Source: src, Protects: publicPopulation})
			continue
		}
		lim := &r.Limits[gov]
		e := &lim.Exposure
		limit := lim.PPM
		if tier != 1 {
			limit *= cr.MaxFractionOfLimit
		}
		fd := atMost(id, publicTitles[tier], "ppm", e.PPM, limit, 1, lim.findingSource())
		if tier == 1 && fd.Status == StatusFail {
			fd.Status = StatusCaution
		}
		if e.Bounded {
			fd.ValueBound = AtMost
		}
		fd.Protects = lim.Protects
		measured := "average"
		if tier == 3 {
			measured = "peak (highest one-minute average)"
		}
		fd.Facts = ar.keep(named("benchmark", lim.Name), fact(measured, FactConcentration, e.PPM), fact("benchmark value", FactConcentration, lim.PPM))
		out = append(out, fd)
	}
	return out
}

// limitSource words a finding's source: "NIOSH REL TWA 100 ppm: source",
// with the value's standing in brackets when given ("AEGL-2 10 min 220 ppm
// (interim value): source"); the number as %g prints it.
func limitSource(name string, ppm float64, standing, source string) string {
	n := name + " " + strconv.FormatFloat(ppm, 'g', -1, 64) + " ppm"
	if standing != "" {
		n += " (" + standing + ")"
	}
	return n + ": " + source
}

// kindOfLabel returns the kind of an acute entry's label ("AEGL-1 10
// min" → "AEGL-1").
func kindOfLabel(label string) string {
	for i := range label {
		if label[i] == ' ' {
			return label[:i]
		}
	}
	return label
}
