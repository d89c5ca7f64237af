package geometry

import (
	"math"
	"slices"

	"github.com/paulmach/orb"
)

// edgeParamSlack widens the edge parameter range [0, 1] when collecting the
// places where a ray meets the boundary (dimensionless), so that a ray
// through a vertex is never missed by rounding on both edges that meet
// there. Extra candidates are harmless: each is checked.
const edgeParamSlack = 1e-9

// FreeRay returns the distance, m, that one can travel from plan point from
// along the heading (rad from +X counter-clockwise) while staying inside the
// boundary, counting the boundary itself as inside. It is the distance to the
// first point where the ray leaves the cell.
//
// A ray that grazes the boundary and carries on inside is not stopped there,
// so the answer is the distance to where the ray actually leaves:
//
//   - a ray through a convex corner (one pointing out of the room) stops at the corner;
//   - a ray that touches a reflex corner (one pointing into the room) and
//     continues inside runs on to the far wall;
//   - a ray along an edge, on the boundary, runs to where the edge turns
//     away from the ray;
//   - from a point on the boundary, a ray heading out of the cell gives 0.
//
// Special cases are:
//
//	FreeRay = +Inf  if the cell is unbounded
//	FreeRay = 0     if from is outside the boundary
//	FreeRay = NaN   if from has a NaN coordinate or heading is NaN or ±Inf
//
// The time grows with the number of boundary vertices n as n times the
// number of places the ray meets the boundary.
func (c *Cell) FreeRay(from orb.Point, heading float64) float64 {
	if isNaNPoint(from) || !finite(heading) {
		return math.NaN()
	}
	if !c.Bounded() {
		return math.Inf(1)
	}
	if !c.Contains(from) {
		return 0
	}
	sin, cos := math.Sincos(heading)
	u := orb.Point{cos, sin}

	// Every parameter t >= 0 at which the ray meets the boundary: vertices on
	// the ray and crossings of edges. Between two consecutive ones the ray is
	// either wholly inside or wholly outside.
	var buf [64]float64
	ts := append(buf[:0], 0)
	r := c.Boundary
	for i := range r {
		w := orb.Point{r[i][0] - from[0], r[i][1] - from[1]}
		if t := w[0]*u[0] + w[1]*u[1]; t > 0 && math.Abs(cross(u, w)) <= BoundaryTol {
			ts = append(ts, t)
		}
		a, b := ringEdge(r, i)
		e := orb.Point{b[0] - a[0], b[1] - a[1]}
		den := cross(u, e)
		if den == 0 {
			continue // parallel: a collinear edge shows up through its vertices
		}
		w = orb.Point{a[0] - from[0], a[1] - from[1]}
		t, s := cross(w, e)/den, cross(w, u)/den
		if t > 0 && s >= -edgeParamSlack && s <= 1+edgeParamSlack {
			ts = append(ts, t)
		}
	}
	slices.Sort(ts)
	for k := 0; k+1 < len(ts); k++ {
		if ts[k+1] == ts[k] {
			continue
		}
		m := (ts[k] + ts[k+1]) / 2
		if !c.Contains(orb.Point{from[0] + m*u[0], from[1] + m*u[1]}) {
			return ts[k]
		}
	}
	return ts[len(ts)-1]
}

// cross returns the z component of the cross product p × q.
func cross(p, q orb.Point) float64 { return p[0]*q[1] - p[1]*q[0] }
