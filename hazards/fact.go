package hazards

// FactKind says what kind of quantity a Fact holds and so its SI unit.
type FactKind string

// Kinds of fact, with the SI unit of Value.
const (
	FactTemperature     FactKind = "temperature"            // K
	FactTempDifference  FactKind = "temperature-difference" // K
	FactPressure        FactKind = "pressure"               // Pa
	FactStress          FactKind = "stress"                 // Pa
	FactStressPerKelvin FactKind = "stress-per-kelvin"      // Pa/K
	FactMass            FactKind = "mass"                   // kg
	FactVolume          FactKind = "volume"                 // m³
	FactPercent         FactKind = "percent"                // %
	FactConcentration   FactKind = "concentration"          // ppm
	FactMinutes         FactKind = "minutes"                // min
	FactHours           FactKind = "hours"                  // h
	FactYears           FactKind = "years"                  // years
	FactNumber          FactKind = "number"                 // a plain number
	FactProbability     FactKind = "probability"            // a probability
	FactName            FactKind = "name"                   // Text only: a glass, a part, a place
)

// Fact is one value behind a finding, typed, for the detail each output
// words in its own units beside the value and the limit: the hottest
// temperature, the overpressure, the glass. Value is in the SI unit of
// Kind; Text holds a name (Kind FactName) or, for a number that does not
// apply, the state ("not reached"); Bound, when set, says Value is a
// bound.
type Fact struct {
	Name  string    `json:"name"`
	Kind  FactKind  `json:"kind"`
	Value float64   `json:"value"`
	Text  string    `json:"text,omitempty"`
	Bound Direction `json:"bound,omitempty"`
}

func fact(name string, kind FactKind, v float64) Fact {
	return Fact{Name: name, Kind: kind, Value: finiteOr(v, 0)}
}

func named(name, text string) Fact { return Fact{Name: name, Kind: FactName, Text: text} }

// unitOf returns the SI unit of a fact kind, for the calculation record.
func (k FactKind) unitOf() string {
	switch k {
	case FactTemperature, FactTempDifference:
		return "K"
	case FactPressure, FactStress:
		return "Pa"
	case FactStressPerKelvin:
		return "Pa/K"
	case FactMass:
		return "kg"
	case FactVolume:
		return "m³"
	case FactPercent:
		return "%"
	case FactConcentration:
		return "ppm"
	case FactMinutes:
		return "min"
	case FactHours:
		return "h"
	case FactYears:
		return "years"
	}
	return ""
}

// factArena hands out the fact lists of an assessment's findings from a
// few shared backing arrays instead of one allocation per finding. Each
// list is capped at its own length, so an append by anyone but the arena
// copies it and never overwrites the next finding's facts.
type factArena struct {
	buf   []Fact
	start int // where the list handed out last begins in buf
}

// The arena's first backing array holds factArenaFirst facts, which
// fills its 4096-byte allocation size class (72 bytes a fact) and is
// enough for most assessments (the digest test's designs give some 33 to
// 80, most of them 40 to 58); any later one holds factArenaMore, so that
// an assessment with a few more facts pays for a few more and not for a
// second full array.
const (
	factArenaFirst = 56
	factArenaMore  = 16
)

// keep returns a list holding fs.
func (ar *factArena) keep(fs ...Fact) []Fact {
	if len(ar.buf)+len(fs) > cap(ar.buf) {
		n := factArenaFirst
		if ar.buf != nil {
			n = factArenaMore
		}
		ar.buf = make([]Fact, 0, max(n, len(fs)))
	}
	ar.start = len(ar.buf)
	ar.buf = append(ar.buf, fs...)
	return ar.buf[ar.start:len(ar.buf):len(ar.buf)]
}

// extend returns list with more appended, in place when list is the one
// handed out last and there is room after it.
func (ar *factArena) extend(list []Fact, more ...Fact) []Fact {
	n := len(ar.buf)
	if len(list) > 0 && ar.start+len(list) == n && &list[0] == &ar.buf[ar.start] && n+len(more) <= cap(ar.buf) {
		ar.buf = append(ar.buf, more...)
		return ar.buf[ar.start:len(ar.buf):len(ar.buf)]
	}
	return append(list, more...)
}
