package report

import (
	"fmt"
	"math"
	"strings"

	"ullage/fluids"
	"ullage/hazards"
	"ullage/report/display"
)

// extrapolatedMark follows a value computed outside a correlation's
// published range.
const extrapolatedMark = " ‡"

func markIf(s string, f fluids.Flags) string {
	if f.Extrapolated() {
		return s + extrapolatedMark
	}
	return s
}

// vesselState prints the state at the extreme temperatures, the
// liquid-full temperature and the pressure–temperature chart.
func (w *assessmentWriter) vesselState() {
	d, a, u := w.d, w.a, w.u
	d.heading("Vessel state")
	d.lead("The sealed vessel holds a fixed mass of fluid (and any residual gas) in a fixed volume. As it warms, the liquid swells and the vapour space (ullage) shrinks; once the liquid fills the vessel, the pressure climbs by roughly a megapascal per kelvin.")
	st := func(s hazards.VesselState) []string {
		gas := noValue
		if s.GasPressurePa > 0 {
			gas = u.pressure(s.GasPressurePa)
		}
		dens := func(x float64) string {
			if x <= 0 {
				return noValue
			}
			return markIf(u.density(x), s.Flags)
		}
		return []string{
			u.temperature(s.TemperatureK),
			string(s.Phase),
			markIf(u.pressure(s.PressurePa), s.Flags),
			gas,
			markIf(u.f(display.Percent, s.UllagePercent), s.Flags),
			markIf(u.mass(s.LiquidMassKg), s.Flags),
			markIf(u.mass(s.VapourMassKg), s.Flags),
			dens(s.LiquidDensity),
			dens(s.VapourDensity),
			s.Flags.String(),
		}
	}
	names := []string{"Temperature", "Phase", "Absolute pressure", "of which residual gas", "Ullage (vapour space)",
		"Liquid mass", "Vapour mass", "Liquid density", "Vapour density", "Correlations stretched"}
	cold, hot := st(a.Cold), st(a.Hot)
	rows := make([][]cell, len(names))
	for i := range names {
		rows[i] = []cell{{text: names[i], dim: true}, {text: cold[i]}, {text: hot[i]}}
		if i == 1 || i == 2 {
			rows[i][2].bold = true
		}
	}
	d.drawTable(table{cols: []col{{"Quantity", 1.6, 'L'}, {"At the coldest", 2, 'R'}, {"At the hottest", 2, 'R'}}, rows: rows, zebra: true, keep: len(rows)})
	if (a.Hot.Flags | a.Cold.Flags).Extrapolated() {
		d.note("‡ computed outside a correlation's published range (" + (a.Hot.Flags | a.Cold.Flags).String() + "); treat as an estimate and confirm by test.")
	}
	d.keyValues([][2]string{{"Liquid-full temperature", w.liquidFullText()}}, 1)
	d.space(1)
	w.pressureChart()
}

func (w *assessmentWriter) liquidFullText() string {
	a, u := w.a, w.u
	if !a.LiquidFullReached {
		return fmt.Sprintf("not reached: the fill density (%s) is at or below the critical density of %s (%s), so the liquid evaporates before it could fill the vessel.",
			u.density(a.FillDensity), a.Fluid.Name, u.density(a.Fluid.CriticalDensity.Value))
	}
	diff := a.LiquidFullK - a.Design.HottestK
	where := "above"
	if diff < 0 {
		where = "below"
	}
	return fmt.Sprintf("%s, %s %s the hottest temperature", u.temperature(a.LiquidFullK), u.temperatureDifference(math.Abs(diff)), where)
}

