package designfile

import (
	"bytes"
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"strconv"
	"strings"
	"unicode/utf8"
)

// kind is the JSON type of a node.
type kind uint8

const (
	kindNull kind = iota
	kindBool
	kindNumber
	kindString
	kindObject
	kindArray
)

// node is one JSON value with the byte offset where it sits, so that any
// later error about it can name its line. Object members keep the order
// of the file.
type node struct {
	kind    kind
	offset  int64  // just after the value's first token
	text    string // a string's value or a number's literal
	boolean bool
	members []member
	elems   []*node
}

// member is one key of an object, with the offset just after the key.
type member struct {
	key    string
	offset int64
	value  *node
}

// get returns the member with the given key, or nil.
func (n *node) get(key string) *node {
	if n == nil {
		return nil
	}
	for _, m := range n.members {
		if m.key == key {
			return m.value
		}
	}
	return nil
}

// maxDepth bounds the nesting of a design file; a design nests five deep.
const maxDepth = 32

// jsonTree parses one JSON value and everything after it must be blank.
type jsonTree struct {
	data []byte
	dec  *json.Decoder
	// at is the path to the value being read, per level a key (index
	// -1) or an index, written out as a field path only for an error.
	at []pathStep
}

// parseTree parses data into a tree. Errors are *FileError with the line
// set and the file name left for the caller.
func parseTree(data []byte) (*node, *FileError) {
	if root, ok := parseFast(data); ok {
		return root, nil
	}
	return parseTreeStrictly(data)
}

// parseTreeStrictly is parseTree through the standard library's
// tokenizer, which words every error.
func parseTreeStrictly(data []byte) (*node, *FileError) {
	p := &jsonTree{data: data, dec: json.NewDecoder(bytes.NewReader(data))}
	p.dec.UseNumber()
	root, err := p.value(0)
	if err != nil {
		return nil, err
	}
	if _, tokErr := p.dec.Token(); !errors.Is(tokErr, io.EOF) {
		return nil, p.fail(p.dec.InputOffset(), "unexpected text after the end of the JSON object", tokErr)
	}
	return root, nil
}

func (p *jsonTree) value(depth int) (*node, *FileError) {
	tok, err := p.dec.Token()
	if err != nil {
		return nil, p.tokenError(err)
	}
	n := &node{offset: p.dec.InputOffset()}
	switch t := tok.(type) {
	case nil:
		n.kind = kindNull
	case bool:
		n.kind, n.boolean = kindBool, t
	case json.Number:
		n.kind, n.text = kindNumber, string(t)
	case string:
		n.kind, n.text = kindString, t
	case json.Delim:
		if depth >= maxDepth {
			ferr := p.fail(n.offset, fmt.Sprintf("nested more than %d levels deep", maxDepth), nil)
			ferr.Field = p.path()
			return nil, ferr
		}
		if t == '{' {
			return n, p.object(n, depth)
		}
		return n, p.array(n, depth)
	}
	return n, nil
}

func (p *jsonTree) object(n *node, depth int) *FileError {
	n.kind = kindObject
	seen := map[string]int64{}
	for p.dec.More() {
		tok, err := p.dec.Token()
		if err != nil {
			return p.tokenError(err)
		}
		key, _ := tok.(string) // the decoder only yields strings as keys
		off := p.dec.InputOffset()
		if first, dup := seen[key]; dup {
			p.at = append(p.at, pathStep{key: key, index: -1})
			return &FileError{Line: p.line(off), Field: p.path(), Problem: fmt.Sprintf("appears twice in the same object (first on line %d)", p.line(first))}
		}
		seen[key] = off
		p.at = append(p.at, pathStep{key: key, index: -1})
		v, ferr := p.value(depth + 1)
		p.at = p.at[:len(p.at)-1]
		if ferr != nil {
			return ferr
		}
		n.members = append(n.members, member{key: key, offset: off, value: v})
	}
	if _, err := p.dec.Token(); err != nil { // the closing brace
		return p.tokenError(err)
	}
	return nil
}

