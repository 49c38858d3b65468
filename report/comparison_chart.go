package report

import (
	"math"

	"ullage/hazards"
)

// chart draws both pressure–temperature curves on one chart, A as a broad
// grey line and B dashed on top of it (so that B stays visible where the
// curves coincide), with each side's allowable pressure and liquid-full
// point.
func (w *comparisonWriter) chart() {
	d, u := w.d, w.u
	type sideCurve struct {
		label string
		a     *hazards.Assessment
		curve lineStyle
		allow lineStyle
		shape markShape
	}
	sides := []sideCurve{
		{w.la, w.c.A.Assessment, lineStyle{width: 1.2, colour: midGrey}, dottedLine, markSquare},
		{w.lb, w.c.B.Assessment, dashedLine, dashDotLine, markDiamond},
	}
	lo, hi := math.Inf(1), math.Inf(-1)
	for _, s := range sides {
		if s.a != nil {
			l, h := pressureRange(s.a)
			lo, hi = math.Min(lo, l), math.Max(hi, h)
		}
	}
	tq, pq := u.temperatureQ(), u.pressureQ()
	var all []xy
	var ss []series
	var lines []refLine
	var marks []mark
	knee, allowMax := 0.0, 0.0
	var allowText []string
	for _, s := range sides {
		if s.a == nil {
			continue
		}
		curve := convertXY(pressureCurve(s.a, lo, hi), tq, pq)
		all = append(all, curve...)
		ss = append(ss, series{name: s.label + ": internal pressure", pts: curve, style: s.curve})
		allow := s.a.AllowablePressurePa()
		allowMax = math.Max(allowMax, allow)
		allowText = append(allowText, u.pressure(allow))
		lines = append(lines, refLine{value: pq.conv(allow), label: "Allowable, " + s.label + ", " + u.pressure(allow), style: s.allow})
		k := 0.0
		if s.a.LiquidFullReached {
			if st, err := stateAt(s.a, s.a.LiquidFullK); err == nil {
				if s.a.LiquidFullK <= hi {
					k = st.PressurePa
				}
				marks = append(marks, mark{at: xy{tq.conv(s.a.LiquidFullK), pq.conv(st.PressurePa)}, label: "Liquid-full, " + s.label + ", " + u.temperature(s.a.LiquidFullK), shape: s.shape})
			}
		}
		knee = math.Max(knee, k)
	}
	if len(ss) == 2 && allowText[0] == allowText[1] {
		lines = []refLine{{value: lines[0].value, label: "Allowable, both, " + u.pressure(allowMax), style: dottedLine}}
	}
	hotA, hotB := w.c.A.Design.HottestK, w.c.B.Design.HottestK
	if w.c.A.Assessment != nil && w.c.B.Assessment != nil && !sameValue(hotA, hotB) {
		lines = append(lines,
			refLine{value: tq.conv(hotA), vertical: true, label: "Hottest, " + w.la + ", " + u.temperature(hotA), style: longDashLine},
			refLine{value: tq.conv(hotB), vertical: true, label: "Hottest, " + w.lb + ", " + u.temperature(hotB), style: longDashLine})
	} else {
		hot := hotB
		if w.c.B.Assessment == nil {
			hot = hotA
		}
		lines = append(lines, refLine{value: tq.conv(hot), vertical: true, label: "Hottest " + u.temperature(hot), style: longDashLine})
	}
	log, ylo, yhi := pressureScale(all, pq.conv(knee), pq.conv(allowMax))
	ch := pressureTemperatureChart(u, "Figure 1. Internal pressure against temperature, both revisions", lo, hi, log, ylo, yhi)
	ch.series, ch.lines, ch.marks = ss, lines, marks
	d.heading("Pressure against temperature")
	d.drawChart(ch, chartHeight+6)
	if log {
		d.note("The pressure axis is logarithmic so that the steep rise past a liquid-full point does not flatten the rest of the curves.")
	}
}

// sameValue reports whether two numbers agree to a part in a million.
func sameValue(a, b float64) bool { return math.Abs(a-b) <= 1e-6*math.Max(math.Abs(a), math.Abs(b)) }
