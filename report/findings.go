package report

import (
	"strings"

	"ullage/hazards"
	"ullage/report/display"
)

// findings prints every finding with its numbers, message and the source
// of its limit; each finding is kept whole on one page.
func (w *assessmentWriter) findings() {
	d := w.d
	d.heading("Findings")
	for _, v := range display.Findings(w.a, w.u.system()) {
		f := v.Finding
		source := "Source of the limit: " + v.Source
		if steps := stepList(f.Steps()); steps != "" {
			source += ".  " + steps + "."
		}
		d.findingBlock(f.Status, v.Title, v.Numbers(), v.Text(), source)
	}
}

// findingBlock prints one finding: the status on the left, the text on
// the right.
func (d *doc) findingBlock(s hazards.Status, title, numbers, message, source string) {
	const statusW, pad = 27.0, 1.6
	paras := []para{{text: title, st: bodyBold}, {text: numbers, st: body}}
	if message != "" {
		paras = append(paras, para{text: message, st: body, gap: 0.6})
	}
	if source != "" {
		paras = append(paras, para{text: source, st: smallIt, gap: 0.6})
	}
	lines, h := d.layoutParas(paras, d.width()-statusW)
	d.need(h + 2*pad)
	d.drawStatusInline(d.left, d.y+pad, lineHeight(body.size), s, 8.5)
	d.drawLines(lines, d.left+statusW, d.y+pad)
	d.y += h + 2*pad
	d.c.setStroke(lightGrey)
	d.c.setLineWidth(0.2)
	d.c.setDash()
	d.c.line(d.left, d.y, d.right, d.y)
}

// cautions prints the cautions in a box of their own.
func (w *assessmentWriter) cautions() {
	d := w.d
	d.heading("Cautions")
	cs := w.a.Cautions
	if w.u.us && len(w.a.CautionsUS) > 0 {
		cs = w.a.CautionsUS
	}
	d.box("Read before relying on this record", cautionParas(cs))
}

// cautionParas lists the cautions as bullets after a sentence deferring
// to codes, standards and qualified people.
func cautionParas(cs []string) []para {
	ps := []para{{text: "This record supports a review; it does not replace one. Read every caution before signing.", st: bodyItalic}}
	defers := false
	for _, c := range cs {
		defers = defers || strings.Contains(c, "licensed professionals")
	}
	if !defers {
		ps = append(ps, para{text: "Local codes, the applicable product, toy and pressure-equipment standards, and qualified, licensed professionals take precedence over anything printed here.", st: body, bullet: "•", gap: 1})
	}
	for _, c := range cs {
		ps = append(ps, para{text: c, st: body, bullet: "•", gap: 1})
	}
	return ps
}
