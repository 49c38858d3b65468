package tolerance

// Result is the outcome of a sampled tolerance study.
//
// Each unit has its own fill, volume, walls and hottest temperature, and
// its own glass strength: a Weibull draw, with the glass's modulus, whose
// scale is the strength of that unit's stressed glass for the load
// duration (hazards.UnitResult's EffectiveStrengthPa, the glass's
// characteristic strength corrected for area and static fatigue). The
// unit's burst safety factor is that strength over its largest hoop stress
// at its hottest temperature, equivalently its own burst overpressure over
// its overpressure; it bursts when this is below 1. This per-unit factor
// differs from the design's hazards.Assessment.BurstSafetyFactor, which
// divides the 63.2 % (characteristic) burst pressure rather than the
// unit's own.
type Result struct {
	// Samples is the number of units drawn and Seed the seed they were
	// drawn with; the other settings that shape the result are kept beside
	// them.
	Samples               int     `json:"samples"`
	Seed                  uint64  `json:"seed"`
	HottestSpreadK        float64 `json:"hottest_spread_k"`
	HottestDistribution   string  `json:"hottest_distribution"`
	DimensionDistribution string  `json:"dimension_distribution"`
	// Inputs are the inputs that varied and their distributions, glass
	// strength last.
	Inputs []Input `json:"inputs"`

	// LiquidFullFraction: units whose liquid-full temperature is below
	// their hottest temperature (no ullage left).
	LiquidFullFraction Proportion `json:"liquid_full_fraction"`
	// BurstFraction: units whose own glass strength is below their hoop
	// stress at their hottest temperature.
	BurstFraction Proportion `json:"burst_fraction"`
	// MeanFailureProbability is the average over the units of the Weibull
	// failure probability given each unit's own pressure and walls
	// (hazards.UnitResult.FailureProbability): the expected burst fraction
	// with the glass strength integrated out exactly. When bursts are too
	// rare to count it is a far more precise estimate than BurstFraction.
	MeanFailureProbability float64 `json:"mean_failure_probability"`
	// ExposureExceedFraction: units whose release, were they to break
	// indoors, would exceed the governing published exposure limit of any
	// criterion (IDLH, ceiling, STEL, 8-hour TWA, each times
	// Criteria.MaxFractionOfLimit). The release scales with the fill mass,
	// so a unit exceeds when its fill is above ExposureFillLimitKg. The
	// lower flammability limit is not counted here. ExposureLimited is
	// false, and the fraction empty, when no published numeric limit
	// applies to the fluid for the chosen bodies.
	ExposureExceedFraction Proportion `json:"exposure_exceed_fraction"`
	ExposureLimited        bool       `json:"exposure_limited"`
	ExposureFillLimitKg    float64    `json:"exposure_fill_limit_kg"`

	// UnsealableUnits could not be made: their fill, as liquid, would not
	// fit at the sealing temperature. They are counted as liquid-full and
	// burst, with a safety factor of 0, and are left out of the pressure
	// percentiles.
	UnsealableUnits int `json:"unsealable_units"`
	// ExtrapolatedUnits were computed with a correlation outside its
	// published range (fluids.Flags.Extrapolated); when not zero the
	// fractions are estimates to confirm by test.
	ExtrapolatedUnits int `json:"extrapolated_units"`

	// PressurePa are percentiles of the absolute internal pressure at each
	// unit's hottest temperature; SafetyFactor of the units' burst safety
	// factors (capped at hazards.SafetyFactorCap for a unit not
	// over-pressurised).
	PressurePa   Percentiles `json:"pressure_pa"`
	SafetyFactor Percentiles `json:"safety_factor"`
	// Histogram counts the burst safety factors of the units under burst
	// load over the range they span (1st to 99th percentile, from 0 when
	// the lowest come near 1), for a chart; units with no load are counted
	// in NoLoad, units outside the range in Below and Above.
	Histogram Histogram `json:"histogram"`

	// Sensitivity ranks the varying inputs by how strongly they move the
	// burst safety factor, strongest first, computed on the first
	// SensitivityUnits units.
	Sensitivity      []Driver `json:"sensitivity"`
	SensitivityUnits int      `json:"sensitivity_units"`
}
