package units

import (
	"math"
	"strconv"
)

// FormatLengthApprox prints a length given in metres to about three
// significant figures, for reasons and summaries where a tape-measure
// resolution would be noise: "0.12 m" → "120 mm", "4.113 m" → "4.11 m",
// "490.1 m" → "490 m". In Imperial it prints as FormatLength does, the tape
// reading (13' 5-7/8", 1607' 11"), so that a length reads the same in a
// reason as in the tables and on the sheet. Lengths below 1 mm print as
// FormatLength does. It parses back to within half its resolution.
func FormatLengthApprox(m float64, sys System) string {
	mustSystem("FormatLengthApprox", sys)
	a := math.Abs(m)
	if sys == Imperial || math.IsNaN(m) || math.IsInf(m, 0) || a < 1e-3 || a >= HugeValue {
		return FormatLength(m, sys)
	}
	// three significant figures, no finer than 0.1 mm
	d := 2 - int(math.Floor(math.Log10(a)))
	r := math.Round(a*math.Pow10(d)) / math.Pow10(d)
	if r >= math.Pow10(3-d) {
		d-- // rounding carried into the next decade: 999.6 → 1000
		r = math.Round(a*math.Pow10(d)) / math.Pow10(d)
	}
	if r < 1 {
		return withSign(m < 0, strconv.FormatFloat(r*1e3, 'f', min(1, max(0, d-3)), 64)+" mm")
	}
	return withSign(m < 0, strconv.FormatFloat(a, 'f', max(0, d), 64)+" m")
}
