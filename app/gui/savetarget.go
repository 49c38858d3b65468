package gui

import (
	"errors"
	"fmt"
	"io/fs"
	"os"
	"path/filepath"
	"strings"

	"ullage/hazards/designfile"
	"ullage/report"
)

// The toolkit's save chooser opens the chosen file for writing (and so
// empties it) before it hands it over, which would destroy an existing
// design file before the atomic writer and its .bak could act. Ullage
// therefore asks only for a folder (with the toolkit's folder chooser,
// which opens nothing) and a name of its own, and checks the path here
// before anything is written.

// targetKind says what is about to be written at a chosen path.
type targetKind int

const (
	// targetDesign is a design file (.json).
	targetDesign targetKind = iota
	// targetRecord is a PDF record.
	targetRecord
)

// ext is the file name ending of the kind.
func (k targetKind) ext() string {
	if k == targetRecord {
		return ".pdf"
	}
	return ".json"
}

// errNotReplaced marks a chosen path that must not be written at all.
var errNotReplaced = errors.New("not written")

// target is a checked place to write: the path, and whether writing
// there replaces a file (so the reviewer is asked first) and, if so,
// whether that file is one of Ullage's own.
type target struct {
	path     string
	replaces bool
	own      bool
}

// resolveTarget joins a folder and a typed name into the path to write,
// adding the kind's ending when the name lacks it, and checks it: the
// folder must exist; the name must be a plain file name; an existing path
// must be an ordinary file, never the same file as any of inputs (by
// identity, so a link is caught), and for a design file one that loads as
// a design file. Errors name the name or path and what is acceptable;
// they wrap errNotReplaced.
func resolveTarget(dir, name string, kind targetKind, inputs []string) (target, error) {
	name = strings.TrimSpace(name)
	if name == "" {
		return target{}, fmt.Errorf("the file name is empty: type a name such as design%s: %w", kind.ext(), errNotReplaced)
	}
	if strings.ContainsAny(name, `/\`) || name == "." || name == ".." {
		return target{}, fmt.Errorf("the file name %q holds a folder: type only the name, and choose the folder above: %w", name, errNotReplaced)
	}
	if !strings.HasSuffix(strings.ToLower(name), kind.ext()) {
		name += kind.ext()
	}
	if dir == "" {
		return target{}, fmt.Errorf("no folder was chosen: choose the folder to write %s in: %w", name, errNotReplaced)
	}
	if info, err := os.Stat(dir); err != nil || !info.IsDir() {
		return target{}, fmt.Errorf("the folder %s does not exist: choose an existing folder: %w", dir, errNotReplaced)
	}
	path := filepath.Join(dir, name)
	out, err := os.Stat(path)
	if errors.Is(err, fs.ErrNotExist) {
		return target{path: path}, nil
	}
	if err != nil {
		return target{}, fmt.Errorf("%s cannot be checked (%v), so nothing was written: %w", path, err, errNotReplaced)
	}
	if out.IsDir() {
		return target{}, fmt.Errorf("%s is a folder: type the name of a file: %w", path, errNotReplaced)
	}
	if !out.Mode().IsRegular() {
		return target{}, fmt.Errorf("%s is not an ordinary file (a named pipe, device or socket), so nothing was written: %w", path, errNotReplaced)
	}
	for _, in := range inputs {
		if in == "" {
			continue
		}
		if st, err := os.Stat(in); err == nil && os.SameFile(st, out) && kind == targetRecord {
			return target{}, fmt.Errorf("%s is the design file this record is made from; writing the record there would destroy it. Give another name: %w", path, errNotReplaced)
		}
	}
	t := target{path: path, replaces: true}
	switch kind {
	case targetDesign:
		if out.Size() > 0 {
			if _, err := designfile.Load(path); err != nil {
				return target{}, fmt.Errorf("%s exists and is not a design file that loads, so it was not replaced: %v: %w", path, err, errNotReplaced)
			}
		}
		t.own = true
	case targetRecord:
		if out.Size() <= maxRecordBytes {
			if data, err := os.ReadFile(path); err == nil && report.IsRecord(data) {
				t.own = true
			}
		}
	}
	return t, nil
}

// maxRecordBytes is the largest existing file read to recognise one of
// Ullage's records; a bigger file is not one.
const maxRecordBytes = 64 << 20
