// Package gui is Ullage's desktop program: the review window in which a
// product-safety reviewer fills in a sealed glass device's design, watches
// the findings and charts follow every keystroke, keeps revisions, compares
// two of them side by side and exports the PDF records.
//
// Every panel is a small constructor over the plain state of a session
// (the open design file, its working copy and the last results). The
// assessment runs off the UI goroutine and comes back through fyne.Do.
package gui
