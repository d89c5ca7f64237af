// Package units parses and prints physical quantities written with units,
// such as "50.8 mm", "12 ft 6-1/2 in", "15 °C" or "60 %", and keeps every
// value in SI units inside the program.
//
// It is used at the edges only: by the layout-file decoder and by
// command-line flags on the way in, and by the sheet and the command
// summaries on the way out. It knows nothing about jets, rooms or files.
//
// # SI inside
//
// Every value that leaves [Parse] and every value that enters a Format
// function is in SI units: metres, kelvin (absolute), pascals, metres per
// second, radians, hertz, and a plain ratio for fractions (0.6 for "60 %").
//
// # Reading a quantity
//
// [Parse] reads one quantity of a wanted [Dim]:
//
//	d, err := units.Parse("2 in", units.Length, "") // d == 0.0508
//	t, err := units.Parse("59 F", units.Temperature, "") // t == 288.15
//	f, err := units.Parse("60", units.Fraction, "%") // f == 0.6, a bare number is in %
//
// The number may be a decimal with an optional sign and exponent ("-1.5e3"),
// a fraction ("3/4"), or a whole number with a fraction ("6-1/2", "6 1/2").
// Lengths may combine whole feet with inches ("12 ft 6 in", "12' 6 1/2\"").
// Unit symbols are case-sensitive and are listed by [Symbols]; [Lookup]
// gives the scale and offset of each.
//
// Every failure is an [*Error] that quotes the whole input, says what was
// wanted and why the input does not fit, for example
//
//	want a length, got "5 kg" (kg is a mass unit)
//
// # Printing a quantity
//
// FormatLength, FormatTemperature, FormatPressure and FormatVelocity print in
// a [System] ([Metric] or [Imperial]); FormatAngleDeg and FormatFrequency
// have one form. Every printed finite value parses back with [Parse] to within
// half of the printed resolution, which each Format function documents with
// its one exception (a temperature within 0.05 of absolute zero rounds up).
//
// # Sources
//
// Each conversion constant in constants.go names its published definition:
// the 1959 international yard and pound agreement, the SI Brochure, the
// conventional standard gravity and mercury density, and the international
// nautical mile.
package units
