package gui

import (
	"fmt"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/widget"

	"ullage/hazards"
)

// keyNumbers lists the numbers behind the findings: the vessel at the
// hottest and coldest temperatures, the glass, the limits, the rupture
// and the release.
type keyNumbers struct {
	grid   *fyne.Container
	object fyne.CanvasObject
}

func newKeyNumbers() *keyNumbers {
	k := &keyNumbers{grid: container.New(keyLayout{})}
	k.object = container.NewPadded(k.grid)
	return k
}

// keyRows returns the label and value of every key number.
func keyRows(a *hazards.Assessment, u unitSystem) [][2]string {
	d := a.Design
	lf := "never, below the critical temperature"
	if a.LiquidFullReached {
		lf = u.show(qTemperature, a.LiquidFullK, 4)
	}
	bound := func(b hazards.Bound) string {
		switch b {
		case hazards.BoundAbove:
			return " (or higher: the limit holds over the whole searched range)"
		case hazards.BoundBelow:
			return " (already exceeded at the bottom of the searched range)"
		}
		return ""
	}
	rows := [][2]string{
		{"Fluid", a.Fluid.Name},
		{"Internal volume", u.show(qVesselVolume, a.VolumeM3, 4)},
		{"Fill density", sigFigures(a.FillDensity, 4) + " kg/m³"},
		{"Liquid share when sealed", sigFigures(a.LiquidFractionAtSealing*100, 3) + " %"},
		{"State at the hottest", fmt.Sprintf("%s at %s", a.Hot.Phase, u.show(qTemperature, d.HottestK, 4))},
		{"Pressure at the hottest (absolute)", u.show(qPressure, a.Hot.PressurePa, 4)},
		{"Ullage at the hottest", sigFigures(a.Hot.UllagePercent, 3) + " %"},
		{"Goes liquid-full at", lf},
		{"Allowable pressure (absolute)", u.show(qPressure, a.AllowablePressurePa(), 4) + " at safety factor " + sigFigures(a.RequiredSafetyFactor, 3)},
		{"Long-term burst overpressure", u.show(qPressure, a.Strength.LongTermBurstPa, 3)},
		{"Burst safety factor", findingValue(hazards.Finding{}, a.BurstSafetyFactor)},
		{"Failure probability over the life", sigFigures(a.FailureProbability, 2)},
		{"Pressure at the coldest (absolute)", u.show(qPressure, a.Cold.PressurePa, 4)},
		{"Implosion safety factor", findingValue(hazards.Finding{}, a.ImplosionSafetyFactor)},
		{"Maximum safe temperature", u.show(qTemperature, a.MaxSafe.TemperatureK, 4) + ", set by " + a.MaxSafe.TemperatureLimitBy + bound(a.MaxSafe.TemperatureBound)},
		{"Maximum safe fill", u.show(qMass, a.MaxSafe.FillMassKg, 4) + bound(a.MaxSafe.FillBound)},
		{"Stored energy at rupture", sigFigures(a.Rupture.StoredEnergyJ, 3) + " J"},
		{"Flash fraction", sigFigures(a.Rupture.FlashFraction*100, 3) + " %"},
		{"Peak concentration", sigFigures(a.Release.Peak.PPM, 3) + " ppm (" + zoneName(a.Release.Peak.Zone) + ")"},
		{"15-minute average", sigFigures(a.Release.STEL.PPM, 3) + " ppm"},
		{"8-hour average", sigFigures(a.Release.TWA8h.PPM, 3) + " ppm"},
		{"Peak share of the LFL", sigFigures(a.Release.PercentLFL, 3) + " %"},
	}
	for i, p := range a.Parts {
		rows = append(rows, [2]string{fmt.Sprintf("Hoop stress, part %d (%s)", i+1, p.Name),
			stressText(p.HoopStressPa, u) + ", " + p.Form})
	}
	if a.Flags.Extrapolated() {
		rows = append(rows, [2]string{"Correlations stretched", a.Flags.String()})
	}
	return rows
}

// stressText shows a stress in MPa or psi.
func stressText(pa float64, u unitSystem) string {
	if u == unitsUS {
		return u.show(qPressure, pa, 3)
	}
	return sigFigures(pa/1e6, 3) + " MPa"
}

// zoneName names a release-model zone.
func zoneName(z hazards.Zone) string {
	switch z {
	case hazards.NearField:
		return "near the breakage"
	case hazards.FarField:
		return "rest of the room"
	}
	return "whole room"
}

// set shows an assessment's key numbers.
func (k *keyNumbers) set(a *hazards.Assessment, u unitSystem) {
	if a == nil {
		k.grid.Objects = nil
		k.grid.Refresh()
		return
	}
	rows := keyRows(a, u)
	objs := make([]fyne.CanvasObject, 0, 2*len(rows))
	for _, r := range rows {
		l := widget.NewLabel(r[0])
		v := widget.NewLabelWithStyle(r[1], fyne.TextAlignLeading, fyne.TextStyle{Bold: true})
		v.Wrapping = fyne.TextWrapWord
		objs = append(objs, l, v)
	}
	k.grid.Objects = objs
	k.grid.Refresh()
}

// keyLayout is a two-column table: labels at their natural width (up to
// a limit), values filling the rest.
type keyLayout struct{}

const keyLabelWidth = 270

// MinSize is one label column and a narrow value column.
func (keyLayout) MinSize(objs []fyne.CanvasObject) fyne.Size {
	var h float32
	for i := 0; i+1 < len(objs); i += 2 {
		h += max(objs[i].MinSize().Height, objs[i+1].MinSize().Height)
	}
	return fyne.NewSize(keyLabelWidth+200, h)
}

// Layout places the pairs row by row.
func (keyLayout) Layout(objs []fyne.CanvasObject, size fyne.Size) {
	y := float32(0)
	for i := 0; i+1 < len(objs); i += 2 {
		vw := size.Width - keyLabelWidth
		objs[i+1].Resize(fyne.NewSize(vw, objs[i+1].MinSize().Height))
		h := max(objs[i].MinSize().Height, objs[i+1].MinSize().Height)
		objs[i].Move(fyne.NewPos(0, y))
		objs[i].Resize(fyne.NewSize(keyLabelWidth, h))
		objs[i+1].Move(fyne.NewPos(keyLabelWidth, y))
		objs[i+1].Resize(fyne.NewSize(vw, h))
		y += h
	}
}
