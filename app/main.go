// Command ullage is the Ullage desktop program and its command line.
//
// With no arguments, or with a design file, it opens the review window.
// With a subcommand (check, compare, fluids, props, version, help) it
// runs without a window and needs no display.
package main

import (
	"os"
	"strings"

	"ullage/app/cli"
	"ullage/app/gui"
)

func main() {
	plainLocale()
	if len(os.Args) > 1 && cli.IsCommand(os.Args[1]) {
		os.Exit(cli.Run(os.Args[1:], os.Stdout, os.Stderr))
	}
	os.Exit(gui.Run(os.Args[1:]))
}

// plainLocale replaces the POSIX "C" locale, common on servers and in
// pipelines, with US English, which the program's text is written in. The
// window toolkit reads the locale lazily and logs an error for "C"; this
// keeps that noise off the command line's stderr.
func plainLocale() {
	for _, k := range []string{"LC_ALL", "LC_MESSAGES", "LANG", "LANGUAGE"} {
		v := os.Getenv(k)
		base, _, _ := strings.Cut(v, ".")
		if v == "" || base == "C" || base == "POSIX" {
			os.Setenv(k, "en_US.UTF-8")
		}
	}
}
