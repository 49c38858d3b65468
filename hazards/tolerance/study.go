package tolerance

import (
	"context"
	"errors"
	"fmt"
	"math"
	"sync"
	"sync/atomic"
	"time"

	"ullage/hazards"
)

// tally is what one chunk of units found.
type tally struct {
	liquidFull, burst, exceed, unsealable, extrapolated int
	sumFailure                                          float64
	err                                                 error
}

// study holds the per-unit outputs while the workers run.
type study struct {
	p       *plan
	chunks  int
	tallies []tally
	// pressure and factor hold each unit's pressure at its hottest
	// temperature (+Inf for an unsealable unit) and burst safety factor.
	pressure, factor []float64
	// columns hold the first SensitivityUnits values of each input.
	columns [][]float64
}

func newStudy(p *plan) *study {
	n := p.settings.Samples
	st := &study{p: p, chunks: (n + ChunkUnits - 1) / ChunkUnits}
	st.tallies = make([]tally, st.chunks)
	st.pressure = make([]float64, n)
	st.factor = make([]float64, n)
	st.columns = make([][]float64, len(p.inputs))
	for i := range st.columns {
		st.columns[i] = make([]float64, p.settings.SensitivityUnits)
	}
	return st
}

// run hands chunks to the workers in increasing order. After an error in
// chunk c no chunk above c is started, so the error returned is always that
// of the lowest failing chunk, whatever the number of workers. It reports
// progress to the settings' Progress every ProgressInterval.
func (st *study) run(ctx context.Context) error { return st.runWith(ctx, nil) }

// runWith is run, reporting progress at every tick of tick instead when
// tick is not nil.
func (st *study) runWith(ctx context.Context, tick <-chan time.Time) error {
	if tick == nil && st.p.settings.Progress != nil {
		t := time.NewTicker(ProgressInterval)
		defer t.Stop()
		tick = t.C
	}
	return st.runTicking(ctx, tick)
}

// runTicking is run with progress reported at each tick (none when tick
// is nil), and once more with the total when every unit is done.
func (st *study) runTicking(ctx context.Context, tick <-chan time.Time) error {
	var done atomic.Int64 // units of finished chunks
	report := st.p.settings.Progress
	if report == nil {
		return st.runChunks(ctx, &done)
	}
	total := st.p.settings.Samples
	stopReports := make(chan struct{})
	reporting := make(chan struct{})
	last := int64(-1) // the last count reported; read after reporting closes
	go func() {
		defer close(reporting)
		for {
			select {
			case <-stopReports:
				return
			case <-tick:
				if n := done.Load(); n != last {
					last = n
					report(int(n), total)
				}
			}
		}
	}()
	err := st.runChunks(ctx, &done)
	close(stopReports)
	<-reporting
	if err == nil && last != int64(total) {
		report(total, total)
	}
	return err
}

// runChunks runs the workers, adding each finished chunk's units to done.
func (st *study) runChunks(ctx context.Context, done *atomic.Int64) error {
	var next atomic.Int64
	var stopAt atomic.Int64
	stopAt.Store(int64(st.chunks))
	var wg sync.WaitGroup
	for range min(st.p.settings.Workers, st.chunks) {
		wg.Go(func() {
			w := st.newWorker()
			for {
				c := next.Add(1) - 1
				if c >= stopAt.Load() {
					return
				}
				if ctx.Err() != nil {
					return
				}
				if err := w.chunk(int(c)); err != nil {
					for {
						cur := stopAt.Load()
						if c >= cur || stopAt.CompareAndSwap(cur, c) {
							break
						}
					}
					return
				}
				done.Add(int64(min(ChunkUnits, st.p.settings.Samples-int(c)*ChunkUnits)))
			}
		})
	}
	wg.Wait()
	if err := ctx.Err(); err != nil {
		return err
	}
	for _, t := range st.tallies {
		if t.err != nil {
			return t.err
		}
	}
	return nil
}

// worker is one goroutine's sampler and scratch unit.
type worker struct {
	st   *study
	smp  *sampler
	unit hazards.Unit
	row  []float64
}

func (st *study) newWorker() *worker {
	return &worker{st: st, smp: st.p.newSampler(),
		unit: hazards.Unit{WallThicknessM: make([]float64, len(st.p.design.Vessel.Parts))},
		row:  make([]float64, len(st.p.inputs))}
}

// chunk draws and evaluates the units of chunk c from stream c and
// stores its tally, with the error if any. The tally is counted locally
// and stored once: neighbouring chunks' tallies share cache lines, and
// other workers write them.
func (w *worker) chunk(c int) error {
	var t tally
	t.err = w.count(c, &t)
	w.st.tallies[c] = t
	return t.err
}

