// Package fluidfind finds a fluid of the library from what a reviewer
// types (an ID, a name, a synonym, a CAS number or the start of a name)
// and sorts fluid names the way people look them up: by the name itself,
// ignoring case, locants and prefixes such as "1,2-" and "n-". It needs
// no window.
package fluidfind
