package sheet

import (
	"math"

	"arcwright/internal/jet"
	"arcwright/internal/planner"
)

// The zones that the free-jet envelopes do not describe: the bent zones of
// a buoyant plume (jet.BentPlume) and the zones carried on by the floor,
// the ceiling and the walls (planner.Attached). The sheet draws them for
// the drawn points, in the drawn zones' styles, cut at the boundary like
// the free zones.

// drawnZone is one of the two zones the sheet draws.
type drawnZone struct {
	p     *planner.PointResult
	zone  jet.Zone
	style Style
}

// drawn returns the velocity and hot zones of the zone set (on the sheet,
// the governing point's velocity zone and the hot point's hot zone).
func (z zoneSet) drawn() []drawnZone {
	var out []drawnZone
	if z.velPt != nil {
		out = append(out, drawnZone{z.velPt, jet.VelocityZone, StyleVelocity})
	}
	if z.hotPt != nil {
		out = append(out, drawnZone{z.hotPt, jet.HotZone, StyleHot})
	}
	return out
}

// bentPlanOutline returns the plan section of a bent zone seen from above,
// up to the height top (m above the floor; z0 is the axis height), as a
// meridian outline (x, r) about the jet axis's plan line: the upper
// envelope of the discs of the zone's radius about each path point, which
// is what a tube about a path in the vertical plane of the axis covers in
// plan. n+1 samples; nil when the zone is empty.
func bentPlanOutline(bp *jet.BentPlume, z jet.Zone, n int, z0, top float64) zoneOutline {
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
	out := make(zoneOutline, 0, n+1)
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

// bentSideRing returns the section of a bent zone in the vertical plane of
// the axis, as (x along the axis, height) in metres about the axis height
// z0: the path offset by the zone's radius on either side, normal to the
// path. nil when the zone is empty.
func bentSideRing(bp *jet.BentPlume, z jet.Zone, z0 float64) [][2]float64 {
	if bp == nil {
		return nil
	}
	var up, down [][2]float64
	for _, pt := range bp.Path {
		r := pt.Radius(z)
		if r == 0 && len(up) > 0 {
			break
		}
		s, c := math.Sincos(pt.Angle)
		up = append(up, [2]float64{pt.X - r*s, z0 + pt.Z + r*c})
		down = append(down, [2]float64{pt.X + r*s, z0 + pt.Z - r*c})
	}
	if len(up) < 2 {
		return nil
	}
	ring := up
	for i := len(down) - 1; i >= 0; i-- {
		ring = append(ring, down[i])
	}
	return ring
}

// drawnTop returns the top of the layer the plan view shows of a bent
// zone, m above the floor: the ceiling of a covered cell, else 2 m above
// the highest microphone or the exit.
func (b *builder) drawnTop() float64 {
	if c := b.req.Cell.Ceiling; !math.IsInf(c, 1) && c > 0 {
		return c
	}
	top := b.req.Exit.Exit.Z
	for _, s := range b.plan.Stations {
		top = math.Max(top, s.Mic.Z)
	}
	return top + 2
}

// drawCarried draws the bent and attached zones of the drawn points on
// the plan, cut to clip.
func (v *planView) drawCarried(z zoneSet, clip []Pt) {
	fr := v.b.req.Exit
	top := v.b.drawnTop()
	add := func(s Style, ring [][2]float64) {
		sh := poly(s, v.ringPts(ring))
		sh.Clip = clip
		v.shapes = append(v.shapes, sh)
	}
	for _, d := range z.drawn() {
		if o := bentPlanOutline(d.p.Plume.Bent(), d.zone, 240, fr.Exit.Z, top); o != nil {
			add(d.style, planRing(fr, o))
		}
		for _, a := range v.b.plan.Attached {
			if a.Point == d.p.Name && a.Zone == d.zone && !a.Solid.Footprint.IsCircle() {
				add(d.style, orbPts(a.Solid.Footprint.Ring))
			}
		}
	}
}

// carried draws the bent zones of the drawn points in the elevation, about
// the axis height z0, cut to clip; the clearance view (upper) shows the
// meridian plane of a body of revolution and leaves them out.
func (v *sideView) carried(z0 float64, upper bool, clip []Pt) {
	if upper {
		return
	}
	for _, d := range v.b.zs.drawn() {
		if ring := bentSideRing(d.p.Plume.Bent(), d.zone, z0); ring != nil {
			v.zone(d.style, ring, clip)
		}
	}
}
