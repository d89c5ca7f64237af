package planner

import (
	"math"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/geometry"
	"arcwright/internal/jet"
)

// Attached is a zone carried on by a surface that the free zone reaches:
// a wall jet along the floor, the ceiling or a side wall, or a radial wall
// jet over a wall across the jet. Stations are checked against it like any
// zone.
type Attached struct {
	Point   string   // the operating point
	Zone    jet.Zone // velocity or hot zone
	Surface string   // "floor" ("ground" on an outdoor pad), "ceiling" or "wall"
	// Radial is true for a jet spreading over a wall across it.
	Radial bool
	// X is the jet-frame distance where the free zone reaches the surface, m.
	X float64
	// Solid is a prism in the cell frame that holds the attached zone; its
	// footprint may reach past the boundary (drawings cut it there).
	Solid geometry.Solid
}

// attachedOutside is how far past a wall the footprint of a zone along or
// over the wall is drawn out, m: beyond the wall is not in the cell, and a
// wall that is not quite straight or parallel stays inside the prism.
const attachedOutside = 1.0

// attachedZones returns, for every operating point and both conservative
// zones, the attached zones on the floor, the ceiling and the boundary
// walls that the zone reaches upstream of a capturing collector.
func (ck *checker) attachedZones() []Attached {
	req := ck.req
	cell := &req.Cell
	f := req.Exit
	var out []Attached
	for k := range ck.points {
		p := &ck.points[k]
		capture := captureX(req, p)
		for _, z := range []jet.Zone{jet.VelocityZone, jet.HotZone} {
			env := p.Plume.Envelope(z, jet.Conservative)
			if env.Length == 0 {
				continue
			}
			for _, c := range zoneReaches(req, nil, env, capture) {
				a := Attached{Point: p.Name, Zone: z, X: c.x}
				switch c.surface {
				case surfaceFloor, surfaceCeiling:
					w := p.Plume.WallJet(z, c.x)
					if len(w.X) < 2 {
						continue
					}
					a.Surface = "floor"
					if cell.Kind == geometry.OutdoorPad {
						a.Surface = "ground"
					}
					a.Solid = geometry.Solid{Footprint: fanFootprint(f, w), ZMin: 0, ZMax: w.MaxDepth}
					if c.surface == surfaceCeiling {
						a.Surface = "ceiling"
						a.Solid.ZMin, a.Solid.ZMax = cell.Ceiling-w.MaxDepth, cell.Ceiling
					}
				case surfaceBoundary:
					if cell.Kind == geometry.OutdoorPad {
						continue // a site limit is a line on the ground, not a wall
					}
					s, ok := ck.wallContact(f, env, c.x)
					if !ok {
						continue
					}
					a.Surface = "wall"
					if s.across {
						rj := p.Plume.RadialJet(z, s.axisX)
						a.Radial = true
						a.Solid = geometry.Solid{
							Footprint: geometry.Polygon(wallStrip(s.at, s.along, s.inward, rj.Radius, rj.Radius, rj.Depth)),
							ZMin:      math.Max(0, f.Exit.Z-rj.Radius), ZMax: math.Min(cell.Ceiling, f.Exit.Z+rj.Radius),
						}
					} else {
						w := p.Plume.WallJet(z, c.x)
						if len(w.X) < 2 {
							continue
						}
						// from the contact downstream along the wall
						run := w.End - c.x
						a.Solid = geometry.Solid{
							Footprint: geometry.Polygon(wallStrip(s.at, s.along, s.inward, 0, run, w.MaxDepth)),
							ZMin:      math.Max(0, f.Exit.Z-w.MaxSpan), ZMax: math.Min(cell.Ceiling, f.Exit.Z+w.MaxSpan),
						}
					}
				default:
					continue
				}
				out = append(out, a)
			}
		}
	}
	return out
}

// fanFootprint returns the plan footprint of a wall jet along the floor or
// the ceiling: its span either side of the axis's plan line.
func fanFootprint(f geometry.JetFrame, w jet.WallJet) geometry.Footprint {
	ring := make(orb.Ring, 0, 2*len(w.X)+1)
	for i, x := range w.X {
		c := f.ToCell(geometry.JetPoint{X: x, R: w.Span[i]})
		ring = append(ring, orb.Point{c.X, c.Y})
	}
	for i := len(w.X) - 1; i >= 0; i-- {
		c := f.ToCell(geometry.JetPoint{X: w.X[i], R: w.Span[i], Azimuth: math.Pi})
		ring = append(ring, orb.Point{c.X, c.Y})
	}
	ring = append(ring, ring[0])
	if ring.Orientation() != orb.CCW {
		ring.Reverse()
	}
	return geometry.Polygon(ring)
}

// wallContact is where a zone meets a wall.
type wallContact struct {
	at     orb.Point // the point of the wall met, plan, m
	along  orb.Point // unit vector along the wall, pointing downstream (or either way across)
	inward orb.Point // unit normal into the cell
	across bool      // the wall stands across the jet (more than 45° off the axis)
	axisX  float64   // jet-frame distance of the wall on the axis (across walls), m
}

