package tolerance

import (
	"context"
	"errors"
	"math"
	"runtime"
	"sync"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"ullage/fluids"
	"ullage/hazards"
)

// fastPathRel is the relative tolerance of the fast-path check's numbers.
const fastPathRel = 1e-10

// worstRel is the largest relative difference the check saw.
var worstRel maxTracker

// maxTracker keeps the largest value noted, from any goroutine.
type maxTracker struct {
	mu  sync.Mutex
	max float64
}

func (m *maxTracker) value() float64 {
	m.mu.Lock()
	defer m.mu.Unlock()
	return m.max
}

func (m *maxTracker) note(x float64) {
	m.mu.Lock()
	m.max = math.Max(m.max, x)
	m.mu.Unlock()
}

// fastPathUnits is how many sampled units of each kind of design the
// fast-path check compares with their own full assessment.
const fastPathUnits = 10_000

// The study's per-unit path (hazards.UnitModel.EvaluateHot, with its
// recycled vessels, shared sealing state and the liquid-full decision
// from the hot state) gives each sampled unit what the full assessment of
// that same unit gives: the study draws the units, the test draws them
// again from the same streams, builds each one as a design of its own and
// runs hazards.Assess on it. Compared: the pressure and safety factor the
// study stores, and the ullage, phase, liquid-full status, failure
// probability, stretched-correlation flag and exposure status it counts,
// and the study's tallies against the same counts from the assessments.
//
// Tolerances: the unit path and Assess run the same functions on the same
// inputs (the volume summed over the same parts in the same order, the
// residual gas sealed from the same saturated state), except that with
// residual gas the study prepares the compressed liquid at each unit's
// hottest temperature from a table of the equation of state
// (fluids.IsothermTable, within 1e-9 of ρRT in the liquid's pressure), so
// the numbers agree within fastPathRel (measured: at most 3e-11). Two decisions are compared exactly except
// within the width of a root find of the boundary: liquid-full (Assess
// searches the liquid-full temperature to 1e-10 K, units within 1e-6 K
// of it are left out) and exposure (units whose fill lies within 1e-9
// relative of the study's exposure limit fill are left out).
func TestFastPathMatchesFullAssessment(t *testing.T) {
	lib := testLibrary(t)
	for _, k := range studyKinds(t) {
		t.Run(k.name, func(t *testing.T) {
			t.Parallel() // the kinds are independent; keep both cores busy
			s, err := Settings{Samples: fastPathUnits, Seed: 11, Workers: 2, HottestSpreadK: k.spreadK}.resolved()
			if err != nil {
				t.Fatal(err)
			}
			d := k.design
			nominal, err := hazards.Assess(d, lib)
			if err != nil {
				t.Fatal(err)
			}
			model, err := hazards.NewUnitModel(d, lib)
			if err != nil {
				t.Fatal(err)
			}
			nom, err := model.Evaluate(hazards.Unit{FillMassKg: d.FillMassKg, VolumeM3: d.Vessel.InternalVolumeM3, HottestK: d.HottestK})
			if err != nil {
				t.Fatal(err)
			}
			p := newPlan(d, model, nom.EffectiveStrengthPa, s)
			p.exposureMassKg, _ = exposureFillLimit(nominal)
			st := newStudy(p)
			if err := st.run(context.Background()); err != nil {
				t.Fatal(err)
			}
			var study tally
			for _, c := range st.tallies {
				study.liquidFull += c.liquidFull
				study.burst += c.burst
				study.exceed += c.exceed
				study.unsealable += c.unsealable
				study.extrapolated += c.extrapolated
				study.sumFailure += c.sumFailure
			}

			// Draw the units again, chunk by chunk from the same streams.
			type drawn struct {
				u  hazards.Unit
				wq float64
			}
			units := make([]drawn, s.Samples)
			for c := 0; c < st.chunks; c++ {
				smp := p.newSampler()
				seedChunk(smp.pcg, s.Seed, c)
				for i := c * ChunkUnits; i < min((c+1)*ChunkUnits, s.Samples); i++ {
					u := hazards.Unit{WallThicknessM: make([]float64, len(d.Vessel.Parts))}
					wq, err := smp.drawUnit(p, &u)
					if err != nil {
						t.Fatal(err)
					}
					units[i] = drawn{u, wq}
				}
			}

			var mu sync.Mutex
			var full tally
			kinds := map[hazards.Phase]int{}
			var next int
			var wg sync.WaitGroup
			for range runtime.GOMAXPROCS(0) {
				wg.Go(func() {
					var mine tally
					mineKinds := map[hazards.Phase]int{}
					defer func() {
						mu.Lock()
						full.liquidFull += mine.liquidFull
						full.burst += mine.burst
						full.exceed += mine.exceed
						full.unsealable += mine.unsealable
						full.extrapolated += mine.extrapolated
						full.sumFailure += mine.sumFailure
						for ph, n := range mineKinds {
							kinds[ph] += n
						}
						mu.Unlock()
					}()
					for {
						mu.Lock()
						i := next
						next++
						mu.Unlock()
						if i >= s.Samples || t.Failed() {
							return
						}
						checkUnit(t, lib, p, st, i, units[i].u, units[i].wq, &mine, mineKinds)
					}
				})
			}
			wg.Wait()
			if full.liquidFull != study.liquidFull || full.burst != study.burst || full.exceed != study.exceed ||
				full.unsealable != study.unsealable || full.extrapolated != study.extrapolated {
				t.Errorf("tallies: study %+v, full assessments %+v", study, full)
			}
			if !scalar.EqualWithinRel(full.sumFailure, study.sumFailure, 1e-9) {
				t.Errorf("summed failure probability: study %g, full assessments %g", study.sumFailure, full.sumFailure)
			}
			t.Logf("%s: %d units; phases %v; liquid-full %d, burst %d, exposure over %d, unsealable %d; largest relative difference so far %.1e",
				k.name, s.Samples, kinds, full.liquidFull, full.burst, full.exceed, full.unsealable, worstRel.value())
		})
	}
}

