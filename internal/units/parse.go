package units

import (
	"fmt"
	"math"
	"strings"
)

// Parse reads a quantity of dimension want from s and returns it in the SI
// unit of want (metres, kelvin, pascals, metres per second, radians, hertz,
// or a plain ratio for Fraction).
//
// A number without a unit is taken in the unit whose symbol is bare; bare ""
// means the SI unit of want (so Parse("0.6", Fraction, "") is 0.6 and
// Parse("60", Fraction, "%") is 0.6 too).
//
// Accepted forms, with any amount of white space (or none) between the number
// and its unit, and leading or trailing white space ignored:
//
//	50.8mm  50.8 mm  -1.5e3 mm  +2 m  2 in  2"  6'  3/4 in  1-1/2 in
//	12 ft 6 in  12 ft 6-1/2 in  12 ft 6 1/2 in  12' 6 1/2"  12'6"
//	15C  15 °C  15 degC  288.15 K  59 F  491.67 R
//	101.325kPa  1 bar  14.7 psi  1 atm  29.92 inHg  760 mmHg
//	5m/s  10 km/h  20 kn  30 mph  100 ft/s
//	30 deg  30°  0.5 rad  1 kHz  50 Hz  60 %  60%
//
// The rules in detail:
//   - Unit symbols are matched exactly and case-sensitively; [Symbols] lists
//     them. "k" alone, "KM" or "c" are unknown units.
//   - A sign is allowed only at the very start, next to the number, and
//     applies to the whole quantity: "-3 ft 2-1/2 in" is −(3 ft + 2.5 in).
//   - A fraction is digits/digits with a non-zero denominator. In a mixed
//     number ("6-1/2", "6 1/2") the whole part is digits only and the
//     fraction is below 1.
//   - Only lengths may have two parts, and only whole feet followed by
//     inches below 12 ("12 ft 6 in", "5' 11 3/4\""). "12 ft 6" is an error.
//   - Temperatures are absolute: "15 C" is 288.15 K. A result below 0 K is
//     an error. Other dimensions may be negative.
//   - A unit of another dimension is named in the error ("kg is a mass unit").
//
// Special cases: "NaN", "Inf" and numbers too large for a float64 ("1e999")
// give an error saying "not a finite number"; a finite number whose SI value
// overflows ("1e308 km") gives "out of range". A nil error always comes with
// a finite result.
//
// Every failure is an *[Error]. Parse panics, as programmer misuse, if want
// is not one of Length … Fraction, or if bare is neither "" nor a symbol of
// dimension want.
func Parse(s string, want Dim, bare string) (float64, error) {
	if !want.parseable() {
		panic(fmt.Sprintf("units: Parse: cannot parse a quantity of dimension %v", want))
	}
	bareUnit := siUnit(want)
	if bare != "" {
		u, ok := Lookup(bare)
		if !ok || u.Dim != want {
			panic(fmt.Sprintf("units: Parse: bare unit %q is not %s unit", bare, want.withArticle()))
		}
		bareUnit = u
	}
	v, reason := parseQuantity(strings.TrimSpace(s), want, bareUnit)
	if reason != "" {
		return 0, &Error{Input: s, Want: want, Reason: reason}
	}
	return v, nil
}

// parseQuantity does the work of Parse on the trimmed input t and returns the
// SI value, or a reason in words why t is not a quantity of dimension want.
func parseQuantity(t string, want Dim, bare Unit) (float64, string) {
	if t == "" {
		return 0, reasonEmpty
	}
	sc := &scanner{s: t}
	sign := 1.0
	if c := sc.peekByte(); c == '+' || c == '-' {
		sc.pos++
		if c == '-' {
			sign = -1
		}
		if !startsNumber(sc.s[sc.pos:]) && notANumberReason(sc.token()) != reasonNotFinite {
			return 0, fmt.Sprintf("expected a number right after the sign %q", string(c))
		}
	}

	n1, reason := sc.number()
	if reason != "" {
		return 0, reason
	}
	sc.skipSpace()
	sym1 := sc.unit()
	u1 := bare
	if sym1 != "" {
		if u1, reason = resolve(sym1, want); reason != "" {
			return 0, reason
		}
	}
	sc.skipSpace()
	if sc.done() {
		return finish(u1.ToSI(sign*n1.v), want)
	}

	// Something follows the first number and its unit.
	rest := sc.token()
	switch {
	case sym1 == "":
		return 0, fmt.Sprintf("unexpected %q after the number %q", rest, n1.text)
	case !isFeet(sym1):
		if u1.Dim == Length && startsNumber(sc.s[sc.pos:]) {
			return 0, fmt.Sprintf("only feet then inches can be combined, got %q after %q", rest, sym1)
		}
		return 0, fmt.Sprintf("unexpected %q after the unit %q", rest, sym1)
	case !n1.whole:
		return 0, fmt.Sprintf("feet before inches must be a whole number, got %q", n1.text)
	}
	return parseInches(sc, want, sign, n1.v, sym1)
}

// parseInches reads the inches that follow whole feet (ft of them, written
// with the symbol feetSym) and returns the SI length.
func parseInches(sc *scanner, want Dim, sign, ft float64, feetSym string) (float64, string) {
	n2, reason := sc.number()
	if reason != "" {
		return 0, reason
	}
	upToNumber := sc.s[:sc.pos]
	sc.skipSpace()
	sym2 := sc.unit()
	switch {
	case sym2 == "":
		return 0, fmt.Sprintf("a number after feet needs a unit: %q", upToNumber+inchHint(feetSym))
	case !isInch(sym2):
		if _, ok := Lookup(sym2); !ok {
			return 0, unknownUnitReason(sym2, want)
		}
		return 0, fmt.Sprintf("only inches can follow feet, got %q", sym2)
	case n2.v >= 12:
		return 0, fmt.Sprintf("inches after feet must be below 12, got %q", n2.text)
	}
	sc.skipSpace()
	if !sc.done() {
		return 0, fmt.Sprintf("unexpected %q after the inches", sc.token())
	}
	return finish(sign*(ft*Foot+n2.v*Inch), want)
}

// resolve finds the unit sym and checks that it measures want.
func resolve(sym string, want Dim) (Unit, string) {
	u, ok := Lookup(sym)
	if !ok {
		return Unit{}, unknownUnitReason(sym, want)
	}
	if u.Dim != want {
		if want == Temperature && u.Symbol == "°" {
			return Unit{}, wrongDimReason(u) + `; write "°C" or "°F"`
		}
		return Unit{}, wrongDimReason(u)
	}
	return u, ""
}

// finish checks an SI result: finite, and not below absolute zero for a
// temperature.
func finish(si float64, want Dim) (float64, string) {
	if math.IsInf(si, 0) || math.IsNaN(si) {
		return 0, reasonRange
	}
	if want == Temperature && si < 0 {
		return 0, fmt.Sprintf("%s, at %.2f K", reasonBelowZero, si)
	}
	return si, ""
}

func isFeet(sym string) bool { return sym == "ft" || sym == "'" || sym == "′" }

func isInch(sym string) bool { return sym == "in" || sym == `"` || sym == "″" }

// inchHint is the inch symbol that matches the style of the feet symbol,
// used to suggest the fix for "12 ft 6".
func inchHint(feetSym string) string {
	switch feetSym {
	case "'":
		return `"`
	case "′":
		return "″"
	}
	return " in"
}
