package solve

import (
	"errors"
	"fmt"
	"math"
)

// ErrNoBracket is returned when f(lo) and f(hi) have the same sign, so the
// interval is not known to hold a root.
var ErrNoBracket = errors.New("solve: interval does not bracket a root")

// ErrNotFinite is returned when the function gives NaN or ±Inf inside the
// bracket.
var ErrNotFinite = errors.New("solve: function value is not finite")

// Root describes a root found by Brent: the root X, the residual f(X), the
// starting bracket [Lo, Hi], the absolute tolerance on X and the number of
// function evaluations used.
type Root struct {
	X, Residual float64
	Lo, Hi      float64
	Tolerance   float64
	Evaluations int
}

// Brent finds x in [lo, hi] with f(x) = 0 to within tol in x, using Brent's
// method (R. P. Brent, Algorithms for Minimization without Derivatives,
// Prentice-Hall 1973, ch. 4: bisection safeguarding inverse quadratic and
// secant steps). f(lo) and f(hi) must differ in sign (a zero at either end
// is accepted). It returns ErrNoBracket or ErrNotFinite wrapped with the
// values seen, and stops after maxEval evaluations with an error.
func Brent(f func(float64) float64, lo, hi, tol float64, maxEval int) (Root, error) {
	r := Root{Lo: lo, Hi: hi, Tolerance: tol}
	a, b := lo, hi
	fa, fb := f(a), f(b)
	r.Evaluations = 2
	if !isFinite(fa) || !isFinite(fb) {
		return r, fmt.Errorf("%w: f(%g) = %g, f(%g) = %g", ErrNotFinite, a, fa, b, fb)
	}
	if fa == 0 {
		r.X, r.Residual = a, 0
		return r, nil
	}
	if fb == 0 {
		r.X, r.Residual = b, 0
		return r, nil
	}
	if (fa > 0) == (fb > 0) {
		return r, fmt.Errorf("%w: f(%g) = %g, f(%g) = %g", ErrNoBracket, a, fa, b, fb)
	}
	c, fc := a, fa
	d := b - a
	e := d
	for r.Evaluations < maxEval {
		if (fb > 0) == (fc > 0) {
			c, fc = a, fa
			d = b - a
			e = d
		}
		if math.Abs(fc) < math.Abs(fb) {
			a, b, c = b, c, b
			fa, fb, fc = fb, fc, fb
		}
		tol1 := 2*2.220446049250313e-16*math.Abs(b) + 0.5*tol
		xm := 0.5 * (c - b)
		if math.Abs(xm) <= tol1 || fb == 0 {
			r.X, r.Residual = b, fb
			return r, nil
		}
		if math.Abs(e) >= tol1 && math.Abs(fa) > math.Abs(fb) {
			s := fb / fa
			var p, q float64
			if a == c {
				p = 2 * xm * s
				q = 1 - s
			} else {
				qq := fa / fc
				rr := fb / fc
				p = s * (2*xm*qq*(qq-rr) - (b-a)*(rr-1))
				q = (qq - 1) * (rr - 1) * (s - 1)
			}
			if p > 0 {
				q = -q
			}
			p = math.Abs(p)
			if 2*p < min(3*xm*q-math.Abs(tol1*q), math.Abs(e*q)) {
				e = d
				d = p / q
			} else {
				d = xm
				e = d
			}
		} else {
			d = xm
			e = d
		}
		a, fa = b, fb
		if math.Abs(d) > tol1 {
			b += d
		} else {
			b += math.Copysign(tol1, xm)
		}
		fb = f(b)
		r.Evaluations++
		if !isFinite(fb) {
			return r, fmt.Errorf("%w: f(%g) = %g", ErrNotFinite, b, fb)
		}
	}
	r.X, r.Residual = b, fb
	return r, fmt.Errorf("solve: no convergence after %d evaluations (x = %g, f = %g)", maxEval, b, fb)
}

func isFinite(x float64) bool { return !math.IsNaN(x) && !math.IsInf(x, 0) }
