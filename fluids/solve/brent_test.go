package solve

import (
	"errors"
	"math"
	"testing"
)

func TestBrent(t *testing.T) {
	tests := []struct {
		name   string
		f      func(float64) float64
		lo, hi float64
		want   float64
	}{
		{"square root of two (analytic)", func(x float64) float64 { return x*x - 2 }, 0, 2, math.Sqrt2},
		{"cosine root at pi/2 (analytic)", math.Cos, 0, 3, math.Pi / 2},
		{"cubic with flat region (analytic)", func(x float64) float64 { return (x - 1) * (x - 1) * (x - 1) }, -3, 4, 1},
		{"root at the upper end", func(x float64) float64 { return x - 5 }, 0, 5, 5},
	}
	for _, tt := range tests {
		r, err := Brent(tt.f, tt.lo, tt.hi, 1e-12, 200)
		if err != nil {
			t.Errorf("%s: %v", tt.name, err)
			continue
		}
		if math.Abs(r.X-tt.want) > 1e-6 {
			t.Errorf("%s: x = %.15g, want %.15g (residual %g)", tt.name, r.X, tt.want, r.Residual)
		}
	}
}

func TestBrentErrors(t *testing.T) {
	if _, err := Brent(func(x float64) float64 { return x*x + 1 }, -1, 1, 1e-9, 100); !errors.Is(err, ErrNoBracket) {
		t.Errorf("no root: got %v, want ErrNoBracket", err)
	}
	if _, err := Brent(func(x float64) float64 { return math.NaN() }, -1, 1, 1e-9, 100); !errors.Is(err, ErrNotFinite) {
		t.Errorf("NaN: got %v, want ErrNotFinite", err)
	}
}

func BenchmarkBrent(b *testing.B) {
	b.ReportAllocs()
	f := func(x float64) float64 { return math.Exp(x) - 3 }
	for i := 0; i < b.N; i++ {
		if _, err := Brent(f, 0, 5, 1e-10, 100); err != nil {
			b.Fatal(err)
		}
	}
}
