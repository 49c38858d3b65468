package report

import (
	"io"
	"testing"
)

func BenchmarkWriteAssessment(b *testing.B) {
	a := assess(b, "typical_design.json")
	m := loadMeta(b, "meta_b.json")
	b.ReportAllocs()
	for b.Loop() {
		if err := WriteAssessment(io.Discard, m, a, Options{Deterministic: true}); err != nil {
			b.Fatal(err)
		}
	}
}

func BenchmarkWriteComparison(b *testing.B) {
	c := revisions(b)
	ma, mb := loadMeta(b, "meta_a.json"), loadMeta(b, "meta_b.json")
	b.ReportAllocs()
	for b.Loop() {
		if err := WriteComparison(io.Discard, ma, mb, c, Options{Deterministic: true}); err != nil {
			b.Fatal(err)
		}
	}
}
