package sheet

import (
	"testing"

	"arcwright/internal/units"
)

// TestTape: feet and inches as a tape reads them, to 1/8 in up to 100 ft
// and to the inch beyond (issue 9: "147 ft 11-11/16 in", "0 ft 7-7/8 in",
// 1/16 in on a 2,005 ft zone). Expected values hand-computed from
// 1 in = 25.4 mm.
func TestTape(t *testing.T) {
	in := units.Inch
	ft := units.Foot
	tests := []struct {
		m    float64
		want string
	}{
		{47*ft + 7.6*in, `47' 7-5/8"`},     // 7.6 in is 7-5/8 to the nearest 1/8
		{147*ft + 7.6*in, `147' 8"`},       // beyond 100 ft: to the inch
		{99*ft + 11.99*in, `100' 0"`},      // rounds up to 100 ft
		{7.87 * in, `7-7/8"`},              // no "0'"
		{0.06 * in, `0"`},                  // below 1/16 in
		{0.5 * in, `1/2"`},                 // a fraction alone
		{12 * ft, `12' 0"`},                // whole feet
		{2005*ft + 3.3*in, `2005' 3"`},     // to the inch beyond 100 ft
		{100*ft + 0.4*in, `100' 0"`},       // 100 ft is past the fine range
		{-(2*ft + 3.125*in), `-2' 3-1/8"`}, // a negative coordinate
		{5, `16' 4-7/8"`},                  // 5 m = 196.85 in
	}
	for _, tt := range tests {
		if got := tape(tt.m); got != tt.want {
			t.Errorf("%.6f m: got %s, want %s", tt.m, got, tt.want)
		}
	}
	// One notation in text and drawing, on a site plan too: 147.6' reads
	// as 147' 6" on site (review of the pad plan).
	p := printer{sys: units.Imperial}
	if got := p.dim(45); got != `147' 8"` {
		t.Errorf("site plan callout of 45 m: got %s, want 147' 8\" (hand-computed 45/0.3048 = 147.64 ft)", got)
	}
	if got := p.length(45); got != `147' 8"` {
		t.Errorf("text of 45 m: got %s, want 147' 8\" (147.64 ft, to the inch beyond 100 ft)", got)
	}
}
