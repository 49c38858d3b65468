package designfile

import (
	"bytes"
	"errors"
	"fmt"
	"io"
	"io/fs"
	"os"
	"path/filepath"
	"reflect"
	"strings"
	"testing"

	"ullage/hazards"
)

func TestLoadCurrentFixture(t *testing.T) {
	f, err := Load(fixtureCurrent)
	if err != nil {
		t.Fatal(err)
	}
	if f.Format != FormatCurrent || f.Product.PartNumber != "EX-TB40" {
		t.Errorf("format %q, product %+v", f.Format, f.Product)
	}
	if got := f.Labels(); !reflect.DeepEqual(got, []string{"A", "B"}) {
		t.Fatalf("labels %v; want [A B]", got)
	}
	want := typicalDesign()
	want.Criteria.LimitBodies = []string{} // the file writes []
	if got := f.Revisions[0].Design; !reflect.DeepEqual(got, want) {
		t.Errorf("revision A design\n got %+v\nwant %+v", got, want)
	}
	b := f.Revisions[1].Design
	if b.FillMassKg != 0.0055 || b.Vessel.Parts[2].WallThicknessM != 0.0012 || !reflect.DeepEqual(b.Criteria.LimitBodies, []string{"NIOSH", "OSHA"}) {
		t.Errorf("revision B design %+v", b)
	}
}

func TestMigrateSingleSheet(t *testing.T) {
	f, err := Load(fixtureSingleSheet)
	if err != nil {
		t.Fatal(err)
	}
	if f.Format != FormatCurrent {
		t.Errorf("format %q after migration; want %q", f.Format, FormatCurrent)
	}
	if len(f.Revisions) != 1 {
		t.Fatalf("%d revisions; want 1", len(f.Revisions))
	}
	r := f.Revisions[0]
	if r.Label != "A" || r.ChangeNote != MigratedChangeNote || r.Date != "2023-11-20" || r.Author != "R. Tester" {
		t.Errorf("migrated revision %+v", r)
	}
	if f.Product.Name != "Twin-bulb desk ornament TB-40" {
		t.Errorf("product %+v", f.Product)
	}
	typical := Revision{Design: typicalDesign()}
	if r.Fingerprint() != typical.Fingerprint() {
		t.Errorf("migrated design differs from the sheet's design: %+v", r.Design)
	}
	// What is written back is the current format.
	if out := encodeToBytes(t, f); !bytes.Contains(out, []byte(`"format": "ullage-design/2"`)) {
		t.Errorf("migrated file written as:\n%s", out)
	}
}

// edit changes the n-th (1-based) occurrence of old in a fixture.
type edit struct {
	old, new string
	nth      int
}

// mark finds the line an error should name: the line of the n-th
// occurrence of text in the edited file, plus offset lines.
type mark struct {
	text   string
	nth    int
	offset int
}

func replaceNth(s, old, new string, n int) (string, bool) {
	i := -1
	for k := 0; k < n; k++ {
		j := strings.Index(s[i+1:], old)
		if j < 0 {
			return s, false
		}
		i += 1 + j
	}
	return s[:i] + new + s[i+len(old):], true
}

func lineOfNth(s, text string, n int) int {
	i := -1
	for k := 0; k < n; k++ {
		j := strings.Index(s[i+1:], text)
		if j < 0 {
			return -1
		}
		i += 1 + j
	}
	return 1 + strings.Count(s[:i], "\n")
}

