package export

import (
	"fmt"
	"math"

	"github.com/paulmach/orb"
	"github.com/paulmach/orb/geojson"
	"github.com/paulmach/orb/planar"
	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/geometry"
	"arcwright/internal/jet"
	"arcwright/internal/planner"
)

// Drawing resolution.
const (
	// circleSides is the number of sides of the polygon that stands for a
	// disc footprint; its vertices lie on the circle.
	circleSides = 64
	// arcStep is the largest angle, rad, that one straight piece of an arc
	// line spans (1°).
	arcStep = math.Pi / 180
	// arcSlack is the fraction of arcStep by which a span may exceed a
	// whole number of steps, through rounding, without taking an extra
	// piece.
	arcSlack = 1e-6
)

// roundPoint rounds a plan position (m) to 0.1 mm; false when a coordinate
// is NaN or ±Inf.
func roundPoint(x, y float64) (orb.Point, bool) {
	return orb.Point{roundTo(x, lengthDecimals), roundTo(y, lengthDecimals)}, finite(x) && finite(y)
}

// degreeDecimals is the number of decimals of a longitude or latitude in
// degrees: 1e-9° is 0.1 mm of latitude, the rounding of the cell frame.
const degreeDecimals = 9

// point returns the Point at the plan position (x, y), m: in the cell frame
// rounded to 0.1 mm, or, when the layout has an anchor, the WGS 84
// longitude and latitude rounded to 1e-9°; false when a coordinate is NaN
// or ±Inf.
func (c *collection) point(x, y float64) (orb.Point, bool) {
	if c.anchor == nil || !finite(x) || !finite(y) {
		return roundPoint(x, y)
	}
	lon, lat := c.anchor.ToWGS84(orb.Point{x, y})
	return orb.Point{roundTo(lon, degreeDecimals), roundTo(lat, degreeDecimals)}, finite(lon) && finite(lat)
}

// path rounds pts and drops a vertex equal to the one before it.
func (c *collection) path(pts []orb.Point) (orb.LineString, bool) {
	out := make(orb.LineString, 0, len(pts))
	for _, p := range pts {
		q, ok := c.point(p[0], p[1])
		if !ok {
			return nil, false
		}
		if n := len(out); n > 0 && out[n-1] == q {
			continue
		}
		out = append(out, q)
	}
	return out, true
}

// polygon returns the polygon with outline pts (open or closed, either
// orientation): rounded, without repeated vertices, closed and
// counter-clockwise.
func (c *collection) polygon(pts []orb.Point) (orb.Polygon, bool) {
	ls, ok := c.path(pts)
	if !ok || len(ls) == 0 {
		return nil, ok
	}
	ring := orb.Ring(ls)
	if ring[len(ring)-1] != ring[0] {
		ring = append(ring, ring[0])
	}
	if ring.Orientation() == orb.CW {
		ring.Reverse()
	}
	return orb.Polygon{ring}, true
}

// footprint returns a footprint's outline: its ring, or a disc as a
// 64-gon (a Point for a disc of radius 0).
func (c *collection) footprint(f geometry.Footprint) (orb.Geometry, bool) {
	if !f.IsCircle() {
		return c.polygon(f.Ring)
	}
	if f.Radius == 0 {
		return c.point(f.Center[0], f.Center[1])
	}
	pts := make([]orb.Point, circleSides)
	for i := range pts {
		s, c := math.Sincos(2 * math.Pi * float64(i) / circleSides)
		pts[i] = orb.Point{f.Center[0] + f.Radius*c, f.Center[1] + f.Radius*s}
	}
	return c.polygon(pts)
}

// addJet adds the nozzle, the jet axis and the governing point's zones.
func (c *collection) addJet(p *planner.Plan) {
	fr := p.Request.Exit
	g, ok := c.point(fr.Exit.X, fr.Exit.Y)
	c.add(layerNozzle, "", g, ok, geojson.Properties{"heading_deg": degrees(fr.Heading), "z_m": metres(fr.Exit.Z)})

	// the axis reaches the end of the longest conservative zone of any point
	longest, by, zone := 0.0, "", ""
	for i := range p.Points {
		pt := &p.Points[i]
		if pt.Plume == nil {
			continue
		}
		for _, e := range []*jet.Envelope{pt.Velocity(), pt.Hot()} {
			if e.Length > longest {
				longest, by, zone = e.Length, pt.Name, zoneName(e.Zone)
			}
		}
	}
	if longest > 0 {
		end := fr.ToCell(geometry.JetPoint{X: longest})
		ls, ok := c.path([]orb.Point{vec2(fr.Exit), vec2(end)})
		c.add(layerJetAxis, "", ls, ok, geojson.Properties{"length_m": metres(longest), "point": by, "zone": zone})
	}

	c.addZones(p)
}

