package acoustics

import (
	"errors"
	"math"
	"strings"
	"testing"
)

func TestThirdOctaveBandLabels(t *testing.T) {
	// Nominal midband labels of the preferred-number series (IEC 61260 /
	// ISO 266; from memory, high confidence) from 20 Hz to 100 kHz, in order,
	// with exact centres 10^(n/10) Hz (IEC 61260 base-ten system, acoustics.md
	// §1.3, CONFIRMED as the ISO 9613-1 evaluation points).
	want := []string{
		"20 Hz", "25 Hz", "31.5 Hz", "40 Hz", "50 Hz", "63 Hz", "80 Hz", "100 Hz",
		"125 Hz", "160 Hz", "200 Hz", "250 Hz", "315 Hz", "400 Hz", "500 Hz", "630 Hz", "800 Hz",
		"1 kHz", "1.25 kHz", "1.6 kHz", "2 kHz", "2.5 kHz", "3.15 kHz", "4 kHz", "5 kHz", "6.3 kHz", "8 kHz",
		"10 kHz", "12.5 kHz", "16 kHz", "20 kHz", "25 kHz", "31.5 kHz", "40 kHz", "50 kHz", "63 kHz", "80 kHz",
		"100 kHz",
	}
	bands, err := ThirdOctaveBands(20, 100e3)
	if err != nil {
		t.Fatal(err)
	}
	if len(bands) != len(want) {
		t.Fatalf("got %d bands, want %d", len(bands), len(want))
	}
	edge := math.Pow(10, 0.05)
	for i, b := range bands {
		n := 13 + i // 20 Hz is 10^(13/10)
		if b.Nominal != want[i] || b.String() != want[i] {
			t.Errorf("band %d: got label %q, want %q", i, b.Nominal, want[i])
		}
		if b.Index != n {
			t.Errorf("%s: got index %d, want %d", want[i], b.Index, n)
		}
		if c := math.Pow(10, float64(n)/10); !withinRel(b.Centre, c, 1e-14) {
			t.Errorf("%s: got centre %.15g Hz, want 10^(%d/10) = %.15g Hz", want[i], b.Centre, n, c)
		}
		if !withinRel(b.Lower, b.Centre/edge, 1e-14) || !withinRel(b.Upper, b.Centre*edge, 1e-14) {
			t.Errorf("%s: got edges %.10g–%.10g Hz, want centre·10^(∓1/20)", want[i], b.Lower, b.Upper)
		}
		if i > 0 && !withinRel(b.Lower, bands[i-1].Upper, 1e-14) {
			t.Errorf("%s: got lower edge %.12g Hz, want the upper edge of the band below, %.12g Hz", want[i], b.Lower, bands[i-1].Upper)
		}
	}
	// Decade centres are exact (hand-computed: powers of ten).
	for _, n := range []int{0, 10, 20, 30, 40, 50} {
		if got, want := NewBand(n).Centre, math.Pow10(n/10); got != want {
			t.Errorf("band %d: got centre %.17g, want exactly %g", n, got, want)
		}
	}
}

func TestNominalLabelsOutsideAudio(t *testing.T) {
	// Decade extensions of the same preferred-number series (hand-computed).
	tests := []struct {
		n    int
		want string
	}{
		{-30, "0.001 Hz"}, {-29, "0.00125 Hz"}, {-1, "0.8 Hz"}, {0, "1 Hz"}, {5, "3.15 Hz"},
		{60, "1 MHz"}, {65, "3.15 MHz"}, {89, "800 MHz"}, {90, "1 GHz"}, {120, "1000 GHz"},
	}
	for _, tt := range tests {
		if got := NewBand(tt.n).Nominal; got != tt.want {
			t.Errorf("band %d: got %q, want %q", tt.n, got, tt.want)
		}
	}
}

