package acoustics

import (
	"math"
	"testing"
)

func TestNIOSHAllowedHours(t *testing.T) {
	// NIOSH REL, 85 dB(A) for 8 h with a 3-dB exchange rate: 88 → 4 h,
	// 94 → 1 h, 100 dB(A) → 15 min (acoustics.md §7.1, CONFIRMED on a CDC/
	// NIOSH page mirror); 115 dB(A) → 28 s (noise-and-exposure.md §6, DERIVED).
	tests := []struct{ la, hours, tol float64 }{
		{85, 8, 1e-12}, {88, 4, 1e-12}, {94, 1, 1e-12}, {100, 0.25, 1e-12}, {115, 28.125 / 3600, 1e-12},
	}
	for _, tt := range tests {
		if got := NIOSHAllowedHours(tt.la); !withinAbs(got, tt.hours, tt.tol) {
			t.Errorf("%g dB(A): got %.6g h, want %.6g h", tt.la, got, tt.hours)
		}
	}
}

func TestClassifyExposure(t *testing.T) {
	// EU Directive 2003/10/EC Art. 3 (CONFIRMED, acoustics.md §7.1): lower
	// action 80 dB(A)/135 dB(C), upper action 85/137, limit 87/140; limits
	// inclusive.
	tests := []struct {
		lex, peak float64
		want      ExposureClass
	}{
		{79.9, 134.9, BelowAction},
		{80, 100, LowerAction},
		{70, 135, LowerAction},
		{85, 100, UpperAction},
		{70, 137, UpperAction},
		{87, 100, AboveLimit},
		{70, 140, AboveLimit},
		{math.NaN(), 100, AboveLimit},
	}
	for _, tt := range tests {
		if got := ClassifyExposure(tt.lex, tt.peak); got != tt.want {
			t.Errorf("%g dB(A), %g dB(C): got %v, want %v", tt.lex, tt.peak, got, tt.want)
		}
	}
	// L_EX,8h of 2 h at 90 dB(A) is 90 − 6.02 dB (hand-computed)
	if got := DailyExposure(90, 2); !withinAbs(got, 90-10*math.Log10(4), 1e-12) {
		t.Errorf("got L_EX,8h %.3f dB(A), want 83.979", got)
	}
}
