package hazards

import (
	"bufio"
	"crypto/sha256"
	"encoding/hex"
	"encoding/json"
	"flag"
	"fmt"
	"math"
	"math/rand/v2"
	"os"
	"path/filepath"
	"runtime"
	"strings"
	"sync"
	"testing"

	"ullage/fluids"
)

// updateDigests rewrites testdata/assess_digests.txt from the current
// engine: only on purpose, when a change to the results is intended.
var updateDigests = flag.Bool("update-digests", false, "rewrite testdata/assess_digests.txt from the current results (only on purpose)")

// digestDesigns is how many random designs TestAssessDigests checks.
const digestDesigns = 2000

const digestFile = "testdata/assess_digests.txt"

// digestDesign is randomValidDesign with, now and then, a thermal shock,
// a seal stress, chosen limit sets and limit bodies, so that every part
// of the assessment is reached.
func digestDesign(r *rand.Rand, sub *fluids.Substance) Design {
	d := randomValidDesign(r, sub)
	if r.IntN(3) == 0 {
		d.ThermalShock = ThermalShock{HotToColdK: 1 + 99*r.Float64(), ColdToHotK: float64(r.IntN(2)) * 80 * r.Float64()}
	}
	if r.IntN(4) == 0 {
		p := d.Vessel.Parts[r.IntN(len(d.Vessel.Parts))]
		if r.IntN(2) == 0 {
			d.SealStress = SealStress{Part: p.Name, ResidualStressPa: 1e6 + 9e6*r.Float64()}
		} else {
			d.SealStress = SealStress{Part: p.Name, RetardationM: 1e-7 * (0.5 + 3*r.Float64()), PathLengthM: p.WallThicknessM}
		}
	}
	sets := LimitSetIDs()
	if r.IntN(3) == 0 {
		for _, s := range sets {
			if r.IntN(2) == 0 {
				d.Criteria.LimitSets = append(d.Criteria.LimitSets, s)
			}
		}
	}
	if r.IntN(4) == 0 {
		for _, b := range []string{"NIOSH", "OSHA", "EPA", "AIHA", "ACGIH"} {
			if r.IntN(2) == 0 {
				d.Criteria.LimitBodies = append(d.Criteria.LimitBodies, b)
			}
		}
	}
	return d
}

// assessmentDigest is the first 16 hex digits of the SHA-256 of
// everything an assessment of d gives: the error, or the whole result
// as JSON, its calculation record, and the vessel's states and the
// release's concentrations where the charts read them.
func assessmentDigest(t *testing.T, d Design, lib *fluids.Library) string {
	h := sha256.New()
	a, err := Assess(d, lib)
	if err != nil {
		fmt.Fprintf(h, "error: %v", err)
		return hex.EncodeToString(h.Sum(nil))[:16]
	}
	e := json.NewEncoder(h)
	if err := e.Encode(a); err != nil {
		t.Errorf("%s: the result as JSON: %v", d.Fluid, err)
	}
	if err := e.Encode(a.Trace()); err != nil {
		t.Errorf("%s: the record as JSON: %v", d.Fluid, err)
	}
	tc := a.vessel.fluid.CriticalTemperature()
	for _, temp := range []float64{d.ColdestK, (d.ColdestK + d.HottestK) / 2, d.HottestK, tc - 0.5, tc, tc + 0.5, d.HottestK + 40} {
		st, err := a.StateAt(temp)
		fmt.Fprintf(h, "%v %v\n", err, math.Float64bits(temp))
		if err == nil {
			if err := e.Encode(st); err != nil {
				t.Errorf("%s: a state as JSON: %v", d.Fluid, err)
			}
		}
	}
	for _, z := range []Zone{WellMixedRoom, NearField} {
		for _, s := range []float64{1, 60, 600, 3600, 8 * 3600} {
			fmt.Fprintf(h, "%x\n", math.Float64bits(a.Concentration(z, s)))
		}
	}
	return hex.EncodeToString(h.Sum(nil))[:16]
}

// TestAssessDigests assesses random designs over every fluid and the
// whole accepted input range and holds each full result, bit for bit, to
// the digest stored in testdata: a change meant only to make the engine
// faster must leave every result as it was. Rewrite the digests with
// -update-digests only when a change to the results is intended.
func TestAssessDigests(t *testing.T) {
	lib := testLibrary(t)
	subs := lib.All()
	r := rand.New(rand.NewPCG(20261202, 16))
	designs := make([]Design, digestDesigns)
	for i := range designs {
		designs[i] = digestDesign(r, subs[r.IntN(len(subs))])
	}
	// The designs are drawn in order and assessed on every core.
	got := make([]string, digestDesigns)
	var wg sync.WaitGroup
	workers := runtime.GOMAXPROCS(0)
	for w := range workers {
		wg.Add(1)
		go func() {
			defer wg.Done()
			for i := w; i < len(designs); i += workers {
				got[i] = assessmentDigest(t, designs[i], lib)
			}
		}()
	}
	wg.Wait()
	if *updateDigests {
		if err := os.WriteFile(digestFile, []byte(strings.Join(got, "\n")+"\n"), 0o644); err != nil {
			t.Fatal(err)
		}
		return
	}
	f, err := os.Open(filepath.FromSlash(digestFile))
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	var want []string
	sc := bufio.NewScanner(f)
	for sc.Scan() {
		want = append(want, sc.Text())
	}
	if err := sc.Err(); err != nil {
		t.Fatal(err)
	}
	if len(want) != len(got) {
		t.Fatalf("%s holds %d digests, want %d", digestFile, len(want), len(got))
	}
	changed := 0
	for i := range got {
		if got[i] != want[i] {
			if changed < 10 {
				t.Errorf("design %d: result digest %s, stored %s", i, got[i], want[i])
			}
			changed++
		}
	}
	if changed > 0 {
		t.Errorf("%d of %d results changed", changed, len(got))
	}
}
