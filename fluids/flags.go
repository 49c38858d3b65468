package fluids

import "strings"

// Flags records how far a property result can be trusted: which
// correlations were used outside their published range.
type Flags uint8

// Flag bits.
const (
	// VapourPressureExtrapolated: the vapour pressure came from outside
	// every published correlation piece (below the first, in a gap, or in
	// the hand-over to the critical point).
	VapourPressureExtrapolated Flags = 1 << iota
	// NearCriticalVapour: the saturated vapour density came from the law of
	// rectilinear diameters near the critical point rather than the
	// equation of state.
	NearCriticalVapour
	// CompressedLiquidExtrapolated: the compressed-liquid state lies above
	// the Tait correlation's reduced-temperature limit of 0.95.
	CompressedLiquidExtrapolated
	// SupercriticalState: the state is above the critical temperature,
	// described by the anchored equation of state.
	SupercriticalState
	// LiquidDensityExtrapolated: the saturated liquid density came from a
	// published correlation below its lower temperature limit.
	LiquidDensityExtrapolated
	// EquationOfStateExtrapolated: the state lies outside the reference
	// equation of state's stated range of temperature or pressure.
	EquationOfStateExtrapolated
)

// Extrapolated reports whether any correlation was used outside its
// stated range.
func (f Flags) Extrapolated() bool {
	return f&(VapourPressureExtrapolated|CompressedLiquidExtrapolated|LiquidDensityExtrapolated|EquationOfStateExtrapolated) != 0
}

// String lists the flags in words, or "none".
func (f Flags) String() string {
	if f == 0 {
		return "none"
	}
	var parts []string
	if f&VapourPressureExtrapolated != 0 {
		parts = append(parts, "vapour pressure outside its correlation's range")
	}
	if f&NearCriticalVapour != 0 {
		parts = append(parts, "near-critical vapour density (rectilinear diameter)")
	}
	if f&CompressedLiquidExtrapolated != 0 {
		parts = append(parts, "compressed liquid above Tr 0.95 (Tait range)")
	}
	if f&LiquidDensityExtrapolated != 0 {
		parts = append(parts, "liquid density below its correlation's range")
	}
	if f&EquationOfStateExtrapolated != 0 {
		parts = append(parts, "outside the equation of state's stated range")
	}
	if f&SupercriticalState != 0 {
		parts = append(parts, "supercritical")
	}
	return strings.Join(parts, "; ")
}
