package designfile

import (
	"errors"
	"fmt"
	"io"
	"io/fs"
	"os"
	"path/filepath"
	"runtime"
)

// BackupSuffix is appended to a file's path to name the copy of its
// previous version that Save keeps.
const BackupSuffix = ".bak"

// Load reads and decodes the design file at path (see Decode). A missing
// file, a folder or a file over MaxFileBytes is refused with a
// *FileError naming the path; every error wraps ErrInvalidFile, and also
// fs.ErrNotExist for a missing file and ErrTooLarge for an oversized one.
func Load(path string) (*File, error) {
	info, err := os.Stat(path)
	if err != nil {
		return nil, pathError(path, "cannot be opened", err)
	}
	if info.IsDir() {
		return nil, &FileError{File: path, Problem: "is a folder, not a design file"}
	}
	if info.Size() > MaxFileBytes {
		return nil, tooLarge(path)
	}
	fh, err := os.Open(path)
	if err != nil {
		return nil, pathError(path, "cannot be opened", err)
	}
	defer fh.Close()
	return Decode(fh, path)
}

// pathError reports an operating-system error on a path without
// repeating the path.
func pathError(path, what string, err error) *FileError {
	detail := err.Error()
	var pe *fs.PathError
	if errors.As(err, &pe) {
		detail = pe.Err.Error()
	}
	return &FileError{File: path, Problem: what + ": " + detail, Err: err}
}

// Save writes f to path as a FormatCurrent file without ever leaving a
// partly written file in its place. It refuses a File that fails
// Validate. Steps: encode into a temporary file in the same folder, flush
// it to disk (fsync) and close it; keep the existing file, if any, as
// "<path>.bak" (a hard link, or a copy where links are not supported,
// replacing any older .bak); rename the temporary file over path; fsync
// the folder. On any failure the temporary file is removed and the file
// at path is left as it was. A new file gets permissions 0644; an
// existing file keeps its own.
//
// Save does not read the file it replaces. Callers must not Save over a
// file they failed to Load: doing so would replace content the user may
// still want to repair by hand (the .bak would hold it, but only until
// the next Save).
func Save(path string, f *File) error {
	return save(path, f, nil)
}

// save is Save with a hook that wraps the writer of the temporary file,
// so that tests can make the write fail half way.
func save(path string, f *File, wrap func(io.Writer) io.Writer) error {
	if ferr := f.validate(); ferr != nil {
		return fmt.Errorf("not saved to %s: %w", path, ferr)
	}
	mode := fs.FileMode(0o644)
	old, statErr := os.Stat(path)
	switch {
	case statErr == nil && !old.Mode().IsRegular():
		return &FileError{File: path, Problem: "is not a regular file; not saved"}
	case statErr == nil:
		mode = old.Mode().Perm()
	case !errors.Is(statErr, fs.ErrNotExist):
		return pathError(path, "cannot be saved", statErr)
	}
	dir, base := filepath.Split(path)
	if dir == "" {
		dir = "."
	}
	tmp, err := os.CreateTemp(dir, "."+base+".*.tmp")
	if err != nil {
		return pathError(path, "cannot be saved", err)
	}
	renamed := false
	defer func() {
		if !renamed {
			tmp.Close()
			os.Remove(tmp.Name())
		}
	}()
	var w io.Writer = tmp
	if wrap != nil {
		w = wrap(tmp)
	}
	if err = Encode(w, f); err != nil {
		return fmt.Errorf("not saved to %s: %w", path, err)
	}
	if err := tmp.Chmod(mode); err != nil && runtime.GOOS != "windows" {
		return fmt.Errorf("not saved to %s: %w", path, err)
	}
	if err = tmp.Sync(); err != nil {
		return fmt.Errorf("not saved to %s: %w", path, err)
	}
	if err = tmp.Close(); err != nil {
		return fmt.Errorf("not saved to %s: %w", path, err)
	}
	if statErr == nil {
		if err = keepBackup(path, tmp.Name()); err != nil {
			return fmt.Errorf("not saved to %s: keeping the previous version: %w", path, err)
		}
	}
	if err = os.Rename(tmp.Name(), path); err != nil {
		return fmt.Errorf("not saved to %s: %w", path, err)
	}
	renamed = true
	if err := syncDir(dir); err != nil {
		// The new file is in place; only its durability across a power
		// cut is in doubt. Report it without undoing the save.
		return fmt.Errorf("saved to %s, but flushing the folder failed: %w", path, err)
	}
	return nil
}

// keepBackup makes path+BackupSuffix hold the current content of path,
// replacing an older backup in one rename. tmpBase names a free
// temporary name to build it under.
func keepBackup(path, tmpBase string) error {
	staged := tmpBase + BackupSuffix
	if err := os.Link(path, staged); err != nil {
		if err := copyFile(path, staged); err != nil {
			os.Remove(staged)
			return err
		}
	}
	if err := os.Rename(staged, path+BackupSuffix); err != nil {
		os.Remove(staged)
		return err
	}
	return nil
}

// copyFile copies src to a new file dst and flushes it to disk.
func copyFile(src, dst string) error {
	in, err := os.Open(src)
	if err != nil {
		return err
	}
	defer in.Close()
	out, err := os.OpenFile(dst, os.O_WRONLY|os.O_CREATE|os.O_EXCL, 0o644)
	if err != nil {
		return err
	}
	if _, err := io.Copy(out, in); err != nil {
		out.Close()
		return err
	}
	if err := out.Sync(); err != nil {
		out.Close()
		return err
	}
	return out.Close()
}

// syncDir flushes a folder's entries to disk so that a rename survives a
// power cut. Windows cannot flush a folder handle; there it does nothing.
func syncDir(dir string) error {
	if runtime.GOOS == "windows" {
		return nil
	}
	d, err := os.Open(dir)
	if err != nil {
		return err
	}
	if err := d.Sync(); err != nil {
		d.Close()
		return err
	}
	return d.Close()
}
