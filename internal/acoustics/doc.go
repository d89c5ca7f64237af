// Package acoustics computes the acoustics a microphone-station planner needs:
// atmospheric absorption of sound (ISO 9613-1:1993), one-third-octave band
// tables, wavelengths and far-field criteria, floor-reflection interference,
// the error of assuming a nozzle-centred source, jet-noise levels at a
// receiver (mixing and shock-associated noise, frequency weightings), the
// microphone fit and occupational noise limits. It knows nothing about
// rooms or files.
//
// # Units
//
// Every parameter and result is SI: metres, seconds, kelvin, pascals, kg/m³,
// hertz and radians, unless a name says otherwise. Three quantities are kept
// in the units of the trade and say so in their names and doc comments:
// relative humidity and molar water-vapour concentration in percent (70 means
// 70 %), absorption coefficients in dB/m, and levels in dB.
//
// # Boundary checks
//
// [Atmosphere.Validate] is the package boundary for user data: it rejects
// NaN, infinite and implausible values with an error naming the field.
// [ThirdOctaveBands] checks its limits. The physics functions take raw
// float64 values and do not return errors; the planner validates its inputs
// before calling them. Each lists its special cases (zero, NaN, infinity)
// in a "Special cases are:" paragraph, like [math.Hypot].
//
// # Sources and status
//
// Formulas, constants and check values come from the project reference sheet
// /work/shared/references/acoustics.md. Each carries the sheet's status tag:
// CONFIRMED (seen in a named public source), FROM MEMORY (recalled, to be
// checked against the original), COMPUTED (worked from a stated formula),
// DERIVED, or SUGGESTION (a model of this project's own). The source of every
// constant is given beside it.
//
// # Atmospheric absorption
//
// [Atmosphere.Absorption] gives the pure-tone attenuation coefficient of
// ISO 9613-1:1993 (the same algorithm as ANSI S1.26) in dB/m. The
// standard's tables are evaluated at the exact base-ten midbands
// 1000·10^(k/10) Hz, which [ThirdOctaveBands] returns as [Band.Centre]; use
// those, not the nominal labels, when comparing with printed tables. For band
// levels with large attenuation the pure-tone value at midband is not the
// band attenuation (SAE ARP5534 gives the band method).
//
// # Far field and source position
//
// [Wavelength], [WaveNumber] and [FresnelRadius] give the acoustic and
// Fresnel far-field distances. [SourceExtent] is a SUGGESTION model of where
// a jet radiates a given frequency and how long that region is;
// [SourceOffset] gives the distance, angle and level errors of treating that
// source as if it sat at the arc centre.
//
// # Floor reflection
//
// [FloorReflection] applies the image-source model over a rigid floor;
// [Reflection] gives null and peak frequencies and the level change at any
// frequency. [MaxMicHeightForNull] is the design rule that keeps the first
// null above the highest frequency of interest.
//
// # Anechoic practice and microphones
//
// [QuarterWave] and [WedgeCutoff] are the λ/4 rules of anechoic-room
// practice. [EstimateLevel] is a Lighthill-scaling estimate (±5 dB) meant
// only for choosing a microphone range, and [MicrophoneAdvice] turns it into
// a suggested nominal microphone size from a typical-values table that the
// user should check against data sheets. [Microphone.LevelMargin] and
// [SmallestFit] compare a predicted level with a named microphone.
//
// # Jet-noise levels
//
// [NoiseSource] predicts the noise of one jet ([Jet], the fully expanded
// state) in one atmosphere, by the method named in [NoiseMethod]: the SAE
// ARP 876 single-stream procedure (Zorumski 1982, §8.4) gives the mixing
// noise's sound power and directivity ([MixingPower], [MixingDirectivity]);
// its spectrum follows the similarity spectra of Tam, Golebiowski & Seiner
// (1996) ([LargeScaleSpectrum] aft, [FineScaleSpectrum] at the sideline);
// imperfectly expanded jets add broadband shock-associated noise
// (β = √|Mj² − Md²|, Harper-Bourne & Fisher 1973, in the ARP 876 form).
// [NoiseSource.At] propagates it along a [Path]: spherical spreading from
// the source position, ISO 9613-1 absorption per band, the floor image over
// a hard floor (the band average of the coherent sum: +6 dB flush, tending
// to the energy sum's +3 dB) or over soft ground such as grass (per band the
// larger of that and the energy sum: conservative; no ground-impedance
// model such as Delany & Bazley 1970 is used), and the reverberant field
// 4·ρ0·c0·W/R of a
// hard-walled room ([RoomConstant]; [EyringAbsorption] turns a reverberation
// time into ᾱ by Eyring's formula, which, unlike Sabine's, stays below 1
// and does not overstate the absorption of a dead room). It gives
// OASPL, the A- and C-weighted levels of IEC 61672-1 ([AWeighting],
// [CWeighting]) and a C-weighted peak estimate (the C level plus a crest
// factor of 12 dB for subsonic jets, 15 dB otherwise), with a stated
// uncertainty: ±3 dB on OASPL inside the tables' range, wider near the jet
// axis, for shock-containing jets and outside the tables.
//
// A coaxial jet has no single-stream prediction. [NewCoaxialSource] bounds
// it from three: in every band at every angle the larger of the fully
// mixed jet (a lower bound for separate-flow jets) and the energy sum of
// the two streams each predicted alone, with 3 dB more uncertainty and the
// method named by [NoiseSource.Method] ([CoaxialMethod]); the four-source
// model of Fisher, Preston & Bryce (1998) is not implemented.
//
// # Noise exposure
//
// [ClassifyExposure] grades a daily exposure and a peak against the action
// and limit values of EU Directive 2003/10/EC; [NIOSHAllowedHours] gives the
// allowed time under the NIOSH REL (85 dB(A), 3-dB exchange). They inform
// planning only: hearing protection and exclusion zones follow the
// facility's procedures, local codes and licensed practice.
package acoustics
