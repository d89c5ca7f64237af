package sheet

import (
	"math"

	"arcwright/internal/geometry"
	"arcwright/internal/jet"
	"arcwright/internal/planner"
)

// zoneOutline is a zone's meridian outline in the jet frame, (x, r) in m,
// from (x0, 0) along the edge to (x1, 0), r >= 0.
type zoneOutline [][2]float64

// marginOutline returns the zone bounded by out grown by its margin m
// (jet.GrowOutline, which the GeoJSON export uses too).
func marginOutline(out zoneOutline, m float64, n int) zoneOutline {
	return zoneOutline(jet.GrowOutline(out, m, n))
}

// envelopeOutline returns the envelope's outline, nil when the zone is
// empty.
func envelopeOutline(e *jet.Envelope) zoneOutline {
	if e == nil || e.Length == 0 || len(e.Points) < 2 {
		return nil
	}
	return zoneOutline(e.Points)
}

// planRing returns the zone's section in the horizontal plane through the
// axis, in cell-frame plan metres: the left side (azimuth 0) downstream,
// then the right side (azimuth π) back.
func planRing(fr geometry.JetFrame, out zoneOutline) [][2]float64 {
	ring := make([][2]float64, 0, 2*len(out))
	for _, p := range out {
		c := fr.ToCell(geometry.JetPoint{X: p[0], R: p[1]})
		ring = append(ring, [2]float64{c.X, c.Y})
	}
	for i := len(out) - 1; i >= 0; i-- {
		c := fr.ToCell(geometry.JetPoint{X: out[i][0], R: out[i][1], Azimuth: math.Pi})
		ring = append(ring, [2]float64{c.X, c.Y})
	}
	return ring
}

// sideRing returns the zone's section in the vertical plane through the
// axis as (x along the axis, height) in metres: the upper side downstream,
// then the lower side back; z0 is the axis height.
func sideRing(out zoneOutline, z0 float64) [][2]float64 {
	ring := make([][2]float64, 0, 2*len(out))
	for _, p := range out {
		ring = append(ring, [2]float64{p[0], z0 + p[1]})
	}
	for i := len(out) - 1; i >= 0; i-- {
		ring = append(ring, [2]float64{out[i][0], z0 - out[i][1]})
	}
	return ring
}

// zoneSet is what the sheet draws of the governing point's plume.
type zoneSet struct {
	vel, hot       zoneOutline // conservative envelopes
	velM, hotM     zoneOutline // grown by the margin
	core           float64     // nominal core length, m
	exitR          float64     // exit radius, m
	velLen, hotLen float64     // axial reach of the zones, m
	hotPoint       string      // the operating point whose hot zone is drawn
	// velPt and hotPt are the points whose velocity and hot zones are
	// drawn (their bent and attached zones too)
	velPt, hotPt *planner.PointResult
}

// zones returns what the sheet draws of the plume: the governing point's
// velocity zone and potential core, and the hot zone of the plan's
// GoverningHot point, the longest hot zone of the test matrix (the
// governing point is the one with the largest velocity zone, often a cold
// one).
func (b *builder) zones() zoneSet {
	return b.zoneSetOf(b.gov, &b.plan.Points[b.plan.GoverningHot])
}

// zoneSetOf returns what the sheet draws of the velocity zone and core of
// point vp and the hot zone of point hp: their conservative envelopes and
// margins.
func (b *builder) zoneSetOf(vp, hp *planner.PointResult) zoneSet {
	hot := hp.Plume.Envelope(jet.HotZone, jet.Conservative)
	vel := vp.Plume.Envelope(jet.VelocityZone, jet.Conservative)
	z := zoneSet{
		vel: envelopeOutline(vel), hot: envelopeOutline(hot),
		core: vp.CoreNominal, exitR: vp.Exit.Diameter / 2,
		velLen: vel.Length, hotLen: hot.Length, hotPoint: hp.Name,
		velPt: vp, hotPt: hp,
	}
	z.velM = marginOutline(z.vel, b.lim.Margin, 240)
	z.hotM = marginOutline(z.hot, b.lim.Margin, 240)
	return z
}
