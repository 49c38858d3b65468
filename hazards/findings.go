package hazards

import (
	"encoding/json"
	"math"

	"ullage/fluids"
)

// Status is the outcome of one review criterion.
type Status string

// Statuses, from best to worst.
const (
	StatusPass    Status = "pass"
	StatusCaution Status = "caution"
	StatusFail    Status = "fail"
	// StatusNotAssessed: the criterion could not be applied (no published
	// limit for the fluid); the finding says why in NotAssessed. It is no
	// pass, but it does not change the verdict.
	StatusNotAssessed Status = "not-assessed"
)

func (s Status) rank() int {
	switch s {
	case StatusFail:
		return 2
	case StatusCaution:
		return 1
	case StatusNotAssessed:
		return -1
	}
	return 0
}

// Worse returns the worse of two statuses.
func Worse(a, b Status) Status {
	if b.rank() > a.rank() {
		return b
	}
	return a
}

// Criterion identifiers, stable across versions: they key findings in
// saved results, JSON output and comparisons.
const (
	CriterionUllage         = "ullage-at-hottest"
	CriterionUllageWorst    = "ullage-worst-case-unit"
	CriterionBurst          = "burst-safety-factor"
	CriterionBurstWorst     = "burst-safety-factor-worst-case-unit"
	CriterionFailure        = "failure-probability"
	CriterionImplosion      = "implosion-safety-factor"
	CriterionIDLH           = "exposure-idlh"
	CriterionCeiling        = "exposure-ceiling"
	CriterionSTEL           = "exposure-stel"
	CriterionTWA            = "exposure-twa"
	CriterionNoLimit        = "exposure-no-published-limit"
	CriterionFlammability   = "flammability"
	CriterionCorrelationUse = "correlation-range"
)

// Direction says which way a finding's limit holds.
type Direction string

// Directions of a limit, and of a value that is a bound.
const (
	AtLeast Direction = "at-least"
	AtMost  Direction = "at-most"
)

// Reason says, in words that every output prints alike, why a finding has
// no computed value.
type Reason string

// Reasons a finding has no computed value.
const (
	// ReasonNoBurstLoad: the vessel is not above ambient at the hottest
	// temperature, so nothing loads it towards bursting.
	ReasonNoBurstLoad Reason = "no burst load"
	// ReasonNoExternalLoad: the vessel is not below ambient at the coldest
	// temperature, so nothing loads it towards implosion.
	ReasonNoExternalLoad Reason = "no external load"
	// ReasonNoPublishedLimit: no published limit of this kind for the
	// fluid from the chosen bodies.
	ReasonNoPublishedLimit Reason = "no published limit"
	// ReasonNonePublished: the limit set publishes no value for the fluid.
	ReasonNonePublished Reason = "none published"
	// ReasonNotChecked: the set's published table could not be checked
	// for the fluid, so no value is entered (not a statement that none
	// exists).
	ReasonNotChecked Reason = "published table not checked"
	// ReasonNotRecommended: the AEGL table marks the value "NR", not
	// recommended for want of data.
	ReasonNotRecommended Reason = "not recommended (NR)"
	// ReasonNotListed: the fluid (one of the user's own) is in no
	// built-in table.
	ReasonNotListed Reason = "not listed"
	// ReasonNotFlammable: the fluid is not flammable, so no concentration
	// is held against a flammable limit.
	ReasonNotFlammable Reason = "not flammable"
)

// NotAssessed reports whether the reason means the criterion was not
// assessed (no value to judge by), rather than that no load applies.
func (r Reason) NotAssessed() bool {
	switch r {
	case ReasonNoPublishedLimit, ReasonNonePublished, ReasonNotChecked, ReasonNotRecommended, ReasonNotListed:
		return true
	}
	return false
}

// Finding is the outcome of one criterion: the value found, the limit it
// is held to, the margin (positive when on the safe side, as a fraction of
// the limit), the source of the limit and the facts behind it, all typed;
// the words are the display layer's.
type Finding struct {
	Criterion string  `json:"criterion"`
	Title     string  `json:"title"`
	Status    Status  `json:"status"`
	Value     float64 `json:"value"`
	Limit     float64 `json:"limit"`
	Unit      string  `json:"unit"`
	Margin    float64 `json:"margin"`
	Source    string  `json:"source"`
	// Facts are the values behind the finding (temperatures, pressures,
	// the glass ...), typed, for the detail each output words.
	Facts []Fact `json:"facts"`
	// Direction says which way the limit holds: the value must be at
	// least the limit, or at most.
	Direction Direction `json:"direction"`
	// NotApplicable, when set, says why the finding has no computed
	// value; Value and Margin are then not results (the JSON gives null).
	NotApplicable Reason `json:"not_applicable,omitempty"`
	// ValueBound, when set, says the value is a bound and not a computed
	// value: the true value is at most (or at least) Value.
	ValueBound Direction `json:"value_bound,omitempty"`
	// Stretched names the values behind this finding that came from a
	// correlation used outside its published range.
	Stretched []string `json:"stretched,omitempty"`
	// Protects says, for a public acute finding, whom and for how long
	// the governing benchmark protects ("General public, children
	// included, 30 minutes").
	Protects string `json:"protects,omitempty"`

	// rec is the calculation record of the assessment the finding is of
	// and index the finding's place in its Findings (see Steps).
	rec   *record
	index int
}

