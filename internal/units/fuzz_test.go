package units

import (
	"errors"
	"math"
	"strings"
	"testing"
)

// fuzzRoundTripLimit is the largest length (m) whose printed form is checked
// to parse back within the printed resolution; beyond it the check only
// demands a finite result.
const fuzzRoundTripLimit = 1e9

func FuzzParse(f *testing.F) {
	for _, s := range []string{
		"50.8mm", "50.8 mm", "2 in", "2in", `2"`, "6'", "12 ft 6 in", "12 ft 6-1/2 in",
		"12 ft 6 1/2 in", `12' 6 1/2"`, "3/4 in", "1-1/2 in", "15C", "15 °C", "15 degC",
		"288.15 K", "59 F", "101.325kPa", "1 bar", "14.7 psi", "1 atm", "5m/s", "10 km/h",
		"20 kn", "30 mph", "100 ft/s", "30 deg", "30°", "0.5 rad", "1 kHz", "50 Hz",
		"60 %", "60%", "-1.5e3 mm", "+2 m", "", "5 kg", "15 Q", "12 ft 6", "NaN mm",
		"5 mmm", "5 m m", "5m/", "1/0 in", "- 5 m", "1e999 m", "1e308 km", "-300 C",
		"-3 ft 2-1/2 in", "0 ft 1-15/16 in", "2 ft 1/2 in", "12′ 6″", "\xff m", "6 1/2",
		"1e-400 m", "1-", "1/", "1 /2 in", "007 m", "5 ft 11 15/16 in",
	} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		for _, dim := range []Dim{Length, Temperature, Pressure, Velocity, Angle, Frequency, Fraction} {
			v, err := Parse(s, dim, "")
			checkParseResult(t, s, dim, v, err)

			// Surrounding white space never changes the result.
			v2, err2 := Parse(" \t"+s+"\n ", dim, "")
			if (err == nil) != (err2 == nil) || (err == nil && v != v2) {
				t.Errorf("Parse(%q) and Parse with spaces around: got %v, %v and %v, %v, want the same", s, v, err, v2, err2)
			}
			if err == nil && dim == Length && math.Abs(v) <= fuzzRoundTripLimit {
				checkLengthRoundTrip(t, v)
			}
		}
		for _, bare := range []struct {
			dim Dim
			sym string
		}{{Length, "in"}, {Temperature, "F"}, {Fraction, "%"}} {
			v, err := Parse(s, bare.dim, bare.sym)
			checkParseResult(t, s, bare.dim, v, err)
		}
	})
}

// checkParseResult checks the contract of Parse for one call.
func checkParseResult(t *testing.T, s string, dim Dim, v float64, err error) {
	t.Helper()
	if err == nil {
		if math.IsNaN(v) || math.IsInf(v, 0) {
			t.Errorf("Parse(%q, %v): got %v with nil error, want a finite value", s, dim, v)
		}
		if dim == Temperature && v < 0 {
			t.Errorf("Parse(%q, %v): got %v K with nil error, want >= 0", s, dim, v)
		}
		return
	}
	var pe *Error
	if !errors.As(err, &pe) {
		t.Fatalf("Parse(%q, %v): got error type %T, want *Error", s, dim, err)
	}
	if pe.Input != s || pe.Want != dim || pe.Reason == "" || v != 0 {
		t.Errorf("Parse(%q, %v): got %v, %+v, want 0 and an *Error with the input, dimension and a reason", s, dim, v, pe)
	}
	if !strings.HasPrefix(err.Error(), "want "+dim.withArticle()+", got ") {
		t.Errorf("Parse(%q, %v): got message %q, want it to start with %q", s, dim, err, "want "+dim.withArticle())
	}
}

// checkLengthRoundTrip prints v (m) in both systems and parses it back.
func checkLengthRoundTrip(t *testing.T, v float64) {
	t.Helper()
	for _, sys := range []System{Metric, Imperial} {
		s := FormatLength(v, sys)
		got, err := Parse(s, Length, "")
		if err != nil {
			t.Errorf("Parse(FormatLength(%v, %v) = %q): got error %v, want nil", v, sys, s, err)
			continue
		}
		half := Inch / 16 // half of 1/8 in
		if math.Abs(v) >= TapeFine-Inch {
			half = Inch / 2 // half of 1 in from 100 ft
		}
		if sys == Metric {
			half = 0.5e-3 // half of 1 mm; 0.05 mm below 1 m
			if strings.HasSuffix(s, " mm") {
				half = 0.05e-3
			}
		}
		if d := math.Abs(got - v); d > half+slack*math.Abs(v) {
			t.Errorf("Parse(FormatLength(%v, %v) = %q): got %v, off by %g, want within %g", v, sys, s, got, d, half)
		}
	}
}
