package gui

import (
	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"

	"ullage/app/prefs"
	"ullage/hazards"
)

// criteriaSection holds the review's pass marks, each with its grounds.
type criteriaSection struct {
	f      *designForm
	fields []*numField
	sets   *widget.CheckGroup
}

// newCriteriaSection builds the "Review criteria" group.
func newCriteriaSection(f *designForm) fyne.CanvasObject {
	c := &criteriaSection{f: f}
	f.criteria = c
	var objs []fyne.CanvasObject
	for _, cp := range prefs.Criteria {
		nf := f.field(criterionPath(cp.Key))
		c.fields = append(c.fields, nf)
		objs = append(objs, nf.object, indented(hint(hazards.DefaultCriteriaGrounds[cp.Key])))
	}
	c.sets = widget.NewCheckGroup(limitSetNames(), func(sel []string) {
		f.s.doc.choose(hazards.FieldLimitSets, func(d *hazards.Design) { d.Criteria.LimitSets = limitSetsOf(sel) })
	})
	objs = append(objs, labelled("Limit sets that apply", c.sets),
		indented(hint("Default for a consumer product (none ticked, or exactly these two): US occupational and US public acute. Each set's limits are averaged over their own periods; within each kind the largest share of its limit governs.")))
	reset := widget.NewButtonWithIcon("Use my default criteria", theme.HistoryIcon(), c.useDefaults)
	objs = append(objs, indented(container.NewHBox(reset)))
	return section("Review criteria", objs...)
}

// criterionPath is the field path of the numeric criterion key.
func criterionPath(key string) string { return hazards.FieldCriteria + "." + key }

// criterionGetter returns the accessor of a criterion by its JSON key.
func criterionGetter(key string) func(*hazards.Criteria) *float64 {
	for _, cp := range prefs.Criteria {
		if cp.Key == key {
			return cp.Get
		}
	}
	panic("gui: unknown criterion " + key)
}

// load ticks the limit sets the design applies (the default ones when it
// names none); the number fields are filled with the rest.
func (c *criteriaSection) load() {
	var names []string
	for _, id := range c.f.s.doc.Work.Criteria.AppliedLimitSets() {
		names = append(names, hazards.LimitSetName(id))
	}
	showChecked(c.sets, names)
}

// limitSetNames lists the limit sets by name, in their usual order.
func limitSetNames() []string {
	var out []string
	for _, id := range hazards.LimitSetIDs() {
		out = append(out, hazards.LimitSetName(id))
	}
	return out
}

// limitSetsOf turns ticked names into set IDs in their usual order; the
// default sets, or none ticked, give nil (the default, left out of the
// file so that its fingerprint stays as it was).
func limitSetsOf(names []string) []string {
	var out []string
	for _, id := range hazards.LimitSetIDs() {
		for _, n := range names {
			if n == hazards.LimitSetName(id) {
				out = append(out, id)
			}
		}
	}
	if len(out) == len(hazards.DefaultLimitSets) {
		same := true
		for i := range out {
			same = same && out[i] == hazards.DefaultLimitSets[i]
		}
		if same {
			return nil
		}
	}
	return out
}

// useDefaults replaces the criteria by the reviewer's defaults.
func (c *criteriaSection) useDefaults() {
	defaults := c.f.s.settings.Criteria
	c.f.s.doc.choose(hazards.FieldCriteria, func(d *hazards.Design) {
		bodies, sets := d.Criteria.LimitBodies, d.Criteria.LimitSets
		d.Criteria = defaults
		d.Criteria.LimitBodies, d.Criteria.LimitSets = bodies, sets
	})
}
