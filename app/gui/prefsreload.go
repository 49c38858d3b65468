package gui

import (
	"bytes"
	"io"
	"sync"
)

// The window toolkit keeps the preferences in one file per program, which
// it rewrites in place (truncate, then write) on every change, and every
// running copy of the program watches that file's folder and reads the
// file again on any change there. When a second window (a second process)
// opens a design, it rewrites the recent-files list; a copy that reads the
// file between the truncation and the write finds it empty and logs
//
//	Fyne error:  Preferences load error:
//	  Cause: EOF
//	  At: .../fyne/v2/app/preferences.go:103
//
// The failed read changes nothing: the decoder reads a whole JSON value
// before it stores any of it, so the preferences in memory stay as they
// were, and the write that follows raises another change that reads the
// complete file. The message is therefore noise, and reloadNoiseFilter
// drops exactly that record (cause EOF or unexpected EOF) once the
// program is running. A file already empty or damaged when the program
// starts is read before the filter is in place, so that message still
// shows.

// reloadNoiseFilter passes log output on to w, leaving out the
// toolkit's record of a preferences read that met a half-written file.
// The toolkit logs a record as three lines, each its own Write.
type reloadNoiseFilter struct {
	mu   sync.Mutex
	w    io.Writer
	held []byte // a "Preferences load error:" line waiting for its cause
	skip bool   // the cause was dropped; drop its "At:" line too
}

var (
	prefsLoadLine = []byte("Fyne error:  Preferences load error:")
	causeEOF      = [][]byte{[]byte("  Cause: EOF\n"), []byte("  Cause: unexpected EOF\n")}
	atLine        = []byte("  At: ")
)

// Write passes p on unless it is part of the record being left out. It
// always reports the whole of p written.
func (f *reloadNoiseFilter) Write(p []byte) (int, error) {
	f.mu.Lock()
	defer f.mu.Unlock()
	switch {
	case f.skip:
		f.skip = false
		if bytes.Contains(p, atLine) {
			return len(p), nil
		}
	case f.held != nil:
		held := f.held
		f.held = nil
		if hasAnySuffix(p, causeEOF) {
			f.skip = true
			return len(p), nil
		}
		if _, err := f.w.Write(held); err != nil {
			return len(p), err
		}
	}
	if bytes.Contains(p, prefsLoadLine) {
		f.held = append([]byte(nil), p...)
		return len(p), nil
	}
	_, err := f.w.Write(p)
	return len(p), err
}

func hasAnySuffix(p []byte, suffixes [][]byte) bool {
	for _, s := range suffixes {
		if bytes.HasSuffix(p, s) {
			return true
		}
	}
	return false
}
