package report

import (
	"fmt"
	"math"
	"strconv"
	"strings"

	"ullage/fluids/units"
	"ullage/hazards"
	"ullage/hazards/compare"
)

// hasNumber reports whether a result text carries a number (and not
// "not reached", "not assessed" and the like).
func hasNumber(text string) bool {
	return !strings.HasPrefix(text, "not ") && strings.ContainsAny(text, "0123456789")
}

// resultFormat converts a result from the unit the comparison uses to the
// report's units; ok is false for units that need no conversion.
func (u unitSystem) resultFormat(unit string) (format func(float64) string, ok bool) {
	switch unit {
	case "kPa":
		return func(v float64) string { return u.pressure(v * 1000) }, true
	case "°C":
		return func(v float64) string { return u.temperature(units.CelsiusToKelvin(v)) }, true
	case "g":
		return func(v float64) string { return u.mass(v / 1000) }, true
	case "J":
		return func(v float64) string { return u.energy(v) }, true
	}
	return nil, false
}

// resultText is one side of a result in the report's units.
func (u unitSystem) resultText(unit string, v float64, text string) string {
	format, ok := u.resultFormat(unit)
	if !u.us || !ok || !hasNumber(text) {
		return prettyExponent(text)
	}
	prefix := ""
	for _, p := range []string{"above ", "below "} {
		if strings.HasPrefix(text, p) {
			prefix = p
		}
	}
	return prefix + format(v)
}

// prettyExponent rewrites numbers in e notation (1.4e-11) as powers of
// ten (1.4×10⁻¹¹), as the rest of the record prints them.
func prettyExponent(text string) string {
	fields := strings.Fields(text)
	for i, f := range fields {
		if !strings.ContainsAny(f, "eE") {
			continue
		}
		if x, err := strconv.ParseFloat(f, 64); err == nil && finite(x) {
			mant, _, _ := strings.Cut(strings.ToLower(f), "e")
			n := len(strings.TrimLeft(strings.ReplaceAll(strings.TrimLeft(mant, "-+"), ".", ""), "0"))
			fields[i] = power(x, max(n, 1))
		}
	}
	return strings.Join(fields, " ")
}

// resultDelta is the change from A to B in the report's units.
func (u unitSystem) resultDelta(r compare.ResultChange) string {
	if !hasNumber(r.OldText) || !hasNumber(r.NewText) || strings.HasPrefix(r.OldText, "≥") || strings.HasPrefix(r.NewText, "≥") {
		if r.OldText == r.NewText {
			return "no change"
		}
		return noValue
	}
	d := r.New - r.Old
	if d == 0 {
		return "no change"
	}
	switch r.Unit {
	case "kPa":
		return signed(d, u.pressure(d*1000))
	case "°C":
		s := u.temperatureDifference(math.Abs(d))
		if d < 0 {
			return "−" + s
		}
		return "+" + s
	case "g":
		return signed(d, u.mass(d/1000))
	case "J":
		return signed(d, u.energy(d))
	case "%", "% LFL":
		return signed(d, fixed(d, 1)) + " pts"
	case "ppm":
		return signed(d, sig(d, 3)) + " ppm"
	}
	if r.Old > 0 && r.New > 0 && (r.New/r.Old > 10 || r.Old/r.New > 10) {
		return "×" + sig(r.New/r.Old, 2)
	}
	return signed(d, sig(d, 3))
}

// results prints the headline results of both sides with their change.
func (w *comparisonWriter) results() {
	d, u := w.d, w.u
	d.heading("Results side by side")
	d.lead("Each headline result on both sides, the change from A to B and whether that change is for the better or the worse by the quantity's own direction (a higher safety factor is better, a higher pressure worse).")
	var rows [][]cell
	for _, r := range w.c.Results {
		verdict := cell{text: "no change", dim: true}
		switch {
		case r.Better:
			verdict = cell{text: "▲ better"}
		case r.Worse:
			verdict = cell{text: "▼ worse", bold: true}
		case r.Changed():
			verdict = cell{text: "changed"}
		}
		name := "   " + r.Name
		if r.Changed() {
			name = changedMark + " " + r.Name
		}
		rows = append(rows, []cell{{text: name, bold: r.Changed()}, {text: u.resultText(r.Unit, r.Old, r.OldText)},
			{text: u.resultText(r.Unit, r.New, r.NewText)}, {text: u.resultDelta(r)}, verdict})
	}
	d.drawTable(table{cols: []col{{"Result", 2.5, 'L'}, {w.la, 1.35, 'R'}, {w.lb, 1.35, 'R'}, {"Change", 1.3, 'R'}, {"Better or worse", 1.1, 'L'}},
		rows: rows, zebra: true})
}

