package gui

import (
	"fmt"
	"sync"
	"sync/atomic"
	"time"

	"ullage/fluids"
	"ullage/hazards"
)

// outcome is one assessment computed in the background: the results and
// the fill–temperature map, or the error that stopped it.
type outcome struct {
	gen        uint64
	assessment *hazards.Assessment
	err        error
	took       time.Duration
}

// evaluate assesses a design and samples its charts. It never panics: a
// failure inside the engine comes back as an error, so that a bad input
// can never take the window down.
func evaluate(d hazards.Design, lib *fluids.Library) (o outcome) {
	start := time.Now()
	defer func() {
		if r := recover(); r != nil {
			o = outcome{err: fmt.Errorf("the assessment stopped on an internal error (%v); the last good results are kept", r)}
		}
		o.took = time.Since(start)
	}()
	a, err := hazards.Assess(d, lib)
	if err != nil {
		return outcome{err: err}
	}
	return outcome{assessment: a}
}

// assessor runs assessments off the UI goroutine. Requests coming faster
// than the delay are merged: only the last one is computed. Results are
// handed back through post (fyne.Do in the program), and a result older
// than the newest request is dropped.
type assessor struct {
	delay time.Duration
	post  func(func())

	mu    sync.Mutex
	timer *time.Timer
	// gen counts requests; read and written on the UI goroutine only.
	gen uint64
	// pending counts requests not yet applied, for tests that wait.
	pending atomic.Int64
}

// schedule asks for d to be assessed after the delay; apply runs on the
// UI goroutine with the outcome, unless a newer request came since.
func (as *assessor) schedule(d hazards.Design, lib *fluids.Library, apply func(outcome)) {
	as.gen++
	gen := as.gen
	d = cloneDesign(d)
	as.mu.Lock()
	defer as.mu.Unlock()
	if as.timer != nil && as.timer.Stop() {
		as.pending.Add(-1)
	}
	as.pending.Add(1)
	as.timer = time.AfterFunc(as.delay, func() {
		o := evaluate(d, lib)
		o.gen = gen
		as.post(func() {
			defer as.pending.Add(-1)
			if o.gen == as.gen {
				apply(o)
			}
		})
	})
}

// cancel drops any request not yet started.
func (as *assessor) cancel() {
	as.gen++
	as.mu.Lock()
	defer as.mu.Unlock()
	if as.timer != nil && as.timer.Stop() {
		as.pending.Add(-1)
	}
}

// background runs work off the UI goroutine and hands its result to done
// on the UI goroutine, counting it as pending meanwhile.
func background[T any](as *assessor, work func() T, done func(T)) {
	as.pending.Add(1)
	go func() {
		var v T
		func() {
			defer func() { _ = recover() }()
			v = work()
		}()
		as.post(func() {
			defer as.pending.Add(-1)
			done(v)
		})
	}()
}
