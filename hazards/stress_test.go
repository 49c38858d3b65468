package hazards

import (
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

// TestHoopStressFormulas checks the stress factors against hand
// calculations from the published formulas. Sources beside each row.
func TestHoopStressFormulas(t *testing.T) {
	tests := []struct {
		name     string
		part     Part
		pressure float64
		want     float64
		form     string
		source   string
	}{
		{
			// Lamé, thick cylinder, bore hoop stress p(ro²+ri²)/(ro²−ri²):
			// ri = 30 mm, ro = 50 mm, p = 20 MPa → 20·(2500+900)/(2500−900)
			// = 42.5 MPa. Roark's Formulas for Stress and Strain, 7th ed.,
			// Table 13.5 case 1a (from memory), worked by hand.
			name: "thick tube (Lamé)", part: Part{Shape: ShapeTube, OuterDiameterM: 0.100, WallThicknessM: 0.020, LengthM: 1},
			pressure: 20e6, want: 42.5e6, form: WallThick, source: "Roark 7th ed. Table 13.5 case 1a, by hand",
		},
		{
			// Lamé, thick sphere, bore stress p(ro³+2ri³)/(2(ro³−ri³)):
			// ri = 30, ro = 50 → (125000+54000)/(2·98000) = 0.913265…
			name: "thick sphere (Lamé)", part: Part{Shape: ShapeSphere, OuterDiameterM: 0.100, WallThicknessM: 0.020},
			pressure: 1e6, want: 0.9132653e6, form: WallThick, source: "Roark 7th ed. Table 13.5 case 1b, by hand",
		},
		{
			// Thin sphere p r/(2t), r = 49.5 mm mean radius, t = 1 mm, p =
			// 0.2 MPa → 4.95 MPa. Roark 7th ed. Table 13.1 case 3a (from memory).
			name: "thin sphere", part: Part{Shape: ShapeSphere, OuterDiameterM: 0.100, WallThicknessM: 0.001},
			pressure: 0.2e6, want: 4.95e6, form: WallThin, source: "Roark 7th ed. Table 13.1 case 3a, by hand",
		},
		{
			// Thin cylinder p r/t → 9.9 MPa. Roark Table 13.1 case 1a.
			name: "thin tube", part: Part{Shape: ShapeTube, OuterDiameterM: 0.100, WallThicknessM: 0.001, LengthM: 0.1},
			pressure: 0.2e6, want: 9.9e6, form: WallThin, source: "Roark 7th ed. Table 13.1 case 1a, by hand",
		},
	}
	for _, tt := range tests {
		k, form := hoopStressFactor(&tt.part)
		if got := k * tt.pressure; !scalar.EqualWithinRel(got, tt.want, 1e-6) || form != tt.form {
			t.Errorf("%s: σ = %.6g Pa (%s), want %.6g Pa (%s); source: %s", tt.name, got, form, tt.want, tt.form, tt.source)
		}
	}
}

// TestThinAndThickAgreeAtTheSwitch: at the wall ratio where the form
// changes, the two forms must nearly agree (within 5 %: the thin-wall
// error at t/r = 0.1, common practice).
func TestThinAndThickAgreeAtTheSwitch(t *testing.T) {
	for _, shape := range []string{ShapeSphere, ShapeTube} {
		ri := 0.010
		below := Part{Shape: shape, OuterDiameterM: 2 * (ri + 0.0999*ri), WallThicknessM: 0.0999 * ri, LengthM: 1}
		above := Part{Shape: shape, OuterDiameterM: 2 * (ri + 0.1001*ri), WallThicknessM: 0.1001 * ri, LengthM: 1}
		k1, f1 := hoopStressFactor(&below)
		k2, f2 := hoopStressFactor(&above)
		if f1 != WallThin || f2 != WallThick {
			t.Fatalf("%s: forms %s, %s", shape, f1, f2)
		}
		if !scalar.EqualWithinRel(k1, k2, 0.05) {
			t.Errorf("%s: thin %.4g and thick %.4g differ by more than 5 %% at the switch", shape, k1, k2)
		}
	}
}

// TestClassicalBuckling checks the elastic buckling pressures by hand.
func TestClassicalBuckling(t *testing.T) {
	// Zoelly: 2E(t/R)²/√(3(1−ν²)), E = 70 GPa, ν = 0.2, t = 1 mm, R = 50 mm
	// → 2·70e9·4e-4/√2.88 = 32.998 MPa (Timoshenko & Gere, Theory of
	// Elastic Stability, 2nd ed., §11.5, from memory; by hand).
	sphere := Part{Shape: ShapeSphere, OuterDiameterM: 0.101, WallThicknessM: 0.001}
	if got := classicalBuckling(&sphere, 70e9, 0.2); !scalar.EqualWithinRel(got, 32.9983e6, 1e-4) {
		t.Errorf("sphere: %.6g Pa, want 32.9983e6 (Zoelly, by hand)", got)
	}
	// Bresse–Bryan long tube: E/(4(1−ν²))(t/r)³, r = 10 mm → 70e9/3.84·1e-3
	// = 18.229 MPa (Timoshenko & Gere §7.3, from memory; by hand).
	tube := Part{Shape: ShapeTube, OuterDiameterM: 0.021, WallThicknessM: 0.001, LengthM: 0.3}
	if got := classicalBuckling(&tube, 70e9, 0.2); !scalar.EqualWithinRel(got, 18.2292e6, 1e-4) {
		t.Errorf("tube: %.6g Pa, want 18.2292e6 (Bresse–Bryan, by hand)", got)
	}
}

// TestWeibullStrength checks the weakest-link sum and the load-duration
// factor against hand calculation: one sphere of area A₀, stress factor k,
// σ₀ = 32.08 MPa, m = 7, n = 16 (ASTM E1300 parameters, from memory).
func TestWeibullStrength(t *testing.T) {
	g := Glass{
		CharacteristicStrength: Sourced{Value: 32.08e6}, ReferenceArea: Sourced{Value: 1},
		ReferenceLoad: Sourced{Value: 60}, WeibullModulus: Sourced{Value: 7}, StressCorrosionExponent: Sourced{Value: 16},
	}
	parts := []PartStress{{StressPerPascal: 10, AreaM2: 1}}
	s := glassStrength(parts, &g, 60*65536, 4)
	// Short term: σ₀/k = 3.208 MPa. Long term over 60·2^16 s: × 2^(−1) = 1.604 MPa.
	if !scalar.EqualWithinRel(s.ShortTermBurstPa, 3.208e6, 1e-9) || !scalar.EqualWithinRel(s.LongTermBurstPa, 1.604e6, 1e-9) {
		t.Errorf("burst %g / %g Pa, want 3.208e6 / 1.604e6 (hand calculation)", s.ShortTermBurstPa, s.LongTermBurstPa)
	}
	// Two identical parts: the weakest-link sum doubles, burst falls by 2^(1/7).
	s2 := glassStrength(append(parts, parts[0]), &g, 60, 4)
	if !scalar.EqualWithinRel(s2.ShortTermBurstPa, 3.208e6/1.1040895136738123, 1e-9) {
		t.Errorf("two parts: %g Pa, want %g (size effect 2^(1/7))", s2.ShortTermBurstPa, 3.208e6/1.1040895136738123)
	}
	// At the characteristic overpressure the failure probability is 1 − 1/e.
	if p := failureProbability(s.LongTermBurstPa, s.LongTermBurstPa, 7); !scalar.EqualWithinAbs(p, 0.6321205588, 1e-9) {
		t.Errorf("P_f at the scale stress = %g, want 1 − 1/e (Weibull 1951)", p)
	}
}