// addZones adds the zones the sheet draws, cut as it cuts them: the
// conservative velocity zone of the governing point and the conservative
// hot zone of the point with the longest one (Plan.GoverningHot), each with
// its margin band (the zone grown by the margin, jet.GrowOutline), and the
// governing point's nominal potential core; in a bounded cell each is cut
// at the boundary, where the sheet stops drawing it (the free jet does not
// go on through a wall; the plan warns where a zone meets one).
func (c *collection) addZones(p *planner.Plan) {
	if len(p.Points) == 0 {
		return
	}
	r := p.Request
	fr := r.Exit
	margin := r.Limits.WithDefaults().Margin
	gov, hp := &p.Points[p.Governing], &p.Points[p.GoverningHot]
	for _, z := range []struct {
		pt *planner.PointResult
		e  *jet.Envelope
	}{{gov, gov.Velocity()}, {hp, hp.Hot()}} {
		if z.pt.Plume == nil || z.e.Length == 0 || len(z.e.Points) < 2 {
			continue // the jet never exceeds this limit: no zone
		}
		unit := "m/s"
		if z.e.Zone == jet.HotZone {
			unit = "K"
		}
		props := func() geojson.Properties {
			return geojson.Properties{
				"zone": zoneName(z.e.Zone), "point": z.pt.Name, "variant": z.e.Variant.String(),
				"limit": sig(z.e.Limit), "limit_unit": unit,
				"length_m": metres(z.e.Length), "max_radius_m": metres(z.e.MaxRadius), "margin_m": metres(margin),
			}
		}
		what := fmt.Sprintf("%s of %q", zoneName(z.e.Zone), z.pt.Name)
		c.addCut(layerZone, what, planRing(fr, z.e.Points), &r.Cell, props())
		if grown := jet.GrowOutline(z.e.Points, margin, marginSamples); grown != nil {
			c.addCut(layerZoneMargin, what, planRing(fr, grown), &r.Cell, props())
		}
		// the bent zone of a buoyant point and the zones the floor,
		// ceiling and walls carry on, as the sheet draws them
		if o := p.BentSection(z.pt, z.e.Zone, marginSamples); o != nil {
			bp := props()
			bp["variant"], bp["carried_by"] = "conservative", "bent by buoyancy"
			c.addCut(layerZone, "bent "+what, planRing(fr, o), &r.Cell, bp)
		}
		for _, a := range p.Attached {
			if a.Point != z.pt.Name || a.Zone != z.e.Zone || a.Solid.Footprint.IsCircle() {
				continue
			}
			ap := props()
			ap["carried_by"] = a.Surface
			ap["z_min_m"], ap["z_max_m"] = metres(a.Solid.ZMin), metres(a.Solid.ZMax)
			c.addCut(layerZone, a.Surface+" "+what, a.Solid.Footprint.Ring, &r.Cell, ap)
		}
	}
	if gov.Plume != nil && gov.CoreNominal > 0 {
		core := [][2]float64{{0, 0}, {0, gov.Exit.Diameter / 2}, {gov.CoreNominal, 0}}
		c.addCut(layerCore, fmt.Sprintf("of %q", gov.Name), planRing(fr, core), &r.Cell, geojson.Properties{
			"point": gov.Name, "variant": jet.Nominal.String(), "length_m": metres(gov.CoreNominal),
		})
	}
}

// marginSamples is the number of axial steps of a margin band, as the sheet
// draws it.
const marginSamples = 240

