package units

import "testing"

func TestFormatHours(t *testing.T) {
	for _, tc := range []struct {
		h    float64
		want string
	}{
		{30, "> 24 h"}, {8, "8 h"}, {2.5, "2.5 h"}, {0.25, "15 min"}, {0.001, "3.6 s"},
	} {
		if got := FormatHours(tc.h); got != tc.want {
			t.Errorf("FormatHours(%g): got %q, want %q", tc.h, got, tc.want)
		}
	}
}
