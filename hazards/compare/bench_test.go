package compare

import "testing"

// BenchmarkCompare times the comparison alone (inputs, results and
// statuses) of two assessed revisions; the assessments are made once.
func BenchmarkCompare(b *testing.B) {
	a := side(b, "A", overfilledBulb())
	d := overfilledBulb()
	d.FillMassKg = 0.012
	d.Vessel.Parts[0].WallThicknessM = 0.002
	s := side(b, "B", d)
	b.ReportAllocs()
	for b.Loop() {
		_ = Compare(a, s)
	}
}
