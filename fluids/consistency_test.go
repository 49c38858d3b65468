package fluids

import (
	"errors"
	"math"
	"testing"
)

// Physical consistency over every fluid in the library (common practice:
// properties any correct description of a pure fluid must have).

func TestSaturationIsPhysical(t *testing.T) {
	for _, s := range builtinForTest(t).All() {
		id := s.Fluid().ID
		prevP, prevRhoL, prevRhoV := 0.0, math.Inf(1), 0.0
		const n = 2000
		for i := 0; i <= n; i++ {
			temp := math.Min(s.MinTemperature()+(s.CriticalTemperature()-s.MinTemperature())*float64(i)/n, s.CriticalTemperature())
			sat, err := s.Saturation(temp)
			if err != nil {
				t.Fatalf("%s at %g K: %v", id, temp, err)
			}
			if sat.PressurePa <= prevP {
				t.Errorf("%s: pressure does not rise at %.3f K (%g ≤ %g)", id, temp, sat.PressurePa, prevP)
			}
			// Water is densest near 4 °C (CRC Handbook of Chemistry and
			// Physics, "Properties of Water in the Range 0–100 °C":
			// maximum density at 3.98 °C); every other liquid here is
			// densest at its freezing point.
			if sat.LiquidDensity > prevRhoL && temp > s.tPeak {
				t.Errorf("%s: liquid density rises with temperature at %.3f K", id, temp)
			}
			if sat.VapourDensity < prevRhoV {
				t.Errorf("%s: saturated vapour density falls with temperature at %.3f K", id, temp)
			}
			if i < n && sat.LiquidDensity <= sat.VapourDensity {
				t.Errorf("%s: liquid %.4g not denser than vapour %.4g at %.3f K", id, sat.LiquidDensity, sat.VapourDensity, temp)
			}
			if sat.HeatOfVaporisation < 0 || math.IsNaN(sat.HeatOfVaporisation) {
				t.Errorf("%s: heat of vaporisation %g at %.3f K", id, sat.HeatOfVaporisation, temp)
			}
			prevP, prevRhoL, prevRhoV = sat.PressurePa, sat.LiquidDensity, sat.VapourDensity
		}
		end, _ := s.Saturation(s.CriticalTemperature())
		if math.Abs(end.LiquidDensity-end.VapourDensity) > 1e-6*end.LiquidDensity {
			t.Errorf("%s: liquid %.6g and vapour %.6g densities do not meet at Tc", id, end.LiquidDensity, end.VapourDensity)
		}
	}
}

// TestNoJumpAtHandOvers probes each place where one correlation hands over
// to another (piece ends, the critical extension, the near-critical vapour
// rule, the compressed-liquid limit) for a jump.
func TestNoJumpAtHandOvers(t *testing.T) {
	const eps = 1e-7
	for _, s := range builtinForTest(t).All() {
		id := s.Fluid().ID
		var joins []float64
		if s.ref != nil {
			// The saturation table's segment ends and its hand-over to
			// the critical point.
			tb, _ := s.ref.sat()
			for _, seg := range tb.segs {
				joins = append(joins, s.tc*(1-seg.lo*seg.lo*seg.lo))
			}
		} else {
			for _, p := range s.Fluid().VapourPressure {
				joins = append(joins, p.TMinK, p.TMaxK)
			}
			joins = append(joins, s.blendT, taitMaxTr*s.tc)
			if s.liquid.corr != nil {
				joins = append(joins, s.liquid.tJoin)
			}
		}
		for _, tj := range joins {
			if tj-eps < s.tMin || tj+eps > s.tc {
				continue
			}
			a, err1 := s.Saturation(tj - eps)
			b, err2 := s.Saturation(tj + eps)
			if err1 != nil || err2 != nil {
				t.Fatalf("%s at %g K: %v %v", id, tj, err1, err2)
			}
			for _, q := range []struct {
				name string
				x, y float64
			}{{"pressure", a.PressurePa, b.PressurePa}, {"liquid density", a.LiquidDensity, b.LiquidDensity}, {"vapour density", a.VapourDensity, b.VapourDensity}} {
				if math.Abs(q.y-q.x) > 1e-5*math.Abs(q.x) {
					t.Errorf("%s: %s jumps at %.3f K: %.8g → %.8g", id, q.name, tj, q.x, q.y)
				}
			}
		}
	}
}

