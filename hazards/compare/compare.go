package compare

import "ullage/hazards"

// Side is one revision in a comparison: its label, its design and the
// assessment of that design. Assessment may be nil when the design could
// not be assessed; its results then read "not assessed" and each of the
// other side's findings counts as changed.
type Side struct {
	Label      string
	Design     hazards.Design
	Assessment *hazards.Assessment
}

// InputChange is one design input that differs between the sides, as
// typed values: Field is the path as in the design file's JSON
// (vessel.parts[1].wall_thickness_m), Unit the kind of quantity the field
// holds (UnitNone for text, a plain number or a group), and Old and New
// the values of A and B (KindAbsent for a part, glass or other item
// present on one side only). The display layer words them.
type InputChange struct {
	Field string     `json:"field"`
	Unit  Unit       `json:"unit,omitempty"`
	Old   InputValue `json:"old"`
	New   InputValue `json:"new"`
}

// ResultChange is one headline result on both sides, as typed values:
// Old and New are the readings of A and B, their values in SI units
// (Unit: Pa, %, K, kg, J, ppm, % LFL; "" for a ratio or a probability)
// and Quantity says what kind of value it is, so that each output can
// show it in its own units. Better and Worse say whether the move from
// Old to New is for the better or the worse by the quantity's own
// direction (a higher safety factor is better, a higher pressure worse);
// both are false when the values are equal or either side has no value.
type ResultChange struct {
	Name     string   `json:"name"`
	Quantity Quantity `json:"quantity"`
	Unit     string   `json:"unit"`
	Old      Reading  `json:"old"`
	New      Reading  `json:"new"`
	Better   bool     `json:"better"`
	Worse    bool     `json:"worse"`
}

// Changed reports whether the result differs between the sides.
func (r ResultChange) Changed() bool { return r.Better || r.Worse || r.Old != r.New }

// StatusChange is a review criterion whose status differs between the
// sides; a criterion found on one side only has status StatusAbsent on the
// other.
type StatusChange struct {
	Criterion, Title string
	Old, New         hazards.Status
}

// StatusAbsent marks a criterion that one side's assessment does not
// have (for instance an exposure limit that applies to one fluid only).
const StatusAbsent hazards.Status = "absent"

// Comparison is the full side-by-side view of revision A (old) and B
// (new).
type Comparison struct {
	A, B Side
	// Inputs lists every differing input, in the order of the design's
	// fields; empty when the designs are identical.
	Inputs []InputChange
	// Results lists every headline result, changed or not, in a fixed
	// order (see Compare).
	Results []ResultChange
	// Statuses lists the criteria whose status changed, in A's finding
	// order followed by those found only in B.
	Statuses []StatusChange
}

// Compare sets A (the older revision) beside B (the newer). Results
// always holds, in this order: pressure at the hottest temperature (kPa,
// absolute), ullage at the hottest temperature (%), liquid-full
// temperature (°C), burst safety factor, failure probability over the
// service life, implosion safety factor, maximum safe temperature (°C),
// maximum safe fill (g), stored energy at rupture (J), peak, 15-minute
// (STEL) and 8-hour (TWA) concentrations (ppm), and the peak as a
// percentage of the LFL.
func Compare(a, b Side) Comparison {
	return Comparison{
		A:        a,
		B:        b,
		Inputs:   inputChanges(&a.Design, &b.Design),
		Results:  resultChanges(a.Assessment, b.Assessment),
		Statuses: statusChanges(a.Assessment, b.Assessment),
	}
}

// HasChanges reports whether anything differs: an input, a result or a
// finding's status.
func (c *Comparison) HasChanges() bool {
	if len(c.Inputs) > 0 || len(c.Statuses) > 0 {
		return true
	}
	for _, r := range c.Results {
		if r.Changed() {
			return true
		}
	}
	return false
}
