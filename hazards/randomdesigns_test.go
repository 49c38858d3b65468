package hazards

import (
	"errors"
	"flag"
	"fmt"
	"math"
	"math/rand/v2"
	"runtime"
	"sync"
	"testing"

	"ullage/fluids"
)

// randomDesigns sets how many random valid designs TestRandomValidDesigns
// assesses: go test -tags ci ./hazards -run RandomValidDesigns -random-designs=1000000
var randomDesigns = flag.Int("random-designs", 300, "number of random valid designs for TestRandomValidDesigns")

// randomValidDesign draws a design over the whole accepted input range of one
// fluid, weighted towards the critical region where models are hardest.
// It may be invalid (overfilled, below freezing); the caller skips those.
func randomValidDesign(r *rand.Rand, sub *fluids.Substance) Design {
	tc, tmin := sub.CriticalTemperature(), sub.MinTemperature()
	u := func(lo, hi float64) float64 { return lo + (hi-lo)*r.Float64() }
	logu := func(lo, hi float64) float64 { return math.Exp(u(math.Log(lo), math.Log(hi))) }
	seal := u(tmin+1, math.Min(tc-5, 330))
	var hot float64
	switch r.IntN(4) {
	case 0:
		hot = tc + u(-1, 1) // the critical region
	case 1:
		hot = tc + u(-1e-6, 1e-6) // a hair from Tc
	default:
		hot = u(seal, math.Min(800, tc+150))
	}
	cold := u(tmin, math.Min(hot, seal))
	od := u(0.01, 0.12)
	wall := od / 2 * u(0.02, 0.3)
	parts := []Part{{Name: "bulb", Shape: ShapeSphere, OuterDiameterM: od, WallThicknessM: wall, WallToleranceM: wall * u(0, 0.3)}}
	if r.IntN(2) == 0 {
		tod := u(0.004, 0.04)
		tw := tod / 2 * u(0.05, 0.4)
		parts = append(parts, Part{Name: "tube", Shape: ShapeTube, OuterDiameterM: tod, WallThicknessM: tw, WallToleranceM: tw * u(0, 0.3), LengthM: u(0.01, 0.5)})
	}
	v := Vessel{Parts: parts}
	vol := v.PartsVolume()
	if r.IntN(3) == 0 {
		v.InternalVolumeM3 = vol * u(0.9, 1.1)
		vol = v.InternalVolumeM3
	}
	v.VolumeToleranceM3 = vol * u(0, 0.05)
	rhoC := sub.CriticalDensity()
	rhoSeal, _ := sub.SaturatedLiquidDensity(seal)
	fill := u(0.1*rhoC, math.Max(rhoSeal, 0.1*rhoC)) * vol
	if r.IntN(10) == 0 {
		fill = logu(1e-6, 1) * rhoC * vol // small fills, all vapour
	}
	residual := 0.0
	if r.IntN(2) == 0 {
		residual = logu(1, 2e5)
	}
	room := Room{VolumeM3: logu(1, 1e4), AirChangesPerHour: u(0, 20), MixingFactor: u(1, 20),
		NearFieldRadiusM: logu(0.05, 2), NearFieldAirSpeed: logu(0.005, 5), ExposureMinutes: u(1, 1440)}
	if n := NearFieldVolume(room.NearFieldRadiusM); n >= room.VolumeM3/2 {
		room.NearFieldRadiusM = math.Cbrt(room.VolumeM3 / 4 / (2.0 / 3.0 * math.Pi))
	}
	years := u(0.5, 30)
	glasses := []string{"soda-lime-annealed", "borosilicate-3.3"}
	return Design{
		Fluid: sub.Fluid().ID, FillMassKg: fill, FillMassToleranceKg: fill * u(0, 0.05), Vessel: v,
		SealingTemperatureK: seal, ResidualGasPressurePa: residual, HottestK: hot, ColdestK: cold,
		AmbientPressurePa: u(7e4, 1.1e5), Glass: GlassChoice{ID: glasses[r.IntN(len(glasses))]},
		ServiceLifeYears: years, HoursAtHottest: u(1, years*8766*0.5),
		Room: room, Criteria: DefaultCriteria(),
	}
}

// designTally counts the outcomes of assessing designs.
type designTally struct {
	valid, engineErrors, nonFinite, overBound int
	firstProblems                             []string
}

func (t *designTally) problem(s string) {
	if len(t.firstProblems) < 10 {
		t.firstProblems = append(t.firstProblems, s)
	}
}

