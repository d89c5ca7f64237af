package geometry

import (
	"math"
	"sort"

	"github.com/paulmach/orb"
)

// Grid is a scalar field sampled on a regular plan grid: Values[j*NX+i] is
// the value at (X0 + i·Step, Y0 + j·Step), cell frame, m. A NaN value is a
// node without a value; no contour passes through a grid square that has
// one.
type Grid struct {
	X0, Y0, Step float64
	NX, NY       int
	Values       []float64
}

// edgeKey names a grid edge: the edge from node (i, j) to the east (h) or
// to the north (!h).
type edgeKey struct {
	i, j int
	h    bool
}

// Contours returns the lines where the field equals level, by marching
// squares with linear interpolation along the grid edges, joined into
// polylines (closed lines repeat their first point). A node exactly at the
// level counts as above it. The saddle squares are resolved by the
// square's mean value. The lines run in no particular direction.
//
// It panics if len(g.Values) != g.NX·g.NY (programmer misuse).
func (g Grid) Contours(level float64) []orb.LineString {
	if len(g.Values) != g.NX*g.NY {
		panic("geometry: Grid.Values does not hold NX·NY values")
	}
	v := func(i, j int) float64 { return g.Values[j*g.NX+i] }
	point := func(e edgeKey) orb.Point {
		a := v(e.i, e.j)
		var b float64
		x, y := g.X0+float64(e.i)*g.Step, g.Y0+float64(e.j)*g.Step
		if e.h {
			b = v(e.i+1, e.j)
		} else {
			b = v(e.i, e.j+1)
		}
		t := 0.5
		if a != b {
			t = (level - a) / (b - a)
		}
		t = math.Max(0, math.Min(1, t))
		if e.h {
			return orb.Point{x + t*g.Step, y}
		}
		return orb.Point{x, y + t*g.Step}
	}
	// segments as pairs of edges; each edge joins at most two segments
	links := map[edgeKey][]edgeKey{}
	link := func(a, b edgeKey) {
		links[a] = append(links[a], b)
		links[b] = append(links[b], a)
	}
	for j := 0; j+1 < g.NY; j++ {
		for i := 0; i+1 < g.NX; i++ {
			c := [4]float64{v(i, j), v(i+1, j), v(i+1, j+1), v(i, j+1)} // SW, SE, NE, NW
			idx := 0
			bad := false
			for k, x := range c {
				if math.IsNaN(x) {
					bad = true
				}
				if x >= level {
					idx |= 1 << k
				}
			}
			if bad || idx == 0 || idx == 15 {
				continue
			}
			s := edgeKey{i, j, true}      // south
			e := edgeKey{i + 1, j, false} // east
			n := edgeKey{i, j + 1, true}  // north
			w := edgeKey{i, j, false}     // west
			switch idx {
			case 1, 14:
				link(w, s)
			case 2, 13:
				link(s, e)
			case 3, 12:
				link(w, e)
			case 4, 11:
				link(e, n)
			case 6, 9:
				link(s, n)
			case 7, 8:
				link(w, n)
			case 5, 10:
				mean := (c[0] + c[1] + c[2] + c[3]) / 4
				if (mean >= level) == (idx == 5) {
					link(w, n) // the above-level corners SW and NE connect through the centre
					link(s, e)
				} else {
					link(w, s)
					link(e, n)
				}
			}
		}
	}
	// walk the chains, open ones from their ends first
	seen := map[edgeKey]bool{}
	var out []orb.LineString
	walk := func(start edgeKey) {
		line := orb.LineString{point(start)}
		seen[start] = true
		cur := start
		for {
			next, ok := edgeKey{}, false
			for _, nb := range links[cur] {
				if !seen[nb] {
					next, ok = nb, true
					break
				}
			}
			if !ok {
				// close a loop back to the start
				for _, nb := range links[cur] {
					if nb == start && len(line) > 2 {
						line = append(line, line[0])
						break
					}
				}
				break
			}
			seen[next] = true
			line = append(line, point(next))
			cur = next
		}
		if len(line) >= 2 {
			out = append(out, line)
		}
	}
	keys := make([]edgeKey, 0, len(links))
	for k := range links {
		keys = append(keys, k)
	}
	// deterministic order: by row, column, orientation
	sortEdges(keys)
	for _, k := range keys {
		if !seen[k] && len(links[k]) == 1 {
			walk(k)
		}
	}
	for _, k := range keys {
		if !seen[k] {
			walk(k)
		}
	}
	return out
}

// sortEdges orders edge keys by row, column and orientation.
func sortEdges(k []edgeKey) {
	less := func(a, b edgeKey) bool {
		if a.j != b.j {
			return a.j < b.j
		}
		if a.i != b.i {
			return a.i < b.i
		}
		return a.h && !b.h
	}
	sort.Slice(k, func(x, y int) bool { return less(k[x], k[y]) })
}
