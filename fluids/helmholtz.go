package fluids

import (
	"math"
)

// The reduced residual Helmholtz energy αr(δ, τ) = a_res/(RT) of a
// multiparameter equation of state, in the reduced density δ = ρ/ρr and
// the inverse reduced temperature τ = Tr/T, as a sum of the published
// term kinds:
//
//	polynomial and exponential   n δ^d τ^t exp(−c δ^l)          (l = 0: no exponential)
//	double exponential           n δ^d τ^t exp(−c δ^l − g τ^m)
//	Gaussian                     n δ^d τ^t exp(−η(δ−ε)² − β(τ−γ)²)
//	Gaussian with rational τ     n δ^d τ^t exp(η(δ−ε)² + 1/(β(τ−γ)² + b))
//	non-analytic (IAPWS-95)      n Δ^b δ ψ
//
// Each term's derivatives are accumulated in the scaled form δ^i τ^j
// ∂^(i+j)αr/∂δ^i∂τ^j, which for these products is the term times a
// polynomial in the logarithmic derivatives; no division happens inside
// the sum. Integer powers of δ and τ come from tables built by
// multiplication; non-integer powers of τ from one exponential each;
// exp(−c δ^l) is shared by every term with the same (c, l).

// residualDerivs holds αr and its derivatives at one (δ, τ).
type residualDerivs struct {
	A, D, DD, T, TT, DT float64 // αr, ∂δ, ∂δδ, ∂τ, ∂ττ, ∂δ∂τ
}

type expTerm struct {
	n     float64
	d     int     // integer density exponent
	t     float64 // temperature exponent
	ti    int     // t as an integer when tInt
	tInt  bool
	group int // index into the shared exp(−c δ^l) table, −1 for none
	cl    float64
	cl2   float64 // c·l and c·l², for the derivatives
	l     int
	// Double exponential: exp(−g τ^m); m integer ≥ 1, g = 0 for none.
	g float64
	m int
}

type expGroup struct {
	c float64
	l int
}

type gaussTerm struct {
	n, t           float64
	d              int
	eta, eps, beta float64
	gamma          float64
	rational       bool    // exp(η(δ−ε)² + 1/(β(τ−γ)² + b))
	b              float64 // rational form only
	tInt           bool
	ti             int
}

type nonAnalyticTerm struct {
	n, a, b, beta, capA, capB, capC, capD float64
}

// helmholtz is a compiled residual Helmholtz energy with its reducing
// constants. It is immutable after construction.
type helmholtz struct {
	tr, rhor float64 // reducing temperature (K) and molar density (mol/m³)
	r        float64 // gas constant of the equation, J/(mol·K)
	molar    float64 // molar mass, kg/mol

	exps    []expTerm
	groups  []expGroup
	gauss   []gaussTerm
	nonAn   []nonAnalyticTerm
	maxD    int // largest integer power of δ needed
	maxTInt int // largest integer power of τ needed
	maxL    int
}

const (
	maxPowerTable = 64
	maxExpGroups  = 32
)

// Limits of the per-temperature cache: the longest equation here (water)
// has 51 power terms and 3 Gaussian ones.
const (
	maxCachedExps  = 64
	maxCachedGauss = 16
)

// tauCache holds every factor of the terms that depends on τ alone, so
// that a density iteration at fixed temperature pays for the
// temperature exponentials once.
type tauCache struct {
	tau         float64
	ef, eB, eBB [maxCachedExps]float64  // n τ^t exp(−g τ^m); B; B² − B + extra
	gf, gB, gBB [maxCachedGauss]float64 // n τ^t times the τ exponential; B; τ² part
	gx          [maxCachedGauss]float64 // the τ part of the Gaussian exponent
}

