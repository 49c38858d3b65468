package cli

import (
	"bytes"
	"context"
	"encoding/json"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"sort"
	"strings"
	"time"
	"unicode/utf8"

	"ullage/app/buildinfo"
	"ullage/fluids"
	"ullage/hazards"
	"ullage/hazards/designfile"
	"ullage/hazards/tolerance"
	"ullage/report"
	"ullage/report/display"
)

// checked is one design assessed by the check command, or the error
// that stopped it.
type checked struct {
	path       string
	file       *designfile.File
	revision   *designfile.Revision
	assessment *hazards.Assessment
	tolerance  *tolerance.Result
	// err is why the design could not be assessed; the other fields may
	// then be nil.
	err error
}

// checkValueFlags are the flags of check that take a value.
var checkValueFlags = []string{"rev", "pdf", "units", "paper", "reviewer", "fluids", "samples", "seed", "hot-spread-k"}

func runCheck(args []string, stdout, stderr io.Writer) int {
	o, err := parseArgs(args, []string{"json", "trace", "appendix", replaceFlag}, checkValueFlags)
	if err != nil {
		return usageError(stderr, "check", err)
	}
	if o.bools["trace"] && !o.bools["json"] {
		return usageError(stderr, "check", fmt.Errorf("--trace adds the calculation record to --json output; give both"))
	}
	if len(o.positional) == 0 {
		return usageError(stderr, "check", fmt.Errorf("name at least one design file or folder"))
	}
	ro, err := reportOptions(o)
	if err != nil {
		return usageError(stderr, "check", err)
	}
	study, err := studySettings(o)
	if err != nil {
		return usageError(stderr, "check", err)
	}
	lib, err := library(o)
	if err != nil {
		return usageError(stderr, "check", err)
	}
	paths, err := expandPaths(o.positional)
	if err != nil {
		return usageError(stderr, "check", err)
	}
	pdfPath, wantPDF := o.last("pdf")
	if wantPDF {
		if len(paths) != 1 {
			return usageError(stderr, "check", fmt.Errorf("--pdf writes one record: name exactly one design file (%d given)", len(paths)))
		}
		if err := checkOutput("--pdf", pdfPath, append(paths, o.value("fluids", "")), o.bools[replaceFlag]); err != nil {
			return usageError(stderr, "check", err)
		}
	}
	results := make([]checked, 0, len(paths))
	bad := 0
	for _, p := range paths {
		c := checkOne(p, o.value("rev", ""), lib)
		if c.err == nil && study != nil {
			var err error
			set := *study
			var line *progressLine
			if isTerminal(stderr) {
				line = &progressLine{w: stderr, label: "ullage check: tolerance study of " + p}
				set.Progress = line.report
			}
			c.tolerance, err = tolerance.Run(context.Background(), c.revision.Design, lib, set)
			if line != nil {
				line.clear()
			}
			if err != nil {
				c.err = fmt.Errorf("%s: tolerance study: %w", p, err)
			}
		}
		if c.err == nil {
			if where := firstNonFinite(c.assessment); where != "" {
				c.err = fmt.Errorf("%s, revision %s: the assessment gave a number that is not finite (%s); the design cannot be assessed", p, c.revision.Label, where)
			} else if where := firstNonFinite(c.tolerance); where != "" {
				c.err = fmt.Errorf("%s: tolerance study: a number that is not finite (%s); the study cannot be reported", p, where)
			}
		}
		if c.err != nil {
			fmt.Fprintf(stderr, "ullage check: %v\n", c.err)
			bad++
		}
		results = append(results, c)
	}
	if wantPDF {
		if bad > 0 {
			fmt.Fprintf(stderr, "ullage check: no record written to %s\n", pdfPath)
			return ExitUsage
		}
		c := results[0]
		var buf bytes.Buffer
		ro.Tolerance = c.tolerance
		ro.Appendix = o.bools["appendix"]
		if err := report.WriteAssessment(&buf, recordMeta(c.file, c.revision, o), c.assessment, ro); err != nil {
			fmt.Fprintf(stderr, "ullage check: writing the record: %v\n", err)
			return ExitUsage
		}
		if err := writeOutput("--pdf", pdfPath, buf.Bytes()); err != nil {
			fmt.Fprintf(stderr, "ullage check: %v\n", err)
			return ExitUsage
		}
		fmt.Fprintf(stderr, "ullage check: record written to %s\n", absOrAsTyped(pdfPath))
	}
	if o.bools["json"] {
		if err := writeCheckJSON(stdout, results, len(paths) == 1 && !isDir(o.positional[0]), o.bools["trace"]); err != nil {
			fmt.Fprintf(stderr, "ullage check: %v\n", err)
			return ExitUsage
		}
	} else {
		// A folder gets the table even when it holds one design.
		writeCheckText(stdout, results, ro.Units, len(paths) > 1 || isDir(o.positional[0]))
	}
	if bad > 0 {
		return ExitUsage
	}
	for _, c := range results {
		if c.assessment.Verdict == hazards.StatusFail {
			return ExitFail
		}
	}
	return ExitPass
}

