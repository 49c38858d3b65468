package designfile

import (
	"errors"
	"fmt"
	"strings"
)

// ErrInvalidFile is wrapped by every error from Decode, Load and Validate,
// and by Save when it refuses a File.
var ErrInvalidFile = errors.New("invalid design file")

// ErrTooLarge is wrapped by the error for a file over MaxFileBytes. It
// wraps ErrInvalidFile itself.
var ErrTooLarge = fmt.Errorf("design file too large: %w", ErrInvalidFile)

// ErrNoRevision is returned (wrapped) by Latest for a file with no
// revision and by Find for a label the file does not hold.
var ErrNoRevision = errors.New("no such revision")

// FileError describes what is wrong with a design file: where (file name,
// line, field path such as revisions[1].design.fill_mass_kg), the value
// found and what is acceptable. It wraps ErrInvalidFile and, when there is
// one, the underlying cause (a *hazards.InputError, an *fs.PathError ...).
type FileError struct {
	// File is the name given to Decode or the path given to Load; empty
	// for an error about a File in memory.
	File string
	// Line is the 1-based line of the file where the problem sits; 0 when
	// not known.
	Line int
	// Field is the path of the offending field; empty when the file as a
	// whole is at fault.
	Field string
	// Value is the value found, as written in the file; may be empty.
	Value string
	// Problem says what is wrong and what is acceptable.
	Problem string
	// Err is the underlying cause, or nil.
	Err error
}

// Error formats the error as "file:line: field = value: problem", leaving
// out the parts that are not known.
func (e *FileError) Error() string {
	var b strings.Builder
	if e.File != "" {
		b.WriteString(e.File)
		if e.Line > 0 {
			fmt.Fprintf(&b, ":%d", e.Line)
		}
		b.WriteString(": ")
	} else if e.Line > 0 {
		fmt.Fprintf(&b, "line %d: ", e.Line)
	}
	if e.Field != "" {
		b.WriteString(e.Field)
		if e.Value != "" {
			b.WriteString(" = ")
			b.WriteString(e.Value)
		}
		b.WriteString(": ")
	}
	b.WriteString(e.Problem)
	return b.String()
}

// Unwrap makes errors.Is(err, ErrInvalidFile) true and exposes the cause.
func (e *FileError) Unwrap() []error {
	if e.Err == nil {
		return []error{ErrInvalidFile}
	}
	return []error{ErrInvalidFile, e.Err}
}

// asError turns a possibly nil *FileError into an error that is nil when
// the pointer is.
func asError(e *FileError) error {
	if e == nil {
		return nil
	}
	return e
}
