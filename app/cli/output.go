package cli

import (
	"bytes"
	"errors"
	"fmt"
	"io"
	"io/fs"
	"os"
	"path/filepath"

	"ullage/hazards/designfile"
	"ullage/report"
)

// replaceFlag is the flag that allows an output to replace an existing
// file that is not a record written by Ullage.
const replaceFlag = "replace"

// maxRecognisedBytes is the largest existing file read to recognise one
// of our own records; a bigger file is not one.
const maxRecognisedBytes = 64 << 20

// checkOutput refuses an output path before anything is computed or
// written: an empty path, a folder, anything that is not a regular file,
// a missing folder, the same file as any input (by identity, so that a
// link or "./d.json" is caught), and an existing file that is not a PDF
// record written by this program unless replace is set. flag names the
// flag for the message ("--pdf"); the message quotes the path as typed.
func checkOutput(flag, path string, inputs []string, replace bool) error {
	if path == "" {
		return fmt.Errorf("%s needs a file name (an empty one was given)", flag)
	}
	dir := filepath.Dir(path)
	if info, err := os.Stat(dir); err != nil {
		return fmt.Errorf("%s %s: the folder %s does not exist", flag, path, dir)
	} else if !info.IsDir() {
		return fmt.Errorf("%s %s: %s is not a folder", flag, path, dir)
	}
	out, err := os.Stat(path)
	if errors.Is(err, fs.ErrNotExist) {
		return nil
	}
	if err != nil {
		return fmt.Errorf("%s %s: %v", flag, path, plainError(err))
	}
	switch {
	case out.IsDir():
		return fmt.Errorf("%s %s: is a folder; give the name of the PDF file to write, such as %s", flag, path, filepath.Join(path, "record.pdf"))
	case !out.Mode().IsRegular():
		return fmt.Errorf("%s %s: is not an ordinary file (a named pipe, device or socket); nothing was written", flag, path)
	}
	for _, in := range inputs {
		if in == "" {
			continue
		}
		if st, err := os.Stat(in); err == nil && os.SameFile(st, out) {
			return fmt.Errorf("%s %s: is the same file as the input %s; writing the record would destroy it. Give another name", flag, path, in)
		}
	}
	if replace {
		return nil
	}
	if !isOwnRecord(path, out) {
		return fmt.Errorf("%s %s: the file exists and is not a PDF record written by Ullage, so it was not replaced; give another name, or add --%s to replace it", flag, path, replaceFlag)
	}
	return nil
}

// isOwnRecord reports whether the regular file at path is a record this
// program wrote.
func isOwnRecord(path string, info fs.FileInfo) bool {
	if info.Size() > maxRecognisedBytes {
		return false
	}
	data, err := os.ReadFile(path)
	return err == nil && report.IsRecord(data)
}

// writeOutput writes data to path atomically with the design file's
// writer: a new file gets mode 0666 less the umask, an existing one keeps
// its mode. Errors name the flag and the path as typed, never the
// temporary file.
func writeOutput(flag, path string, data []byte) error {
	err := designfile.WriteFile(path, 0o666, func(w io.Writer) error {
		_, err := io.Copy(w, bytes.NewReader(data))
		return err
	})
	if err != nil {
		var fe *designfile.FileError
		if errors.As(err, &fe) {
			return fmt.Errorf("%s %s: %s", flag, path, fe.Problem)
		}
		return fmt.Errorf("%s %s: not written: %v", flag, path, plainError(err))
	}
	return nil
}

// plainError drops the operation and path from an operating-system error,
// which may name a temporary file the user never typed.
func plainError(err error) error {
	var pe *fs.PathError
	if errors.As(err, &pe) {
		return pe.Err
	}
	var le *os.LinkError
	if errors.As(err, &le) {
		return le.Err
	}
	return err
}
