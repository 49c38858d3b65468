package chartmodel

import (
	"math"

	"ullage/hazards/tolerance"
	"ullage/report/display"
)

// Histogram describes the bar chart of the sampled units' burst safety
// factors. Its range is the histogram's own, taken from the data by the
// study; the notes say how many units fall outside it and how many carry
// no burst load at all.
func Histogram(title string, h tolerance.Histogram) Chart {
	ch := Chart{
		Title: title,
		X:     Axis{Label: "Unit safety factor (strength over stress)"},
		Y:     Axis{Label: "Units", Whole: true},
	}
	total := h.Below + h.Above + h.NoLoad
	for _, c := range h.Counts {
		total += c
	}
	switch {
	case len(h.Counts) == 0 || len(h.Edges) != len(h.Counts)+1:
		ch.Empty = "No histogram: the study has not run."
		return ch
	case h.NoLoad == total:
		ch.Empty = "All " + display.Units(total) + " carry no burst load at their hottest temperature: there is nothing to draw."
		return ch
	}
	ch.Bars = &Bars{Edges: h.Edges, Counts: h.Counts}
	maxC := 1
	for _, c := range h.Counts {
		maxC = max(maxC, c)
	}
	ch.X.Min, ch.X.Max = h.Edges[0], h.Edges[len(h.Edges)-1]
	ch.X.Log = h.Log // factors spread over decades: bins equal in the logarithm
	ch.Y.Min, ch.Y.Max = LinearRange(0, float64(maxC)*1.1)
	ch.Y.Max = math.Max(math.Ceil(ch.Y.Max), 1)
	if ch.X.Min < 1 && ch.X.Max > 1 {
		ch.Lines = append(ch.Lines, Line{Label: "Bursts below a factor of 1", Value: 1, Vertical: true, Style: Style{Dashed, 1, Red}})
	}
	shown := total - h.Below - h.Above - h.NoLoad
	ch.Notes = append(ch.Notes, display.Count(shown)+" of "+display.Units(total)+" "+display.Agree(shown, "is", "are")+" drawn; "+
		display.Count(h.Below)+" "+display.Agree(h.Below, "lies", "lie")+" below and "+display.Count(h.Above)+" above the range shown.")
	if n := h.NoLoad; n > 0 {
		ch.Notes = append(ch.Notes, display.Units(n)+" "+display.Agree(n, "is", "are")+" not over-pressurised at "+display.Agree(n, "its", "their")+
			" hottest temperature and "+display.Agree(n, "carries", "carry")+" no burst load; "+display.Agree(n, "it is", "they are")+" not drawn.")
	}
	return ch
}

// Drivers describes the ranked bar chart of the inputs' rank correlation
// with the units' safety factor, from −1 to +1.
func Drivers(title string, ds []tolerance.Driver) Chart {
	ch := Chart{Title: title, X: Axis{Label: "Rank correlation with the unit safety factor", Min: -1, Max: 1}}
	if len(ds) == 0 {
		ch.Empty = "No inputs vary."
		return ch
	}
	moved := false
	for _, d := range ds {
		ch.Ranked = append(ch.Ranked, Bar{Label: d.Label, Value: d.RankCorrelation})
		if math.Abs(d.RankCorrelation) >= 0.005 {
			moved = true
		}
	}
	if !moved {
		ch.Notes = append(ch.Notes, "No varied input moves the safety factor: every rank correlation rounds to zero.")
	}
	return ch
}
