package jet

import "math"

const (
	// buoyancyOnset is the Chen & Rodi (1980) limit of the momentum-dominated
	// region, x_b = Fr^(−1/2)·(ρj/ρa)^(−1/4)·x/D < 0.53 (as quoted by
	// Papanikolaou et al. 2012, Eqs. 3–4).
	buoyancyOnset = 0.53
	// buoyantRiseCoefficient gives the rise of a horizontal buoyant jet in
	// its jet-like zone, z/L_M ≈ 0.058·(x/L_M)³ (derived in the project's
	// reference sheet from vertical momentum gained by buoyancy, Gaussian
	// profile, λ = 1.2 and Uc = 7.0·M0^½/x; not a published constant).
	buoyantRiseCoefficient = 0.058
)

// Buoyancy describes how gravity bends a jet whose density differs from the
// ambient's.
type Buoyancy struct {
	// ReducedGravity is g·(ρa − ρj)/ρa, m/s²: positive for a light (hot) jet
	// that rises, negative for a dense one that sinks.
	ReducedGravity float64
	// MomentumLength is L_M = M0^(3/4)/B0^(1/2), m, with M0 = (ρj/ρa)·Uj²·A
	// and B0 = |g′|·Uj·A (Fischer et al. 1979); +Inf for a neutral jet.
	MomentumLength float64
	// Onset is the axial distance where x_b = 0.53, m: beyond it the jet is
	// no longer momentum-dominated (Chen & Rodi 1980); x_b = (π/4)^(1/4)·x/L_M.
	Onset float64
}

// buoyancyOf returns the buoyancy of a jet of velocity uj (m/s) and fully
// expanded area area (m²): dr is the density ratio ρj/ρa of the fully
// expanded jet, which sets its momentum flux, and br the density ratio that
// sets its buoyancy, that of the jet gas at its total temperature against
// the ambient (as the jet slows, its kinetic energy returns as heat, so an
// unheated jet with T0 = Ta carries no buoyancy however cold its static
// temperature).
func buoyancyOf(dr, br, uj, area float64) Buoyancy {
	gp := Gravity * (1 - br)
	b := Buoyancy{ReducedGravity: gp, MomentumLength: math.Inf(1), Onset: math.Inf(1)}
	if gp == 0 || uj <= 0 {
		return b
	}
	m0 := dr * uj * uj * area
	b0 := math.Abs(gp) * uj * area
	b.MomentumLength = math.Pow(m0, 0.75) / math.Sqrt(b0)
	b.Onset = buoyancyOnset * b.MomentumLength / math.Pow(math.Pi/4, 0.25)
	return b
}

// Rise returns the vertical displacement of the jet axis at x (m), upward
// positive, from the jet-like bending law z = 0.058·L_M·(x/L_M)³. The law
// is derived for the jet-like zone, x ≲ L_M; continued beyond it, it stays
// within about 10 % of the integral model of [Plume.Bent] up to 5 L_M
// (checked in the tests), where a rising plume turns vertical and the law
// no longer describes it: use [Plume.Bent] for the path.
func (b Buoyancy) Rise(x float64) float64 {
	if math.IsInf(b.MomentumLength, 1) || x <= 0 {
		return 0
	}
	l := b.MomentumLength
	sign := 1.0
	if b.ReducedGravity < 0 {
		sign = -1
	}
	return sign * buoyantRiseCoefficient * l * math.Pow(x/l, 3)
}
