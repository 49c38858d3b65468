package assets

import (
	"bytes"
	"image/png"
	"testing"

	"ullage/fluids"
	"ullage/hazards"
	"ullage/hazards/designfile"
)

// TestExampleShowsAFailAndAPass: the bundled example must let a newcomer
// see every screen do real work: revision A fails (it goes liquid-full in
// a hot car) and revision B passes.
func TestExampleShowsAFailAndAPass(t *testing.T) {
	f, err := designfile.Decode(bytes.NewReader(Example()), ExampleName)
	if err != nil {
		t.Fatal(err)
	}
	lib, err := fluids.Builtin()
	if err != nil {
		t.Fatal(err)
	}
	want := map[string]hazards.Status{"A": hazards.StatusFail, "B": hazards.StatusPass}
	if len(f.Revisions) != len(want) {
		t.Fatalf("%d revisions, want %d", len(f.Revisions), len(want))
	}
	for _, r := range f.Revisions {
		a, err := hazards.Assess(r.Design, lib)
		if err != nil {
			t.Fatalf("revision %s: %v", r.Label, err)
		}
		if a.Verdict != want[r.Label] {
			t.Errorf("revision %s: verdict %s, want %s", r.Label, a.Verdict, want[r.Label])
		}
		if r.Label == "A" && a.Hot.Phase != hazards.PhaseLiquidFull {
			t.Errorf("revision A is %s at its hottest temperature, want liquid-full", a.Hot.Phase)
		}
	}
}

func TestIcon(t *testing.T) {
	img, err := png.Decode(bytes.NewReader(Icon()))
	if err != nil {
		t.Fatal(err)
	}
	if b := img.Bounds(); b.Dx() < 128 || b.Dx() != b.Dy() {
		t.Errorf("icon is %v, want a square of at least 128 px", b)
	}
}
