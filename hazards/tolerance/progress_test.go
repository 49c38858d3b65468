package tolerance

import (
	"context"
	"reflect"
	"sync/atomic"
	"testing"
	"time"
)

// progressLog records the calls of a Settings.Progress and fails the test
// for one made after Run returned.
type progressLog struct {
	t        *testing.T
	returned atomic.Bool
	calls    [][2]int
}

func (l *progressLog) report(done, total int) {
	if l.returned.Load() {
		l.t.Errorf("progress %d of %d reported after Run returned", done, total)
	}
	l.calls = append(l.calls, [2]int{done, total})
}

// ticking returns a tick channel that ticks as fast as it is read until
// stop is called.
func ticking() (<-chan time.Time, func()) {
	tick := make(chan time.Time)
	quit := make(chan struct{})
	go func() {
		for {
			select {
			case tick <- time.Time{}:
			case <-quit:
				return
			}
		}
	}()
	return tick, func() { close(quit) }
}

// With ticks as fast as the study can take them, progress rises in whole
// chunks (the last, short one counted when it is done, perhaps before
// others), never falls, ends with the total,
// comes only while Run runs, and leaves the result as it is without it,
// on one worker and on several.
func TestProgressRisesToTheTotal(t *testing.T) {
	lib := testLibrary(t)
	d := loadDesign(t, "weak_bulb.json")
	const samples = 6*ChunkUnits + 123
	plain, err := Run(context.Background(), d, lib, Settings{Samples: samples, Seed: 3, Workers: 1})
	if err != nil {
		t.Fatal(err)
	}
	for _, workers := range []int{1, 3} {
		log := &progressLog{t: t}
		tick, stop := ticking()
		r, err := run(context.Background(), d, lib, Settings{Samples: samples, Seed: 3, Workers: workers, Progress: log.report}, tick)
		log.returned.Store(true)
		stop()
		if err != nil {
			t.Fatal(err)
		}
		if !reflect.DeepEqual(r, plain) {
			t.Errorf("%d workers: the result with progress differs from the one without", workers)
		}
		if len(log.calls) == 0 || log.calls[len(log.calls)-1] != [2]int{samples, samples} {
			t.Fatalf("%d workers: calls %v; want the last to be %d of %d", workers, log.calls, samples, samples)
		}
		prev := -1
		for _, c := range log.calls {
			done, total := c[0], c[1]
			if rest := done % ChunkUnits; total != samples || done < prev || done > total || (rest != 0 && rest != samples%ChunkUnits) {
				t.Errorf("%d workers: progress %v after %d: want whole chunks rising to %d", workers, log.calls, prev, samples)
				break
			}
			prev = done
		}
		t.Logf("%d workers: %d progress calls", workers, len(log.calls))
	}
}

// A cancelled study reports no total and nothing after Run returns; with
// no ticks at all the only call is the total.
func TestProgressCancelledAndUnticked(t *testing.T) {
	lib := testLibrary(t)
	d := loadDesign(t, "weak_bulb.json")
	ctx, cancel := context.WithCancel(context.Background())
	log := &progressLog{t: t}
	tick, stop := ticking()
	s := Settings{Samples: 200 * ChunkUnits, Seed: 3, Workers: 2, Progress: func(done, total int) {
		log.report(done, total)
		cancel() // stop at the first report
	}}
	_, err := run(ctx, d, lib, s, tick)
	log.returned.Store(true)
	stop()
	if err == nil {
		t.Fatal("a cancelled study finished")
	}
	for _, c := range log.calls {
		if c[0] == c[1] {
			t.Errorf("a cancelled study reported %d of %d", c[0], c[1])
		}
	}

	log = &progressLog{t: t}
	if _, err := run(context.Background(), d, lib, Settings{Samples: 3*ChunkUnits + 1, Seed: 3, Progress: log.report}, make(chan time.Time)); err != nil {
		t.Fatal(err)
	}
	log.returned.Store(true)
	if want := [][2]int{{3*ChunkUnits + 1, 3*ChunkUnits + 1}}; !reflect.DeepEqual(log.calls, want) {
		t.Errorf("calls %v with no ticks, want %v", log.calls, want)
	}
}
