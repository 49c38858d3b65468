package tolerance

import (
	"fmt"
	"math"
	"math/rand/v2"

	"gonum.org/v1/gonum/stat/distuv"

	"ullage/hazards"
)

// maxRedraws bounds the redraws of a value outside its physical range.
// Every distribution is centred on a nominal value inside the range and
// the design's checks keep at least one side of the range well clear of
// it, so each draw lands inside with a chance of about one half or better
// and running out of redraws has a chance near 2⁻⁶⁴.
const maxRedraws = 64

// maxHottestK is the top of the hottest-temperature range a design
// accepts (hazards.Design.Validate).
const maxHottestK = 800

// variable is an input as drawn by one worker: a distribution on the
// worker's stream and the open physical range (lo, hi) of its values.
type variable struct {
	rander distuv.Rander
	lo, hi float64
	key    string
}

func (v *variable) draw() (float64, error) {
	for range maxRedraws {
		if x := v.rander.Rand(); x > v.lo && x < v.hi {
			return x, nil
		}
	}
	return 0, fmt.Errorf("%s: no value inside its physical range (%g to %g) after %d draws", v.key, v.lo, v.hi, maxRedraws)
}

// sampler draws units for one worker from its own PCG stream.
type sampler struct {
	pcg      *rand.PCG
	fill     variable
	volume   variable
	walls    []variable
	hot      variable
	strength distuv.Weibull
}

func (p *plan) newSampler() *sampler {
	pcg := rand.NewPCG(0, 0)
	d := &p.design
	dim := func(key string, nominal, pm, lo, hi float64) variable {
		v := variable{lo: lo, hi: hi, key: key}
		if p.settings.DimensionDistribution == Uniform {
			v.rander = distuv.Uniform{Min: nominal - pm, Max: nominal + pm, Src: pcg}
		} else {
			v.rander = distuv.Normal{Mu: nominal, Sigma: pm / 3, Src: pcg}
		}
		return v
	}
	sm := &sampler{pcg: pcg, strength: distuv.Weibull{K: p.weibullK, Lambda: 1, Src: pcg}}
	if p.fillVaries {
		sm.fill = dim(KeyFillMass, d.FillMassKg, d.FillMassToleranceKg, 0, math.Inf(1))
	}
	if p.volVaries {
		sm.volume = dim(KeyVolume, d.Vessel.InternalVolumeM3, d.Vessel.VolumeToleranceM3, 0, math.Inf(1))
	}
	sm.walls = make([]variable, len(d.Vessel.Parts))
	for i, part := range d.Vessel.Parts {
		if p.wallVaries[i] {
			sm.walls[i] = dim(hazards.PartField(i, hazards.PartWallThickness), part.WallThicknessM, part.WallToleranceM, 0, part.OuterDiameterM/2)
		}
	}
	if p.hotVaries {
		t, pm := d.HottestK, p.settings.HottestSpreadK
		sm.hot = variable{lo: p.model.Substance().MinTemperature(), hi: maxHottestK, key: KeyHottest}
		switch p.settings.HottestDistribution {
		case Uniform:
			sm.hot.rander = distuv.Uniform{Min: t - pm, Max: t + pm, Src: pcg}
		case Triangle:
			sm.hot.rander = distuv.NewTriangle(t-pm, t+pm, t, pcg)
		default:
			sm.hot.rander = distuv.Normal{Mu: t, Sigma: pm / 3, Src: pcg}
		}
	}
	return sm
}

// drawUnit fills u with the next unit's values, in the fixed order fill,
// volume, walls, hottest temperature, and returns the unit's standard
// Weibull strength variate (scale 1), drawn last. Inputs that do not vary
// keep their design values and take no draw.
func (sm *sampler) drawUnit(p *plan, u *hazards.Unit) (float64, error) {
	d := &p.design
	var err error
	u.FillMassKg, u.VolumeM3, u.HottestK = d.FillMassKg, d.Vessel.InternalVolumeM3, d.HottestK
	if p.fillVaries {
		if u.FillMassKg, err = sm.fill.draw(); err != nil {
			return 0, err
		}
	}
	if p.volVaries {
		if u.VolumeM3, err = sm.volume.draw(); err != nil {
			return 0, err
		}
	}
	for i := range sm.walls {
		u.WallThicknessM[i] = d.Vessel.Parts[i].WallThicknessM
		if p.wallVaries[i] {
			if u.WallThicknessM[i], err = sm.walls[i].draw(); err != nil {
				return 0, err
			}
		}
	}
	if p.hotVaries {
		if u.HottestK, err = sm.hot.draw(); err != nil {
			return 0, err
		}
	}
	return sm.strength.Rand(), nil
}

// record stores the drawn values of the varying inputs of one unit, in
// the order of plan.inputs, into row.
func (p *plan) record(u *hazards.Unit, strengthPa float64, row []float64) {
	j := 0
	put := func(x float64) { row[j] = x; j++ }
	if p.fillVaries {
		put(u.FillMassKg)
	}
	if p.volVaries {
		put(u.VolumeM3)
	}
	for i, w := range p.wallVaries {
		if w {
			put(u.WallThicknessM[i])
		}
	}
	if p.hotVaries {
		put(u.HottestK)
	}
	put(strengthPa)
}
