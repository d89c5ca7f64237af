package units

import (
	"math"
	"testing"
)

// TestFormatLengthApprox checks the three-figure printing (hand-computed),
// in feet and inches the same tape reading as FormatLength (one notation in
// reasons, tables and the sheet), and that it parses back within half its
// resolution.
func TestFormatLengthApprox(t *testing.T) {
	tests := []struct {
		m              float64
		metric, imperi string
	}{
		{0.0004, "0.4 mm", `0"`},
		{0.012, "12.0 mm", `1/2"`},
		{0.12, "120 mm", `4-3/4"`},
		{0.9996, "1.00 m", `3' 3-3/8"`},
		{1.2, "1.20 m", `3' 11-1/4"`},
		{4.113, "4.11 m", `13' 5-7/8"`},
		{45, "45.0 m", `147' 8"`},
		{121.66, "122 m", `399' 2"`},
		{490.1, "490 m", `1607' 11"`},
		{-2.5, "-2.50 m", `-8' 2-3/8"`},
		// 1e300 m = 3.281e300 ft (hand-computed): e-notation, not 300 digits.
		{1e300, "1.000e+300 m", "3.281e+300 ft"},
	}
	for _, tt := range tests {
		if got := FormatLengthApprox(tt.m, Metric); got != tt.metric {
			t.Errorf("%g m metric: got %q, want %q", tt.m, got, tt.metric)
		}
		if got := FormatLengthApprox(tt.m, Imperial); got != tt.imperi {
			t.Errorf("%g m imperial: got %q, want %q", tt.m, got, tt.imperi)
		}
		for _, sys := range []System{Metric, Imperial} {
			s := FormatLengthApprox(tt.m, sys)
			back, err := Parse(s, Length, "")
			if err != nil {
				t.Errorf("%q does not parse: %v", s, err)
				continue
			}
			if tol := math.Max(0.006*math.Abs(tt.m), Foot/2); math.Abs(back-tt.m) > tol {
				t.Errorf("%q reads back as %g, want %g", s, back, tt.m)
			}
		}
	}
}