// count draws and evaluates the units of chunk c into t and the study's
// per-unit arrays.
func (w *worker) count(c int, t *tally) error {
	st, p := w.st, w.st.p
	seedChunk(w.smp.pcg, p.settings.Seed, c)
	first := c * ChunkUnits
	last := min(first+ChunkUnits, p.settings.Samples)
	u := &w.unit
	for i := first; i < last; i++ {
		wq, err := w.smp.drawUnit(p, u)
		if err != nil {
			return fmt.Errorf("unit %d: %w", i, err)
		}
		r, err := p.model.EvaluateHot(*u)
		strength := wq * r.EffectiveStrengthPa
		switch {
		case errors.Is(err, hazards.ErrOverfilled):
			// Recorded for the rank correlations only: the unit never
			// reaches the point of having a stressed area.
			strength = wq * p.inputs[len(p.inputs)-1].Nominal
			t.unsealable++
			t.liquidFull++
			t.burst++
			t.sumFailure++
			st.pressure[i], st.factor[i] = math.Inf(1), 0
		case err != nil:
			return fmt.Errorf("unit %d (fill %g kg, volume %g m³, walls %g m, hottest %g K): %w",
				i, u.FillMassKg, u.VolumeM3, u.WallThicknessM, u.HottestK, err)
		default:
			if r.LiquidFull {
				t.liquidFull++
			}
			if r.Hot.Flags.Extrapolated() {
				t.extrapolated++
			}
			t.sumFailure += r.FailureProbability
			sf := float64(hazards.SafetyFactorCap)
			if r.HoopStressPa > 0 {
				sf = math.Min(strength/r.HoopStressPa, sf)
				if strength < r.HoopStressPa {
					t.burst++
				}
			}
			st.pressure[i], st.factor[i] = r.Hot.PressurePa, sf
		}
		if u.FillMassKg > p.exposureMassKg {
			t.exceed++
		}
		if i < p.settings.SensitivityUnits {
			p.record(u, strength, w.row)
			for j, x := range w.row {
				st.columns[j][i] = x
			}
		}
	}
	return nil
}

// result gathers the chunk tallies (in chunk order, so that the sums are
// the same whatever the number of workers) and the distributions.
func (st *study) result(limited bool) *Result {
	p := st.p
	s := p.settings
	var all tally
	for _, t := range st.tallies {
		all.liquidFull += t.liquidFull
		all.burst += t.burst
		all.exceed += t.exceed
		all.unsealable += t.unsealable
		all.extrapolated += t.extrapolated
		all.sumFailure += t.sumFailure
	}
	n := s.Samples
	r := &Result{
		Samples: n, Seed: s.Seed, HottestSpreadK: s.HottestSpreadK,
		HottestDistribution: s.HottestDistribution, DimensionDistribution: s.DimensionDistribution,
		Inputs:                 p.inputs,
		LiquidFullFraction:     Wilson(all.liquidFull, n),
		BurstFraction:          Wilson(all.burst, n),
		MeanFailureProbability: all.sumFailure / float64(n),
		ExposureLimited:        limited,
		UnsealableUnits:        all.unsealable,
		ExtrapolatedUnits:      all.extrapolated,
		SensitivityUnits:       s.SensitivityUnits,
	}
	if limited {
		r.ExposureExceedFraction = Wilson(all.exceed, n)
		r.ExposureFillLimitKg = p.exposureMassKg
	}
	// The percentiles reorder the arrays, so the rank correlations take a
	// copy of the safety factors they need; the three jobs are independent.
	y := append([]float64(nil), st.factor[:s.SensitivityUnits]...)
	parallel(s.Workers,
		func() { r.Sensitivity = sensitivity(p.inputs, st.columns, y, max(s.Workers-2, 1)) },
		func() { r.PressurePa = percentiles(st.pressure, n-all.unsealable) },
		func() {
			r.Histogram = loadedHistogram(st.factor)
			r.SafetyFactor = percentiles(st.factor, n)
		})
	return r
}

// parallel runs the jobs on up to workers goroutines and waits for them.
func parallel(workers int, jobs ...func()) {
	if workers <= 1 || len(jobs) <= 1 {
		for _, t := range jobs {
			t()
		}
		return
	}
	var next atomic.Int64
	var wg sync.WaitGroup
	for range min(workers, len(jobs)) {
		wg.Go(func() {
			for i := next.Add(1) - 1; i < int64(len(jobs)); i = next.Add(1) - 1 {
				jobs[i]()
			}
		})
	}
	wg.Wait()
}
