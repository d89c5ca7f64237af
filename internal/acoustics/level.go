package acoustics

import "math"

// Reference values and coefficients of the level estimate.
const (
	// ReferenceSoundPressure is p_ref = 20 µPa, in Pa (ISO 1683;
	// acoustics.md §0, FROM MEMORY, high confidence).
	ReferenceSoundPressure = 20e-6

	// ReferenceSoundPower is W_ref = 1 pW, in W (ISO 1683, from memory,
	// high confidence; the reference of L_W in acoustics.md §6.6).
	ReferenceSoundPower = 1e-12

	// efficiencyCoeff is the coefficient of the acoustic efficiency
	// η ≈ 1e-4·M_a⁵ of Lighthill's eighth-power scaling (Lighthill 1952,
	// Proc. R. Soc. A 211; acoustics.md §6.1, FROM MEMORY, medium-high
	// confidence), dimensionless.
	efficiencyCoeff = 1e-4

	// efficiencyCap is the saturation of the acoustic efficiency at
	// supersonic speeds, about 0.5–1 % (acoustics.md §6.1, FROM MEMORY,
	// medium confidence); the 1e-4·M_a⁵ law reaches it at M_a ≈ 2.5.
	// Dimensionless.
	efficiencyCap = 0.01

	// PeakDirectivity is the excess in dB of the level at the peak polar
	// angle over the angle-averaged level: 7.5 dB, the middle of the
	// +5 to +10 dB quoted for high-subsonic jets (acoustics.md §6.2 and
	// §6.6, FROM MEMORY, low-medium confidence).
	PeakDirectivity = 7.5
)

// LevelEstimate is a rough jet-noise level estimate for choosing
// microphones (accuracy about ±5 dB; acoustics.md §6.6).
type LevelEstimate struct {
	// Efficiency is the acoustic efficiency η, dimensionless.
	Efficiency float64
	// AcousticPower is the radiated sound power W in W.
	AcousticPower float64
	// PowerLevel is L_W in dB re 1 pW.
	PowerLevel float64
	// MeanLevel is the angle-averaged sound pressure level at the given
	// radius in dB re 20 µPa.
	MeanLevel float64
	// PeakLevel is the estimated level at the peak polar angle,
	// MeanLevel + PeakDirectivity, in dB re 20 µPa.
	PeakLevel float64
}

// EstimateLevel returns a Lighthill-scaling estimate of the sound radiated
// by a round jet of density rhoJ (kg/m³), velocity uj (m/s) and diameter dj
// (m) into air with speed of sound cAmb (m/s), at radius r (m) (acoustics.md
// §6.6, COMPUTED from the FROM MEMORY relations of §6.1–6.2):
//
//	M_a = uj/cAmb,  η = min(1e-4·M_a⁵, 0.01)
//	W   = η·½·rhoJ·uj³·(π·dj²/4)
//	L_W = 10·log10(W/1 pW)
//	L_p = L_W − 10·log10(4π·r²)          (ρc ≈ 400 rayl assumed)
//	peak ≈ L_p + 7.5 dB
//
// The estimate is meant for choosing a microphone's range, not for
// predicting data; heated jets at moderate speed are louder than it says
// (Tanna 1977, FROM MEMORY).
//
// Special cases are:
//
//	uj ≤ 0, rhoJ ≤ 0 or dj == 0 give zero power and −Inf levels (whatever r is)
//	r == 0 otherwise gives +Inf MeanLevel and PeakLevel
//	cAmb ≤ 0 or any NaN argument gives NaN in every field
func EstimateLevel(rhoJ, uj, dj, cAmb, r float64) LevelEstimate {
	if math.IsNaN(rhoJ) || math.IsNaN(uj) || math.IsNaN(dj) || math.IsNaN(r) || !(cAmb > 0) {
		nan := math.NaN()
		return LevelEstimate{nan, nan, nan, nan, nan}
	}
	var eta, w float64
	if uj > 0 && rhoJ > 0 && dj != 0 {
		ma := uj / cAmb
		eta = math.Min(efficiencyCoeff*math.Pow(ma, 5), efficiencyCap)
		area := math.Pi * dj * dj / 4
		w = eta * 0.5 * rhoJ * uj * uj * uj * area
	}
	lw := 10 * math.Log10(w/ReferenceSoundPower)
	mean := lw - 10*math.Log10(4*math.Pi*r*r)
	if w == 0 {
		mean = math.Inf(-1) // also when r == 0
	}
	return LevelEstimate{
		Efficiency:    eta,
		AcousticPower: w,
		PowerLevel:    lw,
		MeanLevel:     mean,
		PeakLevel:     mean + PeakDirectivity,
	}
}

// PressureLevel returns the sound pressure level in dB re 20 µPa of an rms
// pressure pRMS (Pa): 20·log10(pRMS/20 µPa) (acoustics.md §0, FROM MEMORY,
// ISO 1683).
//
// Special cases are:
//
//	PressureLevel(0) = −Inf
//	PressureLevel(p) = NaN for p < 0 or NaN
func PressureLevel(pRMS float64) float64 {
	return 20 * math.Log10(pRMS/ReferenceSoundPressure)
}
