package units

import (
	"math"
	"testing"
)

// TestFormatLengthApprox checks the three-figure printing (hand-computed)
// and that it parses back within half its resolution.
func TestFormatLengthApprox(t *testing.T) {
	tests := []struct {
		m              float64
		metric, imperi string
	}{
		{0.0004, "0.4 mm", "0 ft 0 in"},
		{0.012, "12.0 mm", "0 ft 1/2 in"},
		{0.12, "120 mm", "0 ft 4-3/4 in"},
		{0.9996, "1.00 m", "3 ft 3 in"},
		{1.2, "1.20 m", "3 ft 11 in"},
		{4.113, "4.11 m", "13 ft 6 in"},
		{45, "45.0 m", "148 ft"},
		{121.66, "122 m", "399 ft"},
		{490.1, "490 m", "1608 ft"},
		{-2.5, "-2.50 m", "-8 ft 2 in"},
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
