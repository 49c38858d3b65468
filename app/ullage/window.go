//go:build !nowindow

package main

import (
	"fmt"
	"io"
	"os"
	"runtime"
	"strings"

	"ullage/app/gui"
)

// openWindow opens the review window, or says in one line why it cannot.
func openWindow(args []string, stderr io.Writer, getenv func(string) string) (status int) {
	if msg := noDisplay(runtime.GOOS, getenv); msg != "" {
		fmt.Fprintln(stderr, "ullage: "+msg)
		return exitNoWindow
	}
	// The window toolkit panics when the display named by DISPLAY cannot
	// be reached; that is the same condition, said in one line. Any other
	// panic is a fault of the program and keeps its trace.
	defer func() {
		if r := recover(); r != nil {
			if !isDisplayFailure(r) {
				panic(r)
			}
			fmt.Fprintf(stderr, "ullage: the window cannot open: the display %q cannot be reached (%v); the command line needs no display: ullage help\n",
				getenv("DISPLAY"), r)
			status = exitNoWindow
		}
	}()
	plainLocale()
	return gui.Run(args)
}

// noDisplay returns why no window can open on this system, or "". On
// Linux and the BSDs the window needs an X11 or Wayland display; macOS
// and Windows always have one.
func noDisplay(goos string, getenv func(string) string) string {
	switch goos {
	case "darwin", "windows", "ios", "android", "js", "wasip1":
		return ""
	}
	if getenv("DISPLAY") != "" || getenv("WAYLAND_DISPLAY") != "" {
		return ""
	}
	return "no display to open the window on (DISPLAY is not set); the command line needs none: ullage help"
}

// isDisplayFailure reports whether a panic from the window toolkit comes
// from a display it could not open.
func isDisplayFailure(r any) bool {
	msg := fmt.Sprint(r)
	for _, s := range []string{"GLFW", "X11", "display", "Display"} {
		if strings.Contains(msg, s) {
			return true
		}
	}
	return false
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
