package gui

import (
	"bytes"
	"fmt"
	"io"
	"log"
	"os"
	"sync/atomic"
	"time"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/app"

	"ullage/assets"
	"ullage/hazards/designfile"
)

// appID is the application's identity, as in FyneApp.toml.
const appID = "org.ullage.desktop"

// smokeTimeout bounds how long --smoke waits for the first results.
const smokeTimeout = 90 * time.Second

// Run starts the review window; args may name a design file to open.
// With --smoke OUT.pdf it opens the bundled example, assesses it, writes
// its assessment record to OUT.pdf through the Export command's own code
// and quits: status 0 when the record was written, 1 otherwise. Bad
// arguments give status 2.
func Run(args []string) int {
	ra, err := parseRunArgs(args)
	if err != nil {
		fmt.Fprintf(os.Stderr, "ullage: %v\n", err)
		return 2
	}
	a := app.NewWithID(appID)
	log.SetOutput(&favouritesNoiseFilter{w: &reloadNoiseFilter{w: log.Writer()}})
	a.SetIcon(fyne.NewStaticResource("icon.png", assets.Icon()))
	w := a.NewWindow("Ullage")
	s, err := newSession(a, w, options{delay: typingDelay})
	if err != nil {
		fmt.Fprintf(os.Stderr, "ullage: %v\n", err)
		return 1
	}
	s.applyLook()
	sh := buildWindow(s)
	w.SetContent(sh.object)
	w.Resize(defaultWindowSize)
	w.SetCloseIntercept(s.requestClose)

	doc, openErr := s.firstDocument(ra)
	if doc == nil {
		fmt.Fprintf(os.Stderr, "ullage: %v\n", openErr)
		return 1
	}
	if ra.smoke != "" && openErr != nil {
		fmt.Fprintf(os.Stderr, "ullage --smoke: %v\n", openErr)
		return 1
	}
	s.open(doc)

	var status atomic.Int32
	switch {
	case ra.smoke != "":
		go s.smoke(ra.smoke, &status)
	default:
		if openErr != nil {
			s.showFileProblem("The design file cannot be opened", openErr)
		} else {
			s.offerRecent()
			s.offerRecovery()
		}
		s.startAutosave(autosavePeriod)
	}
	w.ShowAndRun()
	return int(status.Load())
}

// runArgs are the window's command-line arguments.
type runArgs struct {
	file  string
	smoke string
}

// parseRunArgs reads [FILE] [--smoke OUT.pdf].
func parseRunArgs(args []string) (runArgs, error) {
	var ra runArgs
	for i := 0; i < len(args); i++ {
		switch a := args[i]; a {
		case "--smoke":
			if i+1 >= len(args) {
				return ra, fmt.Errorf("%s needs a value", a)
			}
			i++
			ra.smoke = args[i]
		default:
			if len(a) > 1 && a[0] == '-' {
				return ra, fmt.Errorf("unknown option %q (try: ullage help)", a)
			}
			if ra.file != "" {
				return ra, fmt.Errorf("name one design file to open (%q and %q given)", ra.file, a)
			}
			ra.file = a
		}
	}
	return ra, nil
}

// firstDocument picks what to open: the named file, else (not in smoke
// mode) the most recent file, else the bundled example. When the named
// file fails, the example opens and the error comes back. When the most
// recent file is gone or does not load, the example opens and s.lost says
// why, for offerRecent to tell the reviewer.
func (s *session) firstDocument(ra runArgs) (*document, error) {
	if ra.file != "" {
		doc, err := loadDocument(ra.file)
		if err == nil {
			s.rememberFile(ra.file)
			return doc, nil
		}
		ex, exErr := exampleDocument()
		if exErr != nil {
			return nil, err
		}
		return ex, err
	}
	if ra.smoke == "" {
		if recent := s.app.Preferences().StringList(prefRecent); len(recent) > 0 {
			doc, err := loadRecent(recent[0])
			if err == nil {
				return doc, nil
			}
			s.lost = &lostRecent{path: recent[0], err: err}
		}
	}
	return exampleDocument()
}

// whenIdle waits, off the UI goroutine, until no assessment is pending,
// then runs f on the UI goroutine. It gives up after smokeTimeout and
// reports whether f ran.
func (s *session) whenIdle(f func()) bool {
	deadline := time.Now().Add(smokeTimeout)
	for time.Now().Before(deadline) {
		if s.assess.pending.Load() == 0 {
			done := make(chan struct{})
			s.opts.post(func() {
				defer close(done)
				if s.assess.pending.Load() == 0 {
					f()
					f = nil
				}
			})
			<-done
			if f == nil {
				return true
			}
		}
		time.Sleep(20 * time.Millisecond)
	}
	return false
}

// smoke writes the example's assessment record to out and quits.
func (s *session) smoke(out string, status *atomic.Int32) {
	status.Store(1)
	ran := s.whenIdle(func() {
		defer s.app.Quit()
		if s.last.assessment == nil {
			fmt.Fprintln(os.Stderr, "ullage --smoke: the example gave no results")
			return
		}
		if err := s.exportTo(out); err != nil {
			fmt.Fprintf(os.Stderr, "ullage --smoke: %v\n", err)
			return
		}
		status.Store(0)
	})
	if !ran {
		fmt.Fprintln(os.Stderr, "ullage --smoke: no results within", smokeTimeout)
		s.opts.post(s.app.Quit)
	}
}

// exportTo writes the assessment record to a path through the same
// writer the Export command uses.
func (s *session) exportTo(path string) error {
	var buf bytes.Buffer
	if err := s.writeAssessmentPDF(&buf); err != nil {
		return err
	}
	return designfile.WriteFile(path, 0o666, func(w io.Writer) error {
		_, err := w.Write(buf.Bytes())
		return err
	})
}
