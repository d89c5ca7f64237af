package geometry

import (
	"math"

	"github.com/paulmach/orb"
	"github.com/paulmach/orb/planar"
)

// BoundaryTol is the distance, in metres, within which a point counts as on a
// boundary: Contains reports it inside and Distance reports exactly 0. Two
// vertices closer than BoundaryTol count as one, and two edges closer than
// BoundaryTol count as touching. One nanometre is far below anything that can
// be marked on a floor and far above the rounding error of coordinates of a
// few hundred metres (about 1e-13 m).
const BoundaryTol = 1e-9

// boundaryTol2 is BoundaryTol squared, m².
const boundaryTol2 = BoundaryTol * BoundaryTol

// orient returns twice the signed area of the triangle o, a, b, m²: positive
// when o→a→b turns counter-clockwise, negative clockwise, 0 when collinear.
func orient(o, a, b orb.Point) float64 {
	return (a[0]-o[0])*(b[1]-o[1]) - (a[1]-o[1])*(b[0]-o[0])
}

// segmentsCross reports whether segments ab and cd cross at a single interior
// point of both (a proper crossing). Touching and collinear overlaps are
// left to the point-to-segment distances in segSegDist2.
func segmentsCross(a, b, c, d orb.Point) bool {
	o1, o2 := orient(a, b, c), orient(a, b, d)
	o3, o4 := orient(c, d, a), orient(c, d, b)
	return ((o1 > 0 && o2 < 0) || (o1 < 0 && o2 > 0)) &&
		((o3 > 0 && o4 < 0) || (o3 < 0 && o4 > 0))
}

// segSegDist2 returns the squared distance between segments ab and cd, m².
// Either segment may have zero length (it is then a point).
func segSegDist2(a, b, c, d orb.Point) float64 {
	if segmentsCross(a, b, c, d) {
		return 0
	}
	m := planar.DistanceFromSegmentSquared(c, d, a)
	m = math.Min(m, planar.DistanceFromSegmentSquared(c, d, b))
	m = math.Min(m, planar.DistanceFromSegmentSquared(a, b, c))
	return math.Min(m, planar.DistanceFromSegmentSquared(a, b, d))
}

// ringEdge returns edge i of r, from r[i] to the next vertex, wrapping
// around: for a closed ring the last edge has zero length, and for an open
// ring it is the implicit closing edge.
func ringEdge(r orb.Ring, i int) (orb.Point, orb.Point) {
	j := i + 1
	if j == len(r) {
		j = 0
	}
	return r[i], r[j]
}

// ringQuery returns the squared distance, m², from p to the edges of r and
// whether p is inside r by the even-odd (crossing) rule. Orientation and a
// missing closing vertex do not matter; zero-length edges add nothing.
func ringQuery(r orb.Ring, p orb.Point) (dist2 float64, inside bool) {
	dist2 = math.Inf(1)
	for i := range r {
		a, b := ringEdge(r, i)
		if d := planar.DistanceFromSegmentSquared(a, b, p); d < dist2 {
			dist2 = d
		}
		if (a[1] > p[1]) != (b[1] > p[1]) {
			x := a[0] + (p[1]-a[1])*(b[0]-a[0])/(b[1]-a[1])
			if p[0] < x {
				inside = !inside
			}
		}
	}
	return dist2, inside
}

// ringSegDist2 returns the squared distance, m², from segment ab to the edges
// of r (not its interior).
func ringSegDist2(r orb.Ring, a, b orb.Point) float64 {
	best := math.Inf(1)
	for i := range r {
		c, d := ringEdge(r, i)
		if v := segSegDist2(a, b, c, d); v < best {
			best = v
			if best == 0 {
				break
			}
		}
	}
	return best
}

// boundDist2 returns the squared distance, m², from p to the rectangle b
// (0 inside). It is a cheap lower bound on the distance to anything inside b.
func boundDist2(b orb.Bound, p orb.Point) float64 {
	dx := math.Max(0, math.Max(b.Min[0]-p[0], p[0]-b.Max[0]))
	dy := math.Max(0, math.Max(b.Min[1]-p[1], p[1]-b.Max[1]))
	return dx*dx + dy*dy
}

// signedRingDistance returns the signed distance, m, from p to the region
// bounded by r: negative inside, 0 within BoundaryTol of an edge, positive
// outside. NaN when p has a NaN coordinate.
func signedRingDistance(r orb.Ring, p orb.Point) float64 {
	if isNaNPoint(p) {
		return math.NaN()
	}
	d2, inside := ringQuery(r, p)
	if d2 <= boundaryTol2 {
		return 0
	}
	if inside {
		return -math.Sqrt(d2)
	}
	return math.Sqrt(d2)
}

// ringInside reports whether p is inside r by the even-odd (crossing) rule,
// without the boundary tolerance.
func ringInside(r orb.Ring, p orb.Point) bool {
	inside := false
	for i := range r {
		a, b := ringEdge(r, i)
		if (a[1] > p[1]) != (b[1] > p[1]) {
			if p[0] < a[0]+(p[1]-a[1])*(b[0]-a[0])/(b[1]-a[1]) {
				inside = !inside
			}
		}
	}
	return inside
}

// touchesSegment reports whether the plan segment ab meets f (boundary or
// interior, within BoundaryTol): the same answer as
// f.SegmentDistance(a, b) == 0, found faster. bound is f's bound widened by
// at least BoundaryTol. If no edge comes within BoundaryTol of the segment,
// the segment is wholly inside or wholly outside, which a's side decides.
func (f Footprint) touchesSegment(a, b orb.Point, bound orb.Bound) bool {
	if f.IsCircle() {
		return math.Sqrt(planar.DistanceFromSegmentSquared(a, b, f.Center))-f.Radius <= BoundaryTol
	}
	lo := orb.Point{math.Min(a[0], b[0]) - BoundaryTol, math.Min(a[1], b[1]) - BoundaryTol}
	hi := orb.Point{math.Max(a[0], b[0]) + BoundaryTol, math.Max(a[1], b[1]) + BoundaryTol}
	for i := range f.Ring {
		c, d := ringEdge(f.Ring, i)
		if math.Max(c[0], d[0]) < lo[0] || math.Min(c[0], d[0]) > hi[0] ||
			math.Max(c[1], d[1]) < lo[1] || math.Min(c[1], d[1]) > hi[1] {
			continue
		}
		if segSegDist2(a, b, c, d) <= boundaryTol2 {
			return true
		}
	}
	return bound.Contains(a) && ringInside(f.Ring, a)
}
