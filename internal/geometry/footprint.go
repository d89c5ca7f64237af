package geometry

import (
	"fmt"
	"math"

	"github.com/paulmach/orb"
	"github.com/paulmach/orb/planar"
)

// Footprint is a shape in plan, in cell-frame metres: a simple polygon when
// Ring is not nil, or a disc of centre Center and radius Radius (m) when Ring
// is nil. A Ring made by [Polygon] is closed (first vertex repeated last),
// counter-clockwise and has no zero-length edges.
//
// Every query treats the boundary as part of the shape: points within
// [BoundaryTol] of it are inside and at distance 0. The zero Footprint is a
// disc of radius 0 at the datum, that is a single point.
type Footprint struct {
	Ring   orb.Ring  // polygon vertices, m; nil for a disc
	Center orb.Point // disc centre, m; unused for a polygon
	Radius float64   // disc radius, m; unused for a polygon
}

// Polygon returns the polygon footprint with the vertices of r. The ring is
// copied and normalised: a vertex within [BoundaryTol] of the one before it
// is dropped (so zero-length edges disappear, including a doubled closing
// vertex), the ring is closed if it was open, and it is reversed if it was
// clockwise. Collinear consecutive vertices are kept: they change nothing.
// A ring that reduces to one or two distinct vertices gives a degenerate
// footprint with no interior (a point or a segment) that still answers
// every query correctly. Self-intersection is not checked; call [CheckRing]
// on input read from a file first.
//
// Polygon panics if r is empty or has a NaN or infinite coordinate
// (programmer misuse: CheckRing reports both as errors).
func Polygon(r orb.Ring) Footprint {
	if len(r) == 0 {
		panic("geometry: Polygon of an empty ring")
	}
	out := make(orb.Ring, 0, len(r)+1)
	for i, p := range r {
		if !finite(p[0]) || !finite(p[1]) {
			panic(fmt.Sprintf("geometry: Polygon vertex %d (%g, %g) is not finite", i+1, p[0], p[1]))
		}
		if len(out) > 0 && planar.DistanceSquared(out[len(out)-1], p) <= boundaryTol2 {
			continue
		}
		out = append(out, p)
	}
	for len(out) > 1 && planar.DistanceSquared(out[len(out)-1], out[0]) <= boundaryTol2 {
		out = out[:len(out)-1]
	}
	out = append(out, out[0])
	if len(out) >= 4 && out.Orientation() == orb.CW {
		out.Reverse()
	}
	return Footprint{Ring: out}
}

// Circle returns the disc footprint of centre c and radius radius (m).
// A radius of 0 gives a single point: only c itself (within BoundaryTol) is
// inside, and distances are distances to c.
//
// Circle panics if c or radius is NaN or infinite or radius is negative
// (programmer misuse: [CheckCircle] reports these as errors).
func Circle(c orb.Point, radius float64) Footprint {
	if !finite(c[0]) || !finite(c[1]) || !finite(radius) || radius < 0 {
		panic(fmt.Sprintf("geometry: Circle(centre (%g, %g), radius %g m) needs finite values and a radius >= 0", c[0], c[1], radius))
	}
	return Footprint{Center: c, Radius: radius}
}

// CheckCircle returns nil when c and radius (m) make a valid disc, and
// otherwise an [*InputError] naming the bad input: every value finite and at
// most [MaxCoord] in magnitude, and the radius not negative.
func CheckCircle(c orb.Point, radius float64) error {
	if err := checkPoint("Center", c); err != nil {
		return err
	}
	if err := checkCoord("Radius", radius); err != nil {
		return err
	}
	return checkNonNegative("Radius", radius, "m")
}

// Validate returns nil when f is usable: a disc passing [CheckCircle] or a
// polygon passing [CheckRing]. The error names the bad input.
func (f Footprint) Validate() error {
	if f.IsCircle() {
		return CheckCircle(f.Center, f.Radius)
	}
	if err := CheckRing(f.Ring); err != nil {
		return &InputError{Field: "Ring", Err: err}
	}
	return nil
}

// IsCircle reports whether f is a disc (Ring is nil).
func (f Footprint) IsCircle() bool { return f.Ring == nil }

// Contains reports whether plan point p (m) is inside f. Points on the
// boundary, within BoundaryTol, are inside. A point with a NaN coordinate is
// not inside.
func (f Footprint) Contains(p orb.Point) bool {
	if f.IsCircle() {
		return f.Distance(p) <= 0
	}
	d2, inside := ringQuery(f.Ring, p)
	return inside || d2 <= boundaryTol2
}

