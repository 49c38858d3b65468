package compare

import "ullage/hazards"

// thermalShockReading reads the lowest thermal-shock safety factor of any
// part, naming the part and the direction of the sudden change.
func thermalShockReading(a *hazards.Assessment) reading {
	if !a.Shock.Assessed {
		return reading{text: "not assessed (no sudden change given)", unranked: true}
	}
	best := -1
	for i, p := range a.Shock.Parts {
		if best < 0 || p.Cases[p.Governing].SafetyFactor < a.Shock.Parts[best].Cases[a.Shock.Parts[best].Governing].SafetyFactor {
			best = i
		}
	}
	if best < 0 {
		return reading{text: "not assessed", unranked: true}
	}
	p := a.Shock.Parts[best]
	c := p.Cases[p.Governing]
	r := safetyFactor(c.SafetyFactor)
	r.text += " (" + p.Name + ", " + sig(c.DeltaK, 3) + " K " + c.Direction + ")"
	return r
}

// sealStressReading reads the residual stress given at the seal.
func sealStressReading(a *hazards.Assessment) reading {
	if a.Seal == nil {
		return reading{text: "none given", unranked: true}
	}
	mpa := a.Seal.StressPa / 1e6
	return plain(mpa, sig(mpa, 3)+" MPa ("+a.Seal.Name+")")
}
