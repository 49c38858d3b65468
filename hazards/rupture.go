package hazards

import "math"

// VapourHeatCapacityRatio is the ratio of heat capacities γ used for the
// vapour and gas in the stored-energy estimate. Polyatomic organic vapours
// have γ of about 1.05–1.2; the low end gives the larger energy, so 1.1 is
// taken (common practice, conservative).
const VapourHeatCapacityRatio = 1.1

// Rupture is the energy a vessel would release if it broke at the hottest
// temperature.
type Rupture struct {
	// GasEnergyJ is the expansion energy of the vapour and gas space by
	// Brode's equation, E = (P − P₀) V/(γ − 1) (H. L. Brode, Phys. Fluids
	// 2, 217 (1959); CCPS, Guidelines for Chemical Process Quantitative
	// Risk Analysis, 2nd ed., 2000, §2.2.3, from memory).
	GasEnergyJ float64
	// FlashFraction is the fraction of the liquid that flashes to vapour
	// on release to atmospheric pressure, F = 1 − exp(−c_p (T − T_b)/h_fg)
	// (CCPS 2000, §2.1, from memory), zero below the boiling point.
	FlashFraction float64
	// FlashEnergyJ is Brode's energy for the flashed vapour taken at the
	// burst pressure (the flashed volume added to the vapour space, as in
	// Prugh's method for vessels of boiling liquid; CCPS, Guidelines for
	// Evaluating the Characteristics of Vapor Cloud Explosions, Flash
	// Fires, and BLEVEs, 1994, from memory).
	FlashEnergyJ float64
	// LiquidStrainEnergyJ is the elastic energy of a compressed liquid,
	// ½ (P − P_sat)² V_l/K with K the bulk modulus from the Tait
	// correlation; zero unless the vessel is liquid-full.
	LiquidStrainEnergyJ float64
	// StoredEnergyJ is the sum.
	StoredEnergyJ float64
}

func ruptureEnergy(st VesselState, volume, ambient, boilingK, cpLiquid, hvapAtBoiling, saturationPa, bulkModulus float64) Rupture {
	var r Rupture
	over := st.PressurePa - ambient
	if over <= 0 {
		return r
	}
	gasVolume := volume * st.UllagePercent / 100
	r.GasEnergyJ = over * gasVolume / (VapourHeatCapacityRatio - 1)
	if st.TemperatureK > boilingK && hvapAtBoiling > 0 {
		r.FlashFraction = -math.Expm1(-cpLiquid * (st.TemperatureK - boilingK) / hvapAtBoiling)
	}
	if r.FlashFraction > 0 && st.VapourDensity > 0 {
		flashedVolume := r.FlashFraction * st.LiquidMassKg / st.VapourDensity
		r.FlashEnergyJ = over * flashedVolume / (VapourHeatCapacityRatio - 1)
	}
	if st.Phase == PhaseLiquidFull && bulkModulus > 0 {
		dp := math.Max(st.PressurePa-saturationPa, 0)
		liquidVolume := volume - gasVolume
		r.LiquidStrainEnergyJ = 0.5 * dp * dp * liquidVolume / bulkModulus
	}
	r.StoredEnergyJ = r.GasEnergyJ + r.FlashEnergyJ + r.LiquidStrainEnergyJ
	return r
}
