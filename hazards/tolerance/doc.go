// Package tolerance is Ullage's sampled tolerance study. Fill mass,
// internal volume, wall thickness, glass strength and the hottest
// temperature vary from unit to unit; Run draws many units, evaluates each
// with the assessment engine (hazards.UnitModel) and turns the outcomes
// into the fractions of units that burst, go liquid-full or release more
// than a published exposure limit allows, each with a 95 % confidence
// interval, together with percentiles and a histogram of the pressure and
// the burst safety factor and a ranking of the inputs by how strongly they
// move the safety margin.
//
// The same seed gives the same result, bit for bit, whatever the number of
// workers: units are drawn in fixed chunks, each from its own random
// stream derived from the seed and the chunk's index.
package tolerance
