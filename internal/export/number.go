package export

import (
	"math"
	"strconv"
)

var nan = math.NaN()

// Rounding of written values.
const (
	lengthDecimals = 4 // metres to 0.1 mm
	angleDecimals  = 2 // degrees to 0.01°
	significant    = 6 // significant digits of other quantities
	// roundLimit is the magnitude above which a value is written as it is:
	// beyond it v·10^decimals no longer has a fractional part to round.
	roundLimit = 1e15
)

// num is a float64 that is written to JSON as a number, or as null when it
// is NaN or ±Inf (encoding/json refuses those). Negative zero is written
// as 0.
type num float64

// MarshalJSON writes the shortest decimal that reads back as n, in the
// format encoding/json uses for float64, or null.
func (n num) MarshalJSON() ([]byte, error) {
	return appendNum(nil, float64(n)), nil
}

// appendNum appends v as a JSON number, or null when v is not finite.
func appendNum(b []byte, v float64) []byte {
	switch {
	case !finite(v):
		return append(b, "null"...)
	case v == 0:
		return append(b, '0')
	}
	if a := math.Abs(v); a < 1e-6 || a >= 1e21 {
		return strconv.AppendFloat(b, v, 'e', -1, 64)
	}
	return strconv.AppendFloat(b, v, 'f', -1, 64)
}

// finite reports whether v is neither NaN nor ±Inf.
func finite(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }

// roundTo rounds v to d decimals, half away from zero. NaN, ±Inf and
// values beyond roundLimit are returned unchanged; a result of −0 is 0.
func roundTo(v float64, d int) float64 {
	if !finite(v) || math.Abs(v) >= roundLimit {
		return v
	}
	p := math.Pow10(d)
	r := math.Round(v*p) / p
	if r == 0 {
		return 0
	}
	return r
}

// metres returns a length (m) rounded to 0.1 mm.
func metres(v float64) num { return num(roundTo(v, lengthDecimals)) }

// degrees returns an angle given in radians as degrees rounded to 0.01°.
func degrees(rad float64) num { return num(roundTo(rad*180/math.Pi, angleDecimals)) }

// sig returns v rounded to 6 significant digits; NaN and ±Inf unchanged.
func sig(v float64) num {
	if !finite(v) {
		return num(v)
	}
	r, err := strconv.ParseFloat(strconv.FormatFloat(v, 'g', significant, 64), 64)
	if err != nil || r == 0 { // err cannot happen for a finite v
		return 0
	}
	return num(r)
}

// cellMetres formats a length (m) for a CSV cell with 4 decimals; empty
// when it is NaN or ±Inf.
func cellMetres(v float64) string { return cellFixed(v, lengthDecimals) }

// cellDegrees formats an angle given in radians as degrees with 2 decimals;
// empty when it is NaN or ±Inf.
func cellDegrees(rad float64) string { return cellFixed(rad*180/math.Pi, angleDecimals) }

func cellFixed(v float64, d int) string {
	if !finite(v) {
		return ""
	}
	return strconv.FormatFloat(roundTo(v, d), 'f', d, 64)
}
