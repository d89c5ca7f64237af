package sheet

import (
	"math"
	"slices"
)

// pointTree is a k-d tree of page points for nearest-neighbour queries
// that leave out the points within a given distance: stations piled on
// one spot of a crowded plan, which a sweep along x would read one by one
// for each of them.
type pointTree struct {
	pts   []Pt
	idx   []int // point indices in tree order: a node holds idx[lo:hi]
	nodes []pnode
}

// pnode is a node of a pointTree.
type pnode struct {
	lo, hi      int
	left, right int // child nodes, 0 at a leaf
	box         bnd // bounds of the node's points
}

func newPointTree(pts []Pt) *pointTree {
	t := &pointTree{pts: pts, idx: make([]int, len(pts))}
	for i := range t.idx {
		t.idx[i] = i
	}
	if len(pts) > 0 {
		t.build(0, len(pts))
	}
	return t
}

func (t *pointTree) build(lo, hi int) int {
	b := emptyBnd
	for _, i := range t.idx[lo:hi] {
		p := t.pts[i]
		b = b.grow(bnd{p.X, p.Y, p.X, p.Y})
	}
	k := len(t.nodes)
	t.nodes = append(t.nodes, pnode{lo: lo, hi: hi, box: b})
	if hi-lo <= treeLeaf {
		return k
	}
	byX := b.x1-b.x0 >= b.y1-b.y0
	slices.SortStableFunc(t.idx[lo:hi], func(i, j int) int {
		if byX {
			return cmpFloat(t.pts[i].X, t.pts[j].X)
		}
		return cmpFloat(t.pts[i].Y, t.pts[j].Y)
	})
	mid := (lo + hi) / 2
	l := t.build(lo, mid)
	r := t.build(mid, hi)
	t.nodes[k].left, t.nodes[k].right = l, r
	return k
}

// nearestBeyond returns the least distance (mm) from p to a point of the
// tree more than skip away from it, +Inf if none is.
func (t *pointTree) nearestBeyond(p Pt, skip float64) float64 {
	best := math.Inf(1)
	if len(t.nodes) > 0 {
		t.nearestAt(0, p, skip, &best)
	}
	return best
}

func (t *pointTree) nearestAt(k int, p Pt, skip float64, best *float64) {
	n := &t.nodes[k]
	b := n.box
	dx := math.Max(0, math.Max(b.x0-p.X, p.X-b.x1))
	dy := math.Max(0, math.Max(b.y0-p.Y, p.Y-b.y1))
	// the slack keeps rounding from leaving out a point the test would
	// take
	if math.Hypot(dx, dy)*(1-1e-9) >= *best {
		return
	}
	fx := math.Max(math.Abs(p.X-b.x0), math.Abs(p.X-b.x1))
	fy := math.Max(math.Abs(p.Y-b.y0), math.Abs(p.Y-b.y1))
	if math.Hypot(fx, fy)*(1+1e-9) < skip {
		return // every point is within skip
	}
	if n.left == 0 {
		for _, i := range t.idx[n.lo:n.hi] {
			if d := dist(p, t.pts[i]); d > skip && d < *best {
				*best = d
			}
		}
		return
	}
	// the nearer child first
	l, r := n.left, n.right
	if boxDist2(t.nodes[r].box, p) < boxDist2(t.nodes[l].box, p) {
		l, r = r, l
	}
	t.nearestAt(l, p, skip, best)
	t.nearestAt(r, p, skip, best)
}

// boxDist2 returns the squared distance from p to box b.
func boxDist2(b bnd, p Pt) float64 {
	dx := math.Max(0, math.Max(b.x0-p.X, p.X-b.x1))
	dy := math.Max(0, math.Max(b.y0-p.Y, p.Y-b.y1))
	return dx*dx + dy*dy
}
