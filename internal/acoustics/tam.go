package acoustics

import "math"

// The similarity spectra of Tam, Golebiowski & Seiner (1996), "On the two
// components of turbulent mixing noise from supersonic jets", AIAA paper
// 96-1716: the large-scale spectrum F, which dominates near the aft peak
// (within about 30–40° of the jet axis), and the fine-scale spectrum G,
// which dominates at the sideline and upstream. Both are spectral
// densities in dB, 0 dB at their peak frequency. The piecewise
// coefficients are READ in a public transcription of the paper's
// equation (6) (noise-and-exposure.md §2).

// LargeScaleSpectrum returns Tam's F(f/fL) in dB at the frequency ratio
// x = f/fL (0 dB at x = 1).
//
// Special cases are:
//
//	LargeScaleSpectrum(x) = −Inf for x == 0, NaN for x < 0 or NaN
func LargeScaleSpectrum(x float64) float64 {
	l := math.Log10(x)
	switch {
	case math.IsNaN(l):
		return l
	case x >= 2.5:
		return 5.64174 - 27.7472*l
	case x >= 1:
		return (1.06617 - 45.29940*l + 21.40972*l*l) * l
	case x >= 0.5:
		return -38.19338*l*l - 16.91175*l*l*l
	}
	return 2.53895 + 18.4*l
}

// FineScaleSpectrum returns Tam's G(f/fF) in dB at the frequency ratio
// x = f/fF (0 dB at x = 1).
//
// Special cases are:
//
//	FineScaleSpectrum(x) = −Inf for x == 0, NaN for x < 0 or NaN
func FineScaleSpectrum(x float64) float64 {
	l := math.Log10(x)
	switch {
	case math.IsNaN(l):
		return l
	case x >= 30:
		return 29.77786 - 38.16739*l
	case x >= 10:
		u := l - 1
		return -11.8 - (27.2523+0.8091863*u+14.851964*u*u)*u
	case x >= 1:
		return -(8.1476823 + 3.6523177*l) * l * l
	case x >= 0.15:
		return (-1.0550362 + 4.9774046*l) * l * l
	case x >= 0.05:
		w := math.Log10(x * 20 / 3)
		return -3.5 + (11.874876+2.1202444*w+7.5211814*w*w)*w
	}
	return 9.9 + 14.91126*l
}

// Peak Strouhal numbers f·Dj/Uj of the two spectra. Tam et al. (1996) give
// the peak frequencies as curves against angle and temperature ratio; these
// constants stand for them. LargeScalePeakStrouhal = 0.2 near the aft peak
// (noise-and-exposure.md §2 and acoustics.md §6.3, FROM MEMORY);
// FineScalePeakStrouhal = 0.5 at the sideline, the geometric middle of the
// 0.3–1 quoted in acoustics.md §6.3 (FROM MEMORY; the choice of the middle
// is a SUGGESTION). Heated jets shift both; the uncertainty covers it.
const (
	LargeScalePeakStrouhal = 0.2
	FineScalePeakStrouhal  = 0.5
)

// Angles of the blend between the two spectra, from the downstream jet
// axis: the large-scale spectrum alone up to largeScaleOnly, the
// fine-scale one alone from fineScaleOnly, a cos² blend between (a
// SUGGESTION after the split described by Tam et al. 1996 and
// noise-and-exposure.md §2: F within about 30–40° of the axis, G at the
// sideline and upstream).
const (
	largeScaleOnly = 40 * math.Pi / 180
	fineScaleOnly  = 90 * math.Pi / 180
)

// largeScaleWeight returns the share of the large-scale spectrum at the
// polar angle thetaJ (rad) from the downstream jet axis, in [0, 1].
func largeScaleWeight(thetaJ float64) float64 {
	switch {
	case thetaJ <= largeScaleOnly:
		return 1
	case thetaJ >= fineScaleOnly:
		return 0
	}
	c := math.Cos((thetaJ - largeScaleOnly) / (fineScaleOnly - largeScaleOnly) * math.Pi / 2)
	return c * c
}
