package acoustics

import (
	"errors"
	"fmt"
	"math"
)

// NoiseMethod names the prediction method of [NoiseSource], for outputs.
const NoiseMethod = "SAE ARP 876 single-stream mixing noise (power, density exponent, directivity) " +
	"spread over the Tam, Golebiowski & Seiner (1996) similarity spectra; " +
	"shock-associated noise after Harper-Bourne & Fisher (1973) in the ARP 876 form"

// ErrInvalidJet is wrapped by every error from [Jet.Validate].
var ErrInvalidJet = errors.New("acoustics: invalid jet")

// Uncertainty of the predicted levels, dB (one band of about ±N dB on
// OASPL). baseUncertainty is the ±3 dB of ARP 876 inside its tables' range
// (noise-and-exposure.md §1, FROM MEMORY: ±2–3 dB); the additions are this
// project's SUGGESTION for the cases the same source calls worse.
const (
	baseUncertainty  = 3.0
	axisUncertainty  = 2.0 // within nearAxis of the downstream axis
	shockUncertainty = 2.0 // shock-containing jets (shock noise, screech not modelled)
	rangeUncertainty = 3.0 // velocity or temperature outside the tables
	nearAxis         = 30 * math.Pi / 180
	// minTableTemperatureRatio and maxTableTemperatureRatio are the ends
	// of Tt/T0 in the ARP 876 spectral tables, 1 and 3.5
	// (noise-and-exposure.md §1, READ): a jet colder than the ambient is
	// outside them.
	minTableTemperatureRatio = 1.0
	maxTableTemperatureRatio = 3.5
	// ratioRoundOff is the relative round-off allowed on Tt/T0 at the
	// tables' lower end, so that an unheated jet given at the ambient
	// temperature counts as inside.
	ratioRoundOff = 1e-9
)

// MinSourceDistance is the distance from the noise source position, in
// fully expanded jet diameters, inside which no level is predicted: the
// mixing noise's source region itself spans several Dj along the axis
// about the end of the potential core (common practice), so spherical
// spreading from a point there has no meaning. The noise command refuses
// such a receiver; the planner gives such a station no level and says why.
const MinSourceDistance = 2.0

// Crest factors (peak over rms) for the C-weighted peak estimate, dB: 12 dB
// for subsonic shock-free jets, the top of the +11–12 dB quoted in
// noise-and-exposure.md §4 (FROM MEMORY); 15 dB for supersonic or
// shock-containing jets, which crackle ("more for high-power non-linear
// jets", ibid.; the value is a SUGGESTION matching [CrestAllowance]).
const (
	SubsonicCrestFactor   = 12.0
	SupersonicCrestFactor = 15.0
)

// Jet is the fully expanded jet that radiates the noise.
type Jet struct {
	Velocity         float64 // fully expanded velocity Uj, m/s
	Density          float64 // fully expanded density ρj, kg/m³
	Diameter         float64 // fully expanded diameter Dj, m
	TotalTemperature float64 // total temperature, K
	Mach             float64 // fully expanded Mach number Mj
	DesignMach       float64 // design Mach number of the nozzle; 1 for a convergent nozzle
	ShockFree        bool    // the jet leaves at ambient pressure (subsonic or ideally expanded)
}

// Validate returns an error wrapping [ErrInvalidJet], naming the field,
// when a value is NaN, infinite or not positive.
func (j Jet) Validate() error {
	for _, f := range []struct {
		name string
		v    float64
	}{{"Velocity", j.Velocity}, {"Density", j.Density}, {"Diameter", j.Diameter},
		{"TotalTemperature", j.TotalTemperature}, {"Mach", j.Mach}, {"DesignMach", j.DesignMach}} {
		if math.IsNaN(f.v) || math.IsInf(f.v, 0) || f.v <= 0 {
			return fmt.Errorf("%w: %s is %g, want a finite value > 0", ErrInvalidJet, f.name, f.v)
		}
	}
	return nil
}

// NoiseBands returns the one-third-octave bands over which a jet's noise is
// predicted: from 20 Hz or Strouhal number 0.01, whichever is lower, to
// 20 kHz or Strouhal number 10, whichever is higher (the similarity
// spectra are more than 15 dB below their peak beyond these Strouhal
// numbers; 20 Hz–20 kHz covers the A and C weightings), within 1 Hz–1 MHz.
// With more jets (the streams of a coaxial jet) the bands cover them all.
func NoiseBands(j Jet, more ...Jet) []Band {
	lo, hi := 20.0, 20e3
	for _, j := range append([]Jet{j}, more...) {
		f := j.Velocity / j.Diameter
		lo = math.Min(lo, 0.01*f)
		hi = math.Max(hi, 10*f)
	}
	lo, hi = math.Max(lo, 1), math.Min(hi, 1e6)
	if !(lo <= hi) { // NaN from an invalid jet
		lo, hi = 20, 20e3
	}
	b, _ := ThirdOctaveBands(lo, hi)
	return b
}

