package cli

import (
	"bytes"
	"encoding/json"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"testing"
)

func run(args ...string) (int, string, string) {
	var out, errb bytes.Buffer
	code := Run(args, &out, &errb)
	return code, out.String(), errb.String()
}

func TestExitStatuses(t *testing.T) {
	tests := []struct {
		name      string
		args      []string
		code      int
		stdoutHas string
		stderrHas string
	}{
		{"latest revision passes", []string{"check", "testdata/good.json"}, ExitPass, "verdict: PASS", ""},
		{"revision A fails", []string{"check", "testdata/good.json", "--rev", "A"}, ExitFail, "liquid-full", ""},
		{"unknown revision", []string{"check", "testdata/good.json", "--rev", "Z"}, ExitUsage, "", "Z"},
		{"missing file", []string{"check", "testdata/nope.json"}, ExitUsage, "", "nope.json"},
		{"malformed file", []string{"check", "testdata/malformed.json"}, ExitUsage, "", "malformed.json"},
		{"folder of mixed files", []string{"check", "testdata/mixed"}, ExitUsage, "a-good.json", "c-negative-fill.json"},
		{"no arguments", []string{"check"}, ExitUsage, "", "design file"},
		{"unknown flag", []string{"check", "--colour", "testdata/good.json"}, ExitUsage, "", "--colour"},
		{"bad units", []string{"check", "--units", "cubits", "testdata/good.json"}, ExitUsage, "", "cubits"},
		{"unknown command", []string{"frobnicate"}, ExitUsage, "", "frobnicate"},
		{"fluids", []string{"fluids"}, ExitPass, "Dichloromethane", ""},
		{"fluid-state", []string{"fluid-state", "ethanol", "--temp-c", "25"}, ExitPass, "vapour pressure", ""},
		{"fluid-state below freezing", []string{"fluid-state", "water", "--temp-c", "-40"}, ExitUsage, "", "freezing point"},
		{"fluid-state NaN", []string{"fluid-state", "water", "--temp-c", "NaN"}, ExitUsage, "", "finite"},
		{"fluid-state unknown fluid", []string{"fluid-state", "unobtainium", "--temp-c", "20"}, ExitUsage, "", "unobtainium"},
		{"compare revisions", []string{"compare", "testdata/good.json", "--rev", "A", "--rev", "B"}, ExitPass, "FAIL → PASS", ""},
		{"compare needs two", []string{"compare", "testdata/good.json"}, ExitUsage, "", "two files"},
		{"help", []string{"help"}, ExitPass, "Usage", ""},
		{"version", []string{"version"}, ExitPass, "Ullage", ""},
	}
	for _, tt := range tests {
		code, out, errs := run(tt.args...)
		if code != tt.code {
			t.Errorf("%s: exit %d, want %d\nstdout: %s\nstderr: %s", tt.name, code, tt.code, out, errs)
		}
		if tt.stdoutHas != "" && !strings.Contains(out, tt.stdoutHas) {
			t.Errorf("%s: stdout lacks %q:\n%s", tt.name, tt.stdoutHas, out)
		}
		if tt.stderrHas != "" && !strings.Contains(errs, tt.stderrHas) {
			t.Errorf("%s: stderr lacks %q:\n%s", tt.name, tt.stderrHas, errs)
		}
	}
}

// TestCheckJSONKeys checks the documented keys of check --json.
func TestCheckJSONKeys(t *testing.T) {
	code, out, errs := run("check", "--json", "--rev", "A", "testdata/good.json")
	if code != ExitFail {
		t.Fatalf("exit %d, stderr %s", code, errs)
	}
	var m map[string]any
	if err := json.Unmarshal([]byte(out), &m); err != nil {
		t.Fatalf("not JSON: %v\n%s", err, out)
	}
	for _, k := range []string{"verdict", "phase", "pressure_kpa", "liquid_full_temperature_c", "ullage_percent",
		"burst_safety_factor", "failure_probability", "max_safe_temperature_c", "max_safe_fill_mass_g",
		"stored_energy_j", "peak_concentration_ppm", "stel_average_ppm", "twa_8h_ppm", "percent_lfl", "findings"} {
		if _, ok := m[k]; !ok {
			t.Errorf("key %q missing", k)
		}
	}
	if m["verdict"] != "fail" || m["phase"] != "liquid-full" {
		t.Errorf("verdict %v, phase %v; want fail, liquid-full", m["verdict"], m["phase"])
	}
	findings, _ := m["findings"].([]any)
	if len(findings) == 0 {
		t.Fatal("no findings")
	}
	for _, f := range findings {
		fm := f.(map[string]any)
		for _, k := range []string{"criterion", "status", "value", "limit", "source", "message"} {
			if _, ok := fm[k]; !ok {
				t.Errorf("finding lacks %q: %v", k, fm)
			}
		}
	}
	// A folder gives the summary form.
	code, out, _ = run("check", "--json", "testdata/good.json", "testdata/good.json")
	if code != ExitPass || !strings.Contains(out, `"designs"`) {
		t.Errorf("several files: exit %d, output %s", code, out)
	}
}

