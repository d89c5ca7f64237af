package acoustics

import (
	"fmt"
	"math"
	"testing"
)

func TestSourceExtentCheck(t *testing.T) {
	// Hand-computed check of the SUGGESTION model: 50.8 mm, 300 m/s, 10 kHz
	// gives St = 1.693, xs = 2 + 1/St = 2.591 D and L = 2/St = 1.181 D; at
	// 500 Hz (St = 0.0847) L reaches the 20 D cap.
	const dj = 0.0508
	xs, l := SourceExtent(10e3, dj, 300)
	if !withinAbs(l/dj, 1.181, printed(3)) {
		t.Errorf("got L = %.4f D, want 1.181 D", l/dj)
	}
	if !withinAbs(xs/dj, 2.591, printed(3)) {
		t.Errorf("got xs = %.4f D, want 2.591 D", xs/dj)
	}
	if _, l := SourceExtent(500, dj, 300); l/dj != 20 {
		t.Errorf("500 Hz: got L = %.4f D, want the 20 D cap", l/dj)
	}
}

func TestSourceExtentLiteratureRanges(t *testing.T) {
	// The SUGGESTION model must stay inside the FROM MEMORY (medium) ranges
	// of acoustics.md §6.4: St ≳ 1 within about 1–4 D of the exit; St ≈
	// 0.1–0.3 near x ≈ 5–12 D; the whole region about 10–20 D long at most.
	const dj, uj = 0.0508, 300.0
	fOf := func(st float64) float64 { return st * uj / dj }
	tests := []struct {
		name         string
		st           float64
		xsMin, xsMax float64 // in D
	}{
		{"St 1", 1, 1, 4},
		{"St 2", 2, 1, 4},
		{"St 10", 10, 1, 4},
		{"St 0.1", 0.1, 5, 12},
		{"St 0.2", 0.2, 5, 12},
		{"St 0.3", 0.3, 5, 12},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			xs, l := SourceExtent(fOf(tt.st), dj, uj)
			if xs/dj < tt.xsMin-1e-9 || xs/dj > tt.xsMax+1e-9 {
				t.Errorf("got xs = %.3f D, want %g–%g D", xs/dj, tt.xsMin, tt.xsMax)
			}
			if l/dj > 20+1e-9 {
				t.Errorf("got L = %.3f D, want at most 20 D", l/dj)
			}
		})
	}
	// Hand-computed from the model: xs = 12 D, 7 D and 5.333 D at St = 0.1, 0.2, 0.3.
	for _, c := range []struct{ st, xs float64 }{{0.1, 12}, {0.2, 7}, {0.3, 16.0 / 3}} {
		if xs, _ := SourceExtent(fOf(c.st), dj, uj); !withinRel(xs/dj, c.xs, 1e-12) {
			t.Errorf("St %g: got xs = %.6f D, want %.6f D", c.st, xs/dj, c.xs)
		}
	}
}

func TestSourceExtentMonotoneAndClamped(t *testing.T) {
	// Model properties (SUGGESTION, hand-derived): xs and L do not increase
	// with frequency; xs stays in [1, 15] D and L at most 20 D.
	const dj, uj = 1.0, 600.0
	prevXs, prevL := math.Inf(1), math.Inf(1)
	for f := 1.0; f <= 1e6; f *= 1.25 {
		xs, l := SourceExtent(f, dj, uj)
		if xs > prevXs || l > prevL {
			t.Errorf("%g Hz: got xs %g, L %g, want no more than %g, %g", f, xs, l, prevXs, prevL)
		}
		if xs < 1 || xs > 15 || l > 20 {
			t.Errorf("%g Hz: got xs %g D, L %g D, want xs in [1, 15] D and L ≤ 20 D", f, xs, l)
		}
		prevXs, prevL = xs, l
	}
}

