package fluids

import "math"

// IsothermTable prepares isotherms of one fluid's reference equation of
// state over a fixed temperature range faster than PrepareIsotherm, for
// studies that evaluate a million states at a million slightly different
// temperatures. It holds every temperature factor of the equation (the
// parts of its terms that depend on τ = Tr/T alone) at evenly spaced τ
// and interpolates them with four-point Lagrange polynomials, a few
// multiplications per factor instead of the equation's exponentials and
// powers. An IsothermTable is immutable and safe for concurrent use.
//
// Error bound: the node spacing is halved until, at the middle of every
// interval (where a cubic's error is largest), the error of each term's
// temperature factors — its amplitude, and its exponent and logarithmic
// derivatives times that amplitude — is within tableFactorTolerance of
// the largest amplitude of any term anywhere in the table. TestIsothermTableMatches
// checks the pressure and its density slope against PrepareIsotherm at
// random temperatures and densities for every built-in fluid with an
// equation of state: within 1e-9 of ρRT for the pressure and 1e-9
// relative for the slope.
type IsothermTable struct {
	s         *Substance
	tLo, tHi  float64 // the temperatures it serves, K
	tau0, inv float64 // τ of node 0 and 1/spacing
	nodes     int
	ne, ng    int       // the equation's power and Gaussian terms
	width     int       // factors per node: 3 per power term, 4 per Gaussian
	rows      []float64 // nodes × width, node-major
}

// tableFactorTolerance is the error allowed in each term's tabulated
// temperature factors at the middle of an interval, relative to the
// largest term (see IsothermTable).
const tableFactorTolerance = 1e-11

// maxTableNodes bounds the table's size (about 1.5 MB for the longest
// equation here); a range that would need more is not tabulated.
const maxTableNodes = 4096

// NewIsothermTable tabulates the temperature factors of s's reference
// equation over tLo ≤ T ≤ tHi (K). It returns nil when s has no reference
// equation, when the range is empty or not finite, or when the factors
// cannot be tabulated within the bound in maxTableNodes nodes; a nil table
// prepares nothing (Prepare returns false) and callers use PrepareIsotherm.
func (s *Substance) NewIsothermTable(tLo, tHi float64) *IsothermTable {
	if s == nil || s.ref == nil || !(tLo > 0) || !(tHi > tLo) || math.IsInf(tHi, 0) {
		return nil
	}
	h := s.ref.h
	tauLo, tauHi := h.tr/tHi, h.tr/tLo
	for n := 16; n <= maxTableNodes; n *= 2 {
		tb := &IsothermTable{s: s, tLo: tLo, tHi: tHi, ne: len(h.exps), ng: len(h.gauss)}
		tb.width = 3*tb.ne + 4*tb.ng
		step := (tauHi - tauLo) / float64(n-3)
		tb.tau0, tb.inv, tb.nodes = tauLo-step, 1/step, n
		tb.rows = make([]float64, n*tb.width)
		var c tauCache
		for k := range n {
			c = tauCache{}
			h.prepareTau(tb.tau0+float64(k)*step, &c)
			tb.flatten(&c, tb.rows[k*tb.width:(k+1)*tb.width])
		}
		if tb.withinBound(step) {
			return tb
		}
	}
	return nil
}

// flatten writes the factors of c into row, in the table's order.
func (tb *IsothermTable) flatten(c *tauCache, row []float64) {
	ne, ng := tb.ne, tb.ng
	copy(row[0:], c.ef[:ne])
	copy(row[ne:], c.eB[:ne])
	copy(row[2*ne:], c.eBB[:ne])
	g := row[3*ne:]
	copy(g[0:], c.gf[:ng])
	copy(g[ng:], c.gB[:ng])
	copy(g[2*ng:], c.gBB[:ng])
	copy(g[3*ng:], c.gx[:ng])
}

// withinBound checks every term at the middle of every interval the
// interpolation uses against its exact value (see tableFactorTolerance).
func (tb *IsothermTable) withinBound(step float64) bool {
	ne, ng := tb.ne, tb.ng
	largest := 0.0 // the largest amplitude of any term anywhere
	for k := range tb.nodes {
		row := tb.rows[k*tb.width : (k+1)*tb.width]
		for _, x := range row[:ne] {
			largest = math.Max(largest, math.Abs(x))
		}
		for _, x := range row[3*ne : 3*ne+ng] {
			largest = math.Max(largest, math.Abs(x))
		}
	}
	h := tb.s.ref.h
	var exact, got tauCache
	for k := 1; k < tb.nodes-2; k++ {
		tau := tb.tau0 + (float64(k)+0.5)*step
		exact = tauCache{}
		h.prepareTau(tau, &exact)
		tb.interpolate(tau, &got)
		for i := range ne {
			e := math.Abs(got.ef[i]-exact.ef[i]) +
				math.Abs(exact.ef[i])*(math.Abs(got.eB[i]-exact.eB[i])+math.Abs(got.eBB[i]-exact.eBB[i]))
			if !(e <= tableFactorTolerance*largest) {
				return false
			}
		}
		for i := range ng {
			if exact.gx[i] < -600 {
				continue // the term is cut off there (prepareTau)
			}
			e := math.Abs(got.gf[i]-exact.gf[i]) +
				math.Abs(exact.gf[i])*(math.Abs(got.gB[i]-exact.gB[i])+math.Abs(got.gBB[i]-exact.gBB[i])+math.Abs(got.gx[i]-exact.gx[i]))
			if !(e <= tableFactorTolerance*largest) {
				return false
			}
		}
	}
	return true
}

// Prepare prepares it for temperature t (K) from the table and reports
// whether it could: false for a nil table or a temperature outside the
// table's range, and then it is left as it was.
func (tb *IsothermTable) Prepare(t float64, it *Isotherm) bool {
	if tb == nil || !(t >= tb.tLo && t <= tb.tHi) {
		return false
	}
	it.s, it.t = tb.s, t
	tb.interpolate(tb.s.ref.h.tr/t, &it.c)
	return true
}

// interpolate fills c's factors at tau from the four nodes around it.
func (tb *IsothermTable) interpolate(tau float64, c *tauCache) {
	u := (tau - tb.tau0) * tb.inv
	j := int(u)
	j = min(max(j, 1), tb.nodes-3)
	s := u - float64(j)
	// Lagrange weights of the nodes at −1, 0, 1, 2 (in spacings from j).
	sm1, sm2, sp1 := s-1, s-2, s+1
	w0 := -s * sm1 * sm2 / 6
	w1 := sp1 * sm1 * sm2 / 2
	w2 := -sp1 * s * sm2 / 2
	w3 := sp1 * s * sm1 / 6
	wd := tb.width
	r0 := tb.rows[(j-1)*wd : j*wd]
	r1 := tb.rows[j*wd : (j+1)*wd]
	r2 := tb.rows[(j+1)*wd : (j+2)*wd]
	r3 := tb.rows[(j+2)*wd : (j+3)*wd]
	at := func(i int) float64 { return w0*r0[i] + w1*r1[i] + w2*r2[i] + w3*r3[i] }
	c.tau = tau
	ne, ng := tb.ne, tb.ng
	for i := range ne {
		c.ef[i] = at(i)
		c.eB[i] = at(ne + i)
		c.eBB[i] = at(2*ne + i)
	}
	g := 3 * ne
	for i := range ng {
		c.gf[i] = at(g + i)
		c.gB[i] = at(g + ng + i)
		c.gBB[i] = at(g + 2*ng + i)
		c.gx[i] = at(g + 3*ng + i)
	}
}
