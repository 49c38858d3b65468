package report

import (
	"strings"

	"ullage/hazards"
	"ullage/hazards/compare"
	"ullage/report/display"
)

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
		rows = append(rows, []cell{{text: name, bold: r.Changed()}, {text: display.ResultValue(r, r.Old, u.system())},
			{text: display.ResultValue(r, r.New, u.system())}, {text: display.ResultDelta(r, u.system())}, verdict})
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
		return cell{status: f.Status}, cell{text: display.FindingValue(*f)}
	}
	var rows [][]cell
	refs := &references{index: map[string]int{}}
	limitOf := func(f *hazards.Finding, s compare.Side) (string, string) {
		if f == nil || s.Assessment == nil {
			return "", ""
		}
		return display.FindingLimit(*f), f.Source
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
				n := refs.number(src)
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
	d.drawTable(table{cols: []col{{"Criterion", 1.95, 'L'}, {w.la, 1.1, 'L'}, {"", 1.05, 'R'}, {w.lb, 1.1, 'L'}, {"", 1.05, 'R'}, {"Limit", 1.1, 'R'}, {"Source", 0.65, 'L'}},
		rows: rows, zebra: true, size: 8})
	d.sourceList("Sources of the limits", refs.list)
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
		for _, x := range display.Cautions(s.Assessment, w.u.system()) {
			if !seen[x] {
				seen[x] = true
				cs = append(cs, x)
			}
		}
	}
	d.box("Read before relying on this record", cautionParas(cs))
}
