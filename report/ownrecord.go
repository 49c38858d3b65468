package report

import (
	"bytes"
	"unicode/utf16"
)

// IsRecord reports whether data is a PDF written by this package: it
// starts as a PDF does and its document information names Ullage as the
// creator (the creator entry WriteAssessment and WriteComparison write,
// in the UTF-16 form the PDF library stores it in). Programs use it to
// replace an earlier record without asking, and to refuse to overwrite
// any other file.
func IsRecord(data []byte) bool {
	return bytes.HasPrefix(data, []byte("%PDF-")) && bytes.Contains(data, creatorMarker)
}

// creatorMarker is the start of the creator entry as the PDF library
// writes it: a text string with a UTF-16BE byte-order mark.
var creatorMarker = func() []byte {
	b := []byte("/Creator (\xFE\xFF")
	for _, u := range utf16.Encode([]rune("Ullage")) {
		b = append(b, byte(u>>8), byte(u))
	}
	return b
}()
