package cli

import (
	"bytes"
	"encoding/json"
	"errors"
	"math"
	"strings"

	"ullage/fluids/units"
	"ullage/hazards"
	"ullage/hazards/designfile"
	"ullage/hazards/tolerance"
	"ullage/report/display"
)

// designJSON is the stable, documented JSON form of one checked design.
// SI units, absolute pressures; the unit is in each key's name.
type designJSON struct {
	File                   string   `json:"file"`
	Product                string   `json:"product"`
	Revision               string   `json:"revision"`
	Fingerprint            string   `json:"fingerprint"`
	Fluid                  string   `json:"fluid"`
	Verdict                string   `json:"verdict"`
	Phase                  string   `json:"phase"`
	PressureKPa            float64  `json:"pressure_kpa"`
	LiquidFullTemperatureC *float64 `json:"liquid_full_temperature_c"`
	UllagePercent          float64  `json:"ullage_percent"`
	BurstSafetyFactor      *float64 `json:"burst_safety_factor"`
	FailureProbability     *float64 `json:"failure_probability"`
	ImplosionSafetyFactor  *float64 `json:"implosion_safety_factor"`
	// BurstLoad and ExternalLoad are "none" when nothing loads the
	// vessel, and the matching numbers are then null.
	BurstLoad    string `json:"burst_load"`
	ExternalLoad string `json:"external_load"`
	// The *_bound keys say a number is a bound ("at-least", "at-most").
	BurstSafetyFactorBound     string          `json:"burst_safety_factor_bound,omitempty"`
	FailureProbabilityBound    string          `json:"failure_probability_bound,omitempty"`
	ImplosionSafetyFactorBound string          `json:"implosion_safety_factor_bound,omitempty"`
	WorstUnitBurstSafetyFactor *float64        `json:"worst_unit_burst_safety_factor,omitempty"`
	WorstUnitFailureProb       *float64        `json:"worst_unit_failure_probability,omitempty"`
	MaxSafeTemperatureC        float64         `json:"max_safe_temperature_c"`
	MaxSafeTemperatureNote     string          `json:"max_safe_temperature_bound"`
	MaxSafeFillMassG           float64         `json:"max_safe_fill_mass_g"`
	MaxSafeFillNote            string          `json:"max_safe_fill_bound"`
	StoredEnergyJ              float64         `json:"stored_energy_j"`
	FlashFraction              float64         `json:"flash_fraction"`
	PeakConcentrationPPM       float64         `json:"peak_concentration_ppm"`
	STELAveragePPM             float64         `json:"stel_average_ppm"`
	TWA8hPPM                   float64         `json:"twa_8h_ppm"`
	PercentLFL                 float64         `json:"percent_lfl"`
	PeakBound                  string          `json:"peak_concentration_bound,omitempty"`
	ConcentrationBoundPPM      float64         `json:"concentration_bound_ppm"`
	ConcentrationBoundBy       string          `json:"concentration_bound_by"`
	Limits                     []limitJSON     `json:"limits"`
	LimitSets                  []string        `json:"limit_sets"`
	LimitNotes                 []limitNoteJSON `json:"limit_notes"`
	Extrapolated               bool            `json:"extrapolated"`
	Findings                   []findingJSON   `json:"findings"`
	Cautions                   []string        `json:"cautions"`
	// Tolerance is the sampled tolerance study, included with --samples.
	Tolerance *tolerance.Result `json:"tolerance,omitempty"`
	// Trace is the calculation record, included with --trace.
	Trace []hazards.Step `json:"trace,omitempty"`

	// ThermalShock lists each part's thermal-shock result (with its
	// thermal_shock_safety_factor); null when the design gives no sudden
	// change, and ThermalShockNote then says why.
	ThermalShock     []shockJSON `json:"thermal_shock"`
	ThermalShockNote string      `json:"thermal_shock_note,omitempty"`
	// SealResidualStressMPa is the residual stress used at the seal; null
	// when none is given.
	SealResidualStressMPa *float64 `json:"seal_residual_stress_mpa"`
}

