package planner

import "math"

// NominalRadius returns the radius the layout asks for station s, m, in
// the quantity its array is laid out by: an arc's radius about its centre
// in the arc's own plane (the automatic one when chosen), a ring's radius
// about the axis, a line's offset from the axis, a near-field line's
// clearance from the predicted plume edge; NaN for points, probes and a
// station of no array of p. [Plan.PlacedRadius] is the same quantity as
// placed, so that the two compare; the station's Radius is its distance in
// space from the point its polar angle is seen from, the distance the
// checks use, which is another quantity (a ring's microphone 0.9 m from the
// axis is 1.7 m from the exit).
func (p *Plan) NominalRadius(s *Station) float64 {
	a := p.array(s)
	if a == nil {
		return math.NaN()
	}
	switch s.Kind {
	case Arc, Ring, Line, NearField:
		return a.Radius
	}
	return math.NaN()
}

// PlacedRadius returns the quantity NominalRadius gives for station s as the
// microphone is placed, m: for an arc, its distance from the centre in the
// arc's plane (in plan for an arc set out in plan: horizontal at a height,
// or flush on the floor); for a ring, its distance from the axis; for a
// line, its offset from the axis (in plan for a line set out in plan); for
// a near-field line, its clearance from the predicted plume edge, measured
// square to the edge. NaN where NominalRadius is. A station placed where the
// layout asks has PlacedRadius equal to NominalRadius; an as-built one shows
// how far it is off.
func (p *Plan) PlacedRadius(s *Station) float64 {
	a := p.array(s)
	if a == nil {
		return math.NaN()
	}
	dx, lat := p.inPlane(a, s)
	switch s.Kind {
	case Arc:
		return math.Hypot(dx, lat)
	case Ring:
		return s.Jet.R
	case Line:
		return lat
	case NearField:
		return (lat - a.edge.at(s.Jet.X)) * math.Cos(math.Atan(a.edge.slope))
	}
	return math.NaN()
}

// PlacedPolar returns station s's polar angle as placed, in the layout's
// convention, rad, in the quantity its nominal one (Station.Nominal) is
// given in: for an arc or a polar-stepped line, seen from the centre in the
// array's own plane (in plan for one set out in plan); otherwise the
// station's Polar. A station placed where the layout asks has PlacedPolar
// equal to Nominal.
func (p *Plan) PlacedPolar(s *Station) float64 {
	a := p.array(s)
	if a == nil || !(s.Kind == Arc || s.Kind == Line && a.Spec.Spacing == 0) {
		return s.Polar
	}
	dx, lat := p.inPlane(a, s)
	return p.Request.Convention.FromDownstream(math.Atan2(lat, dx))
}

// array returns the result of station s's array, nil if p has none.
func (p *Plan) array(s *Station) *ArrayResult {
	for i := range p.Arrays {
		if p.Arrays[i].Name == s.Array {
			return &p.Arrays[i]
		}
	}
	return nil
}

// inPlane returns station s in its array's own plane, m: dx along the axis
// from the point the array is seen from (the centre of an arc or a
// polar-stepped line, the nozzle exit otherwise) and lat its distance from
// the axis in that plane — in plan for an array set out in plan (horizontal
// at a height, or flush on the floor), else in space.
func (p *Plan) inPlane(a *ArrayResult, s *Station) (dx, lat float64) {
	cx := p.Request.Exit.ToJet(seenFrom(p.Request, &a.Spec)).X
	dx, lat = s.Jet.X-cx, s.Jet.R
	if a.Spec.HasHeight || a.Spec.Stand == "" {
		lat = math.Abs(s.Jet.R * math.Cos(s.Jet.Azimuth))
	}
	return dx, lat
}