// glass prints the stresses of each part, the strength and the safety
// factors.
func (w *assessmentWriter) glass() {
	d, a, u := w.d, w.a, w.u
	ds := &a.Design
	d.heading("Glass: stress, strength and safety factors")
	d.lead(fmt.Sprintf("Glass: %s. Hoop (membrane) stresses use the thin-wall formulas up to a wall of %s of the inner radius and Lamé's thick-wall solution above it. Buckling pressures are the classical elastic values reduced by the knock-down factors for real shells.",
		a.Glass.Name, percent(hazards.ThinWallLimit, 2)))
	rows := make([][]cell, 0, len(a.Parts))
	for _, p := range a.Parts {
		rows = append(rows, []cell{
			{text: p.Name}, {text: p.Shape + ", " + p.Form}, {text: display.Number(p.WallRatio, 3)}, {text: display.Number(p.StressPerPascal, 3)},
			{text: u.stress(p.HoopStressPa)}, {text: u.area(p.AreaM2)}, {text: u.stress(p.ClassicalBucklingPa)},
			{text: display.Number(p.KnockDown, 2)}, {text: u.stress(p.BucklingPa)},
		})
	}
	d.drawTable(table{cols: []col{
		{"Part", 1.4, 'L'}, {"Shape, wall form", 1.5, 'L'}, {"Wall / inner radius", 0.9, 'R'}, {"Hoop stress per unit overpressure", 1.35, 'R'},
		{"Hoop stress at the hottest", 1.2, 'R'}, {"Outer area", 1, 'R'}, {"Buckling pressure, classical", 1.2, 'R'},
		{"Knock-down factor", 1.3, 'R'}, {"Buckling pressure, used", 1.2, 'R'},
	}, rows: rows, zebra: true, size: 7.5})
	gp := a.Parts[min(max(a.Strength.GoverningPart, 0), len(a.Parts)-1)]
	over := a.Hot.PressurePa - ds.AmbientPressurePa
	d.subheading("Strength and safety factors")
	d.keyValues([][2]string{
		{"Short-term burst overpressure", u.pressure(a.Strength.ShortTermBurstPa) + " (63.2 % of units fail, reference load time " + display.Stated(a.Glass.ReferenceLoad.Value) + " s)"},
		{"Static-fatigue factor", display.Number(a.Strength.DurationFactor, 3) + " for " + display.Stated(ds.HoursAtHottest) + " h at the hottest"},
		{"Long-term burst overpressure", u.pressure(a.Strength.LongTermBurstPa)},
		{"Governing part", gp.Name + ": strength " + u.stress(a.Strength.GoverningStrengthPa) + ", allowable stress " + u.stress(a.Strength.AllowableStressPa)},
		{"Overpressure at the hottest", u.pressure(over) + " over ambient"},
		{"Allowable internal pressure", u.pressure(a.AllowablePressurePa()) + " absolute"},
		{"Burst safety factor", burstText(a) + ", required " + display.Number(a.RequiredSafetyFactor, 3) + " (the larger of the minimum factor and the factor that meets the failure-probability target)"},
		{"Failure probability", failureText(a) + " (Weibull modulus " + display.Stated(a.Glass.WeibullModulus.Value) + ")"},
		{"External load at the coldest", u.pressure(a.ExternalLoadPa) + " (outside minus inside)"},
		{"Implosion safety factor", implosionText(a) + " on the knocked-down buckling pressure"},
	}, 1)
}

// burstText is the nominal burst safety factor, and the weakest permitted
// unit's beside it, as the findings word them.
func burstText(a *hazards.Assessment) string {
	s := display.ValueOf(a, hazards.CriterionBurst)
	if ws := a.WorstStrength; ws != nil && ws.OverPa > 0 {
		s += "; weakest permitted unit (walls at their thinnest, tolerances stacked) " + display.ValueOf(a, hazards.CriterionBurstWorst)
	}
	return s
}

// failureText is the failure probability as the findings word it, over
// the service life.
func failureText(a *hazards.Assessment) string {
	s := display.ValueOf(a, hazards.CriterionFailure)
	if !a.HasBurstLoad() {
		return s
	}
	return s + " per unit over " + display.Stated(a.Design.ServiceLifeYears) + " years"
}

// implosionText is the implosion safety factor as the findings word it.
func implosionText(a *hazards.Assessment) string {
	return display.ValueOf(a, hazards.CriterionImplosion)
}

