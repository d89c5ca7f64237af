package jet

import (
	"fmt"
	"math"
)

// Physical constants.
const (
	// RAir is the specific gas constant of dry air, J/(kg·K): the molar gas
	// constant 8.314462618 J/(mol·K) (CODATA 2018) over the molar mass of dry
	// air 0.0289652 kg/mol (ISO 2533:1975 standard atmosphere).
	RAir = 287.05
	// GammaAir is the ratio of specific heats of air at room temperature
	// (NACA Report 1135, 1953).
	GammaAir = 1.4
	// Gravity is the standard acceleration of gravity, m/s² (CGPM 1901,
	// 9.80665 m/s² exactly).
	Gravity = 9.80665
	// sutherlandMu0, sutherlandT0 and sutherlandS are Sutherland's law for the
	// viscosity of air: 1.716e-5 Pa·s at 273.15 K with S = 110.4 K
	// (Sutherland 1893; constants as tabulated by White, Viscous Fluid Flow,
	// from memory).
	sutherlandMu0 = 1.716e-5
	sutherlandT0  = 273.15
	sutherlandS   = 110.4
	// prandtlAir is the Prandtl number of air near room temperature
	// (from memory; 0.71 at 300 K in standard property tables).
	prandtlAir = 0.71
)

// Gas is a calorically perfect gas.
type Gas struct {
	Gamma float64 // ratio of specific heats, > 1
	R     float64 // specific gas constant, J/(kg·K)
}

// Air returns dry air: γ = 1.4, R = 287.05 J/(kg·K).
func Air() Gas { return Gas{Gamma: GammaAir, R: RAir} }

// Cp returns the specific heat at constant pressure, J/(kg·K).
func (g Gas) Cp() float64 { return g.Gamma * g.R / (g.Gamma - 1) }

// SoundSpeed returns the speed of sound at static temperature t (K), m/s.
func (g Gas) SoundSpeed(t float64) float64 { return math.Sqrt(g.Gamma * g.R * t) }

// CriticalNPR returns the nozzle pressure ratio p0/p at which the flow
// becomes sonic, ((γ+1)/2)^(γ/(γ−1)): 1.89293 for γ = 1.4 (NACA Report 1135).
func (g Gas) CriticalNPR() float64 {
	return math.Pow((g.Gamma+1)/2, g.Gamma/(g.Gamma-1))
}

// MachFromNPR returns the Mach number of isentropic expansion from total
// pressure p0 to static pressure p, for npr = p0/p ≥ 1:
// M = sqrt(2/(γ−1)·(npr^((γ−1)/γ) − 1)) (NACA Report 1135).
func (g Gas) MachFromNPR(npr float64) float64 {
	if npr <= 1 {
		return 0
	}
	return math.Sqrt(2 / (g.Gamma - 1) * (math.Pow(npr, (g.Gamma-1)/g.Gamma) - 1))
}

// TemperatureRatio returns T0/T = 1 + (γ−1)/2·M² (NACA Report 1135).
func (g Gas) TemperatureRatio(m float64) float64 { return 1 + (g.Gamma-1)/2*m*m }

// PressureRatio returns p0/p = (T0/T)^(γ/(γ−1)) (NACA Report 1135).
func (g Gas) PressureRatio(m float64) float64 {
	return math.Pow(g.TemperatureRatio(m), g.Gamma/(g.Gamma-1))
}

// AreaRatio returns A/A*, the ratio of the flow area at Mach m to the sonic
// throat area (NACA Report 1135). Special cases are: AreaRatio(0) = +Inf.
func (g Gas) AreaRatio(m float64) float64 {
	if m <= 0 {
		return math.Inf(1)
	}
	e := (g.Gamma + 1) / (2 * (g.Gamma - 1))
	return math.Pow(2/(g.Gamma+1)*g.TemperatureRatio(m), e) / m
}

// MachFromAreaRatio inverts [Gas.AreaRatio] on the supersonic branch when
// supersonic is true, or the subsonic branch otherwise. ratio must be ≥ 1.
func (g Gas) MachFromAreaRatio(ratio float64, supersonic bool) float64 {
	if ratio <= 1 {
		return 1
	}
	lo, hi := 1e-9, 1.0
	if supersonic {
		lo, hi = 1.0, 2.0
		for g.AreaRatio(hi) < ratio {
			hi *= 2
		}
	}
	for i := 0; i < 200 && hi-lo > 1e-13*hi; i++ {
		mid := (lo + hi) / 2
		// A/A* falls with M on the subsonic branch and rises on the supersonic one.
		if (g.AreaRatio(mid) > ratio) == supersonic {
			hi = mid
		} else {
			lo = mid
		}
	}
	return (lo + hi) / 2
}

// Viscosity returns the dynamic viscosity of air at temperature t (K), Pa·s,
// from Sutherland's law. It is used for the jet gas too: combustion products
// are within a few per cent of air.
func Viscosity(t float64) float64 {
	return sutherlandMu0 * math.Pow(t/sutherlandT0, 1.5) * (sutherlandT0 + sutherlandS) / (t + sutherlandS)
}

// Ambient is the still air around the jet.
type Ambient struct {
	Pressure    float64 // static pressure, Pa
	Temperature float64 // static temperature, K
}

// StandardAmbient returns sea-level standard air, 101 325 Pa and 288.15 K
// (ISO 2533:1975).
func StandardAmbient() Ambient { return Ambient{Pressure: 101325, Temperature: 288.15} }

// Density returns the ambient density, kg/m³.
func (a Ambient) Density() float64 { return a.Pressure / (RAir * a.Temperature) }

// SoundSpeed returns the ambient speed of sound, m/s.
func (a Ambient) SoundSpeed() float64 { return Air().SoundSpeed(a.Temperature) }

func (a Ambient) validate() error {
	if err := positive("ambient pressure", a.Pressure, "Pa"); err != nil {
		return err
	}
	return positive("ambient temperature", a.Temperature, "K")
}

// positive returns an error unless v is finite and > 0.
func positive(name string, v float64, unit string) error {
	switch {
	case math.IsNaN(v) || math.IsInf(v, 0):
		return &InputError{Field: name, Reason: fmt.Sprintf("must be a finite number, got %v", v)}
	case v <= 0:
		return &InputError{Field: name, Reason: fmt.Sprintf("must be greater than 0 %s, got %g %s", unit, v, unit)}
	}
	return nil
}

// InputError reports an input the model cannot use: which input and why.
type InputError struct {
	Field  string // the input, in words: "nozzle pressure ratio"
	Reason string
}

func (e *InputError) Error() string { return "jet: " + e.Field + " " + e.Reason }
