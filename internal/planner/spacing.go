package planner

import (
	"cmp"
	"fmt"
	"math"
	"slices"

	"github.com/paulmach/orb"

	"arcwright/internal/geometry"
)

// spacingCap is the most overlapping (or too close) stands the spacing
// check counts; a station with more says "more than 100". Counting stops
// there so that a crowd of thousands of stands costs each station about as
// much as a crowd of a hundred.
const spacingCap = 100

// spacingLeaf is the most stands in a leaf of a [standTree].
const spacingLeaf = 8

// standTree is a k-d tree over the stands' plan centres. Each node keeps
// the bound of its centres, the largest footprint and sight-line radius
// below it and its lowest station index, so that a search for the deepest
// overlap can skip a node when no stand under it can come closer (a large
// base far away is still found: the bound is taken with the node's largest
// radius, not the searching stand's).
type standTree struct {
	feet  []foot    // footprint for the spacing check, by station
	sight []float64 // radius of the stand's sight-line solid, by station
	perm  []int32   // station indices in tree order
	leaf  int32     // the most stands in a leaf
	nodes []standNode
}

// standNode is a node of a standTree: the stands perm[lo:hi].
type standNode struct {
	b           orb.Bound // bound of the centres
	maxR, maxS  float64   // largest footprint and sight-line radius, m
	minIdx      int32     // lowest station index
	lo, hi      int32
	left, right int32 // children; -1 for a leaf
}

// newStandTree builds the tree over feet; sight[i] is the radius of stand
// i's sight-line solid (its pole), which sets how far the check reaches.
func newStandTree(feet []foot, sight []float64) *standTree {
	return newStandTreeLeaf(feet, sight, spacingLeaf)
}

// newStandTreeLeaf builds the tree with at most leaf stands in a leaf.
func newStandTreeLeaf(feet []foot, sight []float64, leaf int) *standTree {
	t := &standTree{feet: feet, sight: sight, leaf: int32(max(1, leaf)), perm: make([]int32, len(feet))}
	for i := range t.perm {
		t.perm[i] = int32(i)
	}
	if len(feet) > 0 {
		t.nodes = make([]standNode, 0, 2*len(feet)/int(t.leaf)+1)
		t.build(0, int32(len(feet)))
	}
	return t
}

// build adds the node over perm[lo:hi] and its children, and returns its
// position.
func (t *standTree) build(lo, hi int32) int32 {
	n := standNode{lo: lo, hi: hi, left: -1, right: -1, minIdx: math.MaxInt32}
	for k, i := range t.perm[lo:hi] {
		f := t.feet[i]
		if k == 0 {
			n.b = orb.Bound{Min: f.at, Max: f.at}
		} else {
			n.b = n.b.Extend(f.at)
		}
		n.maxR = math.Max(n.maxR, f.r)
		n.maxS = math.Max(n.maxS, t.sight[i])
		n.minIdx = min(n.minIdx, i)
	}
	at := int32(len(t.nodes))
	t.nodes = append(t.nodes, n)
	if hi-lo <= t.leaf {
		return at
	}
	axis := 0
	if n.b.Max[1]-n.b.Min[1] > n.b.Max[0]-n.b.Min[0] {
		axis = 1
	}
	slices.SortFunc(t.perm[lo:hi], func(a, b int32) int {
		return cmp.Or(cmp.Compare(t.feet[a].at[axis], t.feet[b].at[axis]), cmp.Compare(a, b))
	})
	mid := lo + (hi-lo)/2
	l := t.build(lo, mid)
	r := t.build(mid, hi)
	t.nodes[at].left, t.nodes[at].right = l, r
	return at
}

// spread is what the spacing check finds around one stand: the smallest
// gap to another stand within reach (negative for an overlap) and whose,
// and how many stands overlap it or come closer than the spacing asked.
// The counts are exact up to spacingCap; beyond it they only say "more".
type spread struct {
	best            float64 // smallest gap, m; +Inf when no stand is within reach
	who             int     // its station (the lowest index on a tie); −1 for none
	overlaps, close int
}

// near finds the spread of stand i: every other stand whose sight-line
// solid comes within me.r + maxFoot + spacing of its centre is within
// reach (as geometry.Index.AppendNear would list it); the gap to stand j is
// the distance between centres less both footprint radii. It returns what
// a scan of every stand would, counts above spacingCap aside, visiting only
// the nodes that could change the answer.
func (t *standTree) near(i int, maxFoot, spacing float64) spread {
	s := spread{best: math.Inf(1), who: -1}
	if len(t.nodes) == 0 {
		return s
	}
	me := t.feet[i]
	reach := me.r + maxFoot + spacing
	q := query{t: t, i: i, me: me, reach: reach, prune: math.Max(reach, geometry.BoundaryTol), spacing: spacing, s: &s}
	q.visit(0)
	return s
}

