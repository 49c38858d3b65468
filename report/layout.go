package report

import (
	"strconv"
	"strings"
	"unicode/utf8"
)

// ptMM is one typographic point in millimetres.
const ptMM = 25.4 / 72

// Page geometry in mm.
const (
	marginSide   = 18
	marginTop    = 16
	marginBottom = 20 // content stops this far above the paper's edge
	footerRule   = 14 // the footer rule sits this far above the edge
)

// style is a font, size and colour for a run of text.
type style struct {
	face   face
	size   float64
	colour rgb
}

var (
	body       = style{faceRegular, 9, black}
	bodyBold   = style{faceBold, 9, black}
	bodyItalic = style{faceItalic, 9, black}
	small      = style{faceRegular, 7.5, darkGrey}
	smallBold  = style{faceBold, 7.5, black}
	smallIt    = style{faceItalic, 7.5, darkGrey}
	mono       = style{faceMono, 7.5, black}
	label      = style{faceRegular, 7.5, darkGrey}
	heading1   = style{faceBold, 13, accent}
	heading2   = style{faceBold, 10, accent}
	titleStyle = style{faceBold, 17, accent}
)

// lineHeight is the distance between baselines for a font size in pt.
func lineHeight(sizePt float64) float64 { return sizePt * ptMM * 1.3 }

// doc lays text, tables, boxes and charts out down the pages, starting a
// new page whenever the next block would not fit.
type doc struct {
	c     *canvas
	u     unitSystem
	left  float64
	right float64
	top   float64
	// bottom is the lowest y content may reach.
	bottom float64
	y      float64
	// header is printed small at the top of every page after the first;
	// footer at the bottom left of every page, beside "Page x of y".
	header, footer string
	section        int
	pending        []pendingHeading
}

func newDoc(c *canvas, u unitSystem, header, footer string) *doc {
	return &doc{c: c, u: u, left: marginSide, right: c.width - marginSide, top: marginTop,
		bottom: c.height - marginBottom, header: header, footer: footer}
}

func (d *doc) width() float64 { return d.right - d.left }

func (d *doc) use(s style) {
	d.c.setFont(s.face, s.size)
	d.c.setTextColour(s.colour)
}

// newPage starts a page and prints the running header on it.
func (d *doc) newPage() {
	d.c.addPage()
	d.y = d.top
	if d.c.pageNo() > 1 && d.header != "" {
		d.use(small)
		d.c.drawText(d.left, d.top-4, d.fit(d.header, d.width()))
		d.c.setStroke(midGrey)
		d.c.setLineWidth(0.2)
		d.c.setDash()
		d.c.line(d.left, d.top-2.5, d.right, d.top-2.5)
		d.y = d.top + 1
	}
}

// need starts a new page unless h mm, and any headings waiting to be
// printed, still fit on this one; then it prints the waiting headings, so
// that a heading always stands on the same page as what follows it. It
// reports whether a new page was started.
func (d *doc) need(h float64) bool {
	total := h
	for _, p := range d.pending {
		if d.y > d.top+1.5 {
			total += p.gap
		}
		total += p.height
	}
	broke := false
	if d.y+total > d.bottom {
		d.newPage()
		broke = true
	}
	pending := d.pending
	d.pending = nil
	for _, p := range pending {
		d.space(p.gap)
		p.draw()
	}
	return broke
}

// pendingHeading is a heading kept back until the block after it is
// placed.
type pendingHeading struct {
	gap, height float64
	draw        func()
}

func (d *doc) space(h float64) {
	if d.y > d.top+1.5 {
		d.y += h
	}
}

// finishPages prints "Page x of y" and the running footer on every page.
func (d *doc) finishPages() {
	n := d.c.pageCount()
	for p := 1; p <= n; p++ {
		d.c.gotoPage(p)
		y := d.c.height - footerRule
		d.c.setStroke(midGrey)
		d.c.setLineWidth(0.2)
		d.c.setDash()
		d.c.line(d.left, y, d.right, y)
		d.use(small)
		page := "Page " + strconv.Itoa(p) + " of " + strconv.Itoa(n)
		pw := d.c.textWidth(page)
		d.c.drawText(d.right-pw, y+3.8, page)
		d.c.drawText(d.left, y+3.8, d.fit(d.footer, d.width()-pw-6))
	}
}

// fit shortens s with an ellipsis so that it fits in w mm in the current
// font. Each character is measured once, so the time is linear in the
// length of s.
func (d *doc) fit(s string, w float64) string {
	if d.c.textWidth(s) <= w {
		return s
	}
	r := []rune(s)
	widths := d.c.prefixWidths(r)
	room := w - d.c.textWidth("…")
	k := len(r)
	for k > 0 && widths[k] > room {
		k--
	}
	return strings.TrimRight(string(r[:k]), " ") + "…"
}