// findings prints every finding of either side, side by side.
func (w *comparisonWriter) findings() {
	d, c := w.d, w.c
	d.heading("Findings side by side")
	type pair struct {
		title string
		a, b  *hazards.Finding
	}
	var order []string
	byID := map[string]*pair{}
	add := func(s compare.Side, isA bool) {
		if s.Assessment == nil {
			return
		}
		for i := range s.Assessment.Findings {
			f := &s.Assessment.Findings[i]
			p, ok := byID[f.Criterion]
			if !ok {
				p = &pair{title: f.Title}
				byID[f.Criterion] = p
				order = append(order, f.Criterion)
			}
			if isA {
				p.a = f
			} else {
				p.b = f
			}
		}
	}
	add(c.A, true)
	add(c.B, false)
	side := func(f *hazards.Finding, s compare.Side) (cell, cell) {
		if s.Assessment == nil {
			return cell{text: "not assessed", italic: true, dim: true}, cell{}
		}
		if f == nil {
			return cell{text: "not reviewed", italic: true, dim: true}, cell{}
		}
		n := findingNumbers(*f, s.Assessment.Fluid)
		return cell{status: f.Status}, cell{text: n.value}
	}
	var rows [][]cell
	refs := &references{index: map[string]int{}}
	limitOf := func(f *hazards.Finding, s compare.Side) (string, string) {
		if f == nil || s.Assessment == nil {
			return "", ""
		}
		return findingNumbers(*f, s.Assessment.Fluid).limit, f.Source
	}
	for _, id := range order {
		p := byID[id]
		la, srcA := limitOf(p.a, c.A)
		lb, srcB := limitOf(p.b, c.B)
		limit := firstNonBlank(lb, la)
		if la != "" && lb != "" && la != lb {
			limit = la + " / " + lb
		}
		var cites []string
		for _, src := range []string{srcA, srcB} {
			if strings.TrimSpace(src) != "" {
				n := refs.cite(src)
				if !strings.HasPrefix(n, "[") { // a short source is numbered too
					refs.list = append(refs.list, src)
					refs.index[src] = len(refs.list)
					n = fmt.Sprintf("[%d]", len(refs.list))
				}
				if len(cites) == 0 || cites[0] != n {
					cites = append(cites, n)
				}
			}
		}
		changed := p.a == nil || p.b == nil || p.a.Status != p.b.Status
		name := "   " + p.title
		if changed {
			name = changedMark + " " + p.title
		}
		sa, va := side(p.a, c.A)
		sb, vb := side(p.b, c.B)
		rows = append(rows, []cell{{text: name, bold: changed}, sa, va, sb, vb, {text: limit}, {text: strings.Join(cites, " "), dim: true}})
	}
	d.pendingLegend()
	d.drawTable(table{cols: []col{{"Criterion", 2.5, 'L'}, {w.la, 1.05, 'L'}, {"", 0.95, 'R'}, {w.lb, 1.05, 'L'}, {"", 0.95, 'R'}, {"Limit", 0.9, 'R'}, {"Source", 0.6, 'L'}},
		rows: rows, zebra: true, size: 8})
	src := make([][]cell, len(refs.list))
	for i, r := range refs.list {
		src[i] = []cell{{text: fmt.Sprintf("[%d]", i+1), dim: true}, {text: r, italic: true}}
	}
	d.subheading("Sources of the limits")
	d.drawTable(table{cols: []col{{"", 0.07, 'L'}, {"", 0.93, 'L'}}, rows: src, noHeader: true, size: 7})
}

// cautions prints the cautions of both sides, each once.
func (w *comparisonWriter) cautions() {
	d := w.d
	d.heading("Cautions")
	seen := map[string]bool{}
	var cs []string
	for _, s := range []compare.Side{w.c.B, w.c.A} {
		if s.Assessment == nil {
			continue
		}
		list := s.Assessment.Cautions
		if w.u.us && len(s.Assessment.CautionsUS) > 0 {
			list = s.Assessment.CautionsUS
		}
		for _, x := range list {
			if !seen[x] {
				seen[x] = true
				cs = append(cs, x)
			}
		}
	}
	d.box("Read before relying on this record", cautionParas(cs))
}
