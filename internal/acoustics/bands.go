package acoustics

import (
	"errors"
	"fmt"
	"math"
	"strconv"
	"strings"
)

// ErrInvalidBandRange is wrapped by every error from [ThirdOctaveBands].
var ErrInvalidBandRange = errors.New("acoustics: invalid band range")

// BandTolerance is the relative tolerance (0.02, i.e. 2 %) with which
// [ThirdOctaveBands] matches its limits to band centres. It exceeds the
// largest gap between a nominal label and its exact centre (160 Hz against
// 158.49 Hz, 0.95 %) and is far below the 26 % spacing of the bands, so a
// limit given as a nominal label always includes that band and never its
// neighbour.
const BandTolerance = 0.02

// Supported band range of [ThirdOctaveBands], in Hz: a project choice that
// keeps the labels in Hz, kHz, MHz and GHz.
const (
	MinBandFrequency = 1e-3 // Hz
	MaxBandFrequency = 1e12 // Hz
)

// bandsPerDecade is the number of one-third-octave bands per decade in the
// base-ten system of IEC 61260-1 (acoustics practice, from memory, high
// confidence): the ratio between adjacent centres is 10^(1/10).
const bandsPerDecade = 10

// nominalMantissa holds the preferred-number (ISO 266 / IEC 61260 R10)
// nominal midband values of one decade, ×100: 1, 1.25, 1.6, 2, 2.5, 3.15,
// 4, 5, 6.3, 8 (from memory, high confidence; they give the familiar labels
// 31.5 Hz, 1.25 kHz, 6.3 kHz).
var nominalMantissa = [bandsPerDecade]int{100, 125, 160, 200, 250, 315, 400, 500, 630, 800}

// Band is a one-third-octave band of the base-ten system.
type Band struct {
	// Index is n in Centre = 10^(n/10) Hz; n = 30 is the 1 kHz band.
	Index int
	// Centre is the exact midband frequency 10^(n/10) in Hz.
	Centre float64
	// Lower and Upper are the exact band edges Centre·10^(∓1/20) in Hz.
	Lower, Upper float64
	// Nominal is the preferred-number label, such as "31.5 Hz" or "1.25 kHz".
	Nominal string
}

// String returns the nominal label.
func (b Band) String() string { return b.Nominal }

// NewBand returns the band with index n (centre 10^(n/10) Hz).
func NewBand(n int) Band {
	c := bandCentre(n)
	edge := math.Pow(10, 1.0/(2*bandsPerDecade))
	return Band{Index: n, Centre: c, Lower: c / edge, Upper: c * edge, Nominal: nominalLabel(n)}
}

// ThirdOctaveBands returns, in increasing order, every one-third-octave band
// whose exact centre lies in [from/(1+BandTolerance), to·(1+BandTolerance)]
// (Hz), so that nominal limits such as 50 Hz (centre 50.12 Hz) and 80 kHz
// (centre 79.43 kHz) include those bands at either end. The test is made on
// the band index in logarithmic form; a centre within a rounding error of
// a widened limit may fall either way.
//
// It returns an error wrapping [ErrInvalidBandRange] when from or to is NaN
// or infinite, when from ≤ 0, when to < from, or when either lies outside
// [MinBandFrequency, MaxBandFrequency]. The result may be empty, when no
// centre lies within the widened range.
func ThirdOctaveBands(from, to float64) ([]Band, error) {
	for _, l := range []struct {
		name string
		v    float64
	}{{"from", from}, {"to", to}} {
		switch {
		case math.IsNaN(l.v) || math.IsInf(l.v, 0):
			return nil, fmt.Errorf("%w: %s is %v, want a finite frequency in Hz", ErrInvalidBandRange, l.name, l.v)
		case l.v <= 0:
			return nil, fmt.Errorf("%w: %s is %g Hz, want > 0 Hz", ErrInvalidBandRange, l.name, l.v)
		case l.v < MinBandFrequency || l.v > MaxBandFrequency:
			return nil, fmt.Errorf("%w: %s is %g Hz, want %g–%g Hz", ErrInvalidBandRange, l.name, l.v, MinBandFrequency, MaxBandFrequency)
		}
	}
	if to < from {
		return nil, fmt.Errorf("%w: to (%g Hz) is below from (%g Hz)", ErrInvalidBandRange, to, from)
	}
	tol := bandsPerDecade * math.Log10(1+BandTolerance)
	lo := int(math.Ceil(bandsPerDecade*math.Log10(from) - tol))
	hi := int(math.Floor(bandsPerDecade*math.Log10(to) + tol))
	if hi < lo {
		return nil, nil
	}
	bands := make([]Band, 0, hi-lo+1)
	for n := lo; n <= hi; n++ {
		bands = append(bands, NewBand(n))
	}
	return bands, nil
}

// bandCentre returns 10^(n/10) in Hz, split into an exact power of ten and a
// fractional power so that decade centres (1 kHz, 10 kHz) are exact.
func bandCentre(n int) float64 {
	d, r := divFloor(n, bandsPerDecade)
	return math.Pow10(d) * math.Pow(10, float64(r)/bandsPerDecade)
}

// divFloor returns q and r with n = q·m + r and 0 ≤ r < m, for m > 0.
func divFloor(n, m int) (q, r int) {
	q, r = n/m, n%m
	if r < 0 {
		q, r = q-1, r+m
	}
	return q, r
}

// nominalLabel returns the preferred-number label of band n: below 1 kHz in
// Hz, then kHz, MHz and GHz.
func nominalLabel(n int) string {
	d, r := divFloor(n, bandsPerDecade) // value = mantissa × 10^(d−2) Hz, 10^d ≤ value < 10^(d+1)
	unit, u := "Hz", 0
	switch {
	case d >= 9:
		unit, u = "GHz", 9
	case d >= 6:
		unit, u = "MHz", 6
	case d >= 3:
		unit, u = "kHz", 3
	}
	return decimalString(nominalMantissa[r], d-2-u) + " " + unit
}

// decimalString formats m·10^e exactly, without trailing zeros after the
// decimal point.
func decimalString(m, e int) string {
	s := strconv.Itoa(m)
	if e >= 0 {
		return s + strings.Repeat("0", e)
	}
	if k := len(s) + e; k > 0 {
		s = s[:k] + "." + s[k:]
	} else {
		s = "0." + strings.Repeat("0", -k) + s
	}
	s = strings.TrimRight(s, "0")
	return strings.TrimSuffix(s, ".")
}
