package fluids

import (
	"fmt"
	"math"
	"strings"
)

// FieldError names the field of a fluid record that failed validation,
// the value found and what is acceptable. It wraps ErrInvalidFluid.
type FieldError struct {
	Fluid string // fluid ID, or "" when the ID itself is missing
	Field string // JSON field path, e.g. "vapour_pressure[1].t_max_k"
	Value string // the offending value as text
	Want  string // what is acceptable
}

func (e *FieldError) Error() string {
	who := e.Fluid
	if who == "" {
		who = "fluid"
	}
	return fmt.Sprintf("%s: field %s = %s: %s", who, e.Field, e.Value, e.Want)
}

// Unwrap makes errors.Is(err, ErrInvalidFluid) true.
func (e *FieldError) Unwrap() error { return ErrInvalidFluid }

type validator struct {
	id  string
	err error
}

func (v *validator) fail(field string, value any, want string, args ...any) {
	if v.err != nil {
		return
	}
	v.err = &FieldError{Fluid: v.id, Field: field, Value: fmt.Sprint(value), Want: fmt.Sprintf(want, args...)}
}

func finite(x float64) bool { return !math.IsNaN(x) && !math.IsInf(x, 0) }

func (v *validator) number(field string, x, lo, hi float64, unit string) {
	if !finite(x) || x < lo || x > hi {
		v.fail(field, x, "must be a number from %g to %g %s", lo, hi, unit)
	}
}

func (v *validator) sourced(field string, s Sourced, lo, hi float64, unit string) {
	v.number(field+".value", s.Value, lo, hi, unit)
	v.source(field+".source", s.Source)
}

func (v *validator) source(field, s string) {
	if strings.TrimSpace(s) == "" || strings.TrimSpace(s) == "..." {
		v.fail(field, fmt.Sprintf("%q", s), "every value needs its source (a publication, \"common practice\" or \"... (from memory)\")")
	}
}

// Validate checks a fluid record: identity present, every number finite,
// in a physical range and with a source; a critical point above the normal
// boiling point above the freezing point; vapour-pressure pieces of a known
// form, ordered, and together with the hand-over to the critical point
// giving a pressure that rises monotonically from the freezing point to
// Tc and reproduces the stated normal boiling point within 2 K; limits
// with a known averaging and a positive value. The first problem found is
// returned as a *FieldError wrapping ErrInvalidFluid. Validate applies
// the rules of the correlation route, which every user fluid takes.
func (f *Fluid) Validate() error { return f.validate(nil) }

// validate checks the record; with ref, the record is paired with a
// reference equation of state, and the correlation fields
// (vapour_pressure, liquid_density_kg_m3, liquid_density_correlation,
// heat_of_vaporisation_j_mol) become optional — checked only where given
// — while the record's constants must agree with the equation's.
func (f *Fluid) validate(ref *referenceEOS) error {
	v := &validator{id: f.ID}
	if f.Format != FormatFluid {
		v.fail("format", fmt.Sprintf("%q", f.Format), "must be %q", FormatFluid)
	}
	if strings.TrimSpace(f.ID) == "" {
		v.fail("id", `""`, "a fluid needs a short identifier")
	}
	if strings.TrimSpace(f.Name) == "" {
		v.fail("name", `""`, "a fluid needs a name")
	}
	v.sourced("molar_mass_kg_mol", f.MolarMass, 0.002, 1.0, "kg/mol")
	v.sourced("critical_temperature_k", f.CriticalTemperature, 5, 1500, "K")
	v.sourced("critical_pressure_pa", f.CriticalPressure, 1e5, 1e8, "Pa")
	v.sourced("critical_density_kg_m3", f.CriticalDensity, 10, 2000, "kg/m³")
	v.sourced("acentric_factor", f.AcentricFactor, -0.5, 1.5, "")
	v.sourced("normal_boiling_point_k", f.NormalBoilingPoint, 4, 1000, "K")
	v.sourced("freezing_point_k", f.FreezingPoint, 1, 1000, "K")
	if v.err != nil {
		return v.err
	}
	tc, tb, tf := f.CriticalTemperature.Value, f.NormalBoilingPoint.Value, f.FreezingPoint.Value
	if tb >= tc {
		v.fail("critical_temperature_k.value", tc, "must be above the normal boiling point %g K", tb)
	}
	if tf >= tb {
		v.fail("freezing_point_k.value", tf, "must be below the normal boiling point %g K", tb)
	}
	if f.CriticalPressure.Value <= 101325 {
		v.fail("critical_pressure_pa.value", f.CriticalPressure.Value, "must exceed one atmosphere (101325 Pa) for a fluid that boils below Tc")
	}
	ld := f.LiquidDensity
	if ref == nil || ld != (SourcedAt{}) {
		v.number("liquid_density_kg_m3.value", ld.Value, 100, 3000, "kg/m³")
		v.number("liquid_density_kg_m3.temperature_k", ld.TemperatureK, tf, tc*0.95, "K (between the freezing point and 0.95 Tc)")
		v.source("liquid_density_kg_m3.source", ld.Source)
		if v.err == nil && ld.Value <= f.CriticalDensity.Value*1.2 {
			v.fail("critical_density_kg_m3.value", f.CriticalDensity.Value, "must be well below the liquid density %g kg/m³", ld.Value)
		}
	}
	hv := f.HeatOfVaporisation
	if ref == nil || hv != (SourcedAt{}) {
		v.number("heat_of_vaporisation_j_mol.value", hv.Value, 1000, 100000, "J/mol")
		v.number("heat_of_vaporisation_j_mol.temperature_k", hv.TemperatureK, tf, tc*0.99, "K")
		v.source("heat_of_vaporisation_j_mol.source", hv.Source)
	}
	cp := f.LiquidHeatCapacity
	v.number("liquid_heat_capacity_j_mol_k.value", cp.Value, 10, 1000, "J/(mol·K)")
	v.number("liquid_heat_capacity_j_mol_k.temperature_k", cp.TemperatureK, tf, tc, "K")
	v.source("liquid_heat_capacity_j_mol_k.source", cp.Source)
	if ref == nil || len(f.VapourPressure) > 0 {
		v.vapourPressure(f)
	}
	v.liquidDensityCorrelation(f)
	v.flammability(f.Flammability)
	v.limits(f)
	for i, u := range f.Uncertainty {
		field := fmt.Sprintf("uncertainty[%d]", i)
		if !knownProperty[u.Property] {
			v.fail(field+".property", fmt.Sprintf("%q", u.Property), "must name a property: vapour_pressure, liquid_density, vapour_density, compressed_liquid_density, heat_of_vaporisation or liquid_heat_capacity")
		}
		v.number(field+".percent", u.Percent, 0, 100, "%")
		v.source(field+".source", u.Source)
	}
	if v.err != nil {
		return v.err
	}
	if ref != nil {
		v.agreesWithEOS(f, ref)
		return v.err
	}
	s, err := newSubstance(f)
	if err != nil {
		return err
	}
	v.consistency(f, s)
	return v.err
}

