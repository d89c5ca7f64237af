package acoustics

import (
	"fmt"
	"math"
	"testing"
)

// cISO is the speed of sound used by the COMPUTED rows of acoustics.md,
// 343.2 m/s (20 °C in the ISO 9613-1 form, acoustics.md §0).
const cISO = 343.2

func TestWavelengthAndAcousticFarField(t *testing.T) {
	// acoustics.md §2.1, COMPUTED with c = 343.2 m/s: λ, and the radius R
	// giving k·R = 10 (R = 10/k), printed to three and two decimals.
	tests := []struct {
		f, lambda, r10 float64
	}{
		{50, 6.864, 10.92},
		{100, 3.432, 5.46},
		{200, 1.716, 2.73},
		{500, 0.686, 1.09},
		{1000, 0.343, 0.55},
	}
	for _, tt := range tests {
		t.Run(fmt.Sprintf("%g Hz", tt.f), func(t *testing.T) {
			if got := Wavelength(tt.f, cISO); !withinAbs(got, tt.lambda, printed(3)) {
				t.Errorf("got λ = %.5f m, want %.3f m", got, tt.lambda)
			}
			if got := 10 / WaveNumber(tt.f, cISO); !withinAbs(got, tt.r10, printed(2)) {
				t.Errorf("got R(kR = 10) = %.4f m, want %.2f m", got, tt.r10)
			}
		})
	}
}

func TestFresnelRadius(t *testing.T) {
	// acoustics.md §2.1, COMPUTED with c = 343.2 m/s.
	tests := []struct {
		name     string
		l, f     float64
		want     float64
		decimals int
	}{
		{"20 D of 50.8 mm at 1 kHz", 1.016, 1000, 3.01, 2},
		{"20 D of 50.8 mm at 10 kHz", 1.016, 10000, 30.1, 1},
		{"5 D of 50.8 mm at 10 kHz", 0.254, 10000, 1.88, 2},
		{"full scale 10 m at 200 Hz", 10, 200, 58.3, 1},
		{"full scale 20 m at 100 Hz", 20, 100, 116.6, 1},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			if got := FresnelRadius(tt.l, tt.f, cISO); !withinAbs(got, tt.want, printed(tt.decimals)) {
				t.Errorf("got %.4f m, want %g m", got, tt.want)
			}
		})
	}
}

func TestQuarterWave(t *testing.T) {
	// acoustics.md §4.2 (COMPUTED λ/4; the λ/4 clearance rule of ISO 3745 is
	// FROM MEMORY, medium confidence).
	tests := []struct {
		f, want float64
	}{
		{50, 1.716}, {63, 1.362}, {80, 1.073}, {100, 0.858}, {125, 0.686}, {200, 0.429},
	}
	for _, tt := range tests {
		if got := QuarterWave(tt.f, cISO); !withinAbs(got, tt.want, printed(3)) {
			t.Errorf("%g Hz: got %.5f m, want %.3f m", tt.f, got, tt.want)
		}
	}
}

func TestWedgeCutoff(t *testing.T) {
	// acoustics.md §4.1 (COMPUTED f_c = c/(4L); the rule of thumb is Beranek
	// & Sleeper 1946, FROM MEMORY, high confidence).
	tests := []struct {
		depth, want float64
		decimals    int
	}{
		{0.3, 286, 0}, {0.6, 143, 0}, {0.9, 95.3, 1}, {1.2, 71.5, 1},
	}
	for _, tt := range tests {
		if got := WedgeCutoff(tt.depth, cISO); !withinAbs(got, tt.want, printed(tt.decimals)) {
			t.Errorf("L = %g m: got %.3f Hz, want %g Hz", tt.depth, got, tt.want)
		}
	}
}

func TestFarFieldSpecialCases(t *testing.T) {
	// Special cases listed in the doc comments (hand-derived).
	nan := math.NaN()
	inf := math.Inf(1)
	tests := []struct {
		name      string
		got, want float64
	}{
		{"Wavelength(0, c)", Wavelength(0, cISO), inf},
		{"Wavelength(Inf, c)", Wavelength(inf, cISO), 0},
		{"Wavelength(NaN, c)", Wavelength(nan, cISO), nan},
		{"WaveNumber(f, 0)", WaveNumber(100, 0), inf},
		{"FresnelRadius(0, f, c)", FresnelRadius(0, 1000, cISO), 0},
		{"FresnelRadius(L, f, 0)", FresnelRadius(1, 1000, 0), inf},
		{"QuarterWave(0, c)", QuarterWave(0, cISO), inf},
		{"WedgeCutoff(0, c)", WedgeCutoff(0, cISO), inf},
		{"WedgeCutoff(NaN, c)", WedgeCutoff(nan, cISO), nan},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			if tt.got != tt.want && !(math.IsNaN(tt.got) && math.IsNaN(tt.want)) {
				t.Errorf("got %g, want %g", tt.got, tt.want)
			}
		})
	}
}
