// Package gui is Ullage's desktop program: the review window in which a
// product-safety reviewer fills in a sealed glass device's design, watches
// the findings and charts follow every keystroke, opens the working behind
// any finding or key number, runs a tolerance study of unit-to-unit
// variation, keeps revisions, compares two of them side by side and
// exports the PDF records.
//
// Every panel is a small constructor over the plain state of a session
// (the open design file, its working copy and the last results). Panels
// talk through the document, not through each other's widgets: the form
// writes each edit into the document, and the document tells every
// subscribed panel what changed and why (a file opened, a keystroke in a
// field, a choice, a revision kept; the session adds new results and a
// change of units), each panel then showing it. A panel sets its widgets
// from the document with their change callbacks detached, so showing a
// design never counts as an edit of it. The assessment and the tolerance
// study run off the UI goroutine and come back through fyne.Do.
package gui
