package report

import (
	"fmt"
	"io"
	"strings"

	"ullage/hazards"
	"ullage/hazards/compare"
)

// changedMark precedes every changed row of the comparison, which is also
// printed in bold, so that a change reads without colour.
const changedMark = "►"

// WriteComparison writes the PDF record comparing revision A (older, with
// header a) and revision B (newer, with header b) to w: on the first page
// the findings whose status changed, boxed, and both verdicts; then the
// inputs side by side with the changed ones marked, the headline results
// with their changes and whether each is better or worse, every finding
// side by side, both pressure–temperature curves on one chart, the
// cautions and a sign-off block.
//
// A side whose Assessment is nil (its design could not be assessed) is
// shown as "not assessed". It returns an *OptionError for bad options or
// when neither side has an assessment, and any error from the PDF writer
// or from w.
func WriteComparison(w io.Writer, a, b Meta, c compare.Comparison, o Options) error {
	o, err := o.normalise()
	if err != nil {
		return err
	}
	for _, s := range []struct {
		field string
		side  compare.Side
	}{{"comparison.A.Assessment", c.A}, {"comparison.B.Assessment", c.B}} {
		if s.side.Assessment != nil {
			if err := checkAssessment(s.field, s.side.Assessment); err != nil {
				return err
			}
		}
	}
	if c.A.Assessment == nil && c.B.Assessment == nil {
		return &OptionError{Field: "comparison", Value: "no assessments", Want: "at least one side assessed by hazards.Assess"}
	}
	la, lb := sideLabel(a, c.A, "A"), sideLabel(b, c.B, "B")
	product := firstNonBlank(b.Product, a.Product, "unnamed product")
	info := docInfo{
		title:    fmt.Sprintf("Revision comparison: %s, %s against %s", product, lb, la),
		author:   firstNonBlank(b.Reviewer, a.Reviewer, b.Company),
		subject:  fmt.Sprintf("%d changed inputs, %d findings changed status", len(c.Inputs), len(c.Statuses)),
		creator:  creator(firstMeta(b, a)),
		keywords: strings.TrimSpace("ullage comparison " + a.Fingerprint + " " + b.Fingerprint),
	}
	info.fixedDate = o.creationDate(firstMeta(b, a))
	cv := newCanvas(o.Paper, info)
	footer := product + " · " + la + " → " + lb
	if a.Fingerprint != "" || b.Fingerprint != "" {
		footer += " · Fingerprints " + shortPrint(a.Fingerprint) + " / " + shortPrint(b.Fingerprint)
	}
	d := newDoc(cv, newUnitSystem(o.Units), "Revision comparison · "+product+" · "+la+" → "+lb, footer)
	cw := &comparisonWriter{d: d, u: d.u, ma: a, mb: b, c: c, la: la, lb: lb}
	cw.write()
	if err := cv.err(); err != nil {
		return fmt.Errorf("report: drawing the comparison: %w", err)
	}
	if err := cv.writeTo(w); err != nil {
		return fmt.Errorf("report: writing the comparison: %w", err)
	}
	return nil
}

// firstMeta returns the first header that names a tool version.
func firstMeta(ms ...Meta) Meta {
	for _, m := range ms {
		if m.ToolVersion != "" {
			return m
		}
	}
	return ms[0]
}

// sideLabel names a side: "Rev. B", the comparison's label, or the
// fallback letter.
func sideLabel(m Meta, s compare.Side, fallback string) string {
	switch {
	case strings.TrimSpace(m.Revision) != "":
		return "Rev. " + m.Revision
	case strings.TrimSpace(s.Label) != "":
		return s.Label
	}
	return fallback
}

// shortPrint shortens a fingerprint for the footer.
func shortPrint(s string) string {
	if s == "" {
		return "none"
	}
	r := []rune(s)
	if len(r) > 20 {
		return string(r[:20]) + "…"
	}
	return s
}

// comparisonWriter holds what every section of the comparison needs.
type comparisonWriter struct {
	d      *doc
	u      unitSystem
	ma, mb Meta
	c      compare.Comparison
	la, lb string
}

func (w *comparisonWriter) write() {
	d := w.d
	d.newPage()
	w.titleBlock()
	w.inputs()
	w.results()
	w.findings()
	// The cautions come before the sign-off, as in the assessment, and
	// the sign-off follows the findings it signs, never alone on a page.
	w.cautions()
	d.signOff(firstNonBlank(w.mb.Reviewer, w.ma.Reviewer))
	w.chart()
	d.finishPages()
}

