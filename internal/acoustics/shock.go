package acoustics

import "math"

// Broadband shock-associated noise of an imperfectly expanded jet, in the
// static form of the SAE ARP 876 / NASA ANOPP procedure (Zorumski 1982,
// part 2, §8.5; READ in the public implementation MIT-LAE/pyNA), which
// builds on the β⁴ intensity law of Harper-Bourne & Fisher (1973):
//
//	β        = √|Mj² − Md²|                     (Md = 1 for a convergent nozzle)
//	p²·r²    = 1.92×10⁻³·(ρ0·c0²)²·Aj/(4π)·β^η·H(σ)   per 1/3-octave band
//	η        = 4 for β ≤ 1; for β > 1, 2 for hot jets (Tt/T0 ≥ 1.1), 1 for cold ones
//	σ        = 7.80·β·f·√Aj·(1 − Mc·cos θj)/c0
//	log10 H  is tabulated against log10 σ, 0.2 lower for cold jets
//
// The ANOPP form is written for a static observer without the convective
// Doppler factor; here σ carries the factor (1 − Mc·cos θj) with
// Mc = 0.7·Vj/c0 so that the peak frequency follows
// f_p ∝ u_c/[L_s·(1 − Mc·cos θj)] of Harper-Bourne & Fisher and Tam
// (noise-and-exposure.md §3, FROM MEMORY; θj from the downstream axis): it
// equals the ANOPP value at 90° and rises downstream. The shock-cell
// interference term W of ANOPP, which adds the narrow peaks, is left out
// (a smoothed spectrum), and screech tones are not modelled: shock-
// containing jets carry a wider uncertainty.

// shockCoefficient is the 1.92×10⁻³ of Zorumski 1982 §8.5 Eq. 1 (READ in
// MIT-LAE/pyNA), dimensionless.
const shockCoefficient = 1.92e-3

// shockSigmaCoefficient is the 7.80 in σ (Zorumski 1982 §8.5 Eq. 3, READ).
const shockSigmaCoefficient = 7.80

// shockConvection is u_c/Vj = 0.7, the convection speed of the turbulence
// that crosses the shock cells (noise-and-exposure.md §3, FROM MEMORY).
const shockConvection = 0.7

// minDoppler keeps |1 − Mc·cos θj| away from zero where the convective
// Doppler factor is singular (a SUGGESTION of this project).
const minDoppler = 0.1

// shockLogH is log10 H at log10 σ = −0.8, −0.7, …, 2.5 (Zorumski 1982 §8.5
// Table III; READ in MIT-LAE/pyNA,
// pyNA/data/sources/jet/group_source_strength_spectrum.csv). The table is
// extended linearly beyond its ends, as ARP 876 does below log10 σ = 0.
var shockLogH = []float64{
	-5.73, -5.35, -4.97, -4.59, -4.21, -3.83, -3.45, -3.07, -2.69, -2.31,
	-1.94, -1.59, -1.33, -1.1, -0.94, -0.88, -0.91, -0.99, -1.09, -1.17,
	-1.3, -1.42, -1.55, -1.67, -1.81, -1.92, -2.06, -2.18, -2.3, -2.42,
	-2.54, -2.66, -2.78, -2.9,
}

const (
	shockLogSigma0 = -0.8
	shockDLogSigma = 0.1
	// shockColdOffset is the −0.2 in log10 H for cold jets (Zorumski 1982
	// §8.5.4, READ).
	shockColdOffset = -0.2
	// shockHotRatio is the total-temperature ratio Tt/T0 = 1.1 below which
	// ANOPP treats a jet as cold (READ).
	shockHotRatio = 1.1
)

// shockH returns log10 H at log10 σ = ls, extended linearly at both ends.
func shockH(ls float64) float64 {
	n := len(shockLogH)
	u := (ls - shockLogSigma0) / shockDLogSigma
	i := int(math.Floor(u))
	switch {
	case i < 0:
		i = 0
	case i > n-2:
		i = n - 2
	}
	f := u - float64(i)
	return shockLogH[i]*(1-f) + shockLogH[i+1]*f
}

// ShockParameter returns β = √|mj² − md²| for a fully expanded Mach number
// mj and a design Mach number md (1 for a convergent nozzle)
// (Harper-Bourne & Fisher 1973; noise-and-exposure.md §3, FROM MEMORY).
func ShockParameter(mj, md float64) float64 { return math.Sqrt(math.Abs(mj*mj - md*md)) }

// shockExponent returns η of the β^η law for the total-temperature ratio
// ttRatio = Tt/T0.
func shockExponent(beta, ttRatio float64) float64 {
	switch {
	case beta <= 1:
		return 4
	case ttRatio >= shockHotRatio:
		return 2
	}
	return 1
}

// ShockPeakFrequency returns the frequency (Hz) at which the smoothed
// shock-associated spectrum of a jet of velocity vj (m/s), area area (m²)
// and shock parameter beta peaks at the polar angle thetaJ (rad) from the
// downstream jet axis, in air with speed of sound c0 (m/s): the σ of the
// largest H. It is +Inf for beta == 0 (no shock cells).
func ShockPeakFrequency(vj, area, beta, c0, thetaJ float64) float64 {
	peak := shockLogSigma0
	best := math.Inf(-1)
	for i, h := range shockLogH {
		if h > best {
			best, peak = h, shockLogSigma0+float64(i)*shockDLogSigma
		}
	}
	return math.Pow(10, peak) * c0 / (shockSigmaCoefficient * beta * math.Sqrt(area) * doppler(vj, c0, thetaJ))
}

// doppler returns |1 − Mc·cos θj| with Mc = 0.7·vj/c0, at least minDoppler.
func doppler(vj, c0, thetaJ float64) float64 {
	return math.Max(math.Abs(1-shockConvection*vj/c0*math.Cos(thetaJ)), minDoppler)
}

// shockSpectrum is the shock-associated noise of one jet, ready to be
// evaluated at many angles: p²·r² per band is
// amp·H(log10 σ_b + log10 doppler(θ)), with σ_b the σ of band b at 90°.
type shockSpectrum struct {
	amp      float64   // 1.92×10⁻³·(ρ0·c0²)²·Aj/(4π)·β^η, Pa²·m², with the cold offset
	logSigma []float64 // log10 σ of each band without the Doppler factor
	vr       float64   // Vj/c0
}

// newShockSpectrum prepares the shock noise over bands; beta == 0 gives
// none.
func newShockSpectrum(j Jet, area, beta, rho0, c0, ttRatio float64, bands []Band) shockSpectrum {
	if beta == 0 {
		return shockSpectrum{}
	}
	q := rho0 * c0 * c0
	s := shockSpectrum{amp: shockCoefficient * q * q * area / (4 * math.Pi) * math.Pow(beta, shockExponent(beta, ttRatio)), vr: j.Velocity / c0}
	if ttRatio < shockHotRatio {
		s.amp *= math.Pow(10, shockColdOffset)
	}
	s.logSigma = make([]float64, len(bands))
	for b, band := range bands {
		s.logSigma[b] = math.Log10(shockSigmaCoefficient * beta * band.Centre * math.Sqrt(area) / c0)
	}
	return s
}

// add adds the shock noise at the polar angle thetaJ (rad) to row.
func (s shockSpectrum) add(row []float64, thetaJ float64) {
	if s.amp == 0 {
		return
	}
	ld := math.Log10(math.Max(math.Abs(1-shockConvection*s.vr*math.Cos(thetaJ)), minDoppler))
	for b, ls := range s.logSigma {
		row[b] += s.amp * math.Pow(10, shockH(ls+ld))
	}
}
