package display

import (
	"math"
	"strconv"
	"strings"
	"time"

	"ullage/hazards"
	"ullage/hazards/tolerance"
)

// PlusMinusNote says what the ± of a tolerance study stands for, in the
// words the window, the record and the command line share.
const PlusMinusNote = "A ± tolerance is read as three standard deviations (3σ) of a normal distribution, so about 99.7 % of units lie within it; for a uniform or triangular distribution it is the half-width."

// WallVolumeNote explains in one line why a thicker wall can lower the
// margin: the parts are given by their outside size, so the wall takes
// its thickness from the inside.
const WallVolumeNote = "A thicker wall can lower the margin: the outside size is fixed, so a thicker wall shrinks the internal volume and the same fill leaves less free space (ullage), and the vessel goes liquid-full sooner."

// noDriverWords says that no varied input moves the margin.
const noDriverWords = "none: no varied input moves the safety factor (every rank correlation rounds to zero)"

// driverFloor is the smallest rank correlation that prints as other than
// +0.00: below it an input does not move the margin at two decimals.
const driverFloor = 0.005

// DistributionWords names a study's distribution and what its ± stands
// for, the words of the window's choices, the record's table and the
// command line: "Normal, ± is 3σ", "Uniform, ± is the half-width",
// "Triangular, peak at the design, ± is the half-width", "Weibull".
func DistributionWords(dist string) string {
	switch dist {
	case tolerance.Normal:
		return "Normal, ± is 3σ"
	case tolerance.Uniform:
		return "Uniform, ± is the half-width"
	case tolerance.Triangle:
		return "Triangular, peak at the design, ± is the half-width"
	case tolerance.Weibull:
		return "Weibull"
	}
	return dist
}

// Share formats a fraction (0.507) as a percentage ("50.7 %") by
// [Number]'s rule for results; 0 is "0 %".
func Share(fraction float64) string {
	return Number(100*fraction, ValueFigures) + " %"
}

// groupSeparator stands between groups of three digits: a no-break
// space, which the window's and the record's fonts both have (the Go
// fonts of the record have no narrow one, U+202F).
const groupSeparator = '\u00a0'

// Count writes a count with its digits in groups of three ("100 000",
// "1 250 000"), a negative one with a true minus; up to 9999 it is
// written whole, "2000", as counts usually are.
func Count(n int) string {
	s := strconv.Itoa(n)
	neg := strings.HasPrefix(s, "-")
	s = strings.TrimPrefix(s, "-")
	if len(s) > 4 {
		var b strings.Builder
		for i, c := range s {
			if i > 0 && (len(s)-i)%3 == 0 {
				b.WriteRune(groupSeparator)
			}
			b.WriteRune(c)
		}
		s = b.String()
	}
	if neg {
		return "−" + s
	}
	return s
}

// Units words a number of units: "1 unit", "100 000 units".
func Units(n int) string {
	if n == 1 {
		return "1 unit"
	}
	return Count(n) + " units"
}

// Agree returns the verb of a count: one for 1, many otherwise
// (Agree(1, "is", "are") is "is").
func Agree(n int, one, many string) string {
	if n == 1 {
		return one
	}
	return many
}

// Duration words the time a piece of work took: two significant figures
// of seconds below a minute ("0.42 s", "3.1 s"), whole minutes and
// seconds above ("2 min 5 s").
func Duration(d time.Duration) string {
	sec := d.Seconds()
	if sec < 59.5 {
		return Number(sec, MarginFigures) + " s"
	}
	whole := int(math.Round(sec))
	return strconv.Itoa(whole/60) + " min " + strconv.Itoa(whole%60) + " s"
}

// Proportion words a counted fraction of the sampled units with its 95 %
// interval: "441 of 2000 units (22.1 %, 95 % interval 20.3 – 23.9 %)".
func Proportion(p tolerance.Proportion) string {
	return Count(p.Count) + " of " + Units(p.Total) + " (" + Share(p.Estimate) +
		", 95 % interval " + Number(100*p.Low, ValueFigures) + " – " + Share(p.High) + ")"
}

// Spread joins percentiles already in words, or their names: "a / b / c".
func Spread(p ...string) string {
	return strings.Join(p, " / ")
}

// StrongestDriverLabel labels [StrongestDriver]'s words.
const StrongestDriverLabel = "Strongest driver of the safety factor"

// Correlation formats a rank correlation with its sign and two decimals
// ("−0.71", "+0.15"), and one that rounds to zero as "0.00".
func Correlation(r float64) string {
	s := Fixed(r, 2)
	if s == NoValue || s == "0.00" || strings.HasPrefix(s, "−") {
		return s
	}
	return "+" + s
}

// StrongestDriver words the input that moves the units' safety factor
// most, with its rank correlation, or says in words that none does.
func StrongestDriver(ds []tolerance.Driver) string {
	if len(ds) == 0 || !(math.Abs(ds[0].RankCorrelation) >= driverFloor) {
		return noDriverWords
	}
	d := ds[0]
	way := "a larger value raises the margin"
	if d.RankCorrelation < 0 {
		way = "a larger value lowers the margin"
	}
	return d.Label + " (rank correlation " + Correlation(d.RankCorrelation) + ": " + way + ")"
}

// DriversMoved reports whether any varied input moves the safety factor
// at two decimals of rank correlation.
func DriversMoved(ds []tolerance.Driver) bool {
	for _, d := range ds {
		if math.Abs(d.RankCorrelation) >= driverFloor {
			return true
		}
	}
	return false
}

// WallLowersMargin reports whether a wall thickness is among the drivers
// that lower the margin as they grow, the case [WallVolumeNote] explains.
func WallLowersMargin(ds []tolerance.Driver) bool {
	for _, d := range ds {
		if hazards.IsPartField(d.Key) && strings.HasSuffix(d.Key, "."+hazards.PartWallThickness) && d.RankCorrelation <= -driverFloor {
			return true
		}
	}
	return false
}
