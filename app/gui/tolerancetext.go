package gui

import (
	"fmt"
	"math"
	"strconv"
	"strings"

	"ullage/hazards"
	"ullage/hazards/tolerance"
)

// groupDigits writes a whole number with thin spaces between groups of
// three digits: 100 000.
func groupDigits(n int) string {
	s := strconv.Itoa(n)
	neg := strings.HasPrefix(s, "-")
	s = strings.TrimPrefix(s, "-")
	var b strings.Builder
	for i, c := range s {
		if i > 0 && (len(s)-i)%3 == 0 {
			b.WriteRune('\u202f')
		}
		b.WriteRune(c)
	}
	if neg {
		return "−" + b.String()
	}
	return b.String()
}

// percentText writes a fraction as a percentage: three significant
// figures, two below 0.1 %.
func percentText(x float64) string {
	switch {
	case x <= 0 || math.IsNaN(x):
		return "0 %"
	case x < 1e-3:
		return sigFigures(100*x, 2) + " %"
	}
	return sigFigures(100*x, 3) + " %"
}

// proportionText is "12 of 100 000 units (0.012 %); 95 % interval
// 0.0069 % to 0.021 %".
func proportionText(p tolerance.Proportion) string {
	return fmt.Sprintf("%s of %s units (%s); 95 %% interval %s to %s",
		groupDigits(p.Count), groupDigits(p.Total), percentText(p.Estimate), percentText(p.Low), percentText(p.High))
}

// studyInputValue formats a varied input's value in the screen's units.
func studyInputValue(key string, v float64, u unitSystem) string {
	switch {
	case key == tolerance.KeyFillMass:
		return u.show(qMass, v, 4)
	case key == tolerance.KeyVolume:
		return u.show(qVesselVolume, v, 4)
	case key == tolerance.KeyHottest:
		return u.show(qTemperature, v, 4)
	case key == tolerance.KeyGlassStrength:
		return stressText(v, u)
	case hazards.IsPartField(key) && strings.HasSuffix(key, "."+hazards.PartWallThickness):
		return u.show(qLength, v, 3)
	}
	return sigFigures(v, 4)
}

// studyInputSpread formats a ± spread; a temperature spread is a
// difference, so it converts without the offset (K or °F).
func studyInputSpread(in tolerance.Input, u unitSystem) string {
	switch {
	case in.Distribution == tolerance.Weibull:
		return "Weibull modulus " + sigFigures(in.Shape, 3)
	case in.Key == tolerance.KeyHottest:
		return "± " + spreadText(in.PlusMinus, u)
	}
	return "± " + studyInputValue(in.Key, in.PlusMinus, u)
}

// spreadUnit is the unit of a temperature difference: K or °F.
func spreadUnit(u unitSystem) string { return u.unit(qTempDiff) }

// spreadText writes a temperature difference in K or °F to three
// significant figures, with its unit.
func spreadText(k float64, u unitSystem) string { return u.show(qTempDiff, k, 3) }

// distributionNames are the distributions as the panel names them.
var distributionNames = map[string]string{
	tolerance.Normal:   "Normal, ± taken as 3σ",
	tolerance.Uniform:  "Uniform within ±",
	tolerance.Triangle: "Triangle, peak at design",
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

// variedInputs says in words which inputs of d will vary from unit to
// unit, before a study is run: those with a tolerance on the form, the
// hottest temperature when it has a spread, and the glass strength.
func variedInputs(d *hazards.Design, spreadK float64, u unitSystem) []string {
	var out []string
	if d.FillMassToleranceKg > 0 {
		out = append(out, "fill "+u.show(qMass, d.FillMassKg, 4)+" ± "+u.show(qMass, d.FillMassToleranceKg, 3))
	}
	if d.Vessel.InternalVolumeM3 > 0 && d.Vessel.VolumeToleranceM3 > 0 {
		out = append(out, "measured volume "+u.show(qVesselVolume, d.Vessel.InternalVolumeM3, 4)+" ± "+u.show(qVesselVolume, d.Vessel.VolumeToleranceM3, 3))
	}
	for i, p := range d.Vessel.Parts {
		if p.WallToleranceM > 0 {
			name := p.Name
			if name == "" {
				name = fmt.Sprintf("part %d", i+1)
			}
			out = append(out, "wall of "+name+" "+u.show(qLength, p.WallThicknessM, 3)+" ± "+u.show(qLength, p.WallToleranceM, 3))
		}
	}
	if spreadK > 0 {
		out = append(out, "hottest temperature "+u.show(qTemperature, d.HottestK, 4)+" ± "+spreadText(spreadK, u))
	}
	return append(out, "glass strength (Weibull, from the glass chosen)")
}
