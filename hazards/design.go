package hazards

import (
	"fmt"
	"math"
	"strings"
	"unicode/utf8"
)

// Design is everything a review needs to know about one revision of a
// sealed device. SI units throughout; field names carry the unit.
type Design struct {
	// Fluid names the working liquid: a library ID, name, synonym or CAS.
	Fluid string `json:"fluid"`
	// FillMassKg is the nominal fill; FillMassToleranceKg its ± tolerance.
	FillMassKg          float64 `json:"fill_mass_kg"`
	FillMassToleranceKg float64 `json:"fill_mass_tolerance_kg"`
	// Vessel is the glass envelope.
	Vessel Vessel `json:"vessel"`
	// SealingTemperatureK is the temperature of the fill when the vessel
	// was sealed; ResidualGasPressurePa the partial pressure of air or
	// other non-condensable gas left inside at that temperature (0 for a
	// fully evacuated vessel).
	SealingTemperatureK   float64 `json:"sealing_temperature_k"`
	ResidualGasPressurePa float64 `json:"residual_gas_pressure_pa"`
	// HottestK and ColdestK bound the temperatures the device will meet.
	HottestK float64 `json:"hottest_k"`
	ColdestK float64 `json:"coldest_k"`
	// AmbientPressurePa is the outside pressure (101325 Pa at sea level).
	AmbientPressurePa float64 `json:"ambient_pressure_pa"`
	// Glass names a catalogue glass by ID, or carries a custom one.
	Glass GlassChoice `json:"glass"`
	// ServiceLifeYears is the intended life of the product;
	// HoursAtHottest the total time over that life spent at the hottest
	// temperature, the load duration used for static fatigue.
	ServiceLifeYears float64 `json:"service_life_years"`
	HoursAtHottest   float64 `json:"hours_at_hottest"`
	// Room is the release scenario after a breakage.
	Room Room `json:"room"`
	// Criteria are the review's pass marks.
	Criteria Criteria `json:"criteria"`
	// ThermalShock is the largest sudden temperature change the device may
	// meet; the zero value means no thermal shock is assessed.
	ThermalShock ThermalShock `json:"thermal_shock,omitzero"`
	// SealStress is the residual stress measured at the seal; the zero
	// value means none is given.
	SealStress SealStress `json:"seal_stress,omitzero"`
}

// GlassChoice is either a catalogue glass (ID) or a custom glass.
type GlassChoice struct {
	ID     string `json:"id"`
	Custom *Glass `json:"custom,omitempty"`
}

// Part shapes.
const (
	ShapeSphere = "sphere"
	ShapeTube   = "tube"
)

// Vessel is the glass envelope: its internal volume and the parts that
// carry the pressure.
type Vessel struct {
	// InternalVolumeM3 is the measured internal volume; 0 means compute it
	// from the parts. VolumeToleranceM3 is its ± tolerance.
	InternalVolumeM3  float64 `json:"internal_volume_m3"`
	VolumeToleranceM3 float64 `json:"volume_tolerance_m3"`
	// Parts are the spheres and tubes of the envelope; at least one.
	Parts []Part `json:"parts"`
}

// Part is one sphere or tube of the envelope. A tube is treated as a
// closed cylinder of the given length (its ends are spheres or other parts).
type Part struct {
	Name           string  `json:"name"`
	Shape          string  `json:"shape"`
	OuterDiameterM float64 `json:"outer_diameter_m"`
	WallThicknessM float64 `json:"wall_thickness_m"`
	WallToleranceM float64 `json:"wall_tolerance_m"`
	LengthM        float64 `json:"length_m"`
}

// Room is the release scenario: the room a broken device empties into.
type Room struct {
	// PresetID names the preset the values came from, or "" for custom.
	PresetID          string  `json:"preset_id"`
	VolumeM3          float64 `json:"volume_m3"`
	AirChangesPerHour float64 `json:"air_changes_per_hour"`
	// MixingFactor k ≥ 1 divides the ventilation rate to allow for
	// imperfect mixing (1 = perfectly mixed).
	MixingFactor float64 `json:"mixing_factor"`
	// NearFieldRadiusM and NearFieldAirSpeed set the two-zone model's
	// near-field hemisphere around the breakage and the air speed across
	// its surface (m/s).
	NearFieldRadiusM  float64 `json:"near_field_radius_m"`
	NearFieldAirSpeed float64 `json:"near_field_air_speed_m_s"`
	// ExposureMinutes is how long a person stays after the breakage.
	ExposureMinutes float64 `json:"exposure_minutes"`
}