func (v *validator) vapourPressure(f *Fluid) {
	if len(f.VapourPressure) == 0 {
		v.fail("vapour_pressure", "[]", "needs at least one correlation piece")
		return
	}
	if len(f.VapourPressure) > 8 {
		v.fail("vapour_pressure", len(f.VapourPressure), "at most 8 pieces are accepted")
		return
	}
	tc, tf := f.CriticalTemperature.Value, f.FreezingPoint.Value
	for i, p := range f.VapourPressure {
		field := fmt.Sprintf("vapour_pressure[%d]", i)
		if p.Form != FormAntoine && p.Form != FormWagner && p.Form != FormDIPPR101 {
			v.fail(field+".form", fmt.Sprintf("%q", p.Form), "must be %q, %q or %q", FormAntoine, FormWagner, FormDIPPR101)
			return
		}
		if p.Form != FormDIPPR101 && p.E != 0 {
			v.fail(field+".e", p.E, "is only used by the %q form", FormDIPPR101)
		}
		if p.Form == FormDIPPR101 && !(p.E >= -6 && p.E <= 6) {
			v.fail(field+".e", p.E, "must be an exponent from -6 to 6")
		}
		for name, x := range map[string]float64{"a": p.A, "b": p.B, "c": p.C, "d": p.D} {
			if !finite(x) || math.Abs(x) > 1e7 {
				v.fail(field+"."+name, x, "must be a finite coefficient")
			}
		}
		v.number(field+".t_min_k", p.TMinK, tf*0.5, tc, "K")
		v.number(field+".t_max_k", p.TMaxK, p.TMinK+1, tc*1.01, "K (above t_min_k, not beyond Tc)")
		v.source(field+".source", p.Source)
		if p.Form == FormAntoine && p.TMinK+p.C <= 0 {
			v.fail(field+".c", p.C, "makes T + C non-positive inside the range (T from %g K)", p.TMinK)
		}
		if i > 0 && p.TMinK <= f.VapourPressure[i-1].TMinK {
			v.fail(field+".t_min_k", p.TMinK, "pieces must be sorted by t_min_k with distinct starts")
		}
		if i > 0 && p.TMaxK <= f.VapourPressure[i-1].TMaxK {
			v.fail(field+".t_max_k", p.TMaxK, "each piece must reach higher than the one before")
		}
		if v.err != nil {
			return
		}
	}
}

