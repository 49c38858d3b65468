package report

import (
	"fmt"
	"strings"

	"ullage/fluids"
	"ullage/hazards"
)

// softKind is how soft a value's source is, read from the source text the
// data carry beside the value.
type softKind int

const (
	softNone softKind = iota
	softAssumed
	softMemory
	softTranscription
)

// softKindOf classifies a source: a stated assumption, a value recalled
// from memory, or one read from a public transcription of a table.
func softKindOf(source string) softKind {
	s := strings.ToLower(source)
	switch {
	case strings.Contains(s, "assumption"):
		return softAssumed
	case strings.Contains(s, "from memory"):
		return softMemory
	case strings.Contains(s, "public transcription") || strings.Contains(s, "as reproduced"):
		return softTranscription
	}
	return softNone
}

// softValue is one input behind the verdict with a soft source.
type softValue struct {
	owner, name string
	kind        softKind
}

// softInputs lists the sourced inputs the findings rest on (the glass's
// strength and elastic data, the fluid's constants and flammability data,
// the governing exposure limits and the criteria's limits) whose source
// says they are assumed, recalled or transcribed, in that order of
// weight.
func softInputs(a *hazards.Assessment) []softValue {
	var out []softValue
	seen := map[string]bool{}
	add := func(owner, name, source string) {
		if k := softKindOf(source); k != softNone && !seen[owner+name] {
			seen[owner+name] = true
			out = append(out, softValue{owner, name, k})
		}
	}
	g := &a.Glass
	for _, v := range []struct {
		name string
		s    hazards.Sourced
	}{
		{"characteristic strength", g.CharacteristicStrength}, {"Weibull modulus", g.WeibullModulus},
		{"stress-corrosion exponent", g.StressCorrosionExponent}, {"reference area", g.ReferenceArea},
		{"reference load duration", g.ReferenceLoad}, {"elastic modulus", g.ElasticModulus},
		{"Poisson's ratio", g.PoissonRatio}, {"thermal expansion", g.Expansion},
	} {
		add("glass", v.name, v.s.Source)
	}
	f := a.Fluid
	for _, v := range []struct {
		name string
		s    *fluids.Sourced
	}{
		{"molar mass", &f.MolarMass}, {"critical temperature", &f.CriticalTemperature}, {"critical pressure", &f.CriticalPressure},
		{"critical density", &f.CriticalDensity}, {"acentric factor", &f.AcentricFactor}, {"normal boiling point", &f.NormalBoilingPoint},
		{"lower flammability limit", f.Flammability.LFLPercent}, {"flash point", f.Flammability.FlashPointK},
	} {
		if v.s != nil {
			add(f.Name, v.name, v.s.Source)
		}
	}
	add(f.Name, "liquid density", f.LiquidDensity.Source)
	add(f.Name, "liquid heat capacity", f.LiquidHeatCapacity.Source)
	for _, l := range a.Release.Limits {
		if l.Governs {
			add("exposure limit", l.Name, l.Source)
		}
	}
	for _, fd := range a.Findings {
		add("criterion limit", fd.Title, fd.Source)
	}
	return out
}

// dataBehind prints the short box on page 1 that says which inputs behind
// the verdict are stated assumptions, recalled or transcribed values.
func (w *assessmentWriter) dataBehind() {
	vs := softInputs(w.a)
	if len(vs) == 0 {
		return
	}
	groups := []struct {
		kind softKind
		lead string
	}{
		{softAssumed, "Stated assumptions"},
		{softMemory, "Recalled from memory"},
		{softTranscription, "From a public transcription"},
	}
	ps := []para{{text: "Inputs the findings rest on whose own source says so (full citations under Data provenance). Confirm them before relying on the verdict.", st: smallIt}}
	for _, g := range groups {
		var owners []string
		names := map[string][]string{}
		n := 0
		for _, v := range vs {
			if v.kind == g.kind {
				if names[v.owner] == nil {
					owners = append(owners, v.owner)
				}
				names[v.owner] = append(names[v.owner], v.name)
				n++
			}
		}
		var parts []string
		for _, o := range owners {
			parts = append(parts, o+": "+strings.Join(names[o], ", "))
		}
		if n > 0 {
			ps = append(ps, para{text: fmt.Sprintf("%s (%d) — %s.", g.lead, n, strings.Join(parts, "; ")), st: small, bullet: "•"})
		}
	}
	w.d.box("Data behind this verdict", ps)
}
