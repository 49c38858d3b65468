package designfile

import (
	"encoding/json"
	"fmt"
	"io"

	"ullage/hazards"
)

// Encode writes f as a FormatCurrent design file: indented by two spaces,
// fields in a fixed order, empty lists written as [] rather than null, no
// HTML escaping, and a final newline. It writes whatever f holds; Save
// validates first. The error wraps the writer's error.
func Encode(w io.Writer, f *File) error {
	enc := json.NewEncoder(w)
	enc.SetIndent("", "  ")
	enc.SetEscapeHTML(false)
	if err := enc.Encode(forWriting(f)); err != nil {
		return fmt.Errorf("writing the design file: %w", err)
	}
	return nil
}

// forWriting returns a copy of f with the current format tag and empty
// lists in place of nil ones, leaving f untouched.
func forWriting(f *File) *File {
	out := *f
	out.Format = FormatCurrent
	out.Revisions = make([]Revision, len(f.Revisions))
	for i, r := range f.Revisions {
		if r.Design.Vessel.Parts == nil {
			r.Design.Vessel.Parts = []hazards.Part{}
		}
		if r.Design.Criteria.LimitBodies == nil {
			r.Design.Criteria.LimitBodies = []string{}
		}
		out.Revisions[i] = r
	}
	return &out
}