func (v *validator) liquidDensityCorrelation(f *Fluid) {
	c := f.LiquidDensityCorrelation
	if c == nil || v.err != nil {
		return
	}
	const field = "liquid_density_correlation"
	if c.Form != FormDIPPR105 && c.Form != FormDIPPR116 {
		v.fail(field+".form", fmt.Sprintf("%q", c.Form), "must be %q or %q", FormDIPPR105, FormDIPPR116)
		return
	}
	for name, x := range map[string]float64{"a": c.A, "b": c.B, "c": c.C, "d": c.D, "e": c.E, "tc_k": c.TcK} {
		if !finite(x) || math.Abs(x) > 1e6 {
			v.fail(field+"."+name, x, "must be a finite coefficient")
		}
	}
	tc, tf := f.CriticalTemperature.Value, f.FreezingPoint.Value
	v.number(field+".t_min_k", c.TMinK, tf*0.5, tc, "K")
	v.number(field+".t_max_k", c.TMaxK, c.TMinK+1, tc*1.01, "K (above t_min_k, not beyond Tc)")
	v.source(field+".source", c.Source)
	if c.Form == FormDIPPR116 {
		v.number(field+".tc_k", c.TcK, tc*0.98, tc*1.02, "K (the fluid's critical temperature)")
	} else if !(c.B > 0 && c.D > 0 && c.C >= c.TMaxK) {
		v.fail(field, fmt.Sprintf("b=%g c=%g d=%g", c.B, c.C, c.D), "DIPPR 105 needs b > 0, d > 0 and c at or above t_max_k")
	}
	if v.err != nil {
		return
	}
	m := f.MolarMass.Value
	prev := math.Inf(1)
	for i := 0; i <= 100; i++ {
		t := c.TMinK + (c.TMaxK-c.TMinK)*float64(i)/100
		d := c.density(t, m)
		if !finite(d) || d <= 0 || d >= prev {
			v.fail(field, fmt.Sprintf("%.6g kg/m³ at %.2f K", d, t), "the liquid density must fall steadily with temperature over the correlation's range")
			return
		}
		prev = d
	}
	if ref := f.LiquidDensity; ref.TemperatureK >= c.TMinK && ref.TemperatureK <= c.TMaxK {
		if d := c.density(ref.TemperatureK, m); math.Abs(d/ref.Value-1) > 0.03 {
			v.fail(field, fmt.Sprintf("%.6g kg/m³ at %.2f K", d, ref.TemperatureK), "disagrees by more than 3 %% with liquid_density_kg_m3 (%.6g kg/m³)", ref.Value)
		}
	}
}

func (v *validator) flammability(fl Flammability) {
	opt := func(field string, s *Sourced, lo, hi float64, unit string) {
		if s != nil {
			v.sourced(field, *s, lo, hi, unit)
		}
	}
	opt("flammability.lfl_volume_percent", fl.LFLPercent, 0.1, 100, "%")
	opt("flammability.ufl_volume_percent", fl.UFLPercent, 0.1, 100, "%")
	opt("flammability.flash_point_k", fl.FlashPointK, 50, 1000, "K")
	opt("flammability.autoignition_k", fl.AutoignitionK, 200, 1500, "K")
	if fl.Flammable && fl.LFLPercent == nil {
		v.fail("flammability.lfl_volume_percent", "null", "a flammable fluid needs its lower flammability limit")
	}
	if !fl.Flammable && fl.LFLPercent != nil {
		v.fail("flammability.flammable", false, "contradicts the lower flammability limit given")
	}
	if fl.LFLPercent != nil && fl.UFLPercent != nil && fl.UFLPercent.Value <= fl.LFLPercent.Value {
		v.fail("flammability.ufl_volume_percent.value", fl.UFLPercent.Value, "must exceed the LFL %g %%", fl.LFLPercent.Value)
	}
}

var knownProperty = map[string]bool{PropertyVapourPressure: true, PropertyLiquidDensity: true, PropertyVapourDensity: true,
	PropertyCompressedLiquid: true, PropertyHeatOfVaporisation: true, PropertyLiquidHeatCapacity: true}

var knownAveraging = map[string]bool{AveragingTWA: true, AveragingSTEL: true, AveragingCeiling: true, AveragingIDLH: true}

func (v *validator) limits(f *Fluid) {
	for i, l := range f.ExposureLimits {
		field := fmt.Sprintf("exposure_limits[%d]", i)
		if strings.TrimSpace(l.Body) == "" {
			v.fail(field+".body", `""`, "name the body that issued the limit (NIOSH, OSHA, EPA, AIHA, ACGIH …)")
		}
		if strings.TrimSpace(l.Kind) == "" {
			v.fail(field+".kind", `""`, "name the kind of limit (REL, PEL, IDLH …)")
		}
		if !knownAveraging[l.Averaging] {
			v.fail(field+".averaging", fmt.Sprintf("%q", l.Averaging), "must be TWA, STEL, ceiling or IDLH")
		}
		v.number(field+".minutes", l.Minutes, 0, 1440, "minutes")
		v.number(field+".ppm", l.PPM, 1e-6, 1e6, "ppm")
		v.source(field+".source", l.Source)
		if v.err != nil {
			return
		}
	}
}

