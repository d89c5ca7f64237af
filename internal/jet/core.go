package jet

import "math"

// Initial-region correlations: potential core and mixing layer.

const (
	// lauA and lauB are Lau, Morris & Fisher's (1979) potential-core length
	// Lc/Dj = 4.2 + 1.1·Mj² for unheated round jets (J. Fluid Mech.
	// 93(1):1–27; constants from memory).
	lauA, lauB = 4.2, 1.1
	// lauMachMin and lauMachMax bound the Mach numbers of Lau's data
	// (about 0.28–1.37, from memory).
	lauMachMin, lauMachMax = 0.28, 1.37
	// witzeDensityExponent is the density-ratio exponent of Witze's (1974)
	// spreading parameter κ ∝ (ρj/ρ∞)^(−0.22) (AIAA J. 12(4):417–418, as
	// given by Franquet et al. 2015 Eqs. 56–57); with the density entering
	// only through κ the core scales as (ρj/ρ∞)^0.22.
	witzeDensityExponent = 0.22
	// densityRatioMin and densityRatioMax bound the density ratios for which
	// the Thring–Newby effective diameter collapses decay data (1/4–4,
	// Fischer et al. 1979 via a public note, common practice).
	densityRatioMin, densityRatioMax = 0.25, 4
)

// LauCoreLength returns the potential-core length of an unheated round jet
// in fully expanded diameters, Lc/Dj = 4.2 + 1.1·Mj² (Lau, Morris & Fisher
// 1979).
func LauCoreLength(mj float64) float64 { return lauA + lauB*mj*mj }

// HeatingFactor returns the factor by which heating changes the core length
// of a jet at fully expanded Mach number mj and density ratio ρj/ρa =
// densityRatio, relative to an unheated jet (T0 = Ta) at the same Mach
// number: (ρr/ρr,unheated)^0.22 with ρr,unheated = 1 + (γ−1)/2·Mj² (Witze
// 1974 density exponent). Below 1 for heated jets, above 1 for chilled ones.
func HeatingFactor(mj, densityRatio, gamma float64) float64 {
	unheated := 1 + (gamma-1)/2*mj*mj
	return math.Pow(densityRatio/unheated, witzeDensityExponent)
}

// GrowthReduction returns the compressibility reduction Φ(Mc) of
// mixing-layer growth, δ'/δ'_incompressible = 0.8·exp(−3·Mc²) + 0.2: the
// Dimotakis (1991) fit to the Papamoschou & Roshko (1988) data.
func GrowthReduction(mc float64) float64 { return 0.8*math.Exp(-3*mc*mc) + 0.2 }

// MixingLayerGrowth returns dδω/dx, the growth of the vorticity thickness of
// the mixing layer between a jet and still air: (C/2)·(1 + sqrt(s))·Φ(Mc),
// with C the equal-density single-stream rate, s = ρa/ρj the density ratio
// of the slow to the fast side and Mc the convective Mach number (Brown &
// Roshko 1974 form with the velocity ratio 0; Papamoschou & Roshko 1988).
func MixingLayerGrowth(c, s, mc float64) float64 {
	return c / 2 * (1 + math.Sqrt(s)) * GrowthReduction(mc)
}

// MixingLayer describes the annular mixing layer around the potential core
// at one axial station.
type MixingLayer struct {
	X                  float64 // axial distance, m
	Inner              float64 // radius of the potential core (u = Uj), m; 0 past the core
	Outer              float64 // radius where u falls to 1 % of the centreline velocity, m
	VorticityThickness float64 // Uc/|du/dr|max, m
}
