package report

// This file is the only one that knows the PDF library. Everything else
// draws through canvas, so the library could be swapped by rewriting this
// file alone.

import (
	"bytes"
	"io"
	"strings"
	"time"
	"unicode"
	"unicode/utf8"

	"github.com/jung-kurt/gofpdf"
	"golang.org/x/image/font/gofont/gobold"
	"golang.org/x/image/font/gofont/goitalic"
	"golang.org/x/image/font/gofont/gomono"
	"golang.org/x/image/font/gofont/goregular"
)

// face is one of the embedded type faces.
type face int

const (
	faceRegular face = iota
	faceBold
	faceItalic
	faceMono
)

// rgb is a colour; the report keeps to greys and one dark accent so that
// it prints well in black and white.
type rgb struct{ r, g, b int }

var (
	black     = rgb{0, 0, 0}
	white     = rgb{255, 255, 255}
	darkGrey  = rgb{80, 80, 80}
	midGrey   = rgb{150, 150, 150}
	lightGrey = rgb{225, 225, 225}
	paleGrey  = rgb{244, 244, 244}
	accent    = rgb{22, 52, 96}
)

// point is a position on the page in millimetres from the top left.
type point struct{ x, y float64 }

// docInfo is the document metadata.
type docInfo struct {
	title, author, subject, creator, keywords string
	// fixedDate, when not zero, is written as creation and modification
	// date and the catalogue is sorted, so that the output is repeatable.
	fixedDate time.Time
}

// canvas draws on pages measured in millimetres from the top-left corner.
// Like the library it wraps, it keeps the first error and ignores every
// call after it; check err once at the end.
type canvas struct {
	pdf           *gofpdf.Fpdf
	width, height float64

	// Drawing state, re-applied after a clip ends (the clip's graphics
	// state restore would otherwise undo it behind the library's back).
	face      face
	size      float64
	lineWidth float64
	dash      []float64
	stroke    rgb
	fill      rgb
	text      rgb

	// symbolWidths keeps each face's character widths (in the library's
	// thousandths of the font size) once measured, for prefixWidths.
	symbolWidths map[face]map[rune]int
}

// paperSizes maps the Options.Paper names to the library's sizes.
var paperSizes = map[string]string{PaperA4: "A4", PaperLetter: "Letter"}

var faceNames = map[face]struct{ family, style string }{
	faceRegular: {"sans", ""},
	faceBold:    {"sans", "B"},
	faceItalic:  {"sans", "I"},
	faceMono:    {"mono", ""},
}

func newCanvas(paper string, info docInfo) *canvas {
	p := gofpdf.New("P", "mm", paperSizes[paper], "")
	p.SetAutoPageBreak(false, 0)
	p.SetMargins(0, 0, 0)
	p.SetCellMargin(0)
	// The library writes into the font bytes while it subsets them, so
	// each document gets its own copy: the shared font data stay intact
	// and every document comes out the same.
	p.AddUTF8FontFromBytes("sans", "", bytes.Clone(shortHyphen(goregular.TTF)))
	p.AddUTF8FontFromBytes("sans", "B", bytes.Clone(shortHyphen(gobold.TTF)))
	p.AddUTF8FontFromBytes("sans", "I", bytes.Clone(shortHyphen(goitalic.TTF)))
	p.AddUTF8FontFromBytes("mono", "", bytes.Clone(shortHyphen(gomono.TTF)))
	p.SetTitle(printable(info.title), true)
	p.SetAuthor(printable(info.author), true)
	p.SetSubject(printable(info.subject), true)
	p.SetCreator(printable(info.creator), true)
	p.SetKeywords(printable(info.keywords), true)
	if !info.fixedDate.IsZero() {
		p.SetCreationDate(info.fixedDate)
		p.SetModificationDate(info.fixedDate)
		p.SetCatalogSort(true)
	}
	w, h := p.GetPageSize()
	c := &canvas{pdf: p, width: w, height: h, size: 9, lineWidth: 0.2}
	p.SetFont("sans", "", 9)
	return c
}

// addPage starts a new page and re-applies the drawing state.
func (c *canvas) addPage() {
	c.pdf.AddPage()
	c.apply()
}

// pageNo is the current page, from 1.
func (c *canvas) pageNo() int { return c.pdf.PageNo() }

// pageCount is the number of pages so far.
func (c *canvas) pageCount() int { return c.pdf.PageCount() }

// gotoPage makes page n (from 1) current, to draw on it again.
func (c *canvas) gotoPage(n int) {
	c.pdf.SetPage(n)
	c.apply()
}

func (c *canvas) apply() {
	c.setFont(c.face, c.size)
	c.setLineWidth(c.lineWidth)
	c.setDash(c.dash...)
	c.setStroke(c.stroke)
	c.setFill(c.fill)
	c.setTextColour(c.text)
}

// setFont selects a face and a size in points.
func (c *canvas) setFont(f face, sizePt float64) {
	c.face, c.size = f, sizePt
	n := faceNames[f]
	c.pdf.SetFont(n.family, n.style, sizePt)
}

// textWidth is the width of s in the current font, in mm.
func (c *canvas) textWidth(s string) float64 { return c.pdf.GetStringWidth(s) }