// limits prints the maximum safe temperature and fill.
func (w *assessmentWriter) limits() {
	d, a, u := w.d, w.a, w.u
	ms := a.MaxSafe
	d.heading("Maximum safe temperature and fill")
	d.lead("The largest temperature and the largest fill that still meet the burst, failure-probability and ullage criteria, found by root-finding on the vessel model.")
	tText := u.temperature(ms.TemperatureK) + ", limited by " + ms.TemperatureLimitBy
	switch ms.TemperatureBound {
	case hazards.BoundAbove:
		tText = "above " + u.temperature(ms.TemperatureK) + ": the criteria still hold at the top of the searched range, so the limit lies outside it"
	case hazards.BoundBelow:
		tText = "below " + u.temperature(ms.TemperatureK) + ": the " + ms.TemperatureLimitBy + " criterion already fails at the bottom of the searched range, so no temperature in it is safe"
	}
	fText := u.mass(ms.FillMassKg) + " at the hottest temperature (the design has " + u.mass(a.Design.FillMassKg) + ")"
	switch ms.FillBound {
	case hazards.BoundAbove:
		fText = "not limited: even " + u.mass(ms.FillMassKg) + ", the most the vessel holds as liquid at the sealing temperature, meets the criteria (the limit lies outside the searched range)"
	case hazards.BoundBelow:
		fText = "none: even the smallest fill searched (" + u.mass(ms.FillMassKg) + ") fails at the hottest temperature (the limit lies outside the searched range)"
	}
	d.keyValues([][2]string{{"Maximum safe temperature", tText}, {"Maximum safe fill", fText}}, 1)
}

// rupture prints the energy released if the vessel broke at the hottest
// temperature.
func (w *assessmentWriter) rupture() {
	d, a, u := w.d, w.a, w.u
	r := a.Rupture
	d.heading("Rupture at the hottest temperature")
	d.keyValues([][2]string{
		{"Expansion energy of the vapour space", u.energy(r.GasEnergyJ) + " (Brode, γ = " + display.Stated(hazards.VapourHeatCapacityRatio) + ")"},
		{"Flash fraction", percent(r.FlashFraction, 3) + " of the liquid flashes to vapour on release"},
		{"Energy of the flashed vapour", u.energy(r.FlashEnergyJ)},
		{"Strain energy of compressed liquid", u.energy(r.LiquidStrainEnergyJ)},
		{"Stored energy, total", u.energy(r.StoredEnergyJ)},
	}, 1)
}

// zoneName says where an exposure was found.
func zoneName(z hazards.Zone) string {
	switch z {
	case hazards.NearField:
		return "near field, beside the breakage"
	case hazards.FarField:
		return "far field"
	}
	return "whole room, well mixed"
}

// release prints the exposure after a breakage and the concentration
// chart.
func (w *assessmentWriter) release() {
	d, a, u := w.d, w.a, w.u
	r := a.Release
	d.heading("Release into the room")
	d.lead(fmt.Sprintf("The whole fill (%s) is taken to evaporate at once into the room described in the inputs. The highest of the well-mixed room and the near field around the breakage is reported; the peak is the highest average over %s (the shortest the models resolve), and the near field is never averaged over less, the time it takes to mix.",
		u.mass(r.MassKg), fmt.Sprintf("%d s", hazards.PeakAveragingS)))
	row := func(name string, e hazards.Exposure) []cell {
		return []cell{{text: name}, {text: display.Number(e.PPM, 3) + " ppm", bold: true}, {text: display.Number(e.MgM3, 3) + " mg/m³"}, {text: zoneName(e.Zone)}}
	}
	lfl := "not flammable"
	if a.Fluid.Flammability.LFLPercent != nil {
		lfl = display.Number(r.PercentLFL, 3) + " % of the LFL (" + display.Number(a.Fluid.Flammability.LFLPercent.Value, 3) + " % by volume)"
	}
	d.drawTable(table{cols: []col{{"Measure", 1.6, 'L'}, {"ppm", 1, 'R'}, {"mg/m³", 1.1, 'R'}, {"Where", 2, 'L'}}, rows: [][]cell{
		row("Peak", r.Peak), row("15-minute average", r.STEL), row("8-hour time-weighted average", r.TWA8h),
	}, zebra: true, keep: 3})
	d.drawTable(exposureTable(a))
	d.note(exposureTableNote(a))
	tc := display.Number(r.RoomTimeConstantS/3600, 3) + " h"
	if r.RoomTimeConstantS >= 1e9 {
		tc = "no ventilation: the vapour stays"
	}
	d.keyValues([][2]string{{"Peak against the LFL", lfl}, {"Room time constant", tc + " (e-folding time of the well-mixed room)"}}, 1)
	d.space(1)
	w.concentrationChart()
}

