package report

import (
	"fmt"
	"io"
	"strings"

	"ullage/hazards"
	"ullage/hazards/tolerance"
)

// WriteAssessment writes the PDF record of one assessed revision to w: a
// header block, the overall verdict, the data behind it and the summary of
// findings from the first page, the cautions and the sign-off block (on
// page 2 for a design like the bundled example), then the inputs, the
// vessel state with a pressure–temperature chart and the fill–temperature
// map, the glass, thermal shock, the limits, the rupture, the release with
// a concentration chart, each finding with the facts behind it and a
// numbered list of its limits' sources, any tolerance study, the
// provenance of every fluid and glass value and, on request, the
// calculation record as an annex. Every page carries "Page x of y" and the
// product, revision and design fingerprint.
//
// a must come from hazards.Assess. It returns an *OptionError (wrapping
// ErrInvalidOptions) for bad options or a missing assessment, and any
// error from the PDF writer or from w.
func WriteAssessment(w io.Writer, m Meta, a *hazards.Assessment, o Options) error {
	o, err := o.normalise()
	if err != nil {
		return err
	}
	if err := checkAssessment("assessment", a); err != nil {
		return err
	}
	verdict := statusWord(a.Verdict)
	info := docInfo{
		title:    "Hazard assessment: " + recordName(m),
		author:   firstNonBlank(m.Reviewer, m.RevisionAuthor, m.Company),
		subject:  fmt.Sprintf("Sealed glass device filled with %s; overall verdict %s", a.Fluid.Name, verdict),
		creator:  creator(m),
		keywords: strings.TrimSpace("ullage assessment " + m.PartNumber + " fingerprint " + m.Fingerprint),
	}
	info.fixedDate = o.creationDate(m)
	c := newCanvas(o.Paper, info)
	d := newDoc(c, newUnitSystem(o.Units), "Hazard assessment · "+recordName(m)+" · "+recordDate(m), footerText(m))
	aw := &assessmentWriter{d: d, m: m, a: a, u: d.u, tol: o.Tolerance, appendix: o.Appendix}
	aw.write()
	if err := c.err(); err != nil {
		return fmt.Errorf("report: drawing the assessment: %w", err)
	}
	if err := c.writeTo(w); err != nil {
		return fmt.Errorf("report: writing the assessment: %w", err)
	}
	return nil
}

// checkAssessment refuses an assessment that did not come from
// hazards.Assess.
func checkAssessment(field string, a *hazards.Assessment) error {
	switch {
	case a == nil:
		return &OptionError{Field: field, Value: "nil", Want: "an assessment returned by hazards.Assess"}
	case a.Fluid == nil || len(a.Parts) == 0 || len(a.Findings) == 0:
		return &OptionError{Field: field, Value: "incomplete", Want: "an assessment returned by hazards.Assess (fluid, parts and findings are missing)"}
	}
	return nil
}

// assessmentWriter holds what every section of the record needs.
type assessmentWriter struct {
	d *doc
	m Meta
	a *hazards.Assessment
	u unitSystem
	// tol is the tolerance study to print, or nil.
	tol *tolerance.Result
	// appendix says whether to print the calculation record as an annex.
	appendix bool
	// refs numbers the sources the calculation record cites.
	refs *references
}

func (w *assessmentWriter) write() {
	w.d.newPage()
	w.titleBlock()
	w.summary()
	w.cautions()
	w.d.signOff(w.m.Reviewer)
	w.inputs()
	w.vesselState()
	w.glass()
	w.thermalShock()
	w.limits()
	w.rupture()
	w.release()
	w.findings()
	w.toleranceStudy()
	w.provenance()
	if w.appendix {
		w.calculationRecord()
	}
	w.d.finishPages()
}

// recordName is "Product, revision X".
func recordName(m Meta) string {
	name := firstNonBlank(m.Product, "unnamed product")
	if strings.TrimSpace(m.Revision) != "" {
		name += ", revision " + m.Revision
	}
	return name
}

func recordDate(m Meta) string {
	if m.Date.IsZero() {
		return "undated"
	}
	return m.Date.Format("2006-01-02")
}

func creator(m Meta) string {
	return strings.TrimSpace("Ullage " + m.ToolVersion)
}

// footerText is the running footer: product, part number, revision and
// fingerprint.
func footerText(m Meta) string {
	parts := []string{firstNonBlank(m.Product, "unnamed product")}
	if m.PartNumber != "" {
		parts = append(parts, "P/N "+m.PartNumber)
	}
	if m.Revision != "" {
		parts = append(parts, "Rev. "+m.Revision)
	}
	if m.Fingerprint != "" {
		parts = append(parts, "Fingerprint "+m.Fingerprint)
	}
	return strings.Join(parts, " · ")
}

func firstNonBlank(s ...string) string {
	for _, x := range s {
		if strings.TrimSpace(x) != "" {
			return x
		}
	}
	return ""
}
