package cli

import (
	"bytes"
	"fmt"
	"io"
	"strings"
	"unicode/utf8"

	"ullage/hazards"
	"ullage/hazards/compare"
	"ullage/report"
	"ullage/report/display"
)

func runCompare(args []string, stdout, stderr io.Writer) int {
	o, err := parseArgs(args, []string{"json", replaceFlag}, []string{"rev", "pdf", "units", "paper", "reviewer", "fluids"})
	if err != nil {
		return usageError(stderr, "compare", err)
	}
	ro, err := reportOptions(o)
	if err != nil {
		return usageError(stderr, "compare", err)
	}
	lib, err := library(o)
	if err != nil {
		return usageError(stderr, "compare", err)
	}
	revs := o.values["rev"]
	var pa, pb string
	var la, lb string
	switch {
	case len(o.positional) == 1 && len(revs) == 2:
		pa, pb, la, lb = o.positional[0], o.positional[0], revs[0], revs[1]
	case len(o.positional) == 2 && len(revs) == 0:
		pa, pb = o.positional[0], o.positional[1]
	default:
		return usageError(stderr, "compare", fmt.Errorf("give two files, or one file with --rev X --rev Y"))
	}
	pdf, wantPDF := o.last("pdf")
	if wantPDF {
		if err := checkOutput("--pdf", pdf, []string{pa, pb, o.value("fluids", "")}, o.bools[replaceFlag]); err != nil {
			return usageError(stderr, "compare", err)
		}
	}
	a, b := checkOne(pa, la, lib), checkOne(pb, lb, lib)
	for _, side := range []*checked{&a, &b} {
		if side.err == nil {
			if where := firstNonFinite(side.assessment); where != "" {
				side.err = fmt.Errorf("%s, revision %s: the assessment gave a number that is not finite (%s); the design cannot be assessed", side.path, side.revision.Label, where)
			}
		}
	}
	if a.err != nil || b.err != nil {
		for _, side := range []checked{a, b} {
			if side.err != nil {
				fmt.Fprintf(stderr, "ullage compare: %v\n", side.err)
			}
		}
		if wantPDF {
			fmt.Fprintf(stderr, "ullage compare: no record written to %s\n", pdf)
		}
		if o.bools["json"] {
			side := func(c checked) any {
				if c.err != nil {
					return failedJSON(c.path, c.err)
				}
				return checkJSON(c)
			}
			encodeJSON(stdout, struct {
				Verdict string `json:"verdict"`
				A       any    `json:"a"`
				B       any    `json:"b"`
			}{verdictError, side(a), side(b)})
		} else {
			fmt.Fprintln(stdout, "verdict: ERROR (the comparison needs both revisions assessed)")
		}
		return ExitUsage
	}
	c := compare.Compare(
		compare.Side{Label: sideLabel(a), Design: a.revision.Design, Assessment: a.assessment},
		compare.Side{Label: sideLabel(b), Design: b.revision.Design, Assessment: b.assessment})
	if where := firstNonFinite(c); where != "" {
		fmt.Fprintf(stderr, "ullage compare: the comparison gave a number that is not finite (%s); nothing was written\n", where)
		return ExitUsage
	}
	if wantPDF {
		var buf bytes.Buffer
		if err := report.WriteComparison(&buf, recordMeta(a.file, a.revision, o), recordMeta(b.file, b.revision, o), c, ro); err != nil {
			fmt.Fprintf(stderr, "ullage compare: writing the record: %v\n", err)
			return ExitUsage
		}
		if err := writeOutput("--pdf", pdf, buf.Bytes()); err != nil {
			fmt.Fprintf(stderr, "ullage compare: %v\n", err)
			return ExitUsage
		}
	}
	if o.bools["json"] {
		out := struct {
			A        designJSON             `json:"a"`
			B        designJSON             `json:"b"`
			Inputs   []compare.InputChange  `json:"input_changes"`
			Results  []compare.ResultChange `json:"result_changes"`
			Statuses []compare.StatusChange `json:"status_changes"`
		}{checkJSON(a), checkJSON(b), nonNil(c.Inputs), nonNil(c.Results), nonNil(c.Statuses)}
		if err := encodeJSON(stdout, out); err != nil {
			return usageError(stderr, "compare", err)
		}
	} else {
		writeCompareText(stdout, a, b, c, display.ParseSystem(o.value("units", "si")))
	}
	if b.assessment.Verdict == hazards.StatusFail {
		return ExitFail
	}
	return ExitPass
}

func nonNil[T any](s []T) []T {
	if s == nil {
		return []T{}
	}
	return s
}

func sideLabel(c checked) string {
	return fmt.Sprintf("%s rev %s", c.file.Product.Name, c.revision.Label)
}

// writeCompareText prints a comparison in the words of the comparison
// record: the findings that changed status, the changed inputs under the
// record's labels in the chosen units, and every headline result.
func writeCompareText(w io.Writer, a, b checked, c compare.Comparison, sys display.System) {
	fmt.Fprintf(w, "A: %s (%s)\nB: %s (%s)\n\n", sideLabel(a), a.path, sideLabel(b), b.path)
	if len(c.Statuses) > 0 {
		fmt.Fprintln(w, "Findings that changed status:")
		width := 0
		for _, s := range c.Statuses {
			width = max(width, utf8.RuneCountInString(s.Title))
		}
		for _, s := range c.Statuses {
			fmt.Fprintf(w, "  %s  %s → %s\n", pad(s.Title, width), statusText(s.Old), statusText(s.New))
		}
		fmt.Fprintln(w)
	} else {
		fmt.Fprintln(w, "No finding changed status.")
		fmt.Fprintln(w)
	}
	rows := display.InputRows(&c, sys)
	fmt.Fprintf(w, "Changed inputs: %s.\n", display.CountInputs(display.ChangedCount(rows)))
	width := 0
	for _, r := range rows {
		if r.Changed {
			width = max(width, utf8.RuneCountInString(r.Label))
		}
	}
	for _, r := range rows {
		if r.Changed {
			fmt.Fprintf(w, "  %s  %s → %s\n", pad(r.Label, width), r.A, r.B)
		}
	}
	fmt.Fprintln(w, "\nResults:")
	width = 0
	for _, r := range c.Results {
		width = max(width, utf8.RuneCountInString(r.Name))
	}
	for _, r := range c.Results {
		mark := ""
		switch {
		case r.Better:
			mark = " better"
		case r.Worse:
			mark = " worse"
		}
		fmt.Fprintf(w, "  %s  %s → %s  (%s)%s\n", pad(r.Name, width), display.ResultValue(r, r.Old, sys), display.ResultValue(r, r.New, sys), display.ResultDelta(r, sys), mark)
	}
	fmt.Fprintf(w, "\nverdict: %s → %s\n", display.StatusWord(a.assessment.Verdict), display.StatusWord(b.assessment.Verdict))
}

// statusText words a finding's status in a comparison: the status word,
// or "absent" for a criterion one side does not have.
func statusText(s hazards.Status) string {
	if s == compare.StatusAbsent {
		return "absent"
	}
	return display.StatusWord(s)
}

// pad fills s with spaces to width characters.
func pad(s string, width int) string {
	return s + strings.Repeat(" ", max(0, width-utf8.RuneCountInString(s)))
}
