// Package gui is Ullage's desktop program: the review window in which a
// product-safety reviewer fills in a sealed glass device's design, watches
// the findings and charts follow every keystroke, opens the working behind
// any finding or key number, runs a tolerance study of unit-to-unit
// variation, keeps revisions, compares two of them side by side and
// exports the PDF records.
//
// Every panel is a small constructor over the plain state of a session
// (the open design file, its working copy and the last results). The
// assessment and the tolerance study run off the UI goroutine and come
// back through fyne.Do.
package gui
