package display

import (
	"math"

	"ullage/hazards"
	"ullage/hazards/compare"
)

// resultQuantity returns the quantity a headline result is shown in.
func resultQuantity(q compare.Quantity) Quantity {
	switch q {
	case compare.Pressure:
		return Pressure
	case compare.Percent:
		return Percent
	case compare.Temperature:
		return Temperature
	case compare.Stress:
		return Stress
	case compare.Mass:
		return Mass
	case compare.Energy:
		return Energy
	case compare.Concentration:
		return Concentration
	case compare.PercentLFL:
		return PercentLFL
	}
	return Plain
}

// ResultValue formats one side of a headline result of a comparison in
// the system's units: the state in words when there is no value, "above
// …", "below …" or "at least …" for a bound, and the part it belongs to
// in brackets ("2.1 (lower bulb, 40.0 K hot-to-cold)").
func ResultValue(r compare.ResultChange, rd compare.Reading, s System) string {
	if rd.State != "" {
		return string(rd.State)
	}
	v := s.Format(resultQuantity(r.Quantity), rd.Value)
	switch rd.Bound {
	case "":
	case string(hazards.AtLeast):
		v = "at least " + v
	default:
		v = rd.Bound + " " + v
	}
	switch {
	case rd.ShockDirection != "":
		v += " (" + rd.Part + ", " + s.Format(TempDifference, rd.ShockDeltaK) + " " + rd.ShockDirection + ")"
	case rd.Part != "":
		v += " (" + rd.Part + ")"
	}
	return v
}

// ResultDelta formats the change of a headline result from A to B: a
// signed difference in the system's units, a factor when the values
// differ tenfold or more, "no change", or NoValue when either side has no
// value or only a bound.
func ResultDelta(r compare.ResultChange, s System) string {
	o, n := r.Old, r.New
	if o.State != "" || n.State != "" || o.Bound != "" || n.Bound != "" {
		if o == n {
			return "no change"
		}
		return NoValue
	}
	d := n.Value - o.Value
	if d == 0 {
		return "no change"
	}
	q := resultQuantity(r.Quantity)
	if q == Plain && o.Value > 0 && n.Value > 0 && (n.Value/o.Value >= 10 || o.Value/n.Value >= 10) {
		return "× " + Number(n.Value/o.Value, MarginFigures)
	}
	var t string
	switch q {
	case Temperature:
		t = s.Format(TempDifference, math.Abs(d))
	case Percent, PercentLFL:
		t = Number(math.Abs(d), ValueFigures) + " points"
	default:
		t = s.Format(q, math.Abs(d))
	}
	if d < 0 {
		return "−" + t
	}
	return "+" + t
}