func checkOne(path, rev string, lib *fluids.Library) checked {
	c := checked{path: path}
	f, err := designfile.Load(path)
	if err != nil {
		c.err = err
		return c
	}
	c.file = f
	if rev != "" {
		c.revision, err = f.Find(rev)
	} else {
		c.revision, err = f.Latest()
	}
	if err != nil {
		c.err = fmt.Errorf("%s: %w", path, err)
		return c
	}
	a, err := hazards.Assess(c.revision.Design, lib)
	if err != nil {
		c.err = fmt.Errorf("%s, revision %s: %w", path, c.revision.Label, err)
		return c
	}
	c.assessment = a
	return c
}

// expandPaths replaces each folder by the design files (*.json) in it,
// sorted by name.
// studySettings reads --samples, --seed and --hot-spread-k; nil when no
// tolerance study was asked for.
func studySettings(o *options) (*tolerance.Settings, error) {
	n, err := o.integer("samples", 0)
	if err != nil {
		return nil, err
	}
	if _, given := o.values["samples"]; !given {
		for _, f := range []string{"seed", "hot-spread-k"} {
			if _, s := o.values[f]; s {
				return nil, fmt.Errorf("--%s belongs to the tolerance study: give --samples N as well", f)
			}
		}
		return nil, nil
	}
	if n < 1 || n > tolerance.MaxSamples {
		return nil, fmt.Errorf("--samples %d: give 1 to %d units", n, tolerance.MaxSamples)
	}
	seed, err := o.integer("seed", 1)
	if err != nil {
		return nil, err
	}
	if seed < 0 {
		return nil, fmt.Errorf("--seed %d: give a whole number of zero or more", seed)
	}
	spread, _, err := o.float("hot-spread-k")
	if err != nil {
		return nil, err
	}
	if !(spread >= 0 && spread <= maxHotSpreadK) {
		return nil, fmt.Errorf("--hot-spread-k %s: give a spread from 0 to %g K", o.value("hot-spread-k", ""), float64(maxHotSpreadK))
	}
	return &tolerance.Settings{Samples: n, Seed: uint64(seed), HottestSpreadK: spread}, nil
}

// maxHotSpreadK is the largest --hot-spread-k the tolerance study takes.
const maxHotSpreadK = 100

func expandPaths(args []string) ([]string, error) {
	var out []string
	for _, a := range args {
		st, err := os.Stat(a)
		if err != nil {
			return nil, fmt.Errorf("%s: %v", a, plainError(err))
		}
		if !st.IsDir() {
			out = append(out, a)
			continue
		}
		matches, err := filepath.Glob(filepath.Join(a, "*.json"))
		if err != nil {
			return nil, err
		}
		if len(matches) == 0 {
			return nil, fmt.Errorf("%s: no design files (*.json) in this folder", a)
		}
		sort.Strings(matches)
		out = append(out, matches...)
	}
	return out, nil
}

