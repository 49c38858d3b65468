package cli

import (
	"fmt"
	"io"
	"os"
	"strings"
	"unicode/utf8"

	"ullage/report/display"
)

// isTerminal reports whether w is a terminal: an *os.File that is a
// character device. Pipes, files and in-memory writers are not (the null
// device is, and takes the progress line silently).
func isTerminal(w io.Writer) bool {
	f, ok := w.(*os.File)
	if !ok {
		return false
	}
	fi, err := f.Stat()
	return err == nil && fi.Mode()&os.ModeCharDevice != 0
}

// progressLine writes a tolerance study's progress to a terminal as one
// line rewritten in place, and clears it at the end. Its report method is
// a tolerance.Settings.Progress; the study never calls it from two
// goroutines at once nor after the study returns.
type progressLine struct {
	w     io.Writer
	label string
	shown int // length of the line on screen
}

// report rewrites the line with done of total units.
func (p *progressLine) report(done, total int) {
	line := p.label + ": " + display.Count(done) + " of " + display.Units(total) + " (" + display.Count(done*100/max(total, 1)) + " %)"
	n := utf8.RuneCountInString(line)
	pad := max(p.shown-n, 0)
	fmt.Fprintf(p.w, "\r%s%s", line, strings.Repeat(" ", pad))
	p.shown = n
}

// clear blanks the line and returns the cursor to its start.
func (p *progressLine) clear() {
	if p.shown > 0 {
		fmt.Fprintf(p.w, "\r%s\r", strings.Repeat(" ", p.shown))
		p.shown = 0
	}
}
