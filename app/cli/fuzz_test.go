package cli

import (
	"strings"
	"testing"
)

// FuzzParseArgs: the command line's argument parser and the readers of
// its values never panic; every error names a flag, and what parses as a
// study or record settings is within range.
func FuzzParseArgs(f *testing.F) {
	for _, s := range []string{
		"check d.json --json --pdf out.pdf",
		"--samples 10 --seed 3 --hot-spread-k 5 d.json",
		"--pdf= d.json",
		"--samples=-1",
		"--hot-spread-k NaN --samples 2",
		"--units us --paper letter --reviewer R",
		"-- --json",
		"--json=1",
		"--seed 99999999999999999999 --samples 1",
		"---pdf x",
		"--rev A --rev B",
	} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, line string) {
		args := strings.Split(line, " ")
		o, err := parseArgs(args, []string{"json", "trace", replaceFlag}, checkValueFlags)
		if err != nil {
			if !strings.Contains(err.Error(), "-") {
				t.Errorf("error names no flag: %v", err)
			}
			return
		}
		for name, vs := range o.values {
			for _, v := range vs {
				if v == "" {
					t.Errorf("--%s accepted an empty value", name)
				}
			}
		}
		st, err := studySettings(o)
		if err == nil && st != nil {
			if st.Samples < 1 || !(st.HottestSpreadK >= 0 && st.HottestSpreadK <= maxHotSpreadK) {
				t.Errorf("settings out of range accepted: %+v", *st)
			}
		}
		if err == nil && st == nil {
			for _, f := range []string{"seed", "hot-spread-k"} {
				if _, given := o.values[f]; given {
					t.Errorf("--%s accepted without --samples", f)
				}
			}
		}
		if err != nil && !strings.Contains(err.Error(), "--") {
			t.Errorf("study error names no flag: %v", err)
		}
		if ro, err := reportOptions(o); err == nil {
			if ro.Units != "si" && ro.Units != "us" || ro.Paper != "a4" && ro.Paper != "letter" {
				t.Errorf("report options out of range accepted: %+v", ro)
			}
		}
	})
}