func isDir(p string) bool {
	st, err := os.Stat(p)
	return err == nil && st.IsDir()
}

func reportOptions(o *options) (report.Options, error) {
	if r := o.value("reviewer", ""); !utf8.ValidString(r) {
		return report.Options{}, fmt.Errorf("--reviewer: the name is not valid UTF-8 text")
	} else if utf8.RuneCountInString(r) > designfile.MaxNameLength {
		return report.Options{}, fmt.Errorf("--reviewer: the name is %d characters long; at most %d are accepted", utf8.RuneCountInString(r), designfile.MaxNameLength)
	}
	ro := report.Options{Units: o.value("units", "si"), Paper: o.value("paper", "a4")}
	if ro.Units != "si" && ro.Units != "us" {
		return ro, fmt.Errorf("--units %q: use si or us", ro.Units)
	}
	if ro.Paper != "a4" && ro.Paper != "letter" {
		return ro, fmt.Errorf("--paper %q: use a4 or letter", ro.Paper)
	}
	return ro, nil
}

func recordMeta(f *designfile.File, r *designfile.Revision, o *options) report.Meta {
	return report.Meta{
		Product:          f.Product.Name,
		PartNumber:       f.Product.PartNumber,
		Company:          f.Product.Company,
		Revision:         r.Label,
		RevisionDate:     r.Date,
		RevisionAuthor:   r.Author,
		ChangeNote:       r.ChangeNote,
		Reviewer:         o.value("reviewer", ""),
		Date:             time.Now(),
		ToolVersion:      buildinfo.Describe(),
		FluidDataVersion: fluids.DataVersion,
		Fingerprint:      r.Fingerprint(),
	}
}

func writeCheckText(w io.Writer, results []checked, unitSystem string, table bool) {
	if len(results) == 1 && !table {
		if results[0].err != nil {
			fmt.Fprintf(w, "%s: ERROR, not assessed: %v\n\nverdict: ERROR\n", results[0].path, results[0].err)
			return
		}
		writeOneText(w, results[0], unitSystem)
		return
	}
	sys := display.ParseSystem(unitSystem)
	fmt.Fprintf(w, "%-34s %-4s %-9s %-12s %10s %9s %14s  %s\n", "design", "rev", "verdict", "phase", "pressure", "ullage", "burst SF", "failing criteria")
	failed := 0
	for _, c := range results {
		if c.err != nil {
			failed++
			fmt.Fprintf(w, "%-34s %-4s %-9s %v\n", trim(filepath.Base(c.path), 34), "-", "ERROR", c.err)
			continue
		}
		a := c.assessment
		fmt.Fprintf(w, "%-34s %-4s %-9s %-12s %10s %9s %14s  %s\n", trim(filepath.Base(c.path), 34), c.revision.Label,
			strings.ToUpper(string(a.Verdict)), a.Hot.Phase, sys.Format(display.Pressure, a.Hot.PressurePa), sys.Format(display.Percent, a.Hot.UllagePercent), sfText(a), failingCriteria(a, sys))
	}
	if failed > 0 {
		fmt.Fprintf(w, "\nverdict: ERROR (%d of %d designs could not be assessed)\n", failed, len(results))
		return
	}
	fails := 0
	for _, c := range results {
		if c.assessment.Verdict == hazards.StatusFail {
			fails++
		}
	}
	fmt.Fprintf(w, "\nverdict: %s (overall, %d of %d designs fail)\n", strings.ToUpper(overallVerdict(results)), fails, len(results))
}

// failingCriteria names the criteria a design fails by the titles the
// window and the record give them (display.FailingTitles), "none" when
// it fails none.
func failingCriteria(a *hazards.Assessment, sys display.System) string {
	names := display.FailingTitles(display.Findings(a, sys))
	if len(names) == 0 {
		return "none"
	}
	return strings.Join(names, "; ")
}

