// Package report writes the PDF records that go into a product's technical
// file: the assessment of one revision of a sealed glass device
// (WriteAssessment) and the side-by-side comparison of two revisions
// (WriteComparison). Each record carries its inputs, results, findings,
// the sources of every number, the standard cautions and a sign-off block,
// in SI or US customary units on A4 or Letter paper.
//
// The engine works in SI; this package converts only for display. Charts
// are drawn as vector graphics, and the fonts (the Go fonts) are embedded,
// so a record prints and reads the same everywhere.
package report
