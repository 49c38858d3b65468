package hazards

import (
	"bytes"
	_ "embed"
	"encoding/json"
	"fmt"
	"math"
	"sync"
)

// TemperaturePreset is a named hottest or coldest temperature a device may
// meet (a closed car in summer, a winter transport hold …) with its source.
type TemperaturePreset struct {
	ID          string  `json:"id"`
	Name        string  `json:"name"`
	Kind        string  `json:"kind"` // "hottest" or "coldest"
	Temperature Sourced `json:"temperature_k"`
	Note        string  `json:"note"`
}

// RoomPreset is a named release scenario: the room a broken device empties
// into, with its ventilation and mixing.
type RoomPreset struct {
	ID                string  `json:"id"`
	Name              string  `json:"name"`
	Volume            Sourced `json:"volume_m3"`
	AirChangesPerHour Sourced `json:"air_changes_per_hour"`
	MixingFactor      Sourced `json:"mixing_factor"`
	NearFieldRadius   Sourced `json:"near_field_radius_m"`
	NearFieldAirSpeed Sourced `json:"near_field_air_speed_m_s"`
	Note              string  `json:"note"`
}

// Room returns the release scenario of the preset with the given exposure
// duration in minutes.
func (p RoomPreset) Room(exposureMinutes float64) Room {
	return Room{
		PresetID:          p.ID,
		VolumeM3:          p.Volume.Value,
		AirChangesPerHour: p.AirChangesPerHour.Value,
		MixingFactor:      p.MixingFactor.Value,
		NearFieldRadiusM:  p.NearFieldRadius.Value,
		NearFieldAirSpeed: p.NearFieldAirSpeed.Value,
		ExposureMinutes:   exposureMinutes,
	}
}

//go:embed data/temperature_presets.json
var temperaturePresetsJSON []byte

//go:embed data/room_presets.json
var roomPresetsJSON []byte

func decodeStrict(b []byte, v any) error {
	dec := json.NewDecoder(bytes.NewReader(b))
	dec.DisallowUnknownFields()
	if err := dec.Decode(v); err != nil {
		return err
	}
	return nil
}

var temperaturePresets = sync.OnceValues(func() ([]TemperaturePreset, error) {
	var doc struct {
		Format  string              `json:"format"`
		Presets []TemperaturePreset `json:"presets"`
	}
	if err := decodeStrict(temperaturePresetsJSON, &doc); err != nil {
		return nil, fmt.Errorf("temperature presets: %w", err)
	}
	for _, p := range doc.Presets {
		c := &checker{}
		c.sourced("temperature_presets["+p.ID+"].temperature_k", p.Temperature, 150, 500, "K")
		if p.Kind != "hottest" && p.Kind != "coldest" {
			c.fail("temperature_presets["+p.ID+"].kind", p.Kind, "must be hottest or coldest")
		}
		if c.err != nil {
			return nil, c.err
		}
	}
	return doc.Presets, nil
})

var roomPresets = sync.OnceValues(func() ([]RoomPreset, error) {
	var doc struct {
		Format  string       `json:"format"`
		Presets []RoomPreset `json:"presets"`
	}
	if err := decodeStrict(roomPresetsJSON, &doc); err != nil {
		return nil, fmt.Errorf("room presets: %w", err)
	}
	for _, p := range doc.Presets {
		field := "room_presets[" + p.ID + "]"
		r := p.Room(480)
		if err := r.validateRanges(field); err != nil {
			return nil, err
		}
		// The ranges were checked above; here every value must also
		// carry its source.
		c := &checker{}
		for _, v := range []struct {
			name string
			v    Sourced
		}{{RoomKeyVolume, p.Volume}, {RoomKeyAirChanges, p.AirChangesPerHour}, {RoomKeyMixingFactor, p.MixingFactor},
			{RoomKeyNearFieldRadius, p.NearFieldRadius}, {RoomKeyNearFieldAirSpeed, p.NearFieldAirSpeed}} {
			c.sourced(field+"."+v.name, v.v, math.Inf(-1), math.Inf(1), "")
		}
		if c.err != nil {
			return nil, c.err
		}
	}
	return doc.Presets, nil
})

// TemperaturePresets returns the built-in named temperatures.
func TemperaturePresets() ([]TemperaturePreset, error) {
	p, err := temperaturePresets()
	return append([]TemperaturePreset(nil), p...), err
}

// RoomPresets returns the built-in named release scenarios.
func RoomPresets() ([]RoomPreset, error) {
	p, err := roomPresets()
	return append([]RoomPreset(nil), p...), err
}

// LookupTemperaturePreset returns the preset with the given ID.
func LookupTemperaturePreset(id string) (TemperaturePreset, error) {
	all, err := temperaturePresets()
	if err != nil {
		return TemperaturePreset{}, err
	}
	for _, p := range all {
		if p.ID == id {
			return p, nil
		}
	}
	return TemperaturePreset{}, &InputError{Field: "temperature preset", Value: fmt.Sprintf("%q", id), Want: "must name a built-in temperature preset"}
}

// LookupRoomPreset returns the room preset with the given ID.
func LookupRoomPreset(id string) (RoomPreset, error) {
	all, err := roomPresets()
	if err != nil {
		return RoomPreset{}, err
	}
	for _, p := range all {
		if p.ID == id {
			return p, nil
		}
	}
	return RoomPreset{}, &InputError{Field: "room preset", Value: fmt.Sprintf("%q", id), Want: "must name a built-in room preset"}
}
