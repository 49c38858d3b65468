package designfile

import (
	"bytes"
	"math"
	"strings"
	"testing"

	"ullage/hazards"
)

// The optional inputs (tag omitzero) stay out of the canonical form while
// they are zero, so every design written before they existed keeps its
// fingerprint; once given, they count.
func TestOptionalInputsAndFingerprints(t *testing.T) {
	base := typicalDesign()
	fp := (&Revision{Design: base}).Fingerprint()
	if c := canonicalJSON(base); strings.Contains(c, "thermal_shock") || strings.Contains(c, "seal_stress") ||
		strings.Contains(c, "stress_optic") || strings.Contains(c, "limit_sets") {
		t.Errorf("zero optional inputs written into the canonical form: %s", c)
	}
	minusZero := base
	minusZero.ThermalShock.HotToColdK = math.Copysign(0, -1)
	if (&Revision{Design: minusZero}).Fingerprint() != fp {
		t.Error("−0 in an optional input changes the fingerprint")
	}
	given := base
	given.ThermalShock = hazards.ThermalShock{HotToColdK: 56, HotToColdPresetID: "hot-car-into-cold-tap-water"}
	if (&Revision{Design: given}).Fingerprint() == fp {
		t.Error("a sudden change does not change the fingerprint")
	}
	sets := base
	sets.Criteria.LimitSets = []string{hazards.LimitSetUKWEL}
	if (&Revision{Design: sets}).Fingerprint() == fp {
		t.Error("a choice of limit sets does not change the fingerprint")
	}
	sets.Criteria.LimitSets = []string{}
	if (&Revision{Design: sets}).Fingerprint() != fp {
		t.Error("an empty list of limit sets (the default) changes the fingerprint")
	}
	seal := base
	seal.SealStress = hazards.SealStress{Part: "lower bulb", ResidualStressPa: 4e6}
	if (&Revision{Design: seal}).Fingerprint() == fp {
		t.Error("a seal stress does not change the fingerprint")
	}
}

// A file with the optional inputs loads, keeps them, and writes them back
// unchanged; the same file without them is exactly an older file.
func TestOptionalInputsRoundTrip(t *testing.T) {
	f, err := Load(fixtureCurrent)
	if err != nil {
		t.Fatal(err)
	}
	var plain bytes.Buffer
	if err := Encode(&plain, f); err != nil {
		t.Fatal(err)
	}
	if strings.Contains(plain.String(), "thermal_shock") || strings.Contains(plain.String(), "seal_stress") || strings.Contains(plain.String(), "limit_sets") {
		t.Error("an older file gains optional fields when written back")
	}
	f.Revisions[0].Design.ThermalShock = hazards.ThermalShock{ColdToHotK: 62, ColdToHotPresetID: "cold-car-to-warm-hand"}
	f.Revisions[0].Design.SealStress = hazards.SealStress{Part: f.Revisions[0].Design.Vessel.Parts[0].Name, RetardationM: 9e-8, PathLengthM: 0.0015}
	f.Revisions[0].Design.Criteria.LimitSets = []string{hazards.LimitSetUSPublicAcute, hazards.LimitSetDEAGW}
	var b bytes.Buffer
	if err := Encode(&b, f); err != nil {
		t.Fatal(err)
	}
	if strings.Contains(b.String(), "hot_to_cold_k") || strings.Contains(b.String(), "residual_stress_pa") {
		t.Errorf("zero members of the optional inputs written:\n%s", b.String())
	}
	back, err := Decode(bytes.NewReader(b.Bytes()), "round trip")
	if err != nil {
		t.Fatal(err)
	}
	if got := back.Revisions[0].Design.Criteria.LimitSets; len(got) != 2 || got[1] != hazards.LimitSetDEAGW {
		t.Errorf("limit sets read back as %v", got)
	}
	if back.Revisions[0].Design.ThermalShock != f.Revisions[0].Design.ThermalShock ||
		back.Revisions[0].Design.SealStress != f.Revisions[0].Design.SealStress {
		t.Errorf("read back %+v, %+v", back.Revisions[0].Design.ThermalShock, back.Revisions[0].Design.SealStress)
	}
	if back.Revisions[0].Fingerprint() != f.Revisions[0].Fingerprint() {
		t.Error("fingerprint changed in the round trip")
	}
}
