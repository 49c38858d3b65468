package gui

import (
	"strings"
	"ullage/report/display"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/widget"

	"ullage/hazards"
)

// exposureTable lists every applied exposure limit, occupational and
// public side by side: its set, its averaging period, the average over
// it, its share and which one governs its kind; where a set gives no
// number (none published, not checked, not recommended) it says so in
// words.
type exposureTable struct {
	body   *fyne.Container
	sets   *widget.Label
	words  *widget.Label
	object fyne.CanvasObject
}

var exposureColumns = []string{"Set", "Limit", "ppm", "Period", "Average", "Share", ""}

// exposureWidths are the columns' widths (points): the panel is about
// 620 points wide at 1280×800 and the sum stays below that; "Period" is
// the averaging period and "Average" the average over it, in ppm.
var exposureWidths = []float32{88, 150, 68, 84, 72, 70, 76}

// columnsLayout places objects side by side in columns of fixed widths.
type columnsLayout []float32

func (c columnsLayout) MinSize(objs []fyne.CanvasObject) fyne.Size {
	var w, h float32
	for i, o := range objs {
		if i < len(c) {
			w += c[i]
		}
		h = max(h, o.MinSize().Height)
	}
	return fyne.NewSize(w, h)
}

func (c columnsLayout) Layout(objs []fyne.CanvasObject, size fyne.Size) {
	x := float32(0)
	for i, o := range objs {
		if i >= len(c) {
			o.Hide()
			continue
		}
		o.Move(fyne.NewPos(x, 0))
		o.Resize(fyne.NewSize(c[i], size.Height))
		x += c[i]
	}
}

func newExposureTable() *exposureTable {
	t := &exposureTable{body: container.NewVBox()}
	// Lines are broken by hand: a wrapping label above a scroller asks
	// for the height of one word a line before it knows its width.
	t.sets = widget.NewLabel("")
	t.words = widget.NewLabel("")
	t.object = container.NewScroll(container.NewVBox(t.sets, t.body, t.words))
	return t
}

// row makes one line of the table.
func exposureRow(cells []string, bold bool) fyne.CanvasObject {
	row := container.New(columnsLayout(exposureWidths))
	for _, c := range cells {
		row.Add(newFitLabel(c, fyne.TextStyle{Bold: bold}))
	}
	return row
}

// exposureRows returns the table's rows, each a cell per column, and
// whether the row's limit governs its kind.
func exposureRows(a *hazards.Assessment) (rows [][]string, governs []bool) {
	add := func(g bool, cells ...string) {
		rows = append(rows, cells)
		governs = append(governs, g)
	}
	for _, f := range a.Findings {
		if f.NotApplicable == hazards.ReasonNoPublishedLimit {
			add(false, display.LimitSetShort(hazards.LimitSetUSOccupational), strings.TrimPrefix(f.Criterion, "exposure-")+": "+display.ReasonWords(f.NotApplicable), "", "", "", "", "")
		}
	}
	for _, set := range a.Release.LimitSets {
		for _, l := range a.Release.Limits {
			if l.Set != set {
				continue
			}
			period := sigFigures(l.Exposure.AveragingS/60, 3) + " min"
			if l.Exposure.AveragingS <= hazards.PeakAveragingS {
				period = "peak (1 min)"
			}
			avg := sigFigures(l.Exposure.PPM, 3)
			if l.Exposure.Bounded {
				avg = "≤ " + avg
			}
			name := l.Name
			if l.Standing == "interim" || l.Standing == "proposed" {
				name += " (" + l.Standing + ")"
			}
			g := ""
			if l.Governs {
				g = "governs"
			}
			add(l.Governs, display.LimitSetShort(l.Set), name, sigFigures(l.PPM, 4), period, avg, display.Share(l.Share), g)
		}
		for _, n := range a.Release.LimitNotes {
			if n.Set == set {
				label := display.ReasonWords(n.Reason)
				if n.Name != "" {
					label = n.Name + ": " + label
				}
				add(false, display.LimitSetShort(n.Set), label, "", "", "", "", "")
			}
		}
	}
	return rows, governs
}

// set fills the table from an assessment (nil empties it). Rows that
// carry no number (a kind with no published limit, a set that publishes
// none, an NR cell) are said in words below the table.
func (t *exposureTable) set(a *hazards.Assessment) {
	if a == nil {
		t.showRows(nil, nil)
		setText(t.sets, "No results yet.")
		setText(t.words, "")
		return
	}
	var names []string
	for _, s := range a.Release.LimitSets {
		names = append(names, hazards.LimitSetName(s))
	}
	setText(t.sets, "Limit sets applied: "+strings.Join(names, ";\n    ")+".\nEach limit is averaged over its own period; within each kind\nthe largest share of its limit governs (bold).")
	table, bold := [][]string{exposureColumns}, []bool{true}
	rows, governs := exposureRows(a)
	var words []string
	for i, r := range rows {
		if r[2] == "" {
			words = append(words, r[0]+" — "+r[1])
			continue
		}
		table, bold = append(table, r), append(bold, governs[i])
	}
	t.showRows(table, bold)
	setText(t.words, strings.Join(words, "\n"))
}

// showRows shows the table's lines, heading included. Lines already on
// screen are kept and only their changed cells redrawn, so that new
// results of the same design do not build the table again.
func (t *exposureTable) showRows(rows [][]string, bold []bool) {
	same := len(t.body.Objects) == len(rows)
	for i := 0; same && i < len(rows); i++ {
		same = len(t.body.Objects[i].(*fyne.Container).Objects) == len(rows[i])
	}
	if !same {
		objs := make([]fyne.CanvasObject, len(rows))
		for i, r := range rows {
			objs[i] = exposureRow(r, bold[i])
		}
		t.body.Objects = objs
		t.body.Refresh()
		return
	}
	for i, r := range rows {
		style := fyne.TextStyle{Bold: bold[i]}
		for j, c := range t.body.Objects[i].(*fyne.Container).Objects {
			if l := c.(*fitLabel); l.Text != r[j] || l.TextStyle != style {
				l.Text, l.TextStyle = r[j], style
				l.Refresh()
			}
		}
	}
}
