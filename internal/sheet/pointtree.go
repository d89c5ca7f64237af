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
// tree more than skip away from it, when that lies between lo and hi:
// below lo it returns some distance no greater than lo, from hi up it
// returns hi, and +Inf when every point lies within skip of p.
func (t *pointTree) nearestBeyond(p Pt, skip, lo, hi float64) float64 {
	if len(t.nodes) == 0 {
		return math.Inf(1)
	}
	best := hi
	t.nearestAt(0, p, skip, lo, &best)
	if best == hi && !t.beyondAt(0, p, skip) {
		return math.Inf(1)
	}
	return best
}

// nearestAt lowers *best to the distance from p to the nearest point of
// node k more than skip away, if nearer, and stops once *best <= lo.
func (t *pointTree) nearestAt(k int, p Pt, skip, lo float64, best *float64) {
	n := &t.nodes[k]
	// the slack keeps rounding from leaving out a point the test would
	// take
	if math.Sqrt(boxDist2(n.box, p))*(1-1e-9) >= *best {
		return
	}
	if farDist(n.box, p)*(1+1e-9) < skip {
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
	t.nearestAt(l, p, skip, lo, best)
	if *best > lo {
		t.nearestAt(r, p, skip, lo, best)
	}
}

// beyondAt reports whether a point of node k lies more than skip from p.
func (t *pointTree) beyondAt(k int, p Pt, skip float64) bool {
	n := &t.nodes[k]
	if farDist(n.box, p)*(1+1e-9) < skip {
		return false
	}
	if n.left == 0 {
		for _, i := range t.idx[n.lo:n.hi] {
			if dist(p, t.pts[i]) > skip {
				return true
			}
		}
		return false
	}
	return t.beyondAt(n.left, p, skip) || t.beyondAt(n.right, p, skip)
}

// farDist returns the distance from p to the farthest corner of box b.
func farDist(b bnd, p Pt) float64 {
	return math.Hypot(math.Max(math.Abs(p.X-b.x0), math.Abs(p.X-b.x1)), math.Max(math.Abs(p.Y-b.y0), math.Abs(p.Y-b.y1)))
}

// boxDist2 returns the squared distance from p to box b.
func boxDist2(b bnd, p Pt) float64 {
	dx := math.Max(0, math.Max(b.x0-p.X, p.X-b.x1))
	dy := math.Max(0, math.Max(b.y0-p.Y, p.Y-b.y1))
	return dx*dx + dy*dy
}
