// Package buildinfo holds the program's name and version, printed on every
// record and in the About box, and the source revision the running binary
// was built from, so that a record says which build made it. The version
// matches FyneApp.toml.
package buildinfo

import (
	"runtime/debug"
	"sync"
)

// Name is the program's name.
const Name = "Ullage"

// Version is the program's version.
const Version = "0.1.0"

// revisionDigits is how many hex digits of the revision are shown: twelve
// name one commit of this repository without ambiguity and fit a table
// cell of the record.
const revisionDigits = 12

// Source says where a binary came from: the revision of the source tree
// and whether that tree had changes not yet committed. Known is false when
// the build carries no revision: "go run" and "go test", a build with
// -buildvcs=false, or a build outside a git clone.
type Source struct {
	Revision string // full commit hash (vcs.revision)
	Modified bool   // the tree had uncommitted changes (vcs.modified)
	Known    bool
}

// Short returns the first twelve hex digits of the revision.
func (s Source) Short() string {
	if len(s.Revision) > revisionDigits {
		return s.Revision[:revisionDigits]
	}
	return s.Revision
}

var readOnce = sync.OnceValue(func() Source {
	bi, ok := debug.ReadBuildInfo()
	if !ok {
		return Source{}
	}
	return sourceOf(bi.Settings)
})

// Current returns the source of the running binary, read once from the
// Go build information (runtime/debug.ReadBuildInfo).
func Current() Source { return readOnce() }

// sourceOf reads vcs.revision and vcs.modified from build settings.
func sourceOf(settings []debug.BuildSetting) Source {
	var s Source
	for _, kv := range settings {
		switch kv.Key {
		case "vcs.revision":
			s.Revision = kv.Value
			s.Known = kv.Value != ""
		case "vcs.modified":
			s.Modified = kv.Value == "true"
		}
	}
	if !s.Known {
		s.Modified = false
	}
	return s
}

// Describe returns the version with the source revision, as printed by
// "ullage version", in the About box and on every record:
// "0.1.0, revision 1a2b3c4d5e6f", "0.1.0, revision 1a2b3c4d5e6f with
// uncommitted changes" or "0.1.0, revision not recorded".
func Describe() string { return describe(Version, Current()) }

func describe(version string, s Source) string {
	switch {
	case !s.Known:
		return version + ", revision not recorded"
	case s.Modified:
		return version + ", revision " + s.Short() + " with uncommitted changes"
	default:
		return version + ", revision " + s.Short()
	}
}
