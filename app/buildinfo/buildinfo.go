// Package buildinfo holds the program's name and version, printed on every
// record and in the About box. The version matches FyneApp.toml.
package buildinfo

// Name is the program's name.
const Name = "Ullage"

// Version is the program's version.
const Version = "0.1.0"
