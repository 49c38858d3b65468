//go:build !nowindow

package main

import (
	"strings"
	"testing"
)

// TestWindowWithoutDisplay: asking for the window where there is no
// display gives one line and status 2, never the toolkit's panic.
func TestWindowWithoutDisplay(t *testing.T) {
	if noDisplay("linux", noEnv) == "" {
		t.Fatal("no display reported on Linux with DISPLAY unset")
	}
	for _, args := range [][]string{nil, {example}, {"--smoke", "out.pdf"}} {
		code, out, errb := runMain(args...)
		if code != exitNoWindow || out != "" {
			t.Errorf("ullage %q: status %d, stdout %q; want %d and nothing on stdout", args, code, out, exitNoWindow)
		}
		if strings.Count(errb, "\n") != 1 || !strings.Contains(errb, "no display") {
			t.Errorf("ullage %q: stderr %q; want one line saying there is no display", args, errb)
		}
		for _, bad := range []string{"panic", "goroutine", "GLFW"} {
			if strings.Contains(errb, bad) {
				t.Errorf("ullage %q: stderr has %q: %q", args, bad, errb)
			}
		}
	}
}

func TestDisplayNeededOnlyOnLinuxAndBSD(t *testing.T) {
	tests := []struct {
		goos string
		env  map[string]string
		none bool
	}{
		{"linux", nil, true},
		{"freebsd", nil, true},
		{"linux", map[string]string{"DISPLAY": ":0"}, false},
		{"linux", map[string]string{"WAYLAND_DISPLAY": "wayland-0"}, false},
		{"darwin", nil, false},
		{"windows", nil, false},
	}
	for _, tt := range tests {
		got := noDisplay(tt.goos, func(k string) string { return tt.env[k] }) != ""
		if got != tt.none {
			t.Errorf("noDisplay(%s, %v) reports no display = %v, want %v", tt.goos, tt.env, got, tt.none)
		}
	}
}

func TestDisplayFailureIsRecognised(t *testing.T) {
	// The panic values the window toolkit raises without a display
	// (observed with DISPLAY unset and with DISPLAY naming no server).
	for _, v := range []string{"NotInitialized: The GLFW library is not initialized", "PlatformError: X11: Failed to open display :99"} {
		if !isDisplayFailure(v) {
			t.Errorf("%q is not taken for a display failure", v)
		}
	}
	if isDisplayFailure("runtime error: index out of range [3] with length 2") {
		t.Error("a programming fault is taken for a display failure; its trace would be lost")
	}
}
