package gui

import (
	"fmt"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"

	"ullage/hazards/designfile"
)

// productSection names the product and says which revision the working
// copy is based on.
type productSection struct {
	f                            *designForm
	name, partNo, company, descr *widget.Entry
	header                       *widget.Label
	changed                      *widget.Label

	// descrBox is the widget of descr on the form: Tab leaves it.
	descrBox *noTabEntry
}

// newProductSection builds the "Product and revision" group.
func newProductSection(f *designForm) fyne.CanvasObject {
	p := &productSection{f: f}
	f.product = p
	entryOf := func(e *widget.Entry, set func(*designfile.Product, string)) *widget.Entry {
		e.OnChanged = func(t string) {
			f.s.doc.typeProduct(func(pr *designfile.Product) { set(pr, t) })
		}
		return e
	}
	entry := func(set func(*designfile.Product, string)) *widget.Entry { return entryOf(widget.NewEntry(), set) }
	p.name = entry(func(pr *designfile.Product, t string) { pr.Name = t })
	p.partNo = entry(func(pr *designfile.Product, t string) { pr.PartNumber = t })
	p.company = entry(func(pr *designfile.Product, t string) { pr.Company = t })
	p.descrBox = newNoTabEntry()
	p.descr = entryOf(&p.descrBox.Entry, func(pr *designfile.Product, t string) { pr.Description = t })
	p.descr.MultiLine = true
	p.descr.Wrapping = fyne.TextWrapWord
	p.descr.SetMinRowsVisible(2)
	p.header = widget.NewLabel("")
	p.header.Wrapping = fyne.TextWrapWord
	p.changed = widget.NewLabel("")
	p.changed.TextStyle = fyne.TextStyle{Bold: true}
	keep := widget.NewButtonWithIcon("Keep as a new revision…", theme.DocumentSaveIcon(), func() { f.s.askNewRevision(nil) })
	return section("Product and revision",
		labelled("Product", p.name),
		labelled("Part number", p.partNo),
		labelled("Company", p.company),
		labelled("Description", p.descrBox),
		indented(p.header),
		indented(container.NewBorder(nil, nil, nil, keep, p.changed)),
	)
}

// load fills the product entries.
func (p *productSection) load() {
	pr := p.f.s.doc.File.Product
	showText(p.name, pr.Name)
	showText(p.partNo, pr.PartNumber)
	showText(p.company, pr.Company)
	showText(p.descr, pr.Description)
	p.updateHeader()
}

// updateHeader says which revision the working copy is based on and
// whether it has changed since.
func (p *productSection) updateHeader() {
	doc := p.f.s.doc
	b := doc.base()
	if b == nil {
		setText(p.header, "Working copy, not yet kept as a revision.")
	} else {
		note := b.ChangeNote
		if note == "" {
			note = "no change note"
		}
		setText(p.header, fmt.Sprintf("Working copy of revision %s (%s, %s): %s", b.Label, b.Date, b.Author, note))
	}
	switch {
	case b == nil:
		setText(p.changed, "Not yet a revision")
	case doc.workChanged():
		setText(p.changed, "Changed since revision "+b.Label)
	default:
		setText(p.changed, "Same as revision "+b.Label)
	}
}
