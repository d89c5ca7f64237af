package units_test

import (
	"errors"
	"fmt"

	"arcwright/internal/units"
)

func ExampleParse() {
	d, _ := units.Parse("2 in", units.Length, "")
	x, _ := units.Parse("12 ft 6-1/2 in", units.Length, "")
	t, _ := units.Parse("59 F", units.Temperature, "")
	p, _ := units.Parse("14.7 psi", units.Pressure, "")
	h, _ := units.Parse("60", units.Fraction, "%") // a bare number is in %
	fmt.Printf("%.4f m\n%.4f m\n%.2f K\n%.0f Pa\n%.2f\n", d, x, t, p, h)

	_, err := units.Parse("5 kg", units.Length, "")
	fmt.Println(err)
	var pe *units.Error
	if errors.As(err, &pe) {
		fmt.Println(pe.Reason)
	}
	// Output:
	// 0.0508 m
	// 3.8227 m
	// 288.15 K
	// 101353 Pa
	// 0.60
	// want a length, got "5 kg" (kg is a mass unit)
	// kg is a mass unit
}

func ExampleFormatLength() {
	for _, m := range []float64{5.08, 0.0508, 0.0492125, -0.9779} {
		fmt.Printf("%-10s %s\n", units.FormatLength(m, units.Metric), units.FormatLength(m, units.Imperial))
	}
	// Output:
	// 5.080 m    16' 8"
	// 50.8 mm    2"
	// 49.2 mm    2"
	// -977.9 mm  -3' 2-1/2"
}

func ExampleParseSystem() {
	sys, err := units.ParseSystem("ft-in")
	fmt.Println(sys, err)
	fmt.Println(units.FormatTemperature(288.15, sys), units.FormatPressure(101325, sys), units.FormatVelocity(5, sys))
	// Output:
	// imperial <nil>
	// 59.0 °F 14.70 psi 16.4 ft/s
}

func ExampleFormatFrequency() {
	for _, hz := range []float64{50, 1000, 12500, 2.5e6} {
		fmt.Println(units.FormatFrequency(hz))
	}
	fmt.Println(units.FormatAngleDeg(units.Rad(30)))
	// Output:
	// 50.0 Hz
	// 1.00 kHz
	// 12.5 kHz
	// 2.50 MHz
	// 30.0°
}
