package acoustics

import "math"

// Wavelength returns the wavelength λ = c/f in m of sound of frequency f
// (Hz) travelling at speed c (m/s).
//
// Special cases are:
//
//	Wavelength(0, c) = +Inf for c > 0
//	Wavelength(±Inf, c) = 0 for finite c
//	Wavelength(f, c) = NaN if f or c is NaN, or f == c == 0
func Wavelength(f, c float64) float64 {
	return c / f
}

// WaveNumber returns the acoustic wave number k = 2πf/c in rad/m for
// frequency f (Hz) and speed of sound c (m/s). The acoustic far-field
// condition is k·R ≫ 1 for an arc of radius R (acoustics.md §2.1, FROM
// MEMORY, high confidence, textbook); R = 10/k gives k·R = 10.
//
// Special cases are:
//
//	WaveNumber(f, 0) = +Inf for f > 0
//	WaveNumber(f, c) = NaN if f or c is NaN, or f == c == 0
func WaveNumber(f, c float64) float64 {
	return 2 * math.Pi * f / c
}

// FresnelRadius returns the Fresnel (Rayleigh) distance L²/λ in m for a
// source region of length sourceLength (m) radiating at frequency f (Hz)
// with speed of sound c (m/s). An arc of radius R sees the distributed
// source as a point only when R ≳ L²/λ (ASA standard term 5.04 "far field",
// acoustics.md §2.1, CONFIRMED). Use a frequency-dependent length such as
// that of [SourceExtent]: a fixed 20 D is far too strict at high frequency.
//
// Special cases are:
//
//	FresnelRadius(0, f, c) = 0 for finite f and c ≠ 0
//	FresnelRadius(L, f, 0) = +Inf for L ≠ 0 and f > 0
//	FresnelRadius(L, f, c) = NaN if any argument is NaN
func FresnelRadius(sourceLength, f, c float64) float64 {
	return sourceLength * sourceLength * f / c
}

// QuarterWave returns λ/4 = c/(4f) in m for frequency f (Hz) and speed of
// sound c (m/s). ISO 3745 practice keeps microphones at least λ/4 at the
// lowest frequency of interest from absorbing surfaces (wedge tips) and
// asks for a measurement radius of at least λ/4 at the lowest band
// (acoustics.md §4.2, FROM MEMORY, medium confidence).
//
// Special cases are:
//
//	QuarterWave(0, c) = +Inf for c > 0
//	QuarterWave(f, c) = NaN if f or c is NaN, or f == c == 0
func QuarterWave(f, c float64) float64 {
	return c / (4 * f)
}

// WedgeCutoff returns the approximate cut-off frequency f_c = c/(4L) in Hz
// of an anechoic wedge lining of total depth L (tip to wall, including the
// air gap; m), for speed of sound c (m/s): the lining absorbs well (energy
// absorption at least 0.99) from about the frequency at which its depth is a
// quarter wavelength. This is the rule of thumb of Beranek & Sleeper, JASA
// 18:140, 1946 (acoustics.md §4.1, FROM MEMORY, high confidence).
//
// Special cases are:
//
//	WedgeCutoff(0, c) = +Inf for c > 0
//	WedgeCutoff(L, c) = NaN if L or c is NaN, or L == c == 0
func WedgeCutoff(depth, c float64) float64 {
	return c / (4 * depth)
}
