package gui

import (
	"bytes"
	"io"
	"sync"
)

// The toolkit's file and folder choosers look up the usual folders of a
// desktop (Desktop, Documents, Downloads, Music, Pictures, Videos) each
// time they open, and log an error for every one the computer does not
// define; the chooser works the same without them. favouritesNoiseFilter
// drops exactly those records.

// favouritesNoiseFilter passes log output on to w, leaving out the
// toolkit's "Getting favorite locations" records, each written as a
// first line, a "Cause:" line and an "At:" line.
type favouritesNoiseFilter struct {
	mu   sync.Mutex
	w    io.Writer
	skip bool // inside a record being left out
}

var (
	favouritesLine = []byte("Fyne error:  Getting favorite locations")
	causeLine      = []byte("  Cause: ")
)

// Write passes p on unless it belongs to a record being left out. It
// always reports the whole of p written.
func (f *favouritesNoiseFilter) Write(p []byte) (int, error) {
	f.mu.Lock()
	defer f.mu.Unlock()
	if bytes.Contains(p, favouritesLine) {
		f.skip = true
		return len(p), nil
	}
	if f.skip && (bytes.Contains(p, causeLine) || bytes.Contains(p, atLine)) {
		return len(p), nil
	}
	f.skip = false
	_, err := f.w.Write(p)
	return len(p), err
}
