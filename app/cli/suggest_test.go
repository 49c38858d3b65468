package cli

import (
	"bytes"
	"strings"
	"testing"
)

func TestUnknownCommand(t *testing.T) {
	tests := []struct {
		word, want string
	}{
		{"chekc", "ullage: unknown command 'chekc'; did you mean 'check'?\n"},
		{"chek", "ullage: unknown command 'chek'; did you mean 'check'?\n"},
		{"Check", "ullage: unknown command 'Check'; did you mean 'check'?\n"},
		{"compre", "ullage: unknown command 'compre'; did you mean 'compare'?\n"},
		{"fluid", "ullage: unknown command 'fluid'; did you mean 'fluids'?\n"},
		{"fluidstate", "ullage: unknown command 'fluidstate'; did you mean 'fluid-state'?\n"},
		{"verison", "ullage: unknown command 'verison'; did you mean 'version'?\n"},
		{"frobnicate", "ullage: unknown command 'frobnicate' (try: ullage help)\n"},
		{"lamp.json", "ullage: 'lamp.json' is neither a command nor an existing file (try: ullage help)\n"},
		{"designs/lamp", "ullage: 'designs/lamp' is neither a command nor an existing file (try: ullage help)\n"},
	}
	for _, tt := range tests {
		var out, errb bytes.Buffer
		code := Run([]string{tt.word}, &out, &errb)
		if code != ExitUsage || errb.String() != tt.want || out.Len() != 0 {
			t.Errorf("Run(%q) = %d, stdout %q, stderr %q; want %d, no stdout, stderr %q",
				tt.word, code, out.String(), errb.String(), ExitUsage, tt.want)
		}
	}
}

func TestEditDistance(t *testing.T) {
	// Expected values counted by hand.
	tests := []struct {
		a, b string
		want int
	}{
		{"check", "check", 0},
		{"chekc", "check", 1}, // one swap
		{"chk", "check", 2},   // two insertions
		{"", "state", 5},
		{"help", "", 4},
		{"compare", "compre", 1},
	}
	for _, tt := range tests {
		if got := editDistance(tt.a, tt.b); got != tt.want {
			t.Errorf("editDistance(%q, %q) = %d, want %d", tt.a, tt.b, got, tt.want)
		}
	}
}

func TestCommandsAreFarApart(t *testing.T) {
	// A suggestion is only unambiguous if no two commands are within the
	// typo distance of each other.
	var names []string
	for name := range commands() {
		names = append(names, name)
	}
	for i, a := range names {
		for _, b := range names[i+1:] {
			if d := editDistance(a, b); d <= maxTypoDistance {
				t.Errorf("commands %q and %q are %d edits apart: a typo of one could suggest the other", a, b, d)
			}
		}
	}
}

// TestOldPropertyCommandIsGone: the saturation-state command has one
// name, fluid-state; the name it had before is not a command.
func TestOldPropertyCommandIsGone(t *testing.T) {
	var out, errb bytes.Buffer
	code := Run([]string{"props", "ethanol", "--temp-c", "20"}, &out, &errb)
	if code != ExitUsage || !strings.Contains(errb.String(), "unknown command 'props'") || out.Len() != 0 {
		t.Errorf("Run(props …) = %d, stdout %q, stderr %q; want an unknown command", code, out.String(), errb.String())
	}
}
