package gui

import (
	"errors"
	"strings"

	"ullage/hazards"
	"ullage/hazards/designfile"
	"ullage/report/display"
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
// the units the bounds are shown in; otherwise the bound's own SI unit
// does.
func problemOf(err error, u unitSystem, fieldQ func(path string) (quantity, bool)) problem {
	var ie *hazards.InputError
	if errors.As(err, &ie) {
		q, ok := fieldQ(ie.Field)
		if !ok || q == qNumber {
			q = siQuantity(ie.Unit, q)
		}
		bound := display.SIBound(ie.Unit)
		if q != qNumber {
			bound = func(x float64) string { return u.show(q, x, 5) }
		}
		return problem{Path: ie.Field, Text: withLabels(display.InputRule(ie, bound))}
	}
	var fe *designfile.FileError
	if errors.As(err, &fe) {
		path := fe.Field
		if i := strings.Index(path, ".design."); i >= 0 {
			path = path[i+len(".design."):]
		}
		return problem{Path: path, Text: withLabels(fe.Problem)}
	}
	return problem{Text: err.Error()}
}

// withLabels names the design's fields by their labels on screen.
func withLabels(msg string) string {
	for path, label := range fieldLabels {
		msg = strings.ReplaceAll(msg, path, label)
	}
	return msg
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
	hazards.FieldHottest:            "the hottest temperature",
	hazards.FieldColdest:            "the coldest temperature",
	hazards.FieldSealingTemperature: "the sealing temperature",
	hazards.FieldFillMass:           "the fill",
}
