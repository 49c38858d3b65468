package fluids_test

import (
	"fmt"

	"ullage/fluids"
	"ullage/fluids/units"
)

// The saturation state of a built-in fluid at 40 °C.
func ExampleSubstance_Saturation() {
	lib, err := fluids.Builtin()
	if err != nil {
		panic(err)
	}
	dcm, err := lib.Lookup("methylene chloride")
	if err != nil {
		panic(err)
	}
	sat, err := dcm.Saturation(units.CelsiusToKelvin(40))
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("%s at 40 °C: %.0f kPa, liquid %.0f kg/m³, extrapolated: %v\n",
		dcm.Fluid().Name, sat.PressurePa/1000, sat.LiquidDensity, sat.Flags.Extrapolated())
	// Output: Dichloromethane at 40 °C: 102 kPa, liquid 1289 kg/m³, extrapolated: false
}

// A temperature below the freezing point is an error, never a number.
func ExampleSubstance_Saturation_belowFreezing() {
	lib, _ := fluids.Builtin()
	water, _ := lib.Lookup("water")
	_, err := water.Saturation(units.CelsiusToKelvin(-10))
	fmt.Println(err)
	// Output: Water: temperature 263.15 K (-10.00 °C) is below the freezing point 273.15 K (0.00 °C): temperature is below the freezing point
}

// The temperature at which liquid of a given density fills a vessel.
func ExampleSubstance_LiquidFullTemperature() {
	lib, _ := fluids.Builtin()
	acetone, _ := lib.Lookup("acetone")
	t, ok := acetone.LiquidFullTemperature(700) // 0.7 g of fill per mL of vessel
	fmt.Printf("liquid-full at %.1f °C (%v)\n", units.KelvinToCelsius(t), ok)
	// Output: liquid-full at 95.4 °C (true)
}

// A table of ethanol's isotherms for a study between 50 and 60 °C gives
// the compressed liquid's pressure as the equation itself does, to the
// table's error bound.
func ExampleSubstance_NewIsothermTable() {
	lib, _ := fluids.Builtin()
	ethanol, _ := lib.Lookup("ethanol")
	table := ethanol.NewIsothermTable(units.CelsiusToKelvin(50), units.CelsiusToKelvin(60))
	t := units.CelsiusToKelvin(55.5)
	var direct, tabulated fluids.Isotherm
	ethanol.PrepareIsotherm(t, &direct)
	table.Prepare(t, &tabulated)
	p1, _ := direct.PressureSlope(760)
	p2, _ := tabulated.PressureSlope(760)
	fmt.Printf("at 760 kg/m³: %.7f MPa directly, %.7f MPa from the table\n", p1/1e6, p2/1e6)
	// Output: at 760 kg/m³: 1.7643202 MPa directly, 1.7643202 MPa from the table
}

// The public acute benchmarks for ammonia over one hour, in the shape
// the exposure rule evaluates.
func ExampleLimitsFor() {
	sub, err := fluids.LimitsFor("ammonia", fluids.LimitSetUSPublicAcute)
	if err != nil {
		panic(err)
	}
	for _, e := range sub.Entries {
		if e.Minutes == 60 {
			fmt.Printf("%s: %g ppm (%s)\n", e.Label(), e.PPM, e.Status)
		}
	}
	water, _ := fluids.LimitsFor("water", fluids.LimitSetEUOccupational)
	fmt.Println("water, EU:", water.Coverage)
	// Output:
	// AEGL-1 60 min: 30 ppm (final)
	// AEGL-2 60 min: 160 ppm (final)
	// AEGL-3 60 min: 1100 ppm (final)
	// water, EU: none published
}