// wallContact finds the wall that zone env reaches at x: the boundary edge
// nearest to the point of the zone's horizontal section that lies outside.
func (ck *checker) wallContact(f geometry.JetFrame, env *jet.Envelope, x float64) (wallContact, bool) {
	cell := &ck.req.Cell
	r := env.Radius(x)
	var out orb.Point
	found := false
	for _, az := range []float64{0, math.Pi} {
		c := f.ToCell(geometry.JetPoint{X: x, R: r, Azimuth: az})
		if p := (orb.Point{c.X, c.Y}); !cell.Contains(p) {
			out, found = p, true
			break
		}
	}
	if !found {
		c := f.ToCell(geometry.JetPoint{X: x})
		out = orb.Point{c.X, c.Y}
	}
	ring := cell.Boundary
	best, bi := math.Inf(1), -1
	var at orb.Point
	for i := 0; i+1 < len(ring); i++ {
		q, d := closestOnSegment(out, ring[i], ring[i+1])
		if d < best {
			best, bi, at = d, i, q
		}
	}
	if bi < 0 {
		return wallContact{}, false
	}
	a, b := ring[bi], ring[bi+1]
	l := math.Hypot(b[0]-a[0], b[1]-a[1])
	if l == 0 {
		return wallContact{}, false
	}
	along := orb.Point{(b[0] - a[0]) / l, (b[1] - a[1]) / l}
	head := orb.Point{math.Cos(f.Heading), math.Sin(f.Heading)}
	cos := along[0]*head[0] + along[1]*head[1]
	if cos < 0 {
		along, cos = orb.Point{-along[0], -along[1]}, -cos
	}
	inward := orb.Point{-along[1], along[0]}
	// the inward normal points to the side of the wall the exit is on
	ex := f.Exit
	if (ex.X-at[0])*inward[0]+(ex.Y-at[1])*inward[1] < 0 {
		inward = orb.Point{-inward[0], -inward[1]}
	}
	wc := wallContact{at: at, along: along, inward: inward, across: cos < math.Sqrt2/2}
	if wc.across {
		// where the axis meets the wall's line
		d := (at[0]-ex.X)*inward[0] + (at[1]-ex.Y)*inward[1]
		den := head[0]*inward[0] + head[1]*inward[1]
		if den != 0 {
			wc.axisX = d / den
			wc.at = orb.Point{ex.X + wc.axisX*head[0], ex.Y + wc.axisX*head[1]}
		}
	}
	return wc, true
}

// closestOnSegment returns the point of segment ab nearest to p and its
// distance, m.
func closestOnSegment(p, a, b orb.Point) (orb.Point, float64) {
	dx, dy := b[0]-a[0], b[1]-a[1]
	t := 0.0
	if l2 := dx*dx + dy*dy; l2 > 0 {
		t = math.Max(0, math.Min(1, ((p[0]-a[0])*dx+(p[1]-a[1])*dy)/l2))
	}
	q := orb.Point{a[0] + t*dx, a[1] + t*dy}
	return q, math.Hypot(p[0]-q[0], p[1]-q[1])
}

// wallStrip returns the plan ring of a strip along a wall: from back (m)
// behind at to ahead (m) beyond it along the wall, from depth (m) inside
// the wall to attachedOutside beyond it.
func wallStrip(at, along, inward orb.Point, back, ahead, depth float64) orb.Ring {
	pt := func(s, n float64) orb.Point {
		return orb.Point{at[0] + s*along[0] + n*inward[0], at[1] + s*along[1] + n*inward[1]}
	}
	ring := orb.Ring{pt(-back, -attachedOutside), pt(ahead, -attachedOutside), pt(ahead, depth), pt(-back, depth)}
	ring = append(ring, ring[0])
	if ring.Orientation() != orb.CCW {
		ring.Reverse()
	}
	return ring
}

// attachedClearance returns the smallest clearance of the cell-frame probes
// from the attached zones of point name and zone z, less each probe's
// radius, and the part and zone that set it; +Inf when there is none.
func (ck *checker) attachedClearance(name string, z jet.Zone, probes []bentProbe) (float64, string, *Attached) {
	min, part := math.Inf(1), ""
	var gov *Attached
	for i := range ck.attached {
		a := &ck.attached[i]
		if a.Point != name || a.Zone != z {
			continue
		}
		for _, p := range probes {
			if c := a.Solid.Distance(p.c) - p.pen; c < min || math.IsNaN(c) {
				min, part, gov = c, p.part, a
				if math.IsNaN(c) {
					return c, part, gov
				}
			}
		}
	}
	return min, part, gov
}

// probeAt returns the cell point c as a probe of radius pen (m).
func (ck *checker) probeAt(c r3.Vec, pen float64, part string) bentProbe {
	f := ck.req.Exit
	j := f.ToJet(c)
	v := c.Z - f.Exit.Z
	return bentProbe{c: c, x: j.X, v: v, l: math.Sqrt(math.Max(0, j.R*j.R-v*v)), pen: pen, part: part}
}
