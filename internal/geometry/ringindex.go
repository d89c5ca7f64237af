package geometry

import (
	"math"

	"github.com/paulmach/orb"
	"github.com/paulmach/orb/planar"
)

// ringIndex is a bounding-box tree over the edges of a ring in ring order,
// so that distance, containment and crossing queries visit only the edges
// near them instead of all of them. The leaves hold ringLeaf consecutive
// edges; each level above joins two neighbours. Consecutive edges of an
// outline lie close together, so the boxes are tight and a query descends
// only into the few subtrees near it: its time grows about as the logarithm
// of the number of vertices, and building the tree is linear.
//
// Its answers are exactly those of the brute-force loops over every edge
// (ringQuery, segmentsCross): the same edges are tested with the same
// arithmetic, only fewer of them, and each edge at most once.
type ringIndex struct {
	ring orb.Ring
	// levels[0][k] bounds the edges [k·ringLeaf, (k+1)·ringLeaf) (ringEdge's
	// numbering), widened by indexPad; levels[l][k] bounds levels[l-1][2k]
	// and levels[l-1][2k+1]. The last level has one box.
	levels [][]orb.Bound
}

// ringLeaf is the number of edges in a leaf of a ringIndex.
const ringLeaf = 8

// ringIndexMin is the number of vertices from which a [Cell] indexes its
// boundary; smaller rings are searched edge by edge. A variable so that the
// tests can index small rings.
var ringIndexMin = 64

// newRingIndex builds the tree over the edges of r (ringEdge's numbering;
// a missing closing vertex is the implicit closing edge). r must not be
// empty.
func newRingIndex(r orb.Ring) *ringIndex {
	ix := &ringIndex{ring: r}
	leaves := make([]orb.Bound, (len(r)+ringLeaf-1)/ringLeaf)
	for k := range leaves {
		b := orb.Bound{Min: r[k*ringLeaf], Max: r[k*ringLeaf]}
		for e := k * ringLeaf; e < min(len(r), (k+1)*ringLeaf); e++ {
			_, q := ringEdge(r, e)
			b = b.Extend(q)
		}
		leaves[k] = b.Pad(indexPad)
	}
	ix.levels = append(ix.levels, leaves)
	for lv := leaves; len(lv) > 1; {
		up := make([]orb.Bound, (len(lv)+1)/2)
		for k := range up {
			up[k] = lv[2*k]
			if 2*k+1 < len(lv) {
				up[k] = up[k].Union(lv[2*k+1])
			}
		}
		ix.levels = append(ix.levels, up)
		lv = up
	}
	return ix
}

// walk calls leaf(e) for every edge e in the leaves whose boxes, and whose
// ancestors' boxes, pass keep, going down the tree from the root.
func (ix *ringIndex) walk(keep func(b orb.Bound) bool, leaf func(e int)) {
	var down func(l, k int)
	down = func(l, k int) {
		if !keep(ix.levels[l][k]) {
			return
		}
		if l == 0 {
			for e := k * ringLeaf; e < min(len(ix.ring), (k+1)*ringLeaf); e++ {
				leaf(e)
			}
			return
		}
		for c := 2 * k; c < min(len(ix.levels[l-1]), 2*k+2); c++ {
			down(l-1, c)
		}
	}
	down(len(ix.levels)-1, 0)
}

// query returns what ringQuery(ix.ring, p) returns: the squared distance,
// m², from p to the nearest edge and whether p is inside by the even-odd
// rule. p must not be NaN.
func (ix *ringIndex) query(p orb.Point) (dist2 float64, inside bool) {
	return ix.nearest2(p), ix.inside(p)
}

// nearest2 returns the squared distance, m², from p to the nearest edge:
// branch and bound, the nearer child first.
func (ix *ringIndex) nearest2(p orb.Point) float64 {
	best := math.Inf(1)
	var down func(l, k int)
	down = func(l, k int) {
		if boundDist2(ix.levels[l][k], p) > best {
			return
		}
		if l == 0 {
			for e := k * ringLeaf; e < min(len(ix.ring), (k+1)*ringLeaf); e++ {
				a, b := ringEdge(ix.ring, e)
				if d := planar.DistanceFromSegmentSquared(a, b, p); d < best {
					best = d
				}
			}
			return
		}
		c0, c1 := 2*k, 2*k+1
		if c1 >= len(ix.levels[l-1]) {
			down(l-1, c0)
			return
		}
		if boundDist2(ix.levels[l-1][c1], p) < boundDist2(ix.levels[l-1][c0], p) {
			c0, c1 = c1, c0
		}
		down(l-1, c0)
		down(l-1, c1)
	}
	down(len(ix.levels)-1, 0)
	return best
}

// inside reports whether p is inside the ring by the even-odd rule, exactly
// as ringQuery decides it, counting only the edges in boxes that reach the
// horizontal ray to the right of p.
func (ix *ringIndex) inside(p orb.Point) bool {
	inside := false
	ix.walk(func(b orb.Bound) bool {
		return b.Min[1] <= p[1] && p[1] <= b.Max[1] && b.Max[0] >= p[0]
	}, func(e int) {
		a, b := ringEdge(ix.ring, e)
		if (a[1] > p[1]) != (b[1] > p[1]) {
			if p[0] < a[0]+(p[1]-a[1])*(b[0]-a[0])/(b[1]-a[1]) {
				inside = !inside
			}
		}
	})
	return inside
}

// touches reports whether p is within BoundaryTol of an edge: the same
// answer as nearest2(p) <= boundaryTol2, found without the nearest edge.
func (ix *ringIndex) touches(p orb.Point) bool {
	hit := false
	ix.walk(func(b orb.Bound) bool { return !hit && b.Contains(p) }, func(e int) {
		a, b := ringEdge(ix.ring, e)
		hit = hit || planar.DistanceFromSegmentSquared(a, b, p) <= boundaryTol2
	})
	return hit
}

// crossed reports whether segment ab crosses any edge at a single interior
// point of both (segmentsCross).
func (ix *ringIndex) crossed(a, b orb.Point) bool {
	q := orb.Bound{Min: a, Max: a}.Extend(b)
	hit := false
	ix.walk(func(bd orb.Bound) bool { return !hit && bd.Intersects(q) }, func(e int) {
		c, d := ringEdge(ix.ring, e)
		hit = hit || segmentsCross(a, b, c, d)
	})
	return hit
}

// near calls f for every edge in the leaves whose boxes meet b.
func (ix *ringIndex) near(b orb.Bound, f func(e int)) {
	ix.walk(func(bd orb.Bound) bool { return bd.Intersects(b) }, f)
}
