package gui

import (
	"slices"
	"testing"

	"ullage/hazards"
)

// TestFeedHandsOutChangesInOrder: a change published while another is
// handed out reaches every subscriber after the first one has.
func TestFeedHandsOutChangesInOrder(t *testing.T) {
	var f feed
	var got []string
	f.subscribe(func(c change) {
		got = append(got, "a "+c.field)
		if c.field == "first" {
			f.publish(change{field: "second"})
		}
	})
	f.subscribe(func(c change) { got = append(got, "b "+c.field) })
	f.publish(change{field: "first"})
	want := []string{"a first", "b first", "a second", "b second"}
	if !slices.Equal(got, want) {
		t.Errorf("handed out %q, want %q", got, want)
	}
	var none *feed
	none.publish(change{}) // a document not opened in a window tells no one
}

// recordChanges records every change of the window's feed until the test
// ends.
func recordChanges(t *testing.T, h *harness) *[]change {
	var got []change
	n := len(h.s.changes.subs)
	h.s.changes.subscribe(func(c change) { got = append(got, c) })
	t.Cleanup(func() { h.s.changes.subs = h.s.changes.subs[:n] })
	return &got
}

// edits returns the changes that are edits of the document.
func edits(cs []change) []change {
	return slices.DeleteFunc(slices.Clone(cs), func(c change) bool { return !c.cause.edit() })
}

// TestShowingTheDocumentIsNoEdit: opening a file, a revision or a new
// design, and switching units, fill every panel from the document and
// never count as an edit of it: no widget set from the document writes
// back into it.
func TestShowingTheDocumentIsNoEdit(t *testing.T) {
	h := newHarness(t)
	got := recordChanges(t, h)
	doc, err := exampleDocument()
	if err != nil {
		t.Fatal(err)
	}
	h.s.open(doc)
	h.idle()
	h.s.setUnits(unitsUS)
	h.idle()
	h.s.setUnits(unitsSI)
	h.idle()
	h.s.revs.openRevision("A")
	h.idle()
	if e := edits(*got); len(e) > 0 {
		t.Errorf("showing the document published edits: %+v", e)
	}
	if h.s.doc.workChanged() || h.s.doc.fileChanged() {
		t.Error("showing revision A changed the document")
	}
	blank, err := newBlankDocument(h.s.settings.Criteria)
	if err != nil {
		t.Fatal(err)
	}
	h.s.open(blank)
	h.idle()
	if e := edits(*got); len(e) > 0 {
		t.Errorf("opening a new design published edits: %+v", e)
	}
}

// TestTypingIsOneEditOfItsField: each keystroke in a number field is one
// edit naming that field; the form does not write back into it.
func TestTypingIsOneEditOfItsField(t *testing.T) {
	h := newHarness(t)
	got := recordChanges(t, h)
	h.typeInto(hazards.FieldFillMass, "19.5")
	e := edits(*got)
	// typeInto empties the entry, then types four characters.
	if len(e) != 5 {
		t.Errorf("%d edits for five changes of the text: %+v", len(e), e)
	}
	for _, c := range e {
		if c.cause != causeTyped || c.field != hazards.FieldFillMass {
			t.Errorf("edit %+v, want typed into %s", c, hazards.FieldFillMass)
		}
	}
	if h.s.doc.Work.FillMassKg != 0.0195 {
		t.Errorf("fill %g kg after typing 19.5 g, want 0.0195", h.s.doc.Work.FillMassKg)
	}
}