// Criteria are the review's pass marks. DefaultCriteria documents the
// defaults and their grounds.
type Criteria struct {
	MinBurstSafetyFactor     float64 `json:"min_burst_safety_factor"`
	MinImplosionSafetyFactor float64 `json:"min_implosion_safety_factor"`
	MaxFailureProbability    float64 `json:"max_failure_probability"`
	MinUllagePercent         float64 `json:"min_ullage_percent"`
	MaxFractionOfLimit       float64 `json:"max_fraction_of_limit"`
	MaxPercentLFL            float64 `json:"max_percent_lfl"`
	// LimitBodies lists the bodies whose limits apply (NIOSH, OSHA, EPA,
	// AIHA, ACGIH); empty means all. Each limit is averaged over its own
	// period and, for each kind, the largest share of its limit governs.
	LimitBodies []string `json:"limit_bodies"`
	// LimitSets lists the sets of exposure limits that apply, by ID (see
	// LimitSetIDs): LimitSetUSOccupational, LimitSetUSPublicAcute,
	// LimitSetEUOccupational, LimitSetUKWEL, LimitSetDEAGW. Empty means
	// DefaultLimitSets, the public acute benchmarks and the US
	// occupational limits; the field is then left out of the file and of
	// the fingerprint, so designs written before it existed are unchanged.
	LimitSets []string `json:"limit_sets,omitzero"`
}

// DefaultCriteria returns the review criteria used when a design sets
// none, each with its grounds in DefaultCriteriaGrounds.
func DefaultCriteria() Criteria {
	return Criteria{
		MinBurstSafetyFactor:     4,
		MinImplosionSafetyFactor: 4,
		MaxFailureProbability:    1e-4,
		MinUllagePercent:         5,
		MaxFractionOfLimit:       1,
		MaxPercentLFL:            25,
	}
}

// DefaultCriteriaGrounds says where each default criterion comes from.
var DefaultCriteriaGrounds = map[string]string{
	CriterionMinBurstSafetyFactor:     "4 on the long-term characteristic burst pressure: common practice for brittle pressure-bearing glass, which has no yield to warn before failure",
	CriterionMinImplosionSafetyFactor: "4 on the knocked-down buckling pressure: common practice, matching the burst criterion",
	"max_failure_probability":         "1 in 10 000 units over the service life: common practice for consumer glass articles; set it to the firm's own target",
	CriterionMinUllagePercent:         "5 % vapour space at the hottest temperature: mirrors the 0.95 factor on liquid density in the UN packing instruction P200 filling rule for low-pressure liquefied gases (UN Model Regulations, P200 (5)(b))",
	CriterionMaxFractionOfLimit:       "1.0: the exposure must not exceed the governing published limit (each limit averaged over its own period; the largest share of its limit governs)",
	CriterionMaxPercentLFL:            "25 % of the LFL: common practice for an atmosphere kept safely below flammability (NFPA 69 uses 25 % LFL for combustible-concentration control, from memory)",
}

// Physical floors of the inputs: below them the models have no meaning
// (and a value such as a denormal fill would only give NaN downstream).
const (
	// MinFillMassKg is the smallest fill accepted, 1 mg: the weighing
	// resolution of a filling line is coarser than this (common practice).
	MinFillMassKg = 1e-6
	// MinVolumeM3 is the smallest measured internal volume accepted, 1 µL.
	MinVolumeM3 = 1e-9
	// MaxFluidNameLength and MaxPartNameLength bound the fluid's name and
	// a part's name, in characters.
	MaxFluidNameLength = 200
	MaxPartNameLength  = 100
)