// addCut adds the plan polygon ring (cell frame, m), cut at the boundary of
// a bounded cell: a Polygon, or a MultiPolygon when the boundary cuts it
// apart; nothing when it lies wholly outside. The property "cut" says
// whether the boundary cut it. Where the outlines only touch and cannot be
// cut exactly, the uncut polygon is written with "cut" false.
func (c *collection) addCut(layer, what string, ring orb.Ring, cell *geometry.Cell, props geojson.Properties) {
	props["cut"] = false
	if !cell.Bounded() {
		g, ok := c.polygon(ring)
		c.add(layer, what, g, ok, props)
		return
	}
	parts, err := geometry.IntersectRings(ring, cell.Boundary)
	if err != nil {
		g, ok := c.polygon(ring)
		c.add(layer, what, g, ok, props)
		return
	}
	if len(parts) == 1 && math.Abs(planar.Area(parts[0])-math.Abs(planar.Area(ring))) <= 1e-9*math.Abs(planar.Area(ring)) {
		g, ok := c.polygon(parts[0])
		c.add(layer, what, g, ok, props)
		return
	}
	props["cut"] = true
	if len(parts) == 0 {
		return
	}
	mp := make(orb.MultiPolygon, 0, len(parts))
	good := true
	for _, r := range parts {
		g, ok := c.polygon(r)
		good = good && ok
		mp = append(mp, g)
	}
	if len(mp) == 1 {
		c.add(layer, what, mp[0], good, props)
		return
	}
	c.add(layer, what, mp, good, props)
}

// planRing returns the section of the body of revolution with the meridian
// outline out ((x, r), m) in the horizontal plane through the jet axis, in
// the cell frame: up the left side (azimuth 0) from the exit to the tip,
// and back down the right side.
func planRing(fr geometry.JetFrame, out [][2]float64) orb.Ring {
	ring := make(orb.Ring, 0, 2*len(out)+1)
	for _, q := range out {
		ring = append(ring, vec2(fr.ToCell(geometry.JetPoint{X: q[0], R: q[1]})))
	}
	for i := len(out) - 1; i >= 0; i-- {
		q := out[i]
		ring = append(ring, vec2(fr.ToCell(geometry.JetPoint{X: q[0], R: q[1], Azimuth: math.Pi})))
	}
	return append(ring, ring[0])
}

// zoneName returns "velocity" or "hot".
func zoneName(z jet.Zone) string {
	if z == jet.HotZone {
		return "hot"
	}
	return "velocity"
}

// addArcs adds, for each arc array with two or more stations, a line through
// its microphones in plan order that follows the arc about the array's
// centre between them.
func (c *collection) addArcs(p *planner.Plan) {
	for i := range p.Arrays {
		a := &p.Arrays[i]
		if a.Kind != planner.Arc {
			continue
		}
		var mics []r3.Vec
		for j := range p.Stations {
			if p.Stations[j].Array == a.Name {
				mics = append(mics, p.Stations[j].Mic)
			}
		}
		if len(mics) < 2 {
			continue
		}
		pts := []orb.Point{vec2(mics[0])}
		for j := 1; j < len(mics); j++ {
			pts = append(pts, arcPieces(a.Centre, mics[j-1], mics[j])...)
		}
		ls, ok := c.path(pts)
		c.add(layerArc, fmt.Sprintf("%q", a.Name), ls, ok, geojson.Properties{
			"array": a.Name, "radius_m": metres(a.Radius), "centre_x_m": metres(a.Centre.X), "centre_y_m": metres(a.Centre.Y),
		})
	}
}

// arcPieces returns the plan positions along the arc about centre from a
// (excluded) to b (included), in pieces of at most arcStep: the shorter
// great-circle arc between the two directions, with the distance from the
// centre changing linearly. Stations on one arc lie in one plane through its
// centre, so this is the arc itself; where the directions are opposite or a
// point is at the centre, the straight segment is used.
func arcPieces(centre, a, b r3.Vec) []orb.Point {
	u, v := r3.Sub(a, centre), r3.Sub(b, centre)
	lu, lv := r3.Norm(u), r3.Norm(v)
	omega := 0.0
	if lu > 0 && lv > 0 {
		omega = math.Acos(math.Max(-1, math.Min(1, r3.Dot(u, v)/(lu*lv))))
	}
	n := max(1, int(math.Ceil(omega/arcStep-arcSlack)))
	out := make([]orb.Point, 0, n)
	so := math.Sin(omega)
	for k := 1; k <= n; k++ {
		t := float64(k) / float64(n)
		var q r3.Vec
		if k == n || so == 0 || lu == 0 || lv == 0 {
			q = r3.Add(u, r3.Scale(t, r3.Sub(v, u))) // straight, and exactly b at the end
		} else {
			wa, wb := math.Sin((1-t)*omega)/so, math.Sin(t*omega)/so
			dir := r3.Add(r3.Scale(wa/lu, u), r3.Scale(wb/lv, v))
			q = r3.Scale(lu+t*(lv-lu), dir)
		}
		out = append(out, vec2(r3.Add(centre, q)))
	}
	return out
}
