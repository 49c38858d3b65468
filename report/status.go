package report

import (
	"ullage/hazards"
	"ullage/report/display"
)

// Each status has a word and a shape of its own, so that it reads the same
// on a black-and-white print: pass is an open circle, caution a grey
// triangle with a black outline, fail a solid black square with a white
// cross.

// statusWord is the printed word for a status, the display package's
// (PASS, CAUTION, FAIL, NOT ASSESSED); NONE for no status at all.
func statusWord(s hazards.Status) string {
	if s == "" {
		return "NONE"
	}
	return display.StatusWord(s)
}

func statusMarkWidth(sizePt float64) float64 { return sizePt * ptMM * 0.95 }

// drawStatusMark draws the shape of a status in a square of side a whose
// top-left corner is (x, y).
func (d *doc) drawStatusMark(x, y, a float64, s hazards.Status) {
	c := d.c
	c.setDash()
	c.setStroke(black)
	c.setLineWidth(a * 0.12)
	switch s {
	case hazards.StatusFail:
		c.setFill(black)
		c.rect(x, y, a, a, fill)
		c.setStroke(white)
		c.setLineWidth(a * 0.14)
		m := a * 0.25
		c.line(x+m, y+m, x+a-m, y+a-m)
		c.line(x+m, y+a-m, x+a-m, y+m)
	case hazards.StatusCaution:
		c.setFill(midGrey)
		c.polygon([]point{{x + a/2, y}, {x + a, y + a}, {x, y + a}}, fillStroke)
	case hazards.StatusPass:
		c.setFill(white)
		c.circle(x+a/2, y+a/2, a/2*0.92, stroke)
	default:
		c.setStroke(midGrey)
		c.line(x, y+a/2, x+a, y+a/2)
	}
}

// drawStatusInline draws mark and word on a text line of height lh whose
// top is y, and returns the width used.
func (d *doc) drawStatusInline(x, y, lh float64, s hazards.Status, sizePt float64) float64 {
	a := statusMarkWidth(sizePt)
	d.drawStatusMark(x, y+(lh-a)/2, a, s)
	st := style{faceBold, sizePt, black}
	d.use(st)
	w := statusWord(s)
	d.c.drawText(x+a+1.2, baseline(y, lh, sizePt), w)
	return a + 1.2 + d.c.textWidth(w)
}

// drawStatusWrapped draws the mark beside the first of the status word's
// lines (the word wrapped to its column), each line lh high from y.
func (d *doc) drawStatusWrapped(x, y, lh float64, s hazards.Status, sizePt float64, lines []string) {
	a := statusMarkWidth(sizePt)
	d.drawStatusMark(x, y+(lh-a)/2, a, s)
	d.use(style{faceBold, sizePt, black})
	for i, ln := range lines {
		d.c.drawText(x+a+1.2, baseline(y+float64(i)*lh, lh, sizePt), ln)
	}
}

// statusLegend prints one line explaining the marks.
func (d *doc) statusLegend() {
	d.need(lineHeight(7.5))
	d.drawLegendLine()
}

// pendingLegend queues the legend line to print with the next block.
func (d *doc) pendingLegend() {
	d.pending = append(d.pending, pendingHeading{height: lineHeight(7.5) + 1, draw: d.drawLegendLine})
}

func (d *doc) drawLegendLine() {
	lh := lineHeight(7.5)
	x := d.left
	for _, s := range []hazards.Status{hazards.StatusPass, hazards.StatusCaution, hazards.StatusFail} {
		x += d.drawStatusInline(x, d.y, lh, s, 7.5) + 1.5
		d.use(small)
		var t string
		switch s {
		case hazards.StatusPass:
			t = "meets the criterion with margin"
		case hazards.StatusCaution:
			t = "meets it narrowly, or cannot be judged cleanly"
		default:
			t = "does not meet it"
		}
		d.c.drawText(x, baseline(d.y, lh, 7.5), t)
		x += d.c.textWidth(t) + 6
	}
	d.y += lh + 1
}
