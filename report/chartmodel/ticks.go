package chartmodel

import (
	"math"

	"ullage/report/display"
)

// Tick is a tick mark; a labelled tick also carries a grid line.
type Tick struct {
	Value float64
	Label string
}

// Ticks returns the ticks of an axis. A linear axis gets steps of 1, 2 or
// 5 times a power of ten, about eight of them, labelled with as many
// decimals as the step needs; an axis of counts (Whole) steps by at least
// one, with no tick between whole numbers. A logarithmic axis gets a labelled tick at
// each decade (every second or third decade on a long axis), with 2 and 5
// labelled too on an axis shorter than two and a half decades, and
// unlabelled ticks between. The labels of one axis are all written the
// same way: all as plain numbers when every one of them is between 0.001
// and 99 999, otherwise all as powers of ten (2 × 10⁴, 10⁵), never a mix.
func Ticks(a Axis) []Tick {
	if !(a.Max > a.Min) || !finite(a.Min) || !finite(a.Max) || (a.Log && !(a.Min > 0)) {
		return nil
	}
	if a.Log {
		return logTicks(a.Min, a.Max)
	}
	return linearTicks(a.Min, a.Max, a.Whole)
}

func linearTicks(lo, hi float64, whole bool) []Tick {
	step := NiceStep((hi - lo) / 8)
	minor := step / 5
	if m := step / math.Pow(10, math.Floor(math.Log10(step)+1e-9)); math.Abs(m-2) < 1e-9 {
		minor = step / 4
	}
	if whole {
		step, minor = max(step, 1), max(minor, 1)
		if math.Mod(step, minor) != 0 {
			minor = step
		}
	}
	dec := max(0, int(-math.Floor(math.Log10(step)+1e-9)))
	var out []Tick
	first := math.Ceil(lo/minor - 1e-9)
	for i := first; i*minor <= hi+minor*1e-6; i++ {
		v := i * minor
		r := math.Round(v/step) * step
		if math.Abs(v-r) < minor*1e-3 {
			out = append(out, Tick{Value: r, Label: display.Fixed(r, dec)})
		} else {
			out = append(out, Tick{Value: v})
		}
	}
	return out
}

func logTicks(lo, hi float64) []Tick {
	decades := math.Log10(hi) - math.Log10(lo)
	every := 1
	if decades > 8 {
		every = int(math.Ceil(decades / 8))
	}
	type raw struct {
		v        float64
		m, e     int
		labelled bool
	}
	var rs []raw
	for e := int(math.Floor(math.Log10(lo))); e <= int(math.Ceil(math.Log10(hi))); e++ {
		base := math.Pow(10, float64(e))
		for m := 1; m <= 9; m++ {
			v := float64(m) * base
			if v < lo*(1-1e-9) || v > hi*(1+1e-9) {
				continue
			}
			switch {
			case m == 1:
				rs = append(rs, raw{v, m, e, e%every == 0})
			case decades <= 8:
				rs = append(rs, raw{v, m, e, decades < 2.5 && (m == 2 || m == 5)})
			}
		}
	}
	powers := false
	for _, r := range rs {
		if r.labelled && (r.e < -3 || r.e > 4) {
			powers = true
		}
	}
	out := make([]Tick, len(rs))
	for i, r := range rs {
		out[i] = Tick{Value: r.v}
		if !r.labelled {
			continue
		}
		if powers {
			out[i].Label = powerLabel(r.m, r.e)
		} else {
			out[i].Label = plain(r.v, r.e)
		}
	}
	return out
}

// NiceStep rounds a raw step up to 1, 2 or 5 times a power of ten.
func NiceStep(raw float64) float64 {
	p := math.Pow(10, math.Floor(math.Log10(raw)))
	for _, m := range []float64{1, 2, 5, 10} {
		if raw <= m*p*1.0000001 {
			return m * p
		}
	}
	return 10 * p
}

// LinearRange widens [lo, hi] outward to whole steps of about a sixth of
// the span.
func LinearRange(lo, hi float64) (float64, float64) {
	if !(hi > lo) {
		hi = lo + 1
	}
	step := NiceStep((hi - lo) / 6)
	return math.Floor(lo/step+1e-9) * step, math.Ceil(hi/step-1e-9) * step
}

// LogRange widens [lo, hi] (hi > 0) outward to whole decades, or to 1-2-5
// steps when the span is two decades or less. A minimum that is not
// positive is taken three decades below the top.
func LogRange(lo, hi float64) (float64, float64) {
	if !(lo > 0) {
		lo = hi / 1000
	}
	if !(hi > lo) {
		hi = lo * 10
	}
	l, h := math.Floor(math.Log10(lo)), math.Ceil(math.Log10(hi))
	if h-l <= 2 {
		return stepDown(lo), stepUp(hi)
	}
	return math.Pow(10, l), math.Pow(10, h)
}

func stepDown(v float64) float64 {
	p := math.Pow(10, math.Floor(math.Log10(v)))
	for _, m := range []float64{5, 2, 1} {
		if m*p <= v*(1+1e-9) {
			return m * p
		}
	}
	return p
}

func stepUp(v float64) float64 {
	p := math.Pow(10, math.Floor(math.Log10(v)))
	for _, m := range []float64{1, 2, 5, 10} {
		if m*p >= v*(1-1e-9) {
			return m * p
		}
	}
	return 10 * p
}

// powerLabel writes m × 10^e as "10⁵" or "2 × 10⁵", by the display
// package's notation.
func powerLabel(m, e int) string { return display.PowerOfTen(m, e) }

// plain writes a tick value of decade e as a plain decimal number.
func plain(v float64, e int) string { return display.Fixed(v, max(0, -e)) }

func finite(x float64) bool { return !math.IsNaN(x) && !math.IsInf(x, 0) }
