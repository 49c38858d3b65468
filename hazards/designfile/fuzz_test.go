package designfile

import (
	"bytes"
	"encoding/json"
	"regexp"
	"testing"
)

// FuzzDecode: Decode never panics, and whatever it accepts re-encodes to
// a file that decodes to the same designs (same fingerprints).
func FuzzDecode(f *testing.F) {
	// Small seeds only: every new input the fuzzer finds is then small
	// too, so minimising it takes moments instead of the whole run (the
	// multi-kilobyte fixtures, each decoded in about a millisecond, kept
	// the minimiser busy for minutes and the fuzzer made 10 executions in
	// 90 s). FuzzDecodeValue reaches the validation of every field of a
	// valid file with inputs as small.
	f.Add([]byte(`{"format":"ullage-design/2","product":{"name":"","part_number":"","company":"","description":""},"revisions":[]}`))
	f.Add([]byte(`{"format":"ullage-design/2","product":{},"revisions":null}`))
	f.Add([]byte("\xef\xbb\xbf{\"format\":\"ullage-design/2\"}"))
	f.Add([]byte("\xff\xfe{\x00}\x00"))
	f.Add([]byte(`{"format":"ullage-design/2","format":1}`))
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

// valueRE finds the values of a compact JSON file: strings, numbers,
// true, false, null, and empty lists.
var valueRE = regexp.MustCompile(`:("(?:[^"\\\\]|\\\\.)*"|-?[0-9][0-9.eE+-]*|true|false|null|\\[\\])`)

// FuzzDecodeValue puts a fuzzed JSON literal in place of the n-th value
// of a valid design file (the single-design sheet: the smallest file that
// holds every design field, a third the size of the two-revision file)
// and decodes the result. It reaches the range checks of every field with
// inputs of a few bytes, so the fuzzer never stalls minimising kilobytes.
// Decode never panics, and whatever it accepts re-encodes to the same
// fingerprints.
func FuzzDecodeValue(f *testing.F) {
	var compact bytes.Buffer
	if err := json.Compact(&compact, readFixture(f, fixtureSingleSheet)); err != nil {
		f.Fatal(err)
	}
	base := compact.Bytes()
	spots := valueRE.FindAllSubmatchIndex(base, -1)
	if len(spots) < 40 {
		f.Fatalf("only %d values found in the fixture", len(spots))
	}
	for i, lit := range []string{"0", "-1", "5e-324", "1e308", "null", `""`, `"x"`, "[]", "{}", "true", `"\ufeff"`, "1e999"} {
		f.Add(uint16(i*7), lit)
	}
	f.Fuzz(func(t *testing.T, n uint16, literal string) {
		at := spots[int(n)%len(spots)]
		data := make([]byte, 0, len(base)+len(literal))
		data = append(data, base[:at[2]]...)
		data = append(data, literal...)
		data = append(data, base[at[3]:]...)
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
			t.Fatalf("re-encoded file does not decode: %v", err)
		}
		for i := range file.Revisions {
			if a, b := file.Revisions[i].Fingerprint(), again.Revisions[i].Fingerprint(); a != b {
				t.Errorf("revision %d: fingerprint %s, then %s", i, a, b)
			}
		}
	})
}
