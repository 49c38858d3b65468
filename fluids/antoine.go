package fluids

import "math"

// Correlation forms accepted in a vapour-pressure piece.
const (
	// FormAntoine is the Antoine equation as tabulated in the NIST
	// Chemistry WebBook (SRD 69): log10(P/bar) = A − B/(T/K + C).
	FormAntoine = "antoine-log10-bar-k"
	// FormWagner is the Wagner "2.5-5" form given in Poling, Prausnitz and
	// O'Connell, The Properties of Gases and Liquids, 5th ed. (2001),
	// eq. 7-3.3: ln(P/Pc) = (aτ + bτ^1.5 + cτ^2.5 + dτ^5)/Tr, τ = 1 − Tr.
	FormWagner = "wagner-2.5-5"
	// FormDIPPR101 is DIPPR equation 101 as tabulated in Perry's Chemical
	// Engineers' Handbook (Table 2-8): ln(P/Pa) = A + B/T + C·ln(T/K) +
	// D·T^E.
	FormDIPPR101 = "dippr-101-pa-k"
)

const barPa = 1e5

// antoineLnP returns ln(P/Pa) and d ln P/dT from the NIST form of the
// Antoine equation, log10(P/bar) = A − B/(T + C).
func antoineLnP(a, b, c, t float64) (lnP, dlnPdT float64) {
	x := t + c
	lnP = math.Ln10*(a-b/x) + math.Log(barPa)
	dlnPdT = math.Ln10 * b / (x * x)
	return lnP, dlnPdT
}

// wagnerLnP returns ln(P/Pa) and d ln P/dT from the Wagner 2.5-5 form
// (Poling et al., 5th ed., eq. 7-3.3) for a fluid with critical point
// (tc, pc). It requires t < tc.
func wagnerLnP(a, b, c, d, tc, pc, t float64) (lnP, dlnPdT float64) {
	tr := t / tc
	tau := 1 - tr
	s := math.Sqrt(tau)
	tau2 := tau * tau
	f := a*tau + b*tau*s + c*tau2*s + d*tau2*tau2*tau
	df := a + 1.5*b*s + 2.5*c*tau*s + 5*d*tau2*tau2 // d f / d tau
	lnP = math.Log(pc) + f/tr
	// d/dT (f/tr) = (df/dtau·(−1/tc)·tr − f/tc)/tr²
	dlnPdT = (-df*tr - f) / (tc * tr * tr)
	return lnP, dlnPdT
}

// dippr101LnP returns ln(P/Pa) and d ln P/dT from DIPPR equation 101,
// ln(P/Pa) = A + B/T + C ln T + D T^E.
func dippr101LnP(a, b, c, d, e, t float64) (lnP, dlnPdT float64) {
	te := math.Pow(t, e)
	lnP = a + b/t + c*math.Log(t) + d*te
	dlnPdT = -b/(t*t) + c/t + d*e*te/t
	return lnP, dlnPdT
}
