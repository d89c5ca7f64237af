package sheet

import (
	"math"
	"sort"
)

// hatchSegments returns the segments of a family of parallel lines at angle
// deg (degrees from the page's +x axis, counter-clockwise as seen on the
// page, whose y axis points down) and spacing (mm) that lie inside the
// region bounded by rings (page mm), by the even-odd rule: a hole ring
// inside an outer ring is left empty. The lines are anchored at the page
// origin, so neighbouring shapes of the same style hatch in step.
//
// A spacing that is not positive gives no segments.
func hatchSegments(rings [][]Pt, deg, spacing float64) [][2]Pt {
	if !(spacing > 0) {
		return nil
	}
	// rotate the page by −deg (as seen on the page) so that the hatch lines
	// are horizontal: on a y-down page a counter-clockwise turn by a is the
	// matrix rotation by −a.
	s, c := math.Sincos(deg * math.Pi / 180)
	toH := func(p Pt) Pt { return Pt{p.X*c - p.Y*s, p.X*s + p.Y*c} }
	fromH := func(p Pt) Pt { return Pt{p.X*c + p.Y*s, -p.X*s + p.Y*c} }
	type edge struct{ a, b Pt }
	var edges []edge
	ymin, ymax := math.Inf(1), math.Inf(-1)
	for _, r := range rings {
		n := len(r)
		if n < 2 {
			continue
		}
		for i := range n {
			a, b := toH(r[i]), toH(r[(i+1)%n])
			if a.Y == b.Y {
				continue
			}
			edges = append(edges, edge{a, b})
			ymin, ymax = math.Min(ymin, math.Min(a.Y, b.Y)), math.Max(ymax, math.Max(a.Y, b.Y))
		}
	}
	if len(edges) == 0 {
		return nil
	}
	var out [][2]Pt
	var xs []float64
	for k := math.Ceil(ymin / spacing); k*spacing <= ymax; k++ {
		y := k * spacing
		xs = xs[:0]
		for _, e := range edges {
			// half-open rule: an edge counts for ymin <= y < ymax, so a line
			// through a vertex is counted once
			y0, y1 := math.Min(e.a.Y, e.b.Y), math.Max(e.a.Y, e.b.Y)
			if y < y0 || y >= y1 {
				continue
			}
			t := (y - e.a.Y) / (e.b.Y - e.a.Y)
			xs = append(xs, e.a.X+t*(e.b.X-e.a.X))
		}
		sort.Float64s(xs)
		for i := 0; i+1 < len(xs); i += 2 {
			if xs[i+1]-xs[i] < 1e-6 {
				continue
			}
			out = append(out, [2]Pt{fromH(Pt{xs[i], y}), fromH(Pt{xs[i+1], y})})
		}
	}
	return out
}
