package sheet

import (
	"math"
)

// labelGap is the clear space kept between two label boxes and between a
// label and a mark, mm.
const labelGap = 0.3

// placer keeps the boxes already taken in a view (labels, marks, symbols)
// and the leader lines, and finds a free spot for each new label. They lie
// in a uniform grid of cells. Labels and leaders never pile up there,
// since a label goes only where it is clear of the others; the fixed boxes
// (station symbols, marks, the drawn things labels keep off) can, by the
// thousand on one spot of a crowded plan: those that come to a cell that
// holds cellCap fixed boxes already go to a boxTree instead. The fixed
// boxes are added before the labels near them are placed: the tree is
// rebuilt when more than pendingMax boxes came after it.
type placer struct {
	bounds Rect    // labels must lie inside
	cell   float64 // grid cell size, mm
	grid   map[[2]int][]int
	items  []pitem // the boxes and leaders in the grid
	seen   []uint32
	gen    uint32
	nfixed map[[2]int]int // the number of fixed boxes in each cell
	fixed  []pitem        // the fixed boxes beyond cellCap, in the order added
	tree   *boxTree
	built  int // fixed[:built] are in tree
	// hatch is the raster of the view's hatched regions, nil when none:
	// a label keeps off it where it can (see find)
	hatch *hatchMask
	cands []cand // the far candidates of the label being placed
	// misses holds the labels whose far search found no room, by the
	// cell of side missR their anchor lies in (see find)
	misses map[[2]int][]miss
}

// pendingMax is the most fixed boxes the placer tests one by one before
// it rebuilds its tree; cellCap is the most fixed boxes in a grid cell.
const (
	pendingMax = 16
	cellCap    = 32
)

// pitem is a taken box or a leader segment.
type pitem struct {
	r     Rect
	a, b  Pt
	seg   bool
	label bool // a label box, which leaders must not cross
	mark  bool // a station's symbol, which another station's label keeps away from
}

func newPlacer(bounds Rect) *placer {
	return &placer{bounds: bounds, cell: 4, grid: make(map[[2]int][]int), nfixed: make(map[[2]int]int), tree: &boxTree{}}
}

// hatchFrom rasters the hatched regions among shapes (the zones, keep-outs
// and treatment drawn so far) for the labels placed from now on to keep
// off.
func (p *placer) hatchFrom(shapes []Shape) { p.hatch = newHatchMask(p.bounds, shapes) }

// onHatch returns the hatched share (0–1) of label box r with its gap
// round it.
func (p *placer) onHatch(r Rect) float64 {
	return p.hatch.frac(Rect{r.X - labelGap, r.Y - labelGap, r.W + 2*labelGap, r.H + 2*labelGap})
}

func (p *placer) cellRange(r Rect) (int, int, int, int) {
	return int(math.Floor(r.X / p.cell)), int(math.Floor(r.Y / p.cell)),
		int(math.Floor(r.Right() / p.cell)), int(math.Floor(r.Bottom() / p.cell))
}

func (p *placer) insert(it pitem, r Rect) {
	x0, y0, x1, y1 := p.cellRange(r)
	fixed := !it.seg && !it.label
	if fixed {
		for gx := x0; gx <= x1; gx++ {
			for gy := y0; gy <= y1; gy++ {
				if p.nfixed[[2]int{gx, gy}] >= cellCap {
					p.fixed = append(p.fixed, it)
					return
				}
			}
		}
	}
	i := len(p.items)
	p.items = append(p.items, it)
	p.seen = append(p.seen, 0)
	for gx := x0; gx <= x1; gx++ {
		for gy := y0; gy <= y1; gy++ {
			k := [2]int{gx, gy}
			p.grid[k] = append(p.grid[k], i)
			if fixed {
				p.nfixed[k]++
			}
		}
	}
}

// pending returns the fixed boxes not in the tree, after rebuilding the
// tree if they are many.
func (p *placer) pending() []pitem {
	if len(p.fixed)-p.built > pendingMax {
		p.tree = newBoxTree(append([]pitem(nil), p.fixed...))
		p.built = len(p.fixed)
	}
	return p.fixed[p.built:]
}

// block marks r as taken by a mark or symbol.
func (p *placer) block(r Rect) { p.insert(pitem{r: r}, r) }

// mark marks r as taken by a station's symbol.
func (p *placer) mark(r Rect) { p.insert(pitem{r: r, mark: true}, r) }

// take marks r as taken by a label.
func (p *placer) take(r Rect) { p.insert(pitem{r: r, label: true}, r) }

// leader records a leader line from a to b.
func (p *placer) leader(a, b Pt) {
	p.insert(pitem{a: a, b: b, seg: true}, boundOf([]Pt{a, b}))
}

