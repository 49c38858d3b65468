package buildinfo

import (
	"runtime/debug"
	"testing"
)

func TestDescribe(t *testing.T) {
	const rev = "98f62fb0c8e1d2a3b4c5d6e7f8091a2b3c4d5e6f"
	tests := []struct {
		name     string
		settings []debug.BuildSetting
		want     string
	}{
		{"clean clone", []debug.BuildSetting{{Key: "vcs", Value: "git"}, {Key: "vcs.revision", Value: rev}, {Key: "vcs.modified", Value: "false"}},
			"0.1.0, revision 98f62fb0c8e1"},
		{"uncommitted changes", []debug.BuildSetting{{Key: "vcs.revision", Value: rev}, {Key: "vcs.modified", Value: "true"}},
			"0.1.0, revision 98f62fb0c8e1 with uncommitted changes"},
		{"no revision (go run, -buildvcs=false)", []debug.BuildSetting{{Key: "GOOS", Value: "linux"}},
			"0.1.0, revision not recorded"},
		{"modified without a revision says nothing about changes", []debug.BuildSetting{{Key: "vcs.modified", Value: "true"}},
			"0.1.0, revision not recorded"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			s := sourceOf(tt.settings)
			if got := describe("0.1.0", s); got != tt.want {
				t.Errorf("describe(%v) = %q, want %q", tt.settings, got, tt.want)
			}
			if s.Known && s.Revision != rev {
				t.Errorf("revision %q, want the full hash %q", s.Revision, rev)
			}
		})
	}
}

func TestCurrentIsStable(t *testing.T) {
	// A test binary carries no revision ("go test" does not stamp one),
	// but whatever it carries must read the same every time.
	if a, b := Current(), Current(); a != b {
		t.Errorf("Current() changed between calls: %+v then %+v", a, b)
	}
}
