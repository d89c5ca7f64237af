package jet

import "math"

// Attached zones: where a zone reaches a surface, the exhaust does not stop
// there. Along a surface parallel to the jet (the floor under a horizontal
// jet, a ceiling, a side wall) it attaches and runs on as a
// three-dimensional wall jet, which spreads sideways several times faster
// than it thickens; against a surface across the jet (an end wall) it turns
// and spreads radially over the surface as a radial wall jet. Both are
// described here as zones on the surface, with conservative constants; the
// free zone is kept as well (the checks use the union).

const (
	// wallJetLateral and wallJetNormal are the half-width growth rates of
	// a three-dimensional wall jet along the surface and away from it:
	// dy½/dx ≈ 0.26–0.32 and dz½/dx ≈ 0.04–0.05 (Launder & Rodi 1983
	// review of wall-jet data, from memory); the wide ends.
	wallJetLateral = 0.32
	wallJetNormal  = 0.05
	// radialJetThickness is the half-width of a radial wall jet over its
	// distance from the impingement point, δ½/r ≈ 0.085–0.10 (Glauert 1956;
	// Poreh, Tsuei & Cermak 1967; from memory). The thin end gives the
	// faster, farther-reaching layer for the same momentum.
	radialJetThickness = 0.085
)

// radialJetVelocity and radialJetScalar are the decay constants of the
// peak velocity and excess temperature of the radial wall jet of a round
// jet, Um/Uj = Cu·D_eff/r and ΔTm/ΔT0 = Cθ·D_eff/r (derived from the
// momentum and enthalpy fluxes of the arriving jet, Gaussian profiles away
// from the surface with δ½ = 0.085 r and the thermal layer λ times
// thicker: Cu = 1/sqrt(8·0.085·c_uu), c_uu = ∫exp(−2ln2·η²)dη).
var (
	radialJetVelocity = func() float64 {
		cuu := 0.5 * math.Sqrt(math.Pi/(2*math.Ln2))
		return 1 / math.Sqrt(8*radialJetThickness*cuu)
	}()
)

func radialJetScalar(lambda float64) float64 {
	cut := 0.5 * math.Sqrt(math.Pi/(math.Ln2*(1+1/(lambda*lambda))))
	return 1 / (8 * radialJetVelocity * radialJetThickness * cut)
}

// WallJet is a zone carried along a surface parallel to the jet axis. It
// runs from where the zone reaches the surface to where its peak value
// falls to the limit; X, Span and Depth are samples of the axial distance
// from the exit (m), the half-width of the zone along the surface across
// the jet (m) and its thickness away from the surface (m).
type WallJet struct {
	Zone              Zone
	X, Span, Depth    []float64
	MaxSpan, MaxDepth float64
	Start, End        float64
}

// wallJetSamples is the number of intervals of a wall jet's samples.
const wallJetSamples = 32

// WallJet returns zone z carried along a surface parallel to the axis
// from start (m, jet frame), where the conservative zone reaches it. The
// peak value decays no faster than the conservative free jet's centreline
// (a wall jet keeps its momentum near the surface: from momentum alone
// with the growth rates above its peak would fall as 4.65·D_eff·Uj/(x − x0),
// derived, faster than the free jet's 6.2); its widths grow from the free
// jet's virtual origin at the wide ends of the scatter, times the tail
// factor. The zone has no samples when start is past its end.
func (p *Plume) WallJet(z Zone, start float64) WallJet {
	f := &p.cons
	w := WallJet{Zone: z, Start: start}
	eps, peak := p.peak(z)
	env := p.Envelope(z, Conservative)
	end := env.Length
	w.End = end
	if !(start < end) || eps <= 0 {
		return w
	}
	scale := 1.0
	if z == HotZone {
		scale = f.lambda
	}
	for i := 0; i <= wallJetSamples; i++ {
		x := start + (end-start)*float64(i)/wallJetSamples
		v := peak(x)
		g := 0.0
		if v > eps {
			g = math.Sqrt(math.Log(v/eps) / math.Ln2)
		}
		run := math.Max(x-f.x0, 0)
		span := math.Max(f.m.Tail*scale*wallJetLateral*run*g, env.Radius(x))
		depth := f.m.Tail * scale * wallJetNormal * run * g
		w.X = append(w.X, x)
		w.Span = append(w.Span, span)
		w.Depth = append(w.Depth, depth)
		w.MaxSpan = math.Max(w.MaxSpan, span)
		w.MaxDepth = math.Max(w.MaxDepth, depth)
	}
	return w
}

// peak returns the zone's threshold as a fraction of the exit value and
// the conservative centreline value as a fraction of it at x.
func (p *Plume) peak(z Zone) (eps float64, peak func(float64) float64) {
	f := &p.cons
	if z == HotZone {
		if f.dT0 <= 0 {
			return 0, nil
		}
		return (p.limits.Temperature - p.cond.Ambient.Temperature) / f.dT0, f.thetac
	}
	return p.limits.Velocity / f.uj, func(x float64) float64 { return f.uc(x) / f.uj }
}

// RadialJet is a zone spread over a surface across the jet: a disc of
// Radius (m) about the point where the axis meets the surface, Depth (m)
// thick at most.
type RadialJet struct {
	Zone          Zone
	Radius, Depth float64
}

// RadialJet returns zone z spread over a surface across the axis at x (m,
// jet frame): the radial wall jet of the arriving jet (Glauert 1956; the
// decay constants derived above from its fluxes), never smaller than the
// conservative free zone's radius at x. Its thickness is the largest of
// tail·δ½·sqrt(ln(peak/limit)/ln2) over the disc, 0.0504·tail·r_zone at
// r = r_zone·e^(−1/2) (derived), and never less than the free zone's
// radius there.
func (p *Plume) RadialJet(z Zone, x float64) RadialJet {
	f := &p.cons
	rj := RadialJet{Zone: z}
	eps, _ := p.peak(z)
	if eps <= 0 || eps >= 1 {
		return rj
	}
	c := radialJetVelocity
	scale := 1.0
	if z == HotZone {
		c = radialJetScalar(f.lambda)
		scale = f.lambda
	}
	reach := c * f.de / eps
	free := p.Envelope(z, Conservative).Radius(x)
	rj.Radius = math.Max(f.m.Tail*reach, free)
	rj.Depth = math.Max(f.m.Tail*scale*radialJetThickness*reach*math.Exp(-0.5)*math.Sqrt(0.5/math.Ln2), free)
	return rj
}