func TestThirdOctaveBandsLimits(t *testing.T) {
	// Nominal limits include their own band although the exact centre lies
	// outside them (50 Hz → 50.12 Hz, 80 kHz → 79.43 kHz; acoustics.md §1.5,
	// COMPUTED), and never the neighbouring band (hand-computed).
	tests := []struct {
		name       string
		from, to   float64
		first, end string // first and last labels; "" for an empty result
		count      int
	}{
		{"50 Hz to 80 kHz", 50, 80e3, "50 Hz", "80 kHz", 33},
		{"single 50 Hz", 50, 50, "50 Hz", "50 Hz", 1},
		{"single 80 kHz", 80e3, 80e3, "80 kHz", "80 kHz", 1},
		{"single 160 Hz", 160, 160, "160 Hz", "160 Hz", 1},
		{"single 1.6 kHz", 1600, 1600, "1.6 kHz", "1.6 kHz", 1},
		{"near labels", 51, 79, "50 Hz", "80 Hz", 3},
		{"between two bands", 65, 75, "", "", 0},
		{"inner", 56, 70, "63 Hz", "63 Hz", 1},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			bands, err := ThirdOctaveBands(tt.from, tt.to)
			if err != nil {
				t.Fatal(err)
			}
			if len(bands) != tt.count {
				t.Fatalf("got %d bands %v, want %d", len(bands), bands, tt.count)
			}
			if tt.count == 0 {
				return
			}
			if got := bands[0].Nominal; got != tt.first {
				t.Errorf("got first band %q, want %q", got, tt.first)
			}
			if got := bands[len(bands)-1].Nominal; got != tt.end {
				t.Errorf("got last band %q, want %q", got, tt.end)
			}
		})
	}
}

func TestThirdOctaveBandsErrors(t *testing.T) {
	tests := []struct {
		name     string
		from, to float64
		word     string
	}{
		{"zero from", 0, 100, "from"},
		{"negative from", -1, 100, "from"},
		{"NaN from", math.NaN(), 100, "from"},
		{"NaN to", 20, math.NaN(), "to"},
		{"infinite to", 20, math.Inf(1), "to"},
		{"reversed", 1000, 100, "below from"},
		{"below supported range", 1e-4, 100, "from"},
		{"above supported range", 20, 1e13, "to"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			bands, err := ThirdOctaveBands(tt.from, tt.to)
			if err == nil {
				t.Fatalf("got %d bands and nil error, want an error", len(bands))
			}
			if !errors.Is(err, ErrInvalidBandRange) {
				t.Errorf("got %v, want it to wrap ErrInvalidBandRange", err)
			}
			if !strings.Contains(err.Error(), tt.word) {
				t.Errorf("got %q, want it to mention %q", err, tt.word)
			}
		})
	}
}

// FuzzThirdOctaveBands checks that any limits either give an error wrapping
// ErrInvalidBandRange or consecutive bands whose centres lie within the
// documented widened range.
func FuzzThirdOctaveBands(f *testing.F) {
	f.Add(20.0, 100e3)
	f.Add(50.0, 50.0)
	f.Add(MinBandFrequency, MaxBandFrequency)
	f.Add(65.0, 75.0)
	f.Add(0.0, -1.0)
	f.Fuzz(func(t *testing.T, from, to float64) {
		bands, err := ThirdOctaveBands(from, to)
		if err != nil {
			if !errors.Is(err, ErrInvalidBandRange) {
				t.Fatalf("got %v, want it to wrap ErrInvalidBandRange", err)
			}
			return
		}
		lo, hi := from/(1+BandTolerance), to*(1+BandTolerance)
		const slack = 1e-12 // relative; the test on the index is made in log form
		for i, b := range bands {
			if b.Centre < lo*(1-slack) || b.Centre > hi*(1+slack) {
				t.Fatalf("band %s (%g Hz) outside %g–%g Hz", b.Nominal, b.Centre, lo, hi)
			}
			if !(b.Lower < b.Centre && b.Centre < b.Upper) || b.Nominal == "" {
				t.Fatalf("band %+v malformed", b)
			}
			if i > 0 && b.Index != bands[i-1].Index+1 {
				t.Fatalf("got index %d after %d, want consecutive", b.Index, bands[i-1].Index)
			}
		}
		// No band just outside the result lies inside the widened range.
		if len(bands) > 0 {
			below, above := NewBand(bands[0].Index-1), NewBand(bands[len(bands)-1].Index+1)
			if below.Centre >= lo*(1+slack) || above.Centre <= hi*(1-slack) {
				t.Fatalf("result %s–%s misses a neighbour inside %g–%g Hz", bands[0], bands[len(bands)-1], lo, hi)
			}
		}
	})
}