// angleSteps is the number of 1° steps of the angle grid of a source.
const angleSteps = 180

// NoiseSource is the predicted noise of one jet in one atmosphere, ready to
// be propagated to any number of receivers. Build it with [NewNoiseSource].
type NoiseSource struct {
	jet      Jet
	atm      Atmosphere
	c0, rho0 float64
	bands    []Band
	// grid[k][b] is p²·r² (Pa²·m²) in band b at the polar angle k° from the
	// downstream jet axis: mixing and shock noise.
	grid [angleSteps + 1][]float64
	// power[b] is the sound power in band b, W.
	power              []float64
	alpha              []float64 // absorption per band as an exponent, α·ln10/10 in 1/m
	aw, cw             []float64 // A and C weighting per band, linear power factors
	edgeK              []float64 // wave numbers of the band edges, rad/m (len(bands)+1)
	beta, crest        float64
	mixingW, shockPeak float64
	inRange            bool
	// parts are the predictions a coaxial source bounds; nil for one jet
	// (see [NewCoaxialSource]).
	parts []coaxialPart
}

// NewNoiseSource predicts the noise of jet j in atmosphere atm over bands
// (use [NoiseBands] for the default set). It returns an error when j or atm
// is invalid or bands is empty.
func NewNoiseSource(j Jet, atm Atmosphere, bands []Band) (*NoiseSource, error) {
	if err := j.Validate(); err != nil {
		return nil, err
	}
	if err := atm.Validate(); err != nil {
		return nil, err
	}
	if len(bands) == 0 {
		return nil, fmt.Errorf("%w: no bands to predict", ErrInvalidBandRange)
	}
	s := &NoiseSource{jet: j, atm: atm, c0: atm.SpeedOfSound(), rho0: atm.Density(), bands: bands}
	area := math.Pi * j.Diameter * j.Diameter / 4
	vr := j.Velocity / s.c0
	tt := j.TotalTemperature / atm.Temperature
	s.inRange = ARP876InRange(j.Velocity, s.c0) && temperatureInTables(tt)
	s.mixingW = MixingPower(j.Velocity, j.Density, area, s.rho0, s.c0)
	if !j.ShockFree {
		s.beta = ShockParameter(j.Mach, j.DesignMach)
	}
	s.crest = SubsonicCrestFactor
	if vr >= 1 || !j.ShockFree {
		s.crest = SupersonicCrestFactor
	}

	// normalised shapes of the two similarity spectra (band powers summing to 1)
	n := len(bands)
	fl := LargeScalePeakStrouhal * j.Velocity / j.Diameter
	ff := FineScalePeakStrouhal * j.Velocity / j.Diameter
	shapeL, shapeF := make([]float64, n), make([]float64, n)
	var sumL, sumF float64
	for b, band := range bands {
		w := band.Upper - band.Lower // the spectra are densities: band power ∝ density × width
		shapeL[b] = math.Pow(10, LargeScaleSpectrum(band.Centre/fl)/10) * w
		shapeF[b] = math.Pow(10, FineScaleSpectrum(band.Centre/ff)/10) * w
		sumL += shapeL[b]
		sumF += shapeF[b]
	}
	for b := range bands {
		shapeL[b] /= sumL
		shapeF[b] /= sumF
	}
	shock := newShockSpectrum(j, area, s.beta, s.rho0, s.c0, tt, bands)
	cells := make([]float64, (angleSteps+1)*n) // one allocation for the whole grid
	for k := 0; k <= angleSteps; k++ {
		th := float64(k) * math.Pi / angleSteps
		row := cells[k*n : (k+1)*n : (k+1)*n]
		mix := s.rho0 * s.c0 * s.mixingW * MixingDirectivity(th, vr) / (4 * math.Pi)
		wl := largeScaleWeight(th)
		for b := range bands {
			row[b] = mix * (wl*shapeL[b] + (1-wl)*shapeF[b])
		}
		shock.add(row, th)
		s.grid[k] = row
	}
	s.integratePower()
	s.alpha = make([]float64, n)
	s.aw, s.cw = make([]float64, n), make([]float64, n)
	s.edgeK = make([]float64, n+1)
	for b, band := range bands {
		s.alpha[b] = atm.Absorption(band.Centre) * math.Ln10 / 10
		s.aw[b] = math.Pow(10, AWeighting(band.Centre)/10)
		s.cw[b] = math.Pow(10, CWeighting(band.Centre)/10)
		s.edgeK[b] = 2 * math.Pi * band.Lower / s.c0
	}
	s.edgeK[n] = 2 * math.Pi * bands[n-1].Upper / s.c0
	if s.beta > 0 {
		s.shockPeak = ShockPeakFrequency(j.Velocity, area, s.beta, s.c0, math.Pi/2)
	}
	return s, nil
}

