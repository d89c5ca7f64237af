package acoustics

import (
	"fmt"
	"math"
)

// Reflection describes the interference of direct and floor-reflected sound
// for a point source over a rigid floor (reflection coefficient +1, no phase
// change), by the image-source model of acoustics.md §3.1 (FROM MEMORY, high
// confidence, textbook; SAE AIR1327A covers the topic). Real floors are
// finite-impedance and turbulence and band averaging fill in the nulls, so
// the null depths are ideal pure-tone values.
type Reflection struct {
	// Direct is the direct path length r1 in m.
	Direct float64
	// Reflected is the reflected (image-source) path length r2 in m.
	Reflected float64
	// PathDifference is Δ = r2 − r1 in m.
	PathDifference float64
	// Q is the amplitude ratio r1/r2 of reflected to direct sound under
	// spherical spreading, in [0, 1].
	Q float64
}

// FloorReflection returns the reflection geometry for a source at height hs
// (m) and a microphone at height hm (m) above a rigid floor, a horizontal
// distance d (m) apart:
//
//	r1 = (d² + (hs − hm)²)^½,  r2 = (d² + (hs + hm)²)^½,  Δ = r2 − r1,  Q = r1/r2
//
// Δ is computed as 4·hs·hm/(r1 + r2), which equals r2 − r1 exactly and does
// not lose precision when d ≫ hs, hm (where Δ ≈ 2·hs·hm/d).
//
// Special cases are:
//
//	FloorReflection(hs, 0, d) has Δ = 0 and Q = 1: a flush microphone reads +6.02 dB at all frequencies
//	FloorReflection(0, 0, 0) = {0, 0, 0, 1}, the flush limit
//	FloorReflection(h, h, 0) has Direct = 0 and Q = 0 (microphone on the source)
//	any NaN argument gives NaN PathDifference and Q
func FloorReflection(hs, hm, d float64) Reflection {
	r1 := math.Hypot(d, hs-hm)
	r2 := math.Hypot(d, hs+hm)
	if r2 == 0 {
		return Reflection{Q: 1}
	}
	return Reflection{Direct: r1, Reflected: r2, PathDifference: 4 * hs * hm / (r1 + r2), Q: r1 / r2}
}

// NullFrequency returns the frequency in Hz of the n-th interference null,
// (2n+1)·c/(2Δ), where n = 0 is the first null and c is the speed of sound
// in m/s. At a null the level change is 20·log10(1 − Q) dB.
//
// NullFrequency panics if n < 0 (programmer misuse).
//
// Special cases are:
//
//	NullFrequency(n, c) = +Inf when PathDifference == 0 and c > 0 (no nulls)
func (r Reflection) NullFrequency(n int, c float64) float64 {
	if n < 0 {
		panic(fmt.Sprintf("acoustics: NullFrequency with negative index %d", n))
	}
	return float64(2*n+1) * c / (2 * r.PathDifference)
}

// PeakFrequency returns the frequency in Hz of the n-th constructive
// interference peak (n ≥ 1), n·c/Δ, for speed of sound c in m/s. At a peak
// the level change is 20·log10(1 + Q) ≤ +6.02 dB.
//
// PeakFrequency panics if n < 1 (programmer misuse).
//
// Special cases are:
//
//	PeakFrequency(n, c) = +Inf when PathDifference == 0 and c > 0
func (r Reflection) PeakFrequency(n int, c float64) float64 {
	if n < 1 {
		panic(fmt.Sprintf("acoustics: PeakFrequency with index %d, want ≥ 1", n))
	}
	return float64(n) * c / r.PathDifference
}

// LevelChange returns the change in sound pressure level, in dB, that the
// floor reflection adds at a pure-tone frequency f (Hz) for speed of sound c
// (m/s):
//
//	ΔL = 10·log10(1 + Q² + 2Q·cos(2π·f·Δ/c))
//
// It is evaluated as 10·log10((1 − Q)² + 4Q·cos²(π·f·Δ/c)), the same
// quantity written so that rounding cannot make it negative. The result
// lies in [20·log10(1 − Q), 20·log10(1 + Q)].
//
// Special cases are:
//
//	LevelChange(f, c) = 20·log10(2) = +6.02 dB when Q == 1 and Δ == 0 (flush microphone)
//	LevelChange(f, c) may be −Inf at a null when Q == 1
//	LevelChange(f, c) = NaN if f or c is NaN, or f is infinite and Δ ≠ 0
func (r Reflection) LevelChange(f, c float64) float64 {
	half := math.Pi * f * r.PathDifference / c
	if r.PathDifference == 0 {
		half = 0 // no phase difference at any finite frequency
		if math.IsNaN(f) || math.IsNaN(c) {
			half = math.NaN()
		}
	}
	cos := math.Cos(half)
	q := r.Q
	return 10 * math.Log10((1-q)*(1-q)+4*q*cos*cos)
}

// FirstNullInBand returns the lowest interference null frequency f (Hz) not
// below fLow, and whether it lies within [fLow, fHigh] (limits inclusive),
// for speed of sound c (m/s). When inBand is true f is the first null in the
// band; when it is false f is the first null above fHigh (+Inf when the
// floor gives no nulls, Δ == 0). The first null of all is
// r.NullFrequency(0, c); when fLow lies below it, f is that null.
//
// Special cases are:
//
//	FirstNullInBand(r, c, fLow, fHigh) = +Inf, false when PathDifference == 0
//	FirstNullInBand(r, c, fLow, fHigh) = f, false whenever fHigh < fLow
//	FirstNullInBand(r, c, fLow, fHigh) = NaN, false if c, fLow or fHigh is NaN
func FirstNullInBand(r Reflection, c, fLow, fHigh float64) (f float64, inBand bool) {
	f0 := r.NullFrequency(0, c)
	if math.IsNaN(f0) || math.IsNaN(fLow) || math.IsNaN(fHigh) {
		return math.NaN(), false
	}
	if math.IsInf(f0, 0) {
		return math.Inf(1), false
	}
	k := 0.0 // null index, kept in float64 so that huge fLow cannot overflow an int
	if fLow > f0 {
		k = math.Ceil((fLow/f0 - 1) / 2)
	}
	f = (2*k + 1) * f0
	if f < fLow { // rounding in the division above
		f += 2 * f0
	}
	return f, f <= fHigh
}

// MaxMicHeightForNull returns the largest microphone height hm in m that
// keeps the first floor-reflection null above fMax (Hz), for sound arriving
// at grazing angle grazing (rad, above the floor) and speed of sound c
// (m/s):
//
//	hm < c/(4·fMax·sin ψ)
//
// It follows from Δ ≈ 2·hm·sin ψ for a distant source and the first null at
// c/(2Δ) (the design rule of acoustics.md §3.1, DERIVED from the
// image-source formulas). Heights at or above the result put a null at or
// below fMax.
//
// Special cases are:
//
//	MaxMicHeightForNull(fMax, 0, c) = +Inf for fMax, c > 0 (grazing incidence)
//	MaxMicHeightForNull(0, ψ, c) = +Inf for sin ψ, c > 0
//	MaxMicHeightForNull(fMax, ψ, c) = NaN if any argument is NaN
func MaxMicHeightForNull(fMax, grazing, c float64) float64 {
	return c / (4 * fMax * math.Sin(grazing))
}