// Distance returns the signed distance, m, from plan point p to the boundary
// of f: negative inside, 0 on the boundary (within BoundaryTol), positive
// outside. Distance(p) <= 0 exactly when Contains(p).
//
// Special cases are:
//
//	Distance(p) = NaN  if p has a NaN coordinate
//	a disc of radius 0: Distance(p) = |p − Center| (never negative)
//	a degenerate polygon (a point or a segment): the distance to it, never negative
func (f Footprint) Distance(p orb.Point) float64 {
	if f.IsCircle() {
		if isNaNPoint(p) {
			return math.NaN()
		}
		d := math.Hypot(p[0]-f.Center[0], p[1]-f.Center[1]) - f.Radius
		if math.Abs(d) <= BoundaryTol {
			return 0
		}
		return d
	}
	return signedRingDistance(f.Ring, p)
}

// SegmentDistance returns the smallest distance, m, from the plan segment
// from a to b to the shape f (boundary and interior). It is 0 when the
// segment touches or crosses the boundary or lies inside, and never
// negative. A segment of zero length is treated as the point a; the result
// is then max(0, Distance(a)). NaN when a or b has a NaN coordinate.
func (f Footprint) SegmentDistance(a, b orb.Point) float64 {
	if isNaNPoint(a) || isNaNPoint(b) {
		return math.NaN()
	}
	if f.IsCircle() {
		d := math.Sqrt(planar.DistanceFromSegmentSquared(a, b, f.Center)) - f.Radius
		if d <= BoundaryTol {
			return 0
		}
		return d
	}
	if f.Contains(a) || f.Contains(b) {
		return 0
	}
	d2 := ringSegDist2(f.Ring, a, b)
	if d2 <= boundaryTol2 {
		return 0
	}
	return math.Sqrt(d2)
}

// Bound returns the smallest axis-aligned rectangle holding f, m.
func (f Footprint) Bound() orb.Bound {
	if f.IsCircle() {
		r := f.Radius
		return orb.Bound{
			Min: orb.Point{f.Center[0] - r, f.Center[1] - r},
			Max: orb.Point{f.Center[0] + r, f.Center[1] + r},
		}
	}
	return ringBound(f.Ring)
}

// ringBound returns the bound of r; it is the same as r.Bound() but several
// times faster, which matters in the hot loops of PoleClearance and Index.
func ringBound(r orb.Ring) orb.Bound {
	if len(r) == 0 {
		return orb.Bound{}
	}
	lo, hi := r[0], r[0]
	for _, p := range r[1:] {
		lo[0], hi[0] = min(lo[0], p[0]), max(hi[0], p[0])
		lo[1], hi[1] = min(lo[1], p[1]), max(hi[1], p[1])
	}
	return orb.Bound{Min: lo, Max: hi}
}

// Area returns the area of f, m²: πr² for a disc, the enclosed area for a
// polygon (0 for a degenerate one).
func (f Footprint) Area() float64 {
	if f.IsCircle() {
		return math.Pi * f.Radius * f.Radius
	}
	return math.Abs(planar.Area(f.Ring))
}

// Outline returns a closed counter-clockwise ring tracing the boundary of f,
// for drawing. A polygon returns a copy of its ring and ignores n. A disc
// returns n vertices on the circle, the first at angle 0 (on +X from the
// centre), followed by the closing repeat of the first; the polygon is
// inscribed, so it lies inside the disc. A disc of radius 0 returns n+1
// copies of its centre.
//
// Outline panics if f is a disc and n < 3 (programmer misuse).
func (f Footprint) Outline(n int) orb.Ring {
	if !f.IsCircle() {
		return f.Ring.Clone()
	}
	if n < 3 {
		panic(fmt.Sprintf("geometry: Outline of a circle needs at least 3 vertices, got %d", n))
	}
	out := make(orb.Ring, n+1)
	for i := range n {
		s, c := math.Sincos(2 * math.Pi * float64(i) / float64(n))
		out[i] = orb.Point{f.Center[0] + f.Radius*c, f.Center[1] + f.Radius*s}
	}
	out[n] = out[0]
	return out
}

// sq returns x².
func sq(x float64) float64 { return x * x }
