package acoustics

import "math"

// Pole frequencies of the A and C frequency weightings of IEC 61672-1:2013
// (clause 5.5 and Annex E), in Hz: f1 = 20.6, f2 = 107.7, f3 = 737.9,
// f4 = 12194 (from memory, high confidence; the resulting table values are
// CONFIRMED against the third-octave table at
// https://lichtbeeldgeluid.nl/geluid/tabellen/, which lists A and C at the
// exact base-ten midbands).
const (
	weightF1 = 20.598997
	weightF2 = 107.65265
	weightF3 = 737.86223
	weightF4 = 12194.217
	// weightA1000 and weightC1000 normalise the weightings to 0 dB at
	// 1 kHz (IEC 61672-1 Annex E: A1000 = −2.000 dB, C1000 = −0.062 dB;
	// from memory, high confidence).
	weightA1000 = -2.000
	weightC1000 = -0.062
)

// AWeighting returns the A frequency weighting of IEC 61672-1 at frequency
// f (Hz), in dB: 0 dB at 1 kHz, −19.1 dB at 100 Hz, −1.1 dB at 8 kHz and
// −2.5 dB at 10 kHz (CONFIRMED, see the constants above).
//
// Special cases are:
//
//	AWeighting(0) = −Inf
//	AWeighting(f) = NaN for f < 0 or NaN
func AWeighting(f float64) float64 {
	if !(f >= 0) {
		return math.NaN()
	}
	f2 := f * f
	num := weightF4 * weightF4 * f2 * f2
	den := (f2 + weightF1*weightF1) * math.Sqrt((f2+weightF2*weightF2)*(f2+weightF3*weightF3)) * (f2 + weightF4*weightF4)
	return 20*math.Log10(num/den) - weightA1000
}

// CWeighting returns the C frequency weighting of IEC 61672-1 at frequency
// f (Hz), in dB: 0 dB at 1 kHz, −0.3 dB at 100 Hz and −3.0 dB at 31.5 Hz
// and 8 kHz (CONFIRMED, see the constants above).
//
// Special cases are:
//
//	CWeighting(0) = −Inf
//	CWeighting(f) = NaN for f < 0 or NaN
func CWeighting(f float64) float64 {
	if !(f >= 0) {
		return math.NaN()
	}
	f2 := f * f
	num := weightF4 * weightF4 * f2
	den := (f2 + weightF1*weightF1) * (f2 + weightF4*weightF4)
	return 20*math.Log10(num/den) - weightC1000
}