// integratePower sets the band powers from the grid:
// W_b = (2π/(ρ0·c0))·∫ p²r² sin θ dθ, trapezoidal in 1° steps.
func (s *NoiseSource) integratePower() {
	s.power = make([]float64, len(s.bands))
	h := math.Pi / angleSteps
	for k := 0; k <= angleSteps; k++ {
		wt := h
		if k == 0 || k == angleSteps {
			wt = h / 2
		}
		sn := math.Sin(float64(k) * h)
		for b := range s.bands {
			s.power[b] += 2 * math.Pi / (s.rho0 * s.c0) * s.grid[k][b] * sn * wt
		}
	}
}

// temperatureInTables reports whether the total-temperature ratio tt lies
// within the ARP 876 tables (ends included).
func temperatureInTables(tt float64) bool {
	return tt >= minTableTemperatureRatio*(1-ratioRoundOff) && tt <= maxTableTemperatureRatio
}

// Bands returns the bands of the prediction. The caller must not modify
// the slice.
func (s *NoiseSource) Bands() []Band { return s.bands }

// SoundPower returns the total radiated sound power, W, and that of the
// mixing noise alone.
func (s *NoiseSource) SoundPower() (total, mixing float64) {
	for _, w := range s.power {
		total += w
	}
	return total, s.mixingW
}

// ShockParameter returns β of the jet, 0 when it is shock-free.
func (s *NoiseSource) ShockParameter() float64 { return s.beta }

// ShockPeak returns the peak frequency of the shock-associated noise at 90°
// from the jet axis, Hz; 0 when the jet is shock-free.
func (s *NoiseSource) ShockPeak() float64 { return s.shockPeak }

// CrestFactor returns the crest factor used for the peak estimate, dB.
func (s *NoiseSource) CrestFactor() float64 { return s.crest }

// Uncertainty returns the stated uncertainty (±dB on OASPL) at the polar
// angle thetaJ (rad) from the downstream jet axis.
func (s *NoiseSource) Uncertainty(thetaJ float64) float64 {
	if s.parts != nil {
		return s.coaxialUncertainty(thetaJ)
	}
	u := baseUncertainty
	if thetaJ < nearAxis-1e-9 { // 30° itself is outside, whatever its rounding in radians
		u += axisUncertainty
	}
	if !s.jet.ShockFree {
		u += shockUncertainty
	}
	if !s.inRange {
		u += rangeUncertainty
	}
	return u
}

// Notes returns sentences on where the prediction is weaker than ±3 dB.
func (s *NoiseSource) Notes() []string {
	if s.parts != nil {
		return s.coaxialNotes()
	}
	var n []string
	if !ARP876InRange(s.jet.Velocity, s.c0) {
		n = append(n, fmt.Sprintf("Uj/c0 = %.2f is outside the ARP 876 tables (0.40–2.51): the tables are held at their ends.", s.jet.Velocity/s.c0))
	}
	if tt := s.jet.TotalTemperature / s.atm.Temperature; !temperatureInTables(tt) {
		side := "above the 3.5"
		if tt < maxTableTemperatureRatio {
			side = "below the 1"
		}
		n = append(n, fmt.Sprintf("Tt/T0 = %.2f is %s of the ARP 876 tables (1–3.5).", tt, side))
	}
	if s.beta > 0 {
		n = append(n, fmt.Sprintf("shock-containing jet (β = %.2f): shock-associated noise peaks near %s at 90°; screech tones are not modelled.", s.beta, frequencyWords(s.shockPeak)))
	}
	return n
}

// Path describes how sound reaches a receiver.
type Path struct {
	// Distance is the direct path from the source position, m (> 0).
	Distance float64
	// Polar is the polar angle of the receiver seen from the source, from
	// the downstream jet axis, rad.
	Polar float64
	// ImageDistance and ImagePolar describe the path reflected by the
	// floor (image source); ImageDistance 0 means no floor reflection.
	ImageDistance, ImagePolar float64
	// SoftFloor marks a finite-impedance floor (grass, soil): each band
	// takes the larger of the rigid floor's coherent sum and the energy sum
	// of the two paths (incoherent image, +3 dB for equal paths). Real
	// ground is nearly rigid at low frequencies and fills in the nulls
	// higher up; no ground-impedance model (such as Delany & Bazley 1970)
	// is used, so the result errs high (conservative).
	SoftFloor bool
	// RoomConstant is R = S·ᾱ/(1 − ᾱ) of a hard-walled room, m²; 0 means
	// no reverberant field (free field or anechoic).
	RoomConstant float64
	// Lossless leaves out air absorption.
	Lossless bool
}

