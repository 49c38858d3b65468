// Package parse reads numbers as people type them into the window: a
// decimal number with a point or a single decimal comma, and a whole
// count with its digits grouped by spaces or underscores. Text that is
// not such a number is refused, never read as NaN, infinity or part of
// a number.
package parse
