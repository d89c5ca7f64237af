package jet

import (
	"math"
	"sort"
)

// Bent plumes: the trajectory of a buoyant jet from an integral model.
//
// The model is the top-hat integral buoyant-jet model of Morton, Taylor &
// Turner (1956) extended to a jet of any direction in a still ambient
// (Fan 1967; Lee & Chu 2003), without the Boussinesq approximation: along
// the path s, with b the top-hat radius, V the velocity, ρ the density and
// φ the angle of the path above the horizontal,
//
//	d(ρVb²)/ds      = 2α·b·V·sqrt(ρ·ρa)         entrainment (Ricou & Spalding 1961 density form)
//	d(ρV²b²cosφ)/ds = 0                          horizontal momentum
//	d(ρV²b²sinφ)/ds = (ρa − ρ)·g·b²              vertical momentum: buoyancy
//	ρVb²·ΔT         = const                       excess enthalpy (constant cp)
//	ρ = pa/(R·(Ta + ΔT))                          ideal gas at ambient pressure
//
// (all fluxes divided by π). The entrainment coefficient is α = 0.08, the
// top-hat value that reproduces Ricou & Spalding's (1961) jet entrainment
// ṁ/ṁ0 = 0.32·sqrt(ρa/ρj)·x/D (4α = 0.32, derived); plumes entrain more,
// α ≈ 0.12 top-hat (Fischer et al. 1979 Gaussian 0.083·√2, from memory).
// The smaller value dilutes the plume least and keeps its zones longest;
// the trajectory's scatter with α is stated in [BentTrajectoryScatter].
//
// The top-hat state is turned into Gaussian profiles of the same mass and
// momentum flux (derived): centreline velocity 2V, e-folding radius b/√2,
// and a thermal profile λ times wider whose centreline excess is
// ΔT·(1+λ²)/λ² (same enthalpy flux). The zones about the bent path are the
// radii where those profiles fall to the limits, times the conservative
// model's tail factor.

const (
	// bentAlpha is the top-hat entrainment coefficient of the path and of
	// the centreline values (see above); bentAlphaPlume, the plume value,
	// sets the width of the zones about the path (the wide end).
	bentAlpha      = 0.08
	bentAlphaPlume = 0.12
	// BentTrajectoryScatter is the relative scatter of the rise of a bent
	// plume at a given distance, from the range of entrainment
	// coefficients between jets and plumes (α 0.08–0.12 top-hat) and the
	// scatter of measured trajectories (SUGGESTION: about ±30 %).
	// The zones about the path are widened by this fraction of the path's
	// height above the axis.
	BentTrajectoryScatter = 0.3
	// bentStep is the integration step as a fraction of the top-hat
	// radius (RK4; the state changes by about 6 % a step, and the
	// fourth-order error stays below 1e-5 of the state: the flux test
	// checks conservation to 1e-6).
	bentStep = 0.8
	// bentMaxSteps bounds the integration.
	bentMaxSteps = 20000
	// bentSamples is the number of path points kept, evenly in path
	// distance, where nothing else asks for one; bentTurn (rad) and
	// bentGrowth (a fraction of the radius) add points where the path turns
	// or the zones grow (see thinPath).
	bentSamples = 100
	bentTurn    = 2 * math.Pi / 180
	bentGrowth  = 0.1
)

// BentPoint is one point of a bent plume's path, in the vertical plane
// through the jet axis: X along the (horizontal) jet axis from the exit
// plane, Z up from the axis, S the distance along the path, all m; Uc and
// DTc the Gaussian centreline velocity (m/s) and excess total temperature
// (K); Width the Gaussian e-folding radius of the velocity profile, m.
type BentPoint struct {
	X, Z, S    float64
	Uc, DTc    float64
	Width      float64
	Angle      float64 // of the path above the horizontal, rad
	RVel, RHot float64 // radii of the velocity and hot zones about the path, m (0 past them)
}

