package display

import (
	"strconv"
	"strings"
	"unicode"
	"unicode/utf8"

	"ullage/hazards"
	"ullage/hazards/tolerance"
)

// Row is one labelled line of a result: what it is and its value, in
// words.
type Row struct {
	Label, Value string
}

// StudyInput is one input a tolerance study varied, in words: its label,
// its distribution (with what its ± stands for), its nominal value and
// its ± spread (or, for the glass strength, its Weibull modulus).
type StudyInput struct {
	Label, Distribution, Nominal, Spread string
}

// Line is the input's nominal value, spread and distribution on one
// line, as the window and the command line list them: "30 g, ± 0.5 g
// (Normal, ± is 3σ)". The glass strength's modulus already names its
// distribution: "35.33 MPa, Weibull modulus 7".
func (in StudyInput) Line() string {
	if in.Distribution == DistributionWords(tolerance.Weibull) {
		return in.Nominal + ", " + in.Spread
	}
	return in.Nominal + ", " + in.Spread + " (" + in.Distribution + ")"
}

// StudyInputs words the inputs a study varied, in the reader's units:
// nominal values and spreads are stated values (System.Input), the
// hottest temperature's spread a temperature difference.
func StudyInputs(r *tolerance.Result, s System) []StudyInput {
	out := make([]StudyInput, 0, len(r.Inputs))
	for _, in := range r.Inputs {
		q := studyQuantity(in.Key)
		si := StudyInput{Label: Capitalised(in.Label), Distribution: DistributionWords(in.Distribution), Nominal: s.Input(q, in.Nominal)}
		switch {
		case in.Distribution == tolerance.Weibull:
			si.Spread = "Weibull modulus " + Stated(in.Shape)
		case q == Temperature:
			si.Spread = "± " + s.Input(TempDifference, in.PlusMinus)
		default:
			si.Spread = "± " + s.Input(q, in.PlusMinus)
		}
		out = append(out, si)
	}
	return out
}

// studyQuantity is the quantity of a varied input, from its key.
func studyQuantity(key string) Quantity {
	switch {
	case key == tolerance.KeyFillMass:
		return Mass
	case key == tolerance.KeyVolume:
		return VesselVolume
	case key == tolerance.KeyHottest:
		return Temperature
	case key == tolerance.KeyGlassStrength:
		return Stress
	case hazards.IsPartField(key) && strings.HasSuffix(key, "."+hazards.PartWallThickness):
		return Length
	}
	return Plain
}

// Capitalised returns s with its first letter in upper case.
func Capitalised(s string) string {
	r, n := utf8.DecodeRuneInString(s)
	if n == 0 {
		return s
	}
	return string(unicode.ToUpper(r)) + s[n:]
}

// StudyFractions words what a study counted, in the order every output
// prints it: the units that go liquid-full, burst and release too much
// (each with its 95 % interval), the expected burst fraction, and the
// units that could not be sealed or were computed outside a correlation's
// range, when there are any.
func StudyFractions(r *tolerance.Result) []Row {
	rows := []Row{
		{"Liquid-full below their hottest temperature", Proportion(r.LiquidFullFraction)},
		{"Burst over the service life", Proportion(r.BurstFraction)},
	}
	if r.ExposureLimited {
		rows = append(rows, Row{"Release above a governing exposure limit", Proportion(r.ExposureExceedFraction)})
	} else {
		rows = append(rows, Row{"Release above a governing exposure limit", "not assessed: no published numeric limit applies to this fluid"})
	}
	rows = append(rows, Row{"Expected burst fraction", Number(r.MeanFailureProbability, ValueFigures) + " (each unit's failure probability with the strength integrated out)"})
	if r.UnsealableUnits > 0 {
		rows = append(rows, Row{"Units that could not be sealed", Units(r.UnsealableUnits) + ": their fill would not fit as liquid; counted as liquid-full and burst"})
	}
	if r.ExtrapolatedUnits > 0 {
		rows = append(rows, Row{"Outside a correlation's range ‡", Units(r.ExtrapolatedUnits) + ": the fractions are estimates to confirm by test"})
	}
	return rows
}

// SpreadRow is one quantity's spread over a study's units: its label and
// its 1st, 5th, 50th, 95th and 99th percentiles in words.
type SpreadRow struct {
	Label string
	P     [5]string
}

// Percentiles names the columns of a SpreadRow.
var Percentiles = [5]string{"P1", "P5", "P50", "P95", "P99"}

// StudySpread words the spread of the units' pressure at their hottest
// temperature (absolute) and of their safety factor ([SafetyFactor]).
func StudySpread(r *tolerance.Result, s System) []SpreadRow {
	row := func(label string, p tolerance.Percentiles, f func(float64) string) SpreadRow {
		return SpreadRow{label, [5]string{f(p.P1), f(p.P5), f(p.P50), f(p.P95), f(p.P99)}}
	}
	return []SpreadRow{
		row("Pressure at the hottest (absolute)", r.PressurePa, func(x float64) string { return s.Format(Pressure, x) }),
		row("Unit safety factor", r.SafetyFactor, SafetyFactor),
	}
}

// DriversNote says how the drivers of the margin were ranked, over how
// many units, and how to read the bars; with a wall among the drivers
// that lower the margin it adds [WallVolumeNote].
func DriversNote(ds []tolerance.Driver, units int) string {
	note := "Spearman rank correlation of each input with the unit safety factor over the first " + Units(units) +
		", strongest first (Spearman, Am. J. Psychol. 15, 72 (1904)). A bar to the left means a larger value lowers the margin: tighten those tolerances first; a bar to the right means it raises the margin."
	if WallLowersMargin(ds) {
		note += " " + WallVolumeNote
	}
	return note
}

// StudyAbout says in one sentence what a study drew: "2000 units, seed 7;
// hottest temperature ± 5.0 K (Normal, ± is 3σ); fill, volume and walls
// Normal, ± is 3σ."
func StudyAbout(r *tolerance.Result, s System) string {
	hot := "every unit at the design's hottest temperature"
	if r.HottestSpreadK > 0 {
		hot = "hottest temperature ± " + s.Input(TempDifference, r.HottestSpreadK) + " (" + DistributionWords(r.HottestDistribution) + ")"
	}
	return Units(r.Samples) + ", seed " + strconv.FormatUint(r.Seed, 10) + "; " + hot + "; fill, volume and walls " + DistributionWords(r.DimensionDistribution) + "."
}
