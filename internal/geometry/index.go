package geometry

import (
	"fmt"
	"math"
	"slices"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"
)

// maxGridSide caps the number of grid cells along each axis of an [Index].
const maxGridSide = 1024

// maxCellsPerSolid caps the average number of grid cells an [Index] lists
// each solid in. About one grid cell per solid is right for solids smaller
// than the gaps between them; in a crowd of solids that overlap one another
// that grid is finer than the solids, and each would be listed in a number
// of grid cells that grows with the crowd (20,000 poles piled on one spot:
// 400 million entries). The grid is coarsened until the cap holds.
const maxCellsPerSolid = 16

// indexPad is how far, m, each solid's plan bound and each query are widened
// before they are placed on the grid, so that a solid within BoundaryTol of a
// query is always among the candidates despite rounding.
const indexPad = 2 * BoundaryTol

// Index is a uniform-grid spatial index over solids in plan, for answering
// many segment and neighbourhood queries quickly. The grid covers the plan
// bound of all solids with about one grid cell per solid; each solid is
// listed in every grid cell its bound overlaps. A query visits only the grid
// cells it passes through and tests the solids listed there exactly, so its
// time depends on the local crowding, not on the total number of solids.
//
// Build an Index once with [NewIndex] and query it many times. Queries do not
// modify it and allocate nothing beyond growing the slice they append to, so
// one Index may be queried from many goroutines at once. The solids are
// copied when the index is built; later changes to the caller's slice are not
// seen.
type Index struct {
	solids []Solid
	bounds []orb.Bound // plan bound of each footprint, widened by indexPad
	home   [][2]int32  // lowest grid column and row of each solid
	grid   orb.Bound   // covers every bound
	nx, ny int         // grid columns and rows
	sx, sy float64     // grid cell width and height, m
	start  []int32     // items[start[k]:start[k+1]] are the solids in grid cell k = row*nx + col
	items  []int32
}

// NewIndex builds an index over solids. Indices returned by queries are
// positions in solids.
//
// NewIndex panics if a footprint has a NaN or infinite coordinate or radius
// (programmer misuse: [Solid.Validate] reports it).
func NewIndex(solids []Solid) *Index {
	ix := &Index{solids: slices.Clone(solids), nx: 1, ny: 1, sx: 1, sy: 1}
	n := len(solids)
	ix.bounds = make([]orb.Bound, n)
	for i, s := range solids {
		b := s.Footprint.Bound()
		if !finite(b.Min[0]) || !finite(b.Min[1]) || !finite(b.Max[0]) || !finite(b.Max[1]) {
			panic(fmt.Sprintf("geometry: NewIndex: solid %d (%q) has a footprint that is not finite", i, s.Name))
		}
		ix.bounds[i] = b.Pad(indexPad)
		if i == 0 {
			ix.grid = ix.bounds[i]
		} else {
			ix.grid = ix.grid.Union(ix.bounds[i])
		}
	}
	if n > 0 {
		ix.sizeGrid(n)
	}
	ix.fill()
	return ix
}

// sizeGrid chooses about n square grid cells over the grid bound, or
// fewer, larger ones when the solids would otherwise be listed in more than
// maxCellsPerSolid grid cells each on average.
func (ix *Index) sizeGrid(n int) {
	w, h := ix.grid.Max[0]-ix.grid.Min[0], ix.grid.Max[1]-ix.grid.Min[1]
	side := math.Sqrt(w * h / float64(n))
	if !(side > 0) {
		side = math.Max(w, h) / float64(n)
	}
	ix.setSide(side)
	for (ix.nx > 1 || ix.ny > 1) && ix.listed() > maxCellsPerSolid*n {
		side *= 2
		ix.setSide(side)
	}
}

// listed returns how many grid cells the solids' bounds overlap in all.
func (ix *Index) listed() int {
	k := 0
	for _, b := range ix.bounds {
		k += (ix.col(b.Max[0]) - ix.col(b.Min[0]) + 1) * (ix.row(b.Max[1]) - ix.row(b.Min[1]) + 1)
	}
	return k
}

// setSide sets the grid to square cells of about side m.
func (ix *Index) setSide(side float64) {
	w, h := ix.grid.Max[0]-ix.grid.Min[0], ix.grid.Max[1]-ix.grid.Min[1]
	ix.nx, ix.ny, ix.sx, ix.sy = 1, 1, 1, 1
	if side > 0 {
		ix.nx = min(maxGridSide, max(1, int(math.Ceil(w/side))))
		ix.ny = min(maxGridSide, max(1, int(math.Ceil(h/side))))
	}
	if w > 0 {
		ix.sx = w / float64(ix.nx)
	}
	if h > 0 {
		ix.sy = h / float64(ix.ny)
	}
}

