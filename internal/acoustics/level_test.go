package acoustics

import (
	"math"
	"testing"
)

func TestEstimateLevel(t *testing.T) {
	// acoustics.md §6.6 rows (COMPUTED from the FROM MEMORY Lighthill
	// efficiency η = min(1e-4·M_a⁵, 0.01), acoustics.md §6.1), c∞ = 343.2 m/s;
	// levels within 0.1 dB. The peak-angle estimate must lie inside the
	// quoted "≈ 102–107 dB" and "≈ 129–134 dB" ranges.
	const d = 0.0508
	tests := []struct {
		name           string
		rho, u, dj, r  float64
		eta, etaTol    float64
		w, wTol        float64 // W
		lw, lp         float64 // dB
		peakLo, peakHi float64 // dB, 0 when the row gives none
	}{
		{"50.8 mm, 300 m/s, 100 D", 1.204, 300, d, 100 * d, 5.10e-5, printed(7), 1.68, printed(2), 122.3, 97.1, 102, 107},
		{"50.8 mm, Ma 0.9, 100 D", 1.204, 0.9 * cISO, d, 100 * d, math.NaN(), 0, math.NaN(), 0, 123.3, 98.2, 0, 0},
		{"full scale 1 m, 600 m/s, 50 m", 0.6, 600, 1, 50, 1.63e-3, printed(5), 83e3, printed(-3), 169.2, 124.2, 129, 134},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			e := EstimateLevel(tt.rho, tt.u, tt.dj, cISO, tt.r)
			if !math.IsNaN(tt.eta) && !withinAbs(e.Efficiency, tt.eta, tt.etaTol) {
				t.Errorf("got η = %.4g, want %.3g", e.Efficiency, tt.eta)
			}
			if !math.IsNaN(tt.w) && !withinAbs(e.AcousticPower, tt.w, tt.wTol) {
				t.Errorf("got W = %.4g W, want %.3g W", e.AcousticPower, tt.w)
			}
			if !withinAbs(e.PowerLevel, tt.lw, 0.1) {
				t.Errorf("got L_W = %.3f dB, want %.1f dB ± 0.1", e.PowerLevel, tt.lw)
			}
			if !withinAbs(e.MeanLevel, tt.lp, 0.1) {
				t.Errorf("got mean L_p = %.3f dB, want %.1f dB ± 0.1", e.MeanLevel, tt.lp)
			}
			if got := e.PeakLevel - e.MeanLevel; !withinAbs(got, PeakDirectivity, 1e-12) {
				t.Errorf("got peak − mean = %g dB, want %g dB", got, PeakDirectivity)
			}
			if tt.peakHi > 0 && (e.PeakLevel < tt.peakLo || e.PeakLevel > tt.peakHi) {
				t.Errorf("got peak %.2f dB, want within %g–%g dB", e.PeakLevel, tt.peakLo, tt.peakHi)
			}
		})
	}
}

func TestEstimateLevelEfficiencyCap(t *testing.T) {
	// acoustics.md §6.1 (FROM MEMORY): the 1e-4·M_a⁵ law reaches 1 % at
	// M_a ≈ 2.5 (COMPUTED: 1e-4·2.5⁵ = 0.00977) and saturates at 0.01 above.
	if e := EstimateLevel(1, 2.5*cISO, 0.05, cISO, 5); !withinRel(e.Efficiency, 1e-4*math.Pow(2.5, 5), 1e-12) {
		t.Errorf("M_a 2.5: got η %g, want %g", e.Efficiency, 1e-4*math.Pow(2.5, 5))
	}
	if e := EstimateLevel(1, 3*cISO, 0.05, cISO, 5); e.Efficiency != 0.01 {
		t.Errorf("M_a 3: got η %g, want 0.01", e.Efficiency)
	}
}

func TestEstimateLevelInverseSquare(t *testing.T) {
	// Inverse-square law, 6.02 dB per doubling of distance (acoustics.md §0,
	// COMPUTED).
	a := EstimateLevel(1.204, 300, 0.0508, cISO, 5)
	b := EstimateLevel(1.204, 300, 0.0508, cISO, 10)
	if got := a.MeanLevel - b.MeanLevel; !withinAbs(got, 6.02, printed(2)) {
		t.Errorf("got %.4f dB per doubling, want 6.02 dB", got)
	}
}

func TestEstimateLevelSpecialCases(t *testing.T) {
	// Documented special cases (hand-derived).
	ninf := math.Inf(-1)
	for _, c := range []struct {
		name               string
		rho, u, d, cAmb, r float64
		mean               float64
	}{
		{"zero velocity", 1.2, 0, 0.05, cISO, 5, ninf},
		{"negative velocity", 1.2, -300, 0.05, cISO, 5, ninf},
		{"zero density", 0, 300, 0.05, cISO, 5, ninf},
		{"zero diameter", 1.2, 300, 0, cISO, 5, ninf},
		{"zero power at zero radius", 1.2, 0, 0.05, cISO, 0, ninf},
		{"zero radius", 1.2, 300, 0.05, cISO, 0, math.Inf(1)},
		{"zero speed of sound", 1.2, 300, 0.05, 0, 5, math.NaN()},
		{"NaN radius", 1.2, 300, 0.05, cISO, math.NaN(), math.NaN()},
	} {
		t.Run(c.name, func(t *testing.T) {
			e := EstimateLevel(c.rho, c.u, c.d, c.cAmb, c.r)
			if !(e.MeanLevel == c.mean || math.IsNaN(e.MeanLevel) && math.IsNaN(c.mean)) {
				t.Errorf("got mean level %g, want %g", e.MeanLevel, c.mean)
			}
		})
	}
}

func TestPressureLevel(t *testing.T) {
	// acoustics.md §0 (COMPUTED; p_ref = 20 µPa FROM MEMORY, ISO 1683):
	// 140 dB = 200.0 Pa, 137 dB = 141.6 Pa, 135 dB = 112.5 Pa.
	for _, c := range []struct{ p, want float64 }{{200.0, 140}, {141.6, 137}, {112.5, 135}, {20e-6, 0}} {
		if got := PressureLevel(c.p); !withinAbs(got, c.want, 0.01) {
			t.Errorf("%g Pa: got %.4f dB, want %g dB", c.p, got, c.want)
		}
	}
	if got := PressureLevel(0); !math.IsInf(got, -1) {
		t.Errorf("0 Pa: got %g, want −Inf", got)
	}
}
