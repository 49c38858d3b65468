// Command ullage is the Ullage desktop program and its command line.
//
// With a command (check, compare, fluids, props, version, help) it runs
// without a window and needs no display. With no arguments, or with a
// design file, it opens the review window; where there is no display it
// says so in one line and exits with status 2. A first argument that is
// neither a command, an option nor an existing file is taken for a
// mistyped command: a usage error (status 2) that names the nearest one.
//
// Built with -tags nowindow (and CGO_ENABLED=0), the window is left out:
// the binary needs no X11 or OpenGL libraries, and the window's entry
// points say that this build has no window.
package main

import (
	"io"
	"os"
	"strings"

	"ullage/app/cli"
)

// exitNoWindow is the status when the window cannot open: no display, or
// a build without a window. It is the usage status, as the window was
// asked for where it cannot be had.
const exitNoWindow = cli.ExitUsage

func main() {
	os.Exit(run(os.Args[1:], os.Stdout, os.Stderr, os.Getenv))
}

// run dispatches the arguments to the command line or to the window and
// returns the exit status. getenv reads the environment (for the display).
func run(args []string, stdout, stderr io.Writer, getenv func(string) string) int {
	if len(args) > 0 && forCommandLine(args[0]) {
		return cli.Run(args, stdout, stderr)
	}
	return openWindow(args, stderr, getenv)
}

// forCommandLine reports whether the first argument is meant for the
// command line: a command, or a word that is neither an option nor an
// existing file, which the command line reports as a mistyped command.
func forCommandLine(first string) bool {
	if cli.IsCommand(first) {
		return true
	}
	if strings.HasPrefix(first, "-") {
		return false
	}
	_, err := os.Stat(first)
	return err != nil
}
