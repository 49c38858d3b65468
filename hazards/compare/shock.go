package compare

import "ullage/hazards"

// thermalShockReading reads the lowest thermal-shock safety factor of any
// part, naming the part and the direction of the sudden change.
func thermalShockReading(a *hazards.Assessment) Reading {
	if !a.Shock.Assessed {
		return Reading{State: NotAssessed, unranked: true}
	}
	best := -1
	for i, p := range a.Shock.Parts {
		if best < 0 || p.Cases[p.Governing].SafetyFactor < a.Shock.Parts[best].Cases[a.Shock.Parts[best].Governing].SafetyFactor {
			best = i
		}
	}
	if best < 0 {
		return Reading{State: NotAssessed, unranked: true}
	}
	p := a.Shock.Parts[best]
	c := p.Cases[p.Governing]
	r := safetyFactor(c.SafetyFactor)
	r.Part, r.ShockDeltaK, r.ShockDirection = p.Name, c.DeltaK, c.Direction
	return r
}

// sealStressReading reads the residual stress given at the seal.
func sealStressReading(a *hazards.Assessment) Reading {
	if a.Seal == nil {
		return Reading{State: NoneGiven, unranked: true}
	}
	r := value(a.Seal.StressPa)
	r.Part = a.Seal.Name
	return r
}