// failedJSONEntry is the JSON form of an input that could not be
// assessed: {"file": ..., "verdict": "error", "error": {"field": ...,
// "message": ...}}.
type failedJSONEntry struct {
	File    string    `json:"file"`
	Verdict string    `json:"verdict"`
	Error   errorJSON `json:"error"`
}

// errorJSON says why an input could not be assessed: the field path in
// the file (empty when the file as a whole is at fault), its line when
// known, and the full message.
type errorJSON struct {
	Field   string `json:"field"`
	Line    int    `json:"line,omitempty"`
	Message string `json:"message"`
}

// failedJSON describes err, the reason the input at path was not
// assessed.
func failedJSON(path string, err error) failedJSONEntry {
	e := errorJSON{Message: err.Error()}
	var fe *designfile.FileError
	var ie *hazards.InputError
	switch {
	case errors.As(err, &fe):
		e.Field, e.Line = fe.Field, fe.Line
	case errors.As(err, &ie):
		e.Field = "design." + ie.Field
	}
	return failedJSONEntry{File: path, Verdict: verdictError, Error: e}
}

// limitJSON is one published limit evaluated over its own averaging
// period.
type limitJSON struct {
	Body       string  `json:"body"`
	Name       string  `json:"name"`
	Kind       string  `json:"kind"`
	LimitPPM   float64 `json:"limit_ppm"`
	Minutes    float64 `json:"minutes"`
	AveragePPM float64 `json:"average_ppm"`
	Bounded    bool    `json:"bounded"`
	Zone       string  `json:"zone"`
	Share      float64 `json:"share"`
	Governs    bool    `json:"governs"`
	Source     string  `json:"source"`
	Step       int     `json:"step"`
	// Set is the limit set of the entry; Standing its standing as
	// published (final, interim, indicative …) and Protects whom and for
	// how long a public benchmark protects, both absent when not given.
	Set      string `json:"set"`
	Standing string `json:"standing,omitempty"`
	Protects string `json:"protects,omitempty"`
}

// limitNoteJSON is a limit set's word where it gives no number.
type limitNoteJSON struct {
	Set       string `json:"set"`
	Name      string `json:"name,omitempty"`
	Reason    string `json:"reason"`
	Statement string `json:"statement"`
}

// findingJSON is one finding as the JSON gives it: the engine's typed
// fields (SI numbers, null where a value does not apply) and a "message"
// for people, worded by the display package in SI units.
type findingJSON map[string]any

func findingOut(f hazards.Finding) findingJSON {
	out := findingJSON{}
	b, err := json.Marshal(f)
	if err == nil {
		dec := json.NewDecoder(bytes.NewReader(b))
		dec.UseNumber()
		err = dec.Decode(&out)
	}
	if err != nil {
		out = findingJSON{"criterion": f.Criterion, "status": f.Status}
	}
	v := display.Finding(f, display.SI)
	out["message"] = strings.TrimSpace(v.Numbers() + ". " + v.Text())
	return out
}

func round(x float64, digits int) float64 {
	if math.IsNaN(x) || math.IsInf(x, 0) {
		return 0
	}
	if x == 0 {
		return 0
	}
	p := math.Pow(10, float64(digits)-math.Ceil(math.Log10(math.Abs(x))))
	return math.Round(x*p) / p
}