// visit calls f for every item of the grid near r once.
func (p *placer) visit(r Rect, f func(it *pitem) bool) bool {
	p.gen++
	x0, y0, x1, y1 := p.cellRange(r)
	for gx := x0; gx <= x1; gx++ {
		for gy := y0; gy <= y1; gy++ {
			for _, i := range p.grid[[2]int{gx, gy}] {
				if p.seen[i] == p.gen {
					continue
				}
				p.seen[i] = p.gen
				if !f(&p.items[i]) {
					return false
				}
			}
		}
	}
	return true
}

// free reports whether a label box r lies inside the bounds and clear of
// every taken box (by labelGap) and leader line.
func (p *placer) free(r Rect) bool {
	if !p.bounds.Contains(r) {
		return false
	}
	grown := Rect{r.X - labelGap, r.Y - labelGap, r.W + 2*labelGap, r.H + 2*labelGap}
	if !p.visit(grown, func(it *pitem) bool {
		if it.seg {
			return !segHitsRect(it.a, it.b, grown, 0)
		}
		return !it.r.Overlaps(grown, 0)
	}) {
		return false
	}
	for _, it := range p.pending() {
		if it.r.Overlaps(grown, 0) {
			return false
		}
	}
	return len(p.fixed) == 0 || !p.tree.overlaps(grown)
}

// boxesOver returns the number of taken boxes (not leaders) that overlap
// r.
func (p *placer) boxesOver(r Rect) int {
	n := 0
	if len(p.fixed) > 0 {
		n = p.tree.count(r)
	}
	for _, it := range p.pending() {
		if it.r.Overlaps(r, 0) {
			n++
		}
	}
	p.visit(r, func(it *pitem) bool {
		if !it.seg && it.r.Overlaps(r, 0) {
			n++
		}
		return true
	})
	return n
}

// leaderGap is how far (mm) a leader keeps inside the edges of the boxes
// it must not cross.
const leaderGap = 0.05

// clearPath reports whether a leader from a to b crosses no taken box but
// those that hold a (the mark the leader leaves).
func (p *placer) clearPath(a, b Pt) bool {
	if !p.visit(boundOf([]Pt{a, b}), func(it *pitem) bool {
		if it.seg || bndOf(it.r).holdsOpen(a) {
			return true
		}
		return !segHitsRect(a, b, it.r, leaderGap)
	}) {
		return false
	}
	for _, it := range p.pending() {
		if !bndOf(it.r).holdsOpen(a) && segHitsRect(a, b, it.r, leaderGap) {
			return false
		}
	}
	return len(p.fixed) == 0 || !p.tree.segHits(a, b, leaderGap)
}

// nearerMark reports whether the symbol of a station other than the one
// at anchor lies nearer than gap (mm) to box r: a label there would seem
// to name that station.
func (p *placer) nearerMark(r Rect, anchor Pt, gap float64) bool {
	for _, it := range p.pending() {
		if !it.mark || bndOf(it.r).holds(anchor) {
			continue
		}
		if c := centre(it.r); dist(rectEdgePoint(r, c), c) < gap {
			return true
		}
	}
	if len(p.fixed) > 0 && p.tree.markNear(r, anchor, gap) {
		return true
	}
	found := false
	p.visit(Rect{r.X - gap, r.Y - gap, r.W + 2*gap, r.H + 2*gap}, func(it *pitem) bool {
		if !it.mark || bndOf(it.r).holds(anchor) {
			return true
		}
		c := centre(it.r)
		found = dist(rectEdgePoint(r, c), c) < gap
		return !found
	})
	return found
}

// want describes a label to place: its size, the point it labels, the
// radius of the mark there (mm, the label keeps out of it) and the
// preferred direction from the mark (a unit vector on the page).
type want struct {
	w, h   float64
	anchor Pt
	clear  float64
	dir    Pt
}

// spot is a found place for a label.
type spot struct {
	box    Rect
	leader bool
	from   Pt // leader start, on the mark's edge
	to     Pt // leader end, on the box's edge
	// offHatch is set on a spot on a leader when a spot beside the mark
	// was free but on the hatch: the label moved to keep off the hatch
	offHatch bool
}

// nearTurns are the directions tried beside the mark, radians from the
// preferred one, best first.
var nearTurns = []float64{0, 0.6, -0.6, 1.2, -1.2, 1.75, -1.75, 2.35, -2.35, math.Pi}

