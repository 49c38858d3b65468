package fluids

import "math"

// Liquid-density correlation forms accepted in liquid_density_correlation.
const (
	// FormDIPPR105 is DIPPR equation 105, ρ = A / B^(1 + (1 − T/C)^D) in
	// kmol/m³, as tabulated in Perry's Chemical Engineers' Handbook (8th
	// ed., Table 2-32).
	FormDIPPR105 = "dippr-105-kmol-m3"
	// FormDIPPR116 is DIPPR equation 116, used for water:
	// ρ = A + B τ^0.35 + C τ^(2/3) + D τ + E τ^(4/3), τ = 1 − T/Tc, in
	// kmol/m³ (Perry's, 8th ed., Table 2-32).
	FormDIPPR116 = "dippr-116-kmol-m3"
)

// LiquidDensityCorrelation is an optional published saturated-liquid
// density correlation, valid over [TMinK, TMaxK]. TcK is the critical
// temperature the DIPPR 116 form is written with.
type LiquidDensityCorrelation struct {
	Form   string  `json:"form"`
	A      float64 `json:"a"`
	B      float64 `json:"b"`
	C      float64 `json:"c"`
	D      float64 `json:"d"`
	E      float64 `json:"e,omitempty"`
	TcK    float64 `json:"tc_k,omitempty"`
	TMinK  float64 `json:"t_min_k"`
	TMaxK  float64 `json:"t_max_k"`
	Source string  `json:"source"`
}

// density returns the correlation's density in kg/m³ for a fluid of the
// given molar mass (kg/mol).
func (c *LiquidDensityCorrelation) density(t, molarMass float64) float64 {
	kgPerKmol := molarMass * 1000
	switch c.Form {
	case FormDIPPR116:
		tau := 1 - t/c.TcK
		if tau < 0 {
			tau = 0
		}
		return kgPerKmol * (c.A + c.B*math.Pow(tau, 0.35) + c.C*math.Pow(tau, 2.0/3.0) + c.D*tau + c.E*math.Pow(tau, 4.0/3.0))
	default:
		x := 1 - t/c.C
		if x < 0 {
			x = 0
		}
		return kgPerKmol * c.A / math.Pow(c.B, 1+math.Pow(x, c.D))
	}
}