// BentPlume is the path of a buoyant jet that rises (or sinks) away from
// its straight axis, with its zones. Build it with [Plume.Bent].
type BentPlume struct {
	// Path holds the path from the exit to where both zones have ended (or
	// the integration stopped), with X increasing.
	Path []BentPoint
	// Tolerance bounds, m, how far the straight segments of the path and
	// the linear radii between its points may lie inside the exact zone;
	// Clearance subtracts it.
	Tolerance float64
	// VelocityLength and HotLength are the path distances where the zones
	// end, m (0: no zone).
	VelocityLength, HotLength float64
}

// Bent returns the bent-plume prediction for a jet whose zones reach past
// the onset of buoyancy (the FlagBuoyant regime), nil otherwise. The jet
// axis is taken as horizontal; Z is up.
func (p *Plume) Bent() *BentPlume { return p.bent }

// buildBent integrates the trajectory. It is called only for buoyant jets.
func (p *Plume) buildBent() {
	e := p.exit
	a := p.cond.Ambient
	lim := p.limits
	g := Gravity
	air := Air()
	dT0 := e.TotalTemperature - a.Temperature
	rhoA := a.Pressure / (air.R * a.Temperature)
	// state y = (Q, Mx, Mz, X, Z): mass flux/π (kg/s), momentum fluxes/π (N),
	// position (m); the enthalpy flux Q·ΔT = Q0·ΔT0 and the jet gas's mass
	// flux Q·Y = Q0 are constant
	q0 := e.MassFlow / math.Pi
	// density at mass flux q and excess temperature dT: the jet gas's mass
	// fraction q0/q sets the gas constant (a light gas rises unheated); the
	// temperature is the total one, as the jet's kinetic energy returns as
	// heat when it slows (at the exit this makes the jet a little lighter
	// than its static state, erring toward more rise)
	density := func(q, dT float64) float64 {
		r := air.R + q0/q*(e.Gas.R-air.R)
		return a.Pressure / (r * (a.Temperature + dT))
	}
	// the jet's momentum flux is its thrust (with the pressure thrust of an
	// imperfectly expanded exit); its density that of the mixed gas
	m0 := e.Thrust / math.Pi
	h0 := q0 * dT0
	type state [5]float64
	decode := func(y state) (b, v, rho, dT, phi float64) {
		q, mx, mz := y[0], y[1], y[2]
		m := math.Hypot(mx, mz)
		v = m / q
		dT = h0 / q
		rho = density(q, dT)
		b = math.Sqrt(q / (rho * v))
		return b, v, rho, dT, math.Atan2(mz, mx)
	}
	deriv := func(y state) state {
		q, mx, mz := y[0], y[1], y[2]
		m := math.Hypot(mx, mz)
		v := m / q
		rho := density(q, h0/q)
		b2 := q / (rho * v)
		return state{
			2 * bentAlpha * math.Sqrt(b2) * v * math.Sqrt(rho*rhoA),
			0,
			(rhoA - rho) * g * b2,
			mx / m,
			mz / m,
		}
	}
	tail := p.cons.m.Tail
	lambda := p.cons.m.Lambda
	dTLim := lim.Temperature - a.Temperature
	velEnv, hotEnv := p.Envelope(VelocityZone, Conservative), p.Envelope(HotZone, Conservative)
	point := func(y state, s float64) BentPoint {
		b, v, _, dT, phi := decode(y)
		bg := b / math.Sqrt2
		pt := BentPoint{X: y[3], Z: y[4], S: s, Uc: 2 * v, DTc: dT * (1 + lambda*lambda) / (lambda * lambda), Width: bg, Angle: phi}
		// the zone's radius: the centreline values of the jet's entrainment
		// (the least diluted), widened toward the plume's width as the path
		// turns up, plus the scatter of the path's rise, and never less than the
		// conservative straight zone at the same distance along the path
		w := bg * plumeWidening(phi)
		drift := BentTrajectoryScatter * math.Abs(pt.Z)
		if pt.Uc > lim.Velocity {
			pt.RVel = tail*w*math.Sqrt(math.Log(pt.Uc/lim.Velocity)) + drift
		}
		if dTLim > 0 && pt.DTc > dTLim {
			pt.RHot = tail*lambda*w*math.Sqrt(math.Log(pt.DTc/dTLim)) + drift
		}
		pt.RVel = math.Max(pt.RVel, velEnv.outlineRadius(s))
		pt.RHot = math.Max(pt.RHot, hotEnv.outlineRadius(s))
		return pt
	}
	y := state{q0, m0, 0, 0, 0}
	s := 0.0
	var all []BentPoint
	all = append(all, point(y, 0))
	for i := 0; i < bentMaxSteps; i++ {
		b, _, _, _, _ := decode(y)
		h := bentStep * b
		k1 := deriv(y)
		k2 := deriv(addScaled(y, k1, h/2))
		k3 := deriv(addScaled(y, k2, h/2))
		k4 := deriv(addScaled(y, k3, h))
		for j := range y {
			y[j] += h / 6 * (k1[j] + 2*k2[j] + 2*k3[j] + k4[j])
		}
		s += h
		pt := point(y, s)
		all = append(all, pt)
		if pt.RVel == 0 && pt.RHot == 0 {
			break
		}
	}
	bp := &BentPlume{}
	for _, pt := range all {
		if pt.RVel > 0 {
			bp.VelocityLength = pt.S
		}
		if pt.RHot > 0 {
			bp.HotLength = pt.S
		}
	}
	bp.Path = thinPath(all, bentSamples)
	bp.Tolerance = pathTolerance(all, bp.Path)
	p.bent = bp
}

