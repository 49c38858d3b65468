package hazards

import (
	_ "embed"
	"fmt"
	"sync"
)

// Directions of a sudden temperature change.
const (
	// ShockHotToCold: a warm device meets something colder; its outer
	// surface is cooled suddenly and goes into tension.
	ShockHotToCold = "hot-to-cold"
	// ShockColdToHot: a cold device meets something warmer; its outer
	// surface goes into compression and the tension appears on the inner
	// surface and around the edge of the warmed patch.
	ShockColdToHot = "cold-to-hot"
)

// ShockPreset is a named sudden temperature change with the sources of
// both temperatures: where the device comes from and what it meets.
type ShockPreset struct {
	ID        string  `json:"id"`
	Name      string  `json:"name"`
	Direction string  `json:"direction"`
	From      Sourced `json:"from_k"`
	To        Sourced `json:"to_k"`
	Note      string  `json:"note"`
}

// DeltaK returns the size of the sudden change in K (always positive for
// a valid preset).
func (p ShockPreset) DeltaK() float64 {
	if p.Direction == ShockColdToHot {
		return p.To.Value - p.From.Value
	}
	return p.From.Value - p.To.Value
}

//go:embed data/shock_presets.json
var shockPresetsJSON []byte

// FormatShockPresets is the format tag of the sudden-change presets.
const FormatShockPresets = "ullage-shocks/1"

var shockPresets = sync.OnceValues(func() ([]ShockPreset, error) {
	var doc struct {
		Format  string        `json:"format"`
		Presets []ShockPreset `json:"presets"`
	}
	if err := decodeStrict(shockPresetsJSON, &doc); err != nil {
		return nil, fmt.Errorf("sudden-change presets: %w", err)
	}
	if doc.Format != FormatShockPresets {
		return nil, fmt.Errorf("sudden-change presets: format %q, want %q", doc.Format, FormatShockPresets)
	}
	for _, p := range doc.Presets {
		c := &checker{}
		f := "shock_presets[" + p.ID + "]"
		c.sourced(f+".from_k", p.From, 150, 500, "K")
		c.sourced(f+".to_k", p.To, 150, 500, "K")
		if p.Direction != ShockHotToCold && p.Direction != ShockColdToHot {
			c.fail(f+".direction", p.Direction, "must be %s or %s", ShockHotToCold, ShockColdToHot)
		}
		if c.err == nil && p.DeltaK() <= 0 {
			c.fail(f, p.DeltaK(), "the change must go the way its direction says")
		}
		if c.err != nil {
			return nil, c.err
		}
	}
	return doc.Presets, nil
})

// ShockPresets returns the built-in sudden temperature changes.
func ShockPresets() ([]ShockPreset, error) {
	p, err := shockPresets()
	return append([]ShockPreset(nil), p...), err
}

// LookupShockPreset returns the sudden-change preset with the given ID.
func LookupShockPreset(id string) (ShockPreset, error) {
	all, err := shockPresets()
	if err != nil {
		return ShockPreset{}, err
	}
	for _, p := range all {
		if p.ID == id {
			return p, nil
		}
	}
	return ShockPreset{}, &InputError{Field: "shock preset", Value: fmt.Sprintf("%q", id), Want: "must name a built-in sudden-change preset"}
}
