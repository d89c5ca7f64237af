package acoustics

import (
	"fmt"
	"testing"
)

// Band indices of the exact base-ten midbands used by the ISO tables
// (ISO 9613-1 Note 5; acoustics.md §1.3): centre = 10^(n/10) Hz.
const (
	band50Hz  = 17
	band63Hz  = 18
	band125Hz = 21
	band160Hz = 22
	band200Hz = 23
	band1kHz  = 30
	band4kHz  = 36
	band6k3Hz = 38
	band8kHz  = 39
	band10kHz = 40
)

func TestAbsorptionIntermediates(t *testing.T) {
	a := StandardAtmosphere()
	frO, frN, h := a.Relaxation()
	// COMPUTED at 20 °C, 70 %, 101.325 kPa from the ISO 9613-1 equations,
	// acoustics.md §1.5; p_sat = 2.33663045 kPa is also CONFIRMED in a public
	// test suite of the same equations (acoustics.md §1.5). The sheet's
	// p_sat/p_r = 0.0230610 is not checked: it disagrees with its own
	// 2.33663 kPa/101.325 kPa = 0.0230607 in the sixth digit.
	tests := []struct {
		name      string
		got, want float64
	}{
		{"p_sat (Pa)", SaturationVapourPressure(a.Temperature), 2336.63045},
		{"h (%)", h, 1.614252},
		{"MolarHumidity (%)", a.MolarHumidity(), 1.614252},
		{"frO (Hz)", frO, 53173.96},
		{"frN (Hz)", frN, 460.9907},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			if !withinRel(tt.got, tt.want, 1e-5) {
				t.Errorf("got %.8g, want %.8g (relative 1e-5)", tt.got, tt.want)
			}
		})
	}
}

func TestRelaxationDryAir(t *testing.T) {
	// With h_r = 0 at 20 °C and 101.325 kPa the equations give frO = 24 Hz and
	// frN = 9 Hz exactly: COMPUTED in acoustics.md §1.5 and CONFIRMED in a
	// public test suite of the ISO 9613-1 equations (acoustics.md §1.5).
	a := Atmosphere{Temperature: 293.15, RelativeHumidity: 0, Pressure: 101325}
	frO, frN, h := a.Relaxation()
	if h != 0 || !withinRel(frO, 24, 1e-12) || !withinRel(frN, 9, 1e-12) {
		t.Errorf("got frO %g Hz, frN %g Hz, h %g %%, want 24 Hz, 9 Hz, 0 %%", frO, frN, h)
	}
}

func TestAbsorptionISOTable1(t *testing.T) {
	// ISO 9613-1:1993 Table 1 values in dB/km at 101.325 kPa, third-party
	// transcriptions quoted in acoustics.md §1.4 (CONFIRMED), evaluated at the
	// exact base-ten midbands. Tolerance 0.5 % (acoustics.md §1.3: the
	// equations reproduce them within 0.45 % at exact midbands, COMPUTED).
	tests := []struct {
		source     string
		t, rh      float64
		band       int
		wantDBPerK float64
	}{
		{"Table 1 transcription (CSV)", -20, 10, band50Hz, 0.589},
		{"Table 1 transcription (CSV)", -20, 10, band1kHz, 1.65},
		{"Table 1 transcription (CSV)", -20, 10, band4kHz, 3.86},
		{"Table 1 transcription (CSV)", -20, 10, band8kHz, 10.9},
		{"Table 1 transcription (CSV)", -20, 10, band10kHz, 16.4},
		{"Table 1 transcription (CSV)", -15, 30, band50Hz, 0.212},
		{"Table 1 transcription (CSV)", -15, 30, band1kHz, 9.44},
		{"Table 1 transcription (CSV)", -15, 30, band4kHz, 13.1},
		{"Table 1 transcription (CSV)", -15, 30, band8kHz, 20.3},
		{"Table 1 transcription (CSV)", -15, 30, band10kHz, 25.9},
		{"Table 1 transcription (CSV)", 25, 80, band50Hz, 0.0426},
		{"Table 1 transcription (CSV)", 25, 80, band1kHz, 6.35},
		{"Table 1 transcription (CSV)", 25, 80, band4kHz, 21.1},
		{"Table 1 transcription (CSV)", 25, 80, band8kHz, 59.8},
		{"Table 1 transcription (CSV)", 25, 80, band10kHz, 89.6},
		{"Table 1 transcription (test script)", 20, 15, band6k3Hz, 175},
		{"Table 1 transcription (test script)", 20, 80, band50Hz, 0.0501},
		{"Table 1 transcription (test script)", 20, 80, band1kHz, 5.15},
		{"Table 1 transcription (test script)", 20, 80, band10kHz, 105},
		{"Table 1 transcription (test file)", 20, 70, band125Hz, 0.339},
		{"Table 1 transcription (test file)", 20, 70, band160Hz, 0.518},
		{"Table 1 transcription (test file)", 20, 70, band200Hz, 0.776},
		{"Table 1 transcription (test file)", 20, 70, band1kHz, 4.98},
	}
	for _, tt := range tests {
		b := NewBand(tt.band)
		t.Run(fmt.Sprintf("%g°C_%g%%_%s", tt.t, tt.rh, b.Nominal), func(t *testing.T) {
			got := celsius(tt.t, tt.rh, ReferencePressure).Absorption(b.Centre) * 1e3
			if !withinRel(got, tt.wantDBPerK, 0.005) {
				t.Errorf("%s: got %.4g dB/km, want %g dB/km ± 0.5 %%", tt.source, got, tt.wantDBPerK)
			}
		})
	}
}