// titleBlock prints both revisions' headers side by side.
func (w *comparisonWriter) titleBlock() {
	d, a, b := w.d, w.ma, w.mb
	d.recordTitle("TECHNICAL FILE RECORD · REVISION COMPARISON", firstNonBlank(b.Product, a.Product, "Unnamed product"),
		fmt.Sprintf("%s (older) set beside %s (newer): what changed, and did any finding change status", w.la, w.lb))
	w.statusChanges()
	rows := [][3]string{
		{"Product", a.Product, b.Product},
		{"Part number", a.PartNumber, b.PartNumber},
		{"Company", a.Company, b.Company},
		{"Revision", a.Revision, b.Revision},
		{"Revision date", a.RevisionDate, b.RevisionDate},
		{"Revision author", a.RevisionAuthor, b.RevisionAuthor},
		{"Change note", a.ChangeNote, b.ChangeNote},
		{"Reviewer", a.Reviewer, b.Reviewer},
		{"Record date", dateOrBlank(a), dateOrBlank(b)},
		{"Tool version", creator(a), creator(b)},
		{"Fluid-data version", a.FluidDataVersion, b.FluidDataVersion},
		{"Design fingerprint", a.Fingerprint, b.Fingerprint},
	}
	var cells [][]cell
	for _, r := range rows {
		mono := r[0] == "Design fingerprint"
		cells = append(cells, []cell{{text: r[0], dim: true}, {text: orBlank(r[1]), mono: mono}, {text: orBlank(r[2]), mono: mono}})
	}
	d.drawTable(table{cols: []col{{"", 1.2, 'L'}, {w.la, 2.4, 'L'}, {w.lb, 2.4, 'L'}}, rows: cells, keep: len(cells)})
	d.note("Units: " + w.u.name() + "; pressures are absolute unless marked as over ambient.")
}

// verdict returns a side's overall status, or "" when not assessed.
func verdict(s compare.Side) hazards.Status {
	if s.Assessment == nil {
		return ""
	}
	return s.Assessment.Verdict
}

// statusChanges prints, boxed and first, the findings whose status
// changed, under both overall verdicts.
func (w *comparisonWriter) statusChanges() {
	d, c := w.d, w.c
	const rowH, titleH, pad = 6.5, 8.0, 2.5
	colA, colB := d.left+0.52*d.width(), d.left+0.76*d.width()
	// Each criterion is printed in full, wrapped in its column.
	d.use(body)
	markW := d.c.textWidth(changedMark + " ")
	lineH := lineHeight(body.size)
	titles := make([][]string, len(c.Statuses))
	rowsH := rowH
	if len(c.Statuses) > 0 {
		rowsH = 0
	}
	for i, s := range c.Statuses {
		titles[i] = d.wrap(s.Title, colA-d.left-pad-4-markW)
		rowsH += rowH + float64(len(titles[i])-1)*lineH
	}
	h := titleH + 2*rowH + 2 + rowsH + 2*pad + 4
	d.need(h)
	cv := d.c
	top := d.y
	cv.setDash()
	cv.setStroke(black)
	cv.setLineWidth(boxWeight(hazards.Worse(statusOr(verdict(c.A)), statusOr(verdict(c.B)))))
	cv.setFill(paleGrey)
	cv.rect(d.left, top, d.width(), h, fillStroke)
	d.use(style{faceBold, 10, black})
	cv.drawText(d.left+pad+1, baseline(top+1, titleH, 10), "Overall verdict and findings whose status changed")
	y := top + titleH + 1
	d.use(smallBold)
	cv.drawText(colA, baseline(y, rowH, 7.5), w.la)
	cv.drawText(colB, baseline(y, rowH, 7.5), w.lb)
	y += rowH
	d.use(bodyBold)
	cv.drawText(d.left+pad+1, baseline(y, rowH, 9), "Overall verdict")
	w.statusAt(colA, y, rowH, verdict(c.A), 9.5)
	cv.drawText(colB-6, baseline(y, rowH, 9), "→")
	w.statusAt(colB, y, rowH, verdict(c.B), 9.5)
	y += rowH + 1
	cv.setStroke(midGrey)
	cv.setLineWidth(0.2)
	cv.line(d.left+pad, y, d.right-pad, y)
	y += 1
	if len(c.Statuses) == 0 {
		d.use(bodyItalic)
		cv.drawText(d.left+pad+1, baseline(y, rowH, 9), "No finding changed status between the revisions.")
	}
	for i, s := range c.Statuses {
		d.use(body)
		cv.drawText(d.left+pad+1, baseline(y, rowH, 9), changedMark)
		for j, ln := range titles[i] {
			cv.drawText(d.left+pad+1+markW, baseline(y, rowH, 9)+float64(j)*lineH, ln)
		}
		w.statusAt(colA, y, rowH, s.Old, 8.5)
		d.use(body)
		cv.drawText(colB-6, baseline(y, rowH, 9), "→")
		w.statusAt(colB, y, rowH, s.New, 8.5)
		y += rowH + float64(len(titles[i])-1)*lineH
	}
	d.y = top + h + 3
}

func statusOr(s hazards.Status) hazards.Status {
	if s == "" {
		return hazards.StatusCaution
	}
	return s
}

// statusAt draws a status, or "absent" / "not assessed" in words.
func (w *comparisonWriter) statusAt(x, y, lh float64, s hazards.Status, size float64) {
	switch s {
	case hazards.StatusPass, hazards.StatusCaution, hazards.StatusFail:
		w.d.drawStatusInline(x, y, lh, s, size)
	default:
		word := "not assessed"
		if s == compare.StatusAbsent {
			word = "not reviewed"
		}
		w.d.use(style{faceItalic, size, darkGrey})
		w.d.c.drawText(x, baseline(y, lh, size), word)
	}
}
