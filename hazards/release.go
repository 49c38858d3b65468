package hazards

import (
	"math"
	"strconv"

	"ullage/fluids/units"
)

// NearFieldMinimumAverageS is the shortest averaging time applied to the
// near-field concentration: the two-zone model treats the near field as
// well mixed, which takes of the order of a minute after a sudden release,
// so its value at the very instant of breakage is not a meaningful
// exposure (our modelling choice, stated in every record).
const NearFieldMinimumAverageS = 60

// PeakAveragingS is the averaging time of the peak (s): the peak is the
// highest one-minute average concentration, in the well-mixed room or the
// near field, the shortest average the models resolve. The release chart
// draws the same one-minute averages (Assessment.Concentration), so the
// peak is the top of the charted curves.
const PeakAveragingS = NearFieldMinimumAverageS

// NearFieldVolume returns the volume (m³) of the near-field hemisphere of
// radius r around a breakage on a table or floor.
func NearFieldVolume(r float64) float64 { return 2.0 / 3.0 * math.Pi * r * r * r }

// Zone names a part of the room in the release models.
type Zone int

// Zones of the release models.
const (
	// WellMixedRoom is the whole room as one well-mixed volume.
	WellMixedRoom Zone = iota
	// NearField is the hemisphere around the breakage in the two-zone
	// model.
	NearField
	// FarField is the rest of the room in the two-zone model.
	FarField
)

// releaseModel holds the analytic solutions for an instantaneous release
// of the whole fill.
//
// Well-mixed room with ventilation Q and mixing factor k (AIHA,
// Mathematical Models for Estimating Occupational Exposure to Chemicals,
// 2nd ed., 2009, ch. 3, from memory):
//
//	V dC/dt = −(Q/k) C,  C(0) = M/V  ⇒  C(t) = (M/V) exp(−Q t/(k V))
//
// Near-field/far-field (M. Nicas, Appl. Occup. Environ. Hyg. 11(8), 1996;
// AIHA book ch. 5, from memory), with the release into the near field:
//
//	V_N dC_N/dt = β (C_F − C_N)
//	V_F dC_F/dt = β (C_N − C_F) − Q C_F,   β = ½ · FSA · s
//
// solved exactly by the eigenvalues of the 2×2 system.
type releaseModel struct {
	massMg                float64
	roomVolume            float64
	roomRate              float64 // 1/s, Q/(kV)
	nearVolume, farVolume float64
	beta, q               float64 // m³/s
	lambda1, lambda2      float64 // 1/s (≤ 0)
	nearA1, nearA2        float64 // near-field coefficients, mg/m³
	farA                  float64 // far-field coefficient, mg/m³ (C_F = a(e^{λ1 t} − e^{λ2 t}))
	// capMgM3 is the physical bound on any concentration (mg/m³): see
	// ConcentrationBound. Zero means no bound has been set.
	capMgM3 float64
}

func newReleaseModel(massKg float64, r Room) *releaseModel {
	m := &releaseModel{massMg: massKg * 1e6, roomVolume: r.VolumeM3}
	q := r.AirChangesPerHour * r.VolumeM3 / 3600
	m.q = q
	m.roomRate = q / (r.MixingFactor * r.VolumeM3)
	m.nearVolume = NearFieldVolume(r.NearFieldRadiusM)
	m.farVolume = r.VolumeM3 - m.nearVolume
	fsa := 2 * math.Pi * r.NearFieldRadiusM * r.NearFieldRadiusM
	m.beta = 0.5 * fsa * r.NearFieldAirSpeed
	a11 := -m.beta / m.nearVolume
	a12 := m.beta / m.nearVolume
	a21 := m.beta / m.farVolume
	a22 := -(m.beta + q) / m.farVolume
	tr := a11 + a22
	det := a11*a22 - a12*a21
	disc := math.Sqrt(math.Max(tr*tr-4*det, 0))
	m.lambda1 = 0.5 * (tr + disc) // slower (closer to zero)
	m.lambda2 = 0.5 * (tr - disc) // faster
	c0 := m.massMg / m.nearVolume
	// C_N = A1 e^{λ1 t} + A2 e^{λ2 t}, C_N(0) = c0, C_N'(0) = a11 c0.
	m.nearA1 = c0 * (a11 - m.lambda2) / (m.lambda1 - m.lambda2)
	m.nearA2 = c0 - m.nearA1
	// C_F from V_N dC_N/dt = β (C_F − C_N): C_F = C_N + (V_N/β) dC_N/dt.
	m.farA = m.nearA1 * (1 + m.lambda1/a12)
	return m
}

// Concentration returns the concentration (mg/m³) in a zone at time t (s)
// after the breakage.
func (m *releaseModel) Concentration(z Zone, t float64) float64 {
	switch z {
	case NearField:
		return m.nearA1*math.Exp(m.lambda1*t) + m.nearA2*math.Exp(m.lambda2*t)
	case FarField:
		return m.farA * (math.Exp(m.lambda1*t) - math.Exp(m.lambda2*t))
	default:
		return m.massMg / m.roomVolume * math.Exp(-m.roomRate*t)
	}
}

