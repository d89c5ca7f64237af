package units

import (
	"math"
	"testing"
)

type formatCase struct {
	name string
	v    float64 // SI
	want string
}

// checkFormat runs f over cases and compares with want.
func checkFormat(t *testing.T, fn string, f func(float64) string, cases []formatCase) {
	t.Helper()
	for _, tc := range cases {
		t.Run(tc.name, func(t *testing.T) {
			if got := f(tc.v); got != tc.want {
				t.Errorf("%s(%v): got %q, want %q", fn, tc.v, got, tc.want)
			}
		})
	}
}

func inSystem(f func(float64, System) string, sys System) func(float64) string {
	return func(v float64) string { return f(v, sys) }
}

func TestFormatLengthMetric(t *testing.T) {
	checkFormat(t, "FormatLength", inSystem(FormatLength, Metric), []formatCase{
		{"metres", 5.08, "5.080 m"},
		{"millimetres", 0.0508, "50.8 mm"},
		{"just below a metre", 0.9994, "999.4 mm"},
		{"rounds up to a metre", 0.99996, "1.000 m"},
		{"one metre", 1, "1.000 m"},
		{"negative millimetres", -0.9779, "-977.9 mm"},
		{"negative metres", -12.3456, "-12.346 m"},
		{"zero", 0, "0.0 mm"},
		{"negative rounds to zero", -0.00001, "0.0 mm"},
		{"negative zero", math.Copysign(0, -1), "0.0 mm"},
		{"long", 1234.5678, "1234.568 m"},
		{"NaN", math.NaN(), "NaN m"},
		{"Inf", math.Inf(1), "+Inf m"},
		{"minus Inf", math.Inf(-1), "-Inf m"},
		// From HugeValue on, four figures in e-notation, never 300 digits.
		{"huge", 1e300, "1.000e+300 m"},
		{"huge negative", -2.5e15, "-2.500e+15 m"},
	})
}

func TestFormatLengthImperial(t *testing.T) {
	// Hand-computed from 1 in = 0.0254 m, 1 ft = 0.3048 m (1959 agreement,
	// CONFIRMED): e.g. 5.08 m / 0.0254 = 200 in = 16' 8". Rounded as a tape
	// is read (common practice): to 1/8 in up to 100 ft, to the inch beyond.
	checkFormat(t, "FormatLength", inSystem(FormatLength, Imperial), []formatCase{
		{"whole inches", 5.08, `16' 8"`},
		{"whole feet", 0.6096, `2' 0"`},
		{"fifteen sixteenths rounds to the eighth", 0.0492125, `2"`},
		{"seven eighths", 0.0254 * 7.875, `7-7/8"`},
		{"half inch reduced", 0.6223, `2' 1/2"`},
		{"negative", -0.9779, `-3' 2-1/2"`},
		{"feet inches fraction", 3.8227, `12' 6-1/2"`},
		{"quarter", 0.3048 + 0.25*0.0254, `1' 1/4"`},
		{"eighth", 3*0.0254 + 0.0254/8, `3-1/8"`},
		{"carry into feet", 0.3048 + 11.997*0.0254, `2' 0"`},
		{"rounds to eighth", 0.0254 * (1 + 5.2/16), `1-3/8"`},
		// 147.6 ft = 44.99 m (hand-computed): beyond 100 ft to the inch.
		{"beyond 100 ft to the inch", 147*0.3048 + 7.6*0.0254, `147' 8"`},
		{"just below 100 ft keeps eighths", 99*0.3048 + 11.5*0.0254, `99' 11-1/2"`},
		{"2005 ft", 2005*0.3048 + 3.2*0.0254, `2005' 3"`},
		{"zero", 0, `0"`},
		{"negative rounds to zero", -0.0001, `0"`},
		// 1e20 m = 3.28084e20 ft (hand-computed): from HugeValue, e-notation.
		{"huge", 1e20, "3.281e+20 ft"},
		{"huge negative", -1e300, "-3.281e+300 ft"},
		{"NaN", math.NaN(), "NaN ft"},
	})
}