// query is one search of a standTree.
type query struct {
	t              *standTree
	i              int
	me             foot
	reach, spacing float64
	prune          float64 // reach, or BoundaryTol if larger: Distance reads a gap that small as 0
	s              *spread
}

// lower returns a lower bound on the centre distance from the searching
// stand to any centre under node n, never above what math.Hypot gives for
// any of them (a margin of a few units in the last place covers Hypot's
// rounding), so that comparisons with computed gaps are exact.
func (q *query) lower(n *standNode) float64 {
	p := q.me.at
	dx := math.Max(0, math.Max(n.b.Min[0]-p[0], p[0]-n.b.Max[0]))
	dy := math.Max(0, math.Max(n.b.Min[1]-p[1], p[1]-n.b.Max[1]))
	return math.Hypot(dx, dy) * (1 - 1e-15)
}

// wanted reports whether node n, whose centres are at least d away, can
// change the answer: hold a stand within reach that comes closer than the
// best so far (or as close, with a lower index), or one that the counts
// still need.
func (q *query) wanted(n *standNode, d float64) bool {
	if d-n.maxS > q.prune {
		return false // no sight-line solid under n comes within reach
	}
	s := q.s
	lb := d - q.me.r - n.maxR // computed as the gaps are: never above any of them
	switch {
	case lb < s.best || lb == s.best && int(n.minIdx) < s.who:
		return true
	case s.overlaps > spacingCap:
		return false
	case lb < 0:
		return true
	}
	return s.close <= spacingCap && lb < q.spacing
}

// visit searches node k, the nearer child first.
func (q *query) visit(k int32) {
	n := &q.t.nodes[k]
	if n.left < 0 {
		for _, j := range q.t.perm[n.lo:n.hi] {
			q.offer(int(j))
		}
		return
	}
	a, b := &q.t.nodes[n.left], &q.t.nodes[n.right]
	da, db := q.lower(a), q.lower(b)
	first, second := n.left, n.right
	if db < da || db == da && b.minIdx < a.minIdx {
		first, second, da, db, a, b = second, first, db, da, b, a
	}
	if q.wanted(a, da) {
		q.visit(first)
	}
	if q.wanted(b, db) {
		q.visit(second)
	}
}

// offer counts stand j if it is within reach.
func (q *query) offer(j int) {
	if j == q.i {
		return
	}
	o := q.t.feet[j]
	if geometry.Circle(o.at, q.t.sight[j]).Distance(q.me.at) > q.reach {
		return
	}
	s := q.s
	g := math.Hypot(o.at[0]-q.me.at[0], o.at[1]-q.me.at[1]) - q.me.r - o.r
	if g < s.best || g == s.best && j < s.who {
		s.best, s.who = g, j
	}
	switch {
	case g < 0:
		s.overlaps++
	case g < q.spacing:
		s.close++
	}
}

// spacing checks the gap to the nearest other stand and counts the stands
// that overlap this one (or come closer than the layout asks), up to
// spacingCap, so that a crowd of stands gives one short reason, not a list,
// and costs each station about the same however large it is. The verdict
// rests on the smallest gap alone, which the search finds exactly.
func (ck *checker) spacing(st *Station, i int) Check {
	s := ck.spread.near(i, ck.maxFoot, ck.lim.StandSpacing)
	best := s.best
	c := Check{Name: CheckSpacing, Value: best, Unit: "m", Verdict: OK}
	if s.who < 0 {
		c.Reason = fmt.Sprintf("no other stand within %s", ck.m(ck.lim.StandSpacing))
		return c
	}
	other := ck.stands.Solid(s.who).Name
	switch {
	case s.overlaps > 1:
		c.Verdict = Blocked
		c.Reason = fmt.Sprintf("overlaps %s other stands, the stand of %s most, by %s", count(s.overlaps), other, ck.m(-best))
	case best < 0:
		c.Verdict = Blocked
		c.Reason = fmt.Sprintf("overlaps the stand of %s by %s", other, ck.m(-best))
	case s.close > 1:
		c.Verdict = Warn
		c.Reason = fmt.Sprintf("%s other stands closer than the %s the layout asks, the stand of %s nearest, at %s", count(s.close), ck.m(ck.lim.StandSpacing), other, ck.m(best))
	case best < ck.lim.StandSpacing:
		c.Verdict = Warn
		c.Reason = fmt.Sprintf("%s from the stand of %s; the layout asks %s", ck.m(best), other, ck.m(ck.lim.StandSpacing))
	default:
		c.Reason = fmt.Sprintf("%s from the stand of %s", ck.m(best), other)
	}
	return c
}

// count prints a count of stands that stops at spacingCap.
func count(n int) string {
	if n > spacingCap {
		return fmt.Sprintf("more than %d", spacingCap)
	}
	return fmt.Sprint(n)
}
