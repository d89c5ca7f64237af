package acoustics_test

import (
	"fmt"
	"math"

	"arcwright/internal/acoustics"
)

// The absorption correction over a 5 m arc at 20 °C and 70 % relative
// humidity, at the exact midbands the ISO tables use.
func ExampleAtmosphere_Absorption() {
	air := acoustics.StandardAtmosphere()
	if err := air.Validate(); err != nil {
		fmt.Println(err)
		return
	}
	bands, err := acoustics.ThirdOctaveBands(1000, 80e3)
	if err != nil {
		fmt.Println(err)
		return
	}
	const radius = 5.0 // m
	for _, b := range bands {
		if b.Index%5 != 0 && b.Nominal != "80 kHz" {
			continue // every fifth band and the last, to keep the listing short
		}
		alpha := air.Absorption(b.Centre)
		fmt.Printf("%-9s %8.2f dB/km %6.2f dB over %g m\n", b.Nominal, alpha*1e3, alpha*radius, radius)
	}
	// Output:
	// 1 kHz         4.98 dB/km   0.02 dB over 5 m
	// 3.15 kHz     16.13 dB/km   0.08 dB over 5 m
	// 10 kHz      117.51 dB/km   0.59 dB over 5 m
	// 31.5 kHz    905.67 dB/km   4.53 dB over 5 m
	// 80 kHz     2972.12 dB/km  14.86 dB over 5 m
}

func ExampleThirdOctaveBands() {
	bands, err := acoustics.ThirdOctaveBands(800, 1250)
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, b := range bands {
		fmt.Printf("n=%d %-8s centre %7.2f Hz, edges %7.2f–%7.2f Hz\n", b.Index, b.Nominal, b.Centre, b.Lower, b.Upper)
	}
	_, err = acoustics.ThirdOctaveBands(0, 100)
	fmt.Println(err)
	// Output:
	// n=29 800 Hz   centre  794.33 Hz, edges  707.95– 891.25 Hz
	// n=30 1 kHz    centre 1000.00 Hz, edges  891.25–1122.02 Hz
	// n=31 1.25 kHz centre 1258.93 Hz, edges 1122.02–1412.54 Hz
	// acoustics: invalid band range: from is 0 Hz, want > 0 Hz
}

// A microphone 1.5 m above a hard floor, 20 m from a source 2 m high.
func ExampleFloorReflection() {
	const c = 343.2 // m/s
	r := acoustics.FloorReflection(2, 1.5, 20)
	fmt.Printf("path difference %.4f m, Q = %.4f\n", r.PathDifference, r.Q)
	fmt.Printf("first null %.1f Hz (%.1f dB), first peak %.1f Hz (%+.2f dB)\n",
		r.NullFrequency(0, c), r.LevelChange(r.NullFrequency(0, c), c),
		r.PeakFrequency(1, c), r.LevelChange(r.PeakFrequency(1, c), c))
	f, in := acoustics.FirstNullInBand(r, c, 50, 10e3)
	fmt.Printf("null in 50 Hz–10 kHz: %v, at %.1f Hz\n", in, f)
	fmt.Printf("keep a microphone below %.1f mm for no null up to 80 kHz at 30° grazing\n",
		1e3*acoustics.MaxMicHeightForNull(80e3, 30*math.Pi/180, c))
	// Output:
	// path difference 0.2977 m, Q = 0.9853
	// first null 576.4 Hz (-36.7 dB), first peak 1152.9 Hz (+5.96 dB)
	// null in 50 Hz–10 kHz: true, at 576.4 Hz
	// keep a microphone below 2.1 mm for no null up to 80 kHz at 30° grazing
}

// Choosing microphones for a 50.8 mm model jet at 300 m/s on a 100 D arc.
func ExampleEstimateLevel() {
	air := acoustics.StandardAtmosphere()
	const dj = 0.0508 // m
	e := acoustics.EstimateLevel(air.Density(), 300, dj, air.SpeedOfSound(), 100*dj)
	fmt.Printf("L_W %.1f dB, mean %.1f dB, peak %.1f dB at %.2f m\n", e.PowerLevel, e.MeanLevel, e.PeakLevel, 100*dj)
	fmt.Println(acoustics.MicrophoneAdvice(e.PeakLevel, 80e3))
	// Output:
	// L_W 122.3 dB, mean 97.1 dB, peak 104.6 dB at 5.08 m
	// A 1/4 in microphone may do, at the top of its typical range: it must reach 80 kHz and 120 dB (estimated peak 105 dB plus 15 dB for the crest factor); typical 1/4 in limits are 70 kHz to 100 kHz and 160 to 175 dB. A 1/8 in microphone (typically 100 kHz to 140 kHz and 170 to 180 dB) fits with margin but has more self-noise. Typical values from memory: check the data sheet of the microphone you use.
}

// The level and angle errors of a nozzle-centred source assumption.
func ExampleSourceOffset() {
	const dj = 0.0508 // m
	xs, length := acoustics.SourceExtent(1000, dj, 300)
	r, theta, errDB := acoustics.SourceOffset(100*dj, 30*math.Pi/180, xs)
	fmt.Printf("1 kHz source at %.1f D, %.1f D long; true distance %.1f D at %.1f°, error %+.2f dB\n",
		xs/dj, length/dj, r/dj, theta*180/math.Pi, errDB)
	// Output:
	// 1 kHz source at 7.9 D, 11.8 D long; true distance 93.2 D at 32.4°, error +0.61 dB
}

// The noise of an unheated Mach 0.9 jet from a 50.8 mm nozzle at 100
// diameters, at the sideline and near the aft peak, in a free field.
func ExampleNoiseSource() {
	air := acoustics.Atmosphere{Temperature: 288.15, RelativeHumidity: 70, Pressure: 101325}
	tj := 288.15 / (1 + 0.2*0.9*0.9) // static temperature of the fully expanded jet, K
	j := acoustics.Jet{Velocity: 0.9 * math.Sqrt(1.4*287.05*tj), Density: 101325 / (287.05 * tj), Diameter: 0.0508,
		TotalTemperature: 288.15, Mach: 0.9, DesignMach: 1, ShockFree: true}
	src, err := acoustics.NewNoiseSource(j, air, acoustics.NoiseBands(j))
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, deg := range []float64{90, 30} {
		l, err := src.At(acoustics.Path{Distance: 5.08, Polar: deg * math.Pi / 180}, nil)
		if err != nil {
			fmt.Println(err)
			return
		}
		fmt.Printf("%2.0f°: OASPL %.0f ± %.0f dB, %.0f dB(A), peak %.0f dB(C)\n", deg, l.OASPL, l.Uncertainty, l.AWeighted, l.Peak)
	}
	// Output:
	// 90°: OASPL 92 ± 3 dB, 91 dB(A), peak 102 dB(C)
	// 30°: OASPL 102 ± 3 dB, 102 dB(A), peak 114 dB(C)
}
