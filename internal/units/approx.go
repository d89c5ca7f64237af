package units

import (
	"math"
	"strconv"
)

// FormatLengthApprox prints a length given in metres to about three
// significant figures, for reasons and summaries where a tape-measure
// resolution would be noise: "0.12 m" → "120 mm", "4.113 m" → "4.11 m",
// "490.1 m" → "490 m"; in Imperial "13 ft 6 in", "1608 ft", and 1/16 in
// below 1 ft. Lengths below 1 mm print as FormatLength does. It parses back
// to within half its resolution.
func FormatLengthApprox(m float64, sys System) string {
	mustSystem("FormatLengthApprox", sys)
	a := math.Abs(m)
	if math.IsNaN(m) || math.IsInf(m, 0) || a < 1e-3 || a >= HugeValue {
		return FormatLength(m, sys)
	}
	if sys == Imperial {
		switch {
		case a >= 100*Foot:
			return withSign(m < 0, strconv.FormatFloat(math.Round(a/Foot), 'f', 0, 64)+" ft")
		case a >= Foot:
			in := math.Round(a / Inch)
			return withSign(m < 0, strconv.FormatFloat(math.Floor(in/12), 'f', 0, 64)+" ft "+strconv.FormatFloat(math.Mod(in, 12), 'f', 0, 64)+" in")
		}
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
