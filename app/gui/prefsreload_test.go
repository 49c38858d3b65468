package gui

import (
	"bytes"
	"log"
	"strings"
	"testing"
)

func TestReloadNoiseFilter(t *testing.T) {
	const at = "  At: /root/go/pkg/mod/fyne.io/fyne/v2@v2.7.1/app/preferences.go:103"
	tests := []struct {
		name  string
		lines []string // each logged with its own Println, as the toolkit does
		want  string
	}{
		{"half-written file while running", []string{"Fyne error:  Preferences load error:", "  Cause: EOF", at}, ""},
		{"cut inside a value", []string{"Fyne error:  Preferences load error:", "  Cause: unexpected EOF", at}, ""},
		{"any other load error is kept", []string{"Fyne error:  Preferences load error:", "  Cause: invalid character 'x' looking for beginning of value", at},
			"Fyne error:  Preferences load error:\n  Cause: invalid character 'x' looking for beginning of value\n" + at + "\n"},
		{"other records pass", []string{"Fyne error:  Failed on saving preferences", "  Cause: EOF", at},
			"Fyne error:  Failed on saving preferences\n  Cause: EOF\n" + at + "\n"},
		{"lines around a dropped record pass", []string{"before", "Fyne error:  Preferences load error:", "  Cause: EOF", at, "after"},
			"before\nafter\n"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			var out bytes.Buffer
			l := log.New(&reloadNoiseFilter{w: &out}, "", 0)
			for _, line := range tt.lines {
				l.Println(line)
			}
			if out.String() != tt.want {
				t.Errorf("logged %q\ngot  %q\nwant %q", strings.Join(tt.lines, " | "), out.String(), tt.want)
			}
		})
	}
}
