package compare

// ValueKind says what an InputValue holds.
type ValueKind string

// Kinds of input value.
const (
	// KindAbsent: the item (a part, a custom glass) is on the other side
	// only.
	KindAbsent ValueKind = "absent"
	KindNumber ValueKind = "number" // Number, in the SI unit Unit names
	KindText   ValueKind = "text"   // Text (an id, a name, a source)
	KindSwitch ValueKind = "switch" // On
	KindList   ValueKind = "list"   // Items, in order
	KindGroup  ValueKind = "group"  // Fields, in the design's field order
)

// Unit is the kind of quantity a number of the design holds, read from
// the unit its JSON name carries; the value itself is always in SI.
type Unit string

// Units of design inputs, with the SI unit of the value.
const (
	UnitNone              Unit = ""                   // a plain number: a factor, a probability, a count
	UnitTemperature       Unit = "temperature"        // K
	UnitTemperatureChange Unit = "temperature-change" // K, a difference of temperatures
	UnitPressure          Unit = "pressure"           // Pa
	UnitLength            Unit = "length"             // m, of the vessel
	UnitRoomLength        Unit = "room-length"        // m, of the room
	UnitArea              Unit = "area"               // m²
	UnitVolume            Unit = "volume"             // m³, of the vessel
	UnitRoomVolume        Unit = "room-volume"        // m³, of the room
	UnitMass              Unit = "mass"               // kg
	UnitSpeed             Unit = "speed"              // m/s
	UnitPerHour           Unit = "per-hour"           // 1/h
	UnitPerKelvin         Unit = "per-kelvin"         // 1/K
	UnitPerPascal         Unit = "per-pascal"         // 1/Pa
	UnitYears             Unit = "years"              // a
	UnitHours             Unit = "hours"              // h
	UnitMinutes           Unit = "minutes"            // min
	UnitSeconds           Unit = "seconds"            // s
	UnitPercent           Unit = "percent"            // %
	UnitPercentLFL        Unit = "percent-of-lfl"     // % of the lower flammable limit
)

// InputValue is one side of a changed input, as typed data: a number with
// its unit, a text, a switch, a list or a group of named fields, or
// absent. The display layer words it for people.
type InputValue struct {
	Kind   ValueKind    `json:"kind"`
	Unit   Unit         `json:"unit,omitempty"`
	Number float64      `json:"number,omitempty"`
	Text   string       `json:"text,omitempty"`
	On     bool         `json:"on,omitempty"`
	Items  []InputValue `json:"items,omitempty"`
	Fields []InputField `json:"fields,omitempty"`
}

// InputField is one named field of a group, under its JSON name.
type InputField struct {
	Name  string     `json:"name"`
	Value InputValue `json:"value"`
}
