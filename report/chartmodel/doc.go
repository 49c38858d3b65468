// Package chartmodel describes every chart of the program once — series,
// axes (linear or logarithmic), labelled limit lines with distinct dash
// patterns, markers and bars — built from the engine's results, and draws
// such a description with gonum/plot on any vg.Canvas: an image for the
// window, the report's own page canvas for the vector charts of the PDF.
//
// The curves are sampled here and only here, the tick maker and the label
// placer exist once, and charts of the same kind always use the same axis
// rules (pressure is always on a logarithmic axis), so that two records
// compare side by side. Values are in display units; the caller supplies
// the conversions and the formatting of numbers in labels.
package chartmodel
