package chartmodel

import "image/color"

// Axis is one axis of a chart, in display units.
type Axis struct {
	// Label names the quantity and its unit.
	Label string
	// Min and Max bound the axis; Max > Min.
	Min, Max float64
	// Log draws the axis on a logarithmic scale (Min > 0).
	Log bool
	// Whole marks an axis of counts: a linear one steps in whole numbers
	// (never "2.5 units").
	Whole bool
}

// Dash is a line pattern; each pattern is distinct in black and white.
type Dash int

// The dash patterns, in the order limit lines take them.
const (
	Solid Dash = iota
	Dashed
	Dotted
	DashDot
	LongDash
	DashDotDot
	ShortDash
	dashCount
)

// Style is how a line is stroked: its pattern, width in points and colour
// (the printed record draws every colour as black or grey).
type Style struct {
	Dash   Dash
	Width  float64
	Colour color.Color
}

// Series is a named curve. A point whose value is not finite, or not
// positive on a logarithmic axis, breaks the curve.
type Series struct {
	Name  string
	X, Y  []float64
	Style Style
}

// Line is a labelled straight line across the plot: a limit or reference
// value (horizontal) or a temperature or time (vertical). Limit lines are
// a plain list so that any number of them can be shown; each carries its
// own label, which the drawing sets against that line and no other.
type Line struct {
	Label    string
	Value    float64
	Vertical bool
	Style    Style
}

// Shape is the shape of a marker.
type Shape int

// Marker shapes.
const (
	Circle Shape = iota
	Square
	Diamond
	Triangle
)

// Marker is a labelled point, such as the design point or the pressure at
// the hottest temperature.
type Marker struct {
	Label  string
	X, Y   float64
	Shape  Shape
	Filled bool
	Colour color.Color
}

// Box is a labelled rectangle in data units, such as a tolerance box.
type Box struct {
	Label          string
	X0, X1, Y0, Y1 float64
	Style          Style
}

// Bars is a histogram: Counts[i] units between Edges[i] and Edges[i+1].
type Bars struct {
	Edges  []float64
	Counts []int
}

// Bar is one bar of a ranked bar chart, such as a rank correlation.
type Bar struct {
	Label string
	Value float64
}

// Corner is where the legend sits inside the plot.
type Corner int

// Legend corners.
const (
	TopLeft Corner = iota
	TopRight
	BottomLeft
	BottomRight
)

// Chart is the whole description of one chart. A chart with Empty set has
// nothing to draw and says why.
type Chart struct {
	Title   string
	X, Y    Axis
	Series  []Series
	Lines   []Line
	Markers []Marker
	Boxes   []Box
	// Bars is a histogram drawn under everything else.
	Bars *Bars
	// Ranked is a horizontal bar chart of signed values from −1 to +1,
	// one row per bar (the axes' labels and ranges are ignored).
	Ranked []Bar
	// Legend places the legend of the named series.
	Legend Corner
	// Notes are sentences to print under the chart (off-scale values,
	// units outside the range shown, why an axis is logarithmic).
	Notes []string
	// Empty, when set, is shown instead of a plot.
	Empty string
}
