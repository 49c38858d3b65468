// Package solve finds roots of one-variable functions with Brent's method
// and reports how the root was found (bracket, tolerance, residual,
// iterations) so that results can be traced and checked by hand.
package solve
