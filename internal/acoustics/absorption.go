package acoustics

import (
	"fmt"
	"math"
)

// Coefficients of ISO 9613-1:1993 equations (3)–(5) and Annex B, as
// transcribed in acoustics.md §1.1 (CONFIRMED against two public
// implementations; the equations originate in Bass et al., JASA 97(1), 1995).
const (
	// Annex B saturation vapour pressure: C = satA·(T01/T)^satExp + satB,
	// p_sat/p_r = 10^C.
	satA   = -6.8346
	satExp = 1.261
	satB   = 4.6151

	// Oxygen relaxation frequency, Hz at p_r:
	// frO = (p/p_r)·(24 + 4.04e4·h·(0.02 + h)/(0.391 + h)).
	frOBase  = 24.0
	frOScale = 4.04e4
	frOHumA  = 0.02
	frOHumB  = 0.391

	// Nitrogen relaxation frequency, Hz at p_r:
	// frN = (p/p_r)·(T/T0)^(−½)·(9 + 280·h·exp(−4.170·((T/T0)^(−⅓) − 1))).
	frNBase  = 9.0
	frNScale = 280.0
	frNExp   = 4.170

	// Attenuation coefficient, dB/m:
	// α = 8.686·f²·[1.84e-11·(p/p_r)^(−1)·(T/T0)^½ + (T/T0)^(−5/2)·(
	//     0.01275·exp(−2239.1/T)/(frO + f²/frO) + 0.1068·exp(−3352.0/T)/(frN + f²/frN))].
	// 8.686 is the rounded 20/ln 10 = 8.68589 printed in the standard.
	nepersToDB   = 8.686
	classicCoeff = 1.84e-11
	oxyCoeff     = 0.01275
	oxyTheta     = 2239.1 // K
	nitCoeff     = 0.1068
	nitTheta     = 3352.0 // K
)

// ISO 9613-1 stated validity in f/p (acoustics.md §1.3, FROM MEMORY,
// medium confidence): 4e-4 to 10 Hz/Pa, about 40 Hz to 1 MHz at 1 atm.
const (
	isoMinFreqPerPa = 4e-4 // Hz/Pa
	isoMaxFreqPerPa = 10   // Hz/Pa
)

// SaturationVapourPressure returns the saturation vapour pressure of water
// over a plane liquid surface at temperature t (K), in Pa, by the
// simplified formula of ISO 9613-1:1993 Annex B,
// p_sat = p_r·10^(−6.8346·(273.16/t)^1.261 + 4.6151). It agrees with the
// Goff–Gratch/WMO form to 0.04 % from −20 to +50 °C (acoustics.md §1.2,
// COMPUTED).
//
// Special cases are:
//
//	SaturationVapourPressure(0) = 0
//	SaturationVapourPressure(+Inf) = 101325·10^4.6151
//	SaturationVapourPressure(t) = NaN for t < 0 or NaN
func SaturationVapourPressure(t float64) float64 {
	c := satA*math.Pow(triplePointTemperature/t, satExp) + satB
	return ReferencePressure * math.Pow(10, c)
}

// MolarHumidity returns h, the molar concentration of water vapour in
// percent (ISO 9613-1:1993 Annex B): h = RH·(p_sat/p_r)/(p/p_r).
func (a Atmosphere) MolarHumidity() float64 {
	return a.RelativeHumidity * SaturationVapourPressure(a.Temperature) / a.Pressure
}

// Relaxation returns the oxygen and nitrogen relaxation frequencies frO and
// frN in Hz, and the molar water-vapour concentration h in percent, by
// ISO 9613-1:1993 equations (3), (4) and Annex B (acoustics.md §1.1).
// At 293.15 K, 70 % and 101325 Pa they are 53174 Hz, 460.99 Hz and 1.6143 %.
func (a Atmosphere) Relaxation() (frO, frN, h float64) {
	pRel := a.Pressure / ReferencePressure
	tRel := a.Temperature / ReferenceTemperature
	h = a.MolarHumidity()
	// h·((0.02+h)/(0.391+h)) rather than h·(0.02+h)/(0.391+h) keeps the
	// product finite for very large h.
	frO = pRel * (frOBase + frOScale*h*((frOHumA+h)/(frOHumB+h)))
	frN = pRel / math.Sqrt(tRel) * (frNBase + frNScale*h*math.Exp(-frNExp*(math.Cbrt(1/tRel)-1)))
	return frO, frN, h
}

// Absorption returns the pure-tone attenuation coefficient α of sound at
// frequency f (Hz) in this atmosphere, in dB/m, by ISO 9613-1:1993
// equation (5) with the relaxation frequencies of [Atmosphere.Relaxation]
// (acoustics.md §1.1). The attenuation over a path of length s metres is
// α·s dB.
//
// The ISO tables are evaluated at exact base-ten midbands (see
// [Band.Centre]); evaluating at a nominal label such as 8 kHz instead of
// 7943.28 Hz differs by up to 1.7 %. Outside the ranges named by
// [Atmosphere.Warnings] and [Atmosphere.FrequencyWarning] the equations are
// less accurate but still evaluated.
//
// For an atmosphere that passes [Atmosphere.Validate] and |f| ≤ 1e150 Hz the
// result is finite and non-negative; above that α (which grows as f²)
// overflows to +Inf.
//
// Special cases are:
//
//	Absorption(0) = 0
//	Absorption(-f) = Absorption(f) (α depends on f²)
//	Absorption(±Inf) = +Inf
//	Absorption(NaN) = NaN
func (a Atmosphere) Absorption(f float64) float64 {
	frO, frN, _ := a.Relaxation()
	pRel := a.Pressure / ReferencePressure
	tRel := a.Temperature / ReferenceTemperature
	f2 := f * f
	classic := classicCoeff / pRel * math.Sqrt(tRel)
	oxy := oxyCoeff * math.Exp(-oxyTheta/a.Temperature) / (frO + f2/frO)
	nit := nitCoeff * math.Exp(-nitTheta/a.Temperature) / (frN + f2/frN)
	return nepersToDB * f2 * (classic + math.Pow(tRel, -2.5)*(oxy+nit))
}

// FrequencyWarning returns a sentence when f/p lies outside 4e-4 to
// 10 Hz/Pa (about 40 Hz to 1 MHz at 101.325 kPa), the range in which
// ISO 9613-1 states its equations are accurate to ±10 % (acoustics.md §1.3,
// FROM MEMORY, medium confidence), and "" otherwise. Limits are inclusive.
// f is in Hz. A NaN f gives "".
func (a Atmosphere) FrequencyWarning(f float64) string {
	r := f / a.Pressure
	if r < isoMinFreqPerPa || r > isoMaxFreqPerPa {
		return fmt.Sprintf(
			"Frequency %.4g Hz at %.4g kPa is outside %.4g Hz to %.4g MHz, the range in which ISO 9613-1 states its absorption equations are accurate to ±10 %%.",
			f, a.Pressure/1e3, isoMinFreqPerPa*a.Pressure, isoMaxFreqPerPa*a.Pressure/1e6)
	}
	return ""
}
