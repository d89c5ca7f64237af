package sheet

import (
	"math"

	"arcwright/internal/jet"
	"arcwright/internal/planner"
)

// The zones that the free-jet envelopes do not describe: the bent zones of
// a buoyant plume (jet.BentPlume) and the zones carried on by the floor,
// the ceiling and the walls (planner.Attached). The sheet draws them for
// the drawn points, in the drawn zones' styles, cut at the walls like
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

// drawCarried draws the bent and attached zones of the drawn points on
// the plan, cut to clip.
func (v *planView) drawCarried(z zoneSet, clip []Pt) {
	fr := v.b.req.Exit
	add := func(s Style, ring [][2]float64) {
		sh := poly(s, v.ringPts(ring))
		sh.Clip = clip
		v.shapes = append(v.shapes, sh)
	}
	for _, d := range z.drawn() {
		if o := v.b.plan.BentSection(d.p, d.zone, 240); o != nil {
			add(d.style, planRing(fr, zoneOutline(o)))
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
// meridian plane of a body of revolution and leaves them out (it rings
// the stations they block instead).
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