// Validate checks every input of the design and returns the first problem
// as an *InputError naming the field, the value and what is acceptable.
// Bounds (SI): fill 1 mg to 10 kg; measured volume 0 or 1 µL to 0.1 m³;
// outer diameter 1 mm to 2 m, wall 10 µm to 0.1 m, tube length 0.1 mm to
// 5 m; temperatures 20 to 800 K (sealing to 600 K); residual gas 0 to
// 200 kPa; ambient 50 to 120 kPa; service life 0.01 to 100 years; hours at
// the hottest 0.01 h to the service life; room 0.01 to 10⁶ m³, 0 to 100
// air changes per hour, mixing factor 1 to 20, near-field radius 1 cm to
// 5 m, air speed 5 mm/s to 5 m/s, exposure 1 to 1440 minutes; a known room
// preset or none. It checks ranges only; the fluid-dependent checks (temperatures above
// the freezing point, a fill the vessel can hold) happen in Assess.
func (d *Design) Validate() error {
	c := &checker{}
	if strings.TrimSpace(d.Fluid) == "" {
		c.fail(FieldFluid, `""`, "name a fluid from the library")
	}
	c.text(FieldFluid, d.Fluid, MaxFluidNameLength)
	c.number(FieldFillMass, d.FillMassKg, MinFillMassKg, 10, "kg")
	c.number(FieldFillMassTolerance, d.FillMassToleranceKg, 0, d.FillMassKg, "kg (not more than the fill)")
	d.Vessel.validate(c)
	c.number(FieldSealingTemperature, d.SealingTemperatureK, 20, 600, "K")
	c.number(FieldResidualGasPressure, d.ResidualGasPressurePa, 0, 2e5, "Pa")
	c.number(FieldHottest, d.HottestK, 20, 800, "K")
	c.number(FieldColdest, d.ColdestK, 20, 800, "K")
	if c.err == nil && d.ColdestK > d.HottestK {
		first := c.err
		c.fail(FieldColdest, d.ColdestK, "must not be above %s (%g K)", FieldHottest, d.HottestK)
		c.rule(first, RuleAtMost, 0, d.HottestK, "K", "the hottest temperature")
	}
	c.number(FieldAmbientPressure, d.AmbientPressurePa, 5e4, 1.2e5, "Pa")
	if d.Glass.Custom != nil {
		if err := d.Glass.Custom.Validate(FieldGlassCustom); err != nil && c.err == nil {
			c.err = err
		}
	} else if strings.TrimSpace(d.Glass.ID) == "" {
		c.fail(FieldGlassID, `""`, "choose a glass from the catalogue or give a custom one")
	}
	c.number(FieldServiceLife, d.ServiceLifeYears, 0.01, 100, "years")
	c.number(FieldHoursAtHottest, d.HoursAtHottest, 0.01, 876600, "hours")
	if c.err == nil && d.HoursAtHottest > d.ServiceLifeYears*8766 {
		first := c.err
		c.fail(FieldHoursAtHottest, d.HoursAtHottest, "cannot exceed the service life (%g h)", d.ServiceLifeYears*8766)
		c.rule(first, RuleAtMost, 0, d.ServiceLifeYears*8766, "h", "the service life")
	}
	if err := d.Room.Validate(FieldRoom); err != nil && c.err == nil {
		c.err = err
	}
	d.Criteria.validate(c)
	d.ThermalShock.validate(c)
	d.SealStress.validate(c, d.Vessel.Parts)
	return c.err
}

