package planner

import (
	"math"

	"arcwright/internal/jet"
)

// BentSection returns the plan section of point pt's bent zone z seen from
// above, as a meridian outline (x, r) about the jet axis's plan line, n+1
// samples: what the sheet draws and the GeoJSON writes of a bent zone. It
// covers the layer up to the ceiling of a covered cell, or outdoors up to
// 2 m above the highest microphone or the exit: a plume rising far above
// is not drawn over ground it does not reach. nil without a bent zone.
func (p *Plan) BentSection(pt *PointResult, z jet.Zone, n int) [][2]float64 {
	if pt == nil || pt.Plume == nil {
		return nil
	}
	return bentSection(pt.Plume.Bent(), z, n, p.Request.Exit.Exit.Z, p.drawnTop())
}

// drawnTop returns the top of the layer that a plan shows of a bent zone,
// m above the floor (see BentSection).
func (p *Plan) drawnTop() float64 {
	if c := p.Request.Cell.Ceiling; !math.IsInf(c, 1) && c > 0 {
		return c
	}
	top := p.Request.Exit.Exit.Z
	for _, s := range p.Stations {
		top = math.Max(top, s.Mic.Z)
	}
	return top + 2
}

// bentSection returns the plan section of a bent zone seen from above,
// up to the height top (m above the floor; z0 is the axis height), as a
// meridian outline (x, r) about the jet axis's plan line: the upper
// envelope of the discs of the zone's radius about each path point, which
// is what a tube about a path in the vertical plane of the axis covers in
// plan. n+1 samples; nil when the zone is empty.
func bentSection(bp *jet.BentPlume, z jet.Zone, n int, z0, top float64) [][2]float64 {
	if bp == nil || len(bp.Path) < 2 {
		return nil
	}
	// the section, at the top of the drawn layer, of the ball about each
	// path point: a plume rising far above the cell or the stations is
	// not drawn over the floor it does not reach
	radius := func(pt jet.BentPoint) float64 {
		r := pt.Radius(z)
		if above := z0 + pt.Z - top; above > 0 {
			r = math.Sqrt(math.Max(0, r*r-above*above))
		}
		return r
	}
	x0, x1 := math.Inf(1), math.Inf(-1)
	for _, pt := range bp.Path {
		if r := radius(pt); r > 0 {
			x0, x1 = math.Min(x0, pt.X-r), math.Max(x1, pt.X+r)
		}
	}
	if !(x1 > x0) {
		return nil
	}
	out := make([][2]float64, 0, n+1)
	for i := 0; i <= n; i++ {
		x := x0 + (x1-x0)*float64(i)/float64(n)
		r := 0.0
		if i > 0 && i < n {
			for _, pt := range bp.Path {
				rr := radius(pt)
				if d := x - pt.X; rr > math.Abs(d) {
					r = math.Max(r, math.Sqrt(rr*rr-d*d))
				}
			}
			// the chord between samples lies inside the discs' envelope:
			// raise it by the sag of the largest disc over one step
			if r > 0 {
				h := (x1 - x0) / float64(n)
				r += h * h / 8 / math.Max(r, h)
			}
		}
		out = append(out, [2]float64{x, r})
	}
	return out
}
