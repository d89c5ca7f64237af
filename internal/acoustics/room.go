package acoustics

import "math"

// sabineConstant is the 0.161 s/m of the reverberation formulas of Sabine,
// T60 = 0.161·V/(S·ᾱ), and Eyring, T60 = 0.161·V/(−S·ln(1 − ᾱ))
// (noise-and-exposure.md §4, FROM MEMORY, textbook), s/m.
const sabineConstant = 0.161

// RoomConstant returns R = S·ᾱ/(1 − ᾱ) in m² for a room of surface area
// surface (m²) and average absorption coefficient alpha (noise-and-
// exposure.md §4, FROM MEMORY, textbook). The reverberant mean-square
// pressure of a source of power W is 4·ρ0·c0·W/R.
//
// Special cases are:
//
//	RoomConstant(S, 0) = 0 (no absorption: the room constant of a perfectly hard room; callers should refuse it)
//	RoomConstant(S, α) = +Inf for α ≥ 1 (anechoic)
//	RoomConstant(S, α) = NaN for α < 0 or NaN
func RoomConstant(surface, alpha float64) float64 {
	switch {
	case math.IsNaN(alpha) || alpha < 0:
		return math.NaN()
	case alpha >= 1:
		return math.Inf(1)
	}
	return surface * alpha / (1 - alpha)
}

// EyringAbsorption returns the average absorption coefficient
// ᾱ = 1 − exp(−0.161·V/(S·T60)) of a room of volume volume (m³), surface
// area surface (m²) and reverberation time t60 (s), by Eyring's formula
// T60 = 0.161·V/(−S·ln(1 − ᾱ)) (Eyring 1930, J. Acoust. Soc. Am. 1,
// FROM MEMORY, textbook). It meets Sabine's ᾱ = 0.161·V/(S·T60) in a live
// room and stays below 1 in a dead one, where Sabine's overstates the
// absorption (and so understates the reverberant field: 2.8 dB low at
// ᾱ = 0.5).
//
// Special cases are:
//
//	EyringAbsorption(V, S, 0) = 1
//	EyringAbsorption(V, S, T) = NaN if any argument is NaN
func EyringAbsorption(volume, surface, t60 float64) float64 {
	return -math.Expm1(-sabineConstant * volume / (surface * t60))
}
