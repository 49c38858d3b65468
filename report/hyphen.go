package report

import (
	"bytes"
	"encoding/binary"
	"sync"

	"golang.org/x/image/font/sfnt"
)

// The Go fonts draw the hyphen-minus (U+002D) as wide as a minus sign, so
// that "BC-TL-1" and "2026-12-02" read as dashes. Each font also holds a
// hyphen of ordinary width, the glyph of the soft hyphen (U+00AD).
// shortHyphen rebuilds a font's character map so that U+002D draws that
// glyph: the text still reads back as U+002D, and minus signs are written
// as U+2212, which keeps its own, wider glyph.

var (
	// shortHyphenFonts holds the rebuilt fonts by the address of the
	// original font's first byte.
	shortHyphenFonts sync.Map
	shortHyphenMutex sync.Mutex
)

type shortHyphenEntry struct {
	once sync.Once
	ttf  []byte
}

// shortHyphen returns a copy of ttf whose hyphen-minus draws the soft
// hyphen's glyph, or ttf itself when the font cannot be rebuilt. The
// result is computed once per font and shared: callers must clone it
// before handing it to the PDF library, which writes into the bytes.
func shortHyphen(ttf []byte) []byte {
	shortHyphenMutex.Lock()
	v, _ := shortHyphenFonts.LoadOrStore(&ttf[0], &shortHyphenEntry{})
	shortHyphenMutex.Unlock()
	e := v.(*shortHyphenEntry)
	e.once.Do(func() {
		e.ttf = ttf
		if out, ok := rebuildHyphen(ttf); ok {
			e.ttf = out
		}
	})
	return e.ttf
}

func rebuildHyphen(ttf []byte) ([]byte, bool) {
	f, err := sfnt.Parse(ttf)
	if err != nil {
		return nil, false
	}
	var b sfnt.Buffer
	soft, err := f.GlyphIndex(&b, 0xad)
	if err != nil || soft == 0 {
		return nil, false
	}
	glyphs := make([]uint16, 0x10000)
	for r := 0; r < 0xffff; r++ {
		if g, err := f.GlyphIndex(&b, rune(r)); err == nil {
			glyphs[r] = uint16(g)
		}
	}
	glyphs['-'] = uint16(soft)
	// Segments of consecutive characters with consecutive glyphs.
	type seg struct{ start, end, delta uint16 }
	var segs []seg
	for r := 0; r < 0xffff; r++ {
		if glyphs[r] == 0 {
			continue
		}
		d := uint16(int(glyphs[r]) - r)
		if n := len(segs); n > 0 && int(segs[n-1].end) == r-1 && segs[n-1].delta == d {
			segs[n-1].end = uint16(r)
			continue
		}
		segs = append(segs, seg{uint16(r), uint16(r), d})
	}
	segs = append(segs, seg{0xffff, 0xffff, 1})
	n := len(segs)
	var sub bytes.Buffer
	w := func(v uint16) { _ = binary.Write(&sub, binary.BigEndian, v) }
	search := 1
	sel := 0
	for search*2 <= n {
		search *= 2
		sel++
	}
	length := 16 + 8*n
	if length > 0xffff {
		return nil, false
	}
	w(4)
	w(uint16(length))
	w(0)
	w(uint16(2 * n))
	w(uint16(2 * search))
	w(uint16(sel))
	w(uint16(2*n - 2*search))
	for _, s := range segs {
		w(s.end)
	}
	w(0)
	for _, s := range segs {
		w(s.start)
	}
	for _, s := range segs {
		w(s.delta)
	}
	for range segs {
		w(0)
	}
	var cmap bytes.Buffer
	_ = binary.Write(&cmap, binary.BigEndian, []uint16{0, 1, 3, 1})
	_ = binary.Write(&cmap, binary.BigEndian, uint32(12))
	cmap.Write(sub.Bytes())
	return replaceTable(ttf, "cmap", cmap.Bytes())
}

// replaceTable returns a copy of a TrueType file with one table's data
// replaced by data, appended at the end of the file.
func replaceTable(ttf []byte, tag string, data []byte) ([]byte, bool) {
	if len(ttf) < 12 {
		return nil, false
	}
	num := int(binary.BigEndian.Uint16(ttf[4:]))
	out := bytes.Clone(ttf)
	for len(out)%4 != 0 {
		out = append(out, 0)
	}
	for i := 0; i < num; i++ {
		rec := 12 + 16*i
		if rec+16 > len(ttf) {
			return nil, false
		}
		if string(ttf[rec:rec+4]) != tag {
			continue
		}
		var sum uint32
		padded := append(bytes.Clone(data), make([]byte, (4-len(data)%4)%4)...)
		for j := 0; j < len(padded); j += 4 {
			sum += binary.BigEndian.Uint32(padded[j:])
		}
		binary.BigEndian.PutUint32(out[rec+4:], sum)
		binary.BigEndian.PutUint32(out[rec+8:], uint32(len(out)))
		binary.BigEndian.PutUint32(out[rec+12:], uint32(len(data)))
		return append(out, padded...), true
	}
	return nil, false
}
