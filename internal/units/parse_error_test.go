package units

import (
	"errors"
	"fmt"
	"testing"
)

func TestParseErrors(t *testing.T) {
	tests := []struct {
		name string
		in   string
		dim  Dim
		bare string
		msg  string
	}{
		// The five messages given in the package brief.
		{"mass unit", "5 kg", Length, "", `want a length, got "5 kg" (kg is a mass unit)`},
		{"unknown temperature unit", "15 Q", Temperature, "", `want a temperature, got "15 Q" (unknown unit "Q"; known: K, C, F, R)`},
		{"empty", "", Length, "", `want a length, got "" (empty)`},
		{"feet then bare number", "12 ft 6", Length, "", `want a length, got "12 ft 6" (a number after feet needs a unit: "12 ft 6 in")`},
		{"NaN", "NaN mm", Length, "", `want a length, got "NaN mm" (not a finite number)`},

		// Empty and white space.
		{"only spaces", " \t ", Length, "", `want a length, got " \t " (empty)`},

		// Units of another dimension or none.
		{"time unit", "5 s", Length, "", `want a length, got "5 s" (s is a time unit)`},
		{"pressure for length", "5 Pa", Length, "", `want a length, got "5 Pa" (Pa is a pressure unit)`},
		{"angle for temperature", "15°", Temperature, "", `want a temperature, got "15°" (° is an angle unit; write "°C" or "°F")`},
		{"length for angle", "3 m", Angle, "", `want an angle, got "3 m" (m is a length unit)`},
		{"percent for velocity", "5 %", Velocity, "", `want a velocity, got "5 %" (% is a fraction unit)`},
		{"lone k", "5 k", Pressure, "", `want a pressure, got "5 k" (unknown unit "k"; known: Pa, hPa, kPa, MPa, mbar, bar, psi, atm, inHg, mmHg)`},
		{"lower-case c", "15 c", Temperature, "", `want a temperature, got "15 c" (unknown unit "c"; known: K, C, F, R)`},
		{"upper-case KM", "2 KM", Length, "", `want a length, got "2 KM" (unknown unit "KM"; known: m, mm, cm, km, in, ft, yd)`},
		{"lower-case hz", "50 hz", Frequency, "", `want a frequency, got "50 hz" (unknown unit "hz"; known: Hz, kHz, MHz)`},

		// Junk after a number.
		{"unit with extra letter", "5 mmm", Length, "", `want a length, got "5 mmm" (unknown unit "mmm"; known: m, mm, cm, km, in, ft, yd)`},
		{"unit twice", "5 m m", Length, "", `want a length, got "5 m m" (unexpected "m" after the unit "m")`},
		{"dangling slash", "5m/", Length, "", `want a length, got "5m/" (unknown unit "m/"; known: m, mm, cm, km, in, ft, yd)`},
		{"decimal comma", "1,5 m", Length, "", `want a length, got "1,5 m" (unknown unit ","; known: m, mm, cm, km, in, ft, yd)`},
		{"two bare numbers", "12 6 in", Length, "", `want a length, got "12 6 in" (unexpected "6" after the number "12")`},
		{"trailing number", "5 Pa 3", Pressure, "", `want a pressure, got "5 Pa 3" (unexpected "3" after the unit "Pa")`},
		{"metric compound", "2 m 3 cm", Length, "", `want a length, got "2 m 3 cm" (only feet then inches can be combined, got "3" after "m")`},
		{"inches then feet", "6 in 3 ft", Length, "", `want a length, got "6 in 3 ft" (only feet then inches can be combined, got "3" after "in")`},

		// Numbers.
		{"no number", "mm", Length, "", `want a length, got "mm" (expected a number, got "mm")`},
		{"lone k no number", "k", Length, "", `want a length, got "k" (expected a number, got "k")`},
		{"lone point", ". m", Length, "", `want a length, got ". m" (expected a number, got ".")`},
		{"sign apart", "- 5 m", Length, "", `want a length, got "- 5 m" (expected a number right after the sign "-")`},
		{"double sign", "--5 m", Length, "", `want a length, got "--5 m" (expected a number right after the sign "-")`},
		{"Inf", "Inf m", Length, "", `want a length, got "Inf m" (not a finite number)`},
		{"negative infinity", "-infinity m", Length, "", `want a length, got "-infinity m" (not a finite number)`},
		{"signed NaN", "+NaN", Length, "", `want a length, got "+NaN" (not a finite number)`},
		{"overflowing number", "1e999 m", Length, "", `want a length, got "1e999 m" (not a finite number)`},
		{"overflowing SI value", "1e308 km", Length, "", `want a length, got "1e308 km" (out of range)`},
		{"zero denominator", "1/0 in", Length, "", `want a length, got "1/0 in" (zero denominator in "1/0")`},
		{"zero denominator mixed", "1-1/0 in", Length, "", `want a length, got "1-1/0 in" (zero denominator in "1-1/0")`},
		{"improper mixed fraction", "6 3/2 in", Length, "", `want a length, got "6 3/2 in" (the fraction in "6 3/2" must be below 1)`},
		{"improper hyphen fraction", "1-2/2 in", Length, "", `want a length, got "1-2/2 in" (the fraction in "1-2/2" must be below 1)`},

		// Feet and inches.
		{"feet then bare number quotes", "12' 6", Length, "", `want a length, got "12' 6" (a number after feet needs a unit: "12' 6\"")`},
		{"feet then bare mixed", "12 ft 6-1/2", Length, "", `want a length, got "12 ft 6-1/2" (a number after feet needs a unit: "12 ft 6-1/2 in")`},
		{"feet then metres", "5 ft 3 m", Length, "", `want a length, got "5 ft 3 m" (only inches can follow feet, got "m")`},
		{"feet then feet", "5 ft 3 ft", Length, "", `want a length, got "5 ft 3 ft" (only inches can follow feet, got "ft")`},
		{"feet then unknown", "5 ft 3 q", Length, "", `want a length, got "5 ft 3 q" (unknown unit "q"; known: m, mm, cm, km, in, ft, yd)`},
		{"twelve inches", "5 ft 12 in", Length, "", `want a length, got "5 ft 12 in" (inches after feet must be below 12, got "12")`},
		{"fractional feet", "12.5 ft 3 in", Length, "", `want a length, got "12.5 ft 3 in" (feet before inches must be a whole number, got "12.5")`},
		{"sign on inches", "3 ft -2 in", Length, "", `want a length, got "3 ft -2 in" (a sign is allowed only at the start, got "-2")`},
		{"after inches", "5 ft 3 in 2", Length, "", `want a length, got "5 ft 3 in 2" (unexpected "2" after the inches)`},
		{"feet then word", "5 ft x", Length, "", `want a length, got "5 ft x" (expected a number, got "x")`},

		// Absolute zero. Hand-computed: −300 °C = −26.85 K; −500 °F = (−500 + 459.67)/1.8 = −22.41 K.
		{"below zero C", "-300 C", Temperature, "", `want a temperature, got "-300 C" (below absolute zero, at -26.85 K)`},
		{"below zero F", "-500 F", Temperature, "", `want a temperature, got "-500 F" (below absolute zero, at -22.41 K)`},
		{"below zero K", "-1 K", Temperature, "", `want a temperature, got "-1 K" (below absolute zero, at -1.00 K)`},
		{"below zero bare C", "-274", Temperature, "C", `want a temperature, got "-274" (below absolute zero, at -0.85 K)`},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			got, err := Parse(tc.in, tc.dim, tc.bare)
			if err == nil {
				t.Fatalf("Parse(%q): got %v and no error, want error %s", tc.in, got, tc.msg)
			}
			if err.Error() != tc.msg {
				t.Errorf("Parse(%q): got error\n\t%s\nwant\n\t%s", tc.in, err, tc.msg)
			}
			var pe *Error
			if !errors.As(err, &pe) {
				t.Fatalf("Parse(%q): got error of type %T, want *Error", tc.in, err)
			}
			if pe.Input != tc.in || pe.Want != tc.dim {
				t.Errorf("Parse(%q): got Input %q Want %v, want Input %q Want %v", tc.in, pe.Input, pe.Want, tc.in, tc.dim)
			}
			if got != 0 {
				t.Errorf("Parse(%q): got value %v with an error, want 0", tc.in, got)
			}
		})
	}
}

