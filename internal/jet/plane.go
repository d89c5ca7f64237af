package jet

import "math"

// PlaneJet is a turbulent plane jet from a slot of width B (m) at exit
// velocity U0 (m/s): in its two-dimensional region the centreline velocity
// falls as x^(−1/2) and the half-velocity width grows linearly,
//
//	Uc/U0 = K·sqrt(B/x),  y½ = S·x,  u/Uc = exp(−ln2·(y/y½)²)
//
// with K and S from a [Model] (PlaneK, PlaneS) and x from the virtual
// origin. A statistically plane region needs an aspect ratio of about 20 or
// more (Deo, Mi & Nathan 2007).
type PlaneJet struct {
	U0, B float64
	K, S  float64
}

// NewPlaneJet returns the plane jet of a slot under model m.
func NewPlaneJet(u0, b float64, m Model) PlaneJet {
	return PlaneJet{U0: u0, B: b, K: m.PlaneK, S: m.PlaneS}
}

// Centerline returns the centreline velocity at x (m), capped at U0, m/s.
func (j PlaneJet) Centerline(x float64) float64 {
	if x <= 0 {
		return j.U0
	}
	return j.U0 * min(1, j.K*math.Sqrt(j.B/x))
}

// HalfWidth returns the distance from the plane of symmetry where the
// velocity is half the centreline value, m.
func (j PlaneJet) HalfWidth(x float64) float64 { return j.S * max(x, 0) }

// Velocity returns the mean velocity at x (m) and distance y (m) from the
// plane of symmetry, m/s.
func (j PlaneJet) Velocity(x, y float64) float64 {
	w := j.HalfWidth(x)
	if w == 0 {
		if math.Abs(y) <= j.B/2 {
			return j.U0
		}
		return 0
	}
	return j.Centerline(x) * gaussianShape().value(math.Abs(y)/w)
}

// PlaneDecayFromSpread returns the decay constant K that conserves the
// momentum flux of a Gaussian plane jet with spreading rate s:
// K = 1/sqrt(s·sqrt(π/(2·ln2))) (derived; 2.5774 for s = 0.10, 2.4574 for
// s = 0.11).
func PlaneDecayFromSpread(s float64) float64 {
	return 1 / math.Sqrt(s*math.Sqrt(math.Pi/(2*math.Ln2)))
}
