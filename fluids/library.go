package fluids

import (
	"bytes"
	"embed"
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"io/fs"
	"path"
	"sort"
	"sync"
)

//go:embed data/*.json
var builtinData embed.FS

// builtinEOS holds the reference equations of state, one file per fluid
// id, fluids/eos/<id>.json.
//
//go:embed eos/*.json
var builtinEOS embed.FS

// DataVersion identifies the revision of the built-in fluid data. It is
// printed on every record so that a reader knows which data produced it.
const DataVersion = "2026.12-1"

// Library is an immutable, validated set of fluids.
type Library struct {
	substances []*Substance
	// byKey maps every normalised ID, name, CAS number and synonym to
	// the first substance (in library order) that has it, so that Lookup
	// need not normalise every key of every fluid.
	byKey map[string]*Substance
}

var builtin = sync.OnceValues(loadBuiltin)

// Builtin returns the built-in library. The embedded records are parsed
// and validated once; an error here means the program itself is broken.
func Builtin() (*Library, error) { return builtin() }

func loadBuiltin() (*Library, error) {
	entries, err := builtinData.ReadDir("data")
	if err != nil {
		return nil, err
	}
	lib := &Library{}
	for _, e := range entries {
		b, err := builtinData.ReadFile(path.Join("data", e.Name()))
		if err != nil {
			return nil, err
		}
		f, err := decodeFluid(b)
		if err != nil {
			return nil, fmt.Errorf("built-in %s: %w", e.Name(), err)
		}
		s, err := newBuiltinSubstance(f)
		if err != nil {
			return nil, fmt.Errorf("built-in %s: %w", e.Name(), err)
		}
		lib.substances = append(lib.substances, s)
	}
	lib.sort()
	return lib, nil
}

// newBuiltinSubstance pairs a built-in record with its reference equation
// of state, eos/<id>.json, when there is one; otherwise the record's
// correlations are used.
func newBuiltinSubstance(f *Fluid) (*Substance, error) {
	b, err := builtinEOS.ReadFile(path.Join("eos", f.ID+".json"))
	if errors.Is(err, fs.ErrNotExist) {
		return NewSubstance(f)
	}
	if err != nil {
		return nil, err
	}
	e, err := DecodeEquationOfState(b)
	if err != nil {
		return nil, fmt.Errorf("equation of state %s.json: %w", f.ID, err)
	}
	return newEOSSubstance(f, e)
}

// DecodeEquationOfState parses an equation-of-state file strictly
// (unknown fields and trailing data refused) and validates it.
func DecodeEquationOfState(b []byte) (*EquationOfState, error) {
	var e EquationOfState
	if err := strictDecode(b, &e); err != nil {
		return nil, err
	}
	if err := e.validate(); err != nil {
		return nil, err
	}
	return &e, nil
}

// sort puts the substances in name order and indexes their keys.
func (l *Library) sort() {
	sort.Slice(l.substances, func(i, j int) bool { return l.substances[i].fluid.Name < l.substances[j].fluid.Name })
	l.byKey = make(map[string]*Substance, 4*len(l.substances))
	for _, s := range l.substances {
		f := s.fluid
		for _, k := range append([]string{f.ID, f.Name, f.CAS}, f.Synonyms...) {
			if n := normaliseKey(k); n != "" && l.byKey[n] == nil {
				l.byKey[n] = s
			}
		}
	}
}

// All returns the library's substances sorted by name.
func (l *Library) All() []*Substance {
	out := make([]*Substance, len(l.substances))
	copy(out, l.substances)
	return out
}

// Lookup finds a fluid by ID, name, synonym or CAS number. It returns an
// error wrapping ErrUnknownFluid when nothing matches.
func (l *Library) Lookup(key string) (*Substance, error) {
	if l.byKey != nil {
		// The first substance that Matches the key, from the index.
		if s := l.byKey[normaliseKey(key)]; s != nil {
			return s, nil
		}
		return nil, fmt.Errorf("%q: %w (try the id, name, a synonym or the CAS number)", key, ErrUnknownFluid)
	}
	for _, s := range l.substances {
		if s.fluid.Matches(key) {
			return s, nil
		}
	}
	return nil, fmt.Errorf("%q: %w (try the id, name, a synonym or the CAS number)", key, ErrUnknownFluid)
}

// With returns a new library holding l's fluids plus extra, where an
// extra fluid with the same ID replaces the built-in one. l is unchanged.
func (l *Library) With(extra ...*Substance) *Library {
	out := &Library{}
	replaced := map[string]bool{}
	for _, s := range extra {
		replaced[s.fluid.ID] = true
	}
	for _, s := range l.substances {
		if !replaced[s.fluid.ID] {
			out.substances = append(out.substances, s)
		}
	}
	out.substances = append(out.substances, extra...)
	out.sort()
	return out
}

