package fluids

import (
	"errors"
	"fmt"
	"math"
	"sync"

	"ullage/fluids/solve"
)

// referenceEOS is a fluid's published equation of state, compiled, with
// its saturation table built lazily on first use.
type referenceEOS struct {
	file *EquationOfState
	h    *helmholtz
	m    float64 // molar mass, kg/mol

	tc, pc, rhoCMol float64 // critical point of the equation (K, Pa, mol/m³)
	tLow            float64 // lowest temperature the saturation table covers, K
	hasIdeal        bool    // the file gives the ideal-gas heat capacity

	// Fixed texts of explanations, built once.
	citation, source, explainName string
	notes                         map[string]string

	tableOnce sync.Once
	table     *satTable
	tableErr  error
}

func newReferenceEOS(e *EquationOfState, tLow float64) (*referenceEOS, error) {
	if err := e.validate(); err != nil {
		return nil, err
	}
	h := e.compile()
	if len(h.exps) > maxCachedExps || len(h.gauss) > maxCachedGauss {
		return nil, fmt.Errorf("%s: %d power and %d Gaussian terms, at most %d and %d are supported", e.Fluid, len(h.exps), len(h.gauss), maxCachedExps, maxCachedGauss)
	}
	if len(h.groups) > maxExpGroups {
		return nil, fmt.Errorf("%s: %d distinct exponential factors, at most %d are supported", e.Fluid, len(h.groups), maxExpGroups)
	}
	r := &referenceEOS{file: e, h: h, m: e.MolarMass, tc: e.Critical.TemperatureK, pc: e.Critical.PressurePa, rhoCMol: e.Critical.DensityMolM3, tLow: tLow}
	r.explainTexts()
	r.hasIdeal = len(e.IdealHeatCapacity) > 0
	if len(h.nonAn) == 0 {
		// The saturation curve must end where this equation's own
		// critical point is, which can differ by a few hundredths of a
		// kelvin from the value a paper or transcription quotes.
		tc, rc, ok := r.criticalPoint()
		if !ok || math.Abs(tc-e.Reducing.TemperatureK) > 2 || math.Abs(rc/e.Reducing.DensityMolM3-1) > 0.05 {
			return nil, fmt.Errorf("%s: the equation's critical point (%.4f K, %.6g mol/m³) is far from its reducing point (%.4f K, %.6g mol/m³)",
				e.Fluid, tc, rc, e.Reducing.TemperatureK, e.Reducing.DensityMolM3)
		}
		r.tc, r.rhoCMol = tc, rc
		r.pc = h.pressure(tc, rc)
	}
	return r, nil
}

// liquidCp is the isobaric heat capacity (J/(mol·K)) at (t, rho mol/m³):
//
//	cp/R = cv0/R − τ² αr_ττ + (1 + δ αr_δ − δτ αr_δτ)² / (1 + 2δ αr_δ + δ² αr_δδ)
//
// with cv0/R from the ideal-gas part.
func (r *referenceEOS) liquidCp(t, rho float64) float64 {
	h := r.h
	delta, tau := rho/h.rhor, h.tr/t
	d := h.eval(delta, tau)
	num := 1 + delta*d.D - delta*tau*d.DT
	den := 1 + 2*delta*d.D + delta*delta*d.DD
	cv := idealCv0OverR(r.file.IdealHeatCapacity, t, h.tr) - tau*tau*d.TT
	return h.r * (cv + num*num/den)
}

// dpdrho is (∂P/∂ρ)_T at (t, rho mol/m³).
func (r *referenceEOS) dpdrho(t, rho float64) float64 { return r.h.state(t, rho).dpdrho }

// criticalPoint finds the equation's own critical point, where the
// isotherm has a horizontal inflection: for each temperature the least
// (∂P/∂ρ)_T over density (golden-section search), and the temperature
// at which that least slope is zero (Brent's method).
func (r *referenceEOS) criticalPoint() (tc, rhoC float64, ok bool) {
	rr := r.h.rhor
	minSlope := func(t float64) (float64, float64) {
		a, b := 0.5*rr, 1.6*rr
		g := (math.Sqrt(5) - 1) / 2
		c, d := b-g*(b-a), a+g*(b-a)
		fc, fd := r.dpdrho(t, c), r.dpdrho(t, d)
		for i := 0; i < 200 && b-a > 1e-11*rr; i++ {
			if fc < fd {
				b, d, fd = d, c, fc
				c = b - g*(b-a)
				fc = r.dpdrho(t, c)
			} else {
				a, c, fc = c, d, fd
				d = a + g*(b-a)
				fd = r.dpdrho(t, d)
			}
		}
		x := 0.5 * (a + b)
		return r.dpdrho(t, x), x
	}
	t0 := r.file.Reducing.TemperatureK
	res, err := solve.Brent(func(t float64) float64 { v, _ := minSlope(t); return v }, t0-2, t0+2, 1e-9, 200)
	if err != nil {
		return 0, 0, false
	}
	_, rhoC = minSlope(res.X)
	return res.X, rhoC, true
}

