package gui

import (
	"bytes"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"testing"
)

// pdfText returns the text of a PDF by pdftotext (poppler-utils), or
// skips the test when the tool is missing.
func pdfText(t *testing.T, pdf []byte) string {
	t.Helper()
	tool, err := exec.LookPath("pdftotext")
	if err != nil {
		t.Skip("pdftotext (poppler-utils) is not installed")
	}
	path := filepath.Join(t.TempDir(), "record.pdf")
	if err := os.WriteFile(path, pdf, 0o644); err != nil {
		t.Fatal(err)
	}
	out, err := exec.Command(tool, "-enc", "UTF-8", path, "-").Output()
	if err != nil {
		t.Fatalf("pdftotext: %v", err)
	}
	return string(out)
}

func TestExportWritesAReadablePDF(t *testing.T) {
	h := newHarness(t)
	h.s.settings.Reviewer = "A. Reviewer"
	var buf bytes.Buffer
	if err := h.s.writeAssessmentPDF(&buf); err != nil {
		t.Fatal(err)
	}
	if !bytes.HasPrefix(buf.Bytes(), []byte("%PDF-")) {
		t.Fatalf("not a PDF: %q", buf.Bytes()[:min(16, buf.Len())])
	}
	text := pdfText(t, buf.Bytes())
	for _, want := range []string{"Tidemark Lantern", "A. Reviewer"} {
		if !strings.Contains(text, want) {
			t.Errorf("the record does not mention %q", want)
		}
	}

	// The smoke test's path writes the same record to a file.
	out := filepath.Join(t.TempDir(), "smoke.pdf")
	if err := h.s.exportTo(out); err != nil {
		t.Fatal(err)
	}
	if b, err := os.ReadFile(out); err != nil || !bytes.HasPrefix(b, []byte("%PDF-")) {
		t.Errorf("exportTo wrote no PDF: %v", err)
	}
}

// TestExportAnnexOnRequest checks that the calculation record is printed
// only when the export asks for it.
func TestExportAnnexOnRequest(t *testing.T) {
	h := newHarness(t)
	for _, annex := range []bool{false, true} {
		var buf bytes.Buffer
		if err := h.s.writeAssessment(&buf, annex); err != nil {
			t.Fatal(err)
		}
		if got := strings.Contains(pdfText(t, buf.Bytes()), "Calculation record"); got != annex {
			t.Errorf("annex requested %v, calculation record printed %v", annex, got)
		}
	}
}

func TestExportComparisonPDF(t *testing.T) {
	h := newHarness(t)
	var buf bytes.Buffer
	if err := h.s.writeComparisonPDF(&buf); err != nil {
		t.Fatal(err)
	}
	text := pdfText(t, buf.Bytes())
	if !strings.Contains(text, "Tidemark Lantern") {
		t.Error("the comparison record does not name the product")
	}
}

func TestExportRefusesOutOfDateResults(t *testing.T) {
	h := newHarness(t)
	h.typeInto("fill_mass_kg", "lots")
	var buf bytes.Buffer
	if err := h.s.writeAssessmentPDF(&buf); err == nil || buf.Len() > 0 {
		t.Errorf("exported results that do not match the inputs (err %v, %d bytes)", err, buf.Len())
	}
}
