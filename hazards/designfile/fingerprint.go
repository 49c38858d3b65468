package designfile

import (
	"bytes"
	"crypto/sha256"
	"encoding/hex"
	"fmt"
	"math"
	"reflect"
	"strconv"
	"unicode/utf8"

	"ullage/hazards/jsonfields"
)

// Fingerprint returns the hex SHA-256 of the canonical JSON of r.Design,
// so that two revisions with equal designs have equal fingerprints
// whatever the file's layout. Label, date, author and change note are not
// part of it.
//
// The canonical JSON has no whitespace; object members sorted by key
// (byte order) and every field present, a nil pointer as null, except
// that a field tagged omitzero is left out while it holds its zero value
// (so optional inputs added later leave older fingerprints unchanged);
// a nil list
// written as [] like an empty one; numbers in Go's shortest round-trip
// form, strconv.FormatFloat(x, 'g', -1, 64) (e.g. 0.006, 1e-12, 101325),
// with −0 written as 0; text as a JSON string with only ", \ and control
// characters escaped and invalid UTF-8 replaced by U+FFFD. (A number
// that is not finite, which no valid design holds, is written as the
// string "NaN", "+Inf" or "-Inf".) This form is fixed: changing it
// changes every fingerprint already printed in a record.
func (r *Revision) Fingerprint() string {
	var b bytes.Buffer
	b.Grow(canonicalSizeHint)
	writeCanonical(&b, reflect.ValueOf(r.Design))
	sum := sha256.Sum256(b.Bytes())
	return hex.EncodeToString(sum[:])
}

// canonicalSizeHint is a little over the canonical form of a design
// with a few parts (about 1.5 kB), so that one allocation usually holds it.
const canonicalSizeHint = 2048

// canonicalJSON returns the canonical form of v, for tests.
func canonicalJSON(v any) string {
	var b bytes.Buffer
	writeCanonical(&b, reflect.ValueOf(v))
	return b.String()
}

func writeCanonical(b *bytes.Buffer, v reflect.Value) {
	switch v.Kind() {
	case reflect.Struct:
		fields := jsonfields.ByName(v.Type())
		b.WriteByte('{')
		i := 0
		for _, f := range fields {
			fv := v.FieldByIndex(f.Index)
			if f.OmitZero && canonicalZero(fv) {
				continue
			}
			if i > 0 {
				b.WriteByte(',')
			}
			i++
			writeString(b, f.Name)
			b.WriteByte(':')
			writeCanonical(b, fv)
		}
		b.WriteByte('}')
	case reflect.Pointer, reflect.Interface:
		if v.IsNil() {
			b.WriteString("null")
			return
		}
		writeCanonical(b, v.Elem())
	case reflect.Slice, reflect.Array:
		b.WriteByte('[')
		for i := 0; i < v.Len(); i++ {
			if i > 0 {
				b.WriteByte(',')
			}
			writeCanonical(b, v.Index(i))
		}
		b.WriteByte(']')
	case reflect.String:
		writeString(b, v.String())
	case reflect.Float32, reflect.Float64:
		writeNumber(b, v.Float())
	case reflect.Int, reflect.Int8, reflect.Int16, reflect.Int32, reflect.Int64:
		b.Write(strconv.AppendInt(b.AvailableBuffer(), v.Int(), 10))
	case reflect.Uint, reflect.Uint8, reflect.Uint16, reflect.Uint32, reflect.Uint64:
		b.Write(strconv.AppendUint(b.AvailableBuffer(), v.Uint(), 10))
	case reflect.Bool:
		b.WriteString(strconv.FormatBool(v.Bool()))
	default:
		panic(fmt.Sprintf("designfile: no canonical form for %s", v.Type()))
	}
}

// canonicalZero reports whether v is written the same as its type's zero
// value: −0 counts as zero, and so does an empty list.
func canonicalZero(v reflect.Value) bool {
	switch v.Kind() {
	case reflect.Struct:
		for i := 0; i < v.NumField(); i++ {
			if !canonicalZero(v.Field(i)) {
				return false
			}
		}
		return true
	case reflect.Float32, reflect.Float64:
		return v.Float() == 0
	case reflect.Slice:
		return v.Len() == 0
	}
	return v.IsZero()
}

func writeNumber(b *bytes.Buffer, x float64) {
	switch {
	case math.IsNaN(x):
		b.WriteString(`"NaN"`)
	case math.IsInf(x, 1):
		b.WriteString(`"+Inf"`)
	case math.IsInf(x, -1):
		b.WriteString(`"-Inf"`)
	case x == 0:
		b.WriteByte('0') // also −0
	default:
		b.Write(strconv.AppendFloat(b.AvailableBuffer(), x, 'g', -1, 64))
	}
}

func writeString(b *bytes.Buffer, s string) {
	const hexDigits = "0123456789abcdef"
	b.WriteByte('"')
	start := 0 // s[start:i] is waiting to be written as it stands
	for i := 0; i < len(s); {
		c := s[i]
		if c >= 0x20 && c != '"' && c != '\\' && c < utf8.RuneSelf {
			i++
			continue
		}
		if c >= utf8.RuneSelf {
			if r, size := utf8.DecodeRuneInString(s[i:]); r != utf8.RuneError || size > 1 {
				i += size // valid UTF-8, U+FFFD itself included
				continue
			}
		}
		b.WriteString(s[start:i])
		switch {
		case c == '"' || c == '\\':
			b.WriteByte('\\')
			b.WriteByte(c)
		case c < 0x20:
			b.WriteString(`\u00`)
			b.WriteByte(hexDigits[c>>4])
			b.WriteByte(hexDigits[c&0xf])
		default:
			b.WriteRune(utf8.RuneError) // an invalid byte: U+FFFD
		}
		i++
		start = i
	}
	b.WriteString(s[start:])
	b.WriteByte('"')
}