// errNoSaturation: the saturation solve did not converge.
var errNoSaturation = errors.New("saturation solve did not converge")

// satDirect solves the phase equilibrium at t directly: the reduced
// densities δL, δV at which pressure and Gibbs energy are equal in both
// phases, by Newton's method on
//
//	J(δ) = δ (1 + δ αr_δ)          (P/(ρr R T))
//	K(δ) = δ αr_δ + αr + ln δ      (g/(RT) less the terms equal in both phases)
//
// with J(δL) = J(δV), K(δL) = K(δV), in the form of R. Akasaka, J. Therm.
// Sci. Technol. 3, 442 (2008) (from memory), started from the ancillary
// equations. It returns the pressure (Pa), the liquid and vapour molar
// densities (mol/m³) and the molar heat of vaporisation (J/mol).
func (r *referenceEOS) satDirect(t float64) (p, rhoL, rhoV, dh float64, err error) {
	anc := &r.file.Ancillaries
	return r.satFrom(t, anc.LiquidDensity.eval(t), anc.VapourDensity.eval(t))
}

// satFrom is satDirect started from given liquid and vapour molar
// densities.
func (r *referenceEOS) satFrom(t, rhoL0, rhoV0 float64) (p, rhoL, rhoV, dh float64, err error) {
	h := r.h
	dL, dV := rhoL0/h.rhor, rhoV0/h.rhor
	if !(dL > 0) || !(dV > 0) || !(dL > dV) {
		return 0, 0, 0, 0, errNoSaturation
	}
	dC := r.rhoCMol / h.rhor
	tau := h.tr / t
	var tc tauCache
	h.prepareTau(tau, &tc)
	var eL, eV residualDerivs
	for i := 0; i < 100; i++ {
		eL = h.evalCached(dL, &tc)
		eV = h.evalCached(dV, &tc)
		jL, jV := dL*(1+dL*eL.D), dV*(1+dV*eV.D)
		kL, kV := dL*eL.D+eL.A+math.Log(dL), dV*eV.D+eV.A+math.Log(dV)
		jdL, jdV := 1+2*dL*eL.D+dL*dL*eL.DD, 1+2*dV*eV.D+dV*dV*eV.DD
		kdL, kdV := 2*eL.D+dL*eL.DD+1/dL, 2*eV.D+dV*eV.DD+1/dV
		det := jdV*kdL - jdL*kdV
		if det == 0 || math.IsNaN(det) {
			return 0, 0, 0, 0, errNoSaturation
		}
		stepL := ((kV-kL)*jdV - (jV-jL)*kdV) / det
		stepV := ((kV-kL)*jdL - (jV-jL)*kdL) / det
		// Keep both densities positive and each phase on its own side of
		// the critical density.
		for k := 0; k < 40 && (dV+stepV <= 0 || dL+stepL <= dC || dV+stepV >= dC); k++ {
			stepL, stepV = stepL/2, stepV/2
		}
		dL += stepL
		dV += stepV
		// Newton's method converges quadratically to steps of about
		// 1e-15; near the critical point rounding in the nearly singular
		// Jacobian leaves steps of 1e-12 or so, still far below any
		// property's uncertainty.
		rel := math.Max(math.Abs(stepL)/dL, math.Abs(stepV)/dV)
		if rel <= 1e-13 || (i >= 20 && rel <= 1e-10) {
			break
		}
		if i == 99 {
			return 0, 0, 0, 0, errNoSaturation
		}
	}
	if math.Abs(dL-dV) < 1e-6*dL {
		return 0, 0, 0, 0, errNoSaturation // collapsed onto one phase
	}
	eL = h.evalCached(dL, &tc)
	eV = h.evalCached(dV, &tc)
	rt := h.r * t
	rhoL, rhoV = dL*h.rhor, dV*h.rhor
	p = rhoV * rt * (1 + dV*eV.D)
	dh = rt * (tau*(eV.T-eL.T) + dV*eV.D - dL*eL.D)
	return p, rhoL, rhoV, dh, nil
}