// MaxUserFileBytes is the largest user fluid file accepted.
const MaxUserFileBytes = 1 << 20

// FormatUserFluids is the format tag of a file that holds several user
// fluids: {"format": "ullage-user-fluids/1", "fluids": [ ... ]}.
const FormatUserFluids = "ullage-user-fluids/1"

// ErrFileTooLarge: an input file is bigger than its limit.
var ErrFileTooLarge = errors.New("file is too large")

// LoadUserFluids reads a person's own fluid data: either one fluid record
// (format "ullage-fluid/1") or a collection (format
// "ullage-user-fluids/1"). Decoding is strict: unknown fields, wrong types
// trailing data, a key given twice and a UTF-16 file are refused (a UTF-8
// byte-order mark is skipped), and every fluid must pass Validate. The
// substances returned are marked UserSupplied. Nothing is returned when
// any fluid is bad.
func LoadUserFluids(r io.Reader) ([]*Substance, error) {
	b, err := io.ReadAll(io.LimitReader(r, MaxUserFileBytes+1))
	if err != nil {
		return nil, err
	}
	if len(b) > MaxUserFileBytes {
		return nil, fmt.Errorf("user fluids: %w (limit %d bytes)", ErrFileTooLarge, MaxUserFileBytes)
	}
	if b, err = checkUserText(b); err != nil {
		return nil, fmt.Errorf("user fluids: %w", err)
	}
	var head struct {
		Format string `json:"format"`
	}
	if err := json.Unmarshal(b, &head); err != nil {
		return nil, fmt.Errorf("user fluids: %w", describeJSONError(b, err))
	}
	var records []*Fluid
	switch head.Format {
	case FormatFluid:
		f, err := decodeFluid(b)
		if err != nil {
			return nil, fmt.Errorf("user fluids: %w", err)
		}
		records = []*Fluid{f}
	case FormatUserFluids:
		var coll struct {
			Format string            `json:"format"`
			Fluids []json.RawMessage `json:"fluids"`
		}
		if err := strictDecode(b, &coll); err != nil {
			return nil, fmt.Errorf("user fluids: %w", err)
		}
		if len(coll.Fluids) == 0 {
			return nil, fmt.Errorf("user fluids: field fluids is empty: %w", ErrInvalidFluid)
		}
		for i, raw := range coll.Fluids {
			f, err := decodeFluid(raw)
			if err != nil {
				return nil, fmt.Errorf("user fluids: fluids[%d]: %w", i, err)
			}
			records = append(records, f)
		}
	default:
		return nil, fmt.Errorf("user fluids: field format = %q: must be %q or %q: %w", head.Format, FormatFluid, FormatUserFluids, ErrInvalidFluid)
	}
	seen := map[string]bool{}
	out := make([]*Substance, 0, len(records))
	for _, f := range records {
		if seen[f.ID] {
			return nil, fmt.Errorf("user fluids: id %q appears twice: %w", f.ID, ErrInvalidFluid)
		}
		seen[f.ID] = true
		f.UserSupplied = true
		s, err := NewSubstance(f)
		if err != nil {
			return nil, fmt.Errorf("user fluids: %w", err)
		}
		out = append(out, s)
	}
	return out, nil
}

func decodeFluid(b []byte) (*Fluid, error) {
	var f Fluid
	if err := strictDecode(b, &f); err != nil {
		return nil, err
	}
	return &f, nil
}

func strictDecode(b []byte, v any) error {
	dec := json.NewDecoder(bytes.NewReader(b))
	dec.DisallowUnknownFields()
	if err := dec.Decode(v); err != nil {
		return describeJSONError(b, err)
	}
	if dec.More() {
		return fmt.Errorf("unexpected data after the JSON value: %w", ErrInvalidFluid)
	}
	return nil
}

// describeJSONError turns a decoding error into one that names the line
// and, where known, the field, and wraps ErrInvalidFluid.
func describeJSONError(b []byte, err error) error {
	var syn *json.SyntaxError
	var typ *json.UnmarshalTypeError
	switch {
	case errors.As(err, &syn):
		return fmt.Errorf("line %d: %v: %w", lineOf(b, syn.Offset), err, ErrInvalidFluid)
	case errors.As(err, &typ):
		return fmt.Errorf("line %d: field %s: expected %s, found %s: %w", lineOf(b, typ.Offset), typ.Field, typ.Type, typ.Value, ErrInvalidFluid)
	default:
		return fmt.Errorf("%v: %w", err, ErrInvalidFluid)
	}
}

func lineOf(b []byte, offset int64) int {
	if offset > int64(len(b)) {
		offset = int64(len(b))
	}
	return 1 + bytes.Count(b[:offset], []byte{'\n'})
}
