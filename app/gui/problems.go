package gui

import (
	"errors"
	"regexp"
	"strconv"
	"strings"

	"ullage/hazards"
	"ullage/hazards/designfile"
)

// problem is an input the engine refused, in the reviewer's words: the
// field it belongs to and what is acceptable, in the units on screen.
type problem struct {
	// Path is the field's JSON path in hazards.Design, "" when the
	// problem is not about one field.
	Path string
	// Text says what is wrong and what is acceptable.
	Text string
}

// problemOf turns an error from the engine or the design file into a
// problem. The field's quantity, when the form has that field, decides
// the units the limits are shown in.
func problemOf(err error, u unitSystem, fieldQ func(path string) (quantity, bool)) problem {
	var ie *hazards.InputError
	if errors.As(err, &ie) {
		q, _ := fieldQ(ie.Field)
		return problem{Path: ie.Field, Text: humanise(ie.Want, q, u)}
	}
	var fe *designfile.FileError
	if errors.As(err, &fe) {
		path := fe.Field
		if i := strings.Index(path, ".design."); i >= 0 {
			path = path[i+len(".design."):]
		}
		q, _ := fieldQ(path)
		return problem{Path: path, Text: humanise(fe.Problem, q, u)}
	}
	return problem{Text: err.Error()}
}

// Numbers with an SI unit in engine messages. The unit must not run on
// into a longer word.
var (
	rangeWithUnit = regexp.MustCompile(`(-?\d+(?:\.\d+)?(?:e[-+]?\d+)?) to (-?\d+(?:\.\d+)?(?:e[-+]?\d+)?) (K|kg|Pa|m³|m/s|m)([^\p{L}\p{N}³/]|$)`)
	numberPattern = `(-?\d+(?:\.\d+)?(?:e[-+]?\d+)?) ?(K|kg|Pa|m³|m/s|m)(?:[^\p{L}³/]|$)`
	numberWithSI  = regexp.MustCompile(numberPattern)
	celsiusAside  = regexp.MustCompile(` \(-?\d+(?:\.\d+)? °C\)`)
)

// humanise rewrites an engine message for the screen: SI values are
// shown in the units the reviewer works in, and field names by their
// labels.
func humanise(msg string, q quantity, u unitSystem) string {
	if u == unitsUS || q != qNumber {
		msg = celsiusAside.ReplaceAllString(msg, "")
	}
	msg = rangeWithUnit.ReplaceAllStringFunc(msg, func(m string) string {
		s := rangeWithUnit.FindStringSubmatch(m)
		qq := siQuantity(s[3], q)
		a, errA := strconv.ParseFloat(s[1], 64)
		b, errB := strconv.ParseFloat(s[2], 64)
		if errA != nil || errB != nil {
			return m
		}
		return sigFigures(u.fromSI(qq, a), 5) + " to " + u.show(qq, b, 5) + s[4]
	})
	msg = replaceNumbersWithSI(msg, q, u)
	for path, label := range fieldLabels {
		msg = strings.ReplaceAll(msg, path, label)
	}
	return msg
}

// replaceNumbersWithSI converts every "number unit" left in msg.
func replaceNumbersWithSI(msg string, q quantity, u unitSystem) string {
	var b strings.Builder
	rest := msg
	for {
		loc := numberWithSI.FindStringSubmatchIndex(rest)
		if loc == nil {
			b.WriteString(rest)
			return b.String()
		}
		x, err := strconv.ParseFloat(rest[loc[2]:loc[3]], 64)
		unit := rest[loc[4]:loc[5]]
		b.WriteString(rest[:loc[2]])
		if err != nil {
			b.WriteString(rest[loc[2]:loc[5]])
		} else {
			b.WriteString(u.show(siQuantity(unit, q), x, 5))
		}
		rest = rest[loc[5]:]
	}
}

// siQuantity returns the screen quantity for an SI unit in a message,
// preferring the field's own quantity where it matches the dimension.
func siQuantity(unit string, field quantity) quantity {
	switch unit {
	case "K":
		return qTemperature
	case "kg":
		return qMass
	case "Pa":
		return qPressure
	case "m/s":
		return qAirSpeed
	case "m³":
		if field == qRoomVolume {
			return qRoomVolume
		}
		return qVesselVolume
	case "m":
		if field == qRoomLength {
			return qRoomLength
		}
		return qLength
	}
	return qNumber
}

// fieldLabels names the design's top-level fields the engine mentions in
// its messages.
var fieldLabels = map[string]string{
	"hottest_k":             "the hottest temperature",
	"coldest_k":             "the coldest temperature",
	"sealing_temperature_k": "the sealing temperature",
	"fill_mass_kg":          "the fill",
}
