package acoustics

import "math"

// SAE ARP 876 single-stream jet mixing noise, in the form of the NASA ANOPP
// theoretical manual (Zorumski 1982, part 2, §8.4), for a static jet:
//
//	W     = K·ρ0·c0³·Aj·(ρj/ρ0)^ω·(Vj/c0)⁸·P(Vj/c0)
//	p²·r² = ρ0·c0·W·D(θi, Vj/c0)/(4π)
//
// with K = 6.67×10⁻⁵, the density exponent ω and the power deviation factor
// P tabulated against log10(Vj/c0), and the directivity D against the polar
// angle θi from the inlet axis and log10(Vj/c0). The tables below are READ
// in a public implementation that cites Zorumski 1982 (MIT-LAE/pyNA,
// pyNA/data/sources/jet/*.csv and its jet-mixing source; noise-and-exposure.md
// §1). Expected accuracy: about ±2–3 dB OASPL for round convergent nozzles
// inside the tables' range, worse near the jet axis and for shock-containing
// jets (noise-and-exposure.md §1, FROM MEMORY).

// arp876K is the acoustic power coefficient K of ARP 876 (Zorumski 1982
// §8.4 Eq. 3; READ, noise-and-exposure.md §1), dimensionless.
const arp876K = 6.67e-5

// Range of log10(Vj/c0) covered by the directivity and power tables.
const (
	arp876LogVMin = -0.4
	arp876LogVMax = 0.4
)

// arp876Omega is the density exponent ω at log10(Vj/c0) = −0.45, −0.40, …,
// 0.60 (Zorumski 1982 §8.4 Table II, extended to 0.6 after Hoch et al.;
// READ in MIT-LAE/pyNA; noise-and-exposure.md §1 quotes −1.0, 0.77 and 2.0).
var arp876Omega = table1{x0: -0.45, dx: 0.05, y: []float64{
	-1.0, -0.9, -0.76, -0.58, -0.41, -0.22, 0.0, 0.22, 0.5, 0.77, 1.07,
	1.39, 1.74, 1.95, 2.0, 2.0, 2.0, 2.0, 2.0, 2.0, 2.0, 2.0,
}}

// arp876LogP is log10 of the power deviation factor P at log10(Vj/c0) =
// −0.45, −0.40, …, 0.40 (Zorumski 1982 §8.4 Table III; READ in
// MIT-LAE/pyNA; noise-and-exposure.md §1 quotes −0.13 to +0.43).
var arp876LogP = table1{x0: -0.45, dx: 0.05, y: []float64{
	-0.13, -0.13, -0.13, -0.13, -0.13, -0.13, -0.12, -0.1, -0.05, 0.0,
	0.1, 0.21, 0.32, 0.41, 0.43, 0.41, 0.31, 0.14,
}}

// arp876LogD is log10 of the directivity D: rows θi = 0°, 10°, …, 180° from
// the inlet axis, columns log10(Vj/c0) = −0.40, −0.35, …, 0.40 (Zorumski
// 1982 §8.4 Table IV; READ in MIT-LAE/pyNA,
// pyNA/data/sources/jet/directivity_function.csv).
var arp876LogD = [19][17]float64{
	{-0.48, -0.52, -0.55, -0.6, -0.63, -0.67, -0.72, -0.8, -0.86, -0.97, -1.09, -1.23, -1.34, -1.41, -1.46, -1.44, -1.37},
	{-0.46, -0.5, -0.53, -0.58, -0.61, -0.65, -0.7, -0.78, -0.84, -0.95, -1.07, -1.21, -1.32, -1.39, -1.44, -1.42, -1.35},
	{-0.43, -0.47, -0.5, -0.55, -0.58, -0.62, -0.67, -0.75, -0.81, -0.92, -1.04, -1.18, -1.29, -1.36, -1.41, -1.39, -1.32},
	{-0.39, -0.43, -0.46, -0.51, -0.55, -0.59, -0.64, -0.72, -0.8, -0.91, -1.03, -1.15, -1.27, -1.32, -1.37, -1.36, -1.3},
	{-0.37, -0.38, -0.42, -0.46, -0.51, -0.54, -0.6, -0.68, -0.77, -0.88, -1.02, -1.13, -1.23, -1.29, -1.32, -1.31, -1.26},
	{-0.34, -0.35, -0.37, -0.43, -0.48, -0.51, -0.56, -0.65, -0.74, -0.85, -1, -1.1, -1.18, -1.24, -1.27, -1.25, -1.21},
	{-0.29, -0.33, -0.33, -0.4, -0.43, -0.47, -0.51, -0.59, -0.7, -0.81, -0.97, -1.05, -1.13, -1.17, -1.2, -1.19, -1.15},
	{-0.25, -0.27, -0.29, -0.34, -0.38, -0.43, -0.47, -0.57, -0.64, -0.77, -0.91, -1, -1.05, -1.09, -1.11, -1.09, -1.05},
	{-0.21, -0.23, -0.24, -0.28, -0.32, -0.36, -0.41, -0.49, -0.57, -0.68, -0.82, -0.9, -0.96, -0.99, -1, -0.97, -0.92},
	{-0.14, -0.16, -0.19, -0.22, -0.25, -0.28, -0.33, -0.39, -0.47, -0.58, -0.69, -0.78, -0.83, -0.85, -0.85, -0.81, -0.75},
	{-0.07, -0.09, -0.1, -0.13, -0.15, -0.17, -0.21, -0.27, -0.32, -0.41, -0.53, -0.6, -0.65, -0.67, -0.64, -0.59, -0.5},
	{0.03, 0.02, 0, -0.02, -0.03, -0.04, -0.06, -0.09, -0.13, -0.2, -0.29, -0.35, -0.38, -0.36, -0.33, -0.25, -0.11},
	{0.14, 0.13, 0.13, 0.11, 0.12, 0.12, 0.13, 0.11, 0.09, 0.05, -0.01, -0.03, 0, 0.04, 0.12, 0.2, 0.31},
	{0.23, 0.24, 0.25, 0.25, 0.27, 0.29, 0.29, 0.31, 0.34, 0.32, 0.31, 0.35, 0.43, 0.52, 0.58, 0.63, 0.67},
	{0.31, 0.34, 0.35, 0.37, 0.38, 0.41, 0.44, 0.47, 0.52, 0.57, 0.6, 0.65, 0.69, 0.73, 0.74, 0.73, 0.63},
	{0.37, 0.39, 0.42, 0.45, 0.47, 0.51, 0.53, 0.58, 0.63, 0.7, 0.76, 0.77, 0.71, 0.65, 0.56, 0.49, 0.39},
	{0.4, 0.44, 0.47, 0.49, 0.51, 0.54, 0.56, 0.57, 0.61, 0.63, 0.67, 0.65, 0.58, 0.42, 0.24, 0.1, 0},
	{0.45, 0.46, 0.47, 0.51, 0.56, 0.59, 0.61, 0.56, 0.51, 0.45, 0.37, 0.35, 0.33, 0.17, 0.04, -0.11, -0.2},
	{0.45, 0.49, 0.52, 0.54, 0.56, 0.59, 0.61, 0.54, 0.46, 0.38, 0.27, 0.25, 0.23, 0.09, -0.01, -0.16, -0.25},
}