// checkAssessment counts one design: an engine error (any error that is
// not bad input), a non-finite number in a result, or a concentration
// above the physical bounds.
func (t *designTally) check(d Design, lib *fluids.Library) {
	if d.Validate() != nil {
		return
	}
	a, err := Assess(d, lib)
	if err != nil {
		if errors.Is(err, ErrInvalidInput) {
			return
		}
		t.valid++
		t.engineErrors++
		t.problem(fmt.Sprintf("engine error for %s, fill %.4g kg/m³, hottest %.6f K: %v", d.Fluid, d.FillMassKg/d.Vessel.Volume(), d.HottestK, err))
		return
	}
	t.valid++
	if len(a.Findings) == 0 {
		t.engineErrors++
		t.problem(fmt.Sprintf("no findings for %s", d.Fluid))
	}
	nums := []float64{a.Hot.PressurePa, a.Cold.PressurePa, a.Hot.UllagePercent, a.BurstSafetyFactor, a.FailureProbability, a.ImplosionSafetyFactor,
		a.MaxSafe.TemperatureK, a.MaxSafe.FillMassKg, a.Rupture.StoredEnergyJ, a.Release.Peak.PPM, a.Release.STEL.PPM, a.Release.TWA8h.PPM, a.Release.PercentLFL}
	for _, f := range a.Findings {
		nums = append(nums, f.Value, f.Limit, f.Margin)
	}
	for _, x := range nums {
		if math.IsNaN(x) || math.IsInf(x, 0) {
			t.nonFinite++
			t.problem(fmt.Sprintf("non-finite result for %s, hottest %.6f K", d.Fluid, d.HottestK))
			break
		}
	}
	b := a.Release.Bound
	limit := math.Min(1e6, math.Min(b.SaturatedPPM, b.NearFieldPPM)) * (1 + 1e-9)
	over := a.Release.Peak.PPM > limit || a.Release.STEL.PPM > limit || a.Release.TWA8h.PPM > limit
	for _, l := range a.Release.Limits {
		over = over || l.Exposure.PPM > limit
	}
	if over {
		t.overBound++
		t.problem(fmt.Sprintf("concentration above the physical bound for %s: peak %.4g ppm, bound %.4g ppm", d.Fluid, a.Release.Peak.PPM, limit))
	}
}

// TestRandomValidDesigns assesses random valid designs over every fluid and
// the whole accepted input range, a quarter of them with the hottest
// temperature within 1 K of Tc and a quarter within a hair of it: every
// valid design must give findings, with no engine error, no NaN or
// infinity and no concentration above the physical bounds (common
// practice: a valid input always gets a verdict). The count is set by
// -random-designs; the same seed gives the same designs.
func TestRandomValidDesigns(t *testing.T) {
	lib := testLibrary(t)
	subs := lib.All()
	n := *randomDesigns
	workers := runtime.GOMAXPROCS(0)
	var mu sync.Mutex
	total := designTally{}
	var wg sync.WaitGroup
	for w := 0; w < workers; w++ {
		wg.Add(1)
		go func(w int) {
			defer wg.Done()
			r := rand.New(rand.NewPCG(20261202, uint64(w)))
			var tl designTally
			for tl.valid < n/workers+btoi(w < n%workers) {
				before := tl.valid
				tl.check(randomValidDesign(r, subs[r.IntN(len(subs))]), lib)
				if tl.valid != before && tl.valid%50000 == 0 {
					t.Logf("worker %d: %d valid designs so far: %d engine errors, %d non-finite, %d above the bounds", w, tl.valid, tl.engineErrors, tl.nonFinite, tl.overBound)
				}
			}
			mu.Lock()
			total.valid += tl.valid
			total.engineErrors += tl.engineErrors
			total.nonFinite += tl.nonFinite
			total.overBound += tl.overBound
			for _, p := range tl.firstProblems {
				total.problem(p)
			}
			mu.Unlock()
		}(w)
	}
	wg.Wait()
	t.Logf("%d valid designs: %d engine errors, %d with a non-finite result, %d with a concentration above the physical bounds",
		total.valid, total.engineErrors, total.nonFinite, total.overBound)
	if total.engineErrors+total.nonFinite+total.overBound > 0 {
		for _, p := range total.firstProblems {
			t.Error(p)
		}
	}
}

func btoi(b bool) int {
	if b {
		return 1
	}
	return 0
}
