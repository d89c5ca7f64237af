package acoustics

import (
	"errors"
	"fmt"
	"math"
)

// ErrInvalidAtmosphere is wrapped by every error from [Atmosphere.Validate].
var ErrInvalidAtmosphere = errors.New("acoustics: invalid atmosphere")

// Reference conditions and physical constants.
const (
	// ReferencePressure is the reference ambient pressure p_r = 101.325 kPa
	// of ISO 9613-1:1993 (acoustics.md §1.1, CONFIRMED), in Pa.
	ReferencePressure = 101325.0

	// ReferenceTemperature is the reference air temperature T0 = 293.15 K
	// (20 °C) of ISO 9613-1:1993 (acoustics.md §1.1, CONFIRMED), in K.
	ReferenceTemperature = 293.15

	// triplePointTemperature is the triple-point isotherm T01 = 273.16 K of
	// ISO 9613-1:1993 Annex B (acoustics.md §1.1, CONFIRMED), in K.
	triplePointTemperature = 273.16

	// referenceSoundSpeed is the speed of sound at ReferenceTemperature in
	// the ISO 9613-1 form c = 343.2·(T/293.15)^½ (acoustics.md §0,
	// CONFIRMED), in m/s.
	referenceSoundSpeed = 343.2

	// GasConstantDryAir is the specific gas constant of dry air,
	// 287.05 J/(kg·K): ISO 2533:1975 Standard Atmosphere gives
	// 287.05287 J/(kg·K) (from memory, high confidence); the same 287.05 is
	// used throughout jet.md.
	GasConstantDryAir = 287.05
)

// Plausibility limits applied by [Atmosphere.Validate]. They are a project
// choice (SUGGESTION), not taken from a standard: wide enough for any jet
// test facility on the ground, narrow enough to catch unit mistakes such as
// degrees Celsius typed as kelvin or kilopascals typed as pascals. Inside
// them every function of this package returns finite values.
const (
	MinTemperature = 173.15 // K (−100 °C)
	MaxTemperature = 373.15 // K (+100 °C)
	MinPressure    = 1e3    // Pa (1 kPa)
	MaxPressure    = 1e6    // Pa (1 MPa)
)

// ISO 9613-1:1993 stated validity of the absorption equations: ±10 % for
// molar water-vapour concentration 0.05–5 %, temperature 253.15–323.15 K and
// pressure below 200 kPa (acoustics.md §1.3, FROM MEMORY, medium confidence,
// ISO 9613-1 clause 7).
const (
	isoMinTemperature = 253.15 // K
	isoMaxTemperature = 323.15 // K
	isoMinHumidity    = 0.05   // % molar concentration
	isoMaxHumidity    = 5.0    // % molar concentration
	isoMaxPressure    = 200e3  // Pa
)

// Atmosphere is still air.
//
// The zero value is not a valid atmosphere; use [StandardAtmosphere] for the
// defaults and [Atmosphere.Validate] before using an atmosphere read from
// user data. Methods other than Validate and Warnings assume a valid
// atmosphere; for one that fails Validate their results are unspecified (they
// may be NaN or infinite).
type Atmosphere struct {
	// Temperature is the air temperature in K. Default 293.15 K.
	Temperature float64
	// RelativeHumidity is the relative humidity in percent (70 means 70 %),
	// with respect to saturation over liquid water. Default 70 %.
	RelativeHumidity float64
	// Pressure is the ambient (static) pressure in Pa. Default 101325 Pa.
	Pressure float64
}

// StandardAtmosphere returns 293.15 K, 70 % relative humidity and
// 101325 Pa. The temperature and pressure are the reference values T0 and
// p_r of ISO 9613-1:1993; 70 % is the humidity of the ISO 9613-2:1996 Table 2
// row at 20 °C and of the check values in acoustics.md §1.5, a typical
// indoor-chamber condition (common practice).
func StandardAtmosphere() Atmosphere {
	return Atmosphere{
		Temperature:      ReferenceTemperature,
		RelativeHumidity: 70,
		Pressure:         ReferencePressure,
	}
}

