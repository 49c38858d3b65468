package display

import (
	"strconv"
	"strings"

	"ullage/fluids"
	"ullage/hazards"
)

// Cautions returns the cautions printed with an assessment: the standard
// cautions (hazards.StandardCautions), then those the fluid calls for,
// worded from its typed data in the system's units: a listed carcinogen,
// its flammability (lower flammable limit, flash point and autoignition
// temperature, each where the data give it), a low IDLH, the fluid's own
// warnings (see [Warning]) and a note when the data were supplied by the
// user.
func Cautions(a *hazards.Assessment, s System) []string {
	out := append([]string(nil), hazards.StandardCautions...)
	if a == nil || a.Fluid == nil {
		return out
	}
	return append(out, FluidCautions(a.Fluid, s)...)
}

// FluidCautions returns the cautions a fluid calls for, in the system's
// units (see [Cautions]).
func FluidCautions(f *fluids.Fluid, s System) []string {
	var out []string
	if c := f.PotentialCarcinogen; c.Value {
		out = append(out, f.Name+" is listed as a potential occupational carcinogen by "+c.Body+" ("+c.Source+"). Keep exposure as low as feasible.")
	}
	if fl := f.Flammability; fl.Flammable {
		var facts []string
		if fl.LFLPercent != nil {
			facts = append(facts, "LFL "+Number(fl.LFLPercent.Value, ValueFigures)+" % by volume")
		}
		if fl.FlashPointK != nil {
			facts = append(facts, "flash point "+s.Approx(Temperature, fl.FlashPointK.Value))
		}
		if fl.AutoignitionK != nil {
			facts = append(facts, "autoignition "+s.Approx(Temperature, fl.AutoignitionK.Value))
		}
		msg := f.Name + " is flammable"
		if len(facts) > 0 {
			msg += " (" + strings.Join(facts, ", ") + ")"
		}
		out = append(out, msg+". Keep broken devices away from flames, sparks and hot surfaces.")
	}
	for _, l := range f.ExposureLimits {
		if l.Averaging == fluids.AveragingIDLH && l.PPM <= 500 {
			out = append(out, f.Name+" is toxic at low concentration (IDLH "+Number(l.PPM, ValueFigures)+" ppm, "+l.Body+").")
			break
		}
	}
	for _, w := range f.Warnings {
		if strings.TrimSpace(w) != "" {
			out = append(out, Warning(w, s))
		}
	}
	if f.UserSupplied {
		out = append(out, "The data for "+f.Name+" were supplied by the user, not taken from the built-in library; check their sources.")
	}
	return out
}

// Approx formats an SI value of q for a sentence that says "about" or
// "near": temperatures to the whole degree, every other quantity as
// [System.Format] does.
func (s System) Approx(q Quantity, x float64) string {
	if q != Temperature && q != TempDifference {
		return s.Format(q, x)
	}
	t := Fixed(s.FromSI(q, x), 0)
	if t == NoValue {
		return t
	}
	return t + " " + s.Unit(q)
}

// Warning words one of a fluid's own warnings in the system's units. The
// data write a temperature or a pressure as an SI quantity in braces,
// "{313.15 K}" or "{5.7e5 Pa}" (absolute), so that no unit of the
// reader's is fixed in the text; each is printed here with [System.Approx]
// ("40 °C", "104 °F", "570 kPa"). Anything else in braces is kept as
// written.
func Warning(w string, s System) string {
	var b strings.Builder
	for {
		open := strings.IndexByte(w, '{')
		if open < 0 {
			break
		}
		end := strings.IndexByte(w[open:], '}')
		if end < 0 {
			break
		}
		b.WriteString(w[:open])
		inner := w[open+1 : open+end]
		if t, ok := warningQuantity(inner, s); ok {
			b.WriteString(t)
		} else {
			b.WriteString(w[open : open+end+1])
		}
		w = w[open+end+1:]
	}
	b.WriteString(w)
	return b.String()
}

// warningQuantity prints "313.15 K" or "5.7e5 Pa" from a warning's braces.
func warningQuantity(inner string, s System) (string, bool) {
	num, unit, ok := strings.Cut(strings.TrimSpace(inner), " ")
	if !ok {
		return "", false
	}
	x, err := strconv.ParseFloat(num, 64)
	if err != nil || !(x > 0) || x > 1e12 {
		return "", false
	}
	switch unit {
	case "K":
		return s.Approx(Temperature, x), true
	case "Pa":
		return s.Approx(Pressure, x), true
	}
	return "", false
}