// exposureTable lists every applicable limit with its own averaging
// period, the average over it, its share and the one that governs each
// kind, occupational and public sets side by side; a kind with no
// published limit, and a set that gives no number (none published, not
// checked, not recommended), is listed in words.
func exposureTable(a *hazards.Assessment) table {
	var rows [][]cell
	for _, f := range a.Findings {
		if f.NotApplicable == hazards.ReasonNoPublishedLimit {
			rows = append(rows, []cell{{text: display.LimitSetShort(hazards.LimitSetUSOccupational)}, {text: strings.TrimPrefix(f.Criterion, "exposure-")}, {text: display.ReasonWords(hazards.ReasonNoPublishedLimit), dim: true}, {}, {}, {}, {}, {}})
		}
	}
	for _, set := range a.Release.LimitSets {
		for _, l := range a.Release.Limits {
			if l.Set != set {
				continue
			}
			period := display.Number(l.Exposure.AveragingS/60, 3) + " min"
			if l.Exposure.AveragingS <= hazards.PeakAveragingS {
				period = "peak (1 min)"
			}
			avg := display.Number(l.Exposure.PPM, 3)
			if l.Exposure.Bounded {
				avg = "≤ " + avg
			}
			g := ""
			if l.Governs {
				g = "governs"
			}
			name := l.Name
			if l.Standing == "interim" || l.Standing == "proposed" {
				name += " (" + l.Standing + ")"
			}
			rows = append(rows, []cell{{text: display.LimitSetShort(l.Set)}, {text: l.Kind, bold: l.Governs}, {text: name, bold: l.Governs}, {text: display.Stated(l.PPM)}, {text: period},
				{text: avg, bold: l.Governs}, {text: display.Number(100*l.Share, 3) + " %", bold: l.Governs}, {text: g, bold: true}})
		}
		for _, n := range a.Release.LimitNotes {
			if n.Set == set {
				rows = append(rows, []cell{{text: display.LimitSetShort(n.Set)}, {text: n.Name}, {text: display.ReasonWords(n.Reason), dim: true}, {}, {}, {}, {}, {}})
			}
		}
	}
	return table{cols: []col{{"Set", 0.9, 'L'}, {"Kind", 0.7, 'L'}, {"Limit", 1.6, 'L'}, {"ppm", 0.6, 'R'}, {"Averaged over", 0.9, 'R'},
		{"Average, ppm", 0.9, 'R'}, {"Share", 0.7, 'R'}, {"", 0.7, 'L'}}, rows: rows, size: 7.5, zebra: true, keep: 2}
}

// exposureTableNote says how the table was made.
func exposureTableNote(a *hazards.Assessment) string {
	b := a.Release.Bound
	var names []string
	for _, s := range a.Release.LimitSets {
		names = append(names, hazards.LimitSetName(s))
	}
	sets := "Limit sets applied: " + strings.Join(names, "; ") + "."
	if len(a.Design.Criteria.LimitSets) == 0 {
		sets = "Limit sets applied (the default for a consumer product, as the design names none): " + strings.Join(names, "; ") + "."
	}
	return sets + " Each limit is averaged over its own period as its body defines it; within each kind the limit with the largest share of its limit governs. " +
		"Public benchmarks (AEGL, PAC) protect the general public, children included, for a single exposure: each is averaged over its own duration for a person present throughout; AEGL-2 is the fail line, AEGL-1 the caution line, and the peak is held to AEGL-3. " +
		"Every concentration is held to the physical bound, " + display.Number(b.PPM, 3) + " ppm (" + b.By + "); a value marked ≤ is that bound."
}
