// Package compare sets two revisions of a design side by side: which
// inputs changed, how every headline result moved (and whether for the
// better or the worse), and which review findings changed status. It
// only reads designs and assessments; it computes nothing of its own.
package compare
