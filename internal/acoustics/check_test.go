package acoustics

import "math"

// Tolerance helpers shared by the tests of this package.

// withinAbs reports whether |got − want| ≤ tol.
func withinAbs(got, want, tol float64) bool {
	return math.Abs(got-want) <= tol
}

// withinRel reports whether |got − want| ≤ rel·|want|.
func withinRel(got, want, rel float64) bool {
	return math.Abs(got-want) <= rel*math.Abs(want)
}

// printed returns the tolerance of a value printed with the given number of
// decimals: half a unit of the last printed digit, plus a relative 1e-9 so
// that an exact tie (1.0725 printed as 1.073) is not lost to rounding.
func printed(decimals int) float64 {
	return 0.5 * math.Pow(10, -float64(decimals)) * (1 + 1e-9)
}

// deg converts degrees to radians.
func deg(x float64) float64 { return x * math.Pi / 180 }

// celsius returns an atmosphere at t °C, relative humidity rh % and pressure
// p Pa.
func celsius(t, rh, p float64) Atmosphere {
	return Atmosphere{Temperature: t + 273.15, RelativeHumidity: rh, Pressure: p}
}
