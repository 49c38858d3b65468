package cli

import (
	"path/filepath"
	"strings"
	"testing"

	"ullage/report/display"
)

// TestToleranceStudyText: the text of a tolerance study says what ± stands
// for, explains a wall that lowers the margin (revision A of the example:
// a thicker wall shrinks the volume of a nearly liquid-full vessel), says
// in words when nothing moves the margin (revision B, never loaded) and
// prints no e-notation.
func TestToleranceStudyText(t *testing.T) {
	example := filepath.Join("..", "..", "assets", "examples", "tidemark-lantern.json")
	for _, c := range []struct {
		rev  string
		want []string
	}{
		{"A", []string{display.PlusMinusNote, display.WallVolumeNote, "wall of lower bulb (rank correlation −"}},
		{"B", []string{display.PlusMinusNote, display.StrongestDriverLabel, "none: no varied input moves the safety factor"}},
	} {
		_, out, errs := run("check", "--samples", "1000", "--rev", c.rev, example)
		if errs != "" {
			t.Fatalf("revision %s: %s", c.rev, errs)
		}
		for _, w := range c.want {
			if !strings.Contains(out, w) {
				t.Errorf("revision %s: %q missing from\n%s", c.rev, w, out)
			}
		}
		if strings.Contains(out, "e+") || strings.Contains(out, "e-0") || strings.Contains(out, "+0.00") {
			t.Errorf("revision %s: e-notation or a bare +0.00 in\n%s", c.rev, out)
		}
	}
}
