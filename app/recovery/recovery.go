// Package recovery reads and writes the recovery file: what the window
// keeps of the open document every few minutes, so that work survives a
// crash. It knows the file's layout and what makes a snapshot usable;
// the window decides what to offer the reviewer.
package recovery

import (
	"bytes"
	"encoding/json"
	"fmt"
	"time"

	"ullage/hazards"
	"ullage/hazards/designfile"
)

// DefaultName is the name a restored document gets when its snapshot
// names none.
const DefaultName = "recovered work"

// Snapshot is what the recovery file holds: the document's place on
// disk and name, the revision its working copy started from, when it was
// taken, the design file as last saved and the working copy.
type Snapshot struct {
	Path  string          `json:"path"`
	Name  string          `json:"name"`
	Base  string          `json:"base"`
	Saved time.Time       `json:"saved"`
	File  json.RawMessage `json:"file"`
	Work  hazards.Design  `json:"work"`
}

// Encode writes a snapshot as indented JSON.
func Encode(s Snapshot) ([]byte, error) { return json.MarshalIndent(s, "", "  ") }

// Restored is a snapshot read back whole: its design file decoded and
// validated, its name never empty.
type Restored struct {
	File  *designfile.File
	Path  string
	Name  string
	Base  string
	Saved time.Time
	Work  hazards.Design
}

// Restore reads a recovery file whole. It fails when the file is not a
// snapshot or its design file does not decode and validate.
func Restore(b []byte) (Restored, error) {
	var s Snapshot
	if err := json.Unmarshal(b, &s); err != nil {
		return Restored{}, fmt.Errorf("the recovered work cannot be read: %w", err)
	}
	f, err := designfile.Decode(bytes.NewReader(s.File), DefaultName)
	if err != nil {
		return Restored{}, err
	}
	r := Restored{File: f, Path: s.Path, Name: s.Name, Base: s.Base, Saved: s.Saved, Work: s.Work}
	if r.Name == "" {
		r.Name = DefaultName
	}
	return r, nil
}

// Salvage reads what it can of a recovery file that does not restore
// whole: the working copy, when it is intact and valid, and the path of
// the file it came from (which may be gone or changed). ok is false when
// nothing can be read.
func Salvage(b []byte) (work hazards.Design, path string, ok bool) {
	var s Snapshot
	if json.Unmarshal(b, &s) != nil || s.Work.Validate() != nil {
		return hazards.Design{}, "", false
	}
	return s.Work, s.Path, true
}
