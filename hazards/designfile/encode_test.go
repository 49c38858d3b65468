package designfile

import (
	"bytes"
	"flag"
	"os"
	"reflect"
	"strings"
	"testing"
)

var update = flag.Bool("update", false, "rewrite testdata/twin_bulb_v2.json from the encoder (only on purpose)")

// The current-format fixture is also the golden output of Encode: loading
// and re-encoding it must give the same bytes, so the layout of saved
// files changes only on purpose.
func TestEncodeMatchesFixture(t *testing.T) {
	f, err := Load(fixtureCurrent)
	if err != nil {
		t.Fatal(err)
	}
	got := encodeToBytes(t, f)
	if *update {
		if err := os.WriteFile(fixtureCurrent, got, 0o644); err != nil {
			t.Fatal(err)
		}
	}
	if want := readFixture(t, fixtureCurrent); !bytes.Equal(got, want) {
		t.Errorf("Encode(Load(%s)) differs from the file; run with -update if the change is on purpose\ngot:\n%s", fixtureCurrent, got)
	}
}

func TestRoundTrip(t *testing.T) {
	for _, path := range []string{fixtureCurrent, fixtureSingleSheet} {
		t.Run(path, func(t *testing.T) {
			f, err := Load(path)
			if err != nil {
				t.Fatal(err)
			}
			first := encodeToBytes(t, f)
			g, err := Decode(bytes.NewReader(first), "re-encoded")
			if err != nil {
				t.Fatalf("decoding what Encode wrote: %v\n%s", err, first)
			}
			if !reflect.DeepEqual(f, g) {
				t.Errorf("Decode(Encode(f)) != f\n f = %+v\n g = %+v", f, g)
			}
			if second := encodeToBytes(t, g); !bytes.Equal(first, second) {
				t.Errorf("encoding is not stable:\n%s\n---\n%s", first, second)
			}
			for i := range f.Revisions {
				if a, b := f.Revisions[i].Fingerprint(), g.Revisions[i].Fingerprint(); a != b {
					t.Errorf("revision %s: fingerprint %s before, %s after the round trip", f.Revisions[i].Label, a, b)
				}
			}
		})
	}
}

// A File built in memory (nil lists, empty format tag) encodes as a
// complete current-format file that decodes to the same designs.
func TestEncodeFromMemory(t *testing.T) {
	f := typicalFile()
	out := encodeToBytes(t, f)
	for _, want := range []string{`"format": "ullage-design/2"`, `"limit_bodies": []`} {
		if !strings.Contains(string(out), want) {
			t.Errorf("encoded file lacks %s:\n%s", want, out)
		}
	}
	if strings.Contains(string(out), "null") {
		t.Errorf("encoded file holds null:\n%s", out)
	}
	if f.Format != "" || f.Revisions[0].Design.Criteria.LimitBodies != nil {
		t.Error("Encode changed the File it was given")
	}
	g, err := Decode(bytes.NewReader(out), "memory")
	if err != nil {
		t.Fatal(err)
	}
	for i := range f.Revisions {
		if f.Revisions[i].Fingerprint() != g.Revisions[i].Fingerprint() {
			t.Errorf("revision %d: fingerprint changed through Encode/Decode", i)
		}
	}
}

// Text that HTML escaping would mangle is written as typed.
func TestEncodeKeepsText(t *testing.T) {
	f := typicalFile()
	f.Product.Description = "fill < 6 g & walls > 1 mm"
	if out := encodeToBytes(t, f); !strings.Contains(string(out), f.Product.Description) {
		t.Errorf("description not written as typed:\n%s", out)
	}
}
