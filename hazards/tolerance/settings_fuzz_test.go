package tolerance

import (
	"errors"
	"math"
	"strings"
	"testing"

	"ullage/hazards"
)

// FuzzSettings: the tolerance study's settings are either refused with an
// *hazards.InputError naming a settings field, or resolved to values
// within their documented ranges.
func FuzzSettings(f *testing.F) {
	f.Add(1000, uint64(1), 0, 5.0, "", "", 0)
	f.Add(0, uint64(0), -1, math.NaN(), "triangle", "uniform", -5)
	f.Add(MaxSamples+1, uint64(math.MaxUint64), 2000, math.Inf(1), "Normal", "weird", MaxSamples+1)
	f.Add(1, uint64(7), 1024, 100.0, Uniform, Normal, 1)
	f.Fuzz(func(t *testing.T, samples int, seed uint64, workers int, spread float64, hotDist, dimDist string, sens int) {
		s := Settings{Samples: samples, Seed: seed, Workers: workers, HottestSpreadK: spread,
			HottestDistribution: hotDist, DimensionDistribution: dimDist, SensitivityUnits: sens}
		r, err := s.resolved()
		if err != nil {
			var ie *hazards.InputError
			if !errors.As(err, &ie) || !strings.HasPrefix(ie.Field, "settings.") || ie.Want == "" {
				t.Fatalf("error %v does not name a settings field", err)
			}
			return
		}
		switch {
		case r.Samples < 1 || r.Samples > MaxSamples:
			t.Errorf("samples %d", r.Samples)
		case r.Workers < 1 || r.Workers > 1024:
			t.Errorf("workers %d", r.Workers)
		case !(r.HottestSpreadK >= 0 && r.HottestSpreadK <= 100):
			t.Errorf("spread %g", r.HottestSpreadK)
		case r.HottestDistribution != Normal && r.HottestDistribution != Uniform && r.HottestDistribution != Triangle:
			t.Errorf("hottest distribution %q", r.HottestDistribution)
		case r.DimensionDistribution != Normal && r.DimensionDistribution != Uniform:
			t.Errorf("dimension distribution %q", r.DimensionDistribution)
		case r.SensitivityUnits < 1 || r.SensitivityUnits > r.Samples:
			t.Errorf("sensitivity units %d of %d", r.SensitivityUnits, r.Samples)
		}
	})
}
