package report

import (
	"bytes"
	"io"
	"strings"
	"testing"

	"ullage/hazards"
	"ullage/hazards/compare"
)

// FuzzWriteRecords: the assessment and comparison records are written
// for any text in the free-text fields (product, part number, company,
// revision, author, change note, reviewer, part and fluid names: long
// words, control characters, invalid UTF-8, right-to-left marks) without
// a panic or an error, and the result is recognised as our own record.
// Each input writes two PDFs, so this target runs far slower than the
// loaders' (tens of executions a second, not thousands).
func FuzzWriteRecords(f *testing.F) {
	f.Add("Tidemark Lantern", "BC-TL-1", "Brackwater Curio Co.", "B", "Design office", "Fill cut.", "R. Reviewer", "lower bulb", true)
	f.Add(strings.Repeat("W", 3000), "", "", "", "", "", "", "", false)
	f.Add("\x00\x01\t\n\r", "\xff\xfe", "‮gnitirw", "ÄÖÜ ≤ ± °C", "\u200b\u200b", "(parenthesis) \\ backslash", "🙂", strings.Repeat("a b ", 500), true)
	base := assess(f, "typical_design.json")
	other := assess(f, "revision_b_design.json")
	f.Fuzz(func(t *testing.T, product, part, company, rev, author, note, reviewer, partName string, us bool) {
		m := Meta{Product: product, PartNumber: part, Company: company, Revision: rev, RevisionDate: "2026-01-01",
			RevisionAuthor: author, ChangeNote: note, Reviewer: reviewer, ToolVersion: "test", FluidDataVersion: "test", Fingerprint: "abc"}
		a := *base
		a.Parts = append([]hazards.PartStress(nil), base.Parts...)
		a.Parts[0].Name = partName
		o := Options{Deterministic: true}
		if us {
			o.Units = UnitsUS
		}
		var buf bytes.Buffer
		if err := WriteAssessment(&buf, m, &a, o); err != nil {
			t.Fatalf("assessment: %v", err)
		}
		if !IsRecord(buf.Bytes()) {
			t.Fatal("the assessment record is not recognised as ours")
		}
		c := compare.Compare(compare.Side{Label: product, Design: a.Design, Assessment: &a}, compare.Side{Label: rev, Design: other.Design, Assessment: other})
		if err := WriteComparison(io.Discard, m, m, c, o); err != nil {
			t.Fatalf("comparison: %v", err)
		}
	})
}
