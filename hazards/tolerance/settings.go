package tolerance

import (
	"fmt"
	"math"
	"runtime"
	"time"

	"ullage/hazards"
)

// Distribution names for Settings.
const (
	// Normal: the design's ± tolerance (or the study's spread) is taken as
	// three standard deviations, σ = ±/3, the usual reading of a
	// manufacturing tolerance as the ±3σ limits of a capable process
	// (common practice). Draws outside the physical range are drawn again,
	// which truncates the tails (see Settings).
	Normal = "normal"
	// Uniform: every value within ± is equally likely (half-width = ±).
	Uniform = "uniform"
	// Triangle: the triangular distribution from nominal − ± to nominal + ±
	// with its mode at the nominal value. Only for the hottest temperature.
	Triangle = "triangle"
)

// Limits on the study size.
const (
	// MaxSamples bounds Settings.Samples: Run keeps two numbers per unit
	// (16 bytes), so this is 160 MB.
	MaxSamples = 10_000_000
	// DefaultSensitivityUnits is the number of units the rank correlations
	// are computed on when Settings.SensitivityUnits is 0; the standard
	// error of a rank correlation near zero is about 1/√n, here 0.007.
	DefaultSensitivityUnits = 20_000
)

// Settings are the study's own inputs. The zero value of every field but
// Samples is usable.
type Settings struct {
	// Samples is the number of units drawn, 1 to MaxSamples.
	Samples int `json:"samples"`
	// Seed selects the random streams; the same seed gives the same result.
	Seed uint64 `json:"seed"`
	// Workers is the number of goroutines; 0 means runtime.NumCPU(). It
	// never changes the result.
	Workers int `json:"workers"`
	// HottestSpreadK is the ± spread of the hottest temperature about the
	// design's HottestK, in kelvin; 0 keeps it fixed.
	HottestSpreadK float64 `json:"hottest_spread_k"`
	// HottestDistribution is Normal, Uniform or Triangle ("" means Normal).
	HottestDistribution string `json:"hottest_distribution"`
	// DimensionDistribution is Normal or Uniform ("" means Normal) and
	// applies to the fill mass, the internal volume and the walls.
	DimensionDistribution string `json:"dimension_distribution"`
	// SensitivityUnits is how many of the first units the rank
	// correlations use; 0 means DefaultSensitivityUnits (or Samples when
	// fewer).
	SensitivityUnits int `json:"sensitivity_units"`

	// Progress, when not nil, is told how many of the total units are
	// done while the study runs: at most every ProgressInterval, from one
	// goroutine at a time, with done never falling, and once with done =
	// total when every unit is done. Run makes no call after it returns.
	// It is not an input: it never changes the result.
	Progress func(done, total int) `json:"-"`
}

// ProgressInterval is the shortest time between two Settings.Progress
// calls while a study runs.
const ProgressInterval = 250 * time.Millisecond

// resolved returns the settings with defaults filled in, or an
// *hazards.InputError naming the field, the value and what is acceptable.
func (s Settings) resolved() (Settings, error) {
	bad := func(field string, v any, want string) error {
		return &hazards.InputError{Field: "settings." + field, Value: fmt.Sprint(v), Want: want}
	}
	if s.Samples < 1 || s.Samples > MaxSamples {
		return s, bad("samples", s.Samples, fmt.Sprintf("must be from 1 to %d", MaxSamples))
	}
	if s.Workers < 0 || s.Workers > 1024 {
		return s, bad("workers", s.Workers, "must be from 0 (one per CPU) to 1024")
	}
	if s.Workers == 0 {
		s.Workers = runtime.NumCPU()
	}
	if math.IsNaN(s.HottestSpreadK) || s.HottestSpreadK < 0 || s.HottestSpreadK > 100 {
		return s, bad("hottest_spread_k", s.HottestSpreadK, "must be from 0 to 100 K")
	}
	switch s.HottestDistribution {
	case "":
		s.HottestDistribution = Normal
	case Normal, Uniform, Triangle:
	default:
		return s, bad("hottest_distribution", fmt.Sprintf("%q", s.HottestDistribution), fmt.Sprintf("must be %q, %q or %q", Normal, Uniform, Triangle))
	}
	switch s.DimensionDistribution {
	case "":
		s.DimensionDistribution = Normal
	case Normal, Uniform:
	default:
		return s, bad("dimension_distribution", fmt.Sprintf("%q", s.DimensionDistribution), fmt.Sprintf("must be %q or %q", Normal, Uniform))
	}
	if s.SensitivityUnits < 0 || s.SensitivityUnits > MaxSamples {
		return s, bad("sensitivity_units", s.SensitivityUnits, fmt.Sprintf("must be from 0 (the default, %d) to %d", DefaultSensitivityUnits, MaxSamples))
	}
	if s.SensitivityUnits == 0 {
		s.SensitivityUnits = DefaultSensitivityUnits
	}
	s.SensitivityUnits = min(s.SensitivityUnits, s.Samples)
	return s, nil
}