// fill lists each solid in the grid cells its bound overlaps.
func (ix *Index) fill() {
	ix.start = make([]int32, ix.nx*ix.ny+1)
	ix.home = make([][2]int32, len(ix.solids))
	for pass := range 2 {
		for i, b := range ix.bounds {
			c0, c1 := ix.col(b.Min[0]), ix.col(b.Max[0])
			r0, r1 := ix.row(b.Min[1]), ix.row(b.Max[1])
			ix.home[i] = [2]int32{int32(c0), int32(r0)}
			for r := r0; r <= r1; r++ {
				for c := c0; c <= c1; c++ {
					k := r*ix.nx + c
					if pass == 0 {
						ix.start[k+1]++
					} else {
						ix.items[ix.start[k]] = int32(i)
						ix.start[k]++
					}
				}
			}
		}
		if pass == 0 {
			for k := 1; k < len(ix.start); k++ {
				ix.start[k] += ix.start[k-1]
			}
			ix.items = make([]int32, ix.start[len(ix.start)-1])
		}
	}
	// The second pass advanced each start to the next cell's start.
	copy(ix.start[1:], ix.start[:len(ix.start)-1])
	ix.start[0] = 0
}

// col returns the grid column holding x, clamped to the grid (±Inf too).
func (ix *Index) col(x float64) int { return gridStep(x-ix.grid.Min[0], ix.sx, ix.nx) }

// row returns the grid row holding y, clamped to the grid (±Inf too).
func (ix *Index) row(y float64) int { return gridStep(y-ix.grid.Min[1], ix.sy, ix.ny) }

// gridStep returns floor(d/step) clamped to [0, n-1].
func gridStep(d, step float64, n int) int {
	f := d / step
	switch {
	case !(f >= 0):
		return 0
	case f >= float64(n):
		return n - 1
	}
	return int(f)
}

// cellItems returns the solids listed in grid cell (c, r).
func (ix *Index) cellItems(c, r int) []int32 {
	k := r*ix.nx + c
	return ix.items[ix.start[k]:ix.start[k+1]]
}

// Len returns the number of solids in the index.
func (ix *Index) Len() int { return len(ix.solids) }

// Solid returns solid i as given to NewIndex.
func (ix *Index) Solid(i int) Solid { return ix.solids[i] }

// AppendSegmentHits appends to dst the indices of the solids that the 3-D
// segment from a to b (cell frame, m) meets, as decided by
// [Solid.SegmentHits], in ascending order without duplicates, and returns
// the extended slice. It appends nothing when a coordinate is NaN or
// infinite.
func (ix *Index) AppendSegmentHits(dst []int, a, b r3.Vec) []int {
	from := len(dst)
	dst = ix.segmentHits(dst, a, b, -1, -1)
	slices.Sort(dst[from:])
	return dst
}

// AppendFirstSegmentHits appends to dst the indices of at most n solids
// other than solid skip (−1 for none) that the 3-D segment from a to b
// (cell frame, m) meets, the first found as the grid is walked
// (deterministic, but not by index), and returns the extended slice. It
// appends nothing when a coordinate is NaN or infinite. A query that needs
// only the first few hits costs about the same however many solids the
// segment passes through.
func (ix *Index) AppendFirstSegmentHits(dst []int, a, b r3.Vec, n, skip int) []int {
	if n <= 0 {
		return dst
	}
	return ix.segmentHits(dst, a, b, n, skip)
}

