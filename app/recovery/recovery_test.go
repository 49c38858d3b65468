package recovery

import (
	"strings"
	"testing"
)

func TestRestoreTheExample(t *testing.T) {
	r, err := Restore(exampleSnapshot(t))
	if err != nil {
		t.Fatal(err)
	}
	if r.Name != "example" || r.Base == "" || r.Saved.IsZero() || len(r.File.Revisions) == 0 {
		t.Errorf("restored %+v", r)
	}
	latest := r.File.Revisions[len(r.File.Revisions)-1]
	work := latest
	work.Design = r.Work
	if work.Fingerprint() != latest.Fingerprint() {
		t.Error("the working copy is not the design it was taken from")
	}
}

func TestRestoreRefusesDamage(t *testing.T) {
	good := string(exampleSnapshot(t))
	tests := []struct {
		name, in, want string
	}{
		{"cut short", good[:len(good)/2], "cannot be read"},
		{"not an object", `[]`, "cannot be read"},
		{"no design file", `{"name": "x"}`, ""},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			_, err := Restore([]byte(tt.in))
			if err == nil || !strings.Contains(err.Error(), tt.want) {
				t.Errorf("Restore: %v; want an error saying %q", err, tt.want)
			}
		})
	}
}

func TestSalvage(t *testing.T) {
	good := string(exampleSnapshot(t))
	// The design file damaged, the working copy intact.
	damaged := strings.Replace(good, `"format"`, `"formt"`, 1)
	if _, err := Restore([]byte(damaged)); err == nil {
		t.Fatal("a snapshot with a damaged design file restored whole")
	}
	work, _, ok := Salvage([]byte(damaged))
	if !ok || work.Validate() != nil {
		t.Errorf("the intact working copy was not salvaged: ok %v", ok)
	}
	for _, bad := range []string{good[:len(good)/2], `{"work": {}}`, ``} {
		if _, _, ok := Salvage([]byte(bad)); ok {
			t.Errorf("salvaged something from %.40q", bad)
		}
	}
}