// The costs by which find chooses among the free spots, in mm of leader.
const (
	// nearGapMM is the clear space left between a mark's clear radius and
	// a label beside it (no leader), mm.
	nearGapMM = 0.4
	// turnCost is the cost of a radian turned away from the preferred
	// direction.
	turnCost = 1.5
	// leaderCost is the cost of a leader: more than the worst spot beside
	// the mark (nearGapMM + turnCost·π), so that a label goes on a leader
	// only where no spot beside its mark is free and off the hatch.
	leaderCost = 6
	// hatchReach is how far (mm beyond the mark's clear radius) a label
	// with a leader looks for a spot off the hatch, whatever its far list
	// says.
	hatchReach = 10
	// hatchCost is the cost of a label on the hatch, plus hatchShare times
	// the hatched share of its box: more than any leader within
	// hatchReach, so that a clear spot within reach is always taken first,
	// but less than a long one: a label beside its mark on the hatch is
	// better than one far away on a leader.
	hatchCost  = leaderCost + hatchReach + turnCost*math.Pi + strayCost + 1
	hatchShare = 20
	// strayCost is the cost of a label on a leader that lies nearer to
	// another station's symbol than to its own mark.
	strayCost = 8
	// farStep is the spacing of the spots tried on a leader, mm, within
	// hatchReach; twice that out to twice the reach, four times beyond.
	farStep = 1.0
)

// cand is a spot tried on a leader: the box's centre offset from the
// anchor, mm, and its cost before the hatch.
type cand struct {
	off  Pt
	cost float64
	ord  int // lattice order, which breaks ties
}

// less orders candidates by cost, then by lattice order.
func (c cand) less(o cand) bool { return c.cost < o.cost || c.cost == o.cost && c.ord < o.ord }

// siftDown restores the min-heap h below i.
func siftDown(h []cand, i int) {
	for {
		l := 2*i + 1
		if l >= len(h) {
			return
		}
		m := l
		if r := l + 1; r < len(h) && h[r].less(h[l]) {
			m = r
		}
		if !h[m].less(h[i]) {
			return
		}
		h[i], h[m] = h[m], h[i]
		i = m
	}
}

// popCand removes the cheapest candidate h[0] from the heap h.
func popCand(h []cand) []cand {
	n := len(h) - 1
	h[0] = h[n]
	h = h[:n]
	siftDown(h, 0)
	return h
}

// find returns the best free spot for w, the one of least cost: beside the
// mark first (no leader), in the directions of nearTurns; then, when far
// is not empty, on a leader anywhere within the farthest distance of far
// or hatchReach, whichever is larger (mm beyond the mark's clear radius),
// on a lattice of farStep, dearer with distance and with the turn from the
// preferred direction. A spot on the hatch is taken only when no free spot
// within reach is clear of it, and never without a leader list (a label
// that may not move away from its mark stays off the hatch or is left
// out). The far search is skipped where one for a label of the same box,
// clear radius and no less reach found no room from an anchor within
// missR (see missedNear). The choice is deterministic. It does not take
// the spot.
func (p *placer) find(w want, far []float64) (spot, bool) {
	best, bestCost := spot{}, math.Inf(1)
	nearHatch := false
	for _, t := range nearTurns {
		base := nearGapMM + turnCost*math.Abs(t)
		if base >= bestCost {
			break
		}
		v := rot(w.dir, t)
		box := hang(w, add(w.anchor, mul(v, w.clear+nearGapMM)), v)
		if !p.free(box) {
			continue
		}
		cost := base
		if h := p.onHatch(box); h > 0 {
			nearHatch = true
			if len(far) == 0 {
				continue
			}
			cost += hatchCost + hatchShare*h
		}
		if cost < bestCost {
			best, bestCost = spot{box: box}, cost
		}
	}
	if len(far) == 0 || bestCost < leaderCost {
		return best, !math.IsInf(bestCost, 1)
	}
	reach := float64(hatchReach)
	for _, d := range far {
		reach = math.Max(reach, d)
	}
	if p.missedNear(w, reach) {
		return best, !math.IsInf(bestCost, 1)
	}
	cs := p.farCands(w, reach)
	for len(cs) > 0 {
		c := cs[0]
		cs = popCand(cs)
		if c.cost >= bestCost {
			break
		}
		ctr := add(w.anchor, c.off)
		box := Rect{ctr.X - w.w/2, ctr.Y - w.h/2, w.w, w.h}
		cost := c.cost
		if h := p.onHatch(box); h > 0 {
			cost += hatchCost + hatchShare*h
			if cost >= bestCost {
				continue
			}
		}
		if !p.free(box) {
			continue
		}
		near := rectEdgePoint(box, w.anchor)
		v := unit(sub(near, w.anchor), w.dir)
		s := spot{box: box, leader: true, from: add(w.anchor, mul(v, w.clear*1.15)), offHatch: nearHatch}
		s.to = rectEdgePoint(box, s.from)
		if !p.clearPath(s.from, s.to) {
			continue
		}
		if p.nearerMark(box, w.anchor, dist(near, w.anchor)) {
			if cost += strayCost; cost >= bestCost {
				continue
			}
		}
		best, bestCost = s, cost
	}
	if math.IsInf(bestCost, 1) {
		// every candidate was tried and none had room
		p.missed(w, reach)
	}
	return best, !math.IsInf(bestCost, 1)
}

