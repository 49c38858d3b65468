package designfile

import (
	"errors"
	"fmt"
	"strings"
	"time"
	"unicode"
	"unicode/utf8"

	"ullage/hazards"
)

// MaxLabelLength is the longest revision label accepted, in characters.
const MaxLabelLength = 16

// Longest free text accepted in a design file, in characters. A name fits
// on one or two lines of the record; a note or description on half a
// page. Longer text is refused with an error wrapping ErrTextTooLong.
const (
	// MaxNameLength bounds the product name, the company and the
	// revision author.
	MaxNameLength = 200
	// MaxPartNumberLength bounds the part number.
	MaxPartNumberLength = 64
	// MaxNoteLength bounds the product description and a revision's change
	// note.
	MaxNoteLength = 4000
)

// ErrTextTooLong is wrapped by the error for a free-text field longer
// than its limit.
var ErrTextTooLong = errors.New("text too long")

// textTooLong returns the error for a free-text field over most
// characters, or nil.
func textTooLong(field, text string, most int) *FileError {
	if n := utf8.RuneCountInString(text); n > most {
		return &FileError{Field: field, Value: fmt.Sprintf("%q", clip(text)),
			Problem: fmt.Sprintf("is %d characters long; at most %d are accepted", n, most), Err: ErrTextTooLong}
	}
	return nil
}

// dateLayout is the only accepted way to write a revision date.
const dateLayout = "2006-01-02"

// earliestYear is the earliest year a revision date may carry; an earlier
// one is almost certainly a typing slip.
const earliestYear = 1900

// Validate checks the whole file and returns the first problem as a
// *FileError naming the field path (e.g. revisions[1].design.fill_mass_kg),
// the value and what is acceptable; the error wraps ErrInvalidFile and,
// for a design input, the *hazards.InputError. It checks that:
//
//   - Format is FormatCurrent or empty (empty is written as FormatCurrent);
//   - there is at least one revision;
//   - every label is non-empty, at most MaxLabelLength characters, without
//     surrounding spaces or control characters, and unique;
//   - every date is a real calendar date written YYYY-MM-DD, from 1900 on,
//     and no revision is dated before the one listed ahead of it
//     (revisions are listed oldest first);
//   - the product's name and company and each revision's author are at
//     most MaxNameLength characters, the part number at most
//     MaxPartNumberLength, the description and each change note at most
//     MaxNoteLength (ErrTextTooLong);
//   - every design passes hazards.Design.Validate.
func (f *File) Validate() error { return asError(f.validate()) }

func (f *File) validate() *FileError {
	if f.Format != "" && f.Format != FormatCurrent {
		return &FileError{Field: "format", Value: fmt.Sprintf("%q", f.Format),
			Problem: fmt.Sprintf("must be %q (or empty, which is written as %q)", FormatCurrent, FormatCurrent)}
	}
	if len(f.Revisions) == 0 {
		return &FileError{Field: "revisions", Value: "[]", Problem: "a design file holds at least one revision"}
	}
	for _, t := range []struct {
		field, text string
		most        int
	}{
		{"product.name", f.Product.Name, MaxNameLength},
		{"product.part_number", f.Product.PartNumber, MaxPartNumberLength},
		{"product.company", f.Product.Company, MaxNameLength},
		{"product.description", f.Product.Description, MaxNoteLength},
	} {
		if err := textTooLong(t.field, t.text, t.most); err != nil {
			return err
		}
	}
	seen := make(map[string]int, len(f.Revisions))
	var previous time.Time
	for i := range f.Revisions {
		r := &f.Revisions[i]
		at := fmt.Sprintf("revisions[%d]", i)
		if problem := labelProblem(r.Label); problem != "" {
			return &FileError{Field: at + ".label", Value: fmt.Sprintf("%q", r.Label), Problem: problem}
		}
		if j, dup := seen[r.Label]; dup {
			return &FileError{Field: at + ".label", Value: fmt.Sprintf("%q", r.Label),
				Problem: fmt.Sprintf("is already used by revisions[%d]; every label must be unique", j)}
		}
		seen[r.Label] = i
		date, problem := parseDate(r.Date)
		if problem != "" {
			return &FileError{Field: at + ".date", Value: fmt.Sprintf("%q", r.Date), Problem: problem}
		}
		if i > 0 && date.Before(previous) {
			return &FileError{Field: at + ".date", Value: fmt.Sprintf("%q", r.Date),
				Problem: fmt.Sprintf("must not be before revisions[%d].date (%s): revisions are listed oldest first", i-1, previous.Format(dateLayout))}
		}
		previous = date
		if err := textTooLong(at+".author", r.Author, MaxNameLength); err != nil {
			return err
		}
		if err := textTooLong(at+".change_note", r.ChangeNote, MaxNoteLength); err != nil {
			return err
		}
		if err := r.Design.Validate(); err != nil {
			return designError(at+".design", err)
		}
	}
	return nil
}

// designError places an error from hazards.Design.Validate under the
// revision's field path.
func designError(prefix string, err error) *FileError {
	var ie *hazards.InputError
	if errors.As(err, &ie) {
		return &FileError{Field: prefix + "." + ie.Field, Value: ie.Value, Problem: ie.Want, Err: err}
	}
	return &FileError{Field: prefix, Problem: err.Error(), Err: err}
}

// labelProblem returns what is wrong with a revision label, or "".
func labelProblem(label string) string {
	switch {
	case strings.TrimSpace(label) == "":
		return "a revision needs a label, such as \"A\""
	case !utf8.ValidString(label):
		return "must be valid UTF-8 text"
	case strings.TrimSpace(label) != label:
		return "must not start or end with a space"
	case utf8.RuneCountInString(label) > MaxLabelLength:
		return fmt.Sprintf("must be at most %d characters", MaxLabelLength)
	case strings.IndexFunc(label, unicode.IsControl) >= 0:
		return "must not contain control characters"
	}
	return ""
}

// parseDate reads a YYYY-MM-DD date; the problem is "" when it is valid.
func parseDate(s string) (time.Time, string) {
	d, err := time.Parse(dateLayout, s)
	if err != nil || len(s) != len(dateLayout) {
		return time.Time{}, "must be a calendar date written YYYY-MM-DD, such as 2024-03-04"
	}
	if d.Year() < earliestYear {
		return time.Time{}, fmt.Sprintf("must be in %d or later", earliestYear)
	}
	return d, ""
}
