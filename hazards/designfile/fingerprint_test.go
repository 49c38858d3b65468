package designfile

import (
	"bytes"
	"math"
	"reflect"
	"regexp"
	"strconv"
	"testing"

	"ullage/hazards"

	"ullage/hazards/jsonfields"
)

func TestFingerprintStable(t *testing.T) {
	r := Revision{Label: "A", Design: typicalDesign()}
	fp := r.Fingerprint()
	if !regexp.MustCompile(`^[0-9a-f]{64}$`).MatchString(fp) {
		t.Fatalf("fingerprint %q is not 64 hex digits", fp)
	}
	if again := r.Fingerprint(); again != fp {
		t.Errorf("fingerprint changed between calls: %s, %s", fp, again)
	}
	// Label, date, author and note are not part of the design.
	other := Revision{Label: "Z", Date: "2030-01-01", Author: "someone", ChangeNote: "x", Design: typicalDesign()}
	if other.Fingerprint() != fp {
		t.Error("fingerprint depends on more than the design")
	}
	// A nil list and an empty one are the same design, and so are 0 and −0.
	empty := typicalDesign()
	empty.Criteria.LimitBodies = []string{}
	empty.ResidualGasPressurePa = math.Copysign(0, -1)
	if (&Revision{Design: empty}).Fingerprint() != fp {
		t.Error("nil and empty lists, or 0 and -0, give different fingerprints")
	}
	// Pinned value: the canonical form must not drift, since fingerprints
	// are printed in signed records. Recorded from this implementation;
	// change only on purpose, knowing that old records stop matching.
	const pinned = "c498517976a225ab32b3e0a4dd0c8212ab6a42ab769ea422ef3f745899eb33fa"
	if fp != pinned {
		t.Errorf("fingerprint of the typical design = %s; pinned %s", fp, pinned)
	}
}

// Changing any single input changes the fingerprint: every number, text
// and list of the design is perturbed in turn, found by reflection so
// that fields added to hazards.Design later are covered too.
func TestFingerprintSeesEveryInput(t *testing.T) {
	base := typicalDesign()
	base.Criteria.LimitBodies = []string{"NIOSH"}
	base.Glass.Custom = &hazards.Glass{ID: "custom"}
	baseFP := (&Revision{Design: base}).Fingerprint()
	count := 0
	var walk func(path string, get func(d *hazards.Design) reflect.Value)
	walk = func(path string, get func(d *hazards.Design) reflect.Value) {
		probe := base
		probe.Vessel.Parts = append([]hazards.Part(nil), base.Vessel.Parts...)
		glass := *base.Glass.Custom
		probe.Glass.Custom = &glass
		probe.Criteria.LimitBodies = append([]string(nil), base.Criteria.LimitBodies...)
		v := get(&probe)
		switch v.Kind() {
		case reflect.Struct:
			for _, f := range jsonfields.Of(v.Type()) {
				walk(joinPath(path, f.Name), func(d *hazards.Design) reflect.Value { return get(d).FieldByIndex(f.Index) })
			}
			return
		case reflect.Pointer:
			walk(path, func(d *hazards.Design) reflect.Value { return get(d).Elem() })
			return
		case reflect.Slice:
			if v.Type().Elem().Kind() == reflect.Struct {
				for i := 0; i < v.Len(); i++ {
					walk(path+"["+strconv.Itoa(i)+"]", func(d *hazards.Design) reflect.Value { return get(d).Index(i) })
				}
				return
			} else {
				v.Set(reflect.Append(v, reflect.ValueOf("OSHA")))
			}
		case reflect.Float64:
			v.SetFloat(v.Float()*1.0000001 + 1e-300)
		case reflect.String:
			v.SetString(v.String() + "x")
		default:
			t.Fatalf("%s: kind %s not covered by this test", path, v.Kind())
		}
		count++
		if (&Revision{Design: probe}).Fingerprint() == baseFP {
			t.Errorf("changing %s does not change the fingerprint", path)
		}
	}
	walk("", func(d *hazards.Design) reflect.Value { return reflect.ValueOf(d).Elem() })
	if count < 40 {
		t.Errorf("only %d inputs perturbed; the walk missed part of the design", count)
	}
}

// The canonical form, spelled out for a small value.
func TestCanonicalJSON(t *testing.T) {
	type inner struct {
		B float64 `json:"b"`
		A string  `json:"a"`
	}
	type sample struct {
		Zed    []string `json:"zed"`
		Alpha  float64  `json:"alpha"`
		Inner  inner    `json:"inner"`
		Ptr    *inner   `json:"ptr,omitempty"`
		Hidden string   `json:"-"`
		Big    float64  `json:"big"`
		Tiny   float64  `json:"tiny"`
		Text   string   `json:"text"`
	}
	got := canonicalJSON(sample{
		Alpha: math.Copysign(0, -1), Inner: inner{B: 0.1, A: "q\"\\\n<é>"},
		Big: 1e21, Tiny: 1e-12, Text: "bad\xffbyte", Hidden: "not written",
	})
	want := `{"alpha":0,"big":1e+21,"inner":{"a":"q\"\\\u000a<é>","b":0.1},"ptr":null,"text":"bad` + "\uFFFD" + `byte","tiny":1e-12,"zed":[]}`
	if got != want {
		t.Errorf("canonical JSON\n got %s\nwant %s", got, want)
	}
	if got := canonicalJSON(struct {
		X []float64 `json:"x"`
	}{[]float64{math.NaN(), math.Inf(1), math.Inf(-1), 349.15, 101325}}); got != `{"x":["NaN","+Inf","-Inf",349.15,101325]}` {
		t.Errorf("canonical numbers: %s", got)
	}
}

func TestFingerprintsOfFixtureDiffer(t *testing.T) {
	f, err := Load(fixtureCurrent)
	if err != nil {
		t.Fatal(err)
	}
	if f.Revisions[0].Fingerprint() == f.Revisions[1].Fingerprint() {
		t.Error("revisions A and B have different designs but the same fingerprint")
	}
}

// TestCanonicalStrings checks the text rule of the fingerprint's doc
// comment case by case: only ", \ and control characters escaped, each
// invalid byte replaced by U+FFFD, everything else as it stands.
func TestCanonicalStrings(t *testing.T) {
	for _, c := range []struct{ in, want string }{
		{"", `""`},
		{"plain text", `"plain text"`},
		{`a"b\c`, `"a\"b\\c"`},
		{"\x00\x1f\x7f", `"\u0000\u001f` + "\x7f" + `"`},
		{"tab\tnewline\n", `"tab\u0009newline\u000a"`},
		{"é ≤ 🙂", `"é ≤ 🙂"`},
		{"\uFFFD as it stands", `"` + "\uFFFD" + ` as it stands"`},
		{"\xff", `"` + "\uFFFD" + `"`},
		{"a\xc3", `"a` + "\uFFFD" + `"`},                   // a cut two-byte sequence
		{"\xe2\x82x", `"` + "\uFFFD\uFFFD" + `x"`},         // each bad byte on its own
		{"\xed\xa0\x80", `"` + "\uFFFD\uFFFD\uFFFD" + `"`}, // a surrogate's encoding
		{"<&>", `"<&>"`},
	} {
		var b bytes.Buffer
		writeString(&b, c.in)
		if b.String() != c.want {
			t.Errorf("%q: got %s, want %s", c.in, b.String(), c.want)
		}
	}
}
