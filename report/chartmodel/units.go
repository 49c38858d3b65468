package chartmodel

// Quantity converts one kind of value from SI for an axis and formats it
// for a label. The caller supplies both, so that every number on a chart
// is written by the same formatter as the rest of the window or record.
type Quantity struct {
	// Unit is the display unit's symbol, for the axis label.
	Unit string
	// FromSI converts an SI value (K, Pa) to the display unit.
	FromSI func(si float64) float64
	// Format writes an SI value with its unit, for a label.
	Format func(si float64) string
}

// Units are the conversions and formatters a chart needs.
type Units struct {
	Temperature Quantity
	Pressure    Quantity
	// Number writes a plain number (a concentration in ppm, a percentage)
	// for a label.
	Number func(v float64) string
}
