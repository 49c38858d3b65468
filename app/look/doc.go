// Package look is the review window's theme: Ullage's own colours (a
// deep blue-green accent on a warm paper ground) over the toolkit's sizes,
// fonts and icons, in a light or a dark variant, and the Compact and Dense
// variants with less padding for long runs of short lines.
package look
