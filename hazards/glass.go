package hazards

import (
	"bytes"
	_ "embed"
	"encoding/json"
	"fmt"
	"sync"
)

// Glass describes the glass of the vessel: elastic constants and the
// Weibull strength statistics of its surface. The characteristic strength
// is the Weibull scale stress (63.2 % failure) for a surface of
// ReferenceArea under a constant load held for ReferenceLoad seconds.
type Glass struct {
	ID                      string  `json:"id"`
	Name                    string  `json:"name"`
	Note                    string  `json:"note"`
	ElasticModulus          Sourced `json:"elastic_modulus_pa"`
	PoissonRatio            Sourced `json:"poisson_ratio"`
	Expansion               Sourced `json:"expansion_per_k"`
	CharacteristicStrength  Sourced `json:"characteristic_strength_pa"`
	ReferenceArea           Sourced `json:"reference_area_m2"`
	ReferenceLoad           Sourced `json:"reference_load_seconds"`
	WeibullModulus          Sourced `json:"weibull_modulus"`
	StressCorrosionExponent Sourced `json:"stress_corrosion_exponent"`
	// StressOpticCoefficient C (1/Pa) converts a polariscope retardation
	// to stress, σ = δ/(C·L); optional (zero when not known).
	StressOpticCoefficient Sourced `json:"stress_optic_coefficient_per_pa,omitzero"`
	// RatedShockDifference is a stated thermal-shock temperature-difference
	// rating (K) for ware of this glass, shown beside the computed shock
	// result; optional (zero when none is stated).
	RatedShockDifference Sourced `json:"rated_shock_difference_k,omitzero"`
}

//go:embed data/glasses.json
var glassesJSON []byte

// FormatGlasses is the format tag of the glass catalogue.
const FormatGlasses = "ullage-glasses/1"

var glassCatalogue = sync.OnceValues(func() ([]Glass, error) {
	var doc struct {
		Format  string  `json:"format"`
		Glasses []Glass `json:"glasses"`
	}
	dec := json.NewDecoder(bytes.NewReader(glassesJSON))
	dec.DisallowUnknownFields()
	if err := dec.Decode(&doc); err != nil {
		return nil, fmt.Errorf("glass catalogue: %w", err)
	}
	if doc.Format != FormatGlasses {
		return nil, fmt.Errorf("glass catalogue: format %q, want %q", doc.Format, FormatGlasses)
	}
	for i := range doc.Glasses {
		if err := doc.Glasses[i].Validate("glasses[" + doc.Glasses[i].ID + "]"); err != nil {
			return nil, fmt.Errorf("glass catalogue: %w", err)
		}
	}
	return doc.Glasses, nil
})

// Glasses returns the built-in glass catalogue.
func Glasses() ([]Glass, error) {
	g, err := glassCatalogue()
	if err != nil {
		return nil, err
	}
	out := make([]Glass, len(g))
	copy(out, g)
	return out, nil
}

// LookupGlass returns the catalogue glass with the given ID.
func LookupGlass(id string) (Glass, error) {
	all, err := glassCatalogue()
	if err != nil {
		return Glass{}, err
	}
	for _, g := range all {
		if g.ID == id {
			return g, nil
		}
	}
	ids := make([]string, len(all))
	for i, g := range all {
		ids[i] = g.ID
	}
	return Glass{}, &InputError{Field: FieldGlassID, Value: fmt.Sprintf("%q", id), Want: fmt.Sprintf("one of %v, or a custom glass", ids)}
}

// Validate checks every property of the glass against a physical range and
// requires a source for each. field prefixes the field names in errors.
func (g *Glass) Validate(field string) error {
	v := &checker{}
	v.sourced(field+".elastic_modulus_pa", g.ElasticModulus, 1e9, 500e9, "Pa")
	v.sourced(field+".poisson_ratio", g.PoissonRatio, 0.05, 0.45, "")
	v.sourced(field+".expansion_per_k", g.Expansion, 0, 50e-6, "1/K")
	v.sourced(field+".characteristic_strength_pa", g.CharacteristicStrength, 1e6, 5e9, "Pa")
	v.sourced(field+".reference_area_m2", g.ReferenceArea, 1e-8, 100, "m²")
	v.sourced(field+".reference_load_seconds", g.ReferenceLoad, 0.01, 1e9, "s")
	v.sourced(field+".weibull_modulus", g.WeibullModulus, 1, 60, "")
	v.sourced(field+".stress_corrosion_exponent", g.StressCorrosionExponent, 5, 200, "")
	if g.StressOpticCoefficient != (Sourced{}) {
		v.sourced(field+".stress_optic_coefficient_per_pa", g.StressOpticCoefficient, 1e-13, 1e-11, "1/Pa")
	}
	if g.RatedShockDifference != (Sourced{}) {
		v.sourced(field+".rated_shock_difference_k", g.RatedShockDifference, 1, 2000, "K")
	}
	return v.err
}