// satTable is the saturation curve from tLow to just below Tc as
// piecewise Chebyshev series in x = (1 − T/Tc)^(1/3), built once from the
// direct solve. In x the liquid and vapour densities, ln P and the heat of
// vaporisation are smooth all the way to the critical point (their
// leading singular terms go as (1 − T/Tc)^β with β near 1/3), so a few
// segments of modest degree reproduce the direct solve to about 1e-10.
// Between the last solved point, xTop, and the critical point (x = 0) the
// densities and heat of vaporisation are interpolated linearly in x and
// ln P linearly in T to the equation's critical point.
type satTable struct {
	tc, lnPc, rhoC float64
	xTop, xLow     float64
	thetaTop       float64 // 1 − T/Tc at xTop
	width          float64
	segs           []satSegment
	top            satPoint // values at xTop
}

type satPoint struct{ lnP, rhoL, lnRhoV, dh, lnCp float64 }

const chebDegree = 14

type satSegment struct {
	lo, hi float64                    // x range
	c      [5][chebDegree + 1]float64 // ln P, ρL, ln ρV, Δh, ln cp of the liquid
}

// xTopTheta is the reduced distance below Tc, 1 − T/Tc, at which the table
// normally stops solving directly: 1e-4, within 0.07 K of Tc for every fluid here.
const xTopTheta = 1e-4

func (r *referenceEOS) sat() (*satTable, error) {
	r.tableOnce.Do(func() {
		// Where the nearly singular Jacobian defeats the solve closest to
		// the critical point, stop the table a little further below it.
		for _, th := range []float64{xTopTheta, 3e-4, 1e-3, 3e-3} {
			r.table, r.tableErr = r.buildTable(16, th)
			if r.tableErr == nil {
				return
			}
		}
	})
	return r.table, r.tableErr
}

func (r *referenceEOS) buildTable(nSeg int, thetaTop float64) (*satTable, error) {
	tb := &satTable{tc: r.tc, lnPc: math.Log(r.pc), rhoC: r.rhoCMol, thetaTop: thetaTop}
	tb.xTop = math.Cbrt(thetaTop)
	tb.xLow = math.Cbrt(1 - r.tLow/r.tc)
	tb.width = (tb.xLow - tb.xTop) / float64(nSeg)
	n := chebDegree + 1
	tb.segs = make([]satSegment, nSeg)
	// Solve at every node from the coldest to the hottest, each start
	// extrapolated linearly in x from the two solutions before it: near
	// the critical point the ancillary equations are not close enough
	// for Newton's method, the continuation is.
	type node struct {
		x      float64
		seg, k int
	}
	var nodes []node
	for s := nSeg - 1; s >= 0; s-- {
		lo := tb.xTop + float64(s)*tb.width
		tb.segs[s].lo, tb.segs[s].hi = lo, lo+tb.width
		for k := 0; k < n; k++ {
			u := math.Cos(math.Pi * (float64(k) + 0.5) / float64(n))
			nodes = append(nodes, node{x: lo + 0.5*tb.width*(1+u), seg: s, k: k})
		}
	}
	nodes = append(nodes, node{x: tb.xTop, seg: -1})
	var f = make([][5][chebDegree + 1]float64, nSeg)
	var px [2]float64
	var pl, pv [2]float64
	solved := 0
	for _, nd := range nodes {
		t := r.tc * (1 - nd.x*nd.x*nd.x)
		var p, rl, rv, dh float64
		err := errNoSaturation
		if solved >= 2 {
			w := (nd.x - px[1]) / (px[1] - px[0])
			p, rl, rv, dh, err = r.satFrom(t, pl[1]+w*(pl[1]-pl[0]), math.Exp(math.Log(pv[1])+w*(math.Log(pv[1])-math.Log(pv[0]))))
		}
		if err != nil {
			p, rl, rv, dh, err = r.satDirect(t)
		}
		if err != nil {
			return nil, fmt.Errorf("%s: saturation at %.4f K: %w", r.file.Fluid, t, err)
		}
		px[0], pl[0], pv[0] = px[1], pl[1], pv[1]
		px[1], pl[1], pv[1] = nd.x, rl, rv
		solved++
		pt := satPoint{math.Log(p), rl, math.Log(rv), dh, 0}
		if r.hasIdeal {
			pt.lnCp = math.Log(r.liquidCp(t, rl))
		}
		if nd.seg < 0 {
			tb.top = pt
			continue
		}
		f[nd.seg][0][nd.k], f[nd.seg][1][nd.k], f[nd.seg][2][nd.k], f[nd.seg][3][nd.k], f[nd.seg][4][nd.k] = pt.lnP, pt.rhoL, pt.lnRhoV, pt.dh, pt.lnCp
	}
	for s := range tb.segs {
		seg := &tb.segs[s]
		for q := 0; q < 5; q++ {
			for j := 0; j < n; j++ {
				var sum float64
				for k := 0; k < n; k++ {
					sum += f[s][q][k] * math.Cos(math.Pi*float64(j)*(float64(k)+0.5)/float64(n))
				}
				seg.c[q][j] = 2 * sum / float64(n)
			}
			seg.c[q][0] /= 2
		}
	}
	return tb, nil
}

