package cli

import "ullage/hazards"

// shockJSON is one part's thermal-shock result in check --json: the
// governing direction, the sudden change, the stresses and strength in
// MPa, the safety factor and the failure probability per event.
type shockJSON struct {
	Part                     string  `json:"part"`
	Direction                string  `json:"direction"`
	DeltaTK                  float64 `json:"delta_t_k"`
	StressMPa                float64 `json:"stress_mpa"`
	StrengthMPa              float64 `json:"strength_mpa"`
	ThermalShockSafetyFactor float64 `json:"thermal_shock_safety_factor"`
	FailureProbability       float64 `json:"failure_probability_per_event"`
	WithstoodDeltaTK         float64 `json:"withstood_delta_t_k"`
}

// shockResults returns the per-part thermal-shock results, or nil and the
// reason when no sudden change is given.
func shockResults(a *hazards.Assessment) ([]shockJSON, string) {
	if !a.Shock.Assessed {
		return nil, a.Shock.NotAssessedReason
	}
	out := make([]shockJSON, 0, len(a.Shock.Parts))
	for _, p := range a.Shock.Parts {
		c := p.Cases[p.Governing]
		out = append(out, shockJSON{Part: p.Name, Direction: c.Direction, DeltaTK: round(c.DeltaK, 6),
			StressMPa: round(c.TotalStressPa/1e6, 6), StrengthMPa: round(p.StrengthPa/1e6, 6),
			ThermalShockSafetyFactor: round(c.SafetyFactor, 6), FailureProbability: round(c.FailureProbability, 6),
			WithstoodDeltaTK: round(p.AllowableDeltaK, 6)})
	}
	return out, ""
}

// sealStressMPa returns the residual stress used at the seal in MPa, or
// nil when none is given.
func sealStressMPa(a *hazards.Assessment) *float64 {
	if a.Seal == nil {
		return nil
	}
	x := round(a.Seal.StressPa/1e6, 6)
	return &x
}
