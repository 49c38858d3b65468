package cli

import (
	"encoding/json"
	"fmt"
	"io"

	"ullage/fluids"
	"ullage/fluids/units"
	"ullage/report/display"
)

type fluidStateJSON struct {
	Fluid                 string   `json:"fluid"`
	TemperatureC          float64  `json:"temperature_c"`
	PsatKPa               float64  `json:"psat_kpa"`
	LiquidDensityKgM3     float64  `json:"liquid_density_kg_m3"`
	VapourDensityKgM3     float64  `json:"vapour_density_kg_m3"`
	HeatOfVaporisationJKg float64  `json:"heat_of_vaporisation_j_kg"`
	Extrapolated          bool     `json:"extrapolated"`
	Notes                 []string `json:"notes"`
	// Route names where the properties come from (the reference
	// equation of state and its paper, or the record's correlations);
	// each *_uncertainty is the stated uncertainty of that property, or
	// null where none is stated.
	Route                         string           `json:"route"`
	PsatUncertainty               *uncertaintyJSON `json:"psat_uncertainty"`
	LiquidDensityUncertainty      *uncertaintyJSON `json:"liquid_density_uncertainty"`
	VapourDensityUncertainty      *uncertaintyJSON `json:"vapour_density_uncertainty"`
	HeatOfVaporisationUncertainty *uncertaintyJSON `json:"heat_of_vaporisation_uncertainty"`
}

type uncertaintyJSON struct {
	Percent   float64 `json:"percent"`
	Statement string  `json:"statement"`
	Source    string  `json:"source"`
}

func uncertaintyOf(s *fluids.Substance, property string) *uncertaintyJSON {
	u, ok := s.Uncertainty(property)
	if !ok {
		return nil
	}
	return &uncertaintyJSON{Percent: u.Percent, Statement: u.Statement, Source: u.Source}
}

func runFluidState(args []string, stdout, stderr io.Writer) int {
	o, err := parseArgs(args, []string{"json"}, []string{"temp-c", "fluids"})
	if err != nil {
		return usageError(stderr, "fluid-state", err)
	}
	if len(o.positional) != 1 {
		return usageError(stderr, "fluid-state", fmt.Errorf("name one fluid (try: ullage fluids)"))
	}
	tc, ok, err := o.float("temp-c")
	if err != nil {
		return usageError(stderr, "fluid-state", err)
	}
	if !ok {
		return usageError(stderr, "fluid-state", fmt.Errorf("give the temperature with --temp-c"))
	}
	lib, err := library(o)
	if err != nil {
		return usageError(stderr, "fluid-state", err)
	}
	s, err := lib.Lookup(o.positional[0])
	if err != nil {
		return usageError(stderr, "fluid-state", err)
	}
	sat, err := s.Saturation(units.CelsiusToKelvin(tc))
	if err != nil {
		return usageError(stderr, "fluid-state", err)
	}
	out := fluidStateJSON{
		Fluid: s.Fluid().ID, TemperatureC: tc, PsatKPa: round(sat.PressurePa/1000, 6),
		LiquidDensityKgM3: round(sat.LiquidDensity, 6), VapourDensityKgM3: round(sat.VapourDensity, 6),
		HeatOfVaporisationJKg: round(sat.HeatOfVaporisation, 6), Extrapolated: sat.Flags.Extrapolated(), Notes: []string{},
		Route:                         s.Route(),
		PsatUncertainty:               uncertaintyOf(s, fluids.PropertyVapourPressure),
		LiquidDensityUncertainty:      uncertaintyOf(s, fluids.PropertyLiquidDensity),
		VapourDensityUncertainty:      uncertaintyOf(s, fluids.PropertyVapourDensity),
		HeatOfVaporisationUncertainty: uncertaintyOf(s, fluids.PropertyHeatOfVaporisation),
	}
	if sat.Flags != 0 {
		out.Notes = append(out.Notes, sat.Flags.String())
	}
	if o.bools["json"] {
		enc := json.NewEncoder(stdout)
		enc.SetIndent("", "  ")
		if err := enc.Encode(out); err != nil {
			return usageError(stderr, "fluid-state", err)
		}
		return ExitPass
	}
	// Six figures, enough to check a property table, by the display
	// layer's rule (never e-notation).
	n := func(x float64) string { return display.Number(x, 6) }
	fmt.Fprintf(stdout, "%s at %s °C\n", s.Fluid().Name, display.Stated(tc))
	fmt.Fprintf(stdout, "  vapour pressure        %s kPa\n", n(sat.PressurePa/1000))
	fmt.Fprintf(stdout, "  saturated liquid      %s kg/m³\n", n(sat.LiquidDensity))
	fmt.Fprintf(stdout, "  saturated vapour      %s kg/m³\n", n(sat.VapourDensity))
	fmt.Fprintf(stdout, "  heat of vaporisation  %s kJ/kg\n", n(sat.HeatOfVaporisation/1000))
	fmt.Fprintf(stdout, "  from                  %s\n", s.Route())
	if sat.Flags != 0 {
		fmt.Fprintf(stdout, "  note: %s\n", sat.Flags)
	}
	return ExitPass
}
