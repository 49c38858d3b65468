package fluids

import "math"

// Compressed-liquid density by the Tait form of G. H. Thomson, K. R. Brobst
// and R. W. Hankinson, "An Improved Correlation for Densities of Compressed
// Liquids and Liquid Mixtures", AIChE J. 28(4), 671–676 (1982); also
// Poling et al., 5th ed., §4-12 (constants from memory):
//
//	V = Vs [1 − C ln((B + P)/(B + Ps))]
//	B/Pc = −1 + a τ^(1/3) + b τ^(2/3) + d τ + e τ^(4/3),  τ = 1 − Tr
//	e = exp(f + gω + hω²),  C = j + kω
//
// The authors give it for Tr up to 0.95; above that the engine hands over
// to the Peng–Robinson thermal-pressure form and flags the result.
const (
	taitA = -9.070217
	taitB = 62.45326
	taitD = -135.1102
	taitF = 4.79594
	taitG = 0.250047
	taitH = 1.14188
	taitJ = 0.0861488
	taitK = 0.0344483
	// taitMaxTr is the upper reduced temperature of the Tait correlation.
	taitMaxTr = 0.95
)

type tait struct {
	tc, pc, e, c float64
}

func newTait(tc, pc, omega float64) tait {
	return tait{tc: tc, pc: pc, e: math.Exp(taitF + taitG*omega + taitH*omega*omega), c: taitJ + taitK*omega}
}

func (t *tait) bParam(temp float64) float64 {
	tau := 1 - temp/t.tc
	c1 := math.Cbrt(tau)
	return t.pc * (-1 + taitA*c1 + taitB*c1*c1 + taitD*tau + t.e*tau*c1)
}

// density returns the liquid density at (temp, p) from the saturated liquid
// density rhoSat and saturation pressure ps at temp. p ≥ ps.
func (t *tait) density(temp, p, rhoSat, ps float64) float64 {
	return t.densityB(t.bParam(temp), p, rhoSat, ps)
}

// densityB is density with B(temp) given.
func (t *tait) densityB(b, p, rhoSat, ps float64) float64 {
	return rhoSat / (1 - t.c*math.Log((b+p)/(b+ps)))
}

// pressure inverts the Tait equation: the pressure at which the liquid at
// temp has density rho (≥ rhoSat).
func (t *tait) pressure(temp, rho, rhoSat, ps float64) float64 {
	return t.pressureB(t.bParam(temp), rho, rhoSat, ps)
}

// pressureB is pressure with B(temp) given.
func (t *tait) pressureB(b, rho, rhoSat, ps float64) float64 {
	return (b+ps)*math.Exp((1-rhoSat/rho)/t.c) - b
}
