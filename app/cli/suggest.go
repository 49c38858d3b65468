package cli

import (
	"fmt"
	"slices"
	"strings"
)

// maxTypoDistance is the largest number of single-letter edits (insert,
// delete, replace, swap two neighbours) between a mistyped word and a
// command for the command to be suggested: two catches the usual slips
// ("chekc", "compre", "fluid") and no command is within two of another.
const maxTypoDistance = 2

// unknownCommand says that word is not a command, naming the nearest
// command when one is close: "unknown command 'chekc'; did you mean
// 'check'?". A word that looks like a file name says that it is neither
// a command nor an existing file, since a file would have opened the
// window.
func unknownCommand(word string) string {
	if near := nearestCommand(word); near != "" {
		return fmt.Sprintf("unknown command '%s'; did you mean '%s'?", word, near)
	}
	if strings.ContainsAny(word, `/\.`) {
		return fmt.Sprintf("'%s' is neither a command nor an existing file (try: ullage help)", word)
	}
	return fmt.Sprintf("unknown command '%s' (try: ullage help)", word)
}

// nearestCommand returns the command closest to word within
// maxTypoDistance edits, or "".
func nearestCommand(word string) string {
	names := make([]string, 0, len(commands()))
	for name := range commands() {
		names = append(names, name)
	}
	slices.Sort(names) // ties go to the first name, the same every run
	best, bestDist := "", maxTypoDistance+1
	for _, name := range names {
		if d := editDistance(strings.ToLower(word), name); d < bestDist {
			best, bestDist = name, d
		}
	}
	return best
}

// editDistance is the optimal string alignment distance between a and b:
// the fewest insertions, deletions, replacements and swaps of two
// neighbouring letters that turn a into b.
func editDistance(a, b string) int {
	ra, rb := []rune(a), []rune(b)
	prev2 := make([]int, len(rb)+1)
	prev := make([]int, len(rb)+1)
	cur := make([]int, len(rb)+1)
	for j := range prev {
		prev[j] = j
	}
	for i := 1; i <= len(ra); i++ {
		cur[0] = i
		for j := 1; j <= len(rb); j++ {
			cost := 1
			if ra[i-1] == rb[j-1] {
				cost = 0
			}
			cur[j] = min(prev[j]+1, cur[j-1]+1, prev[j-1]+cost)
			if i > 1 && j > 1 && ra[i-1] == rb[j-2] && ra[i-2] == rb[j-1] {
				cur[j] = min(cur[j], prev2[j-2]+1)
			}
		}
		prev2, prev, cur = prev, cur, prev2
	}
	return prev[len(rb)]
}
