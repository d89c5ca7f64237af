package acoustics

import "math"

// Exposure action and limit values of EU Directive 2003/10/EC, Article 3
// (noise-and-exposure.md §6 and acoustics.md §7.1, CONFIRMED): daily noise
// exposure L_EX,8h in dB(A) and peak sound pressure in dB(C). Hearing
// protectors count only against the limit values.
const (
	EULowerActionA    = 80.0  // dB(A)
	EUUpperActionA    = 85.0  // dB(A)
	EULimitA          = 87.0  // dB(A)
	EULowerActionPeak = 135.0 // dB(C) peak, 112 Pa
	EUUpperActionPeak = 137.0 // dB(C) peak, 140 Pa
	EULimitPeak       = 140.0 // dB(C) peak, 200 Pa
)

// NIOSH recommended exposure limit (noise-and-exposure.md §6, READ;
// acoustics.md §7.1, CONFIRMED): 85 dB(A) over 8 h with a 3-dB exchange
// rate; a 140 dB peak ceiling (FROM MEMORY, high confidence).
const (
	NIOSHCriterion   = 85.0  // dB(A) for 8 h
	NIOSHExchange    = 3.0   // dB per halving of the allowed time
	NIOSHCeilingPeak = 140.0 // dB peak
	workShiftHours   = 8.0   // h, the reference duration of both
)

// NIOSHAllowedHours returns the time (h) allowed at a steady level la
// (dB(A)) under the NIOSH REL: T = 8 h / 2^((la − 85)/3); 15 min at
// 100 dB(A) (acoustics.md §7.1, CONFIRMED).
//
// Special cases are:
//
//	NIOSHAllowedHours(NaN) = NaN
func NIOSHAllowedHours(la float64) float64 {
	return workShiftHours / math.Pow(2, (la-NIOSHCriterion)/NIOSHExchange)
}

// DailyExposure returns the daily noise exposure L_EX,8h (dB(A)) of hours
// (h) at a steady level la (dB(A)): la + 10·log10(hours/8) (the definition
// in EU Directive 2003/10/EC, Art. 2, from memory, high confidence).
//
// Special cases are:
//
//	DailyExposure(la, 0) = −Inf
func DailyExposure(la, hours float64) float64 {
	return la + 10*math.Log10(hours/workShiftHours)
}

// ExposureClass grades an exposure against the EU action and limit values.
type ExposureClass int

// Exposure classes, in increasing order of severity.
const (
	BelowAction ExposureClass = iota // below the lower action values
	LowerAction                      // at or above a lower action value (80 dB(A) or 135 dB(C))
	UpperAction                      // at or above an upper action value (85 dB(A) or 137 dB(C))
	AboveLimit                       // at or above a limit value (87 dB(A) or 140 dB(C)), before hearing protectors
)

func (c ExposureClass) String() string {
	switch c {
	case BelowAction:
		return "below the action values"
	case LowerAction:
		return "lower action value reached"
	case UpperAction:
		return "upper action value reached"
	case AboveLimit:
		return "limit value reached without hearing protectors"
	}
	return "ExposureClass(?)"
}

// ClassifyExposure grades a daily exposure lex (dB(A), L_EX,8h) and a peak
// (dB(C)) against EU Directive 2003/10/EC; limits inclusive. NaN values are
// graded AboveLimit (never passed as safe).
func ClassifyExposure(lex, peak float64) ExposureClass {
	grade := func(v, lower, upper, limit float64) ExposureClass {
		switch {
		case math.IsNaN(v) || v >= limit:
			return AboveLimit
		case v >= upper:
			return UpperAction
		case v >= lower:
			return LowerAction
		}
		return BelowAction
	}
	return max(grade(lex, EULowerActionA, EUUpperActionA, EULimitA), grade(peak, EULowerActionPeak, EUUpperActionPeak, EULimitPeak))
}