// wrap breaks s into lines no wider than w mm in the current font, at
// spaces where it can and inside a word only when the word alone is too
// wide; a number in powers of ten ("1 × 10⁻⁴") is kept on one line.
// Newlines in s start new lines. A long word is measured once, a
// character at a time, so the time is linear in its length.
func (d *doc) wrap(s string, w float64) []string {
	var out []string
	space := d.c.textWidth(" ")
	for _, para := range strings.Split(s, "\n") {
		line, lineW := "", 0.0
		for _, word := range keepPowers(strings.Fields(para)) {
			// Widths add up (the font has no kerning), so each word is
			// measured once rather than the whole line again.
			wordW := d.c.textWidth(word)
			if line != "" && lineW+space+wordW <= w {
				line, lineW = line+" "+word, lineW+space+wordW
				continue
			}
			if line == "" && wordW <= w {
				line, lineW = word, wordW
				continue
			}
			if line != "" {
				out = append(out, line)
			}
			if wordW > w && utf8.RuneCountInString(word) > 1 {
				pieces := d.breakWord([]rune(word), w)
				out = append(out, pieces[:len(pieces)-1]...)
				word = pieces[len(pieces)-1]
				wordW = d.c.textWidth(word)
			}
			line, lineW = word, wordW
		}
		out = append(out, line)
	}
	return out
}

// keepPowers joins "m", "×" and "10ⁿ" into one word, so that a line never
// breaks inside a number written in powers of ten.
func keepPowers(words []string) []string {
	out := words[:0:0]
	for i := 0; i < len(words); i++ {
		if words[i] == "×" && len(out) > 0 && i+1 < len(words) && strings.HasPrefix(words[i+1], "10") {
			out[len(out)-1] += " × " + words[i+1]
			i++
			continue
		}
		out = append(out, words[i])
	}
	return out
}

// breakWord cuts a word too wide for w mm into pieces that fit, each at
// least one character long; the last piece may be the narrowest.
func (d *doc) breakWord(r []rune, w float64) []string {
	widths := d.c.prefixWidths(r)
	var pieces []string
	start := 0
	for start < len(r) {
		end := start + 1
		for end < len(r) && widths[end+1]-widths[start] <= w {
			end++
		}
		pieces = append(pieces, string(r[start:end]))
		start = end
	}
	return pieces
}

// baseline is the baseline of a line of text in a box of height lh whose
// top is at y.
func baseline(y, lh, sizePt float64) float64 { return y + lh/2 + 0.34*sizePt*ptMM }

// paragraph prints wrapped text across the full width.
func (d *doc) paragraph(s string, st style) { d.paragraphAt(d.left, d.width(), s, st) }

// paragraphAt prints wrapped text in a column, breaking pages between
// lines but never leaving a single line behind.
func (d *doc) paragraphAt(x, w float64, s string, st style) {
	d.use(st)
	lh := lineHeight(st.size)
	lines := d.wrap(s, w)
	if len(lines) >= 2 {
		d.need(2 * lh)
	}
	for _, ln := range lines {
		d.need(lh)
		d.use(st)
		d.c.drawText(x, baseline(d.y, lh, st.size), ln)
		d.y += lh
	}
}

// heading queues a numbered section heading; it is printed together
// with the next block, on the same page.
func (d *doc) heading(title string) {
	d.section++
	lh := lineHeight(heading1.size)
	text := strconv.Itoa(d.section) + "   " + title
	d.pending = append(d.pending, pendingHeading{gap: 4, height: lh + 3, draw: func() {
		d.use(heading1)
		d.c.bookmark(text, 0, d.y)
		d.c.drawText(d.left, baseline(d.y, lh, heading1.size), text)
		d.y += lh + 0.5
		d.c.setStroke(accent)
		d.c.setLineWidth(0.4)
		d.c.setDash()
		d.c.line(d.left, d.y, d.right, d.y)
		d.y += 2.5
	}})
}

// subheading queues a smaller heading, printed with the next block.
func (d *doc) subheading(title string) {
	lh := lineHeight(heading2.size)
	d.pending = append(d.pending, pendingHeading{gap: 2, height: lh + 0.5, draw: func() {
		d.use(heading2)
		d.c.drawText(d.left, baseline(d.y, lh, heading2.size), title)
		d.y += lh + 0.5
	}})
}

// subheadingSmall queues a bold body-size heading, printed with the next
// block.
func (d *doc) subheadingSmall(title string) {
	lh := lineHeight(bodyBold.size)
	d.pending = append(d.pending, pendingHeading{gap: 1, height: lh + 0.3, draw: func() {
		d.use(bodyBold)
		d.c.drawText(d.left, baseline(d.y, lh, bodyBold.size), title)
		d.y += lh + 0.3
	}})
}

// lead queues an introductory paragraph, printed with the next block so
// that it never stands alone at the foot of a page.
func (d *doc) lead(s string) {
	d.use(body)
	lines := d.wrap(s, d.width())
	lh := lineHeight(body.size)
	d.pending = append(d.pending, pendingHeading{height: float64(len(lines))*lh + 1.5, draw: func() {
		d.use(body)
		for _, ln := range lines {
			d.c.drawText(d.left, baseline(d.y, lh, body.size), ln)
			d.y += lh
		}
		d.y += 1.5
	}})
}

// note prints a small italic line of explanation.
func (d *doc) note(s string) {
	d.paragraph(s, smallIt)
	d.y += 0.8
}
