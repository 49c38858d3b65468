package gui

import (
	"bytes"
	"errors"
	"fmt"
	"io"
	"strings"

	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/dialog"
	"fyne.io/fyne/v2/widget"

	"ullage/app/buildinfo"
	"ullage/fluids"
	"ullage/hazards/designfile"
	"ullage/report"
)

// errNoResults: there are no current results to export.
var errNoResults = errors.New("there are no current results to export: fix the marked inputs first")

// errNotCompared: the compare screen shows no comparison to export.
var errNotCompared = errors.New("both sides of the comparison must be assessed before it can be exported")

// recordMeta describes the working copy for a record: the revision it
// is, or the revision it was changed from.
func (s *session) recordMeta() report.Meta {
	doc := s.doc
	p := doc.File.Product
	m := report.Meta{
		Product: p.Name, PartNumber: p.PartNumber, Company: p.Company,
		Reviewer: s.settings.Reviewer, Date: s.opts.now(),
		ToolVersion: buildinfo.Describe(), FluidDataVersion: fluids.DataVersion,
	}
	work := designfile.Revision{Design: doc.Work}
	m.Fingerprint = work.Fingerprint()
	if b := doc.base(); b != nil {
		m.Revision, m.RevisionDate, m.RevisionAuthor, m.ChangeNote = b.Label, b.Date, b.Author, b.ChangeNote
		if doc.workChanged() {
			m.Revision = b.Label + " with changes not yet kept as a revision"
			m.ChangeNote = "Working copy changed from revision " + b.Label + "; not yet a revision of the design file."
		}
	} else {
		m.Revision = "working copy"
	}
	return m
}

// revisionMeta describes a kept revision, or the working copy for "".
func (s *session) revisionMeta(label string) report.Meta {
	if label == "" {
		return s.recordMeta()
	}
	m := s.recordMeta()
	r, err := s.doc.File.Find(label)
	if err != nil {
		return m
	}
	m.Revision, m.RevisionDate, m.RevisionAuthor, m.ChangeNote = r.Label, r.Date, r.Author, r.ChangeNote
	m.Fingerprint = r.Fingerprint()
	return m
}

// writeAssessmentPDF writes the assessment record of the working copy,
// with the tolerance study when one was run on the working copy as it is
// now; both the Export menu and --smoke come through here.
func (s *session) writeAssessmentPDF(w io.Writer) error { return s.writeAssessment(w, false) }

// writeAssessment writes the assessment record, with the calculation
// record as an annex when appendix is true.
func (s *session) writeAssessment(w io.Writer, appendix bool) error {
	if s.last.assessment == nil || s.stale() {
		return errNoResults
	}
	opts := s.settings.reportOptions()
	opts.Tolerance = s.currentStudy()
	opts.Appendix = appendix
	var buf bytes.Buffer
	if err := report.WriteAssessment(&buf, s.recordMeta(), s.last.assessment, opts); err != nil {
		return fmt.Errorf("the record could not be written: %w", err)
	}
	_, err := w.Write(buf.Bytes())
	return err
}

// writeComparisonPDF writes the comparison record shown on the compare
// screen.
func (s *session) writeComparisonPDF(w io.Writer) error {
	c := s.compared
	if c == nil {
		return errNotCompared
	}
	var buf bytes.Buffer
	if err := report.WriteComparison(&buf, s.revisionMeta(c.labelA), s.revisionMeta(c.labelB), *c.cmp, s.settings.reportOptions()); err != nil {
		return fmt.Errorf("the comparison record could not be written: %w", err)
	}
	_, err := w.Write(buf.Bytes())
	return err
}

// exportAssessmentDialog asks where to write the assessment record.
func (s *session) exportAssessmentDialog() {
	if s.last.assessment == nil || s.stale() {
		s.showError(errNoResults)
		return
	}
	name := s.assessmentPDFName()
	// Asked first, in a dialog of its own, so that the choice of file
	// stays in the one dialog every record export uses.
	annex := widget.NewCheck("Include the calculation record as an annex (every step, equation and source; about 20 more pages)", nil)
	body := container.NewVBox(widget.NewLabel("The record holds the inputs, results, findings, cautions, sources and the sign-off block."), annex)
	dialog.ShowCustomConfirm("Export assessment PDF", "Choose where to write it…", "Cancel", body, func(ok bool) {
		if ok {
			s.exportAssessmentWhere(name, annex.Checked)
		}
	}, s.win)
}

// exportAssessmentWhere asks where to write the assessment record, with
// the calculation record as an annex when appendix is true.
func (s *session) exportAssessmentWhere(name string, appendix bool) {
	s.exportDialog(name, func(w io.Writer) error { return s.writeAssessment(w, appendix) })
}

// assessmentPDFName is the suggested file name of the assessment
// record: it names the revision only when the working copy is that
// revision unchanged.
func (s *session) assessmentPDFName() string {
	part := "-working-copy-assessment"
	if s.doc.Base != "" && !s.doc.workChanged() {
		part = "-rev-" + labelPart(s.doc.Base) + "-assessment"
	}
	return suggestedName(s.doc.File.Product.Name, part, ".pdf")
}

// exportComparisonDialog asks where to write the comparison record.
func (s *session) exportComparisonDialog() {
	c := s.compared
	if c == nil {
		s.showError(errNotCompared)
		return
	}
	name := suggestedName(s.doc.File.Product.Name, "-rev-"+labelPart(c.labelA)+"-to-"+labelPart(c.labelB), ".pdf")
	s.exportDialog(name, s.writeComparisonPDF)
}

// labelPart is a revision label for a file name.
func labelPart(l string) string {
	if l == "" {
		return "working"
	}
	return strings.ToLower(l)
}

// exportDialog asks where to write a record and writes it there with the
// atomic writer; the design file it is made from is never a target, and
// a file that is not one of Ullage's records is replaced only after the
// reviewer confirms.
func (s *session) exportDialog(name string, write func(io.Writer) error) {
	s.askWhere("Export the PDF record", "Export", targetRecord, name, []string{s.docPath()}, func(path string) error {
		var buf bytes.Buffer
		if err := write(&buf); err != nil {
			return err
		}
		if err := designfile.WriteFile(path, 0o666, func(w io.Writer) error {
			_, err := w.Write(buf.Bytes())
			return err
		}); err != nil {
			return err
		}
		s.showInfo("Record written", "The PDF record was written to\n"+path)
		return nil
	})
}
