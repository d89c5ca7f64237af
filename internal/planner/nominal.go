package planner

import "math"

// NominalRadius returns the radius the layout asks for station s, m: the
// arc's radius about its centre (the automatic one when chosen) or the
// ring's radius about the axis; NaN for lines, points, probes and a station
// of no array of p. The station's Radius is the as-placed value, the true
// distance of its microphone from the array's centre, which differs from
// the nominal one where the microphone is not in the arc's plane (a ground
// microphone below an arc centred on the axis).
func (p *Plan) NominalRadius(s *Station) float64 {
	if s.Kind != Arc && s.Kind != Ring {
		return math.NaN()
	}
	for i := range p.Arrays {
		if p.Arrays[i].Name == s.Array {
			return p.Arrays[i].Radius
		}
	}
	return math.NaN()
}
