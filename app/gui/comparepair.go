package gui

import (
	"slices"
	"ullage/report/chartmodel"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/widget"
)

// pairProblem says why the chosen pair cannot be compared: the same
// revision on both sides, or a "later" side older than the "earlier"
// one (the revisions are listed oldest first, the working copy last).
// "" when the pair is fine.
func (c *comparePanel) pairProblem() string {
	a, b := c.pickA.Selected, c.pickB.Selected
	if a == "" || b == "" {
		return ""
	}
	if a == b {
		return "Choose two different revisions: " + a + " is chosen on both sides, and a revision compared with itself shows nothing."
	}
	ia, ib := slices.Index(c.pickA.Options, a), slices.Index(c.pickB.Options, b)
	if ia >= 0 && ib >= 0 && ib < ia {
		return "\"Later\" (" + b + ") is older than \"Earlier\" (" + a + "): choose the older revision as Earlier, or swap the two."
	}
	return ""
}

// refusePair shows why the pair cannot be compared in place of the
// comparison, which is dropped so that nothing stale can be exported.
func (c *comparePanel) refusePair(msg string) {
	c.gen++
	c.cmp = nil
	c.s.compared = nil
	l := widget.NewLabel(msg)
	l.Wrapping = fyne.TextWrapWord
	l.Importance = widget.DangerImportance
	c.statusBox.Objects = []fyne.CanvasObject{l}
	c.statusBox.Refresh()
	setText(c.verdicts, "")
	c.inputs.Objects, c.results.Objects = nil, nil
	c.inputs.Refresh()
	c.results.Refresh()
	c.chart.set(chartmodel.Chart{Empty: "Nothing to compare."}, false)
}