// checkUnit assesses unit i as a design of its own and compares it with
// the study's results for it, counting into full.
func checkUnit(t *testing.T, lib *fluids.Library, p *plan, st *study, i int, u hazards.Unit, wq float64, full *tally, kinds map[hazards.Phase]int) {
	d := p.design
	d.FillMassKg, d.HottestK = u.FillMassKg, u.HottestK
	d.Vessel.InternalVolumeM3 = u.VolumeM3
	d.Vessel.Parts = append([]hazards.Part(nil), d.Vessel.Parts...)
	for j := range d.Vessel.Parts {
		d.Vessel.Parts[j].WallThicknessM = u.WallThicknessM[j]
	}
	a, err := hazards.Assess(d, lib)
	if errors.Is(err, hazards.ErrOverfilled) {
		full.unsealable++
		full.liquidFull++
		full.burst++
		full.sumFailure++
		if !math.IsInf(st.pressure[i], 1) || st.factor[i] != 0 {
			t.Errorf("unit %d: the full assessment finds it unsealable, the study gives %g Pa, factor %g", i, st.pressure[i], st.factor[i])
		}
		if u.FillMassKg > p.exposureMassKg {
			full.exceed++
		}
		return
	}
	if err != nil {
		t.Errorf("unit %d (%+v): %v", i, u, err)
		return
	}
	r, err := p.model.EvaluateHot(u)
	if err != nil {
		t.Errorf("unit %d: unit path: %v", i, err)
		return
	}
	kinds[a.Hot.Phase]++
	// A number made from the overpressure carries the pressure's relative
	// difference times P/(P − ambient), large when the unit is barely
	// over-pressurised, and a failure probability that times the Weibull
	// modulus: those are compared within the pressure's tolerance so
	// scaled, and a probability also within 1e-15 outright.
	over := a.Hot.PressurePa - d.AmbientPressurePa
	amp := 1.0
	if over != 0 {
		amp = math.Max(1, math.Abs(a.Hot.PressurePa/over))
	}
	sameWithin := func(what string, got, want, abs, rel float64) {
		if !scalar.EqualWithinAbsOrRel(got, want, abs, rel) {
			t.Errorf("unit %d: %s %.15g from the study, %.15g from the full assessment", i, what, got, want)
		}
	}
	same := func(what string, got, want float64) {
		if want != 0 && !math.IsInf(want, 0) {
			worstRel.note(math.Abs(got-want) / math.Abs(want))
		}
		if !scalar.EqualWithinAbsOrRel(got, want, 1e-300, fastPathRel) {
			t.Errorf("unit %d: %s %.15g from the study, %.15g from the full assessment", i, what, got, want)
		}
	}
	same("pressure", st.pressure[i], a.Hot.PressurePa)
	same("ullage", r.Hot.UllagePercent, a.Hot.UllagePercent)
	same("long-term burst pressure", r.LongTermBurstPa, a.Strength.LongTermBurstPa)
	sameWithin("failure probability", r.FailureProbability, a.FailureProbability, 1e-15, fastPathRel*amp*p.weibullK)
	if r.Hot.Phase != a.Hot.Phase {
		t.Errorf("unit %d: phase %s from the study, %s from the full assessment", i, r.Hot.Phase, a.Hot.Phase)
	}
	// The unit's safety factor with its own glass strength: the study's
	// draw wq times the assessment's factor (LongTermBurst / overpressure).
	wantSF := float64(hazards.SafetyFactorCap)
	if over > 0 {
		wantSF = math.Min(wq*a.Strength.LongTermBurstPa/over, wantSF)
		if wq*a.Strength.LongTermBurstPa < over {
			full.burst++
		}
	}
	sameWithin("safety factor", st.factor[i], wantSF, 1e-300, fastPathRel*amp)
	lf := a.LiquidFullReached && a.LiquidFullK < d.HottestK
	if lf != r.LiquidFull && math.Abs(a.LiquidFullK-d.HottestK) > 1e-6 {
		t.Errorf("unit %d: liquid-full %v from the study, %v from the full assessment (liquid-full at %.9g K, hottest %.9g K)", i, r.LiquidFull, lf, a.LiquidFullK, d.HottestK)
	}
	if r.LiquidFull {
		full.liquidFull++
	}
	if a.Hot.Flags.Extrapolated() != r.Hot.Flags.Extrapolated() {
		t.Errorf("unit %d: stretched correlations %v from the study, %v from the full assessment", i, r.Hot.Flags.Extrapolated(), a.Hot.Flags.Extrapolated())
	}
	if a.Hot.Flags.Extrapolated() {
		full.extrapolated++
	}
	full.sumFailure += a.FailureProbability
	// Exposure: the unit's own release against every exposure limit.
	worst := 0.0
	for _, f := range a.Findings {
		switch f.Criterion {
		case hazards.CriterionIDLH, hazards.CriterionCeiling, hazards.CriterionSTEL, hazards.CriterionTWA:
			if f.Limit > 0 {
				worst = math.Max(worst, f.Value/f.Limit)
			}
		}
	}
	studyOver := u.FillMassKg > p.exposureMassKg
	if studyOver {
		full.exceed++
	}
	if (worst > 1) != studyOver && math.Abs(u.FillMassKg/p.exposureMassKg-1) > 1e-9 {
		t.Errorf("unit %d: exposure over its limit %v from the study, %v from the full assessment (largest share %g)", i, studyOver, worst > 1, worst)
	}
}
