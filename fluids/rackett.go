package fluids

import "math"

// rackett gives the saturated liquid density by the Rackett equation
// (H. G. Rackett, J. Chem. Eng. Data 15, 514–517, 1970) in its
// reference-point form (C. F. Spencer and R. P. Danner, J. Chem. Eng. Data
// 17, 236–241, 1972; Poling et al., 5th ed., §4-11, from memory):
//
//	V(T) = V_ref · Z_RA^φ,   φ = (1 − Tr)^(2/7) − (1 − Tr_ref)^(2/7)
//
// Z_RA is fixed here by requiring the curve to pass through the measured
// critical density as well as the reference density, so that the liquid
// and vapour branches meet at the critical point.
type rackett struct {
	tc, rhoRef, wRef, lnZ float64
}

func newRackett(tc, rhoRef, tRef, rhoC float64) rackett {
	w := math.Pow(1-tRef/tc, 2.0/7.0)
	return rackett{tc: tc, rhoRef: rhoRef, wRef: w, lnZ: math.Log(rhoC/rhoRef) / w}
}

// z returns the fitted Rackett compressibility Z_RA.
func (r *rackett) z() float64 { return math.Exp(r.lnZ) }

// density returns the saturated liquid density (kg/m³) at t ≤ tc.
func (r *rackett) density(t float64) float64 {
	phi := math.Pow(1-t/r.tc, 2.0/7.0) - r.wRef
	return r.rhoRef * math.Exp(-phi*r.lnZ)
}

// inverse returns the temperature at which the Rackett density equals rho
// (closed form), or tMin, false when rho is denser than at tMin.
func (r *rackett) inverse(rho, tMin float64) (float64, bool) {
	phi := -math.Log(rho/r.rhoRef) / r.lnZ
	w := phi + r.wRef
	if w <= 0 {
		return r.tc, true
	}
	t := r.tc * (1 - math.Pow(w, 3.5))
	if t < tMin {
		return tMin, false
	}
	return t, true
}
