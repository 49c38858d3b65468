package cli

import (
	"fmt"
	"io"

	"ullage/hazards/tolerance"
	"ullage/report/display"
)

// writeToleranceText prints a tolerance study in the display package's
// words, the same as the record's tolerance section and the window's
// study screen: what was drawn, the inputs that varied with their
// distributions and what their ± stands for, the fractions of units that
// fail, the spread of pressure and safety factor and the strongest driver.
func writeToleranceText(w io.Writer, r *tolerance.Result, sys display.System) {
	fmt.Fprintf(w, "\ntolerance study: %s\n", display.StudyAbout(r, sys))
	fmt.Fprintln(w, "  inputs that vary from unit to unit")
	for _, in := range display.StudyInputs(r, sys) {
		fmt.Fprintf(w, "    %-28s %s\n", in.Label, in.Line())
	}
	fmt.Fprintf(w, "  %s\n", display.PlusMinusNote)
	for _, f := range display.StudyFractions(r) {
		fmt.Fprintf(w, "  %-52s %s\n", f.Label, f.Value)
	}
	for _, sp := range display.StudySpread(r, sys) {
		fmt.Fprintf(w, "  %-52s %s\n", sp.Label+", "+display.Spread(display.Percentiles[0], display.Percentiles[2], display.Percentiles[4]),
			display.Spread(sp.P[0], sp.P[2], sp.P[4]))
	}
	fmt.Fprintf(w, "  %-52s %s\n", display.StrongestDriverLabel, display.StrongestDriver(r.Sensitivity))
	if display.WallLowersMargin(r.Sensitivity) {
		fmt.Fprintf(w, "  %s\n", display.WallVolumeNote)
	}
}
