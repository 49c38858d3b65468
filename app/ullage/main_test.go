package main

import (
	"bytes"
	"strings"
	"testing"
)

// example is the bundled example design, from this package's folder.
const example = "../../assets/examples/tidemark-lantern.json"

// noEnv is an environment with no display.
func noEnv(string) string { return "" }

func runMain(args ...string) (int, string, string) {
	var out, errb bytes.Buffer
	code := run(args, &out, &errb, noEnv)
	return code, out.String(), errb.String()
}

// TestWindowWithoutDisplay: asking for the window where there is no
// display gives one line and status 2, never the toolkit's panic.
func TestWindowWithoutDisplay(t *testing.T) {
	if noDisplay("linux", noEnv) == "" {
		t.Fatal("no display reported on Linux with DISPLAY unset")
	}
	for _, args := range [][]string{nil, {example}, {"--show", "study"}} {
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

// TestMistypedCommand: a first word that is neither a command nor an
// existing file is a usage error naming the nearest command.
func TestMistypedCommand(t *testing.T) {
	tests := []struct {
		args []string
		want string
	}{
		{[]string{"chekc"}, "ullage: unknown command 'chekc'; did you mean 'check'?\n"},
		{[]string{"chekc", example}, "ullage: unknown command 'chekc'; did you mean 'check'?\n"},
		{[]string{"no-such-design.json"}, "ullage: 'no-such-design.json' is neither a command nor an existing file (try: ullage help)\n"},
	}
	for _, tt := range tests {
		code, out, errb := runMain(tt.args...)
		if code != 2 || out != "" || errb != tt.want {
			t.Errorf("ullage %q = %d, stdout %q, stderr %q; want 2, nothing, %q", tt.args, code, out, errb, tt.want)
		}
	}
}

func TestCommandsRunWithoutDisplay(t *testing.T) {
	code, out, errb := runMain("check", example)
	if code != 0 || !strings.Contains(out, "PASS") || errb != "" {
		t.Errorf("ullage check example = %d, stdout %q, stderr %q; want 0, a PASS, nothing on stderr", code, out, errb)
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
