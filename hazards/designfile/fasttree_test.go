package designfile

import (
	"os"
	"path/filepath"
	"reflect"
	"testing"
)

// sameTree checks that whenever the fast parser takes data, it builds
// exactly the tree the standard library's tokenizer builds, offsets
// included, and that it never takes what the tokenizer refuses.
func sameTree(t *testing.T, name string, data []byte) {
	t.Helper()
	fast, ok := parseFast(data)
	strict, err := parseTreeStrictly(data)
	if !ok {
		return
	}
	if err != nil {
		t.Fatalf("%s: the fast parser took what the tokenizer refuses (%v)", name, err)
	}
	if !reflect.DeepEqual(fast, strict) {
		t.Fatalf("%s: the fast parser's tree differs from the tokenizer's", name)
	}
}

func TestFastTreeMatchesTheTokenizer(t *testing.T) {
	var files []string
	for _, pattern := range []string{"testdata/*.json", "../../testdata/bad-inputs/*/*.json", "../../testdata/bad-inputs/*.json", "../../assets/examples/*.json"} {
		m, err := filepath.Glob(pattern)
		if err != nil {
			t.Fatal(err)
		}
		files = append(files, m...)
	}
	if len(files) < 100 {
		t.Fatalf("only %d files to compare", len(files))
	}
	took := 0
	for _, f := range files {
		data, err := os.ReadFile(f)
		if err != nil {
			t.Fatal(err)
		}
		sameTree(t, f, data)
		if _, ok := parseFast(data); ok {
			took++
		}
	}
	if took < 10 {
		t.Errorf("the fast parser took only %d of %d files", took, len(files))
	}
	tests := []struct {
		in   string
		fast bool
	}{
		{`{"a": 1, "b": [true, false, null, -0.5e+3, "x"], "c": {}}`, true},
		{` [ ] `, true},
		{`{"a": "caf\u00e9"}`, false}, // an escape: the tokenizer reads it
		{`{"a": "caf` + "\xc3\xa9" + `"}`, true},
		{`{"a": "` + "\xff" + `"}`, false}, // not UTF-8: the tokenizer replaces it
		{`{"a": 1, "a": 2}`, false},
		{`{"a": 01}`, false},
		{`{"a": 1.}`, false},
		{`{"a": -}`, false},
		{`{"a": 1e}`, false},
		{`{"a": tru}`, false},
		{`{"a": 1,}`, false},
		{`[1 2]`, false},
		{`{"a": 1} x`, false},
		{`{"a": 1}{}`, false},
		{"{\"a\":\t1\r\n}", true},
		{`"` + "\x01" + `"`, false},
		{`1x`, false},
	}
	for _, tt := range tests {
		if _, ok := parseFast([]byte(tt.in)); ok != tt.fast {
			t.Errorf("parseFast(%q) took it: %v, want %v", tt.in, ok, tt.fast)
		}
		sameTree(t, tt.in, []byte(tt.in))
	}
}

// FuzzFastTree: on any bytes the fast parser either gives up or builds
// the tokenizer's own tree.
func FuzzFastTree(f *testing.F) {
	for _, s := range []string{`{"a": [1, -2.5e3, "x", true, null, {}]}`, `[`, `{"a":1,"a":2}`, `"\u00e9"`, "0", "-0.0E-0"} {
		f.Add([]byte(s))
	}
	f.Fuzz(func(t *testing.T, data []byte) {
		sameTree(t, "input", data)
	})
}