// table1 is a table of y at x0, x0+dx, …, interpolated linearly and held
// constant beyond its ends.
type table1 struct {
	x0, dx float64
	y      []float64
}

// at returns the interpolated value at x.
func (t table1) at(x float64) float64 {
	u := (x - t.x0) / t.dx
	switch {
	case !(u > 0):
		return t.y[0]
	case u >= float64(len(t.y)-1):
		return t.y[len(t.y)-1]
	}
	i := int(u)
	f := u - float64(i)
	return t.y[i]*(1-f) + t.y[i+1]*f
}

// MixingPower returns the sound power W (W) of the mixing noise of a
// single-stream jet by SAE ARP 876, for a fully expanded jet of velocity vj
// (m/s), density rhoJ (kg/m³) and area area (m²) in air of density rho0
// (kg/m³) and speed of sound c0 (m/s):
//
//	W = 6.67×10⁻⁵·ρ0·c0³·A·(ρj/ρ0)^ω·(Vj/c0)⁸·P
//
// ω and P are interpolated linearly in log10(Vj/c0) and held at the ends
// of their tables (−0.45 to 0.6 and −0.45 to 0.4); [ARP876InRange] says
// whether a velocity lies inside the tables. It assumes valid positive
// inputs (see [Jet.Validate]).
func MixingPower(vj, rhoJ, area, rho0, c0 float64) float64 {
	lv := math.Log10(vj / c0)
	omega := arp876Omega.at(lv)
	p := math.Pow(10, arp876LogP.at(lv))
	return arp876K * rho0 * c0 * c0 * c0 * area * math.Pow(rhoJ/rho0, omega) * math.Pow(vj/c0, 8) * p
}

// ARP876InRange reports whether the velocity ratio vj/c0 lies inside the
// ARP 876 directivity and power tables, 10^−0.4 ≤ Vj/c0 ≤ 10^0.4 (about
// 0.40 to 2.51), limits inclusive.
func ARP876InRange(vj, c0 float64) bool {
	lv := math.Log10(vj / c0)
	return lv >= arp876LogVMin && lv <= arp876LogVMax
}

// The table's aft lobe peaks at θi = 150° (30° from the jet axis) for
// high-subsonic jets and moves toward the axis at lower speeds: below
// Vj/c0 ≈ 0.9 its 160–180° rows hold its largest entries, without the dip
// on the axis that measurements show (Morris, Richarz & Ribner 1973). The
// lobe is flat there within about 1.5 dB, inside the wider uncertainty
// stated within 30° of the axis ([NoiseSource.Uncertainty]); stations that
// close to the axis are usually inside the plume's zones.

// MixingDirectivity returns the ARP 876 directivity factor D at the polar
// angle thetaJ (rad) from the downstream jet axis, for the velocity ratio
// vr = Vj/c0. The table is in the inlet convention, θi = 180° − θj; it is
// interpolated bilinearly and held at the ends of its velocity range.
// The mean-square pressure at distance r is p² = ρ0·c0·W·D/(4π·r²).
func MixingDirectivity(thetaJ, vr float64) float64 {
	ti := 180 - thetaJ*180/math.Pi
	ti = math.Min(math.Max(ti, 0), 180)
	u := (ti) / 10
	i := int(u)
	if i > 17 {
		i = 17
	}
	fu := u - float64(i)
	lv := math.Log10(vr)
	v := (lv - arp876LogVMin) / 0.05
	v = math.Min(math.Max(v, 0), 16)
	j := int(v)
	if j > 15 {
		j = 15
	}
	fv := v - float64(j)
	d := arp876LogD[i][j]*(1-fu)*(1-fv) + arp876LogD[i+1][j]*fu*(1-fv) +
		arp876LogD[i][j+1]*(1-fu)*fv + arp876LogD[i+1][j+1]*fu*fv
	return math.Pow(10, d)
}
