package gui

import (
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"fyne.io/fyne/v2/test"

	"ullage/hazards"
	"ullage/hazards/designfile"
)

func TestNewRevisionAppearsInList(t *testing.T) {
	h := newHarness(t)
	h.typeInto("fill_mass_kg", "19.5")
	if len(h.s.revs.rows) == 0 || h.s.revs.rows[0] != nil {
		t.Fatal("the changed working copy is not listed first")
	}
	h.s.revs.askNewRevision(nil)
	dlg := h.topOverlay()
	es := entries(dlg)
	if len(es) != 3 {
		t.Fatalf("the new-revision dialog has %d entries, want label, author, note", len(es))
	}
	if es[0].Text != "C" {
		t.Errorf("suggested label %q, want C", es[0].Text)
	}
	// A change note is required.
	test.Tap(button(t, dlg, "Keep revision"))
	if !strings.Contains(strings.Join(labels(dlg), " "), "change note") {
		t.Error("no message asking for a change note")
	}
	test.Type(es[1], "Test reviewer")
	test.Type(es[2], "Fill trimmed to 19.5 g.")
	test.Tap(button(t, dlg, "Keep revision"))
	h.idle()
	if h.w.Canvas().Overlays().Top() != nil {
		t.Fatal("the dialog stayed open")
	}
	rows := h.s.revs.rows
	if len(rows) != 3 || rows[0] == nil || rows[0].Label != "C" {
		t.Fatalf("revision list = %v, want C, B, A", revLabels(rows))
	}
	label, date, author, note, status := h.s.revs.describeRow(0)
	if label != "C" || date != "2026-11-03" || author != "Test reviewer" || note != "Fill trimmed to 19.5 g." || status == "" {
		t.Errorf("row 0 = %q %q %q %q %q", label, date, author, note, status)
	}
	if h.s.doc.workChanged() || h.s.doc.Base != "C" {
		t.Errorf("working copy not based on C: base %q, changed %v", h.s.doc.Base, h.s.doc.workChanged())
	}
	if !h.s.doc.dirty() {
		t.Error("a new revision does not count as unsaved")
	}
}

func revLabels(rows []*designfile.Revision) []string {
	var out []string
	for _, r := range rows {
		if r == nil {
			out = append(out, workingCopyLabel)
		} else {
			out = append(out, r.Label)
		}
	}
	return out
}

func TestOpeningARevisionLoadsItsInputs(t *testing.T) {
	h := newHarness(t)
	h.s.revs.openRevision("A")
	h.idle()
	if h.s.doc.Base != "A" || h.field("fill_mass_kg").entry.Text != "28.3" {
		t.Fatalf("revision A not in the form: base %q, fill %q", h.s.doc.Base, h.field("fill_mass_kg").entry.Text)
	}
	// Revision A goes liquid-full in a hot car and fails (assets example).
	if h.s.last.assessment.Verdict != hazards.StatusFail {
		t.Errorf("revision A verdict %s, want fail", h.s.last.assessment.Verdict)
	}
	if h.s.doc.dirty() {
		t.Error("opening a kept revision made the document dirty")
	}
}

func TestComparisonShowsChangedValues(t *testing.T) {
	h := newHarness(t)
	h.s.shell.showCompare()
	c := h.s.cmp
	if c.cmp == nil {
		t.Fatal("no comparison on first start")
	}
	if c.cmp.A.Label != "revision A" || c.cmp.B.Label != "revision B" {
		t.Fatalf("compares %q with %q, want revision A with revision B", c.cmp.A.Label, c.cmp.B.Label)
	}
	status := strings.Join(labels(c.statusBox), " | ")
	if !strings.Contains(status, "changed status") || !strings.Contains(status, "Ullage at the hottest temperature") {
		t.Errorf("status changes not called out first: %s", status)
	}
	rows := map[string][]string{}
	for _, o := range c.inputs.Objects[1:] {
		l := labels(o)
		rows[l[0]] = l
	}
	tests := []struct {
		row, a, b, mark string
	}{
		{"Fill", "28.3 g", "21 g", "changed"},
		{"Glass", "Soda-lime", "Borosilicate", "changed"},
		{"Part 1 wall thickness", "1.4 mm", "1.6 mm", "changed"},
		{"Hottest temperature", "76 °C", "76 °C", ""},
	}
	for _, tc := range tests {
		r, ok := rows[tc.row]
		if !ok {
			t.Errorf("no input row %q", tc.row)
			continue
		}
		if !strings.HasPrefix(r[1], tc.a) || !strings.HasPrefix(r[2], tc.b) || r[3] != tc.mark {
			t.Errorf("row %q = %q, want %q → %q marked %q", tc.row, r, tc.a, tc.b, tc.mark)
		}
	}
	if len(c.chart.spec.Series) != 2 {
		t.Errorf("comparison chart has %d curves, want 2", len(c.chart.spec.Series))
	}
	c.onlyChanged.SetChecked(true)
	for _, o := range c.inputs.Objects[1:] {
		if l := labels(o); l[3] != "changed" {
			t.Errorf("unchanged row %q shown with only changes ticked", l[0])
		}
	}
}

