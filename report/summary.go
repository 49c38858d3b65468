package report

import (
	"fmt"
	"strings"

	"ullage/hazards"
	"ullage/report/display"
)

// titleBlock prints the record's identity on the first page.
func (w *assessmentWriter) titleBlock() {
	d, m := w.d, w.m
	d.recordTitle("TECHNICAL FILE RECORD · HAZARD ASSESSMENT",
		firstNonBlank(m.Product, "Unnamed product"),
		fmt.Sprintf("Sealed glass device filled with %s: burst, implosion, liquid-full and release review", w.a.Fluid.Name))
	d.keyValues([][2]string{
		{"Product", orBlank(m.Product)},
		{"Part number", orBlank(m.PartNumber)},
		{"Company", orBlank(m.Company)},
		{"Record date", orBlank(dateOrBlank(m))},
		{"Revision", orBlank(m.Revision)},
		{"Revision date", orBlank(m.RevisionDate)},
		{"Revision author", orBlank(m.RevisionAuthor)},
		{"Reviewer", orBlank(m.Reviewer)},
		{"Tool version", orBlank(creator(m))},
		{"Fluid-data version", orBlank(m.FluidDataVersion)},
	}, 2)
	d.y -= 1.5
	d.drawTable(table{cols: []col{{weight: 1.15}, {weight: 4.85}}, noHeader: true, keep: 1, rows: [][]cell{
		{{text: "Change note", dim: true}, {text: orBlank(m.ChangeNote)}},
		{{text: "Design fingerprint", dim: true}, {text: orBlank(m.Fingerprint), mono: true}},
		{{text: "Units", dim: true}, {text: w.u.name() + "; pressures are absolute unless marked as over ambient"}},
	}})
}

func dateOrBlank(m Meta) string {
	if m.Date.IsZero() {
		return ""
	}
	return m.Date.Format("2006-01-02")
}

// summary prints the verdict box and the table of findings.
func (w *assessmentWriter) summary() {
	d, a := w.d, w.a
	d.space(2)
	var expl string
	switch a.Verdict {
	case hazards.StatusFail:
		expl = "The design does not meet every review criterion. It should not be released as it stands; see the summary below and the Findings section."
	case hazards.StatusCaution:
		expl = "The design meets the review criteria, but at least one narrowly or with a value that could not be judged cleanly. Read each caution before signing."
	default:
		expl = "The design meets every review criterion with margin, within the models and data stated in this record."
	}
	d.verdictBox("Overall verdict", a.Verdict, display.Tally(a.Findings), expl)
	w.dataBehind()
	d.subheading("Summary of findings")
	rows := make([][]cell, 0, len(a.Findings))
	for _, f := range a.Findings {
		v := display.Finding(f, w.u.system())
		rows = append(rows, []cell{{status: f.Status}, {text: v.Title}, {text: v.Value}, {text: v.Limit}, {text: v.Margin}})
	}
	d.drawTable(table{cols: []col{
		{"Status", 1.25, 'L'}, {"Criterion", 2.9, 'L'}, {"Value", 1.35, 'R'}, {"Limit", 1.35, 'R'}, {"Margin", 1.8, 'R'},
	}, rows: rows, size: 8.5, keep: 4})
	d.statusLegend()
	d.note(display.MarginNote)
}

// verdictBox draws the boxed overall verdict: a large status mark, the
// status word, a tally and an explanation.
func (d *doc) verdictBox(title string, s hazards.Status, tally, expl string) {
	d.use(body)
	textX := d.left + 30
	lines := d.wrap(expl, d.right-3-textX)
	lh := lineHeight(body.size)
	h := 4 + lineHeight(14) + lineHeight(8) + float64(len(lines))*lh + 3
	h = max(h, 22)
	d.need(h)
	c := d.c
	c.setDash()
	c.setStroke(black)
	c.setLineWidth(boxWeight(s))
	c.setFill(paleGrey)
	c.rect(d.left, d.y, d.width(), h, fillStroke)
	d.drawStatusMark(d.left+6, d.y+(h-14)/2, 14, s)
	y := d.y + 3
	d.use(style{faceBold, 8, darkGrey})
	c.drawText(textX, baseline(y, lineHeight(8), 8), strings.ToUpper(title))
	y += lineHeight(8)
	word := statusWord(s)
	wordW := d.textWidthIn(style{faceBold, 14, black}, word)
	c.drawText(textX, baseline(y, lineHeight(14), 14), word)
	d.use(style{faceRegular, 9, darkGrey})
	c.drawText(textX+wordW+5, baseline(y, lineHeight(14), 14)-0.2, tally)
	y += lineHeight(14)
	d.use(body)
	for _, ln := range lines {
		c.drawText(textX, baseline(y, lh, body.size), ln)
		y += lh
	}
	d.y += h + 3
}

// boxWeight is the frame weight of a verdict box: heavier for worse.
func boxWeight(s hazards.Status) float64 {
	switch s {
	case hazards.StatusFail:
		return 1.2
	case hazards.StatusCaution:
		return 0.8
	}
	return 0.5
}

func (d *doc) textWidthIn(st style, s string) float64 {
	d.use(st)
	return d.c.textWidth(s)
}
