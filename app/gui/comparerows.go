package gui

import (
	"fmt"
	"strings"
	"ullage/report/display"

	"ullage/fluids"
	"ullage/hazards"
)

// compareRow is one input of two designs side by side.
type compareRow struct {
	Label   string
	A, B    string
	Changed bool
}

// inputRows lists every input of two designs in the order of the form,
// in the display units, marking those that differ.
func inputRows(a, b *hazards.Design, lib *fluids.Library, u unitSystem) []compareRow {
	var rows []compareRow
	text := func(label string, get func(*hazards.Design) string) {
		x, y := get(a), get(b)
		rows = append(rows, compareRow{label, x, y, x != y})
	}
	num := func(ff formField) {
		x, y := ff.get(a), ff.get(b)
		rows = append(rows, compareRow{ff.label, u.show(ff.q, x, 5), u.show(ff.q, y, 5), x != y})
	}
	text("Fluid", func(d *hazards.Design) string { return fluidName(d.Fluid, lib) })
	for _, ff := range formFields {
		switch ff.path {
		case hazards.FieldInternalVolume:
			rows = append(rows, partRows(a, b, u)...)
		case hazards.FieldHottest:
			text("Glass", glassName)
		case hazards.FieldRoomVolume:
			text("Room", func(d *hazards.Design) string { return roomName(d.Room.PresetID) })
		case hazards.FieldHotToCold:
			text("Sudden drop from", func(d *hazards.Design) string { return shockPresetName(d.ThermalShock.HotToColdPresetID) })
		case hazards.FieldColdToHot:
			text("Sudden rise from", func(d *hazards.Design) string { return shockPresetName(d.ThermalShock.ColdToHotPresetID) })
		case hazards.FieldResidualStress:
			text("Part carrying the seal", func(d *hazards.Design) string { return firstNonEmpty(d.SealStress.Part, "none given") })
		}
		num(ff)
		if ff.path == hazards.FieldExposureMinutes {
			text("Limits from", func(d *hazards.Design) string {
				if len(d.Criteria.LimitBodies) == 0 {
					return "every body"
				}
				return strings.Join(d.Criteria.LimitBodies, ", ")
			})
			text("Limit sets", func(d *hazards.Design) string {
				var names []string
				for _, id := range d.Criteria.AppliedLimitSets() {
					names = append(names, display.LimitSetShort(id))
				}
				return strings.Join(names, ", ")
			})
		}
	}
	return rows
}

// partRows lists the parts of two vessels, part by part.
func partRows(a, b *hazards.Design, u unitSystem) []compareRow {
	var rows []compareRow
	n := max(len(a.Vessel.Parts), len(b.Vessel.Parts))
	part := func(d *hazards.Design, i int) *hazards.Part {
		if i < len(d.Vessel.Parts) {
			return &d.Vessel.Parts[i]
		}
		return nil
	}
	for i := 0; i < n; i++ {
		pa, pb := part(a, i), part(b, i)
		desc := func(p *hazards.Part) string {
			if p == nil {
				return "no such part"
			}
			return p.Name + " (" + p.Shape + ")"
		}
		rows = append(rows, compareRow{fmt.Sprintf("Part %d", i+1), desc(pa), desc(pb),
			pa == nil || pb == nil || pa.Name != pb.Name || pa.Shape != pb.Shape})
		for _, d := range []struct {
			label string
			get   func(*hazards.Part) float64
		}{
			{"outer diameter", func(p *hazards.Part) float64 { return p.OuterDiameterM }},
			{"wall thickness", func(p *hazards.Part) float64 { return p.WallThicknessM }},
			{"wall tolerance (±)", func(p *hazards.Part) float64 { return p.WallToleranceM }},
			{"length", func(p *hazards.Part) float64 { return p.LengthM }},
		} {
			show := func(p *hazards.Part) (string, float64) {
				if p == nil {
					return "—", -1
				}
				if d.label == "length" && p.Shape != hazards.ShapeTube {
					return "—", 0
				}
				return u.show(qLength, d.get(p), 4), d.get(p)
			}
			sa, xa := show(pa)
			sb, xb := show(pb)
			if sa == "—" && sb == "—" {
				continue
			}
			rows = append(rows, compareRow{fmt.Sprintf("Part %d %s", i+1, d.label), sa, sb, xa != xb || sa != sb && (sa == "—" || sb == "—")})
		}
	}
	return rows
}

// fluidName names a design's fluid from the library.
func fluidName(key string, lib *fluids.Library) string {
	if sub, err := lib.Lookup(key); err == nil {
		return fluidOption(sub.Fluid())
	}
	return key + " (not in the library)"
}

// glassName names a design's glass.
func glassName(d *hazards.Design) string {
	if d.Glass.Custom != nil {
		return "custom: " + d.Glass.Custom.Name
	}
	if g, err := hazards.LookupGlass(d.Glass.ID); err == nil {
		return g.Name
	}
	return d.Glass.ID
}

// roomName names a room preset.
func roomName(id string) string {
	if id == "" {
		return "own room"
	}
	if p, err := hazards.LookupRoomPreset(id); err == nil {
		return p.Name
	}
	return id
}
