package report

import (
	"errors"
	"fmt"
	"time"

	"ullage/hazards/tolerance"
)

// Meta identifies the record: the product, the revision being reviewed and
// the people and tools behind it. Every field is printed as given; empty
// fields print as a blank to be filled in by hand.
type Meta struct {
	Product, PartNumber, Company string
	// Revision is the revision label; RevisionDate, RevisionAuthor and
	// ChangeNote describe it.
	Revision, RevisionDate, RevisionAuthor, ChangeNote string
	Reviewer                                           string
	// Date is the date of the record.
	Date time.Time
	// ToolVersion is Ullage's version, FluidDataVersion that of the fluid
	// library, Fingerprint a digest of the design's inputs.
	ToolVersion, FluidDataVersion, Fingerprint string
}

// Unit systems and paper sizes accepted in Options.
const (
	UnitsSI     = "si"
	UnitsUS     = "us"
	PaperA4     = "a4"
	PaperLetter = "letter"
)

// Options choose how the record is printed.
type Options struct {
	// Units is UnitsSI (°C, kPa, mm, g, m³) or UnitsUS (°F, psi, in, oz,
	// ft³); empty means SI.
	Units string
	// Paper is PaperA4 or PaperLetter; empty means A4.
	Paper string
	// Deterministic fixes the creation date (to Meta.Date, or to
	// FixedDate when that is zero) and sorts the PDF catalogue, so that the
	// same inputs give a byte-identical file.
	Deterministic bool
	// Tolerance, when not nil, adds the sampled tolerance study of the
	// same design as a section of the assessment record.
	Tolerance *tolerance.Result
	// Appendix, when true, adds the calculation record (every step of the
	// engine's trace) to the assessment record as an annex; without it the
	// record names the annex and leaves it out.
	Appendix bool
}

// FixedDate is the creation date written in Deterministic mode when the
// record has no Meta.Date.
var FixedDate = time.Date(2000, 1, 1, 0, 0, 0, 0, time.UTC)

// ErrInvalidOptions is wrapped by every error about Options or arguments.
var ErrInvalidOptions = errors.New("invalid report options")

// OptionError names the option that is wrong, the value found and what is
// acceptable. It wraps ErrInvalidOptions.
type OptionError struct {
	Field, Value, Want string
}

// Error says which option is wrong, the value and what is acceptable.
func (e *OptionError) Error() string {
	return fmt.Sprintf("report: %s = %q: %s", e.Field, e.Value, e.Want)
}

// Unwrap makes errors.Is(err, ErrInvalidOptions) true.
func (e *OptionError) Unwrap() error { return ErrInvalidOptions }

// normalise fills the defaults and checks the values.
func (o Options) normalise() (Options, error) {
	if o.Units == "" {
		o.Units = UnitsSI
	}
	if o.Paper == "" {
		o.Paper = PaperA4
	}
	if o.Units != UnitsSI && o.Units != UnitsUS {
		return o, &OptionError{Field: "Units", Value: o.Units, Want: fmt.Sprintf("must be %q or %q", UnitsSI, UnitsUS)}
	}
	if _, ok := paperSizes[o.Paper]; !ok {
		return o, &OptionError{Field: "Paper", Value: o.Paper, Want: fmt.Sprintf("must be %q or %q", PaperA4, PaperLetter)}
	}
	return o, nil
}

// creationDate is the fixed date for Deterministic output, or zero.
func (o Options) creationDate(m Meta) time.Time {
	if !o.Deterministic {
		return time.Time{}
	}
	if m.Date.IsZero() {
		return FixedDate
	}
	return m.Date.UTC()
}
