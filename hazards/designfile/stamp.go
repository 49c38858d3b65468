package designfile

import (
	"bytes"
	"crypto/sha256"
	"errors"
	"fmt"
	"io"
	"io/fs"
	"os"
)

// Stamp records the content of a design file as it was loaded or saved,
// so that a later save can tell whether someone else (another window,
// another program) changed the file in the meantime. The zero Stamp
// stands for "no file yet".
type Stamp struct {
	sum    [sha256.Size]byte
	exists bool
}

// LoadStamped is Load that also returns the Stamp of the bytes it read.
func LoadStamped(path string) (*File, Stamp, error) {
	f, err := Load(path)
	if err != nil {
		return nil, Stamp{}, err
	}
	st, err := StampOf(path)
	if err != nil {
		return nil, Stamp{}, pathError(path, "cannot be read", err)
	}
	return f, st, nil
}

// StampOf returns the Stamp of the file at path as it is now; the zero
// Stamp when there is no file.
func StampOf(path string) (Stamp, error) {
	info, err := os.Stat(path)
	if errors.Is(err, fs.ErrNotExist) {
		return Stamp{}, nil
	}
	if err != nil {
		return Stamp{}, err
	}
	if !info.Mode().IsRegular() {
		return Stamp{exists: true}, nil
	}
	fh, err := os.Open(path)
	if err != nil {
		return Stamp{}, err
	}
	defer fh.Close()
	h := sha256.New()
	if _, err := io.Copy(h, io.LimitReader(fh, MaxFileBytes+1)); err != nil {
		return Stamp{}, err
	}
	var s Stamp
	copy(s.sum[:], h.Sum(nil))
	s.exists = true
	return s, nil
}

// ChangedSince reports whether the file at path no longer holds what it
// held when since was taken: changed, replaced, removed or created. A file
// that cannot be read counts as changed.
func ChangedSince(path string, since Stamp) bool {
	now, err := StampOf(path)
	if err != nil {
		return true
	}
	return now.exists != since.exists || !bytes.Equal(now.sum[:], since.sum[:])
}

// SaveStamped is Save that returns the Stamp of the file it wrote, for the
// next ChangedSince check.
func SaveStamped(path string, f *File) (Stamp, error) {
	var buf bytes.Buffer
	if err := Encode(&buf, f); err != nil {
		return Stamp{}, fmt.Errorf("not saved to %s: %w", path, err)
	}
	if err := Save(path, f); err != nil {
		return Stamp{}, err
	}
	// The stamp of the bytes written, not of the file read back, which
	// another writer may already have replaced.
	return Stamp{sum: sha256.Sum256(buf.Bytes()), exists: true}, nil
}
