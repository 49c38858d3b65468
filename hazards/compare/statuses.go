package compare

import "ullage/hazards"

// statusChanges lists the criteria whose status differs, in A's finding
// order and then those found only in B. A side without an assessment has
// no findings, so each of the other side's criteria counts as changed.
func statusChanges(a, b *hazards.Assessment) []StatusChange {
	oldF, newF := findings(a), findings(b)
	index := func(fs []hazards.Finding) map[string]hazards.Finding {
		m := make(map[string]hazards.Finding, len(fs))
		for _, f := range fs {
			m[f.Criterion] = f
		}
		return m
	}
	oldBy, newBy := index(oldF), index(newF)
	var out []StatusChange
	seen := map[string]bool{}
	for _, list := range [][]hazards.Finding{oldF, newF} {
		for _, f := range list {
			if seen[f.Criterion] {
				continue
			}
			seen[f.Criterion] = true
			oldS, newS := StatusAbsent, StatusAbsent
			title := f.Title
			if o, ok := oldBy[f.Criterion]; ok {
				oldS = o.Status
			}
			if n, ok := newBy[f.Criterion]; ok {
				newS, title = n.Status, n.Title
			}
			if oldS != newS {
				out = append(out, StatusChange{Criterion: f.Criterion, Title: title, Old: oldS, New: newS})
			}
		}
	}
	return out
}

func findings(a *hazards.Assessment) []hazards.Finding {
	if a == nil {
		return nil
	}
	return a.Findings
}
