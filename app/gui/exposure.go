package gui

import "ullage/fluids"

// exposureSummary lists the fluid's published exposure limits for the
// fluid section: body, kind, averaging and value.
func exposureSummary(f *fluids.Fluid) string {
	out := ""
	for _, l := range f.ExposureLimits {
		if out != "" {
			out += "; "
		}
		out += l.Label() + " " + sigFigures(l.PPM, 4) + " ppm"
	}
	if out == "" {
		return "no published numeric exposure limit in the library"
	}
	return out
}
