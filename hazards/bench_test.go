package hazards

import "testing"

// BenchmarkAssess times a full assessment of the typical test design:
// states, stresses, strength, the three root-found limits, rupture,
// release and findings.
func BenchmarkAssess(b *testing.B) {
	lib := testLibrary(b)
	d := typicalDesign()
	b.ReportAllocs()
	for i := 0; i < b.N; i++ {
		if _, err := Assess(d, lib); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkAssessResidualGas is the same with residual air, which
// needs the gas-bubble solve at every state.
func BenchmarkAssessResidualGas(b *testing.B) {
	lib := testLibrary(b)
	d := typicalDesign()
	d.ResidualGasPressurePa = 2000
	b.ReportAllocs()
	for i := 0; i < b.N; i++ {
		if _, err := Assess(d, lib); err != nil {
			b.Fatal(err)
		}
	}
}

func BenchmarkVesselState(b *testing.B) {
	lib := testLibrary(b)
	a, err := Assess(typicalDesign(), lib)
	if err != nil {
		b.Fatal(err)
	}
	b.ReportAllocs()
	for i := 0; i < b.N; i++ {
		if _, err := a.StateAt(340); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkAssessWithRecord is BenchmarkAssess with the calculation
// record written out (Trace), which only the record and the window's
// working panel ask for.
func BenchmarkAssessWithRecord(b *testing.B) {
	lib := testLibrary(b)
	d := typicalDesign()
	b.ReportAllocs()
	for i := 0; i < b.N; i++ {
		a, err := Assess(d, lib)
		if err != nil {
			b.Fatal(err)
		}
		if len(a.Trace()) == 0 {
			b.Fatal("no record")
		}
	}
}