// deltaPart returns the density part of Gaussian term g at reduced
// density delta, given the term's temperature factor gf and the τ part of
// its exponent gx from the tauCache, and δ^d: f, the term times δ-factors;
// A = δ·∂ln f/∂δ; dA, the second-derivative factor δ²·(∂²f/∂δ²)/f. ok is
// false when the bell is so far away (exponent below −600, a value under
// 1e-260) that the term adds nothing. Both evaluations of the equation
// call it, so they agree bit for bit.
func (g *gaussTerm) deltaPart(delta, gf, gx, deltaPowD float64) (f, A, dA float64, ok bool) {
	dd := delta - g.eps
	if !g.rational {
		if -g.eta*dd*dd+gx < -600 {
			return 0, 0, 0, false
		}
		f = gf * deltaPowD * math.Exp(-g.eta*dd*dd)
		A = float64(g.d) - 2*g.eta*delta*dd
		dA = A*A - float64(g.d) - 2*g.eta*delta*delta
		return f, A, dA, true
	}
	f = gf * deltaPowD * math.Exp(g.eta*dd*dd)
	A = float64(g.d) + 2*g.eta*delta*dd
	dA = A*A - float64(g.d) + 2*g.eta*delta*delta
	return f, A, dA, true
}

// prepareTau fills c for inverse reduced temperature tau.
func (h *helmholtz) prepareTau(tau float64, c *tauCache) {
	c.tau = tau
	var tp [maxPowerTable + 1]float64 // τ^k
	tp[0] = 1
	for k := 1; k <= h.maxTInt; k++ {
		tp[k] = tp[k-1] * tau
	}
	lnTau := math.Log(tau)
	for i := range h.exps {
		e := &h.exps[i]
		var tt float64
		if e.tInt {
			if e.ti >= 0 {
				tt = tp[e.ti]
			} else {
				tt = 1 / tp[-e.ti]
			}
		} else {
			tt = math.Exp(e.t * lnTau)
		}
		f := e.n * tt
		B := e.t
		var extraT float64
		if e.g != 0 {
			tm := tp[e.m]
			f *= math.Exp(-e.g * tm)
			gm := e.g * float64(e.m)
			B -= gm * tm
			extraT = -gm * float64(e.m) * tm
		}
		c.ef[i], c.eB[i], c.eBB[i] = f, B, B*B-B+extraT
	}
	for i := range h.gauss {
		g := &h.gauss[i]
		tg := tau - g.gamma
		var tt float64
		if g.tInt {
			tt = tp[g.ti]
		} else {
			tt = math.Exp(g.t * lnTau)
		}
		if !g.rational {
			x := -g.beta * tg * tg
			c.gx[i] = x
			if x < -600 {
				continue
			}
			B := g.t - 2*g.beta*tau*tg
			c.gf[i] = g.n * tt * math.Exp(x)
			c.gB[i] = B
			c.gBB[i] = B*B - g.t - 2*g.beta*tau*tau
			continue
		}
		den := g.beta*tg*tg + g.b
		g1 := -2 * g.beta * tg / (den * den)                            // dg/dτ
		g2 := -2*g.beta/(den*den) + 8*g.beta*g.beta*tg*tg/(den*den*den) // d²g/dτ²
		B := g.t + tau*g1
		c.gf[i] = g.n * tt * math.Exp(1/den)
		c.gB[i] = B
		c.gBB[i] = B*B - g.t + tau*tau*g2
	}
}

// eval returns αr and its derivatives at (δ, τ).
func (h *helmholtz) eval(delta, tau float64) residualDerivs {
	var c tauCache
	h.prepareTau(tau, &c)
	return h.evalCached(delta, &c)
}

// evalCached returns αr and its derivatives at δ and the temperature c
// was prepared for.
func (h *helmholtz) evalCached(delta float64, c *tauCache) residualDerivs {
	tau := c.tau
	var dp [maxPowerTable + 1]float64 // δ^k
	dp[0] = 1
	for k := 1; k <= h.maxD; k++ {
		dp[k] = dp[k-1] * delta
	}
	var ge [maxExpGroups]float64 // shared exp(−c δ^l)
	for i, g := range h.groups {
		ge[i] = math.Exp(-g.c * dp[g.l])
	}
	// Scaled sums: δ^i τ^j ∂^(i+j)αr.
	var a, sd, sdd, st, stt, sdt float64
	for i := range h.exps {
		e := &h.exps[i]
		f := c.ef[i] * dp[e.d]
		A := float64(e.d)
		var extraD float64
		if e.group >= 0 {
			f *= ge[e.group]
			dl := dp[e.l]
			A -= e.cl * dl
			extraD = -e.cl2 * dl
		}
		B := c.eB[i]
		a += f
		sd += f * A
		sdd += f * (A*A - A + extraD)
		st += f * B
		stt += f * c.eBB[i]
		sdt += f * A * B
	}
	for i := range h.gauss {
		f, A, dA, ok := h.gauss[i].deltaPart(delta, c.gf[i], c.gx[i], dp[h.gauss[i].d])
		if !ok {
			continue
		}
		B := c.gB[i]
		a += f
		sd += f * A
		sdd += f * dA
		st += f * B
		stt += f * c.gBB[i]
		sdt += f * A * B
	}
	r := residualDerivs{A: a, D: sd / delta, DD: sdd / (delta * delta), T: st / tau, TT: stt / (tau * tau), DT: sdt / (delta * tau)}
	for i := range h.nonAn {
		h.nonAn[i].add(&r, delta, tau)
	}
	return r
}