// prefixWidths returns, for each k from 0 to len(r), the width in mm of
// r[:k] in the current font, measuring each character of each face once
// per record. The library
// adds the widths of characters without kerning, so these agree with
// textWidth.
func (c *canvas) prefixWidths(r []rune) []float64 {
	_, unit := c.pdf.GetFontSize()
	out := make([]float64, len(r)+1)
	sum := 0
	cache := c.symbolWidths[c.face]
	if cache == nil {
		if c.symbolWidths == nil {
			c.symbolWidths = map[face]map[rune]int{}
		}
		cache = map[rune]int{}
		c.symbolWidths[c.face] = cache
	}
	for i, ch := range r {
		u, ok := cache[ch]
		if !ok {
			u = c.pdf.GetStringSymbolWidth(string(ch))
			cache[ch] = u
		}
		sum += u
		out[i+1] = float64(sum) * unit / 1000
	}
	return out
}

// drawText writes s with its baseline starting at (x, y).
func (c *canvas) drawText(x, y float64, s string) {
	if s != "" {
		c.pdf.Text(x, y, printable(s))
	}
}

// drawTextRotated writes s rotated anticlockwise by deg degrees about the
// start of its baseline.
func (c *canvas) drawTextRotated(x, y, deg float64, s string) {
	c.pdf.TransformBegin()
	c.pdf.TransformRotate(deg, x, y)
	c.pdf.Text(x, y, printable(s))
	c.pdf.TransformEnd()
}

func (c *canvas) setLineWidth(w float64) {
	c.lineWidth = w
	c.pdf.SetLineWidth(w)
}

// setDash sets a dash pattern of alternating on and off lengths in mm;
// none gives a solid line.
func (c *canvas) setDash(pattern ...float64) {
	c.dash = append(c.dash[:0], pattern...)
	c.pdf.SetDashPattern(c.dash, 0)
}

func (c *canvas) setStroke(col rgb) {
	c.stroke = col
	c.pdf.SetDrawColor(col.r, col.g, col.b)
}

func (c *canvas) setFill(col rgb) {
	c.fill = col
	c.pdf.SetFillColor(col.r, col.g, col.b)
}

func (c *canvas) setTextColour(col rgb) {
	c.text = col
	c.pdf.SetTextColor(col.r, col.g, col.b)
}

// paint styles: stroke the outline, fill the inside, or both.
const (
	stroke     = "D"
	fill       = "F"
	fillStroke = "FD"
)

func (c *canvas) line(x1, y1, x2, y2 float64) { c.pdf.Line(x1, y1, x2, y2) }

// polyline strokes an open path through the points.
func (c *canvas) polyline(pts []point) {
	if len(pts) < 2 {
		return
	}
	c.pdf.MoveTo(pts[0].x, pts[0].y)
	for _, p := range pts[1:] {
		c.pdf.LineTo(p.x, p.y)
	}
	c.pdf.DrawPath(stroke)
}

func (c *canvas) rect(x, y, w, h float64, style string) { c.pdf.Rect(x, y, w, h, style) }

func (c *canvas) circle(x, y, r float64, style string) { c.pdf.Circle(x, y, r, style) }

// polygon paints a closed path through the points.
func (c *canvas) polygon(pts []point, style string) {
	ps := make([]gofpdf.PointType, len(pts))
	for i, p := range pts {
		ps[i] = gofpdf.PointType{X: p.x, Y: p.y}
	}
	c.pdf.Polygon(ps, style)
}

// clip confines drawing to a rectangle until unclip.
func (c *canvas) clip(x, y, w, h float64) { c.pdf.ClipRect(x, y, w, h, false) }

func (c *canvas) unclip() {
	c.pdf.ClipEnd()
	c.apply()
}

// bookmark adds an outline entry at height y of the current page.
func (c *canvas) bookmark(title string, level int, y float64) {
	c.pdf.Bookmark(printable(title), level, y)
}

// printable makes text safe for the PDF library, which panics on invalid
// UTF-8 and on characters beyond the Basic Multilingual Plane: each
// invalid byte run and each such character becomes U+FFFD, and control
// characters (which no font draws) become spaces.
func printable(s string) string {
	ok := utf8.ValidString(s)
	for i := 0; ok && i < len(s); i++ {
		// 0xc2 0x80–0x9f is a C1 control character (U+0080–U+009F).
		c1 := s[i] == 0xc2 && i+1 < len(s) && s[i+1] >= 0x80 && s[i+1] <= 0x9f
		if s[i] < 0x20 || s[i] == 0x7f || s[i] >= 0xf0 || c1 {
			ok = false
		}
	}
	if ok {
		return s
	}
	return strings.Map(func(r rune) rune {
		switch {
		case unicode.IsControl(r):
			return ' '
		case r > 0xffff:
			return utf8.RuneError
		}
		return r
	}, strings.ToValidUTF8(s, string(utf8.RuneError)))
}

// err returns the first error met while drawing.
func (c *canvas) err() error { return c.pdf.Error() }

// writeTo finishes the document and writes it to w.
func (c *canvas) writeTo(w io.Writer) error {
	c.pdf.SetPage(c.pdf.PageCount())
	return c.pdf.Output(w)
}
