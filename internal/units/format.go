package units

import (
	"fmt"
	"math"
	"strconv"
	"strings"
)

// Printing. Every Format function takes an SI value and returns a string that
// Parse reads back to within half of the printed resolution, which each
// function's doc states (FormatTemperature notes one exception near 0 K). A value that rounds to zero prints without a minus
// sign. A magnitude of HugeValue or more (in the printed unit) prints in
// e-notation to four figures. NaN and ±Inf print as "NaN", "+Inf" or "-Inf" followed by the unit;
// those strings do not parse back (Parse rejects them as not finite).
//
// The functions taking a System panic, as programmer misuse, if it is not
// Metric or Imperial.

// HugeValue is the magnitude, in the printed unit, from which the Format
// functions print a number in e-notation to four significant figures
// ("1.000e+300 m") instead of in full: such a value is a slip or an
// overflow, and three hundred digits help nobody. It parses back to within
// 0.05 % of the value.
const HugeValue = 1e12

// huge returns v in e-notation when |v| ≥ HugeValue.
func huge(v float64) (string, bool) {
	if math.Abs(v) < HugeValue || math.IsInf(v, 0) || math.IsNaN(v) {
		return "", false
	}
	return strconv.FormatFloat(v, 'e', 3, 64), true
}

// FormatLength prints a length given in metres.
//
// Metric: below 1 m (after rounding) in millimetres with one decimal,
// "50.8 mm", resolution 0.1 mm; from 1 m in metres with three decimals,
// "5.080 m", resolution 1 mm.
//
// Imperial: feet and inches as a tape is read, the one notation of every
// imperial output (tables, plan labels, set-up steps, reasons, summaries):
// to the nearest 1/8 in up to [TapeFine] (100 ft), to the nearest inch
// beyond, the fraction reduced, inches always below 12, no "0'" in front of
// inches alone: 16' 8", 2' 0", 7-7/8", 147' 8", 2005' 3", 0", and for
// negative values -3' 2-1/2" (the sign applies to the whole). Resolution
// 1/8 in, or 1 in from 100 ft. From HugeValue (metres or feet) on,
// "1.000e+300 m" or "3.281e+300 ft".
func FormatLength(m float64, sys System) string {
	mustSystem("FormatLength", sys)
	if math.IsNaN(m) || math.IsInf(m, 0) {
		if sys == Imperial {
			return fixed(m, 0) + " ft"
		}
		return fixed(m, 0) + " m"
	}
	if sys == Imperial {
		if e, ok := huge(m / Foot); ok {
			return e + " ft"
		}
		return withSign(m < 0, feetAndInches(math.Abs(m)))
	}
	if e, ok := huge(m); ok {
		return e + " m"
	}
	a := math.Abs(m)
	if mm := strconv.FormatFloat(a*1e3, 'f', 1, 64); len(mm) < len("1000.0") {
		return withSign(m < 0, mm+" mm")
	}
	return withSign(m < 0, strconv.FormatFloat(a, 'f', 3, 64)+" m")
}

// TapeFine is the length up to which FormatLength prints feet and inches to
// the nearest 1/8 in; beyond it to the nearest inch, as a tape is read over
// a long pull (common practice): 100 ft.
const TapeFine = 100 * Foot

// feetAndInches prints a non-negative finite length a (m) as a tape reads
// it (see FormatLength).
func feetAndInches(a float64) string {
	per := 8.0 // parts of an inch
	if a >= TapeFine {
		per = 1
	}
	n := math.Round(a / Inch * per) // parts; below 2⁵³ from HugeValue
	ft := math.Floor(n / (12 * per))
	rem := int(n - ft*12*per) // exact: integers below 2⁵³
	in, num, den := rem/int(per), rem%int(per), int(per)
	if num != 0 {
		g := gcd(num, den)
		num, den = num/g, den/g
	}
	var inch string
	switch {
	case num == 0:
		inch = strconv.Itoa(in)
	case in == 0:
		inch = fmt.Sprintf("%d/%d", num, den)
	default:
		inch = fmt.Sprintf("%d-%d/%d", in, num, den)
	}
	if ft == 0 {
		return inch + `"`
	}
	return strconv.FormatFloat(ft, 'f', 0, 64) + "' " + inch + `"`
}

// FormatTemperature prints an absolute temperature given in kelvin, with one
// decimal: Metric "15.0 °C", Imperial "59.0 °F". Resolution 0.1 °C or
// 0.1 °F; values are rounded to the nearest 0.1, except that a value within
// 0.05 of absolute zero is rounded up (0 K prints "-459.6 °F", not "-459.7 °F")
// so that the result parses back. A value below 0 K prints as it is, and
// Parse rejects it.
func FormatTemperature(k float64, sys System) string {
	mustSystem("FormatTemperature", sys)
	if sys == Imperial {
		return absoluteReading(k/RankineDegree-ZeroFahrenheitRankine, -ZeroFahrenheitRankine, k >= 0) + " °F"
	}
	return absoluteReading(k-ZeroCelsius, -ZeroCelsius, k >= 0) + " °C"
}

