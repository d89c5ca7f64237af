package sheet

import (
	"math"
	"testing"

	"arcwright/internal/units"
)

func TestChooseScale(t *testing.T) {
	tests := []struct {
		name         string
		w, h, aw, ah float64
		want         int
		ok           bool
	}{
		// a 5.08 m arc plus the rig, about 11 × 7 m, fits A3 at 1:50
		// (acoustics.md §8.4, COMPUTED: 390 × 270 mm at 1:50 holds 19.5 × 13.5 m)
		{"model-scale arc on A3", 11, 7, 263, 243, 50, true},
		// a 50 m outdoor arc, about 105 × 55 m, needs 1:500 on A3 (same source)
		{"outdoor arc on A3", 105, 55, 263, 243, 500, true},
		{"tiny rig", 1, 0.8, 263, 243, 10, true},
		// 1:25 is the largest below 1:20 (hand-computed: 7 m at 1:20 is 350 mm)
		{"between 1:20 and 1:25", 6.5, 4, 263, 243, 25, true},
		{"too big for any", 1000, 100, 263, 243, 0, false},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			got, ok := chooseScale(tt.w, tt.h, tt.aw, tt.ah)
			if got != tt.want || ok != tt.ok {
				t.Errorf("got 1:%d (%v), want 1:%d (%v)", got, ok, tt.want, tt.ok)
			}
		})
	}
}

func TestNiceNumbers(t *testing.T) {
	for _, tt := range []struct{ v, above, below float64 }{
		{1, 1, 1}, {1.1, 2, 1}, {2.4, 2.5, 2}, {4.65, 5, 2.5}, {7, 10, 5}, {0.03, 0.05, 0.025}, {61, 100, 50},
	} {
		if got := niceAbove(tt.v); math.Abs(got-tt.above) > 1e-12 {
			t.Errorf("niceAbove(%g): got %g, want %g", tt.v, got, tt.above)
		}
		if got := niceBelow(tt.v); math.Abs(got-tt.below) > 1e-12 {
			t.Errorf("niceBelow(%g): got %g, want %g", tt.v, got, tt.below)
		}
	}
}

func TestGridSpacing(t *testing.T) {
	tests := []struct {
		scale int
		sys   units.System
		want  float64 // m
	}{
		// at least 18 mm on the page: 0.9 m at 1:50 rounds up to 1 m
		// (hand-computed)
		{50, units.Metric, 1},
		{100, units.Metric, 2},
		{20, units.Metric, 0.5},
		// 3.6 m is 11.8 ft at 1:200: 20 ft (hand-computed)
		{200, units.Imperial, 20 * units.Foot},
	}
	for _, tt := range tests {
		if got := gridSpacing(tt.scale, tt.sys, 18); math.Abs(got-tt.want) > 1e-12 {
			t.Errorf("1:%d %v: got %g m, want %g m", tt.scale, tt.sys, got, tt.want)
		}
	}
}

func TestScaleFor(t *testing.T) {
	if s, err := scaleFor(0, "Options.Scale", 11, 7, 263, 243, "A3"); err != nil || s != 50 {
		t.Errorf("got 1:%d, %v; want 1:50", s, err)
	}
	if _, err := scaleFor(0, "Options.Scale", 5000, 100, 263, 243, "A3"); err == nil {
		t.Error("got no error for a plan that fits no scale")
	}
	if _, err := scaleFor(10, "Options.Scale", 5000, 100, 263, 243, "A3"); err == nil {
		t.Error("got no error for an asked scale with no fitting scale at all")
	}
}
