package hazards

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
	"ullage/fluids/units"
)

// TestWellMixedRoom checks the instantaneous-release solution
// C(t) = (M/V) exp(−Q t/(k V)) (AIHA, Mathematical Models for Estimating
// Occupational Exposure to Chemicals, 2nd ed., ch. 3, from memory) by
// hand: 5 g in 30 m³ at 0.45 air changes per hour.
func TestWellMixedRoom(t *testing.T) {
	room := Room{VolumeM3: 30, AirChangesPerHour: 0.45, MixingFactor: 1, NearFieldRadiusM: 1, NearFieldAirSpeed: 0.1, ExposureMinutes: 480}
	m := newReleaseModel(0.005, room)
	tests := []struct {
		name string
		got  float64
		want float64
	}{
		{"initial, 5000 mg / 30 m³", m.Concentration(WellMixedRoom, 0), 166.6667},
		{"after 1 h, 166.667·e^(−0.45)", m.Concentration(WellMixedRoom, 3600), 106.2709},
		{"after 1 h with k = 3, 166.667·e^(−0.15)", newReleaseModel(0.005, Room{VolumeM3: 30, AirChangesPerHour: 0.45, MixingFactor: 3, NearFieldRadiusM: 1, NearFieldAirSpeed: 0.1}).Concentration(WellMixedRoom, 3600), 143.4512},
		{"1-h average, 166.667·(1−e^(−0.45))/0.45", m.Average(WellMixedRoom, 3600), 134.2118},
	}
	for _, tt := range tests {
		if !scalar.EqualWithinRel(tt.got, tt.want, 1e-5) {
			t.Errorf("%s: %.6g mg/m³, want %.6g (by hand)", tt.name, tt.got, tt.want)
		}
	}
	// ppm at 25 °C and 1 atm: mg/m³ × 24.45 / MW (NIOSH Pocket Guide,
	// introduction). Dichloromethane, MW 84.93: 166.667 mg/m³ = 47.98 ppm.
	if got := units.MgPerM3ToPpm(166.6667, 0.08493); !scalar.EqualWithinRel(got, 47.98, 1e-3) {
		t.Errorf("ppm conversion %g, want 47.98", got)
	}
}

// TestTwoZoneAgainstIntegration checks the closed-form near-field/far-field
// solution against an independent fourth-order Runge–Kutta integration of
// Nicas's equations (Appl. Occup. Environ. Hyg. 11(8), 1996):
// V_N dC_N/dt = β(C_F − C_N), V_F dC_F/dt = β(C_N − C_F) − Q C_F.
func TestTwoZoneAgainstIntegration(t *testing.T) {
	for _, ach := range []float64{0, 0.45, 4} {
		room := Room{VolumeM3: 30, AirChangesPerHour: ach, MixingFactor: 1, NearFieldRadiusM: 1, NearFieldAirSpeed: 0.1}
		m := newReleaseModel(0.005, room)
		vn := NearFieldVolume(1)
		vf := 30 - vn
		beta := 0.5 * 2 * math.Pi * 0.1
		q := ach * 30 / 3600
		cn, cf := 5000/vn, 0.0
		dose := 0.0
		deriv := func(cn, cf float64) (float64, float64) {
			return beta * (cf - cn) / vn, (beta*(cn-cf) - q*cf) / vf
		}
		const h = 0.25
		for step := 1; step <= 4*3600; step++ {
			k1n, k1f := deriv(cn, cf)
			k2n, k2f := deriv(cn+h/2*k1n, cf+h/2*k1f)
			k3n, k3f := deriv(cn+h/2*k2n, cf+h/2*k2f)
			k4n, k4f := deriv(cn+h*k3n, cf+h*k3f)
			prev := cn
			cn += h / 6 * (k1n + 2*k2n + 2*k3n + k4n)
			cf += h / 6 * (k1f + 2*k2f + 2*k3f + k4f)
			dose += h / 2 * (prev + cn)
			if tm := float64(step) * h; step%1200 == 0 {
				if !scalar.EqualWithinRel(m.Concentration(NearField, tm), cn, 1e-6) || !scalar.EqualWithinRel(m.Concentration(FarField, tm), cf, 1e-6) {
					t.Errorf("ACH %g at %g s: closed form %.6g / %.6g, integration %.6g / %.6g",
						ach, tm, m.Concentration(NearField, tm), m.Concentration(FarField, tm), cn, cf)
				}
			}
		}
		// 5e-5: the trapezoid rule at 0.25 s steps on the fast initial decay.
		if got := m.Dose(NearField, 3600); !scalar.EqualWithinRel(got, dose, 5e-5) {
			t.Errorf("ACH %g: near-field dose %.6g, integration %.6g", ach, got, dose)
		}
		// Mass balance: what is in the air plus what ventilation removed.
		tm := 3600.0
		inAir := vn*m.Concentration(NearField, tm) + vf*m.Concentration(FarField, tm)
		removed := q * m.Dose(FarField, tm)
		if !scalar.EqualWithinRel(inAir+removed, 5000, 1e-9) {
			t.Errorf("ACH %g: mass not conserved: %.8g mg in air + %.8g removed ≠ 5000", ach, inAir, removed)
		}
	}
}

func TestNearFieldNeverBelowFarField(t *testing.T) {
	m := newReleaseModel(0.01, Room{VolumeM3: 50, AirChangesPerHour: 2, MixingFactor: 1, NearFieldRadiusM: 0.8, NearFieldAirSpeed: 0.05})
	for tm := 0.0; tm < 8*3600; tm += 37 {
		if m.Concentration(NearField, tm) < m.Concentration(FarField, tm)*(1-1e-12) {
			t.Fatalf("at %g s near field %g below far field %g", tm, m.Concentration(NearField, tm), m.Concentration(FarField, tm))
		}
	}
}
