package sheet

import (
	"math"
	"sort"

	"arcwright/internal/geometry"
	"arcwright/internal/jet"
)

// zoneOutline is a zone's meridian outline in the jet frame, (x, r) in m,
// from (x0, 0) along the edge to (x1, 0), r >= 0.
type zoneOutline [][2]float64

// marginOutline returns the outline of the region within m (m > 0, metres)
// of the zone bounded by out (a meridian outline from the axis to the axis),
// that is the zone grown by its margin: the upper envelope of discs of
// radius m centred on the outline, sampled at n+1 axial stations from
// x0 − m to x1 + m. The outline is first divided so that its points are at
// most s = m/4 apart; a disc centred between two of them lies at most
// e = m − sqrt(m² − (s/2)²) = 0.0078·m above their discs' envelope
// (derived), and every radius is raised by e, so that the drawn band is
// never inside the exact one and at most e outside it.
func marginOutline(out zoneOutline, m float64, n int) zoneOutline {
	if len(out) < 2 || !(m > 0) {
		return nil
	}
	var pts [][2]float64
	for i := 0; i+1 < len(out); i++ {
		a, b := out[i], out[i+1]
		l := math.Hypot(b[0]-a[0], b[1]-a[1])
		k := int(math.Ceil(l / (m / 4)))
		if k > 4096 {
			k = 4096
		}
		for j := 0; j < max(k, 1); j++ {
			t := float64(j) / float64(max(k, 1))
			pts = append(pts, [2]float64{a[0] + t*(b[0]-a[0]), a[1] + t*(b[1]-a[1])})
		}
	}
	pts = append(pts, out[len(out)-1])
	sort.SliceStable(pts, func(i, j int) bool { return pts[i][0] < pts[j][0] })
	x0, x1 := pts[0][0]-m, pts[len(pts)-1][0]+m
	step := m / 4
	lift := m - math.Sqrt(m*m-step*step/4)
	res := make(zoneOutline, 0, n+3)
	res = append(res, [2]float64{x0, 0})
	lo := 0
	for i := 1; i < n; i++ {
		x := x0 + (x1-x0)*float64(i)/float64(n)
		for lo < len(pts) && pts[lo][0] < x-m {
			lo++
		}
		r := 0.0
		for j := lo; j < len(pts) && pts[j][0] <= x+m; j++ {
			dx := x - pts[j][0]
			if h := m*m - dx*dx; h > 0 {
				r = math.Max(r, pts[j][1]+math.Sqrt(h))
			}
		}
		if r > 0 {
			r += lift
		}
		res = append(res, [2]float64{x, r})
	}
	return append(res, [2]float64{x1, 0})
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
}

// zones returns what the sheet draws of the plume: the governing point's
// velocity zone and potential core, and the hot zone of the plan's
// GoverningHot point, the longest hot zone of the test matrix (the
// governing point is the one with the largest velocity zone, often a cold
// one).
func (b *builder) zones() zoneSet {
	g := b.gov
	hp := &b.plan.Points[b.plan.GoverningHot]
	hot := hp.Plume.Envelope(jet.HotZone, jet.Conservative)
	vel := g.Plume.Envelope(jet.VelocityZone, jet.Conservative)
	z := zoneSet{
		vel: envelopeOutline(vel), hot: envelopeOutline(hot),
		core: g.CoreNominal, exitR: g.Exit.Diameter / 2,
		velLen: vel.Length, hotLen: hot.Length, hotPoint: hp.Name,
	}
	z.velM = marginOutline(z.vel, b.lim.Margin, 240)
	z.hotM = marginOutline(z.hot, b.lim.Margin, 240)
	return z
}
