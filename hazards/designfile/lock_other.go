//go:build !unix

package designfile

import (
	"os"
	"time"
)

// staleAfter is how old a temporary file must be before CleanTemporaries
// removes it where files cannot be locked.
const staleAfter = 10 * time.Minute

// lockFile does nothing where advisory locks are not available.
func lockFile(*os.File, string) (func(), bool) { return func() {}, true }

// removeIfUnheld removes the temporary file at path unless it may still
// be in use.
func removeIfUnheld(path string) bool {
	if inUse(path) {
		return false
	}
	return os.Remove(path) == nil
}

// inUse reports whether a temporary file may still be in use: without
// locks, any file younger than staleAfter counts as in use.
func inUse(path string) bool {
	info, err := os.Stat(path)
	if err != nil {
		return false
	}
	return time.Since(info.ModTime()) < staleAfter
}
