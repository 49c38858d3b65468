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
// pipelines, with US English, which the program's text is written in, for
// the window toolkit's later look-ups. The toolkit also reads the locale
// once while the program loads, before this can run, and logs a harmless
// error for "C"; setting LANG (for example LANG=en_US.UTF-8) silences it.
func plainLocale() {
	for _, k := range []string{"LC_ALL", "LC_MESSAGES", "LANG", "LANGUAGE"} {
		v := os.Getenv(k)
		base, _, _ := strings.Cut(v, ".")
		if v == "" || base == "C" || base == "POSIX" {
			os.Setenv(k, "en_US.UTF-8")
		}
	}
}