// add accumulates one IAPWS-95 non-analytic term n Δ^b δ ψ with
//
//	θ = (1 − τ) + A [(δ − 1)²]^(1/(2β)),  Δ = θ² + B [(δ − 1)²]^a,
//	ψ = exp(−C(δ − 1)² − D(τ − 1)²),
//
// and its derivatives as written in the IAPWS release on IAPWS-95 (2018
// revision), Table 5 (from memory of the published form).
func (q *nonAnalyticTerm) add(r *residualDerivs, delta, tau float64) {
	dm := delta - 1
	if math.Abs(dm) < 1e-10 {
		// The derivatives contain (δ − 1) to negative powers that cancel
		// analytically; step off the singular line by a rounding error.
		dm = 1e-10
	}
	tm := tau - 1
	d2 := dm * dm
	// ψ carries the whole term: with C(δ−1)² + D(τ−1)² above 600 it is
	// below 1e-260 and the term, with all its derivatives, vanishes at
	// double precision (Δ^b and its derivatives stay below 1e10 there).
	if q.capC*d2+q.capD*tm*tm > 600 {
		return
	}
	ib := 1 / (2 * q.beta)
	theta := -tm + q.capA*math.Pow(d2, ib)
	Delta := theta*theta + q.capB*math.Pow(d2, q.a)
	if Delta <= 0 {
		Delta = 1e-300
	}
	psi := math.Exp(-q.capC*d2 - q.capD*tm*tm)
	psiD := -2 * q.capC * dm * psi
	psiDD := (2*q.capC*d2 - 1) * 2 * q.capC * psi
	psiT := -2 * q.capD * tm * psi
	psiTT := (2*q.capD*tm*tm - 1) * 2 * q.capD * psi
	psiDT := 4 * q.capC * q.capD * dm * tm * psi

	pIb1 := math.Pow(d2, ib-1)
	dDelta := dm * (q.capA*theta*(2/q.beta)*pIb1 + 2*q.capB*q.a*math.Pow(d2, q.a-1))
	ddDelta := dDelta/dm + d2*(4*q.capB*q.a*(q.a-1)*math.Pow(d2, q.a-2)+
		2*q.capA*q.capA*(1/(q.beta*q.beta))*pIb1*pIb1+
		q.capA*theta*(4/q.beta)*(ib-1)*math.Pow(d2, ib-2))
	db := math.Pow(Delta, q.b)
	db1 := math.Pow(Delta, q.b-1)
	db2 := db1 / Delta
	dbD := q.b * db1 * dDelta
	dbDD := q.b * (db1*ddDelta + (q.b-1)*db2*dDelta*dDelta)
	dbT := -2 * theta * q.b * db1
	dbTT := 2*q.b*db1 + 4*theta*theta*q.b*(q.b-1)*db2
	dbDT := -q.capA*q.b*(2/q.beta)*db1*dm*pIb1 - 2*theta*q.b*(q.b-1)*db2*dDelta

	n := q.n
	r.A += n * db * delta * psi
	r.D += n * (db*(psi+delta*psiD) + dbD*delta*psi)
	r.DD += n * (db*(2*psiD+delta*psiDD) + 2*dbD*(psi+delta*psiD) + dbDD*delta*psi)
	r.T += n * delta * (dbT*psi + db*psiT)
	r.TT += n * delta * (dbTT*psi + 2*dbT*psiT + db*psiTT)
	r.DT += n * (db*(psiT+delta*psiDT) + delta*dbD*psiT + dbT*(psi+delta*psiD) + dbDT*delta*psi)
}

