package designfile

import (
	"bytes"
	"testing"
)

// FuzzDecode: Decode never panics, and whatever it accepts re-encodes to
// a file that decodes to the same designs (same fingerprints).
func FuzzDecode(f *testing.F) {
	for _, path := range []string{fixtureCurrent, fixtureSingleSheet} {
		f.Add(readFixture(f, path))
	}
	f.Add([]byte(`{"format": "ullage-design/2", "product": {}, "revisions": []}`))
	f.Add([]byte(`{"format": "ullage-design/1"}`))
	f.Add([]byte(`[{"a": 1e999}, null, true, "\u0000"]`))
	f.Fuzz(func(t *testing.T, data []byte) {
		file, err := Decode(bytes.NewReader(data), "fuzz")
		if err != nil {
			if err.Error() == "" {
				t.Error("empty error message")
			}
			return
		}
		var out bytes.Buffer
		if err := Encode(&out, file); err != nil {
			t.Fatalf("Encode of a decoded file: %v", err)
		}
		again, err := Decode(bytes.NewReader(out.Bytes()), "re-encoded")
		if err != nil {
			t.Fatalf("re-encoded file does not decode: %v\n%s", err, out.Bytes())
		}
		if len(again.Revisions) != len(file.Revisions) {
			t.Fatalf("%d revisions, then %d", len(file.Revisions), len(again.Revisions))
		}
		for i := range file.Revisions {
			if a, b := file.Revisions[i].Fingerprint(), again.Revisions[i].Fingerprint(); a != b {
				t.Errorf("revision %d: fingerprint %s, then %s", i, a, b)
			}
		}
	})
}
