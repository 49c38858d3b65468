package report

// para is a paragraph inside a block: text in a style, optionally behind a
// bullet.
type para struct {
	text   string
	st     style
	bullet string
	// gap is extra space before the paragraph, in mm.
	gap float64
}

// blockLine is one laid-out line of a block.
type blockLine struct {
	text, bullet string
	st           style
	y            float64 // from the top of the block's text
	h            float64
	indent       float64
}

// layoutParas wraps paragraphs to width w and returns the lines and the
// total height.
func (d *doc) layoutParas(paras []para, w float64) ([]blockLine, float64) {
	var out []blockLine
	y := 0.0
	for _, p := range paras {
		y += p.gap
		d.use(p.st)
		lh := lineHeight(p.st.size)
		indent := 0.0
		if p.bullet != "" {
			indent = 3.5
		}
		for i, ln := range d.wrap(p.text, w-indent) {
			bl := blockLine{text: ln, st: p.st, y: y, h: lh, indent: indent}
			if i == 0 {
				bl.bullet = p.bullet
			}
			out = append(out, bl)
			y += lh
		}
	}
	return out, y
}

// drawLines draws laid-out lines with their top at y.
func (d *doc) drawLines(lines []blockLine, x, y float64) {
	for _, l := range lines {
		d.use(l.st)
		base := baseline(y+l.y, l.h, l.st.size)
		if l.bullet != "" {
			d.c.drawText(x, base, l.bullet)
		}
		d.c.drawText(x+l.indent, base, l.text)
	}
}

// box draws paragraphs in a framed, shaded box with a title bar. A box
// taller than the rest of the page moves to the next page; one taller
// than a whole page is split across pages, each piece framed.
func (d *doc) box(title string, paras []para) {
	const padX, padY, titleH = 4.0, 2.5, 7.0
	lines, total := d.layoutParas(paras, d.width()-2*padX)
	h := titleH + total + 2*padY
	if h <= d.bottom-d.top {
		d.need(h)
	} else {
		d.need(titleH + 3*lineHeight(body.size) + 2*padY)
	}
	first := true
	for len(lines) > 0 {
		top := d.y
		avail := d.bottom - top - 2*padY
		if first {
			avail -= titleH
		}
		n := 0
		base := lines[0].y
		for n < len(lines) && lines[n].y+lines[n].h-base <= avail {
			n++
		}
		if n == 0 {
			d.newPage()
			continue
		}
		seg := lines[:n]
		segH := seg[n-1].y + seg[n-1].h - base + 2*padY
		if first {
			segH += titleH
		}
		d.c.setDash()
		d.c.setFill(paleGrey)
		d.c.setStroke(black)
		d.c.setLineWidth(0.5)
		d.c.rect(d.left, top, d.width(), segH, fillStroke)
		d.c.setFill(black)
		d.c.rect(d.left, top, 1.6, segH, fill)
		y := top + padY
		if first {
			d.use(style{faceBold, 10, black})
			d.c.drawText(d.left+padX, baseline(top+1, titleH, 10), title)
			y = top + titleH + padY/2
		}
		shifted := make([]blockLine, n)
		for i, l := range seg {
			l.y -= base
			shifted[i] = l
		}
		d.drawLines(shifted, d.left+padX, y)
		d.y = top + segH + 3
		lines = lines[n:]
		first = false
		if len(lines) > 0 {
			d.newPage()
		}
	}
}