func TestSourceExtentSpecialCases(t *testing.T) {
	const dj = 0.05
	tests := []struct {
		name          string
		f, dj, uj     float64
		wantXs, wantL float64
	}{
		{"zero frequency", 0, dj, 300, 15 * dj, 20 * dj},
		{"zero velocity", 1000, dj, 0, 2 * dj, 0},
		{"NaN frequency", math.NaN(), dj, 300, math.NaN(), math.NaN()},
		{"NaN diameter", 1000, math.NaN(), 300, math.NaN(), math.NaN()},
		{"0/0", 0, dj, 0, math.NaN(), math.NaN()},
	}
	same := func(a, b float64) bool { return a == b || (math.IsNaN(a) && math.IsNaN(b)) }
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			xs, l := SourceExtent(tt.f, tt.dj, tt.uj)
			if !same(xs, tt.wantXs) || !same(l, tt.wantL) {
				t.Errorf("got %g, %g, want %g, %g", xs, l, tt.wantXs, tt.wantL)
			}
		})
	}
}

func TestSourceOffset(t *testing.T) {
	// acoustics.md §2.2 table (COMPUTED from r′ = (R² + xs² − 2R·xs·cos θj)^½,
	// θ′ = atan2(R sin θj, R cos θj − xs), error = 20·log10(R/r′)), for a
	// 50.8 mm nozzle.
	const d = 0.0508
	tests := []struct {
		rD, thetaDeg, xsD float64
		rTrueD, thetaTrue float64
		errDB             float64
	}{
		{100, 30, 10, 91.476, 33.13, +0.774},
		{100, 90, 10, 100.499, 95.71, -0.043},
		{100, 150, 10, 108.775, 152.63, -0.731},
		{72, 30, 10, 63.537, 34.51, +1.086},
		{50, 30, 10, 41.641, 36.90, +1.589},
		{40, 30, 10, 31.736, 39.06, +2.010},
		{100, 30, 5, 95.703, 31.50, +0.382},
	}
	for _, tt := range tests {
		t.Run(fmt.Sprintf("R%gD_%gdeg_xs%gD", tt.rD, tt.thetaDeg, tt.xsD), func(t *testing.T) {
			r, th, e := SourceOffset(tt.rD*d, deg(tt.thetaDeg), tt.xsD*d)
			if !withinAbs(r/d, tt.rTrueD, printed(3)) {
				t.Errorf("got r′ = %.4f D, want %.3f D", r/d, tt.rTrueD)
			}
			if got := th * 180 / math.Pi; !withinAbs(got, tt.thetaTrue, printed(2)) {
				t.Errorf("got θ′ = %.3f°, want %.2f°", got, tt.thetaTrue)
			}
			if !withinAbs(e, tt.errDB, printed(3)) {
				t.Errorf("got level error %+.4f dB, want %+.3f dB", e, tt.errDB)
			}
		})
	}
}

func TestSourceOffsetSpecialCases(t *testing.T) {
	// Special cases documented on SourceOffset (hand-derived).
	r, th, e := SourceOffset(5, deg(40), 0)
	if !withinRel(r, 5, 1e-15) || !withinAbs(th, deg(40), 1e-15) || e != 0 {
		t.Errorf("xs = 0: got %g, %g rad, %g dB, want 5, %g rad, 0", r, th, e, deg(40))
	}
	r, th, e = SourceOffset(0.5, 0, 0.5)
	if r != 0 || !math.IsInf(e, 1) {
		t.Errorf("microphone on the source: got %g, %g rad, %g dB, want 0, any, +Inf", r, th, e)
	}
	r, th, e = SourceOffset(0, deg(30), 0.5)
	if r != 0.5 || math.Abs(th) != math.Pi || !math.IsInf(e, -1) {
		t.Errorf("r = 0: got %g, %g rad, %g dB, want 0.5, ±π, −Inf", r, th, e)
	}
	for _, in := range [][3]float64{{math.NaN(), 1, 1}, {1, math.NaN(), 1}, {1, 1, math.NaN()}, {math.Inf(1), 1, math.NaN()}} {
		r, th, e := SourceOffset(in[0], in[1], in[2])
		if !math.IsNaN(r) || !math.IsNaN(th) || !math.IsNaN(e) {
			t.Errorf("SourceOffset(%v): got %g, %g, %g, want NaN, NaN, NaN", in, r, th, e)
		}
	}
}
