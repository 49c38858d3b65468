//go:build nowindow

package main

import (
	"fmt"
	"io"
)

// openWindow says that this build has no window: it was built with
// -tags nowindow for machines without a display.
func openWindow(_ []string, stderr io.Writer, _ func(string) string) int {
	fmt.Fprintln(stderr, "ullage: this build has no window (built with -tags nowindow); the commands run as usual: ullage help")
	return exitNoWindow
}