func (p *jsonTree) array(n *node, depth int) *FileError {
	n.kind = kindArray
	for p.dec.More() {
		p.at = append(p.at, pathStep{index: len(n.elems)})
		v, ferr := p.value(depth + 1)
		p.at = p.at[:len(p.at)-1]
		if ferr != nil {
			return ferr
		}
		n.elems = append(n.elems, v)
	}
	if _, err := p.dec.Token(); err != nil { // the closing bracket
		return p.tokenError(err)
	}
	return nil
}

// tokenError describes a failure of the JSON tokenizer.
func (p *jsonTree) tokenError(err error) *FileError {
	var syn *json.SyntaxError
	switch {
	case errors.As(err, &syn):
		return p.fail(syn.Offset, "not valid JSON: "+syn.Error(), err)
	case errors.Is(err, io.EOF) && p.dec.InputOffset() == 0:
		return &FileError{Problem: "the file is empty", Err: err}
	case errors.Is(err, io.EOF), errors.Is(err, io.ErrUnexpectedEOF):
		return p.fail(int64(len(p.data)), "the file ends before the JSON object is complete", err)
	}
	return p.fail(p.dec.InputOffset(), "not valid JSON: "+err.Error(), err)
}

// path writes the path to the value being read: "revisions[1].design".
func (p *jsonTree) path() string { return writePath(p.at) }

// writePath writes a path of keys (index -1) and indexes as a field path.
func writePath(at []pathStep) string {
	var b strings.Builder
	for _, st := range at {
		if st.index >= 0 {
			b.WriteString("[" + strconv.Itoa(st.index) + "]")
			continue
		}
		if b.Len() > 0 {
			b.WriteByte('.')
		}
		b.WriteString(st.key)
	}
	return b.String()
}

func (p *jsonTree) fail(offset int64, problem string, err error) *FileError {
	return &FileError{Line: p.line(offset), Problem: problem, Err: err}
}

func (p *jsonTree) line(offset int64) int { return lineAt(p.data, offset) }

// lineAt returns the 1-based line holding the byte just before offset.
func lineAt(data []byte, offset int64) int {
	if offset > int64(len(data)) {
		offset = int64(len(data))
	}
	if offset > 0 {
		offset-- // offsets point just past a token; count the token's own line
	}
	if offset < 0 {
		offset = 0
	}
	return 1 + bytes.Count(data[:offset], []byte{'\n'})
}

// locate returns the offset of the deepest node along a field path such
// as revisions[1].design.vessel.parts[0].shape, for naming the line of an
// error found after decoding.
func locate(root *node, path string) int64 {
	n, best := root, root.offset
	for _, step := range splitPath(path) {
		var next *node
		if step.key != "" {
			next = n.get(step.key)
		} else if n.kind == kindArray && step.index < len(n.elems) {
			next = n.elems[step.index]
		}
		if next == nil {
			break
		}
		n, best = next, next.offset
	}
	return best
}

// pathStep is one step of a field path: a key or a list index.
type pathStep struct {
	key   string
	index int
}

// splitPath splits "a.b[2].c" into a, b, [2], c.
func splitPath(path string) []pathStep {
	var steps []pathStep
	for _, part := range strings.Split(path, ".") {
		key, rest, _ := strings.Cut(part, "[")
		if key != "" {
			steps = append(steps, pathStep{key: key})
		}
		for rest != "" {
			num, after, ok := strings.Cut(rest, "]")
			i, err := strconv.Atoi(num)
			if !ok || err != nil || i < 0 {
				return steps
			}
			steps = append(steps, pathStep{index: i})
			rest = strings.TrimPrefix(after, "[")
		}
	}
	return steps
}

// shown returns a node as it should appear in an error message: short,
// and quoted when it is text.
func (n *node) shown() string {
	switch n.kind {
	case kindNull:
		return "null"
	case kindBool:
		return strconv.FormatBool(n.boolean)
	case kindNumber:
		return clip(n.text)
	case kindString:
		return strconv.Quote(clip(n.text))
	case kindObject:
		return "{…}"
	}
	return "[…]"
}

// clip shortens long text for an error message.
func clip(s string) string {
	const most = 40
	if utf8.RuneCountInString(s) <= most {
		return s
	}
	r := []rune(s)
	return string(r[:most]) + "…"
}

// joinPath appends a key to a field path.
func joinPath(path, key string) string {
	if path == "" {
		return key
	}
	return path + "." + key
}
