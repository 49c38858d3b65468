package tolerance

import (
	"context"
	"testing"

	"ullage/hazards"
)

// benchmarkRun times a study of one million units of the ornament fixture
// with every tolerance and a 5 K spread of the hottest temperature, and
// reports the time per unit.
func benchmarkRun(b *testing.B, workers int) {
	lib := testLibrary(b)
	d := loadDesign(b, "ornament.json")
	s := Settings{Samples: 1_000_000, Seed: 1, Workers: workers, HottestSpreadK: 5}
	b.ReportAllocs()
	for b.Loop() {
		if _, err := Run(context.Background(), d, lib, s); err != nil {
			b.Fatal(err)
		}
	}
	b.ReportMetric(float64(b.Elapsed().Nanoseconds())/float64(b.N)/float64(s.Samples), "ns/unit")
}

func BenchmarkRunMillionWorkers1(b *testing.B) { benchmarkRun(b, 1) }
func BenchmarkRunMillionWorkers2(b *testing.B) { benchmarkRun(b, 2) }

// BenchmarkStudyMillion times a whole study of one million units on two
// workers for each kind of design (studyKinds): target 1 s wall on two
// cores. Skipped under -short.
func BenchmarkStudyMillion(b *testing.B) {
	if testing.Short() {
		b.Skip("one million units per run; skipped under -short")
	}
	lib := testLibrary(b)
	for _, k := range studyKinds(b) {
		b.Run(k.name, func(b *testing.B) {
			s := Settings{Samples: 1_000_000, Seed: 1, Workers: 2, HottestSpreadK: k.spreadK}
			b.ReportAllocs()
			for b.Loop() {
				if _, err := Run(context.Background(), k.design, lib, s); err != nil {
					b.Fatal(err)
				}
			}
			b.ReportMetric(float64(b.Elapsed().Nanoseconds())/float64(b.N)/float64(s.Samples), "ns/unit")
		})
	}
}

// BenchmarkEvaluateUnit times the engine's per-unit evaluation of the
// nominal ornament unit, the bulk of a study's time.
func BenchmarkEvaluateUnit(b *testing.B) {
	lib := testLibrary(b)
	d := loadDesign(b, "ornament.json")
	m, err := hazards.NewUnitModel(d, lib)
	if err != nil {
		b.Fatal(err)
	}
	u := hazards.Unit{FillMassKg: d.FillMassKg, WallThicknessM: []float64{0.001, 0.0011, 0.0009}, HottestK: d.HottestK}
	b.ReportAllocs()
	for b.Loop() {
		if _, err := m.Evaluate(u); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkAssessKinds times the full assessment of each kind of study
// design (studyKinds), the reference the fast-path check compares with.
func BenchmarkAssessKinds(b *testing.B) {
	lib := testLibrary(b)
	for _, k := range studyKinds(b) {
		b.Run(k.name, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if _, err := hazards.Assess(k.design, lib); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}
