package fluids

import (
	"errors"
	"math"
	"strings"
	"testing"
)

// DIPPR equation 101 as printed in Perry's Chemical Engineers' Handbook,
// 8th ed., Table 2-8, evaluated by hand for chloroform at 298.15 K:
// ln P = 146.43 − 7792.3/298.15 − 20.614·ln 298.15 + 0.024578·298.15
// = 10.17217, P = 26.16 kPa (the CRC Handbook gives 26.2 kPa at 25 °C).
// The tolerance, 1e-5, is the rounding of the hand calculation to five decimals.
func TestDIPPR101Form(t *testing.T) {
	lnP, _ := dippr101LnP(146.43, -7792.3, -20.614, 0.024578, 1, 298.15)
	if math.Abs(lnP-10.17217) > 1e-5 {
		t.Errorf("ln P = %.6f, hand calculation 10.17217", lnP)
	}
	// The exponent belongs to the DIPPR form only: on another form it is
	// an error that names the field.
	s, err := builtinForTest(t).Lookup("dichloromethane")
	if err != nil {
		t.Fatal(err)
	}
	f := *s.Fluid()
	f.VapourPressure = append([]VapourPressurePiece(nil), f.VapourPressure...)
	f.VapourPressure[0].E = 2
	err = f.Validate()
	if !errors.Is(err, ErrInvalidFluid) || !strings.Contains(err.Error(), "vapour_pressure[0].e") {
		t.Errorf("exponent on a %s piece: got %v, want an error naming vapour_pressure[0].e", f.VapourPressure[0].Form, err)
	}
}