// TestSinglePhaseMeetsSaturation checks that the compressed-liquid and
// superheated-vapour pressures start from the saturation pressure on the
// phase boundary, and that the liquid-full rise is steep.
func TestSinglePhaseMeetsSaturation(t *testing.T) {
	for _, s := range builtinForTest(t).All() {
		id := s.Fluid().ID
		for _, tr := range []float64{0.6, 0.75, 0.9, 0.97} {
			temp := tr * s.CriticalTemperature()
			if temp < s.MinTemperature() {
				continue
			}
			sat, _ := s.Saturation(temp)
			for _, side := range []struct {
				name string
				rho  float64
			}{{"liquid", sat.LiquidDensity}, {"vapour", sat.VapourDensity}} {
				p, _, err := s.SinglePhasePressure(temp+1e-6, side.rho)
				if err != nil {
					t.Errorf("%s %s at Tr %.2f: %v", id, side.name, tr, err)
					continue
				}
				if math.Abs(p-sat.PressurePa) > 1e-3*sat.PressurePa+50 {
					t.Errorf("%s %s at Tr %.2f: single-phase pressure %.6g Pa, saturation %.6g Pa", id, side.name, tr, p, sat.PressurePa)
				}
			}
			// One kelvin past liquid-full the pressure must have risen by
			// far more than the vapour pressure alone would (the brief's
			// "roughly a megapascal per kelvin"; we require > 0.2 MPa up to
			// 0.75 Tc and > 0.15 MPa at 0.9 Tc, where the liquid is far more
			// compressible: the reference equations of Span & Wagner (2003)
			// for n-heptane and McLinden et al. (2015) for
			// perfluoro(2-methyl-3-pentanone) give 0.19 MPa/K there,
			// evaluated independently of this code from the CoolProp
			// transcription of their coefficients).
			p1, _, err := s.SinglePhasePressure(temp+1, sat.LiquidDensity)
			if err != nil {
				t.Errorf("%s: %v", id, err)
				continue
			}
			minRise := 2e5
			if tr > 0.8 {
				minRise = 1.5e5
			}
			if tr <= 0.9 && p1-sat.PressurePa < minRise {
				t.Errorf("%s at Tr %.2f: liquid-full rise only %.4g Pa over 1 K", id, tr, p1-sat.PressurePa)
			}
		}
	}
}

// TestSinglePhaseIsContinuousAcrossTc follows isochores through the
// critical temperature.
func TestSinglePhaseIsContinuousAcrossTc(t *testing.T) {
	for _, s := range builtinForTest(t).All() {
		for _, f := range []float64{0.3, 1, 1.5} {
			rho := f * s.CriticalDensity()
			a, _, err1 := s.SinglePhasePressure(s.tc-1e-6, rho)
			b, _, err2 := s.SinglePhasePressure(s.tc+1e-6, rho)
			if err1 != nil || err2 != nil {
				if f == 0.3 || f == 1.5 {
					t.Errorf("%s ρ=%.0f: %v %v", s.Fluid().ID, rho, err1, err2)
				}
				continue
			}
			if math.Abs(b-a) > 1e-4*a {
				t.Errorf("%s ρ=%.0f: pressure jumps across Tc: %.8g → %.8g", s.Fluid().ID, rho, a, b)
			}
		}
	}
}

func TestDensityInvertsPressure(t *testing.T) {
	for _, s := range builtinForTest(t).All() {
		temp := 1.1 * s.CriticalTemperature()
		for _, p := range []float64{1e5, 1e6, 2 * s.CriticalPressure()} {
			rho, _, err := s.Density(temp, p)
			if err != nil {
				t.Errorf("%s at %g K, %g Pa: %v", s.Fluid().ID, temp, p, err)
				continue
			}
			back, _, err := s.SinglePhasePressure(temp, rho)
			if err != nil || math.Abs(back-p) > 1e-6*p {
				t.Errorf("%s: density %g at %g Pa gives back %g Pa (%v)", s.Fluid().ID, rho, p, back, err)
			}
		}
	}
}

