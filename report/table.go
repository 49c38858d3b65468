package report

import "ullage/hazards"

// col is one column of a table: its heading, its share of the table's
// width and its alignment ('L', 'R' or 'C').
type col struct {
	title  string
	weight float64
	align  byte
}

// cell is one table entry. A cell with a status shows the status mark and
// its word, wrapped to the column (NOT / ASSESSED) when it is too wide,
// and no text.
type cell struct {
	text               string
	bold, italic, mono bool
	dim                bool
	status             hazards.Status
}

// table is a grid of wrapped cells. Rows never split across pages, and
// the heading row is repeated at the top of each new page.
type table struct {
	cols []col
	rows [][]cell
	// size is the font size in pt (default 8).
	size float64
	// x and w place the table; zero w means the full text width.
	x, w float64
	// noHeader hides the heading row; zebra shades every other row.
	noHeader, zebra bool
	// keep is how many rows must fit with the heading row (default: all
	// of a table of up to five rows, else two).
	keep int
}

const (
	cellPadX = 1.4
	cellPadY = 0.75
)

func (c cell) style(size float64) style {
	st := style{faceRegular, size, black}
	switch {
	case c.mono:
		st.face = faceMono
		st.size = size - 0.5
	case c.bold:
		st.face = faceBold
	case c.italic:
		st.face = faceItalic
	}
	if c.dim {
		st.colour = darkGrey
	}
	return st
}

// layoutRow wraps each cell and returns the lines and the row height.
func (d *doc) layoutRow(cells []cell, widths []float64, size float64) ([][]string, float64) {
	lines := make([][]string, len(widths))
	h := 0.0
	for i := range widths {
		if i >= len(cells) {
			continue
		}
		c := cells[i]
		st := c.style(size)
		w := widths[i] - 2*cellPadX
		if c.status != "" {
			st = style{faceBold, size, black}
			d.use(st)
			lines[i] = d.wrap(statusWord(c.status), max(w-statusMarkWidth(size)-1.2, 5))
			h = max(h, float64(len(lines[i]))*lineHeight(st.size))
			continue
		}
		d.use(st)
		if c.text != "" {
			lines[i] = d.wrap(c.text, max(w, 5))
		}
		n := max(len(lines[i]), 1)
		h = max(h, float64(n)*lineHeight(st.size))
	}
	return lines, h + 2*cellPadY
}

func (d *doc) drawTable(t table) {
	if t.size == 0 {
		t.size = 8
	}
	if t.w == 0 {
		t.x, t.w = d.left, d.width()
	}
	if t.keep == 0 {
		t.keep = 2
		if len(t.rows) <= 5 {
			t.keep = len(t.rows)
		}
	}
	total := 0.0
	for _, c := range t.cols {
		total += c.weight
	}
	widths := make([]float64, len(t.cols))
	for i, c := range t.cols {
		widths[i] = t.w * c.weight / total
	}
	var head []cell
	for _, c := range t.cols {
		head = append(head, cell{text: c.title, bold: true})
	}
	headLines, headH := d.layoutRow(head, widths, t.size-0.5)
	drawHead := func() {
		if t.noHeader {
			return
		}
		d.c.setFill(lightGrey)
		d.c.rect(t.x, d.y, t.w, headH, fill)
		d.drawRow(t, head, headLines, widths, headH, t.size-0.5)
		d.y += headH
	}
	// Keep the heading with the first rows.
	keepH := 0.0
	if !t.noHeader {
		keepH = headH
	}
	for i := 0; i < t.keep && i < len(t.rows); i++ {
		_, h := d.layoutRow(t.rows[i], widths, t.size)
		keepH += h
	}
	d.need(keepH)
	drawHead()
	for i, row := range t.rows {
		lines, h := d.layoutRow(row, widths, t.size)
		keepWith := h
		if i == len(t.rows)-2 && len(t.rows) > 3 {
			// Never leave the last row alone on a new page.
			_, last := d.layoutRow(t.rows[i+1], widths, t.size)
			keepWith += last
		}
		if d.need(keepWith) {
			drawHead()
		}
		if t.zebra && i%2 == 1 {
			d.c.setFill(paleGrey)
			d.c.rect(t.x, d.y, t.w, h, fill)
		}
		d.drawRow(t, row, lines, widths, h, t.size)
		d.y += h
		d.c.setStroke(lightGrey)
		d.c.setLineWidth(0.15)
		d.c.setDash()
		if i == len(t.rows)-1 {
			d.c.setStroke(midGrey)
			d.c.setLineWidth(0.3)
		}
		d.c.line(t.x, d.y, t.x+t.w, d.y)
	}
	d.y += 1.5
}

func (d *doc) drawRow(t table, cells []cell, lines [][]string, widths []float64, h, size float64) {
	x := t.x
	for i, w := range widths {
		if i >= len(cells) {
			break
		}
		c := cells[i]
		st := c.style(size)
		lh := lineHeight(st.size)
		tx, tw := x+cellPadX, w-2*cellPadX
		if c.status != "" {
			d.drawStatusWrapped(tx, d.y+cellPadY, lh, c.status, size, lines[i])
			x += w
			continue
		}
		d.use(st)
		for j, ln := range lines[i] {
			lx := tx
			switch t.cols[i].align {
			case 'R':
				lx = tx + tw - d.c.textWidth(ln)
			case 'C':
				lx = tx + (tw-d.c.textWidth(ln))/2
			}
			d.c.drawText(lx, baseline(d.y+cellPadY+float64(j)*lh, lh, st.size), ln)
		}
		x += w
	}
}

// keyValues prints label–value pairs in pairs of columns.
func (d *doc) keyValues(pairs [][2]string, perRow int) {
	cols := make([]col, 0, 2*perRow)
	for i := 0; i < perRow; i++ {
		cols = append(cols, col{weight: 1.15}, col{weight: 1.85})
	}
	if perRow == 1 {
		cols = []col{{weight: 1.9}, {weight: 4.1}}
	}
	var rows [][]cell
	for i := 0; i < len(pairs); i += perRow {
		var row []cell
		for j := 0; j < perRow; j++ {
			if i+j < len(pairs) {
				row = append(row, cell{text: pairs[i+j][0], dim: true}, cell{text: pairs[i+j][1]})
			} else {
				row = append(row, cell{}, cell{})
			}
		}
		rows = append(rows, row)
	}
	d.drawTable(table{cols: cols, rows: rows, noHeader: true})
}