func TestPropsJSON(t *testing.T) {
	code, out, _ := run("fluid-state", "water", "--temp-c", "100", "--json")
	if code != ExitPass {
		t.Fatalf("exit %d", code)
	}
	var m map[string]any
	if err := json.Unmarshal([]byte(out), &m); err != nil {
		t.Fatal(err)
	}
	for _, k := range []string{"psat_kpa", "liquid_density_kg_m3", "vapour_density_kg_m3", "extrapolated"} {
		if _, ok := m[k]; !ok {
			t.Errorf("key %q missing", k)
		}
	}
	// Water boils at 100 °C under one standard atmosphere, 101.325 kPa
	// (ITS-90; IAPWS-95 gives 101.418 kPa at exactly 100 °C): within 0.5 %.
	if p := m["psat_kpa"].(float64); p < 100.9 || p > 101.9 {
		t.Errorf("water at 100 °C: %g kPa, want about 101.4 (IAPWS-95)", p)
	}
}

// TestNoPartialOutput: bad input never leaves an output file behind.
func TestNoPartialOutput(t *testing.T) {
	dir := t.TempDir()
	for _, args := range [][]string{
		{"check", "testdata/malformed.json", "--pdf", filepath.Join(dir, "a.pdf")},
		{"check", "testdata/mixed", "--pdf", filepath.Join(dir, "b.pdf")},
		{"check", "testdata/nope.json", "--pdf", filepath.Join(dir, "c.pdf")},
	} {
		if code, _, _ := run(args...); code != ExitUsage {
			t.Errorf("%v: exit %d, want %d", args, code, ExitUsage)
		}
	}
	entries, _ := os.ReadDir(dir)
	if len(entries) != 0 {
		t.Errorf("files left behind: %v", entries)
	}
}

// TestPDFOutput writes both records and reads their text back.
func TestPDFOutput(t *testing.T) {
	if _, err := exec.LookPath("pdftotext"); err != nil {
		t.Skip("pdftotext (poppler-utils) not installed")
	}
	dir := t.TempDir()
	one := filepath.Join(dir, "record.pdf")
	if code, _, errs := run("check", "testdata/good.json", "--rev", "A", "--pdf", one, "--reviewer", "Q. Reviewer"); code != ExitFail {
		t.Fatalf("check --pdf: exit %d: %s", code, errs)
	}
	two := filepath.Join(dir, "compare.pdf")
	if code, _, errs := run("compare", "testdata/good.json", "--rev", "A", "--rev", "B", "--pdf", two); code != ExitPass {
		t.Fatalf("compare --pdf: exit %d: %s", code, errs)
	}
	for _, p := range []string{one, two} {
		out, err := exec.Command("pdftotext", "-enc", "UTF-8", p, "-").Output()
		if err != nil {
			t.Fatalf("%s: %v", p, err)
		}
		if !strings.Contains(string(out), "Tidemark Lantern") {
			t.Errorf("%s lacks the product name", p)
		}
	}
}

// TestTraceInJSON: --trace archives the calculation record.
func TestTraceInJSON(t *testing.T) {
	code, out, errs := run("check", "--json", "--trace", "testdata/good.json")
	if code != ExitPass {
		t.Fatalf("exit %d: %s", code, errs)
	}
	var m struct {
		Trace []struct {
			Number   int    `json:"number"`
			Equation string `json:"equation"`
			Source   string `json:"source"`
		} `json:"trace"`
		Findings []struct {
			Steps []int `json:"steps"`
		} `json:"findings"`
	}
	if err := json.Unmarshal([]byte(out), &m); err != nil {
		t.Fatal(err)
	}
	if len(m.Trace) < 20 || m.Trace[0].Number != 1 || m.Trace[0].Equation == "" || m.Trace[0].Source == "" {
		t.Errorf("trace missing or incomplete: %d steps", len(m.Trace))
	}
	for _, f := range m.Findings {
		if len(f.Steps) == 0 {
			t.Errorf("finding without steps")
		}
	}
	if code, _, _ := run("check", "--trace", "testdata/good.json"); code != ExitUsage {
		t.Errorf("--trace without --json: exit %d, want %d", code, ExitUsage)
	}
}

// TestToleranceStudyJSON: check --samples adds the study with its
// intervals, and the same seed gives the same answer.
func TestToleranceStudyJSON(t *testing.T) {
	runStudy := func(seed string) map[string]any {
		code, out, errs := run("check", "--json", "--samples", "4000", "--seed", seed, "--rev", "A", "testdata/good.json")
		if code != ExitFail {
			t.Fatalf("exit %d: %s", code, errs)
		}
		var m map[string]any
		if err := json.Unmarshal([]byte(out), &m); err != nil {
			t.Fatal(err)
		}
		tol, ok := m["tolerance"].(map[string]any)
		if !ok {
			t.Fatalf("no tolerance block in %s", out)
		}
		return tol
	}
	a, b := runStudy("7"), runStudy("7")
	for _, k := range []string{"liquid_full_fraction", "burst_fraction", "exposure_exceed_fraction", "pressure_pa", "safety_factor", "sensitivity", "histogram"} {
		if _, ok := a[k]; !ok {
			t.Errorf("tolerance lacks %q", k)
		}
	}
	ja, _ := json.Marshal(a)
	jb, _ := json.Marshal(b)
	if string(ja) != string(jb) {
		t.Error("same seed gave different studies")
	}
	lf := a["liquid_full_fraction"].(map[string]any)
	if est := lf["estimate"].(float64); est < 0.5 {
		t.Errorf("revision A goes liquid-full at its nominal fill; the study says only %.3g of units do", est)
	}
	for _, bad := range [][]string{{"--samples", "0"}, {"--samples", "many"}, {"--seed", "3"}} {
		args := append([]string{"check", "testdata/good.json"}, bad...)
		if code, _, _ := run(args...); code != ExitUsage {
			t.Errorf("%v: exit %d, want %d", bad, code, ExitUsage)
		}
	}
}