func TestDecodeMalformed(t *testing.T) {
	tests := []struct {
		name    string
		fixture string
		edits   []edit
		whole   string // replaces the whole file when set
		field   string // "" when the file as a whole is at fault
		at      mark   // line to be named; zero for none expected
		text    string // must appear in the message
		is      error  // extra error the result must wrap, or nil
	}{
		{name: "text for a number", fixture: fixtureCurrent,
			edits: []edit{{`"fill_mass_kg": 0.0055`, `"fill_mass_kg": "five grams"`, 1}},
			field: "revisions[1].design.fill_mass_kg", at: mark{`"five grams"`, 1, 0}, text: "must be a number"},
		{name: "negative fill", fixture: fixtureCurrent,
			edits: []edit{{`"fill_mass_kg": 0.0055`, `"fill_mass_kg": -0.001`, 1}},
			field: "revisions[1].design.fill_mass_kg", at: mark{`-0.001`, 1, 0}, text: "must be from 1e-06 to 10 kg", is: hazards.ErrInvalidInput},
		{name: "null for a number", fixture: fixtureCurrent,
			edits: []edit{{`"hottest_k": 349.15`, `"hottest_k": null`, 1}},
			field: "revisions[0].design.hottest_k", at: mark{`null`, 1, 0}, text: "must be a number"},
		{name: "number too large", fixture: fixtureCurrent,
			edits: []edit{{`"volume_m3": 30`, `"volume_m3": 1e999`, 2}},
			field: "revisions[1].design.room.volume_m3", at: mark{`1e999`, 1, 0}, text: "too large"},
		{name: "unknown field", fixture: fixtureCurrent,
			edits: []edit{{`"fluid": "dichloromethane",`, `"colour": "amber", "fluid": "dichloromethane",`, 1}},
			field: "revisions[0].design.colour", at: mark{`"colour"`, 1, 0}, text: "fill_mass_kg", is: errUnknownField},
		{name: "field in another case", fixture: fixtureCurrent,
			edits: []edit{{`"fluid":`, `"Fluid":`, 2}},
			field: "revisions[1].design.Fluid", at: mark{`"Fluid"`, 1, 0}, text: `did you mean "fluid"?`, is: errUnknownField},
		{name: "missing field", fixture: fixtureCurrent,
			edits: []edit{{"\"hottest_k\": 349.15,\n", "", 2}},
			field: "revisions[1].design.hottest_k", at: mark{`"design": {`, 2, 0}, text: "missing", is: errMissingField},
		{name: "missing part field", fixture: fixtureCurrent,
			edits: []edit{{"\"wall_tolerance_m\": 0,\n", "", 1}},
			field: "revisions[0].design.vessel.parts[0].wall_tolerance_m", at: mark{`"parts": [`, 1, 1}, text: "missing", is: errMissingField},
		{name: "missing product", fixture: fixtureCurrent,
			edits: []edit{{`"product"`, `"maker"`, 1}},
			field: "maker", at: mark{`"maker"`, 1, 0}, text: "unknown field", is: errUnknownField},
		{name: "object for a list", fixture: fixtureCurrent,
			edits: []edit{{`"parts": [`, `"parts": {"x": [`, 2}, {`]
        },
        "sealing`, `]}
        },
        "sealing`, 2}},
			field: "revisions[1].design.vessel.parts", at: mark{`"parts": {`, 1, 0}, text: "must be a list"},
		{name: "number for an object", fixture: fixtureCurrent,
			edits: []edit{{`"product": {`, `"product": 7, "x": {`, 1}},
			field: "product", at: mark{`"product": 7`, 1, 0}, text: "must be an object"},
		{name: "part shape", fixture: fixtureCurrent,
			edits: []edit{{`"shape": "tube"`, `"shape": "cone"`, 1}},
			field: "revisions[0].design.vessel.parts[2].shape", at: mark{`"cone"`, 1, 0}, text: `"sphere" or "tube"`, is: hazards.ErrInvalidInput},
		{name: "unknown limit body", fixture: fixtureCurrent,
			edits: []edit{{`"OSHA"`, `"WHO"`, 1}},
			field: "revisions[1].design.criteria.limit_bodies[1]", at: mark{`"WHO"`, 1, 0}, text: "NIOSH", is: hazards.ErrInvalidInput},
		{name: "duplicate key", fixture: fixtureCurrent,
			edits: []edit{{`"fluid": "dichloromethane",`, `"fluid": "dichloromethane", "fluid": "acetone",`, 2}},
			field: "revisions[1].design.fluid", at: mark{`"acetone"`, 1, 0}, text: "appears twice"},
		{name: "duplicate label", fixture: fixtureCurrent,
			edits: []edit{{`"label": "B"`, `"label": "A"`, 1}},
			field: "revisions[1].label", at: mark{`"label": "A"`, 2, 0}, text: "already used"},
		{name: "impossible date", fixture: fixtureCurrent,
			edits: []edit{{`"2024-03-04"`, `"2024-02-30"`, 1}},
			field: "revisions[0].date", at: mark{`"2024-02-30"`, 1, 0}, text: "YYYY-MM-DD"},
		{name: "dates out of order", fixture: fixtureCurrent,
			edits: []edit{{`"2024-06-17"`, `"2023-06-17"`, 1}},
			field: "revisions[1].date", at: mark{`"2023-06-17"`, 1, 0}, text: "oldest first"},
		{name: "no revisions", whole: "{\n  \"format\": \"ullage-design/2\",\n  \"product\": {\"name\": \"\", \"part_number\": \"\", \"company\": \"\", \"description\": \"\"},\n  \"revisions\": []\n}\n",
			field: "revisions", at: mark{`"revisions"`, 1, 0}, text: "at least one revision"},
		{name: "missing comma", fixture: fixtureCurrent,
			edits: []edit{{`"author": "R. Tester",`, `"author": "R. Tester"`, 2}},
			at:    mark{`"change_note"`, 2, 0}, text: "not valid JSON"},
		{name: "text after the object", fixture: fixtureCurrent,
			edits: []edit{{"}\n", "}\n{}\n", strings.Count(string(readFixture(t, fixtureCurrent)), "}\n")}},
			at:    mark{"{}", 1, 0}, text: "after the end"},
		{name: "cut short", whole: "{\n  \"format\": \"ullage-design/2\",\n  \"product\": {\n",
			at: mark{`"product"`, 1, 0}, text: "ends before"},
		{name: "empty", whole: "", text: "empty"},
		{name: "only spaces", whole: "  \n\n ", text: "empty"},
		{name: "a list, not an object", whole: "\n[1, 2]", at: mark{"[", 1, 0}, text: "one JSON object"},
		{name: "no format", whole: "{\n  \"product\": {}\n}", field: "format", at: mark{"{", 1, 0}, text: "ullage-design/2", is: errMissingField},
		{name: "format from the future", fixture: fixtureCurrent,
			edits: []edit{{`"ullage-design/2"`, `"ullage-design/3"`, 1}},
			field: "format", at: mark{`"ullage-design/3"`, 1, 0}, text: "newer version"},
		{name: "format of another kind", whole: `{"format": "ullage-fluid/1"}`,
			field: "format", at: mark{`"format"`, 1, 0}, text: `must be "ullage-design/2"`},
		{name: "format not text", whole: "{\n\"format\": 2\n}",
			field: "format", at: mark{`2`, 1, 0}, text: `must be "ullage-design/2"`},
		{name: "too deep", whole: `{"format": "ullage-design/2", "product": ` + strings.Repeat("[", 100) + strings.Repeat("]", 100) + "}",
			field: "product" + strings.Repeat("[0]", maxDepth-1), at: mark{`{`, 1, 0}, text: "nested"},
		{name: "single sheet: bad date", fixture: fixtureSingleSheet,
			edits: []edit{{`"2023-11-20"`, `"20 Nov 2023"`, 1}},
			field: "date", at: mark{`"20 Nov 2023"`, 1, 0}, text: "YYYY-MM-DD"},
		{name: "single sheet: design out of range", fixture: fixtureSingleSheet,
			edits: []edit{{`"coldest_k": 244.15`, `"coldest_k": 400`, 1}},
			field: "design.coldest_k", at: mark{`"coldest_k": 400`, 1, 0}, text: "hottest_k", is: hazards.ErrInvalidInput},
		{name: "single sheet: revision list", fixture: fixtureSingleSheet,
			edits: []edit{{`"author"`, `"revisions": [], "author"`, 1}},
			field: "revisions", at: mark{`"revisions"`, 1, 0}, text: "unknown field", is: errUnknownField},
		{name: "single sheet: missing author", fixture: fixtureSingleSheet,
			edits: []edit{{`"author": "R. Tester",`, ``, 1}},
			field: "author", at: mark{"{", 1, 0}, text: "missing", is: errMissingField},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			text := tt.whole
			if tt.fixture != "" {
				text = string(readFixture(t, tt.fixture))
				for _, e := range tt.edits {
					var ok bool
					if text, ok = replaceNth(text, e.old, e.new, e.nth); !ok {
						t.Fatalf("edit %q not found in %s", e.old, tt.fixture)
					}
				}
			}
			f, err := Decode(strings.NewReader(text), "bad.json")
			if err == nil {
				t.Fatalf("Decode accepted the file: %+v\n%s", f, text)
			}
			var fe *FileError
			if !errors.As(err, &fe) || !errors.Is(err, ErrInvalidFile) {
				t.Fatalf("error %v (%T) is not a *FileError wrapping ErrInvalidFile", err, err)
			}
			msg := err.Error()
			wantLine := 0
			if tt.at.text != "" {
				wantLine = lineOfNth(text, tt.at.text, tt.at.nth) + tt.at.offset
			}
			prefix := "bad.json: "
			if wantLine > 0 {
				prefix = fmt.Sprintf("bad.json:%d: ", wantLine)
			}
			if fe.Field != tt.field || fe.Line != wantLine || !strings.HasPrefix(msg, prefix) || !strings.Contains(msg, tt.text) {
				t.Errorf("error %q\n field %q line %d; want field %q, line %d, text %q", msg, fe.Field, fe.Line, tt.field, wantLine, tt.text)
			}
			if tt.field != "" && !strings.Contains(msg, tt.field) {
				t.Errorf("message %q does not name the field %s", msg, tt.field)
			}
			if tt.is != nil && !errors.Is(err, tt.is) {
				t.Errorf("error %q does not wrap %v", msg, tt.is)
			}
		})
	}
}