// Validate reports whether a is usable. It returns an error wrapping
// [ErrInvalidAtmosphere] and naming the field when Temperature or Pressure
// is NaN, infinite or not positive, when RelativeHumidity is NaN or outside
// 0..100 %, or when Temperature lies outside [MinTemperature,
// MaxTemperature] or Pressure outside [MinPressure, MaxPressure] (limits
// inclusive). Fields are checked in the order Temperature,
// RelativeHumidity, Pressure; the first failure is returned.
func (a Atmosphere) Validate() error {
	switch t := a.Temperature; {
	case math.IsNaN(t) || math.IsInf(t, 0):
		return fmt.Errorf("%w: Temperature is %v, want a finite value in K", ErrInvalidAtmosphere, t)
	case t <= 0:
		return fmt.Errorf("%w: Temperature is %g K, want > 0 K", ErrInvalidAtmosphere, t)
	case t < MinTemperature || t > MaxTemperature:
		return fmt.Errorf("%w: Temperature is %g K, want %g–%g K (was a Celsius value given as kelvin?)",
			ErrInvalidAtmosphere, t, MinTemperature, MaxTemperature)
	}
	if rh := a.RelativeHumidity; math.IsNaN(rh) || rh < 0 || rh > 100 {
		return fmt.Errorf("%w: RelativeHumidity is %g %%, want 0–100 %%", ErrInvalidAtmosphere, rh)
	}
	switch p := a.Pressure; {
	case math.IsNaN(p) || math.IsInf(p, 0):
		return fmt.Errorf("%w: Pressure is %v, want a finite value in Pa", ErrInvalidAtmosphere, p)
	case p <= 0:
		return fmt.Errorf("%w: Pressure is %g Pa, want > 0 Pa", ErrInvalidAtmosphere, p)
	case p < MinPressure || p > MaxPressure:
		return fmt.Errorf("%w: Pressure is %g Pa, want %g–%g Pa (was a kPa value given as Pa?)",
			ErrInvalidAtmosphere, p, MinPressure, MaxPressure)
	}
	return nil
}

// Warnings returns one sentence for each way in which a lies outside the
// stated validity of the ISO 9613-1 absorption equations (temperature
// 253.15–323.15 K, molar water-vapour concentration 0.05–5 %, pressure below
// 200 kPa; limits inclusive except the pressure). It returns nil when there
// is nothing to say. If a fails [Atmosphere.Validate], Warnings returns that
// error's message as its only sentence.
func (a Atmosphere) Warnings() []string {
	if err := a.Validate(); err != nil {
		return []string{err.Error() + "."}
	}
	var w []string
	if t := a.Temperature; t < isoMinTemperature || t > isoMaxTemperature {
		w = append(w, fmt.Sprintf(
			"Temperature %.2f K is outside 253.15–323.15 K, the range in which ISO 9613-1 states its absorption equations are accurate to ±10 %%.", t))
	}
	if h := a.MolarHumidity(); h < isoMinHumidity || h > isoMaxHumidity {
		w = append(w, fmt.Sprintf(
			"Water-vapour concentration %.3g %% (from %.3g %% relative humidity) is outside 0.05–5 %%, the range in which ISO 9613-1 states its absorption equations are accurate to ±10 %%.",
			h, a.RelativeHumidity))
	}
	if p := a.Pressure; p >= isoMaxPressure {
		w = append(w, fmt.Sprintf(
			"Pressure %.1f kPa is not below 200 kPa, the limit to which ISO 9613-1 states its absorption equations are accurate to ±10 %%.", p/1e3))
	}
	return w
}

// SpeedOfSound returns the speed of sound in m/s in the ISO 9613-1 form
// c = 343.2·(T/293.15)^½ (acoustics.md §0, CONFIRMED). It depends on
// Temperature only.
//
// Special cases are:
//
//	SpeedOfSound() = 0 when Temperature == 0
//	SpeedOfSound() = NaN when Temperature < 0 or is NaN
func (a Atmosphere) SpeedOfSound() float64 {
	return referenceSoundSpeed * math.Sqrt(a.Temperature/ReferenceTemperature)
}

// Density returns the density of dry air in kg/m³, p/(R·T) with
// R = [GasConstantDryAir]. Humidity is ignored: moist air at 20 °C and 70 % is about 0.6 %
// lighter (hand-computed, 0.378·p_vapour/p).
//
// Special cases are:
//
//	Density() = +Inf when Temperature == 0 and Pressure > 0
//	Density() = NaN when Temperature and Pressure are both 0, or either is NaN
func (a Atmosphere) Density() float64 {
	return a.Pressure / (GasConstantDryAir * a.Temperature)
}