func TestAbsorptionISO9613Part2Table2(t *testing.T) {
	// ISO 9613-2:1996 Table 2, octave bands 63 Hz–8 kHz, dB/km at
	// 101.325 kPa, third-party transcription quoted in acoustics.md §1.4
	// (CONFIRMED; also from memory, high). The table prints one decimal below
	// 100 dB/km and whole numbers above, so a value passes when it is within
	// 0.5 % or within half a unit of the last printed digit, whichever is
	// larger. Documented exception (acoustics.md §1.4, COMPUTED): 15 °C, 80 %,
	// 1 kHz computes 4.151 but is printed 4.1, a print-side rounding quirk the
	// transcriber also notes; it is allowed one full printed unit.
	octaves := []int{18, 21, 24, 27, 30, 33, 36, 39} // 63 Hz … 8 kHz
	rows := []struct {
		t, rh float64
		want  [8]float64
	}{
		{10, 70, [8]float64{0.1, 0.4, 1.0, 1.9, 3.7, 9.7, 32.8, 117}},
		{20, 70, [8]float64{0.1, 0.3, 1.1, 2.8, 5.0, 9.0, 22.9, 76.6}},
		{30, 70, [8]float64{0.1, 0.3, 1.0, 3.1, 7.4, 12.7, 23.1, 59.3}},
		{15, 20, [8]float64{0.3, 0.6, 1.2, 2.7, 8.2, 28.2, 88.8, 202}},
		{15, 50, [8]float64{0.1, 0.5, 1.2, 2.2, 4.2, 10.8, 36.2, 129}},
		{15, 80, [8]float64{0.1, 0.3, 1.1, 2.4, 4.1, 8.3, 23.7, 82.8}},
	}
	for _, row := range rows {
		a := celsius(row.t, row.rh, ReferencePressure)
		for i, n := range octaves {
			b := NewBand(n)
			want := row.want[i]
			t.Run(fmt.Sprintf("%g°C_%g%%_%s", row.t, row.rh, b.Nominal), func(t *testing.T) {
				tol := printed(1)
				if want >= 100 {
					tol = printed(0)
				}
				if row.t == 15 && row.rh == 80 && n == band1kHz {
					tol = 0.1 // documented print-rounding exception
				}
				tol = max(tol, 0.005*want)
				got := a.Absorption(b.Centre) * 1e3
				if !withinAbs(got, want, tol) {
					t.Errorf("got %.4g dB/km, want %g ± %.3g dB/km", got, want, tol)
				}
			})
		}
	}
}

