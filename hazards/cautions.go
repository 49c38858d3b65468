package hazards

import (
	"fmt"
	"strings"

	"ullage/fluids"
	"ullage/fluids/units"
)

// StandardCautions are printed with every result: the tool's numbers
// support a review, they do not replace one.
var StandardCautions = []string{
	"This assessment is an engineering estimate from published correlations and simple models. It does not certify a product. Local codes, the applicable product-safety, toy and pressure-equipment standards, and the judgement of qualified, licensed professionals take precedence.",
	"Test real units: burst, thermal-cycling and drop tests on production samples are needed to confirm the glass strength assumed here, which depends on surface damage, residual stress from flame sealing and annealing quality that no calculation can see.",
	"Flame-sealed tips, joints and thickness changes concentrate stress; the membrane formulas used here do not capture them.",
	"Exposure limits apply to healthy adult workers. Children, the unwell and the public may need lower levels; consult the responsible authority.",
	"The release models assume the whole fill evaporates at once and spreads as the chosen room model describes; real rooms, spills onto fabric and heat sources can give higher local concentrations.",
}

// fluidCautions returns the warnings the fluid itself calls for, with
// temperatures in °C, or in °F when us is true.
func fluidCautions(f *fluids.Fluid, us bool) []string {
	var out []string
	if f.PotentialCarcinogen.Value {
		out = append(out, fmt.Sprintf("%s is listed as a potential occupational carcinogen by %s (%s). Keep exposure as low as feasible.", f.Name, f.PotentialCarcinogen.Body, f.PotentialCarcinogen.Source))
	}
	if f.Flammability.Flammable {
		msg := fmt.Sprintf("%s is flammable", f.Name)
		if f.Flammability.LFLPercent != nil {
			msg += fmt.Sprintf(" (LFL %.3g %% by volume", f.Flammability.LFLPercent.Value)
			if fp := f.Flammability.FlashPointK; fp != nil && us {
				msg += fmt.Sprintf(", flash point %.0f °F", units.KelvinToFahrenheit(fp.Value))
			} else if fp != nil {
				msg += fmt.Sprintf(", flash point %.0f °C", units.KelvinToCelsius(fp.Value))
			}
			msg += ")"
		}
		out = append(out, msg+". Keep broken devices away from flames, sparks and hot surfaces.")
	}
	for _, l := range f.ExposureLimits {
		if l.Averaging == fluids.AveragingIDLH && l.PPM <= 500 {
			out = append(out, fmt.Sprintf("%s is toxic at low concentration (IDLH %g ppm, %s).", f.Name, l.PPM, l.Body))
			break
		}
	}
	flashStated := f.Flammability.Flammable && f.Flammability.LFLPercent != nil && f.Flammability.FlashPointK != nil
	for _, w := range f.Warnings {
		// The caution above states the flash point from the typed value;
		// a warning of the data that repeats it is left out.
		if flashStated && strings.Contains(strings.ToLower(w), "flash point") && !strings.Contains(strings.ToLower(w), "autoignition") {
			continue
		}
		if strings.TrimSpace(w) != "" {
			out = append(out, w)
		}
	}
	if f.UserSupplied {
		out = append(out, fmt.Sprintf("The data for %s were supplied by the user, not taken from the built-in library; check their sources.", f.Name))
	}
	return out
}
