package geometry

import (
	"math"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"
)

// Solid is a vertical prism in the cell frame: a footprint extruded from
// height ZMin to ZMax above the floor, m. It models obstacles, other stands'
// poles (thin discs) and the collector housing. ZMin may be −Inf and ZMax
// +Inf for a zone of unlimited height. The prism is closed: its faces, top
// and bottom belong to it.
type Solid struct {
	Name      string
	Footprint Footprint
	ZMin      float64 // bottom, m
	ZMax      float64 // top, m; at least ZMin
}

// Contains reports whether p (cell frame, m) is inside s or on its surface:
// its plan position is inside the footprint (within [BoundaryTol]) and
// ZMin <= p.Z <= ZMax. False when p has a NaN coordinate.
func (s Solid) Contains(p r3.Vec) bool {
	return p.Z >= s.ZMin && p.Z <= s.ZMax && s.Footprint.Contains(orb.Point{p.X, p.Y})
}

// Distance returns the 3-D distance, m, from p (cell frame, m) to the prism:
// 0 exactly when [Solid.Contains] reports p inside, otherwise the length of
// the shortest segment from p to the prism. NaN when p has a NaN coordinate.
func (s Solid) Distance(p r3.Vec) float64 {
	if math.IsNaN(p.Z) {
		return math.NaN()
	}
	d := s.Footprint.Distance(orb.Point{p.X, p.Y})
	v := math.Max(0, math.Max(s.ZMin-p.Z, p.Z-s.ZMax))
	if math.IsNaN(d) {
		return d
	}
	if d <= 0 {
		return v // inside the slab, or straight above or below the footprint
	}
	return math.Hypot(d, v)
}

// SegmentHits reports whether the 3-D segment from a to b (cell frame, m)
// meets the prism; touching a face, edge or corner counts as a hit. The test
// is exact up to [BoundaryTol] in plan: the segment is clipped to the height
// slab ZMin <= z <= ZMax, and the clipped piece is tested in plan against
// the footprint: a hit exactly when [Footprint.SegmentDistance] of the
// clipped piece is 0.
//
// Special cases are:
//
//	a == b: the point test s.Contains(a)
//	a horizontal segment (a.Z == b.Z): a miss unless ZMin <= a.Z <= ZMax
//	any NaN coordinate: false
func (s Solid) SegmentHits(a, b r3.Vec) bool {
	return s.segmentHits(a, b, s.Footprint.Bound().Pad(indexPad))
}

// segmentHits is SegmentHits given the footprint's bound widened by at least
// BoundaryTol, which rejects most misses cheaply.
func (s Solid) segmentHits(a, b r3.Vec, bound orb.Bound) bool {
	pa, pb, ok := s.clip(a, b)
	if !ok {
		return false
	}
	seg := orb.Bound{
		Min: orb.Point{math.Min(pa[0], pb[0]), math.Min(pa[1], pb[1])},
		Max: orb.Point{math.Max(pa[0], pb[0]), math.Max(pa[1], pb[1])},
	}
	if !seg.Intersects(bound) {
		return false
	}
	return s.Footprint.touchesSegment(pa, pb, bound)
}

// clip returns the plan endpoints of the part of segment ab inside the
// height slab of s, and false when no part is (or a coordinate is NaN).
func (s Solid) clip(a, b r3.Vec) (orb.Point, orb.Point, bool) {
	t0, t1 := 0.0, 1.0
	dz := b.Z - a.Z
	switch {
	case math.IsNaN(dz):
		return orb.Point{}, orb.Point{}, false
	case dz == 0:
		if a.Z < s.ZMin || a.Z > s.ZMax {
			return orb.Point{}, orb.Point{}, false
		}
	default:
		ta, tb := (s.ZMin-a.Z)/dz, (s.ZMax-a.Z)/dz
		if ta > tb {
			ta, tb = tb, ta
		}
		t0, t1 = math.Max(t0, ta), math.Min(t1, tb)
		if !(t0 <= t1) {
			return orb.Point{}, orb.Point{}, false
		}
	}
	return lerpPlan(a, b, t0), lerpPlan(a, b, t1), true
}

// lerpPlan returns the plan position of a + t·(b − a), exactly a at t = 0
// and exactly b at t = 1.
func lerpPlan(a, b r3.Vec, t float64) orb.Point {
	switch t {
	case 0:
		return orb.Point{a.X, a.Y}
	case 1:
		return orb.Point{b.X, b.Y}
	}
	return orb.Point{a.X + t*(b.X-a.X), a.Y + t*(b.Y-a.Y)}
}
