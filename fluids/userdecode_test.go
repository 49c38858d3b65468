package fluids

import (
	"bytes"
	"errors"
	"os"
	"strings"
	"testing"
)

// TestUserFluidText: duplicate keys are refused with the key path and
// both lines and never blamed on another field; a UTF-8 byte-order mark
// is accepted; UTF-16 is named.
func TestUserFluidText(t *testing.T) {
	good, err := os.ReadFile("testdata/user/good_single.json")
	if err != nil {
		t.Fatal(err)
	}
	if _, err := LoadUserFluids(bytes.NewReader(append([]byte("\xef\xbb\xbf"), good...))); err != nil {
		t.Errorf("a byte-order mark is refused: %v", err)
	}
	// The duplicate comes after a valid value: the last would win.
	dup := strings.Replace(string(good), `"value": 508.1,`, `"value": 508.1,`+"\n  \"value\": 9999,", 1)
	_, err = LoadUserFluids(strings.NewReader(dup))
	if err == nil || !strings.Contains(err.Error(), "critical_temperature_k.value appears twice") || !strings.Contains(err.Error(), "line 14") || !errors.Is(err, ErrInvalidFluid) {
		t.Errorf("duplicate key: %v", err)
	}
	utf16 := []byte{0xff, 0xfe}
	for _, c := range string(good[:40]) {
		utf16 = append(utf16, byte(c), 0)
	}
	if _, err := LoadUserFluids(bytes.NewReader(utf16)); err == nil || !strings.Contains(err.Error(), "UTF-16") {
		t.Errorf("UTF-16: %v", err)
	}
}

// TestExtendRefusesClash: a user fluid may not take the id or the name of
// a fluid already in the library.
func TestExtendRefusesClash(t *testing.T) {
	lib, err := Builtin()
	if err != nil {
		t.Fatal(err)
	}
	good, err := os.ReadFile("testdata/user/good_single.json")
	if err != nil {
		t.Fatal(err)
	}
	for _, tc := range []struct{ from, to string }{
		{`"id": "acetone-supplier-sheet"`, `"id": "ethanol"`},
		{`"name": "Acetone (supplier data sheet)"`, `"name": "ETHANOL"`},
	} {
		subs, err := LoadUserFluids(strings.NewReader(strings.Replace(string(good), tc.from, tc.to, 1)))
		if err != nil {
			t.Fatalf("%s: %v", tc.to, err)
		}
		if _, err := lib.Extend(subs...); !errors.Is(err, ErrNameClash) {
			t.Errorf("%s: %v, want a name clash", tc.to, err)
		}
	}
	subs, err := LoadUserFluids(bytes.NewReader(good))
	if err != nil {
		t.Fatal(err)
	}
	ext, err := lib.Extend(subs...)
	if err != nil || len(ext.All()) != len(lib.All())+1 {
		t.Errorf("a fluid of its own: %v", err)
	}
}