func TestCompareWorkingCopyWithItsRevision(t *testing.T) {
	h := newHarness(t)
	h.typeInto("hottest_k", "60")
	h.s.revs.compareSelected()
	h.idle()
	c := h.s.cmp.cmp
	if c == nil || c.A.Label != "revision B" || c.B.Label != "working copy" {
		t.Fatalf("comparison %+v, want revision B against the working copy", c)
	}
	if len(c.Inputs) != 1 || c.Inputs[0].Field != "hottest_k" {
		t.Errorf("changed inputs %+v, want only hottest_k", c.Inputs)
	}
}

func TestSaveAndReopen(t *testing.T) {
	h := newHarness(t)
	path := filepath.Join(t.TempDir(), "lantern.json")
	if err := h.s.writeFile(path); err != nil {
		t.Fatal(err)
	}
	if h.s.doc.dirty() || h.s.doc.Path != path {
		t.Errorf("after saving: dirty %v, path %q", h.s.doc.dirty(), h.s.doc.Path)
	}
	f, err := designfile.Load(path)
	if err != nil {
		t.Fatal(err)
	}
	if got := f.Labels(); strings.Join(got, ",") != "A,B" {
		t.Errorf("saved revisions %v", got)
	}
	if recent := h.s.recentFiles(); len(recent) == 0 || recent[0] != path {
		t.Errorf("recent files %v, want %s first", recent, path)
	}
	if !h.s.openPath(path) || h.s.doc.Name != "lantern.json" {
		t.Error("the saved file does not open")
	}
}

func TestNeverSavesOverAFileThatDoesNotLoad(t *testing.T) {
	h := newHarness(t)
	path := filepath.Join(t.TempDir(), "notes.json")
	want := []byte("{\"my\": \"notes\"}\n")
	if err := os.WriteFile(path, want, 0o644); err != nil {
		t.Fatal(err)
	}
	if err := h.s.writeFile(path); err == nil {
		t.Fatal("saved over a file that is not a design file")
	}
	if got, _ := os.ReadFile(path); string(got) != string(want) {
		t.Errorf("file changed to %q", got)
	}
	if h.s.openPath(path) {
		t.Error("a file that does not load was opened")
	}
	if h.s.doc.Path == path {
		t.Error("the failed file became the document")
	}
}

func TestAutosaveOffersRecovery(t *testing.T) {
	dir := t.TempDir()
	h := newHarnessIn(t, dir)
	h.typeInto("fill_mass_kg", "18")
	h.s.autosaveNow()
	if _, err := os.Stat(filepath.Join(dir, recoveryFile)); err != nil {
		t.Fatalf("no autosave: %v", err)
	}
	// The next run of the program on the same storage, as after a crash.
	h2 := newHarnessIn(t, dir)
	if !h2.s.offerRecovery() {
		t.Fatal("recovery not offered")
	}
	test.Tap(button(t, h2.topOverlay(), "Restore"))
	h2.idle()
	if got := h2.s.doc.Work.FillMassKg; math.Abs(got-0.018) > 1e-12 {
		t.Errorf("recovered fill %g kg, want 0.018", got)
	}
	if !h2.s.doc.dirty() {
		t.Error("recovered work does not count as unsaved")
	}
	if path := filepath.Join(t.TempDir(), "x.json"); h2.s.writeFile(path) != nil || h2.s.offerRecovery() {
		t.Error("the recovery file outlived a save")
	}
}

func TestNewDesignUsesDefaultCriteria(t *testing.T) {
	h := newHarness(t)
	h.s.settings.Criteria.MinBurstSafetyFactor = 6
	doc, err := newBlankDocument(h.s.settings.Criteria)
	if err != nil {
		t.Fatal(err)
	}
	h.s.open(doc)
	h.idle()
	if got := h.field("criteria.min_burst_safety_factor").entry.Text; got != "6" {
		t.Errorf("new design's burst criterion %q, want the reviewer's default 6", got)
	}
	h.fillRequired()
	if h.s.last.assessment == nil || !h.s.doc.dirty() {
		t.Error("a new design is not assessed once its required fields are typed, or not counted as unsaved")
	}
	if len(h.s.revs.rows) != 1 || h.s.revs.rows[0] != nil {
		t.Errorf("revision list %v, want only the working copy", revLabels(h.s.revs.rows))
	}
	rev := h.s.doc.newRevision(h.s.doc.File.NextLabel(), "T", "First design", fixedNow)
	if err := h.s.keepRevision(rev); err != nil {
		t.Fatal(err)
	}
	path := t.TempDir() + "/new.json"
	if err := h.s.writeFile(path); err != nil {
		t.Errorf("the new design does not save: %v", err)
	}
}