// absoluteReading prints a temperature reading v with one decimal. When the
// temperature is not below absolute zero (valid) but the rounded reading
// would be below the scale's absolute zero (zero, in the same scale; 0 K
// prints "-459.7" in °F), it rounds up instead, so that Parse accepts the
// result; the error then stays below the resolution of 0.1.
func absoluteReading(v, zero float64, valid bool) string {
	s := fixed(v, 1)
	if r, err := strconv.ParseFloat(s, 64); valid && err == nil && r < zero {
		s = fixed(math.Ceil(v*10)/10, 1)
	}
	return s
}

// FormatPressure prints a pressure given in pascals, with two decimals:
// Metric in kilopascals "101.33 kPa" (resolution 10 Pa), Imperial in pounds
// per square inch "14.70 psi" (resolution 0.01 psi).
func FormatPressure(pa float64, sys System) string {
	mustSystem("FormatPressure", sys)
	if sys == Imperial {
		return fixed(pa/PSI, 2) + " psi"
	}
	return fixed(pa/1e3, 2) + " kPa"
}

// FormatVelocity prints a velocity given in metres per second, with one
// decimal: Metric "5.0 m/s", Imperial "16.4 ft/s". Resolution 0.1 m/s or
// 0.1 ft/s.
func FormatVelocity(ms float64, sys System) string {
	mustSystem("FormatVelocity", sys)
	if sys == Imperial {
		return fixed(ms/FootPerSecond, 1) + " ft/s"
	}
	return fixed(ms, 1) + " m/s"
}

// FormatAngleDeg prints an angle given in radians as degrees with one
// decimal and the degree sign: "30.0°". Resolution 0.1°.
func FormatAngleDeg(rad float64) string {
	return fixed(Deg(rad), 1) + "°"
}

// FormatFrequency prints a frequency given in hertz to three significant
// figures in Hz, kHz or MHz, whichever keeps the number below 1000 (MHz above
// that): "50.0 Hz", "1.00 kHz", "12.5 kHz", "0.500 Hz", "0.00 Hz".
// Resolution one unit in the third significant figure; at 1000 MHz and above
// the number is printed without decimals and keeps its trailing zeros.
func FormatFrequency(hz float64) string {
	if math.IsNaN(hz) || math.IsInf(hz, 0) || hz == 0 {
		return fixed(hz, 2) + " Hz"
	}
	e := strconv.FormatFloat(math.Abs(hz), 'e', 2, 64) // "d.dde±XX", correctly rounded
	digits := e[:1] + e[2:4]
	exp, err := strconv.Atoi(e[5:])
	if err != nil {
		panic("units: FormatFrequency: unexpected exponent in " + e) // cannot happen: strconv's 'e' format
	}
	var shift int
	var sym string
	switch {
	case exp < 3:
		shift, sym = 0, " Hz"
	case exp < 6:
		shift, sym = 3, " kHz"
	default:
		shift, sym = 6, " MHz"
	}
	var s string
	switch intLen := exp - shift + 1; { // digits before the decimal point
	case intLen <= 0:
		s = "0." + strings.Repeat("0", -intLen) + digits
	case intLen < len(digits):
		s = digits[:intLen] + "." + digits[intLen:]
	default:
		s = digits + strings.Repeat("0", intLen-len(digits))
	}
	return withSign(hz < 0, s+sym)
}

// fixed formats v with prec decimals and drops the minus sign of a result
// that rounds to zero ("-0.0" becomes "0.0").
func fixed(v float64, prec int) string {
	if e, ok := huge(v); ok {
		return e
	}
	s := strconv.FormatFloat(v, 'f', prec, 64)
	if s[0] == '-' && strings.Trim(s[1:], "0.") == "" {
		return s[1:]
	}
	return s
}

// withSign puts a minus sign in front of s when neg is true and s does not
// show a zero.
func withSign(neg bool, s string) string {
	if neg && !isZeroText(s) {
		return "-" + s
	}
	return s
}

// isZeroText reports whether s shows no digit other than zero ("0.0 mm",
// 0", "0.00"); no unit symbol contains a digit.
func isZeroText(s string) bool {
	for _, r := range s {
		if r >= '1' && r <= '9' {
			return false
		}
	}
	return true
}

func gcd(a, b int) int {
	for b != 0 {
		a, b = b, a%b
	}
	return a
}
