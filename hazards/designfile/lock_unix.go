//go:build unix

package designfile

import (
	"os"
	"syscall"
)

// lockFile takes an exclusive advisory lock on a temporary file while it
// is written, so that CleanTemporaries can tell a live writer's file from
// one left by a writer that was killed (the lock ends with the process).
// It returns the function that releases the lock.
func lockFile(f *os.File) func() {
	if syscall.Flock(int(f.Fd()), syscall.LOCK_EX|syscall.LOCK_NB) != nil {
		return func() {}
	}
	return func() { syscall.Flock(int(f.Fd()), syscall.LOCK_UN) }
}

// inUse reports whether a live writer holds the temporary file at path.
func inUse(path string) bool {
	f, err := os.Open(path)
	if err != nil {
		return false // gone: its staged backup, if any, is left over
	}
	defer f.Close()
	if err := syscall.Flock(int(f.Fd()), syscall.LOCK_EX|syscall.LOCK_NB); err != nil {
		return true
	}
	syscall.Flock(int(f.Fd()), syscall.LOCK_UN)
	return false
}
