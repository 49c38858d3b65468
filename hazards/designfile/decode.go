package designfile

import (
	"bytes"
	"fmt"
	"io"
	"reflect"
	"strings"
	"unicode/utf8"

	"ullage/hazards"
)

// MigratedChangeNote is the change note of the revision made from a
// single-design sheet.
const MigratedChangeNote = "Migrated from a single-design sheet"

// singleSheet is the older FormatSingleSheet layout.
type singleSheet struct {
	Format  string         `json:"format"`
	Product Product        `json:"product"`
	Design  hazards.Design `json:"design"`
	Author  string         `json:"author"`
	Date    string         `json:"date"`
}

// Decode reads one design file from r. name is used only in error
// messages (a path or "clipboard"). Decoding is strict: the file must be
// a single JSON object of a known format, with every field present, no
// unknown field, every value of the right type and every design valid
// (see File.Validate); at most MaxFileBytes are read. A FormatSingleSheet
// file is migrated to a File with one revision labelled "A". The returned
// File always has Format FormatCurrent.
//
// Every error wraps ErrInvalidFile; it is a *FileError naming the file,
// the field path and, where the decoder knows it, the line. A file over
// MaxFileBytes gives an error that also wraps ErrTooLarge.
func Decode(r io.Reader, name string) (*File, error) {
	data, err := io.ReadAll(io.LimitReader(r, MaxFileBytes+1))
	if err != nil {
		return nil, &FileError{File: name, Problem: "cannot be read: " + err.Error(), Err: err}
	}
	if len(data) > MaxFileBytes {
		return nil, tooLarge(name)
	}
	data, line, problem := stripBOM(data)
	if problem != "" {
		return nil, &FileError{File: name, Line: line, Problem: problem}
	}
	f, ferr := decodeBytes(data)
	if ferr != nil {
		ferr.File = name
		return nil, ferr
	}
	return f, nil
}

func tooLarge(name string) *FileError {
	return &FileError{File: name, Problem: fmt.Sprintf("is larger than %d bytes (%d MiB), the most a design file may hold", MaxFileBytes, MaxFileBytes>>20), Err: ErrTooLarge}
}

func decodeBytes(data []byte) (*File, *FileError) {
	root, ferr := parseTree(data)
	if ferr != nil {
		return nil, ferr
	}
	if root.kind != kindObject {
		return nil, &FileError{Line: lineAt(data, root.offset), Value: root.shown(),
			Problem: fmt.Sprintf("a design file is one JSON object { … } starting with \"format\": %q", FormatCurrent)}
	}
	format := root.get("format")
	switch {
	case format == nil:
		return nil, &FileError{Line: lineAt(data, root.offset), Field: "format",
			Problem: fmt.Sprintf("is missing; a design file gives \"format\": %q", FormatCurrent), Err: errMissingField}
	case format.kind != kindString || (format.text != FormatCurrent && format.text != FormatSingleSheet):
		problem := fmt.Sprintf("must be %q (or the older %q)", FormatCurrent, FormatSingleSheet)
		if format.kind == kindString && strings.HasPrefix(format.text, "ullage-design/") {
			problem += "; this file may come from a newer version of Ullage"
		}
		return nil, &FileError{Line: lineAt(data, format.offset), Field: "format", Value: format.shown(), Problem: problem}
	}
	d := &strictDecoder{data: data}
	var f *File
	// fieldInFile maps a path in the File to the path in the file as written.
	fieldInFile := func(path string) string { return path }
	if format.text == FormatCurrent {
		f = new(File)
		if err := d.decode(root, reflect.ValueOf(f).Elem()); err != nil {
			return nil, err
		}
	} else {
		var s singleSheet
		if err := d.decode(root, reflect.ValueOf(&s).Elem()); err != nil {
			return nil, err
		}
		f = migrateSingleSheet(&s)
		fieldInFile = func(path string) string { return strings.TrimPrefix(path, "revisions[0].") }
	}
	if err := f.validate(); err != nil {
		err.Field = fieldInFile(err.Field)
		err.Line = lineAt(data, locate(root, err.Field))
		return nil, err
	}
	return f, nil
}

// migrateSingleSheet turns a single-design sheet into a File.
func migrateSingleSheet(s *singleSheet) *File {
	return &File{
		Format:  FormatCurrent,
		Product: s.Product,
		Revisions: []Revision{{
			Label:      "A",
			Date:       s.Date,
			Author:     s.Author,
			ChangeNote: MigratedChangeNote,
			Design:     s.Design,
		}},
	}
}

// utf8BOM is the UTF-8 byte-order mark some editors put first.
var utf8BOM = []byte{0xEF, 0xBB, 0xBF}

// stripBOM skips a UTF-8 byte-order mark and names a UTF-16 or UTF-32
// encoding, which the JSON decoder cannot read; problem is "" when the
// data can be decoded, and line says where the problem is.
func stripBOM(data []byte) (out []byte, line int, problem string) {
	const saveAs = "; save it as UTF-8 (most editors offer this under Save As or Encoding)"
	switch {
	case bytes.HasPrefix(data, utf8BOM):
		data = data[len(utf8BOM):]
	case bytes.HasPrefix(data, []byte{0xFF, 0xFE, 0, 0}), bytes.HasPrefix(data, []byte{0, 0, 0xFE, 0xFF}):
		return nil, 1, "the file is encoded as UTF-32" + saveAs
	case bytes.HasPrefix(data, []byte{0xFE, 0xFF}):
		return nil, 1, "the file is encoded as UTF-16 (big-endian)" + saveAs
	case bytes.HasPrefix(data, []byte{0xFF, 0xFE}):
		return nil, 1, "the file is encoded as UTF-16 (little-endian)" + saveAs
	case len(data) >= 4 && data[0] == 0 && data[1] != 0 && data[2] == 0:
		return nil, 1, "the file is encoded as UTF-16 (big-endian, no byte-order mark)" + saveAs
	case len(data) >= 4 && data[0] != 0 && data[1] == 0 && data[3] == 0:
		return nil, 1, "the file is encoded as UTF-16 (little-endian, no byte-order mark)" + saveAs
	}
	if !utf8.Valid(data) {
		return nil, lineAt(data, int64(firstInvalidUTF8(data))+1), "the file is not valid UTF-8 text (a byte that is no character in UTF-8, perhaps from another encoding)" + saveAs
	}
	return data, 0, ""
}

// firstInvalidUTF8 returns the offset of the first byte that does not
// start a valid UTF-8 sequence.
func firstInvalidUTF8(data []byte) int {
	for i := 0; i < len(data); {
		r, size := utf8.DecodeRune(data[i:])
		if r == utf8.RuneError && size <= 1 {
			return i
		}
		i += size
	}
	return len(data)
}
