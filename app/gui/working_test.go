package gui

import (
	"strings"
	"testing"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/widget"

	"ullage/hazards"
)

// shownText returns the text of every label and rich text under o.
func shownText(o fyne.CanvasObject) string {
	var b strings.Builder
	walk(o, func(o fyne.CanvasObject) {
		switch x := o.(type) {
		case *widget.Label:
			b.WriteString(x.Text + "\n")
		case *fitLabel:
			b.WriteString(x.Text + "\n")
		case *widget.RichText:
			b.WriteString(x.String() + "\n")
		}
	})
	return b.String()
}

// findingIndex returns the row of a criterion in the findings list.
func (h *harness) findingIndex(criterion string) int {
	h.t.Helper()
	for i, f := range h.s.results.list.rows {
		if f.Criterion == criterion {
			return i
		}
	}
	h.t.Fatalf("no finding %s", criterion)
	return -1
}

func TestSelectingAFindingKeepsTheFormAndShowsItsWorkingOnRequest(t *testing.T) {
	tests := []struct {
		criterion string
		// key names the step that produced the finding's value.
		key string
		// whole also switches to the whole record and back: the record
		// is the same whichever finding is selected, so one row checks it.
		whole bool
	}{
		{hazards.CriterionBurst, "burst_safety_factor", true},
		{hazards.CriterionUllage, "state_hot", false},
		{hazards.CriterionImplosion, "implosion_safety_factor", false},
	}
	for _, tc := range tests {
		t.Run(tc.criterion, func(t *testing.T) {
			h := newHarness(t)
			wp := h.s.working
			if wp.open || !h.s.shell.form.Visible() {
				t.Fatal("the working opened without being asked for")
			}
			fl := h.s.results.list
			i := h.findingIndex(tc.criterion)
			if fl.selected == i {
				// Tapping the selected row does nothing in a list: choose
				// another first, then come back.
				fl.list.Select((i + 1) % len(fl.rows))
			}
			fl.list.Select(i)
			h.idle()
			if wp.open || !h.s.shell.form.Visible() {
				t.Fatal("selecting a finding replaced the design form")
			}
			button(t, h.s.results.object, "Show the working").OnTapped()
			h.idle()
			if !wp.open || !wp.object.Visible() || !h.s.shell.form.Visible() {
				t.Fatal("the working is not shown beside the design form")
			}
			a := h.s.last.assessment
			f := fl.rows[i]
			text := shownText(wp.object)
			for _, n := range f.Steps() {
				if !strings.Contains(text, stepHeading(a.Trace()[n-1])) {
					t.Errorf("step %d is not shown", n)
				}
			}
			own := a.Trace()[a.TraceStep(tc.key)-1]
			if !strings.Contains(text, own.Equation) {
				t.Errorf("the equation of step %d, %q, is not shown", own.Number, own.Equation)
			}
			if !strings.Contains(text, "Working: "+f.Title) {
				t.Errorf("the panel does not name the finding %q", f.Title)
			}

			// The whole record lists every step.
			if tc.whole {
				wp.mode.SetSelected(workingWhole)
				if got := strings.Count(shownText(wp.steps), "Step "); got < len(a.Trace()) {
					t.Errorf("the whole record shows %d steps, want %d", got, len(a.Trace()))
				}
				wp.mode.SetSelected(workingBehind)
				if got := shownText(wp.object); got != text {
					t.Error("back from the whole record, the working of the finding is not shown as before")
				}
			}

			button(t, wp.object, closeWorking).OnTapped()
			if wp.open || wp.object.Visible() || !h.s.shell.form.Visible() {
				t.Error("the working did not close, or took the design form with it")
			}
		})
	}
}

func TestShowTheWorkingButtonOpensTheSelectedFinding(t *testing.T) {
	h := newHarness(t)
	fl := h.s.results.list
	button(t, h.s.results.object, "Show the working").OnTapped()
	f := fl.rows[fl.selected]
	if !h.s.working.open || h.s.working.subject.criterion != f.Criterion {
		t.Fatalf("the working of the selected finding %s did not open (subject %+v)", f.Criterion, h.s.working.subject)
	}
}

func TestKeyNumberRowsOpenTheirWorking(t *testing.T) {
	h := newHarness(t)
	keys := h.s.results.keys
	a := h.s.last.assessment
	tests := []struct{ label, key string }{
		{"Maximum safe temperature", "max_safe_temperature"},
		{"Stored energy at rupture", "stored_energy"},
		{"Hoop stress, part 1 (" + a.Parts[0].Name + ")", "stress_0"},
	}
	for _, tc := range tests {
		k := -1
		for i, r := range keys.rows {
			if r.label == tc.label {
				k = i
			}
		}
		if k < 0 {
			t.Errorf("no key number %q", tc.label)
			continue
		}
		keys.taps[k].Tapped(nil)
		h.idle()
		st := a.Trace()[a.TraceStep(tc.key)-1]
		text := shownText(h.s.working.object)
		if !h.s.working.open || !strings.Contains(text, stepHeading(st)) || !strings.Contains(text, st.Equation) {
			t.Errorf("%s: step %d and its equation not shown", tc.label, st.Number)
		}
		if !keys.taps[k].selected {
			t.Errorf("%s: the row is not marked as shown", tc.label)
		}
	}
}

func TestCopyAsTextPutsTheWorkingOnTheClipboard(t *testing.T) {
	h := newHarness(t)
	i := h.findingIndex(hazards.CriterionBurst)
	h.s.working.show(workSubject{criterion: hazards.CriterionBurst})
	button(t, h.s.working.object, "Copy as text").OnTapped()
	got := h.s.app.Clipboard().Content()
	a := h.s.last.assessment
	f := h.s.results.list.rows[i]
	if want := WorkingText(a, f.Title+" — "+statusWord(f.Status), f.Steps()); got != want {
		t.Errorf("clipboard holds\n%s\nwant\n%s", got, want)
	}
	for _, n := range f.Steps() {
		if !strings.Contains(got, stepHeading(a.Trace()[n-1])) {
			t.Errorf("the copied text lacks step %d", n)
		}
	}
}

func TestWorkingFollowsTheResults(t *testing.T) {
	h := newHarness(t)
	wp := h.s.working
	wp.show(workSubject{criterion: hazards.CriterionUllage})
	before := shownText(wp.steps)
	h.typeInto("fill_mass_kg", "15")
	if wp.shownFor != h.s.last.assessment || shownText(wp.steps) == before {
		t.Error("the working did not follow the new results")
	}
	h.typeInto("fill_mass_kg", "oops")
	if !wp.stale.Visible() || !strings.HasPrefix(wp.text(), "OUT OF DATE") {
		t.Error("the working of out-of-date results is not marked")
	}
}
