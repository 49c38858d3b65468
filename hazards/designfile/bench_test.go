package designfile

import (
	"bytes"
	"io"
	"testing"
)

// BenchmarkDecode times a strict decode of the two-revision fixture,
// validation included.
func BenchmarkDecode(b *testing.B) {
	data := readFixture(b, fixtureCurrent)
	b.ReportAllocs()
	b.SetBytes(int64(len(data)))
	for b.Loop() {
		if _, err := Decode(bytes.NewReader(data), "bench"); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkEncode times writing the two-revision file.
func BenchmarkEncode(b *testing.B) {
	f := typicalFile()
	b.ReportAllocs()
	for b.Loop() {
		if err := Encode(io.Discard, f); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkFingerprint times the canonical form and its hash.
func BenchmarkFingerprint(b *testing.B) {
	r := Revision{Design: typicalDesign()}
	b.ReportAllocs()
	for b.Loop() {
		_ = r.Fingerprint()
	}
}