// pressure returns the pressure (Pa) at temperature t (K) and molar
// density rho (mol/m³): P = ρRT(1 + δ αr_δ). Explicit, no iteration.
func (h *helmholtz) pressure(t, rho float64) float64 {
	var c tauCache
	h.prepareTau(h.tr/t, &c)
	delta := rho / h.rhor
	sd, _ := h.densityDerivsCached(delta, &c)
	return rho * h.r * t * (1 + rho/h.rhor*(sd/delta))
}

// stateAt is the thermodynamic state at (T, ρ) that the solvers need.
type stateAt struct {
	p      float64 // Pa
	dpdrho float64 // (∂P/∂ρ)_T, Pa·m³/mol
	dpdt   float64 // (∂P/∂T)_ρ, Pa/K
	d      residualDerivs
	delta  float64
	tau    float64
}

func (h *helmholtz) state(t, rho float64) stateAt {
	var c tauCache
	h.prepareTau(h.tr/t, &c)
	return h.stateCached(t, rho, &c)
}

// densityDerivsCached returns only δ·∂αr/∂δ and δ²·∂²αr/∂δ² at δ and the
// temperature c was prepared for: all that the pressure and its density
// slope need. The sums are those of evalCached, term for term; an
// equation with non-analytic terms takes evalCached itself.
func (h *helmholtz) densityDerivsCached(delta float64, c *tauCache) (sd, sdd float64) {
	if len(h.nonAn) > 0 {
		d := h.evalCached(delta, c)
		return delta * d.D, delta * delta * d.DD
	}
	var dp [maxPowerTable + 1]float64 // δ^k
	dp[0] = 1
	for k := 1; k <= h.maxD; k++ {
		dp[k] = dp[k-1] * delta
	}
	var ge [maxExpGroups]float64 // shared exp(−c δ^l)
	for i, g := range h.groups {
		ge[i] = math.Exp(-g.c * dp[g.l])
	}
	for i := range h.exps {
		e := &h.exps[i]
		f := c.ef[i] * dp[e.d]
		A := float64(e.d)
		var extraD float64
		if e.group >= 0 {
			f *= ge[e.group]
			dl := dp[e.l]
			A -= e.cl * dl
			extraD = -e.cl2 * dl
		}
		sd += f * A
		sdd += f * (A*A - A + extraD)
	}
	for i := range h.gauss {
		f, A, dA, ok := h.gauss[i].deltaPart(delta, c.gf[i], c.gx[i], dp[h.gauss[i].d])
		if !ok {
			continue
		}
		sd += f * A
		sdd += f * dA
	}
	return sd, sdd
}

// pressureSlopeCached returns the pressure (Pa) and (∂P/∂ρ)_T
// (Pa·m³/mol) at molar density rho and the temperature c was prepared
// for, as stateCached gives them.
func (h *helmholtz) pressureSlopeCached(t, rho float64, c *tauCache) (p, dpdrho float64) {
	delta := rho / h.rhor
	sd, sdd := h.densityDerivsCached(delta, c)
	// stateCached's δ·D and δ²·DD, with D = sd/δ and DD = sdd/δ².
	dD := delta * (sd / delta)
	ddDD := delta * delta * (sdd / (delta * delta))
	rt := h.r * t
	return rho * rt * (1 + dD), rt * (1 + 2*dD + ddDD)
}

// stateCached is state at the temperature c was prepared for.
func (h *helmholtz) stateCached(t, rho float64, c *tauCache) stateAt {
	delta, tau := rho/h.rhor, c.tau
	d := h.evalCached(delta, c)
	rt := h.r * t
	return stateAt{
		p:      rho * rt * (1 + delta*d.D),
		dpdrho: rt * (1 + 2*delta*d.D + delta*delta*d.DD),
		dpdt:   rho * h.r * (1 + delta*d.D - delta*tau*d.DT),
		d:      d,
		delta:  delta,
		tau:    tau,
	}
}
