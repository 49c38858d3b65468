package cli

import (
	"fmt"
	"io"
	"os"

	"ullage/app/buildinfo"
	"ullage/fluids"
)

// Exit statuses.
const (
	ExitPass  = 0 // every finding passes (cautions allowed)
	ExitFail  = 1 // at least one finding fails
	ExitUsage = 2 // bad input or usage; nothing written
)

type command struct {
	summary string
	run     func(args []string, stdout, stderr io.Writer) int
}

func commands() map[string]command {
	return map[string]command{
		"check":       {"assess design files (a folder checks every design in it)", runCheck},
		"compare":     {"compare two revisions, of one file or of two files", runCompare},
		"fluids":      {"list the fluid library with its sources", runFluids},
		"fluid-state": {"saturation properties of a fluid at a temperature", runFluidState},
		"version":     {"print the version", runVersion},
		"help":        {"show this help", runHelp},
	}
}

// IsCommand reports whether s names a command-line subcommand, so that
// main can run it without opening a window.
func IsCommand(s string) bool {
	_, ok := commands()[s]
	return ok || s == "-h" || s == "--help" || s == "--version"
}

// Run runs the subcommand named by args[0] and returns the exit status.
func Run(args []string, stdout, stderr io.Writer) int {
	if len(args) == 0 {
		return runHelp(nil, stdout, stderr)
	}
	switch args[0] {
	case "-h", "--help":
		return runHelp(nil, stdout, stderr)
	case "--version":
		return runVersion(nil, stdout, stderr)
	}
	c, ok := commands()[args[0]]
	if !ok {
		fmt.Fprintln(stderr, "ullage: "+unknownCommand(args[0]))
		return ExitUsage
	}
	return c.run(args[1:], stdout, stderr)
}

const usageText = `Ullage %s — sealed volatile-fluid glass device review

Usage:
  ullage [DESIGN.json]                     open the review window
  ullage check FILE|FOLDER... [flags]      assess the latest revision of each design
      --rev LABEL       assess this revision instead of the latest
      --json            print machine-readable results
      --pdf OUT.pdf     write the assessment record (one design only); an
                        existing file is replaced only when it is a record
                        written by Ullage, never when it is one of the inputs
      --replace         allow --pdf to replace a file that is not such a record
      --units si|us     units of the text and PDF output (default si)
      --paper a4|letter paper size of the PDF (default a4)
      --reviewer NAME   reviewer printed on the PDF
      --trace           add the calculation record to the --json output
      --appendix        add the calculation record to the --pdf record as an annex
      --samples N       add a tolerance study of N sampled units
      --seed S          seed of the study (default 1; same seed, same answer)
      --hot-spread-k K  ± spread of the hottest temperature in the study
      --fluids FILE     add fluids from a JSON file of your own
  ullage compare A.json B.json [flags]     compare the latest revisions of two files
  ullage compare FILE --rev X --rev Y      compare two revisions of one file
      --json, --pdf OUT.pdf, --replace, --units, --paper, --reviewer, --fluids as above
  ullage fluids [--json]                   list the fluid library with sources
  ullage fluid-state FLUID --temp-c T      saturation state at T °C [--json]
  ullage version

Exit status: 0 every finding passes (cautions allowed), 1 a finding fails,
2 bad input or usage, or any input could not be assessed (no output file is
written; --json still lists every input, a failed one with its error).
`

func runHelp(_ []string, stdout, _ io.Writer) int {
	fmt.Fprintf(stdout, usageText, buildinfo.Version)
	return ExitPass
}

func runVersion(_ []string, stdout, _ io.Writer) int {
	fmt.Fprintf(stdout, "%s %s (fluid data %s)\n", buildinfo.Name, buildinfo.Describe(), fluids.DataVersion)
	return ExitPass
}

// library returns the built-in fluid library, extended by a user fluid
// file when --fluids is given.
func library(o *options) (*fluids.Library, error) {
	lib, err := fluids.Builtin()
	if err != nil {
		return nil, err
	}
	path := o.value("fluids", "")
	if path == "" {
		return lib, nil
	}
	// A stat before opening: opening a named pipe would wait for ever.
	info, err := os.Stat(path)
	if err != nil {
		return nil, fmt.Errorf("--fluids %s: %v", path, plainError(err))
	}
	if !info.Mode().IsRegular() {
		return nil, fmt.Errorf("--fluids %s: is not an ordinary file (a folder, named pipe or device); give a fluid file", path)
	}
	f, err := os.Open(path)
	if err != nil {
		return nil, fmt.Errorf("--fluids %s: %v", path, plainError(err))
	}
	defer f.Close()
	extra, err := fluids.LoadUserFluids(f)
	if err != nil {
		return nil, fmt.Errorf("--fluids %s: %w", path, err)
	}
	out, err := lib.Extend(extra...)
	if err != nil {
		return nil, fmt.Errorf("--fluids %s: %w", path, err)
	}
	return out, nil
}

// usageError prints a usage problem and returns ExitUsage.
func usageError(stderr io.Writer, cmd string, err error) int {
	fmt.Fprintf(stderr, "ullage %s: %v\n", cmd, err)
	return ExitUsage
}
