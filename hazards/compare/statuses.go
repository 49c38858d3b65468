package compare

import "ullage/hazards"

// statusChanges lists the criteria whose status differs, in A's finding
// order and then those found only in B. A side without an assessment has
// no findings, so each of the other side's criteria counts as changed.
// The lists are a few dozen findings long: they are searched in place.
func statusChanges(a, b *hazards.Assessment) []StatusChange {
	oldF, newF := findings(a), findings(b)
	var out []StatusChange
	for side, list := range [][]hazards.Finding{oldF, newF} {
		for i := range list {
			f := &list[i]
			// Each criterion once: at its first finding in A, else at its
			// first in B.
			if side == 0 && firstIndex(oldF, f.Criterion) < i ||
				side == 1 && (firstIndex(oldF, f.Criterion) < len(oldF) || firstIndex(newF, f.Criterion) < i) {
				continue
			}
			oldS, newS := StatusAbsent, StatusAbsent
			title := f.Title
			if o := lastIndex(oldF, f.Criterion); o >= 0 {
				oldS = oldF[o].Status
			}
			if n := lastIndex(newF, f.Criterion); n >= 0 {
				newS, title = newF[n].Status, newF[n].Title
			}
			if oldS != newS {
				out = append(out, StatusChange{Criterion: f.Criterion, Title: title, Old: oldS, New: newS})
			}
		}
	}
	return out
}

// firstIndex returns the place of the first finding of the criterion, or
// len(fs) when there is none.
func firstIndex(fs []hazards.Finding, criterion string) int {
	for i := range fs {
		if fs[i].Criterion == criterion {
			return i
		}
	}
	return len(fs)
}

// lastIndex returns the place of the last finding of the criterion, or -1.
func lastIndex(fs []hazards.Finding, criterion string) int {
	for i := len(fs) - 1; i >= 0; i-- {
		if fs[i].Criterion == criterion {
			return i
		}
	}
	return -1
}

func findings(a *hazards.Assessment) []hazards.Finding {
	if a == nil {
		return nil
	}
	return a.Findings
}