// addScaled returns y + h·k.
func addScaled[T ~[5]float64](y, k T, h float64) T {
	for i := range y {
		y[i] += h * k[i]
	}
	return y
}

// thinPath keeps the points of the path needed to draw it and its zones:
// a point whenever the path has turned by bentTurn, a zone's radius has
// changed by bentGrowth of itself, a zone has ended, or 1/n of the path's
// length has passed since the last kept point; and the last point.
func thinPath(all []BentPoint, n int) []BentPoint {
	if len(all) <= 2 {
		return all
	}
	end := all[len(all)-1].S
	out := []BentPoint{all[0]}
	for i := 1; i < len(all)-1; i++ {
		last, pt := out[len(out)-1], all[i]
		changed := func(a, b float64) bool {
			return (a == 0) != (b == 0) || math.Abs(a-b) > bentGrowth*math.Max(a, b)
		}
		if math.Abs(pt.Angle-last.Angle) >= bentTurn || changed(last.RVel, pt.RVel) || changed(last.RHot, pt.RHot) ||
			pt.S-last.S >= end/float64(n) {
			out = append(out, pt)
		}
	}
	return append(out, all[len(all)-1])
}

// pathTolerance bounds how far the kept path's chords and interpolated
// radii lie inside the integrated zone: the largest amount by which an
// integrated point's zone reaches beyond the kept segment's tube there.
func pathTolerance(all, kept []BentPoint) float64 {
	tol := 0.0
	for _, pt := range all {
		i := sort.Search(len(kept), func(i int) bool { return kept[i].S >= pt.S })
		if i == 0 || i >= len(kept) {
			continue
		}
		a, b := kept[i-1], kept[i]
		d := math.Sqrt(segmentDistanceSquared(pt.X, pt.Z, [2]float64{a.X, a.Z}, [2]float64{b.X, b.Z}))
		// each zone against its own tube: a peak of one zone between kept
		// points must not hide behind the other zone's radius
		for _, z := range []Zone{VelocityZone, HotZone} {
			if r := pt.Radius(z); r > 0 {
				tol = math.Max(tol, d+r-math.Max(a.Radius(z), b.Radius(z)))
			}
		}
	}
	return math.Max(0, tol)
}

