package jet

import "math"

// shape is a radial profile f(η) = value/centreline value, with η the
// distance outside the potential core divided by the half-value width, so
// that f(0) = 1 and f(1) = 1/2. Each shape can be inverted exactly.
type shape struct {
	kind shapeKind
	// p is the exponent of the scalar form of a laminar profile: 1 for
	// velocity, the Prandtl number for temperature.
	p float64
	// half is the similarity variable at the half-value point.
	half float64
}

type shapeKind int

const (
	gaussian    shapeKind = iota + 1 // exp(−ln2·η²): turbulent round jets (Albertson et al. 1950)
	schlichting                      // (1 + ξ²/4)^(−2p): laminar round jet (Schlichting 1933)
	bickley                          // sech^(2p)(ξ): laminar plane jet (Bickley 1937)
)

func gaussianShape() shape { return shape{kind: gaussian, p: 1, half: 1} }

// schlichtingShape returns the round laminar profile with exponent p; the
// half-value point is ξ½ = 2·sqrt(2^(1/(2p)) − 1) (1.28719 for p = 1).
func schlichtingShape(p float64) shape {
	return shape{kind: schlichting, p: p, half: 2 * math.Sqrt(math.Pow(2, 1/(2*p))-1)}
}

// bickleyShape returns the plane laminar profile with exponent p; the
// half-value point is ξ½ = arccosh(2^(1/(2p))) (arccosh √2 = 0.88137 for p = 1).
func bickleyShape(p float64) shape {
	return shape{kind: bickley, p: p, half: math.Acosh(math.Pow(2, 1/(2*p)))}
}

// value returns f(η) for η ≥ 0.
func (s shape) value(eta float64) float64 {
	switch s.kind {
	case schlichting:
		xi := s.half * eta
		return math.Pow(1+xi*xi/4, -2*s.p)
	case bickley:
		return math.Pow(1/math.Cosh(s.half*eta), 2*s.p)
	}
	return math.Exp(-math.Ln2 * eta * eta)
}

// inverse returns η ≥ 0 such that f(η) = v, for 0 < v ≤ 1; +Inf for v ≤ 0
// and 0 for v ≥ 1.
func (s shape) inverse(v float64) float64 {
	switch {
	case v >= 1:
		return 0
	case v <= 0:
		return math.Inf(1)
	}
	switch s.kind {
	case schlichting:
		return 2 * math.Sqrt(math.Pow(v, -1/(2*s.p))-1) / s.half
	case bickley:
		return math.Acosh(math.Pow(v, -1/(2*s.p))) / s.half
	}
	return math.Sqrt(-math.Log(v) * (1 / math.Ln2))
}

// gaussianVorticityThickness is the vorticity thickness of a Gaussian
// shoulder, in half-value widths: δω = u_max/|du/dy|max = sqrt(2e/ln2)·… =
// 1.40027 (derived: the steepest slope of exp(−ln2·η²) is at η = 1/sqrt(2 ln2)).
var gaussianVorticityThickness = 1 / (math.Sqrt(2*math.Ln2) * math.Exp(-0.5))