// consistency checks the assembled correlations: pressure rising with
// temperature from the freezing point to Tc, the stated boiling point
// reproduced, liquid denser than vapour, a sensible Rackett factor.
func (v *validator) consistency(f *Fluid, s *Substance) {
	if z := s.RackettZ(); !(z > 0.1 && z < 0.45) {
		v.fail("critical_density_kg_m3.value", f.CriticalDensity.Value,
			"together with the liquid density it implies a Rackett factor Z_RA = %.3f; expected 0.1 to 0.45", z)
		return
	}
	const n = 400
	tf, tc := s.tMin, s.tc
	sats := make([]Saturation, n+1)
	for i := range sats {
		t := math.Min(tf+(tc-tf)*float64(i)/n, tc)
		sat, err := s.Saturation(t)
		if err != nil {
			v.fail("vapour_pressure", "", "cannot be evaluated at %.2f K: %v", t, err)
			return
		}
		sats[i] = sat
	}
	prev := math.Inf(-1)
	for _, sat := range sats {
		if !finite(sat.PressurePa) || sat.PressurePa <= prev {
			v.fail("vapour_pressure", fmt.Sprintf("%.6g Pa at %.2f K", sat.PressurePa, sat.TemperatureK),
				"the vapour pressure must rise steadily with temperature from the freezing point to the critical point")
			return
		}
		prev = sat.PressurePa
	}
	for _, sat := range sats[:n] {
		if !(sat.LiquidDensity > sat.VapourDensity && sat.VapourDensity > 0) {
			v.fail("critical_density_kg_m3.value", f.CriticalDensity.Value,
				"gives a vapour (%.4g kg/m³) not lighter than the liquid (%.4g kg/m³) at %.2f K", sat.VapourDensity, sat.LiquidDensity, sat.TemperatureK)
			return
		}
	}
	if math.Abs(prev/f.CriticalPressure.Value-1) > 0.05 {
		v.fail("vapour_pressure", fmt.Sprintf("%.6g Pa at Tc", prev), "must end within 5 %% of the critical pressure %g Pa", f.CriticalPressure.Value)
		return
	}
	tb, err := s.SaturationTemperature(101325)
	if err != nil {
		v.fail("vapour_pressure", "", "does not reach one atmosphere: %v", err)
		return
	}
	if math.Abs(tb-f.NormalBoilingPoint.Value) > 2 {
		v.fail("normal_boiling_point_k.value", f.NormalBoilingPoint.Value,
			"disagrees with the vapour-pressure correlation, which boils at %.2f K at 101325 Pa (2 K allowed)", tb)
	}
}

// agreesWithEOS checks that a record and the equation of state paired
// with it describe the same fluid: molar mass within 0.1 %, critical
// temperature within 1 K, critical pressure within 5 %, and the equation
// boiling within 1 K of the record's normal boiling point at 101325 Pa.
// The tolerances allow for rounding and for the handbook values the
// record cites; a wrong pairing misses them by far more.
func (v *validator) agreesWithEOS(f *Fluid, ref *referenceEOS) {
	e := ref.file
	if math.Abs(f.MolarMass.Value/e.MolarMass-1) > 1e-3 {
		v.fail("molar_mass_kg_mol.value", f.MolarMass.Value, "disagrees with the equation of state's %g kg/mol by more than 0.1 %%", e.MolarMass)
	}
	if math.Abs(f.CriticalTemperature.Value-ref.tc) > 2 {
		v.fail("critical_temperature_k.value", f.CriticalTemperature.Value, "disagrees with the equation of state's %g K by more than 2 K", ref.tc)
	}
	if math.Abs(f.CriticalPressure.Value/ref.pc-1) > 0.05 {
		v.fail("critical_pressure_pa.value", f.CriticalPressure.Value, "disagrees with the equation of state's %g Pa by more than 5 %%", ref.pc)
	}
	if v.err != nil {
		return
	}
	s, err := newRefSubstance(f, ref)
	if err != nil {
		v.fail("equation of state", e.Name, "cannot be evaluated: %v", err)
		return
	}
	tb, err := s.SaturationTemperature(101325)
	if err != nil {
		v.fail("normal_boiling_point_k.value", f.NormalBoilingPoint.Value, "the equation of state does not reach one atmosphere: %v", err)
		return
	}
	if math.Abs(tb-f.NormalBoilingPoint.Value) > 1 {
		v.fail("normal_boiling_point_k.value", f.NormalBoilingPoint.Value,
			"disagrees with the equation of state, which boils at %.2f K at 101325 Pa (1 K allowed)", tb)
	}
}
