package sheet

import (
	"math"
	"slices"
)

// treeLeaf is the most boxes a leaf of a boxTree holds.
const treeLeaf = 8

// boxTree indexes the placer's fixed boxes (station symbols, marks and
// the other drawn things labels keep off) for the placer's queries. A
// crowded plan piles thousands of symbols on one spot, where a grid cell
// would hold them all and every query near the pile would read each one;
// the tree splits the boxes by their centres (the wider spread first, at
// the median) and keeps, for each node, the union and the intersection of
// its boxes. A query that misses the union skips the node; one that meets
// the intersection meets every box of the node and is answered there, so
// that a pile costs about as much as a single box.
//
// Every query gives the same answer as a test of each box in turn: the
// answers do not depend on the order of the boxes.
type boxTree struct {
	items []pitem // in tree order: a node holds items[lo:hi]
	nodes []tnode // nodes[0] is the root
}

// tnode is a node of a boxTree.
type tnode struct {
	lo, hi      int
	left, right int // child nodes, 0 at a leaf
	union       bnd // the smallest box holding every box of the node
	common      bnd // the part common to every box (empty: x0 > x1 or y0 > y1)
	// centres bounds the centres of the node's station symbols; marks
	// counts them
	centres bnd
	marks   int
}

// bnd is a box by its edges, mm. Its edges are those computed from a Rect
// (X, Y, Right(), Bottom()), so that comparing a query with a node's
// bounds rounds the same way as comparing it with the box that gave them.
type bnd struct{ x0, y0, x1, y1 float64 }

func bndOf(r Rect) bnd { return bnd{r.X, r.Y, r.Right(), r.Bottom()} }

// emptyBnd is the union of no boxes and the intersection of every box.
var emptyBnd = bnd{math.Inf(1), math.Inf(1), math.Inf(-1), math.Inf(-1)}

func (b bnd) grow(o bnd) bnd {
	return bnd{math.Min(b.x0, o.x0), math.Min(b.y0, o.y0), math.Max(b.x1, o.x1), math.Max(b.y1, o.y1)}
}

func (b bnd) cut(o bnd) bnd {
	return bnd{math.Max(b.x0, o.x0), math.Max(b.y0, o.y0), math.Min(b.x1, o.x1), math.Min(b.y1, o.y1)}
}

// overlaps is Rect.Overlaps(q, 0) for b: true for b's union only if some
// box of the node may overlap q, for b's intersection (even empty) only
// if every box does.
func (b bnd) overlaps(q Rect) bool {
	return b.x0 < q.Right() && q.X < b.x1 && b.y0 < q.Bottom() && q.Y < b.y1
}

// holdsOpen reports whether p lies strictly inside b.
func (b bnd) holdsOpen(p Pt) bool { return b.x0 < p.X && p.X < b.x1 && b.y0 < p.Y && p.Y < b.y1 }

// holds reports whether p lies inside b or on its edge.
func (b bnd) holds(p Pt) bool { return b.x0 <= p.X && p.X <= b.x1 && b.y0 <= p.Y && p.Y <= b.y1 }

// centre returns the centre of box r, as nearerMark takes it.
func centre(r Rect) Pt { return Pt{r.X + r.W/2, r.Y + r.H/2} }

// newBoxTree builds the tree of items (which it reorders).
func newBoxTree(items []pitem) *boxTree {
	t := &boxTree{items: items}
	if len(items) > 0 {
		t.nodes = make([]tnode, 0, 2*len(items)/treeLeaf+2)
		t.build(0, len(items))
	}
	return t
}

// build adds the node of items[lo:hi] and its children and returns its
// index.
func (t *boxTree) build(lo, hi int) int {
	n := tnode{lo: lo, hi: hi, union: emptyBnd, common: bnd{math.Inf(-1), math.Inf(-1), math.Inf(1), math.Inf(1)}, centres: emptyBnd}
	for i := lo; i < hi; i++ {
		it := &t.items[i]
		b := bndOf(it.r)
		n.union, n.common = n.union.grow(b), n.common.cut(b)
		if it.mark {
			c := centre(it.r)
			n.centres = n.centres.grow(bnd{c.X, c.Y, c.X, c.Y})
			n.marks++
		}
	}
	k := len(t.nodes)
	t.nodes = append(t.nodes, n)
	if hi-lo <= treeLeaf {
		return k
	}
	// split at the median centre along the wider spread; ties keep their
	// order, so that the tree is the same on every run
	cb := emptyBnd
	for i := lo; i < hi; i++ {
		c := centre(t.items[i].r)
		cb = cb.grow(bnd{c.X, c.Y, c.X, c.Y})
	}
	byX := cb.x1-cb.x0 >= cb.y1-cb.y0
	slices.SortStableFunc(t.items[lo:hi], func(a, b pitem) int {
		ca, cb := centre(a.r), centre(b.r)
		if byX {
			return cmpFloat(ca.X, cb.X)
		}
		return cmpFloat(ca.Y, cb.Y)
	})
	mid := (lo + hi) / 2
	l := t.build(lo, mid)
	r := t.build(mid, hi)
	t.nodes[k].left, t.nodes[k].right = l, r
	return k
}

