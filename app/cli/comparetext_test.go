package cli

import (
	"path/filepath"
	"strings"
	"testing"
)

// TestCompareTextUnitsAndLabels: compare prints inputs under the record's
// labels in the chosen units, never as raw JSON paths in base units, says
// "no burst load" where revision B carries none (never a probability of
// 0) and counts the inputs it lists.
func TestCompareTextUnitsAndLabels(t *testing.T) {
	example := filepath.Join("..", "..", "assets", "examples", "tidemark-lantern.json")
	for _, c := range []struct {
		units      string
		want, none []string
	}{
		{"si", []string{"Fill mass 28.3 g ± 0.3 g → 21 g ± 0.3 g", "Glass Soda-lime-silica glass, annealed → Borosilicate", "5 inputs differ",
			"Failure probability over the service life 3.3 × 10⁻⁹ → no burst load", "Burst safety factor 16.3 → no burst load"},
			[]string{"fill_mass_kg", "wall_thickness_m", "°F"}},
		{"us", []string{"Fill mass 0.9983 oz ± 0.01058 oz → 0.7408 oz ± 0.01058 oz", "°F", "psi", "5 inputs differ"},
			[]string{"fill_mass_kg", " kg", "°C", "kPa"}},
	} {
		_, out, errs := run("compare", example, "--rev", "A", "--rev", "B", "--units", c.units)
		if errs != "" {
			t.Fatalf("%s: %s", c.units, errs)
		}
		flat := strings.Join(strings.Fields(out), " ")
		for _, w := range c.want {
			if !strings.Contains(flat, w) {
				t.Errorf("%s: %q missing from\n%s", c.units, w, out)
			}
		}
		for _, w := range c.none {
			if strings.Contains(out, w) {
				t.Errorf("%s: %q printed in\n%s", c.units, w, out)
			}
		}
		lines := 0
		_, inputs, _ := strings.Cut(out, "inputs differ.\n")
		inputs, _, _ = strings.Cut(inputs, "\n\n")
		for _, l := range strings.Split(inputs, "\n") {
			if strings.Contains(l, "→") {
				lines++
			}
		}
		if lines != 5 {
			t.Errorf("%s: %d input lines, the count says 5", c.units, lines)
		}
	}
}
