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

// fluidCautions returns the standard cautions followed by the warnings
// the fluid itself calls for, with temperatures in °C (si) and in °F (us):
// the two lists differ only in the flash point.
func fluidCautions(f *fluids.Fluid) (si, us []string) {
	n := len(StandardCautions) + 4 + len(f.Warnings)
	si = append(make([]string, 0, n), StandardCautions...)
	us = append(make([]string, 0, n), StandardCautions...)
	both := func(msg string) {
		si = append(si, msg)
		us = append(us, msg)
	}
	if f.PotentialCarcinogen.Value {
		both(f.Name + " is listed as a potential occupational carcinogen by " + f.PotentialCarcinogen.Body + " (" + f.PotentialCarcinogen.Source + "). Keep exposure as low as feasible.")
	}
	if f.Flammability.Flammable {
		msgSI, msgUS := f.Name+" is flammable", f.Name+" is flammable"
		if f.Flammability.LFLPercent != nil {
			lfl := fmt.Sprintf(" (LFL %.3g %% by volume", f.Flammability.LFLPercent.Value)
			msgSI, msgUS = msgSI+lfl, msgUS+lfl
			if fp := f.Flammability.FlashPointK; fp != nil {
				msgSI += fmt.Sprintf(", flash point %.0f °C", units.KelvinToCelsius(fp.Value))
				msgUS += fmt.Sprintf(", flash point %.0f °F", units.KelvinToFahrenheit(fp.Value))
			}
			msgSI, msgUS = msgSI+")", msgUS+")"
		}
		const keep = ". Keep broken devices away from flames, sparks and hot surfaces."
		si, us = append(si, msgSI+keep), append(us, msgUS+keep)
	}
	for _, l := range f.ExposureLimits {
		if l.Averaging == fluids.AveragingIDLH && l.PPM <= 500 {
			both(fmt.Sprintf("%s is toxic at low concentration (IDLH %g ppm, %s).", f.Name, l.PPM, l.Body))
			break
		}
	}
	flashStated := f.Flammability.Flammable && f.Flammability.LFLPercent != nil && f.Flammability.FlashPointK != nil
	for _, w := range f.Warnings {
		// The caution above states the flash point from the typed value;
		// a warning of the data that repeats it is left out.
		if flashStated && containsLower(w, "flash point") && !containsLower(w, "autoignition") {
			continue
		}
		if strings.TrimSpace(w) != "" {
			both(w)
		}
	}
	if f.UserSupplied {
		both("The data for " + f.Name + " were supplied by the user, not taken from the built-in library; check their sources.")
	}
	return si, us
}

// containsLower reports strings.Contains(strings.ToLower(s), sub) for a
// lower-case ASCII sub, without the copy when s is ASCII.
func containsLower(s, sub string) bool {
	for i := 0; i < len(s); i++ {
		if s[i] >= 0x80 {
			return strings.Contains(strings.ToLower(s), sub)
		}
	}
	for i := 0; i+len(sub) <= len(s); i++ {
		j := 0
		for ; j < len(sub); j++ {
			c := s[i+j]
			if 'A' <= c && c <= 'Z' {
				c += 'a' - 'A'
			}
			if c != sub[j] {
				break
			}
		}
		if j == len(sub) {
			return true
		}
	}
	return false
}
