package acoustics

import "math"

// Limits of the SUGGESTION source-position model of [SourceExtent], in
// nozzle diameters. They are this project's own fit to the literature
// ranges of acoustics.md §6.4 (FROM MEMORY, medium confidence): sources at
// St ≳ 1 lie within about 1–4 D of the exit, sources at St ≈ 0.1–0.3 near
// x ≈ 5–12 D, and the whole source region spans about 10–20 D.
const (
	sourceOffsetD    = 2.0  // xs/dj at St → ∞
	sourceMinD       = 1.0  // lower clamp of xs/dj
	sourceMaxD       = 15.0 // upper clamp of xs/dj
	sourceLengthMaxD = 20.0 // upper clamp of L/dj
	sourceCompactD   = 2.0  // L·St/dj: the radiating region shrinks as 1/St
)

// SourceExtent returns, for a jet of fully expanded diameter dj (m) and
// velocity uj (m/s) radiating at frequency f (Hz), the axial position xs (m,
// downstream of the nozzle exit) of the apparent source centroid and the
// length (m) of the region radiating at that frequency.
//
// The model is a SUGGESTION of this project, not a published correlation.
// With the Strouhal number St = f·dj/uj,
//
//	xs/dj = 2 + 1/St, clamped to [1, 15]
//	L/dj  = 2/St,     clamped to at most 20
//
// It is fitted to the literature ranges quoted in acoustics.md §6.4 (FROM
// MEMORY, medium confidence, phased-array and polar-correlation studies):
// sources at St ≳ 1 lie within about 1–4 D of the exit (the model gives
// 2–3 D), sources at St ≈ 0.1–0.3 lie near x ≈ 5–12 D (the model gives
// 12 D at St = 0.1, 7 D at 0.2, 5.3 D at 0.3), and the whole region spans
// about 10–20 D (L is capped at 20 D). The length falls as 1/St so that
// high-frequency sources are compact near the nozzle, as acoustics.md §2.1
// asks of a frequency-dependent Fresnel test: the bands near the spectral
// peak (St ≈ 0.2) radiate from about 10 D (the 5–12 D span above), the
// lowest (St ≤ 0.1) from the whole 20 D region, St = 1 from 2 D, St = 10
// from 0.2 D. Baars, Murray & Tinney (J. Fluid Mech., 2021)
// confirm that the source position depends on frequency but are not the
// source of these numbers.
//
// Special cases are:
//
//	SourceExtent(0, dj, uj) = 15·dj, 20·dj for uj > 0 (St = 0)
//	SourceExtent(f, dj, 0) = 2·dj, 0 for f·dj > 0 (St = +Inf)
//	SourceExtent(f, dj, uj) = NaN, NaN if any argument is NaN, or f·dj == uj == 0
func SourceExtent(f, dj, uj float64) (xs, length float64) {
	st := f * dj / uj
	if math.IsNaN(st) || math.IsNaN(dj) {
		return math.NaN(), math.NaN()
	}
	xsD := sourceOffsetD + 1/st
	if math.IsInf(xsD, 0) { // St == 0: 1/St = ±Inf depending on the sign of zero
		xsD = sourceMaxD
	}
	xsD = math.Min(math.Max(xsD, sourceMinD), sourceMaxD)
	lD := math.Min(sourceCompactD/st, sourceLengthMaxD)
	return xsD * dj, lD * dj
}

// SourceOffset returns the error of treating a source that sits xs (m)
// downstream of the arc centre, on the jet axis, as if it sat at the
// centre, for a microphone at radius r (m) from the centre and polar angle
// thetaJ (rad) measured from the downstream jet axis:
//
//	rTrue      = (r² + xs² − 2·r·xs·cos θj)^½   true source–microphone distance, m
//	thetaTrue  = atan2(r·sin θj, r·cos θj − xs)  true polar angle from the downstream axis, rad
//	levelErrDB = 20·log10(r/rTrue)              dB; positive when the true source is nearer
//
// (acoustics.md §2.2, COMPUTED; the physical point that per-frequency source
// positions matter is CONFIRMED by Baars, Murray & Tinney, J. Fluid Mech.,
// 2021). A negative xs places the source upstream of the centre.
// thetaTrue lies in [−π, π].
//
// Special cases are:
//
//	SourceOffset(r, θ, 0) = r, θ wrapped to [−π, π], 0 for r > 0
//	SourceOffset(r, θ, xs) has levelErrDB = +Inf when rTrue == 0 and r ≠ 0 (microphone on the source)
//	SourceOffset(0, θ, xs) = |xs|, ±π (xs > 0) or 0 (xs < 0), −Inf
//	SourceOffset(0, θ, 0) = 0, 0 or ±π, NaN
//	SourceOffset(r, θ, xs) = NaN, NaN, NaN if any argument is NaN
func SourceOffset(r, thetaJ, xs float64) (rTrue, thetaTrue, levelErrDB float64) {
	sin, cos := math.Sincos(thetaJ)
	y, x := r*sin, r*cos-xs
	rTrue = math.Hypot(x, y)
	thetaTrue = math.Atan2(y, x)
	levelErrDB = 20 * math.Log10(math.Abs(r)/rTrue)
	if math.IsNaN(xs) {
		return math.NaN(), math.NaN(), math.NaN()
	}
	return rTrue, thetaTrue, levelErrDB
}
