// Package display turns the engine's typed results into the words and
// numbers a person reads, once, for SI or US customary units. The window,
// the PDF records and the command line's text all render from it, so a
// value, a limit or a margin reads the same wherever it appears.
//
// It holds the one rule for significant figures ([Number]), the one for
// scientific notation (× 10ⁿ with superscript digits), the one set of
// words for states ([ReasonWords], [StatusWord]) and the one wording of a
// margin ([Margin]). It imports only the engine (fluids, hazards).
package display