// segmentHits appends the solids other than skip that segment ab meets, at
// most n of them (all when n < 0), each once, in the order the grid is
// walked.
func (ix *Index) segmentHits(dst []int, a, b r3.Vec, n, skip int) []int {
	if len(ix.solids) == 0 || !finiteVec(a) || !finiteVec(b) {
		return dst
	}
	seg := orb.Bound{
		Min: orb.Point{math.Min(a.X, b.X), math.Min(a.Y, b.Y)},
		Max: orb.Point{math.Max(a.X, b.X), math.Max(a.Y, b.Y)},
	}.Pad(indexPad)
	if !seg.Intersects(ix.grid) {
		return dst
	}
	found := 0
	// Solids already tested and missed, so that one spanning several grid
	// cells is tested once (beyond its capacity a solid may be retested,
	// which costs time but never changes the answer), and solids already
	// reported, so that each is reported once.
	var missed [64]int32
	nmissed := 0
	var reported seenSet
	c0, c1 := ix.col(seg.Min[0]), ix.col(seg.Max[0])
	for c := c0; c <= c1; c++ {
		// The rows the segment crosses within this column's x range.
		xl := math.Max(seg.Min[0], ix.grid.Min[0]+float64(c)*ix.sx)
		xr := math.Min(seg.Max[0], ix.grid.Min[0]+float64(c+1)*ix.sx)
		ylo, yhi := seg.Min[1], seg.Max[1]
		if dx := b.X - a.X; dx != 0 && c0 != c1 {
			tl := min(1, max(0, (xl-a.X)/dx))
			tr := min(1, max(0, (xr-a.X)/dx))
			yl, yr := a.Y+tl*(b.Y-a.Y), a.Y+tr*(b.Y-a.Y)
			ylo, yhi = math.Min(yl, yr)-indexPad, math.Max(yl, yr)+indexPad
		}
		if yhi < ix.grid.Min[1] || ylo > ix.grid.Max[1] {
			continue // the segment passes above or below the grid here
		}
		// the piece of the segment over this column: a solid whose bound
		// misses it cannot be hit here
		piece := orb.Bound{Min: orb.Point{xl - indexPad, ylo}, Max: orb.Point{xr + indexPad, yhi}}
		for r := ix.row(ylo); r <= ix.row(yhi); r++ {
			for _, id := range ix.cellItems(c, r) {
				i := int(id)
				if i == skip || !ix.bounds[i].Intersects(piece) || slices.Contains(missed[:nmissed], id) || reported.has(id) {
					continue
				}
				if !ix.solids[i].segmentHits(a, b, ix.bounds[i]) {
					if nmissed < len(missed) {
						missed[nmissed] = id
						nmissed++
					}
					continue
				}
				reported.add(id)
				dst = append(dst, i)
				if found++; found == n {
					return dst
				}
			}
		}
	}
	return dst
}

// AppendNear appends to dst the indices of the solids whose footprint comes
// within radius (m) of plan point p (m), that is Footprint.Distance(p) <=
// radius, in ascending order without duplicates, and returns the extended
// slice. Heights are ignored. A footprint containing p always qualifies.
// It appends nothing when p or radius is NaN or radius is negative.
func (ix *Index) AppendNear(dst []int, p orb.Point, radius float64) []int {
	if len(ix.solids) == 0 || isNaNPoint(p) || !(radius >= 0) {
		return dst
	}
	from := len(dst)
	q := orb.Bound{Min: p, Max: p}.Pad(radius + indexPad)
	if !q.Intersects(ix.grid) {
		return dst
	}
	c0, c1 := ix.col(q.Min[0]), ix.col(q.Max[0])
	r0, r1 := ix.row(q.Min[1]), ix.row(q.Max[1])
	for r := r0; r <= r1; r++ {
		for c := c0; c <= c1; c++ {
			for _, id := range ix.cellItems(c, r) {
				i := int(id)
				// A solid listed in several visited cells is handled only in
				// the first of them: its lowest column and row in the query.
				h := ix.home[i]
				if c != max(int(h[0]), c0) || r != max(int(h[1]), r0) {
					continue
				}
				if boundDist2(ix.bounds[i], p) > sq(radius+indexPad) {
					continue
				}
				if ix.solids[i].Footprint.Distance(p) <= radius {
					dst = append(dst, i)
				}
			}
		}
	}
	slices.Sort(dst[from:])
	return dst
}

// finiteVec reports whether every coordinate of v is finite.
func finiteVec(v r3.Vec) bool { return finite(v.X) && finite(v.Y) && finite(v.Z) }

// seenSet is a set of solid indices: a short list on the stack, then a map
// when it grows. The zero value is empty.
type seenSet struct {
	few  [32]int32
	n    int
	many map[int32]bool
}

// has reports whether id is in the set.
func (s *seenSet) has(id int32) bool {
	if s.many != nil {
		return s.many[id]
	}
	return slices.Contains(s.few[:s.n], id)
}

// add adds id, which is not in the set.
func (s *seenSet) add(id int32) {
	switch {
	case s.many != nil:
		s.many[id] = true
	case s.n < len(s.few):
		s.few[s.n] = id
		s.n++
	default:
		s.many = make(map[int32]bool, 2*len(s.few))
		for _, f := range s.few {
			s.many[f] = true
		}
		s.many[id] = true
	}
}