func (v *Vessel) validate(c *checker) {
	c.number(FieldInternalVolume, v.InternalVolumeM3, 0, 0.1, "m³ (0 means compute from the parts)")
	if c.err == nil && v.InternalVolumeM3 != 0 && v.InternalVolumeM3 < MinVolumeM3 {
		c.fail(FieldInternalVolume, v.InternalVolumeM3, "must be 0 (compute from the parts) or from %g to 0.1 m³", MinVolumeM3)
	}
	if len(v.Parts) == 0 {
		c.fail(FieldParts, "[]", "describe at least one sphere or tube")
	}
	if len(v.Parts) > 50 {
		c.fail(FieldParts, len(v.Parts), "at most 50 parts")
	}
	for i, p := range v.Parts {
		if c.err == nil && p.fine() {
			continue // every check below passes: no field names to build
		}
		f := PartField(i, "") + "."
		c.text(f+PartName, p.Name, MaxPartNameLength)
		if p.Shape != ShapeSphere && p.Shape != ShapeTube {
			c.fail(f+PartShape, fmt.Sprintf("%q", p.Shape), "must be %q or %q", ShapeSphere, ShapeTube)
		}
		c.number(f+PartOuterDiameter, p.OuterDiameterM, 1e-3, 2, "m")
		c.number(f+PartWallThickness, p.WallThicknessM, 1e-5, 0.1, "m")
		if c.err == nil && p.WallThicknessM >= p.OuterDiameterM/2 {
			first := c.err
			c.fail(f+PartWallThickness, p.WallThicknessM, "must be less than the outer radius (%g m)", p.OuterDiameterM/2)
			c.rule(first, RuleBelow, 0, p.OuterDiameterM/2, "m", "the outer radius")
		}
		c.number(f+PartWallTolerance, p.WallToleranceM, 0, p.WallThicknessM*0.5, "m (at most half the wall)")
		if p.Shape == ShapeTube {
			c.number(f+PartLength, p.LengthM, 1e-4, 5, "m")
		} else {
			c.number(f+PartLength, p.LengthM, 0, 0, "m (a sphere has no length)")
		}
	}
	if c.err == nil && v.InternalVolumeM3 == 0 && v.PartsVolume() <= 0 {
		c.fail(FieldParts, "", "give the parts an internal volume")
	}
	if c.err == nil {
		c.number(FieldVolumeTolerance, v.VolumeToleranceM3, 0, 0.5*math.Max(v.InternalVolumeM3, v.PartsVolume()), "m³ (at most half the internal volume)")
	}
}

// fine reports whether the part passes every check Vessel.validate makes
// of it, each the exact opposite of that check's failure.
func (p *Part) fine() bool {
	if utf8.RuneCountInString(p.Name) > MaxPartNameLength || (p.Shape != ShapeSphere && p.Shape != ShapeTube) {
		return false
	}
	if !inRange(p.OuterDiameterM, 1e-3, 2) || !inRange(p.WallThicknessM, 1e-5, 0.1) || p.WallThicknessM >= p.OuterDiameterM/2 ||
		!inRange(p.WallToleranceM, 0, p.WallThicknessM*0.5) {
		return false
	}
	if p.Shape == ShapeTube {
		return inRange(p.LengthM, 1e-4, 5)
	}
	return inRange(p.LengthM, 0, 0)
}

// Validate checks a release scenario; field prefixes error field names.
func (r *Room) Validate(field string) error {
	if r.PresetID != "" {
		if _, err := LookupRoomPreset(r.PresetID); err != nil {
			c := &checker{}
			c.fail(field+"."+RoomKeyPreset, fmt.Sprintf("%q", r.PresetID), "must name a room preset (%s) or be \"\" for a room of your own", roomPresetIDs())
			return c.err
		}
	}
	return r.validateRanges(field)
}

// validateRanges is Validate without the preset check, for the presets
// themselves.
func (r *Room) validateRanges(field string) error {
	c := &checker{}
	// Each name is built only for a value that fails its check.
	if !inRange(r.VolumeM3, 0.01, 1e6) {
		c.number(field+"."+RoomKeyVolume, r.VolumeM3, 0.01, 1e6, "m³")
	}
	if !inRange(r.AirChangesPerHour, 0, 100) {
		c.number(field+"."+RoomKeyAirChanges, r.AirChangesPerHour, 0, 100, "per hour")
	}
	if !inRange(r.MixingFactor, 1, 20) {
		c.number(field+"."+RoomKeyMixingFactor, r.MixingFactor, 1, 20, "(1 = perfectly mixed)")
	}
	if !inRange(r.NearFieldRadiusM, 0.01, 5) {
		c.number(field+"."+RoomKeyNearFieldRadius, r.NearFieldRadiusM, 0.01, 5, "m")
	}
	if !inRange(r.NearFieldAirSpeed, 0.005, 5) {
		c.number(field+"."+RoomKeyNearFieldAirSpeed, r.NearFieldAirSpeed, 0.005, 5, "m/s")
	}
	if !inRange(r.ExposureMinutes, 1, 1440) {
		c.number(field+"."+RoomKeyExposureMinutes, r.ExposureMinutes, 1, 1440, "minutes")
	}
	if c.err == nil && NearFieldVolume(r.NearFieldRadiusM) >= r.VolumeM3/2 {
		c.fail(field+"."+RoomKeyNearFieldRadius, r.NearFieldRadiusM, "the near-field hemisphere must be less than half the room")
	}
	return c.err
}

