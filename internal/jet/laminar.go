package jet

import "math"

// Laminar similarity solutions, used for jets below the transition Reynolds
// number (small bleed and leak jets; real exhausts are always turbulent).

// RoundLaminarJet is Schlichting's (1933) round laminar jet from a point
// source of kinematic momentum flux K = J/ρ = 2π∫u²r dr (m⁴/s²) in a fluid of
// kinematic viscosity Nu (m²/s):
//
//	u = um·(1 + ξ²/4)^(−2),  um = 3K/(8π·ν·x),  ξ = sqrt(3K/(16π))·r/(ν·x)
//
// x is measured from the virtual origin, m.
type RoundLaminarJet struct{ K, Nu float64 }

// Centerline returns the centreline velocity um at x > 0, m/s.
func (j RoundLaminarJet) Centerline(x float64) float64 { return 3 * j.K / (8 * math.Pi * j.Nu * x) }

// Xi returns the similarity variable ξ at (x, r).
func (j RoundLaminarJet) Xi(x, r float64) float64 {
	return math.Sqrt(3*j.K/(16*math.Pi)) * r / (j.Nu * x)
}

// Velocity returns the axial velocity at (x, r), m/s.
func (j RoundLaminarJet) Velocity(x, r float64) float64 {
	xi := j.Xi(x, r)
	return j.Centerline(x) * math.Pow(1+xi*xi/4, -2)
}

// HalfWidth returns the radius where u = um/2, m: r½ = 5.2689·ν·x/sqrt(K)
// (ξ½ = 2·sqrt(√2 − 1)).
func (j RoundLaminarJet) HalfWidth(x float64) float64 {
	return schlichtingShape(1).half * j.Nu * x / math.Sqrt(3*j.K/(16*math.Pi))
}

// PlaneLaminarJet is Bickley's (1937) plane laminar jet from a line source of
// kinematic momentum flux per unit span K = ∫u² dy (m³/s²):
//
//	u = um·sech²ξ,  um = (3K²/(32·ν·x))^(1/3),  ξ = y·(K/(48·ν²·x²))^(1/3)
type PlaneLaminarJet struct{ K, Nu float64 }

// Centerline returns um at x > 0, m/s.
func (j PlaneLaminarJet) Centerline(x float64) float64 {
	return math.Cbrt(3 * j.K * j.K / (32 * j.Nu * x))
}

// Xi returns the similarity variable ξ at (x, y).
func (j PlaneLaminarJet) Xi(x, y float64) float64 {
	return y * math.Cbrt(j.K/(48*j.Nu*j.Nu*x*x))
}

// Velocity returns the axial velocity at (x, y), m/s.
func (j PlaneLaminarJet) Velocity(x, y float64) float64 {
	s := 1 / math.Cosh(j.Xi(x, y))
	return j.Centerline(x) * s * s
}

// HalfWidth returns the distance from the plane of symmetry where u = um/2,
// m: 3.2031·(ν²x²/K)^(1/3) (ξ½ = arccosh √2).
func (j PlaneLaminarJet) HalfWidth(x float64) float64 {
	return bickleyShape(1).half / math.Cbrt(j.K/(48*j.Nu*j.Nu*x*x))
}

// laminarRoundCore is the ratio x/(Re·D) at which the Schlichting centreline
// velocity of a jet from a round nozzle with a uniform exit profile equals
// the exit velocity: um/U0 = (3/32)·Re·D/x (derived from K = (π/4)U0²D²).
const laminarRoundCore = 3.0 / 32

// laminarRoundWidth is r½/x·Re for that jet: 5.9453 (derived).
var laminarRoundWidth = schlichtingShape(1).half / math.Sqrt(3.0/64)

// laminarPlaneDecay is um/U0·(x/(Re·b))^(1/3) for a slot of width b with a
// uniform exit profile, K = U0²b: (3/32)^(1/3) = 0.45428 (derived).
var laminarPlaneDecay = math.Cbrt(3.0 / 32)
