// Package cli is Ullage's command line: check, compare, fluids, fluid-state. It
// never opens a window and needs no display, so quality pipelines can run
// whole folders of designs. Exit status: 0 when every finding passes (a
// caution is not a failure), 1 when any finding fails, 2 for bad input or
// usage, with the problem named on stderr and no output file written.
package cli