func TestErrorWrapped(t *testing.T) {
	_, err := Parse("5 kg", Length, "")
	wrapped := fmt.Errorf("layouts/cell.yaml:12: nozzle.diameter: %w", err)
	want := `layouts/cell.yaml:12: nozzle.diameter: want a length, got "5 kg" (kg is a mass unit)`
	if wrapped.Error() != want {
		t.Errorf("got %q, want %q", wrapped.Error(), want)
	}
	var pe *Error
	if !errors.As(wrapped, &pe) || pe.Reason != "kg is a mass unit" {
		t.Errorf("errors.As through %%w: got %+v, want Reason %q", pe, "kg is a mass unit")
	}
}

func TestErrorWithoutReason(t *testing.T) {
	e := &Error{Input: "x", Want: Angle}
	if got, want := e.Error(), `want an angle, got "x"`; got != want {
		t.Errorf("got %q, want %q", got, want)
	}
}

func TestParsePanicsOnMisuse(t *testing.T) {
	tests := []struct {
		name string
		dim  Dim
		bare string
	}{
		{"zero dimension", 0, ""},
		{"mass is not parsed", Mass, ""},
		{"time is not parsed", Time, ""},
		{"out of range dimension", Dim(99), ""},
		{"unknown bare unit", Length, "furlong"},
		{"bare unit of another dimension", Length, "Pa"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			defer func() {
				if recover() == nil {
					t.Errorf("Parse(\"1\", %v, %q): got no panic, want a panic", tc.dim, tc.bare)
				}
			}()
			_, _ = Parse("1", tc.dim, tc.bare)
		})
	}
}
