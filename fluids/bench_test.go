package fluids

import (
	"bytes"
	"os"
	"testing"

	"ullage/fluids/units"
)

// Speed targets: saturation state ≤ 1 µs, compressed-liquid pressure at
// (T, ρ) ≤ 1 µs, single-phase state at (T, p) ≤ 5 µs.

func benchFluid(b *testing.B, id string) *Substance {
	b.Helper()
	lib, err := Builtin()
	if err != nil {
		b.Fatal(err)
	}
	s, err := lib.Lookup(id)
	if err != nil {
		b.Fatal(err)
	}
	return s
}

func BenchmarkSaturationState(b *testing.B) {
	for _, id := range []string{"water", "ethanol", "dichloromethane"} {
		b.Run(id, func(b *testing.B) {
			s := benchFluid(b, id)
			t0 := units.CelsiusToKelvin(20)
			b.ReportAllocs()
			for i := 0; b.Loop(); i++ {
				if _, err := s.Saturation(t0 + float64(i%100)*0.5); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}

func BenchmarkCompressedLiquidPressure(b *testing.B) {
	for _, id := range []string{"water", "ethanol", "dichloromethane"} {
		b.Run(id, func(b *testing.B) {
			s := benchFluid(b, id)
			t0 := units.CelsiusToKelvin(60)
			sat, _ := s.Saturation(t0)
			rho := sat.LiquidDensity * 1.002
			b.ReportAllocs()
			for i := 0; b.Loop(); i++ {
				if _, _, err := s.SinglePhasePressure(t0+float64(i%10)*0.01, rho); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}

func BenchmarkDensityAtTP(b *testing.B) {
	for _, id := range []string{"water", "ethanol", "dichloromethane"} {
		b.Run(id, func(b *testing.B) {
			s := benchFluid(b, id)
			t0 := units.CelsiusToKelvin(60)
			b.ReportAllocs()
			for i := 0; b.Loop(); i++ {
				if _, _, err := s.Density(t0+float64(i%10)*0.1, 5e6); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}

// BenchmarkLoadUserFluids times reading, checking and preparing a user's
// fluid file (testdata/user/good_single.json), the fuzz target's work.
func BenchmarkLoadUserFluids(b *testing.B) {
	data, err := os.ReadFile("testdata/user/good_single.json")
	if err != nil {
		b.Fatal(err)
	}
	b.ReportAllocs()
	for b.Loop() {
		if _, err := LoadUserFluids(bytes.NewReader(data)); err != nil {
			b.Fatal(err)
		}
	}
}