func checkJSON(c checked) designJSON {
	a := c.assessment
	d := designJSON{
		File:                   c.path,
		Product:                c.file.Product.Name,
		Revision:               c.revision.Label,
		Fingerprint:            c.revision.Fingerprint(),
		Fluid:                  a.Fluid.ID,
		Verdict:                string(a.Verdict),
		Phase:                  string(a.Hot.Phase),
		PressureKPa:            round(a.Hot.PressurePa/1000, 6),
		UllagePercent:          round(a.Hot.UllagePercent, 6),
		BurstLoad:              "present",
		ExternalLoad:           "present",
		MaxSafeTemperatureC:    round(units.KelvinToCelsius(a.MaxSafe.TemperatureK), 6),
		MaxSafeTemperatureNote: string(a.MaxSafe.TemperatureBound),
		MaxSafeFillMassG:       round(a.MaxSafe.FillMassKg*1000, 6),
		MaxSafeFillNote:        string(a.MaxSafe.FillBound),
		StoredEnergyJ:          round(a.Rupture.StoredEnergyJ, 6),
		FlashFraction:          round(a.Rupture.FlashFraction, 6),
		PeakConcentrationPPM:   round(a.Release.Peak.PPM, 6),
		STELAveragePPM:         round(a.Release.STEL.PPM, 6),
		TWA8hPPM:               round(a.Release.TWA8h.PPM, 6),
		PercentLFL:             round(a.Release.PercentLFL, 6),
		ConcentrationBoundPPM:  round(a.Release.Bound.PPM, 6),
		ConcentrationBoundBy:   a.Release.Bound.By,
		Limits:                 []limitJSON{},
		LimitNotes:             []limitNoteJSON{},
		Extrapolated:           a.Flags.Extrapolated(),
		Cautions:               display.Cautions(a, display.SI),
		Tolerance:              c.tolerance,
	}
	d.ThermalShock, d.ThermalShockNote = shockResults(a)
	d.SealResidualStressMPa = sealStressMPa(a)
	num := func(x float64) *float64 { v := round(x, 6); return &v }
	if a.HasBurstLoad() {
		d.BurstSafetyFactor, d.FailureProbability = num(a.BurstSafetyFactor), num(a.FailureProbability)
		d.BurstSafetyFactorBound, d.FailureProbabilityBound = string(a.BurstSafetyFactorBound), string(a.FailureProbabilityBound)
	} else {
		d.BurstLoad = "none"
	}
	if ws := a.WorstStrength; ws != nil && ws.OverPa > 0 {
		d.WorstUnitBurstSafetyFactor, d.WorstUnitFailureProb = num(ws.SafetyFactor), num(ws.FailureProbability)
	}
	if a.HasExternalLoad() {
		d.ImplosionSafetyFactor = num(a.ImplosionSafetyFactor)
		if a.ImplosionSafetyFactor >= hazards.SafetyFactorCap {
			d.ImplosionSafetyFactorBound = string(hazards.AtLeast)
		}
	} else {
		d.ExternalLoad = "none"
	}
	if a.Release.Peak.Bounded {
		d.PeakBound = string(hazards.AtMost)
	}
	for _, l := range a.Release.Limits {
		zone := "well-mixed room"
		if l.Exposure.Zone == hazards.NearField {
			zone = "near field"
		}
		d.Limits = append(d.Limits, limitJSON{Body: l.Body, Name: l.Name, Kind: l.Kind, LimitPPM: l.PPM, Minutes: round(l.Exposure.AveragingS/60, 6),
			AveragePPM: round(l.Exposure.PPM, 6), Bounded: l.Exposure.Bounded, Zone: zone, Share: round(l.Share, 6), Governs: l.Governs,
			Source: l.Source, Step: a.TraceStep(l.StepKey), Set: l.Set, Standing: l.Standing, Protects: l.Protects})
	}
	d.LimitSets = append([]string{}, a.Release.LimitSets...)
	for _, n := range a.Release.LimitNotes {
		d.LimitNotes = append(d.LimitNotes, limitNoteJSON{Set: n.Set, Name: n.Name, Reason: string(n.Reason), Statement: n.Statement})
	}
	if a.LiquidFullReached {
		t := round(units.KelvinToCelsius(a.LiquidFullK), 6)
		d.LiquidFullTemperatureC = &t
	}
	for _, f := range a.Findings {
		f.Value, f.Limit, f.Margin = round(f.Value, 6), round(f.Limit, 6), round(f.Margin, 6)
		d.Findings = append(d.Findings, findingOut(f))
	}
	return d
}