// at returns ln P (Pa), ρL, ρV (mol/m³) and Δh (J/mol) at temperature t,
// tLow ≤ t ≤ Tc.
func (tb *satTable) at(t float64) (lnP, rhoL, rhoV, dh float64) {
	th := 1 - t/tb.tc
	if th <= 0 {
		return tb.lnPc, tb.rhoC, tb.rhoC, 0
	}
	x := math.Cbrt(th)
	if x < tb.xTop {
		w := x / tb.xTop
		tTop := tb.tc * (1 - tb.thetaTop)
		lnP = tb.lnPc + (tb.top.lnP-tb.lnPc)*(tb.tc-t)/(tb.tc-tTop)
		rhoL = tb.rhoC + (tb.top.rhoL-tb.rhoC)*w
		rhoV = tb.rhoC + (math.Exp(tb.top.lnRhoV)-tb.rhoC)*w
		return lnP, rhoL, rhoV, tb.top.dh * w
	}
	i := int((x - tb.xTop) / tb.width)
	if i >= len(tb.segs) {
		i = len(tb.segs) - 1
	}
	if i < 0 {
		i = 0
	}
	s := &tb.segs[i]
	u := (2*x - s.lo - s.hi) / (s.hi - s.lo)
	lnP = clenshaw(&s.c[0], u)
	rhoL = clenshaw(&s.c[1], u)
	rhoV = math.Exp(clenshaw(&s.c[2], u))
	dh = clenshaw(&s.c[3], u)
	return
}

// liquidCp returns the saturated liquid's isobaric heat capacity
// (J/(mol·K)) at t from the table; near the critical point, where it
// diverges, the table's last value. Zero without an ideal-gas part.
func (tb *satTable) liquidCp(t float64) float64 {
	th := 1 - t/tb.tc
	x := math.Cbrt(math.Max(th, 0))
	if x < tb.xTop {
		return math.Exp(tb.top.lnCp)
	}
	i := int((x - tb.xTop) / tb.width)
	i = min(max(i, 0), len(tb.segs)-1)
	s := &tb.segs[i]
	u := (2*x - s.lo - s.hi) / (s.hi - s.lo)
	return math.Exp(clenshaw(&s.c[4], u))
}

// densities returns only ρL and ρV (mol/m³) at t: the phase test of a
// single-phase state needs no pressure or heat of vaporisation.
func (tb *satTable) densities(t float64) (rhoL, rhoV float64) {
	th := 1 - t/tb.tc
	x := math.Cbrt(th)
	if th <= 0 || x < tb.xTop {
		_, rhoL, rhoV, _ = tb.at(t)
		return
	}
	i := int((x - tb.xTop) / tb.width)
	i = min(max(i, 0), len(tb.segs)-1)
	s := &tb.segs[i]
	u := (2*x - s.lo - s.hi) / (s.hi - s.lo)
	return clenshaw(&s.c[1], u), math.Exp(clenshaw(&s.c[2], u))
}

func clenshaw(c *[chebDegree + 1]float64, u float64) float64 {
	var b1, b2 float64
	u2 := 2 * u
	for j := chebDegree; j >= 1; j-- {
		b1, b2 = u2*b1-b2+c[j], b1
	}
	return u*b1 - b2 + c[0]
}
