package acoustics

import (
	"math"
	"strings"
	"testing"
)

func TestMicrophoneAdvice(t *testing.T) {
	// Table of acoustics.md §5.1 (FROM MEMORY, medium confidence) with the
	// rule max SPL ≥ level + 15 dB and upper frequency ≥ fMax (FROM MEMORY).
	// Inputs from acoustics.md §6.6 rows (COMPUTED) where noted.
	tests := []struct {
		name       string
		peak, fMax float64
		want       []string // substrings, in order
		not        []string
	}{
		// Model scale, §6.6 row 1: peak ≈ 104.6 dB, up to 100 kHz (§1.5). The
		// 1/4 in class reaches 100 kHz only at the top of its range; 1/8 in
		// has margin.
		{"model scale to 100 kHz", 104.6, 100e3,
			[]string{"A 1/4 in microphone may do", "100 kHz and 120 dB", "A 1/8 in microphone", "data sheet"}, nil},
		// Model scale to 60 kHz: inside the 1/4 in range (70–100 kHz).
		{"model scale to 60 kHz", 104.6, 60e3, []string{"Use a 1/4 in microphone", "70 kHz to 100 kHz"}, []string{"may do"}},
		// Full scale, §6.6 row 3: peak ≈ 131.7 dB, to 10 kHz: 1/2 in reaches
		// 146.7 dB only at the top (140–160 dB); 1/4 in has margin.
		{"full scale to 10 kHz", 131.7, 10e3, []string{"A 1/2 in microphone may do", "A 1/4 in microphone"}, nil},
		{"quiet, low frequency", 100, 5e3, []string{"Use a 1 in microphone", "115 dB"}, nil},
		{"no frequency requirement", 120, 0, []string{"Use a 1 in microphone: it must reach 135 dB"}, []string{"Hz and 135"}},
		{"beyond every class", 170, 150e3, []string{"No microphone size in the table", "150 kHz and 185 dB"}, nil},
		{"NaN level", math.NaN(), 10e3, []string{"No microphone advice", "peak level"}, nil},
		{"NaN frequency", 120, math.NaN(), []string{"No microphone advice", "frequency"}, nil},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			got := MicrophoneAdvice(tt.peak, tt.fMax)
			rest := got
			for _, w := range tt.want {
				i := strings.Index(rest, w)
				if i < 0 {
					t.Fatalf("got %q, want it to contain %q (in order)", got, w)
				}
				rest = rest[i+len(w):]
			}
			for _, w := range tt.not {
				if strings.Contains(got, w) {
					t.Errorf("got %q, want it not to contain %q", got, w)
				}
			}
		})
	}
}

func TestAdviseMicrophoneCustomTable(t *testing.T) {
	// A user table overrides the typical values (hand-made case).
	table := []MicrophoneClass{{Name: "house 1/4 in", Diameter: 6.35e-3,
		UpperFrequencyLow: 120e3, UpperFrequencyHigh: 120e3, MaxLevelLow: 170, MaxLevelHigh: 170}}
	if got := AdviseMicrophone(table, 140, 110e3); !strings.HasPrefix(got, "Use a house 1/4 in microphone") {
		t.Errorf("got %q, want the custom class", got)
	}
	if got := AdviseMicrophone(nil, 100, 1e3); !strings.HasPrefix(got, "No microphone size") {
		t.Errorf("empty table: got %q, want no size", got)
	}
}

func TestMicrophoneClassesOrdered(t *testing.T) {
	// acoustics.md §5.1 (FROM MEMORY): sizes 1, 1/2, 1/4, 1/8 in with
	// diameters 25.4, 12.7, 6.35, 3.18 mm, largest first; every range low ≤ high.
	want := []struct {
		name string
		dia  float64
	}{{"1 in", 25.4e-3}, {"1/2 in", 12.7e-3}, {"1/4 in", 6.35e-3}, {"1/8 in", 3.18e-3}}
	got := MicrophoneClasses()
	if len(got) != len(want) {
		t.Fatalf("got %d classes, want %d", len(got), len(want))
	}
	for i, c := range got {
		if c.Name != want[i].name || c.Diameter != want[i].dia {
			t.Errorf("class %d: got %s %g m, want %s %g m", i, c.Name, c.Diameter, want[i].name, want[i].dia)
		}
		if c.UpperFrequencyLow > c.UpperFrequencyHigh || c.MaxLevelLow > c.MaxLevelHigh {
			t.Errorf("%s: got reversed ranges %+v", c.Name, c)
		}
	}
}

func TestMicrophoneFit(t *testing.T) {
	// Typical limits from acoustics.md §5.1 (FROM MEMORY, medium): the
	// cautious end of each range; a 1/4 in microphone is good to 160 dB and
	// 70 kHz, so 140 dB OASPL + 15 dB crest fits it with 5 dB to spare
	// (hand-computed).
	c, ok := MicrophoneClassNamed("1/4\"")
	if !ok || c.Name != "1/4 in" {
		t.Fatalf("got %v %v, want the 1/4 in class", c, ok)
	}
	for _, n := range []string{"1/2 in", "1/2in", "1/2 inch", " 1 in"} {
		if _, ok := MicrophoneClassNamed(n); !ok {
			t.Errorf("%q: not recognised", n)
		}
	}
	if _, ok := MicrophoneClassNamed("3/8 in"); ok {
		t.Error("3/8 in: recognised, want not")
	}
	m := c.Typical()
	if got := m.LevelMargin(140); got != 5 {
		t.Errorf("got margin %g dB, want 5", got)
	}
	tests := []struct {
		oaspl, fmax float64
		want        string
		ok          bool
	}{
		{110, 5e3, "1 in", true},
		{110, 10e3, "1/2 in", true}, // 1 in reaches only 8 kHz at the cautious end
		{125, 10e3, "1/2 in", true},
		{130, 10e3, "1/4 in", true}, // 1/2 in: 140 dB < 130 + 15
		{150, 10e3, "1/8 in", true},
		{170, 10e3, "", false},
	}
	for _, tt := range tests {
		c, ok := SmallestFit(tt.oaspl, tt.fmax)
		if ok != tt.ok || c.Name != tt.want {
			t.Errorf("%g dB, %g Hz: got %q %v, want %q %v", tt.oaspl, tt.fmax, c.Name, ok, tt.want, tt.ok)
		}
	}
}
