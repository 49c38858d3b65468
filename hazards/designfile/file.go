package designfile

import (
	"fmt"
	"strings"

	"ullage/hazards"
)

// Format tags. Only FormatCurrent is ever written; FormatSingleSheet is
// read and migrated.
const (
	// FormatCurrent is a product with its revision history.
	FormatCurrent = "ullage-design/2"
	// FormatSingleSheet is the older single-design sheet: a product, one
	// design, its author and date, and no revision list. Decode turns it
	// into a File with one revision labelled "A".
	FormatSingleSheet = "ullage-design/1"
)

// MaxFileBytes is the largest design file Decode and Load accept (4 MiB,
// far more than a long revision history needs).
const MaxFileBytes = 4 << 20

// File is one product and its revision history.
type File struct {
	// Format is FormatCurrent once decoded; Encode always writes
	// FormatCurrent.
	Format  string  `json:"format"`
	Product Product `json:"product"`
	// Revisions are listed oldest first.
	Revisions []Revision `json:"revisions"`
}

// Product names the device the revisions describe.
type Product struct {
	Name        string `json:"name"`
	PartNumber  string `json:"part_number"`
	Company     string `json:"company"`
	Description string `json:"description"`
}

// Revision is one reviewed state of the design.
type Revision struct {
	// Label is short and unique within the file: "A", "B", ...
	Label string `json:"label"`
	// Date is the revision date, written YYYY-MM-DD.
	Date string `json:"date"`
	// Author is who made the revision; ChangeNote says what changed.
	Author     string `json:"author"`
	ChangeNote string `json:"change_note"`
	// Design is the complete design of this revision.
	Design hazards.Design `json:"design"`
}

// Latest returns the newest revision, the last in the list. The pointer
// points into f.Revisions. It returns an error wrapping ErrNoRevision when
// the file holds none.
func (f *File) Latest() (*Revision, error) {
	if len(f.Revisions) == 0 {
		return nil, fmt.Errorf("the design file holds no revision: %w", ErrNoRevision)
	}
	return &f.Revisions[len(f.Revisions)-1], nil
}

// Find returns the revision with the given label (exact match). The
// pointer points into f.Revisions. The error for an unknown label wraps
// ErrNoRevision and lists the labels the file holds.
func (f *File) Find(label string) (*Revision, error) {
	for i := range f.Revisions {
		if f.Revisions[i].Label == label {
			return &f.Revisions[i], nil
		}
	}
	return nil, fmt.Errorf("revision %q not found; %s: %w", label, f.describeLabels(), ErrNoRevision)
}

// Labels returns the revision labels, oldest first.
func (f *File) Labels() []string {
	out := make([]string, len(f.Revisions))
	for i := range f.Revisions {
		out[i] = f.Revisions[i].Label
	}
	return out
}

func (f *File) describeLabels() string {
	if len(f.Revisions) == 0 {
		return "the file holds no revision"
	}
	return "the file holds " + strings.Join(f.Labels(), ", ")
}

// AddRevision appends r as the newest revision. Its label must be
// well-formed (see Validate) and not yet used in the file; the rest of the
// revision is checked by Validate, which Save runs.
func (f *File) AddRevision(r Revision) error {
	if problem := labelProblem(r.Label); problem != "" {
		return &FileError{Field: "label", Value: fmt.Sprintf("%q", r.Label), Problem: problem}
	}
	for i := range f.Revisions {
		if f.Revisions[i].Label == r.Label {
			return &FileError{Field: "label", Value: fmt.Sprintf("%q", r.Label),
				Problem: fmt.Sprintf("is already used (%s); choose a new label", f.describeLabels())}
		}
	}
	f.Revisions = append(f.Revisions, r)
	return nil
}

// NextLabel suggests a label for the next revision: the letter after the
// newest label when that is a run of capital letters ("A" → "B",
// "Z" → "AA", "AZ" → "BA"), otherwise the first of "A", "B", ... not yet
// used.
func (f *File) NextLabel() string {
	used := map[string]bool{}
	for _, r := range f.Revisions {
		used[r.Label] = true
	}
	if latest, err := f.Latest(); err == nil {
		if next, ok := nextLetters(latest.Label); ok && !used[next] {
			return next
		}
	}
	for n := 1; ; n++ {
		if l := lettersOf(n); !used[l] {
			return l
		}
	}
}

// nextLetters increments a run of capital letters as a base-26 numeral
// without a zero digit.
func nextLetters(s string) (string, bool) {
	if s == "" || len(s) > 8 {
		return "", false
	}
	n := 0
	for _, c := range s {
		if c < 'A' || c > 'Z' {
			return "", false
		}
		n = n*26 + int(c-'A') + 1
	}
	return lettersOf(n + 1), true
}

// lettersOf returns the n-th label, n ≥ 1: A … Z, AA, AB, …
func lettersOf(n int) string {
	var b []byte
	for n > 0 {
		n--
		b = append([]byte{byte('A' + n%26)}, b...)
		n /= 26
	}
	return string(b)
}