func TestAbsorptionComputedVectors(t *testing.T) {
	// COMPUTED vectors of acoustics.md §1.5 from the ISO 9613-1 equations,
	// relative tolerance 1e-5 (they are printed to six significant figures).
	std := StandardAtmosphere()
	tests := []struct {
		name string
		a    Atmosphere
		f    float64 // Hz
		want float64 // dB/m
	}{
		{"20C_70pct_1k", std, 1000, 4.97781e-3},
		{"20C_70pct_4k", std, 4000, 2.30858e-2},
		{"20C_70pct_4k_exact", std, NewBand(band4kHz).Centre, 2.29112e-2},
		{"20C_70pct_8k", std, 8000, 7.76332e-2},
		{"20C_70pct_8k_exact", std, NewBand(band8kHz).Centre, 7.66206e-2},
		{"20C_70pct_10k", std, 10000, 0.117507},
		{"20C_70pct_20k", std, 20000, 0.420158},
		{"20C_70pct_40k", std, 40000, 1.28557},
		{"20C_70pct_63k", std, 63000, 2.29570},
		{"20C_70pct_63k_exact", std, NewBand(48).Centre, 2.29973},
		{"20C_70pct_80k", std, 80000, 2.99517},
		{"20C_70pct_80k_exact", std, NewBand(49).Centre, 2.97212},
		{"20C_70pct_100k", std, 100000, 3.81450},
		{"15C_70pct_1k", celsius(15, 70, 101325), 1000, 4.07924e-3},
		{"15C_70pct_10k", celsius(15, 70, 101325), 10000, 1.43524e-1},
		{"15C_70pct_40k", celsius(15, 70, 101325), 40000, 1.22758},
		{"25C_80pct_1k", celsius(25, 80, 101325), 1000, 6.34509e-3},
		{"25C_80pct_10k", celsius(25, 80, 101325), 10000, 8.96390e-2},
		{"25C_80pct_40k", celsius(25, 80, 101325), 40000, 1.14192},
		{"20C_70pct_90kPa_1k", celsius(20, 70, 90e3), 1000, 4.97206e-3},
		{"20C_70pct_90kPa_10k", celsius(20, 70, 90e3), 10000, 1.17663e-1},
		{"20C_70pct_90kPa_40k", celsius(20, 70, 90e3), 40000, 1.31170},
		{"-20C_10pct_1k", celsius(-20, 10, 101325), 1000, 1.64901e-3},
		{"-20C_10pct_10k", celsius(-20, 10, 101325), 10000, 1.63584e-2},
		{"-20C_10pct_40k", celsius(-20, 10, 101325), 40000, 2.39137e-1},
		{"35C_20pct_1k", celsius(35, 20, 101325), 1000, 6.82166e-3},
		{"35C_20pct_10k", celsius(35, 20, 101325), 10000, 2.07476e-1},
		{"35C_20pct_40k", celsius(35, 20, 101325), 40000, 1.61410},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			if got := tt.a.Absorption(tt.f); !withinRel(got, tt.want, 1e-5) {
				t.Errorf("got %.6g dB/m, want %.6g dB/m (relative 1e-5)", got, tt.want)
			}
		})
	}
}

func TestRelaxationComputedVectors(t *testing.T) {
	// COMPUTED vectors of acoustics.md §1.5 (h, frO, frN), relative 1e-5.
	tests := []struct {
		name        string
		a           Atmosphere
		h, frO, frN float64
	}{
		{"15C_70pct", celsius(15, 70, 101325), 1.177222, 36332.37, 333.669},
		{"25C_80pct", celsius(25, 80, 101325), 2.499707, 88051.12, 719.410},
		{"20C_70pct_90kPa", celsius(20, 70, 90e3), 1.817379, 54281.09, 459.985},
		{"-20C_10pct", celsius(-20, 10, 101325), 0.012370, 64.104, 12.7093},
		{"35C_20pct", celsius(35, 20, 101325), 1.109718, 33773.31, 333.424},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			frO, frN, h := tt.a.Relaxation()
			if !withinRel(h, tt.h, 1e-5) || !withinRel(frO, tt.frO, 1e-5) || !withinRel(frN, tt.frN, 1e-5) {
				t.Errorf("got h %.7g %%, frO %.7g Hz, frN %.7g Hz; want %.7g %%, %.7g Hz, %.7g Hz",
					h, frO, frN, tt.h, tt.frO, tt.frN)
			}
		})
	}
}
