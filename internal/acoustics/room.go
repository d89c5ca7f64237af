package acoustics

import "math"

// sabineConstant is the 0.161 s/m of Sabine's reverberation formula
// T60 = 0.161·V/(S·ᾱ) (noise-and-exposure.md §4, FROM MEMORY, textbook), s/m.
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

// SabineAbsorption returns the average absorption coefficient
// ᾱ = 0.161·V/(S·T60) of a room of volume volume (m³), surface area
// surface (m²) and reverberation time t60 (s), by Sabine's formula
// (noise-and-exposure.md §4, FROM MEMORY, textbook). Sabine's formula
// suits live rooms (ᾱ below about 0.2); a result of 1 or more means the
// reverberation time is too short for the room.
//
// Special cases are:
//
//	SabineAbsorption(V, S, 0) = +Inf
//	SabineAbsorption(V, S, T) = NaN if any argument is NaN
func SabineAbsorption(volume, surface, t60 float64) float64 {
	return sabineConstant * volume / (surface * t60)
}
