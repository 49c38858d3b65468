package hazards

import "math"

// Wall forms for the membrane stress.
const (
	WallThin  = "thin-wall"
	WallThick = "thick-wall"
)

// ThinWallLimit is the wall-thickness-to-inner-radius ratio up to which the
// thin-wall (membrane) formulas are used; thicker walls use Lamé's
// solution. A ratio of one tenth is the usual bound of the thin-wall
// theory (Roark's Formulas for Stress and Strain, 7th ed., §13.1, from
// memory: common practice).
const ThinWallLimit = 0.1

// Knock-down factors applied to the classical elastic buckling pressure to
// allow for the shape imperfections of real shells.
const (
	// SphereKnockDown is the lower bound of NASA SP-8032 (1969), "Buckling
	// of thin-walled doubly curved shells", for complete spheres under
	// uniform external pressure (from memory).
	SphereKnockDown = 0.14
	// TubeKnockDown is NASA SP-8007 (1968), "Buckling of thin-walled
	// circular cylinders", for cylinders under lateral pressure (from
	// memory).
	TubeKnockDown = 0.56
)

// PartStress is the mechanical response of one part of the envelope.
type PartStress struct {
	Name  string
	Shape string
	// WallRatio is wall thickness over inner radius; Form says which
	// stress formula it selects.
	WallRatio float64
	Form      string
	// StressPerPascal is the largest tensile hoop stress per pascal of
	// internal overpressure (dimensionless).
	StressPerPascal float64
	// HoopStressPa is that stress at the hottest temperature.
	HoopStressPa float64
	// AreaM2 is the outer surface area, the stressed area for the Weibull
	// size effect.
	AreaM2 float64
	// ClassicalBucklingPa is the elastic buckling pressure of the perfect
	// shell; BucklingPa the knocked-down value used for the review.
	ClassicalBucklingPa float64
	KnockDown           float64
	BucklingPa          float64
}

// hoopStressFactor returns the maximum tensile hoop stress per unit
// internal overpressure for a part, and which form was used.
//
// Thin wall, mean radius r_m and wall t (Roark, 7th ed., Table 13.1, cases
// 1a and 3a, from memory):
//
//	sphere σ = p r_m/(2t),   tube σ = p r_m/t
//
// Thick wall, Lamé's solution at the bore (Roark, 7th ed., Table 13.5,
// cases 1a and 1b, from memory):
//
//	sphere σ = p (r_o³ + 2r_i³)/(2(r_o³ − r_i³)),
//	tube   σ = p (r_o² + r_i²)/(r_o² − r_i²)
func hoopStressFactor(p *Part) (float64, string) {
	ro := p.OuterDiameterM / 2
	ri := p.InnerRadius()
	t := p.WallThicknessM
	if t/ri <= ThinWallLimit {
		rm := ro - t/2
		if p.Shape == ShapeSphere {
			return rm / (2 * t), WallThin
		}
		return rm / t, WallThin
	}
	if p.Shape == ShapeSphere {
		ro3, ri3 := ro*ro*ro, ri*ri*ri
		return (ro3 + 2*ri3) / (2 * (ro3 - ri3)), WallThick
	}
	return (ro*ro + ri*ri) / (ro*ro - ri*ri), WallThick
}

// classicalBuckling returns the elastic buckling pressure of a perfect
// part under uniform external pressure (Pa):
//
//	sphere (Zoelly 1915): p = 2E (t/r_m)² / √(3(1 − ν²))
//	long tube (Bresse–Bryan): p = E/(4(1 − ν²)) (t/r_m)³
//
// (Timoshenko and Gere, Theory of Elastic Stability, 2nd ed., 1961,
// §11.5 and §7.3, from memory.) The long-tube value ignores the stiffening
// of the ends, which errs on the safe side for short tubes.
func classicalBuckling(p *Part, e, nu float64) float64 {
	t := p.WallThicknessM
	rm := p.OuterDiameterM/2 - t/2
	if p.Shape == ShapeSphere {
		return 2 * e * (t / rm) * (t / rm) / math.Sqrt(3*(1-nu*nu))
	}
	x := t / rm
	return e / (4 * (1 - nu*nu)) * x * x * x
}

func analyseParts(parts []Part, g *Glass, overPressure float64) []PartStress {
	out := make([]PartStress, len(parts))
	for i := range parts {
		p := &parts[i]
		k, form := hoopStressFactor(p)
		cb := classicalBuckling(p, g.ElasticModulus.Value, g.PoissonRatio.Value)
		kd := SphereKnockDown
		if p.Shape == ShapeTube {
			kd = TubeKnockDown
		}
		out[i] = PartStress{
			Name:                p.Name,
			Shape:               p.Shape,
			WallRatio:           p.WallThicknessM / p.InnerRadius(),
			Form:                form,
			StressPerPascal:     k,
			HoopStressPa:        k * math.Max(overPressure, 0),
			AreaM2:              p.OuterArea(),
			ClassicalBucklingPa: cb,
			KnockDown:           kd,
			BucklingPa:          kd * cb,
		}
	}
	return out
}
