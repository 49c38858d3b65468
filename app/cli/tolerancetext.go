package cli

import (
	"fmt"
	"io"

	"ullage/hazards/tolerance"
	"ullage/report/display"
)

// writeToleranceText prints a tolerance study's fractions, its strongest
// driver and what its ± stands for, in the display package's words (the
// same as the record's tolerance section).
func writeToleranceText(w io.Writer, r *tolerance.Result) {
	fmt.Fprintf(w, "\ntolerance study: %d units, seed %d\n", r.Samples, r.Seed)
	fmt.Fprintf(w, "  liquid-full below the hottest  %s\n", display.Proportion(r.LiquidFullFraction))
	fmt.Fprintf(w, "  burst over the service life    %s\n", display.Proportion(r.BurstFraction))
	if r.ExposureLimited {
		fmt.Fprintf(w, "  release above a limit          %s\n", display.Proportion(r.ExposureExceedFraction))
	}
	fmt.Fprintf(w, "  strongest driver of the margin %s\n", display.StrongestDriver(r.Sensitivity))
	if display.WallLowersMargin(r.Sensitivity) {
		fmt.Fprintf(w, "  %s\n", display.WallVolumeNote)
	}
	fmt.Fprintf(w, "  %s\n", display.PlusMinusNote)
}
