package report

import (
	"strings"
	"testing"
	"unicode"
	"unicode/utf8"
)

// FuzzRecordText feeds any text through the steps every free-text field of
// a record takes before it is drawn: made printable for the PDF library,
// then wrapped to a column and fitted to a cell. It checks what a reader
// of the record relies on: no panic, valid UTF-8 with no control
// characters, no line wider than its column (unless it is a single
// character), no word lost or changed by wrapping, and a fitted cell no
// wider than its width. It complements FuzzWriteRecords, which builds
// both whole records per input and so runs far fewer inputs in the same
// time.
func FuzzRecordText(f *testing.F) {
	f.Add("Tidemark Lantern, lower bulb", uint8(60))
	f.Add("\x00\x01\t\n\r\xff\xfe", uint8(3))
	f.Add("‮gnitirw ÄÖÜ ≤ ± °C \u200b🙂 (parenthesis) \\ backslash", uint8(20))
	f.Add(strings.Repeat("W", 300), uint8(10))
	f.Add("sha256:3f9a1c0b7e2d44a18c5b9e0f6a7d2c1b8e4f0a9d3c6b5e2f1a0d9c8b7e6f5a4d", uint8(30))
	d := testDoc()
	d.use(body)
	f.Fuzz(func(t *testing.T, s string, width uint8) {
		// Columns in the record are 2 mm to about 180 mm wide.
		w := 2 + float64(width)*178/255
		p := printable(s)
		if !utf8.ValidString(p) {
			t.Fatalf("printable(%q) = %q is not valid UTF-8", s, p)
		}
		for _, r := range p {
			if unicode.IsControl(r) || r > 0xffff {
				t.Fatalf("printable(%q) keeps %U, which the PDF library cannot draw", s, r)
			}
		}
		if utf8.ValidString(s) && !strings.ContainsFunc(s, func(r rune) bool { return unicode.IsControl(r) || r > 0xffff }) && p != s {
			t.Fatalf("printable changed text it can draw: %q → %q", s, p)
		}
		lines := d.wrap(p, w)
		for _, ln := range lines {
			if lw := d.c.textWidth(ln); lw > w+1e-9 && utf8.RuneCountInString(ln) > 1 {
				t.Fatalf("wrap(%q, %.1f mm): line %q is %.2f mm wide", p, w, ln, lw)
			}
		}
		if got, want := strings.Join(strings.Fields(strings.Join(lines, "")), ""), strings.Join(strings.Fields(p), ""); got != want {
			t.Fatalf("wrap(%q, %.1f mm) changed the text: %q", p, w, lines)
		}
		if fitted := d.fit(p, w); d.c.textWidth(fitted) > w+1e-9 && fitted != "…" {
			t.Fatalf("fit(%q, %.1f mm) = %q is %.2f mm wide", p, w, fitted, d.c.textWidth(fitted))
		}
		if err := d.c.err(); err != nil {
			t.Fatalf("the PDF library failed on %q: %v", p, err)
		}
	})
}
