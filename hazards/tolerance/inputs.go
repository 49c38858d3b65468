package tolerance

import (
	"fmt"
	"math"

	"ullage/hazards"
)

// Weibull is the distribution of the glass strength in Input.
const Weibull = "weibull"

// Input keys of the quantities that can vary. Walls are keyed
// "vessel.parts[i].wall_thickness_m" after the design's own field.
const (
	KeyFillMass      = hazards.FieldFillMass
	KeyVolume        = hazards.FieldInternalVolume
	KeyGlassStrength = "glass_strength_pa"
	KeyHottest       = hazards.FieldHottest
)

// Input describes one input that varies from unit to unit and the
// distribution it is drawn from.
type Input struct {
	// Key names the input after the design field it varies; Label says it
	// in plain words.
	Key   string `json:"key"`
	Label string `json:"label"`
	// Distribution is Normal, Uniform, Triangle or Weibull.
	Distribution string `json:"distribution"`
	// Nominal is the design value (SI units of the key). For the glass
	// strength it is the Weibull scale stress of the nominal unit's
	// stressed glass for the load duration (hazards.UnitResult's
	// EffectiveStrengthPa).
	Nominal float64 `json:"nominal"`
	// PlusMinus is the ± tolerance or spread the distribution was built
	// from (0 for Weibull): σ = PlusMinus/3 for Normal, the half-width for
	// Uniform and Triangle.
	PlusMinus float64 `json:"plus_minus"`
	// StdDev is the standard deviation of the distribution before any
	// redraw of values outside the physical range.
	StdDev float64 `json:"std_dev"`
	// Shape is the Weibull modulus (Weibull only).
	Shape float64 `json:"shape"`
}

// plan is what every worker needs to draw and judge units.
type plan struct {
	model    *hazards.UnitModel
	design   hazards.Design
	settings Settings
	// inputs lists the varying inputs in drawing order, glass strength
	// last; the unit fields they set are fill, volume, walls and hottest.
	inputs     []Input
	fillVaries bool
	volVaries  bool
	wallVaries []bool
	hotVaries  bool
	weibullK   float64
	// exposureMassKg is the fill above which a release exceeds a limit.
	exposureMassKg float64
}

func newPlan(d hazards.Design, m *hazards.UnitModel, nominalStrengthPa float64, s Settings) *plan {
	p := &plan{model: m, design: d, settings: s, weibullK: m.Glass().WeibullModulus.Value}
	add := func(key, label, dist string, nominal, pm float64) {
		in := Input{Key: key, Label: label, Distribution: dist, Nominal: nominal, PlusMinus: pm}
		switch dist {
		case Normal:
			in.StdDev = pm / 3
		case Uniform:
			in.StdDev = pm / math.Sqrt(3)
		case Triangle:
			in.StdDev = pm / math.Sqrt(6)
		}
		p.inputs = append(p.inputs, in)
	}
	dim := s.DimensionDistribution
	if d.FillMassToleranceKg > 0 {
		p.fillVaries = true
		add(KeyFillMass, "fill mass", dim, d.FillMassKg, d.FillMassToleranceKg)
	}
	if d.Vessel.InternalVolumeM3 > 0 && d.Vessel.VolumeToleranceM3 > 0 {
		p.volVaries = true
		add(KeyVolume, "internal volume", dim, d.Vessel.InternalVolumeM3, d.Vessel.VolumeToleranceM3)
	}
	p.wallVaries = make([]bool, len(d.Vessel.Parts))
	for i, part := range d.Vessel.Parts {
		if part.WallToleranceM > 0 {
			p.wallVaries[i] = true
			name := part.Name
			if name == "" {
				name = fmt.Sprintf("part %d", i+1)
			}
			add(hazards.PartField(i, hazards.PartWallThickness), "wall of "+name, dim, part.WallThicknessM, part.WallToleranceM)
		}
	}
	if s.HottestSpreadK > 0 {
		p.hotVaries = true
		add(KeyHottest, "hottest temperature", s.HottestDistribution, d.HottestK, s.HottestSpreadK)
		// A normal spread's ± is 3σ: the table covers 6σ, and the rare
		// unit beyond it is prepared directly.
		reach := s.HottestSpreadK
		if s.HottestDistribution != Uniform && s.HottestDistribution != Triangle {
			reach *= 2
		}
		m.TabulateHottest(d.HottestK-reach, d.HottestK+reach)
	}
	k := p.weibullK
	g1, g2 := math.Gamma(1+1/k), math.Gamma(1+2/k)
	p.inputs = append(p.inputs, Input{Key: KeyGlassStrength, Label: "glass strength", Distribution: Weibull,
		Nominal: nominalStrengthPa, StdDev: nominalStrengthPa * math.Sqrt(math.Max(g2-g1*g1, 0)), Shape: k})
	return p
}
