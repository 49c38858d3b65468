package hazards

import (
	"fmt"
	"math"
	"sort"
	"strings"

	"ullage/fluids"
)

// Status is the outcome of one review criterion.
type Status string

// Statuses, from best to worst.
const (
	StatusPass    Status = "pass"
	StatusCaution Status = "caution"
	StatusFail    Status = "fail"
)

func (s Status) rank() int {
	switch s {
	case StatusFail:
		return 2
	case StatusCaution:
		return 1
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

// Finding is the outcome of one criterion: the value found, the limit it
// is held to, the margin (positive when on the safe side, as a fraction of
// the limit), the source of the limit and a message in plain words.
type Finding struct {
	Criterion string  `json:"criterion"`
	Title     string  `json:"title"`
	Status    Status  `json:"status"`
	Value     float64 `json:"value"`
	Limit     float64 `json:"limit"`
	Unit      string  `json:"unit"`
	Margin    float64 `json:"margin"`
	Source    string  `json:"source"`
	Message   string  `json:"message"`
	// MessageUS is the same message with US customary units.
	MessageUS string `json:"message_us"`
	// Steps are the numbers of the calculation-record steps behind this
	// finding, its own comparison step first.
	Steps []int `json:"steps"`
}

// MessageIn returns the message in US customary units when us is true,
// otherwise in SI.
func (f Finding) MessageIn(us bool) string {
	if us && f.MessageUS != "" {
		return f.MessageUS
	}
	return f.Message
}

// atLeast returns a minimum-type finding: pass when value ≥ limit·cautionFactor,
// caution when limit ≤ value < that, fail below the limit.
func atLeast(id, title, unit string, value, limit, cautionFactor float64, source string) Finding {
	f := Finding{Criterion: id, Title: title, Unit: unit, Value: value, Limit: limit, Source: source}
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
	f := Finding{Criterion: id, Title: title, Unit: unit, Value: value, Limit: limit, Source: source}
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

// GoverningLimit returns the most protective numeric limit of the given
// averaging (fluids.AveragingTWA, …) among the chosen bodies (all when
// bodies is empty), and whether there is one.
func GoverningLimit(f *fluids.Fluid, averaging string, bodies []string) (fluids.ExposureLimit, bool) {
	var best fluids.ExposureLimit
	found := false
	for _, l := range f.ExposureLimits {
		if l.Averaging != averaging || !bodyChosen(l.Body, bodies) {
			continue
		}
		if !found || l.PPM < best.PPM {
			best, found = l, true
		}
	}
	return best, found
}

// GoverningLimits returns the governing limit of each averaging that has
// one, in the order IDLH, ceiling, STEL, TWA.
func GoverningLimits(f *fluids.Fluid, bodies []string) []fluids.ExposureLimit {
	var out []fluids.ExposureLimit
	for _, avg := range []string{fluids.AveragingIDLH, fluids.AveragingCeiling, fluids.AveragingSTEL, fluids.AveragingTWA} {
		if l, ok := GoverningLimit(f, avg, bodies); ok {
			out = append(out, l)
		}
	}
	return out
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

// exposureFindings compares the release with every published limit.
func exposureFindings(f *fluids.Fluid, rel *releaseModel, exposureS float64, cr Criteria) []Finding {
	type kind struct {
		id, averaging, title string
	}
	kinds := []kind{
		{CriterionIDLH, fluids.AveragingIDLH, "Peak concentration against the IDLH"},
		{CriterionCeiling, fluids.AveragingCeiling, "Concentration against the ceiling limit"},
		{CriterionSTEL, fluids.AveragingSTEL, "Short-term average against the STEL"},
		{CriterionTWA, fluids.AveragingTWA, "Time-weighted average against the TWA limit"},
	}
	var out []Finding
	for _, k := range kinds {
		lim, ok := GoverningLimit(f, k.averaging, cr.LimitBodies)
		if !ok {
			continue
		}
		period := lim.Minutes * 60
		if k.averaging == fluids.AveragingIDLH {
			period = 0 // compared with the peak: IDLH is a level not to be entered at all
		}
		e := rel.exposure(period, exposureS, f.MolarMass.Value)
		fd := atMost(k.id, k.title, "ppm", e.PPM, lim.PPM*cr.MaxFractionOfLimit, exposureCautionFraction,
			fmt.Sprintf("%s %g ppm: %s", lim.Label(), lim.PPM, lim.Source))
		where := "the whole room, well mixed"
		if e.Zone == NearField {
			where = "the near field beside the breakage"
		}
		avg := "Peak"
		if period > 0 {
			avg = fmt.Sprintf("The %g-minute average", lim.Minutes)
		}
		fd.Message = fmt.Sprintf("%s in %s: %.3g ppm against %s %s %.4g ppm (%.0f %% of the limit).",
			avg, where, e.PPM, lim.Body, lim.Kind, lim.PPM, 100*e.PPM/lim.PPM)
		out = append(out, fd)
	}
	if len(out) == 0 {
		fd := Finding{Criterion: CriterionNoLimit, Title: "Published exposure limit", Status: StatusCaution, Unit: "ppm",
			Source: "none found in the library for the chosen bodies"}
		e := rel.exposure(0, exposureS, f.MolarMass.Value)
		fd.Value = e.PPM
		notes := []string{}
		for _, n := range f.NoNumericLimit {
			notes = append(notes, n.Body+" "+n.Kind+": "+n.Note)
		}
		fd.Message = fmt.Sprintf("No published numeric exposure limit applies to %s, so the release (peak %.3g ppm) cannot be judged against one; this is not a pass.", f.Name, e.PPM)
		if len(notes) > 0 {
			fd.Message += " " + strings.Join(notes, " ")
		}
		out = append(out, fd)
	}
	return out
}

func sortFindings(fs []Finding) {
	order := map[string]int{
		CriterionUllage: 0, CriterionUllageWorst: 1, CriterionBurst: 2, CriterionFailure: 3, CriterionImplosion: 4,
		CriterionIDLH: 5, CriterionCeiling: 6, CriterionSTEL: 7, CriterionTWA: 8, CriterionNoLimit: 9,
		CriterionFlammability: 10, CriterionCorrelationUse: 11,
	}
	rank := func(c string) int {
		if IsThermalShockCriterion(c) {
			return order[CriterionImplosion] // kept after the implosion finding by the stable sort
		}
		return order[c]
	}
	sort.SliceStable(fs, func(i, j int) bool { return rank(fs[i].Criterion) < rank(fs[j].Criterion) })
}

// finiteOr replaces a non-finite number by a fallback so that no NaN or
// infinity ever reaches a result.
func finiteOr(x, fallback float64) float64 {
	if math.IsNaN(x) || math.IsInf(x, 0) {
		return fallback
	}
	return x
}
