package acoustics

import (
	"math"
	"strings"
	"testing"
)

// propertyAtmospheres spans the plausible range accepted by Validate.
func propertyAtmospheres() []Atmosphere {
	return []Atmosphere{
		StandardAtmosphere(),
		{Temperature: MinTemperature, RelativeHumidity: 0, Pressure: MinPressure},
		{Temperature: MinTemperature, RelativeHumidity: 100, Pressure: MaxPressure},
		{Temperature: MaxTemperature, RelativeHumidity: 100, Pressure: MinPressure},
		{Temperature: MaxTemperature, RelativeHumidity: 0, Pressure: MaxPressure},
		celsius(-20, 10, 101325),
		celsius(35, 20, 101325),
		celsius(20, 70, 90e3),
	}
}

func TestAbsorptionIncreasesWithFrequency(t *testing.T) {
	// Property of ISO 9613-1 eq. (5) (DERIVED): each term f²·fr/(fr² + f²)
	// and the classical f² term grow with f, so α is strictly increasing for
	// f > 0 at a fixed atmosphere. Checked on every one-third-octave band from
	// 1 Hz to 10 MHz.
	bands, err := ThirdOctaveBands(1, 10e6)
	if err != nil {
		t.Fatal(err)
	}
	for _, a := range propertyAtmospheres() {
		prev := a.Absorption(0)
		if prev != 0 {
			t.Errorf("%+v: got α(0) = %g, want 0", a, prev)
		}
		for _, b := range bands {
			got := a.Absorption(b.Centre)
			if !(got > prev) {
				t.Errorf("%+v: got α(%s) = %g dB/m, want more than the band below (%g dB/m)", a, b.Nominal, got, prev)
			}
			prev = got
		}
	}
}

func TestAbsorptionSpecialCases(t *testing.T) {
	// Special cases documented on Absorption (hand-derived from eq. (5)).
	a := StandardAtmosphere()
	tests := []struct {
		name string
		f    float64
		want float64
	}{
		{"zero", 0, 0},
		{"+Inf", math.Inf(1), math.Inf(1)},
		{"-Inf", math.Inf(-1), math.Inf(1)},
		{"negative equals positive", -1000, a.Absorption(1000)},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			if got := a.Absorption(tt.f); got != tt.want {
				t.Errorf("got %g, want %g", got, tt.want)
			}
		})
	}
	t.Run("NaN", func(t *testing.T) {
		if got := a.Absorption(math.NaN()); !math.IsNaN(got) {
			t.Errorf("got %g, want NaN", got)
		}
	})
	t.Run("largest documented finite frequency", func(t *testing.T) {
		for _, at := range propertyAtmospheres() {
			if got := at.Absorption(1e150); math.IsInf(got, 0) || math.IsNaN(got) || got < 0 {
				t.Errorf("%+v: got %g, want a finite non-negative value", at, got)
			}
		}
	})
}

func TestSaturationVapourPressureAgainstGoffGratch(t *testing.T) {
	// acoustics.md §1.2 (COMPUTED): the ISO Annex B form differs from the
	// Goff–Gratch/WMO form by at most 0.04 % from −20 to +50 °C. The
	// Goff–Gratch form is the one printed in acoustics.md §1.2 (CONFIRMED in
	// public code, FROM MEMORY as the ANSI S1.26 form).
	goffGratch := func(t float64) float64 {
		r := triplePointTemperature / t
		v := 10.79586*(1-r) - 5.02808*math.Log10(t/triplePointTemperature) +
			1.50474e-4*(1-math.Pow(10, -8.29692*(t/triplePointTemperature-1))) +
			0.42873e-3*(-1+math.Pow(10, 4.76955*(1-r))) - 2.2195983
		return ReferencePressure * math.Pow(10, v)
	}
	for c := -20.0; c <= 50; c += 10 {
		tk := c + 273.15
		if got, want := SaturationVapourPressure(tk), goffGratch(tk); !withinRel(got, want, 4e-4) {
			t.Errorf("%g °C: got %.6g Pa, want %.6g Pa ± 0.04 %%", c, got, want)
		}
	}
}

func TestFrequencyWarning(t *testing.T) {
	// ISO 9613-1 validity 4e-4 ≤ f/p ≤ 10 Hz/Pa (acoustics.md §1.3, FROM
	// MEMORY): 40.53 Hz to 1.01325 MHz at 101.325 kPa (hand-computed).
	a := StandardAtmosphere()
	tests := []struct {
		f    float64
		warn bool
	}{
		{40, true}, {40.53, false}, {1000, false}, {100e3, false}, {1.01325e6, false}, {1.1e6, true}, {math.NaN(), false},
	}
	for _, tt := range tests {
		got := a.FrequencyWarning(tt.f)
		if (got != "") != tt.warn {
			t.Errorf("f = %g Hz: got %q, want a warning: %v", tt.f, got, tt.warn)
		}
		if tt.warn && !strings.Contains(got, "ISO 9613-1") {
			t.Errorf("f = %g Hz: got %q, want it to name ISO 9613-1", tt.f, got)
		}
	}
}

// FuzzAbsorption checks that every atmosphere that passes Validate gives a
// non-negative, non-NaN attenuation coefficient for every f > 0, finite for
// f ≤ 1e150 Hz (beyond that α ∝ f² may overflow to +Inf, as documented).
func FuzzAbsorption(f *testing.F) {
	f.Add(293.15, 70.0, 101325.0, 1000.0)
	f.Add(MinTemperature, 0.0, MinPressure, 1e-300)
	f.Add(MinTemperature, 100.0, MaxPressure, 1e150)
	f.Add(MaxTemperature, 100.0, MinPressure, 1e150)
	f.Add(MaxTemperature, 0.0, MaxPressure, 5e-324)
	f.Add(253.15, 10.0, 90e3, 100e3)
	f.Add(300.0, 50.0, 200e3, math.MaxFloat64)
	f.Fuzz(func(t *testing.T, temp, rh, p, freq float64) {
		a := Atmosphere{Temperature: temp, RelativeHumidity: rh, Pressure: p}
		if a.Validate() != nil || !(freq > 0) {
			t.Skip()
		}
		got := a.Absorption(freq)
		if math.IsNaN(got) || got < 0 {
			t.Fatalf("%+v at %g Hz: got %g, want a non-negative number", a, freq, got)
		}
		if freq <= 1e150 && math.IsInf(got, 0) {
			t.Fatalf("%+v at %g Hz: got %g, want a finite value", a, freq, got)
		}
		frO, frN, h := a.Relaxation()
		for _, v := range []float64{frO, frN, h, a.SpeedOfSound(), a.Density()} {
			if math.IsNaN(v) || math.IsInf(v, 0) || v < 0 {
				t.Fatalf("%+v: got relaxation %g, %g, %g, c %g, ρ %g, want finite non-negative values",
					a, frO, frN, h, a.SpeedOfSound(), a.Density())
			}
		}
	})
}

func BenchmarkAbsorption(b *testing.B) {
	a := StandardAtmosphere()
	freqs := make([]float64, 0, 64)
	bands, err := ThirdOctaveBands(20, 100e3)
	if err != nil {
		b.Fatal(err)
	}
	for _, bd := range bands {
		freqs = append(freqs, bd.Centre)
	}
	b.ReportAllocs()
	var sink float64
	for i := 0; b.Loop(); i++ {
		sink += a.Absorption(freqs[i%len(freqs)])
	}
	if math.IsNaN(sink) {
		b.Fatal("NaN absorption")
	}
}
