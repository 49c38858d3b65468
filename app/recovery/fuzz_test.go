package recovery

import (
	"bytes"
	"testing"
	"time"

	"ullage/assets"
	"ullage/hazards/designfile"
)

// exampleSnapshot is the recovery file of the bundled example, opened
// and untouched.
func exampleSnapshot(tb testing.TB) []byte {
	tb.Helper()
	f, err := assets.ExampleFile()
	if err != nil {
		tb.Fatal(err)
	}
	latest, err := f.Latest()
	if err != nil {
		tb.Fatal(err)
	}
	var file bytes.Buffer
	if err := designfile.Encode(&file, f); err != nil {
		tb.Fatal(err)
	}
	b, err := Encode(Snapshot{Name: "example", Base: latest.Label, Saved: time.Date(2026, 11, 3, 10, 0, 0, 0, time.UTC),
		File: file.Bytes(), Work: latest.Design})
	if err != nil {
		tb.Fatal(err)
	}
	return b
}

// FuzzRestoreSnapshot: the recovery-file reader never panics on any
// bytes; what it restores has a design file that validates and a name,
// and what it salvages is a working copy that validates.
func FuzzRestoreSnapshot(f *testing.F) {
	f.Add([]byte(`{"path": "", "name": "x", "base": "B", "saved": "2026-01-01T00:00:00Z", "file": null, "work": {}}`))
	f.Add([]byte(`{"file": {"format": "ullage-design/2"}}`))
	f.Add([]byte(`{"saved": "not a time"}`))
	f.Add([]byte("\xef\xbb\xbf{}"))
	f.Add([]byte(`[]`))
	if good := exampleSnapshot(f); len(good) < 8000 {
		f.Add(good)
	}
	f.Fuzz(func(t *testing.T, b []byte) {
		r, err := Restore(b)
		if err == nil {
			if r.File == nil || r.File.Validate() != nil {
				t.Fatal("restored a document whose file does not validate")
			}
			if r.Name == "" {
				t.Error("restored document has no name")
			}
		}
		if work, _, ok := Salvage(b); ok && work.Validate() != nil {
			t.Error("salvaged a working copy that does not validate")
		}
	})
}