// Clearance returns the distance (m) from a point to the bent zone z, less
// the Tolerance: positive outside, negative inside; +Inf when the zone is
// empty. The point is given by its jet-frame axial distance x, its height
// above the jet axis v and its horizontal distance from the vertical plane
// of the axis l (m). Each path segment's zone is taken as the tube of the
// larger radius of its two ends, which only errs toward a smaller
// clearance.
func (bp *BentPlume) Clearance(z Zone, x, v, l float64) float64 {
	if bp == nil || len(bp.Path) < 2 {
		return math.Inf(1)
	}
	l2 := l * l
	// a first bound from every fourth vertex (the distance to a vertex,
	// less its radius, is never less than the clearance of the segments
	// that end there), so that the bounding-box test below prunes from the
	// start
	best := math.Inf(1)
	for i := 0; i < len(bp.Path); i += 4 {
		pt := &bp.Path[i]
		if r := pt.Radius(z); r > 0 {
			dx, dv := x-pt.X, v-pt.Z
			best = min(best, math.Sqrt(dx*dx+dv*dv+l2)-r)
		}
	}
	for i := 1; i < len(bp.Path); i++ {
		a, b := &bp.Path[i-1], &bp.Path[i]
		ra, rb := a.RVel, b.RVel
		if z == HotZone {
			ra, rb = a.RHot, b.RHot
		}
		r := max(ra, rb)
		if r == 0 {
			continue
		}
		// the distance to the segment's bounding box bounds the distance
		// to the segment from below: skip segments that cannot win
		dx := max(0, min(a.X, b.X)-x, x-max(a.X, b.X))
		dv := max(0, min(a.Z, b.Z)-v, v-max(a.Z, b.Z))
		if lim := best + r; lim > 0 && dx*dx+dv*dv+l2 > lim*lim {
			continue
		}
		d := math.Sqrt(segmentDistanceSquared(x, v, [2]float64{a.X, a.Z}, [2]float64{b.X, b.Z}) + l2)
		best = min(best, d-r)
	}
	if math.IsInf(best, 1) {
		return best
	}
	return best - bp.Tolerance
}

// Radius returns the radius of zone z at path point i, m.
func (pt BentPoint) Radius(z Zone) float64 {
	if z == HotZone {
		return pt.RHot
	}
	return pt.RVel
}

// finite returns an error when a number of the path is not finite.
func (bp *BentPlume) finite() error {
	for _, pt := range bp.Path {
		for _, v := range []float64{pt.X, pt.Z, pt.S, pt.Uc, pt.DTc, pt.Width, pt.RVel, pt.RHot} {
			if bad(v) {
				return &InputError{Field: "operating point", Reason: "gives a bent-plume path that is not finite: the inputs are outside what the plume model can compute"}
			}
		}
	}
	if bad(bp.Tolerance) {
		return &InputError{Field: "operating point", Reason: "gives a bent-plume path that is not finite"}
	}
	return nil
}

// BentEdge returns the radius about the bent path at pt where the mean
// velocity falls to the fraction frac of its value on the path, m: the
// Gaussian of the plume's entrainment width, times the tail factor of the
// conservative model (1.15).
func BentEdge(pt BentPoint, frac float64) float64 {
	if !(frac > 0 && frac < 1) {
		return 0
	}
	return ConservativeModel().Tail * pt.Width * plumeWidening(pt.Angle) * math.Sqrt(-math.Log(frac))
}

// plumeWidening returns the factor on the jet-entrainment width of the
// zones about the path at a path angle phi (rad above the horizontal):
// 1 where the flow runs level and is still jet-like, rising to the ratio
// of the plume and jet entrainment coefficients (0.12/0.08) where it rises
// vertically as a plume, with |sin φ| between (SUGGESTION, after the
// angle-blended entrainment of Priestley & Ball 1955, from memory).
func plumeWidening(phi float64) float64 {
	return 1 + (bentAlphaPlume/bentAlpha-1)*math.Abs(math.Sin(phi))
}
