package designfile

import (
	"crypto/rand"
	"encoding/hex"
	"errors"
	"fmt"
	"io"
	"io/fs"
	"os"
	"path/filepath"
	"runtime"
	"strings"
)

// tempSuffix ends the name of every temporary file this package writes:
// "." + base + "." + 16 hex digits + tempSuffix, beside the target.
const tempSuffix = ".tmp"

// WriteFile writes the bytes produced by write to path without ever
// leaving a partly written file in its place: it writes a temporary file
// in the same folder, flushes it to disk (fsync), closes it, renames it
// over path and flushes the folder. An existing path keeps its
// permissions; a new one is created with perm less the process's umask
// (pass 0o666 for the usual mode of a document). Before writing it removes
// temporaries of its own naming for the same path that no live writer
// holds (left by a writer that was killed). A path that exists and is not
// a regular file (a folder, a named pipe, a device) is refused before
// anything is opened. On failure the temporary file is removed and path
// is left as it was.
func WriteFile(path string, perm fs.FileMode, write func(io.Writer) error) error {
	return writeAtomic(path, perm, false, write)
}

// writeAtomic is WriteFile, keeping the file it replaces as
// path+BackupSuffix when backup is set.
func writeAtomic(path string, perm fs.FileMode, backup bool, write func(io.Writer) error) error {
	old, statErr := os.Stat(path)
	switch {
	case statErr == nil && !old.Mode().IsRegular():
		return &FileError{File: path, Problem: "is " + describeMode(old.Mode()) + ", not a regular file; nothing was written"}
	case statErr != nil && !errors.Is(statErr, fs.ErrNotExist):
		return pathError(path, "cannot be written", statErr)
	}
	dir, base := filepath.Split(path)
	if dir == "" {
		dir = "."
	}
	if info, err := os.Stat(dir); err != nil {
		return &FileError{File: path, Problem: fmt.Sprintf("cannot be written: the folder %s does not exist", dir), Err: err}
	} else if !info.IsDir() {
		return &FileError{File: path, Problem: fmt.Sprintf("cannot be written: %s is not a folder", dir)}
	}
	CleanTemporaries(path)
	tmp, tmpName, unlock, err := createTemp(dir, base, perm)
	if err != nil {
		return pathError(path, "cannot be written", err)
	}
	renamed := false
	defer func() {
		if !renamed {
			tmp.Close()
			os.Remove(tmpName)
		}
	}()
	if err := write(tmp); err != nil {
		return err
	}
	if statErr == nil && runtime.GOOS != "windows" {
		if err := tmp.Chmod(old.Mode().Perm()); err != nil {
			return pathError(path, "cannot be written", err)
		}
	}
	if err := tmp.Sync(); err != nil {
		return pathError(path, "cannot be written", err)
	}
	if statErr == nil && backup {
		if err := keepBackup(path, tmpName); err != nil {
			return fmt.Errorf("not saved to %s: keeping the previous version: %w", path, err)
		}
	}
	if err := os.Rename(tmpName, path); err != nil {
		return pathError(path, "cannot be written", err)
	}
	renamed = true
	unlock()
	tmp.Close()
	if err := syncDir(dir); err != nil {
		// The new file is in place; only its durability across a power
		// cut is in doubt. Report it without undoing the write.
		return fmt.Errorf("written to %s, but flushing the folder failed: %w", path, err)
	}
	return nil
}

// createTemp creates and locks a new temporary file for base in dir with
// perm (less the umask), named so that CleanTemporaries recognises it.
func createTemp(dir, base string, perm fs.FileMode) (*os.File, string, func(), error) {
	for range 100 {
		var b [8]byte
		if _, err := rand.Read(b[:]); err != nil {
			return nil, "", nil, err
		}
		name := filepath.Join(dir, "."+base+"."+hex.EncodeToString(b[:])+tempSuffix)
		f, err := os.OpenFile(name, os.O_RDWR|os.O_CREATE|os.O_EXCL, perm)
		if errors.Is(err, fs.ErrExist) {
			continue
		}
		if err != nil {
			return nil, "", nil, err
		}
		unlock, kept := lockFile(f, name)
		if !kept {
			// Another writer's cleaning removed it before the lock was
			// taken; make another.
			f.Close()
			continue
		}
		return f, name, unlock, nil
	}
	return nil, "", nil, errors.New("no free temporary file name")
}

// CleanTemporaries removes the temporary files that WriteFile and Save
// leave beside path when they are killed part way (".<name>.<digits>.tmp"
// and the staged backup ".<name>.<digits>.tmp.bak"). A temporary that a
// live writer still holds is left alone. It reports how many it removed;
// errors are ignored, since a leftover temporary does no harm.
func CleanTemporaries(path string) int {
	dir, base := filepath.Split(path)
	if dir == "" {
		dir = "."
	}
	entries, err := os.ReadDir(dir)
	if err != nil {
		return 0
	}
	removed := 0
	prefix := "." + base + "."
	for _, e := range entries {
		name := e.Name()
		if !strings.HasPrefix(name, prefix) || !e.Type().IsRegular() {
			continue
		}
		middle := strings.TrimPrefix(name, prefix)
		owner := name
		if strings.HasSuffix(middle, tempSuffix+BackupSuffix) {
			middle = strings.TrimSuffix(middle, tempSuffix+BackupSuffix)
			owner = strings.TrimSuffix(name, BackupSuffix)
		} else if strings.HasSuffix(middle, tempSuffix) {
			middle = strings.TrimSuffix(middle, tempSuffix)
		} else {
			continue
		}
		if !isDigits(middle) {
			continue
		}
		if owner != name {
			// A staged backup: left over when its writer's temporary is
			// gone or no longer held.
			if inUse(filepath.Join(dir, owner)) {
				continue
			}
			if os.Remove(filepath.Join(dir, name)) == nil {
				removed++
			}
			continue
		}
		if removeIfUnheld(filepath.Join(dir, name)) {
			removed++
		}
	}
	return removed
}

// isDigits reports whether s is a non-empty run of decimal or hex digits,
// the random part of a temporary's name.
func isDigits(s string) bool {
	if s == "" {
		return false
	}
	for _, c := range s {
		if !(c >= '0' && c <= '9' || c >= 'a' && c <= 'f') {
			return false
		}
	}
	return true
}

// describeMode names a non-regular file type for a message.
func describeMode(m fs.FileMode) string {
	switch {
	case m.IsDir():
		return "a folder"
	case m&fs.ModeNamedPipe != 0:
		return "a named pipe"
	case m&fs.ModeSocket != 0:
		return "a socket"
	case m&fs.ModeDevice != 0:
		return "a device"
	case m&fs.ModeSymlink != 0:
		return "a symbolic link"
	}
	return "not an ordinary file"
}
