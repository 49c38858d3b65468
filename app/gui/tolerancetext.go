package gui

import (
	"ullage/hazards"
	"ullage/hazards/tolerance"
	"ullage/report/display"
)

// distributionNames are the distributions as the panel's selectors offer
// them, in the display layer's words (the record's and the command
// line's): "Normal, ± is 3σ".
var distributionNames = map[string]string{
	tolerance.Normal:   display.DistributionWords(tolerance.Normal),
	tolerance.Uniform:  display.DistributionWords(tolerance.Uniform),
	tolerance.Triangle: display.DistributionWords(tolerance.Triangle),
}

// distributionOf returns the distribution a panel name stands for.
func distributionOf(name string) string {
	for k, v := range distributionNames {
		if v == name {
			return k
		}
	}
	return tolerance.Normal
}

// spreadUnit is the unit of a temperature difference: K or °F.
func spreadUnit(u unitSystem) string { return u.unit(qTempDiff) }

// spreadText writes a temperature difference in K or °F, with its unit,
// as a stated value.
func spreadText(k float64, u unitSystem) string { return u.display().Input(qTempDiff, k) }

// variedInputs says in words which inputs of d will vary from unit to
// unit, before a study is run: those with a tolerance on the form, the
// hottest temperature when it has a spread, and the glass strength. The
// values are stated ones, as the study's inputs print after the run.
func variedInputs(d *hazards.Design, spreadK float64, u unitSystem) []string {
	s := u.display()
	var out []string
	if d.FillMassToleranceKg > 0 {
		out = append(out, "fill "+s.Input(qMass, d.FillMassKg)+" ± "+s.Input(qMass, d.FillMassToleranceKg))
	}
	if d.Vessel.InternalVolumeM3 > 0 && d.Vessel.VolumeToleranceM3 > 0 {
		out = append(out, "measured volume "+s.Input(qVesselVolume, d.Vessel.InternalVolumeM3)+" ± "+s.Input(qVesselVolume, d.Vessel.VolumeToleranceM3))
	}
	for i, p := range d.Vessel.Parts {
		if p.WallToleranceM > 0 {
			name := p.Name
			if name == "" {
				name = "part " + display.Count(i+1)
			}
			out = append(out, "wall of "+name+" "+s.Input(qLength, p.WallThicknessM)+" ± "+s.Input(qLength, p.WallToleranceM))
		}
	}
	if spreadK > 0 {
		out = append(out, "hottest temperature "+s.Input(qTemperature, d.HottestK)+" ± "+spreadText(spreadK, u))
	}
	return append(out, "glass strength (Weibull, from the glass chosen)")
}
