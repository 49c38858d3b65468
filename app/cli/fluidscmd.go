package cli

import (
	"encoding/json"
	"fmt"
	"io"

	"ullage/fluids"
	"ullage/fluids/units"
)

func runFluids(args []string, stdout, stderr io.Writer) int {
	o, err := parseArgs(args, []string{"json"}, []string{"fluids"})
	if err != nil {
		return usageError(stderr, "fluids", err)
	}
	if len(o.positional) > 0 {
		return usageError(stderr, "fluids", fmt.Errorf("takes no arguments"))
	}
	lib, err := library(o)
	if err != nil {
		return usageError(stderr, "fluids", err)
	}
	all := lib.All()
	if o.bools["json"] {
		recs := make([]*fluids.Fluid, len(all))
		for i, s := range all {
			recs[i] = s.Fluid()
		}
		enc := json.NewEncoder(stdout)
		enc.SetIndent("", "  ")
		if err := enc.Encode(struct {
			DataVersion string          `json:"data_version"`
			Fluids      []*fluids.Fluid `json:"fluids"`
		}{fluids.DataVersion, recs}); err != nil {
			return usageError(stderr, "fluids", err)
		}
		return ExitPass
	}
	fmt.Fprintf(stdout, "fluid data %s — %d fluids\n\n", fluids.DataVersion, len(all))
	fmt.Fprintf(stdout, "%-30s %-11s %9s %9s %10s  %s\n", "fluid", "CAS", "Tb °C", "Tc °C", "Pc MPa", "flammable")
	for _, s := range all {
		f := s.Fluid()
		fl := "no"
		if f.Flammability.Flammable {
			fl = "yes"
		}
		fmt.Fprintf(stdout, "%-30s %-11s %9.1f %9.1f %10.3f  %s\n", trim(f.Name, 30), f.CAS,
			units.KelvinToCelsius(f.NormalBoilingPoint.Value), units.KelvinToCelsius(f.CriticalTemperature.Value), f.CriticalPressure.Value/1e6, fl)
	}
	fmt.Fprintln(stdout, "\nSources: every value's source is listed by `ullage fluids --json` and printed in each record.")
	return ExitPass
}