func TestBadTemperatures(t *testing.T) {
	s, err := builtinForTest(t).Lookup("acetone")
	if err != nil {
		t.Fatal(err)
	}
	tests := []struct {
		name string
		temp float64
		want error
	}{
		{"NaN", math.NaN(), ErrNotFinite},
		{"+Inf", math.Inf(1), ErrNotFinite},
		{"below freezing", s.MinTemperature() - 1, ErrBelowFreezing},
		{"absolute zero", 0, ErrBelowFreezing},
		{"above Tc", s.CriticalTemperature() + 1, ErrSupercritical},
	}
	for _, tt := range tests {
		if _, err := s.Saturation(tt.temp); !errors.Is(err, tt.want) {
			t.Errorf("%s: got %v, want %v", tt.name, err, tt.want)
		}
	}
	if _, err := s.SaturationTemperature(1); !errors.Is(err, ErrOutOfDomain) {
		t.Errorf("1 Pa: got %v, want ErrOutOfDomain", err)
	}
	if _, _, err := s.CompressedLiquidDensity(300, 10); !errors.Is(err, ErrOutOfDomain) {
		t.Errorf("liquid below its vapour pressure: got %v, want ErrOutOfDomain", err)
	}
	if _, _, err := s.SinglePhasePressure(300, 100); !errors.Is(err, ErrTwoPhase) {
		t.Errorf("inside the dome: got %v, want ErrTwoPhase", err)
	}
}

func TestLookup(t *testing.T) {
	lib := builtinForTest(t)
	tests := []struct{ key, want string }{
		{"dichloromethane", "dichloromethane"},
		{"Methylene chloride", "dichloromethane"},
		{"75-09-2", "dichloromethane"},
		{"ACETONE", "acetone"},
	}
	for _, tt := range tests {
		s, err := lib.Lookup(tt.key)
		if err != nil || s.Fluid().ID != tt.want {
			t.Errorf("Lookup(%q) = %v, %v; want %s", tt.key, s, err, tt.want)
		}
	}
	if _, err := lib.Lookup("unobtainium"); !errors.Is(err, ErrUnknownFluid) {
		t.Errorf("unknown fluid: got %v", err)
	}
}

func BenchmarkSaturation(b *testing.B) {
	s, err := builtinForTest(b).Lookup("dichloromethane")
	if err != nil {
		b.Fatal(err)
	}
	b.ReportAllocs()
	temp := 330.0
	for i := 0; i < b.N; i++ {
		if _, err := s.Saturation(temp); err != nil {
			b.Fatal(err)
		}
	}
}

func BenchmarkSinglePhasePressureLiquid(b *testing.B) {
	s, err := builtinForTest(b).Lookup("dichloromethane")
	if err != nil {
		b.Fatal(err)
	}
	b.ReportAllocs()
	for i := 0; i < b.N; i++ {
		if _, _, err := s.SinglePhasePressure(340, 1300); err != nil {
			b.Fatal(err)
		}
	}
}

func TestLimitLabel(t *testing.T) {
	tests := []struct {
		l    ExposureLimit
		want string
	}{
		{ExposureLimit{Body: "NIOSH", Kind: "REL", Averaging: AveragingTWA}, "NIOSH REL TWA"},
		{ExposureLimit{Body: "NIOSH", Kind: "IDLH", Averaging: AveragingIDLH}, "NIOSH IDLH"},
		{ExposureLimit{Body: "OSHA", Kind: "PEL", Averaging: AveragingCeiling}, "OSHA PEL ceiling"},
	}
	for _, tt := range tests {
		if got := tt.l.Label(); got != tt.want {
			t.Errorf("Label() = %q, want %q", got, tt.want)
		}
	}
}