// Steps returns the numbers of the calculation-record steps behind the
// finding, its own comparison step first (Assessment.Trace); nil for a
// finding made outside an assessment. The first call on an assessment
// builds its record.
func (f Finding) Steps() []int {
	if f.rec == nil {
		return nil
	}
	return f.rec.built().findings[f.index]
}

// MarshalJSON writes a finding with null value and margin when they were
// not computed (NotApplicable set), and with the steps behind it.
// The fields are listed here in Finding's order, with the steps where the
// field of that name used to be; TestFindingJSONHasEveryField keeps the
// list whole.
func (f Finding) MarshalJSON() ([]byte, error) {
	out := struct {
		Criterion     string    `json:"criterion"`
		Title         string    `json:"title"`
		Status        Status    `json:"status"`
		Limit         float64   `json:"limit"`
		Unit          string    `json:"unit"`
		Source        string    `json:"source"`
		Facts         []Fact    `json:"facts"`
		Steps         []int     `json:"steps"`
		Direction     Direction `json:"direction"`
		NotApplicable Reason    `json:"not_applicable,omitempty"`
		ValueBound    Direction `json:"value_bound,omitempty"`
		Stretched     []string  `json:"stretched,omitempty"`
		Protects      string    `json:"protects,omitempty"`
		Value         *float64  `json:"value"`
		Margin        *float64  `json:"margin"`
	}{Criterion: f.Criterion, Title: f.Title, Status: f.Status, Limit: f.Limit, Unit: f.Unit, Source: f.Source, Facts: f.Facts,
		Steps: f.Steps(), Direction: f.Direction, NotApplicable: f.NotApplicable, ValueBound: f.ValueBound, Stretched: f.Stretched,
		Protects: f.Protects}
	if f.NotApplicable == "" {
		out.Value, out.Margin = &f.Value, &f.Margin
	}
	return json.Marshal(out)
}

// atLeast returns a minimum-type finding: pass when value ≥ limit·cautionFactor,
// caution when limit ≤ value < that, fail below the limit.
func atLeast(id, title, unit string, value, limit, cautionFactor float64, source string) Finding {
	f := Finding{Criterion: id, Title: title, Unit: unit, Value: value, Limit: limit, Source: source, Direction: AtLeast}
	f.Margin = value/limit - 1
	switch {
	case value < limit:
		f.Status = StatusFail
	case value < limit*cautionFactor:
		f.Status = StatusCaution
	default:
		f.Status = StatusPass
	}
	return f
}

// atMost returns a maximum-type finding: fail above the limit, caution
// above limit·cautionFraction, pass otherwise.
func atMost(id, title, unit string, value, limit, cautionFraction float64, source string) Finding {
	f := Finding{Criterion: id, Title: title, Unit: unit, Value: value, Limit: limit, Source: source, Direction: AtMost}
	f.Margin = 1 - value/limit
	switch {
	case value > limit:
		f.Status = StatusFail
	case value > limit*cautionFraction:
		f.Status = StatusCaution
	default:
		f.Status = StatusPass
	}
	return f
}

// Caution bands, the same for every design (common practice: a margin
// under a quarter of the requirement is worth a second look).
const (
	safetyFactorCautionBand  = 1.25 // caution below 1.25 × the minimum
	ullageCautionPoints      = 5    // caution within 5 percentage points of the minimum
	exposureCautionFraction  = 0.5  // caution above half the limit
	lflCautionFraction       = 0.5  // caution above half the allowed % LFL
	probabilityCautionFactor = 0.1  // caution above a tenth of the allowed probability
)

// exposureFindings gives one finding per averaging kind: the limit of that
// kind with the largest share of its limit governs; a kind with no
// published limit is listed as not assessed.
func exposureFindings(f *fluids.Fluid, r *Release, cr Criteria) []Finding {
	return appendExposureFindings(nil, f, r, cr, &factArena{})
}

