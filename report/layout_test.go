package report

import (
	"strings"
	"testing"
	"time"
)

func testDoc() *doc {
	c := newCanvas(PaperA4, docInfo{})
	d := newDoc(c, newUnitSystem(UnitsSI), "header", "footer")
	d.newPage()
	return d
}

func TestWrap(t *testing.T) {
	d := testDoc()
	d.use(body)
	cases := []struct {
		name string
		text string
		w    float64
	}{
		{"sentence", "The sealed vessel holds a fixed mass of fluid and any residual gas in a fixed volume; as it warms the liquid swells.", 50},
		{"one long word", "sha256:3f9a1c0b7e2d44a18c5b9e0f6a7d2c1b8e4f0a9d3c6b5e2f1a0d9c8b7e6f5a4d", 30},
		{"narrow column", "Knock-down factor", 8},
	}
	for _, c := range cases {
		lines := d.wrap(c.text, c.w)
		for _, ln := range lines {
			if w := d.c.textWidth(ln); w > c.w+1e-9 && len([]rune(ln)) > 1 {
				t.Errorf("%s: line %q is %.1f mm wide, more than %g", c.name, ln, w, c.w)
			}
		}
		joined := strings.Join(lines, "")
		if strings.ReplaceAll(joined, " ", "") != strings.ReplaceAll(c.text, " ", "") {
			t.Errorf("%s: text changed by wrapping: %q", c.name, lines)
		}
	}
	if got := d.wrap("a\nb", 100); len(got) != 2 {
		t.Errorf("a newline gave %q, want two lines", got)
	}
}

// A heading is never left alone at the foot of a page: it moves with the
// block that follows it.
func TestHeadingKeptWithNext(t *testing.T) {
	d := testDoc()
	d.y = d.bottom - 12
	d.heading("Findings")
	d.need(40)
	if d.c.pageNo() != 2 {
		t.Fatalf("page %d, want the heading and block moved to page 2", d.c.pageNo())
	}
	if d.y <= d.top+lineHeight(heading1.size) {
		t.Errorf("y = %.1f: the heading was not printed on the new page", d.y)
	}
}

// Table rows never split across pages, and the heading row repeats.
func TestTableRowsStayWhole(t *testing.T) {
	d := testDoc()
	var rows [][]cell
	for i := 0; i < 60; i++ {
		rows = append(rows, []cell{{text: "row"}, {text: strings.Repeat("wrapped text ", 12)}})
	}
	tb := table{cols: []col{{"A", 1, 'L'}, {"B", 2, 'L'}}, rows: rows}
	d.drawTable(tb)
	if d.c.pageCount() < 2 {
		t.Fatalf("%d pages, want the table to run over", d.c.pageCount())
	}
	if d.y > d.bottom+1.5 {
		t.Errorf("table ran past the bottom margin: y = %.1f > %.1f", d.y, d.bottom)
	}
}

// TestWrapLongWordIsLinear: an unbroken word of 20 000 characters wraps in
// well under a second (each character is measured once; the earlier
// re-measuring took time growing with the cube of the length, over a
// minute for 4 000 characters). The limit is generous for a shared
// machine: a linear pass takes a few milliseconds.
func TestWrapLongWordIsLinear(t *testing.T) {
	d := testDoc()
	d.use(body)
	word := strings.Repeat("W", 20000)
	start := time.Now()
	lines := d.wrap(word, 40)
	fitted := d.fit(word, 40)
	if el := time.Since(start); el > 2*time.Second {
		t.Errorf("wrapping a 20 000-character word took %v", el)
	}
	if strings.Join(lines, "") != word {
		t.Error("wrapping changed the word")
	}
	for _, ln := range lines {
		if d.c.textWidth(ln) > 40+1e-9 {
			t.Fatalf("line %.20q… is %.1f mm wide, more than 40", ln, d.c.textWidth(ln))
		}
	}
	if w := d.c.textWidth(fitted); w > 40+1e-9 || !strings.HasSuffix(fitted, "…") {
		t.Errorf("fit gave %.1f mm, %q…", w, fitted[:10])
	}
}

// TestRecordWithLongText: a record whose every free-text field holds
// 4 000 unbroken characters is written in seconds, not minutes.
func TestRecordWithLongText(t *testing.T) {
	long := strings.Repeat("X", 4000)
	m := loadMeta(t, "meta_a.json")
	m.Product, m.Company, m.Reviewer, m.ChangeNote, m.RevisionAuthor, m.PartNumber = long, long, long, long, long, long
	a := assess(t, "typical_design.json")
	a.Parts[0].Name = long
	start := time.Now()
	render(t, m, a, Options{})
	if el := time.Since(start); el > 20*time.Second {
		t.Errorf("the record took %v", el)
	}
}
