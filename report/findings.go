package report

import (
	"strings"

	"ullage/hazards"
	"ullage/report/display"
)

// findings prints every finding with its numbers, the facts behind it,
// the number of its limit's source in the list that follows and the
// steps of the calculation record behind it; each finding is kept whole
// on one page.
func (w *assessmentWriter) findings() {
	d := w.d
	d.heading("Findings")
	d.lead("Each finding with the values behind it. The source of its limit is cited by number from the list that follows; the steps named are those of the calculation record, an annex printed on request.")
	refs := &references{index: map[string]int{}}
	for _, v := range display.Findings(w.a, w.u.system()) {
		numbers := v.Numbers()
		if strings.TrimSpace(v.Source) != "" {
			numbers += "   ·   Source " + refs.number(v.Source)
		}
		text := v.Text()
		if steps := stepNumbers(v.Finding.Steps()); steps != "" {
			text = strings.TrimSpace(text + " " + display.Capitalised(steps) + ".")
		}
		d.findingBlock(v.Finding.Status, v.Title, numbers, text)
	}
	d.sourceList("Sources of the limits", refs.list)
}

// findingBlock prints one finding: the status on the left, the title,
// numbers and text on the right.
func (d *doc) findingBlock(s hazards.Status, title, numbers, message string) {
	const statusW, pad, size = 27.0, 1.6, 8.5
	paras := []para{{text: title, st: bodyBold}, {text: numbers, st: body}}
	if message != "" {
		paras = append(paras, para{text: message, st: body, gap: 0.6})
	}
	lines, h := d.layoutParas(paras, d.width()-statusW)
	d.use(style{faceBold, size, black})
	word := d.wrap(statusWord(s), statusW-2-statusMarkWidth(size)-1.2)
	lh := lineHeight(body.size)
	h = max(h, float64(len(word))*lh)
	d.need(h + 2*pad)
	d.drawStatusWrapped(d.left, d.y+pad, lh, s, size, word)
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
	d.box("Read before relying on this record", cautionParas(display.Cautions(w.a, w.u.system())))
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