// missR is how near (mm) to the anchor of a label whose far search found
// no room another label's anchor must lie for find to give up its far
// search: in a crowd the labels that are left over would each try every
// spot round the same pile in vain.
const missR = 0.1

// miss is a far search that found no room.
type miss struct {
	at                 Pt
	w, h, clear, reach float64
}

// missCell returns the cell of side missR that holds q.
func missCell(q Pt) [2]int { return [2]int{int(math.Floor(q.X / missR)), int(math.Floor(q.Y / missR))} }

// missed records that the far search for w within reach found no room.
func (p *placer) missed(w want, reach float64) {
	if p.misses == nil {
		p.misses = make(map[[2]int][]miss)
	}
	k := missCell(w.anchor)
	p.misses[k] = append(p.misses[k], miss{at: w.anchor, w: w.w, h: w.h, clear: w.clear, reach: reach})
}

// missedNear reports whether a far search for a label no smaller than w,
// with the same clear radius and at least the same reach, found no room
// from an anchor within missR of w's. Taken boxes are never given back,
// so from the same anchor the search would find no room again; from one
// a fraction of a millimetre away it would try the same crowded spots.
func (p *placer) missedNear(w want, reach float64) bool {
	if len(p.misses) == 0 {
		return false
	}
	k := missCell(w.anchor)
	for gx := k[0] - 1; gx <= k[0]+1; gx++ {
		for gy := k[1] - 1; gy <= k[1]+1; gy++ {
			for _, m := range p.misses[[2]int{gx, gy}] {
				if m.w == w.w && m.h == w.h && m.clear == w.clear && m.reach >= reach && dist(m.at, w.anchor) <= missR {
					return true
				}
			}
		}
	}
	return false
}

// hang returns the box of w hung from q in direction v: scaling v to unit
// max-norm puts the box's near edge (or corner) at q.
func hang(w want, q, v Pt) Rect {
	m := math.Max(math.Abs(v.X), math.Abs(v.Y))
	c := Pt{q.X + v.X/m*w.w/2, q.Y + v.Y/m*w.h/2}
	return Rect{c.X - w.w/2, c.Y - w.h/2, w.w, w.h}
}

// farCands returns the spots on a leader to try for w, as a min-heap by
// cost (popCand takes the cheapest):
// box centres on a lattice about the anchor (farStep apart within
// hatchReach, coarser beyond) whose box lies more than nearGapMM·2.5
// beyond the mark's clear radius and at most reach beyond it. The cost is
// leaderCost plus the gap and the turn from the preferred direction; ties
// go by lattice order, so the order is the same on every run.
func (p *placer) farCands(w want, reach float64) []cand {
	out := p.cands[:0]
	ext := w.clear + reach
	nx, ny := int(math.Ceil((ext+w.w/2)/farStep)), int(math.Ceil((ext+w.h/2)/farStep))
	for j := -ny; j <= ny; j++ {
		for i := -nx; i <= nx; i++ {
			off := Pt{float64(i) * farStep, float64(j) * farStep}
			// the gap from the anchor to the box
			gx := math.Max(0, math.Abs(off.X)-w.w/2)
			gy := math.Max(0, math.Abs(off.Y)-w.h/2)
			g := math.Hypot(gx, gy) - w.clear
			if g <= 2.5*nearGapMM || g > reach {
				continue
			}
			switch {
			case g > 2*hatchReach:
				if i%4 != 0 || j%4 != 0 {
					continue
				}
			case g > hatchReach:
				if i%2 != 0 || j%2 != 0 {
					continue
				}
			}
			turn := math.Acos(math.Max(-1, math.Min(1, dot(unit(off, w.dir), w.dir))))
			out = append(out, cand{off: off, cost: leaderCost + g + turnCost*turn, ord: len(out)})
		}
	}
	for i := len(out)/2 - 1; i >= 0; i-- {
		siftDown(out, i)
	}
	p.cands = out
	return out
}

// dot returns the dot product of a and b.
func dot(a, b Pt) float64 { return a.X*b.X + a.Y*b.Y }

// commit takes the spot s.
func (p *placer) commit(s spot) {
	p.take(s.box)
	if s.leader {
		p.leader(s.from, s.to)
	}
}

// leaderLine returns the leader of s, nil when it has none.
func leaderLine(s spot) []Pt {
	if !s.leader {
		return nil
	}
	return []Pt{s.from, s.to}
}