func TestLoadMissingFile(t *testing.T) {
	path := filepath.Join(t.TempDir(), "absent.json")
	_, err := Load(path)
	if !errors.Is(err, ErrInvalidFile) || !errors.Is(err, fs.ErrNotExist) || !strings.Contains(err.Error(), path) {
		t.Errorf("Load(missing) = %v; want ErrInvalidFile and fs.ErrNotExist, naming %s", err, path)
	}
	if strings.Count(err.Error(), path) != 1 {
		t.Errorf("path repeated in %q", err)
	}
}

func TestLoadFolder(t *testing.T) {
	dir := t.TempDir()
	_, err := Load(dir)
	if !errors.Is(err, ErrInvalidFile) || !strings.Contains(err.Error(), "folder") || !strings.Contains(err.Error(), dir) {
		t.Errorf("Load(folder) = %v; want ErrInvalidFile saying it is a folder", err)
	}
}

func TestTooLarge(t *testing.T) {
	fixture := readFixture(t, fixtureCurrent)
	dir := t.TempDir()
	// Exactly MaxFileBytes (the fixture padded with blanks) still loads.
	atLimit := append(bytes.Clone(fixture), bytes.Repeat([]byte{' '}, MaxFileBytes-len(fixture))...)
	path := filepath.Join(dir, "at-limit.json")
	if err := os.WriteFile(path, atLimit, 0o644); err != nil {
		t.Fatal(err)
	}
	if _, err := Load(path); err != nil {
		t.Errorf("a file of exactly MaxFileBytes: %v", err)
	}
	// One byte more is refused, by Load (from the size) and by Decode
	// (from reading).
	over := append(atLimit, ' ')
	path = filepath.Join(dir, "over.json")
	if err := os.WriteFile(path, over, 0o644); err != nil {
		t.Fatal(err)
	}
	_, err := Load(path)
	if !errors.Is(err, ErrTooLarge) || !errors.Is(err, ErrInvalidFile) || !strings.Contains(err.Error(), path) {
		t.Errorf("Load(over) = %v; want ErrTooLarge naming the file", err)
	}
	_, err = Decode(io.MultiReader(bytes.NewReader(fixture), neverEnding{}), "stream")
	if !errors.Is(err, ErrTooLarge) || !strings.HasPrefix(err.Error(), "stream: ") {
		t.Errorf("Decode(endless) = %v; want ErrTooLarge naming the stream", err)
	}
}

// neverEnding yields blanks for ever.
type neverEnding struct{}

func (neverEnding) Read(p []byte) (int, error) {
	for i := range p {
		p[i] = ' '
	}
	return len(p), nil
}

// A reader that fails is reported with the file's name and its cause.
func TestDecodeReadError(t *testing.T) {
	cause := errors.New("device unplugged")
	_, err := Decode(io.MultiReader(strings.NewReader(`{"format":`), failingReader{cause}), "usb.json")
	if !errors.Is(err, cause) || !errors.Is(err, ErrInvalidFile) || !strings.HasPrefix(err.Error(), "usb.json: ") {
		t.Errorf("Decode = %v; want the cause, ErrInvalidFile and the name", err)
	}
}

type failingReader struct{ err error }

func (r failingReader) Read([]byte) (int, error) { return 0, r.err }
