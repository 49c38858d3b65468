package designfile

import (
	"errors"
	"fmt"
	"io"
	"io/fs"
	"os"
	"runtime"
)

// BackupSuffix is appended to a file's path to name the copy of its
// previous version that Save keeps.
const BackupSuffix = ".bak"

// Load reads and decodes the design file at path (see Decode). A missing
// file, a folder, anything that is not a regular file (a named pipe, a
// device: checked before opening, so Load never blocks) or a file over
// MaxFileBytes is refused with a
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
	if !info.Mode().IsRegular() {
		// Opening a named pipe would wait for a writer for ever.
		return nil, &FileError{File: path, Problem: "is " + describeMode(info.Mode()) + ", not a design file; give an ordinary file"}
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
// the folder (see WriteFile, which Save shares). On any failure the
// temporary file is removed and the file at path is left as it was. A new
// file gets permissions 0666 less the umask (0644 under the usual umask);
// an existing file keeps its own. Temporaries left by a killed save of the
// same path are removed first.
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
	err := writeAtomic(path, 0o666, true, func(w io.Writer) error {
		if wrap != nil {
			w = wrap(w)
		}
		if err := Encode(w, f); err != nil {
			return fmt.Errorf("not saved to %s: %w", path, err)
		}
		return nil
	})
	return err
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
	// When path+BackupSuffix already was a hard link to path (another
	// writer made it a moment ago), rename does nothing and leaves staged
	// in place; the backup already holds path's content, so staged goes.
	if _, err := os.Lstat(staged); err == nil {
		os.Remove(staged)
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
