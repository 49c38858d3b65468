//go:build unix

package designfile

import (
	"os"
	"syscall"
)

// lockFile takes an exclusive advisory lock on a new temporary file, held
// while it is written, so that CleanTemporaries can tell a live writer's
// file from one left by a writer that was killed (the lock ends with the
// process). It waits while a cleaner holds the file, and reports false
// when the cleaner removed it meanwhile (the caller then makes another).
// The returned function releases the lock.
func lockFile(f *os.File, name string) (unlock func(), kept bool) {
	if syscall.Flock(int(f.Fd()), syscall.LOCK_EX) != nil {
		return func() {}, true // no locks here: nothing to coordinate
	}
	unlock = func() { syscall.Flock(int(f.Fd()), syscall.LOCK_UN) }
	mine, err1 := f.Stat()
	now, err2 := os.Stat(name)
	if err1 != nil || err2 != nil || !os.SameFile(mine, now) {
		unlock()
		return func() {}, false
	}
	return unlock, true
}

// removeIfUnheld removes the temporary file at path unless a live writer
// holds it, holding the lock itself while it removes it; it reports
// whether it removed the file.
func removeIfUnheld(path string) bool {
	f, err := os.Open(path)
	if err != nil {
		return false
	}
	defer f.Close()
	if err := syscall.Flock(int(f.Fd()), syscall.LOCK_EX|syscall.LOCK_NB); err != nil {
		return false
	}
	defer syscall.Flock(int(f.Fd()), syscall.LOCK_UN)
	return os.Remove(path) == nil
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