// Levels are the predicted levels at one receiver.
type Levels struct {
	OASPL     float64 // overall sound pressure level, dB re 20 µPa
	AWeighted float64 // A-weighted level (IEC 61672-1), dB(A)
	CWeighted float64 // C-weighted level, dB(C)
	// Peak is the C-weighted peak estimate: CWeighted plus the crest
	// factor, dB(C).
	Peak float64
	// Uncertainty is ± dB on OASPL.
	Uncertainty float64
}

// At returns the levels over path p. When band is not nil it must have
// len(s.Bands()) elements and receives the band levels in dB re 20 µPa.
// It returns an error when the distance is not finite and positive or a
// room constant is negative.
func (s *NoiseSource) At(p Path, band []float64) (Levels, error) {
	if !(p.Distance > 0) || math.IsInf(p.Distance, 0) || math.IsNaN(p.Polar) {
		return Levels{}, fmt.Errorf("acoustics: receiver distance %g m, polar %g rad: want a finite distance > 0", p.Distance, p.Polar)
	}
	if !(p.ImageDistance >= 0) || math.IsInf(p.ImageDistance, 0) || !(p.RoomConstant >= 0) || math.IsInf(p.RoomConstant, 0) {
		return Levels{}, fmt.Errorf("acoustics: image distance %g m, room constant %g m²: want finite values ≥ 0", p.ImageDistance, p.RoomConstant)
	}
	row, rowF := s.rowAt(p.Polar)
	var img [2][]float64
	var imgF, delta float64
	if p.ImageDistance > 0 {
		img, imgF = s.rowAt(p.ImagePolar)
		delta = math.Max(p.ImageDistance-p.Distance, 0)
	}
	var z, a, c float64
	imaged := p.ImageDistance > 0 && delta > 0
	var prevSin float64
	if imaged {
		prevSin = math.Sin(s.edgeK[0] * delta)
	}
	for b := range s.bands {
		d := (row[0][b]*(1-rowF) + row[1][b]*rowF) / (p.Distance * p.Distance)
		if !p.Lossless {
			d *= math.Exp(-s.alpha[b] * p.Distance)
		}
		p2 := d
		var nextSin float64
		if imaged {
			nextSin = math.Sin(s.edgeK[b+1] * delta)
		}
		if p.ImageDistance > 0 {
			q := (img[0][b]*(1-imgF) + img[1][b]*imgF) / (p.ImageDistance * p.ImageDistance)
			if !p.Lossless {
				q *= math.Exp(-s.alpha[b] * p.ImageDistance)
			}
			// band average of cos(kΔ) over the band: the coherent image sum
			avg := 1.0
			if dk := (s.edgeK[b+1] - s.edgeK[b]) * delta; imaged && dk > 0 {
				avg = (nextSin - prevSin) / dk
			}
			if p.SoftFloor {
				avg = math.Max(avg, 0) // at least the energy sum
			}
			p2 += q + 2*math.Sqrt(d*q)*avg
		}
		prevSin = nextSin
		if p.RoomConstant > 0 {
			p2 += 4 * s.rho0 * s.c0 * s.power[b] / p.RoomConstant
		}
		p2 = math.Max(p2, 0)
		z += p2
		a += p2 * s.aw[b]
		c += p2 * s.cw[b]
		if band != nil {
			band[b] = levelOf(p2)
		}
	}
	l := Levels{OASPL: levelOf(z), AWeighted: levelOf(a), CWeighted: levelOf(c), Uncertainty: s.Uncertainty(p.Polar)}
	l.Peak = l.CWeighted + s.crest
	if math.IsNaN(l.OASPL) || math.IsInf(l.OASPL, 0) {
		return Levels{}, fmt.Errorf("acoustics: the level at %g m is not finite", p.Distance)
	}
	return l, nil
}

// rowAt returns the two grid rows around the angle th (rad), folded into
// [0, π], and the interpolation fraction.
func (s *NoiseSource) rowAt(th float64) ([2][]float64, float64) {
	th = math.Abs(math.Remainder(th, 2*math.Pi))
	u := th / math.Pi * angleSteps
	k := int(u)
	if k >= angleSteps {
		k = angleSteps - 1
	}
	return [2][]float64{s.grid[k], s.grid[k+1]}, u - float64(k)
}

// levelOf returns 10·log10(p2/p_ref²).
func levelOf(p2 float64) float64 {
	return 10 * math.Log10(p2/(ReferenceSoundPressure*ReferenceSoundPressure))
}