func cmpFloat(a, b float64) int {
	switch {
	case a < b:
		return -1
	case a > b:
		return 1
	}
	return 0
}

// overlaps reports whether some box overlaps q (Rect.Overlaps with no
// gap).
func (t *boxTree) overlaps(q Rect) bool { return len(t.nodes) > 0 && t.overlapsAt(0, q) }

func (t *boxTree) overlapsAt(k int, q Rect) bool {
	n := &t.nodes[k]
	if !n.union.overlaps(q) {
		return false
	}
	if n.common.overlaps(q) {
		return true
	}
	if n.left == 0 {
		for i := n.lo; i < n.hi; i++ {
			if t.items[i].r.Overlaps(q, 0) {
				return true
			}
		}
		return false
	}
	return t.overlapsAt(n.left, q) || t.overlapsAt(n.right, q)
}

// count returns the number of boxes that overlap q.
func (t *boxTree) count(q Rect) int {
	if len(t.nodes) == 0 {
		return 0
	}
	return t.countAt(0, q)
}

func (t *boxTree) countAt(k int, q Rect) int {
	n := &t.nodes[k]
	switch {
	case !n.union.overlaps(q):
		return 0
	case n.common.overlaps(q):
		return n.hi - n.lo
	case n.left == 0:
		c := 0
		for i := n.lo; i < n.hi; i++ {
			if t.items[i].r.Overlaps(q, 0) {
				c++
			}
		}
		return c
	}
	return t.countAt(n.left, q) + t.countAt(n.right, q)
}

// segHits reports whether the segment ab meets some box shrunk by gap
// (segHitsRect), leaving out the boxes that hold a strictly inside.
func (t *boxTree) segHits(a, b Pt, gap float64) bool {
	return len(t.nodes) > 0 && t.segHitsAt(0, a, b, gap)
}

func (t *boxTree) segHitsAt(k int, a, b Pt, gap float64) bool {
	n := &t.nodes[k]
	switch {
	case !segHitsEdges(a, b, n.union, gap):
		return false
	case n.common.holdsOpen(a):
		return false // every box holds a
	case !n.union.holdsOpen(a) && segHitsEdges(a, b, n.common, gap):
		return true // no box holds a, and ab meets them all
	case n.left == 0:
		for i := n.lo; i < n.hi; i++ {
			it := &t.items[i]
			if !bndOf(it.r).holdsOpen(a) && segHitsRect(a, b, it.r, gap) {
				return true
			}
		}
		return false
	}
	return t.segHitsAt(n.left, a, b, gap) || t.segHitsAt(n.right, a, b, gap)
}

// markNear reports whether the centre of a station symbol that does not
// hold anchor (edges included) lies nearer than gap to box r.
func (t *boxTree) markNear(r Rect, anchor Pt, gap float64) bool {
	return len(t.nodes) > 0 && t.markNearAt(0, r, anchor, gap)
}

func (t *boxTree) markNearAt(k int, r Rect, anchor Pt, gap float64) bool {
	n := &t.nodes[k]
	if n.marks == 0 || n.common.holds(anchor) {
		return false
	}
	// the centres' box lies at least dx, dy from r; the slack keeps the
	// test from leaving out a centre that rounding brings just inside
	dx := math.Max(0, math.Max(r.X-n.centres.x1, n.centres.x0-r.Right()))
	dy := math.Max(0, math.Max(r.Y-n.centres.y1, n.centres.y0-r.Bottom()))
	if math.Hypot(dx, dy) > gap*(1+1e-9)+1e-9 {
		return false
	}
	if n.left == 0 {
		for i := n.lo; i < n.hi; i++ {
			it := &t.items[i]
			if !it.mark || bndOf(it.r).holds(anchor) {
				continue
			}
			c := centre(it.r)
			if dist(rectEdgePoint(r, c), c) < gap {
				return true
			}
		}
		return false
	}
	return t.markNearAt(n.left, r, anchor, gap) || t.markNearAt(n.right, r, anchor, gap)
}