func (cr *Criteria) validate(c *checker) {
	c.number(FieldMinBurstSafetyFactor, cr.MinBurstSafetyFactor, 1, 100, "")
	c.number(FieldMinImplosionSafetyFactor, cr.MinImplosionSafetyFactor, 1, 100, "")
	c.number(FieldMaxFailureProbability, cr.MaxFailureProbability, 1e-12, 0.5, "")
	c.number(FieldMinUllagePercent, cr.MinUllagePercent, 0, 50, "%")
	c.number(FieldMaxFractionOfLimit, cr.MaxFractionOfLimit, 0.01, 1, "(fraction of the governing limit)")
	c.number(FieldMaxPercentLFL, cr.MaxPercentLFL, 1, 100, "% of LFL")
	for i, b := range cr.LimitBodies {
		if !knownBodies[b] {
			c.fail(ItemField(FieldLimitBodies, i), fmt.Sprintf("%q", b), "must be one of NIOSH, OSHA, EPA, AIHA, ACGIH")
		}
	}
	seen := map[string]bool{}
	for i, id := range cr.LimitSets {
		field := ItemField(FieldLimitSets, i)
		if !knownLimitSet(id) {
			c.fail(field, fmt.Sprintf("%q", id), "must be one of %s", strings.Join(LimitSetIDs(), ", "))
		}
		if seen[id] {
			c.fail(field, fmt.Sprintf("%q", id), "is listed twice")
		}
		seen[id] = true
	}
}

// roomPresetIDs lists the room presets' IDs for a message.
func roomPresetIDs() string {
	all, err := RoomPresets()
	if err != nil {
		return "none available"
	}
	ids := make([]string, len(all))
	for i, p := range all {
		ids[i] = p.ID
	}
	return strings.Join(ids, ", ")
}

var knownBodies = map[string]bool{"NIOSH": true, "OSHA": true, "EPA": true, "AIHA": true, "ACGIH": true}

// PartsVolume returns the sum of the parts' internal volumes in m³
// (spheres π dᵢ³/6, tubes π dᵢ² L/4); joints are not subtracted.
func (v *Vessel) PartsVolume() float64 {
	sum := 0.0
	for _, p := range v.Parts {
		sum += p.InternalVolume()
	}
	return sum
}

// Volume returns the internal volume used for the fill: the measured one
// when given, otherwise the parts' volume.
func (v *Vessel) Volume() float64 {
	if v.InternalVolumeM3 > 0 {
		return v.InternalVolumeM3
	}
	return v.PartsVolume()
}

// InnerRadius returns the inner radius in m.
func (p *Part) InnerRadius() float64 { return p.OuterDiameterM/2 - p.WallThicknessM }

// InternalVolume returns the part's internal volume in m³.
func (p *Part) InternalVolume() float64 {
	ri := p.InnerRadius()
	if p.Shape == ShapeSphere {
		return 4.0 / 3.0 * math.Pi * ri * ri * ri
	}
	return math.Pi * ri * ri * p.LengthM
}

// OuterArea returns the part's outer surface area in m².
func (p *Part) OuterArea() float64 {
	ro := p.OuterDiameterM / 2
	if p.Shape == ShapeSphere {
		return 4 * math.Pi * ro * ro
	}
	return 2 * math.Pi * ro * p.LengthM
}
