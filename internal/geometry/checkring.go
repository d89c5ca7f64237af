package geometry

import (
	"fmt"
	"math"

	"github.com/paulmach/orb"
	"github.com/paulmach/orb/planar"
)

// CheckRing returns nil when r is a usable plan outline, and otherwise a
// descriptive error wrapping one of the sentinel errors. Vertices are
// numbered from 1 in the order given, so the closing repeat of a ring of n
// corners is vertex n+1, and edge i-j runs from vertex i to vertex j. The
// checks, in the order made:
//
//   - every coordinate is finite ([ErrNotFinite], naming the vertex) and
//     at most [MaxCoord] in magnitude ([ErrOutOfRange]);
//   - the ring is closed: its last vertex equals its first exactly
//     ([ErrNotClosed]: "not closed: last vertex (x, y) differs from first (x, y)");
//   - it has at least 3 distinct vertices ([ErrTooFewVertices]);
//   - no edge other than the closing repeat has zero length, that is shorter
//     than [BoundaryTol] ([ErrZeroLengthEdge], naming both vertices);
//   - its vertices are not all collinear ([ErrZeroArea]): the summed
//     unsigned area of the triangles fanned from the first vertex is more
//     than BoundaryTol times the perimeter, so the ring is more than a
//     nanometre wide on average (a ring whose signed area cancels, such as a
//     bow-tie, passes this check and fails the next);
//   - it is simple: no two edges that are not neighbours come within
//     BoundaryTol of each other, and no two neighbouring edges fold back over
//     each other ([ErrSelfIntersecting], naming the two edges).
//
// Collinear consecutive vertices and either orientation are accepted.
// The simplicity check compares each edge only with the edges near it (a
// tree of boxes over the ring), so for outlines whose consecutive edges lie
// close together the time grows about linearly with the number of vertices
// (BenchmarkCheckRing).
func CheckRing(r orb.Ring) error {
	if len(r) == 0 {
		return fmt.Errorf("%w: the ring is empty, want at least 3 distinct vertices and the closing repeat", ErrTooFewVertices)
	}
	for i, p := range r {
		if !finite(p[0]) || !finite(p[1]) {
			return fmt.Errorf("%w: vertex %d is (%g, %g)", ErrNotFinite, i+1, p[0], p[1])
		}
		if math.Abs(p[0]) > MaxCoord || math.Abs(p[1]) > MaxCoord {
			return fmt.Errorf("%w: vertex %d (%g, %g) is more than %g m from the datum", ErrOutOfRange, i+1, p[0], p[1], float64(MaxCoord))
		}
	}
	first, last := r[0], r[len(r)-1]
	if first != last {
		return fmt.Errorf("%w: last vertex (%g, %g) differs from first (%g, %g); repeat the first vertex at the end",
			ErrNotClosed, last[0], last[1], first[0], first[1])
	}
	n := len(r) - 1 // edges, and corners counting repeats
	distinct := make(map[orb.Point]struct{}, n)
	for _, p := range r[:max(n, 1)] {
		distinct[p] = struct{}{}
	}
	if len(distinct) < 3 {
		return fmt.Errorf("%w: got %d distinct, want at least 3", ErrTooFewVertices, len(distinct))
	}
	for i := 0; i+1 < n; i++ {
		if planar.DistanceSquared(r[i], r[i+1]) <= boundaryTol2 {
			return fmt.Errorf("%w: vertex %d (%g, %g) repeats vertex %d (%g, %g)",
				ErrZeroLengthEdge, i+2, r[i+1][0], r[i+1][1], i+1, r[i][0], r[i][1])
		}
	}
	if planar.DistanceSquared(r[n-1], r[n]) <= boundaryTol2 {
		return fmt.Errorf("%w: vertex %d (%g, %g) repeats the first vertex (%g, %g) before the closing repeat",
			ErrZeroLengthEdge, n, r[n-1][0], r[n-1][1], r[n][0], r[n][1])
	}
	if spread, perim := fanArea(r), planar.Length(r); spread <= BoundaryTol*perim {
		return fmt.Errorf("%w: the vertices are collinear (perimeter %g m)", ErrZeroArea, perim)
	}
	return checkSimple(r, n)
}

// checkSimple reports the first pair of edges of the closed ring r (n edges)
// that touch or cross, other than neighbours meeting at their shared vertex:
// the pair (i, j), i < j, with the smallest i and then the smallest j. Each
// edge is compared only with the edges in the leaves of a ringIndex whose
// boxes its bound meets, so the time grows about as n·log n for
// outlines whose consecutive edges lie close together.
func checkSimple(r orb.Ring, n int) error {
	ix := newRingIndex(r)
	for i := range n {
		a, b := r[i], r[i+1]
		q := orb.Bound{Min: a, Max: a}.Extend(b).Pad(indexPad)
		first := -1
		ix.near(q, func(j int) {
			if j <= i || j >= n || (first >= 0 && j >= first) {
				return
			}
			c, d := r[j], r[j+1]
			neighbours := j == i+1 || (i == 0 && j == n-1)
			var bad bool
			switch {
			case !neighbours:
				bad = segSegDist2(a, b, c, d) <= boundaryTol2
			case j == i+1: // b == c is shared: does d fold back onto ab, or a onto cd?
				bad = planar.DistanceFromSegmentSquared(a, b, d) <= boundaryTol2 ||
					planar.DistanceFromSegmentSquared(c, d, a) <= boundaryTol2
			default: // closing neighbours: d == a is shared
				bad = planar.DistanceFromSegmentSquared(a, b, c) <= boundaryTol2 ||
					planar.DistanceFromSegmentSquared(c, d, b) <= boundaryTol2
			}
			if bad {
				first = j
			}
		})
		if j := first; j >= 0 {
			c, d := r[j], r[j+1]
			return fmt.Errorf("%w: edge %d-%d from (%g, %g) to (%g, %g) meets edge %d-%d from (%g, %g) to (%g, %g)",
				ErrSelfIntersecting, i+1, i+2, a[0], a[1], b[0], b[1], j+1, j+2, c[0], c[1], d[0], d[1])
		}
	}
	return nil
}

// fanArea returns the sum of the unsigned areas, m², of the triangles
// (r[0], r[i], r[i+1]): 0 exactly when all vertices are collinear.
func fanArea(r orb.Ring) float64 {
	sum := 0.0
	for i := 1; i+1 < len(r); i++ {
		sum += math.Abs(orient(r[0], r[i], r[i+1]))
	}
	return sum / 2
}
