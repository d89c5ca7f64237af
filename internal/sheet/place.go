package sheet

import (
	"math"
)

// labelGap is the clear space kept between two label boxes and between a
// label and a mark, mm.
const labelGap = 0.3

// placer keeps the boxes already taken in a view (labels, marks, symbols)
// and the leader lines, in a uniform grid of cells, and finds a free spot
// for each new label.
type placer struct {
	bounds Rect    // labels must lie inside
	cell   float64 // grid cell size, mm
	grid   map[[2]int][]int
	items  []pitem
	seen   []uint32
	gen    uint32
}

// pitem is a taken box or a leader segment.
type pitem struct {
	r     Rect
	a, b  Pt
	seg   bool
	label bool // a label box, which leaders must not cross
}

func newPlacer(bounds Rect) *placer {
	return &placer{bounds: bounds, cell: 4, grid: make(map[[2]int][]int)}
}

func (p *placer) cellRange(r Rect) (int, int, int, int) {
	return int(math.Floor(r.X / p.cell)), int(math.Floor(r.Y / p.cell)),
		int(math.Floor(r.Right() / p.cell)), int(math.Floor(r.Bottom() / p.cell))
}

func (p *placer) insert(it pitem, r Rect) {
	i := len(p.items)
	p.items = append(p.items, it)
	p.seen = append(p.seen, 0)
	x0, y0, x1, y1 := p.cellRange(r)
	for gx := x0; gx <= x1; gx++ {
		for gy := y0; gy <= y1; gy++ {
			k := [2]int{gx, gy}
			p.grid[k] = append(p.grid[k], i)
		}
	}
}

// block marks r as taken by a mark or symbol.
func (p *placer) block(r Rect) { p.insert(pitem{r: r}, r) }

// take marks r as taken by a label.
func (p *placer) take(r Rect) { p.insert(pitem{r: r, label: true}, r) }

// leader records a leader line from a to b.
func (p *placer) leader(a, b Pt) {
	p.insert(pitem{a: a, b: b, seg: true}, boundOf([]Pt{a, b}))
}

// visit calls f for every item near r once.
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
	return p.visit(grown, func(it *pitem) bool {
		if it.seg {
			return !segHitsRect(it.a, it.b, grown, 0)
		}
		return !it.r.Overlaps(grown, 0)
	})
}

// clearPath reports whether a leader from a to b crosses no taken box.
func (p *placer) clearPath(a, b Pt) bool {
	return p.visit(boundOf([]Pt{a, b}), func(it *pitem) bool {
		return it.seg || !segHitsRect(a, b, it.r, 0.05)
	})
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
}

// Candidate directions around the preferred one, radians, best first.
var (
	nearTurns = []float64{0, 0.6, -0.6, 1.2, -1.2, 1.75, -1.75, 2.35, -2.35, math.Pi}
	farTurns  = []float64{0, 0.3, -0.3, 0.6, -0.6, 0.9, -0.9, 1.3, -1.3, 1.75, -1.75, 2.35, -2.35, math.Pi}
)

// find returns the first free spot for w: beside the mark at distance 0
// first (no leader), then further out with a leader at each distance of
// far (mm), trying directions around the preferred one. It does not take
// the spot.
func (p *placer) find(w want, far []float64) (spot, bool) {
	try := func(turn, d float64, leader bool) (spot, bool) {
		v := rot(w.dir, turn)
		q := add(w.anchor, mul(v, w.clear+d))
		// hang the box from q in direction v: scaling v to unit max-norm puts
		// the box's near edge (or corner) at q
		m := math.Max(math.Abs(v.X), math.Abs(v.Y))
		c := Pt{q.X + v.X/m*w.w/2, q.Y + v.Y/m*w.h/2}
		box := Rect{c.X - w.w/2, c.Y - w.h/2, w.w, w.h}
		if !p.free(box) {
			return spot{}, false
		}
		s := spot{box: box}
		if leader {
			s.leader = true
			s.from = add(w.anchor, mul(v, w.clear*1.15))
			s.to = rectEdgePoint(box, s.from)
			if !p.clearPath(s.from, s.to) {
				return spot{}, false
			}
		}
		return s, true
	}
	for _, t := range nearTurns {
		if s, ok := try(t, 0.4, false); ok {
			return s, true
		}
	}
	for _, d := range far {
		for _, t := range farTurns {
			if s, ok := try(t, d, true); ok {
				return s, true
			}
		}
	}
	return spot{}, false
}

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
