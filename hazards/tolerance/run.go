package tolerance

import (
	"context"
	"fmt"
	"math"
	"time"

	"ullage/fluids"
	"ullage/hazards"
)

// Run draws s.Samples units of the design and evaluates each one (see
// Result for what a unit is and when it bursts).
//
// How the design's tolerances become distributions: FillMassToleranceKg,
// Vessel.VolumeToleranceM3 (used only when the design gives a measured
// InternalVolumeM3; otherwise each unit's volume follows from its own
// walls) and each Part.WallToleranceM are ± values, read as three standard
// deviations for s.DimensionDistribution Normal and as the half-width for
// Uniform; the hottest temperature spreads by ± s.HottestSpreadK the same
// way (Triangle: from −spread to +spread, mode at the design's value). A
// draw outside the physical range (fill and volume positive, a wall
// thinner than its part's radius, the hottest temperature between the
// fluid's freezing point and 800 K) is drawn again. Inputs with no
// tolerance stay at their design values.
//
// The design is validated and assessed once (hazards.Assess) for the
// exposure limits; errors from that come back unchanged, bad settings as
// an *hazards.InputError. Run stops early and returns ctx.Err() when ctx is
// cancelled. The result depends only on the design and on the settings
// other than Workers and Progress (see Settings.Progress for the progress
// reports).
func Run(ctx context.Context, d hazards.Design, lib *fluids.Library, s Settings) (*Result, error) {
	return run(ctx, d, lib, s, nil)
}

// run is Run, reporting progress at every tick of tick instead of every
// ProgressInterval when tick is not nil.
func run(ctx context.Context, d hazards.Design, lib *fluids.Library, s Settings, tick <-chan time.Time) (*Result, error) {
	s, err := s.resolved()
	if err != nil {
		return nil, err
	}
	if lib == nil {
		return nil, &hazards.InputError{Field: "library", Value: "nil", Want: "a fluid library (fluids.Builtin)"}
	}
	nominal, err := hazards.Assess(d, lib)
	if err != nil {
		return nil, err
	}
	model, err := hazards.NewUnitModel(d, lib)
	if err != nil {
		return nil, err
	}
	nom, err := model.Evaluate(hazards.Unit{FillMassKg: d.FillMassKg, VolumeM3: d.Vessel.InternalVolumeM3, HottestK: d.HottestK})
	if err != nil {
		return nil, fmt.Errorf("nominal unit: %w", err)
	}
	p := newPlan(d, model, nom.EffectiveStrengthPa, s)
	limitKg, limited := exposureFillLimit(nominal)
	p.exposureMassKg = limitKg

	st := newStudy(p)
	if err := st.runWith(ctx, tick); err != nil {
		return nil, err
	}
	return st.result(limited), nil
}

// exposureFillLimit returns the fill above which a release exceeds the
// governing limit of some exposure criterion: every concentration of the
// release models is proportional to the fill mass, so the limit is the
// nominal fill over the nominal design's largest value-to-limit ratio.
func exposureFillLimit(a *hazards.Assessment) (float64, bool) {
	worst, found := 0.0, false
	for _, f := range a.Findings {
		switch f.Criterion {
		case hazards.CriterionIDLH, hazards.CriterionCeiling, hazards.CriterionSTEL, hazards.CriterionTWA:
			if f.Limit > 0 {
				worst, found = math.Max(worst, f.Value/f.Limit), true
			}
		}
	}
	if !found || !(worst > 0) {
		return math.MaxFloat64, false
	}
	return a.Design.FillMassKg / worst, true
}
