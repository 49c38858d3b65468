package report

import (
	"ullage/report/display"
)

// inputs prints every input side by side, the changed ones marked.
func (w *comparisonWriter) inputs() {
	d, c := w.d, w.c
	d.heading("Inputs side by side")
	var rows, other [][]cell
	all := display.InputRows(&c, w.u.system())
	for _, r := range all {
		if r.Other {
			other = append(other, []cell{{text: changedMark + " " + r.Label, bold: true}, {text: r.A}, {text: r.B}})
			continue
		}
		name := "   " + r.Label
		if r.Changed {
			name = changedMark + " " + r.Label
		}
		rows = append(rows, []cell{{text: name, bold: r.Changed}, {text: r.A, bold: r.Changed}, {text: r.B, bold: r.Changed}})
	}
	// The count is the number of rows marked, here and in the table of
	// other changed inputs below.
	d.lead(display.CountInputs(display.ChangedCount(all)) + " between the revisions. A changed row starts with " + changedMark + " and is printed in bold.")
	d.drawTable(table{cols: []col{{"Input", 1.6, 'L'}, {w.la, 2.2, 'L'}, {w.lb, 2.2, 'L'}}, rows: rows, zebra: true})
	if len(other) > 0 {
		d.subheading("Other changed inputs, named as in the design files")
		d.drawTable(table{cols: []col{{"Field", 1.8, 'L'}, {w.la, 2.1, 'L'}, {w.lb, 2.1, 'L'}}, rows: other, size: 7.5})
	}
}