func TestFormatTemperature(t *testing.T) {
	// 0 °C = 273.15 K, 32 °F = 273.15 K, −40 °C = −40 °F (CONFIRMED, stored
	// page converttoolpro.com "Fahrenheit to Kelvin").
	checkFormat(t, "FormatTemperature", inSystem(FormatTemperature, Metric), []formatCase{
		{"15 C", 288.15, "15.0 °C"},
		{"zero C", 273.15, "0.0 °C"},
		{"tiny below zero", 273.14, "0.0 °C"},
		{"minus 40", 233.15, "-40.0 °C"},
		// float64(273.15) is 273.149 999 999 999 98, so −273.15 rounds down.
		{"absolute zero", 0, "-273.1 °C"},
	})
	checkFormat(t, "FormatTemperature", inSystem(FormatTemperature, Imperial), []formatCase{
		{"59 F", 288.15, "59.0 °F"},
		{"freezing", 273.15, "32.0 °F"},
		{"minus 40", 233.15, "-40.0 °F"},
		// −459.67 would round to −459.7, below absolute zero; it rounds up instead.
		{"absolute zero", 0, "-459.6 °F"},
		{"near absolute zero", 0.01, "-459.6 °F"},
		{"below absolute zero prints as it is", -1, "-461.5 °F"},
	})
}

func TestFormatPressure(t *testing.T) {
	// 1 atm = 101 325 Pa (CONFIRMED); 101 325 Pa / 6894.757 Pa/psi = 14.696 psi
	// (hand-computed).
	checkFormat(t, "FormatPressure", inSystem(FormatPressure, Metric), []formatCase{
		{"atmosphere", 101325, "101.33 kPa"},
		{"bar", 1e5, "100.00 kPa"},
		{"small", 4, "0.00 kPa"},
		{"negative small", -4, "0.00 kPa"},
		// 1e300 Pa = 1e297 kPa: from HugeValue, four figures in e-notation.
		{"huge", 1e300, "1.000e+297 kPa"},
	})
	checkFormat(t, "FormatPressure", inSystem(FormatPressure, Imperial), []formatCase{
		{"atmosphere", 101325, "14.70 psi"},
		{"one psi", 6894.757293168, "1.00 psi"},
	})
}

func TestFormatVelocity(t *testing.T) {
	// 5 m/s / 0.3048 m/s per ft/s = 16.40 ft/s (hand-computed).
	checkFormat(t, "FormatVelocity", inSystem(FormatVelocity, Metric), []formatCase{
		{"five", 5, "5.0 m/s"},
		{"rounding", 312.46, "312.5 m/s"},
		{"negative", -2, "-2.0 m/s"},
	})
	checkFormat(t, "FormatVelocity", inSystem(FormatVelocity, Imperial), []formatCase{
		{"five", 5, "16.4 ft/s"},
		{"hundred ft/s", 30.48, "100.0 ft/s"},
	})
}

func TestFormatAngleDeg(t *testing.T) {
	checkFormat(t, "FormatAngleDeg", FormatAngleDeg, []formatCase{
		{"thirty", math.Pi / 6, "30.0°"},
		{"right", math.Pi / 2, "90.0°"},
		{"negative", -math.Pi / 4, "-45.0°"},
		{"zero", 0, "0.0°"},
		{"tiny negative", -1e-9, "0.0°"},
	})
}

func TestFormatFrequency(t *testing.T) {
	checkFormat(t, "FormatFrequency", FormatFrequency, []formatCase{
		{"one kHz", 1000, "1.00 kHz"},
		{"fifty Hz", 50, "50.0 Hz"},
		{"hundreds", 315, "315 Hz"},
		{"round up to kHz", 999.6, "1.00 kHz"},
		{"stays Hz", 999.4, "999 Hz"},
		{"twelve and a half kHz", 12500, "12.5 kHz"},
		{"hundred kHz", 100000, "100 kHz"},
		{"MHz", 2.5e6, "2.50 MHz"},
		{"beyond MHz", 5e9, "5000 MHz"},
		{"below one", 0.5, "0.500 Hz"},
		{"small", 0.005, "0.00500 Hz"},
		{"three figures", 1234, "1.23 kHz"},
		{"negative", -50, "-50.0 Hz"},
		{"zero", 0, "0.00 Hz"},
		{"NaN", math.NaN(), "NaN Hz"},
	})
}

func TestFormatPanicsOnBadSystem(t *testing.T) {
	fns := map[string]func(float64, System) string{
		"FormatLength":      FormatLength,
		"FormatTemperature": FormatTemperature,
		"FormatPressure":    FormatPressure,
		"FormatVelocity":    FormatVelocity,
	}
	for name, f := range fns {
		for _, sys := range []System{0, 3} {
			t.Run(name+"/"+sys.String(), func(t *testing.T) {
				defer func() {
					if recover() == nil {
						t.Errorf("%s(1, %v): got no panic, want a panic", name, sys)
					}
				}()
				_ = f(1, sys)
			})
		}
	}
}
