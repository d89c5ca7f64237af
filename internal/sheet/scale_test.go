package sheet

import (
	"errors"
	"math"
	"strings"
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
		// 1:5 holds 1 × 0.8 m in 200 × 160 mm (hand-computed)
		{"tiny rig", 1, 0.8, 263, 243, 5, true},
		// 1:25 is the largest below 1:20 (hand-computed: 7 m at 1:20 is 350 mm)
		{"between 1:20 and 1:25", 6.5, 4, 263, 243, 25, true},
		{"too big for any", 5000, 100, 263, 243, 0, false},
		// 1:75 fits a 15 m room where 1:50 does not (hand-computed: 15 m at
		// 1:75 is 200 mm, at 1:50 300 mm)
		{"1:75 between 1:50 and 1:100", 15, 10, 263, 243, 75, true},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			got, ok := chooseScale(metricScales, tt.w, tt.h, tt.aw, tt.ah)
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

func TestParseScale(t *testing.T) {
	tests := []struct {
		in   string
		want int // 0: an error
	}{
		{"1:50", 50}, {"50", 50}, {" 1 : 75 ", 75}, {"1:5000", 5000}, {"1:1", 1},
		// engineer's and architect's scales: feet per inch × 12
		// (hand-computed)
		{`1" = 20'`, 240}, {"1in=20ft", 240}, {`1″ = 10′`, 120}, {`1/4" = 1'-0"`, 48}, {`1/8"=1'`, 96},
		{"1:240", 240},
		{"1:7", 0}, {"1:0", 0}, {"1:-50", 0}, {"fifty", 0}, {"", 0}, {`1" = 7'`, 0},
	}
	for _, tt := range tests {
		got, err := ParseScale(tt.in)
		if tt.want == 0 {
			if err == nil || !errors.Is(err, ErrScale) || !strings.Contains(err.Error(), "1:50") {
				t.Errorf("%q: got 1:%d, %v; want an ErrScale listing the scales", tt.in, got, err)
			}
			continue
		}
		if err != nil || got != tt.want {
			t.Errorf("%q: got 1:%d, %v; want 1:%d", tt.in, got, err, tt.want)
		}
	}
}

func TestScaleName(t *testing.T) {
	for _, tt := range []struct {
		den  int
		sys  units.System
		want string
	}{
		{50, units.Metric, "1:50"}, {240, units.Imperial, `1" = 20' (1:240)`}, {48, units.Imperial, `1/4" = 1'-0" (1:48)`},
		{50, units.Imperial, "1:50"},
	} {
		if got := ScaleName(tt.den, tt.sys); got != tt.want {
			t.Errorf("1:%d %v: got %q, want %q", tt.den, tt.sys, got, tt.want)
		}
	}
}

func TestParsePaper(t *testing.T) {
	tests := []struct {
		in   string
		want string
		w, h float64 // mm
	}{
		// ISO 216 (acoustics.md §8.2, CONFIRMED for A4/A3; A2–A0 FROM MEMORY)
		{"A4", "A4", 297, 210}, {"a0", "A0", 1189, 841}, {"A1", "A1", 841, 594},
		// ANSI/ASME Y14.1 and architectural sizes at 25.4 mm/in (FROM MEMORY)
		{"letter", "Letter", 279.4, 215.9}, {"ANSI A", "Letter", 279.4, 215.9}, {"ansi-b", "Tabloid", 431.8, 279.4},
		{"ANSI E", "ANSI E", 1117.6, 863.6}, {"arch d", "Arch D", 914.4, 609.6}, {"ArchE1", "Arch E1", 1066.8, 762},
	}
	for _, tt := range tests {
		p, err := ParsePaper(tt.in)
		if err != nil || p.Name != tt.want || p.Width != tt.w || p.Height != tt.h {
			t.Errorf("%q: got %+v, %v; want %s %g × %g", tt.in, p, err, tt.want, tt.w, tt.h)
		}
	}
	for _, bad := range []string{"A5", "B4", "", "ANSI F"} {
		if _, err := ParsePaper(bad); !errors.Is(err, ErrUnknownPaper) || !strings.Contains(err.Error(), "A0") {
			t.Errorf("%q: got %v, want an ErrUnknownPaper listing the papers", bad, err)
		}
	}
}
