package designfile

import "unicode/utf8"

// fastTree parses well-formed JSON into the same tree as jsonTree, in a
// fraction of the time: the standard library's tokenizer allocates for
// every token and writes an error message at the end of every value. It
// gives up (ok false) at anything it does not handle itself: a syntax
// error, nesting deeper than maxDepth, a duplicate key, text after the
// value, a string with an escape or with bytes that are not UTF-8. The
// caller then parses the file again with jsonTree, which has the last
// word on every error and on every string.
type fastTree struct {
	data []byte
	i    int
	// text is data as one string: every key, string and number literal
	// of the tree is a piece of it, so that none needs an allocation.
	text string
	// members and elems are stacks of the objects and lists being read:
	// each one's entries are copied out once, at its exact length, when
	// it closes.
	members []member
	elems   []*node
	// slab hands out nodes a block at a time.
	slab []node
}

// slabNodes is how many nodes are allocated together.
const slabNodes = 32

// newNode returns a node from the slab.
func (p *fastTree) newNode(k kind, offset int) *node {
	if len(p.slab) == cap(p.slab) {
		p.slab = make([]node, 0, slabNodes)
	}
	p.slab = p.slab[:len(p.slab)+1]
	n := &p.slab[len(p.slab)-1]
	n.kind, n.offset = k, int64(offset)
	return n
}

// parseFast returns the tree of data, or ok false when jsonTree must
// parse it.
func parseFast(data []byte) (root *node, ok bool) {
	p := &fastTree{data: data, text: string(data)}
	root, ok = p.value(0)
	if !ok {
		return nil, false
	}
	p.blank()
	return root, p.i == len(data)
}

// blank skips JSON white space.
func (p *fastTree) blank() {
	for p.i < len(p.data) {
		switch p.data[p.i] {
		case ' ', '\t', '\n', '\r':
			p.i++
		default:
			return
		}
	}
}

func (p *fastTree) value(depth int) (*node, bool) {
	p.blank()
	if p.i >= len(p.data) {
		return nil, false
	}
	switch c := p.data[p.i]; {
	case c == '{':
		if depth >= maxDepth {
			return nil, false
		}
		p.i++
		n := p.newNode(kindObject, p.i)
		return n, p.object(n, depth)
	case c == '[':
		if depth >= maxDepth {
			return nil, false
		}
		p.i++
		n := p.newNode(kindArray, p.i)
		return n, p.array(n, depth)
	case c == '"':
		s, ok := p.str()
		n := p.newNode(kindString, p.i)
		n.text = s
		return n, ok
	case c == '-' || (c >= '0' && c <= '9'):
		start := p.i
		if !p.number() {
			return nil, false
		}
		n := p.newNode(kindNumber, p.i)
		n.text = p.text[start:p.i]
		return n, true
	case p.word("true"):
		n := p.newNode(kindBool, p.i)
		n.boolean = true
		return n, true
	case p.word("false"):
		return p.newNode(kindBool, p.i), true
	case p.word("null"):
		return p.newNode(kindNull, p.i), true
	}
	return nil, false
}

// word consumes a literal and reports whether it was there.
func (p *fastTree) word(w string) bool {
	if len(p.data)-p.i >= len(w) && string(p.data[p.i:p.i+len(w)]) == w {
		p.i += len(w)
		return true
	}
	return false
}

func (p *fastTree) object(n *node, depth int) bool {
	p.blank()
	if p.i < len(p.data) && p.data[p.i] == '}' {
		p.i++
		return true
	}
	mark := len(p.members)
	defer func() { p.members = p.members[:mark] }()
	for {
		p.blank()
		if p.i >= len(p.data) || p.data[p.i] != '"' {
			return false
		}
		key, ok := p.str()
		if !ok {
			return false
		}
		off := int64(p.i)
		for _, m := range p.members[mark:] {
			if m.key == key {
				return false // jsonTree names both lines
			}
		}
		p.blank()
		if p.i >= len(p.data) || p.data[p.i] != ':' {
			return false
		}
		p.i++
		v, ok := p.value(depth + 1)
		if !ok {
			return false
		}
		p.members = append(p.members, member{key: key, offset: off, value: v})
		p.blank()
		if p.i >= len(p.data) {
			return false
		}
		switch p.data[p.i] {
		case ',':
			p.i++
		case '}':
			p.i++
			n.members = append([]member(nil), p.members[mark:]...)
			return true
		default:
			return false
		}
	}
}

func (p *fastTree) array(n *node, depth int) bool {
	p.blank()
	if p.i < len(p.data) && p.data[p.i] == ']' {
		p.i++
		return true
	}
	mark := len(p.elems)
	defer func() { p.elems = p.elems[:mark] }()
	for {
		v, ok := p.value(depth + 1)
		if !ok {
			return false
		}
		p.elems = append(p.elems, v)
		p.blank()
		if p.i >= len(p.data) {
			return false
		}
		switch p.data[p.i] {
		case ',':
			p.i++
		case ']':
			p.i++
			n.elems = append([]*node(nil), p.elems[mark:]...)
			return true
		default:
			return false
		}
	}
}

// str reads a string with no escapes and no control characters whose
// bytes are UTF-8; anything else is left to jsonTree.
func (p *fastTree) str() (string, bool) {
	start := p.i + 1
	for j := start; j < len(p.data); j++ {
		switch c := p.data[j]; {
		case c == '"':
			b := p.data[start:j]
			p.i = j + 1
			return p.text[start:j], utf8.Valid(b)
		case c == '\\' || c < 0x20:
			return "", false
		}
	}
	return "", false
}

// number reads a number by JSON's grammar:
// -?(0|[1-9][0-9]*)(\.[0-9]+)?([eE][+-]?[0-9]+)?
func (p *fastTree) number() bool {
	d := p.data
	if p.i < len(d) && d[p.i] == '-' {
		p.i++
	}
	switch {
	case p.i < len(d) && d[p.i] == '0':
		p.i++
	case p.i < len(d) && d[p.i] >= '1' && d[p.i] <= '9':
		p.digits()
	default:
		return false
	}
	if p.i < len(d) && d[p.i] == '.' {
		p.i++
		if !p.digits() {
			return false
		}
	}
	if p.i < len(d) && (d[p.i] == 'e' || d[p.i] == 'E') {
		p.i++
		if p.i < len(d) && (d[p.i] == '+' || d[p.i] == '-') {
			p.i++
		}
		if !p.digits() {
			return false
		}
	}
	// A number runs into the next token only through a delimiter.
	if p.i < len(d) {
		switch d[p.i] {
		case ' ', '\t', '\n', '\r', ',', ']', '}':
		default:
			return false
		}
	}
	return true
}

// digits consumes one or more decimal digits and reports whether there
// was one.
func (p *fastTree) digits() bool {
	start := p.i
	for p.i < len(p.data) && p.data[p.i] >= '0' && p.data[p.i] <= '9' {
		p.i++
	}
	return p.i > start
}
