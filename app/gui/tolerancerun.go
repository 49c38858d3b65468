package gui

import (
	"context"
	"fmt"
	"runtime"
	"time"

	"ullage/fluids"
	"ullage/hazards"
	"ullage/hazards/designfile"
	"ullage/hazards/tolerance"
)

// study is the plain state of the tolerance study: the last finished
// result, what it was run on, and the run in progress if any.
type study struct {
	// result is the last finished study, nil before the first.
	result *tolerance.Result
	// design is the fingerprint of the design the result is of and lib
	// the fluid library it used: when either differs from the working
	// copy's, the result is out of date.
	design string
	lib    *fluids.Library
	// of says which revision the result is of, for the panel.
	of   string
	took time.Duration

	// running is true while a study runs; cancel stops it and gen tells
	// its result from that of a run started later.
	running bool
	cancel  context.CancelFunc
	gen     uint64
	// err is what stopped the last run, nil when it finished.
	err error
}

// studyOutcome is what a background run hands back.
type studyOutcome struct {
	result *tolerance.Result
	err    error
	took   time.Duration
}

// designFingerprint is the digest of a design's inputs, as in the records.
func designFingerprint(d hazards.Design) string {
	r := designfile.Revision{Design: d}
	return r.Fingerprint()
}

// studyWorkers leaves one processor to the window while a study runs;
// the number of workers never changes the result.
func studyWorkers() int { return max(runtime.NumCPU()-1, 1) }

// runStudy runs a study and never panics: a failure inside the engine
// comes back as an error.
func runStudy(ctx context.Context, d hazards.Design, lib *fluids.Library, set tolerance.Settings) (o studyOutcome) {
	start := time.Now()
	defer func() {
		if r := recover(); r != nil {
			o = studyOutcome{err: fmt.Errorf("the study stopped on an internal error (%v)", r)}
		}
		o.took = time.Since(start)
	}()
	r, err := tolerance.Run(ctx, d, lib, set)
	return studyOutcome{result: r, err: err}
}

// startStudy runs a study of the working copy off the UI goroutine;
// done runs on the UI goroutine when it ends, unless a later run
// replaced it. It counts as pending work meanwhile, like an assessment.
func (tp *tolerancePanel) startStudy(set tolerance.Settings, done func()) {
	s, st := tp.s, &tp.st
	if st.cancel != nil {
		st.cancel()
	}
	d := cloneDesign(s.doc.Work)
	lib := s.lib
	fp := designFingerprint(d)
	of := s.revisionNote()
	ctx, cancel := context.WithCancel(context.Background())
	st.gen++
	gen := st.gen
	st.running, st.cancel, st.err = true, cancel, nil
	// The panel's bar shows the units done, at most a few times a second.
	set.Progress = func(done, total int) {
		s.opts.post(func() {
			if gen == st.gen && st.running {
				s.tol.busy.SetValue(float64(done) / float64(total))
			}
		})
	}
	s.assess.pending.Add(1)
	go func() {
		o := runStudy(ctx, d, lib, set)
		s.opts.post(func() {
			defer s.assess.pending.Add(-1)
			cancel()
			if gen != st.gen {
				return
			}
			st.running, st.cancel = false, nil
			if o.err != nil {
				st.err = o.err
			} else {
				st.result, st.design, st.lib, st.of, st.took = o.result, fp, lib, of, o.took
			}
			done()
		})
	}()
}

// stop cancels the run in progress, if any.
func (tp *tolerancePanel) stop() {
	if tp.st.cancel != nil {
		tp.st.cancel()
	}
}

// current reports whether the last study is of the working copy as it
// is now, with the same fluid library.
func (tp *tolerancePanel) current() bool {
	st, s := &tp.st, tp.s
	return st.result != nil && s.doc != nil && st.lib == s.lib && st.design == designFingerprint(s.doc.Work)
}

// stopStudy cancels the tolerance study in progress, if any.
func (s *session) stopStudy() { s.tol.stop() }

// forRecord returns the study to put in the assessment record: the last
// one, when it is of the working copy as it is now; nil otherwise.
func (tp *tolerancePanel) forRecord() *tolerance.Result {
	if !tp.current() {
		return nil
	}
	return tp.st.result
}

// currentStudy returns the study the assessment record takes, if any.
func (s *session) currentStudy() *tolerance.Result { return s.tol.forRecord() }
