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

// study is the plain state of the study screen's runs: the run in
// progress if any and how the last one ended. The finished study is the
// document's (document.keepStudy).
type study struct {
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
	doc := s.doc
	// The panel's bar shows the units done, at most a few times a second.
	set.Progress = func(done, total int) {
		s.opts.post(func() {
			if gen == st.gen && st.running {
				tp.busy.SetValue(float64(done) / float64(total))
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
			st.err = o.err
			// A study of a document no longer open is dropped.
			if o.err == nil && doc == s.doc {
				doc.keepStudy(studied{result: o.result, design: fp, lib: lib, of: of, took: o.took})
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

// current reports whether the document's last study is of the working
// copy as it is now, with the same fluid library.
func (tp *tolerancePanel) current() bool {
	s := tp.s
	return s.doc != nil && s.doc.studyCurrent(s.lib)
}

// last returns the document's last finished study and what it ran on.
func (tp *tolerancePanel) last() studied {
	if tp.s.doc == nil {
		return studied{}
	}
	return tp.s.doc.studied
}

// stopStudy stops the window's background study, if one runs: it
// publishes causeStop, and the study screen cancels its run.
func (s *session) stopStudy() { s.changes.publish(change{cause: causeStop}) }

// currentStudy returns the study the assessment record takes, if any:
// the document's, when it is of the working copy as it is now.
func (s *session) currentStudy() *tolerance.Result {
	if s.doc == nil {
		return nil
	}
	return s.doc.studyFor(s.lib)
}
