package units

import (
	"math"
	"math/rand/v2"
	"strings"
	"testing"
)

// roundTripSeed fixes the pseudo-random spread of values so that failures
// repeat.
const roundTripSeed = 20240611

// spread returns n values log-uniform in magnitude between lo and hi (SI
// units), with random signs if signed, after the fixed values.
func spread(fixed []float64, n int, lo, hi float64, signed bool) []float64 {
	r := rand.New(rand.NewPCG(roundTripSeed, uint64(n)))
	out := append([]float64(nil), fixed...)
	for range n {
		v := lo * math.Pow(hi/lo, r.Float64())
		if signed && r.IntN(2) == 0 {
			v = -v
		}
		out = append(out, v)
	}
	return out
}

// checkRoundTrip formats every value, parses it back as dim and checks that
// the result is within tol(v, printed) (SI units) of the value.
func checkRoundTrip(t *testing.T, name string, values []float64, format func(float64) string,
	dim Dim, tol func(v float64, printed string) float64) {
	t.Helper()
	for _, v := range values {
		s := format(v)
		got, err := Parse(s, dim, "")
		if err != nil {
			t.Errorf("%s: Parse(%q) of %v: got error %v, want nil", name, s, v, err)
			continue
		}
		if d, lim := math.Abs(got-v), tol(v, s); d > lim {
			t.Errorf("%s: Parse(%q) of %v: got %v, off by %g, want within %g", name, s, v, got, d, lim)
		}
	}
}

// slack covers float64 rounding in format and parse on top of half the
// printed resolution (relative, dimensionless).
const slack = 1e-12

func fixedTol(half float64) func(float64, string) float64 {
	return func(v float64, _ string) float64 { return half + slack*math.Abs(v) }
}

func TestRoundTripLength(t *testing.T) {
	values := spread([]float64{0, 1e-5, 0.0492125, 0.99994, 0.99996, 1, 3.8227, -0.9779, 99999.9999}, 2000, 1e-5, 1e5, true)
	checkRoundTrip(t, "metric", values, inSystem(FormatLength, Metric), Length, func(v float64, s string) float64 {
		if strings.HasSuffix(s, " mm") {
			return 0.05e-3 + slack*math.Abs(v) // half of 0.1 mm
		}
		return 0.5e-3 + slack*math.Abs(v) // half of 1 mm
	})
	checkRoundTrip(t, "imperial", values, inSystem(FormatLength, Imperial), Length, func(v float64, _ string) float64 {
		if math.Abs(v) >= TapeFine-Inch {
			return Inch/2 + slack*math.Abs(v) // half of 1 in
		}
		return Inch/16 + slack*math.Abs(v) // half of 1/8 in
	})
}

func TestRoundTripTemperature(t *testing.T) {
	values := spread([]float64{0, 0.01, 0.04, 233.15, 273.15, 288.15}, 1000, 0.1, 5000, false)
	checkRoundTrip(t, "metric", values, inSystem(FormatTemperature, Metric), Temperature, func(v float64, _ string) float64 {
		if v < 0.05 { // rounded up near absolute zero: within the resolution
			return 0.1 + slack*v
		}
		return 0.05 + slack*v // half of 0.1 K
	})
	checkRoundTrip(t, "imperial", values, inSystem(FormatTemperature, Imperial), Temperature, func(v float64, _ string) float64 {
		if v < 0.05*RankineDegree {
			return 0.1*RankineDegree + slack*v
		}
		return 0.05*RankineDegree + slack*v // half of 0.1 °F
	})
}

func TestRoundTripPressure(t *testing.T) {
	values := spread([]float64{0, 101325, 1e5, -3}, 1000, 1, 1e8, true)
	checkRoundTrip(t, "metric", values, inSystem(FormatPressure, Metric), Pressure, fixedTol(5))             // half of 0.01 kPa
	checkRoundTrip(t, "imperial", values, inSystem(FormatPressure, Imperial), Pressure, fixedTol(0.005*PSI)) // half of 0.01 psi
}

func TestRoundTripVelocity(t *testing.T) {
	values := spread([]float64{0, 5, 343, -0.04}, 1000, 0.01, 3000, true)
	checkRoundTrip(t, "metric", values, inSystem(FormatVelocity, Metric), Velocity, fixedTol(0.05))                   // half of 0.1 m/s
	checkRoundTrip(t, "imperial", values, inSystem(FormatVelocity, Imperial), Velocity, fixedTol(0.05*FootPerSecond)) // half of 0.1 ft/s
}

func TestRoundTripAngle(t *testing.T) {
	values := spread([]float64{0, math.Pi / 6, -math.Pi / 2}, 1000, 1e-4, 2*math.Pi, true)
	checkRoundTrip(t, "degrees", values, FormatAngleDeg, Angle, fixedTol(Rad(0.05))) // half of 0.1°
}

func TestRoundTripFrequency(t *testing.T) {
	values := spread([]float64{0, 50, 999.4, 999.6, 1000, 12500, 2.5e6, 5e9}, 1000, 1e-3, 1e10, false)
	// Half a unit in the third significant figure is at most 0.5/99.5 of the
	// value (the worst case is a value just below a power of ten).
	checkRoundTrip(t, "hertz", values, FormatFrequency, Frequency, func(v float64, _ string) float64 {
		return 0.0051*math.Abs(v) + slack*math.Abs(v)
	})
}
