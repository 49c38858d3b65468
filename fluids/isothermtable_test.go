package fluids

import (
	"math"
	"math/rand/v2"
	"testing"

	"ullage/fluids/units"
)

// TestIsothermTableMatches checks the table's stated error bound: for
// every built-in fluid with a reference equation, over a 20 K range at
// three places in its liquid range, the pressure and its density slope
// of a tabulated isotherm agree with PrepareIsotherm's at random
// temperatures, for the saturated liquid compressed by up to 5 % and for
// the saturated vapour: the pressure within 1e-9 of ρRT (ρ molar), the
// slope within 1e-9 relative.
func TestIsothermTableMatches(t *testing.T) {
	lib, err := Builtin()
	if err != nil {
		t.Fatal(err)
	}
	rng := rand.New(rand.NewPCG(3, 5))
	worstP, worstK := 0.0, 0.0
	var nodes []int
	for _, s := range lib.All() {
		if s.ref == nil {
			continue
		}
		tMin, tc := s.MinTemperature(), s.CriticalTemperature()
		for _, f := range []float64{0.1, 0.5, 0.85} {
			lo := tMin + f*(tc-tMin)
			hi := math.Min(lo+20, tc-1)
			tb := s.NewIsothermTable(lo, hi)
			if tb != nil {
				nodes = append(nodes, tb.nodes)
			}
			if tb == nil {
				t.Errorf("%s: no table for %.2f–%.2f K", s.Fluid().ID, lo, hi)
				continue
			}
			for range 200 {
				temp := lo + rng.Float64()*(hi-lo)
				sat, err := s.SaturationNoHeatCapacity(temp)
				if err != nil {
					t.Fatalf("%s at %.3f K: %v", s.Fluid().ID, temp, err)
				}
				var exact, got Isotherm
				s.PrepareIsotherm(temp, &exact)
				if !tb.Prepare(temp, &got) {
					t.Fatalf("%s: table for %.2f–%.2f K refused %.3f K", s.Fluid().ID, lo, hi, temp)
				}
				for _, rho := range []float64{sat.VapourDensity, sat.LiquidDensity, sat.LiquidDensity * (1 + 0.05*rng.Float64())} {
					pe, ke := exact.PressureSlope(rho)
					pg, kg := got.PressureSlope(rho)
					rt := rho / s.molarMass * units.GasConstant * temp
					dp, dk := math.Abs(pg-pe)/rt, math.Abs(kg-ke)/math.Abs(ke)
					worstP, worstK = math.Max(worstP, dp), math.Max(worstK, dk)
					if !(dp <= 1e-9) || !(dk <= 1e-9) {
						t.Errorf("%s at %.3f K, %.1f kg/m³: P %g vs %g (%.1e of ρRT), slope %g vs %g (%.1e)",
							s.Fluid().ID, temp, rho, pg, pe, dp, kg, ke, dk)
					}
				}
			}
		}
	}
	t.Logf("worst: pressure %.2e of ρRT, slope %.2e relative; nodes %v", worstP, worstK, nodes)
}

// TestIsothermTableRange: outside its range, or as a nil table, Prepare
// refuses and leaves the isotherm alone; a range that is empty or not
// finite gives no table.
func TestIsothermTableRange(t *testing.T) {
	lib, err := Builtin()
	if err != nil {
		t.Fatal(err)
	}
	s, err := lib.Lookup("ethanol")
	if err != nil {
		t.Fatal(err)
	}
	tb := s.NewIsothermTable(300, 320)
	if tb == nil {
		t.Fatal("no table for ethanol at 300–320 K")
	}
	var it Isotherm
	for _, temp := range []float64{299.99, 320.01, math.NaN(), math.Inf(1)} {
		if tb.Prepare(temp, &it) || it.s != nil {
			t.Errorf("%g K: prepared outside 300–320 K", temp)
		}
	}
	var none *IsothermTable
	if none.Prepare(310, &it) {
		t.Error("a nil table prepared an isotherm")
	}
	for _, r := range [][2]float64{{320, 300}, {300, 300}, {0, 300}, {math.NaN(), 300}, {300, math.Inf(1)}} {
		if s.NewIsothermTable(r[0], r[1]) != nil {
			t.Errorf("%g–%g K: a table was built", r[0], r[1])
		}
	}
}
