package geometry

import (
	"math"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"
)

// Obstacle is a fixed object in the cell (a rig, a column, a cable tray)
// occupying its footprint from height ZMin to ZMax above the floor, m.
type Obstacle struct {
	Name      string
	Footprint Footprint
	ZMin      float64 // bottom above the floor, m
	ZMax      float64 // top above the floor, m; at least ZMin
}

// Solid returns the obstacle as a vertical prism.
func (o Obstacle) Solid() Solid {
	return Solid{Name: o.Name, Footprint: o.Footprint, ZMin: o.ZMin, ZMax: o.ZMax}
}

// KeepOut is a zone of the floor where no stand may stand, over the full
// height of the cell (a walkway, a door swing, a fuel line).
type KeepOut struct {
	Name      string
	Footprint Footprint
}

// Collector is the exhaust collector: a duct whose round inlet faces the jet.
type Collector struct {
	Inlet    r3.Vec  // centre of the inlet plane, cell frame, m
	Diameter float64 // inlet diameter, m
	Heading  float64 // heading of the duct axis in plan, rad from +X counter-clockwise, pointing into the duct
}

// Axis returns the unit vector along the collector axis, horizontal,
// pointing from the inlet into the duct.
func (c Collector) Axis() r3.Vec {
	s, co := math.Sincos(c.Heading)
	return r3.Vec{X: co, Y: s}
}

// Mark is a named reference mark on the floor (a datum pin, a grid
// intersection) from which a technician measures.
type Mark struct {
	Name string
	At   orb.Point // position, cell frame, m
}

// Cell is a test cell in plan and height, in cell-frame metres.
//
// The zero Cell is an unbounded anechoic space with a hard floor and a
// ceiling at height 0, which [Cell.Validate] rejects: set Ceiling to
// math.Inf(1) for open sky.
type Cell struct {
	Kind Kind
	// Boundary is the closed outline in plan that microphones must stay
	// inside: the wedge-tip plane of an anechoic chamber, the inner wall face
	// of a hard-walled cell or the site limit of an outdoor pad. Either
	// orientation. Empty means unbounded (an open pad).
	Boundary       orb.Ring
	Ceiling        float64 // height of the ceiling (wedge tips) above the floor, m; +Inf for open sky
	Floor          Surface
	TreatmentDepth float64 // depth of the acoustic treatment behind the boundary, m, for drawing; 0 if none
	Obstacles      []Obstacle
	KeepOuts       []KeepOut
	Collector      *Collector // nil if none
	Marks          []Mark

	// walls indexes a large Boundary, built by the first query that needs
	// it (see Cell.walls).
	wallIndex *ringIndex
}

// walls returns the index of the boundary's edges, building it on first
// use, or nil for a boundary of fewer than ringIndexMin vertices or with a
// non-finite coordinate (searched edge by edge). The index is rebuilt when
// Boundary is assigned a different ring; a ring edited in place after the
// first query is not seen, and a Cell must not be queried from several
// goroutines at once until its first query has returned.
func (c *Cell) walls() *ringIndex {
	r := c.Boundary
	if len(r) < ringIndexMin {
		return nil
	}
	if ix := c.wallIndex; ix != nil && len(ix.ring) == len(r) && &ix.ring[0] == &r[0] {
		return ix
	}
	if b := r.Bound(); !finite(b.Min[0]) || !finite(b.Min[1]) || !finite(b.Max[0]) || !finite(b.Max[1]) {
		return nil
	}
	c.wallIndex = newRingIndex(r)
	return c.wallIndex
}

// ringQuery returns the squared distance, m², from p to the boundary and
// whether p is inside it by the even-odd rule (the package's ringQuery,
// through the index for a large boundary).
func (c *Cell) ringQuery(p orb.Point) (float64, bool) {
	if ix := c.walls(); ix != nil {
		return ix.query(p)
	}
	return ringQuery(c.Boundary, p)
}

// Bounded reports whether the cell has a boundary.
func (c *Cell) Bounded() bool { return len(c.Boundary) > 0 }

// Contains reports whether plan point p (m) is inside the boundary. Points on
// the boundary, within [BoundaryTol], are inside. Every point is inside an
// unbounded cell; a point with a NaN coordinate is inside none.
func (c *Cell) Contains(p orb.Point) bool {
	if isNaNPoint(p) {
		return false
	}
	if !c.Bounded() {
		return true
	}
	if ix := c.walls(); ix != nil {
		return ix.inside(p) || ix.touches(p)
	}
	d2, inside := ringQuery(c.Boundary, p)
	return inside || d2 <= boundaryTol2
}

// WallDistance returns the signed plan distance, m, from p to the boundary:
// positive inside, 0 on it (within BoundaryTol), negative outside, and +Inf
// when the cell is unbounded. NaN when p has a NaN coordinate.
// WallDistance(p) >= 0 exactly when Contains(p).
func (c *Cell) WallDistance(p orb.Point) float64 {
	if isNaNPoint(p) {
		return math.NaN()
	}
	if !c.Bounded() {
		return math.Inf(1)
	}
	d2, inside := c.ringQuery(p)
	switch {
	case d2 <= boundaryTol2:
		return 0
	case inside:
		return math.Sqrt(d2)
	}
	return -math.Sqrt(d2)
}

// Extent returns the rectangle to draw, m: the bound of the boundary when
// the cell is bounded; otherwise the bound of the datum (the origin), the
// obstacles, the keep-out zones, the collector inlet disc and the marks.
// The treatment behind the boundary is not included; pad by TreatmentDepth
// to draw it.
func (c *Cell) Extent() orb.Bound {
	if c.Bounded() {
		return c.Boundary.Bound()
	}
	b := orb.Bound{}
	for _, o := range c.Obstacles {
		b = b.Union(o.Footprint.Bound())
	}
	for _, k := range c.KeepOuts {
		b = b.Union(k.Footprint.Bound())
	}
	if col := c.Collector; col != nil {
		r := col.Diameter / 2
		b = b.Union(orb.Bound{
			Min: orb.Point{col.Inlet.X - r, col.Inlet.Y - r},
			Max: orb.Point{col.Inlet.X + r, col.Inlet.Y + r},
		})
	}
	for _, m := range c.Marks {
		b = b.Extend(m.At)
	}
	return b
}

// Solids returns the obstacles as vertical prisms, in order, for [NewIndex].
func (c *Cell) Solids() []Solid {
	out := make([]Solid, len(c.Obstacles))
	for i, o := range c.Obstacles {
		out[i] = o.Solid()
	}
	return out
}

// SegmentInside reports whether the plan segment ab stays inside the
// boundary, which counts as inside; true when the cell is unbounded. A
// segment that only touches the boundary, or runs along it, is inside; one
// that crosses an edge, or has an end outside, is not.
func (c *Cell) SegmentInside(a, b orb.Point) bool {
	if !c.Bounded() {
		return true
	}
	if !c.Contains(a) || !c.Contains(b) {
		return false
	}
	if ix := c.walls(); ix != nil {
		if ix.crossed(a, b) {
			return false
		}
	} else {
		for i := 0; i+1 < len(c.Boundary); i++ {
			if segmentsCross(a, b, c.Boundary[i], c.Boundary[i+1]) {
				return false
			}
		}
	}
	// both ends inside and no edge crossed: the segment can still leave
	// through a vertex of a reflex corner; its midpoint tells
	return c.Contains(orb.Point{(a[0] + b[0]) / 2, (a[1] + b[1]) / 2})
}