// absOrAsTyped is path made absolute, or as typed when that fails.
func absOrAsTyped(path string) string {
	if abs, err := filepath.Abs(path); err == nil {
		return abs
	}
	return path
}

// verdictError is the overall verdict when any input could not be
// assessed.
const verdictError = "error"

// overallVerdict is the worst verdict of the results, or verdictError
// when any could not be assessed.
func overallVerdict(results []checked) string {
	v := hazards.StatusPass
	for _, c := range results {
		if c.err != nil {
			return verdictError
		}
		v = hazards.Worse(v, c.assessment.Verdict)
	}
	return string(v)
}

func writeOneText(w io.Writer, c checked, unitSystem string) {
	a := c.assessment
	fmt.Fprintf(w, "%s — %s, revision %s (%s)\n", c.path, c.file.Product.Name, c.revision.Label, c.revision.Date)
	sys := display.ParseSystem(unitSystem)
	fmt.Fprintf(w, "fluid %s, fill %s in %s\n", a.Fluid.Name, sys.Format(display.Mass, a.Design.FillMassKg), sys.Format(display.VesselVolume, a.VolumeM3))
	fmt.Fprintf(w, "at the hottest %s: %s, %s absolute, ullage %s\n", sys.Format(display.Temperature, a.Design.HottestK), a.Hot.Phase,
		sys.Format(display.Pressure, a.Hot.PressurePa), sys.Format(display.Percent, a.Hot.UllagePercent))
	if a.LiquidFullReached {
		fmt.Fprintf(w, "liquid-full at %s\n", sys.Format(display.Temperature, a.LiquidFullK))
	} else {
		fmt.Fprintln(w, "never liquid-full below the critical temperature")
	}
	fmt.Fprintln(w)
	for _, v := range display.Findings(a, sys) {
		fmt.Fprintf(w, "  %-12s %s\n               %s\n               %s\n", v.Status, v.Title, v.Numbers(), v.Text())
	}
	fmt.Fprintf(w, "\nverdict: %s (%s)\n", strings.ToUpper(string(a.Verdict)), display.Tally(a.Findings))
	if c.tolerance != nil {
		writeToleranceText(w, c.tolerance, sys)
	}
	fmt.Fprintf(w, "\n%s\n", hazards.StandardCautions[0])
}

func trim(s string, n int) string {
	if len([]rune(s)) <= n {
		return s
	}
	return string([]rune(s)[:n-1]) + "…"
}

// sfText is the burst safety factor for the summary table: "none" when
// nothing loads the vessel, "≥" before a capped factor.
func sfText(a *hazards.Assessment) string {
	for _, f := range a.Findings {
		if f.Criterion == hazards.CriterionBurst {
			return display.FindingValue(f)
		}
	}
	return display.NoValue
}

func writeCheckJSON(w io.Writer, results []checked, single, trace bool) error {
	one := func(c checked) any {
		if c.err != nil {
			return failedJSON(c.path, c.err)
		}
		d := checkJSON(c)
		if trace {
			d.Trace = c.assessment.Trace()
		}
		return d
	}
	var out any
	if single && len(results) == 1 {
		out = one(results[0])
	} else {
		all := struct {
			Verdict string `json:"verdict"`
			Designs []any  `json:"designs"`
		}{Verdict: overallVerdict(results), Designs: []any{}}
		for _, c := range results {
			all.Designs = append(all.Designs, one(c))
		}
		out = all
	}
	return encodeJSON(w, out)
}

// encodeJSON encodes v indented into memory first, so that a failure
// prints nothing rather than half a document.
func encodeJSON(w io.Writer, v any) error {
	var buf bytes.Buffer
	enc := json.NewEncoder(&buf)
	enc.SetIndent("", "  ")
	if err := enc.Encode(v); err != nil {
		return fmt.Errorf("the JSON output cannot be written: %w", err)
	}
	_, err := w.Write(buf.Bytes())
	return err
}
