package fluidfind

import (
	"regexp"
	"slices"
	"sort"
	"strings"

	"ullage/fluids"
)

// namePrefix matches the parts of a chemical name that do not decide
// where it sorts: locants ("1,2-", "2-") and prefixes such as "n-",
// "iso-", "sec-", "tert-", "cis-", "trans-", "o-", "m-", "p-".
var namePrefix = regexp.MustCompile(`^(?i)((\d+(,\d+)*|n|o|m|p|iso|sec|tert|cis|trans)-)+`)

// SortKey is the part of a fluid's name it sorts by: lower case,
// without leading locants and prefixes ("n-Butane" sorts as "butane",
// "1,2-Dichloroethane" as "dichloroethane").
func SortKey(name string) string {
	return strings.ToLower(namePrefix.ReplaceAllString(strings.TrimSpace(name), ""))
}

// Sort sorts names (or selector texts that begin with a name) by their
// SortKey, the full text breaking ties.
func Sort(opts []string) {
	sort.SliceStable(opts, func(i, j int) bool {
		a, b := SortKey(opts[i]), SortKey(opts[j])
		if a != b {
			return a < b
		}
		return opts[i] < opts[j]
	})
}

// Find returns the fluid a reviewer's typing names: one the
// library knows by that ID, name, synonym or CAS number; otherwise the
// first, in list order, whose name or a synonym starts with the text
// (ignoring case, locants and prefixes). nil when none does.
func Find(lib *fluids.Library, typed string) *fluids.Substance {
	typed = strings.TrimSpace(typed)
	if typed == "" {
		return nil
	}
	if sub, err := lib.Lookup(typed); err == nil {
		return sub
	}
	want := looseKey(typed)
	starts := func(n string) bool {
		return strings.HasPrefix(looseKey(n), want) || strings.HasPrefix(looseKey(SortKey(n)), want)
	}
	// Names first, then synonyms: "eth" is ethanol before ethyl chloride.
	for _, bySynonym := range []bool{false, true} {
		var best *fluids.Substance
		bestKey := ""
		for _, sub := range lib.All() {
			f := sub.Fluid()
			names := []string{f.Name}
			if bySynonym {
				names = f.Synonyms
			}
			if slices.ContainsFunc(names, starts) {
				if k := SortKey(f.Name); best == nil || k < bestKey {
					best, bestKey = sub, k
				}
			}
		}
		if best != nil {
			return best
		}
	}
	return nil
}

// looseKey drops case, spaces and hyphens, so that "R-134a" and "r134a"
// compare equal.
func looseKey(s string) string {
	var b strings.Builder
	for _, r := range strings.ToLower(s) {
		if r != ' ' && r != '-' {
			b.WriteRune(r)
		}
	}
	return b.String()
}
