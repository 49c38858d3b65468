package fluids

import "math"

// Peng–Robinson equation of state (D.-Y. Peng and D. B. Robinson, "A New
// Two-Constant Equation of State", Ind. Eng. Chem. Fundam. 15(1), 59–64,
// 1976, eqs. 9–18):
//
//	P = RT/(v − b) − a·α(T)/(v² + 2bv − b²)
//	a = 0.45724 R²Tc²/Pc,  b = 0.07780 RTc/Pc
//	α = [1 + κ(1 − √Tr)]²,  κ = 0.37464 + 1.54226ω − 0.26992ω²
//
// with a Péneloux-type volume translation (A. Péneloux, E. Rauzy and R.
// Fréze, Fluid Phase Equilib. 8, 7–23, 1982): the physical molar volume is
// v = v_PR − c, with c chosen here so that the translated critical volume
// equals the fluid's measured critical volume. The equation's own critical
// compressibility factor is 0.30740 (Peng and Robinson 1976, eq. 13).
type pengRobinson struct {
	r, tc, a, b, kappa, shift, molarMass float64
}

const prCriticalZ = 0.30740

func newPengRobinson(tc, pc, omega, molarMass, criticalDensity, r float64) pengRobinson {
	vcPR := prCriticalZ * r * tc / pc
	vc := molarMass / criticalDensity
	return pengRobinson{
		r:         r,
		tc:        tc,
		a:         0.45724 * r * r * tc * tc / pc,
		b:         0.07780 * r * tc / pc,
		kappa:     0.37464 + 1.54226*omega - 0.26992*omega*omega,
		shift:     vcPR - vc,
		molarMass: molarMass,
	}
}

func (e *pengRobinson) aAlpha(t float64) float64 {
	s := 1 + e.kappa*(1-math.Sqrt(t/e.tc))
	return e.a * s * s
}

// pressure returns P in Pa at temperature t (K) and mass density rho
// (kg/m³), and false when the translated volume falls inside the
// co-volume, where the equation has no meaning.
func (e *pengRobinson) pressure(t, rho float64) (float64, bool) {
	v := e.molarMass/rho + e.shift
	if v <= e.b*1.0001 {
		return 0, false
	}
	return e.r*t/(v-e.b) - e.aAlpha(t)/(v*v+2*e.b*v-e.b*e.b), true
}

// vapourDensity returns the mass density (kg/m³) of the vapour-like (largest
// compressibility) root of the equation at (t, p).
func (e *pengRobinson) vapourDensity(t, p float64) float64 {
	rt := e.r * t
	A := e.aAlpha(t) * p / (rt * rt)
	B := e.b * p / rt
	z := largestCubicRoot(-(1 - B), A-3*B*B-2*B, -(A*B - B*B - B*B*B))
	v := z*rt/p - e.shift
	return e.molarMass / v
}

// largestCubicRoot returns the largest real root of z³ + a2 z² + a1 z + a0
// (Cardano's method with the trigonometric form for three real roots).
func largestCubicRoot(a2, a1, a0 float64) float64 {
	q := (a2*a2 - 3*a1) / 9
	r := (2*a2*a2*a2 - 9*a2*a1 + 27*a0) / 54
	q3 := q * q * q
	if r*r < q3 {
		theta := math.Acos(r / math.Sqrt(q3))
		return -2*math.Sqrt(q)*math.Cos((theta+2*math.Pi)/3) - a2/3
	}
	s := -math.Copysign(math.Cbrt(math.Abs(r)+math.Sqrt(r*r-q3)), r)
	var u float64
	if s != 0 {
		u = q / s
	}
	return s + u - a2/3
}
