package fluids

import (
	"bytes"
	"encoding/json"
	"errors"
	"fmt"
	"io"
)

// ErrNameClash is wrapped by the error for a user fluid whose id or name
// is already taken by a fluid of the library.
var ErrNameClash = errors.New("the id or name is already taken in the library")

// Extend returns a new library holding l's fluids plus extra. It refuses,
// with an error wrapping ErrNameClash and ErrInvalidFluid, an extra fluid
// whose id or name matches a fluid already in l (by id, name, synonym or
// CAS number, as Lookup matches), so that a user fluid can never stand in
// for a built-in one under its name. l is unchanged.
func (l *Library) Extend(extra ...*Substance) (*Library, error) {
	for _, s := range extra {
		for _, key := range []struct{ what, value string }{{"id", s.fluid.ID}, {"name", s.fluid.Name}} {
			for _, have := range l.substances {
				if have.fluid.Matches(key.value) {
					return nil, fmt.Errorf("user fluid %q: %s %q is already used by the library's %s (%s); give your fluid an id and a name of its own: %w",
						s.fluid.ID, key.what, key.value, have.fluid.Name, have.fluid.ID, errors.Join(ErrNameClash, ErrInvalidFluid))
				}
			}
		}
	}
	return l.With(extra...), nil
}

// checkUserText refuses what encoding/json would read wrongly or blame on
// the wrong field: a UTF-16 or UTF-32 encoding, and a key that appears
// twice in one object (the last would silently win). It returns the data
// with a UTF-8 byte-order mark removed.
func checkUserText(b []byte) ([]byte, error) {
	const saveAs = "; save it as UTF-8"
	switch {
	case bytes.HasPrefix(b, []byte{0xEF, 0xBB, 0xBF}):
		b = b[3:]
	case bytes.HasPrefix(b, []byte{0xFF, 0xFE, 0, 0}), bytes.HasPrefix(b, []byte{0, 0, 0xFE, 0xFF}):
		return nil, fmt.Errorf("line 1: the file is encoded as UTF-32%s: %w", saveAs, ErrInvalidFluid)
	case bytes.HasPrefix(b, []byte{0xFE, 0xFF}), bytes.HasPrefix(b, []byte{0xFF, 0xFE}),
		len(b) >= 4 && (b[0] == 0 && b[2] == 0 || b[1] == 0 && b[3] == 0):
		return nil, fmt.Errorf("line 1: the file is encoded as UTF-16%s: %w", saveAs, ErrInvalidFluid)
	}
	if err := duplicateKeys(b); err != nil {
		return nil, err
	}
	return b, nil
}

// duplicateKeys returns an error naming the key path and both lines of
// the first key that appears twice in the same object; syntax errors are
// left to the decoder, which reports them with their line.
func duplicateKeys(b []byte) error {
	dec := json.NewDecoder(bytes.NewReader(b))
	type frame struct {
		object bool
		path   string
		seen   map[string]int64 // offset of each key
		index  int
		key    string // the key whose value comes next, in an object
	}
	var stack []*frame
	child := func() string {
		if len(stack) == 0 {
			return ""
		}
		top := stack[len(stack)-1]
		if top.object {
			if top.path == "" {
				return top.key
			}
			return top.path + "." + top.key
		}
		p := fmt.Sprintf("%s[%d]", top.path, top.index)
		top.index++
		return p
	}
	for {
		tok, err := dec.Token()
		if err == io.EOF {
			return nil
		}
		if err != nil {
			return nil
		}
		top := (*frame)(nil)
		if len(stack) > 0 {
			top = stack[len(stack)-1]
		}
		if top != nil && top.object && top.key == "" {
			if d, ok := tok.(json.Delim); ok && d == '}' {
				stack = stack[:len(stack)-1]
				continue
			}
			key, _ := tok.(string)
			// Offsets are kept and turned into lines only for the error:
			// counting lines at every key would read the file again each
			// time.
			off := dec.InputOffset()
			if first, dup := top.seen[key]; dup {
				path := key
				if top.path != "" {
					path = top.path + "." + key
				}
				return fmt.Errorf("line %d: field %s appears twice in the same object (first on line %d); give each field once: %w", lineOf(b, off), path, lineOf(b, first), ErrInvalidFluid)
			}
			top.seen[key] = off
			top.key = key
			continue
		}
		switch t := tok.(type) {
		case json.Delim:
			switch t {
			case '{':
				p := child()
				if top != nil && top.object {
					top.key = ""
				}
				stack = append(stack, &frame{object: true, path: p, seen: map[string]int64{}})
			case '[':
				p := child()
				if top != nil && top.object {
					top.key = ""
				}
				stack = append(stack, &frame{path: p})
			default:
				stack = stack[:len(stack)-1]
			}
		default:
			if top != nil {
				if top.object {
					top.key = ""
				} else {
					top.index++
				}
			}
		}
	}
}