// appendExposureFindings appends the findings of exposureFindings to out,
// their facts from ar.
func appendExposureFindings(out []Finding, f *fluids.Fluid, r *Release, cr Criteria, ar *factArena) []Finding {
	assessed := 0
	occupational := cr.appliesOccupational()
	var kb [16]string
	kinds := kb[:0]
	if occupational {
		kinds = appendOccupationalKinds(kinds, r.Limits)
	}
	for _, kind := range kinds {
		id, title := exposureCriterion(kind), exposureTitle(kind)
		gov := -1
		for i := range r.Limits {
			if l := &r.Limits[i]; l.Kind == kind && l.Governs {
				gov = i
			}
		}
		if gov < 0 {
			out = append(out, Finding{Criterion: id, Title: title, Status: StatusNotAssessed, Unit: "ppm", Direction: AtMost,
				NotApplicable: ReasonNoPublishedLimit, Source: "none in the library for the chosen bodies",
				Facts: ar.keep(named("kind of limit", kind), named("fluid", f.Name))})
			continue
		}
		assessed++
		lim := &r.Limits[gov]
		e := &lim.Exposure
		fd := atMost(id, title, "ppm", e.PPM, lim.PPM*cr.MaxFractionOfLimit, exposureCautionFraction, lim.findingSource())
		if e.Bounded {
			fd.ValueBound = AtMost
		}
		where := "the whole room, well mixed"
		if e.Zone == NearField {
			where = "the near field beside the breakage"
		}
		avg := fact("averaging period", FactMinutes, e.AveragingS/60)
		if e.AveragingS <= PeakAveragingS {
			avg = named("averaging period", "the peak (highest one-minute average)")
		}
		fd.Facts = ar.keep(avg, named("where", where), named("governing limit", lim.Name), fact("share of the governing limit", FactPercent, 100*lim.Share))
		for i := range r.Limits {
			if l := &r.Limits[i]; l.Kind == kind && l.Name != lim.Name {
				fd.Facts = ar.extend(fd.Facts, fact("share of "+l.Name, FactPercent, 100*l.Share))
			}
		}
		if e.Bounded {
			fd.Facts = ar.extend(fd.Facts, named("held to the physical bound", r.Bound.By))
		}
		out = append(out, fd)
	}
	if cr.Applies(LimitSetUSPublicAcute) {
		n := len(out)
		out = appendPublicFindings(out, f, r, cr, ar)
		for _, p := range out[n:] {
			if p.NotApplicable == "" {
				assessed++
			}
		}
	}
	if assessed == 0 {
		fd := Finding{Criterion: CriterionNoLimit, Title: "Published exposure limit", Status: StatusCaution, Unit: "ppm",
			Source: "none found in the library for the chosen bodies", Direction: AtMost, Value: r.Peak.PPM}
		fd.Facts = ar.keep(named("fluid", f.Name), fact("peak concentration", FactConcentration, r.Peak.PPM))
		for _, n := range f.NoNumericLimit {
			fd.Facts = ar.extend(fd.Facts, named(n.Body+" "+n.Kind, n.Note))
		}
		out = append(out, fd)
	}
	return out
}

// sortFindings puts the findings in their order (findingRank), keeping
// the order of those of one rank.
func sortFindings(fs []Finding) {
	var rb [32]int
	ranks := rb[:0]
	for i := range fs {
		ranks = append(ranks, findingRank(fs[i].Criterion))
	}
	// Insertion sort by rank: stable, and the findings are few and
	// nearly in order already.
	for i := 1; i < len(fs); i++ {
		if ranks[i] >= ranks[i-1] {
			continue
		}
		f, r := fs[i], ranks[i]
		j := i
		for ; j > 0 && ranks[j-1] > r; j-- {
			fs[j], ranks[j] = fs[j-1], ranks[j-1]
		}
		fs[j], ranks[j] = f, r
	}
}

// findingRank is the place of a criterion's findings in the order of the
// findings.
func findingRank(c string) int {
	switch c {
	case CriterionUllage:
		return 0
	case CriterionUllageWorst:
		return 1
	case CriterionBurst:
		return 2
	case CriterionBurstWorst:
		return 3
	case CriterionFailure:
		return 4
	case CriterionImplosion:
		return 5
	case CriterionIDLH:
		return 6
	case CriterionCeiling:
		return 7
	case CriterionSTEL:
		return 8
	case CriterionTWA:
		return 9
	case CriterionNoLimit:
		return 11
	case CriterionFlammability:
		return 12
	case CriterionCorrelationUse:
		return 13
	}
	if IsThermalShockCriterion(c) {
		return 5 // the implosion finding's: kept after it by the stable sort
	}
	return 10 // a further exposure kind, after the TWA
}

// finiteOr replaces a non-finite number by a fallback so that no NaN or
// infinity ever reaches a result.
func finiteOr(x, fallback float64) float64 {
	if math.IsNaN(x) || math.IsInf(x, 0) {
		return fallback
	}
	return x
}