// integralExp returns ∫₀ᵀ a e^{λt} dt, exact also for λ = 0.
func integralExp(a, lambda, t float64) float64 {
	x := lambda * t
	if math.Abs(x) < 1e-9 {
		return a * t
	}
	return a * math.Expm1(x) / lambda
}

// Dose returns ∫₀ᵀ C dt in mg·s/m³ for a zone.
func (m *releaseModel) Dose(z Zone, t float64) float64 {
	switch z {
	case NearField:
		return integralExp(m.nearA1, m.lambda1, t) + integralExp(m.nearA2, m.lambda2, t)
	case FarField:
		return integralExp(m.farA, m.lambda1, t) - integralExp(m.farA, m.lambda2, t)
	default:
		return integralExp(m.massMg/m.roomVolume, -m.roomRate, t)
	}
}

// Average returns the mean concentration (mg/m³) over the first t seconds.
func (m *releaseModel) Average(z Zone, t float64) float64 {
	return m.Dose(z, t) / t
}

// Exposure is the highest exposure a person could receive for one
// averaging period, in mg/m³ and ppm, and where. Bounded is true when the
// model's value lay above the physical bound and the bound is reported
// instead (the true value is at most the bound).
type Exposure struct {
	AveragingS float64
	MgM3       float64
	PPM        float64
	Zone       Zone
	Bounded    bool
}

// exposure returns the larger of the well-mixed room and near-field
// averages over the first periodS seconds, for a person present exposureS
// seconds and averaged over periodS. A period at or below PeakAveragingS
// gives the peak, the one-minute average whoever is present. The result
// never exceeds the physical bound.
func (m *releaseModel) exposure(periodS, exposureS, molarMass float64) Exposure {
	room, near := 0.0, 0.0
	if periodS <= PeakAveragingS {
		periodS = PeakAveragingS
		room = m.Average(WellMixedRoom, PeakAveragingS)
		near = m.Average(NearField, PeakAveragingS)
	} else {
		present := math.Min(exposureS, periodS)
		room = m.Dose(WellMixedRoom, present) / periodS
		np := math.Max(present, math.Min(NearFieldMinimumAverageS, periodS))
		near = m.Dose(NearField, np) / math.Max(periodS, NearFieldMinimumAverageS)
	}
	e := Exposure{AveragingS: periodS, MgM3: room, Zone: WellMixedRoom}
	if near > room {
		e.MgM3, e.Zone = near, NearField
	}
	if m.capMgM3 > 0 && e.MgM3 > m.capMgM3 {
		e.MgM3, e.Bounded = m.capMgM3, true
	}
	e.PPM = units.MgPerM3ToPpm(e.MgM3, molarMass)
	return e
}

// charted returns the concentration the release chart draws (mg/m³): the
// average over the minute before t (nothing before the breakage), held to
// the physical bound. Its highest value, reached one minute after the
// breakage, is the peak.
func (m *releaseModel) charted(z Zone, t float64) float64 {
	if !(t > 0) {
		return 0
	}
	from := math.Max(t-PeakAveragingS, 0)
	c := (m.Dose(z, t) - m.Dose(z, from)) / PeakAveragingS
	if m.capMgM3 > 0 {
		c = math.Min(c, m.capMgM3)
	}
	return math.Max(c, 0)
}

// ConcentrationBound is the physical ceiling on any vapour concentration
// after the breakage: the smallest of the saturated-vapour concentration
// at the room temperature (P_sat/P_ambient), all of the fill diluted in
// the near-field volume, and 10⁶ ppm (pure vapour). A model result above
// it is replaced by it and flagged (Exposure.Bounded).
type ConcentrationBound struct {
	PPM float64
	// By names the bound that applies: "saturated vapour", "whole fill in
	// the near field" or "pure vapour".
	By string
	// RoomTemperatureK is the temperature of the saturated-vapour bound:
	// the hottest temperature of the design, but not below 25 °C, the
	// highest saturated concentration the scenario allows (conservative);
	// SaturatedPPM is that bound (10⁶ ppm at or above the critical point).
	RoomTemperatureK float64
	SaturatedPPM     float64
	NearFieldPPM     float64
}

// exposureStepKey names the calculation step of an averaging period.
func exposureStepKey(periodS float64) string {
	return "exposure_avg_" + strconv.FormatFloat(periodS, 'g', -1, 64) + "s"
}

// publicStepKey names the calculation step of a public acute duration,
// averaged for a person present throughout; the peak shares the peak's
// step.
func publicStepKey(periodS float64) string {
	if periodS <= PeakAveragingS {
		return exposureStepKey(PeakAveragingS)
	}
	return "exposure_public_avg_" + strconv.FormatFloat(periodS, 'g', -1, 64) + "s"
}
