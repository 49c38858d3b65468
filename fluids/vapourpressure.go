package fluids

import (
	"fmt"
	"math"
)

// vapourPressureCurve evaluates a fluid's saturation pressure from its
// published pieces, joined into one continuous curve from the freezing
// point to the critical point:
//
//   - inside a piece, the piece itself;
//   - where two pieces overlap, a linear blend of ln P across the overlap;
//   - in a gap between pieces, ln P interpolated linearly in 1/T (the
//     Clausius–Clapeyron form), flagged as extrapolated;
//   - below the first piece, the first piece extended, flagged;
//   - above the last piece, a three-constant Riedel-type form
//     ln P = α + β/T + γ ln T that matches the last piece's value and
//     slope at its upper limit and passes through the critical point,
//     flagged. The form is Riedel's (Riedel, Chem.-Ing.-Tech. 26, 83
//     (1954); Poling et al., 5th ed., §7-4, from memory); anchoring it to
//     the critical point is our own hand-over, chosen so that the curve
//     ends exactly at (Tc, Pc).
type vapourPressureCurve struct {
	pieces []VapourPressurePiece
	tc, pc float64
	// Riedel-type extension above the last piece.
	extFrom          float64
	extA, extB, extC float64
	lnPc             float64
}

func newVapourPressureCurve(pieces []VapourPressurePiece, tc, pc float64) (*vapourPressureCurve, error) {
	c := &vapourPressureCurve{pieces: pieces, tc: tc, pc: pc, lnPc: math.Log(pc)}
	last := pieces[len(pieces)-1]
	th := math.Min(last.TMaxK, tc)
	c.extFrom = th
	if th >= tc {
		return c, nil
	}
	yh, sh := c.evalPiece(len(pieces)-1, th)
	u := th / tc
	denom := u - 1 - math.Log(u)
	if denom <= 0 || math.IsNaN(denom) {
		return nil, fmt.Errorf("vapour pressure: cannot join last piece at %g K to the critical point", th)
	}
	delta := c.lnPc - yh
	gamma := (delta + sh*th*th*(1/tc-1/th)) / denom
	beta := gamma*th - sh*th*th
	alpha := yh - beta/th - gamma*math.Log(th)
	c.extA, c.extB, c.extC = alpha, beta, gamma
	return c, nil
}

func (c *vapourPressureCurve) evalPiece(i int, t float64) (lnP, dlnPdT float64) {
	p := &c.pieces[i]
	switch p.Form {
	case FormWagner:
		return wagnerLnP(p.A, p.B, p.C, p.D, c.tc, c.pc, t)
	case FormDIPPR101:
		return dippr101LnP(p.A, p.B, p.C, p.D, p.E, t)
	}
	return antoineLnP(p.A, p.B, p.C, t)
}

// lnP returns ln(Psat/Pa) at t and whether t lies outside every published
// piece. t must be finite and at most tc.
func (c *vapourPressureCurve) lnP(t float64) (lnP float64, extrapolated bool) {
	v, _, ext := c.lnPWithSlope(t)
	return v, ext
}

// lnPWithSlope returns ln(Psat/Pa), its temperature derivative and the
// extrapolation flag.
func (c *vapourPressureCurve) lnPWithSlope(t float64) (float64, float64, bool) {
	n := len(c.pieces)
	if t >= c.extFrom {
		if c.extFrom >= c.tc {
			v, s := c.evalPiece(n-1, t)
			return v, s, t > c.pieces[n-1].TMaxK
		}
		v := c.extA + c.extB/t + c.extC*math.Log(t)
		s := -c.extB/(t*t) + c.extC/t
		return v, s, true
	}
	if t < c.pieces[0].TMinK {
		v, s := c.evalPiece(0, t)
		return v, s, true
	}
	for i := 0; i < n; i++ {
		p := &c.pieces[i]
		if t > p.TMaxK {
			continue
		}
		if t >= p.TMinK {
			// Inside piece i; blend with the next piece if they overlap here.
			if i+1 < n {
				q := &c.pieces[i+1]
				if t >= q.TMinK {
					w := (t - q.TMinK) / (p.TMaxK - q.TMinK)
					v1, s1 := c.evalPiece(i, t)
					v2, s2 := c.evalPiece(i+1, t)
					return (1-w)*v1 + w*v2, (1-w)*s1 + w*s2 + (v2-v1)/(p.TMaxK-q.TMinK), false
				}
			}
			v, s := c.evalPiece(i, t)
			return v, s, false
		}
		// In the gap between piece i-1 and piece i: interpolate ln P in 1/T.
		prev := &c.pieces[i-1]
		t0, t1 := prev.TMaxK, p.TMinK
		y0, _ := c.evalPiece(i-1, t0)
		y1, _ := c.evalPiece(i, t1)
		x0, x1, x := 1/t0, 1/t1, 1/t
		w := (x - x0) / (x1 - x0)
		slope := (y1 - y0) / (x1 - x0) * (-1 / (t * t))
		return (1-w)*y0 + w*y1, slope, true
	}
	// Unreachable when pieces are validated and t < extFrom.
	v, s := c.evalPiece(n-1, t)
	return v, s, true
}
