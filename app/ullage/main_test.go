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
