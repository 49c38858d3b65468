// Package fluids holds Ullage's built-in library of volatile working
// liquids and the property correlations used to describe them: vapour
// pressure (Antoine or Wagner, joined smoothly to the critical point),
// saturated liquid density (Rackett), saturated vapour and supercritical
// density (Peng–Robinson with a volume translation), compressed-liquid
// density (the Tait form of Thomson, Brobst and Hankinson), heat of
// vaporisation (Watson) and the flammability and exposure-limit data a
// safety review needs.
//
// Every built-in number carries its source in the embedded JSON files
// under data/. The limit sets under limits/ (limitsets.go) hold the
// public acute benchmarks (AEGL, DOE PAC) and the EU, UK and German
// occupational limits, one table per set, apart from the fluid records. All quantities are SI: K, Pa, kg, m³, J. Conversions to
// °C, bar or ppm belong to the edges of the program (see package units).
package fluids
