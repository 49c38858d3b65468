package designfile

import (
	"errors"
	"strings"
	"testing"

	"ullage/hazards"
)

func TestLatestAndFind(t *testing.T) {
	f := typicalFile()
	r, err := f.Latest()
	if err != nil || r.Label != "B" {
		t.Fatalf("Latest() = %v, %v; want revision B", r, err)
	}
	if r != &f.Revisions[1] {
		t.Error("Latest does not point into the file")
	}
	r, err = f.Find("A")
	if err != nil || r != &f.Revisions[0] {
		t.Fatalf("Find(A) = %v, %v; want the first revision", r, err)
	}
	_, err = f.Find("C")
	if !errors.Is(err, ErrNoRevision) || !strings.Contains(err.Error(), `"C"`) || !strings.Contains(err.Error(), "A, B") {
		t.Errorf("Find(C) error = %v; want ErrNoRevision naming C and the labels A, B", err)
	}
	if _, err := (&File{}).Latest(); !errors.Is(err, ErrNoRevision) {
		t.Errorf("Latest on an empty file: %v; want ErrNoRevision", err)
	}
	if _, err := (&File{}).Find("A"); !errors.Is(err, ErrNoRevision) || !strings.Contains(err.Error(), "no revision") {
		t.Errorf("Find on an empty file: %v", err)
	}
}

func TestAddRevision(t *testing.T) {
	tests := []struct {
		label   string
		wantErr string // "" for success
	}{
		{"C", ""},
		{"", "needs a label"},
		{"   ", "needs a label"},
		{" C", "space"},
		{"A", "already used"},
		{"B", "already used"},
		{"REVISION-NUMBER-17", "at most 16"},
		{"C\t1", "control"},
	}
	for _, tt := range tests {
		f := typicalFile()
		err := f.AddRevision(Revision{Label: tt.label, Date: "2024-09-01", Design: typicalDesign()})
		switch {
		case tt.wantErr == "" && err != nil:
			t.Errorf("AddRevision(%q) = %v; want success", tt.label, err)
		case tt.wantErr == "" && (len(f.Revisions) != 3 || f.Revisions[2].Label != tt.label):
			t.Errorf("AddRevision(%q): revisions now %v", tt.label, f.Labels())
		case tt.wantErr != "" && (err == nil || !strings.Contains(err.Error(), tt.wantErr)):
			t.Errorf("AddRevision(%q) = %v; want an error containing %q", tt.label, err, tt.wantErr)
		case tt.wantErr != "" && len(f.Revisions) != 2:
			t.Errorf("AddRevision(%q) failed but changed the file: %v", tt.label, f.Labels())
		}
	}
}

func TestNextLabel(t *testing.T) {
	tests := []struct {
		labels []string
		want   string
	}{
		{nil, "A"},
		{[]string{"A"}, "B"},
		{[]string{"A", "B"}, "C"},
		{[]string{"Y", "Z"}, "AA"},
		{[]string{"AZ"}, "BA"},
		{[]string{"ZZ"}, "AAA"},
		{[]string{"A", "draft"}, "B"},         // latest is not letters: first unused
		{[]string{"B", "A"}, "C"},             // after A comes B, which is taken: first unused
		{[]string{"prototype"}, "A"},          // nothing lettered yet
		{[]string{"A", "B", "1.0"}, "C"},      // first unused letter
		{[]string{"ABCDEFGHIJ"}, "A"},         // too long to count on
		{[]string{"A", "C", "b"}, "B"},        // first unused
		{[]string{"A", "C", "B"}, "D"},        // latest is B, C is used: first unused is D
		{[]string{"X", "Y", "Z", "AA"}, "AB"}, // carries on past Z
	}
	for _, tt := range tests {
		f := &File{}
		for _, l := range tt.labels {
			f.Revisions = append(f.Revisions, Revision{Label: l})
		}
		if got := f.NextLabel(); got != tt.want {
			t.Errorf("NextLabel after %v = %q; want %q", tt.labels, got, tt.want)
		}
	}
}

func TestValidate(t *testing.T) {
	tests := []struct {
		name      string
		edit      func(f *File)
		wantField string
		wantText  string
	}{
		{"wrong format", func(f *File) { f.Format = "ullage-design/1" }, "format", "ullage-design/2"},
		{"no revisions", func(f *File) { f.Revisions = nil }, "revisions", "at least one revision"},
		{"empty label", func(f *File) { f.Revisions[1].Label = "" }, "revisions[1].label", "needs a label"},
		{"duplicate label", func(f *File) { f.Revisions[1].Label = "A" }, "revisions[1].label", "revisions[0]"},
		{"no date", func(f *File) { f.Revisions[0].Date = "" }, "revisions[0].date", "YYYY-MM-DD"},
		{"day that does not exist", func(f *File) { f.Revisions[0].Date = "2023-02-29" }, "revisions[0].date", "YYYY-MM-DD"},
		{"other layout", func(f *File) { f.Revisions[0].Date = "04/03/2024" }, "revisions[0].date", "YYYY-MM-DD"},
		{"short form", func(f *File) { f.Revisions[0].Date = "2024-3-4" }, "revisions[0].date", "YYYY-MM-DD"},
		{"slipped year", func(f *File) { f.Revisions[0].Date = "0224-03-04" }, "revisions[0].date", "1900"},
		{"dates backwards", func(f *File) { f.Revisions[1].Date = "2024-03-03" }, "revisions[1].date", "oldest first"},
		{"design out of range", func(f *File) { f.Revisions[1].Design.FillMassKg = -0.001 }, "revisions[1].design.fill_mass_kg", "must be from 1e-06 to 10 kg"},
		{"part shape", func(f *File) { f.Revisions[0].Design.Vessel.Parts[2].Shape = "cone" }, "revisions[0].design.vessel.parts[2].shape", "sphere"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			f := typicalFile()
			tt.edit(f)
			err := f.Validate()
			var fe *FileError
			if !errors.As(err, &fe) {
				t.Fatalf("Validate() = %v; want a *FileError", err)
			}
			if fe.Field != tt.wantField || !strings.Contains(err.Error(), tt.wantText) || !errors.Is(err, ErrInvalidFile) {
				t.Errorf("Validate() = %q (field %q); want field %q, text %q, wrapping ErrInvalidFile", err, fe.Field, tt.wantField, tt.wantText)
			}
		})
	}
	if err := typicalFile().Validate(); err != nil {
		t.Errorf("valid file: %v", err)
	}
	f := typicalFile()
	f.Revisions[1].Date = f.Revisions[0].Date
	if err := f.Validate(); err != nil {
		t.Errorf("two revisions on the same day: %v", err)
	}
}

// A design error keeps the hazards error reachable for callers.
func TestValidateWrapsInputError(t *testing.T) {
	f := typicalFile()
	f.Revisions[0].Design.HottestK = 1e4
	err := f.Validate()
	var ie *hazards.InputError
	if !errors.As(err, &ie) || !errors.Is(err, hazards.ErrInvalidInput) || ie.Field != "hottest_k" {
		t.Errorf("Validate() = %v; want it to wrap the *hazards.InputError for hottest_k", err)
	}
	if want := "revisions[0].design.hottest_k = 10000: must be from 20 to 800 K"; err.Error() != want {
		t.Errorf("message %q; want %q", err, want)
	}
}
